import { describe, it, expect } from "vitest";
import { phaseVolumesChart, type AssemblageVolumes } from "../../lib/charts/phase-volumes";

const assemblages: (AssemblageVolumes & { poreSolutionCm3: number; emptyPorosityCm3: number })[] = [
  { label: "28 d", phaseVolumesCm3: { "C-S-H": 20.5, portlandite: 6.1, ettringite: 4.2 }, poreSolutionCm3: 10.2, emptyPorosityCm3: 2.4 },
  { label: "sulfate 3000 mg/L", phaseVolumesCm3: { "C-S-H": 20.1, gypsum: 3.3, ettringite: 7.9, trace: 1e-6 }, poreSolutionCm3: 8.8, emptyPorosityCm3: 2.4 },
];

describe("phase volumes chart", () => {
  it("stacks every phase present in any assemblage, then pore solution and empty porosity on top", () => {
    const chart = phaseVolumesChart(assemblages);
    expect(chart.kind).toBe("stacked-bar");
    expect(chart.series.map((s) => s.label)).toEqual(["C-S-H", "portlandite", "ettringite", "gypsum", "pore solution", "empty porosity"]);
  });

  it("drops phases below the minimum volume in every bar", () => {
    expect(phaseVolumesChart(assemblages).series.map((s) => s.label)).not.toContain("trace");
  });

  it("keeps the paste volume: each bar's segments sum to the solids, pore solution and porosity of its assemblage", () => {
    const chart = phaseVolumesChart(assemblages);
    chart.rows.forEach((row, i) => {
      const total = chart.series.reduce((sum, s) => sum + ((row[s.key] as number | null) ?? 0), 0);
      const a = assemblages[i];
      const expected = Object.values(a.phaseVolumesCm3).filter((v) => v >= 1e-3).reduce((x, y) => x + y, 0) + a.poreSolutionCm3 + a.emptyPorosityCm3;
      expect(total).toBeCloseTo(expected, 10);
    });
  });

  it("writes zero for a phase absent from one assemblage and labels each bar", () => {
    const chart = phaseVolumesChart(assemblages);
    const gypsum = chart.series.find((s) => s.label === "gypsum")!;
    expect(chart.rows[0][gypsum.key]).toBe(0);
    expect(chart.rows.map((r) => r.label)).toEqual(["28 d", "sulfate 3000 mg/L"]);
  });

  it("states its units on the axis and in every series", () => {
    const chart = phaseVolumesChart(assemblages);
    expect(chart.yLeft.unit).toBe("cm³/100 g binder");
    expect(chart.series.every((s) => s.unit === "cm³/100 g binder")).toBe(true);
  });
});
