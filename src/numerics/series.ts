/**
 * Summation of slowly or rapidly converging infinite series with an explicit
 * stopping rule, used by the rectangular-duct and striped-surface series.
 */

export interface SeriesResult {
  sum: number;
  terms: number;
  converged: boolean;
}

export interface SeriesOptions {
  /** Stop when |term| ≤ relativeTolerance·|sum| for `quietTerms` terms in a row. */
  relativeTolerance?: number;
  /** Consecutive small terms required before stopping (guards against a zero term). */
  quietTerms?: number;
  maxTerms?: number;
}

/**
 * Σ term(k) for k = 0, 1, 2, … with compensated (Kahan–Babuška/Neumaier)
 * addition, stopping when the terms have become negligible. The caller maps
 * k to the series index (e.g. odd n = 2k + 1).
 */
export function sumSeries(term: (k: number) => number, options: SeriesOptions = {}): SeriesResult {
  const relTol = options.relativeTolerance ?? 1e-16;
  const quiet = options.quietTerms ?? 3;
  const maxTerms = options.maxTerms ?? 100_000;
  let sum = 0;
  let compensation = 0;
  let small = 0;
  for (let k = 0; k < maxTerms; k++) {
    const t = term(k);
    const s = sum + t;
    compensation += Math.abs(sum) >= Math.abs(t) ? sum - s + t : t - s + sum;
    sum = s;
    if (Math.abs(t) <= relTol * Math.abs(sum + compensation)) {
      small++;
      if (small >= quiet) return { sum: sum + compensation, terms: k + 1, converged: true };
    } else {
      small = 0;
    }
  }
  return { sum: sum + compensation, terms: maxTerms, converged: false };
}

/**
 * Σ over odd n = 1, 3, 5, … of term(n).
 *
 * With `decayPower` p (terms ~ C·n^−p, p > 1) the series is stopped early and
 * its tail added by the midpoint rule, Σ_{n>N, odd} C n^−p ≈ C (N+1)^(1−p) / (2(p−1))
 * (Euler–Maclaurin; error O(N^−p−1)), which makes algebraically converging
 * series exact to rounding in a few thousand terms.
 */
export function sumOdd(
  term: (n: number) => number,
  options: SeriesOptions & { decayPower?: number } = {},
): SeriesResult {
  const p = options.decayPower;
  if (p === undefined) return sumSeries((k) => term(2 * k + 1), options);
  const relTol = options.relativeTolerance ?? 1e-16;
  const maxTerms = options.maxTerms ?? 1_000_000;
  let sum = 0;
  let c = 0;
  for (let k = 0; k < maxTerms; k++) {
    const n = 2 * k + 1;
    const t = term(n);
    const s = sum + t;
    c += Math.abs(sum) >= Math.abs(t) ? sum - s + t : t - s + sum;
    sum = s;
    const tail = (t * n ** p * (n + 1) ** (1 - p)) / (2 * (p - 1));
    // Midpoint-rule error of the tail is about p(p+1)/24 · t · (2/n)², relative to the tail's own size.
    const tailError = Math.abs(tail) * ((p * (p + 1)) / 6) / (n * n);
    if (n > 8 && tailError <= relTol * Math.abs(sum)) {
      return { sum: sum + c + tail, terms: k + 1, converged: true };
    }
  }
  return { sum: sum + c, terms: maxTerms, converged: false };
}

/** Neumaier-compensated sum of an array. */
export function compensatedSum(values: ArrayLike<number>): number {
  let sum = 0;
  let c = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    const t = sum + v;
    c += Math.abs(sum) >= Math.abs(v) ? sum - t + v : v - t + sum;
    sum = t;
  }
  return sum + c;
}

/**
 * Σ_{m ≥ start} (−1)^m t_m for terms t_m that vary smoothly with m, by Euler's
 * transformation (Abramowitz & Stegun 1964, 3.6.27):
 * Σ_{k≥0} (−1)^k t_k = Σ_j (−1)^j Δʲt_0 / 2^{j+1}, with `differences` forward
 * differences taken from t_start … t_start+differences. Needs
 * t.length > start + differences.
 */
export function eulerAlternatingTail(t: ArrayLike<number>, start: number, differences = 8): number {
  const table = new Float64Array(differences + 1);
  for (let i = 0; i <= differences; i++) table[i] = t[start + i];
  let sum = 0;
  let factor = 0.5;
  for (let j = 0; j <= differences; j++) {
    sum += factor * table[0];
    for (let i = 0; i < differences - j; i++) table[i] = table[i + 1] - table[i];
    factor *= -0.5;
  }
  return start % 2 === 0 ? sum : -sum;
}
