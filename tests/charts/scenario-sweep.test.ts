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

describe("scenario sweep chart of a scenario that adds a solution with its water", () => {
  // Sulfate ingress adds the sulfate solution with its water: litres of pore solution per 100 g binder (numbers invented).
  const flooded: ScenarioSweep = {
    id: "sulfate",
    title: "Sulfate ingress",
    doseLabel: "Sulfate taken up",
    doseUnit: "mmol SO4 per 100 g binder",
    points: [
      { dose: 0, phaseVolumesCm3: { csh: 30, ettringite: 5, "pore-solution": 20 }, pH: 13.5 },
      { dose: 100, phaseVolumesCm3: { csh: 28, ettringite: 12, "pore-solution": 5600 }, pH: 13.0 },
    ],
  };

  it("keeps the pore solution in the table but does not draw it when it exceeds the solids, and says so in the note", () => {
    const chart = scenarioSweepChart(flooded);
    const solution = chart.series.find((s) => s.label === "pore-solution")!;
    expect(solution.tableOnly).toBe(true);
    expect(chart.rows[1][solution.key]).toBe(5600);
    expect(chart.series.filter((s) => s.label !== "pore-solution").every((s) => !s.tableOnly)).toBe(true);
    expect(chart.note).toMatch(/5600 cm³\/100 g binder against 40 cm³ of solids/);
  });

  it("draws the pore solution stacked on the solids when it is smaller than they are (the paste volume)", () => {
    const paste: ScenarioSweep = { ...flooded, points: flooded.points.map((p) => ({ ...p, phaseVolumesCm3: { ...p.phaseVolumesCm3, "pore-solution": 20 } })) };
    const chart = scenarioSweepChart(paste);
    expect(chart.series.some((s) => s.tableOnly)).toBe(false);
    expect(chart.note).not.toMatch(/not drawn/);
  });
});

describe("scenario sweep chart without a pore solution at any point (dried solids)", () => {
  it("has no pH series and no right axis, and says why", () => {
    const dry: ScenarioSweep = { id: "drying", title: "Solids after drying", doseLabel: "Relative humidity", doseUnit: "%", points: [{ dose: 30, phaseVolumesCm3: { ettringite: 5 }, pH: null }, { dose: 60, phaseVolumesCm3: { ettringite: 6 }, pH: null }] };
    const chart = scenarioSweepChart(dry);
    expect(chart.series.map((s) => s.label)).toEqual(["ettringite"]);
    expect(chart.yRight).toBeUndefined();
    expect(chart.note).toMatch(/no pH/);
  });
});
