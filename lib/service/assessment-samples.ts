import { sortFlags, type Flag } from "../advisory/flag";
import { createRng } from "../advisory/random";
import { flagRobustness, summarise } from "../advisory/sample-statistics";
import type { BinderSystem } from "../cement/binder-system";
import { loadDataset, type Dataset } from "../data/load-dataset";
import { newWarmStartBook, readingBook, type WarmStartBook } from "../scenarios/sweep";
import { assessInput, type AssessInput } from "../schema/assess-input";
import { assessWithDataset, binderSystemOf, MONTE_CARLO_SWEEP_POINTS, SCENARIO_OF_FLAG, type AssessmentResult } from "./assessment-core";
import { domainError, type ServiceOutcome } from "./outcome";
import { sampleDataset } from "./perturbed-dataset";

/**
 * The Monte Carlo samples of an assessment (`runAssessment`, `assess.ts`). Sample i assesses the data set perturbed by
 * the random stream (seed, i) (`sampleDataset`), so its value depends only on the input, the data set, the seed and i:
 * the samples may be computed in any order, in this thread or in worker threads (`sample-pool.ts`), and merged by
 * index to the same result.
 *
 * The samples' path: the scenarios at MONTE_CARLO_SWEEP_POINTS points with drying at the service conditions only; a
 * reference run of that path on the data set as it is records a warm start at every point, and each sample starts every
 * equilibrium from the reference at the same point (same composition and temperature, perturbed potentials).
 */

/**
 * One sample's contribution: the base paste's phase volumes (cm³ per 100 g binder), the ids of the flags it raised as
 * caution or warning, and the scenarios that failed in it (their flags were not evaluated, `SCENARIO_OF_FLAG`); null
 * when its assessment failed as a whole.
 */
export type SampleValue = { volumesCm3: Record<string, number>; firedFlagIds: string[]; failedScenarios: string[] } | null;

/** The warm starts of the samples' path, from its reference run (undefined when that run fails: the samples then start cold). */
export function samplePathReference(input: AssessInput, binder: BinderSystem, dataset: Dataset): WarmStartBook | undefined {
  const book = newWarmStartBook();
  const reference = assessWithDataset(input, binder, dataset, { points: MONTE_CARLO_SWEEP_POINTS, withTimeline: false, book, reduced: true });
  return reference.ok ? readingBook(book) : undefined;
}

export function assessSample(input: AssessInput, binder: BinderSystem, dataset: Dataset, reference: WarmStartBook | undefined, seed: number, index: number): SampleValue {
  const sampled = sampleDataset(dataset, createRng(seed, index));
  const run = assessWithDataset(input, binder, sampled, { points: MONTE_CARLO_SWEEP_POINTS, withTimeline: false, book: reference, reduced: true });
  if (!run.ok) return null;
  return {
    volumesCm3: run.value.assemblage.paste.volumes,
    firedFlagIds: run.value.flags.filter((f) => f.severity !== "info").map((f) => f.id),
    failedScenarios: Object.keys(run.value.scenarioErrors),
  };
}

/**
 * The samples' statistics: P5/P50/P95 and mean of each phase volume over the samples that succeeded, and each flag of
 * the deterministic run with its fired fraction over the samples that evaluated it (a sample whose flag scenario
 * failed is counted in `notEvaluated`, not as not fired), flags sorted again by severity and robustness.
 */
export function summariseSamples(
  flags: readonly Flag[],
  values: readonly SampleValue[],
): { failedSamples: number; phaseVolumesCm3: NonNullable<AssessmentResult["uncertainty"]>["phaseVolumesCm3"]; flags: Flag[] } {
  const volumes: Record<string, number[]> = {};
  const fired: Record<string, boolean[]> = {};
  const notEvaluated: Record<string, number> = {};
  let failedSamples = 0;
  for (const value of values) {
    if (!value) {
      failedSamples++;
      continue;
    }
    for (const [id, v] of Object.entries(value.volumesCm3)) (volumes[id] ??= []).push(v);
    const ids = new Set(value.firedFlagIds);
    for (const flag of flags) {
      const scenario = SCENARIO_OF_FLAG[flag.id];
      if (scenario && value.failedScenarios.includes(scenario)) notEvaluated[flag.id] = (notEvaluated[flag.id] ?? 0) + 1;
      else (fired[flag.id] ??= []).push(ids.has(flag.id));
    }
  }
  const phaseVolumesCm3 = Object.fromEntries(
    Object.entries(volumes).map(([id, series]) => {
      const s = summarise(series);
      return [id, { p5: s.p5, p50: s.p50, p95: s.p95, mean: s.mean }];
    }),
  );
  const withRobustness = flags.map((flag) => {
    if (!fired[flag.id]?.length) return flag;
    const skipped = notEvaluated[flag.id];
    return { ...flag, robustness: { ...flagRobustness(fired[flag.id]), ...(skipped ? { notEvaluated: skipped } : {}) } };
  });
  return { failedSamples, phaseVolumesCm3, flags: sortFlags(withRobustness) };
}

/** A range of samples for a worker thread: samples `from` (inclusive) to `to` (exclusive). */
export type SampleRange = {
  /** The assessment input, as validated by `assessInput`. */
  input: unknown;
  seed: number;
  from: number;
  to: number;
  /** The version of the data set the samples perturb. */
  datasetVersion: string;
  /** That data set, when it is not the one this process loads (a caller's own data set). */
  dataset?: Dataset;
};

/** The last input's binder and reference in this thread: the ranges of one run share them. */
let lastPath: { key: string; binder: BinderSystem; reference: WarmStartBook | undefined } | undefined;

/**
 * The worker threads' entry (`sample-pool.ts`): the samples of a range, in index order. The first range of a run in a
 * thread pays for its reference run; the later ones reuse it.
 */
export async function runSampleRange(raw: SampleRange): Promise<ServiceOutcome<SampleValue[]>> {
  const parsed = assessInput.safeParse(raw.input);
  if (!parsed.success) return domainError("invalid_sample_range", "the sample range's input is not a valid assessment input");
  const input = parsed.data;
  let dataset = raw.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return domainError("dataset_invalid", `${loaded.error.file}: ${loaded.error.message}`);
    dataset = loaded.value;
  }
  if (dataset.version !== raw.datasetVersion) return domainError("dataset_mismatch", `the worker's data set is version ${dataset.version}, the run's ${raw.datasetVersion}`);
  const key = `${dataset.version}|${JSON.stringify(input)}`;
  if (lastPath?.key !== key) {
    const binder = binderSystemOf(input);
    if (!binder.ok) return binder;
    lastPath = { key, binder: binder.value, reference: samplePathReference(input, binder.value, dataset) };
  }
  const values: SampleValue[] = [];
  for (let i = raw.from; i < raw.to; i++) values.push(assessSample(input, lastPath.binder, dataset, lastPath.reference, raw.seed, i));
  return { ok: true, value: values };
}
