/**
 * The edge-graded mesh of one texture period, shared by the groove-cell field
 * solver (slip, ./groove-cell.ts) and the heat model's conduction cell and
 * cross-section (../heat/conduction-field.ts): spanwise columns
 * [ridge half | groove | ridge half] graded towards the groove edges, rows in
 * the groove graded towards its mouth, rows above the interface graded away
 * from it. The fields have a square-root (or stronger) singularity at the
 * groove edges; grading the cells like √r there restores second-order
 * convergence (measured in the tests of both users).
 */

/**
 * Cell sizes for a segment of given length, finest (`fine`) at the start and
 * growing geometrically by `growth` up to `coarse`; rescaled to fit exactly.
 * Why: the velocity has a square-root (longitudinal) or stronger (transverse)
 * singularity at the groove edge, so a graded mesh there buys accuracy cheaply.
 */
export function gradedSegment(length: number, fine: number, coarse: number, growth: number): number[] {
  const sizes: number[] = [];
  let total = 0;
  let h = Math.min(fine, coarse);
  while (total < length) {
    sizes.push(h);
    total += h;
    h = Math.min(coarse, h * growth);
  }
  // Remove the overshoot by scaling, keeping at least two cells.
  if (sizes.length === 1) sizes.push(sizes[0]);
  const scale = length / sizes.reduce((a, b) => a + b, 0);
  return sizes.map((x) => x * scale);
}

/**
 * Cell sizes for a segment of given length graded towards its start by the
 * power map x_k = L (k/m)^q, m = ⌈q L / coarse⌉ (largest cell ≈ coarse, first
 * cell L/m^q). Why: the fields have a square-root (or stronger) singularity
 * at the groove edge; with q = 2 the cell size grows like √r (h(r) ∝ r^(1−1/q)) [derived],
 * and the order this gives is measured in the tests rather than claimed. Graded meshes for such singularities:
 * Babuška, Kellogg & Pitkäranta 1979, Numer. Math. 33, 447–471, doi:10.1007/BF01399326;
 * Schwab 1998, p- and hp-Finite Element Methods, Oxford University Press.
 */
export function powerGradedSegment(length: number, coarse: number, q: number): number[] {
  const m = Math.max(4, Math.ceil((q * length) / coarse));
  const sizes: number[] = [];
  let previous = 0;
  for (let k = 1; k <= m; k++) {
    const x = length * (k / m) ** q;
    sizes.push(x - previous);
    previous = x;
  }
  return sizes;
}

/** The groove-local part of the mesh: spanwise widths, rows in the groove, and the graded rows just above its mouth. */
export interface GrooveLayout {
  /** Column widths over [−P/2, P/2], m. */
  widths: number[];
  /** Columns [grooveFirst, grooveLast] lie in the groove. */
  grooveFirst: number;
  grooveLast: number;
  /** Rows from the groove floor up to the mouth, finest at the mouth, m (empty without the groove). */
  cavity: number[];
  /** Rows from the mouth upward over a few groove widths, finest at the mouth, m. */
  near: number[];
  /** Height the near rows span, m. */
  nearHeight: number;
}

/**
 * The groove-local mesh at spacing h (the largest spanwise cell). Every spacing
 * is proportional to h, so that results on h and 2h can be Richardson-
 * extrapolated; a half-segment shorter than P/8 gets its spacing reduced so that
 * it keeps ≥ P/(8h) cells. The near rows span min(4 × the narrower half-segment,
 * nearHeightLimit).
 */
export function grooveLayout(pitch: number, width: number, depth: number, h: number, nearHeightLimit: number, includeGroove = true): GrooveLayout {
  const halfGroove = width / 2;
  const halfRidge = (pitch - width) / 2;
  const seg = 8;
  const q = 2;
  const grooveCoarse = h * Math.min(1, (seg * halfGroove) / pitch);
  const ridgeCoarse = h * Math.min(1, (seg * halfRidge) / pitch);
  const groove = powerGradedSegment(halfGroove, grooveCoarse, q).reverse(); // 0 → w/2, fine at w/2
  const ridge = powerGradedSegment(halfRidge, ridgeCoarse, q); // w/2 → P/2
  const right = [...groove, ...ridge];
  const left = [...right].reverse();
  const narrow = Math.min(halfGroove, halfRidge);
  const nearHeight = Math.min(4 * narrow, nearHeightLimit);
  const near = powerGradedSegment(nearHeight, Math.min(grooveCoarse, ridgeCoarse), q);
  const cavity = includeGroove ? powerGradedSegment(depth, Math.min(grooveCoarse, ((h * depth) / pitch) * 8), q).reverse() : [];
  return { widths: [...left, ...right], grooveFirst: ridge.length, grooveLast: ridge.length + 2 * groove.length - 1, cavity, near, nearHeight };
}

/** Mesh of the groove cell: the groove layout, then rows growing to h up to y = P and to P/4 beyond, up to the domain height. */
export interface CellMesh {
  widths: Float64Array;
  heights: Float64Array;
  /** z of each column centre. */
  columnCentres: Float64Array;
  /** y of each row centre. */
  rowCentres: Float64Array;
  /** First row above the interface (rows 0 … interfaceRow − 1 lie in the groove). */
  interfaceRow: number;
  /** Columns [grooveFirst, grooveLast] lie in the groove. */
  grooveFirst: number;
  grooveLast: number;
}

export interface CellMeshSpec {
  pitch: number;
  width: number;
  /** Domain height H above the interface, m. */
  height: number;
  cellsPerPitch: number;
  /** Cap on the total number of cells; the spacing grows by 25 % steps until the mesh fits. */
  maxCells: number;
}

export function buildMesh(cell: CellMeshSpec, includeGroove: boolean, depth: number): CellMesh {
  const { pitch, width, height } = cell;
  let base = pitch / cell.cellsPerPitch;
  for (;;) {
    const mesh = meshWithSpacing(base);
    if (mesh.widths.length * mesh.heights.length <= cell.maxCells || base > pitch / 8) return mesh;
    base *= 1.25;
  }

  function meshWithSpacing(h: number): CellMesh {
    const layout = grooveLayout(pitch, width, depth, h, height / 4, includeGroove);
    const widths = Float64Array.from(layout.widths);
    // Above the near rows: geometric growth to h up to y = P and to P/4 beyond: above y ≈ P the disturbance has
    // decayed like exp(−2π y/P) and the linear shear profile is exact on any mesh.
    const { near, nearHeight } = layout;
    const midHeight = Math.max(0, Math.min(pitch, height / 2) - nearHeight);
    const mid = midHeight > 0 ? gradedSegment(midHeight, near[near.length - 1], h, 1.1) : [];
    const far = gradedSegment(height - nearHeight - midHeight, (mid.length ? mid : near)[(mid.length ? mid : near).length - 1], pitch / 4, 1.1);
    const cavity = layout.cavity;
    const heights = Float64Array.from([...cavity, ...near, ...mid, ...far]);
    const columnCentres = new Float64Array(widths.length);
    let z = -pitch / 2;
    for (let i = 0; i < widths.length; i++) {
      columnCentres[i] = z + widths[i] / 2;
      z += widths[i];
    }
    const rowCentres = new Float64Array(heights.length);
    let y = -depth * (includeGroove ? 1 : 0);
    for (let j = 0; j < heights.length; j++) {
      rowCentres[j] = y + heights[j] / 2;
      y += heights[j];
    }
    return { widths, heights, columnCentres, rowCentres, interfaceRow: cavity.length, grooveFirst: layout.grooveFirst, grooveLast: layout.grooveLast };
  }
}
