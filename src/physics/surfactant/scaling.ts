/**
 * Scaling theory of the slip of a surfactant-contaminated transverse grating:
 * Landel, Peaudecerf, Temprano-Coleto, Gibou, Goldstein & Luzzatto-Fegiz
 * (2020) [1]. The Marangoni stress is taken uniform over the gap, so the
 * interface velocity is the clean one times (1 − γ_Ma), with γ_Ma from the
 * paper's scaling law (its eq. 4.29) and the clean coefficients E (mean) and
 * F(0) (gap-centre) of the interface velocity from its series (§4) or its
 * long- and short-period closed forms (appendix C, eqs. C8 and C20).
 *
 * Equation numbers and the fitted constants a1 = 2.30, a2 = 0.319,
 * δ0 = 1.68, δ1 = 0.0528 were confirmed against the authors' companion
 * code (github.com/feslab/shs-models-2d, files fitting_coefficients.m,
 * compute_drag_parameters.m, compute_F.m, compute_coeff_clean_case.m, which
 * quote eqs. 4.29, 3.20–3.22, C8 and C20); the paper's PDF itself was not
 * read here, so its typography of the formulas is unconfirmed.
 *
 * Our rearrangement: every term of eq. (4.29) scales as 1/h² with the
 * channel half-height h, so multiplying through by γ̇ h² gives an h-free
 * form usable for a half-space (wall-shear) flow:
 *
 *   γ_Ma = M / (D_I + a2 g² κ_d / (1 + κ_a Γ_m δ / D) + M),
 *   M = a1 (K c) n R T Γ_m u_c / (2 τ_w),
 *   δ = g δ0 (1 + δ1 γ̇ g²/D)^(−1/3)        (Lévêque-type layer, eqs. 3.20–3.22),
 *
 * with g the gap length along the flow (m), u_c the clean interface velocity
 * at the gap centre (m/s; u_c = 2 U F(0) in the paper's normalisation with
 * U = γ̇ h), τ_w = μ γ̇ the no-slip wall shear stress (Pa). For
 * diffusion-controlled exchange (κ_a, κ_d → ∞ at fixed K) the kinetic term
 * tends to a2 g² D/(K Γ_m δ).
 *
 * Extension to a lubricant (ours): with a lubricant the interface feels a
 * local drag μ u/b_local. For a uniform Marangoni stress the problem stays
 * linear in the shear deficit, so the interface velocity is still the clean
 * one times (1 − γ_Ma) (exact, by linearity); the lubricant enters γ_Ma only
 * through a slower clean interface: u_c is taken as the shear-free gap-centre
 * velocity times b_clean/b_shear-free. Checked against the interface solver
 * (surfactant-solver.ts), which carries the local drag explicitly.
 *
 * References:
 * [1] Landel et al. (2020) J. Fluid Mech., arXiv:1904.01194 (landel2020).
 * [2] Philip, J. R. (1972) Flows satisfying mixed no-slip and no-shear conditions (philip1972).
 */
import { solveDense } from '../../numerics/linalg.js';
import { BoundedCache } from '../../numerics/memo.js';
import { GAS_CONSTANT } from '../../core/constants.js';
import type { ResolvedSurfactant } from '../../core/surfactant.js';

/** Fitted constants of the scaling law, eq. (4.29), and of the layer thickness, eqs. (3.20–3.22) [1]. */
export const LANDEL_FIT = { a1: 2.3, a2: 0.319, delta0: 1.68, delta1: 0.0528 } as const;

export interface CleanTransverseCoefficients {
  /** E: mean interface velocity over the period divided by 2U (paper's normalisation, U = γ̇ h). */
  meanCoefficient: number;
  /** F(0): gap-centre interface velocity divided by 2U. */
  centreCoefficient: number;
  method: 'long-period' | 'short-period' | 'series' | 'trivial';
  terms: number;
}

/**
 * Clean (surfactant-free) coefficients of a channel of half-height h whose
 * lower wall is a transverse grating of period L h and gas fraction φ [1].
 * Long period (L > 10³, eq. C8): E = φ/(4 − 3φ), F(0) = 1/(4 − 3φ).
 * Short period (L ≤ {@link SHORT_PERIOD_LIMIT}, eq. C20): with s = L/(4π), E = s ln sec(πφ/2)/(1 + s ln sec(πφ/2)),
 * F(0) = s arccosh(1/cos(πφ/2))/(1 + s ln sec(πφ/2)).
 * Why C20 holds to rounding up to L = 0.4 [derived]: the series' mode m ≥ 1 has wavenumber
 * k = 2πm/L, and its factors α_m, β_m differ from their half-space values (−1, −2k) only by
 * terms in k e^{−2k} ≤ (8π/L) e^{−4π/L}, below 2×10⁻¹² at L = 0.4. There the periodic part of
 * the flow is Philip's half-space grating exactly, the mean flow a Couette flow over its slip
 * length b = (P/2π) ln sec(πφ/2), and λ = b/h = 2E/(1 − E) gives C20; the truncated series
 * converges to it (test/physics/surfactant/scaling.test.ts), and its Richardson value at
 * 400 terms is 0.04–0.3 % away, which is the series' truncation error, not C20's.
 * Otherwise the truncated Fourier series of §4 (dense solve, `terms` unknowns; without `terms`,
 * Richardson-extrapolated from 400 and 200 terms, or 800 and 400 for φ ≤ 0.1 or φ ≥ 0.95),
 * kept in a small cache keyed by (L, φ): a sweep or a sensitivity step that changes neither
 * (depth, tension, viscosity) does not repeat the dense solves.
 * @param periodOverHalfHeight L = P/h (> 0); @param gasFraction φ in [0, 1]
 */
export function cleanTransverseCoefficients(
  periodOverHalfHeight: number,
  gasFraction: number,
  terms?: number,
): CleanTransverseCoefficients {
  const L = periodOverHalfHeight;
  const phi = gasFraction;
  if (phi <= 0) return { meanCoefficient: 0, centreCoefficient: 0, method: 'trivial', terms: 0 };
  if (phi >= 1) return { meanCoefficient: 1, centreCoefficient: 1, method: 'trivial', terms: 0 };
  if (L > 1e3 && terms === undefined) {
    return { meanCoefficient: phi / (4 - 3 * phi), centreCoefficient: 1 / (4 - 3 * phi), method: 'long-period', terms: 0 };
  }
  if (L <= SHORT_PERIOD_LIMIT && terms === undefined) {
    const s = L / (4 * Math.PI);
    const lnSec = -Math.log(Math.cos((Math.PI * phi) / 2));
    const denom = 1 + s * lnSec;
    return {
      meanCoefficient: (s * lnSec) / denom,
      centreCoefficient: (s * Math.acosh(1 / Math.cos((Math.PI * phi) / 2))) / denom,
      method: 'short-period',
      terms: 0,
    };
  }
  if (terms !== undefined) return { ...cleanTransverseSeries(L, phi, terms), method: 'series', terms };
  return SERIES_CACHE.getOrCompute(`${L}:${phi}`, () => {
    // The truncated series converges like 1/N (square-root edge singularity of the interface velocity):
    // Richardson extrapolation from N and N/2 terms (ours) removes the leading error.
    const n = phi <= 0.1 || phi >= 0.95 ? 800 : 400;
    const full = cleanTransverseSeries(L, phi, n);
    const halfN = cleanTransverseSeries(L, phi, n / 2);
    return {
      meanCoefficient: 2 * full.meanCoefficient - halfN.meanCoefficient,
      centreCoefficient: 2 * full.centreCoefficient - halfN.centreCoefficient,
      method: 'series' as const,
      terms: n,
    };
  });
}

/** Largest L = P/h answered by the short-period closed form C20 (exact to rounding there: see above). */
export const SHORT_PERIOD_LIMIT = 0.4;
/** Series results by (L, φ): each costs two dense solves of 200–800 unknowns. */
const SERIES_CACHE = new BoundedCache<CleanTransverseCoefficients>(64);

/** Fourier-mode factors of the channel deviation stream function [1, §4]: α_m and β_m at k = 2πm/L. */
function modeFactors(k: number): { alpha: number; beta: number } {
  const e2 = Math.exp(-2 * k);
  const e4 = e2 * e2;
  const alpha = (-1 + 4 * k * e2 + e4) / (1 + e2);
  const beta = (-2 * k * (1 - 8 * k * e4 - e4 * e4)) / ((1 + e2) * (1 + 4 * k * e2 - e4));
  return { alpha, beta };
}

/**
 * Truncated series of [1, §4]: unknowns E, d_1 … d_{N−1} from a Galerkin system
 * enforcing no shear on the gap and no slip on the ridge; F(0) = E + Σ d_m α_m/2.
 */
function cleanTransverseSeries(L: number, phi: number, N: number): { meanCoefficient: number; centreCoefficient: number } {
  const A = new Float64Array(N * N);
  const b = new Float64Array(N);
  const alpha = new Float64Array(N);
  const beta = new Float64Array(N);
  for (let m = 1; m < N; m++) {
    const f = modeFactors((2 * Math.PI * m) / L);
    alpha[m] = f.alpha;
    beta[m] = f.beta;
  }
  const pi = Math.PI;
  A[0] = 1 - phi / 2;
  b[0] = phi / 2;
  for (let j = 1; j < N; j++) A[j] = ((beta[j] - alpha[j]) * Math.sin(pi * j * phi)) / (2 * pi * j);
  for (let i = 1; i < N; i++) {
    const row = i * N;
    A[row] = -Math.sin(pi * i * phi) / (2 * pi * i);
    b[i] = Math.sin(pi * i * phi) / (2 * pi * i);
    for (let j = 1; j < N; j++) {
      const ba = beta[j] - alpha[j];
      if (i === j) {
        A[row + j] = alpha[j] / 4 + ba * (phi / 4 + Math.sin(2 * pi * j * phi) / (8 * pi * j));
      } else {
        A[row + j] = (ba / (4 * pi)) * (Math.sin(pi * (i + j) * phi) / (i + j) + Math.sin(pi * (i - j) * phi) / (i - j));
      }
    }
  }
  const x = solveDense(A, b, N);
  if (!x) return { meanCoefficient: phi / (4 - 3 * phi), centreCoefficient: 1 / (4 - 3 * phi) };
  let centre = x[0];
  for (let m = 1; m < N; m++) centre += (x[m] * alpha[m]) / 2;
  return { meanCoefficient: x[0], centreCoefficient: centre };
}

/**
 * Shear-free transverse grating in a half-space (short-period limit of [1],
 * Philip's result [2]): slip length b = (P/2π) ln sec(πφ/2) (m) and gap-centre
 * interface velocity u_c = (γ̇ P/2π) arccosh(1/cos(πφ/2)) (m/s).
 * @param pitch P, m; @param gasFraction φ in (0, 1); @param shearRate γ̇, 1/s
 */
export function philipTransverse(pitch: number, gasFraction: number, shearRate: number): { slipLength: number; centreVelocity: number } {
  const c = Math.cos((Math.PI * gasFraction) / 2);
  return {
    slipLength: (pitch / (2 * Math.PI)) * -Math.log(c),
    centreVelocity: ((shearRate * pitch) / (2 * Math.PI)) * Math.acosh(1 / c),
  };
}

export interface MarangoniScalingInput {
  /** g: length of the interface along the flow (transverse gap width, or groove length), m. */
  gapLength: number;
  /** u_c: clean interface velocity at the gap centre, m/s. */
  centreVelocity: number;
  /** γ̇ = τ_w/μ, no-slip wall shear rate, 1/s. */
  shearRate: number;
  /** μ of the working fluid, Pa·s. */
  viscosity: number;
  surfactant: ResolvedSurfactant;
  /** c, mol/m³. */
  bulkConcentration: number;
  /** T, K. */
  temperature: number;
}

/** Dimensionless groups on the gap length (h-free forms of the paper's groups). */
export interface SurfactantGroups {
  /** k = K c (dilute when ≤ 1). */
  dimensionlessConcentration: number;
  /** Ma_g = n R T Γ_m/(μ γ̇ g): Marangoni number on the gap length. */
  marangoniNumber: number;
  /** Pe_g = γ̇ g²/D: bulk Péclet number. */
  bulkPecletNumber: number;
  /** Pe_I,g = g u_c/(2 D_I): interfacial Péclet number (paper's g F(0) Pe_I). */
  interfacialPecletNumber: number;
  /** Bi = κ_d/γ̇: Biot (desorption vs shear) number; absent for diffusion-controlled exchange. */
  biotNumber?: number;
  /** χ = κ_d g/(κ_a Γ_m): kinetic ratio (desorption vs adsorption); with K only, g/(K Γ_m). */
  kineticRatio: number;
  /** K_I,g = 2 g κ_d (1 + k)/u_c: kinetic exchange vs advection (paper's g Bi (1+k)/F(0)). */
  exchangeNumber?: number;
  /** D_I,g = χ (1 + k)/√(g u_c/(2D)): diffusion-limited exchange vs advection. */
  diffusiveExchangeNumber: number;
  /** δ, m: diffusive sublayer thickness, eqs. (3.20–3.22). */
  diffusiveLayerThickness: number;
}

export interface MarangoniScaling {
  /** γ_Ma in [0, 1): fraction of the wall shear opposed by the (uniform) Marangoni stress. */
  marangoniReduction: number;
  groups: SurfactantGroups;
  /** The three relaxation terms of the denominator and the Marangoni term, m²/s. */
  terms: { surfaceDiffusion: number; exchange: number; marangoni: number };
  /** Validity: dilute (k ≤ 1), and the paper's stagnant-cap criteria. */
  flags: { dilute: boolean; stagnantCapLikely: boolean };
}

/**
 * Marangoni reduction factor γ_Ma by eq. (4.29) of [1] in the h-free form
 * given in the module comment. Validity: Stokes flow over the gap, dilute
 * surfactant (k = K c ≲ 1), Marangoni stress nearly uniform over the gap
 * (fails in the stagnant-cap regime: Pe_I,g ≥ 10 with K_I,g or D_I,g ≤ 50,
 * the thresholds of the authors' code). Returns γ_Ma = 0 for c = 0.
 */
export function marangoniScaling(input: MarangoniScalingInput): MarangoniScaling {
  const { gapLength: g, centreVelocity: uc, shearRate, viscosity, surfactant: s, bulkConcentration: c, temperature } = input;
  const { a1, a2, delta0, delta1 } = LANDEL_FIT;
  const k = s.langmuirConstant * c;
  const nRTGm = s.gibbsPrefactor * GAS_CONSTANT * temperature * s.maximumSurfaceExcess;
  const tauW = viscosity * shearRate;
  const bulkPeclet = (shearRate * g * g) / s.bulkDiffusivity;
  const delta = g * delta0 * Math.pow(1 + delta1 * bulkPeclet, -1 / 3);
  const marangoni = (a1 * k * nRTGm * uc) / (2 * tauW);
  let exchange: number;
  let biot: number | undefined;
  let kineticRatio: number;
  let exchangeNumber: number | undefined;
  if (s.adsorptionRate !== undefined && s.desorptionRate !== undefined) {
    exchange = (a2 * g * g * s.desorptionRate) / (1 + (s.adsorptionRate * s.maximumSurfaceExcess * delta) / s.bulkDiffusivity);
    biot = s.desorptionRate / shearRate;
    kineticRatio = (s.desorptionRate * g) / (s.adsorptionRate * s.maximumSurfaceExcess);
    exchangeNumber = uc > 0 ? (2 * g * s.desorptionRate * (1 + k)) / uc : undefined;
  } else {
    exchange = (a2 * g * g * s.bulkDiffusivity) / (s.langmuirConstant * s.maximumSurfaceExcess * delta);
    kineticRatio = g / (s.langmuirConstant * s.maximumSurfaceExcess);
  }
  const surfaceDiffusion = s.surfaceDiffusivity;
  const total = surfaceDiffusion + exchange + marangoni;
  const reduction = total > 0 && Number.isFinite(total) ? marangoni / total : 0;
  const interfacialPeclet = (g * uc) / (2 * s.surfaceDiffusivity);
  const diffusiveExchangeNumber = uc > 0 ? (kineticRatio * (1 + k)) / Math.sqrt((g * uc) / (2 * s.bulkDiffusivity)) : Number.MAX_VALUE;
  const stagnantCapLikely =
    interfacialPeclet >= 10 && ((exchangeNumber !== undefined && exchangeNumber <= 50) || diffusiveExchangeNumber <= 50) && k > 0;
  return {
    marangoniReduction: reduction,
    groups: {
      dimensionlessConcentration: k,
      marangoniNumber: nRTGm / (tauW * g),
      bulkPecletNumber: bulkPeclet,
      interfacialPecletNumber: interfacialPeclet,
      ...(biot !== undefined ? { biotNumber: biot } : {}),
      kineticRatio,
      ...(exchangeNumber !== undefined ? { exchangeNumber } : {}),
      diffusiveExchangeNumber,
      diffusiveLayerThickness: delta,
    },
    terms: { surfaceDiffusion, exchange, marangoni },
    flags: { dilute: k <= 1, stagnantCapLikely },
  };
}

/**
 * Slip length with a uniform Marangoni stress. Half-space: b = (1 − γ_Ma) b_clean
 * (exact by linearity). Channel of half-height h ([1], the relation
 * λ = 2(1 − γ)E/(1 − (1 − γ)E) with λ = b/h, E recovered from the clean slip as
 * E = λ_clean/(2 + λ_clean)), which reproduces b_clean at γ_Ma = 0 exactly.
 * @param cleanSlipLength b_clean, m; @param halfHeight h, m, or undefined for a half-space
 */
export function slipWithMarangoni(cleanSlipLength: number, reduction: number, halfHeight?: number): number {
  if (halfHeight === undefined || !(halfHeight > 0)) return (1 - reduction) * cleanSlipLength;
  const lambdaClean = cleanSlipLength / halfHeight;
  const E = lambdaClean / (2 + lambdaClean);
  const Eg = (1 - reduction) * E;
  return (halfHeight * 2 * Eg) / (1 - Eg);
}
