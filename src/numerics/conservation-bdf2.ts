/**
 * Implicit time integration of a one-dimensional conservation law on a chain of
 * finite volumes,
 *   c_i dy_i/dt = E_i(y) − L_{i+1}(y),
 * where face i lies between cells i − 1 and i, L_i is the flux leaving cell i − 1
 * through face i and E_i the flux entering cell i through it. On an ordinary face
 * the two are equal; where they differ (a chain end, or a face that lets material
 * out of the system, such as a spill-over), the difference is the loss through
 * that face. Each face flux may depend only on its two neighbouring cells, so the
 * Newton matrix is tridiagonal; it is formed by finite differences with three
 * colours (Curtis, Powell & Reid 1974, J. Inst. Math. Appl. 13, 117).
 *
 * Scheme: variable-step BDF2 (second order, L-stable; Hairer & Wanner 1996,
 * "Solving Ordinary Differential Equations II", 2nd ed., Springer, §III.5,
 * variable-step coefficients) started by one backward-Euler step. After Newton
 * has converged, the new state is written in flux form from the converged face
 * fluxes, and the cumulative loss is advanced with the same coefficients, so the
 * total Σ c_i y_i + loss is conserved to rounding whatever the Newton residual
 * (the coefficients satisfy a₁ − a₂ = 1).
 *
 * Step control: the difference between the converged state and the linear
 * extrapolation of the two previous states (a second-difference estimate of
 * the local error) against atol + rtol·|y|, with the usual cube-root update.
 */
import { solveTridiagonal } from './linalg.js';
import { compensatedSum } from './series.js';

export interface ConservationChain {
  /** Number of cells. */
  size: number;
  /** Capacity c_i of each cell (e.g. its cross-section times its length). */
  capacities: ArrayLike<number>;
  /**
   * Fill `leaving` (length size + 1: L_i, flux leaving cell i − 1 through face i;
   * L_0 is ignored) and `entering` (length size + 1: E_i, flux entering cell i
   * through face i; E_size is ignored) for the state y.
   */
  faceFluxes(y: Float64Array, leaving: Float64Array, entering: Float64Array): void;
}

export interface ChainIntegrationOptions {
  initialStep: number;
  maxStep?: number;
  minStep?: number;
  relativeTolerance?: number;
  absoluteTolerance?: number;
  /** Newton stops when the largest update is below this (state units). */
  newtonTolerance?: number;
  maxNewtonIterations?: number;
  /** Keep the Newton matrix while the iteration contracts fast (default true); false forms it every iteration. */
  simplifiedNewton?: boolean;
  /** Budget of step attempts, accepted and rejected alike, so that the work is bounded before the integration starts (default 200 000). */
  maxSteps?: number;
  /** Called after every accepted step with the time, state and cumulative loss. */
  onStep?: (time: number, y: Float64Array, cumulativeLoss: number) => void;
}

export interface ChainIntegrationResult {
  converged: boolean;
  /** Reason when not converged. */
  reason?: string;
  time: number;
  y: Float64Array;
  steps: number;
  rejectedSteps: number;
  newtonIterations: number;
  /** Newton matrices formed (each costs three flux evaluations). */
  jacobianEvaluations: number;
  /** ∫ (total loss rate) dt, in units of Σ c_i y_i. */
  cumulativeLoss: number;
  /** |Σ c y + loss − initial Σ c y| / max(initial Σ c y, tiny). */
  conservationError: number;
}

function rates(chain: ConservationChain, y: Float64Array, leaving: Float64Array, entering: Float64Array, out: Float64Array): number {
  chain.faceFluxes(y, leaving, entering);
  let loss = 0;
  const n = chain.size;
  for (let i = 0; i < n; i++) out[i] = (entering[i] - leaving[i + 1]) / chain.capacities[i];
  // Loss: whatever leaves a cell without entering the next one.
  loss += leaving[n] - entering[0];
  for (let i = 1; i < n; i++) loss += leaving[i] - entering[i];
  return loss;
}

/** Integrates the chain from t0 to t1 starting at y0 (module comment). Never throws for a finite problem. */
export function integrateConservationChain(
  chain: ConservationChain,
  y0: ArrayLike<number>,
  t0: number,
  t1: number,
  options: ChainIntegrationOptions,
): ChainIntegrationResult {
  const n = chain.size;
  const c = chain.capacities;
  const rtol = options.relativeTolerance ?? 1e-4;
  const atol = options.absoluteTolerance ?? 1e-6;
  const newtonTol = options.newtonTolerance ?? 1e-12;
  const maxNewton = options.maxNewtonIterations ?? 12;
  const simplified = options.simplifiedNewton ?? true;
  const maxSteps = options.maxSteps ?? 200_000;
  const maxStep = options.maxStep ?? t1 - t0;
  const minStep = options.minStep ?? (t1 - t0) * 1e-14;

  const leaving = new Float64Array(n + 1);
  const entering = new Float64Array(n + 1);
  const rate = new Float64Array(n);
  const ratePerturbed = new Float64Array(n);
  const lower = new Float64Array(n);
  const diag = new Float64Array(n);
  const upper = new Float64Array(n);
  const residual = new Float64Array(n);
  const base = new Float64Array(n);

  let yPrev = Float64Array.from(y0);
  let y = Float64Array.from(y0);
  let lossPrev = 0;
  let loss = 0;
  const weighted = (v: Float64Array): number => {
    const terms = new Float64Array(n);
    for (let i = 0; i < n; i++) terms[i] = c[i] * v[i];
    return compensatedSum(terms);
  };
  const initialAmount = weighted(y);
  const scale = Math.max(Math.abs(initialAmount), Number.MIN_VALUE);

  let t = t0;
  let h = Math.min(options.initialStep, maxStep, t1 - t0);
  let hPrev = 0;
  let steps = 0;
  let rejected = 0;
  let newtonTotal = 0;
  let jacobianEvaluations = 0;
  const trial = new Float64Array(n);

  while (t < t1 && steps + rejected < maxSteps) {
    if (t + h > t1) h = t1 - t;
    const first = hPrev === 0;
    const omega = first ? 0 : h / hPrev;
    const a1 = first ? 1 : ((1 + omega) * (1 + omega)) / (1 + 2 * omega);
    const a2 = first ? 0 : (omega * omega) / (1 + 2 * omega);
    const b = first ? 1 : (1 + omega) / (1 + 2 * omega);
    for (let i = 0; i < n; i++) base[i] = a1 * y[i] - a2 * yPrev[i];

    // Predictor: linear extrapolation (also the error reference).
    const predictor = new Float64Array(n);
    for (let i = 0; i < n; i++) predictor[i] = first ? y[i] : y[i] + omega * (y[i] - yPrev[i]);
    trial.set(predictor);

    // Newton's method with a tridiagonal Jacobian by three-colour finite differences. The matrix is
    // formed at the first iteration of a step and kept while each update is at most a tenth of the one
    // before (simplified Newton: the converged state is the same, a kept iteration costs one flux
    // evaluation instead of four); an update that grows is undone and the matrix formed afresh. The
    // iteration fails after `maxNewton` formed matrices, as full Newton would, or 3·maxNewton iterations.
    let converged = false;
    let previousUpdate = Infinity;
    let keepMatrix = false;
    let formed = 0;
    for (let iter = 0; iter < 3 * maxNewton && formed < maxNewton; iter++) {
      newtonTotal++;
      rates(chain, trial, leaving, entering, rate);
      for (let i = 0; i < n; i++) residual[i] = trial[i] - base[i] - b * h * rate[i];
      const formMatrix = !keepMatrix;
      if (formMatrix) {
        formed++;
        jacobianEvaluations++;
      }
      for (let colour = 0; formMatrix && colour < 3; colour++) {
        const saved: number[] = [];
        const deltas: number[] = [];
        for (let j = colour; j < n; j += 3) {
          const delta = 1e-7 * Math.max(Math.abs(trial[j]), 1e-3);
          saved.push(trial[j]);
          deltas.push(delta);
          trial[j] += delta;
        }
        rates(chain, trial, leaving, entering, ratePerturbed);
        let k = 0;
        for (let j = colour; j < n; j += 3, k++) {
          trial[j] = saved[k];
          const delta = deltas[k];
          diag[j] = 1 - (b * h * (ratePerturbed[j] - rate[j])) / delta;
          if (j > 0) upper[j - 1] = (-b * h * (ratePerturbed[j - 1] - rate[j - 1])) / delta;
          if (j < n - 1) lower[j + 1] = (-b * h * (ratePerturbed[j + 1] - rate[j + 1])) / delta;
        }
      }
      const step = solveTridiagonal(lower, diag, upper, residual);
      let largest = 0;
      let finite = true;
      for (let i = 0; i < n; i++) {
        if (!Number.isFinite(step[i])) finite = false;
        trial[i] -= step[i];
        largest = Math.max(largest, Math.abs(step[i]));
      }
      if (!finite) break;
      if (largest <= newtonTol) {
        converged = true;
        break;
      }
      if (!formMatrix && largest > previousUpdate) {
        // A kept matrix made the iteration diverge: back to the previous iterate, with a fresh matrix.
        for (let i = 0; i < n; i++) trial[i] += step[i];
        keepMatrix = false;
        continue;
      }
      keepMatrix = simplified && largest <= 0.1 * previousUpdate;
      previousUpdate = largest;
    }

    if (!converged) {
      rejected++;
      h *= 0.25;
      if (h < minStep) {
        return {
          converged: false,
          reason: `Newton iteration failed at t = ${t} with step below ${minStep}`,
          time: t,
          y,
          steps,
          rejectedSteps: rejected,
          newtonIterations: newtonTotal,
          jacobianEvaluations,
          cumulativeLoss: loss,
          conservationError: Math.abs(weighted(y) + loss - initialAmount) / scale,
        };
      }
      continue;
    }

    // Flux-form update from the converged fluxes: exact conservation.
    const lossRate = rates(chain, trial, leaving, entering, rate);
    const next = new Float64Array(n);
    for (let i = 0; i < n; i++) next[i] = base[i] + b * h * rate[i];
    const nextLoss = a1 * loss - a2 * lossPrev + b * h * lossRate;

    let errorNorm = 0;
    if (!first) {
      for (let i = 0; i < n; i++) {
        const e = Math.abs(next[i] - predictor[i]) / 3 / (atol + rtol * Math.abs(next[i]));
        if (e > errorNorm) errorNorm = e;
      }
    } else {
      for (let i = 0; i < n; i++) {
        const e = Math.abs(next[i] - y[i]) / 2 / (atol + rtol * Math.abs(next[i]));
        if (e > errorNorm) errorNorm = e;
      }
    }
    if (errorNorm > 1 && h > minStep * 4) {
      rejected++;
      h *= Math.max(0.2, 0.9 * Math.cbrt(1 / errorNorm));
      continue;
    }

    yPrev = y;
    y = next;
    lossPrev = loss;
    loss = nextLoss;
    t += h;
    hPrev = h;
    steps++;
    options.onStep?.(t, y, loss);
    const factor = errorNorm > 0 ? Math.min(2, Math.max(0.2, 0.9 * Math.cbrt(1 / errorNorm))) : 2;
    h = Math.min(maxStep, h * factor);
  }

  const conservationError = Math.abs(weighted(y) + loss - initialAmount) / scale;
  if (t < t1) {
    return {
      converged: false,
      reason: `budget of ${maxSteps} step attempts exhausted at t = ${t} (${steps} accepted, ${rejected} rejected)`,
      time: t,
      y,
      steps,
      rejectedSteps: rejected,
      newtonIterations: newtonTotal,
      jacobianEvaluations,
      cumulativeLoss: loss,
      conservationError,
    };
  }
  return { converged: true, time: t, y, steps, rejectedSteps: rejected, newtonIterations: newtonTotal, jacobianEvaluations, cumulativeLoss: loss, conservationError };
}
