import { describe, it, expect } from "vitest";
import { loadDataset } from "../../lib/data/load-dataset";
import { vanTHoffLog10K } from "../../lib/data/van-t-hoff-log-k";
import { speciesEnthalpyResolver, SpeciesEnthalpyFailure } from "../../lib/curing/species-enthalpy";
import { gasConstantJPerMolK } from "../../lib/thermo/physical-constants";
import type { Dataset } from "../../lib/data/dataset";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;

describe("apparent enthalpies of the data-set species", () => {
  it("gives a reaction-defined species the enthalpy implied by the temperature slope of its log K (Gibbs–Helmholtz / van 't Hoff)", () => {
    // ΔrH(T) = R ln10 T² d(log K)/dT (van 't Hoff equation; Anderson & Crerar 1993, ch. 11), by central differences.
    for (const id of ["CaHCO3+", "CaOH+", "KSO4-"]) {
      const species = dataset.species.find((s) => s.id === id)!;
      const T = 313.15;
      const h = 0.01;
      const slope = (vanTHoffLog10K(species.logK!, T + h) - vanTHoffLog10K(species.logK!, T - h)) / (2 * h);
      const reactionEnthalpyJPerMol = gasConstantJPerMolK * Math.LN10 * T * T * slope;
      const enthalpy = speciesEnthalpyResolver(dataset, T);
      const sum = Object.entries(species.logK!.reaction).reduce((acc, [other, nu]) => acc + nu * enthalpy(other), 0);
      expect(sum - enthalpy(id)).toBeCloseTo(reactionEnthalpyJPerMol, 0);
    }
  });

  it("reproduces the enthalpy of solution of portlandite at 25 °C from its formation enthalpies (about −16.7 kJ/mol; Wagman et al. 1982 values, from memory)", () => {
    // Ca(OH)2 = Ca+2 + 2 OH-: ΔrH° = −543.0 − 2·230.0 + 985.2 ≈ −17.8 kJ/mol (NBS 1982), measured −16.7 to −17.8 (from memory).
    const enthalpy = speciesEnthalpyResolver(dataset, 298.15);
    const dissolution = enthalpy("Ca+2") + 2 * enthalpy("OH-") - enthalpy("portlandite");
    expect(dissolution).toBeGreaterThan(-19000);
    expect(dissolution).toBeLessThan(-15500);
  });

  it("raises a typed failure naming the species when an id is absent or an entry has no enthalpy", () => {
    const enthalpy = speciesEnthalpyResolver(dataset, 298.15);
    expect(() => enthalpy("no-such-phase")).toThrow(SpeciesEnthalpyFailure);
    const bare: Dataset = {
      ...dataset,
      species: [{ ...dataset.species.find((s) => s.id === "calcite")!, standard: { gibbsJPerMol: -1e6, entropyJPerMolK: 90 } }],
    };
    try {
      speciesEnthalpyResolver(bare, 298.15)("calcite");
      expect.unreachable();
    } catch (caught) {
      expect((caught as SpeciesEnthalpyFailure).detail).toMatchObject({ code: "missing_enthalpy", speciesId: "calcite" });
    }
  });
});
