/**
 * Solves A·x = b for a small dense matrix by LU decomposition with row equilibration and partial
 * pivoting (Golub & Van Loan, Matrix Computations, 4th ed., §3.4). Runs in O(n³); n is at most a few
 * tens here (elements plus active phases).
 *
 * `matrix` is row-major n×n and is overwritten; `rhs` is overwritten with the solution.
 * Returns false when a pivot falls below `singularTolerance` after equilibration (each row scaled to
 * a largest entry of 1), which is how the solver detects a phase set that violates the phase rule.
 */
export function solveInPlace(matrix: Float64Array, rhs: Float64Array, n: number, singularTolerance = 1e-12): boolean {
  const columns = columnBuffer(n);
  for (let i = 0; i < n; i++) {
    let rowMax = 0;
    for (let j = 0; j < n; j++) rowMax = Math.max(rowMax, Math.abs(matrix[i * n + j]));
    if (rowMax === 0 || !Number.isFinite(rowMax)) return false;
    const scale = 1 / rowMax;
    for (let j = 0; j < n; j++) matrix[i * n + j] *= scale;
    rhs[i] *= scale;
  }
  for (let k = 0; k < n; k++) {
    let pivotRow = k;
    let pivotAbs = Math.abs(matrix[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(matrix[i * n + k]);
      if (v > pivotAbs) {
        pivotAbs = v;
        pivotRow = i;
      }
    }
    if (!(pivotAbs > singularTolerance)) return false;
    if (pivotRow !== k) {
      for (let j = 0; j < n; j++) {
        const t = matrix[k * n + j];
        matrix[k * n + j] = matrix[pivotRow * n + j];
        matrix[pivotRow * n + j] = t;
      }
      const t = rhs[k];
      rhs[k] = rhs[pivotRow];
      rhs[pivotRow] = t;
    }
    const pivot = matrix[k * n + k];
    // The Newton matrices are sparse (a pure solid's row has its few elements only): eliminate with the pivot row's
    // non-zero entries alone (subtracting factor·0 would change nothing).
    let count = 0;
    for (let j = k + 1; j < n; j++) if (matrix[k * n + j] !== 0) columns[count++] = j;
    for (let i = k + 1; i < n; i++) {
      const factor = matrix[i * n + k] / pivot;
      if (factor === 0) continue;
      matrix[i * n + k] = 0;
      for (let c = 0; c < count; c++) {
        const j = columns[c];
        matrix[i * n + j] -= factor * matrix[k * n + j];
      }
      rhs[i] -= factor * rhs[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let sum = rhs[i];
    for (let j = i + 1; j < n; j++) sum -= matrix[i * n + j] * rhs[j];
    rhs[i] = sum / matrix[i * n + i];
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(rhs[i])) return false;
  return true;
}

let sharedColumns = new Int32Array(64);
/** Scratch space for the column indices of one pivot row (grown when a larger matrix comes). */
function columnBuffer(n: number): Int32Array {
  if (sharedColumns.length < n) sharedColumns = new Int32Array(2 * n);
  return sharedColumns;
}
