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
 */
import { ConvergenceError, DomainError, KARMAN_CONSTANT, Notes, outcome, type Outcome, type Reference } from './common.js';
import type { Scenario } from './scenario.js';
import { grooveLidVelocityMean } from './groove-duct.js';
import { integrateRungeKutta4 } from '../numerics/ode.js';
import { brent } from '../numerics/roots.js';
import { sumSeries } from '../numerics/series.js';

export const HEAT_REFERENCES = {
  shahLondon1978: {
    key: 'shahLondon1978',
    citation:
      'Shah, R. K. & London, A. L. 1978 Laminar Flow Forced Convection in Ducts. Advances in Heat Transfer, Supplement 1. Academic Press, New York.',
    doi: '10.1016/C2013-0-06152-X',
  },
  philip1972: {
    key: 'philip1972',
    citation: 'Philip, J. R. 1972 Flows satisfying mixed no-slip and no-shear conditions. Z. angew. Math. Phys. 23, 353–372.',
    doi: '10.1007/BF01595477',
  },
  belyaevVinogradova2010: {
    key: 'belyaevVinogradova2010',
    citation:
      'Belyaev, A. V. & Vinogradova, O. I. 2010 Effective slip in pressure-driven flow past super-hydrophobic stripes. J. Fluid Mech. 652, 489–499.',
    doi: '10.1017/S002211201000100X',
  },
  mikic1974: {
    key: 'mikic1974',
    citation: 'Mikić, B. B. 1974 Thermal contact conductance; theoretical considerations. Int. J. Heat Mass Transfer 17, 205–214 (from memory).',
  },
  gnielinski1976: {
    key: 'gnielinski1976',
    citation: 'Gnielinski, V. 1976 New equations for heat and mass transfer in turbulent pipe and channel flow. Int. Chem. Eng. 16(2), 359–368.',
  },
  petukhov1970: {
    key: 'petukhov1970',
    citation:
      'Petukhov, B. S. 1970 Heat transfer and friction in turbulent pipe flow with variable physical properties. Advances in Heat Transfer 6, 503–564.',
  },
  dittusBoelter1930: {
    key: 'dittusBoelter1930',
    citation:
      'Dittus, F. W. & Boelter, L. M. K. 1930 Heat transfer in automobile radiators of the tubular type. Univ. Calif. Publ. Eng. 2, 443–461; reprinted Int. Commun. Heat Mass Transfer 12 (1985) 3–22.',
    doi: '10.1016/0735-1933(85)90003-X',
  },
  kader1981: {
    key: 'kader1981',
    citation: 'Kader, B. A. 1981 Temperature and concentration profiles in fully turbulent boundary layers. Int. J. Heat Mass Transfer 24(9), 1541–1544.',
    doi: '10.1016/0017-9310(81)90220-9',
  },
  patankar1980: {
    key: 'patankar1980',
    citation: 'Patankar, S. V. 1980 Numerical Heat Transfer and Fluid Flow. Hemisphere, Washington, ch. 4.',
  },
} satisfies Record<string, Reference>;

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
 * ./groove-duct.ts with k_o in place of μ and T in place of u, so the mean lid
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
  model: 'isothermal-ridges-striped' | 'parallel-columns' | 'identical-materials';
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
 * (lubricant the better conductor, ridges the bottleneck) the grooves act as
 * parallel columns: b_t = φ b_s [derived, area-weighted parallel resistances].
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
  return { thermalSlipLength: phi * excess, grooveExcessResistance: excess, model: 'parallel-columns', estimate: true };
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
