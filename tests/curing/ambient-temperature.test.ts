import { describe, it, expect } from "vitest";
import { ambientTemperatureC } from "../../lib/curing/ambient-temperature";

describe("ambient temperature histories", () => {
  it("puts the daily sine maximum at the peak hour and the minimum twelve hours later", () => {
    const sine = { kind: "daily-sine" as const, meanC: 15, amplitudeC: 8, peakHourOfDay: 15, placementHourOfDay: 8 };
    expect(ambientTemperatureC(sine, 7)).toBeCloseTo(23, 10);
    expect(ambientTemperatureC(sine, 19)).toBeCloseTo(7, 10);
    expect(ambientTemperatureC(sine, 31)).toBeCloseTo(23, 10);
  });

  it("interpolates an entered series linearly and holds its end values", () => {
    const series = { kind: "series" as const, points: [{ timeH: 0, temperatureC: 10 }, { timeH: 10, temperatureC: 20 }, { timeH: 20, temperatureC: 0 }] };
    expect(ambientTemperatureC(series, 5)).toBeCloseTo(15, 12);
    expect(ambientTemperatureC(series, 15)).toBeCloseTo(10, 12);
    expect(ambientTemperatureC(series, 100)).toBe(0);
  });
});
