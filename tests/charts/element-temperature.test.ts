import { describe, it, expect } from "vitest";
import { elementTemperatureChart } from "../../lib/charts/element-temperature";

describe("element temperature chart", () => {
  const temperature = { timesH: [0, 12, 24], coreC: [18, 55, 61.5], surfaceC: [18, 30, 28] };

  it("gives core, surface and their difference at every output time", () => {
    const chart = elementTemperatureChart(temperature);
    expect(chart.rows).toEqual([
      { timeH: 0, core: 18, surface: 18, difference: 0 },
      { timeH: 12, core: 55, surface: 30, difference: 25 },
      { timeH: 24, core: 61.5, surface: 28, difference: 33.5 },
    ]);
  });

  it("draws the maximum temperature as a threshold in °C", () => {
    const chart = elementTemperatureChart(temperature, { maxTemperatureC: 70, label: "DEF limit 70 °C" });
    expect(chart.thresholds).toEqual([{ label: "DEF limit 70 °C", value: 70, unit: "°C", axis: "left" }]);
  });

  it("adds face B when the element has two faces", () => {
    const chart = elementTemperatureChart({ ...temperature, surfaceBC: [18, 40, 35] });
    expect(chart.series.map((s) => s.label)).toContain("Surface (face B)");
    expect(chart.rows[1].surfaceB).toBe(40);
  });

  it("labels both axes with their units", () => {
    const chart = elementTemperatureChart(temperature);
    expect(chart.x.unit).toBe("h");
    expect(chart.yLeft.unit).toBe("°C");
  });
});
