/**
 * Extrapolation of a sequence of approximations to infinite resolution when
 * the error is a sum of known powers of the resolution:
 *   v(M) = v∞ + Σ_k c_k M^(−p_k)
 * (Richardson 1911, Phil. Trans. R. Soc. Lond. A 210, 307–357,
 * doi:10.1098/rsta.1911.0009, generalised to several known exponents: common
 * practice, no source). With as many points as unknowns this is exact
 * elimination of the listed terms; with more points it is a least-squares
 * fit, which damps the irregular part of the error.
 */
export interface ExtrapolationResult {
  /** Estimate of v∞. */
  value: number;
  /** Number of points used. */
  points: number;
}

/**
 * Fits v(M) = v∞ + Σ c_k M^(−p_k) to (resolutions[i], values[i]) and returns v∞.
 * Needs at least exponents.length + 1 points with distinct positive resolutions;
 * with fewer points the highest exponents are dropped. Returns the finest value
 * unchanged if the fit is singular.
 */
export function extrapolateToInfiniteResolution(
  resolutions: ArrayLike<number>,
  values: ArrayLike<number>,
  exponents: readonly number[],
): ExtrapolationResult {
  const count = resolutions.length;
  const terms = Math.min(exponents.length, count - 1);
  const finest = values[count - 1];
  if (terms <= 0) return { value: finest, points: count };
  const unknowns = terms + 1;
  // Columns scaled by the finest resolution's powers; solved by Householder QR rather than the normal
  // equations, whose squared condition number loses everything when the resolutions are close together
  // (consecutive mode counts; Golub & Van Loan 2013, §5.3).
  const reference = resolutions[count - 1];
  const a = new Float64Array(count * unknowns);
  const rhs = Float64Array.from({ length: count }, (_, i) => values[i]);
  for (let i = 0; i < count; i++) {
    a[i * unknowns] = 1;
    for (let k = 1; k < unknowns; k++) a[i * unknowns + k] = (resolutions[i] / reference) ** -exponents[k - 1];
  }
  const solution = leastSquares(a, rhs, count, unknowns);
  if (!solution || !Number.isFinite(solution[0])) return { value: finest, points: count };
  return { value: solution[0], points: count };
}

/** min ‖A x − b‖ for a row-major m × n matrix (m ≥ n) by Householder QR; null if A is rank-deficient. A and b are overwritten. */
function leastSquares(a: Float64Array, b: Float64Array, m: number, n: number): Float64Array | null {
  for (let k = 0; k < n; k++) {
    let norm = 0;
    for (let i = k; i < m; i++) norm += a[i * n + k] * a[i * n + k];
    norm = Math.sqrt(norm);
    if (norm === 0) return null;
    const alpha = a[k * n + k] > 0 ? -norm : norm;
    // v = column k below the diagonal minus alpha·e_k; reflect the remaining columns and b.
    const v = new Float64Array(m - k);
    for (let i = k; i < m; i++) v[i - k] = a[i * n + k];
    v[0] -= alpha;
    let vv = 0;
    for (let i = 0; i < v.length; i++) vv += v[i] * v[i];
    if (vv === 0) continue;
    for (let j = k; j < n; j++) {
      let dot = 0;
      for (let i = k; i < m; i++) dot += v[i - k] * a[i * n + j];
      const f = (2 * dot) / vv;
      for (let i = k; i < m; i++) a[i * n + j] -= f * v[i - k];
    }
    let dot = 0;
    for (let i = k; i < m; i++) dot += v[i - k] * b[i];
    const f = (2 * dot) / vv;
    for (let i = k; i < m; i++) b[i] -= f * v[i - k];
  }
  const x = new Float64Array(n);
  for (let k = n - 1; k >= 0; k--) {
    let sum = b[k];
    for (let j = k + 1; j < n; j++) sum -= a[k * n + j] * x[j];
    const diagonal = a[k * n + k];
    if (diagonal === 0) return null;
    x[k] = sum / diagonal;
  }
  return x;
}
