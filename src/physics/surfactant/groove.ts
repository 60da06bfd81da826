/**
 * Long-wave model of surfactant along a streamwise groove of finite length
 * L_g ≫ P (ours). Across the groove the Stokes problem is linear in the
 * shear deficit, so a Marangoni stress τ_M(x) that varies slowly along the
 * groove gives a groove-mean interface velocity U(x) = U_c (1 − τ_M/τ_w)
 * with U_c = γ̇ b_∥/φ the clean groove-mean velocity. Transport
 * d(UΓ)/dx − D_I Γ'' = J with zero flux at both ends (exchange J of
 * surfactant-transport.ts); the retained longitudinal slip is the
 * groove-mean of U/U_c, equal to 1 − (σ(0) − σ(L_g))/(τ_w L_g) in the
 * continuum.
 *
 * Discretisation: finite volumes on cells clustered at both ends (tanh
 * stretching), where the stagnant cap and the upstream depletion layer sit;
 * fitted fluxes; first order, so the default answer is Richardson-
 * extrapolated from N and N/2 cells (checked against scipy solve_bvp in the
 * tests). In the tension variable v (surfactant-transport.ts) the face
 * velocity U_a = U_c[1 − Ma s_eq (v_{a+1} − v_a)/Δx_a] is local, so the
 * Jacobian is tridiagonal: each Newton iteration or pseudo time step costs
 * O(N) (numerics/steady-state.ts; pivoted tridiagonal elimination, because
 * the Marangoni coupling makes the rows far from diagonally dominant).
 *
 * Non-convergence throws ConvergenceError with the iteration count.
 */
import { solveTridiagonalPivoting } from '../../numerics/linalg.js';
import { solveSteadyState, type SteadyStateProblem } from '../../numerics/steady-state.js';
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

export interface LongWaveInput extends SurfactantSolveConditions {
  /** L_g, m. */
  grooveLength: number;
  /** U_c = γ̇ b_∥/φ, clean groove-mean interface velocity, m/s. */
  cleanInterfaceVelocity: number;
  shearRate: number;
  viscosity: number;
  /** Cells along the groove (default 200). */
  cells?: number;
  /** Richardson-extrapolate the retained slip from `cells` and `cells/2` (default true). */
  extrapolate?: boolean;
  /** State of an earlier solve (any grid: interpolated) to start from. */
  warmStart?: GrooveState;
}

/** Tension variable v at the cell centres (positions as fractions of L_g); opaque to callers. */
export interface GrooveState {
  centres: Float64Array;
  tension: Float64Array;
}

export interface LongWaveSolution {
  /** Groove-mean U/U_c (Richardson-extrapolated unless `extrapolate: false`). */
  slipRetained: number;
  /** The same on the finest grid, when extrapolated. */
  slipRetainedFinestGrid?: number;
  surfaceTensionDrop: number;
  profile: InterfaceProfile;
  /** Linear solves (Newton iterations plus pseudo time steps), all grids. */
  iterations: number;
  /** Relative residual at the solution (finest grid). */
  residual: number;
  tolerance: number;
  cells: number;
  stagnantCap: boolean;
  /** For a warm start of a neighbouring solve (finest grid). */
  state: GrooveState;
}

/**
 * Long-wave model along a streamwise groove of finite length (module
 * comment). Validity: L_g ≫ P, Stokes flow, below the CMC.
 */
export function solveLongWaveGroove(input: LongWaveInput): LongWaveSolution {
  const fine = solveOnGrid(input, input.warmStart);
  if (input.extrapolate === false || fine.slipRetained === 1) return fine;
  // First-order scheme: Richardson extrapolation from N and N/2 cells removes the leading error.
  const coarse = solveOnGrid({ ...input, cells: Math.max(8, Math.round(fine.cells / 2)) }, fine.state);
  const extrapolated = Math.min(1, Math.max(0, 2 * fine.slipRetained - coarse.slipRetained));
  return { ...fine, slipRetained: extrapolated, slipRetainedFinestGrid: fine.slipRetained, iterations: fine.iterations + coarse.iterations };
}

/** Linear interpolation of a state onto new centres (constant beyond the ends). */
function interpolateState(state: GrooveState, centres: Float64Array): Float64Array {
  const out = new Float64Array(centres.length);
  const xs = state.centres;
  const ys = state.tension;
  let j = 0;
  for (let i = 0; i < centres.length; i++) {
    const x = centres[i];
    if (x <= xs[0]) out[i] = ys[0];
    else if (x >= xs[xs.length - 1]) out[i] = ys[ys.length - 1];
    else {
      while (j < xs.length - 2 && xs[j + 1] < x) j++;
      while (j > 0 && xs[j] > x) j--;
      const t = (x - xs[j]) / (xs[j + 1] - xs[j]);
      out[i] = ys[j] + t * (ys[j + 1] - ys[j]);
    }
  }
  return out;
}

function grooveProblem(
  centres: Float64Array,
  volume: Float64Array,
  marangoni: number,
  eps: number,
  ex: ExchangeState,
  timeScale: number,
): SteadyStateProblem & { faceVelocity(v: Float64Array, a: number): number } {
  const N = centres.length;
  const spacing = (a: number): number => centres[a + 1] - centres[a];
  const faceVelocity = (v: Float64Array, a: number): number => 1 - (marangoni * (v[a + 1] - v[a])) / spacing(a);
  const transport = transportProblem({ volume, spacing, faceVelocity, diffusivity: eps, exchange: ex, timeScale });
  return {
    ...transport,
    faceVelocity,
    solveLinearised(v, shift, rhs) {
      const lower = new Float64Array(N);
      const diag = new Float64Array(N);
      const upper = new Float64Array(N);
      const add = (i: number, j: number, value: number): void => {
        if (j === i) diag[i] += value;
        else if (j === i + 1) upper[i] += value;
        else lower[i] += value;
      };
      const dU = transport.localJacobian(v, shift, add);
      // U_a depends on v_a (+Ma s_eq/Δx_a) and v_{a+1} (−Ma s_eq/Δx_a) only: the Jacobian stays tridiagonal.
      for (let a = 0; a < N - 1; a++) {
        const w = (marangoni / spacing(a)) * dU[a];
        add(a, a, w);
        add(a, a + 1, -w);
        add(a + 1, a, -w);
        add(a + 1, a + 1, w);
      }
      return solveTridiagonalPivoting(lower, diag, upper, rhs);
    },
  };
}

function solveOnGrid(input: LongWaveInput, warmStart: GrooveState | undefined): LongWaveSolution {
  const { grooveLength: Lg, cleanInterfaceVelocity: Uc, shearRate, viscosity: mu, surfactant: s, bulkConcentration: c0, temperature: T } = input;
  if (!(Lg > 0)) throw new DomainError('groove length must be positive', { field: 'grooveLength' });
  const tol = input.tolerance ?? 1e-10;
  const budget = Math.max(1, Math.round(input.maxIterations ?? 400));
  const N = Math.max(8, Math.round(input.cells ?? 200));
  const nRTGm = s.gibbsPrefactor * GAS_CONSTANT * T * s.maximumSurfaceExcess;
  const Ma = nRTGm / (mu * shearRate * Lg);
  const ex = exchangeState(s, c0, diffusiveLayerThickness(Lg, shearRate, s.bulkDiffusivity));
  const faces = new Float64Array(N + 1);
  const stretch = 3.5;
  for (let j = 0; j <= N; j++) faces[j] = 0.5 * (1 + Math.tanh(stretch * ((2 * j) / N - 1)) / Math.tanh(stretch));
  const centres = new Float64Array(N);
  const volume = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    centres[i] = 0.5 * (faces[i] + faces[i + 1]);
    volume[i] = faces[i + 1] - faces[i];
  }
  if (c0 === 0 || ex.k === 0 || !(Uc > 0)) {
    const position = Array.from(centres, (x) => x * Lg);
    return {
      slipRetained: 1,
      surfaceTensionDrop: 0,
      profile: {
        position,
        velocity: position.map(() => Uc),
        cleanVelocity: position.map(() => Uc),
        surfaceExcess: position.map(() => 0),
        marangoniStress: position.map(() => 0),
        tensionChange: position.map(() => 0),
      },
      iterations: 0,
      residual: 0,
      tolerance: tol,
      cells: N,
      stagnantCap: false,
      state: { centres, tension: new Float64Array(N).fill(1) },
    };
  }
  const eps = Math.max(s.surfaceDiffusivity, 1e-30) / (Uc * Lg);
  const problem = grooveProblem(centres, volume, Ma * ex.equilibriumTension, eps, ex, Lg / Uc);
  const start = warmStart ? interpolateState(warmStart, centres) : new Float64Array(N).fill(1);
  const options = { tolerance: tol, maxNewtonIterations: Math.min(30, budget), maxPseudoSteps: budget, initialPseudoStep: 0.1 / N };
  let sol = solveSteadyState(problem, start, options);
  let iterations = sol.iterations;
  if (!sol.converged && warmStart) {
    sol = solveSteadyState(problem, new Float64Array(N).fill(1), { ...options, maxNewtonIterations: 0 });
    iterations += sol.iterations;
  }
  if (!sol.converged) throw new ConvergenceError('long-wave groove model (Newton, then pseudo-transient continuation) did not converge', iterations, sol.residualNorm);
  const v = sol.x;
  const velocity: number[] = [];
  const marangoniStress: number[] = [];
  for (let i = 0; i < N; i++) {
    const left = i > 0 ? problem.faceVelocity(v, i - 1) : undefined;
    const right = i < N - 1 ? problem.faceVelocity(v, i) : undefined;
    const ui = left !== undefined && right !== undefined ? 0.5 * (left + right) : (left ?? right ?? 1);
    velocity.push(ui * Uc);
    marangoniStress.push((1 - ui) * mu * shearRate);
  }
  // Groove-mean of U/U_c: face velocities weighted by the centre-to-centre spacing.
  let sumU = 0;
  let span = 0;
  for (let a = 0; a < N - 1; a++) {
    const d = centres[a + 1] - centres[a];
    sumU += problem.faceVelocity(v, a) * d;
    span += d;
  }
  let restLength = 0;
  for (let i = N - 1; i >= 0 && velocity[i] < 0.1 * Uc; i--) restLength += volume[i];
  const tension = ex.equilibriumTension * nRTGm;
  return {
    slipRetained: sumU / span,
    surfaceTensionDrop: tension * (v[N - 1] - v[0]),
    profile: {
      position: Array.from(centres, (x) => x * Lg),
      velocity,
      cleanVelocity: velocity.map(() => Uc),
      surfaceExcess: Array.from(v, (x) => -Math.expm1(-ex.equilibriumTension * x) * s.maximumSurfaceExcess),
      marangoniStress,
      tensionChange: Array.from(v, (x) => -tension * (x - 1)),
    },
    iterations,
    residual: sol.residualNorm,
    tolerance: tol,
    cells: N,
    stagnantCap: restLength >= 0.05 && restLength < 1,
    state: { centres, tension: Float64Array.from(v) },
  };
}
