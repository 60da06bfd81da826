/**
 * Work bounds of the field solvers, known before they start.
 *
 * Every field solve derives its grid from the geometry ratios (w/P, d/w, d/P,
 * the flow height over P), so its cost — cells, memory, iterations — is a
 * function of those ratios that can be evaluated in microseconds. The
 * functions here evaluate it, and each solver's entry calls one of them:
 * within the bounds the solve runs (on a grid that may be shortened where the
 * field has decayed, see below); beyond them the caller gets a
 * {@link WorkLimitError} (HTTP 422) that names the field and the limit, or —
 * where the endpoint has a cheaper accurate alternative — a result from that
 * alternative with a warning. The same bounds hold in the worker pool, inline
 * and in the CLI, because they are part of the physics.
 *
 * The bounds (why these numbers: DEVELOPERS.md, "Work bounds"):
 * - groove cell (slip field solver): ≤ {@link GROOVE_CELL_LIMITS.maxCells}
 *   cells per grid, w/P within [{@link GROOVE_CELL_LIMITS.minInterfaceFraction},
 *   1 − that], and the groove cut at {@link GROOVE_CELL_LIMITS.resolvedDepthInWidths}
 *   widths deep (deeper fluid is at rest to within exp(−π·4) ≈ 3.5e-6 of the
 *   mouth velocity along the grooves, and beyond the third corner eddy across
 *   them, so the slip does not change; checked in test/physics/solver-budget.test.ts);
 * The other field solvers are bounded by construction, whatever the geometry
 * (DEVELOPERS.md, "Work bounds"): the heat grids have at most about 80
 * columns and a number of rows that grows with the logarithm of H/P (about
 * 44 000 cells at the extremes the schema admits) and a sweep runs at most 25
 * field points; the surfactant interface solver uses 256–320 cells per
 * period; the drainage timeline has a step budget.
 */
import { DomainError } from '../../core/errors.js';

/** Input that would need more work than the service allows; mapped to 422 naming the field and the limit. */
export class WorkLimitError extends DomainError {
  /** The bound that was exceeded, in words a caller can act on. */
  readonly limit: string;
  constructor(message: string, options: { field: string; limit: string }) {
    super(message, { field: options.field, code: 'over-work-limit' });
    this.name = 'WorkLimitError';
    this.limit = options.limit;
  }
}

export const GROOVE_CELL_LIMITS = {
  /** Largest grid (cells) of one groove-cell solve; the transverse Stokes solve has about 3 unknowns per cell. */
  maxCells: 120_000,
  /** Narrowest groove (and ridge) relative to the pitch that the edge-graded grid resolves. */
  minInterfaceFraction: 0.01,
  /** Groove depth, in groove widths, beyond which the cell is cut (the field there has decayed). */
  resolvedDepthInWidths: 4,
} as const;

/** Sizes of cells growing by `growth` from `fine` to `coarse`, then uniform, over `length` (count only). */
function gradedCount(length: number, fine: number, coarse: number, growth: number): { count: number; last: number } {
  let total = 0;
  let count = 0;
  let h = Math.min(fine, coarse);
  while (total < length && h < coarse) {
    total += h;
    count++;
    h = Math.min(coarse, h * growth);
  }
  if (total < length) count += Math.ceil((length - total) / coarse);
  return { count: Math.max(count, 2), last: count > 0 ? Math.min(h, coarse) : coarse };
}

/** Cells of a segment of `length` graded towards one end by x = L (k/m)², largest cell ≈ `coarse`. */
function powerGradedCount(length: number, coarse: number): number {
  const m = Math.ceil((2 * length) / coarse);
  return Number.isFinite(m) ? Math.max(4, m) : Number.POSITIVE_INFINITY;
}

export interface GrooveCellGeometry {
  pitch: number;
  grooveWidth: number;
  grooveDepth: number;
  /** Largest spanwise cell is P / cellsPerPitch. */
  cellsPerPitch: number;
  /** Height of the water layer above the interface, m. */
  domainHeight: number;
}

/**
 * Grid size (columns × rows) of the edge-graded groove-cell mesh of
 * src/numerics/groove-cell.ts, counted without building it. Mirrors that
 * mesh's segments: half groove and half ridge graded by x = L (k/m)², the
 * near-wall rows likewise over four widths of the narrower segment, growth by
 * 1.1 to the base spacing up to y = P and to P/4 beyond, and the cavity graded
 * towards the mouth. The test compares it with the grids the solver reports.
 */
export function grooveCellGridSize(geometry: GrooveCellGeometry): { columns: number; rows: number; cells: number } {
  const { pitch, grooveWidth, grooveDepth, cellsPerPitch, domainHeight } = geometry;
  const h = pitch / cellsPerPitch;
  const halfGroove = grooveWidth / 2;
  const halfRidge = (pitch - grooveWidth) / 2;
  const grooveCoarse = h * Math.min(1, (8 * halfGroove) / pitch);
  const ridgeCoarse = h * Math.min(1, (8 * halfRidge) / pitch);
  const columns = 2 * (powerGradedCount(halfGroove, grooveCoarse) + powerGradedCount(halfRidge, ridgeCoarse));
  const nearHeight = Math.min(4 * Math.min(halfGroove, halfRidge), domainHeight / 4);
  const nearCoarse = Math.min(grooveCoarse, ridgeCoarse);
  const near = powerGradedCount(nearHeight, nearCoarse);
  const nearLast = nearHeight * (1 - ((near - 1) / near) ** 2);
  const midHeight = Math.max(0, Math.min(pitch, domainHeight / 2) - nearHeight);
  const mid = midHeight > 0 ? gradedCount(midHeight, nearLast, h, 1.1) : { count: 0, last: nearLast };
  const far = gradedCount(domainHeight - nearHeight - midHeight, mid.last, pitch / 4, 1.1);
  const cavity = powerGradedCount(grooveDepth, Math.min(grooveCoarse, ((h * grooveDepth) / pitch) * 8));
  const rows = cavity + near + mid.count + far.count;
  return { columns, rows, cells: columns * rows };
}

export interface GrooveCellPlan {
  /** Depth the cell is solved with: the groove depth, or the depth at which the field has decayed. */
  solvedDepth: number;
  /** Cells of the finer of the two grids (the coarser, used for extrapolation, has about a quarter). */
  cells: { longitudinal: number; transverse: number };
}

/**
 * Plan of one groove-cell slip solve (both directions), or a WorkLimitError
 * naming the texture field and the limit when the geometry is beyond what the
 * grid resolves within {@link GROOVE_CELL_LIMITS}.
 * @param geometry pitch P, groove width w and depth d (m); resolutions along
 *   (default 48) and across (default 32) the grooves; water height (default 4P)
 */
export function planGrooveCellSolve(geometry: {
  pitch: number;
  grooveWidth: number;
  grooveDepth: number;
  cellsPerPitch?: number;
  domainHeight?: number;
}): GrooveCellPlan {
  const { pitch, grooveWidth, grooveDepth } = geometry;
  const fraction = grooveWidth / pitch;
  const { minInterfaceFraction, resolvedDepthInWidths, maxCells } = GROOVE_CELL_LIMITS;
  if (!(fraction >= minInterfaceFraction)) {
    throw new WorkLimitError(
      `groove width over pitch w/P = ${fraction.toPrecision(3)} is below ${minInterfaceFraction}: the field solver's grid cannot resolve so narrow a groove; use method "closed-form"`,
      { field: 'texture.grooveWidth', limit: `w/P ≥ ${minInterfaceFraction}` },
    );
  }
  if (!(fraction <= 1 - minInterfaceFraction)) {
    throw new WorkLimitError(
      `groove width over pitch w/P = ${fraction.toPrecision(3)} is above ${1 - minInterfaceFraction}: the field solver's grid cannot resolve so narrow a ridge; use method "closed-form"`,
      { field: 'texture.grooveWidth', limit: `w/P ≤ ${1 - minInterfaceFraction}` },
    );
  }
  const solvedDepth = Math.min(grooveDepth, resolvedDepthInWidths * grooveWidth);
  const domainHeight = Math.max(2 * pitch, geometry.domainHeight ?? 4 * pitch);
  const size = (defaultCells: number) =>
    grooveCellGridSize({ pitch, grooveWidth, grooveDepth: solvedDepth, cellsPerPitch: geometry.cellsPerPitch ?? defaultCells, domainHeight }).cells;
  const cells = { longitudinal: size(48), transverse: size(32) };
  const largest = Math.max(cells.longitudinal, cells.transverse);
  if (!(largest <= maxCells)) {
    throw new WorkLimitError(
      `the groove-cell grid for this texture would have ${largest.toPrecision(3)} cells, over the limit of ${maxCells}; use method "closed-form" or a coarser grid`,
      { field: 'texture', limit: `${maxCells} cells` },
    );
  }
  return { solvedDepth, cells };
}
