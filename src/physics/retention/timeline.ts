/**
 * The drainage timeline of ./retention.ts: the finite-volume solution of the
 * filled cross-section along the groove (./drainage.ts) where the capillary
 * mechanism binds, the lumped plug model in closed form where pinning binds or
 * the finite-volume solve exceeds its step budget; and the warning that explains
 * a timeline whose end differs from the steady retained share.
 */
import { ConvergenceError } from '../../core/errors.js';
import type { Notes } from '../../core/notes.js';
import { pressureDrivenGrooveFlux, shearDrivenGrooveFlux } from '../groove/groove-duct.js';
import { lumpedDrainageTime, lumpedRetainedLength, solveDrainage, type DrainageInput, type DrainageResult, type TimelinePoint } from './drainage.js';

/** The drainage model's inputs, plus what the choice between the two timelines needs. */
export interface TimelineInput extends Omit<DrainageInput, 'cellsPerSegment' | 'maxSteps'> {
  /** Steady retained length of the binding mechanism, m (where the lumped plug stops). */
  retainedLength: number;
  /** Whether the capillary mechanism binds, so the finite-volume model applies. */
  finiteVolume: boolean;
  /**
   * For a caller that reads the steady share, not the timeline's end, once the drainage has settled within this
   * time, s (an assessment): the finite-volume timeline is solved on {@link COARSE_CELLS_PER_SEGMENT} cells per
   * segment. The caller decides from the result (`cellsPerSegment`, the timeline) whether it settled early enough,
   * and asks again without this if not.
   */
  settledBy?: number;
}

export interface Timeline {
  timeline: TimelinePoint[];
  timelineModel: 'finite-volume' | 'lumped-plug';
  finalRetainedFraction: number;
  timeTo90: number | null;
  conservationError: number | null;
  /** Cells per segment of the finite-volume timeline (null for the lumped plug). */
  cellsPerSegment: number | null;
}

/**
 * Cells per segment of a timeline that only has to show a drainage settling early (our choice; the share the
 * verdict reads is then the steady column's quadrature, not the timeline's end). Measured against the 120-cell
 * solution, in the steep part of the drainage: the assessment demonstration (a 20 mm groove settling in 7 s)
 * within 8e-4 of the groove volume at 0.41 of the cost; a 100 mm groove of a wetting lubricant draining to 8 %
 * within a minute within 0.025 at about a ninth; other invented designs within 0.01 and 0.045
 * (test/physics/retention/timeline.test.ts). The 120-cell solution is itself first order in its cells.
 */
export const COARSE_CELLS_PER_SEGMENT = 40;

/** Step budget of a finite-volume solve: a stalled integration must fail fast (the request has a time budget). */
const STEP_BUDGET = 2_000;

/** Samples of the lumped plug L(t) on a grid denser at early times, and its time to 90 % of the change. */
function lumpedTimeline(input: TimelineInput, notes: Notes): Timeline {
  const { grooveWidth: w, grooveDepth: d, segmentLength } = input;
  const speed = Math.abs(
    (input.interfacialShearStress * shearDrivenGrooveFlux(w, d) + input.bodyForceGradient * pressureDrivenGrooveFlux(w, d)) / (input.lubricantViscosity * w * d),
  );
  const initialLength = input.initialFill * segmentLength;
  const stopLength = Math.min(input.retainedLength, initialLength);
  const points = Math.max(2, Math.min(200, input.timelinePoints ?? 150));
  const timeline: TimelinePoint[] = [];
  for (let k = 0; k < points; k++) {
    const t = input.duration * (k / (points - 1)) ** 2;
    const length = speed > 0 ? lumpedRetainedLength(t, initialLength, stopLength, speed) : initialLength;
    timeline.push({ time: t, retainedFraction: length / segmentLength, retainedLength: length });
  }
  const finalRetainedFraction = timeline[timeline.length - 1].retainedFraction;
  const change = initialLength - finalRetainedFraction * segmentLength;
  const timeTo90 = change > 1e-12 * initialLength && speed > 0 ? lumpedDrainageTime(initialLength, initialLength - 0.9 * change, stopLength, speed) : null;
  notes.model('retention.drainage-lumped-plug');
  return { timeline, timelineModel: 'lumped-plug', finalRetainedFraction, timeTo90, conservationError: null, cellsPerSegment: null };
}

/** The coarse finite-volume solve for a caller reading the steady share once settled: null if it stalls. */
function coarseDrainage(model: Omit<DrainageInput, 'cellsPerSegment' | 'maxSteps'>): DrainageResult | null {
  try {
    return solveDrainage({ ...model, cellsPerSegment: COARSE_CELLS_PER_SEGMENT, maxSteps: STEP_BUDGET });
  } catch (error) {
    if (error instanceof ConvergenceError) return null;
    throw error;
  }
}

/** The timeline of the retention model (module comment). */
export function drainageTimeline(input: TimelineInput, notes: Notes): Timeline {
  if (!input.finiteVolume) return lumpedTimeline(input, notes);
  const solvedSegments = Math.min(input.segments, 4);
  if (input.segments > solvedSegments) {
    notes.assume(`timeline solved for the first ${solvedSegments} of ${input.segments} segments (interior segments behave alike)`);
  }
  try {
    const { retainedLength: _retainedLength, finiteVolume: _finiteVolume, settledBy: _settledBy, ...model } = input;
    // A stalled integration fails fast; the lumped model then answers.
    const drainage = (input.settledBy !== undefined && coarseDrainage({ ...model, segments: solvedSegments })) || solveDrainage({ ...model, segments: solvedSegments, maxSteps: STEP_BUDGET });
    notes.model('retention.drainage-finite-volume');
    return {
      timeline: drainage.timeline,
      timelineModel: 'finite-volume',
      finalRetainedFraction: drainage.finalRetainedFraction,
      timeTo90: drainage.timeTo90PercentChange,
      conservationError: drainage.conservationError,
      cellsPerSegment: drainage.cells / solvedSegments,
    };
  } catch (error) {
    if (!(error instanceof ConvergenceError)) throw error;
    notes.warn(
      'drainage-solver-fallback',
      `the finite-volume drainage solver did not finish (${error.message}); the timeline comes from the lumped plug model, which neglects the meniscus sag (about 1 % of the length in the verified cases)`,
      'caution',
    );
    return lumpedTimeline(input, notes);
  }
}

/** Share of the groove volume within which the timeline's end and the steady share count as the same (our choice). */
const TIMELINE_AGREEMENT = 0.02;

/**
 * The steady retained share (the verdict's basis) and the timeline's last point
 * come from different pieces of the model: the steady column of the capillary
 * model (meniscus sag, end meniscus) or the critical plug length, against the
 * finite-volume or lumped drainage over the requested duration. Where they
 * differ by more than {@link TIMELINE_AGREEMENT} of the groove volume, say
 * which difference it is, so the two numbers never contradict each other
 * silently.
 */
export function explainTimelineEnd(
  notes: Notes,
  run: {
    retainedFraction: number;
    finalRetainedFraction: number;
    timeline: TimelinePoint[];
    timelineModel: 'finite-volume' | 'lumped-plug';
    binding: 'capillary-back-pressure' | 'contact-line-pinning' | 'dissolution' | 'none';
    duration: number;
  },
): void {
  const { retainedFraction: steady, finalRetainedFraction: end, timeline } = run;
  if (Math.abs(end - steady) <= TIMELINE_AGREEMENT) return;
  const share = (x: number) => `${(100 * x).toFixed(1)} %`;
  const last = timeline[timeline.length - 1];
  const before = timeline[Math.max(0, timeline.length - 11)];
  // Still moving towards the steady share over the last tenth of the samples: the duration was too short.
  const settling = last !== undefined && before !== undefined && (last.retainedFraction - before.retainedFraction) * (steady - end) > 0;
  let why: string;
  if (settling) {
    why = `the timeline is still changing at the end of the ${run.duration.toPrecision(3)} s duration (drainage near the retained length is slow); a longer duration approaches the steady state`;
  } else if (run.timelineModel === 'lumped-plug' && run.binding === 'capillary-back-pressure') {
    why = 'the timeline comes from the lumped plug model, which has neither the meniscus sag nor the end meniscus of the steady capillary column';
  } else if (run.timelineModel === 'lumped-plug') {
    why = 'the timeline follows one plug sliding out to the critical length; break-up into several pinned plugs, which the steady share counts, is not modelled in time';
  } else {
    why = 'the finite-volume timeline settles on its own discrete steady state, which differs from the steady column of the closed form';
  }
  notes.warn(
    'timeline-differs-from-steady-state',
    `the drainage timeline ends at ${share(end)} of the groove volume while the steady retained share is ${share(steady)}: ${why}. The verdict uses the steady share.`,
    'caution',
  );
}
