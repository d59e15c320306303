import { describe, it, expect } from "vitest";
import { loadDataset } from "../../lib/data/load-dataset";
import { anhydrousEnthalpyData, anhydrousReactantResolver } from "../../lib/curing/anhydrous-enthalpy";
import { speciesEnthalpyResolver } from "../../lib/curing/species-enthalpy";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;
const at25 = anhydrousReactantResolver(dataset, 298.15);
const ions = speciesEnthalpyResolver(dataset, 298.15);

describe("enthalpies of the anhydrous reactants", () => {
  it("resolves every entry of the data file, data-set links included, with a parsed stoichiometry", () => {
    for (const entry of anhydrousEnthalpyData.reactants) {
      const r = at25(entry.id);
      expect(Number.isFinite(r.enthalpyJPerMol)).toBe(true);
      expect(Object.keys(r.elements).length).toBeGreaterThan(0);
    }
  });

  it("raises the enthalpy by Cp·ΔT between 25 and 60 °C for entries with a constant heat capacity", () => {
    const at60 = anhydrousReactantResolver(dataset, 333.15);
    const alite = anhydrousEnthalpyData.reactants.find((r) => r.id === "alite")!;
    if (!("heatCapacityJPerMolK" in alite)) throw new Error();
    expect(at60("alite").enthalpyJPerMol - at25("alite").enthalpyJPerMol).toBeCloseTo(alite.heatCapacityJPerMolK * 35, 6);
  });

  it("reproduces the enthalpies of solution at infinite dilution of K2SO4, Na2SO4 and CaCl2 within 1.5 kJ/mol (CRC Handbook: +23.8, −2.4, −81.3 kJ/mol, from memory)", () => {
    const solution = (id: string, ionsOf: [string, number][]) => ionsOf.reduce((s, [ion, n]) => s + n * ions(ion), 0) - at25(id).enthalpyJPerMol;
    expect(Math.abs(solution("arcanite", [["K+", 2], ["SO4-2", 1]]) - 23800)).toBeLessThan(1500);
    expect(Math.abs(solution("thenardite", [["Na+", 2], ["SO4-2", 1]]) - -2400)).toBeLessThan(1500);
    expect(Math.abs(solution("calcium-chloride", [["Ca+2", 1], ["Cl-", 2]]) - -81300)).toBeLessThan(1500);
  });

  it("gives the heat of hydration of periclase to brucite near the classic 841 J/g (Taylor 1997 ch. 7, from memory) within 10 %", () => {
    const heatJPerMol = at25("periclase").enthalpyJPerMol + at25("water").enthalpyJPerMol - ions("brucite");
    const molarMassGPerMol = 40.304; // MgO, IUPAC atomic weights
    expect(Math.abs(heatJPerMol / molarMassGPerMol - 841) / 841).toBeLessThan(0.1);
  });

  it("refuses an id that the data file does not hold", () => {
    expect(() => at25("unobtainium")).toThrow(/anhydrous-enthalpies/);
  });
});
