import { describe, expect, it } from "vitest";
import { isPhaseInputPath, readableInputValue } from "../../lib/report/input-value-label";

describe("readable input values", () => {
  it("names the phases of the suppressed and allowed lists (C-S-H, Monosulfate (14 H2O): common practice)", () => {
    expect(readableInputValue("options.suppressedPhases.0", "monosulfate-14")).toBe("Monosulfate (14 H2O)");
    expect(readableInputValue("options.allowedPhases.2", "csh")).toBe("C-S-H");
    expect(readableInputValue("options.suppressedPhases", ["csh", "friedel-salt"])).toEqual(["C-S-H", "Friedel's salt"]);
  });

  it("leaves every other value as it is, a phase-like text included", () => {
    expect(readableInputValue("binder.cement.presetId", "csh")).toBe("csh");
    expect(readableInputValue("options.suppressedPhases", [])).toEqual([]);
    expect(readableInputValue("mix.waterBinderRatio", 0.45)).toBe(0.45);
    expect(isPhaseInputPath("options.suppressedPhasesX.0")).toBe(false);
    expect(isPhaseInputPath("xoptions.allowedPhases.0")).toBe(false);
  });
});
