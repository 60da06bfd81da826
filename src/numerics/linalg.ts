/**
 * Dense and banded linear algebra for small systems: LU with partial
 * pivoting (Golub & Van Loan 2013, Matrix Computations 4th ed., §3.4) and
 * the tridiagonal (Thomas) algorithm (Golub & Van Loan §4.3).
 */

/** Solve A x = b for a dense row-major n×n matrix (inputs untouched); returns x, or null if singular. */
export function solveDense(matrix: Float64Array | number[], rhs: Float64Array | number[], n: number): Float64Array | null {
  const x = Float64Array.from(rhs);
  return solveDenseInPlace(Float64Array.from(matrix), x, n) ? x : null;
}

/**
 * Solve A x = b by Gaussian elimination with partial pivoting, overwriting
 * `matrix` with its factors and `rhs` with x (no allocation, for solvers that
 * reuse one workspace every iteration). Returns false if singular.
 */
export function solveDenseInPlace(a: Float64Array, x: Float64Array, n: number): boolean {
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
    if (max === 0 || !Number.isFinite(max)) return false;
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
  return true;
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
  const multipliers = new Float64Array(n);
  const pivots = new Float64Array(n);
  factorTridiagonal(lower, diag, upper, multipliers, pivots);
  const x = new Float64Array(n);
  solveFactoredTridiagonal(lower, multipliers, pivots, rhs, x);
  return x;
}

/**
 * The elimination of {@link solveTridiagonal} (the Thomas algorithm) kept apart from the substitutions, for a
 * matrix solved with several right-hand sides: multipliers[i] = upper[i−1]/pivots[i−1], pivots[i] = diag[i] −
 * lower[i]·multipliers[i] (pivots[0] = diag[0]).
 */
export function factorTridiagonal(
  lower: ArrayLike<number>,
  diag: ArrayLike<number>,
  upper: ArrayLike<number>,
  multipliers: Float64Array,
  pivots: Float64Array,
): void {
  const n = diag.length;
  pivots[0] = diag[0];
  for (let i = 1; i < n; i++) {
    multipliers[i] = upper[i - 1] / pivots[i - 1];
    pivots[i] = diag[i] - lower[i] * multipliers[i];
  }
}

/** Forward and back substitution with the factors of {@link factorTridiagonal}; writes the solution to x. */
export function solveFactoredTridiagonal(
  lower: ArrayLike<number>,
  multipliers: ArrayLike<number>,
  pivots: ArrayLike<number>,
  rhs: ArrayLike<number>,
  x: Float64Array,
): void {
  const n = pivots.length;
  x[0] = rhs[0] / pivots[0];
  for (let i = 1; i < n; i++) x[i] = (rhs[i] - lower[i] * x[i - 1]) / pivots[i];
  for (let i = n - 2; i >= 0; i--) x[i] -= multipliers[i + 1] * x[i + 1];
}

/**
 * Solve a general tridiagonal system (same layout as {@link solveTridiagonal})
 * by Gaussian elimination with partial pivoting, which adds one
 * super-diagonal of fill (Golub & Van Loan 2013, §4.3); no diagonal
 * dominance needed. Returns null if singular.
 */
export function solveTridiagonalPivoting(
  lower: ArrayLike<number>,
  diag: ArrayLike<number>,
  upper: ArrayLike<number>,
  rhs: ArrayLike<number>,
): Float64Array | null {
  const n = diag.length;
  const d = Float64Array.from(diag);
  const du = new Float64Array(n);
  const du2 = new Float64Array(n);
  const dl = new Float64Array(n);
  const x = Float64Array.from(rhs);
  for (let i = 0; i < n - 1; i++) du[i] = upper[i];
  for (let i = 1; i < n; i++) dl[i] = lower[i];
  for (let i = 0; i < n - 1; i++) {
    // Row i holds d[i], du[i], du2[i]; row i+1 holds dl[i+1], d[i+1], du[i+1].
    if (Math.abs(dl[i + 1]) > Math.abs(d[i])) {
      const f = d[i] / dl[i + 1];
      const a0 = dl[i + 1];
      const a1 = d[i + 1];
      const a2 = i + 1 < n - 1 ? du[i + 1] : 0;
      const b1 = du[i];
      const b2 = du2[i];
      d[i] = a0;
      du[i] = a1;
      du2[i] = a2;
      d[i + 1] = b1 - f * a1;
      if (i + 1 < n - 1) du[i + 1] = b2 - f * a2;
      const t = x[i];
      x[i] = x[i + 1];
      x[i + 1] = t - f * x[i + 1];
    } else {
      if (d[i] === 0) return null;
      const f = dl[i + 1] / d[i];
      d[i + 1] -= f * du[i];
      if (i + 1 < n - 1) du[i + 1] -= f * du2[i];
      x[i + 1] -= f * x[i];
    }
  }
  if (d[n - 1] === 0 || !Number.isFinite(d[n - 1])) return null;
  x[n - 1] /= d[n - 1];
  if (n > 1) x[n - 2] = (x[n - 2] - du[n - 2] * x[n - 1]) / d[n - 2];
  for (let i = n - 3; i >= 0; i--) x[i] = (x[i] - du[i] * x[i + 1] - du2[i] * x[i + 2]) / d[i];
  for (let i = 0; i < n; i++) if (!Number.isFinite(x[i])) return null;
  return x;
}
