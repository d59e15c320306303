import { seriesKey, unionOfKeys, type ChartData } from "./chart-data";
import { seriesColours } from "./phase-colours";

export type TimelinePointVolumes = { ageDays: number; phaseVolumesCm3: Record<string, number> };

/**
 * The hydration timeline: phase volumes (stacked areas, cm³/100 g binder, unreacted clinker included when the
 * engine reports it) against age on a logarithmic axis. Non-positive ages cannot sit on a log axis and are dropped.
 */
export function hydrationTimelineChart(points: readonly TimelinePointVolumes[], minimumCm3 = 1e-3): ChartData {
  const kept = points.filter((p) => p.ageDays > 0).sort((a, b) => a.ageDays - b.ageDays);
  const phases = unionOfKeys(kept.map((p) => p.phaseVolumesCm3)).filter((phase) => kept.some((p) => (p.phaseVolumesCm3[phase] ?? 0) >= minimumCm3));
  const colours = seriesColours(phases);
  return {
    id: "hydration-timeline",
    title: "Hydration timeline",
    kind: "stacked-area",
    x: { key: "ageDays", label: "Age", unit: "d", scale: "log" },
    yLeft: { label: "Volume", unit: "cm³/100 g binder" },
    series: phases.map((phase, index) => ({ key: seriesKey(index), label: phase, unit: "cm³/100 g binder", axis: "left", colour: colours[index] })),
    rows: kept.map((p) => {
      const row: Record<string, number | string | null> = { ageDays: p.ageDays };
      phases.forEach((phase, index) => (row[seriesKey(index)] = p.phaseVolumesCm3[phase] ?? 0));
      return row;
    }),
    thresholds: [],
    note: "Equilibrium assemblage at each age for the reaction degrees of the hydration model (logarithmic age axis).",
  };
}
