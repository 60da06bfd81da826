/**
 * Slip and drag change of a liquid-infused grooved wall: effective slip lengths
 * along and across the grooves (closed forms or the groove-cell field solver),
 * the local slip of the lubricant-filled grooves, the interfacial shear that
 * drives the lubricant, slip in wall units and the drag change of the flow.
 * Pure function of a resolved SI {@link Scenario}; no HTTP, no logging.
 */
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import type { SourcedNumber } from '../../core/values.js';
import { REFERENCES } from '../../core/references.js';
import type { Scenario } from '../scenario.js';
import {
  CellInputError,
  SolverDivergence,
  solveLongitudinalCell,
  solveTransverseCell,
  type GrooveCellInput,
  type GrooveCellResult,
} from '../groove/groove-cell.js';
import { planGrooveCellSolve, WorkLimitError, type GrooveCellPlan } from '../groove/solver-budget.js';
import { closedFormErrorEstimate } from './closed-form-error.js';
import { dragChange, type DragChange } from './drag.js';
import {
  belyaevVinogradovaSlipLengthLongitudinal,
  belyaevVinogradovaSlipLengthTransverse,
  grooveLocalSlipLengths,
  interfacialShearRatioFromSlip,
  obliqueSlipLengths,
  type GrooveLocalSlip,
} from './stripe-slip.js';

export type SlipMethod = 'auto' | 'closed-form' | 'field';

export interface SlipInput {
  scenario: Scenario;
  method: SlipMethod;
  /** Field-solver resolution (passed to src/physics/groove/groove-cell.ts). */
  grid?: { cellsPerPitch?: number; maxCells?: number; domainHeight?: number };
}

export type ClosedFormErrorSource = 'measured' | 'error-map';

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
   * τ_i/τ = b_∥/(φ b̄_s) (./stripe-slip.ts). The retention model uses it.
   */
  interfacialShearRatio: number;
  /** The same ratio for flow exactly along the grooves (θ = 0). */
  interfacialShearRatioLongitudinal: number;
  /** Slip lengths and texture sizes in viscous lengths ℓ_ν of the smooth wall. */
  wallUnits: { slipLengthLongitudinalPlus: number; slipLengthTransversePlus: number; pitchPlus: number; grooveWidthPlus: number };
  /** Mean lubricant velocity at the interface for longitudinal shear times w over ν of the working liquid. */
  textureReynoldsNumber: number;
  drag: DragChange;
  /** Method used: 'field' where the groove-cell solver ran for at least one direction. */
  method: 'closed-form' | 'field';
  /**
   * Relative error |b_closed − b_exact|/b_exact of the closed form for each slip length:
   * source 'measured' where the field solver ran for that direction, else 'error-map'.
   */
  closedFormError: {
    slipLengthLongitudinal: SourcedNumber<ClosedFormErrorSource>;
    slipLengthTransverse: SourcedNumber<ClosedFormErrorSource>;
  };
  fieldSolverStats?: FieldSolverStats;
}

/** Texture limits of the smooth-wall (virtual-origin) regime, wall units (Ibrahim et al. 2021 for the framework; the bounds ~5 and ~25 are common practice, no source). */
const SLIP_PLUS_LIMIT = 5;
const PITCH_PLUS_LIMIT = 25;
/** Stokes assumption inside the texture. */
const TEXTURE_REYNOLDS_LIMIT = 1;

const AUTO_ERROR_LIMIT = 0.01;

interface FieldRun {
  longitudinal?: GrooveCellResult;
  transverse?: GrooveCellResult;
  failures: string[];
  wallTimeMs: number;
}

/**
 * Both groove-cell solves (src/physics/groove/groove-cell.ts). Non-convergence maps to
 * ConvergenceError, impossible geometry to DomainError; any other failure of one
 * direction is recorded so that direction falls back to the closed form with a warning.
 */
function runFieldSolver(input: GrooveCellInput, explicit: boolean): FieldRun {
  const start = performance.now();
  const run: FieldRun = { failures: [], wallTimeMs: 0 };
  // Work bound before any solve (src/physics/groove/solver-budget.ts): asked for explicitly, a geometry beyond it is
  // a 422 naming the field and the limit; under 'auto' the closed form stands in, with a warning.
  let plan: GrooveCellPlan;
  try {
    plan = planGrooveCellSolve(input);
  } catch (error) {
    if (explicit || !(error instanceof WorkLimitError)) throw error;
    run.failures.push(error.message);
    return run;
  }
  const bounded = { ...input, grooveDepth: plan.solvedDepth };
  for (const direction of ['longitudinal', 'transverse'] as const) {
    const solve = direction === 'longitudinal' ? solveLongitudinalCell : solveTransverseCell;
    try {
      run[direction] = solve(bounded);
    } catch (error) {
      if (error instanceof SolverDivergence) {
        throw new ConvergenceError(`groove-cell ${direction} solver did not converge`, error.iterations, error.residual, 'method');
      }
      if (error instanceof CellInputError) throw new DomainError(error.message, { field: error.field });
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
 * lid-sheared duct series (longitudinal) and the shear-driven cavity table
 * (transverse), inserted into the Belyaev–Vinogradova stripe formulas
 * (transverse through the Asmolov–Vinogradova relation); slip tensor for the flow
 * angle. Field: the groove-cell solvers (src/physics/groove/groove-cell.ts), exact for a
 * flat interface; about 0.05–0.3 s along and 0.5–2 s across the grooves on the
 * default grid (more for extreme geometry), so the API should run `field`/`auto`
 * in a worker thread. `auto` uses the closed form only where the measured error
 * map (closedFormErrorEstimate) puts both directions below 1 %, in practice
 * N ≲ 0.01 (gas-like lubricants). Drag: laminar fixed-flow-rate formulas for channels and pipes;
 * turbulent virtual-origin shift with ℓ_x⁺ the slip along the mean flow and ℓ_z⁺
 * the spanwise slip, converted to DR at fixed bulk Reynolds number in the reduced
 * wall units (./drag.ts).
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
  notes.model('slip.stripe-closed-form').cite(
    REFERENCES.philip1972,
    REFERENCES.laugaStone2003,
    REFERENCES.belyaevVinogradova2010,
    REFERENCES.asmolovVinogradova2012,
    REFERENCES.schoenecker2014,
    REFERENCES.kamrinBazantStone2010,
    REFERENCES.shahLondon1978, REFERENCES.white2006,
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
  const estimate = closedFormErrorEstimate(phi, d / w, viscosityRatio);

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
    }, method === 'field');
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
    slipLengthLongitudinal: fieldLongitudinal
      ? { value: relative(closedLongitudinal, fieldLongitudinal.slipLength), source: 'measured' }
      : { value: estimate.longitudinal, source: 'error-map' },
    slipLengthTransverse: fieldTransverse
      ? { value: relative(closedTransverse, fieldTransverse.slipLength), source: 'measured' }
      : { value: estimate.transverse, source: 'error-map' },
  };
  const methodUsed: SlipResult['method'] = fieldLongitudinal || fieldTransverse ? 'field' : 'closed-form';
  let fieldSolverStats: FieldSolverStats | undefined;
  if (field && (fieldLongitudinal || fieldTransverse)) {
    notes.model('slip.groove-cell-field');
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
    fieldLongitudinal ? 0 : closedFormError.slipLengthLongitudinal.value,
    fieldTransverse ? 0 : closedFormError.slipLengthTransverse.value,
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
    slipLengthLongitudinalPlus: slipLengthLongitudinal / viscousLength,
    slipLengthTransversePlus: slipLengthTransverse / viscousLength,
    pitchPlus: P / viscousLength,
    grooveWidthPlus: w / viscousLength,
  };
  // Mean stripe velocity τ b_∥/(μ φ) (plane-mean argument in stripe-slip.ts).
  const interfaceVelocity = (flow.wallShearStress * slipLengthLongitudinal) / (workingFluid.viscosity * phi);
  const textureReynoldsNumber = (interfaceVelocity * w) / kinematicViscosity;

  const drag = dragChange(scenario, oblique.alongFlow, spanwise, kinematicViscosity, notes);

  // Validity warnings.
  if (flow.regime !== 'laminar') {
    if (Math.max(wallUnits.slipLengthLongitudinalPlus, wallUnits.slipLengthTransversePlus) > SLIP_PLUS_LIMIT) {
      notes.warn(
        'slip-beyond-smooth-wall-regime',
        `Slip length of ${Math.max(wallUnits.slipLengthLongitudinalPlus, wallUnits.slipLengthTransversePlus).toFixed(2)} viscous lengths exceeds ~${SLIP_PLUS_LIMIT}: the virtual-origin model is outside its calibrated range.`,
      );
    }
    if (wallUnits.pitchPlus > PITCH_PLUS_LIMIT) {
      notes.warn(
        'pitch-too-large-in-wall-units',
        `Texture pitch of ${wallUnits.pitchPlus.toFixed(1)} viscous lengths exceeds ~${PITCH_PLUS_LIMIT}: turbulence penetrates the texture and the slip-length model no longer holds.`,
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
      method: methodUsed,
      closedFormError,
      ...(fieldSolverStats ? { fieldSolverStats } : {}),
    },
    notes,
  );
}
