import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  equivalentAgeForStrengthH,
  meanStrengthMPa,
  relativeStrength,
  timeToStrengthH,
} from "../../lib/curing/strength-development";

describe("fib Model Code 2010 strength development", () => {
  it("returns the entered 28-day strength at 28 days of equivalent age", () => {
    for (const cls of ["R", "N", "S"] as const) expect(meanStrengthMPa(28 * 24, 43, cls)).toBeCloseTo(43, 10);
  });

  it("gives beta_cc(7 d) = exp(s(1 − 2)) for the EN 1992-1-1 coefficients 0.20 / 0.25 / 0.38", () => {
    // EN 1992-1-1 eq. 3.2 with s of 3.1.2(6): 0.8187 (R), 0.7788 (N), 0.6839 (S) (hand calculation).
    expect(relativeStrength(7 * 24, "R")).toBeCloseTo(0.8187, 4);
    expect(relativeStrength(7 * 24, "N")).toBeCloseTo(0.7788, 4);
    expect(relativeStrength(7 * 24, "S")).toBeCloseTo(0.6839, 4);
  });

  it("inverts exactly: the age for a strength gives back that strength", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 55, noNaN: true }), fc.constantFrom("R", "N", "S"), (target, cls) => {
        const age = equivalentAgeForStrengthH(target, 50, cls as "R" | "N" | "S");
        return age !== null && Math.abs(meanStrengthMPa(age, 50, cls as "R" | "N" | "S") - target) < 1e-9 * target;
      }),
    );
  });

  it("reports no age for a strength above the asymptote exp(s) · fcm28", () => {
    expect(equivalentAgeForStrengthH(50 * Math.exp(0.25) * 1.01, 50, "N")).toBeNull();
  });

  it("finds the time at which a history reaches the strength, interpolating between samples", () => {
    // Equivalent age equal to real age (20 °C); 7 d gives 0.7788 x 40 = 31.15 MPa (EN 1992-1-1 eq. 3.2, hand).
    const times = Array.from({ length: 401 }, (_, i) => i);
    const t = timeToStrengthH(times, times, 40 * 0.7788, 40, "N");
    expect(t).not.toBeNull();
    expect(Math.abs(t! - 168) / 168).toBeLessThan(0.001);
    expect(timeToStrengthH(times, times, 45, 40, "N")).toBeNull();
  });
});
