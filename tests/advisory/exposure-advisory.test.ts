import { describe, it, expect } from "vitest";
import { assessExposureClasses } from "../../lib/advisory/exposure-advisory";

describe("the exposure advisory", () => {
  it("classifies, checks the mix and carries the cautions", () => {
    // 3200 mg/L SO4 → EN 206 XA3 (> 3000 and ≤ 6000 mg/L, Table 2) with max w/c 0.45 (Annex F): w/c 0.50 fails.
    const r = assessExposureClasses({ sulfateMgPerL: 3200, sulfateCation: "Na", wetting: "permanently-wet" }, { waterBinderRatio: 0.5, binderContentKgPerM3: 360, strengthClass: "C35/45", sulfateResisting: true });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.exposureClasses.en206.classes.map((c) => c.exposureClass)).toContain("XA3");
    expect(r.value.flags.map((f) => f.id)).toEqual(["exposure-class-noncompliance"]);
    expect(r.value.cautions.join(" ")).toMatch(/thermodynamic guide/);
  });

  it("returns the field of the first bad input, exposure or mix", () => {
    const a = assessExposureClasses({ sulfateMgPerL: "lots" });
    expect(!a.ok && a.error.field).toBe("exposure.sulfateMgPerL");
    const b = assessExposureClasses({}, { waterBinderRatio: 0.05, binderContentKgPerM3: 300 });
    expect(!b.ok && b.error.field).toBe("mix.waterBinderRatio");
  });

  it("works without a mix, giving classes only", () => {
    const r = assessExposureClasses({ wetting: "sheltered" });
    expect(r.ok && r.value.compliance).toBeUndefined();
    expect(r.ok && r.value.exposureClasses.en206.classes[0].exposureClass).toBe("XC3");
  });
});
