import { assessInput } from "../schema/assess-input";
import { formatIssues } from "../schema/format-issues";
import type { AssessmentResult } from "./assess";
import { createJobRegistry, type JobRegistry, type JobStatus } from "./jobs";
import { validationError, type ServiceOutcome } from "./outcome";
import { processWide } from "./process-wide";
import { workerJobRunner, type WorkerModule } from "./worker-job-runner";

/** What an assessment job's worker runs: `runAssessment(raw, { onProgress })` of `lib/service/assess.ts`. */
export const assessmentWorkerModule: WorkerModule = { modulePath: "lib/service/assess.ts", exportName: "runAssessment" };

/**
 * The process-wide registry of assessment jobs (`/api/v1/assess/jobs`), on `globalThis` so that the
 * routes that start, poll and cancel a job (bundled separately by Next) share it. Each job computes in its
 * own worker thread (`worker-job-runner.ts`), so the server keeps answering other requests meanwhile, and a
 * cancelled job's worker is terminated.
 */
const jobs = processWide("hydrastate.assessmentJobs", () => createJobRegistry<AssessmentResult>(workerJobRunner<AssessmentResult>(assessmentWorkerModule)));

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
