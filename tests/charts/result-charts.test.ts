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
