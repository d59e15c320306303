import { oxideMolarMassGPerMol } from "./oxides";

/**
 * Allocation of SO3 in a cement analysis (Taylor 1997, Cement Chemistry, §4.3, modified Bogue calculation):
 * SO3 combines first with K2O as arcanite K2SO4, then with Na2O as thenardite Na2SO4, and the rest with CaO as
 * calcium sulfate. Alkali not combined as sulfate stays in solid solution in the clinker phases.
 * All quantities in mol per 100 g of analysis (inputs in mass %).
 */
export type SulfateAllocation = {
  arcaniteMol: number;
  thenarditeMol: number;
  calciumSulfateMol: number;
  /** K2O and Na2O left in the clinker phases, mol of oxide. */
  potassiumOxideInClinkerMol: number;
  sodiumOxideInClinkerMol: number;
};

export function allocateSulfate(so3MassPercent: number, k2oMassPercent: number, na2oMassPercent: number, alkaliSulfatesFirst = true): SulfateAllocation {
  const so3Mol = so3MassPercent / oxideMolarMassGPerMol("SO3");
  const k2oMol = k2oMassPercent / oxideMolarMassGPerMol("K2O");
  const na2oMol = na2oMassPercent / oxideMolarMassGPerMol("Na2O");
  const arcaniteMol = alkaliSulfatesFirst ? Math.min(k2oMol, so3Mol) : 0;
  const thenarditeMol = alkaliSulfatesFirst ? Math.min(na2oMol, so3Mol - arcaniteMol) : 0;
  return {
    arcaniteMol,
    thenarditeMol,
    calciumSulfateMol: so3Mol - arcaniteMol - thenarditeMol,
    potassiumOxideInClinkerMol: k2oMol - arcaniteMol,
    sodiumOxideInClinkerMol: na2oMol - thenarditeMol,
  };
}
