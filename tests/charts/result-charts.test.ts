import { describe, it, expect } from "vitest";
import { phaseVolumesOf, resultCharts } from "../../lib/charts/result-charts";

const result = {
  assemblage: { phases: [{ id: "C-S-H", volumeCm3: 21 }, { id: "portlandite", volumeCm3: 5.5 }], poreSolutionCm3: 9, emptyPorosityCm3: 2, pH: 13.3 },
  scenarios: { sulfate: { title: "External sulfate", doseLabel: "SO3 added", doseUnit: "g/100 g binder", points: [{ dose: 0, pH: 13.3, phaseVolumesCm3: { ettringite: 4 } }, { dose: 1, pH: 13.0, phaseVolumesCm3: { ettringite: 8 } }] } },
  timeline: [{ ageDays: 1, phaseVolumesCm3: { alite: 20 } }, { ageDays: 28, phaseVolumesCm3: { alite: 3 } }],
  curing: {
    temperature: { timesH: [0, 1], coreC: [20, 25], surfaceC: [20, 22] },
    strength: [{ timeH: 1, coreMPa: 0.5, surfaceMPa: 0.3 }],
    maturity: [{ timeH: 1, coreEquivalentAgeH: 1.2, surfaceEquivalentAgeH: 1.1 }],
  },
  rhTemperatureMap: [{ temperatureC: 20, relativeHumidityPercent: 50, state: "ettringite" }],
};

describe("result charts", () => {
  it("gives one chart per part present, in reading order", () => {
    expect(resultCharts(result).map((c) => c.id)).toEqual(["phase-volumes", "sweep-sulfate", "hydration-timeline", "element-temperature", "strength-maturity", "rh-temperature-map"]);
  });

  it("gives no chart (and no error) for a result without those parts", () => {
    expect(resultCharts({ flags: [] })).toEqual([]);
    expect(resultCharts(null)).toEqual([]);
    expect(resultCharts({ assemblage: "broken", curing: { temperature: { timesH: "x" } } })).toEqual([]);
  });

  it("reads phase volumes from a list of phases or from a record", () => {
    expect(phaseVolumesOf({ phases: [{ id: "a", volumeCm3: 1 }, { id: "b", volumeCm3: "x" }] })).toEqual({ a: 1 });
    expect(phaseVolumesOf({ phaseVolumesCm3: { a: 2, b: null } })).toEqual({ a: 2 });
  });

  it("draws the delayed-ettringite limit at 70 °C when the result states none (Taylor, Famy & Scrivener 2001)", () => {
    const chart = resultCharts(result).find((c) => c.id === "element-temperature")!;
    expect(chart.thresholds.map((t) => t.value)).toEqual([70]);
  });
});

describe("result charts from the assess service's result shape", () => {
  // Shape of `AssessmentResult` in lib/service/assess.ts (numbers invented for the test).
  const serviceResult = {
    inputs: { age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } },
    assemblage: {
      temperatureC: 20,
      paste: { volumes: { csh: 20, portlandite: 5, "pore-solution": 9 }, porosity: { poreSolutionVolumeCm3: 9, chemicalShrinkageCm3: 2.5 } },
      timeline: [
        { ageDays: 1, phases: [{ id: "alite", origin: "unreacted", grams: 40, volumeCm3: 13 }], poreSolutionVolumeCm3: 20, pH: 13.1 },
        { ageDays: 28, phases: [{ id: "alite", origin: "unreacted", grams: 9, volumeCm3: 3 }], poreSolutionVolumeCm3: 10, pH: 13.3 },
      ],
    },
    scenarios: { sulfate: { sweep: { id: "sulfate", title: "Sulfate ingress", doseLabel: "SO4 added", doseUnit: "mmol/100 g", points: [{ dose: 0, phaseVolumesCm3: { ettringite: 4 }, pH: 13.3 }] }, summary: {} } },
  };

  it("takes pore solution and empty porosity out of the phase list into their own segments", () => {
    const chart = resultCharts(serviceResult).find((c) => c.id === "phase-volumes")!;
    expect(chart.series.map((s) => s.label)).toEqual(["csh", "portlandite", "pore solution", "empty porosity"]);
    expect(chart.rows[0]).toMatchObject({ label: "28 d at 20 °C", s0: 20, s1: 5, s2: 9, s3: 2.5 });
  });

  it("reads each scenario's sweep under `sweep` and the timeline under the assemblage, with its pore solution", () => {
    const charts = resultCharts(serviceResult);
    expect(charts.map((c) => c.id)).toEqual(["phase-volumes", "sweep-sulfate", "hydration-timeline"]);
    const timeline = charts[2];
    const pore = timeline.series.find((s) => s.label === "pore solution")!;
    expect(timeline.rows.map((r) => r[pore.key])).toEqual([20, 10]);
  });
});

describe("relative humidity–temperature maps of the drying scenario", () => {
  it("draws one map per data family, named after it", () => {
    const charts = resultCharts({
      scenarios: {
        drying: {
          sweep: { id: "drying", title: "Drying", doseLabel: "Relative humidity", doseUnit: "%", points: [{ dose: 50, phaseVolumesCm3: { ettringite: 3 }, pH: null }] },
          rhTemperatureMaps: [
            { family: "Ettringite", members: ["ettringite", "metaettringite"], cells: [{ temperatureC: 20, relativeHumidityPercent: 50, state: "ettringite" }, { temperatureC: 60, relativeHumidityPercent: 10, state: "metaettringite" }] },
            { family: "Monosulfate", members: [], cells: [] },
          ],
        },
      },
    });
    expect(charts.map((c) => c.id)).toEqual(["sweep-drying", "rh-temperature-map-ettringite"]);
    expect(charts[1].title).toContain("Ettringite");
    expect(charts[1].series.map((s) => s.label)).toEqual(["ettringite", "metaettringite"]);
  });
});
