import { adviseCuring, type CuringAdvice } from "../curing/advise-curing";
import { curingInputSchema } from "../schema/curing-input";
import { formatIssues } from "../schema/format-issues";
import { validationError, type ServiceOutcome } from "./outcome";
import { runningVersions } from "./versions";

export type CureOutput = CuringAdvice & { versions: { dataset: string; engine: string } };

/** `POST /api/v1/cure`: the curing advisory (schema `curingInputSchema`), every schema issue at once. */
export function runCure(raw: unknown): ServiceOutcome<CureOutput> {
  const parsed = curingInputSchema.safeParse(raw);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  return { ok: true, value: { ...adviseCuring(parsed.data), versions: runningVersions() } };
}
