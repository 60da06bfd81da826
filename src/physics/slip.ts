/**
 * Slip and drag change of a liquid-infused grooved wall: effective slip lengths
 * along and across the grooves (closed forms or the groove-cell field solver),
 * the local slip of the lubricant-filled grooves, the interfacial shear that
 * drives the lubricant, slip in wall units and the drag change of the flow.
 * Pure function of a resolved SI {@link Scenario}; no HTTP, no logging.
 */
import * as grooveCell from '../numerics/groove-cell.js';
import type { GrooveCellInput, GrooveCellResult } from '../numerics/groove-cell.js';
import { ConvergenceError, DomainError, Notes, outcome, type Outcome } from './common.js';
import { GROOVE_DUCT_REFERENCES } from './groove-duct.js';
import type { Scenario } from './scenario.js';
import {
  SLIP_DRAG_REFERENCES,
  laminarChannelDragReductionBothWalls,
  laminarChannelDragReductionOneWall,
  laminarPipeDragReduction,
  turbulentDragChange,
  virtualOriginShift,
} from './slip-drag.js';
import {
  STRIPE_SLIP_REFERENCES,
  TENSOR_SLIP_REFERENCE,
  belyaevVinogradovaSlipLengthLongitudinal,
  belyaevVinogradovaSlipLengthTransverse,
  grooveLocalSlipLengths,
  interfacialShearRatioFromSlip,
  obliqueSlipLengths,
  type GrooveLocalSlip,
} from './stripe-slip.js';

export type SlipMethod = 'auto' | 'closed-form' | 'field';
export type WavesRegime = 'calm' | 'marginal' | 'wavy';

export interface SlipInput {
  scenario: Scenario;
  method: SlipMethod;
  /** Interface wave regime from the waves model; 'wavy' makes the drag change untrustworthy. */
  wavesRegime?: WavesRegime;
  /** Wetting state from the wetting model ('film-covered' | 'infused-exposed-tops' | 'not-wetting'). */
  wettingState?: string;
  /** Field-solver resolution (passed to src/numerics/groove-cell.ts). */
  grid?: { cellsPerPitch?: number; maxCells?: number; domainHeight?: number };
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

export interface FieldSolverRunStats {
  unknowns: number;
  iterations: number;
  residual: number;
  grid: [number, number];
}

export interface FieldSolverStats {
  longitudinal?: FieldSolverRunStats;
  transverse?: FieldSolverRunStats;
  /** Wall time of both solves, ms (indicative; the machine is shared). */
  wallTimeMs: number;
}

export interface SlipResult {
  /** b_∥, m (flow along the grooves). */
  slipLengthLongitudinal: number;
  /** b_⊥, m (flow across the grooves). */
  slipLengthTransverse: number;
  /** Slip length along the mean flow, b_∥ cos²θ + b_⊥ sin²θ, m. */
  slipLengthAlongFlow: number;
  /** Cross-flow slip component (b_∥ − b_⊥) sinθ cosθ, m. */
  slipLengthCrossFlow: number;
  /** Slip length in the spanwise direction of the mean flow, b_∥ sin²θ + b_⊥ cos²θ, m (enters ΔU⁺). */
  slipLengthSpanwise: number;
  localSlipLength: GrooveLocalSlip;
  /**
   * Mean interfacial shear along the grooves over the wall shear applied to the
   * textured wall, for the mean flow at angle θ: (τ_i/τ)_∥ |cos θ|. From the field
   * solver when it ran, else from the closed-form local-slip model
   * τ_i/τ = b_∥/(φ b̄_s) (src/physics/stripe-slip.ts). The retention model uses it.
   */
  interfacialShearRatio: number;
  /** The same ratio for flow exactly along the grooves (θ = 0). */
  interfacialShearRatioLongitudinal: number;
  wallUnits: { slipLengthLongitudinal: number; slipLengthTransverse: number; pitch: number; grooveWidth: number };
  /** Mean lubricant velocity at the interface for longitudinal shear times w over ν of the working liquid. */
  textureReynoldsNumber: number;
  drag: DragChange;
  methodUsed: 'closed-form' | 'field';
  /** Relative error of the closed form against the field solver (measured if both ran, else the error map). */
  closedFormError: {
    longitudinal: number;
    transverse: number;
    /** 'measured' where the field solver ran for that direction, else 'error-map'. */
    source: { longitudinal: 'measured' | 'error-map'; transverse: 'measured' | 'error-map' };
  };
  fieldSolverStats?: FieldSolverStats;
}

/** Texture limits of the smooth-wall (virtual-origin) regime, wall units (physics.md §4; Ibrahim et al. 2021). */
const SLIP_PLUS_LIMIT = 5;
const PITCH_PLUS_LIMIT = 25;
/** Stokes assumption inside the texture. */
const TEXTURE_REYNOLDS_LIMIT = 1;

/**
 * Measured relative error |b_closed − b_field|/b_field of the longitudinal closed
 * form (Belyaev–Vinogradova with the mean duct local slip b̄_s) against the
 * groove-cell field solver, from `npx tsx bench/slip-error-map.ts` (table in the
 * slip report). The error collapses onto the two parameters φ and b̄_s/P (rows for
 * d/w = 0.1 … 2 agree to within about 0.01), so the map keeps, for each φ, nodes
 * (b̄_s/P, error) at d/w = 1.
 */
const LONGITUDINAL_ERROR_MAP: { interfaceFraction: number; nodes: [number, number][] }[] = [
  { interfaceFraction: 0.2, nodes: [[0.000541, 0.2183], [0.00541, 0.2076], [0.0541, 0.143], [0.541, 0.0526], [5.41, 0.0301]] },
  { interfaceFraction: 0.5, nodes: [[0.00135, 0.2141], [0.0135, 0.2041], [0.135, 0.1409], [1.35, 0.0445], [13.5, 0.0188]] },
  { interfaceFraction: 0.8, nodes: [[0.00216, 0.2032], [0.0216, 0.1949], [0.216, 0.1406], [2.16, 0.0452], [21.6, 0.0156]] },
  { interfaceFraction: 0.95, nodes: [[0.00257, 0.1719], [0.0257, 0.1645], [0.257, 0.1174], [2.57, 0.0371], [25.7, 0.0108]] },
];

/** Error at one φ row: piecewise linear in log10(b̄_s/P); clamped below; power-law decay above (exact as b̄_s → ∞). */
function errorAlongRow(nodes: [number, number][], localSlipOverPitch: number): number {
  const x = Math.log10(Math.max(localSlipOverPitch, 1e-300));
  const first = nodes[0];
  if (x <= Math.log10(first[0])) return first[1];
  for (let i = 1; i < nodes.length; i++) {
    const [x1, e1] = [Math.log10(nodes[i - 1][0]), nodes[i - 1][1]];
    const [x2, e2] = [Math.log10(nodes[i][0]), nodes[i][1]];
    if (x <= x2) return e1 + ((e2 - e1) * (x - x1)) / (x2 - x1);
  }
  const [xa, ea] = [Math.log10(nodes[nodes.length - 2][0]), Math.log10(nodes[nodes.length - 2][1])];
  const [xb, eb] = [Math.log10(nodes[nodes.length - 1][0]), Math.log10(nodes[nodes.length - 1][1])];
  return 10 ** (eb + ((eb - ea) / (xb - xa)) * (x - xb));
}

/**
 * Estimated relative error of the longitudinal closed form at interface fraction φ
 * and local slip b̄_s/P, interpolated linearly in φ between the rows of the
 * measured map (clamped outside 0.2 ≤ φ ≤ 0.95).
 */
export function closedFormErrorLongitudinal(interfaceFraction: number, localSlipOverPitch: number): number {
  const rows = LONGITUDINAL_ERROR_MAP;
  if (interfaceFraction <= rows[0].interfaceFraction) return errorAlongRow(rows[0].nodes, localSlipOverPitch);
  for (let i = 1; i < rows.length; i++) {
    if (interfaceFraction <= rows[i].interfaceFraction) {
      const t = (interfaceFraction - rows[i - 1].interfaceFraction) / (rows[i].interfaceFraction - rows[i - 1].interfaceFraction);
      return (1 - t) * errorAlongRow(rows[i - 1].nodes, localSlipOverPitch) + t * errorAlongRow(rows[i].nodes, localSlipOverPitch);
    }
  }
  return errorAlongRow(rows[rows.length - 1].nodes, localSlipOverPitch);
}

/**
 * Error estimate of both closed forms for `auto`. Transverse: the
 * Asmolov–Vinogradova relation b_⊥[b_s] = ½ b_∥[2b_s] is exact for a given uniform
 * local slip, so the stripe-formula part of the transverse error is taken as the
 * longitudinal error at 2b̄_s,⊥ (replaced by the measured value whenever the
 * transverse field solver runs).
 */
export function closedFormErrorEstimate(
  interfaceFraction: number,
  pitch: number,
  local: GrooveLocalSlip,
): { longitudinal: number; transverse: number } {
  return {
    longitudinal: closedFormErrorLongitudinal(interfaceFraction, local.longitudinalMean / pitch),
    transverse: closedFormErrorLongitudinal(interfaceFraction, (2 * local.transverseMean) / pitch),
  };
}

const AUTO_ERROR_LIMIT = 0.01;

type CellSolver = (input: GrooveCellInput) => GrooveCellResult;

/**
 * Field-method hook: the groove-cell solvers of src/numerics/groove-cell.ts, looked up
 * at run time so that a direction whose solver is not yet available falls back to the
 * closed form (with a warning) instead of failing.
 */
function cellSolver(name: 'solveLongitudinalCell' | 'solveTransverseCell'): CellSolver | undefined {
  const candidate = (grooveCell as unknown as Record<string, unknown>)[name];
  return typeof candidate === 'function' ? (candidate as CellSolver) : undefined;
}

interface FieldRun {
  longitudinal?: GrooveCellResult;
  transverse?: GrooveCellResult;
  failures: string[];
  wallTimeMs: number;
}

function runFieldSolver(input: GrooveCellInput): FieldRun {
  const start = performance.now();
  const run: FieldRun = { failures: [], wallTimeMs: 0 };
  for (const direction of ['longitudinal', 'transverse'] as const) {
    const solve = cellSolver(direction === 'longitudinal' ? 'solveLongitudinalCell' : 'solveTransverseCell');
    if (!solve) {
      run.failures.push(`${direction} solver not available`);
      continue;
    }
    try {
      run[direction] = solve(input);
    } catch (error) {
      if (error instanceof grooveCell.SolverDivergence) {
        throw new ConvergenceError(`groove-cell ${direction} solver did not converge`, error.iterations, error.residual, 'method');
      }
      if (error instanceof grooveCell.CellInputError) throw new DomainError(error.message, { field: error.field });
      run.failures.push(`${direction}: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
  run.wallTimeMs = performance.now() - start;
  return run;
}

function cellStats(r: GrooveCellResult): FieldSolverRunStats {
  return { unknowns: r.grid.unknowns, iterations: r.iterations, residual: r.residual, grid: [r.grid.nx, r.grid.ny] as [number, number] };
}

function validate(scenario: Scenario): void {
  const { texture, lubricant, workingFluid, flow } = scenario;
  const positive: [number, string][] = [
    [texture.pitch, 'texture.pitch'],
    [texture.grooveWidth, 'texture.grooveWidth'],
    [texture.grooveDepth, 'texture.grooveDepth'],
    [lubricant.viscosity, 'lubricant.viscosity'],
    [workingFluid.viscosity, 'workingFluid.viscosity'],
    [workingFluid.density, 'workingFluid.density'],
    [flow.wallShearStress, 'flow.wallShearStress'],
    [flow.frictionVelocity, 'flow.frictionVelocity'],
    [flow.viscousLength, 'flow.viscousLength'],
  ];
  for (const [value, field] of positive) {
    if (!(Number.isFinite(value) && value > 0)) throw new DomainError(`${field} must be a positive finite number`, { field });
  }
  if (!(texture.grooveWidth < texture.pitch)) {
    throw new DomainError('groove width must be smaller than the pitch', { field: 'texture.grooveWidth' });
  }
  if (!Number.isFinite(texture.flowAngle)) throw new DomainError('flow angle must be finite', { field: 'texture.flowAngle' });
}

/**
 * Effective slip and drag change of a liquid-infused grooved wall.
 *
 * Closed form: mean local slip of the lubricant-filled groove from the
 * lid-sheared duct series (longitudinal) and the shallow-groove recirculation
 * (transverse), inserted into the Belyaev–Vinogradova stripe formulas
 * (transverse through the Asmolov–Vinogradova relation); slip tensor for the flow
 * angle. Field: the groove-cell solver (src/numerics/groove-cell.ts), exact for a
 * flat interface. Drag: laminar fixed-flow-rate formulas for channels and pipes;
 * turbulent virtual-origin shift with ℓ_x⁺ the slip along the mean flow and ℓ_z⁺
 * the spanwise slip, converted to DR at fixed bulk Reynolds number in the reduced
 * wall units (src/physics/slip-drag.ts).
 *
 * Throws DomainError for impossible input (non-positive lengths or viscosities,
 * w ≥ P, channel without height, pipe without diameter) and ConvergenceError when
 * an iteration fails; everything else returns a result with warnings.
 */
export function evaluateSlip(input: SlipInput): Outcome<SlipResult> {
  const { scenario, method } = input;
  if (method !== 'auto' && method !== 'closed-form' && method !== 'field') {
    throw new DomainError(`unknown method '${String(method)}'`, { field: 'method' });
  }
  validate(scenario);
  const { texture, lubricant, workingFluid, flow } = scenario;
  const notes = new Notes();
  notes.model('slip/belyaev-vinogradova-duct-local-slip').cite(
    STRIPE_SLIP_REFERENCES.philip1972,
    STRIPE_SLIP_REFERENCES.laugaStone2003,
    STRIPE_SLIP_REFERENCES.belyaevVinogradova2010,
    STRIPE_SLIP_REFERENCES.asmolovVinogradova2012,
    STRIPE_SLIP_REFERENCES.schoenecker2014,
    TENSOR_SLIP_REFERENCE,
    ...GROOVE_DUCT_REFERENCES,
  );
  notes.assume('Flat lubricant–working-liquid interface pinned at the groove edges; Stokes flow inside the texture.');
  notes.assume('Grooves long compared with their width and pitch (fully developed flow in the groove).');

  const P = texture.pitch;
  const w = texture.grooveWidth;
  const d = texture.grooveDepth;
  const phi = w / P;
  const viscosityRatio = lubricant.viscosity / workingFluid.viscosity;
  const kinematicViscosity = workingFluid.viscosity / workingFluid.density;

  // Closed form (always evaluated: cheap, and needed for the error estimate).
  const local = grooveLocalSlipLengths(w, d, viscosityRatio);
  const closedLongitudinal = belyaevVinogradovaSlipLengthLongitudinal(P, w, local.longitudinalMean);
  const closedTransverse = belyaevVinogradovaSlipLengthTransverse(P, w, local.transverseMean);
  const estimate = closedFormErrorEstimate(phi, P, local);

  const wantField =
    method === 'field' || (method === 'auto' && Math.max(estimate.longitudinal, estimate.transverse) >= AUTO_ERROR_LIMIT);
  let field: FieldRun | undefined;
  if (wantField) {
    field = runFieldSolver({
      pitch: P,
      grooveWidth: w,
      grooveDepth: d,
      viscosityRatio,
      appliedShear: flow.wallShearStress,
      waterViscosity: workingFluid.viscosity,
      cellsPerPitch: input.grid?.cellsPerPitch,
      maxCells: input.grid?.maxCells,
      domainHeight: input.grid?.domainHeight,
    });
    if (field.failures.length > 0) {
      notes.warn(
        'field-solver-unavailable',
        `The groove-cell field solver could not run (${field.failures.join('; ')}); the closed form is reported for that direction, with its estimated error.`,
        'warning',
      );
    }
  }
  const fieldLongitudinal = field?.longitudinal;
  const fieldTransverse = field?.transverse;

  const relative = (closed: number, exact: number) => (exact > 0 ? Math.abs(closed - exact) / exact : 0);
  const slipLengthLongitudinal = fieldLongitudinal ? fieldLongitudinal.slipLength : closedLongitudinal;
  const slipLengthTransverse = fieldTransverse ? fieldTransverse.slipLength : closedTransverse;
  const localSlipLength: GrooveLocalSlip = {
    longitudinalMean: fieldLongitudinal?.meanLocalSlip ?? local.longitudinalMean,
    longitudinalCentre: fieldLongitudinal?.localSlipAtCentre ?? local.longitudinalCentre,
    transverseMean: fieldTransverse?.meanLocalSlip ?? local.transverseMean,
    transverseCentre: fieldTransverse?.localSlipAtCentre ?? local.transverseCentre,
  };
  const interfacialShearRatioLongitudinal = fieldLongitudinal
    ? fieldLongitudinal.interfacialShearRatio
    : interfacialShearRatioFromSlip(closedLongitudinal, local.longitudinalMean, phi);
  const closedFormError: SlipResult['closedFormError'] = {
    longitudinal: fieldLongitudinal ? relative(closedLongitudinal, fieldLongitudinal.slipLength) : estimate.longitudinal,
    transverse: fieldTransverse ? relative(closedTransverse, fieldTransverse.slipLength) : estimate.transverse,
    source: {
      longitudinal: fieldLongitudinal ? 'measured' : 'error-map',
      transverse: fieldTransverse ? 'measured' : 'error-map',
    },
  };
  const methodUsed: SlipResult['methodUsed'] = fieldLongitudinal || fieldTransverse ? 'field' : 'closed-form';
  let fieldSolverStats: FieldSolverStats | undefined;
  if (field && (fieldLongitudinal || fieldTransverse)) {
    notes.model('slip/groove-cell-field-solver');
    fieldSolverStats = {
      ...(fieldLongitudinal ? { longitudinal: cellStats(fieldLongitudinal) } : {}),
      ...(fieldTransverse ? { transverse: cellStats(fieldTransverse) } : {}),
      wallTimeMs: field.wallTimeMs,
    };
  }
  if (!fieldLongitudinal || !fieldTransverse) {
    notes.assume(
      'Closed form: uniform local slip equal to the mean lid velocity of the groove alone (lid-sheared duct series along the grooves, tabulated shear-driven cavity across them); Belyaev–Vinogradova stripe formula.',
    );
  }
  const reportedError = Math.max(
    fieldLongitudinal ? 0 : closedFormError.longitudinal,
    fieldTransverse ? 0 : closedFormError.transverse,
  );
  if (reportedError >= AUTO_ERROR_LIMIT) {
    notes.warn(
      'closed-form-approximate',
      `Estimated error of the closed-form slip reported: ${(100 * reportedError).toFixed(1)} % (error map); method 'field' gives the exact flat-interface value.`,
      'caution',
    );
  }

  const oblique = obliqueSlipLengths(slipLengthLongitudinal, slipLengthTransverse, texture.flowAngle);
  const spanwise = obliqueSlipLengths(slipLengthTransverse, slipLengthLongitudinal, texture.flowAngle).alongFlow;
  const cosine = Math.abs(Math.cos((texture.flowAngle * Math.PI) / 180));
  const viscousLength = flow.viscousLength;
  const wallUnits = {
    slipLengthLongitudinal: slipLengthLongitudinal / viscousLength,
    slipLengthTransverse: slipLengthTransverse / viscousLength,
    pitch: P / viscousLength,
    grooveWidth: w / viscousLength,
  };
  // Mean stripe velocity τ b_∥/(μ φ) (plane-mean argument in stripe-slip.ts).
  const interfaceVelocity = (flow.wallShearStress * slipLengthLongitudinal) / (workingFluid.viscosity * phi);
  const textureReynoldsNumber = (interfaceVelocity * w) / kinematicViscosity;

  const drag = dragChange(scenario, oblique.alongFlow, spanwise, kinematicViscosity, notes);

  // Validity warnings.
  if (flow.regime !== 'laminar') {
    if (Math.max(wallUnits.slipLengthLongitudinal, wallUnits.slipLengthTransverse) > SLIP_PLUS_LIMIT) {
      notes.warn(
        'slip-beyond-smooth-wall-regime',
        `Slip length of ${Math.max(wallUnits.slipLengthLongitudinal, wallUnits.slipLengthTransverse).toFixed(2)} viscous lengths exceeds ~${SLIP_PLUS_LIMIT}: the virtual-origin model is outside its calibrated range.`,
      );
    }
    if (wallUnits.pitch > PITCH_PLUS_LIMIT) {
      notes.warn(
        'pitch-too-large-in-wall-units',
        `Texture pitch of ${wallUnits.pitch.toFixed(1)} viscous lengths exceeds ~${PITCH_PLUS_LIMIT}: turbulence penetrates the texture and the slip-length model no longer holds.`,
      );
    }
  }
  if (textureReynoldsNumber > TEXTURE_REYNOLDS_LIMIT) {
    notes.warn(
      'texture-reynolds-number-high',
      `Reynolds number in the texture (interface velocity × w/ν) is ${textureReynoldsNumber.toPrecision(3)} > ${TEXTURE_REYNOLDS_LIMIT}: inertia in the grooves is not negligible (Stokes assumption).`,
      'caution',
    );
  }
  if (input.wettingState === 'not-wetting') {
    notes.warn(
      'lubricant-not-stable',
      'The wetting state is not-wetting: the working liquid displaces the lubricant, so the slip computed for a filled groove will not be realised.',
    );
  }
  if (input.wavesRegime === 'wavy') {
    notes.warn(
      'interface-waves-roughness',
      'The interface is in the wavy regime: waves act as roughness and the computed drag reduction is not to be trusted (it may turn into a drag increase).',
    );
  } else if (input.wavesRegime === 'marginal') {
    notes.warn('interface-waves-marginal', 'The interface is marginally stable to waves; the drag reduction may be lost at higher shear.', 'caution');
  }
  notes.warn(
    'clean-interface',
    'The slip assumes a clean (surfactant-free) interface: surfactant traces can remove most of this slip — see /v1/surfactant.',
    'info',
  );

  const interfacialShearRatio = interfacialShearRatioLongitudinal * cosine;
  return outcome(
    {
      slipLengthLongitudinal,
      slipLengthTransverse,
      slipLengthAlongFlow: oblique.alongFlow,
      slipLengthCrossFlow: oblique.crossFlow,
      slipLengthSpanwise: spanwise,
      localSlipLength,
      interfacialShearRatio,
      interfacialShearRatioLongitudinal,
      wallUnits,
      textureReynoldsNumber,
      drag,
      methodUsed,
      closedFormError,
      ...(fieldSolverStats ? { fieldSolverStats } : {}),
    },
    notes,
  );
}

function dragChange(
  scenario: Scenario,
  slipAlongFlow: number,
  slipSpanwise: number,
  kinematicViscosity: number,
  notes: Notes,
): DragChange {
  const { flow } = scenario;
  const b = Math.max(slipAlongFlow, 0);
  if (flow.regime === 'laminar') {
    notes.cite(SLIP_DRAG_REFERENCES.laugaStone2003);
    if (flow.kind === 'channel') {
      const H = flow.height;
      if (!(H !== undefined && Number.isFinite(H) && H > 0)) {
        throw new DomainError('a channel flow needs its full height', { field: 'flow.height' });
      }
      const walls = flow.texturedWalls ?? 2;
      notes.model('drag/laminar-channel-fixed-flow-rate');
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
      notes.model('drag/laminar-pipe-fixed-flow-rate');
      return { kind: 'laminar-fixed-flow-rate', dragReduction: laminarPipeDragReduction(D / 2, b), geometry: 'pipe', slipLength: b, lengthScale: D / 2 };
    }
    return {
      kind: 'not-evaluated',
      reason: `no closed-form laminar drag change for a '${flow.kind}' flow; the slip velocity is τ_w b/μ`,
    };
  }

  notes.cite(SLIP_DRAG_REFERENCES.fukagata2006, SLIP_DRAG_REFERENCES.ibrahim2021).model('drag/virtual-origin-fixed-bulk-reynolds');
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
