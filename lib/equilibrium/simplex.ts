/**
 * Linear programme min c·x subject to A·x = b, x ≥ 0, by the two-phase tableau simplex method with
 * Bland's anti-cycling rule (Dantzig 1963; Bland 1977, Math. Oper. Res. 2, 103).
 *
 * The equilibrium solver uses it for its initial approximation: the Gibbs energy without mixing terms
 * is linear in the mole numbers, and its LP optimum gives a starting phase set and element potentials
 * (the LP duals), as in the initial approximation of Karpov, Chudnenko & Kulik (1997, Am. J. Sci. 297, 767).
 * Sizes here are a few tens of rows and a few hundred columns.
 */
export type LinearProgramResult =
  | { status: "optimal"; x: Float64Array; duals: Float64Array; objective: number }
  | { status: "infeasible"; infeasibility: number }
  | { status: "iteration_limit"; iterations: number };

export function solveLinearProgram(
  a: Float64Array, // row-major m×n
  b: Float64Array,
  c: Float64Array,
  m: number,
  n: number,
  maxIterations = 5000,
): LinearProgramResult {
  const width = n + m + 1; // real columns, artificial columns, right-hand side
  const t = new Float64Array(m * width);
  const sign = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    sign[i] = b[i] < 0 ? -1 : 1;
    for (let j = 0; j < n; j++) t[i * width + j] = sign[i] * a[i * n + j];
    t[i * width + n + i] = 1;
    t[i * width + width - 1] = sign[i] * b[i];
  }
  const basis = new Int32Array(m);
  for (let i = 0; i < m; i++) basis[i] = n + i;
  const bScale = Math.max(1e-300, ...Array.from(b, Math.abs));
  const eps = 1e-11;
  let iterations = 0;

  // Reduced costs r_j = c_j − c_B·column_j of the current cost vector, kept up to date by each pivot
  // (a row operation like the constraint rows) instead of being recomputed from the tableau every iteration.
  const reduced = new Float64Array(n + m);
  const pivot = (row: number, col: number) => {
    const p = t[row * width + col];
    for (let j = 0; j < width; j++) t[row * width + j] /= p;
    for (let i = 0; i < m; i++) {
      if (i === row) continue;
      const f = t[i * width + col];
      if (f === 0) continue;
      for (let j = 0; j < width; j++) {
        const v = t[row * width + j];
        if (v !== 0) t[i * width + j] -= f * v;
      }
      t[i * width + col] = 0;
    }
    const f = reduced[col];
    if (f !== 0) {
      for (let j = 0; j < n + m; j++) {
        const v = t[row * width + j];
        if (v !== 0) reduced[j] -= f * v;
      }
      reduced[col] = 0;
    }
    basis[row] = col;
  };

  // Runs the simplex for a cost vector over the first `allowed` columns; returns false on the limit.
  const optimise = (cost: Float64Array, allowed: number): boolean => {
    for (let j = 0; j < n + m; j++) {
      let r = cost[j];
      for (let i = 0; i < m; i++) r -= cost[basis[i]] * t[i * width + j];
      reduced[j] = r;
    }
    for (;;) {
      if (++iterations > maxIterations) return false;
      // Bland: the first improving column enters.
      let entering = -1;
      for (let j = 0; j < allowed; j++) {
        if (reduced[j] < -eps * (1 + Math.abs(cost[j]))) {
          entering = j;
          break;
        }
      }
      if (entering < 0) return true;
      let leaving = -1;
      let bestRatio = Infinity;
      for (let i = 0; i < m; i++) {
        const coef = t[i * width + entering];
        if (coef > 1e-12) {
          const ratio = t[i * width + width - 1] / coef;
          if (ratio < bestRatio - 1e-15 || (Math.abs(ratio - bestRatio) <= 1e-15 && basis[i] < basis[leaving])) {
            bestRatio = ratio;
            leaving = i;
          }
        }
      }
      if (leaving < 0) return true; // unbounded direction: callers bound the problem, so stop here
      pivot(leaving, entering);
    }
  };

  const phaseOneCost = new Float64Array(n + m);
  for (let j = n; j < n + m; j++) phaseOneCost[j] = 1;
  const phaseTwoCost = new Float64Array(n + m);
  phaseTwoCost.set(c);
  if (!optimise(phaseOneCost, n + m)) return { status: "iteration_limit", iterations };
  let infeasibility = 0;
  for (let i = 0; i < m; i++) if (basis[i] >= n) infeasibility += t[i * width + width - 1];
  if (infeasibility > 1e-9 * bScale) return { status: "infeasible", infeasibility };
  // Drive zero-level artificials out of the basis where a real column allows it.
  for (let i = 0; i < m; i++) {
    if (basis[i] < n) continue;
    for (let j = 0; j < n; j++) {
      if (Math.abs(t[i * width + j]) > 1e-9) {
        pivot(i, j);
        break;
      }
    }
  }
  if (!optimise(phaseTwoCost, n)) return { status: "iteration_limit", iterations };

  const x = new Float64Array(n);
  for (let i = 0; i < m; i++) if (basis[i] < n) x[basis[i]] = Math.max(0, t[i * width + width - 1]);
  // Duals y = c_B·B⁻¹; B⁻¹ sits in the artificial columns (times the row signs).
  const duals = new Float64Array(m);
  for (let k = 0; k < m; k++) {
    let y = 0;
    for (let i = 0; i < m; i++) {
      const cb = basis[i] < n ? c[basis[i]] : 0;
      y += cb * t[i * width + n + k];
    }
    duals[k] = y * sign[k];
  }
  let objective = 0;
  for (let j = 0; j < n; j++) objective += c[j] * x[j];
  return { status: "optimal", x, duals, objective };
}
