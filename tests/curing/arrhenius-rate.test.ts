import { describe, it, expect } from "vitest";
import { arrheniusAgeFactor } from "../../lib/curing/arrhenius-rate";

describe("Arrhenius age-conversion factor", () => {
  it("is 1 at the reference temperature (ASTM C1074 definition)", () => {
    expect(arrheniusAgeFactor(20, 40000, 20)).toBe(1);
  });

  it("matches the fib Model Code 2010 temperature-adjusted age factor exp(13.65 − 4000/(273 + T)) to 1 %", () => {
    // fib MC2010 eq. 5.1-85 is an Arrhenius factor with E/R = 4000 K and a reference of 4000/13.65 − 273 = 20.04 °C.
    for (const t of [0, 5, 10, 20, 35, 50, 70]) {
      const fib = Math.exp(13.65 - 4000 / (273 + t));
      const ours = arrheniusAgeFactor(t, 4000 * 8.314462618, 20);
      expect(Math.abs(ours - fib) / fib).toBeLessThan(0.01);
    }
  });
});
