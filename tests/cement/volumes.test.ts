import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  initialPasteVolumeCm3,
  chemicalShrinkageCm3,
  waterFilledAndEmptyFraction,
  classifyPoreSpace,
  volumeBalance,
  per100gToPerM3,
  concreteVolumeCheck,
  mixingWaterDensityGPerCm3,
} from "../../lib/cement/volumes";
import { powersPasteFractions, powersCapillaryPorosity, powersGelPorosity } from "../../lib/cement/powers-model";
import { bulkComposition } from "../../lib/cement/bulk-composition";
import { resolveBinder } from "../../lib/cement/resolve-binder";
import { reactionDegreesForInput } from "../../lib/cement/reaction-degrees";
import { binderInputSchema } from "../../lib/schema/binder-input";

describe("paste and concrete volume bookkeeping", () => {
  // A Powers paste (Jensen & Hansen 2001 fractions) of 100 g cement, ρc = 3.15, w/c 0.5, α = 0.8, ρw = 1.
  const initial = 100 / 3.15 + 50;
  const f = powersPasteFractions(0.5, 0.8);
  const hydrates = (f.gelSolid + f.gelWater) * initial;
  const poreSolution = f.capillaryWater * initial;
  const unreacted = f.unreactedCement * initial;

  it("recovers Powers' chemical shrinkage 0.20 (1 − p) α from the reactant and product volumes (Jensen & Hansen 2001)", () => {
    const shrinkage = chemicalShrinkageCm3({ reactedBinderVolumeCm3: (0.8 * 100) / 3.15, mixingWaterVolumeCm3: 50, hydrateVolumeCm3: hydrates, poreSolutionVolumeCm3: poreSolution });
    expect(shrinkage / initial).toBeCloseTo(f.chemicalShrinkage, 12);
    // Hand calculation: 0.20 × 0.8 × 100 g / 3.15 g/cm³ = 5.08 cm³ per 100 g cement.
    expect(shrinkage).toBeCloseTo(5.08, 2);
  });

  it("gives the capillary porosity of Powers' model from pore solution and shrinkage space when the hydrates hold their gel water", () => {
    const shrinkage = f.chemicalShrinkage * initial;
    expect(waterFilledAndEmptyFraction(poreSolution, shrinkage, initial)).toBeCloseTo(powersCapillaryPorosity(0.5, 0.8), 12);
  });

  it("recovers Powers' capillary and gel porosity when the gel water is in the pore solution and the gel pores are attached to the gel solid (Jensen & Hansen 2001 fractions)", () => {
    // The same Powers paste as an equilibrium calculation sees it: hydrates = gel solid only, the gel water in solution.
    const shrinkage = f.chemicalShrinkage * initial;
    const solutionWithGelWater = (f.capillaryWater + f.gelWater) * initial;
    const classes = classifyPoreSpace(solutionWithGelWater, shrinkage, f.gelSolid * initial, powersGelPorosity(), initial);
    expect(classes.capillaryPorosityFraction).toBeCloseTo(powersCapillaryPorosity(0.5, 0.8), 12);
    expect(classes.gelPorosityFraction).toBeCloseTo(f.gelWater, 12);
    expect(waterFilledAndEmptyFraction(solutionWithGelWater, shrinkage, initial)).toBeCloseTo(powersCapillaryPorosity(0.5, 0.8) + f.gelWater, 12);
  });

  it("never gives more gel pores than the pore space and always splits it exactly (property test)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        fc.double({ min: 0, max: 0.6, noNaN: true }),
        (solution, shrinkage, carrier, gelPorosity) => {
          const classes = classifyPoreSpace(solution, shrinkage, carrier, gelPorosity, 100);
          expect(classes.gelPoreVolumeCm3).toBeGreaterThanOrEqual(0);
          expect(classes.gelPoreVolumeCm3).toBeLessThanOrEqual(solution + shrinkage + 1e-12);
          expect(classes.capillaryPoreVolumeCm3).toBeGreaterThanOrEqual(-1e-12);
          expect(classes.gelPoreVolumeCm3 + classes.capillaryPoreVolumeCm3).toBeCloseTo(solution + shrinkage, 10);
        },
      ),
    );
  });

  it("closes the volume balance of a consistent paste and flags one that is 1 % off (tolerance 0.5 %)", () => {
    const shrinkage = f.chemicalShrinkage * initial;
    expect(volumeBalance({ hydrates, unreacted }, poreSolution, shrinkage, initial).withinTolerance).toBe(true);
    const off = volumeBalance({ hydrates: hydrates + 0.01 * initial, unreacted }, poreSolution, shrinkage, initial);
    expect(off.withinTolerance).toBe(false);
    expect(off.relativeResidual).toBeCloseTo(0.01, 9);
  });

  it("scales per 100 g binder to per m³: 10 cm³/100 g at 350 kg/m³ is 35 L/m³ (hand calculation)", () => {
    expect(per100gToPerM3(10, 350)).toBeCloseTo(35, 12);
  });

  it("adds paste, aggregate and air to about 1 m³ for a consistent mix and warns for an inconsistent one", () => {
    // 350 kg binder at 3.15 g/cm³ = 111.1 L, 175 kg water = 175 L: paste 286.1 L (hand calculation).
    const pastePer100g = initialPasteVolumeCm3(100 / 3.15, 50, 1.0);
    const good = concreteVolumeCheck(pastePer100g, 350, { unit: "litresPerM3", value: 694 }, { unit: "fraction", value: 0.02 });
    expect(good.pasteLitresPerM3).toBeCloseTo(286.1, 1);
    expect(good.warning).toBeUndefined();
    expect(concreteVolumeCheck(pastePer100g, 350, { unit: "litresPerM3", value: 600 }, undefined).warning?.code).toBe("mix_volume_mismatch");
  });

  it("uses a mixing-water density of 0.9982 g/cm³ at 20 °C (Kell 1975; CRC Handbook)", () => {
    expect(mixingWaterDensityGPerCm3(20)).toBeCloseTo(0.9982, 4);
  });

  it("keeps the binder volume of a bulk composition equal to its reacted plus unreacted volumes", () => {
    const input = binderInputSchema.parse({ cement: { kind: "preset", presetId: "en197-cem-iii-a" }, mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 340 }, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } });
    const binder = resolveBinder(input);
    if (!binder.ok) throw new Error("resolve failed");
    const c = bulkComposition(binder.value, reactionDegreesForInput(binder.value));
    if (!c.ok) throw new Error("composition failed");
    expect(c.value.reactedBinderVolumeCm3 + c.value.unreactedVolumeCm3).toBeCloseTo(c.value.binderVolumeCm3, 10);
    // A CEM III/A (50 % slag at 2.90, clinker ≈ 3.1–3.2 g/cm³) has a mean density near 3.0 g/cm³ (Lothenbach, Scrivener & Hooton 2011).
    const meanDensity = 100 / c.value.binderVolumeCm3;
    expect(meanDensity).toBeGreaterThan(2.9);
    expect(meanDensity).toBeLessThan(3.1);
  });
});
