import { availableParallelism } from "node:os";
import type { SampleRange, SampleValue } from "./assessment-samples";
import { createComputationPool, poolSizeFrom, sizeOrDefault, type ComputationPool, type PoolSizeError } from "./computation-pool";
import { domainError, type ServiceOutcome } from "./outcome";
import { processWide } from "./process-wide";
import type { WorkerModule } from "./worker-job-runner";

/**
 * The Monte Carlo samples of an assessment (`runAssessment`), computed in ranges of SAMPLES_PER_RANGE by the thread
 * that runs the assessment and, beside it, by the long-lived worker threads of a sample pool (`computation-pool.ts`).
 * Each thread takes the next range when it is free, so a worker that is still starting takes fewer; each worker keeps
 * the run's binder and reference path between ranges (`assessment-samples.ts`). The values are merged by index, so
 * the result equals the one computed in a single thread, whatever the number of workers.
 */
export const SAMPLE_WORKERS_ENV = "HYDRASTATE_SAMPLE_WORKERS";

/** Sample workers accepted: 0 (the computing thread alone) to 16, a bound against typing errors (common practice). */
export const SAMPLE_WORKER_LIMITS = { min: 0, max: 16 } as const;

/**
 * Default sample workers: one fewer than the cores, up to two cores (the service machines have 2): the computing
 * thread takes its share, so one worker fills a 2-core machine.
 */
export function defaultSampleWorkers(): number {
  return Math.min(2, availableParallelism()) - 1;
}

/**
 * Samples per range: enough that a range outweighs its message round trip (a sample takes some tens of ms), few enough
 * that ranges share the threads evenly and progress moves.
 */
export const SAMPLES_PER_RANGE = 10;

export const sampleWorkerModule: WorkerModule = { modulePath: "lib/service/assessment-samples.ts", exportName: "runSampleRange" };

export function sampleWorkersFrom(text: string | undefined): { ok: true; value: number } | { ok: false; error: PoolSizeError<typeof SAMPLE_WORKERS_ENV> } {
  return poolSizeFrom(SAMPLE_WORKERS_ENV, text, defaultSampleWorkers(), SAMPLE_WORKER_LIMITS);
}

/** The sample workers of a thread: `size` workers in `pool` (none when `size` is 0). */
export type SamplePool = { size: number; pool?: ComputationPool<SampleValue[]> };

/** One sample pool per thread; an invalid HYDRASTATE_SAMPLE_WORKERS is reported in one log line and the default is used. */
const shared = processWide("hydrastate.samplePool", (): SamplePool => {
  const workers = sizeOrDefault(sampleWorkersFrom(process.env[SAMPLE_WORKERS_ENV]), defaultSampleWorkers());
  return { size: workers, pool: workers > 0 ? createComputationPool<SampleValue[]>(sampleWorkerModule, { size: workers }) : undefined };
});

export function samplePool(): SamplePool {
  return shared.get();
}

/** Replaces the pool (tests); returns the previous one, whose pool the caller closes. */
export function setSamplePool(replacement: SamplePool | undefined): SamplePool | undefined {
  return shared.replace(replacement);
}

export type SampleLanes = {
  /** The sample workers to use beside this thread (none: this thread alone). */
  workers?: SamplePool;
  /** What a worker needs besides its range. */
  request: Omit<SampleRange, "from" | "to">;
  /** Sample i in this thread. */
  sampleHere: (index: number) => SampleValue;
  signal?: AbortSignal;
  onSamplesDone?: (completed: number) => void;
};

/**
 * Samples 0 … samples − 1 in index order, computed by this thread and the workers, a range at a time each. A worker
 * that fails (it cannot start, it stops) leaves its range to the others and takes no more, with one log line: the
 * run still completes, in this thread if need be. Cancelling stops every thread and gives the `cancelled` error with
 * the number of samples done.
 */
export async function computeSamples(samples: number, lanes: SampleLanes): Promise<ServiceOutcome<SampleValue[]>> {
  const pending: { from: number; to: number }[] = [];
  for (let from = 0; from < samples; from += SAMPLES_PER_RANGE) pending.push({ from, to: Math.min(samples, from + SAMPLES_PER_RANGE) });
  const values = new Array<SampleValue>(samples);
  let completed = 0;
  const stopWorkers = new AbortController();
  const cancel = () => stopWorkers.abort();
  lanes.signal?.addEventListener("abort", cancel, { once: true });
  const cancelled = () => lanes.signal?.aborted === true;
  const done = (count: number) => {
    completed += count;
    lanes.onSamplesDone?.(completed);
  };

  const here = async () => {
    for (let range = pending.shift(); range && !cancelled(); range = pending.shift()) {
      for (let i = range.from; i < range.to && !cancelled(); i++) {
        values[i] = lanes.sampleHere(i);
        done(1);
        // Yield after every sample: progress and cancellation get through, and a worker's finished range is answered.
        await new Promise((resolve) => setImmediate(resolve));
      }
    }
  };
  let loggedFailure = false;
  const worker = async (pool: ComputationPool<SampleValue[]>) => {
    for (let range = pending.shift(); range && !cancelled(); range = pending.shift()) {
      let outcome: ServiceOutcome<SampleValue[]>;
      try {
        outcome = await pool.run({ ...lanes.request, ...range }, { signal: stopWorkers.signal });
      } catch (caught) {
        outcome = domainError("sample_worker_failed", caught instanceof Error ? caught.message : String(caught));
      }
      if (cancelled()) return;
      if (!outcome.ok || outcome.value.length !== range.to - range.from) {
        pending.unshift(range);
        if (!loggedFailure) {
          loggedFailure = true;
          const reason = outcome.ok ? "a range came back with the wrong number of samples" : outcome.error.kind === "domain" ? outcome.error.message : "invalid range";
          console.error(JSON.stringify({ level: "warn", event: "sample_worker_failed", reason, fallback: "the other threads" }));
        }
        return;
      }
      outcome.value.forEach((value, k) => (values[range.from + k] = value));
      done(range.to - range.from);
    }
  };

  try {
    const workerLanes = Array.from({ length: lanes.workers?.pool ? lanes.workers.size : 0 }, () => worker(lanes.workers!.pool!));
    await Promise.all([here(), ...workerLanes]);
    // Ranges a failing worker gave back after this thread had finished.
    await here();
    if (cancelled()) return domainError("cancelled", `cancelled after ${completed} of ${samples} samples`, { completedSamples: completed });
    return { ok: true, value: values };
  } finally {
    lanes.signal?.removeEventListener("abort", cancel);
  }
}
