import { describe, it, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { createRng, splitMix64 } from "../../lib/advisory/random";

/** Runs a SciPy one-sample Kolmogorov–Smirnov test (Debian python3-scipy, an independent library) and returns its p-value. */
function scipyKsPValue(values: number[], distribution: "norm" | "uniform"): number {
  const script = `import json,sys\nfrom scipy import stats\nx=json.load(sys.stdin)\nprint(stats.kstest(x, "${distribution}").pvalue)`;
  const out = execFileSync("/usr/bin/python3", ["-c", script], { input: JSON.stringify(values) }).toString();
  return Number(out.trim());
}

describe("the seeded generator", () => {
  it("implements SplitMix64: the first output from state 0 is 0xe220a8397b1dcdaf (Steele, Lea & Flood 2014 reference code; value from memory)", () => {
    const [first, state] = splitMix64(0n);
    expect(first).toBe(0xe220a8397b1dcdafn);
    const [second] = splitMix64(state);
    expect(second).toBe(0x6e789e6aa1b965f4n);
  });

  it("gives the same sequence for the same seed and stream, and different ones otherwise", () => {
    const draw = (seed: number, stream = 0) => {
      const rng = createRng(seed, stream);
      return Array.from({ length: 20 }, () => rng.nextUint32());
    };
    expect(draw(42)).toEqual(draw(42));
    expect(draw(42)).not.toEqual(draw(43));
    expect(draw(42, 0)).not.toEqual(draw(42, 1));
  });

  it("starts every (seed, stream) pair of a 50 × 50 grid from a different point", () => {
    const starts = new Set<string>();
    for (let seed = 0; seed < 50; seed++)
      for (let stream = 0; stream < 50; stream++) {
        const rng = createRng(seed, stream);
        starts.add(`${rng.nextUint32()}:${rng.nextUint32()}`);
      }
    expect(starts.size).toBe(2500);
  });

  it("draws uniform numbers in [0, 1) that pass SciPy's Kolmogorov–Smirnov test against U(0,1)", () => {
    const rng = createRng(2026);
    const u = Array.from({ length: 5000 }, () => rng.uniform());
    expect(Math.min(...u)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...u)).toBeLessThan(1);
    expect(scipyKsPValue(u, "uniform")).toBeGreaterThan(0.001);
  });

  it("draws normal deviates whose mean and standard deviation agree with N(0,1) within sampling error", () => {
    const n = 20000;
    const rng = createRng(7);
    const z = Array.from({ length: n }, () => rng.normal());
    const mean = z.reduce((a, v) => a + v, 0) / n;
    const sd = Math.sqrt(z.reduce((a, v) => a + (v - mean) ** 2, 0) / (n - 1));
    // Standard errors: mean 1/sqrt(n) = 0.0071; sd about 1/sqrt(2n) = 0.0050. Allow 4 standard errors.
    expect(Math.abs(mean)).toBeLessThan(4 / Math.sqrt(n));
    expect(Math.abs(sd - 1)).toBeLessThan(4 / Math.sqrt(2 * n));
    // The 95th percentile of N(0,1) is 1.6449 (Abramowitz & Stegun 1964, Table 26.5); the SE of a sample quantile here is about 0.015.
    const sorted = [...z].sort((a, b) => a - b);
    expect(sorted[Math.round(0.95 * n)]).toBeCloseTo(1.6449, 1);
  });

  it("draws normal deviates that pass SciPy's Kolmogorov–Smirnov test against N(0,1)", () => {
    const rng = createRng(11);
    const z = Array.from({ length: 5000 }, () => rng.normal());
    expect(scipyKsPValue(z, "norm")).toBeGreaterThan(0.001);
  });

  it("scales normal deviates by the given mean and standard deviation", () => {
    const a = createRng(5);
    const b = createRng(5);
    for (let i = 0; i < 10; i++) expect(a.normal(10, 2)).toBeCloseTo(10 + 2 * b.normal(), 12);
  });

  it("rejects seeds that are not safe integers", () => {
    expect(() => createRng(1.5)).toThrow(/seed/);
    expect(() => createRng(0, -1)).toThrow(/stream/);
  });
});
