import { describe, it, expect } from "vitest";
import { heatOfHydrationChart } from "../../lib/charts/heat-of-hydration";

describe("heat of hydration chart", () => {
  const model = {
    label: "thermodynamic heat of hydration",
    referenceTemperatureC: 20,
    curve: [
      { equivalentAgeH: 1, cumulativeHeatJPerGBinder: 2.5 },
      { equivalentAgeH: 24, cumulativeHeatJPerGBinder: 210 },
      { equivalentAgeH: 8760, cumulativeHeatJPerGBinder: 470 },
    ],
    perPhaseCheckJPerGCement: { lerchBogue: 470, taylor1997: 480 },
    cementFractionOfBinder: 0.5,
  };

  it("gives the cumulative heat at every equivalent age of the curve", () => {
    expect(heatOfHydrationChart(model).rows).toEqual([
      { equivalentAgeH: 1, heat: 2.5 },
      { equivalentAgeH: 24, heat: 210 },
      { equivalentAgeH: 8760, heat: 470 },
    ]);
  });

  it("draws the classic per-phase heats as the check, per g binder for the cement's share of the binder", () => {
    const chart = heatOfHydrationChart({ ...model, cementFractionOfBinder: 0.75, perPhaseCheckJPerGCement: { lerchBogue: 455.9, taylor1997: 466.9 } });
    // 455.9 × 0.75 = 341.925, rounded to 0.1 J/g for the label; Taylor's set is named in the note.
    expect(chart.thresholds).toEqual([{ label: "Complete hydration, Lerch & Bogue per-phase heats, cement share", value: 341.9, unit: "J/g", axis: "left" }]);
    expect(chart.note).toContain("Taylor 1997: 350.2 J/g binder");
    const plain = heatOfHydrationChart({ ...model, cementFractionOfBinder: 1 });
    expect(plain.thresholds.map((t) => t.value)).toEqual([470]);
    expect(plain.thresholds[0].label).not.toMatch(/share/);
  });

  it("reads equivalent age on a log axis at the model's reference temperature, heat in J/g binder, and names the heat source", () => {
    const chart = heatOfHydrationChart(model);
    expect(chart.x).toEqual({ key: "equivalentAgeH", label: "Equivalent age at 20 °C", unit: "h", scale: "log" });
    expect(chart.yLeft.unit).toBe("J/g binder");
    expect(chart.note).toContain("thermodynamic heat of hydration");
  });
});
