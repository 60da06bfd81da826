/**
 * Wall shear stress, friction velocity and viscous length imposed by a flow
 * on a smooth, no-slip wall: plane channel, circular pipe, flat plate, or a
 * wall shear stress given directly. All inputs and outputs SI.
 */
import { DomainError } from '../../core/errors.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import { REFERENCES } from '../../core/references.js';
import type { FlowKind, FlowRegime, FlowState, Texture } from '../scenario.js';
import { safeNewton } from '../../numerics/roots.js';

/** Laminar limit of plane-channel flow on the full-height bulk Reynolds number (common practice, no source). */
export const CHANNEL_LAMINAR_LIMIT = 2000;
/** Above this the channel flow is taken as fully turbulent (common practice, no source). */
export const CHANNEL_TURBULENT_LIMIT = 4000;
/** Laminar limit of pipe flow (common practice, no source). */
export const PIPE_LAMINAR_LIMIT = 2300;
export const PIPE_TURBULENT_LIMIT = 4000;
/** Critical Reynolds number of flat-plate transition, Re_x (Schlichting & Gersten 2017, ch. 1). */
export const PLATE_TRANSITION_REYNOLDS = 5e5;

/**
 * Laminar plane Poiseuille flow between plates a full height H apart:
 * τ_w = 6 μ U / H, so the Fanning coefficient is C_f = 12 / Re_m with Re_m = U H / ν
 * (exact solution; White 2006 §3-3).
 */
export function laminarChannelSkinFriction(bulkReynolds: number): number {
  return 12 / bulkReynolds;
}

/**
 * Dean's (1978) correlation for turbulent plane-channel flow,
 * C_f = 0.073 Re_m^(−1/4), with Re_m = U H/ν on the full height and C_f = τ_w/(½ρU²).
 * Fitted to data for about 6×10³ < Re_m < 6×10⁵ (range from memory: the abstract read, J. Fluids Eng.
 * 100(2), 215–223, gives the correlation but not the range; searched the ASME page, code bibliographies and
 * public solver reports quoting "Dean (1978)", none of which states the range).
 * Example: Re_m = 10⁴ → C_f = 0.00730.
 */
export function deanSkinFriction(bulkReynolds: number): number {
  return 0.073 * bulkReynolds ** -0.25;
}

/**
 * Haaland's (1983) explicit approximation to the Colebrook equation,
 * 1/√f = −1.8 log₁₀[(ε/D / 3.7)^1.11 + 6.9/Re]; Darcy friction factor, within
 * about ±1.5 % of Colebrook for 4×10³ ≤ Re ≤ 10⁸ (Haaland 1983).
 */
export function haalandFrictionFactor(reynolds: number, relativeRoughness: number): number {
  const x = -1.8 * Math.log10((relativeRoughness / 3.7) ** 1.11 + 6.9 / reynolds);
  return 1 / (x * x);
}

/**
 * Colebrook (1939) equation for the Darcy friction factor f of turbulent pipe
 * flow, 1/√f = −2 log₁₀(ε/(3.7 D) + 2.51/(Re √f)), solved to machine precision
 * by safeguarded Newton iteration in x = 1/√f starting from Haaland (1983).
 * Valid for turbulent flow, Re ≳ 4000, 0 ≤ ε/D ≲ 0.05.
 * Example: Re = 10⁵, ε/D = 10⁻³ → f = 0.02218.
 */
export function colebrookFrictionFactor(reynolds: number, relativeRoughness: number): { frictionFactor: number; iterations: number } {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / reynolds;
  const g = (x: number) => {
    const arg = a + b * x;
    return { value: x + 2 * Math.log10(arg), derivative: 1 + (2 * b) / (arg * Math.LN10) };
  };
  const x0 = 1 / Math.sqrt(haalandFrictionFactor(reynolds, relativeRoughness));
  // g is increasing in x; g(0.1) < 0 and g(100) > 0 for every Re > 10 and ε/D < 1.
  const r = safeNewton(g, 0.1, 100, x0);
  return { frictionFactor: 1 / (r.root * r.root), iterations: r.iterations };
}

/** Laminar Blasius boundary layer, local c_f = 0.664 Re_x^(−1/2) (Blasius 1908; Schlichting & Gersten 2017 eq. 6.59). */
export function blasiusSkinFriction(reynoldsX: number): number {
  return 0.664 / Math.sqrt(reynoldsX);
}

/**
 * Turbulent flat plate, local skin friction: the one-seventh power law
 * c_f = 0.0592 Re_x^(−1/5) for 5×10⁵ < Re_x < 10⁷, and Schlichting's
 * c_f = (2 log₁₀ Re_x − 0.65)^(−2.3) beyond 10⁷ (Schlichting & Gersten 2017, ch. 18; White 2006 eq. 6-70).
 */
export function turbulentPlateSkinFriction(reynoldsX: number): { value: number; correlation: 'power-law' | 'schlichting' } {
  if (reynoldsX <= 1e7) return { value: 0.0592 * reynoldsX ** -0.2, correlation: 'power-law' };
  const l = 2 * Math.log10(reynoldsX) - 0.65;
  return { value: l ** -2.3, correlation: 'schlichting' };
}

export type FlowSpec =
  | { kind: 'channel'; height: number; bulkVelocity: number; texturedWalls?: 1 | 2 }
  | { kind: 'pipe'; diameter: number; bulkVelocity: number; roughness?: number }
  | { kind: 'plate'; freeStreamVelocity: number; distance: number }
  | { kind: 'wall-shear'; wallShearStress: number; regime?: FlowRegime };

export interface FlowFluid {
  density: number;
  viscosity: number;
}

export interface FlowResult extends FlowState {
  /** Texture dimensions in viscous lengths ℓ_ν, when a texture was given. */
  wallUnits?: { grooveWidthPlus: number; pitchPlus: number; grooveDepthPlus: number };
}

/**
 * Wall conditions of a flow over a smooth wall.
 *
 * @param fluid working fluid: density ρ (kg/m³), dynamic viscosity μ (Pa·s)
 * @param spec the flow: channel (full height H, bulk velocity U), pipe (diameter D,
 *   bulk velocity U, absolute roughness ε), flat plate (free-stream velocity, distance x
 *   from the leading edge) or a given wall shear stress τ_w (Pa)
 * @param texture optional groove texture, to express its sizes in viscous lengths
 * @returns τ_w (Pa), u_τ = √(τ_w/ρ) (m/s), ℓ_ν = ν/u_τ (m), Reynolds numbers,
 *   Fanning skin-friction coefficient and regime, with warnings outside each
 *   correlation's range.
 */
export function evaluateFlow(fluid: FlowFluid, spec: FlowSpec, texture?: Texture): Outcome<FlowResult> {
  const notes = new Notes();
  const { density, viscosity } = fluid;
  const nu = viscosity / density;
  let state: FlowState;
  switch (spec.kind) {
    case 'channel': {
      const re = (spec.bulkVelocity * spec.height) / nu;
      let cf: number;
      let regime: FlowRegime;
      if (re < CHANNEL_LAMINAR_LIMIT) {
        regime = 'laminar';
        cf = laminarChannelSkinFriction(re);
        notes.model('flow.channel-laminar').cite(REFERENCES.white2006);
        notes.assume('Fully developed laminar plane Poiseuille flow between smooth plates.');
      } else {
        regime = re < CHANNEL_TURBULENT_LIMIT ? 'transitional' : 'turbulent';
        cf = deanSkinFriction(re);
        notes.model('flow.channel-turbulent-dean').cite(REFERENCES.dean1978);
        notes.assume('Fully developed turbulent plane-channel flow over smooth walls (Dean 1978 correlation).');
        if (regime === 'transitional') {
          notes.warn(
            'transitional-flow',
            `Bulk Reynolds number ${fmt(re)} lies between ${CHANNEL_LAMINAR_LIMIT} and ${CHANNEL_TURBULENT_LIMIT}: the flow may be laminar, intermittent or turbulent; the turbulent correlation is reported.`,
          );
        } else if (re > 6e5) {
          notes.warn('correlation-extrapolated', `Bulk Reynolds number ${fmt(re)} is above the range Dean (1978) fitted (about 6×10⁵).`, 'caution');
        }
      }
      const tau = 0.5 * density * spec.bulkVelocity ** 2 * cf;
      const ut = Math.sqrt(tau / density);
      state = {
        kind: 'channel',
        wallShearStress: tau,
        frictionVelocity: ut,
        viscousLength: nu / ut,
        bulkVelocity: spec.bulkVelocity,
        reynoldsNumber: re,
        frictionReynoldsNumber: (ut * spec.height) / 2 / nu,
        skinFrictionCoefficient: cf,
        regime,
        height: spec.height,
        texturedWalls: spec.texturedWalls ?? 2,
      };
      break;
    }
    case 'pipe': {
      const re = (spec.bulkVelocity * spec.diameter) / nu;
      const roughness = spec.roughness ?? 0;
      const relRough = roughness / spec.diameter;
      // Roughness elements as tall as the radius would close the pipe (and Colebrook has no root for ε/D ≳ 3.7).
      if (!(relRough < 0.5)) {
        throw new DomainError(`pipe roughness ${fmt(roughness)} m is not smaller than the pipe radius ${fmt(spec.diameter / 2)} m`, { field: 'flow.roughness' });
      }
      let fD: number;
      let regime: FlowRegime;
      if (re < PIPE_LAMINAR_LIMIT) {
        regime = 'laminar';
        fD = 64 / re;
        notes.model('flow.pipe-laminar').cite(REFERENCES.white2006);
        notes.assume('Fully developed laminar Hagen–Poiseuille flow.');
      } else {
        regime = re < PIPE_TURBULENT_LIMIT ? 'transitional' : 'turbulent';
        fD = colebrookFrictionFactor(re, relRough).frictionFactor;
        notes.model('flow.pipe-turbulent-colebrook').cite(REFERENCES.colebrook1939, REFERENCES.haaland1983);
        notes.assume('Fully developed turbulent pipe flow; Colebrook equation solved to machine precision.');
        if (regime === 'transitional') {
          notes.warn(
            'transitional-flow',
            `Reynolds number ${fmt(re)} lies between ${PIPE_LAMINAR_LIMIT} and ${PIPE_TURBULENT_LIMIT}: the flow may be laminar or turbulent; the Colebrook value is reported.`,
          );
        }
        if (relRough > 0.05) {
          notes.warn('correlation-extrapolated', `Relative roughness ${fmt(relRough)} is beyond the Moody chart (0.05).`, 'caution');
        }
      }
      const tau = (fD * density * spec.bulkVelocity ** 2) / 8;
      const ut = Math.sqrt(tau / density);
      state = {
        kind: 'pipe',
        wallShearStress: tau,
        frictionVelocity: ut,
        viscousLength: nu / ut,
        bulkVelocity: spec.bulkVelocity,
        reynoldsNumber: re,
        frictionReynoldsNumber: (ut * spec.diameter) / 2 / nu,
        skinFrictionCoefficient: fD / 4,
        regime,
        diameter: spec.diameter,
      };
      break;
    }
    case 'plate': {
      const re = (spec.freeStreamVelocity * spec.distance) / nu;
      let cf: number;
      let regime: FlowRegime;
      if (re < PLATE_TRANSITION_REYNOLDS) {
        regime = 'laminar';
        cf = blasiusSkinFriction(re);
        notes.model('flow.plate-laminar-blasius').cite(REFERENCES.blasius1908, REFERENCES.schlichting2017);
        notes.assume('Zero-pressure-gradient laminar boundary layer (Blasius); local skin friction at the given distance.');
        if (re < 1e3) {
          notes.warn('boundary-layer-thick', `Re_x = ${fmt(re)} is low: the boundary-layer approximation loses accuracy near the leading edge.`, 'caution');
        }
      } else {
        regime = 'turbulent';
        const t = turbulentPlateSkinFriction(re);
        cf = t.value;
        notes.model(t.correlation === 'power-law' ? 'flow.plate-turbulent-power-law' : 'flow.plate-turbulent-schlichting').cite(REFERENCES.schlichting2017);
        notes.assume('Turbulent boundary layer from the leading edge (no laminar run accounted for); local skin friction.');
        if (re < 1e6) {
          notes.warn('transition-region', `Re_x = ${fmt(re)} is near the critical value ${fmt(PLATE_TRANSITION_REYNOLDS)}: the boundary layer may still be transitional.`, 'caution');
        }
      }
      const tau = 0.5 * density * spec.freeStreamVelocity ** 2 * cf;
      const ut = Math.sqrt(tau / density);
      state = {
        kind: 'plate',
        wallShearStress: tau,
        frictionVelocity: ut,
        viscousLength: nu / ut,
        bulkVelocity: spec.freeStreamVelocity,
        reynoldsNumber: re,
        skinFrictionCoefficient: cf,
        regime,
        distance: spec.distance,
      };
      break;
    }
    case 'wall-shear': {
      const ut = Math.sqrt(spec.wallShearStress / density);
      const regime = spec.regime ?? 'turbulent';
      if (spec.regime === undefined) notes.assume('Wall shear stress given directly; the flow is taken as turbulent for the drag models.');
      notes.model('flow.wall-shear-given');
      state = {
        kind: 'wall-shear',
        wallShearStress: spec.wallShearStress,
        frictionVelocity: ut,
        viscousLength: nu / ut,
        regime,
      };
      break;
    }
  }
  const result: FlowResult = { ...state };
  if (texture) {
    result.wallUnits = {
      grooveWidthPlus: texture.grooveWidth / state.viscousLength,
      pitchPlus: texture.pitch / state.viscousLength,
      grooveDepthPlus: texture.grooveDepth / state.viscousLength,
    };
  }
  return outcome(result, notes);
}

export const FLOW_KINDS: readonly FlowKind[] = ['channel', 'pipe', 'plate', 'wall-shear'];

function fmt(x: number): string {
  return Number(x.toPrecision(4)).toString();
}
