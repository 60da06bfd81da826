/**
 * Pieces shared by the two surfactant interface solvers
 * (surfactant-solver.ts: transverse grating; surfactant-groove.ts: long-wave
 * model along finite streamwise grooves): the surface-transport flux, the
 * bulk–interface exchange closure, and the tension variable the solvers
 * iterate on.
 *
 * Tension variable (ours). With the Szyszkowski equation of state
 * σ = σ0 + nRTΓ_m ln(1 − Γ/Γ_m), write s = −ln(1 − Γ/Γ_m) ≥ 0, so
 * σ = σ0 − nRTΓ_m s and the Marangoni stress −dσ/dx = nRTΓ_m ds/dx is linear
 * in s. The solvers use v = s/s_eq with s_eq = ln(1 + K c0) (the equilibrium
 * value, so v = 1 on an undisturbed interface): the momentum balance is then
 * linear in v with the effective Marangoni number Ma·s_eq = Π/(τ_w g), where
 * Π = nRTΓ_m ln(1 + K c0) = σ0 − σ_eq is the equilibrium surface pressure,
 * and every real v maps to an admissible coverage Γ/Γ_m = 1 − e^{−s_eq v} < 1,
 * so no iterate can leave the range of the equation of state.
 *
 * Exchange: Langmuir kinetics J = κ_a c_s(Γ_m − Γ) − κ_d Γ with the sublayer
 * concentration c_s from the bulk-diffusion closure J = D(c0 − c_s)/δ over the
 * Lévêque-type layer δ of Landel et al. (2020, eqs. 3.20–3.22); eliminating
 * c_s gives J = [K c0 (Γ_m − Γ) − Γ]/(1/κ_d + K δ (Γ_m − Γ)/D), and 1/κ_d → 0
 * for diffusion-controlled exchange.
 *
 * Flux: finite volumes with the exponentially fitted (Scharfetter–Gummel /
 * Il'in) flux, exact for constant coefficients and stable at any cell Péclet
 * number (Scharfetter & Gummel 1969, IEEE Trans. Electron Devices 16, 64–77,
 * doi:10.1109/T-ED.1969.16566).
 *
 * References:
 * [1] Landel et al. (2020) J. Fluid Mech. 883, A18, arXiv:1904.01194.
 */
import { LANDEL_FIT } from './scaling.js';
import type { ResolvedSurfactant } from '../../core/surfactant.js';

/** Surfactant, its bulk state and the iteration controls shared by both interface solvers. */
export interface SurfactantSolveConditions {
  surfactant: ResolvedSurfactant;
  /** c0, mol/m³. */
  bulkConcentration: number;
  /** T, K. */
  temperature: number;
  /** Tolerance on the relative residual (residual over the magnitude of each cell's terms), ∞-norm (default 1e-10). */
  tolerance?: number;
  /** Budget of linear solves (Newton iterations plus pseudo time steps), default 400. */
  maxIterations?: number;
}

export interface InterfaceProfile {
  /** Positions along the flow, m (gap from 0 to w, or groove from 0 to L_g). */
  position: number[];
  /** Interface velocity, m/s. */
  velocity: number[];
  /** Clean interface velocity on the same grid, m/s. */
  cleanVelocity: number[];
  /** Γ, mol/m². */
  surfaceExcess: number[];
  /** −dσ/dx, Pa (positive = opposing the flow). */
  marangoniStress: number[];
  /** σ(x) − σ_eq, N/m. */
  tensionChange: number[];
}

/** Exponentially fitted flux weight B(z) = z/(e^z − 1), B(0) = 1. */
export function fittedWeight(z: number): number {
  if (Math.abs(z) < 1e-8) return 1 - z / 2;
  if (z > 700) return 0;
  return z / Math.expm1(z);
}

/** dB/dz of {@link fittedWeight}: B(z)(1/z + 1/(e^{−z} − 1)); series −1/2 + z/6 − z³/180 near 0. */
export function fittedWeightSlope(z: number): number {
  if (Math.abs(z) < 1e-3) return -0.5 + z / 6 - (z * z * z) / 180;
  if (z > 700) return 0;
  return fittedWeight(z) * (1 / z + 1 / Math.expm1(-z));
}

/** Lévêque-type diffusive sublayer on an interface of length g ([1], eqs. 3.20–3.22), m. */
export function diffusiveLayerThickness(length: number, shearRate: number, bulkDiffusivity: number): number {
  return length * LANDEL_FIT.delta0 * Math.pow(1 + (LANDEL_FIT.delta1 * shearRate * length * length) / bulkDiffusivity, -1 / 3);
}

/**
 * Exchange closure and tension variable for one bulk state: k = K c0,
 * Γ_eq/Γ_m = k/(1 + k), s_eq = ln(1 + k), 1/κ_d (s; 0 when diffusion-
 * controlled) and the sublayer resistance K Γ_m δ/D (s).
 */
export interface ExchangeState {
  k: number;
  equilibriumCoverage: number;
  equilibriumTension: number;
  inverseDesorption: number;
  sublayer: number;
}

export function exchangeState(s: ResolvedSurfactant, c0: number, delta: number): ExchangeState {
  const k = s.langmuirConstant * c0;
  return {
    k,
    equilibriumCoverage: k / (1 + k),
    equilibriumTension: Math.log1p(k),
    inverseDesorption: s.desorptionRate !== undefined ? 1 / s.desorptionRate : 0,
    sublayer: (s.langmuirConstant * s.maximumSurfaceExcess * delta) / s.bulkDiffusivity,
  };
}

/** q = Γ/Γ_eq from the tension variable v (module comment). */
export function surfaceExcessRatio(v: number, ex: ExchangeState): number {
  return -Math.expm1(-ex.equilibriumTension * v) / ex.equilibriumCoverage;
}

/** dq/dv. */
export function surfaceExcessRatioSlope(v: number, ex: ExchangeState): number {
  return (ex.equilibriumTension * Math.exp(-ex.equilibriumTension * v)) / ex.equilibriumCoverage;
}

/**
 * Net adsorption per unit Γ_eq in the time unit `timeScale` (s):
 * timeScale·(1 + k)(1 − q)/(1/κ_d + K Γ_m δ (1 − Γ/Γ_m)/D), and its derivative in q.
 */
export function exchangeRate(q: number, ex: ExchangeState, timeScale: number): { rate: number; slope: number } {
  const den = ex.inverseDesorption + ex.sublayer * (1 - ex.equilibriumCoverage * q);
  const rate = (timeScale * (1 + ex.k) * (1 - q)) / den;
  const slope = (timeScale * (1 + ex.k) * -(ex.inverseDesorption + ex.sublayer * (1 - ex.equilibriumCoverage))) / (den * den);
  return { rate, slope };
}

/**
 * Fitted flux through a face between cells a and b at distance d with face
 * velocity U: F = (ε/d)[B(−z) q_a − B(z) q_b], z = U d/ε; and its
 * derivatives in q_a, q_b and U.
 */
export function fittedFlux(qa: number, qb: number, velocity: number, spacing: number, diffusivity: number): { flux: number; dqa: number; dqb: number; dU: number; magnitude: number } {
  const z = (velocity * spacing) / diffusivity;
  const bm = fittedWeight(-z);
  const bp = fittedWeight(z);
  const g = diffusivity / spacing;
  return {
    flux: g * (bm * qa - bp * qb),
    dqa: g * bm,
    dqb: -g * bp,
    dU: -fittedWeightSlope(-z) * qa - fittedWeightSlope(z) * qb,
    magnitude: g * (Math.abs(bm * qa) + Math.abs(bp * qb)),
  };
}

/** Cells of a surface-transport discretisation (positions and lengths in the solver's length unit). */
export interface TransportCells {
  /** Cell lengths. */
  volume: Float64Array;
  /** Distance between the centres of cells a and a+1. */
  spacing(a: number): number;
  /** Interface velocity at the face between cells a and a+1, for the tension variable v. */
  faceVelocity(v: Float64Array, a: number): number;
  /** Surface diffusivity in the solver's units. */
  diffusivity: number;
  exchange: ExchangeState;
  /** Time unit of the exchange rate, s. */
  timeScale: number;
}

/**
 * The parts of the steady transport problem in v that both interface solvers share: cell balances
 * R_i = F_{i+½} − F_{i−½} − V_i J(q_i) with zero flux through the ends, their magnitudes (the scale of
 * the relative residual), the pseudo-time accumulation d(V_i q_i)/dv_i, the projection, and the Jacobian
 * at fixed face velocities (`localJacobian` adds its entries through `add` and returns ∂F_a/∂U_a per face,
 * for the solver to chain with its own ∂U/∂v).
 */
export function transportProblem(c: TransportCells) {
  const { volume, exchange: ex, timeScale, diffusivity } = c;
  const n = volume.length;
  const faces = (v: Float64Array) => {
    const q = new Float64Array(n);
    for (let i = 0; i < n; i++) q[i] = surfaceExcessRatio(v[i], ex);
    const f = [];
    for (let a = 0; a < n - 1; a++) f.push(fittedFlux(q[a], q[a + 1], c.faceVelocity(v, a), c.spacing(a), diffusivity));
    return { q, f };
  };
  const balances = (v: Float64Array, out: Float64Array, magnitude: boolean): void => {
    const { q, f } = faces(v);
    let top = 0;
    for (let i = 0; i < n; i++) {
      const exchange = volume[i] * exchangeRate(q[i], ex, timeScale).rate;
      if (magnitude) {
        out[i] = (i < n - 1 ? f[i].magnitude : 0) + (i > 0 ? f[i - 1].magnitude : 0) + Math.abs(exchange);
        top = Math.max(top, out[i]);
      } else {
        out[i] = (i < n - 1 ? f[i].flux : 0) - (i > 0 ? f[i - 1].flux : 0) - exchange;
      }
    }
    if (magnitude) for (let i = 0; i < n; i++) out[i] = Math.max(out[i], 1e-14 * top, 1e-300);
  };
  return {
    size: n,
    residual(v: Float64Array, out: Float64Array): void {
      balances(v, out, false);
    },
    rowScale(v: Float64Array, out: Float64Array): void {
      balances(v, out, true);
    },
    accumulationDerivative(v: Float64Array, out: Float64Array): void {
      for (let i = 0; i < n; i++) out[i] = volume[i] * surfaceExcessRatioSlope(v[i], ex);
    },
    project: keepSurfaceExcessPositive,
    localJacobian(v: Float64Array, shift: Float64Array | null, add: (row: number, column: number, value: number) => void): Float64Array {
      const { q, f } = faces(v);
      for (let i = 0; i < n; i++) add(i, i, -volume[i] * exchangeRate(q[i], ex, timeScale).slope * surfaceExcessRatioSlope(v[i], ex) + (shift ? shift[i] : 0));
      const dU = new Float64Array(Math.max(0, n - 1));
      for (let a = 0; a < n - 1; a++) {
        const dqa = f[a].dqa * surfaceExcessRatioSlope(v[a], ex);
        const dqb = f[a].dqb * surfaceExcessRatioSlope(v[a + 1], ex);
        // F_a enters row a with +1 and row a+1 with −1.
        add(a, a, dqa);
        add(a, a + 1, dqb);
        add(a + 1, a, -dqa);
        add(a + 1, a + 1, -dqb);
        dU[a] = f[a].dU;
      }
      return dU;
    },
  };
}

/**
 * Projection of a trial iterate that keeps every Γ ≥ 0 (v ≥ 0): no unknown
 * may fall below a tenth of its current value in one step (component-wise, so
 * one cell heading for a negative surface excess does not stall the others).
 */
export function keepSurfaceExcessPositive(v: Float64Array, trial: Float64Array): boolean {
  let changed = false;
  for (let i = 0; i < v.length; i++) {
    if (v[i] > 0 && trial[i] < 0.1 * v[i]) {
      trial[i] = 0.1 * v[i];
      changed = true;
    }
  }
  return changed;
}
