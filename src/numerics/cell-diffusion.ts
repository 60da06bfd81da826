/**
 * General diffusion solver on one rectangular, x-periodic (or side-bounded) cell:
 *
 *     ∂/∂x (k ∂φ/∂x) + ∂/∂y (k ∂φ/∂y) = s
 *
 * discretised by a cell-centred finite-volume scheme on a tensor-product grid
 * (cell widths in x, cell heights in y, both may be non-uniform) with a
 * per-cell coefficient k ≥ 0 and a per-cell source s. The flux between two
 * cells uses the series (harmonic) conductance of the two half cells,
 * G = A / (Δ₁/(2k₁) + Δ₂/(2k₂)), which is exact for a layered medium and
 * enforces continuity of φ and of the normal flux k ∂φ/∂n across a material
 * interface lying on a cell face (Patankar 1980, Numerical Heat Transfer and
 * Fluid Flow, Hemisphere, §4.2-3).
 *
 * The linear system is symmetric positive definite and is solved by the
 * conjugate-gradient method preconditioned with one symmetric multigrid cycle
 * (see ./multigrid.ts).
 */

/** Condition on the bottom (y = y₀) or top (y = y₀ + Σ heights) edge of the cell. */
export type CellBoundary =
  /** Prescribed normal-direction flux: k ∂φ/∂y = value (y upward, units of k·φ/m). */
  | { kind: 'flux'; value: number }
  /** Prescribed value φ = value on the boundary face itself (not at the first cell centre). */
  | { kind: 'value'; value: number };

/** Treatment of the left/right edges (x = 0 and x = Σ widths). */
export type CellSides = 'periodic' | 'zero-flux' | 'zero-value';

export interface CellDiffusionProblem {
  /** Cell widths in x (m), left to right; nx = widths.length ≥ 1. */
  widths: ArrayLike<number>;
  /** Cell heights in y (m), bottom to top; ny = heights.length ≥ 1. */
  heights: ArrayLike<number>;
  /**
   * Coefficient k per cell (row-major, index j·nx + i, j counted from the bottom), ≥ 0, finite.
   * Units are the caller's (viscosity Pa·s, conductivity W/(m·K)). A cell with k = 0 is
   * a perfect insulator: its faces carry no flux (zero-stress / adiabatic boundary) and its
   * value is reported as 0.
   */
  coefficient: ArrayLike<number>;
  /** Source s per cell (units of k·φ/m²), same indexing; default zero. */
  source?: ArrayLike<number>;
  /**
   * Cells held at φ = 0 (non-zero entry = fixed). The value 0 is imposed on the faces
   * a fixed cell shares with free cells: a no-slip solid wall or an isothermal body lies
   * on the face, at second-order accuracy, not at the fixed cell's centre.
   */
  fixed?: ArrayLike<number | boolean>;
  bottom: CellBoundary;
  top: CellBoundary;
  /** Default 'periodic'. 'zero-value' imposes φ = 0 on the side faces. */
  sides?: CellSides;
  /** Relative residual ‖r‖₂/‖b‖₂ at which the iteration stops (default 1e-10). */
  tolerance?: number;
  /** Iteration cap for the preconditioned CG (default 200). */
  maxIterations?: number;
  /** Optional starting field (length nx·ny). */
  initialGuess?: ArrayLike<number>;
}

export interface CellDiffusionResult {
  /** φ per cell centre, row-major j·nx + i; fixed and k = 0 cells hold 0. */
  field: Float64Array;
  nx: number;
  ny: number;
  /** Number of free unknowns actually solved for. */
  unknowns: number;
  iterations: number;
  /** Final relative residual ‖b − A φ‖₂ / ‖b‖₂. */
  residual: number;
  converged: boolean;
  /** Number of multigrid levels used by the preconditioner. */
  levels: number;
}

/** Raised for inputs that cannot describe a diffusion problem (wrong lengths, negative k, no reference value). */
export class CellInputError extends RangeError {
  readonly field: string;
  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'CellInputError';
    this.field = field;
  }
}

/**
 * Solve div(k grad φ) = s on the cell (see the file header). Never throws for
 * non-convergence: inspect `converged`, `iterations`, `residual`.
 * Throws CellInputError for malformed input or a singular problem (no value
 * boundary, no fixed cell and no zero-value sides: φ defined only up to a constant).
 */
export function solveCellDiffusion(problem: CellDiffusionProblem): CellDiffusionResult {
  void problem;
  throw new Error('solveCellDiffusion: not implemented yet');
}
