import { describe, it, expect } from "vitest";
import { rhTemperatureMapChart } from "../../lib/charts/rh-temperature-map";

describe("relative humidity–temperature map", () => {
  const cells = [
    { temperatureC: 20, relativeHumidityPercent: 90, state: "monosulfate 12 H2O" },
    { temperatureC: 20, relativeHumidityPercent: 20, state: "monosulfate 10.5 H2O" },
    { temperatureC: 60, relativeHumidityPercent: 90, state: "monosulfate 12 H2O" },
  ];

  it("makes one series per stable state, in first-seen order", () => {
    expect(rhTemperatureMapChart(cells).series.map((s) => s.label)).toEqual(["monosulfate 12 H2O", "monosulfate 10.5 H2O"]);
  });

  it("places each point's humidity under its own state only", () => {
    const chart = rhTemperatureMapChart(cells);
    expect(chart.rows[1]).toEqual({ temperatureC: 20, s0: null, s1: 20 });
    expect(chart.rows[2]).toEqual({ temperatureC: 60, s0: 90, s1: null });
  });

  it("uses °C across and % up", () => {
    const chart = rhTemperatureMapChart(cells);
    expect([chart.x.unit, chart.yLeft.unit]).toEqual(["°C", "%"]);
  });
});
