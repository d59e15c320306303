import { describe, it, expect } from "vitest";
import { binderSystemFromInput, binderTimeline, logarithmicAgesDays } from "../../lib/cement/binder-system";

const valid = {
  cement: { kind: "preset", presetId: "en197-cem-ii-b-s" },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 320 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
};

describe("binder system from raw input", () => {
  it("returns the field issues of invalid input as a typed error instead of throwing", () => {
    const result = binderSystemFromInput({ ...valid, mix: { waterBinderRatio: 1.2, binderContentKgPerM3: 320 } });
    expect(result).toEqual({ ok: false, error: { code: "invalid_input", issues: [{ path: "mix.waterBinderRatio", message: "waterBinderRatio must be between 0.25 and 0.80" }] } });
    expect(binderSystemFromInput("not an object").ok).toBe(false);
  });

  it("builds the bulk composition of a valid blended input, conserving mass to 1e-9", () => {
    const result = binderSystemFromInput(valid);
    if (!result.ok) throw new Error(JSON.stringify(result.error));
    const c = result.value.composition;
    expect(Math.abs(c.reactedMassG + c.unreactedMassG - 150) / 150).toBeLessThan(1e-9);
    expect(c.unreactedSolids.map((s) => s.id)).toContain("unreacted-slag");
  });

  it("gives a 40-point logarithmic timeline from 1 hour to 10 years whose reacted silicon never falls", () => {
    const system = binderSystemFromInput(valid);
    if (!system.ok) throw new Error("invalid");
    const ages = logarithmicAgesDays(1 / 24, 3652.5, 40);
    expect(ages[0]).toBeCloseTo(1 / 24, 12);
    expect(ages[39]).toBeCloseTo(3652.5, 9);
    const timeline = binderTimeline(system.value.binder, ages, 20);
    if (!timeline.ok) throw new Error("timeline failed");
    for (let i = 1; i < 40; i++) {
      expect(timeline.value[i].composition.reactedElementsMol.Si).toBeGreaterThanOrEqual(timeline.value[i - 1].composition.reactedElementsMol.Si);
    }
  });
});
