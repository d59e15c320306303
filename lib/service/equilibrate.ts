import { equilibrate } from "../equilibrium/equilibrate";
import type { EquilibriumFailure } from "../equilibrium/failure";
import { describeFailure } from "../equilibrium/failure";
import type { EquilibriumResult } from "../equilibrium/result";
import { equilibrateInput } from "../schema/equilibrate-input";
import { formatIssues } from "../schema/format-issues";
import { domainError, validationError, type ServiceOutcome } from "./outcome";
import { runningVersions } from "./versions";

/** The equilibrium result as served: without the internal warm-start state, with the versions. */
export type EquilibrateOutput = Omit<EquilibriumResult, "state"> & { versions: { dataset: string; engine: string } };

/** An engine failure as a service error: bad input names its field (422); the rest are domain errors. */
export function equilibriumServiceError(failure: EquilibriumFailure): ServiceOutcome<never> {
  if (failure.code === "invalid_input") return validationError([{ path: failure.field, message: failure.message }]);
  const { code, ...detail } = failure;
  return domainError(code, describeFailure(failure), detail as Record<string, unknown>);
}

/**
 * `POST /api/v1/equilibrate`: one equilibrium calculation (schema `equilibrateInput`). All schema
 * issues are reported at once; formula and data-set problems found by the engine name their field.
 */
export function runEquilibrate(raw: unknown): ServiceOutcome<EquilibrateOutput> {
  const parsed = equilibrateInput.safeParse(raw);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  const outcome = equilibrate(parsed.data);
  if (!outcome.ok) return equilibriumServiceError(outcome.error);
  const { state: _state, ...result } = outcome.value;
  return { ok: true, value: { ...result, versions: runningVersions() } };
}
