import { describe, it, expect } from "vitest";
import { fieldId, flattenFormErrors, inputPathFor, withoutUnionMessageBesideBounds } from "../../../components/form/form-errors";

describe("form error flattening", () => {
  it("lists nested and array errors with dotted paths, array-level errors at the array", () => {
    const errors = {
      mix: { waterBinderRatio: { type: "too_big", message: "waterBinderRatio must be between 0.25 and 0.80" } },
      binder: { supplementaryMaterials: { root: { message: "sum too large" }, 0: { type: { message: "bad type" } } } },
    };
    expect(flattenFormErrors(errors)).toEqual([
      { path: "mix.waterBinderRatio", message: "waterBinderRatio must be between 0.25 and 0.80" },
      { path: "binder.supplementaryMaterials", message: "sum too large" },
      { path: "binder.supplementaryMaterials.0.type", message: "bad type" },
    ]);
  });

  it("makes DOM ids from paths and links derived fields to the field typed", () => {
    expect(fieldId("binder.supplementaryMaterials.0.type")).toBe("f-binder-supplementaryMaterials-0-type");
    expect(inputPathFor("curing.thermal.concrete.waterBinderRatio")).toBe("mix.waterBinderRatio");
    expect(inputPathFor("mix.waterBinderRatio")).toBe("mix.waterBinderRatio");
  });
});

describe("a union field's message beside its bounds", () => {
  it("is dropped when a bound has its own error, and kept otherwise", () => {
    const both = { exposure: { serviceTemperatureC: { message: "serviceTemperatureC must be a number in °C", type: "invalid_type", minC: { message: "serviceTemperatureC.minC must be a number in °C", type: "invalid_type" } } } };
    const cleaned = withoutUnionMessageBesideBounds(both, "exposure.serviceTemperatureC");
    expect(cleaned.exposure.serviceTemperatureC).toEqual({ minC: { message: "serviceTemperatureC.minC must be a number in °C", type: "invalid_type" } });
    expect(both.exposure.serviceTemperatureC.message).toBe("serviceTemperatureC must be a number in °C");
    const single = { exposure: { serviceTemperatureC: { message: "serviceTemperatureC must be at most 80 °C", type: "too_big" } } };
    expect(withoutUnionMessageBesideBounds(single, "exposure.serviceTemperatureC")).toBe(single);
    expect(withoutUnionMessageBesideBounds({}, "exposure.serviceTemperatureC")).toEqual({});
  });
});
