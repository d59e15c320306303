import { finiteOrNull, seriesKey, unionOfKeys, type ChartData } from "./chart-data";

/** One point of a durability scenario sweep: the dose and the assemblage it gives. */
export type SweepPoint = {
  dose: number;
  phaseVolumesCm3: Record<string, number>;
  pH: number | null;
};

/** A scenario sweep: the assemblage as one quantity (sulfate, CO2 uptake, temperature, …) is increased. */
export type ScenarioSweep = {
  id: string;
  title: string;
  doseLabel: string;
  doseUnit: string;
  points: SweepPoint[];
};

/**
 * Phase volumes (stacked areas, left axis, cm³/100 g binder) against the dose of a scenario, with the pH of the
 * pore solution on the right axis. Points are sorted by dose; phases absent from every point are not drawn.
 */
export function scenarioSweepChart(sweep: ScenarioSweep, minimumCm3 = 1e-3): ChartData {
  const points = [...sweep.points].sort((a, b) => a.dose - b.dose);
  const phases = unionOfKeys(points.map((p) => p.phaseVolumesCm3)).filter((phase) =>
    points.some((p) => (p.phaseVolumesCm3[phase] ?? 0) >= minimumCm3),
  );
  const pHKey = seriesKey(phases.length);
  const series = [
    ...phases.map((phase, index) => ({ key: seriesKey(index), label: phase, unit: "cm³/100 g binder", axis: "left" as const })),
    { key: pHKey, label: "pH", unit: "", axis: "right" as const },
  ];
  const rows = points.map((p) => {
    const row: Record<string, number | string | null> = { dose: p.dose };
    phases.forEach((phase, index) => (row[seriesKey(index)] = p.phaseVolumesCm3[phase] ?? 0));
    row[pHKey] = finiteOrNull(p.pH);
    return row;
  });
  return {
    id: `sweep-${sweep.id}`,
    title: sweep.title,
    kind: "stacked-area",
    x: { key: "dose", label: sweep.doseLabel, unit: sweep.doseUnit, scale: "linear" },
    yLeft: { label: "Volume", unit: "cm³/100 g binder" },
    yRight: { label: "pH", unit: "" },
    series,
    rows,
    thresholds: [],
    note: "Equilibrium assemblage at each dose; pH of the pore solution on the right axis.",
  };
}
