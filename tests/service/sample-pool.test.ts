import { afterAll, describe, expect, it } from "vitest";
import { availableParallelism } from "node:os";
import { loadDataset } from "../../lib/data/load-dataset";
import { runAssessment } from "../../lib/service/assess";
import { createComputationPool, type ComputationPool } from "../../lib/service/computation-pool";
import { defaultSampleWorkers, SAMPLE_WORKERS_ENV, sampleWorkerModule, sampleWorkersFrom, SAMPLES_PER_RANGE, setSamplePool } from "../../lib/service/sample-pool";
import type { SampleValue } from "../../lib/service/assessment-samples";

/**
 * The Monte Carlo samples computed by the assessing thread and its sample workers (lib/service/sample-pool.ts) must
 * give exactly what one thread gives: sample i depends only on the input, the data set, the seed and i. The input is
 * the small mix of tests/service/assess.test.ts (8 sweep points keep each sample short).
 */
const input = {
  binder: { cement: { kind: "preset", presetId: "en197-cem-i" } },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 340 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: { sulfateMgPerL: 1200, sulfateCation: "Na", relativeHumidityPercent: 70, wetting: "wet-dry", coverMm: 35 },
  options: { sweepPoints: 8, monteCarlo: { samples: 2 * SAMPLES_PER_RANGE, seed: 11 } },
};

const pools: ComputationPool<SampleValue[]>[] = [];
/** A one-worker sample pool of `module` installed as the process's pool: this thread and one worker share the ranges. */
function installPool(module = sampleWorkerModule): ComputationPool<SampleValue[]> {
  const pool = createComputationPool<SampleValue[]>(module, { size: 1 });
  pools.push(pool);
  setSamplePool({ size: 1, pool });
  return pool;
}
afterAll(async () => {
  setSamplePool(undefined);
  for (const pool of pools) await pool.close();
});

/** Runs `act` with console.error captured; returns the lines logged. */
async function capturingLog(act: () => Promise<void>): Promise<string[]> {
  const logged: string[] = [];
  const original = console.error;
  console.error = (line: string) => void logged.push(line);
  try {
    await act();
  } finally {
    console.error = original;
  }
  return logged;
}

describe("the sample pool's size from HYDRASTATE_SAMPLE_WORKERS", () => {
  it("defaults to one fewer than the cores, up to two cores, and takes an integer within the limits", () => {
    expect(defaultSampleWorkers()).toBe(Math.min(2, availableParallelism()) - 1);
    expect(sampleWorkersFrom(undefined)).toEqual({ ok: true, value: defaultSampleWorkers() });
    expect(sampleWorkersFrom("0")).toEqual({ ok: true, value: 0 });
    expect(sampleWorkersFrom("1")).toEqual({ ok: true, value: 1 });
    expect(sampleWorkersFrom("4")).toEqual({ ok: true, value: 4 });
  });

  it("is a typed error naming the variable and its limits for anything else", () => {
    for (const text of ["-1", "17", "2.5", "many"]) expect(sampleWorkersFrom(text)).toEqual({ ok: false, error: { code: "invalid_pool_size", field: SAMPLE_WORKERS_ENV, value: text, min: 0, max: 16 } });
  });
});

describe("Monte Carlo samples shared with a worker thread", () => {
  it("give the same result, byte for byte, as the samples computed in one thread", async () => {
    const pool = installPool();
    let inWorkers: Awaited<ReturnType<typeof runAssessment>> | undefined;
    // The worker takes the first range before this thread starts, and a failed range would be logged.
    const logged = await capturingLog(async () => void (inWorkers = await runAssessment(input)));
    const inThread = await runAssessment(input, { sampleWorkers: 0 });
    if (!inWorkers?.ok || !inThread.ok) throw new Error(JSON.stringify([inWorkers, inThread].map((r) => r && !r.ok && r.error)));
    expect(logged).toEqual([]);
    expect(pool.stats().workers).toBe(1);
    expect(JSON.stringify(inWorkers.value)).toBe(JSON.stringify(inThread.value));
    expect(inWorkers.value.uncertainty?.samples).toBe(2 * SAMPLES_PER_RANGE);
  }, 240_000);

  it("receive the caller's own data set: with zero uncertainty every sample equals the deterministic base paste", async () => {
    installPool();
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error();
    const certain = { ...loaded.value, species: loaded.value.species.map((s) => ({ ...s, uncertaintyLog10K: 0 })), version: `${loaded.value.version}-certain-workers` };
    let r: Awaited<ReturnType<typeof runAssessment>> | undefined;
    // A worker given another data set than the run's refuses its range, which would be logged.
    const logged = await capturingLog(async () => void (r = await runAssessment(input, { dataset: certain })));
    expect(logged).toEqual([]);
    if (!r?.ok) throw new Error(JSON.stringify(r && !r.ok && r.error));
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
    // The range still running had its worker stopped; nothing is left queued.
    expect(pool.stats().queued).toBe(0);
    expect(pool.stats().busy).toBe(0);
  }, 240_000);

  it("are computed in this thread, with the same result and one log line, when the worker cannot run", async () => {
    installPool({ modulePath: "lib/service/no-such-sample-module.ts", exportName: "runSampleRange" });
    let fallback: Awaited<ReturnType<typeof runAssessment>> | undefined;
    const logged = await capturingLog(async () => void (fallback = await runAssessment(input)));
    const inThread = await runAssessment(input, { sampleWorkers: 0 });
    if (!fallback?.ok || !inThread.ok) throw new Error();
    expect(JSON.stringify(fallback.value)).toBe(JSON.stringify(inThread.value));
    expect(logged.filter((line) => line.includes("sample_worker_failed"))).toHaveLength(1);
  }, 240_000);
});
