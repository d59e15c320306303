import type { Flag } from "../advisory/flag";
import { CARBONATION_TIME_REPORTING_LIMIT_YEARS } from "../scenarios/carbonation-depth";

/**
 * Reading a saved result for comparisons and reports. Saved results are stored as JSON and may come
 * from an older engine, so everything here reads defensively: a figure that is absent is left out,
 * never guessed.
 */
export type KeyFigure = { id: string; label: string; unit: string; value: number | string };

type FigureDefinition = { id: string; label: string; unit: string; paths: string[][]; scale?: number; reportedUpTo?: number };

/**
 * Where the key figures sit in an assessment result (`lib/service/assess.ts`; first path that holds a
 * number or text wins; `scale` converts, e.g. a fraction to per cent; a value above `reportedUpTo` is shown as "more than" it).
 */
const FIGURES: readonly FigureDefinition[] = [
  { id: "pH", label: "Pore solution pH", unit: "", paths: [["assemblage", "paste", "poreSolution", "pH"], ["assemblage", "pH"]] },
  { id: "capillaryPorosity", label: "Capillary porosity of the paste", unit: "% of paste volume", paths: [["assemblage", "paste", "porosity", "capillaryFraction"]], scale: 100 },
  { id: "portlandite", label: "Portlandite", unit: "kg/m³ concrete", paths: [["assemblage", "paste", "perM3", "portlanditeKg"]] },
  { id: "boundWater", label: "Bound water", unit: "kg/m³ concrete", paths: [["assemblage", "paste", "perM3", "boundWaterKg"]] },
  { id: "sulfateSolidVolumeIncrease", label: "Largest solid-volume gain under sulfate (of initial pores)", unit: "%", paths: [["scenarios", "sulfate", "summary", "maximumSolidVolumeIncreasePercentOfPores"]] },
  { id: "portlanditeExhaustedSulfate", label: "Sulfate dose that exhausts portlandite", unit: "mmol SO4/100 g binder", paths: [["scenarios", "sulfate", "summary", "portlanditeExhaustedDoseMmolPer100g"]] },
  { id: "co2BindingCapacity", label: "CO2 binding capacity", unit: "mol/m³ concrete", paths: [["scenarios", "carbonation", "summary", "co2BindingCapacityMolPerM3"]] },
  { id: "carbonationCoefficient", label: "Carbonation coefficient", unit: "mm/√year", paths: [["scenarios", "carbonation", "depth", "coefficientMmPerSqrtYear"]] },
  { id: "carbonationTimeToCover", label: "Time for carbonation to reach the cover", unit: "years", paths: [["scenarios", "carbonation", "depth", "timeToCoverYears"]], reportedUpTo: CARBONATION_TIME_REPORTING_LIMIT_YEARS },
  { id: "heatSource", label: "Heat of hydration from", unit: "", paths: [["curing", "heatModel", "sourceName"]] },
  { id: "peakTemperature", label: "Peak core temperature", unit: "°C", paths: [["curing", "temperature", "peakCoreC"]] },
  { id: "peakTemperaturePerPhaseCheck", label: "Peak core temperature with the classic per-phase heats (check)", unit: "°C", paths: [["curing", "perPhaseHeatCheck", "peakCoreC"]] },
  { id: "maxDifference", label: "Largest core–surface difference", unit: "°C", paths: [["curing", "temperature", "maxDifferenceC"]] },
  { id: "minimumCuring", label: "Minimum curing period", unit: "d", paths: [["curing", "minimumCuringDays"]] },
  { id: "monteCarloSamples", label: "Monte Carlo samples", unit: "", paths: [["uncertainty", "samples"]] },
];

/** The value at a path of nested objects, or undefined. */
export function valueAt(value: unknown, path: readonly string[]): unknown {
  let current: unknown = value;
  for (const key of path) {
    if (current === null || typeof current !== "object") return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

function isFigureValue(value: unknown): value is number | string {
  return (typeof value === "number" && Number.isFinite(value)) || (typeof value === "string" && value !== "");
}

/** Key figures present in a result, in a fixed order. */
export function keyFigures(result: unknown): KeyFigure[] {
  const out: KeyFigure[] = [];
  for (const figure of FIGURES) {
    for (const path of figure.paths) {
      const value = valueAt(result, path);
      if (isFigureValue(value)) {
        const scaled = typeof value === "number" && figure.scale ? value * figure.scale : value;
        const reported = typeof scaled === "number" && figure.reportedUpTo !== undefined && scaled > figure.reportedUpTo ? `more than ${figure.reportedUpTo}` : scaled;
        out.push({ id: figure.id, label: figure.label, unit: figure.unit, value: reported });
        break;
      }
    }
  }
  return out;
}

function isFlag(value: unknown): value is Flag {
  const flag = value as Partial<Flag> | null;
  return !!flag && typeof flag.id === "string" && typeof flag.title === "string" && typeof flag.severity === "string";
}

/** The flags of a result (`result.flags`), only well-formed ones. */
export function flagsOf(result: unknown): Flag[] {
  const flags = valueAt(result, ["flags"]);
  return Array.isArray(flags) ? flags.filter(isFlag) : [];
}

/** The cautions of a result: `result.cautions` as texts (strings or `{ text }`). */
export function cautionsOf(result: unknown): string[] {
  const cautions = valueAt(result, ["cautions"]);
  if (!Array.isArray(cautions)) return [];
  return cautions
    .map((c) => (typeof c === "string" ? c : typeof (c as { text?: unknown })?.text === "string" ? (c as { text: string }).text : null))
    .filter((c): c is string => c !== null);
}
