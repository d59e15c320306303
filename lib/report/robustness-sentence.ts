import type { FlagRobustness } from "../advisory/flag";

/**
 * How often a flag rose to a caution or warning in the Monte Carlo samples, as one sentence for the results page and the
 * reports. A sample counts a flag only at caution or warning (`assessSample`), so an information flag of the
 * deterministic run reads "in 0 %" when no sample made more of it.
 */
export function robustnessSentence(robustness: FlagRobustness): string {
  const skipped = robustness.notEvaluated ? ` (${robustness.notEvaluated} more could not evaluate it: its scenario did not converge there)` : "";
  return `A caution or warning in ${Math.round(robustness.firedFraction * 100)} % of ${robustness.samples} Monte Carlo samples${skipped}.`;
}
