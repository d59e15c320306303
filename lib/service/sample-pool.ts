import { setMaxListeners } from "node:events";
import { availableParallelism } from "node:os";
import type { SampleRange, SampleValue } from "./assessment-samples";
import { createComputationPool, poolSizeFrom, type ComputationPool, type PoolSizeError } from "./computation-pool";
import { domainError, type ServiceOutcome } from "./outcome";
import { processWide } from "./process-wide";
import type { WorkerModule } from "./worker-job-runner";

/**
 * The worker threads that compute the Monte Carlo samples of an assessment in parallel (`runAssessment`). Samples are
 * sent in ranges of SAMPLES_PER_RANGE to a long-lived pool (`computation-pool.ts`); each worker keeps the run's binder
 * and reference path between ranges (`assessment-samples.ts`), and the values come back merged by index, so the result
 * equals the one computed in a single thread.
 */
export const SAMPLE_WORKERS_ENV = "HYDRASTATE_SAMPLE_WORKERS";

/** Default workers: one per core, at most two (the service machines have 2 cores; more would only queue). */
export function defaultSampleWorkers(): number {
  return Math.min(2, availableParallelism());
}

/**
 * Samples per range: enough that a range outweighs its message round trip (a sample takes about 50–90 ms), few enough
 * that ranges share the workers evenly and progress moves.
 */
export const SAMPLES_PER_RANGE = 10;

export const sampleWorkerModule: WorkerModule = { modulePath: "lib/service/assessment-samples.ts", exportName: "runSampleRange" };

export function sampleWorkersFrom(text: string | undefined): { ok: true; value: number } | { ok: false; error: PoolSizeError<typeof SAMPLE_WORKERS_ENV> } {
  return poolSizeFrom(SAMPLE_WORKERS_ENV, text, defaultSampleWorkers());
}

export type SamplePool = { size: number; pool: ComputationPool<SampleValue[]> };

/** The process-wide sample pool; an invalid HYDRASTATE_SAMPLE_WORKERS is reported in one log line and the default is used. */
const shared = processWide("hydrastate.samplePool", (): SamplePool => {
  const size = sampleWorkersFrom(process.env[SAMPLE_WORKERS_ENV]);
  if (!size.ok) console.error(JSON.stringify({ level: "warn", ...size.error, using: defaultSampleWorkers() }));
  const workers = size.ok ? size.value : defaultSampleWorkers();
  return { size: workers, pool: createComputationPool<SampleValue[]>(sampleWorkerModule, { size: workers }) };
});

export function samplePool(): SamplePool {
  return shared.get();
}

/** Replaces the pool (tests); returns the previous one, whose pool the caller closes. */
export function setSamplePool(replacement: SamplePool | undefined): SamplePool | undefined {
  return shared.replace(replacement);
}

/**
 * Samples 0 … samples − 1 in the pool's workers, in ranges, values in index order. The first failed range (an error
 * outcome, a worker that stopped) cancels the others and is returned: a thrown worker failure as the domain error
 * `sample_worker_failed`, which the caller may answer by computing in its own thread.
 */
export async function samplesInWorkers(
  pool: ComputationPool<SampleValue[]>,
  request: Omit<SampleRange, "from" | "to">,
  samples: number,
  options: { signal?: AbortSignal; onSamplesDone?: (completed: number) => void } = {},
): Promise<ServiceOutcome<SampleValue[]>> {
  const stopAll = new AbortController();
  const ranges: { from: number; to: number }[] = [];
  for (let from = 0; from < samples; from += SAMPLES_PER_RANGE) ranges.push({ from, to: Math.min(samples, from + SAMPLES_PER_RANGE) });
  // Every range listens to the one signal (the default limit of 10 listeners would warn from 11 ranges).
  setMaxListeners(ranges.length + 1, stopAll.signal);
  const stop = () => stopAll.abort();
  options.signal?.addEventListener("abort", stop, { once: true });
  if (options.signal?.aborted) stop();
  let completed = 0;
  let firstFailure: ServiceOutcome<SampleValue[]> | undefined;
  try {
    const outcomes = await Promise.all(
      ranges.map(async (range) => {
        let outcome: ServiceOutcome<SampleValue[]>;
        try {
          outcome = await pool.run({ ...request, ...range }, { signal: stopAll.signal });
        } catch (caught) {
          outcome = domainError("sample_worker_failed", caught instanceof Error ? caught.message : String(caught));
        }
        if (!outcome.ok) {
          // The caller's cancellation is the answer whichever range noticed it first.
          if (!firstFailure && !options.signal?.aborted) firstFailure = outcome;
          stop();
        } else {
          completed += range.to - range.from;
          options.onSamplesDone?.(completed);
        }
        return outcome;
      }),
    );
    if (options.signal?.aborted) return domainError("cancelled", `cancelled after ${completed} of ${samples} samples`, { completedSamples: completed });
    if (firstFailure) return firstFailure;
    return { ok: true, value: outcomes.flatMap((o) => (o.ok ? o.value : [])) };
  } finally {
    options.signal?.removeEventListener("abort", stop);
  }
}
