/**
 * Lubricant flow in one rectangular groove treated as a duct: the exact
 * Fourier-series solutions for a groove of width w and depth d, with no slip on
 * its two side walls and its floor, driven either by a uniform shear stress τ on
 * its lid (the lubricant–working-liquid interface, taken flat) or by a uniform
 * pressure gradient along the groove with a stress-free lid. The one place in
 * the tree that defines these coefficients: the slip model (local slip of a
 * lubricant-filled groove) and the retention model (shear-driven drainage of
 * the lubricant against the back pressure) both import them.
 *
 * Coordinates: x across the groove, 0 ≤ x ≤ w; y up from the floor, 0 ≤ y ≤ d
 * (lid at y = d); flow u(x, y) along the groove. μ is the lubricant viscosity.
 *
 * Shear-driven problem [derived, separation of variables]: μ∇²u = 0, u = 0 on
 * x = 0, x = w, y = 0; μ ∂u/∂y = τ on y = d. With u = Σ A_n sin(nπx/w) sinh(nπy/w)
 * and the sine series of unity, 1 = Σ_odd (4/(nπ)) sin(nπx/w), the lid condition
 * gives A_n = 4τw / (μ n²π² cosh(nπd/w)) for odd n (zero for even n), so
 *   u(x, d) = (τ/μ) Σ_odd (4w/(n²π²)) tanh(nπd/w) sin(nπx/w),
 *   mean lid velocity ū = (τ/μ) (8w/π³) Σ_odd tanh(nπd/w)/n³,
 *   centre lid velocity u(w/2, d) = (τ/μ) (4w/π²) Σ_odd (−1)^((n−1)/2) tanh(nπd/w)/n²,
 *   flux Q = ∫∫u dx dy = (τ/μ) Q̂_s,  Q̂_s = Σ_odd (8w³/(n⁴π⁴)) [1 − sech(nπd/w)].
 * Limits: shallow (d ≪ w) Couette flow u = τy/μ gives ū = τd/μ and Q̂_s → w d²/2
 * (since 1 − sech z ≈ z²/2 and Σ_odd 1/n² = π²/8); deep (d ≫ w) Q̂_s → w³/12
 * (Σ_odd 1/n⁴ = π⁴/96) and ū → (τ/μ)(7ζ(3)/π³) w = 0.27137 τw/μ. At d/w = ½
 * exactly ū = τw/(4μ) because Σ_odd tanh(nπ/2)/n³ = π³/32 (a Ramanujan-type
 * lattice sum; the identity holds to 40 digits in mpmath and is checked numerically
 * in test/numerics/basics.test.ts).
 *
 * Pressure-driven problem [pub, mirror image]: with a stress-free lid the groove
 * is one half of a closed w × 2d duct (the lid is its symmetry plane), so the
 * groove carries half the duct flux. For a closed a × b duct (b ≤ a)
 *   Q = (G/μ)(a b³/12) [1 − (192 b/(π⁵ a)) Σ_odd tanh(nπa/(2b))/n⁵]
 * (Shah & London 1978, ch. VII, rectangular ducts; White 2006, Viscous Fluid
 * Flow, 3rd ed., eq. 3-48), with G = −dp/dz. Hence Q = (G/μ) Q̂_p with
 *   Q̂_p = (w d³/3) [1 − (384 d/(π⁵ w)) Σ_odd tanh(nπw/(4d))/n⁵]     (2d ≤ w),
 *   Q̂_p = (d w³/12) [1 − (96 w/(π⁵ d)) Σ_odd tanh(nπd/w)/n⁵]        (2d ≥ w),
 * two expansions of the same quantity; each is used where its bracket does not
 * cancel. Limits: shallow Q̂_p → w d³/3 (half of plane Poiseuille flow in a gap
 * 2d), deep Q̂_p → d w³/12.
 *
 * Zero net flux (a groove with closed ends in steady state): G = τ Q̂_s/Q̂_p,
 * which tends to 3τ/(2d) for shallow grooves and τ/d for deep ones.
 *
 * References:
 *  [1] Shah, R. K. & London, A. L. 1978 Laminar Flow Forced Convection in Ducts.
 *      Advances in Heat Transfer, Supplement 1. Academic Press, New York.
 *  [2] White, F. M. 2006 Viscous Fluid Flow, 3rd ed. McGraw-Hill, New York, §3-3.
 */
import { sumOdd } from '../../numerics/series.js';
import { DomainError } from '../../core/errors.js';

/** Σ_odd n^−p for p = 3, 4, 5: (1 − 2^−p) ζ(p); ζ(3) = 1.2020569031595942, ζ(5) = 1.03692775514337, ζ(4) = π⁴/90. */
const ODD_ZETA: Record<3 | 4 | 5, number> = {
  3: (7 / 8) * 1.2020569031595942,
  4: Math.PI ** 4 / 96,
  5: (31 / 32) * 1.03692775514337,
};
/** Catalan's constant G = Σ_odd (−1)^((n−1)/2)/n² (OEIS A006752). */
const CATALAN = 0.915965594177219;

function checkGroove(width: number, depth: number): void {
  if (!(Number.isFinite(width) && width > 0)) {
    throw new DomainError('groove width must be a positive finite length', { field: 'grooveWidth' });
  }
  if (!(Number.isFinite(depth) && depth > 0)) {
    throw new DomainError('groove depth must be a positive finite length', { field: 'grooveDepth' });
  }
}

/**
 * Σ_odd tanh(nβ)/n^p. For β ≥ 1 the complement Σ_odd n^−p − Σ_odd 2/((e^{2nβ} + 1) n^p)
 * converges geometrically; for smaller β the direct positive series is summed with
 * its algebraic tail (no cancellation when tanh(nβ) ≈ nβ for many terms).
 */
function oddTanhSum(power: 3 | 5, beta: number): number {
  if (beta >= 1) {
    const complement = sumOdd((n) => 2 / ((Math.exp(2 * n * beta) + 1) * n ** power), { relativeTolerance: 1e-18 });
    return ODD_ZETA[power] - complement.sum;
  }
  return sumOdd((n) => Math.tanh(n * beta) / n ** power, { decayPower: power, relativeTolerance: 1e-15 }).sum;
}

/**
 * Mean lid velocity of a groove sheared by τ on its lid, as a length:
 * ū μ/τ = (8w/π³) Σ_odd tanh(nπd/w)/n³ (derivation in the module comment).
 * Divided by the viscosity ratio N = μ_lubricant/μ_working it is the mean
 * local slip length of the lubricant-filled groove.
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @returns m; → d for d ≪ w, → 0.27137 w for d ≫ w, = w/4 at d/w = ½.
 * Valid for a flat lid and fully developed flow (groove length ≫ w, d).
 */
export function grooveLidVelocityMean(grooveWidth: number, grooveDepth: number): number {
  checkGroove(grooveWidth, grooveDepth);
  const beta = (Math.PI * grooveDepth) / grooveWidth;
  return ((8 * grooveWidth) / Math.PI ** 3) * oddTanhSum(3, beta);
}

/**
 * Lid velocity at the groove centre line, as a length:
 * u(w/2, d) μ/τ = (4w/π²) Σ_odd (−1)^((n−1)/2) tanh(nπd/w)/n², summed as
 * G − Σ_odd (−1)^((n−1)/2) 2/((e^{2nπd/w} + 1) n²) with Catalan's constant G.
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @returns m; → d for d ≪ w, → (4G/π²) w = 0.37123 w for d ≫ w.
 */
export function grooveLidVelocityCentre(grooveWidth: number, grooveDepth: number): number {
  checkGroove(grooveWidth, grooveDepth);
  const beta = (Math.PI * grooveDepth) / grooveWidth;
  // Consecutive odd terms are grouped in pairs (n, n + 2), n ≡ 1 (mod 4): each pair is positive.
  let sum = 0;
  let compensation = 0;
  for (let n = 1; n < 1e8; n += 4) {
    const m = n + 2;
    const t = 2 / ((Math.exp(2 * n * beta) + 1) * n * n) - 2 / ((Math.exp(2 * m * beta) + 1) * m * m);
    const s = sum + t;
    compensation += Math.abs(sum) >= Math.abs(t) ? sum - s + t : t - s + sum;
    sum = s;
    if (Math.abs(t) <= 1e-18 * Math.abs(sum) && n > 8) break;
  }
  return ((4 * grooveWidth) / Math.PI ** 2) * (CATALAN - (sum + compensation));
}

/**
 * Shear-driven flux coefficient of a groove, Q̂_s, with Q = (τ/μ) Q̂_s the
 * volumetric flux (m³/s) of lubricant of viscosity μ driven along the groove by a
 * lid shear stress τ: Q̂_s = Σ_odd (8w³/(n⁴π⁴)) [1 − sech(nπd/w)].
 * @param w groove width, m (> 0)
 * @param d groove depth, m (> 0)
 * @returns m³; → w d²/2 for d ≪ w (Couette), → w³/12 for d ≫ w.
 */
export function shearDrivenGrooveFlux(w: number, d: number): number {
  checkGroove(w, d);
  const beta = (Math.PI * d) / w;
  const scale = (8 * w ** 3) / Math.PI ** 4;
  if (beta >= 1) {
    // 1 − sech z = 1 − 2/(e^z + e^−z): subtract the geometrically converging sech part.
    const sech = sumOdd((n) => 1 / (Math.cosh(n * beta) * n ** 4), { relativeTolerance: 1e-18 });
    return scale * (ODD_ZETA[4] - sech.sum);
  }
  // 1 − sech z written as 2 sinh²(z/2)/cosh z where z is small, to keep full precision.
  const terms = sumOdd(
    (n) => {
      const z = n * beta;
      if (z > 1) return (1 - 1 / Math.cosh(z)) / n ** 4;
      const half = Math.sinh(z / 2);
      return (2 * half * half) / Math.cosh(z) / n ** 4;
    },
    { decayPower: 4, relativeTolerance: 1e-15 },
  );
  return scale * terms.sum;
}

/**
 * Pressure-driven flux coefficient of a groove with a stress-free lid, Q̂_p, with
 * Q = (G/μ) Q̂_p the volumetric flux (m³/s) for a pressure gradient G = −dp/dz (Pa/m)
 * along the groove; half of a closed w × 2d duct's flux (module comment, [1], [2]).
 * @param w groove width, m (> 0)
 * @param d groove depth, m (> 0)
 * @returns m⁴; → w d³/3 for d ≪ w, → d w³/12 for d ≫ w.
 */
export function pressureDrivenGrooveFlux(w: number, d: number): number {
  checkGroove(w, d);
  if (2 * d <= w) {
    const sum = oddTanhSum(5, (Math.PI * w) / (4 * d));
    return ((w * d ** 3) / 3) * (1 - ((384 * d) / (Math.PI ** 5 * w)) * sum);
  }
  const sum = oddTanhSum(5, (Math.PI * d) / w);
  return ((d * w ** 3) / 12) * (1 - ((96 * w) / (Math.PI ** 5 * d)) * sum);
}

/**
 * Pressure gradient along a groove whose ends are closed, at which the
 * shear-driven flux is cancelled by the back flow: G = τ Q̂_s/Q̂_p.
 * @param w groove width, m (> 0)
 * @param d groove depth, m (> 0)
 * @param lidShearStress τ on the lid, Pa
 * @returns Pa/m; → 3τ/(2d) for d ≪ w, → τ/d for d ≫ w.
 */
export function zeroNetFluxPressureGradient(w: number, d: number, lidShearStress: number): number {
  return (lidShearStress * shearDrivenGrooveFlux(w, d)) / pressureDrivenGrooveFlux(w, d);
}

/**
 * Fanning friction factor times Reynolds number, f·Re = (τ̄_w/(½ρU²))(ρ U D_h/μ) = 2 τ̄_w D_h/(μ U),
 * of fully developed laminar flow in a closed rectangular duct of side ratio
 * α = short side / long side (0 < α ≤ 1; α → 0 is the parallel-plate channel,
 * f·Re = 24). From the force balance τ̄_w = G D_h/4 and U = Q/A:
 * f·Re = D_h² A/(2 Q̂_duct) = 24/((1 + α)² [1 − (192α/π⁵) Σ_odd tanh(nπ/(2α))/n⁵]) [1].
 * The duct of sides a × b is two grooves of width a and depth b/2 (mirror image),
 * so this reuses {@link pressureDrivenGrooveFlux}.
 * @param aspectRatio α, dimensionless; values above 1 are inverted (same duct).
 * @returns f·Re with D_h = 2ab/(a + b): 14.227 (α = 1), 24 (α → 0) [1].
 */
export function rectangularDuctFrictionReynolds(aspectRatio: number): number {
  if (!(Number.isFinite(aspectRatio) && aspectRatio > 0)) {
    throw new DomainError('duct aspect ratio must be positive and finite', { field: 'aspectRatio' });
  }
  const alpha = aspectRatio > 1 ? 1 / aspectRatio : aspectRatio;
  const a = 1;
  const b = alpha;
  const area = a * b;
  const hydraulicDiameter = (2 * a * b) / (a + b);
  const ductFlux = 2 * pressureDrivenGrooveFlux(a, b / 2);
  return (hydraulicDiameter ** 2 * area) / (2 * ductFlux);
}
