import { assessInput } from "../schema/assess-input";
import { formatIssues } from "../schema/format-issues";
import type { AssessmentResult } from "./assess";
import { createComputationPool, poolSizeFrom, sizeOrDefault, type ComputationPool, type PoolSizeError } from "./computation-pool";
import { createJobRegistry, poolJobRunner, type JobRegistry, type JobStatus } from "./jobs";
import { validationError, type ServiceOutcome } from "./outcome";
import { processWide } from "./process-wide";
import type { WorkerModule } from "./worker-job-runner";

/** What an assessment job's worker runs: `runAssessment(raw, { onProgress })` of `lib/service/assess.ts`. */
export const assessmentWorkerModule: WorkerModule = { modulePath: "lib/service/assess.ts", exportName: "runAssessment" };

/** The environment variable that sets the number of job pool workers. */
export const JOB_WORKERS_ENV = "HYDRASTATE_JOB_WORKERS";
/** Default job pool workers: one; a second job waits for it (two Monte Carlo runs at once only share the 2 cores). */
export const DEFAULT_JOB_WORKERS = 1;
/** Jobs queued or running at once (the registry's limit; more → 503 busy). */
export const MAX_ACTIVE_JOBS = 2;

export function jobWorkersFrom(text: string | undefined): { ok: true; value: number } | { ok: false; error: PoolSizeError<typeof JOB_WORKERS_ENV> } {
  return poolSizeFrom(JOB_WORKERS_ENV, text, DEFAULT_JOB_WORKERS);
}

/**
 * The long-lived workers that compute the assessment jobs, apart from the pool of `POST /api/v1/assess` so that a
 * Monte Carlo job does not hold up a quick assessment. A worker keeps its sample worker (`sample-pool.ts`), the data
 * set and the compiled engine between jobs: a 200-sample job took 11.2–11.8 s on a fresh worker per job and
 * 5.3 s on a warm pool worker (2026-12-02, this machine). A cancelled job's worker is terminated and replaced.
 */
const jobPool = processWide("hydrastate.assessmentJobPool", () =>
  createComputationPool<AssessmentResult>(assessmentWorkerModule, { size: sizeOrDefault(jobWorkersFrom(process.env[JOB_WORKERS_ENV]), DEFAULT_JOB_WORKERS) }),
);

export function assessmentJobPool(): ComputationPool<AssessmentResult> {
  return jobPool.get();
}

/** Replaces the job pool (tests); returns the previous one, which the caller closes. */
export function setAssessmentJobPool(replacement: ComputationPool<AssessmentResult> | undefined): ComputationPool<AssessmentResult> | undefined {
  return jobPool.replace(replacement);
}

/**
 * The process-wide registry of assessment jobs (`/api/v1/assess/jobs`), on `globalThis` so that the
 * routes that start, poll and cancel a job (bundled separately by Next) share it. The jobs compute on the job pool
 * (above), so the server keeps answering other requests meanwhile.
 */
const jobs = processWide("hydrastate.assessmentJobs", () => createJobRegistry<AssessmentResult>(poolJobRunner(assessmentJobPool), { maxActive: MAX_ACTIVE_JOBS }));

export function assessmentJobs(): JobRegistry<AssessmentResult> {
  return jobs.get();
}

/** Replaces the registry (tests); returns the previous one. */
export function setAssessmentJobs(registry: JobRegistry<AssessmentResult> | undefined): JobRegistry<AssessmentResult> | undefined {
  return jobs.replace(registry);
}

/** Starts a job after validating the input, so that bad input is a 422 at once rather than a failed job. */
export function startAssessmentJob(raw: unknown, registry: JobRegistry<AssessmentResult> = assessmentJobs()): ServiceOutcome<JobStatus<AssessmentResult>> {
  const parsed = assessInput.safeParse(raw);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  return registry.start(raw);
}
