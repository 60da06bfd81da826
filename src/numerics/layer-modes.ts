/**
 * Eigenmodes of a periodic layer whose coefficient is piecewise constant
 * across it: k = k_in for |z| < a, k_out for a < |z| < P/2 (one period,
 * mirror-symmetric about z = 0). The modes Z_j(z) even in z solve
 *   (k Z')' = −μ² k Z,   Z and k Z' continuous at |z| = a,   Z'(0) = Z'(P/2) = 0,
 * so that Z_j(z)·(sinh or cosh)(μ_j y) are the separable solutions of
 * div(k grad T) = 0 in the layer (Sturm–Liouville problem with weight k;
 * the modes are orthogonal in ∫ k Z_i Z_j dz).
 *
 * Z = c_in cos(μz) for |z| < a and c_out cos(μ(P/2 − |z|)) beyond. The
 * eigenvalues come from the Prüfer angle θ (Z = R cos θ, Z' = −μ R sin θ in a
 * segment, θ' = μ): θ runs from 0 to μa across the inner segment, jumps to
 * atan((k_in/k_out) tan θ) (same branch) at the interface, and gains μ(P/2 − a)
 * across the outer segment; μ_j is the root of θ_end(μ) = jπ, which is
 * increasing in μ and lies in ((j − ½)π, (j + ½)π)/(P/2) (the Prüfer angle of
 * Sturm–Liouville theory; common practice, no source — the roots are checked against
 * the closed-form equal-conductivity modes in the tests).
 */
import { safeNewton } from './roots.js';

export interface TwoPhaseLayerModes {
  /** μ_j ascending, μ_0 = 0 (the uniform mode). */
  wavenumbers: Float64Array;
  /** c_in and c_out of each mode (c_in² + c_out² = 1 for μ > 0; both 1 for the uniform mode). */
  innerAmplitude: Float64Array;
  outerAmplitude: Float64Array;
  /** ∫_{−P/2}^{P/2} k Z_j² dz. */
  weightedNorm: Float64Array;
  /** Z_j'(a−) − Z_j'(a+): the slope jump at the interface (0 when k_in = k_out). */
  slopeJump: Float64Array;
}

/** Modes with μ ≤ maxWavenumber (at least the uniform one). */
export function twoPhaseLayerModes(period: number, halfWidth: number, innerCoefficient: number, outerCoefficient: number, maxWavenumber: number): TwoPhaseLayerModes {
  const a = halfWidth;
  const r = period / 2 - halfWidth;
  const kappa = innerCoefficient / outerCoefficient;
  const angle = (mu: number): { value: number; derivative: number } => {
    const x = mu * a;
    const m = Math.round(x / Math.PI);
    const psi = x - m * Math.PI;
    const t = Math.tan(psi);
    const c = Math.cos(psi);
    const s = Math.sin(psi);
    return {
      value: m * Math.PI + Math.atan(kappa * t) + mu * r,
      derivative: (a * kappa) / (c * c + kappa * kappa * s * s) + r,
    };
  };
  const mus: number[] = [0];
  const spacing = Math.PI / (period / 2);
  for (let j = 1; ; j++) {
    const lo = Math.max(mus[j - 1], (j - 0.5) * spacing);
    if (lo > maxWavenumber) break;
    const hi = (j + 0.5) * spacing;
    const target = j * Math.PI;
    const f = (mu: number): { value: number; derivative: number } => {
      const g = angle(mu);
      return { value: g.value - target, derivative: g.derivative };
    };
    const root = safeNewton(f, lo, hi, j * spacing);
    const mu = root.converged ? root.root : j * spacing;
    if (mu > maxWavenumber) break;
    mus.push(mu);
  }
  const count = mus.length;
  const wavenumbers = Float64Array.from(mus);
  const innerAmplitude = new Float64Array(count);
  const outerAmplitude = new Float64Array(count);
  const weightedNorm = new Float64Array(count);
  const slopeJump = new Float64Array(count);
  innerAmplitude[0] = 1;
  outerAmplitude[0] = 1;
  weightedNorm[0] = 2 * (innerCoefficient * a + outerCoefficient * r);
  for (let j = 1; j < count; j++) {
    const mu = wavenumbers[j];
    const ca = Math.cos(mu * a);
    const sa = Math.sin(mu * a);
    const cr = Math.cos(mu * r);
    const sr = Math.sin(mu * r);
    // (c_in, c_out) spans the null space of [[cos μa, −cos μr], [k_in sin μa, k_out sin μr]]
    // (continuity and flux); take it from the better-conditioned row.
    const row1 = Math.hypot(ca, cr);
    const row2 = Math.hypot(kappa * sa, sr);
    let cin = row1 >= row2 ? cr : sr;
    let cout = row1 >= row2 ? ca : -kappa * sa;
    const norm = Math.hypot(cin, cout);
    cin /= norm;
    cout /= norm;
    innerAmplitude[j] = cin;
    outerAmplitude[j] = cout;
    weightedNorm[j] =
      2 *
      (innerCoefficient * cin * cin * (a / 2 + Math.sin(2 * mu * a) / (4 * mu)) +
        outerCoefficient * cout * cout * (r / 2 + Math.sin(2 * mu * r) / (4 * mu)));
    slopeJump[j] = -mu * (cin * sa + cout * sr);
  }
  return { wavenumbers, innerAmplitude, outerAmplitude, weightedNorm, slopeJump };
}

/**
 * ∫_{−P/2}^{P/2} Z_j(z) cos(αz) dz for α = α_n = 2πn/P, evaluated directly (stable
 * when α is at or near μ_j, where the closed form 2J cos(αa)/(α² − μ²) is 0/0).
 */
export function layerModeTransform(modes: TwoPhaseLayerModes, j: number, period: number, halfWidth: number, n: number): number {
  const mu = modes.wavenumbers[j];
  const alpha = (2 * Math.PI * n) / period;
  const a = halfWidth;
  const r = period / 2 - halfWidth;
  // ∫_0^L cos(μt) cos(αt) dt = ½[L sinc((μ−α)L) + L sinc((μ+α)L)]
  const sinc = (x: number): number => (Math.abs(x) < 1e-8 ? 1 - (x * x) / 6 : Math.sin(x) / x);
  const product = (L: number): number => 0.5 * L * (sinc((mu - alpha) * L) + sinc((mu + alpha) * L));
  // Outer segment: z = P/2 − t, cos(α(P/2 − t)) = (−1)ⁿ cos(αt).
  const sign = n % 2 === 0 ? 1 : -1;
  return 2 * (modes.innerAmplitude[j] * product(a) + sign * modes.outerAmplitude[j] * product(r));
}
