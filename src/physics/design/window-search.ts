/**
 * Adaptive search of a design window: which points of a box of candidate
 * designs satisfy every requirement, found at a cost that grows with the
 * boundary of the feasible region rather than with its volume.
 *
 * The candidates are the points of a regular lattice over the box (log or
 * linear in each dimension), (m − 1)·2^L + 1 points per dimension. The coarse
 * lattice (every 2^L-th point) is evaluated first. A cell whose corners do not
 * all carry the same label (feasible, or the requirement that limits them) is
 * a boundary cell: it is split in two along every dimension and the new
 * lattice points are evaluated; L times, down to the finest lattice. A
 * candidate never evaluated lies inside a cell whose corners all carry one
 * label and takes that label. This is the usual adaptive refinement of a
 * classification boundary (our implementation); like any sampling it can miss
 * a feasible island smaller than a coarse cell, which is why the coarse
 * lattice is a request parameter.
 */

/** One searched dimension of the box. */
export interface SearchDimension {
  name: string;
  min: number;
  max: number;
  /** Log spacing for lengths that span decades, linear for fractions. */
  scale: 'log' | 'linear';
}

export interface SearchSettings {
  /** Coarse lattice points per dimension (≥ 2). */
  coarsePoints: number;
  /** Halvings of the coarse step at the boundary. */
  refinements: number;
}

/** What the evaluation of one candidate gave: a label ("feasible" or the limiting requirement) and anything else. */
export interface Labelled {
  label: string;
}

export interface SearchResult<T extends Labelled> {
  /** Lattice points per dimension at the finest level. */
  pointsPerDimension: number[];
  /** The value of each lattice index, per dimension. */
  values: number[][];
  /** Every evaluated candidate: its lattice indices, values and outcome. */
  evaluated: { indices: number[]; point: number[]; outcome: T }[];
  /** Label of every lattice point (flat, last dimension fastest): evaluated, or inferred from its uniform cell. */
  labels: string[];
  /** Candidates in the box (lattice points). */
  candidates: number;
}

export const FEASIBLE = 'feasible';

function latticeValues(d: SearchDimension, n: number): number[] {
  if (n === 1 || d.min === d.max) return Array.from({ length: n }, () => d.min);
  return Array.from({ length: n }, (_, k) => {
    if (k === 0) return d.min;
    if (k === n - 1) return d.max;
    const t = k / (n - 1);
    return d.scale === 'log' ? Math.exp(Math.log(d.min) + t * (Math.log(d.max) - Math.log(d.min))) : d.min + t * (d.max - d.min);
  });
}

/**
 * Search the box. `evaluate` gets a batch of candidate points (each a value per dimension) and returns their
 * outcomes in the same order; batches let a caller spread the work over threads.
 */
export async function searchWindow<T extends Labelled>(
  dimensions: readonly SearchDimension[],
  settings: SearchSettings,
  evaluate: (points: number[][]) => Promise<T[]> | T[],
): Promise<SearchResult<T>> {
  const D = dimensions.length;
  // A fixed dimension (min = max) is one lattice point wide.
  const fixed = dimensions.map((d) => d.min === d.max);
  const top = 2 ** settings.refinements;
  const n = dimensions.map((_, a) => (fixed[a] ? 1 : (settings.coarsePoints - 1) * top + 1));
  const values = dimensions.map((d, a) => latticeValues(d, n[a]!));
  const strides = n.map((_, a) => n.slice(a + 1).reduce((p, x) => p * x, 1));
  const flat = (idx: readonly number[]) => idx.reduce((f, i, a) => f + i * strides[a]!, 0);
  const outcomes = new Map<number, T>();
  const evaluated: SearchResult<T>['evaluated'] = [];

  async function ensure(points: number[][]): Promise<void> {
    const fresh = new Map<number, number[]>();
    for (const idx of points) {
      const key = flat(idx);
      if (!outcomes.has(key) && !fresh.has(key)) fresh.set(key, idx);
    }
    if (fresh.size === 0) return;
    const list = [...fresh.values()];
    const results = await evaluate(list.map((idx) => idx.map((i, a) => values[a]![i]!)));
    list.forEach((idx, k) => {
      outcomes.set(flat(idx), results[k]!);
      evaluated.push({ indices: idx, point: idx.map((i, a) => values[a]![i]!), outcome: results[k]! });
    });
  }

  /** Lattice points of the box from `lo` (inclusive) to `hi` (inclusive) with `step` (fixed dimensions: their one point). */
  function lattice(lo: readonly number[], hi: readonly number[], step: number): number[][] {
    let out: number[][] = [[]];
    for (let a = 0; a < D; a++) {
      const s = fixed[a] ? 1 : step;
      const next: number[][] = [];
      for (const prefix of out) for (let i = lo[a]!; i <= hi[a]!; i += s) next.push([...prefix, i]);
      out = next;
    }
    return out;
  }

  /** Corners of the cell at `lo` with edge `step`. */
  const corners = (lo: readonly number[], step: number) => lattice(lo, lo.map((i, a) => (fixed[a] ? i : i + step)), step);
  const uniform = (lo: readonly number[], step: number) => new Set(corners(lo, step).map((c) => outcomes.get(flat(c))!.label)).size === 1;

  let step = top;
  await ensure(lattice(n.map(() => 0), n.map((x) => x - 1), step));
  let cells = lattice(n.map(() => 0), n.map((x, a) => (fixed[a] ? 0 : x - 1 - step)), step);
  const settled: { lo: number[]; step: number }[] = [];
  while (step > 1) {
    const boundary: number[][] = [];
    for (const lo of cells) {
      if (uniform(lo, step)) settled.push({ lo, step });
      else boundary.push(lo);
    }
    const half = step / 2;
    await ensure(boundary.flatMap((lo) => lattice(lo, lo.map((i, a) => (fixed[a] ? i : i + step)), half)));
    cells = boundary.flatMap((lo) => lattice(lo, lo.map((i, a) => (fixed[a] ? i : i + half)), half));
    step = half;
  }
  // Cells of the finest level need no inference: all their points are evaluated.
  const labels = new Array<string>(n.reduce((p, x) => p * x, 1));
  for (const { lo, step: s } of settled) {
    const label = outcomes.get(flat(lo))!.label;
    for (const idx of lattice(lo, lo.map((i, a) => (fixed[a] ? i : i + s)), 1)) labels[flat(idx)] = label;
  }
  for (const [key, outcome] of outcomes) labels[key] = outcome.label;
  return { pointsPerDimension: n, values, evaluated, labels, candidates: labels.length };
}
