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
 * Dual expansions [derived, separation of variables in y]: the same two problems
 * expanded in sin(k_m y), k_m = (2m + 1)π/(2d), which vanish on the floor and have
 * zero slope at the lid. For the lid-sheared groove write u = τy/μ + v, with v
 * harmonic, v = −τy/μ on the side walls; the sine coefficients of y on [0, d] are
 * (2/d)(−1)^m/k_m², so v = −(τ/μ) Σ_m (2/d)(−1)^m sin(k_m y) cosh(k_m(x − w/2))/(k_m² cosh(k_m w/2)),
 * and with odd n = 2m + 1 and ζ = nπw/(4d):
 *   ū μ/τ    = d − (32 d²/(π³ w)) Σ_odd tanh(ζ)/n³,
 *   u(w/2, d) μ/τ = d − (8d/π²) Σ_odd sech(ζ)/n²,
 *   Q̂_s      = w d²/2 − (64 d³/π⁴) Σ_odd (−1)^((n−1)/2) tanh(ζ)/n⁴.
 * Where d/w is small these converge like e^{−πw/(2d)} per term while the first
 * forms' terms fall only algebraically; where d/w is large the first forms converge
 * like e^{−2πd/w}. Each function sums the form that converges geometrically at the
 * given aspect ratio, with tanh written through its complement 2/(e^{2ζ} + 1)
 * (the full sums Σ_odd n^−p and Σ_odd (−1)^((n−1)/2) n^−p are known constants), so
 * a coefficient costs about ten exponentials at any aspect ratio and keeps full
 * double precision. At d/w = ½ the mean-lid-velocity pair is self-dual, which is the
 * identity above. The first (defining) forms stay available in
 * {@link grooveDuctDefiningSeries}; test/physics/groove/groove-duct.test.ts checks the
 * fast forms against them over d/w = 10⁻⁶ … 10⁶.
 *
 * Zero net flux (a groove with closed ends in steady state): G = τ Q̂_s/Q̂_p,
 * which tends to 3τ/(2d) for shallow grooves and τ/d for deep ones.
 *
 * References:
 *  [1] Shah, R. K. & London, A. L. 1978 Laminar Flow Forced Convection in Ducts.
 *      Advances in Heat Transfer, Supplement 1. Academic Press, New York.
 *  [2] White, F. M. 2006 Viscous Fluid Flow, 3rd ed. McGraw-Hill, New York, §3-3.
 */
import { compensatedSum } from '../../numerics/series.js';
import { DomainError } from '../../core/errors.js';

/** Σ_odd n^−p for p = 3, 4, 5: (1 − 2^−p) ζ(p); ζ(3) = 1.2020569031595942, ζ(5) = 1.03692775514337, ζ(4) = π⁴/90. */
const ODD_ZETA: Record<3 | 4 | 5, number> = {
  3: (7 / 8) * 1.2020569031595942,
  4: Math.PI ** 4 / 96,
  5: (31 / 32) * 1.03692775514337,
};
/**
 * Dirichlet beta values β(p) = Σ_odd (−1)^((n−1)/2)/n^p: β(2) is Catalan's constant
 * (OEIS A006752), β(4) = 0.98894455174110533 (OEIS A175572); both checked against the
 * alternating sums in test/physics/groove/groove-duct.test.ts.
 */
const DIRICHLET_BETA: Record<2 | 4, number> = { 2: 0.915965594177219, 4: 0.9889445517411053 };

/** Stop a geometrically converging sum once a term is below this share of the first. */
const GEOMETRIC_TOLERANCE = 1e-18;

function checkGroove(width: number, depth: number): void {
  if (!(Number.isFinite(width) && width > 0)) {
    throw new DomainError('groove width must be a positive finite length', { field: 'grooveWidth' });
  }
  if (!(Number.isFinite(depth) && depth > 0)) {
    throw new DomainError('groove depth must be a positive finite length', { field: 'grooveDepth' });
  }
}

/** n^p by multiplication (p ≤ 5 here); Math.pow costs more than the rest of a term. */
function oddPower(n: number, power: number): number {
  const square = n * n;
  if (power === 2) return square;
  if (power === 3) return square * n;
  if (power === 4) return square * square;
  return square * square * n;
}

/**
 * Σ_odd s_n (1 − tanh(nζ))/n^p = Σ_odd s_n 2/((e^{2nζ} + 1) n^p), s_n = 1 or the
 * alternating (−1)^((n−1)/2): the part of Σ_odd s_n tanh(nζ)/n^p missing from the
 * constant Σ_odd s_n/n^p. Terms fall by e^{−4ζ} per odd step; callers keep ζ ≥ π/4.
 */
function tanhComplementSum(zeta: number, power: number, alternating: boolean): number {
  let sum = 0;
  let first = 0;
  // e^{−2nζ} by repeated multiplication (one exponential per call; the few products lose no accuracy that matters).
  const ratio = Math.exp(-4 * zeta);
  let e = Math.exp(-2 * zeta);
  for (let n = 1, sign = 1; n < 1e4; n += 2, sign = alternating ? -sign : 1, e *= ratio) {
    const term = (2 * e) / ((1 + e) * oddPower(n, power));
    if (n === 1) first = term;
    sum += sign * term;
    if (term <= GEOMETRIC_TOLERANCE * first || e === 0) break;
  }
  return sum;
}

/** Σ_odd sech(nζ)/n^p = Σ_odd 2e^{−nζ}/((1 + e^{−2nζ}) n^p); terms fall by e^{−2ζ} per odd step. */
function sechSum(zeta: number, power: number): number {
  let sum = 0;
  let first = 0;
  const ratio = Math.exp(-2 * zeta);
  let e = Math.exp(-zeta);
  for (let n = 1; n < 1e4; n += 2, e *= ratio) {
    const term = (2 * e) / ((1 + e * e) * oddPower(n, power));
    if (n === 1) first = term;
    sum += term;
    if (term <= GEOMETRIC_TOLERANCE * first) break;
  }
  return sum;
}

/** Σ_odd tanh(nβ)/n^p for β ≥ π/4, through the complement (geometric convergence). */
function oddTanhSum(power: 3 | 5, beta: number): number {
  return ODD_ZETA[power] - tanhComplementSum(beta, power, false);
}

/**
 * Mean lid velocity of a groove sheared by τ on its lid, as a length:
 * ū μ/τ = (8w/π³) Σ_odd tanh(nπd/w)/n³ (derivation in the module comment; summed
 * in the dual form for d/w < ½).
 * Divided by the viscosity ratio N = μ_lubricant/μ_working it is the mean
 * local slip length of the lubricant-filled groove.
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @returns m; → d for d ≪ w, → 0.27137 w for d ≫ w, = w/4 at d/w = ½.
 * Valid for a flat lid and fully developed flow (groove length ≫ w, d).
 */
export function grooveLidVelocityMean(grooveWidth: number, grooveDepth: number): number {
  checkGroove(grooveWidth, grooveDepth);
  const ratio = grooveDepth / grooveWidth;
  if (ratio >= 0.5) return ((8 * grooveWidth) / Math.PI ** 3) * oddTanhSum(3, Math.PI * ratio);
  const dual = oddTanhSum(3, Math.PI / (4 * ratio));
  return grooveDepth * (1 - ((32 * ratio) / Math.PI ** 3) * dual);
}

/**
 * Lid velocity at the groove centre line, as a length:
 * u(w/2, d) μ/τ = (4w/π²) Σ_odd (−1)^((n−1)/2) tanh(nπd/w)/n² (summed as Catalan's
 * constant minus the complement), or for d/w < 1/√8 the dual form
 * d − (8d/π²) Σ_odd sech(nπw/(4d))/n² (module comment).
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @returns m; → d for d ≪ w, → (4G/π²) w = 0.37123 w for d ≫ w.
 */
export function grooveLidVelocityCentre(grooveWidth: number, grooveDepth: number): number {
  checkGroove(grooveWidth, grooveDepth);
  const ratio = grooveDepth / grooveWidth;
  if (ratio >= Math.SQRT1_2 / 2) {
    return ((4 * grooveWidth) / Math.PI ** 2) * (DIRICHLET_BETA[2] - tanhComplementSum(Math.PI * ratio, 2, true));
  }
  return grooveDepth * (1 - (8 / Math.PI ** 2) * sechSum(Math.PI / (4 * ratio), 2));
}

/**
 * Shear-driven flux coefficient of a groove, Q̂_s, with Q = (τ/μ) Q̂_s the
 * volumetric flux (m³/s) of lubricant of viscosity μ driven along the groove by a
 * lid shear stress τ: Q̂_s = Σ_odd (8w³/(n⁴π⁴)) [1 − sech(nπd/w)], or for
 * d/w < 1/√2 the dual form w d²/2 − (64 d³/π⁴) Σ_odd (−1)^((n−1)/2) tanh(nπw/(4d))/n⁴.
 * @param w groove width, m (> 0)
 * @param d groove depth, m (> 0)
 * @returns m³; → w d²/2 for d ≪ w (Couette), → w³/12 for d ≫ w.
 */
export function shearDrivenGrooveFlux(w: number, d: number): number {
  checkGroove(w, d);
  const ratio = d / w;
  if (ratio >= Math.SQRT1_2) return ((8 * w ** 3) / Math.PI ** 4) * (ODD_ZETA[4] - sechSum(Math.PI * ratio, 4));
  const dual = DIRICHLET_BETA[4] - tanhComplementSum(Math.PI / (4 * ratio), 4, true);
  return w * d * d * (0.5 - ((64 * ratio) / Math.PI ** 4) * dual);
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
 * Σ_odd g(nβ)/n^p for a g that has settled to 1 (to double precision) once its
 * argument passes `settledAt`: the terms below are added one by one (compensated),
 * the rest is Σ_odd n^−p from there on, which is the constant (1 − 2^−p)ζ(p) less
 * the partial sum when at most 20 terms came before, else the Euler–Maclaurin midpoint tail
 * with x = N − 1: x^{1−p}/(2(p − 1)) − p x^{−p−1}/12 + (7/720)(p)₃ x^{−p−3} − (31/30240)(p)₅ x^{−p−5},
 * (p)_k the rising factorial (Abramowitz & Stegun 1964, 23.1.32 with B_2k(½)); error O(N^{−p−7}).
 */
function settledOddSum(g: (z: number) => number, power: 3 | 4 | 5, beta: number, settledAt: number): number {
  const firstSettled = Math.max(1, 2 * Math.ceil((settledAt / beta - 1) / 2) + 1);
  const terms: number[] = [];
  for (let n = 1; n < firstSettled; n += 2) terms.push(g(n * beta) / n ** power);
  const from = firstSettled - 1;
  if (firstSettled > 41) {
    const p = power;
    const tail =
      from ** (1 - p) / (2 * (p - 1)) -
      (p * from ** (-p - 1)) / 12 +
      ((7 / 720) * p * (p + 1) * (p + 2)) * from ** (-p - 3) -
      ((31 / 30240) * p * (p + 1) * (p + 2) * (p + 3) * (p + 4)) * from ** (-p - 5);
    return compensatedSum(terms) + tail;
  }
  // Few terms before the tail: Σ_odd (g(nβ) − 1)/n^p is small and exact, the constant carries the rest.
  return ODD_ZETA[power] + compensatedSum(terms.map((t, k) => t - 1 / (2 * k + 1) ** power));
}

/**
 * The defining series of the module comment, summed term by term in their first
 * forms: the exact reference the fast forms above are checked against (and timed
 * against in bench/groove-duct.ts). Arguments as in the functions above; costs up
 * to millions of terms for very shallow grooves.
 */
export const grooveDuctDefiningSeries = {
  lidVelocityMean(w: number, d: number): number {
    return ((8 * w) / Math.PI ** 3) * settledOddSum(Math.tanh, 3, (Math.PI * d) / w, 20);
  },
  lidVelocityCentre(w: number, d: number): number {
    const beta = (Math.PI * d) / w;
    // Alternating: Catalan's constant less the complement, whose pairs (n, n + 2), n ≡ 1 (mod 4), are positive.
    let pairs = 0;
    for (let n = 1; n < 1e9; n += 4) {
      const t = 2 / ((Math.exp(2 * n * beta) + 1) * n * n) - 2 / ((Math.exp(2 * (n + 2) * beta) + 1) * (n + 2) ** 2);
      pairs += t;
      if (t <= 1e-18 * pairs) break;
    }
    return ((4 * w) / Math.PI ** 2) * (DIRICHLET_BETA[2] - pairs);
  },
  shearDrivenFlux(w: number, d: number): number {
    // 1 − sech z written as 2 sinh²(z/2)/cosh z, so small z keeps full precision.
    const oneMinusSech = (z: number): number => (2 * Math.sinh(z / 2) ** 2) / Math.cosh(z);
    return ((8 * w ** 3) / Math.PI ** 4) * settledOddSum(oneMinusSech, 4, (Math.PI * d) / w, 40);
  },
  pressureDrivenFlux(w: number, d: number): number {
    // The closed-duct series of [1], [2] in whichever of its two expansions does not cancel.
    const wide = 2 * d <= w;
    const sum = settledOddSum(Math.tanh, 5, wide ? (Math.PI * w) / (4 * d) : (Math.PI * d) / w, 20);
    return wide
      ? ((w * d ** 3) / 3) * (1 - ((384 * d) / (Math.PI ** 5 * w)) * sum)
      : ((d * w ** 3) / 12) * (1 - ((96 * w) / (Math.PI ** 5 * d)) * sum);
  },
};

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
