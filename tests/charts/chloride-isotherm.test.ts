import { describe, it, expect } from "vitest";
import { chlorideIsothermChart } from "../../lib/charts/chloride-isotherm";
import { resultCharts } from "../../lib/charts/result-charts";

describe("chloride binding isotherm chart", () => {
  const points = [
    { freeChlorideMolPerKgWater: 0.5, boundChlorideMgPerGBinder: 9.1, totalChlorideMassPercent: 1.6 },
    { freeChlorideMolPerKgWater: 0, boundChlorideMgPerGBinder: 0.1, totalChlorideMassPercent: 0.02 },
    { freeChlorideMolPerKgWater: 0.1, boundChlorideMgPerGBinder: 5.2, totalChlorideMassPercent: 0.6 },
  ];

  it("gives bound (left) and total (right) chloride in order of free chloride", () => {
    const chart = chlorideIsothermChart(points);
    expect(chart.rows).toEqual([
      { freeChlorideMolPerKgWater: 0, bound: 0.1, total: 0.02 },
      { freeChlorideMolPerKgWater: 0.1, bound: 5.2, total: 0.6 },
      { freeChlorideMolPerKgWater: 0.5, bound: 9.1, total: 1.6 },
    ]);
    expect(chart.series.map((s) => [s.key, s.axis, s.unit])).toEqual([
      ["bound", "left", "mg/g binder"],
      ["total", "right", "% of binder"],
    ]);
    expect(chart.x.unit).toBe("mol/kg water");
  });

  it("names the exposure's free chloride in the note when the result gives it", () => {
    expect(chlorideIsothermChart(points, 0.0034).note).toContain("0.0034 mol/kg water");
    expect(chlorideIsothermChart(points).note).not.toContain("exposure's free chloride");
  });

  it("is among a result's charts when the chloride scenario carries an isotherm, after the sweeps", () => {
    const result = {
      scenarios: {
        chloride: { isotherm: points, summary: { exposure: { freeChlorideMolPerKgWater: 0.0034 } }, sweep: { id: "chloride", title: "Chloride", doseLabel: "Cl", doseUnit: "mmol", points: [{ dose: 0, phases: { csh: 20 } }, { dose: 1, phases: { csh: 20 } }] } },
      },
    };
    expect(resultCharts(result).map((c) => c.id)).toEqual(["sweep-chloride", "chloride-isotherm"]);
    expect(resultCharts({ scenarios: { chloride: { isotherm: [points[0]] } } }).map((c) => c.id)).toEqual([]);
  });
});
