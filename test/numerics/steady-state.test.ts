import { describe, expect, it } from 'vitest';
import { solveDense, solveTridiagonalPivoting } from '../../src/numerics/linalg.js';
import { relativeResidual, solveSteadyState, type SteadyStateProblem } from '../../src/numerics/steady-state.js';
import { invertSymmetricToeplitz } from '../../src/numerics/toeplitz.js';

/**
 * Manufactured problem with a known root x*: R(x) = −L(x − x*) + (x³ − x*³), L the zero-flux
 * discrete Laplacian. R(x*) = 0 by construction, J = −L + 3 diag(x²) is positive definite, so the root
 * is unique and the pseudo-time flow dx/dt = −R is stable.
 */
function manufactured(n: number): { problem: SteadyStateProblem; root: Float64Array; evaluated: Float64Array[] } {
  const root = Float64Array.from({ length: n }, (_, i) => 1 + 0.5 * Math.sin((Math.PI * i) / (n - 1)));
  const evaluated: Float64Array[] = [];
  const laplacian = (x: Float64Array, i: number): number => (i > 0 ? x[i - 1] - x[i] : 0) + (i < n - 1 ? x[i + 1] - x[i] : 0);
  const problem: SteadyStateProblem = {
    size: n,
    residual(x, out) {
      evaluated.push(Float64Array.from(x));
      const d = x.map((v, i) => v - root[i]);
      for (let i = 0; i < n; i++) out[i] = -laplacian(d, i) + x[i] ** 3 - root[i] ** 3;
    },
    rowScale(x, out) {
      for (let i = 0; i < n; i++) out[i] = 4 * (Math.abs(x[i]) + Math.abs(root[i])) + Math.abs(x[i]) ** 3 + root[i] ** 3;
    },
    accumulationDerivative(_x, out) {
      out.fill(1);
    },
    solveLinearised(x, shift, rhs) {
      const J = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        if (i > 0) {
          J[i * n + i] += 1;
          J[i * n + i - 1] -= 1;
        }
        if (i < n - 1) {
          J[i * n + i] += 1;
          J[i * n + i + 1] -= 1;
        }
        J[i * n + i] += 3 * x[i] * x[i] + (shift ? shift[i] : 0);
      }
      return solveDense(J, rhs, n);
    },
  };
  return { problem, root, evaluated };
}

const maxError = (a: ArrayLike<number>, b: ArrayLike<number>): number => {
  let e = 0;
  for (let i = 0; i < a.length; i++) e = Math.max(e, Math.abs(a[i] - b[i]));
  return e;
};

describe('steady state: Newton, then pseudo-transient continuation', () => {
  it('Newton from a nearby start reaches the manufactured root x* to 1e-12 (exact by construction)', () => {
    const { problem, root } = manufactured(20);
    const r = solveSteadyState(problem, new Float64Array(20).fill(1));
    expect(r.converged).toBe(true);
    expect(r.method).toBe('newton');
    expect(r.pseudoSteps).toBe(0);
    expect(maxError(r.x, root)).toBeLessThan(1e-12);
    expect(r.residualNorm).toBeLessThanOrEqual(1e-10);
  });
  it('the pseudo-time march alone (no Newton phase) reaches the same root from a far start', () => {
    const { problem, root } = manufactured(20);
    const r = solveSteadyState(problem, new Float64Array(20).fill(30), { maxNewtonIterations: 0, initialPseudoStep: 1e-3 });
    expect(r.converged).toBe(true);
    expect(r.method).toBe('pseudo-transient');
    expect(r.pseudoSteps).toBeGreaterThan(3);
    // relative residual below 1e-10 with a well-conditioned Jacobian: the root to about that accuracy
    expect(maxError(r.x, root)).toBeLessThan(1e-10);
  });
  it('an exhausted budget is reported (converged false, the iteration count), never thrown', () => {
    const { problem } = manufactured(20);
    const r = solveSteadyState(problem, new Float64Array(20).fill(30), { maxNewtonIterations: 1, maxPseudoSteps: 2, initialPseudoStep: 1e-6 });
    expect(r.converged).toBe(false);
    expect(r.iterations).toBeGreaterThan(0);
    expect(r.iterations).toBeLessThanOrEqual(3);
    expect(Number.isFinite(r.residualNorm)).toBe(true);
  });
  it('relativeResidual is the convergence measure: zero at the root, positive elsewhere', () => {
    const { problem, root } = manufactured(10);
    expect(relativeResidual(problem, root)).toBe(0);
    expect(relativeResidual(problem, new Float64Array(10).fill(1))).toBeGreaterThan(1e-3);
  });
  it('a projection keeps every evaluated iterate admissible: ln x = 0 from x = 10, where the plain Newton step lands at −13', () => {
    const evaluated: number[] = [];
    const problem: SteadyStateProblem = {
      size: 1,
      residual(x, out) {
        evaluated.push(x[0]);
        out[0] = Math.log(x[0]);
      },
      rowScale(_x, out) {
        out[0] = 1;
      },
      accumulationDerivative(_x, out) {
        out[0] = 1;
      },
      solveLinearised(x, shift, rhs) {
        return Float64Array.of(rhs[0] / (1 / x[0] + (shift ? shift[0] : 0)));
      },
      project(x, trial) {
        if (trial[0] < 0.1 * x[0]) {
          trial[0] = 0.1 * x[0];
          return true;
        }
        return false;
      },
    };
    const r = solveSteadyState(problem, [10]);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.x[0] - 1)).toBeLessThan(1e-12);
    expect(Math.min(...evaluated)).toBeGreaterThan(0);
  });
});

describe('symmetric Toeplitz inverse (Durbin, then the Trench displacement identity)', () => {
  it('T·T⁻¹ = I to 1e-13 for positive-definite kernels of order 1 to 40 (identity witness)', () => {
    for (const n of [1, 2, 3, 4, 7, 16, 40]) {
      const row = Float64Array.from({ length: n }, (_, k) => (k === 0 ? 3 : (k % 2 ? -1 : 0.5) / (1 + k * k)));
      const B = invertSymmetricToeplitz(row);
      expect(B).not.toBeNull();
      let err = 0;
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          let s = 0;
          for (let k = 0; k < n; k++) s += row[Math.abs(i - k)] * (B as Float64Array)[k * n + j];
          err = Math.max(err, Math.abs(s - (i === j ? 1 : 0)));
        }
      }
      expect(err).toBeLessThan(1e-13);
    }
  });
  it('refuses a matrix that is not positive definite (first row 1, 2: eigenvalues 3 and −1)', () => {
    expect(invertSymmetricToeplitz([1, 2])).toBeNull();
    expect(invertSymmetricToeplitz([1, 0.9, -0.9])).toBeNull();
    expect(invertSymmetricToeplitz([0, 1])).toBeNull();
  });
});

describe('tridiagonal elimination with partial pivoting', () => {
  it('solves systems with zero diagonal entries (no diagonal dominance): residual below 1e-12, equal to the dense solve', () => {
    const n = 9;
    const lower = Float64Array.from({ length: n }, (_, i) => (i === 0 ? 0 : 1 + 0.3 * i));
    const diag = Float64Array.from({ length: n }, (_, i) => (i % 3 === 0 ? 0 : 0.1 * (i - 4)));
    const upper = Float64Array.from({ length: n }, (_, i) => (i === n - 1 ? 0 : 2 - 0.2 * i));
    const rhs = Float64Array.from({ length: n }, (_, i) => Math.cos(i));
    const x = solveTridiagonalPivoting(lower, diag, upper, rhs);
    expect(x).not.toBeNull();
    const xs = x as Float64Array;
    const dense = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      dense[i * n + i] = diag[i];
      if (i > 0) dense[i * n + i - 1] = lower[i];
      if (i < n - 1) dense[i * n + i + 1] = upper[i];
    }
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += dense[i * n + j] * xs[j];
      expect(Math.abs(s - rhs[i])).toBeLessThan(1e-12);
    }
    expect(maxError(xs, solveDense(dense, rhs, n) as Float64Array)).toBeLessThan(1e-12);
  });
  it('returns null for a singular system (rows 1 1 0 / 1 1 0 / 0 1 1)', () => {
    expect(solveTridiagonalPivoting([0, 1, 1], [1, 1, 1], [1, 0, 0], [1, 2, 3])).toBeNull();
  });
});
