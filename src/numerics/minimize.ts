/**
 * One-dimensional minimisation without derivatives: a coarse scan over a
 * grid (to find the basin of the global minimum among several local ones)
 * followed by golden-section refinement inside the bracketing cell (Kiefer
 * 1953, "Sequential minimax search for a maximum", Proc. Amer. Math. Soc. 4(3),
 * 502–506, doi:10.1090/S0002-9939-1953-0055639-3; Press et al. 2007, Numerical Recipes 3rd ed.,
 * §10.2).
 */

export interface MinimumResult {
  /** Abscissa of the minimum. */
  x: number;
  /** f(x) at the minimum. */
  value: number;
  /** Function evaluations spent (scan plus refinement). */
  evaluations: number;
  /** True when the refinement reached its tolerance inside the bracket. */
  converged: boolean;
}

/** 1/φ² with φ the golden ratio: the fraction by which each golden-section step shrinks the bracket. */
const GOLDEN_FRACTION = (3 - Math.sqrt(5)) / 2;

/**
 * Golden-section search for a minimum of a unimodal f on [a, b]. Never throws;
 * `converged` is false when the iteration budget runs out first.
 */
export function goldenSectionMinimum(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { xTolerance?: number; maxIterations?: number } = {},
): MinimumResult {
  const maxIterations = options.maxIterations ?? 200;
  let lo = Math.min(a, b);
  let hi = Math.max(a, b);
  let x1 = lo + GOLDEN_FRACTION * (hi - lo);
  let x2 = hi - GOLDEN_FRACTION * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  let evaluations = 2;
  for (let iter = 0; iter < maxIterations; iter++) {
    const tolerance = options.xTolerance ?? 4 * Number.EPSILON * (Math.abs(x1) + Math.abs(x2)) + 1e-300;
    if (hi - lo <= tolerance) {
      return f1 <= f2 ? { x: x1, value: f1, evaluations, converged: true } : { x: x2, value: f2, evaluations, converged: true };
    }
    if (f1 <= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = lo + GOLDEN_FRACTION * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = hi - GOLDEN_FRACTION * (hi - lo);
      f2 = f(x2);
    }
    evaluations++;
  }
  return f1 <= f2 ? { x: x1, value: f1, evaluations, converged: false } : { x: x2, value: f2, evaluations, converged: false };
}

/**
 * Minimum of f over [a, b]: evaluate on `gridPoints` equally spaced points,
 * then refine by golden section between the neighbours of the best grid point.
 * Finds the global minimum when the grid resolves the basins of f. A best grid
 * point at an end of the interval is returned as is (minimum on the boundary).
 */
export function scanAndRefineMinimum(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { gridPoints?: number; xTolerance?: number; maxIterations?: number } = {},
): MinimumResult {
  const gridPoints = Math.max(3, Math.floor(options.gridPoints ?? 81));
  const step = (b - a) / (gridPoints - 1);
  let best = 0;
  let bestValue = Number.POSITIVE_INFINITY;
  for (let i = 0; i < gridPoints; i++) {
    const value = f(a + i * step);
    if (value < bestValue) {
      bestValue = value;
      best = i;
    }
  }
  if (best === 0 || best === gridPoints - 1) {
    return { x: a + best * step, value: bestValue, evaluations: gridPoints, converged: true };
  }
  const refined = goldenSectionMinimum(f, a + (best - 1) * step, a + (best + 1) * step, options);
  const useRefined = refined.value <= bestValue;
  return {
    x: useRefined ? refined.x : a + best * step,
    value: useRefined ? refined.value : bestValue,
    evaluations: gridPoints + refined.evaluations,
    converged: refined.converged,
  };
}
