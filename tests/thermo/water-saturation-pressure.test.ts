import { describe, expect, it } from "vitest";
import { expectReference } from "../support/reference-check";
import { saturationPressureBar } from "../../lib/thermo/water-saturation-pressure";
import { ThermoInputError } from "../../lib/thermo/thermo-error";
import { saturationReference } from "./water-reference";

describe("saturation pressure of water", () => {
  it("is within 0.1 % of IAPWS-IF97 region 4 from 0.01 to 100 °C (python3-iapws fixture)", () => {
    expect(saturationReference.some((point) => point.temperatureC === 100)).toBe(true);
    for (const point of saturationReference) {
      expectReference({
        id: `saturation-pressure-${point.temperatureC}C`,
        quantity: "Saturation pressure of water",
        conditions: `${point.temperatureC} °C`,
        source: "IAPWS-IF97 region 4 via Debian python3-iapws (fixture)",
        reference: point.saturationPressureBar,
        computed: saturationPressureBar(point.temperatureK),
        tolerance: 1e-3,
        relative: true,
        unit: "bar",
      });
    }
  });

  it("gives 1.01418 bar at 100 °C (IAPWS R7-97 steam tables; boiling point at 1 atm lies at 99.97 °C)", () => {
    expectReference({ id: "saturation-pressure-100C", quantity: "Saturation pressure of water", conditions: "100 °C", source: "IAPWS R7-97 steam tables", reference: 1.01418, computed: saturationPressureBar(373.15), tolerance: 5e-5, unit: "bar" });
  });

  it("rejects temperatures outside 273.15–373.15 K with a typed error", () => {
    expect(() => saturationPressureBar(200)).toThrow(ThermoInputError);
    expect(() => saturationPressureBar(Number.POSITIVE_INFINITY)).toThrow(/temperatureK/);
  });
});
