import { finiteOrNull, type ChartData } from "./chart-data";

export type IsothermPoint = { freeChlorideMolPerKgWater: number; boundChlorideMgPerGBinder: number; totalChlorideMassPercent: number };

/**
 * The chloride binding isotherm of the chloride scenario: chloride bound in the solids (Friedel's and Kuzel's salts,
 * mg per g binder) against free chloride of the pore solution (mol/kg water), the form in which binding is measured
 * and reported (e.g. Tang & Nilsson 1993, Cem. Concr. Res. 23, 247; from memory), with the total chloride (% of binder)
 * on the right axis. Points in order of free chloride; the exposure's free chloride, when known, is named in the note.
 */
export function chlorideIsothermChart(points: readonly IsothermPoint[], exposureFreeChlorideMolPerKgWater?: number): ChartData {
  const rows = [...points]
    .sort((a, b) => a.freeChlorideMolPerKgWater - b.freeChlorideMolPerKgWater)
    .map((p) => ({ freeChlorideMolPerKgWater: p.freeChlorideMolPerKgWater, bound: finiteOrNull(p.boundChlorideMgPerGBinder), total: finiteOrNull(p.totalChlorideMassPercent) }));
  const exposure =
    exposureFreeChlorideMolPerKgWater !== undefined && Number.isFinite(exposureFreeChlorideMolPerKgWater)
      ? ` The exposure's free chloride is ${Number(exposureFreeChlorideMolPerKgWater.toPrecision(3))} mol/kg water.`
      : "";
  return {
    id: "chloride-isotherm",
    title: "Chloride binding isotherm",
    kind: "line",
    x: { key: "freeChlorideMolPerKgWater", label: "Free chloride in the pore solution", unit: "mol/kg water", scale: "linear" },
    yLeft: { label: "Bound chloride", unit: "mg/g binder" },
    yRight: { label: "Total chloride", unit: "% of binder" },
    series: [
      { key: "bound", label: "Bound chloride", unit: "mg/g binder", axis: "left" },
      { key: "total", label: "Total chloride", unit: "% of binder", axis: "right" },
    ],
    rows,
    thresholds: [],
    note: `Equilibrium of the paste with increasing chloride (the chloride scenario's sweep), bound in Friedel's and Kuzel's salts.${exposure}`,
  };
}
