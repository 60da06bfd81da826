/**
 * Fourier overlap sums between the modes of a periodic cell and modes that
 * live in (or are built on) a centred window |z| < a of that cell.
 *
 * A cell of period P has Fourier modes cos(α_n z), α_n = 2πn/P. A window mode
 * with wavenumber μ whose transform over the cell is
 *   ∫ Z cos(α z) dz ∝ cos(α a) / (α² − μ²)
 * (every mode of a piecewise-harmonic profile with kinks only at z = ±a has
 * this form; see the callers) couples to the cell modes through sums of
 *   S_ij = Σ_{n≥1} w_n α_n C_n² / ((α_n² − μ_i²)(α_n² − μ_j²)),   C_n = cos(α_n a),
 * with an optional weight w_n (1 for a half-space, coth(α_n s) for a layer of
 * thickness s on a fixed-value base). Partial fractions reduce the J × J
 * double sum to J single sums:
 *   S_ij = (σ_i − σ_j)/(μ_i² − μ_j²)  (i ≠ j),   S_ii = D_i,
 *   σ(μ) = Σ w_n α_n C_n² μ²/(α_n²(α_n² − μ²)),   D(μ) = Σ w_n α_n C_n²/(α_n² − μ²)²,
 * so the cost is O(J·K) rather than O(J²·K). Each single sum is taken term by
 * term up to K ≳ 2μ/β (β = 2π/P) and its tail from the expansion in μ²/α²,
 * whose moments Σ_{n>K} C_n² n^−p split into a Hurwitz zeta part (Euler–Maclaurin,
 * Abramowitz & Stegun 1964, 23.1.30) and an oscillating part summed by Euler's
 * transformation of series (common practice, no source; the sums are checked
 * against brute-force summation in the tests).
 *
 * A term with α_n = μ (to 1e-9) is left out of σ and D and its index reported:
 * its value depends on the mode's own transform there, which the caller knows.
 */

export interface WindowSumsInput {
  /** Cell period P (> 0). */
  period: number;
  /** Window half-width a, 0 < a < P/2. */
  halfWidth: number;
  /** Window-mode wavenumbers μ_j ≥ 0 (any order). */
  wavenumbers: ArrayLike<number>;
  /** Weight w_n of Fourier mode n ≥ 1 (default 1); must equal 1 to rounding from `weightSettlesAt` on. */
  weight?: (n: number) => number;
  /** Index from which the weight is 1 to rounding (default 0). */
  weightSettlesAt?: number;
}

export interface WindowSums {
  /** σ(μ_j). */
  sigma: Float64Array;
  /** D(μ_j). */
  curvature: Float64Array;
  /** Index n of a Fourier mode with α_n = μ_j left out of σ_j and D_j, or −1. */
  coincident: Int32Array;
}

/** Bernoulli numbers B_2 … B_12 (Abramowitz & Stegun 1964, table 23.2). */
const BERNOULLI = [1 / 6, -1 / 30, 1 / 42, -1 / 30, 5 / 66, -691 / 2730];

/** N^(p−1) Σ_{n≥N} n^−p by Euler–Maclaurin (N ≥ 20 keeps the truncation below rounding for p ≤ 60). */
function scaledHurwitzZeta(p: number, n0: number): number {
  let sum = 1 / (p - 1) + 1 / (2 * n0);
  let rising = p; // (p)_{2k−1}
  let factorial = 2; // (2k)!
  let power = 1 / (n0 * n0);
  for (let k = 1; k <= BERNOULLI.length; k++) {
    sum += (BERNOULLI[k - 1] / factorial) * rising * power;
    rising *= (p + 2 * k - 1) * (p + 2 * k);
    factorial *= (2 * k + 1) * (2 * k + 2);
    power /= n0 * n0;
  }
  return sum;
}

/**
 * Σ_{n≥N} cos(nθ) f(n) from f(N), f(N+1), …, f(N+T) (values[0 … count − 1], T = count − 1; `values` is used as
 * scratch) by Euler's transformation Σ_{n≥N} zⁿ f(n) = zᴺ/(1 − z) Σ_j (z/(1 − z))ʲ Δʲf(N), z = e^{iθ}: the j-th
 * term shrinks like j!/(N·|1 − z|)ʲ for f varying on the scale N, so it converges fast when N·|1 − z| ≫ 1; the
 * series is asymptotic and is stopped at its smallest term. The differences Δʲf(N) are built one value at a time
 * along the table's last diagonal (after f(N+j), diagonal[i] = Δⁱf(N+j−i)), so a series stopped at term j costs
 * O(j²) subtractions, not O(j·T); each difference is the same subtraction of the same two numbers as in the
 * full table, so the values are those of the table.
 */
function oscillatingTail(values: Float64Array, count: number, n0: number, theta: number, diagonal: Float64Array): number {
  const terms = count - 1;
  // q = z/(1 − z), prefactor zᴺ/(1 − z), both complex.
  const zr = Math.cos(theta);
  const zi = Math.sin(theta);
  const dr = 1 - zr;
  const di = -zi;
  const dd = dr * dr + di * di;
  const qr = (zr * dr + zi * di) / dd;
  const qi = (zi * dr - zr * di) / dd;
  const zNr = Math.cos(n0 * theta);
  const zNi = Math.sin(n0 * theta);
  const pr = (zNr * dr + zNi * di) / dd;
  const pi = (zNi * dr - zNr * di) / dd;
  let sr = 0;
  let si = 0;
  let wr = 1;
  let wi = 0;
  let last = Infinity;
  for (let j = 0; j <= terms; j++) {
    // Extend the diagonal by f(N+j): diagonal[i] = Δⁱf(N+j−i), so diagonal[j] = Δʲf(N).
    let carried = values[j];
    for (let i = 0; i < j; i++) {
      const previous = diagonal[i];
      diagonal[i] = carried;
      carried -= previous;
    }
    diagonal[j] = carried;
    const difference = carried;
    const tr = wr * difference;
    const ti = wi * difference;
    // Sizes compared as squares: Math.hypot's guard against overflow is not needed for these terms (far below
    // 1e150) and costs several times the products.
    const size = tr * tr + ti * ti;
    if (size > last) break;
    sr += tr;
    si += ti;
    if (size <= 1e-36 * (sr * sr + si * si)) break;
    last = size;
    const nr = wr * qr - wi * qi;
    wi = wr * qi + wi * qr;
    wr = nr;
  }
  return pr * sr - pi * si;
}

/** n² and 1/n for n ≤ K, kept between calls (they depend on nothing else). */
let integerCache = { squares: new Float64Array(1), inverse: new Float64Array(1) };
function integerTables(k: number): { squares: Float64Array; inverse: Float64Array } {
  if (integerCache.squares.length <= k) {
    const size = Math.max(k + 1, 2 * integerCache.squares.length);
    const squares = new Float64Array(size);
    const inverse = new Float64Array(size);
    for (let n = 1; n < size; n++) {
      squares[n] = n * n;
      inverse[n] = 1 / n;
    }
    integerCache = { squares, inverse };
  }
  return integerCache;
}

/** Powers of μ²/α² kept in the tail's non-oscillating part (ratio ≤ ¼ there: 26 terms reach 1e-16). */
const TAIL_TERMS = 26;
/**
 * ½ (K/N)^{2q+2} N^{2q+2} Σ_{n≥N} n^{−2q−3} scaled as the tail needs it (K = N − 1, q = 0 … TAIL_TERMS): the moments
 * of the plain half of the tail depend on N alone, which many modes and many cells share, so each N's are formed
 * once (the same products in the same order as formed per mode before) and kept, for N below a bound.
 */
function tailMoments(n0: number): Float64Array {
  const kept = n0 < TAIL_MOMENTS_KEPT ? tailMomentCache[n0] : undefined;
  if (kept !== undefined) return kept;
  const k = n0 - 1;
  const shrink = (k / n0) * (k / n0);
  const moments = new Float64Array(TAIL_TERMS + 1);
  let factor = 0.5 * shrink;
  for (let q = 0; q <= TAIL_TERMS; q++) {
    moments[q] = factor * scaledHurwitzZeta(2 * q + 3, n0);
    factor *= shrink;
  }
  if (n0 < TAIL_MOMENTS_KEPT) tailMomentCache[n0] = moments;
  return moments;
}
/** Cut-offs below this keep their tail moments (about 220 bytes each; the cut-offs met stay below a few thousand). */
const TAIL_MOMENTS_KEPT = 8192;
const tailMomentCache: (Float64Array | undefined)[] = [];

/** Values of the summand passed to Euler's transformation for the oscillating part of the tail. */
const EULER_TERMS = 24;

export function windowFourierSums(input: WindowSumsInput): WindowSums {
  const { period, halfWidth, wavenumbers } = input;
  const count = wavenumbers.length;
  const beta = (2 * Math.PI) / period;
  const fraction = (2 * halfWidth) / period;
  const theta = 2 * Math.PI * fraction;
  const weight = input.weight;
  const settle = Math.ceil(input.weightSettlesAt ?? 0);
  // Mode j is summed term by term to K_j ≥ 2μ_j/β. Beyond, C_n² = ½(1 + cos nθ): the plain half is the expansion
  // in μ²/α² with Hurwitz-zeta moments (ratio ≤ ¼), the oscillating half Euler's transformation of the summand,
  // which needs K·|1 − e^{iθ}| ≫ 1, |1 − e^{iθ}| = 2|sin(πφ)|: hence the floor on K.
  const oscillationFloor = Math.ceil(60 / (2 * Math.abs(Math.sin(Math.PI * fraction)))) + 8;
  const cutoff = (c: number): number => Math.max(oscillationFloor, settle, Math.ceil(2 * c) + 4);
  let largest = 0;
  for (let j = 0; j < count; j++) largest = Math.max(largest, wavenumbers[j] / beta);
  const kAll = cutoff(largest);
  const weighted = new Float64Array(kAll + 1);
  const { squares, inverse } = integerTables(kAll);
  for (let n = 1; n <= kAll; n++) {
    const c = Math.cos(Math.PI * n * fraction);
    weighted[n] = (weight ? weight(n) : 1) * c * c;
  }
  const sigma = new Float64Array(count);
  const curvature = new Float64Array(count);
  const coincident = new Int32Array(count).fill(-1);
  const gap = 2 * Math.abs(Math.sin(Math.PI * fraction)); // |1 − e^{iθ}|
  const sigmaValues = new Float64Array(EULER_TERMS + 1);
  const curvatureValues = new Float64Array(EULER_TERMS + 1);
  const diagonal = new Float64Array(EULER_TERMS + 1);
  for (let j = 0; j < count; j++) {
    const c = wavenumbers[j] / beta;
    const c2 = c * c;
    const k = cutoff(c);
    // A Fourier mode with α_n = μ_j (to 1e-9) is left out and reported.
    const nearest = Math.round(c);
    const skip = nearest >= 1 && nearest <= k && Math.abs(squares[nearest] - c2) <= 1e-9 * c2 ? nearest : -1;
    coincident[j] = skip;
    let s = 0;
    let d = 0;
    for (let n = 1; n <= k; n++) {
      if (n === skip) continue;
      const u = 1 / (squares[n] - c2);
      const t = weighted[n] * u;
      s += t * inverse[n];
      d += t * n * u;
    }
    s *= c2;
    // Plain half of the tail n > K: c²/(n(n² − c²)) = Σ_q c^{2q+2} n^{−2q−3}, n/(n² − c²)² = Σ_q (q+1) c^{2q} n^{−2q−3},
    // with moments K^{2q+2} Σ_{n>K} n^{−2q−3} from the Euler–Maclaurin Hurwitz zeta.
    const n0 = k + 1;
    const k2 = k * k;
    const r2 = c2 / k2;
    const moments = tailMoments(n0);
    let rq = 1;
    for (let q = 0; q <= TAIL_TERMS && rq > 1e-18; q++) {
      const moment = moments[q];
      s += rq * r2 * moment;
      d += ((q + 1) * rq * moment) / k2;
      rq *= r2;
    }
    // Oscillating half: ½ Σ_{n>K} cos(nθ) f(n) for both summands; Euler's transformation needs about as many
    // differences as it takes the ratio (3 + j)/(K|1 − e^{iθ}|) of its terms to bring them to rounding.
    const eulerTerms = Math.min(EULER_TERMS, Math.max(8, Math.ceil(960 / (k * gap)) + 6));
    for (let i = 0; i <= eulerTerms; i++) {
      const n = n0 + i;
      const u = 1 / (n * n - c2);
      sigmaValues[i] = (c2 * u) / n;
      curvatureValues[i] = n * u * u;
    }
    s += 0.5 * oscillatingTail(sigmaValues, eulerTerms + 1, n0, theta, diagonal);
    d += 0.5 * oscillatingTail(curvatureValues, eulerTerms + 1, n0, theta, diagonal);
    sigma[j] = s / beta;
    curvature[j] = d / (beta * beta * beta);
  }
  return { sigma, curvature, coincident };
}

/**
 * Fills the symmetric row-major n × n matrix M_ij = g_i g_j S_ij from the sums
 * (S_ij = (σ_i − σ_j)/(μ_i² − μ_j²), S_ii = D_i), adding `into` (scale × …) to what is there.
 */
export function addWindowOverlapMatrix(
  into: Float64Array,
  size: number,
  sums: WindowSums,
  wavenumbers: ArrayLike<number>,
  gains: ArrayLike<number>,
  scale: number,
): void {
  const { sigma, curvature } = sums;
  for (let i = 0; i < size; i++) {
    const gi = gains[i] * scale;
    into[i * size + i] += gi * gains[i] * curvature[i];
    const mi = wavenumbers[i] * wavenumbers[i];
    for (let j = 0; j < i; j++) {
      const value = (gi * gains[j] * (sigma[i] - sigma[j])) / (mi - wavenumbers[j] * wavenumbers[j]);
      into[i * size + j] += value;
      into[j * size + i] += value;
    }
  }
}
