/**
 * Interface solvers for surfactant-laden slip (the numerical part beyond the
 * scaling theory of surfactant-scaling.ts).
 *
 * 1. Transverse grating, one period P, gap of width w = φP, half-space of
 *    working fluid above, lubricant (or gas) below the gap.
 *    - Water side: Stokes flow in the half-space. Writing the flow as the
 *      no-slip shear flow γ̇y plus a periodic perturbation driven by the
 *      interface velocity u(x), Fourier mode k of u with amplitude û_k
 *      changes the wall shear by −2μ|k|û_k (stream function (B y) e^{−|k|y}
 *      with zero normal velocity at y = 0; derived here, standard Stokes
 *      result). Hence τ(x) = μγ̇ − 2μ(|∂|u)(x).
 *    - Lubricant: local drag μ u / b_local (b_local the lubricant's local
 *      slip length; zero drag for gas).
 *    - Ridges: no slip, u = 0.
 *    - Gap stress balance: τ = μ u/b_local − dσ/dx, σ by the Szyszkowski
 *      equation σ = σ0 + nRTΓ_m ln(1 − Γ/Γ_m).
 *    - Surface transport: d(uΓ)/dx − D_I d²Γ/dx² = J with zero total flux at
 *      the contact lines and Langmuir exchange J = κ_a c_s(Γ_m − Γ) − κ_d Γ,
 *      where the sublayer concentration follows the bulk-diffusion closure
 *      J = D (c0 − c_s)/δ with the Lévêque-type layer δ of Landel et al.
 *      (2020, eqs. 3.20–3.22). Eliminating c_s:
 *      J = [K c0 (Γ_m − Γ) − Γ] / (1/κ_d + K δ (Γ_m − Γ)/D)
 *      (1/κ_d → 0 for diffusion-controlled exchange).
 *    Discretisation (ours): N uniform cells per period, the gap made of
 *    whole cells; |∂| as the circulant trigonometric-interpolation matrix
 *    (spectral collocation); finite volumes for the transport with the
 *    exponentially fitted (Scharfetter–Gummel / Il'in) flux, exact for
 *    constant coefficients and stable at any cell Péclet number
 *    (Scharfetter & Gummel 1969, IEEE Trans. Electron Devices 16, 64–77,
 *    doi:10.1109/T-ED.1969.16566, DOI from memory). The linear problem (linearised about the
 *    uniform equilibrium Γ_eq) is solved first; the full nonlinear problem
 *    then by Newton's method (dense, difference Jacobian), with continuation
 *    in the Marangoni number when the direct Newton fails, so stagnant caps
 *    (Γ far from uniform) are resolved.
 *
 * 2. Streamwise grooves of finite length L_g: long-wave (L_g ≫ P) 1-D model
 *    along the groove (ours). Across the groove the Stokes problem is linear
 *    in the shear deficit, so a Marangoni stress τ_M(x) that varies slowly
 *    along the groove gives a groove-mean interface velocity
 *    U(x) = U_c (1 − τ_M/τ_w) with U_c = γ̇ b_∥/φ the clean groove-mean
 *    velocity. Transport d(UΓ)/dx − D_I Γ'' = J with zero flux at both
 *    ends; the retained longitudinal slip is the groove-mean of U/U_c,
 *    equal to 1 − (σ(0) − σ(L_g))/(τ_w L_g) in the continuum.
 *
 * Non-convergence throws ConvergenceError with the iteration count.
 */
import { solveDense } from '../../numerics/linalg.js';
import { solveDenseNewton } from '../../numerics/newton-dense.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { GAS_CONSTANT } from '../../core/constants.js';
import { LANDEL_FIT } from './scaling.js';
import type { ResolvedSurfactant } from '../../core/surfactant.js';

/** Exponentially fitted flux weight B(z) = z/(e^z − 1), B(0) = 1. */
function fittedWeight(z: number): number {
  if (Math.abs(z) < 1e-8) return 1 - z / 2;
  if (z > 700) return 0;
  return z / Math.expm1(z);
}

/** Lévêque-type diffusive sublayer on an interface of length g (Landel et al. 2020, eqs. 3.20–3.22), m. */
export function diffusiveLayerThickness(length: number, shearRate: number, bulkDiffusivity: number): number {
  return length * LANDEL_FIT.delta0 * Math.pow(1 + (LANDEL_FIT.delta1 * shearRate * length * length) / bulkDiffusivity, -1 / 3);
}

/** Surfactant, its bulk state and the Newton controls shared by both interface solvers. */
export interface SurfactantSolveConditions {
  surfactant: ResolvedSurfactant;
  /** c0, mol/m³. */
  bulkConcentration: number;
  /** T, K. */
  temperature: number;
  /** Newton tolerance on the dimensionless residual, ∞-norm (default 1e-10). */
  tolerance?: number;
  maxIterations?: number;
}

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
}

export interface InterfaceProfile {
  /** Positions along the flow, m (gap from 0 to w, or groove from 0 to L_g). */
  position: number[];
  /** Interface velocity, m/s. */
  velocity: number[];
  /** Clean interface velocity on the same grid, m/s. */
  cleanVelocity: number[];
  /** Γ, mol/m². */
  surfaceExcess: number[];
  /** −dσ/dx, Pa (positive = opposing the flow). */
  marangoniStress: number[];
  /** σ(x) − σ_eq, N/m. */
  tensionChange: number[];
}

export interface InterfaceSolution {
  /** b_surfactant/b_clean on the same grid. */
  slipRetained: number;
  /** Same from the linearised problem. */
  linearSlipRetained: number;
  /** Clean slip length of the discrete problem, m (compare with Philip). */
  cleanSlipLength: number;
  /** σ(upstream end) − σ(downstream end), N/m. */
  surfaceTensionDrop: number;
  /** Mean Marangoni stress over the interface, Pa. */
  meanMarangoniStress: number;
  profile: InterfaceProfile;
  /** Newton iterations of the nonlinear solve (all continuation steps). */
  iterations: number;
  residual: number;
  tolerance: number;
  cells: number;
  gapCells: number;
  /** Gas fraction as resolved by the grid (whole cells). */
  gasFractionResolved: number;
  stagnantCap: boolean;
  continuationSteps: number;
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

function exchangeParameters(s: ResolvedSurfactant, c0: number, delta: number): { k: number; geq: number; inverseDesorption: number; sublayer: number } {
  const k = s.langmuirConstant * c0;
  return {
    k,
    geq: k / (1 + k),
    inverseDesorption: s.desorptionRate !== undefined ? 1 / s.desorptionRate : 0,
    sublayer: (s.langmuirConstant * s.maximumSurfaceExcess * delta) / s.bulkDiffusivity,
  };
}

/**
 * Solve the transverse-grating interface problem (module comment, part 1).
 * Validity: Stokes flow, half-space (channel height ≫ P), flat interface,
 * bulk concentration below the CMC. Throws ConvergenceError if Newton
 * (with continuation) does not reach the tolerance.
 */
export function solveTransverseInterface(input: TransverseSolverInput): InterfaceSolution {
  const { pitch: P, grooveWidth: w, shearRate, viscosity: mu, surfactant: s, bulkConcentration: c0, temperature: T } = input;
  if (!(w > 0 && w < P)) throw new DomainError('groove width must lie between 0 and the pitch', { field: 'texture.grooveWidth' });
  if (!(shearRate > 0)) throw new DomainError('wall shear rate must be positive', { field: 'scenario.flow.wallShearStress' });
  const tol = input.tolerance ?? 1e-10;
  const maxIterations = input.maxIterations ?? 40;
  const phi = w / P;
  const { N, Ng } = chooseGrid(Math.max(16, Math.round(input.cells ?? 256)), phi);
  const h = 1 / N;
  const stencil = absoluteDerivativeStencil(N);
  const drag = input.localSlipLength !== undefined && Number.isFinite(input.localSlipLength) && input.localSlipLength > 0 ? P / input.localSlipLength : 0;
  // Dense momentum operator on the gap: 2|∂| + drag.
  const Mop = new Float64Array(Ng * Ng);
  for (let i = 0; i < Ng; i++) for (let j = 0; j < Ng; j++) Mop[i * Ng + j] = 2 * stencil[Math.abs(i - j)] + (i === j ? drag : 0);
  const ones = new Float64Array(Ng).fill(1);
  const clean = solveDense(Mop, ones, Ng);
  if (!clean) throw new ConvergenceError('clean interface system is singular', 0, Infinity);
  let cleanSum = 0;
  for (let i = 0; i < Ng; i++) cleanSum += clean[i];
  const cleanSlip = cleanSum * h * P; // mean of ũ over the period times P (b = ⟨u⟩/γ̇)

  const nRTGm = s.gibbsPrefactor * GAS_CONSTANT * T * s.maximumSurfaceExcess;
  const Ma = nRTGm / (mu * shearRate * P);
  const eps = Math.max(s.surfaceDiffusivity, 1e-30) / (shearRate * P * P);
  const delta = diffusiveLayerThickness(w, shearRate, s.bulkDiffusivity);
  const ex = exchangeParameters(s, c0, delta);
  const geq = ex.geq;
  const invBi = ex.inverseDesorption * shearRate;
  const beta = ex.sublayer * shearRate;

  const profileOf = (x: Float64Array): InterfaceProfile => {
    const position: number[] = [];
    const velocity: number[] = [];
    const cleanVelocity: number[] = [];
    const surfaceExcess: number[] = [];
    const marangoniStress: number[] = [];
    const tensionChange: number[] = [];
    const sEq = Math.log1p(-geq);
    for (let i = 0; i < Ng; i++) {
      position.push((i + 0.5) * h * P);
      velocity.push(x[i] * shearRate * P);
      cleanVelocity.push(clean[i] * shearRate * P);
      surfaceExcess.push(geq * x[Ng + i] * s.maximumSurfaceExcess);
      const si = Math.log1p(-geq * x[Ng + i]);
      const sl = Math.log1p(-geq * x[Ng + Math.max(i - 1, 0)]);
      const sr = Math.log1p(-geq * x[Ng + Math.min(i + 1, Ng - 1)]);
      marangoniStress.push((-nRTGm * (sr - sl)) / (2 * h * P));
      tensionChange.push(nRTGm * (si - sEq));
    }
    return { position, velocity, cleanVelocity, surfaceExcess, marangoniStress, tensionChange };
  };

  if (c0 === 0 || geq === 0) {
    const x = new Float64Array(2 * Ng);
    x.set(clean, 0);
    x.fill(1, Ng);
    return {
      slipRetained: 1,
      linearSlipRetained: 1,
      cleanSlipLength: cleanSlip,
      surfaceTensionDrop: 0,
      meanMarangoniStress: 0,
      profile: profileOf(x),
      iterations: 0,
      residual: 0,
      tolerance: tol,
      cells: N,
      gapCells: Ng,
      gasFractionResolved: Ng / N,
      stagnantCap: false,
      continuationSteps: 0,
    };
  }

  const mu2 = new Float64Array(Ng);
  // Residual of the full (linear = false) or linearised problem, Marangoni number scaled by theta.
  const makeResidual = (theta: number, linear: boolean) => (x: Float64Array, out: Float64Array) => {
    const MaT = Ma * theta;
    for (let i = 0; i < Ng; i++) {
      let acc = 0;
      const row = i * Ng;
      for (let j = 0; j < Ng; j++) acc += Mop[row + j] * x[j];
      mu2[i] = acc;
    }
    for (let i = 0; i < Ng; i++) {
      const qi = x[Ng + i];
      const ql = x[Ng + Math.max(i - 1, 0)];
      const qr = x[Ng + Math.min(i + 1, Ng - 1)];
      let dsdx: number;
      if (linear) dsdx = (-(geq / (1 - geq)) * (qr - ql)) / (2 * h);
      else dsdx = (Math.log1p(-geq * qr) - Math.log1p(-geq * ql)) / (2 * h);
      out[i] = 1 - mu2[i] + MaT * dsdx;
      // transport, cell i
      const flux = (a: number): number => {
        // face between cell a and a+1
        if (a < 0 || a >= Ng - 1) return 0;
        const uf = 0.5 * (x[a] + x[a + 1]);
        const qa = x[Ng + a];
        const qb = x[Ng + a + 1];
        if (linear) return uf - (eps * (qb - qa)) / h;
        const z = (uf * h) / eps;
        return (eps / h) * (fittedWeight(-z) * qa - fittedWeight(z) * qb);
      };
      const g = linear ? geq : geq * qi;
      const exchange = ((1 + ex.k) * (1 - qi)) / (invBi + beta * (1 - g));
      out[Ng + i] = (flux(i) - flux(i - 1)) / h - exchange;
      if (!linear && !(g < 1)) out[Ng + i] = NaN;
    }
  };
  const typical = new Float64Array(2 * Ng);
  for (let i = 0; i < Ng; i++) {
    typical[i] = Math.max(0.01, Math.abs(clean[i]));
    typical[Ng + i] = 1;
  }
  // Linear problem: Newton converges in one step (difference Jacobian of a linear map).
  const guess = new Float64Array(2 * Ng);
  guess.set(clean, 0);
  guess.fill(1, Ng);
  const lin = solveDenseNewton(makeResidual(1, true), guess, { tolerance: tol, maxIterations: 4, typicalSize: typical });
  const linearX = lin.x;
  let linSum = 0;
  for (let i = 0; i < Ng; i++) linSum += linearX[i];
  const linearSlipRetained = linSum / cleanSum;

  // Nonlinear: direct Newton from the linear solution (clipped to admissible Γ), else continuation in Ma.
  const start = Float64Array.from(linearX);
  const qMax = (1 - 1e-9) / geq;
  for (let i = Ng; i < 2 * Ng; i++) start[i] = Math.min(Math.max(start[i], 1e-6), 0.999 * qMax);
  let iterations = 0;
  let result = solveDenseNewton(makeResidual(1, false), start, { tolerance: tol, maxIterations, typicalSize: typical });
  iterations += result.iterations;
  let continuationSteps = 0;
  if (!result.converged) {
    let theta = 0;
    let dTheta = 0.05;
    let x: Float64Array = Float64Array.from(guess);
    const first = solveDenseNewton(makeResidual(0, false), x, { tolerance: tol, maxIterations: Math.max(maxIterations, 10), typicalSize: typical });
    iterations += first.iterations;
    if (!first.converged) throw new ConvergenceError('surfactant transport (no Marangoni coupling) did not converge', iterations, first.residualNorm);
    x = first.x;
    let last = first;
    while (theta < 1) {
      const next = Math.min(1, theta + dTheta);
      const r = solveDenseNewton(makeResidual(next, false), x, { tolerance: tol, maxIterations: Math.min(25, maxIterations), typicalSize: typical });
      iterations += r.iterations;
      continuationSteps++;
      if (r.converged) {
        theta = next;
        x = r.x;
        last = r;
        dTheta = Math.min(dTheta * 2, 0.5);
      } else {
        dTheta /= 4;
        if (dTheta < 1e-4 || continuationSteps > 200) {
          throw new ConvergenceError('surfactant interface Newton continuation stalled', iterations, r.residualNorm);
        }
      }
    }
    result = last;
  }
  const x = result.x;
  let sum = 0;
  for (let i = 0; i < Ng; i++) sum += x[i];
  const slipRetained = sum / cleanSum;
  const profile = profileOf(x);
  const drop = nRTGm * (Math.log1p(-geq * x[Ng]) - Math.log1p(-geq * x[2 * Ng - 1]));
  let stressSum = 0;
  for (const t of profile.marangoniStress) stressSum += t;
  // Stagnant cap: a downstream stretch (≥ 10 % of the gap) nearly at rest while the upstream part still moves.
  let restCells = 0;
  for (let i = Ng - 1; i >= 0 && x[i] < 0.1 * clean[i]; i--) restCells++;
  let maxRatio = 0;
  for (let i = 0; i < Ng; i++) maxRatio = Math.max(maxRatio, x[i] / clean[i]);
  const stagnantCap = restCells >= 0.1 * Ng && restCells < Ng && maxRatio > 0.3;
  return {
    slipRetained,
    linearSlipRetained,
    cleanSlipLength: cleanSlip,
    surfaceTensionDrop: drop,
    meanMarangoniStress: stressSum / Ng,
    profile,
    iterations,
    residual: result.residualNorm,
    tolerance: tol,
    cells: N,
    gapCells: Ng,
    gasFractionResolved: Ng / N,
    stagnantCap,
    continuationSteps,
  };
}

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
}

export interface LongWaveSolution {
  /** Groove-mean U/U_c (Richardson-extrapolated unless `extrapolate: false`). */
  slipRetained: number;
  /** The same on the finest grid, when extrapolated. */
  slipRetainedFinestGrid?: number;
  surfaceTensionDrop: number;
  profile: InterfaceProfile;
  iterations: number;
  residual: number;
  tolerance: number;
  cells: number;
  stagnantCap: boolean;
}

/**
 * Long-wave model along a streamwise groove of finite length (module
 * comment, part 2; ours). Validity: L_g ≫ P, Stokes flow, below the CMC.
 */
export function solveLongWaveGroove(input: LongWaveInput): LongWaveSolution {
  const fine = solveLongWaveOnGrid(input);
  if (input.extrapolate === false || fine.slipRetained === 1) return fine;
  // First-order scheme (upwind-like fitted fluxes, clustered cells): Richardson extrapolation
  // from N and N/2 cells removes the leading error (checked against scipy solve_bvp in the tests).
  const coarse = solveLongWaveOnGrid({ ...input, cells: Math.max(8, Math.round(fine.cells / 2)) });
  const extrapolated = Math.min(1, Math.max(0, 2 * fine.slipRetained - coarse.slipRetained));
  return { ...fine, slipRetained: extrapolated, slipRetainedFinestGrid: fine.slipRetained, iterations: fine.iterations + coarse.iterations };
}

function solveLongWaveOnGrid(input: LongWaveInput): LongWaveSolution {
  const { grooveLength: Lg, cleanInterfaceVelocity: Uc, shearRate, viscosity: mu, surfactant: s, bulkConcentration: c0, temperature: T } = input;
  if (!(Lg > 0)) throw new DomainError('groove length must be positive', { field: 'grooveLength' });
  const tol = input.tolerance ?? 1e-10;
  const N = Math.max(8, Math.round(input.cells ?? 200));
  const nRTGm = s.gibbsPrefactor * GAS_CONSTANT * T * s.maximumSurfaceExcess;
  const Ma = nRTGm / (mu * shearRate * Lg);
  const delta = diffusiveLayerThickness(Lg, shearRate, s.bulkDiffusivity);
  const ex = exchangeParameters(s, c0, delta);
  const geq = ex.geq;
  const position = Array.from({ length: N }, (_, i) => ((i + 0.5) / N) * Lg);
  if (c0 === 0 || geq === 0 || !(Uc > 0)) {
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
    };
  }
  const eps = Math.max(s.surfaceDiffusivity, 1e-30) / (Uc * Lg);
  const timeScale = Lg / Uc;
  // Faces clustered at both ends (tanh stretching), where the cap and the upstream depletion layer sit.
  const faces = new Float64Array(N + 1);
  const stretch = 3.5;
  for (let j = 0; j <= N; j++) faces[j] = 0.5 * (1 + Math.tanh(stretch * ((2 * j) / N - 1)) / Math.tanh(stretch));
  const centres = new Float64Array(N);
  const volume = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    centres[i] = 0.5 * (faces[i] + faces[i + 1]);
    volume[i] = faces[i + 1] - faces[i];
  }
  const gapTo = (a: number): number => centres[a + 1] - centres[a];
  const faceVelocity = (q: Float64Array, a: number, theta: number): number =>
    1 + (Ma * theta * (Math.log1p(-geq * q[a + 1]) - Math.log1p(-geq * q[a]))) / gapTo(a);
  const makeResidual = (theta: number) => (q: Float64Array, out: Float64Array) => {
    const flux = (a: number): number => {
      if (a < 0 || a >= N - 1) return 0;
      const d = gapTo(a);
      const uf = faceVelocity(q, a, theta);
      const z = (uf * d) / eps;
      return (eps / d) * (fittedWeight(-z) * q[a] - fittedWeight(z) * q[a + 1]);
    };
    for (let i = 0; i < N; i++) {
      const g = geq * q[i];
      const exchange = (timeScale * (1 + ex.k) * (1 - q[i])) / (ex.inverseDesorption + ex.sublayer * (1 - g));
      out[i] = g < 1 ? flux(i) - flux(i - 1) - exchange * volume[i] : NaN; // integrated over the cell: well scaled on small cells
    }
  };
  let q: Float64Array = new Float64Array(N).fill(1);
  let iterations = 0;
  const maxIterations = input.maxIterations ?? 40;
  let r = solveDenseNewton(makeResidual(1), q, { tolerance: tol, maxIterations });
  iterations += r.iterations;
  if (!r.converged) {
    let theta = 0;
    let dTheta = 0.05;
    let steps = 0;
    while (theta < 1) {
      const next = Math.min(1, theta + dTheta);
      const rr = solveDenseNewton(makeResidual(next), q, { tolerance: tol, maxIterations: Math.min(25, maxIterations) });
      iterations += rr.iterations;
      steps++;
      if (rr.converged) {
        theta = next;
        q = rr.x;
        r = rr;
        dTheta = Math.min(2 * dTheta, 0.5);
      } else {
        dTheta /= 4;
        if (dTheta < 1e-4 || steps > 200) throw new ConvergenceError('long-wave groove model did not converge', iterations, rr.residualNorm);
      }
    }
  }
  q = r.x;
  const velocity: number[] = [];
  const marangoniStress: number[] = [];
  const sEq = Math.log1p(-geq);
  for (let i = 0; i < N; i++) {
    const left = i > 0 ? faceVelocity(q, i - 1, 1) : undefined;
    const right = i < N - 1 ? faceVelocity(q, i, 1) : undefined;
    const ui = left !== undefined && right !== undefined ? 0.5 * (left + right) : (left ?? right ?? 1);
    velocity.push(ui * Uc);
    marangoniStress.push((1 - ui) * mu * shearRate);
  }
  // Groove-mean of U/U_c: face velocities weighted by the centre-to-centre spacing.
  let sumU = 0;
  let span = 0;
  for (let a = 0; a < N - 1; a++) {
    sumU += faceVelocity(q, a, 1) * gapTo(a);
    span += gapTo(a);
  }
  const slipRetained = sumU / span;
  let restLength = 0;
  for (let i = N - 1; i >= 0 && velocity[i] < 0.1 * Uc; i--) restLength += volume[i];
  return {
    slipRetained,
    surfaceTensionDrop: nRTGm * (Math.log1p(-geq * q[0]) - Math.log1p(-geq * q[N - 1])),
    profile: {
      position: Array.from(centres, (x) => x * Lg),
      velocity,
      cleanVelocity: velocity.map(() => Uc),
      surfaceExcess: Array.from(q, (v) => v * geq * s.maximumSurfaceExcess),
      marangoniStress,
      tensionChange: Array.from(q, (v) => nRTGm * (Math.log1p(-geq * v) - sEq)),
    },
    iterations,
    residual: r.residualNorm,
    tolerance: tol,
    cells: N,
    stagnantCap: restLength >= 0.05 && restLength < 1,
  };
}
