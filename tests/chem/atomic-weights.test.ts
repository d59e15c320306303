import { describe, it, expect } from "vitest";
import { atomicWeightGPerMol, molarMassGPerMol } from "../../lib/chem/atomic-weights";
import { parseFormulaOrThrow } from "../../lib/chem/formula";

const molarMassOf = (formula: string) => molarMassGPerMol(parseFormulaOrThrow(formula).elements);

describe("molarMassGPerMol", () => {
  // Molar masses as printed in the CRC Handbook of Chemistry and Physics, "Physical constants of inorganic
  // compounds" (values from memory, to the two decimals the handbook gives).
  it.each([
    ["CaSO4·2H2O", 172.17],
    ["Ca(OH)2", 74.09],
    ["CaCO3", 100.09],
    ["CaSO4", 136.14],
    ["H2O", 18.02],
    ["NaCl", 58.44],
    ["CO2", 44.01],
    ["SiO2", 60.08],
    ["Al2O3", 101.96],
    ["Fe2O3", 159.69],
    ["3CaO·Al2O3·6H2O", 378.28],
  ])("gives %s as %f g/mol", (formula, expectedGPerMol) => {
    expect(molarMassOf(formula)).toBeCloseTo(expectedGPerMol, 1);
    expect(Math.abs(molarMassOf(formula) - expectedGPerMol)).toBeLessThan(0.011);
  });

  it("is zero for an empty stoichiometry and linear in the counts", () => {
    expect(molarMassGPerMol({})).toBe(0);
    expect(molarMassGPerMol({ Ca: 2, O: 2 })).toBeCloseTo(2 * molarMassOf("CaO"), 12);
  });

  it("uses the IUPAC 2021 conventional weights for interval elements", () => {
    // IUPAC CIAAW 2021 (Prohaska et al. 2022, Pure Appl. Chem. 94, 573), conventional values (from memory).
    expect(atomicWeightGPerMol("H")).toBe(1.008);
    expect(atomicWeightGPerMol("O")).toBe(15.999);
    expect(atomicWeightGPerMol("S")).toBe(32.06);
    expect(atomicWeightGPerMol("Cl")).toBe(35.45);
  });

  it("throws for an element outside the table", () => {
    expect(() => atomicWeightGPerMol("Xx")).toThrow(/Xx/);
  });
});
