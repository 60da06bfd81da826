/**
 * Drag change produced by an effective wall slip length: exact laminar results
 * at fixed flow rate, and the turbulent virtual-origin model at fixed bulk
 * Reynolds number; {@link dragChange} picks the one that fits a flow. Drag reduction DR is a fraction, positive = less drag:
 * DR = 1 − τ_slip/τ_smooth (equivalently 1 − Δp_slip/Δp_smooth at the same
 * flow rate). Lengths in m.
 */
import { brent } from '../../numerics/roots.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { KARMAN_CONSTANT } from '../../core/constants.js';
import type { Notes } from '../../core/notes.js';
import { REFERENCES } from '../../core/references.js';
import type { Scenario } from '../scenario.js';

function requireNonNegative(value: number, field: string): void {
  if (!(Number.isFinite(value) && value >= 0)) throw new DomainError(`${field} must be a non-negative finite length`, { field });
}
function requirePositive(value: number, field: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new DomainError(`${field} must be a positive finite length`, { field });
}

/**
 * Laminar plane channel of height H, both walls with slip length b, fixed flow
 * rate [derived; Lauga & Stone 2003 for the slip-flow profile]. With half-height
 * h = H/2 and G = −dp/dx: u = (G/2μ)(h² − y²) + bGh/μ, so the flux per unit width is
 * Q = (G/μ)(2h³/3 + 2bh²) = Q₀(1 + 3b/h). At equal Q the pressure gradient (and the
 * wall shear, τ = Gh) falls by the factor 1/(1 + 6b/H):
 *   DR = 6b/(H + 6b).
 * Example: H = 100 µm, b = 10 µm → 0.375.
 * @param channelHeight H, m (> 0)
 * @param slipLength b, m (≥ 0)
 * @returns DR, fraction in [0, 1).
 */
export function laminarChannelDragReductionBothWalls(channelHeight: number, slipLength: number): number {
  requirePositive(channelHeight, 'flow.height');
  requireNonNegative(slipLength, 'slipLength');
  return (6 * slipLength) / (channelHeight + 6 * slipLength);
}

/**
 * Laminar plane channel of height H, one wall with slip length b and the other
 * no-slip, fixed flow rate [derived]. u = (G/2μ)(−y² + a y + a b), y from the
 * slipping wall, with u(H) = 0 giving a = H²/(H + b); then Q/Q₀ = (H + 4b)/(H + b),
 * so at equal Q the pressure drop falls by (H + b)/(H + 4b):
 *   DR = 3b/(H + 4b)   (the change of the channel's pressure drop, i.e. of the
 *   mean of the two walls' shear).
 * @param channelHeight H, m (> 0)
 * @param slipLength b, m (≥ 0)
 */
export function laminarChannelDragReductionOneWall(channelHeight: number, slipLength: number): number {
  requirePositive(channelHeight, 'flow.height');
  requireNonNegative(slipLength, 'slipLength');
  return (3 * slipLength) / (channelHeight + 4 * slipLength);
}

/**
 * Laminar pipe of radius R with wall slip length b [Lauga & Stone 2003, derived]:
 * u = (G/4μ)(R² − r²) + bGR/(2μ) gives Q/Q₀ = 1 + 4b/R at fixed pressure drop,
 * hence at fixed flow rate
 *   DR = 4b/(R + 4b).
 * @param pipeRadius R, m (> 0)
 * @param slipLength b, m (≥ 0)
 */
export function laminarPipeDragReduction(pipeRadius: number, slipLength: number): number {
  requirePositive(pipeRadius, 'flow.diameter');
  requireNonNegative(slipLength, 'slipLength');
  return (4 * slipLength) / (pipeRadius + 4 * slipLength);
}

/** Flow-rate gain of a laminar pipe at fixed pressure drop, Q/Q₀ = 1 + 4b/R (Lauga & Stone 2003). */
export function laminarPipeFlowRateRatio(pipeRadius: number, slipLength: number): number {
  requirePositive(pipeRadius, 'flow.diameter');
  requireNonNegative(slipLength, 'slipLength');
  return 1 + (4 * slipLength) / pipeRadius;
}

/**
 * Shift of the logarithmic velocity profile by streamwise and spanwise slip,
 * in wall units (virtual-origin model; Fukagata, Kasagi & Koumoutsakos 2006 [1]
 * for the streamwise part, Ibrahim et al. 2021 [2] for the saturating spanwise
 * penalty):
 *   ΔU⁺ = ℓ_x⁺ − ℓ_z⁺/(1 + ℓ_z⁺/4).
 * The streamwise slip moves the mean profile up by ℓ_x⁺; spanwise slip lets the
 * quasi-streamwise vortices approach the wall, displacing the turbulence origin
 * by ℓ_z⁺ for small ℓ_z⁺ and by at most about 4 wall units (the form of the
 * saturation and its constant 4 are from memory: not in the abstracts of [1] and [2] read on the publisher
 * pages; the full text of [2] and later papers quoting the form — Fairhall et al. 2019, Tomlinson et al. 2023,
 * Xie, Fairhall & García-Mayoral 2024, whose openings were read — were searched for by the formula without result).
 * @param streamwiseSlipPlus ℓ_x⁺ = b_x u_τ/ν, ≥ 0
 * @param spanwiseSlipPlus ℓ_z⁺ = b_z u_τ/ν, ≥ 0
 * @returns ΔU⁺, dimensionless (positive = drag reduction).
 * Validity: ℓ⁺ ≲ 5, texture period P⁺ ≲ 20–25 (smooth-wall-like regime [2]).
 */
export function virtualOriginShift(streamwiseSlipPlus: number, spanwiseSlipPlus: number): number {
  requireNonNegative(streamwiseSlipPlus, 'slipLengthLongitudinalPlus');
  requireNonNegative(spanwiseSlipPlus, 'slipLengthTransversePlus');
  return streamwiseSlipPlus - spanwiseSlipPlus / (1 + spanwiseSlipPlus / 4);
}

/**
 * Left-hand side of the fixed-bulk-Reynolds-number relation between a log-law
 * shift and the drag reduction [derived]. With U_b⁺ = U_b/u_τ = √(2/C_f) and the
 * integrated log law U_b⁺ = (1/κ) ln Re_τ + B′ + ΔU⁺, comparing the slipping and the
 * smooth wall at the same U_b and ν (u_τ = u_τ0 √(1 − DR), Re_τ = Re_τ0 √(1 − DR)):
 *   ΔU⁺ = √(2/C_f0) [(1 − DR)^(−1/2) − 1] − ln(1 − DR)/(2κ),  κ = 0.41.
 * Monotone increasing in DR on (−∞, 1), so each ΔU⁺ has one DR.
 */
export function logLawShiftForDragReduction(dragReduction: number, smoothSkinFriction: number): number {
  const remaining = 1 - dragReduction;
  return Math.sqrt(2 / smoothSkinFriction) * (1 / Math.sqrt(remaining) - 1) - Math.log(remaining) / (2 * KARMAN_CONSTANT);
}

/**
 * Root of a residual that is negative far into drag increase (DR → −∞) and
 * positive as DR → 1 (the log-law side grows without bound there). The lower end
 * is pushed out by doubling 1 − DR until the sign changes.
 */
function solveDragReduction(residual: (dr: number) => number, field: string): { dragReduction: number; iterations: number } {
  const upper = 1 - 1e-12;
  let lower = 0;
  let expansions = 0;
  while (!(residual(lower) < 0) && expansions < 60) {
    lower = 1 - 2 * (1 - lower);
    expansions++;
  }
  if (!(residual(lower) < 0 && residual(upper) > 0)) {
    throw new ConvergenceError('no bracket for the drag reduction', expansions, Math.abs(residual(lower)), field);
  }
  const root = brent(residual, lower, upper, { xTolerance: 1e-14, maxIterations: 200 });
  if (!root.converged || !Number.isFinite(root.root)) {
    throw new ConvergenceError('drag reduction from the log-law shift did not converge', root.iterations, root.residual, field);
  }
  return { dragReduction: root.root, iterations: root.iterations + expansions };
}

/**
 * Drag reduction at fixed bulk Reynolds number for a given log-law shift ΔU⁺,
 * solving {@link logLawShiftForDragReduction} for DR with Brent's method.
 * @param deltaUPlus ΔU⁺ in the wall units of the slipping wall
 * @param smoothSkinFriction C_f0, Fanning, of the smooth wall at the same bulk Reynolds number (> 0)
 * @returns DR (fraction; negative = drag increase) and the iteration count.
 * Example: Re_m = 1e4 channel (Dean: C_f0 = 0.073 Re_m^−¼ = 0.0073), ΔU⁺ = 2 → DR ≈ 0.18.
 */
export function dragReductionFromLogLawShift(
  deltaUPlus: number,
  smoothSkinFriction: number,
): { dragReduction: number; iterations: number } {
  if (!Number.isFinite(deltaUPlus)) throw new DomainError('ΔU⁺ must be finite', { field: 'deltaUPlus' });
  if (!(Number.isFinite(smoothSkinFriction) && smoothSkinFriction > 0)) {
    throw new DomainError('skin-friction coefficient must be positive', { field: 'flow.skinFrictionCoefficient' });
  }
  if (deltaUPlus === 0) return { dragReduction: 0, iterations: 0 };
  return solveDragReduction((dr) => logLawShiftForDragReduction(dr, smoothSkinFriction) - deltaUPlus, 'deltaUPlus');
}

export interface TurbulentDragChange {
  /** ΔU⁺ in the reduced (slipping-wall) wall units. */
  deltaUPlus: number;
  /** DR = 1 − τ_w/τ_w0 at fixed bulk Reynolds number (positive = less drag). */
  dragReduction: number;
  /** u_τ = u_τ0 √(1 − DR), m/s. */
  frictionVelocityReduced: number;
  /** Slip lengths in the reduced wall units, ℓ⁺ = b u_τ/ν. */
  slipLengthLongitudinalPlus: number;
  slipLengthTransversePlus: number;
  iterations: number;
}

/**
 * Turbulent drag change of a wall with physical slip lengths b_x (streamwise)
 * and b_z (spanwise) at fixed bulk Reynolds number. The slip lengths in wall units
 * depend on the reduced friction velocity, ℓ⁺ = b u_τ0 √(1 − DR)/ν, so the fixed
 * point ΔU⁺(ℓ⁺(DR)) = F(DR) (F from {@link logLawShiftForDragReduction}) is solved
 * as one scalar equation in DR with Brent's method.
 * @param streamwiseSlipLength b_x, m (≥ 0)
 * @param spanwiseSlipLength b_z, m (≥ 0)
 * @param smoothFrictionVelocity u_τ0, m/s (> 0)
 * @param kinematicViscosity ν, m²/s (> 0)
 * @param smoothSkinFriction C_f0 (> 0)
 */
export function turbulentDragChange(
  streamwiseSlipLength: number,
  spanwiseSlipLength: number,
  smoothFrictionVelocity: number,
  kinematicViscosity: number,
  smoothSkinFriction: number,
): TurbulentDragChange {
  requireNonNegative(streamwiseSlipLength, 'slipLengthLongitudinal');
  requireNonNegative(spanwiseSlipLength, 'slipLengthTransverse');
  requirePositive(smoothFrictionVelocity, 'flow.frictionVelocity');
  requirePositive(kinematicViscosity, 'workingFluid.viscosity');
  if (!(Number.isFinite(smoothSkinFriction) && smoothSkinFriction > 0)) {
    throw new DomainError('skin-friction coefficient must be positive', { field: 'flow.skinFrictionCoefficient' });
  }
  const plus = (b: number, dr: number) => (b * smoothFrictionVelocity * Math.sqrt(1 - dr)) / kinematicViscosity;
  const residual = (dr: number) =>
    logLawShiftForDragReduction(dr, smoothSkinFriction) -
    virtualOriginShift(plus(streamwiseSlipLength, dr), plus(spanwiseSlipLength, dr));
  const solved =
    streamwiseSlipLength === 0 && spanwiseSlipLength === 0
      ? { dragReduction: 0, iterations: 0 }
      : solveDragReduction(residual, 'slipLengthLongitudinal');
  const dr = solved.dragReduction;
  const lx = plus(streamwiseSlipLength, dr);
  const lz = plus(spanwiseSlipLength, dr);
  return {
    deltaUPlus: virtualOriginShift(lx, lz),
    dragReduction: dr,
    frictionVelocityReduced: smoothFrictionVelocity * Math.sqrt(1 - dr),
    slipLengthLongitudinalPlus: lx,
    slipLengthTransversePlus: lz,
    iterations: solved.iterations,
  };
}

export type DragChange =
  | {
      kind: 'laminar-fixed-flow-rate';
      /** DR = 1 − Δp/Δp₀ at equal flow rate; positive = less drag. */
      dragReduction: number;
      geometry: 'channel-both-walls' | 'channel-one-wall' | 'pipe';
      /** Slip length along the mean flow used, m. */
      slipLength: number;
      /** Channel height H or pipe radius R, m. */
      lengthScale: number;
    }
  | {
      kind: 'turbulent-fixed-bulk-reynolds';
      deltaUPlus: number;
      /** DR = 1 − τ_w/τ_w0 at fixed bulk Reynolds number; positive = less drag. */
      dragReduction: number;
      /** u_τ of the slipping wall, m/s. */
      frictionVelocityReduced: number;
      /** Slip lengths in the reduced wall units used in ΔU⁺. */
      slipLengthAlongFlowPlus: number;
      slipLengthSpanwisePlus: number;
      /** C_f0 of the smooth wall the change refers to. */
      smoothSkinFriction: number;
      iterations: number;
    }
  | {
      kind: 'turbulent-log-law-shift';
      /** ΔU⁺ in the smooth-wall units (no skin-friction coefficient to convert it to DR). */
      deltaUPlus: number;
    }
  | {
      kind: 'not-evaluated';
      reason: string;
    };

/**
 * Drag change of a slipping wall in the scenario's flow (laminar fixed flow rate,
 * or turbulent virtual-origin shift at fixed bulk Reynolds number), from the slip
 * lengths along the flow and spanwise (m). Exported so that other models (e.g.
 * surfactant-reduced slip) reuse the one drag model.
 */
export function dragChange(
  scenario: Scenario,
  slipAlongFlow: number,
  slipSpanwise: number,
  kinematicViscosity: number,
  notes: Notes,
): DragChange {
  const { flow } = scenario;
  const b = Math.max(slipAlongFlow, 0);
  if (flow.regime === 'laminar') {
    notes.cite(REFERENCES.laugaStone2003);
    if (flow.kind === 'channel') {
      const H = flow.height;
      if (!(H !== undefined && Number.isFinite(H) && H > 0)) {
        throw new DomainError('a channel flow needs its full height', { field: 'flow.height' });
      }
      const walls = flow.texturedWalls ?? 2;
      notes.model('drag.laminar-channel');
      return {
        kind: 'laminar-fixed-flow-rate',
        dragReduction: walls === 2 ? laminarChannelDragReductionBothWalls(H, b) : laminarChannelDragReductionOneWall(H, b),
        geometry: walls === 2 ? 'channel-both-walls' : 'channel-one-wall',
        slipLength: b,
        lengthScale: H,
      };
    }
    if (flow.kind === 'pipe') {
      const D = flow.diameter;
      if (!(D !== undefined && Number.isFinite(D) && D > 0)) {
        throw new DomainError('a pipe flow needs its diameter', { field: 'flow.diameter' });
      }
      notes.model('drag.laminar-pipe');
      return { kind: 'laminar-fixed-flow-rate', dragReduction: laminarPipeDragReduction(D / 2, b), geometry: 'pipe', slipLength: b, lengthScale: D / 2 };
    }
    return {
      kind: 'not-evaluated',
      reason: `no closed-form laminar drag change for a '${flow.kind}' flow; the slip velocity is τ_w b/μ`,
    };
  }

  notes.cite(REFERENCES.fukagata2006, REFERENCES.ibrahim2021).model('drag.turbulent-virtual-origin');
  if (flow.regime === 'transitional') {
    notes.warn(
      'transitional-flow-drag',
      'The flow is transitional; the turbulent virtual-origin drag model is applied but transition itself may shift with slip.',
      'caution',
    );
  }
  const cf = flow.skinFrictionCoefficient;
  if (!(cf !== undefined && Number.isFinite(cf) && cf > 0)) {
    notes.warn(
      'no-skin-friction-coefficient',
      'No skin-friction coefficient is known for this flow, so only the log-law shift ΔU⁺ (smooth-wall units) is reported.',
      'caution',
    );
    notes.model('drag.turbulent-log-law-shift');
    return {
      kind: 'turbulent-log-law-shift',
      deltaUPlus: virtualOriginShift(b / flow.viscousLength, Math.max(slipSpanwise, 0) / flow.viscousLength),
    };
  }
  if (flow.kind === 'channel' && flow.texturedWalls === 1) {
    notes.assume('Turbulent channel with one textured wall: the drag change is that of the textured wall, as if both walls were textured.');
  }
  if (flow.kind === 'plate') {
    notes.assume('Flat plate: the fixed-bulk-Reynolds-number log-law relation is applied with the free-stream velocity and the local C_f.');
  }
  const turbulent = turbulentDragChange(b, Math.max(slipSpanwise, 0), flow.frictionVelocity, kinematicViscosity, cf);
  return {
    kind: 'turbulent-fixed-bulk-reynolds',
    deltaUPlus: turbulent.deltaUPlus,
    dragReduction: turbulent.dragReduction,
    frictionVelocityReduced: turbulent.frictionVelocityReduced,
    slipLengthAlongFlowPlus: turbulent.slipLengthLongitudinalPlus,
    slipLengthSpanwisePlus: turbulent.slipLengthTransversePlus,
    smoothSkinFriction: cf,
    iterations: turbulent.iterations,
  };
}
