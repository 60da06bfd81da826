/**
 * Dense and banded linear algebra for small systems: LU with partial
 * pivoting (Golub & Van Loan 2013, Matrix Computations 4th ed., §3.4) and
 * the tridiagonal (Thomas) algorithm (Golub & Van Loan §4.3).
 */

/** Solve A x = b in place for a dense row-major n×n matrix; returns x, or null if singular. */
export function solveDense(matrix: Float64Array | number[], rhs: Float64Array | number[], n: number): Float64Array | null {
  const a = Float64Array.from(matrix);
  const x = Float64Array.from(rhs);
  for (let k = 0; k < n; k++) {
    let pivot = k;
    let max = Math.abs(a[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]);
      if (v > max) {
        max = v;
        pivot = i;
      }
    }
    if (max === 0 || !Number.isFinite(max)) return null;
    if (pivot !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j];
        a[k * n + j] = a[pivot * n + j];
        a[pivot * n + j] = t;
      }
      const t = x[k];
      x[k] = x[pivot];
      x[pivot] = t;
    }
    const akk = a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const factor = a[i * n + k] / akk;
      if (factor === 0) continue;
      a[i * n + k] = 0;
      for (let j = k + 1; j < n; j++) a[i * n + j] -= factor * a[k * n + j];
      x[i] -= factor * x[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let j = i + 1; j < n; j++) s -= a[i * n + j] * x[j];
    x[i] = s / a[i * n + i];
  }
  return x;
}

/**
 * Solve a tridiagonal system: lower[i]·x[i−1] + diag[i]·x[i] + upper[i]·x[i+1] = rhs[i]
 * (lower[0] and upper[n−1] are ignored). Stable for diagonally dominant systems.
 */
export function solveTridiagonal(
  lower: ArrayLike<number>,
  diag: ArrayLike<number>,
  upper: ArrayLike<number>,
  rhs: ArrayLike<number>,
): Float64Array {
  const n = diag.length;
  const c = new Float64Array(n);
  const x = new Float64Array(n);
  let beta = diag[0];
  x[0] = rhs[0] / beta;
  for (let i = 1; i < n; i++) {
    c[i] = upper[i - 1] / beta;
    beta = diag[i] - lower[i] * c[i];
    x[i] = (rhs[i] - lower[i] * x[i - 1]) / beta;
  }
  for (let i = n - 2; i >= 0; i--) x[i] -= c[i + 1] * x[i + 1];
  return x;
}
