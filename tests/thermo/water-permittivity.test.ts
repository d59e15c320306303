import { describe, expect, it } from "vitest";
import {
  relativePermittivityFromDensity,
  waterRelativePermittivity,
  waterRelativePermittivityDerivativePerK,
  waterRelativePermittivitySecondDerivativePerK2,
} from "../../lib/thermo/water-permittivity";
import { liquidReference, relativeDeviation } from "./water-reference";

describe("relative permittivity of water at 1 bar", () => {
  it("reproduces the check value printed in the IAPWS R8-97 release at 298.15 K, 999.242866 kg/m³", () => {
    // IAPWS R8-97 (Fernández et al. 1997), table of computer-program verification values: ε = 78.5907250.
    expect(relativePermittivityFromDensity(999.242866, 298.15)).toBeCloseTo(78.590725, 5);
  });

  it("is within 0.1 % of IAPWS R8-97 on IAPWS-95 density from 0.01 to 99 °C (python3-iapws fixture)", () => {
    for (const point of liquidReference) {
      expect(relativeDeviation(waterRelativePermittivity(point.temperatureK), point.relativePermittivity)).toBeLessThan(1e-3);
    }
  });

  it("has a temperature derivative within 0.5 % of the python3-iapws central difference", () => {
    for (const point of liquidReference) {
      expect(relativeDeviation(waterRelativePermittivityDerivativePerK(point.temperatureK), point.permittivityDerivativePerK)).toBeLessThan(5e-3);
    }
  });

  it("has a first derivative consistent with a central difference of ε itself", () => {
    for (const temperatureK of [273.5, 298.15, 323.15, 372.5]) {
      const stepK = 0.01;
      const slope = (waterRelativePermittivity(temperatureK + stepK) - waterRelativePermittivity(temperatureK - stepK)) / (2 * stepK);
      expect(waterRelativePermittivityDerivativePerK(temperatureK)).toBeCloseTo(slope, 6);
    }
  });

  it("has a second derivative consistent with a central difference of ε itself", () => {
    for (const temperatureK of [274, 298.15, 323.15, 372]) {
      const stepK = 0.5;
      const curvature =
        (waterRelativePermittivity(temperatureK + stepK) - 2 * waterRelativePermittivity(temperatureK) + waterRelativePermittivity(temperatureK - stepK)) / stepK ** 2;
      expect(waterRelativePermittivitySecondDerivativePerK2(temperatureK)).toBeCloseTo(curvature, 5);
    }
  });

  it("gives ε(25 °C) = 78.41 (IAPWS R8-97 tables; 78.4 in the CRC Handbook, common practice)", () => {
    expect(waterRelativePermittivity(298.15)).toBeCloseTo(78.41, 1);
  });
});
