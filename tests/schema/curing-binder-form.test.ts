import { describe, it, expect } from "vitest";
import { curingBinderFormSchema, firstCuringBinderFormIssue } from "../../lib/schema/curing-binder-form";
import { curingInputFromBinderForm } from "../../lib/curing/binder-form-input";

const valid = {
  element: { thicknessM: 0.5 },
  concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 38 },
  placementTemperatureC: 20,
  ambient: { kind: "constant", temperatureC: 15 },
  binder: { cement: { kind: "preset", presetId: "en197-cem-i" } },
};

function issueOf(raw: unknown) {
  const parsed = curingBinderFormSchema.safeParse(raw);
  if (parsed.success) throw new Error("expected a failure");
  return firstCuringBinderFormIssue(parsed.error);
}

describe("the binder form of the curing input (schema)", () => {
  it("accepts the assessment's cement and supplementary materials with the curing fields, and fills the defaults", () => {
    const parsed = curingBinderFormSchema.safeParse({ ...valid, binder: { ...valid.binder, supplementaryMaterials: [{ type: "limestone", massPercentOfBinder: 10, composition: { kind: "preset", presetId: "limestone-typical" } }] } });
    if (!parsed.success) throw new Error(JSON.stringify(parsed.error.issues));
    expect(parsed.data.binder.supplementaryMaterials).toHaveLength(1);
    expect(parsed.data.faces.a.cover).toBe("exposed");
    expect(parsed.data).not.toHaveProperty("cement");
  });

  it("names an unknown key of binder or binder.heatCalculation by its own path", () => {
    expect(issueOf({ ...valid, binder: { ...valid.binder, slag: 30 } })).toEqual({ field: "binder.slag", message: "binder allows only cement, supplementaryMaterials, heatCalculation (got slag)" });
    expect(issueOf({ ...valid, binder: { ...valid.binder, heatCalculation: { temperature: 20 } } }).field).toBe("binder.heatCalculation.temperature");
  });

  it("names the field and its limit for the heat calculation and the curing fields", () => {
    expect(issueOf({ ...valid, binder: { ...valid.binder, heatCalculation: { points: 2 } } })).toEqual({ field: "binder.heatCalculation.points", message: "binder.heatCalculation.points must be between 4 and 40" });
    expect(issueOf({ ...valid, placementTemperatureC: 60 })).toEqual({ field: "placementTemperatureC", message: "placementTemperatureC must be between 0 and 45 °C" });
    expect(issueOf({ ...valid, binder: "CEM I" })).toEqual({ field: "binder", message: "binder must be an object with cement and supplementaryMaterials" });
  });

  it("keeps the curing input's cross-field checks (a two-faced element needs faces.b)", () => {
    expect(issueOf({ ...valid, element: { thicknessM: 0.5, geometry: "two-faces" } })).toEqual({ field: "faces.b", message: "faces.b is required when element.geometry is two-faces" });
  });

  it("is checked before the heat curve is computed: a bad curing field fails at once, naming it", () => {
    const converted = curingInputFromBinderForm({ ...valid, ambient: { kind: "constant", temperatureC: 80 } });
    expect(converted).toEqual({ ok: false, error: { code: "invalid-input", field: "ambient.temperatureC", message: "ambient.temperatureC must be between -40 and 50 °C" } });
  });
});
