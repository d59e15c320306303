import { describe, it, expect } from "vitest";
import { belowSulfateClassesSentence, severeSulfateExposure, severityForSulfateClass } from "../../lib/advisory/sulfate-exposure";
import { parseExposureInput, type ExposureInputRaw } from "../../lib/schema/exposure-input";

function classOf(raw: ExposureInputRaw) {
  const parsed = parseExposureInput(raw);
  if (!parsed.ok) throw new Error(parsed.error.message);
  return severeSulfateExposure(parsed.value);
}

describe("the sulfate exposure class of the sulfate flags", () => {
  it("follows EN 206 Table 2 (XA1 from 200 mg/L, XA2 above 600) and ACI 318-19 Table 19.3.1.1 (S1 from 150 ppm, S2 from 1500)", () => {
    expect(classOf({ sulfateMgPerL: 100 })).toMatchObject({ any: false, severe: false, label: "no sulfate class" });
    expect(classOf({ sulfateMgPerL: 160 })).toMatchObject({ any: true, severe: false, label: "ACI 318 S1" });
    expect(classOf({ sulfateMgPerL: 400 })).toMatchObject({ any: true, severe: false, label: "EN 206 XA1, ACI 318 S1" });
    expect(classOf({ sulfateMgPerL: 1800 })).toMatchObject({ any: true, severe: true, label: "EN 206 XA2, ACI 318 S2" });
  });

  it("keeps a warning only in a severe class, caps it at a caution in XA1/S1, and makes every flag information without a class", () => {
    const none = classOf({ sulfateMgPerL: 100 });
    const mild = classOf({ sulfateMgPerL: 400 });
    const severe = classOf({ sulfateMgPerL: 1800 });
    expect((["info", "caution", "warning"] as const).map((s) => severityForSulfateClass(s, none))).toEqual(["info", "info", "info"]);
    expect((["info", "caution", "warning"] as const).map((s) => severityForSulfateClass(s, mild))).toEqual(["info", "caution", "caution"]);
    expect((["info", "caution", "warning"] as const).map((s) => severityForSulfateClass(s, severe))).toEqual(["info", "caution", "warning"]);
  });

  it("explains an information-only flag with the limits read from the standards' data files", () => {
    expect(belowSulfateClassesSentence(50)).toContain("The exposure's sulfate (50 mg/L in the water) is below the lowest sulfate classes (EN 206 Table 2 XA1 from 200 mg/L, ACI 318-19 Table 19.3.1.1 S1 from 150 ppm)");
    expect(belowSulfateClassesSentence(undefined)).toMatch(/^The exposure's sulfate is below/);
  });
});
