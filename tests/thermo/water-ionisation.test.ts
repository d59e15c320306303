import { describe, expect, it } from "vitest";
import { log10Kw } from "../../lib/thermo/water-ionisation";
import { liquidReference } from "./water-reference";

describe("ionisation constant of water at 1 bar", () => {
  it("matches IAPWS R11-07 on IAPWS-95 density within 0.02 in pKw at 0.01, 25, 50, 75 and 99 °C (python3-iapws fixture)", () => {
    const checkedC = [0.01, 25, 50, 75, 99];
    for (const temperatureC of checkedC) {
      const point = liquidReference.find((p) => p.temperatureC === temperatureC);
      expect(point, `fixture point at ${temperatureC} °C`).toBeDefined();
      expect(Math.abs(-log10Kw(point!.temperatureK) - point!.pKw)).toBeLessThan(0.02);
    }
  });

  it("gives pKw = 13.995 at 25 °C (IAPWS R11-07, Bandura & Lvov 2006, table; CRC Handbook)", () => {
    expect(Math.abs(-log10Kw(298.15) - 13.995)).toBeLessThan(0.002);
  });

  it("gives pKw = 14.946, 13.264, 12.696 at 0, 50, 75 °C (Bandura & Lvov 2006, table at 0.1 MPa)", () => {
    expect(Math.abs(-log10Kw(273.15) - 14.946)).toBeLessThan(0.002);
    expect(Math.abs(-log10Kw(323.15) - 13.264)).toBeLessThan(0.002);
    expect(Math.abs(-log10Kw(348.15) - 12.696)).toBeLessThan(0.002);
  });
});
