import type { Flag } from "../advisory/flag";

/**
 * Reading a saved result for comparisons and reports. Saved results are stored as JSON and may come
 * from an older engine, so everything here reads defensively: a figure that is absent is left out,
 * never guessed.
 */
export type KeyFigure = { id: string; label: string; unit: string; value: number | string };

type FigureDefinition = { id: string; label: string; unit: string; paths: string[][] };

/** Where the key figures sit in an assessment result (first path that holds a number or text wins). */
const FIGURES: readonly FigureDefinition[] = [
  { id: "pH", label: "Pore solution pH", unit: "", paths: [["assemblage", "pH"], ["assemblage", "poreSolution", "pH"], ["assemblage", "equilibrium", "pH"]] },
  { id: "porosity", label: "Capillary porosity", unit: "vol %", paths: [["assemblage", "porosityVolumePercent"], ["assemblage", "capillaryPorosityVolumePercent"], ["assemblage", "volumes", "capillaryPorosityVolumePercent"]] },
  { id: "portlandite", label: "Portlandite", unit: "vol %", paths: [["assemblage", "portlanditeVolumePercent"]] },
  { id: "peakTemperature", label: "Peak core temperature", unit: "°C", paths: [["curing", "temperature", "peakCoreC"], ["curing", "peakCoreC"], ["temperatureHistory", "peakCoreC"]] },
  { id: "maxDifference", label: "Largest core–surface difference", unit: "°C", paths: [["curing", "temperature", "maxDifferenceC"]] },
  { id: "minimumCuring", label: "Minimum curing period", unit: "d", paths: [["curing", "minimumCuringDays"]] },
  { id: "carbonationDepth", label: "Carbonation depth at service life", unit: "mm", paths: [["carbonation", "depthMm"], ["scenarios", "carbonation", "depthAtServiceLifeMm"]] },
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
        out.push({ id: figure.id, label: figure.label, unit: figure.unit, value });
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
