/**
 * Laminar fully developed Nusselt numbers of a plane channel or a tube whose
 * walls carry a velocity slip length b and a thermal slip length b_t: closed
 * forms at uniform heat flux, and the Graetz-type eigenproblem at uniform wall
 * temperature solved by shooting. Symbols as in ./heat.ts.
 *
 * Sources: Shah & London 1978 (shahLondon1978) for the no-slip limits; the
 * slip forms are derived here and checked symbolically by
 * fixtures/heat/generate_laminar.py.
 */
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { integrateRungeKutta4 } from '../../numerics/ode.js';
import { brent } from '../../numerics/roots.js';

/**
 * Parallel plates, both walls alike (velocity slip b, thermal slip b_t, equal
 * uniform flux on both), fully developed, Nu on D_h = 2H:
 *   Nu = 140(1 + 6x)² / [17 + 168x + 420x² + 70y(1 + 6x)²],  x = b/H, y = b_t/H.
 *
 * [derived; checked symbolically by fixtures/heat/generate_laminar.py] With
 * η = 2y'/H from the mid-plane, Navier slip gives u ∝ 1 − η² + 4x. The energy
 * equation d²θ/dη² = u/ū with θ'(0) = 0, θ'(Shah & London 1978) = 1 (θ = T k/(q H/2)),
 * integrated twice, and the mixing-cup θ_b = ∫u θ dη/∫u dη give
 * θ_f(Shah & London 1978) − θ_b = (17 + 168x + 420x²)/(35(1 + 6x)²). The thermal slip adds
 * T_w − T_f = q b_t/k, i.e. 2y to θ; Nu = 4/(θ_w − θ_b). Hence
 * 1/Nu = 1/Nu_slip + b_t/D_h (series resistances).
 * Limits: x = y = 0 → 140/17 = 8.2353 (Shah & London (Shah & London 1978)); x → ∞ → 12 (plug flow).
 * @param slipRatio x = b/H (≥ 0)
 * @param thermalSlipRatio y = b_t/H (any sign; result null if the total resistance is not positive)
 */
export function nusseltUniformFluxPlates(slipRatio: number, thermalSlipRatio: number): number | null {
  const x = slipRatio;
  const g = (1 + 6 * x) ** 2;
  const den = 17 + 168 * x + 420 * x * x + 70 * thermalSlipRatio * g;
  return den > 0 && Number.isFinite(den) ? (140 * g) / den : null;
}

/**
 * One heated slipping wall (b, b_t), the opposite wall adiabatic and no-slip,
 * fully developed uniform flux, Nu on D_h = 2H:
 *   Nu = 70(1 + 4x)² / [13 + 82x + 132x² + 35y(1 + 4x)²],  x = b/H, y = b_t/H.
 *
 * [derived; checked symbolically by fixtures/heat/generate_laminar.py] With
 * η = y'/H from the adiabatic wall, u ∝ η − η² + cη with c = x/(1 + x) (no slip at
 * η = 0, Navier slip at η = 1); θ'' = u/ū, θ'(0) = 0, θ'(Shah & London 1978) = 1 (θ = T k/(qH));
 * Nu = 2/(θ_w − θ_b) with θ_w = θ_f(Shah & London 1978) + y.
 * Limit x = y = 0 → 70/13 = 5.3846 (Shah & London (Shah & London 1978)).
 */
export function nusseltUniformFluxOneWall(slipRatio: number, thermalSlipRatio: number): number | null {
  const x = slipRatio;
  const g = (1 + 4 * x) ** 2;
  const den = 13 + 82 * x + 132 * x * x + 35 * thermalSlipRatio * g;
  return den > 0 && Number.isFinite(den) ? (70 * g) / den : null;
}

/**
 * Circular tube with slip b and thermal slip b_t, fully developed uniform flux, Nu on D:
 *   Nu = 48(1 + 4β)² / [11 + 64β + 96β² + 24β_t(1 + 4β)²],  β = b/R, β_t = b_t/R.
 *
 * [derived; checked symbolically by fixtures/heat/generate_laminar.py] Note the
 * ratios are on the RADIUS R = D/2: the symbolic derivation gives, on the
 * diameter, 48(1 + 8b/D)²/[11 + 128 b/D + 384 (b/D)² + 48 (b_t/D)(1 + 8b/D)²],
 * the same function; with ratios on D the R-form would be wrong.
 * u ∝ 1 − r² + 2b/R, (1/r)(rθ')' = 2u/ū with θ'(Shah & London 1978) = 1 (θ = T k/(qR)),
 * Nu = 2/(θ_w − θ_b), θ_w = θ_f(Shah & London 1978) + b_t/R.
 * Limits: β = β_t = 0 → 48/11 = 4.3636 (Shah & London (Shah & London 1978)); β → ∞ → 8 (plug flow).
 * @param slipRatio β = b/R (≥ 0); @param thermalSlipRatio β_t = b_t/R
 */
export function nusseltUniformFluxTube(slipRatio: number, thermalSlipRatio: number): number | null {
  const x = slipRatio;
  const g = (1 + 4 * x) ** 2;
  const den = 11 + 64 * x + 96 * x * x + 24 * thermalSlipRatio * g;
  return den > 0 && Number.isFinite(den) ? (48 * g) / den : null;
}

export type LaminarGeometry = 'plates-both' | 'one-wall' | 'tube';

export interface EigenSolution {
  /** Nusselt number on D_h = 2H (plates) or D (tube). */
  nusselt: number;
  /** Smallest eigenvalue λ of φ'' + (g/η)φ' + λ² (u/ū) φ = 0. */
  eigenvalue: number;
  /** Brent iterations of the shooting. */
  iterations: number;
}

/** Number of RK4 steps across the half channel / radius (error ~1e-13 in λ for these smooth profiles). */
const SHOOTING_STEPS = 1600;

/**
 * Fully developed laminar Nusselt number at uniform wall temperature with
 * velocity slip b and thermal slip b_t, by shooting on the Graetz-type
 * eigenproblem [derived]. With T − T_w = (T_b − T_w) φ(η)/φ_b and
 * d(T_b − T_w)/dx ∝ −(T_b − T_w), the energy equation becomes
 *   φ'' + (g/η) φ' + λ² U(η) φ = 0,  φ(0) = 1, φ'(0) = 0,
 *   φ(Shah & London 1978) + s φ'(Shah & London 1978) = 0 (thermal slip: T_f = T_w − b_t ∂T/∂n),
 * with the smallest λ > 0 wanted. Energy balance h = λ² k/L gives:
 *  - 'plates-both': η from the mid-plane (L = H/2), g = 0, U = (1 − η² + 4x)/(2/3 + 4x),
 *    s = 2 b_t/H, Nu = 4λ²; limits 7.5407 (x = 0, Shah & London (Shah & London 1978)) and π² (plug).
 *  - 'one-wall': η from the adiabatic no-slip wall (L = H), g = 0,
 *    U = (η − η² + cη)/(1/6 + c/2), c = x/(1 + x), s = b_t/H, Nu = 2λ²; 4.8607 at x = 0 (independent scipy shooting,
 *    fixtures/heat/laminar.json: 4.86074).
 *  - 'tube': r/R, g = 1, U = (1 − r² + 2β)/(1/2 + 2β), β = b/R, s = b_t/R, Nu = λ²;
 *    limits 3.6568 (Shah & London (Shah & London 1978)) and j₀,₁² = 5.7832 (plug).
 * The ODE is integrated by RK4 (../numerics/ode.ts); λ by Brent's method.
 * @param geometry which duct
 * @param slipRatio x = b/H (plates) or β = b/R (tube), ≥ 0
 * @param thermalSlipRatio b_t/H (plates) or b_t/R (tube); negative values allowed while the
 *   uniform-flux total resistance stays positive (otherwise DomainError)
 */
export function nusseltUniformTemperature(geometry: LaminarGeometry, slipRatio: number, thermalSlipRatio: number): EigenSolution {
  if (!(Number.isFinite(slipRatio) && slipRatio >= 0)) throw new DomainError('slip ratio must be ≥ 0', { field: 'slipLength' });
  if (!Number.isFinite(thermalSlipRatio)) throw new DomainError('thermal slip ratio must be finite', { field: 'thermalSlipLength' });
  const x = slipRatio;
  let profile: (eta: number) => number;
  let curvature = 0;
  let robin: number;
  let scale: number;
  if (geometry === 'plates-both') {
    const mean = 2 / 3 + 4 * x;
    profile = (e) => (1 - e * e + 4 * x) / mean;
    robin = 2 * thermalSlipRatio;
    scale = 4;
  } else if (geometry === 'one-wall') {
    const c = x / (1 + x);
    const mean = 1 / 6 + c / 2;
    profile = (e) => (e - e * e + c * e) / mean;
    robin = thermalSlipRatio;
    scale = 2;
  } else {
    const mean = 0.5 + 2 * x;
    profile = (e) => (1 - e * e + 2 * x) / mean;
    curvature = 1;
    robin = thermalSlipRatio;
    scale = 1;
  }
  const wallMismatch = (lambda: number): number => {
    const l2 = lambda * lambda;
    const end = integrateRungeKutta4(
      (t, y, dy) => {
        dy[0] = y[1];
        // At the axis (t = 0) the term (g/t)φ' tends to gφ''(0): φ''(0) = −λ²U(0)φ/(1 + g).
        dy[1] = t === 0 ? (-l2 * profile(0) * y[0]) / (1 + curvature) : -l2 * profile(t) * y[0] - (curvature / t) * y[1];
      },
      0,
      [1, 0],
      1,
      SHOOTING_STEPS,
    );
    return end[0] + robin * end[1];
  };
  // Scan upward in λ for the first sign change; the first root lies below π (plates) or
  // j₀,₁-like values for any non-negative Robin coefficient and grows as the coefficient falls.
  const step = 0.1;
  let lo = 0.05;
  let flo = wallMismatch(lo);
  for (let i = 0; i < 200; i++) {
    const hi = lo + step;
    const fhi = wallMismatch(hi);
    if (flo * fhi <= 0) {
      const r = brent(wallMismatch, lo, hi, { xTolerance: 1e-13 });
      if (!r.converged) throw new ConvergenceError('uniform-wall-temperature eigenvalue', r.iterations, r.residual);
      return { nusselt: scale * r.root * r.root, eigenvalue: r.root, iterations: r.iterations };
    }
    lo = hi;
    flo = fhi;
  }
  throw new ConvergenceError('uniform-wall-temperature eigenvalue: no sign change found', 200, Math.abs(flo));
}

/** A laminar duct as the closed forms see it. */
export interface LaminarConfiguration {
  geometry: LaminarGeometry;
  /** Length the closed-form ratios are taken on: H (plates) or R (tube). */
  ratioLength: number;
  hydraulicDiameter: number;
  pipe: boolean;
}

/** Laminar Nu of the configuration: closed forms at uniform flux, the eigenproblem at uniform wall temperature. */
export function laminarNusselt(config: LaminarConfiguration, heating: 'uniform-flux' | 'uniform-temperature', slip: number, thermalSlip: number): number | null {
  const x = slip / config.ratioLength;
  const y = thermalSlip / config.ratioLength;
  const uniformFlux =
    config.geometry === 'plates-both'
      ? nusseltUniformFluxPlates(x, y)
      : config.geometry === 'one-wall'
        ? nusseltUniformFluxOneWall(x, y)
        : nusseltUniformFluxTube(x, y);
  if (heating === 'uniform-flux' || uniformFlux === null) return uniformFlux;
  return nusseltUniformTemperature(config.geometry, x, y).nusselt;
}

/** Laminar friction ratio at fixed flow rate: the exact Navier-slip results of ../slip/drag.ts. */
export function laminarFrictionRatio(config: LaminarConfiguration, slip: number): number {
  const L = config.ratioLength;
  if (config.geometry === 'plates-both') return L / (L + 6 * slip);
  if (config.geometry === 'one-wall') return (L + slip) / (L + 4 * slip);
  return L / (L + 4 * slip);
}
