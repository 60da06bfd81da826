import { describe, expect, it } from 'vitest';
import { goldenSectionMinimum, scanAndRefineMinimum } from '../../src/numerics/minimize.js';

describe('one-dimensional minimisation', () => {
  it('golden section finds the vertex of (x − 2)² + 1 (exact solution)', () => {
    const r = goldenSectionMinimum((x) => (x - 2) ** 2 + 1, 0, 5);
    expect(r.converged).toBe(true);
    expect(r.x).toBeCloseTo(2, 7); // a quadratic minimum is located to ~√ε
    expect(r.value).toBeCloseTo(1, 14);
  });

  it('scan and refine picks the global minimum of cos 3x + 0.1(x − π)² at x = π, value −1 (exact: both terms at their least), not the side minima', () => {
    const f = (x: number) => Math.cos(3 * x) + 0.1 * (x - Math.PI) ** 2;
    const r = scanAndRefineMinimum(f, 0, 2 * Math.PI, { gridPoints: 41 });
    expect(r.x).toBeCloseTo(Math.PI, 7);
    expect(r.value).toBeCloseTo(-1, 13);
    // golden section alone on the whole interval can land in a side basin
    expect(goldenSectionMinimum(f, 0, 2 * Math.PI).x).not.toBeCloseTo(Math.PI, 2);
  });

  it('a minimum on the boundary is returned at the boundary (monotonic e^x on [0, 1])', () => {
    const r = scanAndRefineMinimum(Math.exp, 0, 1);
    expect(r.x).toBe(0);
    expect(r.value).toBe(1);
  });
});
