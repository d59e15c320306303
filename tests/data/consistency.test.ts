import { describe, it, expect } from "vitest";
import { formationConsistencyJPerMol } from "../../lib/data/consistency";
import { loadDataset } from "../../lib/data/load-dataset";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const withEnthalpy = loaded.value.species.filter((s) => s.standard?.enthalpyJPerMol !== undefined);

describe("formationConsistencyJPerMol", () => {
  it("is zero for CODATA water, whose ΔfG° the table derives from ΔfH° and S°", () => {
    // CODATA Key Values (Cox et al. 1989), from memory: ΔfH° −285.830 kJ/mol, S° 69.95 J/(mol K), ΔfG° −237.140 kJ/mol.
    const residual = formationConsistencyJPerMol({
      elements: { H: 2, O: 1 },
      charge: 0,
      standard: { gibbsJPerMol: -237140, enthalpyJPerMol: -285830, entropyJPerMolK: 69.95 },
    });
    expect(Math.abs(residual ?? Infinity)).toBeLessThan(20);
  });

  it("detects a kilojoule-scale error in ΔfG°", () => {
    const residual = formationConsistencyJPerMol({
      elements: { H: 2, O: 1 },
      charge: 0,
      standard: { gibbsJPerMol: -239140, enthalpyJPerMol: -285830, entropyJPerMolK: 69.95 },
    });
    expect(residual).toBeCloseTo(-2000, -1);
  });

  it("returns undefined without an enthalpy", () => {
    expect(formationConsistencyJPerMol({ elements: { H: 2, O: 1 }, charge: 0, standard: { gibbsJPerMol: 0, entropyJPerMolK: 0 } })).toBeUndefined();
  });

  it("covers every starter entry that has ΔfH°", () => {
    expect(withEnthalpy.length).toBeGreaterThanOrEqual(18);
  });

  // Gibbs–Helmholtz at 298.15 K with CODATA element entropies (Cox et al. 1989): every tabulated set should
  // agree to within about 1 kJ/mol (common practice for internally consistent compilations).
  it.each(withEnthalpy.map((s) => [s.id, s] as const))("holds within 1 kJ/mol for %s", (_id, species) => {
    const residual = formationConsistencyJPerMol(species);
    expect(residual).toBeDefined();
    expect(Math.abs(residual!)).toBeLessThanOrEqual(1000);
  });
});
