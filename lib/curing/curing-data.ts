/**
 * The curing data files (`lib/data/curing/*.json`), checked with zod when first loaded so a malformed
 * edit fails loudly at start-up rather than giving silent numbers. Each file carries its provenance.
 */
import { z } from "zod";
import thermalJson from "../data/curing/concrete-thermal-properties.json";
import coversJson from "../data/curing/surface-covers.json";
import phaseHeatsJson from "../data/curing/clinker-phase-heats.json";
import hydrationJson from "../data/curing/hydration-model.json";
import maturityJson from "../data/curing/maturity-strength.json";
import limitsJson from "../data/curing/curing-limits.json";
import en13670Json from "../data/curing/en13670-curing.json";
import inputDefaultsJson from "../data/curing/input-defaults.json";

const provenance = z.object({ sources: z.array(z.string()).min(1), generatedBy: z.string(), date: z.string() });
const sourced = z.object({ value: z.number(), source: z.string().min(3), recalledFromMemory: z.boolean().optional() });
const ranged = sourced.extend({ range: z.tuple([z.number(), z.number()]) });

const thermalSchema = z.object({
  provenance,
  densityKgPerM3: ranged,
  specificHeatJPerKgK: ranged,
  conductivityWPerMK: ranged,
});

const layer = z.object({ thicknessM: z.number().positive(), conductivityWPerMK: z.number().positive(), material: z.string() });
const coversSchema = z.object({
  provenance,
  outerFilm: z.object({
    convectiveBaseWPerM2K: z.number(),
    convectivePerWindWsPerM3K: z.number(),
    emissivity: z.number().min(0).max(1),
    stefanBoltzmannWPerM2K4: z.number().positive(),
    source: z.string(),
  }),
  covers: z.array(
    z.object({
      id: z.string(),
      name: z.string(),
      layers: z.union([z.array(layer), z.literal("adiabatic")]),
      source: z.string().min(3),
      recalledFromMemory: z.boolean().optional(),
    }),
  ),
});

const phaseHeats = z.object({
  C3S: z.number(),
  C2S: z.number(),
  C3A: z.number(),
  C4AF: z.number(),
  SO3: z.number(),
  freeCaO: z.number(),
  MgO: z.number(),
});
const phaseHeatsSchema = z.object({
  provenance,
  units: z.string(),
  sets: z.array(z.object({ id: z.string(), name: z.string(), heatsJPerG: phaseHeats, source: z.string().min(3) })),
  scmUltimateHeatsJPerG: z.object({ slag: sourced, flyAshPerCaOFraction: sourced }),
});

const hydrationSchema = z.object({
  provenance,
  referenceTemperatureC: sourced,
  tau: z.object({
    coefficientH: z.number(),
    exponentC3A: z.number(),
    exponentC3S: z.number(),
    exponentBlaine: z.number(),
    exponentSO3: z.number(),
    slagExpFactor: z.number(),
    flyAshCaOExpFactor: z.number(),
  }),
  beta: z.object({
    coefficient: z.number(),
    exponentC3A: z.number(),
    exponentC3S: z.number(),
    exponentBlaine: z.number(),
    exponentSO3: z.number(),
    slagExpFactor: z.number(),
  }),
  ultimateDegree: z.object({
    coefficient: z.number(),
    offsetWaterBinder: z.number(),
    flyAshTerm: z.number(),
    slagTerm: z.number(),
    maximum: z.number(),
  }),
  activationEnergy: z.object({
    coefficientJPerMol: z.number(),
    exponentC3A: z.number(),
    exponentC4AF: z.number(),
    exponentBlaine: z.number(),
    flyAshFactor: z.number(),
    flyAshCaOReference: z.number(),
    slagFactor: z.number(),
  }),
  defaults: z.object({
    blaineM2PerKg: sourced,
    so3MassFraction: sourced,
    flyAshCaOMassFraction: sourced,
    calcareousFlyAshCaOMassFraction: sourced,
    minimumPhaseFraction: sourced,
  }),
});

const maturitySchema = z.object({
  provenance,
  gasConstantJPerMolK: sourced,
  activationEnergyJPerMol: z.object({ default: z.number(), range: z.tuple([z.number(), z.number()]), source: z.string() }),
  referenceTemperatureC: z.object({ default: z.number(), allowed: z.array(z.number()), source: z.string() }),
  strengthDevelopmentS: z.object({ R: sourced, N: sourced, S: sourced }),
  referenceAgeDays: sourced,
  characteristicMarginMPa: sourced,
});

const limitsSchema = z.object({
  provenance,
  defPeakTemperatureC: sourced.extend({ cautionMarginC: z.number() }),
  coreSurfaceDifferenceC: sourced,
  evaporationCautionKgPerM2H: sourced,
  evaporationLowWcmKgPerM2H: sourced.extend({ lowWaterBinderBelow: z.number() }),
  freezingRequiredStrengthMPa: sourced,
});

const developmentId = z.enum(["rapid", "medium", "slow", "very-slow"]);
const en13670Schema = z.object({
  provenance,
  curingClasses: z.array(
    z.object({
      curingClass: z.number().int(),
      periodH: z.number().optional(),
      fractionOfFck: z.number().optional(),
      source: z.string(),
    }),
  ),
  strengthDevelopment: z.array(z.object({ id: developmentId, minimumRatio: z.number() })),
  strengthDevelopmentSource: z.string(),
  minimumDaysTables: z.array(
    z.object({
      curingClass: z.number().int(),
      source: z.string(),
      recalledFromMemory: z.boolean().optional(),
      rows: z.array(
        z.object({ minSurfaceTemperatureC: z.number(), days: z.record(developmentId, z.number()) }),
      ),
    }),
  ),
});

const inputDefaultsSchema = z.object({
  provenance,
  nodeCount: sourced,
  timeStepMin: sourced,
  durationH: sourced,
  outputIntervalH: sourced,
  windSpeedMPerS: sourced,
  placementHourOfDay: sourced,
  sinePeakHourOfDay: sourced,
  curingClass: sourced,
  cementClass: z.object({ value: z.enum(["R", "N", "S"]), source: z.string() }),
  maxTimeSteps: sourced,
});

export type StrengthDevelopmentId = z.infer<typeof developmentId>;
export type PhaseHeatSet = z.infer<typeof phaseHeatsSchema>["sets"][number];
export type SurfaceCover = z.infer<typeof coversSchema>["covers"][number];

/** Default concrete thermal properties (EN 1991-1-1, EN 1992-1-2, ACI 207.1R). */
export const concreteThermalData = thermalSchema.parse(thermalJson);
/** Formwork and insulation layers and the outer air film (EN ISO 6946, EN ISO 10456). */
export const surfaceCoverData = coversSchema.parse(coversJson);
/** Per-phase heats of complete hydration (Lerch & Bogue 1934; Taylor 1997). */
export const phaseHeatData = phaseHeatsSchema.parse(phaseHeatsJson);
/** Schindler & Folliard (2005) hydration regressions; Schindler (2004) activation energy. */
export const hydrationModelData = hydrationSchema.parse(hydrationJson);
/** ASTM C1074 and fib MC2010 parameters. */
export const maturityStrengthData = maturitySchema.parse(maturityJson);
/** Flag limits (DEF, thermal cracking, evaporation, freezing). */
export const curingLimitData = limitsSchema.parse(limitsJson);
/** EN 13670 curing classes and minimum-days table. */
export const en13670Data = en13670Schema.parse(en13670Json);
/** Defaults of optional inputs (typical values with their reasons). */
export const curingInputDefaults = inputDefaultsSchema.parse(inputDefaultsJson);
