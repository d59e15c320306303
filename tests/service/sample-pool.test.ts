import { afterAll, describe, expect, it } from "vitest";
import { availableParallelism } from "node:os";
import { loadDataset } from "../../lib/data/load-dataset";
import { runAssessment } from "../../lib/service/assess";
import { createComputationPool } from "../../lib/service/computation-pool";
import { defaultSampleWorkers, SAMPLE_WORKERS_ENV, sampleWorkerModule, sampleWorkersFrom, SAMPLES_PER_RANGE, setSamplePool, type SamplePool } from "../../lib/service/sample-pool";
import type { SampleValue } from "../../lib/service/assessment-samples";

/**
 * The Monte Carlo samples computed in worker threads (lib/service/sample-pool.ts) must give exactly what one thread
 * gives: sample i depends only on the input, the data set, the seed and i. The input is the small mix of
 * tests/service/assess.test.ts (8 sweep points keep each sample short).
 */
const input = {
  binder: { cement: { kind: "preset", presetId: "en197-cem-i" } },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 340 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: { sulfateMgPerL: 1200, sulfateCation: "Na", relativeHumidityPercent: 70, wetting: "wet-dry", coverMm: 35 },
  options: { sweepPoints: 8, monteCarlo: { samples: 2 * SAMPLES_PER_RANGE, seed: 11 } },
};

const pools: SamplePool[] = [];
/** A two-worker sample pool of `module` installed as the process's pool. */
function installPool(module = sampleWorkerModule): SamplePool {
  const installed = { size: 2, pool: createComputationPool<SampleValue[]>(module, { size: 2 }) };
  pools.push(installed);
  setSamplePool(installed);
  return installed;
}
afterAll(async () => {
  setSamplePool(undefined);
  for (const p of pools) await p.pool.close();
});

describe("the sample pool's size from HYDRASTATE_SAMPLE_WORKERS", () => {
  it("defaults to one worker per core, at most two, and takes an integer within the limits", () => {
    expect(defaultSampleWorkers()).toBe(Math.min(2, availableParallelism()));
    expect(sampleWorkersFrom(undefined)).toEqual({ ok: true, value: defaultSampleWorkers() });
    expect(sampleWorkersFrom("1")).toEqual({ ok: true, value: 1 });
    expect(sampleWorkersFrom("4")).toEqual({ ok: true, value: 4 });
  });

  it("is a typed error naming the variable and its limits for anything else", () => {
    for (const text of ["0", "17", "2.5", "many"]) expect(sampleWorkersFrom(text)).toEqual({ ok: false, error: { code: "invalid_pool_size", field: SAMPLE_WORKERS_ENV, value: text, min: 1, max: 16 } });
  });
});

describe("Monte Carlo samples in worker threads", () => {
  it("give the same result, byte for byte, as the samples computed in one thread", async () => {
    const pool = installPool();
    const inWorkers = await runAssessment(input);
    const inThread = await runAssessment(input, { sampleWorkers: 1 });
    if (!inWorkers.ok || !inThread.ok) throw new Error(JSON.stringify([inWorkers, inThread].map((r) => !r.ok && r.error)));
    // The workers did compute: both were started for the two ranges.
    expect(pool.pool.stats().workers).toBe(2);
    expect(JSON.stringify(inWorkers.value)).toBe(JSON.stringify(inThread.value));
    expect(inWorkers.value.uncertainty?.samples).toBe(2 * SAMPLES_PER_RANGE);
  }, 240_000);

  it("receive the caller's own data set: with zero uncertainty every sample equals the deterministic base paste", async () => {
    installPool();
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error();
    const certain = { ...loaded.value, species: loaded.value.species.map((s) => ({ ...s, uncertaintyLog10K: 0 })), version: `${loaded.value.version}-certain-workers` };
    const r = await runAssessment(input, { dataset: certain });
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    for (const [id, v] of Object.entries(r.value.assemblage.paste.volumes)) {
      expect(r.value.uncertainty!.phaseVolumesCm3[id].p5, id).toBeCloseTo(v, 10);
      expect(r.value.uncertainty!.phaseVolumesCm3[id].p95, id).toBeCloseTo(v, 10);
    }
  }, 240_000);

  it("stop when cancelled and report how many samples were done", async () => {
    const pool = installPool();
    const controller = new AbortController();
    const many = { ...input, options: { ...input.options, monteCarlo: { samples: 20 * SAMPLES_PER_RANGE, seed: 3 } } };
    const running = runAssessment(many, { signal: controller.signal, onProgress: (fraction) => fraction > 0.1 && controller.abort() });
    const r = await running;
    expect(r.ok).toBe(false);
    if (!r.ok && r.error.kind === "domain") {
      expect(r.error.code).toBe("cancelled");
      expect(r.error.detail?.completedSamples as number).toBeLessThan(20 * SAMPLES_PER_RANGE);
    }
    // The ranges still running had their workers stopped; nothing is left queued.
    expect(pool.pool.stats().queued).toBe(0);
  }, 240_000);

  it("fall back to this thread, with the same result, when the workers cannot run", async () => {
    installPool({ modulePath: "lib/service/no-such-sample-module.ts", exportName: "runSampleRange" });
    const logged: string[] = [];
    const original = console.error;
    console.error = (line: string) => void logged.push(line);
    try {
      const fallback = await runAssessment(input);
      const inThread = await runAssessment(input, { sampleWorkers: 1 });
      if (!fallback.ok || !inThread.ok) throw new Error();
      expect(JSON.stringify(fallback.value)).toBe(JSON.stringify(inThread.value));
    } finally {
      console.error = original;
    }
    expect(logged.some((line) => line.includes("sample_workers_unavailable"))).toBe(true);
  }, 240_000);
});
