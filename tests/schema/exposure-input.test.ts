import { describe, it, expect } from "vitest";
import { z } from "zod";
import { exposureInput, parseCuringHistoryInput, parseExposureInput, serviceTemperatureRangeC } from "../../lib/schema/exposure-input";

describe("the exposure input", () => {
  it("accepts a full groundwater exposure and fills the defaults", () => {
    const r = parseExposureInput({
      sulfateMgPerL: 3200,
      sulfateCation: "Na",
      waterPH: 6.8,
      chlorideMgPerL: 120,
      serviceTemperatureC: { minC: 5, maxC: 15 },
      relativeHumidityPercent: 95,
      wetting: "permanently-wet",
      freezing: { exposed: false },
      coverMm: 50,
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.co2Percent).toBe(0.04);
    expect(r.value.reinforced).toBe(true);
    expect(serviceTemperatureRangeC(r.value)).toEqual({ minC: 5, maxC: 15 });
  });

  it("reads a single service temperature as a range of one value", () => {
    const r = parseExposureInput({ serviceTemperatureC: 20 });
    expect(r.ok && serviceTemperatureRangeC(r.value)).toEqual({ minC: 20, maxC: 20 });
  });

  it("names the field and the limit when a value is out of range", () => {
    const cases: Array<[unknown, string, RegExp]> = [
      [{ sulfateMgPerL: -1 }, "exposure.sulfateMgPerL", /sulfateMgPerL must be at least 0 mg\/L/],
      [{ relativeHumidityPercent: 101 }, "exposure.relativeHumidityPercent", /at most 100 %/],
      [{ waterPH: 15 }, "exposure.waterPH", /waterPH must be at most 14/],
      [{ coverMm: 0 }, "exposure.coverMm", /coverMm must be greater than 0 mm/],
      [{ co2Percent: "a lot" }, "exposure.co2Percent", /co2Percent must be a number/],
      [{ wetting: "damp" }, "exposure.wetting", /wetting must be one of/],
      [{ sulfateCation: "Fe" }, "exposure.sulfateCation", /sulfateCation must be one of/],
      [{ serviceTemperatureC: { minC: 30, maxC: 10 } }, "exposure.serviceTemperatureC.minC", /must not exceed/],
    ];
    for (const [input, field, message] of cases) {
      const r = parseExposureInput(input);
      expect(r.ok, JSON.stringify(input)).toBe(false);
      if (r.ok) continue;
      expect(r.error.field).toBe(field);
      expect(r.error.message).toMatch(message);
    }
  });

  it("rejects unknown fields by name, so typing errors do not pass silently", () => {
    const r = parseExposureInput({ sulphateMgPerL: 500 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/unknown field\(s\) sulphateMgPerL/);
  });

  it("says so when the exposure is not an object", () => {
    const r = parseExposureInput(null);
    expect(!r.ok && r.error).toEqual({ code: "invalid-input", field: "exposure", message: "exposure must be an object" });
  });

  it("rejects soil sulfate given in two units at once", () => {
    const r = parseExposureInput({ soilSulfateMgPerKg: 3000, soilSulfateMassPercent: 0.3 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/either/);
  });

  it("checks the curing history's maximum temperature", () => {
    expect(parseCuringHistoryInput({ maxTemperatureC: 85 }).ok).toBe(true);
    const r = parseCuringHistoryInput({ maxTemperatureC: 150 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.field).toBe("curing.maxTemperatureC");
      expect(r.error.message).toMatch(/at most 120 °C/);
    }
    const missing = parseCuringHistoryInput({});
    expect(!missing.ok && missing.error.message).toMatch(/curing.maxTemperatureC is required/);
  });

  it("can be printed as a JSON Schema for the command line's schema command", () => {
    const schema = z.toJSONSchema(exposureInput, { io: "input" }) as { properties: Record<string, unknown> };
    expect(Object.keys(schema.properties)).toEqual(expect.arrayContaining(["sulfateMgPerL", "wetting", "co2Percent", "coverMm"]));
  });
});
