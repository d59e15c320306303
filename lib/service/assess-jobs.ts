import { assessInput } from "../schema/assess-input";
import { formatIssues } from "../schema/format-issues";
import { runAssessment, type AssessmentResult } from "./assess";
import { createJobRegistry, type JobRegistry, type JobStatus } from "./jobs";
import { validationError, type ServiceOutcome } from "./outcome";

/**
 * The process-wide registry of assessment jobs (`/api/v1/assess/jobs`), on `globalThis` so that the
 * routes that start, poll and cancel a job (bundled separately by Next) share it.
 */
const key = Symbol.for("hydrastate.assessmentJobs");
type Holder = { [key]?: JobRegistry<AssessmentResult> };

export function assessmentJobs(): JobRegistry<AssessmentResult> {
  const holder = globalThis as Holder;
  holder[key] ??= createJobRegistry<AssessmentResult>((raw, options) => runAssessment(raw, options));
  return holder[key];
}

/** Replaces the registry (tests); returns the previous one. */
export function setAssessmentJobs(registry: JobRegistry<AssessmentResult> | undefined): JobRegistry<AssessmentResult> | undefined {
  const holder = globalThis as Holder;
  const previous = holder[key];
  holder[key] = registry;
  return previous;
}

/** Starts a job after validating the input, so that bad input is a 422 at once rather than a failed job. */
export function startAssessmentJob(raw: unknown, registry: JobRegistry<AssessmentResult> = assessmentJobs()): ServiceOutcome<JobStatus<AssessmentResult>> {
  const parsed = assessInput.safeParse(raw);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  return registry.start(raw);
}
