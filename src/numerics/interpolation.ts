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
 * Node derivatives of the monotone interpolant (the Fritsch–Butland choice of {@link monotoneCubic}): harmonic
 * mean of the adjacent secants where they agree in sign, zero at local extrema, end slopes kept within three
 * times the end secant. x strictly increasing (checked), at least two points.
 */
function fritschButlandSlopes(x: Float64Array, y: Float64Array): Float64Array {
  const n = x.length;
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

  return slope;
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
  const slope = fritschButlandSlopes(x, y);
  // Interval lookup in O(1) on average: n equal buckets over [x₀, x_{n−1}] each remember the interval
  // holding their left edge, and a short forward walk finds the last node ≤ t: the same interval a
  // bisection returns, so the values are those of the plain search (uniform tables need no walk).
  const span = x[n - 1] - x[0];
  const bucketsPerUnit = (n - 1) / span;
  const bucketStart = new Int32Array(n);
  for (let k = 0, i = 0; k < n; k++) {
    const edge = x[0] + k / bucketsPerUnit;
    while (i < n - 2 && x[i + 1] <= edge) i++;
    bucketStart[k] = i;
  }
  const locate = (t: number): number => {
    let i = bucketStart[Math.min(n - 1, Math.floor((t - x[0]) * bucketsPerUnit))];
    while (i > 0 && x[i] > t) i--; // t a rounding below its bucket's edge
    while (i < n - 2 && x[i + 1] <= t) i++;
    return i;
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

/**
 * Four-point Lagrange stencil on a uniform grid x_i = start + i·step, i = 0 … count − 1 (count ≥ 4):
 * the first of the four nodes and their weights, so that f(x) ≈ Σ_q weights[q]·f(x_{first+q}).
 * Cubic interpolation, error O(step⁴ f'''') ([derived]: the Lagrange remainder f⁗(ξ)/4! · Π_q (x − x_q)).
 * x outside the grid is clamped to its ends (`clamped` tells which);
 * the caller decides how to treat such points.
 */
export interface UniformStencil {
  first: number;
  weights: [number, number, number, number];
  clamped: 'below' | 'above' | null;
}

export function uniformCubicStencil(start: number, step: number, count: number, x: number): UniformStencil {
  if (!(count >= 4) || !(step > 0)) throw new RangeError('uniformCubicStencil needs at least four nodes and a positive step');
  const last = start + (count - 1) * step;
  const clamped = x < start ? 'below' : x > last ? 'above' : null;
  const t = (Math.min(Math.max(x, start), last) - start) / step;
  const first = Math.min(Math.max(Math.floor(t) - 1, 0), count - 4);
  const u = t - first; // position in units of step from node `first`, 0 ≤ u ≤ 3
  const weights: [number, number, number, number] = [
    (-(u - 1) * (u - 2) * (u - 3)) / 6,
    (u * (u - 2) * (u - 3)) / 2,
    (-u * (u - 1) * (u - 3)) / 2,
    (u * (u - 1) * (u - 2)) / 6,
  ];
  return { first, weights, clamped };
}

/** Applies a stencil to tabulated rows of equal length: out[k] = Σ_q w_q rows[first + q][k]. */
export function applyStencil(stencil: UniformStencil, rows: readonly ArrayLike<number>[], out?: Float64Array): Float64Array {
  const a = rows[stencil.first];
  const b = rows[stencil.first + 1];
  const c = rows[stencil.first + 2];
  const d = rows[stencil.first + 3];
  const [wa, wb, wc, wd] = stencil.weights;
  const result = out ?? new Float64Array(a.length);
  for (let k = 0; k < a.length; k++) result[k] = wa * a[k] + wb * b[k] + wc * c[k] + wd * d[k];
  return result;
}

/**
 * Largest |p(t)| on [0, 1] of the polynomial interpolating `values` at the Chebyshev–Lobatto points
 * t_k = (1 − cos(πk/n))/2, k = 0 … n, evaluated by the barycentric formula (weights (−1)^k, halved
 * at both ends; Berrut, J.-P. & Trefethen, L. N. 2004, Barycentric Lagrange interpolation, SIAM Rev.
 * 46(3), 501–517, eq. (5.4)): a scan at 8n
 * points, then golden-section refinement around the best one. Returns the value and its position t.
 */
export function maxAbsChebyshevLobatto(values: ArrayLike<number>): { value: number; at: number } {
  const n = values.length - 1;
  if (n < 1) return { value: Math.abs(values[0] ?? 0), at: 0 };
  const nodes = new Float64Array(n + 1);
  for (let k = 0; k <= n; k++) nodes[k] = (1 - Math.cos((Math.PI * k) / n)) / 2;
  const evaluate = (t: number): number => {
    let num = 0;
    let den = 0;
    for (let k = 0; k <= n; k++) {
      const diff = t - nodes[k];
      if (diff === 0) return values[k];
      const w = (k % 2 === 0 ? 1 : -1) * (k === 0 || k === n ? 0.5 : 1);
      num += (w * values[k]) / diff;
      den += w / diff;
    }
    return num / den;
  };
  const samples = 8 * n;
  let bestT = 0;
  let best = -1;
  for (let q = 0; q <= samples; q++) {
    const t = q / samples;
    const v = Math.abs(evaluate(t));
    if (v > best) {
      best = v;
      bestT = t;
    }
  }
  let lo = Math.max(0, bestT - 1 / samples);
  let hi = Math.min(1, bestT + 1 / samples);
  const ratio = (Math.sqrt(5) - 1) / 2;
  for (let iteration = 0; iteration < 40; iteration++) {
    const a = hi - ratio * (hi - lo);
    const b = lo + ratio * (hi - lo);
    if (Math.abs(evaluate(a)) >= Math.abs(evaluate(b))) hi = b;
    else lo = a;
  }
  const t = 0.5 * (lo + hi);
  const refined = Math.abs(evaluate(t));
  return refined >= best ? { value: refined, at: t } : { value: best, at: bestT };
}

/**
 * Monotone cubics of several columns tabulated on one uniform grid x_k = start + k·step (k = 0 … n − 1),
 * evaluated together: the interval and the Hermite basis are found once per abscissa and shared by the
 * columns (the drainage model reads both duct coefficients at every face of every flux evaluation). Each
 * column's slopes and values are those of {@link monotoneCubic} on the same points; t outside the grid is
 * clamped to its ends. Writes column c's value at t to out[c].
 */
export function uniformMonotoneCubics(start: number, step: number, columns: readonly ArrayLike<number>[]): (t: number, out: Float64Array) => void {
  const n = columns[0]?.length ?? 0;
  if (n < 2 || !(step > 0) || columns.some((c) => c.length !== n)) throw new RangeError('uniformMonotoneCubics needs at least two points per column, equal lengths and a positive step');
  const x = Float64Array.from({ length: n }, (_, k) => start + k * step);
  const values = columns.map((c) => Float64Array.from(c));
  // Node slopes times the step: the Hermite tangent terms in the unit interval.
  const tangents = values.map((y) => fritschButlandSlopes(x, y).map((m) => m * step));
  const m = columns.length;
  const last = n - 1;
  return (t: number, out: Float64Array): void => {
    const u = (t - start) / step;
    if (!(u > 0)) {
      for (let c = 0; c < m; c++) out[c] = values[c][0];
      return;
    }
    if (u >= last) {
      for (let c = 0; c < m; c++) out[c] = values[c][last];
      return;
    }
    const i = Math.floor(u);
    const s = u - i;
    const s2 = s * s;
    const s3 = s2 * s;
    const h00 = 2 * s3 - 3 * s2 + 1;
    const h10 = s3 - 2 * s2 + s;
    const h01 = -2 * s3 + 3 * s2;
    const h11 = s3 - s2;
    for (let c = 0; c < m; c++) {
      const y = values[c];
      const d = tangents[c];
      out[c] = h00 * y[i] + h10 * d[i] + h01 * y[i + 1] + h11 * d[i + 1];
    }
  };
}
