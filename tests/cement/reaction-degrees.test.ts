import { describe, it, expect } from "vitest";
import { binderInputSchema, type BinderInputRaw } from "../../lib/schema/binder-input";
import { resolveBinder } from "../../lib/cement/resolve-binder";
import { reactionDegreesAtAges, reactionDegreesForInput } from "../../lib/cement/reaction-degrees";
import { parrotKillohDegrees } from "../../lib/cement/parrot-killoh";
import { scmReactionDegree } from "../../lib/cement/scm-reaction";

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
});
