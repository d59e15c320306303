import packageJson from "../../package.json";
import { cautionTextsFor } from "../advisory/cautions";
import { culvertDemo } from "../demo/culvert-demo";
import { loadDataset, type Dataset } from "../data/load-dataset";
import { phaseIds } from "../equilibrium/equilibrate";
import { assessInput, type AssessInput } from "../schema/assess-input";
import { formatIssues } from "../schema/format-issues";
import { assessWithDataset, binderSystemOf, type AssessmentResult } from "./assessment-core";
import { assessSample, samplePathReference, summariseSamples, type SampleValue } from "./assessment-samples";
import { domainError, validationError, type ServiceOutcome } from "./outcome";
import { computeSamples, samplePool, SAMPLES_PER_RANGE } from "./sample-pool";
import type { WarmStartBook } from "../scenarios/sweep";
import type { BinderSystem } from "../cement/binder-system";

export type { AssessmentResult, AssessmentScenarios } from "./assessment-core";

export type AssessmentOptions = {
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
  /** A data set other than the one loaded from `lib/data` (tests, sensitivity studies). */
  dataset?: Dataset;
  /**
   * 0: compute the Monte Carlo samples in this thread alone. By default the thread's sample workers
   * (`sample-pool.ts`, HYDRASTATE_SAMPLE_WORKERS) help when there are at least two ranges of samples.
   */
  sampleWorkers?: 0;
};

/**
 * The assessment behind `assess` (CLI) and `POST /api/v1/assess`: base assemblage at the given age,
 * durability scenarios for the exposure, exposure classes and compliance, the curing advice when the
 * thermal model is given, flags ordered by severity, and the cautions. With `options.monteCarlo`, the data
 * set's uncertainties are sampled (seeded) and each flag reports how often it fires.
 */
export async function runAssessment(raw: unknown, options: AssessmentOptions = {}): Promise<ServiceOutcome<AssessmentResult>> {
  const parsed = assessInput.safeParse(raw);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  const input = parsed.data;
  const loaded = options.dataset ? { ok: true as const, value: options.dataset } : loadDataset();
  if (!loaded.ok) return domainError("dataset_invalid", `${loaded.error.file}: ${loaded.error.message}`);
  const known = phaseIds(loaded.value);
  for (const field of ["suppressedPhases", "allowedPhases"] as const) {
    const index = input.options[field].findIndex((id) => !known.has(id));
    if (index >= 0) return validationError([{ path: `options.${field}.${index}`, message: `unknown phase id "${input.options[field][index]}"` }]);
  }
  const binder = binderSystemOf(input);
  if (!binder.ok) return binder;
  const deterministic = assessWithDataset(input, binder.value, loaded.value, { points: input.options.sweepPoints, withTimeline: true });
  if (!deterministic.ok) return deterministic;
  const result: AssessmentResult = {
    inputs: input,
    ...deterministic.value,
    cautions: cautionTextsFor(input.options.monteCarlo ? "monte-carlo" : "assessment"),
    versions: { dataset: loaded.value.version, engine: packageJson.version },
  };
  options.onProgress?.(input.options.monteCarlo ? 0.05 : 1);
  if (input.options.monteCarlo) {
    const { samples, seed } = input.options.monteCarlo;
    const values = await monteCarloSamples(input, binder.value, loaded.value, samples, seed, options);
    if (!values.ok) return values;
    const summary = summariseSamples(result.flags, values.value);
    result.uncertainty = { samples, seed, failedSamples: summary.failedSamples, phaseVolumesCm3: summary.phaseVolumesCm3 };
    result.flags = summary.flags;
  }
  return { ok: true, value: result };
}

/**
 * The Monte Carlo samples in index order, computed in this thread and, beside it, in the thread's sample workers
 * (`sample-pool.ts`) when there are at least two ranges of samples. Either way the values are the same
 * (`assessment-samples.ts`).
 */
async function monteCarloSamples(
  input: AssessInput,
  binder: BinderSystem,
  dataset: Dataset,
  samples: number,
  seed: number,
  options: AssessmentOptions,
): Promise<ServiceOutcome<SampleValue[]>> {
  // This thread's reference path, computed when it takes its first sample (the workers compute their own).
  let reference: { book: WarmStartBook | undefined } | undefined;
  const sampleHere = (index: number) => {
    reference ??= { book: samplePathReference(input, binder, dataset) };
    return assessSample(input, binder, dataset, reference.book, seed, index);
  };
  const useWorkers = options.sampleWorkers !== 0 && samples >= 2 * SAMPLES_PER_RANGE;
  return computeSamples(samples, {
    workers: useWorkers ? samplePool() : undefined,
    // The workers load the data set themselves unless it is the caller's own.
    request: { input, seed, datasetVersion: dataset.version, dataset: options.dataset },
    sampleHere,
    signal: options.signal,
    onSamplesDone: (completed) => options.onProgress?.(0.05 + (0.95 * completed) / samples),
  });
}

/** Options of the warm-up: `monteCarlo` also starts this thread's sample workers and runs the samples' path once. */
export type WarmUpOptions = { monteCarlo?: boolean };

/**
 * A pool worker's warm-up (`ComputationPool.warm`, at server start): one assessment of the demo loads the data set and
 * compiles the engine's code, which the first request would otherwise wait for (about 2–3 s on the service machines).
 * With `monteCarlo` (the job pool, whose jobs are Monte Carlo runs), two ranges of samples of the demo follow, so that
 * the sample worker has started and compiled the samples' path too.
 */
export async function warmUp(options: WarmUpOptions = {}): Promise<void> {
  await runAssessment(culvertDemo);
  if (options.monteCarlo) await runAssessment({ ...culvertDemo, options: { ...culvertDemo.options, monteCarlo: { samples: 2 * SAMPLES_PER_RANGE, seed: 1 } } });
}
