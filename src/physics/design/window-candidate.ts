/**
 * One candidate of the design window: the design document with the searched
 * geometry (and lubricant) set, assessed exactly as POST /v1/assess assesses
 * it (./assess.ts, without the sensitivities), so the window and the
 * assessment share one definition of every requirement, its margin, its
 * default and the overall verdict:
 * - feasible ⟺ the assessment's overall verdict is not "fails" (every assessed mechanism meets its requirement;
 *   wetting counts only where retention does not hold the lubricant anyway), and, when `stableWetting` is asked
 *   for, the wetting verdict passes too (a requirement the window adds on top of the assessment's);
 * - otherwise the label is the assessment's limiting mechanism (the smallest margin, a failing one), or wetting
 *   when only the added stable-wetting requirement fails.
 * Every mechanism of an infeasible candidate is still evaluated (no stop at the first failing one): the label is the
 * smallest margin, and the adaptive search refines wherever labels change, so a label from a partial evaluation
 * would draw the regions of the limiting requirements wrongly.
 */
import type { Catalogue } from '../../core/catalogue.js';
import { DomainError, MissingInputError } from '../../core/errors.js';
import { assessDesign, type AssessmentRequirements, type MechanismName } from './assess.js';
import { DesignContext } from './context.js';
import type { DesignDocument } from './document.js';
import { FEASIBLE } from './window-search.js';

export interface WindowRequirements extends AssessmentRequirements {
  /** Also require a thermodynamically stable infused state (default false: pinning may hold the lubricant). */
  stableWetting?: boolean;
}

/** A requirement of the window: a mechanism of the assessment, under the window's name for slip and drag. */
export type RequirementName = Exclude<MechanismName, 'slipAndDrag'> | 'dragReduction';

/** Names of the requirements in the words of the plot's legend. */
export const REQUIREMENT_WORDS: Record<RequirementName | 'invalid', string> = {
  wetting: 'wetting',
  waves: 'waves',
  retention: 'retention',
  dragReduction: 'drag reduction',
  surfactant: 'surfactant',
  heat: 'heat transfer',
  invalid: 'outside the models',
};

const requirementName = (m: MechanismName): RequirementName => (m === 'slipAndDrag' ? 'dragReduction' : m);

export interface CandidateOutcome {
  /** "feasible", or the limiting requirement (smallest margin), or "invalid" when a model refuses the design. */
  label: string;
  /** The assessment's margin of every assessed mechanism. */
  margins: Partial<Record<RequirementName, number>>;
  /** Drag reduction credited at the service time, retained share at the service time, waves margin m = 1 − Π_max/Π_calm. */
  dragReduction: number | null;
  retainedFraction: number | null;
  waveMargin: number | null;
  /** Why a model refused the design ("invalid" only). */
  problem?: string;
}

/** The assessment's requirements of a window request (the window's own stableWetting left out). */
export function assessmentRequirements(requirements: WindowRequirements): AssessmentRequirements {
  const { stableWetting: _stableWetting, ...rest } = requirements;
  return rest;
}

/** Evaluate one candidate document against the requirements, as the assessment does. */
export function evaluateCandidate(document: DesignDocument, requirements: WindowRequirements, catalogue: Catalogue): CandidateOutcome {
  try {
    const { result } = assessDesign(new DesignContext(document, catalogue), assessmentRequirements(requirements), { sensitivities: false });
    const margins: Partial<Record<RequirementName, number>> = {};
    for (const [name, m] of Object.entries(result.mechanisms) as [MechanismName, (typeof result.mechanisms)[MechanismName]][]) {
      if (m.status === 'assessed') margins[requirementName(name)] = m.verdict.margin;
    }
    const wetting = result.mechanisms.wetting;
    if (requirements.stableWetting && wetting.status !== 'assessed') throw new MissingInputError('contactAngles', 'design-window', `contact angles under the working fluid (requirements.stableWetting): ${wetting.reason}`);
    let label: string = FEASIBLE;
    if (result.overall.verdict === 'fails') label = requirementName(result.overall.limitingMechanism!);
    else if (requirements.stableWetting && wetting.status === 'assessed' && !wetting.verdict.passes) label = 'wetting';
    const waves = result.mechanisms.waves;
    const minWaveMargin = result.requirements.minWaveMargin.value as number;
    return {
      label,
      margins,
      dragReduction: result.couplings.creditedDragReductionAtServiceTime,
      retainedFraction: result.mechanisms.retention.status === 'assessed' ? result.couplings.filledFractionAtServiceTime : null,
      // Back from the assessment's margin (m − reserve)/(1 − reserve) to m.
      waveMargin: waves.status === 'assessed' ? minWaveMargin + waves.verdict.margin * (1 - minWaveMargin) : null,
    };
  } catch (error) {
    // A part the assessment needs is missing from the document: the request's fault, not this candidate's.
    if (!(error instanceof DomainError) || error instanceof MissingInputError) throw error;
    return { label: 'invalid', margins: {}, dragReduction: null, retainedFraction: null, waveMargin: null, problem: error.message };
  }
}
