import { describe, expect, it } from "vitest";
import { expectReference } from "../support/reference-check";
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
    expectReference({
      id: "permittivity-R8-97-check-value",
      quantity: "Relative permittivity of water",
      conditions: "298.15 K, 999.242866 kg/m³ (verification point)",
      source: "IAPWS R8-97 (Fernández et al. 1997), computer-program verification table",
      reference: 78.590725,
      computed: relativePermittivityFromDensity(999.242866, 298.15),
      tolerance: 5e-6,
      unit: "",
    });
  });

  it("is within 0.1 % of IAPWS R8-97 on IAPWS-95 density from 0.01 to 99 °C (python3-iapws fixture)", () => {
    for (const point of liquidReference) {
      expectReference({
        id: `permittivity-${point.temperatureC}C`,
        quantity: "Relative permittivity of water",
        conditions: `${point.temperatureC} °C, 0.1 MPa, on IAPWS-95 density`,
        source: "IAPWS R8-97 via Debian python3-iapws (fixture)",
        reference: point.relativePermittivity,
        computed: waterRelativePermittivity(point.temperatureK),
        tolerance: 1e-3,
        relative: true,
        unit: "",
      });
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
    expectReference({ id: "permittivity-25C", quantity: "Relative permittivity of water", conditions: "25 °C, 0.1 MPa", source: "IAPWS R8-97 tables; 78.4 in the CRC Handbook (common practice)", reference: 78.41, computed: waterRelativePermittivity(298.15), tolerance: 0.05, unit: "" });
  });
});
