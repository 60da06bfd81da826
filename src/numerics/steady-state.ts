/**
 * Steady state of a discretised conservation law R(x) = 0 (R = flux
 * divergence minus sources, one row per cell): Newton's method with a
 * backtracking line search, and pseudo-transient continuation when Newton
 * alone does not converge.
 *
 * Pseudo-transient continuation (ΨTC) follows the time evolution
 * dm(x)/dt + R(x) = 0 of the conserved content m with one linearly implicit
 * Euler step per pseudo time step, (diag(m'(x))/Δt + J(x)) δ = −R(x), and the
 * switched-evolution-relaxation rule Δt_{n+1} = Δt_n‖R_{n−1}‖/‖R_n‖, so the
 * iteration starts as a damped, physically ordered time march and ends as
 * Newton's method (Kelley, C. T. & Keyes, D. E. 1998, Convergence analysis
 * of pseudo-transient continuation, SIAM J. Numer. Anal. 35, 508–523,
 * doi:10.1137/S0036142996304796; Mulder, W. A. & van Leer, B. 1985,
 * Experiments with implicit upwind methods for the Euler equations,
 * J. Comput. Phys. 59, 232–246, for the SER rule).
 * Backtracking as in Dennis & Schnabel (1996, SIAM, §6.3).
 *
 * Convergence is judged on the residual relative to a per-row magnitude the
 * problem supplies (the sum of the absolute values of the row's terms), so
 * the test does not depend on the units or on how stiff the coupling is.
 * At the rounding floor also: a full Newton step that changes no unknown
 * beyond `stepTolerance` of its size once the relative residual is below
 * `floorTolerance`, or two Newton steps in a row that no longer shrink a
 * relative residual already within 100× the tolerance. Never throws.
 */

export interface SteadyStateProblem {
  readonly size: number;
  /** R(x). Non-finite entries mark x as outside the problem's domain. */
  residual(x: Float64Array, out: Float64Array): void;
  /** Positive magnitude of each row's terms at x, for the relative residual. */
  rowScale(x: Float64Array, out: Float64Array): void;
  /** Diagonal of dm/dx, the derivative of each row's conserved content (pseudo-time term). */
  accumulationDerivative(x: Float64Array, out: Float64Array): void;
  /** Solve (J(x) + diag(shift)) δ = rhs (shift null = plain Jacobian); null if singular. */
  solveLinearised(x: Float64Array, shift: Float64Array | null, rhs: Float64Array): Float64Array | null;
  /**
   * Move a trial point back into the physically admissible set, component by
   * component, given the current point x (a projected step); return true if
   * anything changed. Default: every point is admissible.
   */
  project?(x: Float64Array, trial: Float64Array): boolean;
}

export interface SteadyStateOptions {
  /** Converged when max_i |R_i|/scale_i ≤ tolerance (default 1e-10). */
  tolerance?: number;
  /** Rounding floor of the relative residual for the small-step test (default 1e-6). */
  floorTolerance?: number;
  /** A full Newton step below this fraction of max(|x_i|, typical_i) ends the iteration (default 1e-12). */
  stepTolerance?: number;
  /** Typical size of each unknown (default 1). */
  typicalSize?: number;
  /** Newton iterations before pseudo-transient continuation takes over (default 30). */
  maxNewtonIterations?: number;
  /** Pseudo time steps (linear solves) before giving up (default 400). */
  maxPseudoSteps?: number;
  /** First pseudo time step, in the time unit of m and R (default 1e-3). */
  initialPseudoStep?: number;
}

export interface SteadyStateResult {
  x: Float64Array;
  converged: boolean;
  /** Newton iterations plus pseudo time steps (linear solves). */
  iterations: number;
  /** Of those, pseudo time steps. */
  pseudoSteps: number;
  /** max_i |R_i|/scale_i at x. */
  residualNorm: number;
  method: 'newton' | 'pseudo-transient';
}

interface Evaluated {
  r: Float64Array;
  scale: Float64Array;
  normInf: number;
  norm2: number;
}

function evaluate(problem: SteadyStateProblem, x: Float64Array, scaleAt?: Float64Array): Evaluated {
  const n = problem.size;
  const r = new Float64Array(n);
  problem.residual(x, r);
  let scale = scaleAt;
  if (!scale) {
    scale = new Float64Array(n);
    problem.rowScale(x, scale);
  }
  let normInf = 0;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const v = r[i] / scale[i];
    if (!Number.isFinite(v)) return { r, scale, normInf: Infinity, norm2: Infinity };
    normInf = Math.max(normInf, Math.abs(v));
    sum += v * v;
  }
  return { r, scale, normInf, norm2: Math.sqrt(sum) };
}

/** max_i |R_i(x)|/scale_i(x): the convergence measure, e.g. to rank candidate starting points. */
export function relativeResidual(problem: SteadyStateProblem, x: Float64Array): number {
  return evaluate(problem, x).normInf;
}

function stepIsSmall(x: Float64Array, step: Float64Array, typical: number, tolerance: number): boolean {
  for (let i = 0; i < x.length; i++) if (Math.abs(step[i]) > tolerance * Math.max(Math.abs(x[i]), typical)) return false;
  return true;
}

interface NewtonOutcome {
  x: Float64Array;
  converged: boolean;
  iterations: number;
  residualNorm: number;
}

/** Newton with backtracking on ‖R/scale‖₂ (scale frozen at the current iterate). */
function newton(problem: SteadyStateProblem, x0: Float64Array, o: Required<SteadyStateOptions>, maxIterations: number): NewtonOutcome {
  let x: Float64Array = Float64Array.from(x0);
  let e = evaluate(problem, x);
  if (!Number.isFinite(e.normInf)) return { x, converged: false, iterations: 0, residualNorm: Infinity };
  const n = problem.size;
  let stalls = 0;
  let floorStalls = 0;
  for (let iter = 1; iter <= maxIterations; iter++) {
    if (e.normInf <= o.tolerance) return { x, converged: true, iterations: iter - 1, residualNorm: e.normInf };
    const minusR = new Float64Array(n);
    for (let i = 0; i < n; i++) minusR[i] = -e.r[i];
    const step = problem.solveLinearised(x, null, minusR);
    if (!step) return { x, converged: false, iterations: iter, residualNorm: e.normInf };
    let t = 1;
    let projected = false;
    let accepted: Float64Array | null = null;
    for (let k = 0; k < 12; k++) {
      const trial = new Float64Array(n);
      for (let i = 0; i < n; i++) trial[i] = x[i] + t * step[i];
      projected = problem.project ? problem.project(x, trial) : false;
      const et = evaluate(problem, trial, e.scale);
      if (Number.isFinite(et.norm2) && et.norm2 <= (1 - 1e-4 * t) * e.norm2) {
        accepted = trial;
        break;
      }
      t *= 0.5;
    }
    const full = t === 1 && !projected;
    const atFloor = e.normInf <= 100 * o.tolerance;
    if (!accepted) {
      // No decrease along the Newton direction: at the rounding floor this is convergence.
      const done = e.normInf <= o.floorTolerance && (atFloor || stepIsSmall(x, step, o.typicalSize, 1e3 * o.stepTolerance));
      return { x, converged: done, iterations: iter, residualNorm: e.normInf };
    }
    x = accepted;
    const previous = e;
    e = evaluate(problem, x);
    if (full && e.normInf <= o.floorTolerance && stepIsSmall(x, step, o.typicalSize, o.stepTolerance)) {
      return { x, converged: true, iterations: iter, residualNorm: e.normInf };
    }
    // Newton steps within 100× the tolerance that no longer shrink the residual: the rounding floor.
    floorStalls = e.normInf <= 100 * o.tolerance && e.normInf > 0.25 * previous.normInf ? floorStalls + 1 : 0;
    if (floorStalls >= 2) return { x, converged: true, iterations: iter, residualNorm: e.normInf };
    // Heavily damped steps that barely reduce the residual: Newton is far from its basin; stop early.
    stalls = t <= 0.125 && e.norm2 > 0.9 * previous.norm2 ? stalls + 1 : 0;
    if (stalls >= 3) return { x, converged: false, iterations: iter, residualNorm: e.normInf };
  }
  return { x, converged: e.normInf <= o.tolerance, iterations: maxIterations, residualNorm: e.normInf };
}

/**
 * Solve R(x) = 0 from x0: Newton first; if it fails, pseudo-transient
 * continuation from x0, finishing with Newton once the relative residual
 * is below 1e-4. Returns the best point reached with `converged: false`
 * when the budget runs out.
 */
export function solveSteadyState(problem: SteadyStateProblem, x0: ArrayLike<number>, options: SteadyStateOptions = {}): SteadyStateResult {
  const o: Required<SteadyStateOptions> = {
    tolerance: options.tolerance ?? 1e-10,
    floorTolerance: options.floorTolerance ?? 1e-6,
    stepTolerance: options.stepTolerance ?? 1e-12,
    typicalSize: options.typicalSize ?? 1,
    maxNewtonIterations: options.maxNewtonIterations ?? 30,
    maxPseudoSteps: options.maxPseudoSteps ?? 400,
    initialPseudoStep: options.initialPseudoStep ?? 1e-3,
  };
  const n = problem.size;
  const start = Float64Array.from(x0);
  const first = newton(problem, start, o, o.maxNewtonIterations);
  if (first.converged) return { x: first.x, converged: true, iterations: first.iterations, pseudoSteps: 0, residualNorm: first.residualNorm, method: 'newton' };
  let iterations = first.iterations;
  let pseudoSteps = 0;
  let x: Float64Array = start;
  let e = evaluate(problem, x);
  let best: { x: Float64Array; norm: number } = { x, norm: e.normInf };
  if (first.residualNorm < best.norm) best = { x: first.x, norm: first.residualNorm };
  if (!Number.isFinite(e.normInf)) {
    return { x: best.x, converged: false, iterations, pseudoSteps, residualNorm: best.norm, method: 'pseudo-transient' };
  }
  let dt = o.initialPseudoStep;
  const shift = new Float64Array(n);
  const mDerivative = new Float64Array(n);
  let rejections = 0;
  let lastFinish = Infinity;
  while (pseudoSteps < o.maxPseudoSteps) {
    if (e.normInf <= o.tolerance) return { x, converged: true, iterations, pseudoSteps, residualNorm: e.normInf, method: 'pseudo-transient' };
    if (e.normInf <= Math.min(1e-4, 1e-2 * lastFinish)) {
      lastFinish = e.normInf;
      const finish = newton(problem, x, o, 8);
      iterations += finish.iterations;
      if (finish.converged) return { x: finish.x, converged: true, iterations, pseudoSteps, residualNorm: finish.residualNorm, method: 'pseudo-transient' };
    }
    problem.accumulationDerivative(x, mDerivative);
    for (let i = 0; i < n; i++) shift[i] = mDerivative[i] / dt;
    const minusR = new Float64Array(n);
    for (let i = 0; i < n; i++) minusR[i] = -e.r[i];
    const step = problem.solveLinearised(x, shift, minusR);
    pseudoSteps++;
    iterations++;
    let trial: Float64Array | null = null;
    let et: Evaluated | null = null;
    if (step) {
      trial = new Float64Array(n);
      for (let i = 0; i < n; i++) trial[i] = x[i] + step[i];
      if (problem.project) problem.project(x, trial);
      et = evaluate(problem, trial);
    }
    // Reject a step that leaves the domain or blows the residual up; retry with a shorter pseudo step.
    if (!trial || !et || !Number.isFinite(et.normInf) || et.norm2 > 10 * e.norm2) {
      dt *= 0.1;
      rejections++;
      if (dt < 1e-12 * o.initialPseudoStep || rejections > 60) break;
      continue;
    }
    const ratio = e.norm2 / et.norm2;
    dt *= Math.min(10, Math.max(2, ratio));
    x = trial;
    e = et;
    if (e.normInf < best.norm) best = { x, norm: e.normInf };
  }
  return { x: best.x, converged: false, iterations, pseudoSteps, residualNorm: best.norm, method: 'pseudo-transient' };
}
