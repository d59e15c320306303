import { describe, it, expect } from "vitest";
import { steamEnclosureTemperatureC, steamCycleTimesH } from "../../lib/curing/steam-curing";

// A typical precast cycle (typical): 3 h preset, 15 °C/h ramp to 60 °C, 8 h hold, 10 °C/h cooling, ambient 20 °C.
const cycle = { presetH: 3, rampCPerH: 15, holdTemperatureC: 60, holdH: 8, coolingCPerH: 10 };
const ambient = () => 20;

describe("steam-curing enclosure temperature", () => {
  it("follows preset, ramp, hold and cooling at the stated rates", () => {
    const { rampEndH, holdEndH } = steamCycleTimesH(cycle, 20);
    expect(rampEndH).toBeCloseTo(3 + 40 / 15, 12);
    expect(holdEndH).toBeCloseTo(rampEndH + 8, 12);
    expect(steamEnclosureTemperatureC(cycle, ambient, 2)).toBe(20);
    expect(steamEnclosureTemperatureC(cycle, ambient, 4)).toBeCloseTo(35, 12);
    expect(steamEnclosureTemperatureC(cycle, ambient, rampEndH + 1)).toBe(60);
    expect(steamEnclosureTemperatureC(cycle, ambient, holdEndH + 2)).toBeCloseTo(40, 12);
    expect(steamEnclosureTemperatureC(cycle, ambient, holdEndH + 10)).toBe(20);
  });
});
