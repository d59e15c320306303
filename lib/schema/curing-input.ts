import { z } from "zod";
import surfaceCovers from "../data/curing/surface-covers.json";
import curingInputDefaults from "../data/curing/input-defaults.json";

// Only data files are imported here, so the schema does not depend on the curing modules that use it.
const surfaceCoverIds = surfaceCovers.covers.map((cover) => cover.id);
const maxElementSteps = curingInputDefaults.maxTimeSteps.value;

/**
 * Input of the curing advisory (`cure` command, API, form). Every message names the field and its limit.
 * Limits are the ranges the models behind the fields are meant for (common practice unless stated):
 * thickness 0.05–10 m (slabs to mass pours), binder 150–700 kg/m³ and w/b 0.20–0.80 (structural concrete),
 * placement 0–45 °C (ACI 305R/306R working range), steam hold up to 90 °C (liquid water at 1 bar).
 */

export function boundedNumber(field: string, min: number, max: number, unit = "") {
  const limits = `${field} must be between ${min} and ${max}${unit}`;
  return z
    .number({ error: (issue) => (issue.input === undefined ? `${field} is required` : `${field} must be a number`) })
    .min(min, { error: limits })
    .max(max, { error: limits });
}

export function boundedInteger(field: string, min: number, max: number) {
  return boundedNumber(field, min, max).int({ error: `${field} must be a whole number` });
}

function oneOf<const T extends readonly [string, ...string[]]>(field: string, values: T) {
  return z.enum(values, { error: `${field} must be one of ${values.join(", ")}` });
}

const coverIds = surfaceCoverIds as unknown as readonly [string, ...string[]];

function face(prefix: string) {
  return z.object(
    {
      cover: oneOf(`${prefix}.cover`, coverIds).default("exposed"),
      /** Overrides the cover: an overall surface coefficient, W/(m²·K). */
      hWPerM2K: boundedNumber(`${prefix}.hWPerM2K`, 0, 1e6, " W/(m² K)").optional(),
      windSpeedMPerS: boundedNumber(`${prefix}.windSpeedMPerS`, 0, 30, " m/s").optional(),
      /** Formwork or insulation removed at this time (h after placement); the face is then `coverAfterStrip`. */
      stripAtH: boundedNumber(`${prefix}.stripAtH`, 0, 2160, " h").optional(),
      coverAfterStrip: oneOf(`${prefix}.coverAfterStrip`, coverIds).default("exposed"),
    },
    { error: `${prefix} must be an object` },
  );
}

const ambient = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("constant"), temperatureC: boundedNumber("ambient.temperatureC", -40, 50, " °C") }),
    z.object({
      kind: z.literal("daily-sine"),
      meanC: boundedNumber("ambient.meanC", -40, 50, " °C"),
      amplitudeC: boundedNumber("ambient.amplitudeC", 0, 25, " °C"),
      peakHourOfDay: boundedNumber("ambient.peakHourOfDay", 0, 24, " h").optional(),
      placementHourOfDay: boundedNumber("ambient.placementHourOfDay", 0, 24, " h").optional(),
    }),
    z.object({
      kind: z.literal("series"),
      points: z
        .array(
          z.object({
            timeH: boundedNumber("ambient.points[].timeH", 0, 2160, " h"),
            temperatureC: boundedNumber("ambient.points[].temperatureC", -40, 60, " °C"),
          }),
          { error: "ambient.points must be a list of { timeH, temperatureC }" },
        )
        .min(2, { error: "ambient.points must have at least 2 points" })
        .max(10000, { error: "ambient.points must have at most 10000 points" })
        .refine((p) => p.every((q, i) => i === 0 || q.timeH > p[i - 1].timeH), { error: "ambient.points timeH must increase" }),
    }),
  ],
  { error: "ambient.kind must be one of constant, daily-sine, series" },
);

const scmType = oneOf("supplementaryMaterials[].type", [
  "slag",
  "fly-ash",
  "siliceous-fly-ash",
  "calcareous-fly-ash",
  "silica-fume",
  "metakaolin",
  "limestone",
  "natural-pozzolan",
]);

/**
 * The fields of the curing input, shared with its binder form (`curing-binder-form.ts`), which replaces `cement`,
 * `supplementaryMaterials` and `heatCurve` by a `binder` section.
 */
export const curingFields = {
  element: z.object(
    {
      thicknessM: boundedNumber("element.thicknessM", 0.05, 10, " m"),
      geometry: oneOf("element.geometry", ["symmetric", "two-faces"]).default("symmetric"),
      nodeCount: boundedInteger("element.nodeCount", 5, 401).optional(),
    },
    { error: "element must be an object with thicknessM" },
  ),
  concrete: z.object(
    {
      binderKgPerM3: boundedNumber("concrete.binderKgPerM3", 150, 700, " kg/m³"),
      waterBinderRatio: boundedNumber("concrete.waterBinderRatio", 0.2, 0.8),
      densityKgPerM3: boundedNumber("concrete.densityKgPerM3", 1800, 2800, " kg/m³").optional(),
      specificHeatJPerKgK: boundedNumber("concrete.specificHeatJPerKgK", 700, 1400, " J/(kg K)").optional(),
      conductivityWPerMK: boundedNumber("concrete.conductivityWPerMK", 0.5, 5, " W/(m K)").optional(),
      fcm28MPa: boundedNumber("concrete.fcm28MPa", 10, 150, " MPa"),
      fckMPa: boundedNumber("concrete.fckMPa", 5, 140, " MPa").optional(),
      cementClass: oneOf("concrete.cementClass", ["R", "N", "S"]).optional(),
    },
    { error: "concrete must be an object with binderKgPerM3, waterBinderRatio and fcm28MPa" },
  ),
  cement: z.object(
    {
      phasesMassPercent: z.object(
        {
          C3S: boundedNumber("cement.phasesMassPercent.C3S", 0, 100, " mass %"),
          C2S: boundedNumber("cement.phasesMassPercent.C2S", 0, 100, " mass %"),
          C3A: boundedNumber("cement.phasesMassPercent.C3A", 0, 100, " mass %"),
          C4AF: boundedNumber("cement.phasesMassPercent.C4AF", 0, 100, " mass %"),
          SO3: boundedNumber("cement.phasesMassPercent.SO3", 0, 10, " mass %").optional(),
          freeCaO: boundedNumber("cement.phasesMassPercent.freeCaO", 0, 10, " mass %").optional(),
          MgO: boundedNumber("cement.phasesMassPercent.MgO", 0, 10, " mass %").optional(),
        },
        { error: "cement.phasesMassPercent must be an object with C3S, C2S, C3A, C4AF" },
      ),
      blaineM2PerKg: boundedNumber("cement.blaineM2PerKg", 200, 800, " m²/kg").optional(),
    },
    { error: "cement must be an object with phasesMassPercent" },
  ),
  supplementaryMaterials: z
    .array(
      z.object({
        type: scmType,
        massPercentOfBinder: boundedNumber("supplementaryMaterials[].massPercentOfBinder", 0, 90, " mass %"),
        caoMassPercent: boundedNumber("supplementaryMaterials[].caoMassPercent", 0, 60, " mass %").optional(),
      }),
      { error: "supplementaryMaterials must be a list" },
    )
    .max(6, { error: "supplementaryMaterials must have at most 6 entries" })
    .default([]),
  /** A measured (or engine-computed) heat curve replacing the default model. */
  heatCurve: z
    .object({
      points: z
        .array(
          z.object({
            equivalentAgeH: boundedNumber("heatCurve.points[].equivalentAgeH", 0, 1e5, " h"),
            cumulativeHeatJPerG: boundedNumber("heatCurve.points[].cumulativeHeatJPerG", 0, 1000, " J/g"),
          }),
        )
        .min(2, { error: "heatCurve.points must have at least 2 points" })
        .max(10000, { error: "heatCurve.points must have at most 10000 points" })
        .refine((p) => p.every((q, i) => i === 0 || q.equivalentAgeH > p[i - 1].equivalentAgeH), {
          error: "heatCurve.points equivalentAgeH must increase",
        })
        .refine((p) => p.every((q, i) => i === 0 || q.cumulativeHeatJPerG >= p[i - 1].cumulativeHeatJPerG), {
          error: "heatCurve.points cumulativeHeatJPerG must not decrease",
        }),
      referenceTemperatureC: boundedNumber("heatCurve.referenceTemperatureC", 0, 60, " °C"),
      activationEnergyJPerMol: boundedNumber("heatCurve.activationEnergyJPerMol", 10000, 80000, " J/mol"),
    })
    .optional(),
  placementTemperatureC: boundedNumber("placementTemperatureC", 0, 45, " °C"),
  ambient,
  faces: z
    .object({ a: face("faces.a").default({ cover: "exposed", coverAfterStrip: "exposed" }), b: face("faces.b").optional() })
    .default({ a: { cover: "exposed", coverAfterStrip: "exposed" } }),
  steamCuring: z
    .object({
      presetH: boundedNumber("steamCuring.presetH", 0, 24, " h"),
      rampCPerH: boundedNumber("steamCuring.rampCPerH", 1, 60, " °C/h"),
      holdTemperatureC: boundedNumber("steamCuring.holdTemperatureC", 20, 90, " °C"),
      holdH: boundedNumber("steamCuring.holdH", 0, 72, " h"),
      coolingCPerH: boundedNumber("steamCuring.coolingCPerH", 1, 60, " °C/h"),
    })
    .optional(),
  durationH: boundedNumber("durationH", 1, 2160, " h").optional(),
  timeStepMin: boundedNumber("timeStepMin", 0.5, 60, " min").optional(),
  outputIntervalH: boundedNumber("outputIntervalH", 0.1, 24, " h").optional(),
  scheme: oneOf("scheme", ["crank-nicolson", "backward-euler"]).default("crank-nicolson"),
  maturity: z
    .object({
      activationEnergyJPerMol: boundedNumber("maturity.activationEnergyJPerMol", 10000, 80000, " J/mol").optional(),
      referenceTemperatureC: z.union([z.literal(20), z.literal(23)], { error: "maturity.referenceTemperatureC must be 20 or 23" }).optional(),
    })
    .default({}),
  strengthTargets: z
    .array(
      z.object({
        label: z.string({ error: "strengthTargets[].label must be text" }).min(1).max(80),
        strengthMPa: boundedNumber("strengthTargets[].strengthMPa", 0.5, 150, " MPa"),
      }),
    )
    .max(10, { error: "strengthTargets must have at most 10 entries" })
    .default([]),
  curing: z
    .object({
      curingClass: z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4)], { error: "curing.curingClass must be 1, 2, 3 or 4" }).optional(),
      plannedCuringDays: boundedNumber("curing.plannedCuringDays", 0, 90, " d").optional(),
    })
    .default({}),
  evaporation: z
    .object({
      airTemperatureC: boundedNumber("evaporation.airTemperatureC", -10, 50, " °C"),
      relativeHumidityPercent: boundedNumber("evaporation.relativeHumidityPercent", 0, 100, " %"),
      windSpeedKmH: boundedNumber("evaporation.windSpeedKmH", 0, 100, " km/h"),
      concreteTemperatureC: boundedNumber("evaporation.concreteTemperatureC", 0, 50, " °C").optional(),
    })
    .optional(),
  limits: z
    .object({
      ettringiteStabilityTemperatureC: boundedNumber("limits.ettringiteStabilityTemperatureC", 40, 100, " °C").optional(),
      maxDifferenceC: boundedNumber("limits.maxDifferenceC", 5, 50, " °C").optional(),
      freezingStrengthMPa: boundedNumber("limits.freezingStrengthMPa", 1, 20, " MPa").optional(),
      lowWaterBinderOrSilicaFume: z.boolean({ error: "limits.lowWaterBinderOrSilicaFume must be true or false" }).optional(),
    })
    .default({}),
};

/** The fields every curing input has, whatever form its binder takes. */
const { cement: _cement, supplementaryMaterials: _scms, heatCurve: _heatCurve, ...binderIndependent } = curingFields;
export const binderIndependentCuringFields = binderIndependent;
const binderIndependentObject = z.object(binderIndependent);
type BinderIndependentCuringInput = z.infer<typeof binderIndependentObject>;

/** The cross-field checks that do not concern the binder (faces, step count, strengths). */
export function checkCuringFields(input: BinderIndependentCuringInput, context: z.RefinementCtx): void {
  if (input.element.geometry === "two-faces" && !input.faces.b)
    context.addIssue({ code: "custom", path: ["faces", "b"], message: "faces.b is required when element.geometry is two-faces" });
  const durationH = input.durationH ?? curingInputDefaults.durationH.value;
  const stepMin = input.timeStepMin ?? curingInputDefaults.timeStepMin.value;
  const minutesPerHour = 60;
  if ((durationH * minutesPerHour) / stepMin > maxElementSteps)
    context.addIssue({ code: "custom", path: ["timeStepMin"], message: `durationH / timeStepMin must give at most ${maxElementSteps} steps` });
  if (input.concrete.fckMPa !== undefined && input.concrete.fckMPa >= input.concrete.fcm28MPa)
    context.addIssue({ code: "custom", path: ["concrete", "fckMPa"], message: "concrete.fckMPa must be below concrete.fcm28MPa" });
}

export const curingInputSchema = z.object(curingFields, { error: "input must be a JSON object" }).superRefine((input, context) => {
  const p = input.cement.phasesMassPercent;
  const sum = p.C3S + p.C2S + p.C3A + p.C4AF + (p.SO3 ?? 0) + (p.freeCaO ?? 0) + (p.MgO ?? 0);
  if (sum > 102 || sum < 50)
    context.addIssue({ code: "custom", path: ["cement", "phasesMassPercent"], message: `cement.phasesMassPercent must sum to between 50 and 102 mass % (got ${sum.toFixed(1)})` });
  const scm = input.supplementaryMaterials.reduce((s, m) => s + m.massPercentOfBinder, 0);
  if (scm > 90)
    context.addIssue({ code: "custom", path: ["supplementaryMaterials"], message: `supplementaryMaterials massPercentOfBinder must sum to at most 90 (got ${scm})` });
  checkCuringFields(input, context);
});

export type CuringInput = z.infer<typeof curingInputSchema>;
export type CuringInputError = { code: "invalid-input"; field: string; message: string };

/** Validates raw input; on failure returns the first problem with the field path and a one-line message. */
export function parseCuringInput(raw: unknown): { ok: true; value: CuringInput } | { ok: false; error: CuringInputError } {
  const result = curingInputSchema.safeParse(raw);
  if (result.success) return { ok: true, value: result.data };
  const issue = result.error.issues[0];
  const field = issue.path.map(String).join(".") || "input";
  const message = issue.message.includes(field.split(".")[0]) ? issue.message : `${field}: ${issue.message}`;
  return { ok: false, error: { code: "invalid-input", field, message } };
}
