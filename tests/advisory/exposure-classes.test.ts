import { describe, it, expect } from "vitest";
import { classifyExposure } from "../../lib/advisory/exposure-classes";
import { exposureInput } from "../../lib/schema/exposure-input";

describe("classifyExposure", () => {
  it("classifies 3200 mg/L sodium sulfate groundwater as EN 206 XA3 and ACI 318 S2 (Table 2; Table 19.3.1.1)", () => {
    const r = classifyExposure(exposureInput.parse({ sulfateMgPerL: 3200, sulfateCation: "Na", wetting: "permanently-wet" }));
    expect(r.en206.classes.map((c) => c.exposureClass)).toEqual(["XC1", "XA3"]);
    expect(r.aci318.classes.find((c) => c.family === "S")!.exposureClass).toBe("S2");
    expect(r.en206.classes.find((c) => c.family === "XA")!.source).toMatch(/EN 206:2013\+A2:2021, Table 2/);
  });

  it("states plainly in every result that national annexes and local codes govern", () => {
    const r = classifyExposure(exposureInput.parse({}));
    expect(r.jurisdictionStatement).toMatch(/National annexes.*local codes govern/);
  });
});
