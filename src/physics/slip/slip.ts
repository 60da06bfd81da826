/**
 * Slip and drag change of a liquid-infused grooved wall: effective slip lengths
 * along and across the grooves (the exact fast cores by default, the textbook
 * closed forms or the groove-cell field solver on request),
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
import { planGrooveCellSolve } from '../groove/solver-budget.js';
import { closedFormErrorEstimate } from './closed-form-error.js';
import { EXACT_CORE_REACH, exactCoreReaches, exactGrooveSlip, insideExactCoreRange, type ExactGrooveSlip } from './exact-core.js';
import { dragChange, type DragChange } from './drag.js';
import {
  belyaevVinogradovaSlipLengthLongitudinal,
  belyaevVinogradovaSlipLengthTransverse,
  grooveLocalSlipLengths,
  interfacialShearRatioFromSlip,
  obliqueSlipLengths,
  type GrooveLocalSlip,
} from './stripe-slip.js';

/**
 * 'auto' (default) and 'exact-core': the exact fast cores (./exact-core.ts); 'closed-form': the textbook
 * estimate; 'field': the groove-cell finite-volume solver (the independent reference, seconds per call).
 */
export type SlipMethod = 'auto' | 'exact-core' | 'closed-form' | 'field';

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
   * textured wall, for the mean flow at angle θ: (τ_i/τ)_∥ |cos θ|. From the exact
   * core or the field solver, whichever answered; under 'closed-form' from the
   * local-slip model τ_i/τ = b_∥/(φ b̄_s) (./stripe-slip.ts). The retention model uses it.
   */
  interfacialShearRatio: number;
  /** The same ratio for flow exactly along the grooves (θ = 0). */
  interfacialShearRatioLongitudinal: number;
  /** Slip lengths and texture sizes in viscous lengths ℓ_ν of the smooth wall. */
  wallUnits: { slipLengthLongitudinalPlus: number; slipLengthTransversePlus: number; pitchPlus: number; grooveWidthPlus: number };
  /** Mean lubricant velocity at the interface for longitudinal shear times w over ν of the working liquid. */
  textureReynoldsNumber: number;
  drag: DragChange;
  /**
   * Method that answered: 'exact-core' (the fast exact cores), 'field' where the groove-cell solver ran for at
   * least one direction, else 'closed-form'.
   */
  method: 'exact-core' | 'closed-form' | 'field';
  /**
   * Relative error |b_closed − b_exact|/b_exact of the closed form for each slip length:
   * source 'measured' against the exact core or the field solver (whichever is the exact value here; under
   * 'closed-form' the exact core is run beside it when the cell is inside its measured range), else 'error-map'.
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

/** Closed-form error above which a 'closed-form' answer carries a caution. */
const CLOSED_FORM_CAUTION = 0.01;

interface FieldRun {
  longitudinal?: GrooveCellResult;
  transverse?: GrooveCellResult;
  failures: string[];
  wallTimeMs: number;
}

/**
 * Both groove-cell solves (src/physics/groove/groove-cell.ts), asked for explicitly. Non-convergence maps to
 * ConvergenceError, impossible geometry to DomainError, a geometry beyond the work bound
 * (src/physics/groove/solver-budget.ts) to its 422 naming the field and the limit; any other failure of one
 * direction is recorded so that direction falls back to the exact core with a warning.
 */
function runFieldSolver(input: GrooveCellInput): FieldRun {
  const start = performance.now();
  const run: FieldRun = { failures: [], wallTimeMs: 0 };
  const plan = planGrooveCellSolve(input);
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
 * default grid (more for extreme geometry), so the API runs `field` in a worker
 * thread. Exact core (`auto`, `exact-core`): ./exact-core.ts, exact to the bounds
 * of docs/slip-core.md at about 0.2 ms per cell; outside its measured range it
 * still answers, with a caution (the field solver is no better there and its work
 * bound refuses much of it). Drag: laminar fixed-flow-rate formulas for channels and pipes;
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
  if (method !== 'auto' && method !== 'exact-core' && method !== 'closed-form' && method !== 'field') {
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

  // The exact core: the answer under auto/exact-core, the stand-in where a field solve fails, and the
  // measured error of the closed form (about 0.2 ms, so it runs under every method inside its range).
  const wantCore = method === 'auto' || method === 'exact-core' || method === 'field' || insideExactCoreRange(phi, d / w, viscosityRatio);
  let core: ExactGrooveSlip | undefined;
  if (wantCore && !exactCoreReaches(phi)) {
    if (method === 'auto' || method === 'exact-core') {
      notes.warn(
        'exact-core-out-of-reach',
        `w/P = ${phi.toPrecision(3)} is outside ${EXACT_CORE_REACH.interfaceFraction.join('–')}, where the exact slip core is run: the closed form is reported, with its estimated error (method 'field' solves the cell, where its grid allows).`,
        'caution',
      );
    }
  } else if (wantCore) {
    try {
      core = exactGrooveSlip({ pitch: P, grooveWidth: w, grooveDepth: d, viscosityRatio, appliedShear: flow.wallShearStress, waterViscosity: workingFluid.viscosity });
    } catch (error) {
      if (!(error instanceof ConvergenceError)) throw error;
      notes.warn('exact-core-unavailable', `The exact slip core did not converge (${error.message}); the closed form is reported, with its estimated error.`, 'warning');
    }
  }
  let field: FieldRun | undefined;
  if (method === 'field') {
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
        `The groove-cell field solver could not run (${field.failures.join('; ')}); the ${core ? 'exact core' : 'closed form'} is reported for that direction.`,
        'warning',
      );
    }
  }
  const fieldLongitudinal = field?.longitudinal;
  const fieldTransverse = field?.transverse;
  const coreAnswers = method !== 'closed-form';
  const exactLongitudinal = fieldLongitudinal ?? (coreAnswers ? core?.longitudinal : undefined);
  const exactTransverse = fieldTransverse ?? (coreAnswers ? core?.transverse : undefined);
  if (core && (exactLongitudinal === core.longitudinal || exactTransverse === core.transverse)) {
    notes.model('slip.groove-cell-exact-core').cite(REFERENCES.philip1972, REFERENCES.kamrinBazantStone2010);
    for (const caution of core.warnings) notes.warn(caution.code, caution.message, caution.severity);
  }
  // Reference values for the closed form's measured error: the exact answer where one ran, else the core beside it.
  const referenceLongitudinal = exactLongitudinal ?? (core?.insideRange ? core.longitudinal : undefined);
  const referenceTransverse = exactTransverse ?? (core?.insideRange ? core.transverse : undefined);

  const relative = (closed: number, exact: number) => (exact > 0 ? Math.abs(closed - exact) / exact : 0);
  const slipLengthLongitudinal = exactLongitudinal ? exactLongitudinal.slipLength : closedLongitudinal;
  const slipLengthTransverse = exactTransverse ? exactTransverse.slipLength : closedTransverse;
  const localSlipLength: GrooveLocalSlip = {
    longitudinalMean: exactLongitudinal?.meanLocalSlip ?? local.longitudinalMean,
    longitudinalCentre: exactLongitudinal?.localSlipAtCentre ?? local.longitudinalCentre,
    transverseMean: exactTransverse?.meanLocalSlip ?? local.transverseMean,
    transverseCentre: exactTransverse?.localSlipAtCentre ?? local.transverseCentre,
  };
  const interfacialShearRatioLongitudinal = exactLongitudinal
    ? exactLongitudinal.interfacialShearRatio
    : interfacialShearRatioFromSlip(closedLongitudinal, local.longitudinalMean, phi);
  const closedFormError: SlipResult['closedFormError'] = {
    slipLengthLongitudinal: referenceLongitudinal
      ? { value: relative(closedLongitudinal, referenceLongitudinal.slipLength), source: 'measured' }
      : { value: estimate.longitudinal, source: 'error-map' },
    slipLengthTransverse: referenceTransverse
      ? { value: relative(closedTransverse, referenceTransverse.slipLength), source: 'measured' }
      : { value: estimate.transverse, source: 'error-map' },
  };
  const methodUsed: SlipResult['method'] = fieldLongitudinal || fieldTransverse ? 'field' : exactLongitudinal || exactTransverse ? 'exact-core' : 'closed-form';
  let fieldSolverStats: FieldSolverStats | undefined;
  if (field && (fieldLongitudinal || fieldTransverse)) {
    notes.model('slip.groove-cell-field');
    fieldSolverStats = {
      ...(fieldLongitudinal ? { longitudinal: cellStats(fieldLongitudinal) } : {}),
      ...(fieldTransverse ? { transverse: cellStats(fieldTransverse) } : {}),
      wallTimeMs: field.wallTimeMs,
    };
  }
  if (!exactLongitudinal || !exactTransverse) {
    notes.assume(
      'Closed form: uniform local slip equal to the mean lid velocity of the groove alone (lid-sheared duct series along the grooves, tabulated shear-driven cavity across them); Belyaev–Vinogradova stripe formula.',
    );
  }
  const reportedError = Math.max(
    exactLongitudinal ? 0 : closedFormError.slipLengthLongitudinal.value,
    exactTransverse ? 0 : closedFormError.slipLengthTransverse.value,
  );
  if (reportedError >= CLOSED_FORM_CAUTION) {
    const source = referenceLongitudinal || referenceTransverse ? 'measured against the exact core' : 'error map';
    notes.warn(
      'closed-form-approximate',
      `Error of the closed-form slip reported: ${(100 * reportedError).toFixed(1)} % (${source}); the default method gives the exact flat-interface value.`,
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
