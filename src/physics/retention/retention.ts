/**
 * Will the lubricant stay in the grooves? Steady retention by capillary
 * back-pressure and by contact-line pinning, against shear and gravity; the
 * drainage timeline; and the dissolution lifetime. All mechanisms are
 * evaluated side by side and the one that sets the retained length is named.
 *
 * Symbols: groove width w, depth d (m); interfacial tension γ (N/m); interface
 * shear τ_i = (interfacialShearRatio)·τ_w (Pa); lubricant viscosity μ_o;
 * duct flux coefficients Q̂_s (m³), Q̂_p (m⁴) from groove-duct.ts [2].
 *
 * 1. Capillary back-pressure [mechanism: ref. 1; closed form derived]. Zero net
 *    flux in the filled part needs the back-pressure gradient G = τ_i Q̂_s/Q̂_p
 *    (→ 3τ_i/(2d) shallow, τ_i/d deep). The meniscus at the receding front can
 *    hold at most Δp_max = γ κ_max, with κ_max = 2 cos θ_R/w when the pinned arc
 *    reaches the receding angle before it touches the floor (its sag
 *    w(1 − sin θ_R)/(2 cos θ_R) ≤ d), else the floor-touching arc 8d/(w² + 4d²);
 *    none when θ_R ≥ 90°. Retained length L∞ = Δp_max/G, independent of μ_o.
 * 2. Contact-line pinning [derived, after refs. 3, 4]. A plug of length L is
 *    held by the Furmidge-type force k γ (cos θ_R − cos θ_A)(w + 2d) on its two
 *    contact lines (side walls and floor); inside a pinned plug the net flux is
 *    zero, so the shear is balanced by the back-flow gradient G and the plug
 *    slides once G L exceeds the pinning pressure k γ Δcos (w + 2d)/(w d):
 *      L_c = k γ (cos θ_R − cos θ_A)(w + 2d)/(G w d),
 *    shallow limit (2/3) k γ Δcos (w + 2d)/(τ_i w); a force balance on the plug
 *    without the back-flow, L = k γ Δcos (w + 2d)/(τ_i w), is 3/2 larger there.
 *    Shape factor k: ref. 4 determines it for sessile drops; for a plug whose
 *    contact line spans the groove cross-section normal to the motion the
 *    balance is exact with k = 1 [derived], our default.
 * 3. Gravity along an inclined groove adds b = (ρ_o − ρ_w) g sin α (sign:
 *    + when the along-groove component of gravity points with the flow) to the
 *    drive: G_total = G + b; each holding mechanism then retains
 *    Δp/|G_total|. Gravity alone: hold length Δp/|b|; vertical hydrostatic hold
 *    height γ κ_max/(|Δρ| g).
 * 4. Dissolution into once-through water [order of magnitude]: ./dissolution.ts.
 *
 * The holding mechanisms 1–3 are small functions in ./holding.ts, the drainage
 * model (steady column, lumped plug, finite volumes) in ./drainage.ts.
 *
 * Steady retained share and timeline. When capillary back-pressure binds, the
 * retained volume is that of the drainage model's steady column (drainage.ts,
 * steadyColumn: the sagging meniscus thins the layer, so the column is shorter
 * and holds less than the full-section L∞ w d), with the end meniscus flat at an
 * open end and at the spill bulge at a closed end or barrier; the timeline is the
 * finite-volume solution. When pinning binds, a plug longer than L_c slides out
 * of the segment until it has the length L_c: the lumped equation of drainage.ts
 * with L∞ → L_c gives the timeline (plug break-up into several plugs, which can
 * keep more, is not modelled). Verdict: retained when the steady share reaches
 * the target fill; margin = share/target − 1.
 *
 * Validity and cautions: Stokes flow in the groove; hysteresis measured on flat
 * samples may differ from that inside the grooves; near L∞ the real creep is
 * slower than the continuum model (thermally activated depinning, ref. 8); a
 * `not-wetting` lubricant is held by pinning alone.
 *
 * References (full citations under these keys in src/core/references.ts):
 * [1] wexler2015, [2] shahLondon1978, [3] furmidge1962, [4] elsherbini2006,
 * [8] colosqui2016; the dissolution sources in ./dissolution.ts.
 */
import { DomainError } from '../../core/errors.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import { STANDARD_GRAVITY } from '../../core/constants.js';
import { REFERENCES } from '../../core/references.js';
import type { Scenario } from '../scenario.js';
import type { Verdict } from '../../core/values.js';
import { warnNotWetting, type ContactAngles, type WettingState } from '../wetting/wetting.js';
import { dissolutionLifetime, NO_DISSOLUTION, type DissolutionEstimate, type Solubility } from './dissolution.js';
import { holdLengths, type CurvatureLimit } from './holding.js';
import type { TimelinePoint } from './drainage.js';
import { steadyColumnProfile } from './meniscus.js';
import { drainageTimeline, explainTimelineEnd } from './timeline.js';

const DEG = Math.PI / 180;

export interface RetentionInput {
  scenario: Scenario;
  /** Only the angles under the working fluid are used (hysteresis). */
  contactAngles: ContactAngles;
  /** Total groove length, m. */
  grooveLength?: number;
  /** Barrier spacing, m (grooves cut into segments). */
  segmentLength?: number;
  grooveEnds: 'open' | 'closed';
  /** Inclination of the grooves: degrees from horizontal (0–90) and where gravity's along-groove component points. */
  inclination?: { angle: number; direction: 'with-flow' | 'against-flow' };
  /** Initially filled fraction of each segment (default 1). */
  initialFill?: number;
  /** Timeline duration, s. */
  duration: number;
  solubility?: Solubility;
  /** Mean interfacial shear over wall shear, from the slip solution (default 1). */
  interfacialShearRatio?: number;
  wettingState?: WettingState;
  /** Fill fraction the verdict and the barrier spacing aim at (default 0.9). */
  targetFill?: number;
  /** Furmidge shape factor k (default 1, module comment). */
  pinningShapeFactor?: number;
  /**
   * Report the steady capillary column where it does not bind (pinning binds, or nothing holds) as well (default
   * true). false leaves `steadyColumn` null there: for a caller that reads only the binding mechanism's results
   * (an assessment).
   */
  unboundSteadyColumn?: boolean;
  /** Points of the returned timeline (default 150; 2 to 200): fewer for a caller that reads only its ends. */
  timelinePoints?: number;
  /**
   * Solve the finite-volume timeline where capillary back-pressure binds (default true). false takes the
   * lumped plug's timeline instead: for a caller that already knows the drainage has settled long before the
   * duration and reads only the steady share (an assessment's sensitivity steps).
   */
  finiteVolumeTimeline?: boolean;
  /**
   * For a caller that reads the steady share instead of the timeline's end once the drainage has settled within
   * this time, s (an assessment): a drainage the lumped plug settles well within it gets a coarser finite-volume
   * timeline (./timeline.ts `settledBy`); `timelineCellsPerSegment` says which.
   */
  settledBy?: number;
}

export type RetentionMechanism = 'capillary-back-pressure' | 'contact-line-pinning' | 'dissolution' | 'none';

export interface RetentionResult {
  interfacialShearStress: { value: number; source: 'slip-solution' | 'smooth-wall-assumed' };
  mechanisms: {
    capillaryBackPressure: {
      maximumCurvature: number;
      curvatureLimit: CurvatureLimit;
      maximumCapillaryPressure: number;
      /** G = τ_i Q̂_s/Q̂_p, Pa/m. */
      backPressureGradient: number;
      /** L∞ under shear alone, m. */
      retainedLength: number;
      /** With gravity added to the drive, m. */
      retainedLengthWithGravity: number;
      /**
       * Steady column of the drainage model with the meniscus sag (shear, gravity and end
       * meniscus included; cut at the segment length): filled length and volume/(w d), m. Null
       * without a receding-front suction, or where the column does not bind and the caller
       * asked for the binding mechanism alone (`unboundSteadyColumn: false`).
       */
      steadyColumn: { length: number; equivalentLength: number } | null;
    };
    contactLinePinning: {
      pinningPressure: number;
      shapeFactor: number;
      /** L_c with the back-flow, shear alone, m. */
      criticalPlugLength: number;
      /** Force balance without back-flow, m (for comparison). */
      forceBalancePlugLength: number;
      retainedLengthWithGravity: number;
    };
    gravity: {
      /** b = (ρ_o − ρ_w) g sin α, Pa/m, + downstream. */
      bodyForceGradient: number;
      /** Gravity alone: capillary hold length, m (null without inclination or suction). */
      capillaryHoldLength: number | null;
      pinningHoldLength: number | null;
      /** Vertical hydrostatic hold height γ κ_max/(|Δρ| g), m (null when Δρ = 0 or no suction). */
      hydrostaticHoldHeight: number | null;
    };
    dissolution: DissolutionEstimate;
  };
  bindingMechanism: RetentionMechanism;
  dominantDrive: 'shear' | 'gravity';
  /** Steady retained length per segment of the binding mechanism's closed form, m (full-section). */
  retainedLength: number;
  criticalPlugLength: number;
  /**
   * Steady retained share of the groove volume: from the sag-corrected steady column when
   * capillary back-pressure binds (what the timeline tends to), else binding length/segment.
   */
  retainedFraction: number;
  /** Passes when the steady retained share reaches the target fill; margin = share/target − 1. */
  verdict: Verdict;
  segmentLength: number;
  segments: number;
  timeline: TimelinePoint[];
  timelineModel: 'finite-volume' | 'lumped-plug';
  finalRetainedFraction: number;
  timeTo90PercentChange: number | null;
  /** Volume conservation of the finite-volume solve (relative), null for the lumped model. */
  conservationError: number | null;
  /** Cells per segment of the finite-volume timeline, null for the lumped model. */
  timelineCellsPerSegment: number | null;
  dissolutionLifetime: number | null;
  recommendations: {
    /** Longest barrier spacing that keeps the target fill at steady state, m. */
    maxSegmentLength: number;
    targetFill: number;
    /** d ln L/d ln w and d ln L/d ln d of the binding retained length. */
    widthSensitivity: number;
    depthSensitivity: number;
    width: 'narrower' | 'wider' | 'either';
    depth: 'shallower' | 'deeper' | 'either';
  };
}

/**
 * Lubricant retention in streamwise grooves under shear and gravity (module comment).
 * @returns every mechanism side by side, the binding one, the steady retained
 *   length and fraction with a verdict, the drainage timeline, the dissolution
 *   lifetime and design recommendations.
 */
export function evaluateRetention(input: RetentionInput): Outcome<RetentionResult> {
  const notes = new Notes();
  notes.model('retention.holding-mechanisms').cite(
    REFERENCES.wexler2015,
    REFERENCES.furmidge1962,
    REFERENCES.elsherbini2006,
    REFERENCES.shahLondon1978, REFERENCES.white2006,
  );
  const { scenario } = input;
  const { texture, lubricant, workingFluid, flow } = scenario;
  const w = texture.grooveWidth;
  const d = texture.grooveDepth;
  if (!(w > 0 && Number.isFinite(w))) throw new DomainError('groove width must be positive', { field: 'texture.grooveWidth' });
  if (!(d > 0 && Number.isFinite(d))) throw new DomainError('groove depth must be positive', { field: 'texture.grooveDepth' });
  if (!(texture.pitch > w)) throw new DomainError('pitch must exceed the groove width', { field: 'texture.pitch' });
  const gamma = scenario.interfacialTension;
  if (gamma === undefined || !(gamma > 0 && Number.isFinite(gamma))) {
    throw new DomainError('interfacial tension is needed on the scenario (resolve it with evaluateWetting first)', { field: 'interfacialTension' });
  }
  const angles = input.contactAngles.underWorkingFluid;
  if (!angles) throw new DomainError('retention needs advancing and receding angles under the working fluid', { field: 'contactAngles.underWorkingFluid' });
  for (const [v, field] of [
    [angles.advancing, 'contactAngles.underWorkingFluid.advancing'],
    [angles.receding, 'contactAngles.underWorkingFluid.receding'],
  ] as const) {
    if (!(Number.isFinite(v) && v >= 0 && v <= 180)) throw new DomainError('contact angle must lie between 0 and 180 degrees', { field });
  }
  if (angles.receding > angles.advancing) throw new DomainError('receding angle cannot exceed the advancing angle', { field: 'contactAngles.underWorkingFluid.receding' });
  const mu = lubricant.viscosity;
  if (!(mu > 0 && Number.isFinite(mu))) throw new DomainError('lubricant viscosity must be positive', { field: 'lubricant.viscosity' });
  if (!(input.duration > 0 && Number.isFinite(input.duration))) throw new DomainError('duration must be positive', { field: 'duration' });
  const initialFill = input.initialFill ?? 1;
  if (!(initialFill > 0 && initialFill <= 1)) throw new DomainError('initial fill must lie in (0, 1]', { field: 'initialFill' });
  const targetFill = input.targetFill ?? 0.9;
  if (!(targetFill > 0 && targetFill <= 1)) throw new DomainError('target fill must lie in (0, 1]', { field: 'targetFill' });
  const shapeFactor = input.pinningShapeFactor ?? 1;
  if (!(shapeFactor > 0 && Number.isFinite(shapeFactor))) throw new DomainError('shape factor must be positive', { field: 'pinningShapeFactor' });
  if (input.pinningShapeFactor === undefined) {
    notes.assume('pinning shape factor k = 1: contact line spanning the groove cross-section normal to the motion');
  }

  // Lengths: segments of a groove.
  let segmentLength: number;
  let segments: number;
  if (input.segmentLength !== undefined) {
    if (!(input.segmentLength > 0 && Number.isFinite(input.segmentLength))) throw new DomainError('segment length must be positive', { field: 'segmentLength' });
    segmentLength = input.segmentLength;
    segments = input.grooveLength !== undefined ? Math.max(1, Math.round(input.grooveLength / input.segmentLength)) : 1;
  } else if (input.grooveLength !== undefined) {
    if (!(input.grooveLength > 0 && Number.isFinite(input.grooveLength))) throw new DomainError('groove length must be positive', { field: 'grooveLength' });
    segmentLength = input.grooveLength;
    segments = 1;
  } else {
    throw new DomainError('give grooveLength or segmentLength', { field: 'grooveLength' });
  }

  // Interface shear.
  const ratio = input.interfacialShearRatio;
  if (ratio !== undefined && !(ratio >= 0 && Number.isFinite(ratio))) throw new DomainError('interfacial shear ratio must be non-negative', { field: 'interfacialShearRatio' });
  const alongGroove = Math.cos(texture.flowAngle * DEG);
  if (Math.abs(texture.flowAngle) > 1e-9) {
    notes.warn('oblique-grooves', `grooves at ${texture.flowAngle}° to the flow: only the along-groove shear component (cos of the angle) drains them`, 'caution');
  }
  const tau = flow.wallShearStress * (ratio ?? 1) * alongGroove;
  if (ratio === undefined) notes.assume('interfacial shear taken equal to the smooth-wall shear stress (interfacialShearRatio = 1)');

  // Gravity.
  let body = 0;
  const deltaRho = lubricant.density - workingFluid.density;
  if (input.inclination) {
    const { angle, direction } = input.inclination;
    if (!(Number.isFinite(angle) && angle >= 0 && angle <= 90)) throw new DomainError('inclination must lie between 0 and 90 degrees', { field: 'inclination.angle' });
    body = deltaRho * STANDARD_GRAVITY * Math.sin(angle * DEG) * (direction === 'with-flow' ? 1 : -1);
  }

  const lengthCap = 1e6 * segmentLength;
  const holds = holdLengths(w, d, gamma, tau, body, angles, shapeFactor, lengthCap);
  const shearOnly = holdLengths(w, d, gamma, tau, 0, angles, shapeFactor, lengthCap);
  const curvature = holds.curvature;
  const maxCapillaryPressure = gamma * curvature.curvature;
  const forceBalancePlugLength = tau > 0 ? Math.min(lengthCap, (holds.pin * w * d) / (tau * w)) : lengthCap;

  const gravityOnly = Math.abs(body) > 0;
  const gravity = {
    bodyForceGradient: body,
    capillaryHoldLength: gravityOnly && maxCapillaryPressure > 0 ? maxCapillaryPressure / Math.abs(body) : null,
    pinningHoldLength: gravityOnly && holds.pin > 0 ? holds.pin / Math.abs(body) : null,
    hydrostaticHoldHeight: Math.abs(deltaRho) > 0 && maxCapillaryPressure > 0 ? maxCapillaryPressure / (Math.abs(deltaRho) * STANDARD_GRAVITY) : null,
  };

  // Binding holding mechanism: the one that keeps the longer length.
  let binding: RetentionMechanism;
  let retainedLength: number;
  if (holds.capillary <= 0 && holds.pinning <= 0) {
    binding = 'none';
    retainedLength = 0;
  } else if (holds.capillary >= holds.pinning) {
    binding = 'capillary-back-pressure';
    retainedLength = holds.capillary;
  } else {
    binding = 'contact-line-pinning';
    retainedLength = holds.pinning;
  }
  const dominantDrive: 'shear' | 'gravity' = Math.abs(body) > Math.abs(holds.gradient) ? 'gravity' : 'shear';

  // Sag-corrected steady column of the drainage model (the timeline's end state), for the retained volume.
  const spillCurvature = (2 * Math.sin(Math.min(90, angles.advancing) * DEG)) / w;
  const endCurvature = input.grooveEnds === 'closed' || segments > 1 ? spillCurvature : 0;
  // One sampling of the column's integrand serves every cut (the segment, and the barrier-spacing search below).
  // Where pinning binds the column is only reported, and a caller may leave it out.
  const columnWanted = binding === 'capillary-back-pressure' || input.unboundSteadyColumn !== false;
  const columnFor =
    curvature.curvature > 0 && columnWanted
      ? steadyColumnProfile({
          grooveWidth: w,
          grooveDepth: d,
          interfacialTension: gamma,
          interfacialShearStress: tau,
          bodyForceGradient: body,
          recedingCurvature: curvature.curvature,
          endCurvature,
        })
      : null;
  const column = columnFor ? columnFor(segmentLength) : null;
  const capillaryBinds = binding === 'capillary-back-pressure';
  const retainedFraction =
    capillaryBinds && column ? Math.min(initialFill, column.equivalentLength / segmentLength) : Math.min(initialFill, retainedLength / segmentLength);

  // Dissolution lifetime.
  const dissolution = input.solubility
    ? dissolutionLifetime({ solubility: input.solubility, scenario, grooveLength: segmentLength * segments }, notes)
    : NO_DISSOLUTION;
  if (dissolution.lifetime !== null && dissolution.lifetime < input.duration) {
    binding = 'dissolution';
    notes.warn('dissolution-within-duration', 'the lubricant dissolves within the requested duration (order-of-magnitude estimate)', 'warning');
  }

  // Timeline.
  const useFiniteVolume =
    input.finiteVolumeTimeline !== false && (binding === 'capillary-back-pressure' || binding === 'dissolution') && curvature.curvature > 0 && holds.capillary >= holds.pinning;
  const { timeline, timelineModel, finalRetainedFraction, timeTo90, conservationError, cellsPerSegment } = drainageTimeline(
    {
      grooveWidth: w,
      grooveDepth: d,
      segmentLength,
      segments,
      grooveEnds: input.grooveEnds,
      interfacialTension: gamma,
      interfacialShearStress: tau,
      lubricantViscosity: mu,
      bodyForceGradient: body,
      recedingCurvature: curvature.curvature,
      spillCurvature,
      initialFill,
      duration: input.duration,
      retainedLength,
      finiteVolume: useFiniteVolume,
      ...(input.timelinePoints === undefined ? {} : { timelinePoints: input.timelinePoints }),
      ...(input.settledBy === undefined ? {} : { settledBy: input.settledBy }),
    },
    notes,
  );

  explainTimelineEnd(notes, { retainedFraction, finalRetainedFraction, timeline, timelineModel, binding, duration: input.duration });

  // Recommendations: barrier spacing and geometry direction.
  let maxSegmentLength = retainedLength / targetFill;
  if (capillaryBinds && columnFor) {
    // Longest segment whose steady column keeps the target share of its volume: the share falls with the length.
    const share = (length: number): number => Math.min(1, columnFor(length).equivalentLength / length);
    let lo = 0;
    let hi = Math.max(retainedLength / targetFill, 1e-12);
    while (share(hi) >= targetFill && hi < lengthCap) hi *= 2;
    for (let k = 0; k < 60 && hi - lo > 1e-9 * hi; k++) {
      const mid = 0.5 * (lo + hi);
      if (share(mid) >= targetFill) lo = mid;
      else hi = mid;
    }
    maxSegmentLength = lo;
  }
  const bindingLength = (ww: number, dd: number): number => {
    const h = holdLengths(ww, dd, gamma, tau, body, angles, shapeFactor, lengthCap);
    return Math.max(h.capillary, h.pinning);
  };
  const step = 0.01;
  const base = bindingLength(w, d);
  let widthSensitivity = 0;
  let depthSensitivity = 0;
  if (base > 0) {
    widthSensitivity = (Math.log(bindingLength(w * (1 + step), d)) - Math.log(bindingLength(w * (1 - step), d))) / (Math.log(1 + step) - Math.log(1 - step));
    depthSensitivity = (Math.log(bindingLength(w, d * (1 + step))) - Math.log(bindingLength(w, d * (1 - step)))) / (Math.log(1 + step) - Math.log(1 - step));
  }

  // Warnings the issue asks for.
  notes.warn(
    'creep-near-retained-length',
    'near the retained length the real drainage is slower than this continuum model (thermally activated depinning, Colosqui et al. 2016)',
    'info',
  );
  notes.cite(REFERENCES.colosqui2016);
  notes.warn('flat-sample-hysteresis', 'contact-angle hysteresis measured on flat samples may differ from that inside the grooves', 'info');
  if (input.wettingState === 'not-wetting') {
    warnNotWetting(notes);
  }
  if (angles.receding >= 90) {
    notes.warn('no-capillary-suction', 'receding angle ≥ 90°: the receding meniscus gives no capillary back-pressure; only pinning holds the lubricant', 'caution');
  }
  if (holds.drive < 0) {
    notes.warn('drained-upstream', 'gravity outweighs the shear: the lubricant drains against the flow', 'caution');
  }

  return outcome(
    {
      interfacialShearStress: { value: tau, source: ratio === undefined ? 'smooth-wall-assumed' : 'slip-solution' },
      mechanisms: {
        capillaryBackPressure: {
          maximumCurvature: curvature.curvature,
          curvatureLimit: curvature.limit,
          maximumCapillaryPressure: maxCapillaryPressure,
          backPressureGradient: holds.gradient,
          retainedLength: shearOnly.capillary,
          retainedLengthWithGravity: holds.capillary,
          steadyColumn: column ? { length: column.length, equivalentLength: column.equivalentLength } : null,
        },
        contactLinePinning: {
          pinningPressure: holds.pin,
          shapeFactor,
          criticalPlugLength: shearOnly.pinning,
          forceBalancePlugLength,
          retainedLengthWithGravity: holds.pinning,
        },
        gravity,
        dissolution,
      },
      bindingMechanism: binding,
      dominantDrive,
      retainedLength,
      criticalPlugLength: shearOnly.pinning,
      retainedFraction,
      verdict: {
        passes: retainedFraction >= targetFill,
        margin: retainedFraction / targetFill - 1,
        criterion: `retained: the steady retained share of the groove volume (${retainedFraction.toPrecision(3)}) reaches the target fill ${targetFill}; margin = share/target − 1`,
      },
      segmentLength,
      segments,
      timeline,
      timelineModel,
      finalRetainedFraction,
      timeTo90PercentChange: timeTo90,
      conservationError,
      timelineCellsPerSegment: cellsPerSegment,
      dissolutionLifetime: dissolution.lifetime,
      recommendations: {
        maxSegmentLength,
        targetFill,
        widthSensitivity,
        depthSensitivity,
        width: widthSensitivity > 0.02 ? 'wider' : widthSensitivity < -0.02 ? 'narrower' : 'either',
        depth: depthSensitivity > 0.02 ? 'deeper' : depthSensitivity < -0.02 ? 'shallower' : 'either',
      },
    },
    notes,
  );
}
