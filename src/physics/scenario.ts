/**
 * The design every endpoint is asked about, in SI units after unit parsing
 * and catalogue look-up. Physics modules take these resolved shapes; the API
 * layer builds them from requests.
 */
import type { FluidState } from '../core/fluid.js';

/** Streamwise-groove texture. Lengths in metres, angle in degrees. */
export interface Texture {
  /** Groove width w, m. */
  grooveWidth: number;
  /** Texture period P (groove + ridge), m. */
  pitch: number;
  /** Groove depth d, m. */
  grooveDepth: number;
  /** Angle between the mean flow and the grooves, degrees (0 = flow along the grooves). */
  flowAngle: number;
}

export type FlowKind = 'channel' | 'pipe' | 'plate' | 'wall-shear';
export type FlowRegime = 'laminar' | 'transitional' | 'turbulent';

/** Flow conditions at the wall, from {@link import('./flow/flow.js').evaluateFlow}. */
export interface FlowState {
  kind: FlowKind;
  /** τ_w, Pa, on a smooth no-slip wall. */
  wallShearStress: number;
  /** u_τ = √(τ_w/ρ), m/s. */
  frictionVelocity: number;
  /** ℓ_ν = ν/u_τ, m. */
  viscousLength: number;
  /** Bulk (channel, pipe) or free-stream (plate) velocity, m/s; absent for `wall-shear`. */
  bulkVelocity?: number;
  /** Reynolds number on the flow's own length (channel full height, pipe diameter, plate distance). */
  reynoldsNumber?: number;
  /** Re_τ = u_τ·(H/2 or D/2)/ν where defined. */
  frictionReynoldsNumber?: number;
  /** Fanning skin-friction coefficient τ_w/(½ρU²). */
  skinFrictionCoefficient?: number;
  regime: FlowRegime;
  /** Channel full height or pipe diameter, m. */
  height?: number;
  diameter?: number;
  /** Plate: distance from the leading edge, m. */
  distance?: number;
  /** Channel: how many walls carry the texture (1 or 2). */
  texturedWalls?: 1 | 2;
}

/** A resolved design: texture, the two liquids and the flow over it. */
export interface Scenario {
  texture: Texture;
  lubricant: FluidState;
  workingFluid: FluidState;
  flow: FlowState;
  /** Lubricant–working-fluid interfacial tension, N/m, when known. */
  interfacialTension?: number;
}
