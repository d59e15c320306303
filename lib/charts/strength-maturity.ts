import { finiteOrNull, type ChartData } from "./chart-data";

export type StrengthPoint = { timeH: number; coreMPa: number; surfaceMPa: number };
export type MaturityPoint = { timeH: number; coreEquivalentAgeH: number; surfaceEquivalentAgeH: number };

/**
 * Mean compressive strength at core and surface (MPa, left axis) and their equivalent ages (h, right axis)
 * against time after placement. Strength and maturity rows are joined on time; a time missing from one
 * side leaves empty cells.
 */
export function strengthMaturityChart(
  strength: readonly StrengthPoint[],
  maturity: readonly MaturityPoint[],
  targets: readonly { label: string; strengthMPa: number }[] = [],
): ChartData {
  const byTime = new Map<number, Record<string, number | null>>();
  const rowAt = (timeH: number) => {
    let row = byTime.get(timeH);
    if (!row) byTime.set(timeH, (row = { timeH, coreMPa: null, surfaceMPa: null, coreAgeH: null, surfaceAgeH: null }));
    return row;
  };
  for (const s of strength) Object.assign(rowAt(s.timeH), { coreMPa: finiteOrNull(s.coreMPa), surfaceMPa: finiteOrNull(s.surfaceMPa) });
  for (const m of maturity) Object.assign(rowAt(m.timeH), { coreAgeH: finiteOrNull(m.coreEquivalentAgeH), surfaceAgeH: finiteOrNull(m.surfaceEquivalentAgeH) });
  const rows = [...byTime.values()].sort((a, b) => (a.timeH as number) - (b.timeH as number));
  return {
    id: "strength-maturity",
    title: "Strength and maturity",
    kind: "line",
    x: { key: "timeH", label: "Time after placement", unit: "h", scale: "linear" },
    yLeft: { label: "Mean compressive strength", unit: "MPa" },
    yRight: { label: "Equivalent age", unit: "h" },
    series: [
      { key: "coreMPa", label: "Strength, core", unit: "MPa", axis: "left" },
      { key: "surfaceMPa", label: "Strength, surface", unit: "MPa", axis: "left" },
      { key: "coreAgeH", label: "Equivalent age, core", unit: "h", axis: "right" },
      { key: "surfaceAgeH", label: "Equivalent age, surface", unit: "h", axis: "right" },
    ],
    rows,
    thresholds: targets.map((t) => ({ label: t.label, value: t.strengthMPa, unit: "MPa", axis: "left" })),
    note: "Strength from the maturity (equivalent age) of each point; targets drawn as lines.",
  };
}
