/**
 * Solves a tridiagonal system in place by the Thomas algorithm (no pivoting; the heat-conduction
 * matrices here are diagonally dominant). Row i: lower[i]·x[i−1] + diagonal[i]·x[i] + upper[i]·x[i+1] = rhs[i].
 * `scratch` must have the length of the system; the solution is written to `x`.
 */
export function solveTridiagonal(
  lower: Float64Array,
  diagonal: Float64Array,
  upper: Float64Array,
  rhs: Float64Array,
  x: Float64Array,
  scratch: Float64Array,
): void {
  const n = diagonal.length;
  let denominator = diagonal[0];
  scratch[0] = upper[0] / denominator;
  x[0] = rhs[0] / denominator;
  for (let i = 1; i < n; i++) {
    denominator = diagonal[i] - lower[i] * scratch[i - 1];
    scratch[i] = i < n - 1 ? upper[i] / denominator : 0;
    x[i] = (rhs[i] - lower[i] * x[i - 1]) / denominator;
  }
  for (let i = n - 2; i >= 0; i--) x[i] -= scratch[i] * x[i + 1];
}
