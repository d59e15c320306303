import { describe, expect, it } from "vitest";
import { expectReference } from "../support/reference-check";
import { saturationPressureBar, saturationTemperatureK } from "../../lib/thermo/water-saturation-pressure";
import { ThermoInputError } from "../../lib/thermo/thermo-error";
import { standardAtmosphereBar } from "../../lib/thermo/physical-constants";
import { boilingReference, saturationReference } from "./water-reference";

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

describe("saturation (boiling) temperature of water", () => {
  it("is within 1 mK of IAPWS-IF97 region 4 at 0.1 MPa and at the standard atmosphere (python3-iapws fixture)", () => {
    expect(boilingReference.map((p) => p.pressureBar)).toEqual([1, standardAtmosphereBar]);
    for (const point of boilingReference) {
      expectReference({
        id: `boiling-temperature-${point.pressureBar}bar`,
        quantity: "Boiling temperature of water",
        conditions: `${point.pressureBar} bar`,
        source: "IAPWS-IF97 region 4 via Debian python3-iapws (fixture)",
        reference: point.temperatureK,
        computed: saturationTemperatureK(point.pressureBar),
        tolerance: 1e-3,
        unit: "K",
      });
    }
  });

  it("inverts the saturation pressure across the range (the two IF97 equations are consistent to 1e-6 relative)", () => {
    for (const temperatureK of [273.16, 300, 330, 360, 373.15]) {
      expect(Math.abs(saturationTemperatureK(saturationPressureBar(temperatureK)) / temperatureK - 1)).toBeLessThan(1e-6);
    }
  });

  it("rejects pressures outside the project's 0–100 °C range with a typed error naming the field", () => {
    expect(() => saturationTemperatureK(2)).toThrow(ThermoInputError);
    expect(() => saturationTemperatureK(0.001)).toThrow(/pressureBar/);
  });
});
