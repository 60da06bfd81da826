/**
 * Heat-transfer change of a liquid-infused grooved wall against the same wall
 * with its grooves filled by the solid: apparent thermal slip length, laminar
 * fully developed Nusselt numbers with velocity and thermal slip (closed forms,
 * shooting eigenproblem, and a cross-section field solution), and a
 * low-confidence turbulent estimate from Gnielinski's correlation and shifted
 * log laws.
 *
 * Symbols: texture period P, groove width w, depth d, interface fraction
 * φ = w/P, substrate thickness s below the groove floor; conductivities k_w
 * (working liquid), k_o (lubricant), k_s (solid); velocity slip length b,
 * thermal slip length b_t (an equivalent thickness of working liquid: the
 * extra conduction resistance of the liquid-infused wall over the solid-filled
 * wall is b_t/k_w; positive = added resistance, negative = enhancement).
 * Channel full height H (between the planes of the ridge tops), hydraulic
 * diameter D_h = 2H; pipe diameter D = 2R.
 *
 * References (numbered as cited in the functions below):
 *  [1] Shah, R. K. & London, A. L. 1978 Laminar Flow Forced Convection in Ducts.
 *      Advances in Heat Transfer, Suppl. 1. Academic Press. doi:10.1016/C2013-0-06152-X
 *  [2] Philip, J. R. 1972 Flows satisfying mixed no-slip and no-shear conditions.
 *      Z. angew. Math. Phys. 23, 353–372. doi:10.1007/BF01595477 (DOI from memory)
 *  [3] Belyaev, A. V. & Vinogradova, O. I. 2010 Effective slip in pressure-driven
 *      flow past super-hydrophobic stripes. J. Fluid Mech. 652, 489–499.
 *      doi:10.1017/S002211201000100X (DOI from memory)
 *  [4] Mikić, B. B. 1974 Thermal contact conductance; theoretical considerations.
 *      Int. J. Heat Mass Transfer 17, 205–214. doi:10.1016/0017-9310(74)90082-9 (from memory)
 *  [5] Gnielinski, V. 1976 New equations for heat and mass transfer in turbulent
 *      pipe and channel flow. Int. Chem. Eng. 16(2), 359–368.
 *  [6] Petukhov, B. S. 1970 Heat transfer and friction in turbulent pipe flow with
 *      variable physical properties. Adv. Heat Transfer 6, 503–564. doi:10.1016/S0065-2717(08)70153-9 (DOI from memory)
 *  [7] Dittus, F. W. & Boelter, L. M. K. 1930 Heat transfer in automobile radiators of
 *      the tubular type. Univ. Calif. Publ. Eng. 2, 443–461; reprinted Int. Commun.
 *      Heat Mass Transfer 12 (1985) 3–22. doi:10.1016/0735-1933(85)90003-X
 *  [8] Kader, B. A. 1981 Temperature and concentration profiles in fully turbulent
 *      boundary layers. Int. J. Heat Mass Transfer 24(9), 1541–1544.
 *      doi:10.1016/0017-9310(81)90220-9 (DOI from memory)
 *  [9] Patankar, S. V. 1980 Numerical Heat Transfer and Fluid Flow. Hemisphere, ch. 4
 *      (finite-volume conduction with harmonic-mean interface conductances).
 * [10] Wiener, O. 1912 Die Theorie des Mischkörpers für das Feld der stationären
 *      Strömung. Abh. Math.-Phys. Kl. Königl. Sächs. Ges. Wiss. 32, 509–604 (from memory).
 */
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { KARMAN_CONSTANT } from '../../core/constants.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import { REFERENCES } from '../../core/references.js';
import type { Scenario } from '../scenario.js';
import { grooveLidVelocityMean } from '../groove/groove-duct.js';
import { integrateRungeKutta4 } from '../../numerics/ode.js';
import { brent } from '../../numerics/roots.js';
import { sumSeries } from '../../numerics/series.js';
import { solveCellDiffusion, type CellDiffusionResult } from '../../numerics/cell-diffusion.js';

function requirePositive(value: number, field: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new DomainError(`${field} must be a positive finite number`, { field });
}

function requireFraction(value: number, field: string): void {
  if (!(Number.isFinite(value) && value > 0 && value < 1)) {
    throw new DomainError(`${field} must lie strictly between 0 and 1`, { field });
  }
}

// ---------------------------------------------------------------------------
// Thermal slip length: closed forms
// ---------------------------------------------------------------------------

/**
 * Adiabatic grooves over isothermal ridges: b_t = (P/π) ln sec(πφ/2).
 *
 * [derived] Above the texture plane the temperature obeys Laplace's equation
 * with T = T_ridge on the ridges and ∂T/∂n = 0 over the groove mouths: the
 * same mixed problem as Philip's longitudinal flow over no-slip/no-shear
 * stripes [2], with T in place of the streamwise velocity, so the thermal
 * slip length equals Philip's longitudinal slip length.
 * @param pitch P, m (> 0)
 * @param interfaceFraction φ = w/P, 0 < φ < 1 (groove fraction)
 * @returns b_t, m (≥ 0). Example: P = 1, φ = ½ → ln 2/(2π) = 0.1103178.
 * Valid when the ridges are much better conductors than the working liquid and
 * the lubricant a much poorer one (k_o ≪ k_w ≪ k_s), and P ≪ channel height.
 */
export function thermalSlipAdiabaticGrooves(pitch: number, interfaceFraction: number): number {
  requirePositive(pitch, 'pitch');
  requireFraction(interfaceFraction, 'interfaceFraction');
  return (pitch / Math.PI) * -Math.log(Math.cos((Math.PI * interfaceFraction) / 2));
}

/**
 * Isoflux ridges, adiabatic grooves: the ridges (solid fraction φ_s = 1 − φ)
 * deliver a uniform flux q/φ_s, the grooves none; b_t is defined with the
 * flux-weighted mean ridge temperature:
 *   b_t / P = Σ_{n≥1} sin²(nπφ_s)/n³ / (π³ φ_s²).
 *
 * [derived] Write the surface flux as q[1 + Σ a_n cos(2πnx/P)] with
 * a_n = 2 sin(nπφ_s)/(nπφ_s); each mode decays into the liquid as
 * exp(−2πnz/P) and raises the surface temperature by a_n q P/(2πn k_w).
 * Averaging over the ridge multiplies mode n by sin(nπφ_s)/(nπφ_s); summing
 * gives the series. It is the strip form of the constriction (spreading)
 * resistance used for contact conductance by Mikić [4] (from memory).
 * @param pitch P, m (> 0)
 * @param interfaceFraction φ = w/P, 0 < φ < 1
 * @returns b_t, m (> 0); → 0 as φ → 0; for φ → 1, ≈ (P/π) ln(1/(πφ_s)) + (3P/2π) (narrow strip).
 * Valid for k_s ≪ k_w with heating applied uniformly below thin ridges, P ≪ channel height.
 */
export function thermalSlipIsofluxRidges(pitch: number, interfaceFraction: number): number {
  requirePositive(pitch, 'pitch');
  requireFraction(interfaceFraction, 'interfaceFraction');
  const solidFraction = 1 - interfaceFraction;
  const sum = sumSeries((k) => {
    const n = k + 1;
    const s = Math.sin(n * Math.PI * solidFraction);
    return (s * s) / (n * n * n);
  }, { relativeTolerance: 1e-14, maxTerms: 2_000_000 });
  return (pitch * sum.sum) / (Math.PI ** 3 * solidFraction * solidFraction);
}

/**
 * Mean local thermal slip of a lubricant-filled groove whose walls and floor
 * are isothermal: b_s = (k_w/k_o)(8w/π³) Σ_odd tanh(nπd/w)/n³, i.e. the sum of
 * the modal resistances (k_w/k_o)(w/(nπ)) tanh(nπd/w) weighted by the sine
 * coefficients of a uniform lid flux.
 *
 * [derived] Conduction in the groove with T = T_solid on x = 0, w and y = 0 and a
 * uniform flux q on the lid is the lid-sheared duct problem of
 * ../groove/groove-duct.ts with k_o in place of μ and T in place of u, so the mean lid
 * temperature rise is q/k_o times the same length; multiplied by k_w it becomes
 * an equivalent thickness of working liquid.
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @param workingConductivity k_w, W/(m·K) (> 0)
 * @param lubricantConductivity k_o, W/(m·K) (> 0)
 * @returns m; → (k_w/k_o) d for d ≪ w; = (k_w/k_o) w/4 at d/w = ½.
 */
export function grooveThermalResistanceLength(
  grooveWidth: number,
  grooveDepth: number,
  workingConductivity: number,
  lubricantConductivity: number,
): number {
  requirePositive(workingConductivity, 'workingConductivity');
  requirePositive(lubricantConductivity, 'lubricantConductivity');
  return (workingConductivity / lubricantConductivity) * grooveLidVelocityMean(grooveWidth, grooveDepth);
}

/**
 * Striped-surface homogenisation with a finite local slip b_s on the stripes
 * (here: thermal slip over the groove mouths, isothermal ridges):
 *   b_eff = (P/π) ln sec(πφ/2) / [1 + (P/(π b_s)) ln(sec(πφ/2) + tan(πφ/2))]
 * (Belyaev & Vinogradova 2010 [3], longitudinal stripes; form from memory).
 * Limits: b_s → ∞ gives the adiabatic-groove result (Philip [2]); b_s → 0
 * gives b_eff ≈ b_s ln sec/ln(sec + tan), which reads low against the
 * area average φ b_s for narrow stripes (known deficiency of the formula).
 * @param pitch P, m (> 0)
 * @param interfaceFraction φ, 0 < φ < 1
 * @param localSlip b_s, m (≥ 0)
 * @returns m (≥ 0)
 */
export function stripedThermalSlip(pitch: number, interfaceFraction: number, localSlip: number): number {
  requirePositive(pitch, 'pitch');
  requireFraction(interfaceFraction, 'interfaceFraction');
  if (!(Number.isFinite(localSlip) && localSlip >= 0)) {
    throw new DomainError('local slip must be a non-negative finite length', { field: 'localSlip' });
  }
  if (localSlip === 0) return 0;
  const a = (Math.PI * interfaceFraction) / 2;
  const lnSec = -Math.log(Math.cos(a));
  const lnSecTan = Math.log(1 / Math.cos(a) + Math.tan(a));
  return ((pitch / Math.PI) * lnSec) / (1 + (pitch / (Math.PI * localSlip)) * lnSecTan);
}

export interface ThermalSlipClosedForm {
  /** b_t, m, against the solid-filled wall. */
  thermalSlipLength: number;
  /** Local excess resistance of the groove over a solid-filled groove, m of working liquid. */
  grooveExcessResistance: number;
  /** Which limit the estimate rests on. */
  model: 'isothermal-ridges-striped' | 'laminate-bounds-mean' | 'identical-materials';
  /** True when the conductivities lie outside the limit the model is exact in (k_s ≫ k_w, k_o). */
  estimate: boolean;
}

/**
 * Closed-form thermal slip of lubricant-filled grooves against the
 * solid-filled wall. The groove's excess local resistance over a groove filled
 * with solid is
 *   b_s = k_w L(w, d) (1/k_o − 1/k_s),   L = (8w/π³) Σ_odd tanh(nπd/w)/n³
 * (see {@link grooveThermalResistanceLength}); b_s = 0 exactly when k_o = k_s.
 * For b_s > 0 (lubricant the poorer conductor) the striped homogenisation
 * with isothermal ridges ({@link stripedThermalSlip}) gives b_t; for b_s < 0
 * (lubricant the better conductor, ridges the bottleneck) the texture layer of
 * depth d is bracketed by Wiener's bounds [10] for a laminate of the two
 * columns: series b_series = k_w d φ (1/k_o − 1/k_s) and parallel
 * b_parallel = k_w d [1/(φ k_o + (1 − φ) k_s) − 1/k_s]; the estimate is their
 * mean [derived]; against the field method (k_w = 0.6, k_s = 0.2, φ = ½,
 * s = P/2) it reads 3–4 % low in magnitude for d/w = ½ and 7–11 % low for
 * d/w = 1 at k_o/k_s = 2–5 (team’s comparison, see the tests).
 * Exact in the limit k_s ≫ k_w, k_o for b_s > 0; otherwise an estimate
 * (the field method is the reference).
 * @param pitch P, m; @param grooveWidth w, m; @param grooveDepth d, m
 * @param workingConductivity k_w, lubricantConductivity k_o, solidConductivity k_s, W/(m·K)
 */
export function thermalSlipLubricantGrooves(
  pitch: number,
  grooveWidth: number,
  grooveDepth: number,
  workingConductivity: number,
  lubricantConductivity: number,
  solidConductivity: number,
): ThermalSlipClosedForm {
  requirePositive(solidConductivity, 'solidConductivity');
  const phi = grooveWidth / pitch;
  requireFraction(phi, 'interfaceFraction');
  const lid = grooveThermalResistanceLength(grooveWidth, grooveDepth, workingConductivity, lubricantConductivity) * lubricantConductivity;
  // lid = k_w L; the difference of reciprocals is formed directly so equal conductivities give exactly zero.
  const excess = lid * (1 / lubricantConductivity - 1 / solidConductivity);
  if (excess === 0) return { thermalSlipLength: 0, grooveExcessResistance: 0, model: 'identical-materials', estimate: false };
  const strongSolid = solidConductivity >= 10 * Math.max(workingConductivity, lubricantConductivity);
  if (excess > 0) {
    return {
      thermalSlipLength: stripedThermalSlip(pitch, phi, excess),
      grooveExcessResistance: excess,
      model: 'isothermal-ridges-striped',
      estimate: !strongSolid,
    };
  }
  const k = workingConductivity;
  const series = k * grooveDepth * phi * (1 / lubricantConductivity - 1 / solidConductivity);
  const parallel = k * grooveDepth * (1 / (phi * lubricantConductivity + (1 - phi) * solidConductivity) - 1 / solidConductivity);
  return { thermalSlipLength: 0.5 * (series + parallel), grooveExcessResistance: excess, model: 'laminate-bounds-mean', estimate: true };
}

// ---------------------------------------------------------------------------
// Laminar fully developed Nusselt numbers, uniform heat flux (closed forms)
// ---------------------------------------------------------------------------

/**
 * Parallel plates, both walls alike (velocity slip b, thermal slip b_t, equal
 * uniform flux on both), fully developed, Nu on D_h = 2H:
 *   Nu = 140(1 + 6x)² / [17 + 168x + 420x² + 70y(1 + 6x)²],  x = b/H, y = b_t/H.
 *
 * [derived; checked symbolically by fixtures/heat/generate_laminar.py] With
 * η = 2y'/H from the mid-plane, Navier slip gives u ∝ 1 − η² + 4x. The energy
 * equation d²θ/dη² = u/ū with θ'(0) = 0, θ'(1) = 1 (θ = T k/(q H/2)),
 * integrated twice, and the mixing-cup θ_b = ∫u θ dη/∫u dη give
 * θ_f(1) − θ_b = (17 + 168x + 420x²)/(35(1 + 6x)²). The thermal slip adds
 * T_w − T_f = q b_t/k, i.e. 2y to θ; Nu = 4/(θ_w − θ_b). Hence
 * 1/Nu = 1/Nu_slip + b_t/D_h (series resistances).
 * Limits: x = y = 0 → 140/17 = 8.2353 (Shah & London [1]); x → ∞ → 12 (plug flow).
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
 * η = 0, Navier slip at η = 1); θ'' = u/ū, θ'(0) = 0, θ'(1) = 1 (θ = T k/(qH));
 * Nu = 2/(θ_w − θ_b) with θ_w = θ_f(1) + y.
 * Limit x = y = 0 → 70/13 = 5.3846 (Shah & London [1]).
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
 * u ∝ 1 − r² + 2b/R, (1/r)(rθ')' = 2u/ū with θ'(1) = 1 (θ = T k/(qR)),
 * Nu = 2/(θ_w − θ_b), θ_w = θ_f(1) + b_t/R.
 * Limits: β = β_t = 0 → 48/11 = 4.3636 (Shah & London [1]); β → ∞ → 8 (plug flow).
 * @param slipRatio β = b/R (≥ 0); @param thermalSlipRatio β_t = b_t/R
 */
export function nusseltUniformFluxTube(slipRatio: number, thermalSlipRatio: number): number | null {
  const x = slipRatio;
  const g = (1 + 4 * x) ** 2;
  const den = 11 + 64 * x + 96 * x * x + 24 * thermalSlipRatio * g;
  return den > 0 && Number.isFinite(den) ? (48 * g) / den : null;
}

// ---------------------------------------------------------------------------
// Laminar fully developed Nusselt numbers, uniform wall temperature (shooting)
// ---------------------------------------------------------------------------

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
 *   φ(1) + s φ'(1) = 0 (thermal slip: T_f = T_w − b_t ∂T/∂n),
 * with the smallest λ > 0 wanted. Energy balance h = λ² k/L gives:
 *  - 'plates-both': η from the mid-plane (L = H/2), g = 0, U = (1 − η² + 4x)/(2/3 + 4x),
 *    s = 2 b_t/H, Nu = 4λ²; limits 7.5407 (x = 0, Shah & London [1]) and π² (plug).
 *  - 'one-wall': η from the adiabatic no-slip wall (L = H), g = 0,
 *    U = (η − η² + cη)/(1/6 + c/2), c = x/(1 + x), s = b_t/H, Nu = 2λ²; 4.8607 at x = 0 ([1], from memory).
 *  - 'tube': r/R, g = 1, U = (1 − r² + 2β)/(1/2 + 2β), β = b/R, s = b_t/R, Nu = λ²;
 *    limits 3.6568 (Shah & London [1]) and j₀,₁² = 5.7832 (plug).
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

// ---------------------------------------------------------------------------
// Turbulent correlations
// ---------------------------------------------------------------------------

/**
 * Petukhov's (1970) smooth-pipe Darcy friction factor f = (0.790 ln Re − 1.64)⁻² [6],
 * the friction factor Gnielinski [5] pairs with his correlation.
 * @param reynolds Re on the hydraulic diameter; valid 3×10³ ≤ Re ≤ 5×10⁶.
 * Example: Re = 10⁴ → f = 0.031479.
 */
export function petukhovFrictionFactor(reynolds: number): number {
  requirePositive(reynolds, 'reynoldsNumber');
  const a = 0.79 * Math.log(reynolds) - 1.64;
  return 1 / (a * a);
}

/**
 * Gnielinski (1976) [5] fully developed turbulent Nusselt number:
 *   Nu = (f/8)(Re − 1000) Pr / [1 + 12.7 √(f/8) (Pr^(2/3) − 1)],
 * with the Darcy friction factor f (default Petukhov [6]).
 * @param reynolds Re on D_h, 3×10³ ≤ Re ≤ 5×10⁶; @param prandtl Pr, 0.5 ≤ Pr ≤ 2000
 * Example: Re = 10⁴, Pr = 7 → 79.49.
 */
export function gnielinskiNusselt(reynolds: number, prandtl: number, frictionFactor = petukhovFrictionFactor(reynolds)): number {
  requirePositive(prandtl, 'prandtlNumber');
  const f8 = frictionFactor / 8;
  return (f8 * (reynolds - 1000) * prandtl) / (1 + 12.7 * Math.sqrt(f8) * (prandtl ** (2 / 3) - 1));
}

/**
 * Dittus–Boelter (1930) [7]: Nu = 0.023 Re^0.8 Pr^n, n = 0.4 heating the fluid, 0.3 cooling.
 * Valid Re ≳ 10⁴, 0.6 ≤ Pr ≤ 160. Example: Re = 10⁴, Pr = 7, n = 0.4 → 79.39.
 */
export function dittusBoelterNusselt(reynolds: number, prandtl: number, exponent = 0.4): number {
  requirePositive(reynolds, 'reynoldsNumber');
  requirePositive(prandtl, 'prandtlNumber');
  return 0.023 * reynolds ** 0.8 * prandtl ** exponent;
}

/** Slope of Kader's (1981) thermal log law Θ⁺ = 2.12 ln y⁺ + β(Pr) [8]. */
export const KADER_THERMAL_SLOPE = 2.12;

/**
 * Kader's (1981) [8] additive constant of the thermal log law,
 * β(Pr) = (3.85 Pr^(1/3) − 1.3)² + 2.12 ln Pr (form from memory). Example: Pr = 0.71 → 3.85.
 */
export function kaderThermalConstant(prandtl: number): number {
  requirePositive(prandtl, 'prandtlNumber');
  return (3.85 * prandtl ** (1 / 3) - 1.3) ** 2 + KADER_THERMAL_SLOPE * Math.log(prandtl);
}

export interface TurbulentHeatEstimate {
  nusseltSmooth: number;
  nusselt: number;
  heatTransferRatio: number;
  frictionRatio: number;
  dragReduction: number;
  /** ΔΘ⁺ = Pr b_t⁺ applied to the temperature law. */
  temperatureShift: number;
  /** Kader's β(Pr), for reference. */
  thermalLawConstant: number;
}

/**
 * Low-confidence turbulent estimate [derived]. Smooth wall: Nu₀ from
 * Gnielinski [5] with Petukhov's f₀ [6], C_f0 = f₀/4, U_b0⁺ = √(2/C_f0),
 * Θ_b0⁺ = Re Pr/(Nu₀ U_b0⁺) (St = 1/(U_b⁺ Θ_b⁺)). Textured wall at the same
 * bulk Reynolds number: drag reduction DR (given, or from the velocity shift
 * ΔU⁺ by ΔU⁺ = √(2/C_f0)[(1 − DR)^(−1/2) − 1] − ln(1 − DR)/(2κ)), so
 * U_b⁺ = U_b0⁺/√(1 − DR); the bulk temperature in wall units follows the thermal
 * log law of slope 2.12 [8] in Re_τ ∝ √(1 − DR) and gains the thermal-slip
 * shift ΔΘ⁺ = Pr b_t⁺ (a resistance b_t/k in the conductive sublayer, where
 * Θ⁺ = Pr y⁺), b_t⁺ = b_t u_τ/ν. Nu/Nu₀ = U_b0⁺Θ_b0⁺/(U_b⁺Θ_b⁺).
 * The turbulence's own virtual-origin shift acting on the temperature field is
 * neglected. Validity: Re 3×10³–5×10⁶, |ΔU⁺| ≲ 5, |b_t⁺| ≲ 5.
 */
export function turbulentHeatTransfer(args: {
  reynolds: number;
  prandtl: number;
  /** ℓ_ν of the smooth wall at this flow, m. */
  viscousLength: number;
  thermalSlipLength: number;
  deltaUPlus?: number;
  dragReduction?: number;
}): TurbulentHeatEstimate {
  const { reynolds, prandtl } = args;
  const f0 = petukhovFrictionFactor(reynolds);
  const cf0 = f0 / 4;
  const nusseltSmooth = gnielinskiNusselt(reynolds, prandtl, f0);
  const ub0 = Math.sqrt(2 / cf0);
  const thetaB0 = (reynolds * prandtl) / (nusseltSmooth * ub0);
  let dr = args.dragReduction ?? 0;
  if (args.dragReduction === undefined && args.deltaUPlus !== undefined && args.deltaUPlus !== 0) {
    const shift = args.deltaUPlus;
    const g = (d: number) => ub0 * ((1 - d) ** -0.5 - 1) - Math.log(1 - d) / (2 * KARMAN_CONSTANT) - shift;
    const r = brent(g, -5, 0.999);
    if (!r.converged) throw new ConvergenceError('drag reduction from the velocity shift', r.iterations, r.residual);
    dr = r.root;
  }
  if (!(dr < 1)) throw new DomainError('drag reduction must be below 1', { field: 'slip.dragReduction' });
  const frictionRatio = 1 - dr;
  const ub = ub0 / Math.sqrt(frictionRatio);
  const frictionVelocityRatio = Math.sqrt(frictionRatio);
  const thermalSlipPlus = (args.thermalSlipLength * frictionVelocityRatio) / args.viscousLength;
  const temperatureShift = prandtl * thermalSlipPlus;
  const thetaB = thetaB0 + KADER_THERMAL_SLOPE * Math.log(frictionVelocityRatio) + temperatureShift;
  if (!(thetaB > 0)) throw new DomainError('thermal slip too negative for the log-law estimate', { field: 'thermalSlipLength' });
  const ratio = (ub0 * thetaB0) / (ub * thetaB);
  return {
    nusseltSmooth,
    nusselt: nusseltSmooth * ratio,
    heatTransferRatio: ratio,
    frictionRatio,
    dragReduction: dr,
    temperatureShift,
    thermalLawConstant: kaderThermalConstant(prandtl),
  };
}

// ---------------------------------------------------------------------------
// Field method: conduction cell and channel cross-section
// ---------------------------------------------------------------------------

export type LubricantMotion = 'co-flowing' | 'zero-net-flux';

/** Geometry and materials of one texture period of the wall (SI). */
export interface WallCell {
  pitch: number;
  /** w, m; 0 gives a smooth wall (grooves filled by the solid). */
  grooveWidth: number;
  grooveDepth: number;
  substrateThickness: number;
  workingConductivity: number;
  lubricantConductivity: number;
  solidConductivity: number;
}

interface CellGrid {
  widths: number[];
  heights: number[];
  /** Per cell: 0 solid, 1 lubricant, 2 working liquid. */
  material: Uint8Array;
  nx: number;
  ny: number;
}

/** Target cells across one period of the field grids (second-order scheme; 0.1 % needs ≳ 48). */
const FIELD_CELLS_PER_PITCH = 64;

function uniformCells(length: number, count: number): number[] {
  return new Array<number>(count).fill(length / count);
}

/** Cells growing geometrically (factor 1.08) from `first` up to `largest`, then uniform, summing to `length`. */
function stretchedCells(length: number, first: number, largest: number): number[] {
  const cells: number[] = [];
  let total = 0;
  let size = Math.min(first, length);
  while (total + size < length) {
    cells.push(size);
    total += size;
    size = Math.min(size * 1.08, largest);
  }
  const rest = length - total;
  // Merge a sliver into the last cell rather than leaving a tiny cell at the top.
  if (cells.length > 0 && rest < 0.5 * cells[cells.length - 1]) cells[cells.length - 1] += rest;
  else cells.push(rest);
  return cells;
}

/**
 * Grid of one period: x = [ridge half | groove | ridge half] so that the groove
 * walls lie on cell faces; y = substrate, groove layer, working-liquid layer of
 * height `liquidHeight` above the ridge-top plane.
 */
function buildGrid(wall: WallCell, liquidHeight: number, topRefined: boolean, cellsPerPitch = FIELD_CELLS_PER_PITCH): CellGrid {
  const { pitch, grooveWidth, grooveDepth, substrateThickness } = wall;
  const spacing = pitch / cellsPerPitch;
  const smooth = grooveWidth === 0;
  const widths = smooth
    ? uniformCells(pitch, 2)
    : [
        ...uniformCells((pitch - grooveWidth) / 2, Math.max(3, Math.round((pitch - grooveWidth) / 2 / spacing))),
        ...uniformCells(grooveWidth, Math.max(8, Math.round(grooveWidth / spacing))),
        ...uniformCells((pitch - grooveWidth) / 2, Math.max(3, Math.round((pitch - grooveWidth) / 2 / spacing))),
      ];
  const grooveLeft = (pitch - grooveWidth) / 2;
  const heights: number[] = [];
  if (substrateThickness > 0) heights.push(...uniformCells(substrateThickness, Math.min(48, Math.max(4, Math.round(substrateThickness / spacing)))));
  const substrateRows = heights.length;
  if (!smooth) heights.push(...uniformCells(grooveDepth, Math.min(96, Math.max(8, Math.round(grooveDepth / spacing)))));
  const grooveRows = heights.length - substrateRows;
  const largest = liquidHeight / 160;
  const first = smooth ? largest : Math.min(spacing, largest);
  let liquid = stretchedCells(liquidHeight, first, largest);
  if (topRefined) {
    // A no-slip top wall: mirror the stretching so both walls are resolved alike.
    const half = stretchedCells(liquidHeight / 2, first, largest);
    liquid = [...half, ...half.slice().reverse()];
  }
  heights.push(...liquid);
  const nx = widths.length;
  const ny = heights.length;
  const material = new Uint8Array(nx * ny);
  const centres: number[] = [];
  let xAcc = 0;
  for (const w of widths) {
    centres.push(xAcc + w / 2);
    xAcc += w;
  }
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      let m = 0;
      if (j >= substrateRows + grooveRows) m = 2;
      else if (j >= substrateRows && !smooth && centres[i] > grooveLeft && centres[i] < grooveLeft + grooveWidth) m = 1;
      material[j * nx + i] = m;
    }
  }
  return { widths, heights, material, nx, ny };
}

function requireSolved(result: CellDiffusionResult, what: string): void {
  if (!result.converged) throw new ConvergenceError(what, result.iterations, result.residual);
}

/**
 * Exact (to discretisation) conduction solution on one period [derived]: the
 * wall cell with a working-liquid layer of height L = 4P above, isothermal
 * substrate bottom and isothermal top; b_t = k_w (R − R_ref) with the total
 * resistance R = ΔT/q and R_ref = (s + d)/k_s + L/k_w for the solid-filled wall.
 * Finite volumes with harmonic face conductances (Patankar [9]) are exact for a
 * layered medium, so equal lubricant and solid conductivities give b_t = 0 to
 * rounding. Valid for a flat interface and P ≪ channel height.
 * Accuracy: second order for moderate conductivity contrasts; near the
 * adiabatic-groove extreme (k_o ≪ k_w ≪ k_s) the groove-edge singularity makes
 * it first order, about 5 % high at the default 64 cells per pitch and 2.6 % at
 * 128 (team's convergence study against Philip's exact value, see the tests).
 * @param cellsPerPitch grid resolution across one period (default 64)
 * @returns b_t, m
 */
export function thermalSlipField(wall: WallCell, cellsPerPitch = FIELD_CELLS_PER_PITCH): { thermalSlipLength: number; iterations: number; cells: number } {
  const liquidHeight = 4 * wall.pitch;
  const grid = buildGrid(wall, liquidHeight, false, cellsPerPitch);
  const k = Float64Array.from(grid.material, (m) =>
    m === 0 ? wall.solidConductivity : m === 1 ? wall.lubricantConductivity : wall.workingConductivity,
  );
  const r = solveCellDiffusion({
    widths: grid.widths,
    heights: grid.heights,
    coefficient: k,
    bottom: { kind: 'value', value: 0 },
    top: { kind: 'value', value: -1 },
    tolerance: 1e-12,
    maxIterations: 400,
  });
  requireSolved(r, 'wall conduction cell');
  const top = grid.ny - 1;
  const halfTop = grid.heights[top] / 2;
  let flux = 0;
  for (let i = 0; i < grid.nx; i++) flux += (wall.workingConductivity * (r.field[top * grid.nx + i] + 1) * grid.widths[i]) / halfTop;
  flux /= wall.pitch;
  const wallDepth = wall.substrateThickness + (wall.grooveWidth === 0 ? 0 : wall.grooveDepth);
  const referenceResistance = wallDepth / wall.solidConductivity + liquidHeight / wall.workingConductivity;
  return {
    thermalSlipLength: wall.workingConductivity * (1 / flux - referenceResistance),
    iterations: r.iterations,
    cells: grid.nx * grid.ny,
  };
}

export interface CrossSectionInput {
  wall: WallCell;
  /** Channel full height H between the ridge-top planes, m. */
  height: number;
  /** 'both': both walls textured and heated alike (mid-plane symmetry); 'one': the opposite wall smooth, no-slip, adiabatic. */
  heatedWalls: 'one' | 'both';
  workingViscosity: number;
  lubricantViscosity: number;
  /** ρc of the working liquid and of the lubricant, J/(m³·K). */
  workingHeatCapacity: number;
  lubricantHeatCapacity: number;
  lubricantMotion: LubricantMotion;
  /** Grid cells across one period (default 64). */
  cellsPerPitch?: number;
}

export interface CrossSectionResult {
  /** Nu on D_h = 2H with the wall temperature of the solid-filled wall's ridge-top plane; null if that temperature difference is not positive. */
  nusselt: number | null;
  /** Overall conductance from the isothermal substrate bottom to the bulk, W/(m²·K) per (k_w/D_h): Nu_overall = U D_h/k_w. */
  overallNusselt: number;
  /** Fanning f·Re on D_h at the same working-liquid flow rate. */
  frictionFactorReynolds: number;
  /** Apparent slip length from the flow-rate gain, m. */
  slipLength: number;
  /** Working-liquid flow rate over that of the smooth channel at the same pressure gradient. */
  flowRateRatio: number;
  cells: number;
}

/**
 * Field method [derived]: laminar fully developed flow and heat transfer with
 * axially uniform heat input, solved together on the cross-section of one
 * texture period (grooves along the flow), no homogenisation:
 *   ∇·(μ∇u) = −G in liquid and lubricant, u = 0 in the solid;
 *   ∇·(k∇T) = ρc u dT_b/dx in liquid and lubricant, conduction in the solid,
 * with the substrate bottom isothermal (peripherally uniform wall temperature,
 * axially uniform flux: the H1 condition of Shah & London [1]) and a
 * symmetry plane at H/2 ('both') or a smooth adiabatic no-slip wall at H ('one').
 * Zero-net-flux lubricant: a second solve with a pressure gradient acting in the
 * groove alone is superposed so that the groove carries no net flow. The heat
 * flux is q = ∫ρc u dA (dT_b/dx)/P; the bulk temperature is the working
 * liquid's mixing-cup mean; h = q/(T_ref − T_b) with T_ref the ridge-top
 * temperature of the solid-filled wall carrying q, T_ref = T_bottom − q (s + d)/k_s,
 * so that Nu matches the closed forms' definition of b_t. Slip length from the
 * flow rate: 'both' Q/Q₀ = 1 + 6b/H, 'one' Q/Q₀ = (H + 4b)/(H + b) (exact
 * laminar results). Discretisation: ./../numerics/cell-diffusion.ts, second order.
 */
export function solveHeatCrossSection(input: CrossSectionInput): CrossSectionResult {
  const { wall, height } = input;
  const both = input.heatedWalls === 'both';
  const liquidHeight = both ? height / 2 : height;
  const grid = buildGrid(wall, liquidHeight, !both, input.cellsPerPitch ?? FIELD_CELLS_PER_PITCH);
  const n = grid.nx * grid.ny;
  const fixed = Uint8Array.from(grid.material, (m) => (m === 0 ? 1 : 0));
  const viscosity = Float64Array.from(grid.material, (m) => (m === 0 ? 1 : m === 1 ? input.lubricantViscosity : input.workingViscosity));
  const base = {
    widths: grid.widths,
    heights: grid.heights,
    coefficient: viscosity,
    fixed,
    bottom: { kind: 'value', value: 0 } as const,
    top: both ? ({ kind: 'flux', value: 0 } as const) : ({ kind: 'value', value: 0 } as const),
    tolerance: 1e-12,
    maxIterations: 400,
  };
  const drive = Float64Array.from(grid.material, (m) => (m === 0 ? 0 : -1));
  const flow = solveCellDiffusion({ ...base, source: drive });
  requireSolved(flow, 'cross-section velocity');
  const velocity = Float64Array.from(flow.field);
  const area = (index: number) => grid.widths[index % grid.nx] * grid.heights[Math.floor(index / grid.nx)];
  const hasGroove = wall.grooveWidth > 0;
  if (input.lubricantMotion === 'zero-net-flux' && hasGroove) {
    const grooveDrive = Float64Array.from(grid.material, (m) => (m === 1 ? -1 : 0));
    const correction = solveCellDiffusion({ ...base, source: grooveDrive });
    requireSolved(correction, 'cross-section groove back-pressure');
    let q1 = 0;
    let q2 = 0;
    for (let c = 0; c < n; c++) {
      if (grid.material[c] === 1) {
        q1 += velocity[c] * area(c);
        q2 += correction.field[c] * area(c);
      }
    }
    const factor = -q1 / q2;
    for (let c = 0; c < n; c++) velocity[c] += factor * correction.field[c];
  }
  let workingFlux = 0;
  let heatInput = 0;
  const heatSource = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    const m = grid.material[c];
    if (m === 2) workingFlux += velocity[c] * area(c);
    if (m !== 0) {
      heatSource[c] = (m === 1 ? input.lubricantHeatCapacity : input.workingHeatCapacity) * velocity[c];
      heatInput += heatSource[c] * area(c);
    }
  }
  // Smooth channel at the same pressure gradient (G = 1 per unit μ_w): Q₀ = P h³/(3μ) per half channel, P H³/(12μ) full.
  const smoothFlux = both
    ? (wall.pitch * liquidHeight ** 3) / (3 * input.workingViscosity)
    : (wall.pitch * liquidHeight ** 3) / (12 * input.workingViscosity);
  const flowRateRatio = workingFlux / smoothFlux;
  const slipLength = both ? (height * (flowRateRatio - 1)) / 6 : (height * (flowRateRatio - 1)) / (4 - flowRateRatio);
  const conductivity = Float64Array.from(grid.material, (m) =>
    m === 0 ? wall.solidConductivity : m === 1 ? wall.lubricantConductivity : wall.workingConductivity,
  );
  const thermal = solveCellDiffusion({
    widths: grid.widths,
    heights: grid.heights,
    coefficient: conductivity,
    source: heatSource,
    bottom: { kind: 'value', value: 0 },
    top: { kind: 'flux', value: 0 },
    tolerance: 1e-12,
    maxIterations: 400,
  });
  requireSolved(thermal, 'cross-section temperature');
  let mixed = 0;
  for (let c = 0; c < n; c++) if (grid.material[c] === 2) mixed += velocity[c] * thermal.field[c] * area(c);
  const bulkTemperature = mixed / workingFlux;
  const wallFlux = heatInput / wall.pitch;
  const wallDepth = wall.substrateThickness + (hasGroove ? wall.grooveDepth : 0);
  const referenceTemperature = -wallFlux * (wallDepth / wall.solidConductivity);
  const hydraulicDiameter = 2 * height;
  const difference = referenceTemperature - bulkTemperature;
  const nusselt = difference > 0 ? (wallFlux * hydraulicDiameter) / (difference * wall.workingConductivity) : null;
  const overallNusselt = (wallFlux * hydraulicDiameter) / (-bulkTemperature * wall.workingConductivity);
  return {
    nusselt,
    overallNusselt,
    frictionFactorReynolds: 24 / flowRateRatio,
    slipLength,
    flowRateRatio,
    cells: n,
  };
}

// ---------------------------------------------------------------------------
// Top-level calculation
// ---------------------------------------------------------------------------

/** Largest sensitivity sweep run with the field thermal slip (cost: one conduction solve per point). */
const FIELD_SWEEP_LIMIT = 25;

export type HeatingCondition = 'uniform-flux' | 'uniform-temperature';
export type HeatMethod = 'auto' | 'closed-form' | 'field';

export interface HeatInput {
  /** Fluids must carry thermalConductivity and specificHeat. Channel or pipe flow. */
  scenario: Scenario;
  solid: { thermalConductivity: number; substrateThickness: number };
  heating: HeatingCondition;
  /** Channel only; ignored for a pipe. */
  heatedWalls: 'one' | 'both';
  lubricantMotion: LubricantMotion;
  method: HeatMethod;
  /** From the slip model: longitudinal slip length b (m), turbulent velocity shift ΔU⁺ and drag reduction. */
  slip: { slipLengthLongitudinal: number; deltaUPlus?: number; dragReduction?: number };
  /** Sweep of the lubricant conductivity (points ≥ 2, at most 101). */
  sensitivity?: { points: number };
}

export interface HeatSensitivity {
  /** Lubricant conductivities, W/(m·K), log-spaced. */
  lubricantConductivity: number[];
  /** Nu/Nu_smooth at each (null where the apparent Nu is undefined). */
  heatTransferRatio: (number | null)[];
  /** Overall conductance ratio from the heated boundary at each (null where the estimate fails). */
  overallConductanceRatio: (number | null)[];
  /** Conductivity with the largest overall conductance ratio on the sweep, W/(m·K). */
  bestLubricantConductivity: number;
  bestOverallConductanceRatio: number;
  /** Which b_t model the sweep used. */
  thermalSlipMethod: 'closed-form' | 'field';
}

export interface HeatResult {
  /** b_t, m (positive = added resistance), from the method used. */
  thermalSlipLength: number;
  /** b_t of the closed form, m (always computed). */
  thermalSlipLengthClosedForm: number;
  /** Velocity slip length used, m (field: from the cross-section solution; else from the slip model). */
  slipLength: number;
  /** Nu on D_h = 2H (channel) or D (pipe), wall temperature at the ridge-top plane of the solid-filled wall; null if undefined. */
  nusselt: number | null;
  /** Nu of the solid-filled, no-slip wall at the same flow rate and heating. */
  nusseltSmooth: number;
  /** Nu / Nu_smooth; null if Nu is undefined (thermal slip so negative that the apparent resistance vanishes). */
  heatTransferRatio: number | null;
  /** Conductance from the heated substrate bottom to the bulk, over that of the solid-filled wall: includes the wall. */
  overallConductanceRatio: number;
  /** Friction (pressure drop) ratio at the same flow rate. */
  frictionRatio: number;
  /** Fanning f·Re on D_h (laminar), else null. */
  frictionFactorReynolds: number | null;
  /**
   * 'field': cross-section solution; 'field-thermal-slip': conduction-cell b_t with the closed-form
   * or eigenproblem Nu (pipe, uniform temperature, oblique grooves or turbulent flow); 'closed-form'.
   */
  method: 'closed-form' | 'field' | 'field-thermal-slip';
  /** (Nu_closed − Nu_field)/Nu_field where both ran. */
  closedFormError: number | null;
  regime: 'laminar' | 'turbulent';
  confidence: 'normal' | 'low';
  /** Groove Péclet number u_i w/α_o of the lubricant (u_i = slip velocity). */
  groovePecletNumber: number;
  sensitivity?: HeatSensitivity;
}

function fluidProperty(value: number | undefined, field: string): number {
  if (value === undefined) throw new DomainError(`${field} is required for heat transfer`, { field, code: 'missing-property' });
  requirePositive(value, field);
  return value;
}

interface Configuration {
  geometry: LaminarGeometry;
  /** Length the closed-form ratios are taken on: H (plates) or R (tube). */
  ratioLength: number;
  hydraulicDiameter: number;
  pipe: boolean;
}

function laminarNusselt(config: Configuration, heating: HeatingCondition, slip: number, thermalSlip: number): number | null {
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

/** Laminar friction ratio at fixed flow rate (physics.md §4 drag-change formulas, exact Navier-slip results). */
function laminarFrictionRatio(config: Configuration, slip: number): number {
  const L = config.ratioLength;
  if (config.geometry === 'plates-both') return L / (L + 6 * slip);
  if (config.geometry === 'one-wall') return (L + slip) / (L + 4 * slip);
  return L / (L + 4 * slip);
}

/**
 * Heat-transfer change of the liquid-infused wall against the same wall with
 * its grooves filled by the solid, at the same flow rate.
 *
 * Laminar: Nu from the closed forms ({@link nusseltUniformFluxPlates},
 * {@link nusseltUniformFluxOneWall}, {@link nusseltUniformFluxTube}) or the
 * eigenproblem ({@link nusseltUniformTemperature}) with the slip model's b and
 * the thermal slip b_t; the field method ({@link solveHeatCrossSection}) for
 * channels with grooves along the flow and uniform flux. Turbulent: the
 * low-confidence log-law estimate ({@link turbulentHeatTransfer}).
 * The overall conductance ratio adds the wall's own resistance (s + d)/k_s:
 * 1/U = (s + d)/k_s + D_h/(k_w Nu) (the solid-filled reference with Nu_smooth).
 * `auto` runs the field method wherever it applies (and reports the closed form's
 * error against it), else the closed forms with the conduction-cell b_t.
 * Throws DomainError for missing or non-physical properties and geometry
 * (field named), and for flows other than channel or pipe.
 */
export function evaluateHeat(input: HeatInput): Outcome<HeatResult> {
  const notes = new Notes();
  const { scenario, solid } = input;
  const { texture, flow } = scenario;
  const kW = fluidProperty(scenario.workingFluid.thermalConductivity, 'scenario.workingFluid.thermalConductivity');
  const cW = fluidProperty(scenario.workingFluid.specificHeat, 'scenario.workingFluid.specificHeat');
  const kO = fluidProperty(scenario.lubricant.thermalConductivity, 'scenario.lubricant.thermalConductivity');
  const cO = fluidProperty(scenario.lubricant.specificHeat, 'scenario.lubricant.specificHeat');
  requirePositive(scenario.workingFluid.density, 'scenario.workingFluid.density');
  requirePositive(scenario.lubricant.density, 'scenario.lubricant.density');
  requirePositive(scenario.workingFluid.viscosity, 'scenario.workingFluid.viscosity');
  requirePositive(scenario.lubricant.viscosity, 'scenario.lubricant.viscosity');
  const kS = solid.thermalConductivity;
  requirePositive(kS, 'solid.thermalConductivity');
  if (!(Number.isFinite(solid.substrateThickness) && solid.substrateThickness >= 0)) {
    throw new DomainError('substrate thickness must be a non-negative finite length', { field: 'solid.substrateThickness' });
  }
  requirePositive(texture.pitch, 'scenario.texture.pitch');
  requirePositive(texture.grooveWidth, 'scenario.texture.grooveWidth');
  requirePositive(texture.grooveDepth, 'scenario.texture.grooveDepth');
  if (!(texture.grooveWidth < texture.pitch)) {
    throw new DomainError('groove width must be smaller than the pitch', { field: 'scenario.texture.grooveWidth' });
  }
  const slip = input.slip.slipLengthLongitudinal;
  if (!(Number.isFinite(slip) && slip >= 0)) {
    throw new DomainError('slip length must be a non-negative finite length', { field: 'slip.slipLengthLongitudinal' });
  }
  let config: Configuration;
  if (flow.kind === 'channel') {
    const H = flow.height;
    if (H === undefined) throw new DomainError('channel height is required', { field: 'scenario.flow.height' });
    requirePositive(H, 'scenario.flow.height');
    config = { geometry: input.heatedWalls === 'both' ? 'plates-both' : 'one-wall', ratioLength: H, hydraulicDiameter: 2 * H, pipe: false };
    const textured = flow.texturedWalls ?? 2;
    if (input.heatedWalls === 'both' && textured === 1) {
      notes.warn('asymmetric-walls', 'Both walls heated but only one textured: computed as if both walls carried the texture (overstates the change).', 'caution');
    }
    if (input.heatedWalls === 'one' && textured === 2) {
      notes.warn('adiabatic-wall-textured', 'The adiabatic opposite wall is treated as smooth and no-slip.', 'info');
    }
  } else if (flow.kind === 'pipe') {
    const D = flow.diameter;
    if (D === undefined) throw new DomainError('pipe diameter is required', { field: 'scenario.flow.diameter' });
    requirePositive(D, 'scenario.flow.diameter');
    config = { geometry: 'tube', ratioLength: D / 2, hydraulicDiameter: D, pipe: true };
  } else {
    throw new DomainError('heat transfer is computed for channel and pipe flows only', { field: 'scenario.flow.kind', code: 'unsupported-flow' });
  }
  notes.cite(REFERENCES.shahLondon1978, REFERENCES.philip1972, REFERENCES.belyaevVinogradova2010);
  notes.assume('Flat lubricant–liquid interface; fully developed flow and heat transfer; constant properties.');
  notes.assume('Reference: the same wall with its grooves filled by the solid, at the same flow rate and heating.');

  const wall: WallCell = {
    pitch: texture.pitch,
    grooveWidth: texture.grooveWidth,
    grooveDepth: texture.grooveDepth,
    substrateThickness: solid.substrateThickness,
    workingConductivity: kW,
    lubricantConductivity: kO,
    solidConductivity: kS,
  };
  const closedForm = (k: number) => thermalSlipLubricantGrooves(texture.pitch, texture.grooveWidth, texture.grooveDepth, kW, k, kS);
  const closed = closedForm(kO);
  notes.model(`thermal-slip-${closed.model}`);
  if (closed.model === 'laminate-bounds-mean') notes.cite(REFERENCES.wiener1912);

  const turbulent = flow.regime !== 'laminar';
  const longitudinal = Math.abs(texture.flowAngle) < 1e-9 || Math.abs(texture.flowAngle - 180) < 1e-9;
  const fieldApplies = !turbulent && !config.pipe && input.heating === 'uniform-flux' && longitudinal;
  if (input.method === 'field' && !fieldApplies) {
    notes.warn(
      'field-not-applicable',
      'The cross-section field method covers laminar channels with grooves along the flow and uniform heat flux; the conduction-cell thermal slip is used with the closed forms instead.',
      'caution',
    );
  }
  const useFieldThermalSlip = input.method !== 'closed-form';
  const useCrossSection = input.method !== 'closed-form' && fieldApplies;
  const fieldThermalSlip = (k: number) => thermalSlipField({ ...wall, lubricantConductivity: k }).thermalSlipLength;
  const thermalSlip = useFieldThermalSlip ? fieldThermalSlip(kO) : closed.thermalSlipLength;
  if (useFieldThermalSlip) notes.cite(REFERENCES.patankar1980).model('thermal-slip-field');
  else if (closed.estimate) {
    notes.warn('thermal-slip-estimate', 'The closed-form thermal slip is exact only for a solid much more conductive than both liquids; run method "field" for the exact value.', 'caution');
  }

  const wallResistance = (solid.substrateThickness + texture.grooveDepth) / kS;
  const Dh = config.hydraulicDiameter;
  const overallFrom = (nusseltSlip: number | null, bt: number, smooth: number): number => {
    // 1/U = R_wall + D_h/(k_w Nu_slip) + b_t/k_w against 1/U₀ = R_wall + D_h/(k_w Nu₀).
    const reference = wallResistance + Dh / (kW * smooth);
    const own = nusseltSlip === null ? Number.NaN : wallResistance + Dh / (kW * nusseltSlip) + bt / kW;
    return own > 0 ? reference / own : Number.NaN;
  };

  let result: HeatResult;
  // Filled in once the slip length in use is known (the field method computes its own).
  const groovePecletNumber = 0;

  if (turbulent) {
    notes.cite(REFERENCES.gnielinski1976, REFERENCES.petukhov1970, REFERENCES.kader1981).model('turbulent-log-law-shift');
    notes.warn('turbulent-estimate', 'Turbulent heat-transfer change is a low-confidence estimate from shifted velocity and temperature log laws.', 'caution');
    if (flow.regime === 'transitional') notes.warn('transitional-flow', 'Transitional flow: neither the laminar nor the turbulent result is reliable.', 'warning');
    const reH = flow.reynoldsNumber;
    if (reH === undefined) throw new DomainError('Reynolds number is required for turbulent flow', { field: 'scenario.flow.reynoldsNumber' });
    const reynolds = config.pipe ? reH : 2 * reH; // channel Re is on H; Gnielinski takes D_h = 2H
    if (reynolds < 3000 || reynolds > 5e6) notes.warn('gnielinski-range', `Re_Dh = ${reynolds.toPrecision(3)} outside 3e3–5e6 of Gnielinski (1976).`, 'caution');
    const prandtl = (scenario.workingFluid.viscosity * cW) / kW;
    const estimate = turbulentHeatTransfer({
      reynolds,
      prandtl,
      viscousLength: flow.viscousLength,
      thermalSlipLength: thermalSlip,
      deltaUPlus: input.slip.deltaUPlus,
      dragReduction: input.slip.dragReduction,
    });
    if (!config.pipe) notes.assume('Channel treated with the pipe correlations on the hydraulic diameter 2H (Gnielinski 1976).');
    const smooth = estimate.nusseltSmooth;
    const ownResistance = wallResistance + Dh / (kW * estimate.nusselt);
    result = {
      thermalSlipLength: thermalSlip,
      thermalSlipLengthClosedForm: closed.thermalSlipLength,
      slipLength: slip,
      nusselt: estimate.nusselt,
      nusseltSmooth: smooth,
      heatTransferRatio: estimate.heatTransferRatio,
      overallConductanceRatio: (wallResistance + Dh / (kW * smooth)) / ownResistance,
      frictionRatio: estimate.frictionRatio,
      frictionFactorReynolds: null,
      method: useFieldThermalSlip ? 'field-thermal-slip' : 'closed-form',
      closedFormError: null,
      regime: 'turbulent',
      confidence: 'low',
      groovePecletNumber,
    };
  } else {
    const smooth = laminarNusselt(config, input.heating, 0, 0) as number;
    const closedNusselt = laminarNusselt(config, input.heating, slip, closed.thermalSlipLength);
    if (useCrossSection) {
      const section = solveHeatCrossSection({
        wall,
        height: config.ratioLength,
        heatedWalls: input.heatedWalls,
        workingViscosity: scenario.workingFluid.viscosity,
        lubricantViscosity: scenario.lubricant.viscosity,
        workingHeatCapacity: scenario.workingFluid.density * cW,
        lubricantHeatCapacity: scenario.lubricant.density * cO,
        lubricantMotion: input.lubricantMotion,
      });
      notes.model('field-cross-section');
      const smoothOverall = Dh / kW / (wallResistance + Dh / (kW * smooth));
      result = {
        thermalSlipLength: thermalSlip,
        thermalSlipLengthClosedForm: closed.thermalSlipLength,
        slipLength: section.slipLength,
        nusselt: section.nusselt,
        nusseltSmooth: smooth,
        heatTransferRatio: section.nusselt === null ? null : section.nusselt / smooth,
        overallConductanceRatio: section.overallNusselt / smoothOverall,
        frictionRatio: 1 / section.flowRateRatio,
        frictionFactorReynolds: section.frictionFactorReynolds,
        method: 'field',
        closedFormError: section.nusselt !== null && closedNusselt !== null ? (closedNusselt - section.nusselt) / section.nusselt : null,
        regime: 'laminar',
        confidence: 'normal',
        groovePecletNumber,
      };
    } else {
      const nusselt = laminarNusselt(config, input.heating, slip, thermalSlip);
      const nusseltSlip = laminarNusselt(config, input.heating, slip, 0);
      const frictionRatio = laminarFrictionRatio(config, slip);
      result = {
        thermalSlipLength: thermalSlip,
        thermalSlipLengthClosedForm: closed.thermalSlipLength,
        slipLength: slip,
        nusselt,
        nusseltSmooth: smooth,
        heatTransferRatio: nusselt === null ? null : nusselt / smooth,
        overallConductanceRatio: overallFrom(nusseltSlip, thermalSlip, smooth),
        frictionRatio,
        frictionFactorReynolds: (config.pipe ? 16 : 24) * frictionRatio, // Fanning f·Re: 16 tube, 24 plates (Shah & London 1978)
        method: useFieldThermalSlip ? 'field-thermal-slip' : 'closed-form',
        closedFormError: null,
        regime: 'laminar',
        confidence: 'normal',
        groovePecletNumber,
      };
      if (input.heating === 'uniform-temperature') notes.model('uniform-temperature-shooting');
      if (input.heating === 'uniform-temperature' && thermalSlip !== 0) {
        notes.assume('Uniform wall temperature with thermal slip: the Robin condition T_f = T_w − b_t ∂T/∂n on the homogenised wall.');
      }
    }
  }
  if (result.nusselt === null) {
    notes.warn(
      'apparent-nusselt-undefined',
      'The lubricant removes more conduction resistance than the fluid-side film adds: the apparent Nu on the reference wall plane is undefined; use overallConductanceRatio.',
      'warning',
    );
  }
  if (!Number.isFinite(result.overallConductanceRatio)) {
    throw new DomainError('thermal slip length makes the total thermal resistance non-positive', { field: 'solid.thermalConductivity' });
  }

  // Interface (slip) velocity u_i = τ_w b/μ_w carries lubricant across the groove width w.
  const slipVelocity = (flow.wallShearStress * result.slipLength) / scenario.workingFluid.viscosity;
  const lubricantDiffusivity = kO / (scenario.lubricant.density * cO);
  result.groovePecletNumber = (slipVelocity * texture.grooveWidth) / lubricantDiffusivity;
  // Where conduction-only homogenisation is not enough (physics.md §7; thresholds common practice, no source).
  const comparableSolid = kS < 10 * Math.max(kW, kO);
  if (result.groovePecletNumber > 1 && comparableSolid) {
    notes.warn(
      'lubricant-advection',
      `Groove Péclet number ${result.groovePecletNumber.toPrecision(3)} > 1 with a solid not much more conductive than the liquids: recirculating lubricant carries heat that the thermal slip length ignores.`,
      'caution',
    );
  }
  const channelScale = config.pipe ? config.hydraulicDiameter : config.ratioLength;
  if (texture.pitch > 0.1 * channelScale) {
    notes.warn('pitch-not-small', `Pitch is ${(texture.pitch / channelScale).toPrecision(2)} of the channel height/diameter: homogenised slip lengths lose accuracy.`, 'caution');
  }

  if (input.sensitivity !== undefined) {
    const points = input.sensitivity.points;
    if (!(Number.isInteger(points) && points >= 2 && points <= 101)) {
      throw new DomainError('sensitivity points must be an integer between 2 and 101', { field: 'sensitivity.points' });
    }
    const low = 0.1 * Math.min(kW, kO, kS);
    const high = 10 * Math.max(kW, kO, kS);
    // Each field point is one conduction-cell solve (~0.1 s); long sweeps fall back to the closed form.
    const sweepField = useFieldThermalSlip && points <= FIELD_SWEEP_LIMIT;
    if (useFieldThermalSlip && !sweepField) {
      notes.warn('sensitivity-closed-form', `More than ${FIELD_SWEEP_LIMIT} sweep points: the sweep uses the closed-form thermal slip.`, 'info');
    }
    const conductivities: number[] = [];
    const ratios: (number | null)[] = [];
    const overall: (number | null)[] = [];
    const baseConfig = turbulent ? null : config;
    for (let p = 0; p < points; p++) {
      const k = low * (high / low) ** (p / (points - 1));
      const bt = sweepField ? fieldThermalSlip(k) : closedForm(k).thermalSlipLength;
      conductivities.push(k);
      if (baseConfig !== null) {
        const smooth = result.nusseltSmooth;
        const nu = laminarNusselt(baseConfig, input.heating, result.slipLength, bt);
        ratios.push(nu === null ? null : nu / smooth);
        const o = overallFrom(laminarNusselt(baseConfig, input.heating, result.slipLength, 0), bt, smooth);
        overall.push(Number.isFinite(o) ? o : null);
      } else {
        try {
          const e = turbulentHeatTransfer({
            reynolds: config.pipe ? (flow.reynoldsNumber as number) : 2 * (flow.reynoldsNumber as number),
            prandtl: (scenario.workingFluid.viscosity * cW) / kW,
            viscousLength: flow.viscousLength,
            thermalSlipLength: bt,
            deltaUPlus: input.slip.deltaUPlus,
            dragReduction: input.slip.dragReduction,
          });
          ratios.push(e.heatTransferRatio);
          overall.push((wallResistance + Dh / (kW * e.nusseltSmooth)) / (wallResistance + Dh / (kW * e.nusselt)));
        } catch {
          ratios.push(null);
          overall.push(null);
        }
      }
    }
    let best = -1;
    for (let p = 0; p < points; p++) {
      const v = overall[p];
      if (v !== null && (best < 0 || v > (overall[best] as number))) best = p;
    }
    if (best < 0) throw new DomainError('no sweep point gives a positive thermal resistance', { field: 'sensitivity.points' });
    result.sensitivity = {
      lubricantConductivity: conductivities,
      heatTransferRatio: ratios,
      overallConductanceRatio: overall,
      bestLubricantConductivity: conductivities[best],
      bestOverallConductanceRatio: overall[best] as number,
      thermalSlipMethod: sweepField ? 'field' : 'closed-form',
    };
    if (best === points - 1) {
      notes.warn('sensitivity-at-range-edge', 'Heat transfer keeps rising with lubricant conductivity across the sweep: the best value is its upper end.', 'info');
    }
    if (!sweepField || !useCrossSection) notes.assume('The sensitivity sweep keeps the velocity slip fixed and varies only the thermal slip.');
  }
  return outcome(result, notes);
}

// ---------------------------------------------------------------------------
// Validation geometry: rectangular ducts on the same field machinery
// ---------------------------------------------------------------------------

export interface RectangularDuctResult {
  /** Fanning f·Re on D_h. */
  frictionFactorReynolds: number;
  /** Nu on D_h, axially uniform flux with peripherally uniform wall temperature (H1). */
  nusseltUniformFlux: number;
  /** Nu on D_h, uniform wall temperature (T), by inverse iteration. */
  nusseltUniformTemperature: number;
  inverseIterations: number;
}

/**
 * Fully developed laminar flow and heat transfer in a rectangular duct of
 * aspect ratio α = short/long side, on the finite-volume field machinery used
 * by {@link solveHeatCrossSection} (so the duct tables of Shah & London [1]
 * validate it) [derived]:
 *  ∇²u = −1 (u = 0 on the walls): f·Re = D_h²/(2ū);
 *  ∇²T = u/ū (T = 0 on the walls): Nu_H1 = (A/Per) D_h/(−T_b);
 *  −∇²φ = λ² (u/ū) φ (φ = 0 on the walls), smallest λ²: Nu_T = λ² D_h²/4
 *  (energy balance h = k λ² A/Per, D_h = 4A/Per).
 * @param aspectRatio α, 0 < α ≤ 1
 * @param cellsAcrossShortSide grid cells across the short side (default 64; long side α⁻¹ times more)
 */
export function rectangularDuctLaminar(aspectRatio: number, cellsAcrossShortSide = 64): RectangularDuctResult {
  if (!(Number.isFinite(aspectRatio) && aspectRatio > 0 && aspectRatio <= 1)) {
    throw new DomainError('aspect ratio must lie in (0, 1]', { field: 'aspectRatio' });
  }
  const ny = Math.max(8, Math.round(cellsAcrossShortSide));
  const nx = Math.max(ny, Math.round(ny / aspectRatio));
  const width = 1;
  const height = aspectRatio;
  const widths = uniformCells(width, nx);
  const heights = uniformCells(height, ny);
  const n = nx * ny;
  const area = width * height;
  const perimeter = 2 * (width + height);
  const Dh = (4 * area) / perimeter;
  const common = {
    widths,
    heights,
    coefficient: new Float64Array(n).fill(1),
    bottom: { kind: 'value', value: 0 } as const,
    top: { kind: 'value', value: 0 } as const,
    sides: 'zero-value' as const,
    tolerance: 1e-12,
    maxIterations: 600,
  };
  const flow = solveCellDiffusion({ ...common, source: new Float64Array(n).fill(-1) });
  requireSolved(flow, 'duct velocity');
  let sum = 0;
  for (let c = 0; c < n; c++) sum += flow.field[c];
  const mean = sum / n;
  const shape = Float64Array.from(flow.field, (u) => u / mean);
  const heat = solveCellDiffusion({ ...common, source: shape });
  requireSolved(heat, 'duct temperature');
  let mixed = 0;
  for (let c = 0; c < n; c++) mixed += shape[c] * heat.field[c];
  const bulk = mixed / n;
  // Inverse iteration on −∇²φ = λ² Û φ: φ ← A⁻¹(Û φ), Rayleigh quotient λ² = (φ_k, Ûφ_k)/(φ_{k+1}, Ûφ_k).
  let phi: Float64Array = Float64Array.from(shape);
  let eigen = 0;
  let previous = Number.POSITIVE_INFINITY;
  let iterations = 0;
  for (; iterations < 200; iterations++) {
    const weighted = Float64Array.from(phi, (v, c) => -shape[c] * v);
    const next = solveCellDiffusion({ ...common, source: weighted, initialGuess: phi });
    requireSolved(next, 'duct eigenfunction');
    let numerator = 0;
    let denominator = 0;
    let norm = 0;
    for (let c = 0; c < n; c++) {
      numerator += phi[c] * shape[c] * phi[c];
      denominator += next.field[c] * shape[c] * phi[c];
      norm = Math.max(norm, Math.abs(next.field[c]));
    }
    eigen = numerator / denominator;
    phi = Float64Array.from(next.field, (v) => v / norm);
    if (Math.abs(eigen - previous) <= 1e-11 * eigen) break;
    previous = eigen;
  }
  if (iterations >= 200) throw new ConvergenceError('duct eigenvalue', iterations, Math.abs(eigen - previous));
  return {
    frictionFactorReynolds: (Dh * Dh) / (2 * mean),
    nusseltUniformFlux: ((area / perimeter) * Dh) / -bulk,
    nusseltUniformTemperature: (eigen * Dh * Dh) / 4,
    inverseIterations: iterations,
  };
}
