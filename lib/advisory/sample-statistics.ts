/**
 * Summary statistics of Monte Carlo samples, and the robust/uncertain reading of a flag's fired fraction.
 */

export type SampleSummary = {
  count: number;
  mean: number;
  /** Sample standard deviation (divisor n − 1); 0 for a single sample. */
  standardDeviation: number;
  min: number;
  max: number;
  p5: number;
  p50: number;
  p95: number;
};

/**
 * The p-th quantile (0 ≤ p ≤ 1) by linear interpolation between order statistics, definition 7 of
 * Hyndman & Fan (1996, Am. Stat. 50, 361): h = (n − 1)p, Q = x⌊h⌋ + (h − ⌊h⌋)(x⌊h⌋+1 − x⌊h⌋).
 * `sorted` must be ascending and non-empty.
 */
export function quantileOfSorted(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) throw new RangeError("quantile of an empty sample");
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile p must be within 0–1, got ${p}`);
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/** Mean, standard deviation, extremes and P5/P50/P95 of finite values; throws on an empty or non-finite sample. */
export function summarise(values: readonly number[]): SampleSummary {
  if (values.length === 0) throw new RangeError("cannot summarise an empty sample");
  if (values.some((v) => !Number.isFinite(v))) throw new RangeError("sample contains a non-finite value");
  const n = values.length;
  const mean = values.reduce((a, v) => a + v, 0) / n;
  const sumSquares = values.reduce((a, v) => a + (v - mean) ** 2, 0);
  const sorted = [...values].sort((a, b) => a - b);
  return {
    count: n,
    mean,
    standardDeviation: n > 1 ? Math.sqrt(sumSquares / (n - 1)) : 0,
    min: sorted[0],
    max: sorted[n - 1],
    p5: quantileOfSorted(sorted, 0.05),
    p50: quantileOfSorted(sorted, 0.5),
    p95: quantileOfSorted(sorted, 0.95),
  };
}

/** Fraction (0–1) of samples that are true. */
export function firedFraction(fired: readonly boolean[]): number {
  if (fired.length === 0) throw new RangeError("fired fraction of an empty sample");
  return fired.filter(Boolean).length / fired.length;
}

export type RobustnessClass = "robust-fires" | "robust-silent" | "uncertain";

/**
 * Thresholds of the robust/uncertain reading. The 90 %/10 % defaults are a project convention
 * (common practice in reporting the agreement of ensemble runs), not a standard.
 */
export type RobustnessThresholds = { robustFiresAtLeast: number; robustSilentAtMost: number };
export const DEFAULT_ROBUSTNESS_THRESHOLDS: RobustnessThresholds = { robustFiresAtLeast: 0.9, robustSilentAtMost: 0.1 };

/** Fired in ≥ 90 % of samples → robust-fires; ≤ 10 % → robust-silent; otherwise uncertain. */
export function classifyRobustness(
  fraction: number,
  thresholds: RobustnessThresholds = DEFAULT_ROBUSTNESS_THRESHOLDS,
): RobustnessClass {
  if (!(fraction >= 0 && fraction <= 1)) throw new RangeError(`fired fraction must be within 0–1, got ${fraction}`);
  if (fraction >= thresholds.robustFiresAtLeast) return "robust-fires";
  if (fraction <= thresholds.robustSilentAtMost) return "robust-silent";
  return "uncertain";
}

/** The robustness record of a flag (lib/advisory/flag.ts) from whether it fired in each sample. */
export function flagRobustness(fired: readonly boolean[]): { firedFraction: number; samples: number; reading: RobustnessClass } {
  const fraction = firedFraction(fired);
  return { firedFraction: fraction, samples: fired.length, reading: classifyRobustness(fraction) };
}
