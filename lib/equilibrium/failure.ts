/**
 * Typed failures of the equilibrium engine. Each carries the numbers needed to understand it; human
 * wording for display lives in `describeFailure`, apart from the data.
 */
export type EquilibriumFailure =
  | { code: "invalid_input"; field: string; message: string }
  | { code: "infeasible_composition"; element?: string; infeasibility?: number; message: string }
  | { code: "no_convergence"; iterations: number; residual: number; activePhases: string[]; message: string }
  | { code: "time_limit"; elapsedMs: number; limitMs: number; message: string };

export type EquilibriumOutcome<T> = { ok: true; value: T } | { ok: false; error: EquilibriumFailure };

export function describeFailure(failure: EquilibriumFailure): string {
  switch (failure.code) {
    case "invalid_input":
      return `${failure.field}: ${failure.message}`;
    case "infeasible_composition":
      return `the composition cannot be represented by the species available${failure.element ? ` (element ${failure.element})` : ""}: ${failure.message}`;
    case "no_convergence":
      return `no convergence in ${failure.iterations} iterations (residual ${failure.residual.toExponential(2)}): ${failure.message}`;
    case "time_limit":
      return `stopped after ${failure.elapsedMs.toFixed(0)} ms (limit ${failure.limitMs} ms)`;
  }
}
