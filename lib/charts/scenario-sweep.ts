import { finiteOrNull, seriesKey, unionOfKeys, type ChartData } from "./chart-data";
import { seriesColours } from "./phase-colours";

/** Id of the pore solution among a point's volumes (`HydratedPaste.volumes`). */
const PORE_SOLUTION = "pore-solution";

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
 *
 * A scenario that adds a solution with its water (sulfate ingress, the thaumasite exposure) ends with litres of pore
 * solution per 100 g of binder, against some 50 cm³ of solids: stacked with them it would flatten every solid to a
 * line. When the pore solution exceeds the largest solid volume of the sweep it stays in the data table and the CSV,
 * and the note says so.
 */
export function scenarioSweepChart(sweep: ScenarioSweep, minimumCm3 = 1e-3): ChartData {
  const points = [...sweep.points].sort((a, b) => a.dose - b.dose);
  const phases = unionOfKeys(points.map((p) => p.phaseVolumesCm3)).filter((phase) =>
    points.some((p) => (p.phaseVolumesCm3[phase] ?? 0) >= minimumCm3),
  );
  const solidsCm3 = (p: SweepPoint) => phases.reduce((sum, phase) => sum + (phase === PORE_SOLUTION ? 0 : (p.phaseVolumesCm3[phase] ?? 0)), 0);
  const largestSolidsCm3 = Math.max(0, ...points.map(solidsCm3));
  const largestSolutionCm3 = Math.max(0, ...points.map((p) => p.phaseVolumesCm3[PORE_SOLUTION] ?? 0));
  const solutionNotDrawn = phases.includes(PORE_SOLUTION) && largestSolutionCm3 > largestSolidsCm3;
  const colours = seriesColours(phases);
  const pHKey = seriesKey(phases.length);
  const withPH = points.some((p) => finiteOrNull(p.pH) !== null);
  const series = [
    ...phases.map((phase, index) => ({
      key: seriesKey(index),
      label: phase,
      unit: "cm³/100 g binder",
      axis: "left" as const,
      colour: colours[index],
      ...(phase === PORE_SOLUTION && solutionNotDrawn ? { tableOnly: true } : {}),
    })),
    // A sweep without a pore solution at any point (dried solids) has no pH: no empty right axis then.
    ...(withPH ? [{ key: pHKey, label: "pH", unit: "", axis: "right" as const }] : []),
  ];
  const rows = points.map((p) => {
    const row: Record<string, number | string | null> = { dose: p.dose };
    phases.forEach((phase, index) => (row[seriesKey(index)] = p.phaseVolumesCm3[phase] ?? 0));
    if (withPH) row[pHKey] = finiteOrNull(p.pH);
    return row;
  });
  return {
    id: `sweep-${sweep.id}`,
    title: sweep.title,
    kind: "stacked-area",
    x: { key: "dose", label: sweep.doseLabel, unit: sweep.doseUnit, scale: "linear" },
    yLeft: { label: "Volume", unit: "cm³/100 g binder" },
    ...(withPH ? { yRight: { label: "pH", unit: "" } } : {}),
    series,
    rows,
    thresholds: [],
    note: [
      solutionNotDrawn ? "Equilibrium solids at each point of the sweep" : "Equilibrium assemblage at each point of the sweep",
      withPH ? "; pH of the pore solution on the right axis." : "; no pore solution is left at any point, so there is no pH.",
      solutionNotDrawn
        ? ` The pore solution, which holds the added water (up to ${Math.round(largestSolutionCm3)} cm³/100 g binder against ${Math.round(largestSolidsCm3)} cm³ of solids), is in the data table, not drawn.`
        : "",
    ].join(""),
  };
}
