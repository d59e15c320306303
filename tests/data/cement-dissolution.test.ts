import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { dissolutionReaction, formatReaction, reactionLog10K } from "../../lib/data/cement-dissolution";
import { parseFormula } from "../../lib/chem/formula";
import { gasConstantJPerMolK } from "../../lib/thermo/physical-constants";

function parsed(formula: string) {
  const result = parseFormula(formula);
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
}

describe("dissolutionReaction", () => {
  it("writes ettringite as 6 Ca+2 + 2 Al(OH)4- + 3 SO4-2 + 4 OH- + 26 H2O, the reaction of Perkins & Palmer (1999, Geochim. Cosmochim. Acta 63, 1969)", () => {
    const reaction = dissolutionReaction(parsed("Ca6Al2(SO4)3(OH)12·26H2O"));
    expect(reaction).toEqual({ ok: true, value: { "Ca+2": 6, "Al(OH)4-": 2, "SO4-2": 3, "OH-": 4, "H2O(l)": 26 } });
  });

  it("writes monocarbonate as 4 Ca+2 + 2 Al(OH)4- + CO3-2 + 4 OH- + 5 H2O, as Matschei, Lothenbach & Glasser (2007, Cem. Concr. Res. 37, 1379)", () => {
    const reaction = dissolutionReaction(parsed("Ca4Al2(CO3)(OH)12·5H2O"));
    expect(reaction).toEqual({ ok: true, value: { "Ca+2": 4, "Al(OH)4-": 2, "CO3-2": 1, "OH-": 4, "H2O(l)": 5 } });
  });

  it("writes thaumasite with SiO(OH)3- as Schmidt et al. (2008, Cem. Concr. Res. 38, 337): 6 Ca+2 + 2 H3SiO4- + 2 SO4-2 + 2 CO3-2 + 2 OH- + 26 H2O", () => {
    const reaction = dissolutionReaction(parsed("Ca6Si2(SO4)2(CO3)2(OH)12·24H2O"));
    expect(reaction).toEqual({ ok: true, value: { "Ca+2": 6, "SiO(OH)3-": 2, "SO4-2": 2, "CO3-2": 2, "OH-": 2, "H2O(l)": 26 } });
  });

  it("can use neutral SiO2(aq) for silica, giving amorphous silica = SiO2(aq)", () => {
    expect(dissolutionReaction(parsed("SiO2"), "SiO2(aq)")).toEqual({ ok: true, value: { "SiO2(aq)": 1 } });
  });

  it("names an element that has no basis species", () => {
    const reaction = dissolutionReaction(parsed("TiO2"));
    expect(reaction.ok).toBe(false);
    if (!reaction.ok) expect(reaction.error).toMatchObject({ code: "element_without_basis", element: "Ti" });
  });

  it("balances every element and the charge for any hydrate Ca_a Al_b (SO4)_c (CO3)_d Cl_e (OH)_n ·wH2O (property; conservation of mass and charge)", () => {
    const basis: Record<string, { elements: Record<string, number>; charge: number }> = {
      "Ca+2": { elements: { Ca: 1 }, charge: 2 },
      "Al(OH)4-": { elements: { Al: 1, O: 4, H: 4 }, charge: -1 },
      "SO4-2": { elements: { S: 1, O: 4 }, charge: -2 },
      "CO3-2": { elements: { C: 1, O: 3 }, charge: -2 },
      "Cl-": { elements: { Cl: 1 }, charge: -1 },
      "OH-": { elements: { O: 1, H: 1 }, charge: -1 },
      "H2O(l)": { elements: { O: 1, H: 2 }, charge: 0 },
    };
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6 }), fc.integer({ min: 0, max: 2 }), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 2 }), fc.integer({ min: 0, max: 2 }), fc.integer({ min: 0, max: 30 }), (ca, al, so4, co3, cl, water) => {
        const hydroxide = 2 * ca + 3 * al - 2 * so4 - 2 * co3 - cl;
        fc.pre(hydroxide >= 0);
        const solid = { elements: { Ca: ca, Al: al, S: so4, C: co3, Cl: cl, O: 4 * so4 + 3 * co3 + hydroxide + water, H: hydroxide + 2 * water }, charge: 0 };
        for (const key of Object.keys(solid.elements) as (keyof typeof solid.elements)[]) if (solid.elements[key] === 0) delete solid.elements[key];
        const reaction = dissolutionReaction(solid);
        expect(reaction.ok).toBe(true);
        if (!reaction.ok) return;
        const totals: Record<string, number> = {};
        let charge = 0;
        for (const [id, nu] of Object.entries(reaction.value)) {
          for (const [e, n] of Object.entries(basis[id].elements)) totals[e] = (totals[e] ?? 0) + nu * n;
          charge += nu * basis[id].charge;
        }
        for (const [e, n] of Object.entries(solid.elements)) expect(totals[e]).toBeCloseTo(n, 9);
        expect(charge).toBeCloseTo(0, 9);
      }),
    );
  });
});

describe("reactionLog10K and formatReaction", () => {
  it("returns −ΔrG°/(RT ln10) for a hand-made pair of species (definition of the equilibrium constant)", () => {
    const temperatureK = 298.15;
    const species = [
      { id: "X", phase: "solid" as const, elements: { Ca: 1 }, charge: 0, gibbsJPerMol: -1000, molarMassGPerMol: 40 },
      { id: "Ca+2", phase: "aqueous" as const, elements: { Ca: 1 }, charge: 2, gibbsJPerMol: -1000 + gasConstantJPerMolK * temperatureK * Math.LN10 * 3, molarMassGPerMol: 40 },
    ];
    const result = reactionLog10K(species, "X", { "Ca+2": 1 }, temperatureK);
    expect(result.ok && result.value).toBeCloseTo(-3, 12);
  });

  it("names a species missing from the list", () => {
    const result = reactionLog10K([], "X", {}, 298.15);
    expect(result).toMatchObject({ ok: false, error: { code: "species_missing", speciesId: "X" } });
  });

  it("writes the reaction as text", () => {
    expect(formatReaction("gypsum", { "Ca+2": 1, "SO4-2": 1, "H2O(l)": 2 })).toBe("gypsum = Ca+2 + SO4-2 + 2 H2O(l)");
    expect(formatReaction("x", { "Ca+2": 3, "OH-": 3.16, "H2O(l)": -2.52 })).toBe("x = 3 Ca+2 + 3.16 OH- - 2.52 H2O(l)");
  });
});
