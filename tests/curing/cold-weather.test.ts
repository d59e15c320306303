import { describe, it, expect } from "vitest";
import { assessEarlyFreezing } from "../../lib/curing/cold-weather";
import { equivalentAgeH } from "../../lib/curing/equivalent-age";

describe("early-freezing check", () => {
  it("finds the first sub-zero surface time and the strength reached by then", () => {
    const times = Array.from({ length: 49 }, (_, i) => i);
    const surface = times.map((t) => (t < 30 ? 8 : -2));
    const ages = equivalentAgeH(times, surface, 40000, 20);
    const r = assessEarlyFreezing(times, surface, ages, 5, 30, "N");
    expect(r.firstSubZeroSurfaceH).toBe(30);
    expect(r.strengthAtFirstSubZeroMPa).toBeGreaterThan(0);
    expect(r.timeToRequiredStrengthH === null || r.timeToRequiredStrengthH > 0).toBe(true);
  });

  it("reports no freezing when the surface stays above 0 °C", () => {
    const times = [0, 1, 2];
    const r = assessEarlyFreezing(times, [5, 5, 5], [0, 1, 2], 5, 30, "N");
    expect(r.firstSubZeroSurfaceH).toBeNull();
    expect(r.strengthAtFirstSubZeroMPa).toBeNull();
  });
});
