import { describe, expect, it } from "vitest";
import { saturationPressureBar } from "../../lib/thermo/water-saturation-pressure";
import { ThermoInputError } from "../../lib/thermo/thermo-error";
import { relativeDeviation, saturationReference } from "./water-reference";

describe("saturation pressure of water", () => {
  it("is within 0.1 % of IAPWS-IF97 region 4 from 0.01 to 100 °C (python3-iapws fixture)", () => {
    expect(saturationReference.some((point) => point.temperatureC === 100)).toBe(true);
    for (const point of saturationReference) {
      expect(relativeDeviation(saturationPressureBar(point.temperatureK), point.saturationPressureBar)).toBeLessThan(1e-3);
    }
  });

  it("gives 1.01418 bar at 100 °C (IAPWS R7-97 steam tables; boiling point at 1 atm lies at 99.97 °C)", () => {
    expect(saturationPressureBar(373.15)).toBeCloseTo(1.01418, 4);
  });

  it("rejects temperatures outside 273.15–373.15 K with a typed error", () => {
    expect(() => saturationPressureBar(200)).toThrow(ThermoInputError);
    expect(() => saturationPressureBar(Number.POSITIVE_INFINITY)).toThrow(/temperatureK/);
  });
});
