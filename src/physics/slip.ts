/**
 * Slip and drag change of a liquid-infused grooved wall: effective slip lengths
 * along and across the grooves (closed forms or the groove-cell field solver),
 * the local slip of the lubricant-filled grooves, the interfacial shear that
 * drives the lubricant, slip in wall units and the drag change of the flow.
 * Pure function of a resolved SI {@link Scenario}; no HTTP, no logging.
 */
import {
  CellInputError,
  SolverDivergence,
  solveLongitudinalCell,
  solveTransverseCell,
  type GrooveCellInput,
  type GrooveCellResult,
} from '../numerics/groove-cell.js';
import { ConvergenceError, DomainError, Notes, outcome, type Outcome } from './common.js';
import { GROOVE_DUCT_REFERENCES } from './groove-duct.js';
import { planGrooveCellSolve, WorkLimitError, type GrooveCellPlan } from './solver-budget.js';
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
 * Measured relative error |b_closed − b_field|/b_field of the closed forms
 * (Belyaev–Vinogradova with the groove-alone mean local slip; transverse through
 * Asmolov–Vinogradova with the cavity local slip) against the groove-cell field
 * solver (default grid), from `npx tsx bench/slip-error-map.ts` (2026-12-02; table
 * in the slip report). The closed form always reads low; the error grows from
 * about 0.5 % at N = 0.01 to about 21 % at N ≥ 10 (the Belyaev–Vinogradova
 * small-slip limit ln sec/ln(sec + tan) instead of φ).
 */
const ERROR_MAP = {
  interfaceFractions: [0.2, 0.5, 0.8, 0.95],
  depthRatios: [0.1, 0.5, 1.0, 2.0],
  viscosityRatios: [0.01, 0.1, 1.0, 10.0, 100.0],
  /** |relative error| of b_∥, indexed [φ][d/w][N]. */
  longitudinal: [
    [
      [0.0129, 0.0752, 0.1786, 0.2103, 0.2143],
      [0.0059, 0.0348, 0.1387, 0.2034, 0.2135],
      [0.0055, 0.0318, 0.1334, 0.2022, 0.2134],
      [0.0055, 0.0317, 0.1331, 0.2022, 0.2134],
    ],
    [
      [0.0126, 0.0787, 0.1799, 0.2094, 0.2132],
      [0.0049, 0.0362, 0.1418, 0.2031, 0.2125],
      [0.0045, 0.0331, 0.1366, 0.2020, 0.2124],
      [0.0045, 0.0330, 0.1364, 0.2020, 0.2123],
    ],
    [
      [0.0154, 0.0881, 0.1776, 0.2003, 0.2031],
      [0.0058, 0.0412, 0.1435, 0.1950, 0.2025],
      [0.0053, 0.0375, 0.1384, 0.1940, 0.2024],
      [0.0052, 0.0374, 0.1381, 0.1939, 0.2024],
    ],
    [
      [0.0186, 0.0918, 0.1568, 0.1705, 0.1721],
      [0.0055, 0.0378, 0.1220, 0.1650, 0.1715],
      [0.0047, 0.0329, 0.1163, 0.1639, 0.1714],
      [0.0046, 0.0327, 0.1160, 0.1639, 0.1714],
    ],
  ],
  /** |relative error| of b_⊥, indexed [φ][d/w][N]. */
  transverse: [
    [
      [0.0186, 0.1044, 0.1933, 0.2151, 0.2177],
      [0.0047, 0.0446, 0.1564, 0.2108, 0.2185],
      [0.0030, 0.0331, 0.1394, 0.2043, 0.2144],
      [0.0029, 0.0325, 0.1389, 0.2043, 0.2144],
    ],
    [
      [0.0208, 0.1094, 0.1942, 0.2143, 0.2167],
      [0.0051, 0.0454, 0.1545, 0.2059, 0.2132],
      [0.0035, 0.0348, 0.1409, 0.2030, 0.2125],
      [0.0035, 0.0345, 0.1406, 0.2030, 0.2125],
    ],
    [
      [0.0256, 0.1174, 0.1887, 0.2046, 0.2065],
      [0.0062, 0.0494, 0.1520, 0.1965, 0.2027],
      [0.0042, 0.0370, 0.1384, 0.1940, 0.2024],
      [0.0041, 0.0367, 0.1382, 0.1940, 0.2024],
    ],
    [
      [0.0309, 0.1163, 0.1645, 0.1744, 0.1756],
      [0.0047, 0.0392, 0.1248, 0.1658, 0.1718],
      [0.0016, 0.0223, 0.1088, 0.1629, 0.1713],
      [0.0016, 0.0219, 0.1084, 0.1629, 0.1713],
    ],
  ],
};

/** Index of the interval of a sorted grid holding x (clamped) and the linear weight in it. */
function bracketOf(grid: readonly number[], x: number): [number, number] {
  if (x <= grid[0]) return [0, 0];
  if (x >= grid[grid.length - 1]) return [grid.length - 2, 1];
  let i = 0;
  while (x > grid[i + 1]) i++;
  return [i, (x - grid[i]) / (grid[i + 1] - grid[i])];
}

/**
 * Error along N at one (φ, d/w) node: linear in log N – log error between the
 * measured N; clamped above N = 100 (the error saturates); below N = 0.01 the
 * first log–log slope is continued (the error vanishes as N → 0, where both the
 * closed form and the solver reduce to Philip's exact result).
 */
function errorAlongViscosityRatio(errors: readonly number[], viscosityRatio: number): number {
  const logN = ERROR_MAP.viscosityRatios.map(Math.log10);
  const x = Math.log10(viscosityRatio);
  const logE = errors.map((e) => Math.log10(Math.max(e, 1e-6)));
  if (x >= logN[logN.length - 1]) return errors[errors.length - 1];
  if (x <= logN[0]) {
    const slope = Math.max((logE[1] - logE[0]) / (logN[1] - logN[0]), 0);
    return 10 ** (logE[0] + slope * (x - logN[0]));
  }
  const [i, t] = bracketOf(logN, x);
  return 10 ** ((1 - t) * logE[i] + t * logE[i + 1]);
}

/**
 * Estimated relative error of the closed forms at interface fraction φ, depth
 * ratio d/w and viscosity ratio N: the measured map, interpolated linearly in φ and
 * log(d/w) (clamped to the measured ranges 0.2 ≤ φ ≤ 0.95, 0.1 ≤ d/w ≤ 2) and
 * log–log in N.
 */
export function closedFormErrorEstimate(
  interfaceFraction: number,
  depthOverWidth: number,
  viscosityRatio: number,
): { longitudinal: number; transverse: number } {
  const [i, s] = bracketOf(ERROR_MAP.interfaceFractions, interfaceFraction);
  const [j, t] = bracketOf(ERROR_MAP.depthRatios.map(Math.log10), Math.log10(depthOverWidth));
  const at = (table: readonly (readonly (readonly number[])[])[]) => {
    const e = (a: number, b: number) => errorAlongViscosityRatio(table[a][b], viscosityRatio);
    return (1 - s) * ((1 - t) * e(i, j) + t * e(i, j + 1)) + s * ((1 - t) * e(i + 1, j) + t * e(i + 1, j + 1));
  };
  return { longitudinal: at(ERROR_MAP.longitudinal), transverse: at(ERROR_MAP.transverse) };
}

const AUTO_ERROR_LIMIT = 0.01;

interface FieldRun {
  longitudinal?: GrooveCellResult;
  transverse?: GrooveCellResult;
  failures: string[];
  wallTimeMs: number;
}

/**
 * Both groove-cell solves (src/numerics/groove-cell.ts). Non-convergence maps to
 * ConvergenceError, impossible geometry to DomainError; any other failure of one
 * direction is recorded so that direction falls back to the closed form with a warning.
 */
function runFieldSolver(input: GrooveCellInput, explicit: boolean): FieldRun {
  const start = performance.now();
  const run: FieldRun = { failures: [], wallTimeMs: 0 };
  // Work bound before any solve (src/physics/solver-budget.ts): asked for explicitly, a geometry beyond it is
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
 * angle. Field: the groove-cell solvers (src/numerics/groove-cell.ts), exact for a
 * flat interface; about 0.05–0.3 s along and 0.5–2 s across the grooves on the
 * default grid (more for extreme geometry), so the API should run `field`/`auto`
 * in a worker thread. `auto` uses the closed form only where the measured error
 * map (closedFormErrorEstimate) puts both directions below 1 %, in practice
 * N ≲ 0.01 (gas-like lubricants). Drag: laminar fixed-flow-rate formulas for channels and pipes;
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
