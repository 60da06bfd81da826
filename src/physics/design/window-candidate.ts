/**
 * One candidate of the design window: the design document with the searched
 * geometry (and lubricant) set, answered by the questions, each requirement's
 * margin computed as the assessment states it (margin dimensionless, ≥ 0
 * exactly when the requirement holds), the candidate labelled feasible or by
 * its limiting requirement (the smallest margin).
 *
 * Requirements and their margins (the assessment's semantics; the window
 * evaluates the four mechanisms that depend on the groove geometry through
 * closed forms, not surfactant or heat):
 * - wetting: the wetting verdict's margin, only when asked for (stableWetting): a lubricant the working liquid
 *   would displace at equilibrium can still be held by contact-line pinning, which retention evaluates;
 * - waves: (m − reserve)/(1 − reserve), m the waves verdict's margin and reserve the required minWaveMargin;
 * - retention: f(t_s)/minRetainedFraction − 1, f the retained share of the drainage timeline at the service time
 *   (when advancing/receding angles and a groove length are given);
 * - drag: DR·c·f(t_s)/minDragReduction − 1, DR the slip model's drag reduction, c = 0 on a wavy interface else 1,
 *   f(t_s) the filled share (a drained groove counted as no-slip wall: common practice, no source).
 */
import type { Catalogue } from '../../core/catalogue.js';
import { DomainError, MissingInputError } from '../../core/errors.js';
import { DesignContext } from './context.js';
import type { DesignDocument } from './document.js';
import { interfaceWaves, lubricantRetention, wettingState } from './questions.js';
import { FEASIBLE } from './window-search.js';

export interface WindowRequirements {
  /** Smallest drag reduction credited at the service time, fraction (default 0.05). */
  minDragReduction?: number;
  /** Smallest share of the groove volume filled at the service time (default 0.5). */
  minRetainedFraction?: number;
  /** Share of the calm band's load that must stay unused, 0–1 (default 0). */
  minWaveMargin?: number;
  /** Service time, s (default 7200). */
  serviceTime?: number;
  /** Also require a thermodynamically stable infused state (default false: pinning may hold the lubricant). */
  stableWetting?: boolean;
}

/** Defaults: the assessment's (our screening choices; see its requirements). */
export const WINDOW_REQUIREMENT_DEFAULTS = { minDragReduction: 0.05, minRetainedFraction: 0.5, minWaveMargin: 0, serviceTime: 7200, stableWetting: false } as const;

export type RequirementName = 'wetting' | 'waves' | 'retention' | 'dragReduction';

/** Names of the requirements in the words of the plot's legend. */
export const REQUIREMENT_WORDS: Record<RequirementName | 'invalid', string> = {
  wetting: 'wetting',
  waves: 'waves',
  retention: 'retention',
  dragReduction: 'drag reduction',
  invalid: 'outside the models',
};

export interface CandidateOutcome {
  /** "feasible", or the limiting requirement (smallest margin), or "invalid" when a model refuses the design. */
  label: string;
  margins: Partial<Record<RequirementName, number>>;
  /** Drag reduction credited at the service time, retained share at the service time, waves margin m. */
  dragReduction: number | null;
  retainedFraction: number | null;
  waveMargin: number | null;
  /** Why a model refused the design ("invalid" only). */
  problem?: string;
}

/** Linear interpolation of a sampled timeline at t (clamped to its ends). */
function sampleAt(times: readonly number[], values: readonly number[], t: number): number {
  if (t <= times[0]!) return values[0]!;
  for (let i = 1; i < times.length; i++) {
    if (t <= times[i]!) return values[i - 1]! + ((values[i]! - values[i - 1]!) * (t - times[i - 1]!)) / (times[i]! - times[i - 1]!);
  }
  return values[values.length - 1]!;
}

/** Evaluate one candidate document against the requirements. */
export function evaluateCandidate(document: DesignDocument, requirements: WindowRequirements, catalogue: Catalogue): CandidateOutcome {
  const req = { ...WINDOW_REQUIREMENT_DEFAULTS, ...requirements };
  const doc: DesignDocument = { ...document, options: { ...document.options, duration: Math.max(req.serviceTime, document.options?.duration ?? 0) } };
  const ctx = new DesignContext(doc, catalogue);
  const margins: Partial<Record<RequirementName, number>> = {};
  try {
    if (req.stableWetting) margins.wetting = wettingState(ctx).verdict!.margin;
    const waves = interfaceWaves(ctx);
    const waveMargin = waves.verdict!.margin;
    margins.waves = (waveMargin - req.minWaveMargin) / (1 - req.minWaveMargin);
    let filled = 1;
    let retainedFraction: number | null = null;
    const texture = doc.texture;
    if (doc.contactAngles?.underWorkingFluid && (texture?.grooveLength !== undefined || texture?.segmentLength !== undefined)) {
      const timeline = lubricantRetention(ctx).result.timeline;
      filled = sampleAt(
        timeline.map((p) => p.time),
        timeline.map((p) => p.retainedFraction),
        req.serviceTime,
      );
      retainedFraction = filled;
      margins.retention = filled / req.minRetainedFraction - 1;
    }
    // The slip solution of the context (the slip question adds only checks the window makes itself).
    const drag = ctx.slip('slip', doc.options?.method ?? 'closed-form').result.drag;
    const clean = 'dragReduction' in drag && typeof drag.dragReduction === 'number' ? drag.dragReduction : null;
    const dragReduction = clean === null ? null : clean * (waves.result.regime === 'wavy' ? 0 : 1) * filled;
    if (dragReduction !== null) margins.dragReduction = dragReduction / req.minDragReduction - 1;
    let label: string = FEASIBLE;
    let lowest = 0;
    for (const [name, m] of Object.entries(margins) as [RequirementName, number][]) {
      if (m < lowest) {
        lowest = m;
        label = name;
      }
    }
    return { label, margins, dragReduction, retainedFraction, waveMargin };
  } catch (error) {
    // A part the questions need is missing from the document: the request's fault, not this candidate's.
    if (!(error instanceof DomainError) || error instanceof MissingInputError) throw error;
    return { label: 'invalid', margins, dragReduction: null, retainedFraction: null, waveMargin: null, problem: error.message };
  }
}
