import { describe, expect, it } from "vitest";
import { expectReference } from "../support/reference-check";
import { log10Kw } from "../../lib/thermo/water-ionisation";
import { liquidReference } from "./water-reference";

describe("ionisation constant of water at 1 bar", () => {
  it("matches IAPWS R11-07 on IAPWS-95 density within 0.02 in pKw at 0.01, 25, 50, 75 and 99 °C (python3-iapws fixture)", () => {
    const checkedC = [0.01, 25, 50, 75, 99];
    for (const temperatureC of checkedC) {
      const point = liquidReference.find((p) => p.temperatureC === temperatureC);
      expect(point, `fixture point at ${temperatureC} °C`).toBeDefined();
      expectReference({
        id: `pKw-iapws-${temperatureC}C`,
        quantity: "pKw of water",
        conditions: `${temperatureC} °C, 0.1 MPa, on IAPWS-95 density`,
        source: "IAPWS R11-07 via Debian python3-iapws (fixture)",
        reference: point!.pKw,
        computed: -log10Kw(point!.temperatureK),
        tolerance: 0.02,
        unit: "",
      });
    }
  });

  it("gives pKw = 13.995 at 25 °C (IAPWS R11-07, Bandura & Lvov 2006, table; CRC Handbook)", () => {
    expectReference({ id: "pKw-25C", quantity: "pKw of water", conditions: "25 °C, 0.1 MPa", source: "IAPWS R11-07, Bandura & Lvov 2006, table; CRC Handbook", reference: 13.995, computed: -log10Kw(298.15), tolerance: 0.002, unit: "" });
  });

  it("gives pKw = 14.946, 13.264, 12.696 at 0, 50, 75 °C (Bandura & Lvov 2006, table at 0.1 MPa)", () => {
    for (const [temperatureC, pKw] of [[0, 14.946], [50, 13.264], [75, 12.696]]) {
      expectReference({
        id: `pKw-${temperatureC}C`,
        quantity: "pKw of water",
        conditions: `${temperatureC} °C, 0.1 MPa`,
        source: "Bandura & Lvov 2006, table at 0.1 MPa",
        reference: pKw,
        computed: -log10Kw(273.15 + temperatureC),
        tolerance: 0.002,
        unit: "",
      });
    }
  });
});
