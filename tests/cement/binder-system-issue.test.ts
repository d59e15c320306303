import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { binderSystemIssue } from "../../lib/cement/binder-system-issue";

const mix = { waterBinderRatio: 0.5, binderContentKgPerM3: 350 };
const age = { mode: "age", ageDays: 28, curingTemperatureC: 20 } as const;

function issueFor(oxidesMassPercent: Record<string, number>) {
  const system = binderSystemFromInput({ cement: { kind: "oxides", oxidesMassPercent }, mix, age });
  if (system.ok || system.error.code === "invalid_input") throw new Error("expected a binder-model error");
  return binderSystemIssue(system.error);
}

describe("binder-model errors told as field issues", () => {
  it("names the oxide analysis and the missing CaO when it cannot form alite (a slag-like analysis entered as a cement)", () => {
    // CaO/SiO2 about 1.2 by mass: below the 2 CaO per SiO2 of belite (mole ratio), common practice for a slag, not a clinker.
    const issue = issueFor({ CaO: 42, SiO2: 35, Al2O3: 11, Fe2O3: 0.5, MgO: 8, SO3: 1 });
    expect(issue.path).toBe("cement.oxidesMassPercent");
    expect(issue.message).toMatch(/^cement\.oxidesMassPercent: the analysis has too little CaO for its SiO2/);
    expect(issue.message).toMatch(/the alite would be −\d+\.\d\d g per 100 g/);
  });

  it("names the excess CaO and the freeLime field when the analysis holds more lime than C3S can", () => {
    const issue = issueFor({ CaO: 75, SiO2: 17, Al2O3: 3, Fe2O3: 2, SO3: 2 });
    expect(issue.message).toContain("more than 3 CaO per SiO2");
    expect(issue.message).toContain("freeLime");
  });

  it("tells the blended-preset and SCM-total errors of the preset expansion in the schema's words", () => {
    expect(binderSystemIssue({ code: "preset_already_blended", presetId: "en197-cem-ii-b-s", field: "supplementaryMaterials" })).toEqual({
      path: "supplementaryMaterials",
      message:
        "supplementaryMaterials must be empty with the blended cement CEM II/B-S 42.5 N (EN 197-1), which already contains slag 30 % of the binder; to add your own, choose a Portland cement type (CEM I or ASTM C150) or give the cement's oxide analysis",
    });
    expect(binderSystemIssue({ code: "scm_total_exceeds_limit", totalMassPercent: 97, maxMassPercent: 95 }).message).toBe("supplementaryMaterials: massPercentOfBinder must sum to at most 95 (got 97)");
  });
});
