import { describe, it, expect } from "vitest";
import { oxideMolarMassGPerMol, addOxideElementMoles } from "../../lib/cement/oxides";

describe("oxides of a chemical analysis", () => {
  it("gives the molar masses of CaO 56.08, SiO2 60.08, Al2O3 101.96, Fe2O3 159.69, SO3 80.06 g/mol (CRC Handbook, from memory)", () => {
    expect(oxideMolarMassGPerMol("CaO")).toBeCloseTo(56.08, 2);
    expect(oxideMolarMassGPerMol("SiO2")).toBeCloseTo(60.08, 2);
    expect(oxideMolarMassGPerMol("Al2O3")).toBeCloseTo(101.96, 2);
    expect(oxideMolarMassGPerMol("Fe2O3")).toBeCloseTo(159.69, 2);
    expect(oxideMolarMassGPerMol("SO3")).toBeCloseTo(80.06, 2);
  });

  it("reproduces the ASTM C150 coefficient 3.043 = M(C4AF)/M(Fe2O3) from the oxide molar masses", () => {
    const c4af = 4 * oxideMolarMassGPerMol("CaO") + oxideMolarMassGPerMol("Al2O3") + oxideMolarMassGPerMol("Fe2O3");
    expect(c4af / oxideMolarMassGPerMol("Fe2O3")).toBeCloseTo(3.043, 3);
  });

  it("converts oxide masses to element moles: 56.08 g CaO and 18.02 g H2O give 1 mol Ca, 2 mol H, 2 mol O", () => {
    const moles = addOxideElementMoles({}, { CaO: 56.077, H2O: 18.015 });
    expect(moles.Ca).toBeCloseTo(1, 3);
    expect(moles.H).toBeCloseTo(2, 3);
    expect(moles.O).toBeCloseTo(2, 3);
  });
});
