/**
 * Field solver for one spanwise period of a grooved, lubricant-filled wall
 * under a uniform far-field shear (the "groove cell").
 *
 * Geometry (all lengths in m): period P in the spanwise coordinate z, groove of
 * width w and depth d below the flat interface y = 0 (|z| < w/2, −d < y < 0),
 * solid elsewhere below y = 0, water above up to y = H where the applied shear
 * τ acts. Viscosity ratio N = μ_lubricant / μ_water.
 *
 * Longitudinal (flow along the grooves): Laplace problem div(μ grad u) = 0,
 * solved with ./cell-diffusion.ts; slip length b_∥ = ū(H) μ_w / τ − H.
 * Transverse (flow across the grooves): 2-D Stokes in water and cavity with a
 * flat no-penetration interface; b_⊥ = ū(H) μ_w / τ − H likewise.
 */

export { solveCellDiffusion, CellInputError } from './cell-diffusion.js';
export type { CellDiffusionProblem, CellDiffusionResult, CellBoundary, CellSides } from './cell-diffusion.js';

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
  /** Grid resolution: cells across one period before edge refinement (default 64). */
  cellsPerPitch?: number;
  /** Cap on the total number of grid cells (default 2e6); exceeded → resolution is reduced. */
  maxCells?: number;
  /** Iteration cap of the linear solver (default 200 for longitudinal; outer cap for transverse). */
  maxIterations?: number;
  /** Relative residual tolerance (default 1e-10). */
  tolerance?: number;
}

export interface GrooveCellResult {
  direction: 'longitudinal' | 'transverse';
  /** Effective slip length b (m) measured from the interface plane y = 0. */
  slipLength: number;
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
  /** Longitudinal: volume flux of lubricant through the groove cross-section, ∫∫ u dA (m³/s). Transverse: recirculating flux in the cavity (m²/s per unit length), 0 for N = 0. */
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

/**
 * Longitudinal groove cell. Throws CellInputError for impossible geometry
 * (non-positive or non-finite lengths, w ≥ P, N < 0) and SolverDivergence on
 * non-convergence.
 */
export function solveLongitudinalCell(input: GrooveCellInput): GrooveCellResult {
  void input;
  throw new Error('solveLongitudinalCell: not implemented yet');
}

/** Transverse groove cell (2-D Stokes). Same error contract as solveLongitudinalCell. */
export function solveTransverseCell(input: GrooveCellInput): GrooveCellResult {
  void input;
  throw new Error('solveTransverseCell: not implemented yet');
}
