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
import { factorTridiagonal, solveFactoredTridiagonal } from './linalg.js';
import { compensatedSum } from './series.js';

/**
 * Kept Jacobians are used while each Newton update is at most this fraction of the one before (a choice:
 * at 0.3 the remaining error falls by a decade in two iterations; slower contraction costs more flux
 * evaluations than forming J afresh, three).
 */
const CONTRACTION = 0.3;

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
  /**
   * Newton also stops when every residual is below this fraction of its local error weight
   * atol + rtol·|y_i| (default 0.01; 0 leaves only `newtonTolerance`).
   */
  newtonResidualFraction?: number;
  maxNewtonIterations?: number;
  /** Keep the Newton matrix while the iteration contracts fast (default true); false forms it every iteration. */
  simplifiedNewton?: boolean;
  /**
   * End early once the chain is at rest: when, after an accepted step, no cell's rate times the time left exceeds
   * this (state units), nor the loss rate times the time left this fraction of the initial amount, the state is
   * kept to t1 (reported there through onStep, not counted as a step). Off by default.
   */
  restTolerance?: number;
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
  /** Calls of `faceFluxes`, the integration's cost. */
  fluxEvaluations: number;
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
  const residualFraction = options.newtonResidualFraction ?? 0.01;
  const restTolerance = options.restTolerance;
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
  const saved = new Float64Array(n);
  const deltas = new Float64Array(n);

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
  let fluxEvaluations = 0;
  const trial = new Float64Array(n);
  /** The step's predictor (also the error reference). */
  const predictor = new Float64Array(n);
  // Rate Jacobian bands: jLower[i] = ∂rate_i/∂y_{i−1}, jDiag[i] = ∂rate_i/∂y_i, jUpper[i] = ∂rate_i/∂y_{i+1}.
  const jLower = new Float64Array(n);
  const jDiag = new Float64Array(n);
  const jUpper = new Float64Array(n);
  let haveJacobian = false;
  const step = new Float64Array(n);
  const multipliers = new Float64Array(n);
  const pivots = new Float64Array(n);
  /** b·h and the J (its formation count) the factored Newton matrix belongs to. */
  let factoredStep = Number.NaN;
  let factoredJacobian = -1;
  /** J was formed during the current step's iteration. */
  let freshJacobian = false;
  /** Forms J at `trial`, whose rates are in `rate` (three flux evaluations, one per colour). */
  const formRateJacobian = (): void => {
    for (let colour = 0; colour < 3; colour++) {
      for (let j = colour; j < n; j += 3) {
        const delta = 1e-7 * Math.max(Math.abs(trial[j]), 1e-3);
        saved[j] = trial[j];
        deltas[j] = delta;
        trial[j] += delta;
      }
      rates(chain, trial, leaving, entering, ratePerturbed);
      for (let j = colour; j < n; j += 3) {
        trial[j] = saved[j];
        const delta = deltas[j];
        jDiag[j] = (ratePerturbed[j] - rate[j]) / delta;
        if (j > 0) jUpper[j - 1] = (ratePerturbed[j - 1] - rate[j - 1]) / delta;
        if (j < n - 1) jLower[j + 1] = (ratePerturbed[j + 1] - rate[j + 1]) / delta;
      }
    }
  };

  while (t < t1 && steps + rejected < maxSteps) {
    if (t + h > t1) h = t1 - t;
    const first = hPrev === 0;
    const omega = first ? 0 : h / hPrev;
    const a1 = first ? 1 : ((1 + omega) * (1 + omega)) / (1 + 2 * omega);
    const a2 = first ? 0 : (omega * omega) / (1 + 2 * omega);
    const b = first ? 1 : (1 + omega) / (1 + 2 * omega);
    for (let i = 0; i < n; i++) base[i] = a1 * y[i] - a2 * yPrev[i];

    // Predictor: linear extrapolation (also the error reference).
    for (let i = 0; i < n; i++) predictor[i] = first ? y[i] : y[i] + omega * (y[i] - yPrev[i]);
    trial.set(predictor);
    freshJacobian = false;

    // Newton's method on the tridiagonal matrix I − b·h·J, J = ∂rate/∂y formed by three-colour finite
    // differences. J is kept from iteration to iteration and from step to step (simplified Newton, as
    // stiff integrators do: the matrix is rebuilt from J for each step's b·h without a flux evaluation) while
    // each update is at most CONTRACTION times the one before; a slower update is undone and J formed afresh
    // at the previous iterate. Converged when, at an iterate, the residual r = y − base − b·h·rate(y) is below
    // `residualFraction` of the local error weights (atol + rtol·|y|), or the last update below `newtonTol`.
    // The residual is what the flux-form update below adds to the iterate (next = y − r), so the first test
    // bounds the step's departure from the implicit solution directly; and it is taken on the rates the
    // update uses, so a converged step costs no further flux evaluation. A predictor that already satisfies
    // it (a state at rest) needs no Newton update. Fails after `maxNewton` matrices formed in the step, or
    // 3·maxNewton updates.
    let converged = false;
    let previousUpdate = Infinity;
    let lastUpdate = Infinity;
    let formed = 0;
    let lossRate = 0;
    for (let updates = 0; ; ) {
      lossRate = rates(chain, trial, leaving, entering, rate);
      fluxEvaluations++;
      let residualNorm = 0;
      for (let i = 0; i < n; i++) {
        residual[i] = trial[i] - base[i] - b * h * rate[i];
        residualNorm = Math.max(residualNorm, Math.abs(residual[i]) / (atol + rtol * Math.abs(trial[i])));
      }
      if (!Number.isFinite(residualNorm)) {
        haveJacobian = false;
        break;
      }
      if (residualNorm <= residualFraction || lastUpdate <= newtonTol) {
        converged = true;
        break;
      }
      if (updates >= 3 * maxNewton) break;
      if (!haveJacobian || !simplified) {
        if (formed >= maxNewton) break;
        formed++;
        jacobianEvaluations++;
        fluxEvaluations += 3;
        formRateJacobian();
        haveJacobian = true;
        freshJacobian = true;
      }
      if (b * h !== factoredStep || jacobianEvaluations !== factoredJacobian) {
        // The Newton matrix I − b·h·J and its elimination (the Thomas algorithm's multipliers and pivots), kept
        // while neither J nor b·h changes: each kept iteration then costs only the two substitutions.
        for (let i = 0; i < n; i++) {
          diag[i] = 1 - b * h * jDiag[i];
          upper[i] = -b * h * jUpper[i];
          lower[i] = -b * h * jLower[i];
        }
        factorTridiagonal(lower, diag, upper, multipliers, pivots);
        factoredStep = b * h;
        factoredJacobian = jacobianEvaluations;
      }
      solveFactoredTridiagonal(lower, multipliers, pivots, residual, step);
      updates++;
      newtonTotal++;
      let largest = 0;
      for (let i = 0; i < n; i++) {
        trial[i] -= step[i];
        largest = Math.max(largest, Math.abs(step[i]));
      }
      if (!Number.isFinite(largest)) {
        haveJacobian = false;
        break;
      }
      if (simplified && !freshJacobian && largest > CONTRACTION * previousUpdate) {
        // A kept J that no longer contracts: back to the previous iterate, with J formed there.
        for (let i = 0; i < n; i++) trial[i] += step[i];
        haveJacobian = false;
        continue;
      }
      // A fresh J that contracts slowly (a kink in the fluxes, or far from the solution): the next update forms
      // J again at its iterate (full Newton), within the budget of `maxNewton` matrices.
      if (largest > CONTRACTION * previousUpdate) haveJacobian = false;
      previousUpdate = largest;
      lastUpdate = largest;
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
          fluxEvaluations,
          cumulativeLoss: loss,
          conservationError: Math.abs(weighted(y) + loss - initialAmount) / scale,
        };
      }
      continue;
    }

    // Flux-form update from the converged fluxes (the rates of the last iterate): exact conservation.
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
    if (restTolerance !== undefined && t < t1) {
      // At rest: the rates of the converged state (those the flux-form update used) would move no cell by more than
      // restTolerance over the rest of the interval, and in an autonomous chain a state at rest stays there. The
      // integration ends at t1 with the state unchanged (conservation untouched).
      let fastest = 0;
      for (let i = 0; i < n; i++) fastest = Math.max(fastest, Math.abs(rate[i]));
      if (fastest * (t1 - t) <= restTolerance && Math.abs(lossRate) * (t1 - t) <= restTolerance * Math.abs(scale)) {
        t = t1;
        options.onStep?.(t, y, loss);
        break;
      }
    }
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
      fluxEvaluations,
      cumulativeLoss: loss,
      conservationError,
    };
  }
  return { converged: true, time: t, y, steps, rejectedSteps: rejected, newtonIterations: newtonTotal, jacobianEvaluations, fluxEvaluations, cumulativeLoss: loss, conservationError };
}
