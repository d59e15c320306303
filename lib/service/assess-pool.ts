import type { AssessmentResult } from "./assess";
import { assessmentWorkerModule } from "./assess-jobs";
import { createComputationPool, poolSizeFrom, sizeOrDefault, type ComputationPool, type PoolSizeError } from "./computation-pool";
import { processWide } from "./process-wide";

/** The environment variable that sets the number of pool workers for `POST /api/v1/assess`. */
export const ASSESS_WORKERS_ENV = "HYDRASTATE_ASSESS_WORKERS";
/** Default pool workers: one, leaving the second core of the 2-core service machines to the job workers and the server. */
export const DEFAULT_ASSESS_WORKERS = 1;
/**
 * Assessments that may wait for a pool worker: a short queue bounds the wait (a deterministic assessment takes about
 * 0.3 s, one with 200 Monte Carlo samples about 6 s: `npm run bench`); one more is answered 503 at once instead of
 * waiting out the route's time limit (common practice for an overloaded service).
 */
export const MAX_QUEUED_ASSESSMENTS = 8;

/** The pool size from the environment's text: unset or empty gives the default; anything but an integer in the limits is an error. */
export function assessWorkersFrom(text: string | undefined): { ok: true; value: number } | { ok: false; error: PoolSizeError<typeof ASSESS_WORKERS_ENV> } {
  return poolSizeFrom(ASSESS_WORKERS_ENV, text, DEFAULT_ASSESS_WORKERS);
}

/**
 * The process-wide pool that computes `POST /api/v1/assess` (`runAssessment` of `lib/service/assess.ts`, as the
 * assessment jobs), on `globalThis` so that a reloaded route module finds the workers already started. An
 * invalid `HYDRASTATE_ASSESS_WORKERS` is reported in one log line and the default is used.
 */
const pool = processWide("hydrastate.assessmentPool", () =>
  createComputationPool<AssessmentResult>(assessmentWorkerModule, { size: sizeOrDefault(assessWorkersFrom(process.env[ASSESS_WORKERS_ENV]), DEFAULT_ASSESS_WORKERS), maxQueued: MAX_QUEUED_ASSESSMENTS }),
);

export function assessmentPool(): ComputationPool<AssessmentResult> {
  return pool.get();
}

/** Replaces the pool (tests); returns the previous one, which the caller closes. */
export function setAssessmentPool(replacement: ComputationPool<AssessmentResult> | undefined): ComputationPool<AssessmentResult> | undefined {
  return pool.replace(replacement);
}
