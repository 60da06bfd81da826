/**
 * Newton's method for small dense nonlinear systems R(x) = 0 with a
 * forward-difference Jacobian and a backtracking line search on ‖R‖₂
 * (Dennis & Schnabel 1996, Numerical Methods for Unconstrained Optimization
 * and Nonlinear Equations, SIAM, §5.4 finite-difference Jacobian and §6.3
 * backtracking). Never throws: the caller decides what non-convergence means.
 */
import { solveDense } from './linalg.js';

export type ResidualFunction = (x: Float64Array, out: Float64Array) => void;

export interface DenseNewtonOptions {
  /** Converged when ‖R‖∞ ≤ tolerance (default 1e-10). */
  tolerance?: number;
  maxIterations?: number;
  /** Relative finite-difference step (default 1e-7). */
  relativeStep?: number;
  /** Typical magnitude of each unknown, for the difference step (default 1). */
  typicalSize?: ArrayLike<number>;
  /**
   * Also converged when a full Newton step changes no unknown by more than
   * this fraction of its typical size while ‖R‖∞ ≤ 100·tolerance (rounding
   * floor of badly scaled residuals; default 1e-11).
   */
  stepTolerance?: number;
}

export interface DenseNewtonResult {
  x: Float64Array;
  converged: boolean;
  iterations: number;
  /** ‖R(x)‖∞ at the returned point. */
  residualNorm: number;
  /** History of ‖R‖∞, one entry per iterate (the initial guess first). */
  history: number[];
}

function normInf(v: Float64Array): number {
  let m = 0;
  for (let i = 0; i < v.length; i++) {
    const a = Math.abs(v[i]);
    if (!(a <= m)) m = Number.isFinite(a) ? a : Infinity;
  }
  return m;
}

function norm2(v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += v[i] * v[i];
  return Number.isFinite(s) ? Math.sqrt(s) : Infinity;
}

/** Forward-difference Jacobian, row-major n×n. */
export function differenceJacobian(residual: ResidualFunction, x: Float64Array, r0: Float64Array, relativeStep = 1e-7, typicalSize?: ArrayLike<number>): Float64Array {
  const n = x.length;
  const J = new Float64Array(n * n);
  const xp = Float64Array.from(x);
  const rp = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const scale = Math.max(Math.abs(x[j]), typicalSize ? typicalSize[j] : 1);
    const h = relativeStep * scale;
    xp[j] = x[j] + h;
    residual(xp, rp);
    const inv = 1 / (xp[j] - x[j]);
    for (let i = 0; i < n; i++) J[i * n + j] = (rp[i] - r0[i]) * inv;
    xp[j] = x[j];
  }
  return J;
}

export function solveDenseNewton(residual: ResidualFunction, x0: ArrayLike<number>, options: DenseNewtonOptions = {}): DenseNewtonResult {
  const tol = options.tolerance ?? 1e-10;
  const maxIterations = options.maxIterations ?? 50;
  const stepTol = options.stepTolerance ?? 1e-11;
  const n = x0.length;
  let x = Float64Array.from(x0);
  const r = new Float64Array(n);
  residual(x, r);
  let rInf = normInf(r);
  let r2 = norm2(r);
  const history = [rInf];
  if (!Number.isFinite(rInf)) return { x, converged: false, iterations: 0, residualNorm: rInf, history };
  for (let iter = 1; iter <= maxIterations; iter++) {
    if (rInf <= tol) return { x, converged: true, iterations: iter - 1, residualNorm: rInf, history };
    const J = differenceJacobian(residual, x, r, options.relativeStep, options.typicalSize);
    const minusR = new Float64Array(n);
    for (let i = 0; i < n; i++) minusR[i] = -r[i];
    const step = solveDense(J, minusR, n);
    if (!step) return { x, converged: false, iterations: iter, residualNorm: rInf, history };
    let t = 1;
    const trial = new Float64Array(n);
    const rTrial = new Float64Array(n);
    let accepted = false;
    for (let k = 0; k < 30; k++) {
      for (let i = 0; i < n; i++) trial[i] = x[i] + t * step[i];
      residual(trial, rTrial);
      const t2 = norm2(rTrial);
      if (Number.isFinite(t2) && t2 <= (1 - 1e-4 * t) * r2) {
        accepted = true;
        break;
      }
      t *= 0.5;
    }
    if (!accepted) return { x, converged: false, iterations: iter, residualNorm: rInf, history };
    let relStep = 0;
    for (let i = 0; i < n; i++) {
      const scale = Math.max(Math.abs(x[i]), options.typicalSize ? options.typicalSize[i] : 1);
      relStep = Math.max(relStep, Math.abs(t * step[i]) / scale);
    }
    x = Float64Array.from(trial);
    r.set(rTrial);
    rInf = normInf(r);
    r2 = norm2(r);
    history.push(rInf);
    if (relStep <= stepTol && rInf <= 100 * tol) return { x, converged: true, iterations: iter, residualNorm: rInf, history };
  }
  return { x, converged: rInf <= tol, iterations: maxIterations, residualNorm: rInf, history };
}
