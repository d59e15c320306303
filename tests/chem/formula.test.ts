import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { parseFormula, parseFormulaOrThrow } from "../../lib/chem/formula";

function parsed(text: string) {
  const result = parseFormula(text);
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
}

describe("parseFormula", () => {
  // Expected stoichiometries are read off the formulas by hand (common practice: counting atoms).
  it("counts the atoms of a simple neutral formula", () => {
    expect(parsed("Ca(OH)2")).toEqual({ elements: { Ca: 1, O: 2, H: 2 }, charge: 0 });
  });

  it("multiplies nested parentheses and square brackets", () => {
    expect(parsed("Ca6[Al(OH)6]2(SO4)3(H2O)26").elements).toEqual({ Ca: 6, Al: 2, O: 12 + 12 + 26, H: 12 + 52, S: 3 });
    expect(parsed("K((OH)2)3").elements).toEqual({ K: 1, O: 6, H: 6 });
  });

  it("reads decimal subscripts of C-S-H end-members", () => {
    expect(parsed("(CaO)1.5(SiO2)1(H2O)2.5").elements).toEqual({ Ca: 1.5, O: 1.5 + 2 + 2.5, Si: 1, H: 5 });
    expect(parsed("CaSO4·0.5H2O").elements).toEqual({ Ca: 1, S: 1, O: 4.5, H: 1 });
  });

  it("reads hydrate notation with a middle dot or an asterisk and leading multipliers", () => {
    const gypsum = { elements: { Ca: 1, S: 1, O: 6, H: 4 }, charge: 0 };
    expect(parsed("CaSO4·2H2O")).toEqual(gypsum);
    expect(parsed("CaSO4*2H2O")).toEqual(gypsum);
    expect(parsed("CaSO4 · 2H2O")).toEqual(gypsum);
    expect(parsed("3CaO·Al2O3·6H2O").elements).toEqual({ Ca: 3, O: 3 + 3 + 6, Al: 2, H: 12 });
  });

  it("reads charges written after the formula", () => {
    expect(parsed("Ca+2")).toEqual({ elements: { Ca: 1 }, charge: 2 });
    expect(parsed("SO4-2")).toEqual({ elements: { S: 1, O: 4 }, charge: -2 });
    expect(parsed("Al(OH)4-")).toEqual({ elements: { Al: 1, O: 4, H: 4 }, charge: -1 });
    expect(parsed("H+")).toEqual({ elements: { H: 1 }, charge: 1 });
    expect(parsed("CO3--").charge).toBe(-2);
    expect(parsed("Fe+++").charge).toBe(3);
  });

  it("ignores phase suffixes for stoichiometry", () => {
    expect(parsed("CO2(aq)")).toEqual({ elements: { C: 1, O: 2 }, charge: 0 });
    expect(parsed("CO2(g)")).toEqual(parsed("CO2"));
    expect(parsed("H2O(l)")).toEqual(parsed("H2O"));
    expect(parsed("CaCO3(s)")).toEqual(parsed("CaCO3"));
    expect(parsed("Ca+2(aq)")).toEqual({ elements: { Ca: 1 }, charge: 2 });
    expect(parsed("SiO2(am)")).toEqual(parsed("SiO2"));
    expect(parsed("Al(OH)3(cr)")).toEqual(parsed("Al(OH)3"));
  });

  it("reports a syntax error with the position of the offending character", () => {
    const cases: [string, number][] = [
      ["Ca(OH2", 6],
      ["CaOH)2", 4],
      ["Ca()2", 2],
      ["ca", 0],
      ["Ca$O", 2],
      ["CaSO4·", 6],
      ["H2.O", 3],
    ];
    for (const [text, position] of cases) {
      const result = parseFormula(text);
      expect(result.ok, text).toBe(false);
      if (!result.ok) {
        expect(result.error.code, text).toBe("formula_syntax");
        expect(result.error.position, text).toBe(position);
        expect(result.error.formula).toBe(text);
        expect(result.error.message).toContain(text);
      }
    }
  });

  it("reports an empty formula and a bare charge as syntax errors", () => {
    for (const text of ["", "+2", "(aq)"]) {
      const result = parseFormula(text);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.error.code).toBe("formula_syntax");
    }
  });

  it("reports an element missing from the element table with its position", () => {
    const result = parseFormula("CaXx2");
    expect(result).toMatchObject({ ok: false, error: { code: "unknown_element", position: 2 } });
    if (!result.ok) expect(result.error.message).toContain("Xx");
  });

  it("parseFormulaOrThrow returns the value for good input and throws for bad input", () => {
    expect(parseFormulaOrThrow("NaCl").elements).toEqual({ Na: 1, Cl: 1 });
    expect(() => parseFormulaOrThrow("Na(")).toThrow(/Na\(/);
  });

  it("never throws on arbitrary text (property test)", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 30 }), (text) => {
        const result = parseFormula(text);
        expect(typeof result.ok).toBe("boolean");
      }),
    );
  });

  it("is additive: A·B has the atoms of A plus the atoms of B (property test)", () => {
    const part = fc.constantFrom("CaO", "SiO2", "H2O", "Al2O3", "(OH)2Ca", "Na2SO4", "3CaO", "0.5H2O", "K[Al(OH)4]");
    fc.assert(
      fc.property(part, part, (a, b) => {
        const joined = parsed(`${a}·${b}`).elements;
        const left = parsed(a).elements;
        const right = parsed(b).elements;
        for (const symbol of new Set([...Object.keys(left), ...Object.keys(right)])) {
          expect(joined[symbol]).toBeCloseTo((left[symbol] ?? 0) + (right[symbol] ?? 0), 12);
        }
      }),
    );
  });
});
