import { seriesKey, unionOfKeys, type ChartData } from "./chart-data";
import { seriesColours } from "./phase-colours";

/** The volumes of one hydrate assemblage, cm³ per 100 g of binder. */
export type AssemblageVolumes = {
  /** What the bar stands for: "28 d at 20 °C", "sulfate 3000 mg/L", … */
  label: string;
  /** Solid phase id → volume, cm³/100 g binder. */
  phaseVolumesCm3: Record<string, number>;
  /** Pore solution left at equilibrium, cm³/100 g binder. */
  poreSolutionCm3?: number | null;
  /** Empty (air-filled) capillary porosity from chemical shrinkage, cm³/100 g binder. */
  emptyPorosityCm3?: number | null;
};

const PORE_SOLUTION = "pore solution";
const POROSITY = "empty porosity";

/**
 * Stacked bars of the assemblage volumes: one bar per assemblage, one stacked segment per solid phase present
 * in any of them (phases below `minimumCm3` in every bar are dropped), then pore solution and empty porosity on top
 * so the bar height is the paste volume.
 */
export function phaseVolumesChart(assemblages: readonly AssemblageVolumes[], minimumCm3 = 1e-3): ChartData {
  const phases = unionOfKeys(assemblages.map((a) => a.phaseVolumesCm3)).filter((phase) =>
    assemblages.some((a) => (a.phaseVolumesCm3[phase] ?? 0) >= minimumCm3),
  );
  const names = [...phases];
  const hasSolution = assemblages.some((a) => typeof a.poreSolutionCm3 === "number");
  const hasPorosity = assemblages.some((a) => typeof a.emptyPorosityCm3 === "number");
  if (hasSolution) names.push(PORE_SOLUTION);
  if (hasPorosity) names.push(POROSITY);
  const colours = seriesColours(names);
  const series = names.map((name, index) => ({ key: seriesKey(index), label: name, unit: "cm³/100 g binder", axis: "left" as const, colour: colours[index] }));
  const rows = assemblages.map((a) => {
    const row: Record<string, number | string | null> = { label: a.label };
    phases.forEach((phase, index) => (row[seriesKey(index)] = a.phaseVolumesCm3[phase] ?? 0));
    if (hasSolution) row[seriesKey(phases.length)] = a.poreSolutionCm3 ?? null;
    if (hasPorosity) row[seriesKey(phases.length + (hasSolution ? 1 : 0))] = a.emptyPorosityCm3 ?? null;
    return row;
  });
  return {
    id: "phase-volumes",
    title: "Phase volumes of the hydrate assemblage",
    kind: "stacked-bar",
    x: { key: "label", label: "Assemblage", unit: "", scale: "category" },
    yLeft: { label: "Volume", unit: "cm³/100 g binder" },
    series,
    rows,
    thresholds: [],
    note: "Volumes per 100 g of binder at equilibrium; the bar height is the paste volume (solids, pore solution and empty pores).",
  };
}
