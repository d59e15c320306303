import { describe, expect, it } from "vitest";
import { expectReference } from "../support/reference-check";
import { debyeHuckelParameters, debyeHuckelPrefactors } from "../../lib/thermo/debye-huckel";

describe("Debye–Hückel parameters of water", () => {
  it("have prefactors from CODATA 2018 constants within 1e-4 of Helgeson & Kirkham 1974 (Am. J. Sci. 274, 1199), 1.824829238e6 and 50.29158649", () => {
    // The small residual comes from the older fundamental constants Helgeson & Kirkham used.
    expect(Math.abs(debyeHuckelPrefactors.aPrefactorKgHalfK3HalfPerMolHalf / 1.824829238e6 - 1)).toBeLessThan(1e-4);
    expect(Math.abs(debyeHuckelPrefactors.bPrefactorKgHalfKHalfPerMolHalfPerAngstrom / 50.29158649 - 1)).toBeLessThan(1e-4);
  });

  it("give A(25 °C) = 0.509 ± 0.002 kg^½ mol^-½ (Helgeson 1981, Am. J. Sci. 281, 1249; standard texts)", () => {
    expectReference({ id: "debye-huckel-A-25C-helgeson", quantity: "Debye–Hückel A", conditions: "25 °C, 1 bar", source: "Helgeson 1981, Am. J. Sci. 281, 1249; standard texts", reference: 0.509, computed: debyeHuckelParameters(298.15).aKgHalfPerMolHalf, tolerance: 0.002, unit: "kg^½ mol^-½" });
  });

  // Freeze & Cherry 1979, Groundwater, Appendix IV: A in kg^½ mol^-½, B in 10⁸ cm⁻¹ kg^½ mol^-½ (= Å⁻¹ kg^½ mol^-½).
  const freezeCherryTable = [
    { temperatureC: 0, a: 0.4883, b: 0.3241 },
    { temperatureC: 25, a: 0.5085, b: 0.3281 },
    { temperatureC: 50, a: 0.5319, b: 0.3321 },
    { temperatureC: 60, a: 0.5425, b: 0.3338 },
  ];
  for (const row of freezeCherryTable) {
    it(`give A and B at ${row.temperatureC} °C within 1 % of Freeze & Cherry 1979, Appendix IV`, () => {
      const parameters = debyeHuckelParameters(273.15 + row.temperatureC);
      const source = "Freeze & Cherry 1979, Groundwater, Appendix IV";
      const conditions = `${row.temperatureC} °C, 1 bar`;
      expectReference({ id: `debye-huckel-A-${row.temperatureC}C`, quantity: "Debye–Hückel A", conditions, source, reference: row.a, computed: parameters.aKgHalfPerMolHalf, tolerance: 0.01, relative: true, unit: "kg^½ mol^-½" });
      expectReference({ id: `debye-huckel-B-${row.temperatureC}C`, quantity: "Debye–Hückel B", conditions, source, reference: row.b, computed: parameters.bKgHalfPerMolHalfPerAngstrom, tolerance: 0.01, relative: true, unit: "Å⁻¹ kg^½ mol^-½" });
    });
  }

  it("rise with temperature over 0–100 °C, as tabulated by Helgeson & Kirkham 1974", () => {
    let previous = debyeHuckelParameters(273.15);
    for (let temperatureK = 283.15; temperatureK <= 373.15; temperatureK += 10) {
      const current = debyeHuckelParameters(temperatureK);
      expect(current.aKgHalfPerMolHalf).toBeGreaterThan(previous.aKgHalfPerMolHalf);
      expect(current.bKgHalfPerMolHalfPerAngstrom).toBeGreaterThan(previous.bKgHalfPerMolHalfPerAngstrom);
      previous = current;
    }
  });
});
