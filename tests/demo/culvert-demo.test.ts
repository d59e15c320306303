import { describe, it, expect } from "vitest";
import { assessInput } from "../../lib/schema/assess-input";
import { culvertDemo, DEMO_LABEL } from "../../lib/demo/culvert-demo";

describe("culvert demo scenario", () => {
  it("is a valid assessment input under the shared schema", () => {
    const parsed = assessInput.safeParse(culvertDemo);
    expect(parsed.success ? [] : parsed.error.issues).toEqual([]);
  });

  it("is labelled as a demo in its label and its project name", () => {
    expect(DEMO_LABEL).toMatch(/demo/i);
    expect(DEMO_LABEL).toMatch(/invented/i);
    expect(culvertDemo.project?.name).toMatch(/demo/i);
  });

  it("falls in EN 206 XA2 by its groundwater sulfate (> 600 and ≤ 3000 mg/L, EN 206 Table 2), so the sulfate advice shows", () => {
    expect(culvertDemo.exposure.sulfateMgPerL).toBeGreaterThan(600);
    expect(culvertDemo.exposure.sulfateMgPerL).toBeLessThanOrEqual(3000);
  });
});
