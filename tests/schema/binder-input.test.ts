import { describe, it, expect } from "vitest";
import { binderInputSchema, formatIssues } from "../../lib/schema/binder-input";

// These checks test the input contract (field names and limits stated in issue 4), not science.
const valid = {
  cement: { kind: "preset", presetId: "en197-cem-i" },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350, aggregateVolume: { unit: "litresPerM3", value: 700 } },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
};

function issuesOf(input: unknown) {
  const result = binderInputSchema.safeParse(input);
  if (result.success) return [];
  return formatIssues(result.error);
}

describe("binder input schema", () => {
  it("accepts a preset cement with a mix and an age, defaulting to no supplementary materials", () => {
    const result = binderInputSchema.safeParse(valid);
    expect(result.success).toBe(true);
    if (result.success) expect(result.data.supplementaryMaterials).toEqual([]);
  });

  it("names waterBinderRatio and its limits 0.25 and 0.80 when it is out of range", () => {
    expect(issuesOf({ ...valid, mix: { ...valid.mix, waterBinderRatio: 0.9 } })).toEqual([
      { path: "mix.waterBinderRatio", message: "waterBinderRatio must be between 0.25 and 0.80" },
    ]);
    expect(issuesOf({ ...valid, mix: { ...valid.mix, waterBinderRatio: 0.2 } })[0].message).toBe("waterBinderRatio must be between 0.25 and 0.80");
  });

  it("names binderContentKgPerM3 and its limits 200 and 700", () => {
    expect(issuesOf({ ...valid, mix: { ...valid.mix, binderContentKgPerM3: 150 } })[0]).toEqual({
      path: "mix.binderContentKgPerM3",
      message: "binderContentKgPerM3 must be between 200 and 700 kg/m³",
    });
  });

  it("limits age to 1 hour to 10 years and curing temperature to 0–100 °C", () => {
    const tooYoung = issuesOf({ ...valid, age: { mode: "age", ageDays: 0.01, curingTemperatureC: 20 } });
    expect(tooYoung[0].path).toBe("age.ageDays");
    expect(tooYoung[0].message).toContain("1 hour");
    const tooHot = issuesOf({ ...valid, age: { mode: "age", ageDays: 7, curingTemperatureC: 120 } });
    expect(tooHot[0]).toEqual({ path: "age.curingTemperatureC", message: "age.curingTemperatureC must be between 0 and 100 °C" });
  });

  it("requires the four main oxides of a cement analysis and rejects free lime above CaO", () => {
    const issues = issuesOf({ ...valid, cement: { kind: "oxides", oxidesMassPercent: { CaO: 60, SiO2: 21, freeLime: 61 } } });
    expect(issues.map((issue) => issue.path)).toEqual(
      expect.arrayContaining(["cement.oxidesMassPercent.Al2O3", "cement.oxidesMassPercent.Fe2O3", "cement.oxidesMassPercent.freeLime"]),
    );
  });

  it("rejects an unknown cement kind and an unknown preset id with the allowed values", () => {
    expect(issuesOf({ ...valid, cement: { kind: "bag" } })[0].message).toBe("cement.kind must be one of oxides, phases, preset");
    expect(issuesOf({ ...valid, cement: { kind: "preset", presetId: "nope" } })[0].message).toContain("en197-cem-iii-a");
  });

  it("requires a degree for every supplementary material when degrees are entered directly", () => {
    const issues = issuesOf({
      ...valid,
      supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 40, composition: { kind: "preset", presetId: "slag-typical" } }],
      age: { mode: "degrees", clinkerDegrees: { alite: 0.8, belite: 0.4, aluminate: 0.8, ferrite: 0.6 } },
    });
    expect(issues).toEqual([{ path: "age.scmDegrees.slag", message: "age.scmDegrees.slag is required (0-1) for supplementaryMaterials[0]" }]);
  });

  it("rejects supplementary materials summing above 95 % of binder and a repeated type", () => {
    const slag = { type: "slag", massPercentOfBinder: 60, composition: { kind: "preset", presetId: "slag-typical" } };
    const paths = issuesOf({ ...valid, supplementaryMaterials: [slag, slag] }).map((issue) => issue.path);
    expect(paths).toEqual(expect.arrayContaining(["supplementaryMaterials", "supplementaryMaterials.1.type"]));
  });

  it("rejects further supplementary materials with a blended cement preset, naming what the preset holds and what to choose instead (EN 197-1 CEM III/A: 36-65 % slag)", () => {
    const issues = issuesOf({
      ...valid,
      cement: { kind: "preset", presetId: "en197-cem-iii-a" },
      supplementaryMaterials: [{ type: "siliceous-fly-ash", massPercentOfBinder: 10, composition: { kind: "preset", presetId: "siliceous-fly-ash-typical" } }],
    });
    expect(issues).toEqual([
      {
        path: "supplementaryMaterials",
        message:
          "supplementaryMaterials must be empty with the blended cement CEM III/A 42.5 N (EN 197-1), which already contains slag 50 % of the binder; to add your own, choose a Portland cement type (CEM I or ASTM C150) or give the cement's oxide analysis",
      },
    ]);
    expect(issuesOf({ ...valid, cement: { kind: "preset", presetId: "en197-cem-iii-a" } })).toEqual([]);
  });

  it("requires reactiveFraction with an oxide analysis of a supplementary material", () => {
    const issues = issuesOf({
      ...valid,
      supplementaryMaterials: [{ type: "silica-fume", massPercentOfBinder: 10, composition: { kind: "oxides", oxidesMassPercent: { SiO2: 95 } } }],
    });
    expect(issues[0].path).toBe("supplementaryMaterials.0.reactiveFraction");
  });

  it("says a field is required rather than printing a type error when it is missing", () => {
    expect(issuesOf({ ...valid, mix: { waterBinderRatio: 0.5 } })).toEqual([{ path: "mix.binderContentKgPerM3", message: "binderContentKgPerM3 is required" }]);
  });
});
