import { describe, it, expect } from "vitest";
import { elementEntropyJPerMolK, elementEntropySumJPerMolK } from "../../lib/chem/element-entropy";

const referenceTemperatureK = 298.15;

describe("elementEntropySumJPerMolK", () => {
  it("gives zero for H+ under the conventional S°(H+) = 0", () => {
    expect(elementEntropySumJPerMolK({ H: 1 }, 1)).toBeCloseTo(0, 10);
  });

  it("gives half of S°(O2, g) per oxygen atom", () => {
    // CODATA Key Values (Cox, Wagman & Medvedev 1989): S°(O2, g) = 205.152 J/(mol K), from memory.
    expect(elementEntropyJPerMolK("O")).toBeCloseTo(205.152 / 2, 3);
  });

  // Each row: CODATA Key Values (Cox et al. 1989) ΔfH°, S° and the separately tabulated ΔfG° (from memory).
  // ΔfG° − (ΔfH° − T·(S° − Σ)) must vanish to the rounding of the tables if the element entropies are right.
  it.each([
    ["H2O(l)", { H: 2, O: 1 }, 0, -285830, 69.95, -237140],
    ["CO2(g)", { C: 1, O: 2 }, 0, -393510, 213.785, -394373],
    ["H2O(g)", { H: 2, O: 1 }, 0, -241826, 188.835, -228582],
    ["Cl-(aq)", { Cl: 1 }, -1, -167080, 56.6, -131217],
    ["Ca+2(aq)", { Ca: 1 }, 2, -543000, -56.2, -552806],
    ["Na+(aq)", { Na: 1 }, 1, -240340, 58.45, -261905],
    ["SO4-2(aq)", { S: 1, O: 4 }, -2, -909340, 18.5, -744004],
  ])("reproduces CODATA ΔfG° of %s from its ΔfH° and S°", (_name, elements, charge, enthalpyJPerMol, entropyJPerMolK, gibbsJPerMol) => {
    const formationEntropyJPerMolK = entropyJPerMolK - elementEntropySumJPerMolK(elements, charge);
    const gibbsFromEnthalpyJPerMol = enthalpyJPerMol - referenceTemperatureK * formationEntropyJPerMolK;
    expect(Math.abs(gibbsFromEnthalpyJPerMol - gibbsJPerMol)).toBeLessThan(150);
  });

  it("throws for an element outside the table", () => {
    expect(() => elementEntropySumJPerMolK({ Xx: 1 }, 0)).toThrow(/Xx/);
  });
});
