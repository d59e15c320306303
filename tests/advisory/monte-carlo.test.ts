import { describe, it, expect } from "vitest";
import { runMonteCarlo, describeMonteCarloError } from "../../lib/advisory/monte-carlo";

describe("the Monte Carlo runner", () => {
  const sample = (rng: { normal: (m?: number, s?: number) => number }) => rng.normal(100, 5);

  it("is reproducible: the same seed gives identical samples, a different seed different ones", async () => {
    const a = await runMonteCarlo({ samples: 200, seed: 1234, sample });
    const b = await runMonteCarlo({ samples: 200, seed: 1234, sample });
    const c = await runMonteCarlo({ samples: 200, seed: 1235, sample });
    expect(a.ok && b.ok && c.ok).toBe(true);
    if (!a.ok || !b.ok || !c.ok) return;
    expect(a.values).toEqual(b.values);
    expect(a.values).not.toEqual(c.values);
  });

  it("gives sample i the same value whatever the total number of samples", async () => {
    const short = await runMonteCarlo({ samples: 10, seed: 5, sample });
    const long = await runMonteCarlo({ samples: 50, seed: 5, sample });
    if (!short.ok || !long.ok) throw new Error("run failed");
    expect(long.values.slice(0, 10)).toEqual(short.values);
  });

  it("with zero spread returns the deterministic value in every sample", async () => {
    const run = await runMonteCarlo({ samples: 30, seed: 9, sample: (rng) => rng.normal(42, 0) });
    if (!run.ok) throw new Error("run failed");
    expect(run.values.every((v) => v === 42)).toBe(true);
  });

  it("reports progress up to the total", async () => {
    const seen: number[] = [];
    await runMonteCarlo({ samples: 60, seed: 1, sample, yieldEvery: 25, onProgress: (done) => seen.push(done) });
    expect(seen).toEqual([25, 50, 60]);
  });

  it("stops when its AbortSignal fires and says how far it got", async () => {
    const controller = new AbortController();
    const run = await runMonteCarlo({
      samples: 10_000,
      seed: 1,
      sample,
      yieldEvery: 10,
      onProgress: (done) => {
        if (done >= 30) controller.abort();
      },
      signal: controller.signal,
    });
    expect(run.ok).toBe(false);
    if (run.ok) return;
    expect(run.error).toEqual({ code: "cancelled", completedSamples: 30, samples: 10_000 });
    expect(describeMonteCarloError(run.error)).toMatch(/30 of 10000/);
  });

  it("rejects a sample count outside 1 – 100 000 with a typed error naming the field", async () => {
    for (const samples of [0, 1.5, 100_001]) {
      const run = await runMonteCarlo({ samples, seed: 1, sample });
      expect(run.ok).toBe(false);
      if (!run.ok) expect(run.error).toMatchObject({ code: "invalid-samples", field: "samples", max: 100_000 });
    }
  });

  it("turns an exception inside a sample into a typed error with the sample index", async () => {
    const run = await runMonteCarlo({
      samples: 5,
      seed: 1,
      sample: (_rng, i) => {
        if (i === 3) throw new Error("engine did not converge");
        return i;
      },
    });
    expect(run).toEqual({ ok: false, error: { code: "sample-failed", index: 3, message: "engine did not converge" } });
  });
});
