import { describe, expect, it } from 'vitest';
import { brent, safeNewton, expandBracket } from '../../src/numerics/roots.js';
import { sumOdd, compensatedSum } from '../../src/numerics/series.js';
import { adaptiveQuadrature, gaussLegendre } from '../../src/numerics/quadrature.js';
import { solveDense, solveTridiagonal } from '../../src/numerics/linalg.js';

describe('root finding', () => {
  it('Brent finds √2 to machine precision (exact solution)', () => {
    const r = brent((x) => x * x - 2, 0, 2);
    expect(r.converged).toBe(true);
    expect(r.root).toBeCloseTo(Math.SQRT2, 15);
  });
  it('Brent reports an invalid bracket instead of throwing', () => {
    expect(brent((x) => x * x + 1, -1, 1).converged).toBe(false);
  });
  it('Dottie number cos x = x: 0.7390851332151607 (exact fixed point, OEIS A003957)', () => {
    const r = safeNewton((x) => ({ value: Math.cos(x) - x, derivative: -Math.sin(x) - 1 }), 0, 1, 0.5);
    expect(r.root).toBeCloseTo(0.7390851332151607, 15);
  });
  it('bracket expansion finds a sign change', () => {
    const b = expandBracket((x) => x - 100, 0, 1);
    expect(b).not.toBeNull();
    expect(b![0] <= 100 && b![1] >= 100).toBe(true);
  });
});

describe('series', () => {
  it('Σ_odd 1/n⁴ = π⁴/96 (exact, Euler)', () => {
    expect(sumOdd((n) => 1 / n ** 4, { decayPower: 4 }).sum).toBeCloseTo(Math.PI ** 4 / 96, 14);
  });
  it('Σ_odd tanh(nπ/2)/n³ = π³/32 (exact lattice-sum identity)', () => {
    expect(sumOdd((n) => Math.tanh((n * Math.PI) / 2) / n ** 3, { decayPower: 3 }).sum).toBeCloseTo(Math.PI ** 3 / 32, 13);
  });
  it('compensated sum keeps small terms (exact arithmetic)', () => {
    expect(compensatedSum([1, 1e-16, 1e-16, -1])).toBeCloseTo(2e-16, 30);
  });
});

describe('quadrature', () => {
  it('∫₀^π sin = 2 (exact)', () => {
    expect(gaussLegendre(Math.sin, 0, Math.PI, 20)).toBeCloseTo(2, 14);
    expect(adaptiveQuadrature(Math.sin, 0, Math.PI).value).toBeCloseTo(2, 13);
  });
  it('∫₀¹ √x = 2/3 (exact) with an endpoint singularity in the derivative', () => {
    const r = adaptiveQuadrature(Math.sqrt, 0, 1, { relativeTolerance: 1e-10 });
    expect(r.value).toBeCloseTo(2 / 3, 9);
  });
});

describe('linear algebra', () => {
  it('dense LU solves a pivoting-requiring system (exact solution [1,2,3])', () => {
    const a = [0, 2, 1, 1, 1, 1, 2, 1, 3];
    const x = solveDense(a, [7, 6, 13], 3)!;
    expect(Array.from(x).map((v) => Math.round(v * 1e12) / 1e12)).toEqual([1, 2, 3]);
  });
  it('singular matrix returns null', () => {
    expect(solveDense([1, 2, 2, 4], [1, 2], 2)).toBeNull();
  });
  it('tridiagonal solve of the 1-D Poisson matrix reproduces x(1−x)/2 (exact for the 3-point stencil)', () => {
    const n = 9;
    const h = 1 / (n + 1);
    const x = solveTridiagonal(new Array(n).fill(-1), new Array(n).fill(2), new Array(n).fill(-1), new Array(n).fill(h * h));
    for (let i = 0; i < n; i++) {
      const xi = (i + 1) * h;
      expect(x[i]).toBeCloseTo((xi * (1 - xi)) / 2, 13);
    }
  });
});
