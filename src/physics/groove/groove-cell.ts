/**
 * Field solver for one spanwise period of a grooved, lubricant-filled wall
 * under a uniform far-field shear (the "groove cell").
 *
 * Geometry (all lengths in m): period P in the spanwise coordinate z, groove of
 * width w and depth d below the flat interface y = 0 (|z| < w/2, −d < y < 0),
 * solid elsewhere below y = 0, water above up to y = H where the applied shear
 * τ acts. Viscosity ratio N = μ_lubricant / μ_water.
 *
 * Longitudinal (flow along the grooves): div(μ grad u) = 0 solved with the
 * general finite-volume solver of ../../numerics/cell-diffusion.ts (harmonic face
 * viscosities: u and μ ∂u/∂y continuous across the mouth; N = 0 = zero-stress
 * mouth exactly). Transverse (flow across the grooves): 2-D Stokes on a MAC
 * mesh, ../../numerics/stokes-cell.ts. In both b = ū(H) μ_w / τ − H.
 *
 * Why finite volumes with multigrid rather than an eigenfunction method: the
 * same code serves the heat engineer's conduction and duct problems with
 * arbitrary per-cell coefficients, and handles every w/P, d/w and N without
 * series-truncation tuning at the edge singularity.
 *
 * Mesh: spanwise segments (half groove, half ridge) and the near-wall rows are
 * graded towards the groove edge by x = L (k/m)², i.e. cell size ∝ √r, which
 * restores second-order convergence despite the edge singularity (measured
 * observed order 1.8–2.0 for N = 0 … 100, tests). The slip length is then
 * Richardson-extrapolated from the grid and one of half the resolution.
 * Accuracy against Philip (1972) at the default grids (bench/field-solver.ts,
 * tests): longitudinal N = 0 φ = 0.5 0.07 %, φ = 0.75–0.9 ≤ 0.12 %,
 * φ = 0.1–0.25 0.2–0.3 % (≤ 0.15 % with cellsPerPitch = 64); transverse N = 0
 * ≤ 0.1 % for φ = 0.25–0.9. Finite N: within 0.05 % of an independent scipy
 * finite-difference reference (fixtures/groove-cell).
 *
 * References
 * 1. Philip J.R. (1972) Flows satisfying mixed no-slip and no-shear conditions
 *    (philip1972, whose citation says which details are unconfirmed).
 * 2. Lauga E., Stone H.A. (2003) Effective slip in pressure-driven Stokes flow.
 *    J. Fluid Mech. 489, 55–77. doi:10.1017/S0022112003004695 (confirmed).
 * 3. Patankar S.V. (1980) Numerical Heat Transfer and Fluid Flow. Hemisphere, §4.2.
 * 4. Richardson L.F. (1911) Phil. Trans. R. Soc. Lond. A 210, 307–357. doi:10.1098/rsta.1911.0009.
 */

import { solveCellDiffusion, CellInputError } from '../../numerics/cell-diffusion.js';
import { solveStokesCell } from '../../numerics/stokes-cell.js';
import { buildMesh } from './cell-mesh.js';

export { solveCellDiffusion, CellInputError };
export type { CellDiffusionProblem, CellDiffusionResult, CellBoundary, CellSides } from '../../numerics/cell-diffusion.js';

export interface GrooveCellInput {
  /** Texture period P (m), > 0. */
  pitch: number;
  /** Groove width w (m), 0 < w < P (resolved well for 0.02 ≤ w/P ≤ 0.98). */
  grooveWidth: number;
  /** Groove depth d (m), > 0 (resolved well for 0.02 ≤ d/w ≤ 5). */
  grooveDepth: number;
  /** N = μ_lubricant / μ_water, 0 ≤ N ≤ 1e3 recommended; N = 0 is the shear-free mouth. */
  viscosityRatio: number;
  /** Applied far-field shear stress τ (Pa), default 1. Results are linear in τ. */
  appliedShear?: number;
  /** Water viscosity μ_w (Pa·s), default 1. */
  waterViscosity?: number;
  /** Height H of the water layer above the interface (m), default 4 P; values < 2 P are raised to 2 P. */
  domainHeight?: number;
  /** Grid resolution: largest spanwise cell is P / cellsPerPitch; the mesh is graded towards the groove edges (default 48 longitudinal, 32 transverse; minimum 8). */
  cellsPerPitch?: number;
  /** Cap on the total number of grid cells (default 2e6); exceeded → resolution is reduced. */
  maxCells?: number;
  /** Iteration cap of the linear solver (default 200 for longitudinal; outer cap for transverse). */
  maxIterations?: number;
  /** Relative residual tolerance of the linear solver (default 1e-8). */
  tolerance?: number;
  /**
   * Richardson extrapolation of the slip length from this grid and one with half the
   * resolution, assuming the observed second-order convergence (default true; see the
   * convergence test). Profiles and statistics always come from the finer grid.
   */
  extrapolate?: boolean;
}

export interface GrooveCellResult {
  direction: 'longitudinal' | 'transverse';
  /** Effective slip length b (m) measured from the interface plane y = 0 (Richardson-extrapolated unless disabled). */
  slipLength: number;
  /** Slip length on the finer grid alone (m). */
  slipLengthFinestGrid: number;
  /** |slipLength − slipLengthFinestGrid| (m): an estimate of the finer grid's discretisation error; 0 without extrapolation. */
  slipLengthErrorEstimate: number;
  /** Spanwise positions z (m) of the interface samples across the groove mouth, −w/2 < z < w/2. */
  interfacePositions: Float64Array;
  /** Interface velocity u(z, 0) (m/s) at those positions. */
  interfaceVelocity: Float64Array;
  /** Interfacial shear stress μ ∂u/∂y (Pa) at those positions (continuous across the interface). */
  interfaceShear: Float64Array;
  /** Width-weighted mean interface velocity over the mouth (m/s). */
  meanInterfaceVelocity: number;
  /** Width-weighted mean interfacial shear over the mouth (Pa). */
  meanInterfaceShear: number;
  /** meanInterfaceShear / τ (dimensionless); used by the retention model. */
  interfacialShearRatio: number;
  /** Local slip u_i / (∂u/∂y)_water at the groove centre (m); null for N = 0 (shear-free mouth: unbounded). */
  localSlipAtCentre: number | null;
  /** Mean local slip: mean u_i / mean (∂u/∂y)_water over the mouth (m); null for N = 0. */
  meanLocalSlip: number | null;
  /** Longitudinal: volume flux of lubricant along the groove, ∫∫ u dA over its cross-section (m³/s). Transverse: recirculating flux of the cavity eddy, max |ψ| (m²/s, per unit groove length), 0 for N = 0. */
  lubricantFlux: number;
  /** Largest velocity magnitude in the field (m/s). */
  maxVelocity: number;
  grid: { nx: number; ny: number; unknowns: number; domainHeight: number };
  iterations: number;
  residual: number;
  converged: boolean;
}

/** Raised when the linear solver fails to converge within the iteration cap. */
export class SolverDivergence extends Error {
  readonly iterations: number;
  readonly residual: number;
  constructor(message: string, iterations: number, residual: number) {
    super(`${message} (after ${iterations} iterations, relative residual ${residual.toExponential(2)})`);
    this.name = 'SolverDivergence';
    this.iterations = iterations;
    this.residual = residual;
  }
}

/** Resolved, validated inputs shared by both directions. */
interface ResolvedCell {
  pitch: number;
  width: number;
  depth: number;
  ratio: number;
  shear: number;
  waterViscosity: number;
  height: number;
  cellsPerPitch: number;
  maxCells: number;
  maxIterations: number;
  tolerance: number;
  extrapolate: boolean;
}

function positiveFinite(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || !(value > 0)) {
    throw new CellInputError(field, 'must be a positive finite number');
  }
  return value;
}

function resolveInput(input: GrooveCellInput, defaultIterations: number, defaultCellsPerPitch: number): ResolvedCell {
  const pitch = positiveFinite(input.pitch, 'pitch');
  const width = positiveFinite(input.grooveWidth, 'grooveWidth');
  const depth = positiveFinite(input.grooveDepth, 'grooveDepth');
  if (!(width < pitch)) throw new CellInputError('grooveWidth', 'must be smaller than the pitch (a ridge is needed)');
  const ratio = input.viscosityRatio;
  if (typeof ratio !== 'number' || !Number.isFinite(ratio) || ratio < 0) {
    throw new CellInputError('viscosityRatio', 'must be a finite number ≥ 0');
  }
  const shear = input.appliedShear === undefined ? 1 : input.appliedShear;
  if (typeof shear !== 'number' || !Number.isFinite(shear) || shear === 0) {
    throw new CellInputError('appliedShear', 'must be a finite non-zero number');
  }
  const waterViscosity = input.waterViscosity === undefined ? 1 : positiveFinite(input.waterViscosity, 'waterViscosity');
  const height = Math.max(2 * pitch, input.domainHeight === undefined ? 4 * pitch : positiveFinite(input.domainHeight, 'domainHeight'));
  const cellsPerPitch = input.cellsPerPitch === undefined ? defaultCellsPerPitch : Math.round(positiveFinite(input.cellsPerPitch, 'cellsPerPitch'));
  if (cellsPerPitch < 8) throw new CellInputError('cellsPerPitch', 'must be ≥ 8');
  const maxCells = input.maxCells === undefined ? 2e6 : positiveFinite(input.maxCells, 'maxCells');
  const maxIterations = input.maxIterations === undefined ? defaultIterations : Math.round(positiveFinite(input.maxIterations, 'maxIterations'));
  const tolerance = input.tolerance === undefined ? 1e-8 : positiveFinite(input.tolerance, 'tolerance');
  const extrapolate = input.extrapolate ?? true;
  return { pitch, width, depth, ratio, shear, waterViscosity, height, cellsPerPitch, maxCells, maxIterations, tolerance, extrapolate };
}

/**
 * Velocity and shear stress on the interface face between a water cell (height
 * hw, centre value ua) and a lubricant cell (height hb, centre value ub): flux
 * continuity across the face with the half-cell conductances μ/(h/2), i.e. the
 * harmonic face average of the finite-volume scheme.
 */
function interfaceFaceValues(ua: number, ub: number, hw: number, hb: number, muW: number, muO: number): { velocity: number; shear: number } {
  const ga = muW / (hw / 2);
  const gb = muO / (hb / 2);
  return { velocity: (ga * ua + gb * ub) / (ga + gb), shear: (ua - ub) / (hw / (2 * muW) + hb / (2 * muO)) };
}

/**
 * Longitudinal groove cell. Throws CellInputError for impossible geometry
 * (non-positive or non-finite lengths, w ≥ P, N < 0) and SolverDivergence on
 * non-convergence.
 *
 * Method: div(μ grad u) = 0 by the finite-volume solver of ../../numerics/cell-diffusion.ts
 * on an edge-graded mesh; μ = μ_w above y = 0, N μ_w in the groove; ridge
 * cells fixed (u = 0 on their faces: no slip), u = 0 on the groove floor,
 * μ_w ∂u/∂y = τ at y = H, periodic in z. The harmonic face conductance makes
 * u and μ ∂u/∂y continuous across the groove mouth; N = 0 gives zero-conductance
 * groove cells, i.e. exactly the natural (zero-stress) condition on the mouth.
 */
export function solveLongitudinalCell(input: GrooveCellInput): GrooveCellResult {
  const cell = resolveInput(input, 200, 48);
  return withExtrapolation(cell, solveLongitudinalOnGrid);
}

/**
 * Runs `solveOnGrid` at the requested resolution and, if asked, at half of it,
 * and combines the slip lengths as b = (4 b_h − b_2h)/3 (Richardson 1911,
 * Phil. Trans. R. Soc. A 210, 307; second order as measured in the tests).
 */
function withExtrapolation(cell: ResolvedCell, solveOnGrid: (cell: ResolvedCell) => GrooveCellResult): GrooveCellResult {
  const fine = solveOnGrid(cell);
  if (!Number.isFinite(fine.slipLength)) throw new SolverDivergence('groove cell produced a non-finite slip length', fine.iterations, fine.residual);
  const coarseResolution = Math.floor(cell.cellsPerPitch / 2);
  if (!cell.extrapolate || coarseResolution < 8) return fine;
  const coarse = solveOnGrid({ ...cell, cellsPerPitch: coarseResolution });
  const extrapolated = (4 * fine.slipLength - coarse.slipLength) / 3;
  if (!Number.isFinite(extrapolated)) return fine;
  return {
    ...fine,
    slipLength: extrapolated,
    slipLengthErrorEstimate: Math.abs(extrapolated - fine.slipLength),
    iterations: fine.iterations + coarse.iterations,
  };
}

function solveLongitudinalOnGrid(cell: ResolvedCell): GrooveCellResult {
  const shearFree = cell.ratio === 0;
  // N = 0: the groove content is irrelevant (zero-conductance cells); two thin rows stand for it.
  const mesh = buildMesh(cell, true, shearFree ? cell.pitch / cell.cellsPerPitch / 4 : cell.depth);
  const nx = mesh.widths.length;
  const ny = mesh.heights.length;
  const coefficient = new Float64Array(nx * ny);
  const fixed = new Uint8Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      if (j >= mesh.interfaceRow) coefficient[c] = cell.waterViscosity;
      else if (i >= mesh.grooveFirst && i <= mesh.grooveLast) coefficient[c] = cell.ratio * cell.waterViscosity;
      else fixed[c] = 1;
    }
  }
  const solution = solveCellDiffusion({
    widths: mesh.widths,
    heights: mesh.heights,
    coefficient,
    fixed,
    bottom: { kind: 'value', value: 0 },
    top: { kind: 'flux', value: cell.shear },
    tolerance: cell.tolerance,
    maxIterations: cell.maxIterations,
  });
  if (!solution.converged) throw new SolverDivergence('longitudinal groove cell did not converge', solution.iterations, solution.residual);
  const u = solution.field;
  const j0 = mesh.interfaceRow;
  const hw = mesh.heights[j0];
  const hTop = mesh.heights[ny - 1];
  // Mean velocity on the top face: the top flux condition makes the half-cell extrapolation exact.
  let topMean = 0;
  let maxVelocity = 0;
  for (let i = 0; i < nx; i++) {
    const top = u[(ny - 1) * nx + i] + (cell.shear / cell.waterViscosity) * (hTop / 2);
    topMean += top * mesh.widths[i];
    maxVelocity = Math.max(maxVelocity, Math.abs(top));
  }
  topMean /= cell.pitch;
  for (let c = 0; c < u.length; c++) maxVelocity = Math.max(maxVelocity, Math.abs(u[c]));
  const slipLength = (topMean * cell.waterViscosity) / cell.shear - cell.height;

  const m = mesh.grooveLast - mesh.grooveFirst + 1;
  const positions = new Float64Array(m);
  const velocity = new Float64Array(m);
  const interfaceShear = new Float64Array(m);
  const waterGradient = new Float64Array(m);
  const muW = cell.waterViscosity;
  const muO = cell.ratio * muW;
  for (let q = 0; q < m; q++) {
    const i = mesh.grooveFirst + q;
    positions[q] = mesh.columnCentres[i];
    const ua = u[j0 * nx + i];
    if (shearFree) {
      velocity[q] = ua;
      interfaceShear[q] = 0;
      waterGradient[q] = 0;
    } else {
      const face = interfaceFaceValues(ua, u[(j0 - 1) * nx + i], hw, mesh.heights[j0 - 1], muW, muO);
      velocity[q] = face.velocity;
      interfaceShear[q] = face.shear;
      waterGradient[q] = face.shear / muW;
    }
  }
  let lubricantFlux = 0;
  for (let j = 0; j < j0 && !shearFree; j++) {
    for (let i = mesh.grooveFirst; i <= mesh.grooveLast; i++) lubricantFlux += u[j * nx + i] * mesh.widths[i] * mesh.heights[j];
  }
  const weights = mesh.widths.slice(mesh.grooveFirst, mesh.grooveLast + 1);
  return summarise('longitudinal', cell, positions, velocity, interfaceShear, waterGradient, weights, {
    slipLength,
    lubricantFlux,
    maxVelocity,
    nx,
    ny,
    unknowns: solution.unknowns,
    iterations: solution.iterations,
    residual: solution.residual,
  });
}

interface SummaryFigures {
  slipLength: number;
  lubricantFlux: number;
  maxVelocity: number;
  nx: number;
  ny: number;
  unknowns: number;
  iterations: number;
  residual: number;
}

/** Width-weighted means over the mouth and the local-slip figures common to both directions. */
function summarise(
  direction: 'longitudinal' | 'transverse',
  cell: ResolvedCell,
  positions: Float64Array,
  velocity: Float64Array,
  interfaceShear: Float64Array,
  waterGradient: Float64Array,
  weights: Float64Array,
  figures: SummaryFigures,
): GrooveCellResult {
  let meanVelocity = 0;
  let meanShear = 0;
  let meanGradient = 0;
  let total = 0;
  for (let q = 0; q < positions.length; q++) {
    const dz = weights[q];
    meanVelocity += velocity[q] * dz;
    meanShear += interfaceShear[q] * dz;
    meanGradient += waterGradient[q] * dz;
    total += dz;
  }
  meanVelocity /= total;
  meanShear /= total;
  meanGradient /= total;
  // The mesh is mirror-symmetric: the groove centre z = 0 is either a sample (odd count) or midway between two.
  const count = positions.length;
  const mid = Math.floor(count / 2);
  const centreVelocity = count % 2 === 1 ? velocity[mid] : 0.5 * (velocity[mid - 1] + velocity[mid]);
  const centreGradient = count % 2 === 1 ? waterGradient[mid] : 0.5 * (waterGradient[mid - 1] + waterGradient[mid]);
  const finiteRatio = (a: number, b: number): number | null => {
    if (cell.ratio === 0 || b === 0) return null;
    const r = a / b;
    return Number.isFinite(r) ? r : null;
  };
  return {
    direction,
    slipLength: figures.slipLength,
    slipLengthFinestGrid: figures.slipLength,
    slipLengthErrorEstimate: 0,
    interfacePositions: positions,
    interfaceVelocity: velocity,
    interfaceShear,
    meanInterfaceVelocity: meanVelocity,
    meanInterfaceShear: meanShear,
    interfacialShearRatio: meanShear / cell.shear,
    localSlipAtCentre: finiteRatio(centreVelocity, centreGradient),
    meanLocalSlip: finiteRatio(meanVelocity, meanGradient),
    lubricantFlux: figures.lubricantFlux,
    maxVelocity: figures.maxVelocity,
    grid: { nx: figures.nx, ny: figures.ny, unknowns: figures.unknowns, domainHeight: cell.height },
    iterations: figures.iterations,
    residual: figures.residual,
    converged: true,
  };
}

/**
 * Transverse groove cell (2-D Stokes). Same error contract as solveLongitudinalCell.
 *
 * Method: staggered (MAC) finite volumes on the same edge-graded mesh, the
 * Stokes system solved by the Uzawa / pressure-Schur-complement conjugate
 * gradient method (see ../../numerics/stokes-cell.ts). The interface y = 0 is flat and
 * impermeable (v = 0 on every face of that line); the tangential velocity u and
 * the stress μ ∂u/∂y are continuous across the mouth through the harmonic face
 * viscosity, as in the longitudinal problem; N = 0 removes the cavity and leaves
 * a zero-stress mouth. No slip on the ridge top, the groove walls and floor;
 * periodic in the flow direction; μ_w ∂u/∂y = τ and v = 0 at y = H.
 */
export function solveTransverseCell(input: GrooveCellInput): GrooveCellResult {
  const cell = resolveInput(input, 400, 32);
  return withExtrapolation(cell, solveTransverseOnGrid);
}

function solveTransverseOnGrid(cell: ResolvedCell): GrooveCellResult {
  const shearFree = cell.ratio === 0;
  const mesh = buildMesh(cell, true, shearFree ? cell.pitch / cell.cellsPerPitch / 4 : cell.depth);
  const flow = solveStokesCell({
    widths: mesh.widths,
    heights: mesh.heights,
    interfaceRow: mesh.interfaceRow,
    grooveFirst: mesh.grooveFirst,
    grooveLast: mesh.grooveLast,
    waterViscosity: cell.waterViscosity,
    lubricantViscosity: cell.ratio * cell.waterViscosity,
    topShear: cell.shear,
    tolerance: cell.tolerance,
    maxIterations: cell.maxIterations,
  });
  if (!flow.converged) throw new SolverDivergence('transverse groove cell (Stokes) did not converge', flow.iterations, flow.residual);
  const nx = mesh.widths.length;
  const ny = mesh.heights.length;
  const { u, v } = flow;
  const muW = cell.waterViscosity;
  const muO = cell.ratio * muW;
  const hTop = mesh.heights[ny - 1];
  // u-nodes sit on the west face of each column; their control widths are the mean of the two columns.
  const faceX = new Float64Array(nx);
  const faceWidth = new Float64Array(nx);
  for (let i = 0; i < nx; i++) {
    faceX[i] = mesh.columnCentres[i] - mesh.widths[i] / 2;
    faceWidth[i] = 0.5 * (mesh.widths[i] + mesh.widths[(i + nx - 1) % nx]);
  }
  let topMean = 0;
  let maxVelocity = 0;
  for (let i = 0; i < nx; i++) {
    const top = u[(ny - 1) * nx + i] + (cell.shear / muW) * (hTop / 2);
    topMean += top * faceWidth[i];
    maxVelocity = Math.max(maxVelocity, Math.abs(top));
  }
  topMean /= cell.pitch;
  for (let c = 0; c < u.length; c++) maxVelocity = Math.max(maxVelocity, Math.abs(u[c]));
  for (let c = 0; c < v.length; c++) maxVelocity = Math.max(maxVelocity, Math.abs(v[c]));
  const slipLength = (topMean * muW) / cell.shear - cell.height;

  // Interface samples: u-faces strictly inside the mouth (the two wall faces carry u = 0).
  const first = mesh.grooveFirst + 1;
  const last = mesh.grooveLast;
  const m = last - first + 1;
  const positions = new Float64Array(m);
  const velocity = new Float64Array(m);
  const interfaceShear = new Float64Array(m);
  const waterGradient = new Float64Array(m);
  const weights = new Float64Array(m);
  const j0 = mesh.interfaceRow;
  const hw = mesh.heights[j0];
  for (let q = 0; q < m; q++) {
    const i = first + q;
    positions[q] = faceX[i];
    weights[q] = faceWidth[i];
    const ua = u[j0 * nx + i];
    if (shearFree) {
      velocity[q] = ua;
    } else {
      const face = interfaceFaceValues(ua, u[(j0 - 1) * nx + i], hw, mesh.heights[j0 - 1], muW, muO);
      velocity[q] = face.velocity;
      interfaceShear[q] = face.shear;
      waterGradient[q] = face.shear / muW;
    }
  }
  // Recirculating flux: largest |ψ| in the cavity, ψ(x, y) = ∫_{−d}^{y} u dy' along each u-face.
  let lubricantFlux = 0;
  if (!shearFree) {
    for (let i = first; i <= last; i++) {
      let psi = 0;
      for (let j = 0; j < j0; j++) {
        psi += u[j * nx + i] * mesh.heights[j];
        lubricantFlux = Math.max(lubricantFlux, Math.abs(psi));
      }
    }
  }
  return summarise('transverse', cell, positions, velocity, interfaceShear, waterGradient, weights, {
    slipLength,
    lubricantFlux,
    maxVelocity,
    nx,
    ny,
    unknowns: flow.unknowns,
    iterations: flow.iterations,
    residual: flow.residual,
  });
}
