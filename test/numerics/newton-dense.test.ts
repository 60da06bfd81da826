import { describe, expect, it } from 'vitest';
import { solveDenseNewton } from '../../src/numerics/newton-dense.js';

describe('dense Newton with a difference Jacobian', () => {
  it('solves x² + y² = 4, x = y to x = y = √2 (exact solution)', () => {
    const r = solveDenseNewton(
      (v, out) => {
        out[0] = v[0] * v[0] + v[1] * v[1] - 4;
        out[1] = v[0] - v[1];
      },
      [1, 3],
    );
    expect(r.converged).toBe(true);
    expect(r.x[0]).toBeCloseTo(Math.SQRT2, 10);
    expect(r.x[1]).toBeCloseTo(Math.SQRT2, 10);
  });
  it('converges quadratically: the residual falls faster than geometrically near the root', () => {
    const r = solveDenseNewton((v, out) => void (out[0] = Math.exp(v[0]) - 2), [2], { tolerance: 1e-14 });
    expect(r.x[0]).toBeCloseTo(Math.LN2, 12);
    const h = r.history;
    expect(h[h.length - 1]).toBeLessThan(1e-13);
    expect(h.length).toBeLessThan(9);
  });
  it('reports failure instead of throwing when there is no root (x² + 1 = 0)', () => {
    const r = solveDenseNewton((v, out) => void (out[0] = v[0] * v[0] + 1), [0.5], { maxIterations: 20 });
    expect(r.converged).toBe(false);
    expect(Number.isFinite(r.residualNorm)).toBe(true);
  });
});
