import { createRng, type Rng } from "./random";

/**
 * A generic, seeded, cancellable Monte Carlo loop. Sample i draws from its own stream (seed, i), so a
 * run is reproducible with the same seed, and the first k samples of a run of n equal a run of k.
 * The loop yields to the event loop every `yieldEvery` samples so that progress can be shown and an
 * AbortSignal can stop it.
 */

export const MAX_MONTE_CARLO_SAMPLES = 100_000;

export type MonteCarloOptions<T> = {
  /** Number of samples, 1 – 100 000. */
  samples: number;
  /** Any safe integer. */
  seed: number;
  /** Draws one sample; must use only `rng` for randomness to stay reproducible. */
  sample: (rng: Rng, index: number) => T;
  /** Called after each batch with the number of samples done and the total. */
  onProgress?: (completed: number, total: number) => void;
  signal?: AbortSignal;
  /** Samples between yields to the event loop (default 25). */
  yieldEvery?: number;
};

export type MonteCarloError =
  | { code: "invalid-samples"; field: "samples"; value: number; min: 1; max: number }
  | { code: "invalid-seed"; field: "seed"; value: number }
  | { code: "cancelled"; completedSamples: number; samples: number }
  | { code: "sample-failed"; index: number; message: string };

export type MonteCarloResult<T> =
  | { ok: true; values: T[]; seed: number; samples: number }
  | { ok: false; error: MonteCarloError };

const yieldToEventLoop = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

export async function runMonteCarlo<T>(options: MonteCarloOptions<T>): Promise<MonteCarloResult<T>> {
  const { samples, seed, sample, onProgress, signal } = options;
  if (!Number.isInteger(samples) || samples < 1 || samples > MAX_MONTE_CARLO_SAMPLES) {
    return { ok: false, error: { code: "invalid-samples", field: "samples", value: samples, min: 1, max: MAX_MONTE_CARLO_SAMPLES } };
  }
  if (!Number.isSafeInteger(seed)) return { ok: false, error: { code: "invalid-seed", field: "seed", value: seed } };
  const yieldEvery = Math.max(1, Math.floor(options.yieldEvery ?? 25));

  const values: T[] = [];
  for (let index = 0; index < samples; index++) {
    if (signal?.aborted) return { ok: false, error: { code: "cancelled", completedSamples: index, samples } };
    try {
      values.push(sample(createRng(seed, index), index));
    } catch (error) {
      return { ok: false, error: { code: "sample-failed", index, message: error instanceof Error ? error.message : String(error) } };
    }
    const completed = index + 1;
    if (completed % yieldEvery === 0 || completed === samples) {
      onProgress?.(completed, samples);
      if (completed < samples) await yieldToEventLoop();
    }
  }
  return { ok: true, values, seed, samples };
}

/** Human wording of a Monte Carlo error (kept apart from the typed value). */
export function describeMonteCarloError(error: MonteCarloError): string {
  switch (error.code) {
    case "invalid-samples":
      return `samples must be an integer from ${error.min} to ${error.max}, got ${error.value}`;
    case "invalid-seed":
      return `seed must be a safe integer, got ${error.value}`;
    case "cancelled":
      return `Monte Carlo run cancelled after ${error.completedSamples} of ${error.samples} samples`;
    case "sample-failed":
      return `Monte Carlo sample ${error.index} failed: ${error.message}`;
  }
}
