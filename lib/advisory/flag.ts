/**
 * A risk flag of the durability advisory: what may go wrong, how sure we are, on what basis, and
 * what an engineer should check next. Human wording lives in `title`/`explanation`/`actions`;
 * `id` and `severity` are for code.
 */

/** Severity, in increasing order of concern. */
export type Severity = "info" | "caution" | "warning";

/** The closed list of flag ids the advisory raises (issue 5). More may be added here, never elsewhere. */
export const FLAG_IDS = [
  "delayed-ettringite-formation",
  "sulfate-attack",
  "gypsum-formation",
  "magnesium-sulfate-attack",
  "thaumasite-formation",
  "carbonation-depassivation",
  "low-alkalinity-reserve",
  "chloride-binding-limit",
  "ettringite-dehydration",
  "exposure-class-noncompliance",
] as const;

export type FlagId = (typeof FLAG_IDS)[number];

/** How often a flag fired across Monte Carlo samples of the uncertain data. */
export type FlagRobustness = {
  /** Fraction of samples, 0–1, in which the flag was raised as a caution or warning (information does not count). */
  firedFraction: number;
  /** Number of samples evaluated. */
  samples: number;
  /** Samples that could not evaluate the flag (its scenario failed there), left out of `samples`; absent when none. */
  notEvaluated?: number;
};

export type Flag = {
  /** One of `FLAG_IDS`; a string is allowed for ids added by later scenarios. */
  id: FlagId | string;
  severity: Severity;
  title: string;
  /** The governing reaction and its ΔrG or saturation index at the conditions, in plain words. */
  explanation: string;
  /** The standard, paper, or "common practice" the flag rests on. */
  basis: string;
  /** What an engineer would check next. */
  actions: string[];
  robustness?: FlagRobustness;
};

const RANK: Record<Severity, number> = { info: 0, caution: 1, warning: 2 };

/** 0 for info, 1 for caution, 2 for warning. */
export function severityRank(severity: Severity): number {
  return RANK[severity];
}

export function isFlagId(id: string): id is FlagId {
  return (FLAG_IDS as readonly string[]).includes(id);
}

/**
 * Flags ordered for display: most severe first; within a severity, flags that fire in more Monte
 * Carlo samples first (flags without robustness data count as always fired), then by id so the order
 * is stable. Returns a new array.
 */
export function sortFlags(flags: readonly Flag[]): Flag[] {
  return [...flags].sort((a, b) => {
    const bySeverity = severityRank(b.severity) - severityRank(a.severity);
    if (bySeverity !== 0) return bySeverity;
    const fa = a.robustness?.firedFraction ?? 1;
    const fb = b.robustness?.firedFraction ?? 1;
    if (fa !== fb) return fb - fa;
    return String(a.id).localeCompare(String(b.id));
  });
}
