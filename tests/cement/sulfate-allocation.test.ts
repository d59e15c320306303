import { describe, it, expect } from "vitest";
import { allocateSulfate } from "../../lib/cement/sulfate-allocation";

describe("allocation of SO3 to alkali and calcium sulfates (Taylor 1997, Cement Chemistry §4.3)", () => {
  it("forms K2SO4 first, then Na2SO4, then CaSO4 with the rest", () => {
    // 3.0 % SO3 = 0.03747 mol; 0.94 % K2O = 0.00998 mol; 0.31 % Na2O = 0.00500 mol (molar masses 80.06, 94.20, 61.98 g/mol).
    const a = allocateSulfate(3.0, 0.94, 0.31);
    expect(a.arcaniteMol).toBeCloseTo(0.94 / 94.2, 5);
    expect(a.thenarditeMol).toBeCloseTo(0.31 / 61.98, 5);
    expect(a.calciumSulfateMol).toBeCloseTo(3.0 / 80.06 - 0.94 / 94.2 - 0.31 / 61.98, 5);
    expect(a.potassiumOxideInClinkerMol).toBeCloseTo(0, 12);
  });

  it("leaves the alkali in the clinker phases when SO3 is short", () => {
    const a = allocateSulfate(0.3, 0.94, 0.31);
    expect(a.calciumSulfateMol).toBe(0);
    expect(a.thenarditeMol).toBe(0);
    expect(a.potassiumOxideInClinkerMol).toBeCloseTo(0.94 / 94.2 - 0.3 / 80.06, 5);
    expect(a.sodiumOxideInClinkerMol).toBeCloseTo(0.31 / 61.98, 5);
  });
});
