import { describe, it, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { classifyRobustness, firedFraction, flagRobustness, quantileOfSorted, summarise } from "../../lib/advisory/sample-statistics";
import { createRng } from "../../lib/advisory/random";

describe("sample statistics", () => {
  it("interpolate quantiles as definition 7 of Hyndman & Fan (1996): P5 of 1..5 is 1.2, P50 is 3", () => {
    expect(quantileOfSorted([1, 2, 3, 4, 5], 0.05)).toBeCloseTo(1.2, 12);
    expect(quantileOfSorted([1, 2, 3, 4, 5], 0.5)).toBe(3);
    expect(quantileOfSorted([7], 0.95)).toBe(7);
  });

  it("agree with NumPy's mean, sample standard deviation and linear percentiles (Debian python3-numpy, independent)", () => {
    const rng = createRng(99);
    const x = Array.from({ length: 137 }, () => rng.normal(3, 2) ** 2);
    const script =
      "import json,sys\nimport numpy as np\nx=np.array(json.load(sys.stdin))\n" +
      "print(json.dumps([x.mean(), x.std(ddof=1), *np.percentile(x,[5,50,95]).tolist()]))";
    const ref = JSON.parse(execFileSync("/usr/bin/python3", ["-c", script], { input: JSON.stringify(x) }).toString()) as number[];
    const s = summarise(x);
    expect(s.mean).toBeCloseTo(ref[0], 10);
    expect(s.standardDeviation).toBeCloseTo(ref[1], 10);
    expect(s.p5).toBeCloseTo(ref[2], 10);
    expect(s.p50).toBeCloseTo(ref[3], 10);
    expect(s.p95).toBeCloseTo(ref[4], 10);
  });

  it("give the fraction of samples in which a flag fired", () => {
    expect(firedFraction([true, false, true, true])).toBe(0.75);
  });

  it("read ≥ 90 % fired as robust, ≤ 10 % as robustly silent, and anything between as uncertain (project convention)", () => {
    expect(classifyRobustness(0.9)).toBe("robust-fires");
    expect(classifyRobustness(0.89)).toBe("uncertain");
    expect(classifyRobustness(0.11)).toBe("uncertain");
    expect(classifyRobustness(0.1)).toBe("robust-silent");
    expect(() => classifyRobustness(1.2)).toThrow(/0–1/);
  });

  it("build a flag's robustness record from the samples in which it fired", () => {
    const fired = Array.from({ length: 200 }, (_, i) => i % 20 !== 0); // fires in 190 of 200
    expect(flagRobustness(fired)).toEqual({ firedFraction: 0.95, samples: 200, reading: "robust-fires" });
  });

  it("refuse empty or non-finite samples", () => {
    expect(() => summarise([])).toThrow(/empty/);
    expect(() => summarise([1, Number.NaN])).toThrow(/non-finite/);
  });
});
