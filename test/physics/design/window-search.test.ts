/**
 * The adaptive window search on regions whose membership is known exactly
 * (geometry, our own construction): every lattice point must get its true
 * label, at a cost well below evaluating every candidate.
 */
import { describe, expect, it } from 'vitest';
import { FEASIBLE, searchWindow, type SearchDimension } from '../../../src/physics/design/window-search.js';

const box: SearchDimension[] = [
  { name: 'x', min: 1e-6, max: 1e-3, scale: 'log' },
  { name: 'y', min: 0.1, max: 0.9, scale: 'linear' },
];
/** A disk in (log10 x, y): feasible inside, "far" outside to the right, "low" elsewhere. */
function truth(p: readonly number[]): string {
  const u = Math.log10(p[0]!) + 4.5;
  const v = (p[1]! - 0.5) * 4;
  if (u * u + v * v < 1) return FEASIBLE;
  return u > 0 ? 'far' : 'low';
}

describe('adaptive window search', () => {
  it('labels every lattice point as the exact region does, evaluating a minority of the candidates', async () => {
    let calls = 0;
    const result = await searchWindow(box, { coarsePoints: 9, refinements: 3 }, (points) => {
      calls += points.length;
      return points.map((p) => ({ label: truth(p) }));
    });
    expect(result.candidates).toBe(65 * 65);
    let wrong = 0;
    result.values[0]!.forEach((x, i) =>
      result.values[1]!.forEach((y, j) => {
        if (result.labels[i * 65 + j] !== truth([x, y])) wrong++;
      }),
    );
    expect(wrong).toBe(0);
    expect(calls).toBe(result.evaluated.length);
    // Cost follows the boundary: far fewer evaluations than candidates.
    expect(result.evaluated.length).toBeLessThan(0.4 * result.candidates);
  });

  it('a fixed dimension is one lattice point; refinement 0 is the plain coarse grid', async () => {
    const fixed = await searchWindow([box[0]!, { name: 'y', min: 0.5, max: 0.5, scale: 'linear' }], { coarsePoints: 5, refinements: 0 }, (points) => points.map((p) => ({ label: truth(p) })));
    expect(fixed.pointsPerDimension).toEqual([5, 1]);
    expect(fixed.evaluated).toHaveLength(5);
  });

  it('the cost grows with the boundary, not the volume: one more refinement roughly doubles the evaluations in 2-D (4× the candidates)', async () => {
    const count = async (refinements: number) => (await searchWindow(box, { coarsePoints: 9, refinements }, (points) => points.map((p) => ({ label: truth(p) })))).evaluated.length;
    const [a, b] = [await count(3), await count(4)];
    expect(b / a).toBeLessThan(2.6);
  });
});
