import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  powersPasteFractions,
  powersCapillaryPorosity,
  powersGelPorosity,
  powersNonEvaporableWaterGPerGCement,
  powersChemicalShrinkageCm3PerGCement,
  minimumWaterCementRatioForFullHydration,
  powersMaximumDegreeOfHydration,
} from "../../lib/cement/powers-model";

describe("Powers–Brownyard paste model (Jensen & Hansen 2001 form)", () => {
  it("gives the capillary porosity of a fully hydrated w/c 0.5 paste within 3 points of Powers' textbook formula", () => {
    // Neville, Properties of Concrete (4th ed., 1995, ch. 6), after Powers: capillary porosity
    // = (w/c − 0.36 α)/(w/c + 0.32) = (0.5 − 0.36)/(0.82) = 0.171 at α = 1 (from memory).
    const neville = (0.5 - 0.36) / (0.5 + 0.32);
    expect(Math.abs(powersCapillaryPorosity(0.5, 1) - neville)).toBeLessThan(0.03);
  });

  it("gives a gel porosity of about 28 % (Powers & Brownyard 1947; Taylor 1997 §8.2, from memory)", () => {
    expect(powersGelPorosity()).toBeGreaterThan(0.27);
    expect(powersGelPorosity()).toBeLessThan(0.29);
  });

  it("implies about 0.23 g non-evaporable water per g cement (Powers & Brownyard 1947, from memory)", () => {
    expect(powersNonEvaporableWaterGPerGCement()).toBeCloseTo(0.23, 2);
  });

  it("gives a chemical shrinkage of 0.06–0.07 cm³/g of fully hydrated Portland cement (Powers 1935; Taylor 1997 §8.4, from memory)", () => {
    const shrinkage = powersChemicalShrinkageCm3PerGCement(1);
    expect(shrinkage).toBeGreaterThan(0.06);
    expect(shrinkage).toBeLessThan(0.07);
  });

  it("needs w/c ≈ 0.42 sealed and ≈ 0.36 water-cured for full hydration (Powers 1948; Neville ch. 6, from memory)", () => {
    expect(minimumWaterCementRatioForFullHydration("sealed")).toBeCloseTo(0.42, 2);
    expect(minimumWaterCementRatioForFullHydration("saturated")).toBeCloseTo(0.36, 2);
    expect(powersMaximumDegreeOfHydration(0.3, "sealed")).toBeCloseTo(0.3 / 0.419, 2);
  });

  it("keeps the five volume fractions summing to the initial paste volume at any w/c and degree (property test)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (wc, alpha) => {
        const f = powersPasteFractions(wc, alpha);
        expect(f.capillaryWater + f.gelWater + f.gelSolid + f.chemicalShrinkage + f.unreactedCement).toBeCloseTo(1, 12);
      }),
    );
  });
});
