import { describe, it, expect } from "vitest";
import { carbonationDepthChart } from "../../lib/charts/carbonation-depth";
import { resultCharts } from "../../lib/charts/result-charts";

describe("carbonation depth chart", () => {
  const curve = [
    { timeYears: 4, depthMm: 6 },
    { timeYears: 1, depthMm: 3 },
    { timeYears: 100, depthMm: 30 },
  ];

  it("starts at placement with no depth and follows the curve in time order", () => {
    expect(carbonationDepthChart(curve).rows).toEqual([
      { timeYears: 0, depthMm: 0 },
      { timeYears: 1, depthMm: 3 },
      { timeYears: 4, depthMm: 6 },
      { timeYears: 100, depthMm: 30 },
    ]);
  });

  it("draws the cover as a line in mm, and none without a cover", () => {
    expect(carbonationDepthChart(curve, 40).thresholds).toEqual([{ label: "Cover 40 mm", value: 40, unit: "mm", axis: "left" }]);
    expect(carbonationDepthChart(curve).thresholds).toEqual([]);
  });

  it("takes the exposure's cover before the element's, as the carbonation flag does", () => {
    const scenarios = { carbonation: { depth: { depthCurve: curve } } };
    const chart = (inputs: unknown) => resultCharts({ inputs, scenarios }).find((c) => c.id === "carbonation-depth")!;
    expect(chart({ exposure: { coverMm: 35 }, project: { element: { coverMm: 50 } } }).thresholds[0].value).toBe(35);
    expect(chart({ exposure: {}, project: { element: { coverMm: 50 } } }).thresholds[0].value).toBe(50);
  });
});
