/**
 * Shape-preserving piecewise-cubic Hermite interpolation of tabulated data
 * (Fritsch & Carlson 1980, "Monotone piecewise cubic interpolation", SIAM J.
 * Numer. Anal. 17, 238–246, doi:10.1137/0717021): the interpolant is C¹ and
 * monotone wherever the data are, so a tabulated monotone relation keeps its
 * inverse well defined and a Newton iteration through it sees no kinks.
 */

export interface Interpolant {
  /** Value at x; clamped to the end values outside the table. */
  value(x: number): number;
  /** Derivative at x (zero outside the table). */
  derivative(x: number): number;
}

/**
 * Builds the interpolant through (xs[i], ys[i]); xs strictly increasing, at
 * least two points. Derivatives at the nodes: harmonic mean of the adjacent
 * secants where they agree in sign, zero at local extrema (the Fritsch–Butland
 * choice, which satisfies the Fritsch–Carlson monotonicity conditions).
 */
export function monotoneCubic(xs: ArrayLike<number>, ys: ArrayLike<number>): Interpolant {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError('monotoneCubic needs at least two points and equal lengths');
  const x = Float64Array.from(xs);
  const y = Float64Array.from(ys);
  const secant = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    const h = x[i + 1] - x[i];
    if (!(h > 0)) throw new RangeError('monotoneCubic needs strictly increasing abscissae');
    secant[i] = (y[i + 1] - y[i]) / h;
  }
  const slope = new Float64Array(n);
  slope[0] = secant[0];
  slope[n - 1] = secant[n - 2];
  for (let i = 1; i < n - 1; i++) {
    const a = secant[i - 1];
    const b = secant[i];
    slope[i] = a * b > 0 ? (2 * a * b) / (a + b) : 0;
  }
  // End slopes: keep them no steeper than three times the end secant (Fritsch–Carlson region).
  for (const [k, s] of [
    [0, secant[0]],
    [n - 1, secant[n - 2]],
  ] as const) {
    if (slope[k] * s <= 0) slope[k] = 0;
    else if (Math.abs(slope[k]) > 3 * Math.abs(s)) slope[k] = 3 * s;
  }

  const locate = (t: number): number => {
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (x[mid] <= t) lo = mid;
      else hi = mid;
    }
    return lo;
  };

  return {
    value(t: number): number {
      if (!(t > x[0])) return y[0];
      if (t >= x[n - 1]) return y[n - 1];
      const i = locate(t);
      const h = x[i + 1] - x[i];
      const s = (t - x[i]) / h;
      const s2 = s * s;
      const s3 = s2 * s;
      return (
        (2 * s3 - 3 * s2 + 1) * y[i] + (s3 - 2 * s2 + s) * h * slope[i] + (-2 * s3 + 3 * s2) * y[i + 1] + (s3 - s2) * h * slope[i + 1]
      );
    },
    derivative(t: number): number {
      if (!(t > x[0]) || t >= x[n - 1]) return 0;
      const i = locate(t);
      const h = x[i + 1] - x[i];
      const s = (t - x[i]) / h;
      const s2 = s * s;
      return (
        ((6 * s2 - 6 * s) * y[i]) / h + (3 * s2 - 4 * s + 1) * slope[i] + ((-6 * s2 + 6 * s) * y[i + 1]) / h + (3 * s2 - 2 * s) * slope[i + 1]
      );
    },
  };
}
