/**
 * Inverse of a symmetric positive-definite Toeplitz matrix in O(n²):
 * Durbin's algorithm for the Yule–Walker system gives the first column b of
 * the inverse B, and the rest follows from the displacement identity
 * B(i+1, j+1) = B(i, j) + (b_{i+1} b_{j+1} − b_{n−1−i} b_{n−1−j})/b_0 (Trench's
 * algorithm; Golub, G. H. & Van Loan, C. F. 2013, Matrix Computations, 4th
 * ed., Johns Hopkins University Press; the identity is checked numerically
 * in the tests: T·B = I). A dense LU costs O(n³).
 */

/**
 * Solve the Yule–Walker system T_m y = −(r_1, …, r_m) for the unit-diagonal
 * symmetric Toeplitz T_m with first row (1, r_1, …, r_{m−1}) (Durbin).
 * Returns null if T_m is not positive definite.
 */
function durbin(r: ArrayLike<number>, m: number): Float64Array | null {
  const y = new Float64Array(m);
  const z = new Float64Array(m);
  if (m === 0) return y;
  y[0] = -r[1];
  let beta = 1;
  let alpha = -r[1];
  for (let k = 1; k < m; k++) {
    beta *= 1 - alpha * alpha;
    if (!(beta > 0)) return null;
    let acc = r[k + 1];
    for (let i = 0; i < k; i++) acc += r[k - i] * y[i];
    alpha = -acc / beta;
    for (let i = 0; i < k; i++) z[i] = y[i] + alpha * y[k - 1 - i];
    for (let i = 0; i < k; i++) y[i] = z[i];
    y[k] = alpha;
  }
  return y;
}

/**
 * Inverse of the symmetric Toeplitz matrix with first row `firstRow`
 * (length n), row-major n×n. Returns null if the matrix is not positive
 * definite (or its diagonal is not positive).
 */
export function invertSymmetricToeplitz(firstRow: ArrayLike<number>): Float64Array | null {
  const n = firstRow.length;
  const t0 = firstRow[0];
  if (!(t0 > 0)) return null;
  const B = new Float64Array(n * n);
  if (n === 1) {
    B[0] = 1 / t0;
    return B;
  }
  const r = new Float64Array(n);
  for (let k = 0; k < n; k++) r[k] = firstRow[k] / t0;
  const m = n - 1;
  const y = durbin(r, m);
  if (!y) return null;
  let dot = 1;
  for (let i = 0; i < m; i++) dot += r[i + 1] * y[i];
  const gamma = 1 / dot;
  if (!(gamma > 0) || !Number.isFinite(gamma)) return null;
  // First column b = γ(1, y_1, …, y_{n−1}); then the Gohberg–Semencul/Trench recursion
  // B(i+1, j+1) = B(i, j) + (b_{i+1} b_{j+1} − b_{n−1−i} b_{n−1−j})/b_0 (0-based), and symmetry.
  const b = new Float64Array(n);
  b[0] = gamma;
  for (let i = 1; i < n; i++) b[i] = gamma * y[i - 1];
  for (let j = 0; j < n; j++) {
    B[j] = b[j];
    B[j * n] = b[j];
  }
  for (let i = 0; i < n - 1; i++) {
    for (let j = i; j < n - 1; j++) {
      const value = B[i * n + j] + (b[i + 1] * b[j + 1] - b[n - 1 - i] * b[n - 1 - j]) / b[0];
      B[(i + 1) * n + j + 1] = value;
      B[(j + 1) * n + i + 1] = value;
    }
  }
  for (let k = 0; k < n * n; k++) B[k] /= t0;
  return B;
}
