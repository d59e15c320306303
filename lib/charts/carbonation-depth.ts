import { finiteOrNull, type ChartData, type ChartThreshold } from "./chart-data";

export type DepthPoint = { timeYears: number; depthMm: number };

/**
 * Carbonation depth against time from the Papadakis, Vayenas & Fardis (1991, ACI Mater. J. 88, 363) model of the
 * carbonation scenario (x = k·√t), from placement (depth 0) to the last time of its curve, with the cover drawn as
 * the depth at which the front reaches the reinforcement.
 */
export function carbonationDepthChart(curve: readonly DepthPoint[], coverMm?: number): ChartData {
  const sorted = [...curve].sort((a, b) => a.timeYears - b.timeYears);
  const rows = [...(sorted[0]?.timeYears > 0 ? [{ timeYears: 0, depthMm: 0 }] : []), ...sorted.map((p) => ({ timeYears: p.timeYears, depthMm: finiteOrNull(p.depthMm) }))];
  const thresholds: ChartThreshold[] = coverMm !== undefined && Number.isFinite(coverMm) ? [{ label: `Cover ${coverMm} mm`, value: coverMm, unit: "mm", axis: "left" }] : [];
  return {
    id: "carbonation-depth",
    title: "Carbonation depth",
    kind: "line",
    x: { key: "timeYears", label: "Time", unit: "years", scale: "linear" },
    yLeft: { label: "Depth of the carbonation front", unit: "mm" },
    series: [{ key: "depthMm", label: "Carbonation depth", unit: "mm", axis: "left" }],
    rows,
    thresholds,
    note: "Papadakis et al. (1991) diffusion model with the binding capacity and porosity of the engine's paste; sheltered exposure at the entered humidity and CO2. Wetting slows real carbonation.",
  };
}
