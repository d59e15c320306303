import { describe, expect, it } from "vitest";
import { bornXPerK2, bornYPerK } from "../../lib/thermo/born-functions";
import { liquidReference } from "./water-reference";

describe("Born functions of water at 1 bar", () => {
  it("give Y(25 °C) within 1 % of −5.80e-5 1/K (Shock et al. 1992, J. Chem. Soc. Faraday Trans. 88, 803; from memory)", () => {
    expect(Math.abs(bornYPerK(298.15) / -5.8e-5 - 1)).toBeLessThan(0.01);
  });

  it("give Y within 0.1 % of the python3-iapws values (1/ε²)(∂ε/∂T) at every fixture temperature", () => {
    for (const point of liquidReference) {
      const referenceY = point.permittivityDerivativePerK / point.relativePermittivity ** 2;
      expect(Math.abs(bornYPerK(point.temperatureK) / referenceY - 1)).toBeLessThan(1e-3);
    }
  });

  it("give X = ∂Y/∂T within 2 % of a central difference of the python3-iapws Y values", () => {
    for (let i = 1; i < liquidReference.length - 2; i++) {
      const below = liquidReference[i - 1];
      const above = liquidReference[i + 1];
      const yBelow = below.permittivityDerivativePerK / below.relativePermittivity ** 2;
      const yAbove = above.permittivityDerivativePerK / above.relativePermittivity ** 2;
      const referenceX = (yAbove - yBelow) / (above.temperatureK - below.temperatureK);
      expect(Math.abs(bornXPerK2(liquidReference[i].temperatureK) / referenceX - 1)).toBeLessThan(0.02);
    }
  });

  it("give X(25 °C) about 11 % smaller in magnitude than the −3.09e-7 1/K of the permittivity the HKF authors used (Shock et al. 1992; from memory)", () => {
    // IAPWS R8-97 and the Johnson & Norton (1991) fit differ in curvature; this bounds the difference.
    const ratio = bornXPerK2(298.15) / -3.09e-7;
    expect(ratio).toBeGreaterThan(0.85);
    expect(ratio).toBeLessThan(1.0);
  });
});
