import { describe, it, expect } from "vitest";
import { binderInputSchema, type BinderInputRaw } from "../../lib/schema/binder-input";
import { resolveBinder } from "../../lib/cement/resolve-binder";
import { reactionDegreesAtAges, reactionDegreesForInput } from "../../lib/cement/reaction-degrees";
import { parrotKillohDegrees } from "../../lib/cement/parrot-killoh";
import { scmReactionDegree } from "../../lib/cement/scm-reaction";
import { powersMaximumDegreeOfHydration } from "../../lib/cement/powers-model";

function binderOf(raw: BinderInputRaw) {
  const result = resolveBinder(binderInputSchema.parse(raw));
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}
const mix = { waterBinderRatio: 0.45, binderContentKgPerM3: 360 };

describe("reaction degrees of a binder", () => {
  it("passes entered degrees through unchanged, limestone defaulting to wholly reactive", () => {
    const binder = binderOf({
      cement: { kind: "preset", presetId: "astm-c595-type-it" },
      mix,
      age: { mode: "degrees", clinkerDegrees: { alite: 0.8, belite: 0.4, aluminate: 0.9, ferrite: 0.6 }, scmDegrees: { slag: 0.35 } },
    });
    const degrees = reactionDegreesForInput(binder);
    expect(degrees.clinker).toEqual({ alite: 0.8, belite: 0.4, aluminate: 0.9, ferrite: 0.6 });
    expect(degrees.scm).toEqual({ slag: 0.35, limestone: 1 });
  });

  it("uses Parrot–Killoh with w/b and the preset fineness, and the SCM curves, at the binder's age", () => {
    const binder = binderOf({ cement: { kind: "preset", presetId: "en197-cem-iii-a" }, mix, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } });
    const degrees = reactionDegreesForInput(binder);
    const expectedAlite = parrotKillohDegrees([28], { waterCementRatio: 0.45, blaineM2PerKg: 450, curingTemperatureC: 20 }).alite[0];
    expect(degrees.clinker.alite).toBe(expectedAlite);
    expect(degrees.scm.slag).toBe(scmReactionDegree("slag", 28, 20).degree);
    expect(degrees.scmUncertaintyAbsolute.slag).toBeGreaterThan(0);
  });

  it("gives a timeline of 40 ages from 1 hour to 10 years that never goes backwards", () => {
    const binder = binderOf({ cement: { kind: "preset", presetId: "en197-cem-v-a" }, mix, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } });
    const ages = Array.from({ length: 40 }, (_, i) => (1 / 24) * Math.pow(3652.5 * 24, i / 39));
    const timeline = reactionDegreesAtAges(binder, ages, 20);
    expect(timeline).toHaveLength(40);
    for (let i = 1; i < timeline.length; i++) {
      expect(timeline[i].clinker.alite).toBeGreaterThanOrEqual(timeline[i - 1].clinker.alite);
      expect(timeline[i].scm.slag ?? 0).toBeGreaterThanOrEqual(timeline[i - 1].scm.slag ?? 0);
      expect(timeline[i].scm["siliceous-fly-ash"] ?? 0).toBeGreaterThanOrEqual(timeline[i - 1].scm["siliceous-fly-ash"] ?? 0);
    }
    expect(timeline[39].warnings.map((w) => w.code)).toContain("scm_model_extrapolated");
  });

  describe("the water limit of a low-w/b paste (Powers & Brownyard 1947; Jensen & Hansen 2001, Cem. Concr. Res. 31, 647)", () => {
    // Powers: a sealed paste hydrates at most to (w/c)/0.42 (0.595 at w/c 0.25; the coefficients of lib/data/binders/powers-model.json).
    const dryMix = { waterBinderRatio: 0.25, binderContentKgPerM3: 500 };

    it("holds each clinker phase at (w/b)/0.42 where Parrot–Killoh's own water factor allows more, and says so", () => {
      const binder = binderOf({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix: dryMix, age: { mode: "age", ageDays: 3650, curingTemperatureC: 20 } });
      const unlimited = parrotKillohDegrees([3650], { waterCementRatio: 0.25, blaineM2PerKg: binder.cement.blaineM2PerKg, curingTemperatureC: 20 });
      const maximum = powersMaximumDegreeOfHydration(0.25, "sealed");
      expect(maximum).toBeCloseTo(0.595, 2);
      expect(unlimited.alite[0]).toBeGreaterThan(maximum + 0.05); // the case the limit exists for
      const degrees = reactionDegreesForInput(binder);
      for (const phase of ["alite", "belite", "aluminate", "ferrite"] as const) {
        expect(degrees.clinker[phase]).toBeCloseTo(Math.min(unlimited[phase][0], maximum), 12);
      }
      const warning = degrees.warnings.find((w) => w.code === "clinker_reaction_limited_by_water");
      expect(warning).toMatchObject({ waterBinderRatio: 0.25, maximumDegree: maximum });
      expect(warning && "phases" in warning ? warning.phases.map((p) => p.phase) : []).toContain("alite");
    });

    it("holds the reactive part of a slag too, but not limestone, which enters the equilibrium whole", () => {
      const binder = binderOf({ cement: { kind: "preset", presetId: "en197-cem-iii-b" }, mix: { waterBinderRatio: 0.3, binderContentKgPerM3: 450 }, age: { mode: "age", ageDays: 3650, curingTemperatureC: 40 } });
      const maximum = powersMaximumDegreeOfHydration(0.3, "sealed");
      expect(scmReactionDegree("slag", 3650, 40).degree).toBeGreaterThan(maximum);
      expect(reactionDegreesForInput(binder).scm.slag).toBe(maximum);
      const withLimestone = binderOf({ cement: { kind: "preset", presetId: "en197-cem-ii-a-ll" }, mix: dryMix, age: { mode: "age", ageDays: 3650, curingTemperatureC: 20 } });
      expect(reactionDegreesForInput(withLimestone).scm.limestone).toBe(1);
    });

    it("leaves a paste with water for full hydration (w/b 0.45) and entered degrees unchanged", () => {
      const binder = binderOf({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: { mode: "age", ageDays: 3650, curingTemperatureC: 20 } });
      const degrees = reactionDegreesForInput(binder);
      expect(degrees.clinker.alite).toBe(parrotKillohDegrees([3650], { waterCementRatio: 0.45, blaineM2PerKg: binder.cement.blaineM2PerKg, curingTemperatureC: 20 }).alite[0]);
      expect(degrees.warnings.map((w) => w.code)).not.toContain("clinker_reaction_limited_by_water");
      const entered = binderOf({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix: dryMix, age: { mode: "degrees", clinkerDegrees: { alite: 0.9, belite: 0.8, aluminate: 1, ferrite: 0.9 } } });
      expect(reactionDegreesForInput(entered).clinker.alite).toBe(0.9);
    });
  });
});
