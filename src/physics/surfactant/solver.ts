/**
 * Interface solvers for surfactant-laden slip (the numerical part beyond the
 * scaling theory of surfactant-scaling.ts). This module holds the transverse
 * grating solver; the long-wave model along finite streamwise grooves is in
 * surfactant-groove.ts and the shared transport pieces in
 * surfactant-transport.ts (both re-exported here).
 *
 * Transverse grating, one period P, gap of width w = φP, half-space of
 * working fluid above, lubricant (or gas) below the gap.
 * - Water side: Stokes flow in the half-space. Writing the flow as the
 *   no-slip shear flow γ̇y plus a periodic perturbation driven by the
 *   interface velocity u(x), Fourier mode k of u with amplitude û_k changes
 *   the wall shear by −2μ|k|û_k (stream function (B y) e^{−|k|y} with zero
 *   normal velocity at y = 0; derived here, standard Stokes result). Hence
 *   τ(x) = μγ̇ − 2μ(|∂|u)(x).
 * - Lubricant: local drag μ u / b_local (b_local the lubricant's local slip
 *   length; zero drag for gas). Ridges: no slip, u = 0.
 * - Gap stress balance: τ = μ u/b_local − dσ/dx, σ by the Szyszkowski
 *   equation σ = σ0 + nRTΓ_m ln(1 − Γ/Γ_m).
 * - Surface transport: d(uΓ)/dx − D_I d²Γ/dx² = J with zero total flux at
 *   the contact lines and the exchange J of surfactant-transport.ts.
 *
 * Discretisation (ours): N uniform cells per period, the gap made of whole
 * cells; |∂| as the circulant trigonometric-interpolation matrix (spectral
 * collocation); finite volumes with the fitted flux for the transport.
 *
 * Solution method (ours). The momentum balance is linear in the interface
 * velocity and, written in the tension variable v of surfactant-transport.ts,
 * linear in v too: u = u_c − (Ma s_eq) G v with u_c the clean velocity and
 * G = M⁻¹D (M the gap operator 2|∂| + drag, D the tension-gradient
 * stencil), both computed once per grid and cached. The velocity is
 * eliminated, leaving N_g transport equations in v, solved by Newton's
 * method with the analytic Jacobian and a line search, from a warm start
 * (a neighbouring concentration) and then from the linearised solution; if
 * Newton fails from both, by pseudo-transient continuation from the warm
 * start and then from the undisturbed interface: the interface evolves in
 * pseudo time as it would from that state once the flow is switched on, and
 * the time step grows until the iteration is Newton's
 * (numerics/steady-state.ts). Steps are projected so no cell's surface
 * excess turns negative. Convergence is judged relative to the size of each cell's transport terms,
 * so the stiff coupling at large Marangoni numbers (Ma·s_eq up to ~10⁴ in
 * realistic designs) does not leave a residual floor above the tolerance.
 * The linearised problem (about the uniform equilibrium Γ_eq) is solved as
 * well and reported.
 *
 * Non-convergence throws ConvergenceError with the iteration count.
 */
import { BoundedCache } from '../../numerics/memo.js';
import { solveDense, solveDenseInPlace } from '../../numerics/linalg.js';
import { invertSymmetricToeplitz } from '../../numerics/toeplitz.js';
import { relativeResidual, solveSteadyState, type SteadyStateProblem, type SteadyStateResult } from '../../numerics/steady-state.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { GAS_CONSTANT } from '../../core/constants.js';
import {
  diffusiveLayerThickness,
  exchangeState,
  transportProblem,
  type ExchangeState,
  type InterfaceProfile,
  type SurfactantSolveConditions,
} from './transport.js';

export { diffusiveLayerThickness, type InterfaceProfile, type SurfactantSolveConditions } from './transport.js';
export { solveLongWaveGroove, type LongWaveInput, type LongWaveSolution } from './groove.js';

export interface TransverseSolverInput extends SurfactantSolveConditions {
  /** P, m. */
  pitch: number;
  /** w, m (0 < w < P). */
  grooveWidth: number;
  /** γ̇ = τ_w/μ, 1/s. */
  shearRate: number;
  /** μ of the working fluid, Pa·s. */
  viscosity: number;
  /** b_local of the lubricant, m; undefined or non-finite = gas (no drag). */
  localSlipLength?: number;
  /** Requested cells per period (default 256; the solver picks N ≥ this so the gap is whole cells). */
  cells?: number;
  /**
   * States of earlier solves on the same grid (e.g. neighbouring concentrations, or a prediction from
   * them) to start from; each is tried as the same profile of v and as the same tension profile, and
   * Newton starts from the candidate with the smallest residual.
   */
  warmStart?: InterfaceState | InterfaceState[];
  /** Solve and report the linearised problem (default true); false skips it unless Newton needs it as a start. */
  reportLinearised?: boolean;
}

/** Tension-variable profile v on the gap cells (see surfactant-transport.ts); opaque to callers. */
export interface InterfaceState {
  cells: number;
  gapCells: number;
  tension: Float64Array;
  /** s_eq = ln(1 + K c0) of that solve. */
  equilibriumTension: number;
}

export interface InterfaceSolution {
  /** b_surfactant/b_clean on the same grid. */
  slipRetained: number;
  /** Same from the linearised problem (NaN only when `reportLinearised: false` and it was not needed). */
  linearSlipRetained: number;
  /** Clean slip length of the discrete problem, m (compare with Philip). */
  cleanSlipLength: number;
  /** σ(upstream end) − σ(downstream end), N/m. */
  surfaceTensionDrop: number;
  /** Mean Marangoni stress over the interface, Pa. */
  meanMarangoniStress: number;
  profile: InterfaceProfile;
  /** Linear solves of the nonlinear solve (Newton iterations plus pseudo time steps). */
  iterations: number;
  /** Relative residual max_i |R_i|/(magnitude of cell i's terms) at the solution. */
  residual: number;
  tolerance: number;
  cells: number;
  gapCells: number;
  /** Gas fraction as resolved by the grid (whole cells). */
  gasFractionResolved: number;
  stagnantCap: boolean;
  /** Pseudo time steps of the continuation (0 when Newton converged directly). */
  continuationSteps: number;
  /** For a warm start of a neighbouring solve. */
  state: InterfaceState;
}

/** Circulant matrix entries c_d of |∂| on a unit period sampled at N points (trigonometric interpolation). */
export function absoluteDerivativeStencil(N: number): Float64Array {
  const c = new Float64Array(N);
  const half = N / 2;
  for (let d = 0; d < N; d++) {
    let s = 0;
    for (let m = 1; m < half; m++) s += 2 * (2 * Math.PI * m) * Math.cos((2 * Math.PI * m * d) / N);
    s += 2 * Math.PI * half * (d % 2 === 0 ? 1 : -1);
    c[d] = s / N;
  }
  return c;
}

function chooseGrid(requested: number, phi: number): { N: number; Ng: number } {
  let best = { N: requested, Ng: Math.round(phi * requested), err: Infinity };
  const top = Math.ceil(requested * 1.25);
  for (let N = requested + (requested % 2); N <= top; N += 2) {
    const Ng = Math.round(phi * N);
    const err = Math.abs(phi * N - Ng) / N;
    if (Ng >= 4 && Ng <= N - 2 && err < best.err - 1e-15) best = { N, Ng, err };
  }
  if (!Number.isFinite(best.err)) throw new DomainError('groove too narrow or too wide for the interface grid', { field: 'texture.grooveWidth' });
  return { N: best.N, Ng: best.Ng };
}

/** Gap operator of one grid and drag: clean velocity u_c = M⁻¹1 and G = M⁻¹D (velocity per unit tension gradient). */
interface GapOperator {
  N: number;
  Ng: number;
  h: number;
  clean: Float64Array;
  cleanSum: number;
  /** Row-major Ng×Ng. */
  green: Float64Array;
  /** Face averages of `green`, row-major (Ng−1)×Ng. */
  faceGreen: Float64Array;
}

const OPERATORS = new BoundedCache<GapOperator>(12);

/** The clamped central difference (S_r − S_l)/(2h) of cell i, as (left, right, weight). */
function gradientStencil(i: number, Ng: number, h: number): [number, number, number] {
  return [Math.max(i - 1, 0), Math.min(i + 1, Ng - 1), 1 / (2 * h)];
}

function gapOperator(N: number, Ng: number, drag: number): GapOperator {
  return OPERATORS.getOrCompute(`${N}:${Ng}:${drag}`, () => buildGapOperator(N, Ng, drag));
}

function buildGapOperator(N: number, Ng: number, drag: number): GapOperator {
  const h = 1 / N;
  const stencil = absoluteDerivativeStencil(N);
  // M = 2|∂| + drag on the gap is symmetric Toeplitz and positive definite: its inverse in O(Ng²).
  const firstRow = new Float64Array(Ng);
  for (let k = 0; k < Ng; k++) firstRow[k] = 2 * stencil[k] + (k === 0 ? drag : 0);
  const inverse = invertSymmetricToeplitz(firstRow);
  if (!inverse) throw new ConvergenceError('clean interface system is singular', 0, Infinity);
  const clean = new Float64Array(Ng);
  let cleanSum = 0;
  for (let i = 0; i < Ng; i++) {
    let acc = 0;
    for (let j = 0; j < Ng; j++) acc += inverse[i * Ng + j];
    clean[i] = acc;
    cleanSum += acc;
  }
  // G = M⁻¹D with D the sparse gradient stencil: column by column from the columns of M⁻¹.
  const green = new Float64Array(Ng * Ng);
  for (let k = 0; k < Ng; k++) {
    const [l, r, wgt] = gradientStencil(k, Ng, h);
    for (let i = 0; i < Ng; i++) {
      const m = inverse[i * Ng + k] * wgt;
      green[i * Ng + r] += m;
      green[i * Ng + l] -= m;
    }
  }
  const faceGreen = new Float64Array((Ng - 1) * Ng);
  for (let a = 0; a < Ng - 1; a++) for (let j = 0; j < Ng; j++) faceGreen[a * Ng + j] = 0.5 * (green[a * Ng + j] + green[(a + 1) * Ng + j]);
  return { N, Ng, h, clean, cleanSum, green, faceGreen };
}

/** Linearised problem about the uniform equilibrium (central fluxes, q = Γ/Γ_eq): returns q. */
function solveLinearised(op: GapOperator, Ma: number, eps: number, ex: ExchangeState, timeScale: number): Float64Array | null {
  const { Ng, h, clean, faceGreen } = op;
  const coupling = Ma * ex.k; // Ma·Γ_eq/(Γ_m − Γ_eq)
  // Exchange linearised with its denominator at the uniform state: rate = denomFixed·(1 − q).
  const denomFixed = (timeScale * (1 + ex.k)) / (ex.inverseDesorption + ex.sublayer * (1 - ex.equilibriumCoverage));
  const A = new Float64Array(Ng * Ng);
  const b = new Float64Array(Ng);
  const addFace = (a: number, sign: number, row: number): void => {
    // sign·F_a into row; F_a = ufc_a − coupling Σ Gf q − (ε/h)(q_{a+1} − q_a)
    b[row] -= sign * 0.5 * (clean[a] + clean[a + 1]);
    for (let j = 0; j < Ng; j++) A[row * Ng + j] -= sign * coupling * faceGreen[a * Ng + j];
    A[row * Ng + a + 1] -= (sign * eps) / h;
    A[row * Ng + a] += (sign * eps) / h;
  };
  for (let i = 0; i < Ng; i++) {
    if (i < Ng - 1) addFace(i, 1, i);
    if (i > 0) addFace(i - 1, -1, i);
    A[i * Ng + i] += h * denomFixed;
    b[i] += h * denomFixed;
  }
  return solveDense(A, b, Ng);
}

/** The transport equations in v with the velocity eliminated (module comment). */
function transverseProblem(op: GapOperator, marangoni: number, eps: number, ex: ExchangeState, timeScale: number): SteadyStateProblem & { velocity(v: Float64Array): Float64Array } {
  const { Ng, h, clean, green, faceGreen } = op;
  const velocity = (v: Float64Array): Float64Array => {
    const u = new Float64Array(Ng);
    for (let i = 0; i < Ng; i++) {
      let acc = 0;
      const row = i * Ng;
      for (let j = 0; j < Ng; j++) acc += green[row + j] * v[j];
      u[i] = clean[i] - marangoni * acc;
    }
    return u;
  };
  const transport = transportProblem({
    volume: new Float64Array(Ng).fill(h),
    spacing: () => h,
    faceVelocity(v, a) {
      let acc = 0;
      const row = a * Ng;
      for (let j = 0; j < Ng; j++) acc += faceGreen[row + j] * v[j];
      return 0.5 * (clean[a] + clean[a + 1]) - marangoni * acc;
    },
    diffusivity: eps,
    exchange: ex,
    timeScale,
  });
  const J = new Float64Array(Ng * Ng); // Jacobian workspace, reused every iteration
  return {
    ...transport,
    velocity,
    solveLinearised(v, shift, rhs) {
      J.fill(0);
      const dU = transport.localJacobian(v, shift, (i, j, value) => {
        J[i * Ng + j] += value;
      });
      // Face velocity U_a = U_c,a − Ma s_eq Σ_j Gf_aj v_j: a dense coupling through the half-space.
      for (let a = 0; a < Ng - 1; a++) {
        const w = -marangoni * dU[a];
        if (w === 0) continue;
        const fg = a * Ng;
        for (let j = 0; j < Ng; j++) {
          const t = w * faceGreen[fg + j];
          J[a * Ng + j] += t;
          J[(a + 1) * Ng + j] -= t;
        }
      }
      const step = Float64Array.from(rhs);
      return solveDenseInPlace(J, step, Ng) ? step : null;
    },
  };
}

/**
 * Solve the transverse-grating interface problem (module comment).
 * Validity: Stokes flow, half-space (channel height ≫ P), flat interface,
 * bulk concentration below the CMC. Throws ConvergenceError if neither
 * Newton nor the pseudo-transient continuation reaches the tolerance.
 */
export function solveTransverseInterface(input: TransverseSolverInput): InterfaceSolution {
  const { pitch: P, grooveWidth: w, shearRate, viscosity: mu, surfactant: s, bulkConcentration: c0, temperature: T } = input;
  if (!(w > 0 && w < P)) throw new DomainError('groove width must lie between 0 and the pitch', { field: 'texture.grooveWidth' });
  if (!(shearRate > 0)) throw new DomainError('wall shear rate must be positive', { field: 'scenario.flow.wallShearStress' });
  const tol = input.tolerance ?? 1e-10;
  const budget = Math.max(1, Math.round(input.maxIterations ?? 400));
  const phi = w / P;
  const { N, Ng } = chooseGrid(Math.max(16, Math.round(input.cells ?? 256)), phi);
  const drag = input.localSlipLength !== undefined && Number.isFinite(input.localSlipLength) && input.localSlipLength > 0 ? P / input.localSlipLength : 0;
  const op = gapOperator(N, Ng, drag);
  const { h, clean, cleanSum } = op;
  const cleanSlip = cleanSum * h * P; // mean of ũ over the period times P (b = ⟨u⟩/γ̇)

  const nRTGm = s.gibbsPrefactor * GAS_CONSTANT * T * s.maximumSurfaceExcess;
  const Ma = nRTGm / (mu * shearRate * P);
  const eps = Math.max(s.surfaceDiffusivity, 1e-30) / (shearRate * P * P);
  const ex = exchangeState(s, c0, diffusiveLayerThickness(w, shearRate, s.bulkDiffusivity));
  const timeScale = 1 / shearRate;
  const marangoni = Ma * ex.equilibriumTension;

  const profileOf = (v: Float64Array, u: Float64Array): InterfaceProfile => {
    const position: number[] = [];
    const velocity: number[] = [];
    const cleanVelocity: number[] = [];
    const surfaceExcess: number[] = [];
    const marangoniStress: number[] = [];
    const tensionChange: number[] = [];
    for (let i = 0; i < Ng; i++) {
      const [l, r, wgt] = gradientStencil(i, Ng, h);
      position.push((i + 0.5) * h * P);
      velocity.push(u[i] * shearRate * P);
      cleanVelocity.push(clean[i] * shearRate * P);
      surfaceExcess.push(-Math.expm1(-ex.equilibriumTension * v[i]) * s.maximumSurfaceExcess);
      marangoniStress.push((nRTGm * ex.equilibriumTension * (v[r] - v[l]) * wgt) / P);
      tensionChange.push(-nRTGm * ex.equilibriumTension * (v[i] - 1));
    }
    return { position, velocity, cleanVelocity, surfaceExcess, marangoniStress, tensionChange };
  };
  const base = { cleanSlipLength: cleanSlip, tolerance: tol, cells: N, gapCells: Ng, gasFractionResolved: Ng / N };

  if (c0 === 0 || ex.k === 0) {
    const v = new Float64Array(Ng).fill(1);
    return {
      ...base,
      slipRetained: 1,
      linearSlipRetained: 1,
      surfaceTensionDrop: 0,
      meanMarangoniStress: 0,
      profile: profileOf(v, clean),
      iterations: 0,
      residual: 0,
      stagnantCap: false,
      continuationSteps: 0,
      state: { cells: N, gapCells: Ng, tension: v, equilibriumTension: ex.equilibriumTension },
    };
  }

  const problem = transverseProblem(op, marangoni, eps, ex, timeScale);
  let maxClean = 0;
  for (let i = 0; i < Ng; i++) maxClean = Math.max(maxClean, clean[i]);
  const solveOptions = { tolerance: tol, maxNewtonIterations: Math.min(20, budget), maxPseudoSteps: 0, initialPseudoStep: h / Math.max(maxClean, eps / h) };

  // The linearised problem (about the uniform equilibrium): reported, and a start for Newton.
  let linearQ: Float64Array | null | undefined;
  let linearSlipRetained = NaN;
  const linearised = (): Float64Array | null => {
    if (linearQ !== undefined) return linearQ;
    linearQ = solveLinearised(op, Ma, eps, ex, timeScale);
    if (linearQ) {
      let sum = 0;
      for (let i = 0; i < Ng; i++) {
        let acc = 0;
        for (let j = 0; j < Ng; j++) acc += op.green[i * Ng + j] * linearQ[j];
        sum += clean[i] - Ma * ex.k * acc;
      }
      linearSlipRetained = sum / cleanSum;
    }
    return linearQ;
  };
  if (input.reportLinearised !== false) linearised();
  const linearStart = (): Float64Array | null => {
    const q = linearised();
    if (!q) return null;
    const mapped = new Float64Array(Ng);
    for (let i = 0; i < Ng; i++) {
      const coverage = Math.min(Math.max(ex.equilibriumCoverage * q[i], 1e-6 * ex.equilibriumCoverage), 1 - 1e-3 * (1 - ex.equilibriumCoverage));
      mapped[i] = -Math.log1p(-coverage) / ex.equilibriumTension;
    }
    return mapped;
  };

  // Starts: a warm start on the same grid, taken either as the same profile of v or as the same tension
  // profile s = v·s_eq (whichever has the smaller residual), then the linearised profile mapped to v with
  // the coverage kept admissible; Newton from each. Last, the pseudo-time march from the undisturbed
  // interface, which is the physical start-up of the flow over a freshly equilibrated interface.
  const starts: Array<() => Float64Array | null> = [];
  const warm = (Array.isArray(input.warmStart) ? input.warmStart : input.warmStart ? [input.warmStart] : []).filter((w) => w.cells === N && w.gapCells === Ng);
  if (warm.length > 0) {
    starts.push(() => {
      let best: Float64Array | null = null;
      let bestNorm = Infinity;
      for (const w of warm) {
        for (const candidate of [Float64Array.from(w.tension), w.tension.map((x) => (x * w.equilibriumTension) / ex.equilibriumTension)]) {
          const norm = relativeResidual(problem, candidate);
          if (norm < bestNorm) {
            bestNorm = norm;
            best = candidate;
          }
        }
      }
      return best;
    });
  }
  starts.push(linearStart);
  let iterations = 0;
  let sol: SteadyStateResult | undefined;
  const tried: Float64Array[] = [];
  for (const start of starts) {
    const x0 = start();
    if (!x0) continue;
    tried.push(x0);
    sol = solveSteadyState(problem, x0, solveOptions);
    iterations += sol.iterations;
    if (sol.converged || iterations >= budget) break;
  }
  // Pseudo-time march: from the warm start if there is one (the interface equilibrated at a neighbouring
  // concentration is as physical a start as the undisturbed one, and closer), then from the undisturbed one.
  const marchStarts = [...(warm.length > 0 && tried.length > 0 ? [tried[0]] : []), new Float64Array(Ng).fill(1)];
  for (const x0 of marchStarts) {
    if (sol?.converged || iterations >= budget) break;
    sol = solveSteadyState(problem, x0, { ...solveOptions, maxNewtonIterations: 0, maxPseudoSteps: Math.max(1, budget - iterations) });
    iterations += sol.iterations;
  }
  if (!sol) sol = solveSteadyState(problem, new Float64Array(Ng).fill(1), { ...solveOptions, maxNewtonIterations: 0, maxPseudoSteps: budget });
  if (!sol.converged) {
    throw new ConvergenceError('surfactant interface solver (Newton, then pseudo-transient continuation) did not converge', iterations, sol.residualNorm);
  }
  const v = sol.x;
  const u = problem.velocity(v);
  let sum = 0;
  for (let i = 0; i < Ng; i++) sum += u[i];
  const profile = profileOf(v, u);
  let stressSum = 0;
  for (const t of profile.marangoniStress) stressSum += t;
  // Stagnant cap: a downstream stretch (≥ 10 % of the gap) nearly at rest while the upstream part still moves.
  // The cell at the contact line is not judged: there u_c → 0 and the ratio u/u_c says nothing.
  let restCells = 1;
  for (let i = Ng - 2; i >= 0 && u[i] < 0.1 * clean[i]; i--) restCells++;
  if (restCells === 1) restCells = 0;
  let maxRatio = 0;
  for (let i = 0; i < Ng; i++) maxRatio = Math.max(maxRatio, u[i] / clean[i]);
  return {
    ...base,
    slipRetained: sum / cleanSum,
    linearSlipRetained,
    surfaceTensionDrop: nRTGm * ex.equilibriumTension * (v[Ng - 1] - v[0]),
    meanMarangoniStress: stressSum / Ng,
    profile,
    iterations,
    residual: sol.residualNorm,
    stagnantCap: restCells >= 0.1 * Ng && restCells < Ng && maxRatio > 0.3,
    continuationSteps: sol.pseudoSteps,
    state: { cells: N, gapCells: Ng, tension: Float64Array.from(v), equilibriumTension: ex.equilibriumTension },
  };
}
