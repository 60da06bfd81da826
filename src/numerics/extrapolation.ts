/**
 * Extrapolation of a sequence of approximations to infinite resolution when
 * the error is a sum of known powers of the resolution:
 *   v(M) = v∞ + Σ_k c_k M^(−p_k)
 * (Richardson 1911, Phil. Trans. R. Soc. A 210, 307, generalised to several
 * known exponents; Sidi 2003, Practical Extrapolation Methods, Cambridge,
 * ch. 1 — both from memory). With as many points as unknowns this is exact
 * elimination of the listed terms; with more points it is a least-squares
 * fit, which damps the irregular part of the error.
 */
import { solveDense } from './linalg.js';

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
  // Columns scaled by the finest resolution's powers so the normal matrix stays well conditioned.
  const reference = resolutions[count - 1];
  const basis = new Float64Array(count * unknowns);
  for (let i = 0; i < count; i++) {
    basis[i * unknowns] = 1;
    for (let k = 1; k < unknowns; k++) basis[i * unknowns + k] = (resolutions[i] / reference) ** -exponents[k - 1];
  }
  const normal = new Float64Array(unknowns * unknowns);
  const rhs = new Float64Array(unknowns);
  for (let i = 0; i < count; i++) {
    for (let r = 0; r < unknowns; r++) {
      const br = basis[i * unknowns + r];
      rhs[r] += br * values[i];
      for (let c = 0; c < unknowns; c++) normal[r * unknowns + c] += br * basis[i * unknowns + c];
    }
  }
  const solution = solveDense(normal, rhs, unknowns);
  if (!solution || !Number.isFinite(solution[0])) return { value: finest, points: count };
  return { value: solution[0], points: count };
}
