import { describe, expect, it } from "vitest";
import { resultCharts } from "../../lib/charts/result-charts";
import { chartSourceOf } from "../../lib/report/chart-source";
import { demoResult } from "./real-result";

describe("chartSourceOf", () => {
  it("lets the shared chart mapping find the assemblage, both scenario sweeps and the timeline of a real assessment", async () => {
    const result = await demoResult();
    const charts = resultCharts(chartSourceOf(result));
    expect(charts.map((c) => c.id)).toEqual(["phase-volumes", "sweep-sulfate", "sweep-carbonation", "hydration-timeline"]);
    const phaseVolumes = charts[0];
    // The bar carries every solid of the paste with its volume, plus pore solution and empty porosity.
    const labels = phaseVolumes.series.map((s) => s.label);
    expect(labels).toContain("pore solution");
    expect(labels).toContain("empty porosity");
    const portlandite = phaseVolumes.series.find((s) => s.label === "portlandite")!;
    expect(phaseVolumes.rows[0][portlandite.key]).toBeCloseTo(result.assemblage.paste.phases.find((p) => p.id === "portlandite")!.volumeCm3, 12);
    expect(phaseVolumes.rows[0].label).toBe("28 d at 20 °C");
    expect(charts[1].rows).toHaveLength(result.scenarios.sulfate!.sweep.points.length);
  });

  it("does not change the saved result and leaves other values as they are", async () => {
    const result = await demoResult();
    const before = JSON.stringify(result);
    const source = chartSourceOf(result) as Record<string, unknown>;
    expect(JSON.stringify(result)).toBe(before);
    expect(source.flags).toBe(result.flags);
    expect(chartSourceOf(null)).toBeNull();
  });
});
