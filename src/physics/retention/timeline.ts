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
import { lumpedDrainageTime, lumpedRetainedLength, solveDrainage, type DrainageInput, type TimelinePoint } from './drainage.js';

/** The drainage model's inputs, plus what the choice between the two timelines needs. */
export interface TimelineInput extends Omit<DrainageInput, 'cellsPerSegment' | 'maxSteps'> {
  /** Steady retained length of the binding mechanism, m (where the lumped plug stops). */
  retainedLength: number;
  /** Whether the capillary mechanism binds, so the finite-volume model applies. */
  finiteVolume: boolean;
}

export interface Timeline {
  timeline: TimelinePoint[];
  timelineModel: 'finite-volume' | 'lumped-plug';
  finalRetainedFraction: number;
  timeTo90: number | null;
  conservationError: number | null;
}

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
  return { timeline, timelineModel: 'lumped-plug', finalRetainedFraction, timeTo90, conservationError: null };
}

/** The timeline of the retention model (module comment). */
export function drainageTimeline(input: TimelineInput, notes: Notes): Timeline {
  if (!input.finiteVolume) return lumpedTimeline(input, notes);
  const solvedSegments = Math.min(input.segments, 4);
  if (input.segments > solvedSegments) {
    notes.assume(`timeline solved for the first ${solvedSegments} of ${input.segments} segments (interior segments behave alike)`);
  }
  try {
    const { retainedLength: _retainedLength, finiteVolume: _finiteVolume, ...model } = input;
    // A stalled integration must fail fast (the request has a time budget); the lumped model then answers.
    const drainage = solveDrainage({ ...model, segments: solvedSegments, maxSteps: 2_000 });
    notes.model('retention.drainage-finite-volume');
    return {
      timeline: drainage.timeline,
      timelineModel: 'finite-volume',
      finalRetainedFraction: drainage.finalRetainedFraction,
      timeTo90: drainage.timeTo90PercentChange,
      conservationError: drainage.conservationError,
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
