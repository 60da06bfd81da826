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
 * interface lying on a cell face ([derived]: the two half cells conduct in
 * series; the finite-volume setting is that of Patankar 1980, Numerical Heat
 * Transfer and Fluid Flow, Hemisphere).
 *
 * The linear system is symmetric positive definite and is solved by the
 * conjugate-gradient method preconditioned with one symmetric multigrid cycle
 * (see ./multigrid.ts): 8–9 iterations from 32² to 512² cells on the Poisson
 * duct (bench/field-solver.ts), cost ∝ unknowns^≈1.
 *
 * Conventions: row-major index c = j·nx + i, j = 0 the bottom row; x periodic by
 * default. A fixed cell imposes φ = 0 on its faces (a wall on the face); a
 * 'value' edge imposes φ on the edge itself; cells with k = 0 are insulators.
 * At least one value edge, fixed cell or 'zero-value' side is required.
 *
 * Typical uses:
 * - Conduction across a textured wall: k per cell = water / lubricant / solid
 *   conductivity (solid substrate of any thickness simply as rows of solid k),
 *   bottom { kind: 'value' } (isothermal back face), top { kind: 'flux' }.
 * - Laminar fully developed duct cross-section: velocity from k = μ,
 *   s = dp/dx (< 0 for flow in +x), solid cells fixed (no slip), walls as
 *   'value' edges or sides 'zero-value'; then temperature with k = conductivity,
 *   s = ρ c_p u dT/dx (uniform axial heating), reusing the velocity field.
 * - Non-zero wall values: solve for φ − φ_wall, or use 'value' edges (fixed cells
 *   are always at 0).
 */

import { MultigridPreconditioner, solvePcg, type FivePointOperator } from './multigrid.js';

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
  const { op, rhs } = assembleCellDiffusion(problem);
  const { nx, ny } = op;
  const field = new Float64Array(nx * ny);
  if (problem.initialGuess) {
    if (problem.initialGuess.length !== nx * ny) throw new CellInputError('initialGuess', `length must be nx·ny = ${nx * ny}`);
    for (let c = 0; c < nx * ny; c++) {
      const v = problem.initialGuess[c];
      field[c] = Number.isFinite(v) ? v : 0;
    }
  }
  const tolerance = problem.tolerance ?? 1e-10;
  const maxIterations = problem.maxIterations ?? 200;
  if (!(tolerance > 0) || !Number.isFinite(tolerance)) throw new CellInputError('tolerance', 'must be a positive number');
  if (!(maxIterations >= 1)) throw new CellInputError('maxIterations', 'must be ≥ 1');
  const preconditioner = new MultigridPreconditioner(op);
  const pcg = solvePcg(op, rhs, field, preconditioner, tolerance, Math.floor(maxIterations));
  let unknowns = 0;
  for (let c = 0; c < nx * ny; c++) unknowns += op.active[c];
  for (let c = 0; c < nx * ny; c++) if (!Number.isFinite(field[c])) field[c] = 0;
  return { field, nx, ny, unknowns, iterations: pcg.iterations, residual: pcg.residual, converged: pcg.converged, levels: preconditioner.depth };
}

/**
 * Assemble the finite-volume operator and right-hand side (exported for the
 * Stokes solver and for tests). Equation per free cell c:
 * Σ_nb G (φ_c − φ_nb) + G_D φ_c = b_c, b_c = −s_c V_c + boundary terms.
 */
export function assembleCellDiffusion(problem: CellDiffusionProblem): { op: FivePointOperator; rhs: Float64Array } {
  const nx = problem.widths.length;
  const ny = problem.heights.length;
  if (nx < 1) throw new CellInputError('widths', 'need at least one cell');
  if (ny < 1) throw new CellInputError('heights', 'need at least one cell');
  const widths = Float64Array.from(problem.widths);
  const heights = Float64Array.from(problem.heights);
  for (const [name, a] of [['widths', widths], ['heights', heights]] as const) {
    for (let k = 0; k < a.length; k++) {
      if (!(a[k] > 0) || !Number.isFinite(a[k])) throw new CellInputError(name, `entry ${k} must be a positive finite length`);
    }
  }
  const n = nx * ny;
  if (problem.coefficient.length !== n) throw new CellInputError('coefficient', `length must be nx·ny = ${n}`);
  if (problem.source && problem.source.length !== n) throw new CellInputError('source', `length must be nx·ny = ${n}`);
  if (problem.fixed && problem.fixed.length !== n) throw new CellInputError('fixed', `length must be nx·ny = ${n}`);
  const k = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    const v = problem.coefficient[c];
    if (!(v >= 0) || !Number.isFinite(v)) throw new CellInputError('coefficient', `entry ${c} must be finite and ≥ 0`);
    k[c] = v;
  }
  const sides: CellSides = problem.sides ?? 'periodic';
  const periodicX = sides === 'periodic';
  for (const [name, bc] of [['bottom', problem.bottom], ['top', problem.top]] as const) {
    if (!bc || (bc.kind !== 'flux' && bc.kind !== 'value') || !Number.isFinite(bc.value)) {
      throw new CellInputError(name, "must be { kind: 'flux' | 'value', value: finite number }");
    }
  }
  const free = new Uint8Array(n);
  for (let c = 0; c < n; c++) free[c] = k[c] > 0 && !(problem.fixed && problem.fixed[c]) ? 1 : 0;
  const isFixed = (c: number): boolean => Boolean(problem.fixed && problem.fixed[c]);

  const west = new Float64Array(n);
  const south = new Float64Array(n);
  const diagonal = new Float64Array(n);
  const rhs = new Float64Array(n);
  let dirichlet = 0;
  // Faces between x-neighbours (west face of cell (i, j)).
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      let w: number;
      if (i > 0) w = c - 1;
      else if (periodicX && nx > 1) w = c + nx - 1;
      else {
        if (free[c] && sides === 'zero-value') {
          const g = (heights[j] * k[c]) / (widths[i] / 2);
          diagonal[c] += g;
          dirichlet += g;
        }
        continue;
      }
      const iw = i > 0 ? i - 1 : nx - 1;
      faceCoupling(c, w, heights[j], widths[i], widths[iw], west);
    }
    if (sides === 'zero-value') {
      const c = j * nx + nx - 1;
      if (free[c]) {
        const g = (heights[j] * k[c]) / (widths[nx - 1] / 2);
        diagonal[c] += g;
        dirichlet += g;
      }
    }
  }
  for (let j = 1; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      faceCoupling(c, c - nx, widths[i], heights[j], heights[j - 1], south);
    }
  }
  // Top and bottom boundaries.
  for (const [edge, j, sign] of [['bottom', 0, -1], ['top', ny - 1, 1]] as const) {
    const bc = edge === 'bottom' ? problem.bottom : problem.top;
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      if (!free[c]) continue;
      if (bc.kind === 'value') {
        const g = (widths[i] * k[c]) / (heights[j] / 2);
        diagonal[c] += g;
        rhs[c] += g * bc.value;
        dirichlet += g;
      } else {
        rhs[c] += sign * bc.value * widths[i];
      }
    }
  }
  if (problem.source) {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = j * nx + i;
        const s = problem.source[c];
        if (!Number.isFinite(s)) throw new CellInputError('source', `entry ${c} must be finite`);
        if (free[c]) rhs[c] -= s * widths[i] * heights[j];
      }
    }
  }
  // Cells with no coupling at all (isolated by insulating cells) carry no equation.
  for (let c = 0; c < n; c++) if (free[c] && !(diagonal[c] > 0)) free[c] = 0;
  if (!(dirichlet > 0)) {
    throw new CellInputError('bottom', 'the problem fixes φ nowhere (no value boundary, no fixed cell touching a free cell): φ is undetermined');
  }
  return { op: { nx, ny, periodicX, west, south, diagonal, active: free }, rhs };

  /** Conductance across the face between c and its neighbour nb (face length L, cell extents dc, dnb normal to the face). */
  function faceCoupling(c: number, nb: number, length: number, dc: number, dnb: number, store: Float64Array): void {
    if (free[c] && free[nb]) {
      const g = length / (dc / (2 * k[c]) + dnb / (2 * k[nb]));
      store[c] = g;
      diagonal[c] += g;
      diagonal[nb] += g;
    } else if (free[c] && isFixed(nb)) {
      const g = (length * k[c]) / (dc / 2);
      diagonal[c] += g;
      dirichlet += g;
    } else if (free[nb] && isFixed(c)) {
      const g = (length * k[nb]) / (dnb / 2);
      diagonal[nb] += g;
      dirichlet += g;
    }
  }
}
