import type { Flag } from "../advisory/flag";
import { curingLimitData } from "./curing-data";

export type CuringFlagFacts = {
  peakCoreC: number;
  peakTimeH: number;
  maxTemperatureC: number;
  /** The mix's computed ettringite stability temperature, °C, when known. */
  ettringiteStabilityTemperatureC?: number;
  maxDifferenceC: number;
  maxDifferenceTimeH: number;
  differenceLimitC?: number;
  evaporationKgPerM2H: number | null;
  lowWaterBinderOrSilicaFume: boolean;
  firstSubZeroSurfaceH: number | null;
  strengthAtFirstSubZeroMPa: number | null;
  freezingStrengthMPa: number;
  plannedCuringDays?: number;
  minimumCuringDays: number | null;
  curingClass: number;
};

const limits = curingLimitData;
const round1 = (x: number) => Math.round(x * 10) / 10;
const round2 = (x: number) => Math.round(x * 100) / 100;

/** Peak above the DEF limit (the mix's ettringite stability temperature, else the common 70 °C). */
export function peakTemperatureFlag(f: CuringFlagFacts): Flag | null {
  const fromMix = f.ettringiteStabilityTemperatureC !== undefined;
  const limitC = f.ettringiteStabilityTemperatureC ?? limits.defPeakTemperatureC.value;
  const peakC = Math.max(f.peakCoreC, f.maxTemperatureC);
  const margin = limits.defPeakTemperatureC.cautionMarginC;
  if (peakC < limitC - margin) return null;
  const above = peakC >= limitC;
  return {
    id: "peak-temperature-def",
    severity: above ? "warning" : "caution",
    title: above ? "Peak temperature above the DEF limit" : "Peak temperature close to the DEF limit",
    explanation:
      `The element reaches ${round1(peakC)} °C (core peak ${round1(f.peakCoreC)} °C at ${round1(f.peakTimeH)} h); ` +
      `${fromMix ? "the mix's computed ettringite stability temperature" : "the common limit"} is ${round1(limitC)} °C. ` +
      "Ettringite formed early can dissolve above this temperature and re-form later in the hardened concrete (delayed ettringite formation). " +
      "Pass the temperature history to the DEF scenario of the durability advisory.",
    basis: fromMix ? `mix ettringite stability temperature; ${limits.defPeakTemperatureC.source}` : limits.defPeakTemperatureC.source,
    actions: [
      "Lower the placement temperature (chilled water, ice, shaded aggregates).",
      "Reduce the cement content or replace part of it with slag or fly ash.",
      "For steam curing, lower the hold temperature.",
      "Monitor core temperature during the first days.",
    ],
  };
}

/** Core–surface difference above the rule-of-thumb or user limit. */
export function thermalCrackingFlag(f: CuringFlagFacts): Flag | null {
  const limitC = f.differenceLimitC ?? limits.coreSurfaceDifferenceC.value;
  if (f.maxDifferenceC <= limitC) return null;
  return {
    id: "thermal-cracking",
    severity: "warning",
    title: "Core–surface temperature difference above the limit",
    explanation:
      `The core is up to ${round1(f.maxDifferenceC)} °C warmer than the surface (at ${round1(f.maxDifferenceTimeH)} h), above the ${round1(limitC)} °C limit. ` +
      "The restrained contraction of the cooler surface can crack it.",
    basis: f.differenceLimitC !== undefined ? "user limit" : limits.coreSurfaceDifferenceC.source,
    actions: [
      "Insulate the exposed faces and delay formwork stripping.",
      "Reduce the heat of the mix (lower cement content, slag or fly ash).",
      "Check the restraint and thermal cracking risk by the methods of ACI 207.2R or CIRIA C766.",
    ],
  };
}

/** Evaporation from the fresh surface above the plastic-shrinkage threshold. */
export function plasticShrinkageFlag(f: CuringFlagFacts): Flag | null {
  if (f.evaporationKgPerM2H === null) return null;
  const lowThreshold = limits.evaporationLowWcmKgPerM2H.value;
  const threshold = f.lowWaterBinderOrSilicaFume ? lowThreshold : limits.evaporationCautionKgPerM2H.value;
  if (f.evaporationKgPerM2H <= threshold) return null;
  return {
    id: "plastic-shrinkage",
    severity: f.evaporationKgPerM2H > limits.evaporationCautionKgPerM2H.value ? "warning" : "caution",
    title: "High evaporation rate from the fresh surface",
    explanation:
      `The evaporation rate is ${round2(f.evaporationKgPerM2H)} kg/(m² h), above ${threshold} kg/(m² h)` +
      `${f.lowWaterBinderOrSilicaFume ? " (the lower threshold for low-w/cm or silica-fume mixes, which bleed little)" : ""}. ` +
      "Water may leave the surface faster than bleeding replaces it and plastic-shrinkage cracks can form.",
    basis: f.lowWaterBinderOrSilicaFume ? limits.evaporationLowWcmKgPerM2H.source : limits.evaporationCautionKgPerM2H.source,
    actions: [
      "Erect windbreaks and sunshades; fog the air above the surface.",
      "Apply an evaporation retarder or curing compound promptly; start wet curing as soon as possible.",
      "Lower the concrete temperature.",
    ],
  };
}

/** Surface freezes before it has the strength required before first freezing. */
export function earlyFreezingFlag(f: CuringFlagFacts): Flag | null {
  if (f.firstSubZeroSurfaceH === null || f.strengthAtFirstSubZeroMPa === null) return null;
  if (f.strengthAtFirstSubZeroMPa >= f.freezingStrengthMPa) return null;
  return {
    id: "early-freezing",
    severity: "warning",
    title: "Surface may freeze before it is strong enough",
    explanation:
      `The surface first falls below 0 °C at ${round1(f.firstSubZeroSurfaceH)} h with an estimated strength of ` +
      `${round1(f.strengthAtFirstSubZeroMPa)} MPa, below the ${f.freezingStrengthMPa} MPa commonly required before first freezing.`,
    basis: limits.freezingRequiredStrengthMPa.source,
    actions: [
      "Insulate or enclose and heat the element until the surface reaches the required strength.",
      "Raise the placement temperature or use an accelerating admixture or a faster cement.",
      "Follow ACI 306R or the cold-weather clauses of the project specification.",
    ],
  };
}

/** Planned curing shorter than the computed EN 13670 minimum (or the minimum not reached in the run). */
export function insufficientCuringFlag(f: CuringFlagFacts): Flag | null {
  if (f.plannedCuringDays === undefined) return null;
  const notReached = f.minimumCuringDays === null;
  if (!notReached && f.plannedCuringDays >= f.minimumCuringDays!) return null;
  return {
    id: "insufficient-curing",
    severity: "caution",
    title: "Planned curing shorter than the computed minimum",
    explanation: notReached
      ? `The surface does not reach the strength of curing class ${f.curingClass} within the simulated period, so ${f.plannedCuringDays} d of curing may not be enough.`
      : `The planned ${f.plannedCuringDays} d is shorter than the ${round1(f.minimumCuringDays!)} d computed for curing class ${f.curingClass} at the surface temperature.`,
    basis: "EN 13670:2009 8.5 (curing classes by percentage of the specified characteristic strength)",
    actions: ["Extend wet curing or the curing compound's period.", "Insulate to keep the surface warmer, which shortens the required period."],
  };
}

/** All curing flags that fire, in the fixed order of the issue. */
export function curingFlags(facts: CuringFlagFacts): Flag[] {
  return [peakTemperatureFlag, thermalCrackingFlag, plasticShrinkageFlag, earlyFreezingFlag, insufficientCuringFlag]
    .map((rule) => rule(facts))
    .filter((flag): flag is Flag => flag !== null);
}
