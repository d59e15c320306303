import { describe, expect, it } from "vitest";
import { expectReference } from "../support/reference-check";
import { waterDensityDerivativeKgPerM3PerK, waterDensityKgPerM3 } from "../../lib/thermo/water-density";
import { ThermoInputError } from "../../lib/thermo/thermo-error";
import { liquidReference, relativeDeviation } from "./water-reference";

describe("water density at 1 bar", () => {
  it("is within 0.1 % of IAPWS-95 from 0.01 to 99 °C (python3-iapws fixture)", () => {
    expect(liquidReference.length).toBeGreaterThanOrEqual(21);
    for (const point of liquidReference) {
      expectReference({
        id: `density-${point.temperatureC}C`,
        quantity: "Density of liquid water",
        conditions: `${point.temperatureC} °C, 0.1 MPa`,
        source: "IAPWS-95 via Debian python3-iapws (fixture)",
        reference: point.densityKgPerM3,
        computed: waterDensityKgPerM3(point.temperatureK),
        tolerance: 1e-3,
        relative: true,
        unit: "kg/m³",
      });
    }
  });

  it("is within 2e-5 of IAPWS-95 everywhere, far inside the 0.1 % target (python3-iapws fixture)", () => {
    for (const point of liquidReference) {
      expect(relativeDeviation(waterDensityKgPerM3(point.temperatureK), point.densityKgPerM3)).toBeLessThan(2e-5);
    }
  });

  it("has its maximum near 4 °C, where the derivative changes sign (Kell 1975: 3.98 °C)", () => {
    expect(waterDensityDerivativeKgPerM3PerK(273.15 + 3.5)).toBeGreaterThan(0);
    expect(waterDensityDerivativeKgPerM3PerK(273.15 + 4.5)).toBeLessThan(0);
  });

  it("has a derivative that matches a central difference of the IAPWS-95 densities in the fixture", () => {
    for (let i = 1; i < liquidReference.length - 2; i++) {
      const below = liquidReference[i - 1];
      const above = liquidReference[i + 1];
      const point = liquidReference[i];
      const slopeKgPerM3PerK = (above.densityKgPerM3 - below.densityKgPerM3) / (above.temperatureK - below.temperatureK);
      // A 10 K central difference carries a truncation error of about ρ‴·(5 K)²/6 ≈ 0.003 kg/(m³·K).
      expect(Math.abs(waterDensityDerivativeKgPerM3PerK(point.temperatureK) - slopeKgPerM3PerK)).toBeLessThan(0.01);
    }
  });

  it("rejects a temperature outside 273.15–373.15 K with a typed error naming temperatureK", () => {
    expect(() => waterDensityKgPerM3(250)).toThrow(ThermoInputError);
    try {
      waterDensityKgPerM3(400);
    } catch (error) {
      expect(error).toBeInstanceOf(ThermoInputError);
      expect((error as ThermoInputError).field).toBe("temperatureK");
      expect((error as ThermoInputError).limit).toBe(373.15);
    }
    expect(() => waterDensityKgPerM3(Number.NaN)).toThrow(/temperatureK/);
  });
});
