import { describe, it, expect } from "vitest";
import { scenarioSweepChart, type ScenarioSweep } from "../../lib/charts/scenario-sweep";

const sweep: ScenarioSweep = {
  id: "sulfate",
  title: "External sulfate",
  doseLabel: "Sulfate added",
  doseUnit: "g SO3/100 g binder",
  points: [
    { dose: 2, phaseVolumesCm3: { ettringite: 9, gypsum: 1.5 }, pH: 12.9 },
    { dose: 0, phaseVolumesCm3: { ettringite: 4, monosulfate: 3 }, pH: 13.4 },
    { dose: 1, phaseVolumesCm3: { ettringite: 7 }, pH: Number.NaN },
  ],
};

describe("scenario sweep chart", () => {
  it("sorts the points by dose", () => {
    expect(scenarioSweepChart(sweep).rows.map((r) => r.dose)).toEqual([0, 1, 2]);
  });

  it("puts pH on the right axis and every phase volume on the left", () => {
    const chart = scenarioSweepChart(sweep);
    const pH = chart.series.filter((s) => s.axis === "right");
    expect(pH.map((s) => s.label)).toEqual(["pH"]);
    expect(chart.series.filter((s) => s.axis === "left").map((s) => s.label).sort()).toEqual(["ettringite", "gypsum", "monosulfate"]);
    expect(chart.yRight?.label).toBe("pH");
  });

  it("leaves a gap where pH is not a finite number, and zero where a phase is absent", () => {
    const chart = scenarioSweepChart(sweep);
    const pHKey = chart.series.find((s) => s.label === "pH")!.key;
    const gypsumKey = chart.series.find((s) => s.label === "gypsum")!.key;
    expect(chart.rows[1][pHKey]).toBeNull();
    expect(chart.rows[0][pHKey]).toBe(13.4);
    expect(chart.rows[0][gypsumKey]).toBe(0);
    expect(chart.rows[2][gypsumKey]).toBe(1.5);
  });

  it("labels the x axis with the dose and its unit and takes its id from the scenario", () => {
    const chart = scenarioSweepChart(sweep);
    expect(chart.x).toMatchObject({ label: "Sulfate added", unit: "g SO3/100 g binder" });
    expect(chart.id).toBe("sweep-sulfate");
  });
});
