/**
 * Surfactant sensitivity of the slip of a liquid-infused (or gas-filled)
 * grooved surface: how much of the clean slip survives a given bulk
 * concentration of surfactant, by the scaling theory of Landel et al. (2020)
 * [1] (surfactant-scaling.ts) or by the interface solvers
 * (surfactant-solver.ts: transverse-grating solver, long-wave model along
 * finite streamwise grooves).
 *
 * Composition (ours):
 * - transverse slip: b_⊥ = (1 − γ_Ma) b_⊥,clean (scaling; half-space, or the
 *   channel relation of [1] when the flow is a channel), or
 *   b_⊥ = R_solver b_⊥,clean with R_solver the solver's retained fraction;
 * - longitudinal slip: unaffected for infinitely long grooves (no streamwise
 *   surfactant gradient can build up: warned); for grooves of length L_g,
 *   eq. (4.29) of [1] with g = L_g and u_c = γ̇ b_∥/φ (scaling; our
 *   extension) or the long-wave model (solver);
 * - along the flow at angle θ to the grooves: b = b_∥ cos²θ + b_⊥ sin²θ
 *   (projection of the slip tensor; common practice, no source).
 * The clean slip lengths are inputs (from the slip model), so c = 0 returns
 * them exactly. Solves along the points, the concentration curve and the
 * half-slip root start from their neighbours (surfactant-warm-starts.ts); a
 * point whose solve finds no steady state within its iteration budget is
 * answered by the scaling theory with the warning `solver-fallback-scaling`,
 * never by an error (none in the committed 600-design sweep,
 * bench/surfactant-sweep.ts). The drag change with the reduced slip is computed by the
 * slip endpoint's drag model from `slipLength` (not here).
 *
 * Regime thresholds (ours; common practice, no source): `clean` when at
 * least 90 % of the slip is retained, `immobilised` at most 10 %,
 * `stagnant-cap` when the solver finds a downstream stretch (≥ 10 % of the
 * interface) nearly at rest while the upstream part moves, else
 * `partially-mobile`.
 *
 * References:
 * [1] Landel, J. R., Peaudecerf, F. J., Temprano-Coleto, F., Gibou, F., Goldstein, R. E. &
 *     Luzzatto-Fegiz, P. (2020) J. Fluid Mech., arXiv:1904.01194 (landel2020).
 * [2] Philip, J. R. (1972) Flows satisfying mixed no-slip and no-shear conditions (philip1972).
 * [3] Peaudecerf, F. J., Landel, J. R., Goldstein, R. E. & Luzzatto-Fegiz, P. (2017) Traces of
 *     surfactants can severely limit the drag reduction of superhydrophobic surfaces.
 *     Proc. Natl Acad. Sci. USA 114, 7254–7259, doi:10.1073/pnas.1702469114.
 */
import { brent } from '../../numerics/roots.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import type { Scenario } from '../scenario.js';
import { REFERENCES } from '../../core/references.js';
import type { ResolvedSurfactant } from '../../core/surfactant.js';
import { surfactantEquilibrium, type SurfactantEquilibrium } from './equilibrium.js';
import {
  cleanTransverseCoefficients,
  marangoniScaling,
  philipTransverse,
  slipWithMarangoni,
  type SurfactantGroups,
} from './scaling.js';
import { solveLongWaveGroove, solveTransverseInterface, type InterfaceProfile } from './solver.js';
import { nearestState, transverseStarts, type WarmStarts } from './warm-starts.js';

export type SurfactantMethod = 'scaling' | 'solver' | 'auto';
export type SurfactantRegime = 'clean' | 'partially-mobile' | 'immobilised' | 'stagnant-cap';

export interface CleanSlip {
  /** b_∥, m. */
  slipLengthLongitudinal: number;
  /** b_⊥, m. */
  slipLengthTransverse: number;
  /** Local slip length of the lubricant over the groove (groove-mean), m. */
  localSlipLengthMean: number;
}

export interface SurfactantInput {
  scenario: Scenario;
  surfactant: ResolvedSurfactant;
  /** c, mol/m³: one value, or a list. */
  bulkConcentration: number | number[];
  /** T, K. */
  temperature: number;
  method: SurfactantMethod;
  cleanSlip: CleanSlip;
  /** Length of streamwise grooves, m (finite grooves); omit for grooves much longer than anything else. */
  grooveLength?: number;
  /** What fills the grooves: lubricant (local drag from localSlipLengthMean) or gas (no drag). Default: gas when the lubricant viscosity is below 5 % of the working fluid's, else lubricant. */
  underlying?: 'lubricant' | 'gas';
  /** Clean interfacial tension σ0, N/m (for the reported σ); default from the scenario. */
  cleanTension?: number;
  /** Curve of slip retained against concentration: number of points and range (mol/m³). */
  curve?: { points?: number; minimum?: number; maximum?: number };
  /**
   * Leave out the curve and the half-slip concentration (empty curve, null concentration): for a caller that reads
   * only the points, such as an assessment's sensitivity steps. Default false.
   */
  pointsOnly?: boolean;
  /** Solver resolution, tolerance and iteration budget (linear solves per solve, default 400). */
  solver?: { cells?: number; grooveCells?: number; tolerance?: number; maxIterations?: number };
}

export interface SurfactantValidity {
  /** k = K c ≤ 1 (the scaling theory's dilute assumption). */
  dilute: boolean;
  /** Gap Reynolds number ρ γ̇ w²/μ ≤ 1. */
  stokes: boolean;
  belowCriticalMicelleConcentration: boolean;
  /** The scaling theory's uniform-Marangoni assumption holds (no stagnant cap by the criteria of [1]). */
  uniformMarangoni: boolean;
  /** Long-wave model: groove length ≥ 10 pitches (only with a groove length). */
  longWave?: boolean;
}

export interface SurfactantPoint {
  bulkConcentration: number;
  method: 'scaling' | 'solver';
  equilibrium: SurfactantEquilibrium;
  /** Groups of the transverse gap (length w). */
  groups: SurfactantGroups;
  /** Groups of the finite streamwise groove (length L_g), when given. */
  groupsLongitudinal?: SurfactantGroups;
  /** γ_Ma of the scaling theory, transverse gap. */
  marangoniReduction: number;
  marangoniReductionLongitudinal?: number;
  slipLengthTransverse: number;
  slipLengthLongitudinal: number;
  /** Slip length along the flow, m (feed to the slip drag model). */
  slipLength: number;
  /** slipLength / clean slipLength along the flow. */
  slipRetained: number;
  regime: SurfactantRegime;
  /** Mean Marangoni stress on the transverse gap, Pa. */
  marangoniStress: number;
  /** σ(upstream) − σ(downstream) along the transverse gap, N/m. */
  surfaceTensionDrop: number;
  /** Interface profile on the transverse gap. */
  interfaceProfile: InterfaceProfile;
  /** Interface profile along the finite groove (solver only). */
  grooveProfile?: InterfaceProfile;
  validity: SurfactantValidity;
  solver?: {
    iterations: number;
    residual: number;
    tolerance: number;
    cells: number;
    linearSlipRetained: number;
    continuationSteps: number;
    longWaveIterations?: number;
  };
}

export interface SurfactantResult {
  interfaceType: string;
  /** Clean slip length along the flow, m. */
  cleanSlipLength: number;
  points: SurfactantPoint[];
  /** Of the first concentration (see `points` for a list). */
  slipLength: number;
  slipRetained: number;
  regime: SurfactantRegime;
  /** Bulk concentration at which half of the clean slip is lost, mol/m³ (null if not in the curve's range). */
  concentrationForHalfSlip: number | null;
  curve: { method: SurfactantMethod; bulkConcentration: number[]; slipRetained: number[] };
}

interface Prepared {
  shearRate: number;
  mu: number;
  pitch: number;
  width: number;
  phi: number;
  halfHeight?: number;
  localSlip?: number;
  centreVelocity: number;
  shearFreeSlip: number;
  theta: number;
}

function prepare(input: SurfactantInput, notes: Notes): Prepared {
  const { scenario, cleanSlip } = input;
  const t = scenario.texture;
  if (!(t.pitch > 0) || !(t.grooveWidth > 0) || !(t.grooveWidth < t.pitch)) {
    throw new DomainError('groove width must be positive and smaller than the pitch', { field: 'scenario.texture.grooveWidth' });
  }
  for (const [name, v] of Object.entries(cleanSlip)) {
    if (!Number.isFinite(v) || v < 0) throw new DomainError(`${name} must be a finite length ≥ 0`, { field: `cleanSlip.${name}` });
  }
  const mu = scenario.workingFluid.viscosity;
  const tau = scenario.flow.wallShearStress;
  if (!(mu > 0) || !(tau > 0)) throw new DomainError('working-fluid viscosity and wall shear stress must be positive', { field: 'scenario.flow.wallShearStress' });
  const shearRate = tau / mu;
  const pitch = t.pitch;
  const width = t.grooveWidth;
  const phi = width / pitch;
  let halfHeight: number | undefined;
  if (scenario.flow.kind === 'channel' && scenario.flow.height && scenario.flow.height > 0) halfHeight = scenario.flow.height / 2;
  if (scenario.flow.kind === 'pipe' && scenario.flow.diameter && scenario.flow.diameter > 0) {
    halfHeight = scenario.flow.diameter / 2;
    notes.assume('pipe treated as a channel of half-height D/2 for the clean coefficients of the scaling theory');
  }
  let centreSf: number;
  let slipSf: number;
  if (halfHeight !== undefined) {
    const cc = cleanTransverseCoefficients(pitch / halfHeight, phi);
    centreSf = 2 * shearRate * halfHeight * cc.centreCoefficient;
    slipSf = (halfHeight * 2 * cc.meanCoefficient) / (1 - cc.meanCoefficient);
    notes.model('surfactant.clean-grating-channel');
  } else {
    const p = philipTransverse(pitch, phi, shearRate);
    centreSf = p.centreVelocity;
    slipSf = p.slipLength;
    notes.model('surfactant.clean-grating-half-space');
  }
  // A lubricant far less viscous than the working fluid is a gas (plastron): no local drag (our threshold, 5 %).
  const gas = input.underlying === 'gas' || (input.underlying === undefined && scenario.lubricant.viscosity < 0.05 * mu);
  if (gas && input.underlying === undefined) notes.assume('lubricant viscosity below 5 % of the working fluid: treated as gas (shear-free gap)');
  const localSlip = gas ? undefined : cleanSlip.localSlipLengthMean;
  let factor = slipSf > 0 ? cleanSlip.slipLengthTransverse / slipSf : 1;
  if (factor > 1) {
    if (factor > 1.05) {
      notes.warn('clean-slip-above-shear-free', 'the clean transverse slip exceeds the shear-free value of the same grating; lubricant factor capped at 1', 'caution');
    }
    factor = 1;
  }
  if (!gas) {
    notes.assume(
      'lubricant below the interface (our extension of Landel et al. 2020): the interface velocity scales as (1 − γ_Ma) exactly by linearity; the lubricant enters γ_Ma through the clean gap-centre velocity, taken as the shear-free value times b_⊥,clean/b_⊥,shear-free; checked against the interface solver with the local lubricant drag',
    );
  }
  if (scenario.flow.regime !== 'laminar') {
    notes.warn('turbulent-wall-shear', 'the surfactant models use the viscous-sublayer shear rate τ_w/μ; valid while the texture lies well inside the viscous sublayer', 'caution');
  }
  return { shearRate, mu, pitch, width, phi, halfHeight, localSlip, centreVelocity: factor * centreSf, shearFreeSlip: slipSf, theta: (t.flowAngle * Math.PI) / 180 };
}

function classify(retained: number, stagnantCap: boolean): SurfactantRegime {
  if (retained >= 0.9) return 'clean';
  if (retained <= 0.1) return 'immobilised';
  if (stagnantCap) return 'stagnant-cap';
  return 'partially-mobile';
}

function uniformProfile(pr: Prepared, reduction: number, tauW: number): InterfaceProfile {
  const n = 41;
  const position: number[] = [];
  const velocity: number[] = [];
  const cleanVelocity: number[] = [];
  const marangoniStress: number[] = [];
  const tensionChange: number[] = [];
  const c = Math.cos((Math.PI * pr.phi) / 2);
  const centreShape = Math.acosh(1 / c);
  for (let i = 0; i < n; i++) {
    const x = (i / (n - 1)) * pr.width;
    const xi = x - pr.width / 2;
    const arg = Math.max(1, Math.cos((Math.PI * xi) / pr.pitch) / c);
    const shape = Math.acosh(arg) / centreShape;
    position.push(x);
    cleanVelocity.push(pr.centreVelocity * shape);
    velocity.push((1 - reduction) * pr.centreVelocity * shape);
    marangoniStress.push(reduction * tauW);
    tensionChange.push(reduction * tauW * (pr.width / 2 - x));
  }
  return { position, velocity, cleanVelocity, surfaceExcess: [], marangoniStress, tensionChange };
}

interface PointRun {
  forceMethod?: 'scaling' | 'solver';
  /** Transverse solver cells (default input.solver.cells ?? 256). */
  cells?: number;
  warm: WarmStarts;
  /** Only the slip along the flow is wanted (curve, half-slip root): skip the transverse solve when the flow is along the grooves. */
  slipOnly?: boolean;
}

/** The regime the scaling groups point to, in words, for the fallback warning. */
function scalingRegime(groups: SurfactantGroups, stagnantCapLikely: boolean, dilute: boolean): string {
  const pe = `Pe_I,g = ${groups.interfacialPecletNumber.toPrecision(3)}`;
  if (!dilute) return `a concentrated interface (k = K c = ${groups.dimensionlessConcentration.toPrecision(3)} > 1), where the scaling theory underpredicts the slip`;
  if (stagnantCapLikely) return `the stagnant-cap regime (${pe}, slow exchange), where the scaling theory underpredicts the slip`;
  return `the uniform-Marangoni regime (${pe}), where the scaling theory holds`;
}

function evaluatePoint(input: SurfactantInput, pr: Prepared, c: number, notes: Notes, run: PointRun): SurfactantPoint {
  const s = input.surfactant;
  const T = input.temperature;
  const tauW = input.scenario.flow.wallShearStress;
  const sigma0 = input.cleanTension ?? (s.interfaceType === 'air-water' ? input.scenario.workingFluid.surfaceTension : input.scenario.interfacialTension);
  const equilibrium = surfactantEquilibrium(s, c, T, notes, sigma0);
  const scal = marangoniScaling({ gapLength: pr.width, centreVelocity: pr.centreVelocity, shearRate: pr.shearRate, viscosity: pr.mu, surfactant: s, bulkConcentration: c, temperature: T });
  const clean = input.cleanSlip;
  const Lg = input.grooveLength;
  let scalLong: ReturnType<typeof marangoniScaling> | undefined;
  const Ulong = pr.phi > 0 ? (pr.shearRate * clean.slipLengthLongitudinal) / pr.phi : 0;
  if (Lg !== undefined) {
    scalLong = marangoniScaling({ gapLength: Lg, centreVelocity: Ulong, shearRate: pr.shearRate, viscosity: pr.mu, surfactant: s, bulkConcentration: c, temperature: T });
  }
  const rho = input.scenario.workingFluid.density;
  const validity: SurfactantValidity = {
    dilute: scal.flags.dilute,
    stokes: (rho * pr.shearRate * pr.width * pr.width) / pr.mu <= 1,
    belowCriticalMicelleConcentration: !equilibrium.aboveCriticalMicelleConcentration,
    uniformMarangoni: !scal.flags.stagnantCapLikely && !(scalLong?.flags.stagnantCapLikely ?? false),
    ...(Lg !== undefined ? { longWave: Lg >= 10 * pr.pitch } : {}),
  };
  let method: 'scaling' | 'solver';
  if (run.forceMethod) method = run.forceMethod;
  else if (input.method === 'auto') method = validity.dilute && validity.uniformMarangoni ? 'scaling' : 'solver';
  else method = input.method;

  const cos2 = Math.cos(pr.theta) ** 2;
  const sin2 = 1 - cos2;
  const cleanFlow = clean.slipLengthLongitudinal * cos2 + clean.slipLengthTransverse * sin2;
  const scalingAnswer = () => ({
    bPerp: slipWithMarangoni(clean.slipLengthTransverse, scal.marangoniReduction, pr.halfHeight),
    bPar: scalLong ? (1 - scalLong.marangoniReduction) * clean.slipLengthLongitudinal : clean.slipLengthLongitudinal,
    interfaceProfile: uniformProfile(pr, scal.marangoniReduction, tauW),
    marangoniStress: scal.marangoniReduction * tauW,
    drop: scal.marangoniReduction * tauW * pr.width,
  });
  let bPerp: number;
  let bPar: number;
  let interfaceProfile: InterfaceProfile;
  let grooveProfile: InterfaceProfile | undefined;
  let stagnant = false;
  let marangoniStress: number;
  let drop: number;
  let solverInfo: SurfactantPoint['solver'];
  if (method === 'solver') {
    const warmTransverse = c > 0 ? transverseStarts(run.warm, c) : [];
    const warmGroove = c > 0 ? nearestState(run.warm, c, 'groove') : undefined;
    const solved: WarmStarts['solved'][number] = { logConcentration: Math.log(c) };
    if (c > 0) run.warm.solved.push(solved);
    try {
      const tol = input.solver?.tolerance ?? 1e-10;
      let iterations = 0;
      let residual = 0;
      let continuationSteps = 0;
      let linearSlipRetained = 1;
      let cells = 0;
      if (run.slipOnly && sin2 < 1e-12) {
        // Flow along the grooves: the transverse gap does not enter the slip along the flow.
        bPerp = clean.slipLengthTransverse;
        interfaceProfile = uniformProfile(pr, 0, tauW);
        marangoniStress = 0;
        drop = 0;
      } else {
        const sol = solveTransverseInterface({
          pitch: pr.pitch,
          grooveWidth: pr.width,
          shearRate: pr.shearRate,
          viscosity: pr.mu,
          localSlipLength: pr.localSlip,
          surfactant: s,
          bulkConcentration: c,
          temperature: T,
          cells: run.cells ?? input.solver?.cells ?? 256,
          tolerance: tol,
          ...(input.solver?.maxIterations !== undefined ? { maxIterations: input.solver.maxIterations } : {}),
          ...(warmTransverse.length > 0 ? { warmStart: warmTransverse } : {}),
          ...(run.slipOnly ? { reportLinearised: false } : {}),
        });
        solved.transverse = sol.state;
        bPerp = sol.slipRetained * clean.slipLengthTransverse;
        interfaceProfile = sol.profile;
        stagnant = sol.stagnantCap;
        marangoniStress = sol.meanMarangoniStress;
        drop = sol.surfaceTensionDrop;
        ({ iterations, residual, continuationSteps, linearSlipRetained, cells } = sol);
      }
      solverInfo = { iterations, residual, tolerance: tol, cells, linearSlipRetained, continuationSteps };
      bPar = clean.slipLengthLongitudinal;
      if (Lg !== undefined && cos2 > 1e-12) {
        const lw = solveLongWaveGroove({
          grooveLength: Lg,
          cleanInterfaceVelocity: Ulong,
          shearRate: pr.shearRate,
          viscosity: pr.mu,
          surfactant: s,
          bulkConcentration: c,
          temperature: T,
          cells: input.solver?.grooveCells ?? 200,
          tolerance: tol,
          ...(input.solver?.maxIterations !== undefined ? { maxIterations: input.solver.maxIterations } : {}),
          ...(warmGroove ? { warmStart: warmGroove } : {}),
        });
        solved.groove = lw.state;
        bPar = lw.slipRetained * clean.slipLengthLongitudinal;
        grooveProfile = lw.profile;
        stagnant = stagnant || lw.stagnantCap;
        solverInfo.longWaveIterations = lw.iterations;
      }
      notes.model('surfactant.interface-solver');
      if (Lg !== undefined) notes.model('surfactant.long-wave-groove');
    } catch (error) {
      if (!(error instanceof ConvergenceError)) throw error;
      // Safety net: no steady state reached within the iteration budget. Answer with the scaling theory.
      method = 'scaling';
      const regime = scalingRegime(scal.groups, scal.flags.stagnantCapLikely, scal.flags.dilute);
      notes.warn(
        'solver-fallback-scaling',
        `At c = ${c.toPrecision(3)} mol/m³ the interface solver found no steady state (${error.iterations} linear solves, relative residual ${Number.isFinite(error.residual) ? error.residual.toExponential(2) : 'not finite'}); the scaling theory of Landel et al. (2020) answers instead. Its groups place this point in ${regime}.`,
        'warning',
      );
      grooveProfile = undefined;
      stagnant = false;
      solverInfo = undefined;
      ({ bPerp, bPar, interfaceProfile, marangoniStress, drop } = scalingAnswer());
      notes.model('surfactant.marangoni-scaling');
    }
  } else {
    ({ bPerp, bPar, interfaceProfile, marangoniStress, drop } = scalingAnswer());
    notes.model('surfactant.marangoni-scaling');
  }
  const slipLength = bPar * cos2 + bPerp * sin2;
  const slipRetained = cleanFlow > 0 ? slipLength / cleanFlow : 1;
  const point: SurfactantPoint = {
    bulkConcentration: c,
    method,
    equilibrium,
    groups: scal.groups,
    ...(scalLong ? { groupsLongitudinal: scalLong.groups, marangoniReductionLongitudinal: scalLong.marangoniReduction } : {}),
    marangoniReduction: scal.marangoniReduction,
    slipLengthTransverse: bPerp,
    slipLengthLongitudinal: bPar,
    slipLength,
    slipRetained,
    regime: classify(slipRetained, stagnant),
    marangoniStress,
    surfaceTensionDrop: drop,
    interfaceProfile,
    ...(grooveProfile ? { grooveProfile } : {}),
    validity,
    ...(solverInfo ? { solver: solverInfo } : {}),
  };
  return point;
}

/**
 * Surfactant sensitivity of the slip (module comment). Throws DomainError
 * for impossible input and ConvergenceError when a solver does not converge.
 * Validity: Stokes flow over the texture, flat interface, dilute surfactant
 * below the CMC (warned otherwise).
 */
export function evaluateSurfactant(input: SurfactantInput): Outcome<SurfactantResult> {
  const notes = new Notes();
  notes.cite(REFERENCES.landel2020, REFERENCES.philip1972, REFERENCES.peaudecerf2017);
  notes.cite(...input.surfactant.references);
  for (const w of input.surfactant.warnings) notes.warn(w.code, w.message, w.severity);
  if (!Number.isFinite(input.temperature) || input.temperature <= 0) throw new DomainError('temperature must be positive (K)', { field: 'temperature' });
  if (input.grooveLength !== undefined && !(input.grooveLength > 0 && Number.isFinite(input.grooveLength))) {
    throw new DomainError('groove length must be a positive finite length', { field: 'grooveLength' });
  }
  const list = Array.isArray(input.bulkConcentration) ? input.bulkConcentration : [input.bulkConcentration];
  if (list.length === 0) throw new DomainError('at least one bulk concentration is needed', { field: 'bulkConcentration' });
  for (const c of list) {
    if (!Number.isFinite(c) || c < 0) throw new DomainError('bulk concentration must be finite and ≥ 0 mol/m³', { field: 'bulkConcentration' });
  }
  const pr = prepare(input, notes);
  if (input.method !== 'scaling') {
    notes.cite(REFERENCES.scharfetter1969);
    notes.assume('interface solver: working fluid as a Stokes half-space over one texture period (flow height ≫ pitch)');
    if (pr.halfHeight !== undefined && pr.halfHeight < 5 * pr.pitch) {
      notes.warn('solver-confined-flow', 'flow half-height below 5 pitches: the half-space interface solver overstates the clean interface velocity', 'caution');
    }
  }
  const cos2 = Math.cos(pr.theta) ** 2;
  if (input.grooveLength === undefined && cos2 > 1e-12) {
    notes.warn(
      'infinite-grooves',
      'no groove length given: streamwise grooves are treated as infinitely long, where surfactant cannot build a streamwise gradient and the longitudinal slip is unaffected; real grooves end, so give grooveLength',
      'caution',
    );
  }
  if (input.grooveLength !== undefined && input.grooveLength < 10 * pr.pitch) {
    notes.warn('long-wave-short-groove', 'groove length below 10 pitches: the long-wave groove model is outside its range', 'caution');
  }
  const warm: WarmStarts = { solved: [] };
  const points = list.map((c) => evaluatePoint(input, pr, c, notes, { warm }));
  for (const p of points) {
    if (!p.validity.dilute) notes.warn('not-dilute', `K c = ${p.equilibrium.dimensionlessConcentration.toPrecision(3)} > 1: outside the dilute range of the scaling theory`, 'caution');
    if (p.method === 'scaling' && !p.validity.uniformMarangoni) {
      notes.warn('stagnant-cap-likely', 'the groups suggest a stagnant cap, where the uniform-Marangoni scaling theory is inaccurate: use method "solver"', 'warning');
    }
    if (!p.validity.stokes) notes.warn('gap-reynolds', 'gap Reynolds number ρ γ̇ w²/μ above 1: inertia over the texture is neglected', 'caution');
  }
  // Curve of slip retained against concentration, and the half-slip concentration by Brent's method.
  const cmc = input.surfactant.criticalMicelleConcentration;
  const cMax = input.curve?.maximum ?? (cmc ?? 10 / input.surfactant.langmuirConstant);
  const cMin = input.curve?.minimum ?? cMax * 1e-7;
  if (!(cMin > 0 && cMax > cMin)) throw new DomainError('curve range must satisfy 0 < minimum < maximum', { field: 'curve' });
  const nCurve = Math.max(3, Math.min(101, Math.round(input.curve?.points ?? 21)));
  const quiet = new Notes();
  const curveMethod: 'scaling' | 'solver' | undefined = input.method === 'auto' ? undefined : input.method;
  // Curve and half-slip root: about 64 cells on the gap (128 per period at φ = 0.5), so their cost does not
  // grow with the groove fraction; never finer than the points.
  const curveCells = Math.min(input.solver?.cells ?? 256, Math.max(32, Math.round(64 / pr.phi)));
  const curveRun: PointRun = { cells: curveCells, warm: { solved: [] }, slipOnly: true, ...(curveMethod ? { forceMethod: curveMethod } : {}) };
  const retainedAt = (c: number): number => evaluatePoint(input, pr, c, quiet, curveRun).slipRetained;
  const cs: number[] = [];
  const rs: number[] = [];
  for (let i = 0; i < (input.pointsOnly === true ? 0 : nCurve); i++) {
    const c = cMin * Math.pow(cMax / cMin, i / (nCurve - 1));
    cs.push(c);
    rs.push(retainedAt(c));
  }
  let half: number | null = null;
  for (let i = 0; i + 1 < cs.length; i++) {
    if ((rs[i] - 0.5) * (rs[i + 1] - 0.5) <= 0) {
      const root = brent((lc) => retainedAt(Math.pow(10, lc)) - 0.5, Math.log10(cs[i]), Math.log10(cs[i + 1]), { xTolerance: 1e-6 });
      if (root.converged) half = Math.pow(10, root.root);
      break;
    }
  }
  const curveFallbacks = quiet.warnings.filter((w) => w.code === 'solver-fallback-scaling').length;
  if (curveFallbacks > 0) {
    notes.warn('curve-solver-fallback', `${curveFallbacks} point(s) of the concentration curve (or of the half-slip search) come from the scaling theory: the interface solver found no steady state there`, 'warning');
  }
  if (half === null && input.pointsOnly !== true) notes.warn('no-half-slip', 'half of the clean slip is not lost anywhere in the curve range', 'info');
  notes.assume('drag change: recompute with slipLength through the slip endpoint drag model');
  const cleanFlow = input.cleanSlip.slipLengthLongitudinal * cos2 + input.cleanSlip.slipLengthTransverse * (1 - cos2);
  return outcome(
    {
      interfaceType: input.surfactant.interfaceType,
      cleanSlipLength: cleanFlow,
      points,
      slipLength: points[0].slipLength,
      slipRetained: points[0].slipRetained,
      regime: points[0].regime,
      concentrationForHalfSlip: half,
      curve: { method: input.method, bulkConcentration: cs, slipRetained: rs },
    },
    notes,
  );
}
