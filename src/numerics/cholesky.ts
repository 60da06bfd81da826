/**
 * Dense Cholesky factorisation A = L Lᵀ of a symmetric positive-definite
 * matrix (Golub & Van Loan 2013, Matrix Computations, 4th ed., §4.2), and the
 * "nested Galerkin" by-products that make one factorisation serve a whole
 * sequence of truncations.
 *
 * Why nested: when a Galerkin basis is ordered (coarse modes first), the
 * system for the first m basis functions is the leading m × m block A_m, and
 * the Cholesky factor of A_m is the leading block L_m of L. So with
 * y = L⁻¹ b and z = L⁻¹ j,
 *   bᵀ A_m⁻¹ b = Σ_{i<m} y_i²   and   jᵀ A_m⁻¹ b = Σ_{i<m} z_i y_i
 * for every m at once: the value of any linear functional of the m-mode
 * solution, for all m, from one factorisation and two triangular solves.
 * Extrapolating such a sequence in m is how the modal solvers reach their
 * accuracy (see ./extrapolation.ts).
 */

/**
 * Overwrites the lower triangle of the row-major n × n matrix `a` with L.
 * Returns false (leaving `a` partly overwritten) if a pivot is not positive
 * and finite, i.e. the matrix is not numerically positive definite.
 */
export function choleskyInPlace(a: Float64Array, n: number): boolean {
  for (let j = 0; j < n; j++) {
    const rowJ = j * n;
    let d = a[rowJ + j];
    for (let k = 0; k < j; k++) d -= a[rowJ + k] * a[rowJ + k];
    if (!(d > 0) || !Number.isFinite(d)) return false;
    const ljj = Math.sqrt(d);
    a[rowJ + j] = ljj;
    for (let i = j + 1; i < n; i++) {
      const rowI = i * n;
      let s = a[rowI + j];
      for (let k = 0; k < j; k++) s -= a[rowI + k] * a[rowJ + k];
      a[rowI + j] = s / ljj;
    }
  }
  return true;
}

/** Solves L y = b for the lower-triangular factor stored in `l` (row-major n × n). */
export function forwardSubstitute(l: Float64Array, b: ArrayLike<number>, n: number): Float64Array {
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const row = i * n;
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[row + k] * y[k];
    y[i] = s / l[row + i];
  }
  return y;
}

/**
 * Solution x of the leading m × m system A_m x = b_m, given y = L⁻¹ b from
 * {@link forwardSubstitute}: back substitution Lᵀ_m x = y_m.
 */
export function leadingSolution(l: Float64Array, n: number, y: ArrayLike<number>, m: number): Float64Array {
  const x = new Float64Array(m);
  for (let i = m - 1; i >= 0; i--) {
    let s = y[i];
    for (let k = i + 1; k < m; k++) s -= l[k * n + i] * x[k];
    x[i] = s / l[i * n + i];
  }
  return x;
}

/** Prefix sums Σ_{i<m} u_i v_i for m = 1 … n (entry m − 1): a functional's value on every truncation. */
export function nestedProducts(u: ArrayLike<number>, v: ArrayLike<number>): Float64Array {
  const out = new Float64Array(u.length);
  let s = 0;
  for (let i = 0; i < u.length; i++) {
    s += u[i] * v[i];
    out[i] = s;
  }
  return out;
}
