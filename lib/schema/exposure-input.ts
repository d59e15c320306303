import { z } from "zod";

/**
 * The exposure of a concrete member, as entered by the user: groundwater/soil chemistry, chlorides,
 * air, climate, wetting, freezing, cover. Every message names the field and its limit.
 *
 * Upper limits are sanity bounds, not physics: they reject typing errors (e.g. mg/kg entered as mg/L ×1000).
 */

/** A finite number within [min, max] (inclusive), with a message naming the field, unit and limit. */
function boundedNumber(field: string, unit: string, min: number, max: number, minExclusive = false) {
  const unitText = unit ? ` ${unit}` : "";
  const base = z.number({ error: `${field} must be a number${unit ? ` in ${unit}` : ""}` }).max(max, {
    error: `${field} must be at most ${max}${unitText}`,
  });
  return minExclusive
    ? base.gt(min, { error: `${field} must be greater than ${min}${unitText}` })
    : base.min(min, { error: `${field} must be at least ${min}${unitText}` });
}

/**
 * Sulfate, mg/L. Upper bound 300 000 mg/L: above the SO4 content of saturated solutions of the common
 * sulfate salts near 25 °C (MgSO4 about 26 % by mass, Na2SO4 about 22 %; CRC Handbook aqueous
 * solubilities, from memory).
 */
const SULFATE_MAX_MG_PER_L = 300_000;

export const wettingRegime = z.enum(["permanently-wet", "wet-rarely-dry", "wet-dry", "unsheltered", "sheltered", "dry"], {
  error: 'wetting must be one of "permanently-wet", "wet-rarely-dry", "wet-dry", "unsheltered", "sheltered", "dry"',
});

export const seawaterZone = z.enum(["airborne", "submerged", "tidal-splash-spray"], {
  error: 'seawater must be true/false or one of "airborne", "submerged", "tidal-splash-spray"',
});

export const serviceTemperatureRange = z
  .strictObject({
    minC: boundedNumber("serviceTemperatureC.minC", "°C", -60, 80),
    maxC: boundedNumber("serviceTemperatureC.maxC", "°C", -60, 80),
  })
  .refine((r) => r.minC <= r.maxC, { error: "serviceTemperatureC.minC must not exceed serviceTemperatureC.maxC", path: ["minC"] });

export const freezingExposure = z.strictObject({
  /** Whether the concrete sees freeze–thaw cycles in service. */
  exposed: z.boolean({ error: "freezing.exposed must be true or false" }),
  /**
   * Water saturation while freezing: "moderate" (EN 206 XF1/XF2; ACI 318 "limited exposure to water") or
   * "high" (XF3/XF4; "frequent exposure to water"). Derived from `wetting` when absent.
   */
  waterSaturation: z.enum(["moderate", "high"], { error: 'freezing.waterSaturation must be "moderate" or "high"' }).optional(),
});

export const exposureInput = z
  .strictObject({
    // Groundwater / soil chemistry (EN 206 Table 2, ACI 318-19 Table 19.3.1.1)
    sulfateMgPerL: boundedNumber("sulfateMgPerL", "mg/L", 0, SULFATE_MAX_MG_PER_L).optional(),
    soilSulfateMgPerKg: boundedNumber("soilSulfateMgPerKg", "mg/kg", 0, 1_000_000).optional(),
    soilSulfateMassPercent: boundedNumber("soilSulfateMassPercent", "% by mass", 0, 100).optional(),
    /** EN 206 Table 2 uses total (acid-soluble, EN 196-2) soil sulfate; ACI 318 water-soluble (ASTM C1580). */
    soilSulfateExtraction: z
      .enum(["acid-soluble", "water-soluble"], { error: 'soilSulfateExtraction must be "acid-soluble" or "water-soluble"' })
      .optional(),
    sulfateCation: z.enum(["Na", "Mg", "Ca", "K"], { error: 'sulfateCation must be one of "Na", "Mg", "Ca", "K"' }).optional(),
    magnesiumMgPerL: boundedNumber("magnesiumMgPerL", "mg/L", 0, 150_000).optional(),
    waterPH: boundedNumber("waterPH", "", 0, 14).optional(),
    bicarbonateMgPerL: boundedNumber("bicarbonateMgPerL", "mg/L", 0, 100_000).optional(),
    carbonateMgPerL: boundedNumber("carbonateMgPerL", "mg/L", 0, 100_000).optional(),
    /** Lime-aggressive CO2 by the marble test of EN 13577. */
    aggressiveCo2MgPerL: boundedNumber("aggressiveCo2MgPerL", "mg/L", 0, 10_000).optional(),
    ammoniumMgPerL: boundedNumber("ammoniumMgPerL", "mg/L", 0, 100_000).optional(),
    /** Soil acidity by the Baumann–Gully method (EN 16502), ml/kg. */
    soilAcidityBaumannGullyMlPerKg: boundedNumber("soilAcidityBaumannGullyMlPerKg", "ml/kg", 0, 10_000).optional(),

    // Chlorides
    chlorideMgPerL: boundedNumber("chlorideMgPerL", "mg/L", 0, 250_000).optional(),
    /** Sea water: true (zone derived from `wetting`) or the zone. */
    seawater: z.union([z.boolean(), seawaterZone], { error: 'seawater must be true/false or one of "airborne", "submerged", "tidal-splash-spray"' }).optional(),
    deIcingSalts: z.boolean({ error: "deIcingSalts must be true or false" }).optional(),

    // Air and climate
    /** CO2 in air, % by volume. Default 0.04 % (about 420 µmol/mol, NOAA global monthly mean 2023–24, from memory). */
    co2Percent: boundedNumber("co2Percent", "% by volume", 0, 100).default(0.04),
    serviceTemperatureC: z
      .union([boundedNumber("serviceTemperatureC", "°C", -60, 80), serviceTemperatureRange], {
        error: "serviceTemperatureC must be a number in °C or { minC, maxC }",
      })
      .optional(),
    relativeHumidityPercent: boundedNumber("relativeHumidityPercent", "%", 0, 100).optional(),
    wetting: wettingRegime.optional(),
    freezing: freezingExposure.optional(),
    /** ACI 318-19 W2: in contact with water where low permeability is required. */
    lowPermeabilityRequired: z.boolean({ error: "lowPermeabilityRequired must be true or false" }).optional(),
    /** Reinforcement or other embedded metal (EN 206 XC/XD/XS apply only then). Default true. */
    reinforced: z.boolean({ error: "reinforced must be true or false" }).default(true),
    carbonateAggregate: z.boolean({ error: "carbonateAggregate must be true or false" }).optional(),
    coverMm: boundedNumber("coverMm", "mm", 0, 500, true).optional(),
  }, { error: "exposure must be an object" })
  .refine((e) => e.soilSulfateMgPerKg === undefined || e.soilSulfateMassPercent === undefined, {
    error: "give soil sulfate either as soilSulfateMgPerKg or as soilSulfateMassPercent, not both",
    path: ["soilSulfateMassPercent"],
  });

/** The curing history, as far as the advisory needs it without the thermal model. */
export const curingHistoryInput = z.strictObject(
  { maxTemperatureC: boundedNumber("curing.maxTemperatureC", "°C", -10, 120) },
  { error: "curing must be an object" },
);

export type ExposureInput = z.infer<typeof exposureInput>;
export type ExposureInputRaw = z.input<typeof exposureInput>;
export type CuringHistoryInput = z.infer<typeof curingHistoryInput>;

export type InputError = { code: "invalid-input"; field: string; message: string };
export type ParseResult<T> = { ok: true; value: T } | { ok: false; error: InputError };

function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = input;
  for (const key of path) v = v !== null && typeof v === "object" ? (v as Record<PropertyKey, unknown>)[key] : undefined;
  return v;
}

function firstIssue(error: z.ZodError, prefix: string, input: unknown): InputError {
  const issue = error.issues[0];
  const path = [prefix, ...issue.path.map(String)].filter(Boolean).join(".");
  let message = issue.message;
  if (issue.code === "unrecognized_keys") message = `${prefix ? prefix + ": " : ""}unknown field(s) ${issue.keys.join(", ")}`;
  else if (issue.code === "invalid_type" && valueAt(input, issue.path) === undefined) message = `${path} is required`;
  return { code: "invalid-input", field: path || prefix, message };
}

/** Checks an exposure object; on failure returns the first problem, naming the field (prefixed `exposure.`). */
export function parseExposureInput(value: unknown): ParseResult<ExposureInput> {
  const result = exposureInput.safeParse(value);
  return result.success ? { ok: true, value: result.data } : { ok: false, error: firstIssue(result.error, "exposure", value) };
}

export function parseCuringHistoryInput(value: unknown): ParseResult<CuringHistoryInput> {
  const result = curingHistoryInput.safeParse(value);
  return result.success ? { ok: true, value: result.data } : { ok: false, error: firstIssue(result.error, "curing", value) };
}

/** The service temperature as a range (a single value gives min = max), or undefined. */
export function serviceTemperatureRangeC(e: Pick<ExposureInput, "serviceTemperatureC">): { minC: number; maxC: number } | undefined {
  const t = e.serviceTemperatureC;
  if (t === undefined) return undefined;
  return typeof t === "number" ? { minC: t, maxC: t } : t;
}
