/**
 * The assessment of one design: every mechanism with its couplings computed
 * (./assess-mechanisms.ts), one overall verdict with the limiting mechanism,
 * and the sensitivities of each margin to the design's main knobs by finite
 * differences through the whole assessment. A pure function of a
 * DesignContext, so a sweep can call it in process.
 *
 * Overall verdict (our rule):
 *   fails                  some assessed mechanism misses its requirement (margin < 0);
 *   works with conditions  every assessed one meets it, but a condition holds: a margin below
 *                          {@link THIN_MARGIN}, a marginal wave regime, or a wetting state in which the
 *                          lubricant is held by pinning alone (wetting fails but retention passes);
 *   works                  otherwise.
 * The limiting mechanism is the assessed one with the smallest margin; wetting is
 * excluded while retention is assessed and passes (the lubricant is then held anyway).
 */
import { MissingInputError } from '../../core/errors.js';
import { Notes } from '../../core/notes.js';
import type { ModelId } from '../../core/models.js';
import type { Reference } from '../../core/references.js';
import type { Warning } from '../../core/notes.js';
import { evaluateMechanisms, MECHANISMS, type CouplingEffects, type MechanismAssessment, type MechanismEvaluation, type MechanismName } from './assess-mechanisms.js';
import { effectiveRequirements, type AssessmentRequirements, type EffectiveRequirements } from './assess-requirements.js';
import { assessSensitivities, type Sensitivities } from './assess-sensitivity.js';
import { DesignContext } from './context.js';

export type { AssessmentRequirements, EffectiveRequirements } from './assess-requirements.js';
export type { MechanismName, MechanismAssessment, CouplingEffects } from './assess-mechanisms.js';

/** A margin below this (10 % of the requirement) passes only "with conditions" (our choice). */
export const THIN_MARGIN = 0.1;

export type OverallVerdict = 'works' | 'works-with-conditions' | 'fails';

export interface AssessmentOptions {
  /** Compute the sensitivities (default true; a sweep over many designs turns them off). */
  sensitivities?: boolean;
  /** Relative step of the finite differences (default 0.02). */
  relativeStep?: number;
  /** Points of the lubricant-conductivity sweep for the heat plot (default none). */
  heatSweepPoints?: number;
}

export interface AssessmentResult {
  requirements: EffectiveRequirements;
  overall: { verdict: OverallVerdict; limitingMechanism: MechanismName | null; conditions: string[]; summary: string };
  mechanisms: Record<MechanismName, MechanismAssessment>;
  couplings: CouplingEffects;
  serviceTime: MechanismEvaluation['serviceTime'];
  surfactantCurve: MechanismEvaluation['surfactantCurve'];
  heatSweep: MechanismEvaluation['heatSweep'];
  sensitivities: Sensitivities | null;
}

export interface Assessment {
  inputs: Record<string, unknown>;
  result: AssessmentResult;
  warnings: readonly Warning[];
  assumptions: readonly string[];
  references: readonly Reference[];
  models: readonly ModelId[];
}

const WORDS: Record<MechanismName, string> = {
  wetting: 'wetting',
  retention: 'lubricant retention',
  waves: 'interface waves',
  slipAndDrag: 'slip and drag',
  surfactant: 'surfactant',
  heat: 'heat transfer',
};

/** Human name of a mechanism key. */
export function mechanismWords(name: MechanismName): string {
  return WORDS[name];
}

function margins(mechanisms: Record<MechanismName, MechanismAssessment>): Partial<Record<MechanismName, number>> {
  const out: Partial<Record<MechanismName, number>> = {};
  for (const name of MECHANISMS) {
    const m = mechanisms[name];
    if (m.status === 'assessed') out[name] = m.verdict.margin;
  }
  return out;
}

/** The overall verdict and limiting mechanism of evaluated mechanisms (module comment). */
export function overallVerdict(mechanisms: Record<MechanismName, MechanismAssessment>, waveRegime: string | null): AssessmentResult['overall'] {
  const retention = mechanisms.retention;
  const heldAnyway = retention.status === 'assessed' && retention.verdict.passes;
  const candidates = (Object.entries(margins(mechanisms)) as [MechanismName, number][]).filter(([name]) => !(name === 'wetting' && heldAnyway));
  candidates.sort((a, b) => a[1] - b[1]);
  const limiting = candidates[0]?.[0] ?? null;
  const conditions: string[] = [];
  const failing = candidates.filter(([, m]) => m < 0).map(([n]) => WORDS[n]);
  for (const [name, m] of candidates) if (m >= 0 && m < THIN_MARGIN) conditions.push(`${WORDS[name]} meets its requirement by less than ${THIN_MARGIN * 100} %`);
  if (waveRegime === 'marginal') conditions.push('the interface is marginal between calm and wavy: keep the flow at or below the stated one');
  if (heldAnyway && mechanisms.wetting.status === 'assessed' && !mechanisms.wetting.verdict.passes) {
    conditions.push('the working liquid displaces the lubricant at equilibrium: it is held by pinning alone, so keep the surface free of damage and contamination');
  }
  const verdict: OverallVerdict = failing.length > 0 ? 'fails' : conditions.length > 0 ? 'works-with-conditions' : 'works';
  const notAssessed = MECHANISMS.filter((n) => mechanisms[n].status === 'not-assessed').map((n) => WORDS[n]);
  const summary =
    (verdict === 'fails' ? `Fails on ${failing.join(', ')}.` : verdict === 'works' ? 'Meets every assessed requirement.' : 'Meets every assessed requirement, with conditions.') +
    (limiting ? ` Smallest margin: ${WORDS[limiting]}.` : '') +
    (notAssessed.length > 0 ? ` Not assessed: ${notAssessed.join(', ')}.` : '');
  return { verdict, limitingMechanism: limiting, conditions, summary };
}

/** The margins of one design (no sensitivities, no plots): what a finite difference compares. */
export function assessmentMargins(ctx: DesignContext, requirements: EffectiveRequirements): Partial<Record<MechanismName, number>> {
  return margins(evaluateMechanisms(ctx, requirements, { marginsOnly: true }).mechanisms);
}

/**
 * Assesses the design of `ctx` against `requirements` (defaults stated in the
 * result). Throws MissingInputError when the document lacks what the slip needs
 * (texture, fluids, flow); every other missing part makes its mechanism "not
 * assessed" with the reason.
 */
export function assessDesign(ctx: DesignContext, requirements: AssessmentRequirements = {}, options: AssessmentOptions = {}): Assessment {
  const doc = ctx.document;
  const water = doc.waterQuality;
  const statedConcentration = water === undefined ? undefined : Array.isArray(water.bulkConcentration) ? water.bulkConcentration[0] : water.bulkConcentration;
  const effective = effectiveRequirements(requirements, { ...(doc.options?.duration === undefined ? {} : { duration: doc.options.duration }), ...(statedConcentration === undefined ? {} : { statedConcentration }) });
  for (const part of ['texture', 'lubricant', 'workingFluid', 'flow'] as const) {
    if (doc[part] === undefined) throw new MissingInputError(part, 'assess', `${part} (the slip every mechanism rests on)`);
  }
  const evaluation = evaluateMechanisms(ctx, effective, options.heatSweepPoints ? { heatSweepPoints: options.heatSweepPoints } : {});
  const overall = overallVerdict(evaluation.mechanisms, evaluation.couplings.waveRegime);
  const notes = new Notes().merge(ctx.notes).merge(evaluation.notes);
  let sensitivities: Sensitivities | null = null;
  if (options.sensitivities !== false) {
    sensitivities = assessSensitivities(ctx, effective, margins(evaluation.mechanisms), overall.limitingMechanism, options.relativeStep ?? 0.02, evaluation.drainageSettled);
    notes.assume(`Sensitivities: one-sided finite differences of each margin through the whole assessment, relative step ${sensitivities.relativeStep} per knob, reported as Δmargin/Δln(knob).`);
  }
  const o = doc.options ?? {};
  ctx.echo('options', {
    method: o.method ?? 'auto',
    surfactantMethod: o.surfactantMethod ?? 'auto',
    duration: effective.serviceTime.value as number,
    initialFill: o.initialFill ?? 1,
    targetFill: o.targetFill ?? 0.9,
  });
  ctx.echo('requirements', Object.fromEntries(Object.entries(effective).map(([k, v]) => [k, v.value])));
  return {
    inputs: ctx.inputs(),
    result: {
      requirements: effective,
      overall,
      mechanisms: evaluation.mechanisms,
      couplings: evaluation.couplings,
      serviceTime: evaluation.serviceTime,
      surfactantCurve: evaluation.surfactantCurve,
      heatSweep: evaluation.heatSweep,
      sensitivities,
    },
    warnings: notes.warnings,
    assumptions: notes.assumptions,
    references: notes.references,
    models: notes.models,
  };
}
