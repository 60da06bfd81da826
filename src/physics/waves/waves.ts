/**
 * Interface wave stability of a lubricant-filled streamwise groove under a
 * wall-bounded flow: does the lubricant–working-fluid interface stay flat
 * (inside the viscous sublayer, so the surface keeps its slip), or do waves
 * grow and act as roughness?
 *
 * Four views are evaluated and reported together:
 *  1. Wall-unit scaling: the inertial–capillary number Λ = w⁺ We_τ^(1/3),
 *     calm/wavy boundary Λ = 1 (common practice, no source).
 *  2. Confined Kelvin–Helmholtz linear stability of the two-layer interface
 *     (inviscid, capillarity, gravity, finite depths, interface pinned at the
 *     groove edges) — see {@link interfaceGrowthRate}.
 *  3. A critical-layer screen (Miles 1957): is there a height above the
 *     viscous sublayer where the mean flow moves with the slowest confined
 *     wave?
 *  4. Static checks: depinning pressure 2γ/w against the turbulent
 *     wall-pressure fluctuation, and the Rayleigh–Taylor limit of the pinned
 *     interface when the denser liquid lies above.
 *
 * Regime, verdict margin and the bands between calm, marginal and wavy:
 * ./criteria.ts.
 *
 * The two-layer dispersion relation (view 2) is in ./dispersion.ts.
 *
 * References (full citations under these keys in src/core/references.ts):
 * chandrasekhar1961, lamb1932, drazinReid1981, miles1957,
 * farabeeCasarella1991 (p′_rms/τ_w ≈ 2.5–3.4, see ./criteria.ts), spalding1961.
 */
import { DomainError } from '../../core/errors.js';
import { Notes, outcome, type Outcome, type Warning } from '../../core/notes.js';
import { STANDARD_GRAVITY } from '../../core/constants.js';
import { REFERENCES } from '../../core/references.js';
import type { FlowState, Scenario } from '../scenario.js';
import { VISCOUS_SUBLAYER_EDGE_PLUS, velocityPlusAtWallDistance, wallDistanceAtVelocityPlus } from '../flow/wall-profile.js';
import {
  evaluateCriteria,
  governing,
  marginOf,
  PHYSICAL_WAVY_LIMIT,
  PRESSURE_FLUCTUATION_LOW,
  regimeOf,
  type DesignPoint,
  type FixedConditions,
  type WaveRegime,
  wavesCriterion,
} from './criteria.js';
import { designLimits, regimeMap } from './limits.js';
import type { GrowthRatePoint, WavesResult } from './result.js';
import {
  confinedCriticalVelocityDifference,
  fastestGrowingMode,
  interfaceGrowthRate,
  neutralVelocityDifference,
  slowestWaveSpeed,
} from './dispersion.js';


export type WallFacing = 'up' | 'down' | 'vertical';

export interface WavesInput {
  scenario: Scenario;
  /**
   * Wall orientation: inclination of the wall from horizontal, degrees, and
   * whether the textured face looks up (lubricant below the working fluid),
   * down (lubricant above it) or sideways. Omitted: gravity neglected.
   */
  gravity?: { inclination: number; facing: WallFacing };
  /**
   * Longitudinal slip length b_∥ of the surface, m, from the slip model. Sets
   * the interface drift u_s = u_τ² b_∥/ν (Navier slip under the linear
   * sublayer). Omitted: 0 (interface at rest).
   */
  slipLengthLongitudinal?: number;
  /** Cells per axis of the regime map (default 24, clamped to 2–200). */
  mapResolution?: number;
}

const DEFAULT_MAP_RESOLUTION = 24;

function positive(value: number | undefined, field: string, what: string): number {
  if (value === undefined || !Number.isFinite(value) || !(value > 0)) {
    throw new DomainError(`${what} must be a positive finite number (got ${String(value)})`, { field });
  }
  return value;
}

/** Depth of the outer layer seen by the wave: the opposite wall, or the symmetry plane when both walls are textured. */
function outerLayerDepth(flow: FlowState, notes: Notes): number | undefined {
  if (flow.kind === 'channel' && flow.height !== undefined && flow.height > 0) {
    const both = (flow.texturedWalls ?? 1) === 2;
    notes.assume(
      both
        ? 'Outer layer depth for the wave: half the channel height (symmetry plane between two textured walls).'
        : 'Outer layer depth for the wave: the full channel height (opposite wall smooth).',
    );
    return both ? flow.height / 2 : flow.height;
  }
  if (flow.kind === 'pipe' && flow.diameter !== undefined && flow.diameter > 0) {
    notes.assume('Outer layer depth for the wave: the pipe radius.');
    return flow.diameter / 2;
  }
  notes.assume('Outer layer treated as deep for the wave (no opposite wall given).');
  return undefined;
}

/** Largest mean velocity of the flow (for the critical-layer screen), m/s, or null when unknown. */
function largestMeanVelocity(flow: FlowState, slipVelocity: number, kinematicViscosity: number): number | null {
  const bulk = flow.bulkVelocity;
  if (flow.kind === 'plate') return bulk !== undefined && bulk > 0 ? bulk : null;
  if (flow.kind === 'wall-shear') return null;
  if (flow.regime === 'laminar' && bulk !== undefined && bulk > 0) {
    // Poiseuille profiles: centreline 3/2 U_b (plates) and 2 U_b (tube) (exact).
    return flow.kind === 'channel' ? 1.5 * bulk : 2 * bulk;
  }
  const halfSize = flow.kind === 'channel' ? (flow.height ?? 0) / 2 : (flow.diameter ?? 0) / 2;
  const frictionReynolds = flow.frictionReynoldsNumber ?? (halfSize * flow.frictionVelocity) / kinematicViscosity;
  if (frictionReynolds > 0 && Number.isFinite(frictionReynolds)) {
    // Wall law at y⁺ = Re_τ; the outer wake is neglected, so this reads the
    // centreline a little low (a screen, not a profile calculation).
    return slipVelocity + flow.frictionVelocity * velocityPlusAtWallDistance(frictionReynolds);
  }
  return bulk !== undefined && bulk > 0 ? bulk : null;
}

/** Warning code that the slip/drag result carries when the interface is wavy. */
export const WAVY_INTERFACE_WARNING_CODE = 'wavy-interface-drag-unreliable';

/**
 * The warning a drag result must carry when the wave verdict is `wavy`
 * (waves act as roughness; the slip-based drag reduction is not to be
 * trusted); null otherwise.
 */
export function waveRoughnessWarning(regime: WaveRegime): Warning | null {
  if (regime !== 'wavy') return null;
  return {
    code: WAVY_INTERFACE_WARNING_CODE,
    severity: 'warning',
    message:
      'The lubricant interface is in the wavy regime: interface waves act as roughness, so the computed drag reduction is not to be trusted and may be a drag increase.',
  };
}

/**
 * The validated inputs and the criteria at the design point: what the full analysis and the regime
 * alone ({@link waveRegimeAtDesign}) both need. Throws DomainError naming the field for impossible input.
 */
function criteriaAtDesign(input: WavesInput, notes: Notes) {
  const { scenario } = input;
  if (scenario.interfacialTension === undefined) {
    throw new DomainError(
      'interfacialTension is required for the wave analysis: give it, or take it from the catalogue or the wetting model (Fowkes estimate)',
      { field: 'interfacialTension' },
    );
  }
  const gamma = positive(scenario.interfacialTension, 'interfacialTension', 'interfacialTension');
  const w = positive(scenario.texture.grooveWidth, 'scenario.texture.grooveWidth', 'grooveWidth');
  const d = positive(scenario.texture.grooveDepth, 'scenario.texture.grooveDepth', 'grooveDepth');
  const lubricantDensity = positive(scenario.lubricant.density, 'scenario.lubricant.density', 'lubricant density');
  const workingDensity = positive(scenario.workingFluid.density, 'scenario.workingFluid.density', 'working-fluid density');
  const workingViscosity = positive(scenario.workingFluid.viscosity, 'scenario.workingFluid.viscosity', 'working-fluid viscosity');
  const uTau = positive(scenario.flow.frictionVelocity, 'scenario.flow.frictionVelocity', 'frictionVelocity');
  const slipLength = input.slipLengthLongitudinal ?? 0;
  if (!Number.isFinite(slipLength) || slipLength < 0) {
    throw new DomainError(`slipLengthLongitudinal must be finite and ≥ 0 (got ${slipLength})`, { field: 'slipLengthLongitudinal' });
  }
  if (input.slipLengthLongitudinal === undefined) {
    notes.assume('No slip length given: interface slip velocity taken as 0 (it shifts the wave speed relative to the wall, not ΔU).');
  }

  let normalGravity = 0;
  if (input.gravity === undefined) {
    notes.assume('Gravity not given: neglected in the dispersion relation and the Rayleigh–Taylor check.');
  } else {
    const { inclination, facing } = input.gravity;
    if (facing !== 'up' && facing !== 'down' && facing !== 'vertical') {
      throw new DomainError(`gravity.facing must be "up", "down" or "vertical" (got ${String(facing)})`, { field: 'gravity.facing' });
    }
    if (!Number.isFinite(inclination)) {
      throw new DomainError(`gravity.inclination must be a finite angle in degrees (got ${inclination})`, { field: 'gravity.inclination' });
    }
    const cosine = Math.cos((inclination * Math.PI) / 180);
    normalGravity = facing === 'vertical' ? 0 : (facing === 'up' ? 1 : -1) * STANDARD_GRAVITY * cosine;
    // cos(90°) is 6e-17 in floating point; a vertical wall has no normal gravity.
    if (Math.abs(normalGravity) < 1e-12) normalGravity = 0;
  }

  const flow = scenario.flow;
  const laminar = flow.regime === 'laminar';
  const kinematicViscosity = workingViscosity / workingDensity;
  const fixed: FixedConditions = {
    lubricantDensity,
    workingDensity,
    workingViscosity,
    grooveDepth: d,
    outerDepth: outerLayerDepth(flow, notes),
    normalGravity,
    slipLength,
    laminar,
  };
  const design: DesignPoint = { grooveWidth: w, interfacialTension: gamma, frictionVelocity: uTau };
  const at = evaluateCriteria(fixed, design);
  return { scenario, gamma, w, d, lubricantDensity, workingDensity, workingViscosity, uTau, normalGravity, flow, laminar, kinematicViscosity, fixed, at };
}

/**
 * The wave regime at the design point alone, without the growth-rate curve, the design limits or the
 * regime map (the same criteria as {@link evaluateWaves}, a fraction of its cost): what the slip answer
 * checks before it trusts its drag change.
 */
export function waveRegimeAtDesign(input: WavesInput): WaveRegime {
  return regimeOf(criteriaAtDesign(input, new Notes()).at.ratios);
}

/** The regime and the verdict's margin at the design point alone (same criteria and margin as {@link evaluateWaves}). */
export function waveMarginAtDesign(input: WavesInput): { regime: WaveRegime; margin: number } {
  const ratios = criteriaAtDesign(input, new Notes()).at.ratios;
  return { regime: regimeOf(ratios), margin: marginOf(ratios) };
}

/**
 * The waves verdict at the design point with every note it carries (models, sources, assumptions and the
 * design-point warnings: laminar flow, oblique grooves, static instability, critical layer, Rayleigh–Taylor,
 * depinning, roughness): what {@link evaluateWaves} and {@link wavesVerdict} share. Leaves out the growth-rate
 * curve, the design limits and the regime map, which cost most of a full evaluation.
 */
function wavesAtDesign(input: WavesInput, notes: Notes) {
  const criteria = criteriaAtDesign(input, notes);
  const { scenario, gamma, lubricantDensity, workingDensity, uTau, normalGravity, flow, laminar, kinematicViscosity, at } = criteria;
  const layers = at.layers;
  const slowest = slowestWaveSpeed(layers);

  notes
    .model('waves.inertial-capillary-scaling')
    .model('waves.confined-kelvin-helmholtz')
    .model('waves.critical-layer-screen')
    .model('waves.static-depinning-rayleigh-taylor')
    .cite(
      REFERENCES.chandrasekhar1961,
      REFERENCES.lamb1932,
      REFERENCES.drazinReid1981,
      REFERENCES.miles1957,
      REFERENCES.farabeeCasarella1991,
      REFERENCES.spalding1961,
    );
  notes.assume('Calm/wavy boundary Λ = w⁺ We_τ^(1/3) = 1 is a fact of the trade (common practice, no source).');
  notes.assume('Inviscid linear theory with uniform streams in each layer; the pinned interface is represented by its fundamental spanwise mode cos(πz/w).');
  if (laminar) {
    notes.warn(
      'laminar-flow-wave-scaling',
      'The flow is laminar: the Λ boundary and the pressure-fluctuation check are calibrated on turbulent near-wall flow; the linear sublayer profile is used for ΔU and no wall-pressure fluctuation is applied.',
      'caution',
    );
  }
  if (Math.abs(scenario.texture.flowAngle) > 1) {
    notes.warn(
      'oblique-grooves-waves',
      `Grooves at ${scenario.texture.flowAngle}° to the flow: the wave analysis assumes flow along the grooves and uses the full friction velocity (conservative for the streamwise waves).`,
      'caution',
    );
  }

  const slipVelocity = layers.wallSideVelocity;
  if (at.critical.value === 0) {
    notes.warn(
      'interface-statically-unstable',
      'Gravity overcomes the capillary restoring pressure of the pinned interface (Rayleigh–Taylor): no velocity difference is needed for the interface to deform.',
      'warning',
    );
  }

  // --- critical layer -------------------------------------------------------------
  const slowestPlus = slowest.value / uTau;
  const criticalHeightPlus = laminar ? slowestPlus : wallDistanceAtVelocityPlus(slowestPlus);
  const largest = largestMeanVelocity(flow, slipVelocity, kinematicViscosity);
  const waveSpeedRelativeToWall = slipVelocity + slowest.value;
  const withinFlow = largest === null || waveSpeedRelativeToWall < largest;
  const criticalLayerExists = criticalHeightPlus > VISCOUS_SUBLAYER_EDGE_PLUS && withinFlow && slowest.value > 0;
  if (criticalLayerExists) {
    notes.warn(
      'critical-layer-present',
      `The slowest confined wave (c_min⁺ = ${slowestPlus.toPrecision(3)}) matches the mean flow at y⁺ ≈ ${criticalHeightPlus.toPrecision(3)}, above the viscous sublayer: the flow can feed these waves there (Miles 1957 mechanism; screen of low confidence).`,
      'caution',
    );
  }

  // --- static checks ---------------------------------------------------------------
  const wallShearStress = workingDensity * uTau * uTau;
  const densityDifference = Math.abs(lubricantDensity - workingDensity);
  const rayleighTaylorMaxWidth =
    at.rayleighTaylorDestabilising && densityDifference > 0 ? Math.PI * Math.sqrt(gamma / (densityDifference * Math.abs(normalGravity))) : null;
  if (at.ratios['rayleigh-taylor'] >= PHYSICAL_WAVY_LIMIT) {
    notes.warn(
      'rayleigh-taylor-unstable',
      `The denser liquid lies above: Bond number ${at.bondNumber.toPrecision(3)} exceeds π², the pinned interface cannot hold against gravity.`,
      'warning',
    );
  }
  if (at.ratios.depinning >= PHYSICAL_WAVY_LIMIT) {
    notes.warn(
      'depinning-by-pressure-fluctuations',
      'Turbulent wall-pressure fluctuations exceed the depinning pressure 2γ/w: the interface can be pushed off the groove edges.',
      'warning',
    );
  }

  // --- regime, verdict, limits -----------------------------------------------------
  const regime = regimeOf(at.ratios);
  const margin = marginOf(at.ratios);
  const roughness = waveRoughnessWarning(regime);
  if (roughness) notes.warn(roughness.code, roughness.message, roughness.severity);

  return {
    ...criteria,
    slowest,
    slipVelocity,
    slowestPlus,
    criticalHeightPlus,
    largest,
    waveSpeedRelativeToWall,
    withinFlow,
    criticalLayerExists,
    wallShearStress,
    rayleighTaylorMaxWidth,
    regime,
    margin,
  };
}

/**
 * The waves verdict alone (regime, margin, governing criterion) with the notes of {@link evaluateWaves}, without
 * the growth-rate curve, the design limits and the regime map: for an assessment, which reads only the verdict.
 * Same inputs, criteria and validity as {@link evaluateWaves}.
 */
export function wavesVerdict(input: WavesInput): Outcome<{ regime: WaveRegime; margin: number; governingCriterion: ReturnType<typeof governing> }> {
  const notes = new Notes();
  const { regime, margin, at } = wavesAtDesign(input, notes);
  return outcome({ regime, margin, governingCriterion: governing(at.ratios) }, notes);
}

/**
 * Evaluate interface wave stability for one design.
 *
 * Inputs (SI): scenario.texture.grooveWidth w and grooveDepth d (m);
 * scenario.lubricant and scenario.workingFluid densities (kg/m³) and the
 * working fluid's viscosity μ_w (Pa·s); scenario.flow.frictionVelocity u_τ
 * (m/s); scenario.interfacialTension γ (N/m, required); gravity.inclination
 * (degrees from horizontal) and facing; slipLengthLongitudinal b_∥ (m).
 *
 * Choices (documented where the issue is silent):
 *  - ℓ_ν = ν_w/u_τ from the working fluid, so We_τ = μ_w u_τ/γ = ρu_τ²ℓ_ν/γ
 *    holds exactly.
 *  - Velocity difference across the interface at the wave's scale: the mean
 *    velocity (Spalding's law, linear in laminar flow) at the decay height
 *    1/K* = w/(√3π) of the most dangerous confined wave, relative to the
 *    interface. Both layers drift with the interface slip velocity
 *    u_s = u_τ² b_∥/ν (the lubricant is an inviscid plug at the interface
 *    speed), which changes the wave's speed relative to the wall but not ΔU.
 *  - Layer depths: h₁ = d; h₂ = channel height (half of it with two textured
 *    walls), pipe radius, or deep. Inertia a_j = ρ_j coth(K h_j) with the
 *    total wavenumber K = √(k² + (π/w)²).
 *  - g_⊥ = g cos(inclination) towards the wall for an upward-facing wall,
 *    away from it for a downward-facing one, 0 for a vertical wall.
 *  - p′_rms band 2.5–3.4 τ_w; the upper value is used for the check
 *    (conservative); zero in laminar flow. Transitional flow is treated as
 *    turbulent.
 *  - Critical layer: the slowest confined wave travels at u_s + c_min
 *    relative to the wall (drift of the interface plus its intrinsic speed;
 *    advection by the outer stream is left out), and its critical height is
 *    where the mean velocity relative to the interface equals c_min. The
 *    largest mean velocity is the Poiseuille centreline (laminar), the wall
 *    law at y⁺ = Re_τ (turbulent channel or pipe), the free stream (plate), or
 *    unknown (wall-shear input).
 *  - Rayleigh–Taylor: the pinned fundamental mode with k → 0 (long grooves)
 *    is stable while Δρ g_⊥ w²/γ < π² (the capillary cut-off √(Δρg/γ) of
 *    Chandrasekhar 1961 ch. X must stay below π/w).
 *  - Design limits vary one quantity with everything else fixed (for the
 *    friction velocity: the flow class and p′/τ_w band stay as given).
 *
 * Worked example (examples/waves-worked-example.json, an invented demo):
 * 30 µm wide, 30 µm deep n-hexadecane grooves (γ = 53 mN/m), water at 1 m/s
 * in a 10 mm channel (u_τ = 0.0604 m/s): w⁺ = 1.81, We_τ = 1.14×10⁻³,
 * Λ = 0.189 → calm, margin 0.987; ΔU_c = 5.75 m/s against ΔU = 0.020 m/s;
 * widest calm groove 126 µm (w⁺ = 7.6), lowest calm tension 0.71 mN/m,
 * highest calm friction velocity 0.177 m/s.
 *
 * @throws DomainError when interfacialTension is absent or a length,
 *   density, viscosity or the friction velocity is not positive and finite.
 */
export function evaluateWaves(input: WavesInput): Outcome<WavesResult> {
  const notes = new Notes();
  const core = wavesAtDesign(input, notes);
  const { gamma, w, d, lubricantDensity, workingDensity, workingViscosity, uTau, normalGravity, flow, laminar, kinematicViscosity, fixed, at, regime, margin } = core;
  const { slowest, slipVelocity, slowestPlus, criticalHeightPlus, largest, waveSpeedRelativeToWall, withinFlow, criticalLayerExists, wallShearStress, rayleighTaylorMaxWidth } = core;
  const design: DesignPoint = { grooveWidth: w, interfacialTension: gamma, frictionVelocity: uTau };
  let resolution = Math.round(input.mapResolution ?? DEFAULT_MAP_RESOLUTION);
  if (!Number.isFinite(resolution) || resolution < 2 || resolution > 200) {
    const clamped = Number.isFinite(resolution) ? Math.min(200, Math.max(2, resolution)) : DEFAULT_MAP_RESOLUTION;
    notes.warn('map-resolution-clamped', `mapResolution ${String(input.mapResolution)} outside 2–200; using ${clamped}.`, 'info');
    resolution = clamped;
  }
  const layers = at.layers;
  // --- Kelvin–Helmholtz outputs -------------------------------------------------
  const m = Math.PI / w;
  const growthRateCurve: GrowthRatePoint[] = [];
  const curvePoints = 121;
  for (let i = 0; i < curvePoints; i++) {
    // k w/π from 0.02 to 20, log-spaced: both sides of k* = √2 π/w.
    const k = m * 0.02 * 1000 ** (i / (curvePoints - 1));
    growthRateCurve.push({
      wavenumber: k,
      growthRate: interfaceGrowthRate(layers, k),
      neutralVelocityDifference: neutralVelocityDifference(layers, k),
    });
  }
  const fastest = fastestGrowingMode(layers);
  const closedForm = confinedCriticalVelocityDifference(lubricantDensity, workingDensity, gamma, w);

  const limits = designLimits(fixed, design);
  if (limits.maxGrooveWidth === null || limits.minInterfacialTension === null || limits.maxFrictionVelocity === null) {
    notes.warn('design-limit-not-found', 'A design limit lies outside the searched range (30 e-folds either side of the design) and is reported as null.', 'info');
  }
  const viscousLength = at.viscousLength;
  const map = regimeMap(fixed, at, workingViscosity, uTau, resolution);

  const bulk = flow.bulkVelocity;
  const result: WavesResult = {
    scaling: {
      viscousLength,
      grooveWidthPlus: at.grooveWidthPlus,
      grooveDepthPlus: d / viscousLength,
      frictionCapillaryNumber: at.frictionCapillaryNumber,
      frictionWeberNumber: (workingDensity * uTau * uTau * w) / gamma,
      bulkWeberNumber: bulk !== undefined && bulk > 0 ? (workingDensity * bulk * bulk * w) / gamma : null,
      inertialCapillaryNumber: at.inertialCapillaryNumber,
      inertialCapillaryBoundary: 1,
      interfaceSlipVelocity: slipVelocity,
    },
    kelvinHelmholtz: {
      growthRateCurve,
      mostUnstableWavelength: fastest.value > 0 && fastest.wavenumber > 0 ? (2 * Math.PI) / fastest.wavenumber : null,
      maxGrowthRate: fastest.value,
      maxGrowthRatePlus: (fastest.value * kinematicViscosity) / (uTau * uTau),
      criticalVelocityDifference: at.critical.value,
      criticalWavelength: (2 * Math.PI) / at.critical.wavenumber,
      deepLayerCriticalVelocityDifference: closedForm.velocityDifference,
      velocityDifferenceImposed: at.velocityDifferenceImposed,
      velocityDifferenceHeight: at.velocityDifferenceHeight,
      slowestWaveSpeed: slowest.value,
      slowestWaveSpeedPlus: slowestPlus,
      slowestWaveWavelength: (2 * Math.PI) / slowest.wavenumber,
      lubricantDepth: d,
      outerDepth: fixed.outerDepth ?? null,
      normalGravity,
    },
    criticalLayer: {
      waveSpeedRelativeToWall,
      criticalHeightPlus: withinFlow ? criticalHeightPlus : null,
      criticalHeight: withinFlow ? criticalHeightPlus * viscousLength : null,
      sublayerEdgePlus: VISCOUS_SUBLAYER_EDGE_PLUS,
      largestMeanVelocity: largest,
      exists: criticalLayerExists,
    },
    staticChecks: {
      depinningPressure: at.depinningPressure,
      wallPressureFluctuationLow: laminar ? 0 : PRESSURE_FLUCTUATION_LOW * wallShearStress,
      wallPressureFluctuationHigh: at.pressureFluctuationHigh,
      depinningRatio: at.ratios.depinning,
      rayleighTaylor: {
        bondNumber: at.bondNumber,
        criticalBondNumber: Math.PI * Math.PI,
        destabilising: at.rayleighTaylorDestabilising,
        stable: at.ratios['rayleigh-taylor'] < PHYSICAL_WAVY_LIMIT,
        maxGrooveWidth: rayleighTaylorMaxWidth,
      },
    },
    loadRatios: at.ratios,
    governingCriterion: governing(at.ratios),
    regime,
    verdict: { passes: regime === 'calm', margin, criterion: wavesCriterion(at.ratios) },
    designLimits: {
      maxGrooveWidth: limits.maxGrooveWidth,
      maxGrooveWidthPlus: limits.maxGrooveWidth === null ? null : limits.maxGrooveWidth / viscousLength,
      minInterfacialTension: limits.minInterfacialTension,
      maxFrictionVelocity: limits.maxFrictionVelocity,
    },
    map,
  };
  return outcome(result, notes);
}
