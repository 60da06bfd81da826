/**
 * The mechanisms of an assessment (./assess.ts), each evaluated with the
 * couplings between them computed, not listed:
 *   slip → interfacial shear → retention (the retention runs on the same slip solution as the assessment);
 *   retention timeline → filled share f(t) → drag of the partly drained surface, DR(t) = f(t)·DR;
 *   waves → credited drag (a wavy interface is credited no reduction);
 *   surfactant at the stated concentration → surviving slip → drag and heat;
 *   heat with the surviving slip and the lubricant's conductivity.
 * A mechanism the document lacks the parts for is "not assessed", with the reason.
 */
import { DomainError, MissingInputError } from '../../core/errors.js';
import { Notes } from '../../core/notes.js';
import type { Verdict } from '../../core/values.js';
import type { RetentionResult } from '../retention/retention.js';
import { COARSE_CELLS_PER_SEGMENT } from '../retention/timeline.js';
import type { DragChange } from '../slip/drag.js';
import type { SlipMethod } from '../slip/slip.js';
import type { WaveRegime } from '../waves/criteria.js';
import type { EffectiveRequirements } from './assess-requirements.js';
import type { DesignContext } from './context.js';
import { heatTransfer, interfaceWaveMargin, interfaceWaveVerdict, lubricantRetention, slipAndDrag, surfactantSensitivity, wettingState, type Answer } from './questions.js';

export type MechanismName = 'wetting' | 'retention' | 'waves' | 'slipAndDrag' | 'surfactant' | 'heat';
export const MECHANISMS: readonly MechanismName[] = ['wetting', 'retention', 'waves', 'slipAndDrag', 'surfactant', 'heat'];

export type MechanismAssessment =
  | { status: 'assessed'; verdict: Verdict; summary: string }
  | { status: 'not-assessed'; reason: string };

/** The couplings' effect on the drag reduction and what carried it from one model to the next. */
export interface CouplingEffects {
  /** Slip method of the assessment (the retention's interfacial shear comes from the same solution). */
  slipMethod: 'exact-core' | 'closed-form' | 'field';
  /** τ_i/τ_w of that slip solution, fed to the retention. */
  interfacialShearRatio: number;
  /** Drag reduction of the clean, full, flat interface. */
  dragReductionClean: number | null;
  /** Share of the clean slip surviving the stated surfactant concentration (1 when the water is clean or not assessed). */
  slipRetainedBySurfactant: number;
  /** Drag reduction with the surviving slip. */
  dragReductionWithSurfactant: number | null;
  /** 1 when the interface is calm or marginal (or unknown), 0 when wavy. */
  waveCredit: number;
  waveRegime: WaveRegime | null;
  /** Filled share of the grooves at the service time (1 when retention is not assessed). */
  filledFractionAtServiceTime: number;
  /** The drag reduction credited at the start and at the end of the service time. */
  creditedDragReductionStart: number | null;
  creditedDragReductionAtServiceTime: number | null;
  /** Heat-transfer change q/q₀ − 1 with the clean slip and with the surviving slip. */
  heatTransferChangeClean: number | null;
  heatTransferChangeWithSurfactant: number | null;
}

/** Over the service time: filled share and credited drag reduction (null where none can be credited). */
export interface ServiceTimeline {
  time: number[];
  retainedFraction: number[];
  dragReduction: (number | null)[];
}

export interface MechanismEvaluation {
  mechanisms: Record<MechanismName, MechanismAssessment>;
  couplings: CouplingEffects;
  serviceTime: ServiceTimeline;
  /** Heat: the lubricant conductivity sweep, when asked for and heat was assessed. */
  heatSweep: { lubricantConductivity: number[]; nusseltRatio: (number | null)[]; heatFluxRatio: (number | null)[] } | null;
  /** Surfactant: slip kept over concentration, when surfactant was assessed. */
  surfactantCurve: { bulkConcentration: number[]; slipRetained: number[]; stated: number; statedSlipRetained: number } | null;
  /** The share at the service time is the steady column's: the drainage settled long before it. */
  drainageSettled: boolean;
  notes: Notes;
}

/** Runs a question; a part the document lacks (or a case the model does not cover) makes it "not assessed". */
function attempt<R>(run: () => R): { answer: R } | { reason: string } {
  try {
    return { answer: run() };
  } catch (error) {
    if (error instanceof MissingInputError) return { reason: error.message };
    if (error instanceof DomainError && error.code === 'unsupported-flow') return { reason: error.message };
    throw error;
  }
}

function dragReductionOf(drag: DragChange): number | null {
  return drag.kind === 'turbulent-fixed-bulk-reynolds' || drag.kind === 'laminar-fixed-flow-rate' ? drag.dragReduction : null;
}

/** Relative margin value/required − 1 (positive exactly when value exceeds a positive requirement). */
function ratioMargin(value: number, required: number): number {
  return value / required - 1;
}

/** An assessed mechanism: passes exactly when its margin is not negative. */
function assessed(margin: number, criterion: string, summary: string): MechanismAssessment {
  return { status: 'assessed', verdict: { passes: margin >= 0, margin, criterion }, summary };
}

const pct = (x: number) => `${(100 * x).toPrecision(3)} %`;

/** Linear interpolation of a sampled timeline at t (clamped to its ends). */
function valueAt(times: readonly number[], values: readonly number[], t: number): number {
  if (t <= times[0]) return values[0];
  for (let i = 1; i < times.length; i++) {
    if (t <= times[i]) return values[i - 1] + ((values[i] - values[i - 1]) * (t - times[i - 1])) / (times[i] - times[i - 1]);
  }
  return values[values.length - 1];
}

/**
 * Share of the service time within which the finite-volume drainage must make 90 % of its change for the
 * assessment to read the steady column instead of the timeline (our choice: 19 more such intervals leave
 * nothing of an exponential approach).
 */
const SETTLED_SHARE = 0.05;

/**
 * Whether a finite-volume drainage (capillary back-pressure binding), sampled at `times` as `filled`, settled long
 * before the service time:
 * 90 % of its change within {@link SETTLED_SHARE} of it, and no visible change over its second half (a slow
 * creep towards the retained length, which the timeline's end would show, is not settled).
 */
function settledEarly(r: Omit<RetentionResult, 'verdict'>, times: readonly number[], filled: readonly number[], serviceTime: number): boolean {
  if (r.timelineModel !== 'finite-volume' || r.bindingMechanism !== 'capillary-back-pressure' || r.timeTo90PercentChange === null) return false;
  if (r.timeTo90PercentChange > SETTLED_SHARE * serviceTime) return false;
  return Math.abs(valueAt(times, filled, serviceTime) - valueAt(times, filled, serviceTime / 2)) <= 1e-3;
}

export interface MechanismOptions {
  /** Heat conductivity sweep points for the plot (none: no sweep). */
  heatSweepPoints?: number;
  /**
   * Only the margins are wanted (a sensitivity step): the waves verdict from the criteria at the design point
   * alone, without the growth curve and the design limits, which the margin does not use (same margin).
   */
  marginsOnly?: boolean;
  /**
   * How the base design's share at the service time was read (its evaluation's `drainageSettled`), for a sensitivity
   * step near it: true, the steady share, without solving the finite-volume timeline; false, its own timeline's last
   * point. Undefined: decided from this design's own timeline.
   */
  drainageSettled?: boolean;
}

/** Every mechanism on one context, with the couplings computed (module comment). */
export function evaluateMechanisms(ctx: DesignContext, requirements: EffectiveRequirements, options: MechanismOptions = {}): MechanismEvaluation {
  const notes = new Notes();
  const gather = (a: Answer<unknown>) => {
    for (const w of a.warnings) notes.warn(w.code, w.message, w.severity);
    for (const x of a.assumptions) notes.assume(x);
    notes.cite(...a.references);
    for (const m of a.models) notes.model(m);
  };
  const method: SlipMethod = ctx.document.options?.method ?? 'auto';
  const serviceTime = requirements.serviceTime.value as number;

  // Slip of the clean, full, flat interface: needed by everything; its absence is the request's fault (422).
  const slip = slipAndDrag(ctx);
  gather(slip);
  const dragClean = dragReductionOf(slip.result.drag);

  // Wetting (only when contact angles are given).
  const wetting = attempt(() => wettingState(ctx));
  const mechanisms = {} as Record<MechanismName, MechanismAssessment>;
  if ('answer' in wetting) {
    gather(wetting.answer);
    const v = wetting.answer.verdict as Verdict;
    mechanisms.wetting = { status: 'assessed', verdict: v, summary: `state ${wetting.answer.result.state}` };
  } else mechanisms.wetting = { status: 'not-assessed', reason: wetting.reason };

  // Waves, and the credit they leave to the drag reduction.
  const waves = attempt(() => {
    if (options.marginsOnly) return { ...interfaceWaveMargin(ctx), governing: 'not evaluated (margins only)' };
    const verdict = interfaceWaveVerdict(ctx);
    gather(verdict);
    return { regime: verdict.result.regime, margin: verdict.result.margin, governing: verdict.result.governingCriterion };
  });
  let waveCredit = 1;
  let waveRegime: WaveRegime | null = null;
  if ('answer' in waves) {
    waveRegime = waves.answer.regime;
    const calmMargin = waves.answer.margin;
    const reserve = requirements.minWaveMargin.value as number;
    const margin = (calmMargin - reserve) / (1 - reserve);
    mechanisms.waves = assessed(
      margin,
      `${waveRegime}: the waves margin 1 − Π_max/Π_calm (${calmMargin.toPrecision(3)}) reaches the required reserve ${reserve}; margin = (m − reserve)/(1 − reserve)`,
      `${waveRegime} (governing: ${waves.answer.governing})`,
    );
    if (waveRegime === 'wavy') {
      waveCredit = 0;
      notes.warn(
        'wavy-interface-no-drag-credit',
        'The interface is wavy: no drag reduction is credited. The slip models assume a flat interface; waves roughen the wall and can turn the reduction into an increase these models do not quantify.',
      );
    }
    notes.assume('Waves → drag: a wavy interface is credited no drag reduction (zero, not the unquantified increase); calm and marginal interfaces keep the flat-interface value.');
  } else mechanisms.waves = { status: 'not-assessed', reason: waves.reason };

  // Surfactant at the stated concentration (and at the tolerable one) → surviving slip → drag.
  const tolerable = requirements.tolerableSurfactantConcentration.value;
  const water = ctx.document.waterQuality;
  const stated = water === undefined ? undefined : Array.isArray(water.bulkConcentration) ? water.bulkConcentration[0] : water.bulkConcentration;
  const concentrations = stated === undefined ? undefined : tolerable !== null && tolerable !== stated ? [stated, tolerable] : [stated];
  // A sensitivity step reads the points at the stated and tolerable concentrations only: no curve.
  const surfactant = attempt(() =>
    surfactantSensitivity(ctx, { ...(concentrations ? { bulkConcentration: concentrations } : {}), ...(options.marginsOnly ? { pointsOnly: true } : {}) }),
  );
  let slipKept = 1;
  let dragWithSurfactant = dragClean;
  let surfactantCurve: MechanismEvaluation['surfactantCurve'] = null;
  let survivingSlip: { slipLengthLongitudinal: number; deltaUPlus?: number; dragReduction?: number } | undefined;
  if ('answer' in surfactant && stated !== undefined) {
    gather(surfactant.answer);
    const r = surfactant.answer.result;
    slipKept = r.points[0].slipRetained;
    dragWithSurfactant = dragReductionOf(r.drag);
    const keptAtTolerable = (r.points[1] ?? r.points[0]).slipRetained;
    const tol = tolerable ?? stated;
    const minKept = requirements.minSlipRetained.value as number;
    const margin = ratioMargin(keptAtTolerable, minKept);
    mechanisms.surfactant = assessed(
      margin,
      `slip kept at the tolerable concentration ${tol} mol/m³ (${keptAtTolerable.toPrecision(3)}) reaches ${minKept}; margin = kept/required − 1`,
      `${pct(slipKept)} of the clean slip kept at ${stated} mol/m³ (${r.regime})`,
    );
    surfactantCurve = { bulkConcentration: r.curve.bulkConcentration, slipRetained: r.curve.slipRetained, stated, statedSlipRetained: slipKept };
    survivingSlip = {
      slipLengthLongitudinal: r.slipLength,
      ...(r.drag.kind === 'turbulent-fixed-bulk-reynolds' ? { deltaUPlus: r.drag.deltaUPlus, dragReduction: r.drag.dragReduction } : {}),
    };
    notes.assume('Surfactant → slip → drag and heat: the slip surviving the stated concentration sets the drag reduction and the heat-transfer change.');
  } else {
    mechanisms.surfactant = { status: 'not-assessed', reason: 'reason' in surfactant ? surfactant.reason : 'waterQuality gives no concentration' };
    notes.assume('No surfactant assessed: the water is taken as clean.');
  }

  // Retention on the assessment's slip solution; the timeline runs to the service time. A sensitivity step of a
  // design whose drainage settled early needs only the steady share: no finite-volume timeline. A design that
  // decides this from its own timeline lets a drainage the lumped plug settles early be solved on the coarse grid
  // (the share is then the steady column's), and solves it again on the full grid if it did not settle after all.
  const retentionWith = (settledBy: number | undefined) =>
    attempt(() =>
      lubricantRetention(ctx, {
        method,
        duration: serviceTime,
        // The assessment reads the binding mechanism's share and timeline, never the column of one that does not bind.
        unboundSteadyColumn: false,
        ...(options.drainageSettled === true ? { finiteVolumeTimeline: false } : {}),
        // A sensitivity step told how to read the share needs the timeline's last point only (it lies at the service time).
        ...(options.marginsOnly && options.drainageSettled !== undefined ? { timelinePoints: 2 } : {}),
        ...(settledBy === undefined ? {} : { settledBy }),
      }),
    );
  let retention = retentionWith(options.drainageSettled === undefined ? SETTLED_SHARE * serviceTime : undefined);
  if ('answer' in retention) {
    const r = retention.answer.result;
    const coarse = r.timelineCellsPerSegment === COARSE_CELLS_PER_SEGMENT;
    if (
      coarse &&
      !settledEarly(
        r,
        r.timeline.map((p) => p.time),
        r.timeline.map((p) => p.retainedFraction),
        serviceTime,
      )
    ) {
      retention = retentionWith(undefined);
    }
  }
  let times = [0, serviceTime];
  let filled = [1, 1];
  let filledAtService = 1;
  let drainageSettled = false;
  if ('answer' in retention) {
    gather(retention.answer);
    const r = retention.answer.result;
    times = r.timeline.map((p) => p.time);
    filled = r.timeline.map((p) => p.retainedFraction);
    drainageSettled = options.drainageSettled ?? settledEarly(r, times, filled, serviceTime);
    const atService = drainageSettled ? r.retainedFraction : valueAt(times, filled, serviceTime);
    filledAtService = atService;
    if (drainageSettled && options.drainageSettled === undefined) {
      notes.assume(
        `Retention at the service time: the drainage settles within ${r.timeTo90PercentChange?.toPrecision(3)} s (90 % of its change), long before ${serviceTime} s, so the share at the service time is the steady column's (${r.retainedFraction.toPrecision(4)}, by quadrature); the finite-volume timeline, first order in its ${r.timelineCellsPerSegment} cells per segment, ends at ${r.finalRetainedFraction.toPrecision(4)}.`,
      );
    }
    const required = requirements.minRetainedFraction.value as number;
    const margin = ratioMargin(atService, required);
    mechanisms.retention = assessed(
      margin,
      `retained share of the groove volume after ${serviceTime} s (${atService.toPrecision(3)}) reaches ${required}; margin = share/required − 1`,
      `${pct(atService)} retained after ${serviceTime} s (${r.bindingMechanism}, ${r.timelineModel} timeline)`,
    );
    notes.assume(`Slip → retention: the interfacial shear is the wall shear × ${slip.result.interfacialShearRatio.toPrecision(4)} of the ${slip.result.method} slip solution used for the drag.`);
  } else {
    mechanisms.retention = { status: 'not-assessed', reason: retention.reason };
    notes.assume('Retention not assessed: the grooves are taken as full over the whole service time.');
  }
  notes.assume(
    'Drainage → drag: a drained stretch of groove is taken as a no-slip wall (it ignores the small slip of a groove refilled by the working liquid: conservative; common practice, no source). Drained and filled stretches are millimetres long, far longer than the viscous length, so each carries its own wall shear and the drag reduction of the partly drained surface is f(t)·DR, f the filled share.',
  );

  // Slip and drag: the credited drag reduction at the end of the service time.
  const base = dragWithSurfactant === null ? null : dragWithSurfactant * waveCredit;
  const dragSeries = filled.map((f) => (base === null ? null : f * base));
  const dragEnd = base === null ? null : filledAtService * base;
  if (dragEnd === null) {
    mechanisms.slipAndDrag = { status: 'not-assessed', reason: `no drag reduction follows from this flow (${slip.result.drag.kind}): give a channel, pipe or plate flow` };
  } else {
    const minDrag = requirements.minDragReduction.value as number;
    const margin = ratioMargin(dragEnd, minDrag);
    mechanisms.slipAndDrag = assessed(
      margin,
      `drag reduction credited after ${serviceTime} s (${dragEnd.toPrecision(3)}: clean ${dragClean?.toPrecision(3)}, × slip kept, × wave credit ${waveCredit}, × filled share ${filledAtService.toPrecision(3)}) reaches ${minDrag}; margin = DR/required − 1`,
      `${pct(dragEnd)} drag reduction credited after ${serviceTime} s (clean ${pct(dragClean ?? 0)})`,
    );
  }

  // Heat with the surviving slip (closed-form heat model: the field heat method re-solves a clean interface itself).
  let heatSweep: MechanismEvaluation['heatSweep'] = null;
  let heatClean: number | null = null;
  let heatSurviving: number | null = null;
  const heat = attempt(() => heatTransfer(ctx, { method: 'closed-form', ...(survivingSlip ? { slip: survivingSlip } : {}), ...(options.heatSweepPoints ? { sensitivity: { points: options.heatSweepPoints } } : {}) }));
  if ('answer' in heat) {
    gather(heat.answer);
    const r = heat.answer.result;
    heatSurviving = r.heatFluxRatio - 1;
    heatClean = survivingSlip ? heatTransfer(ctx, { method: 'closed-form' }).result.heatFluxRatio - 1 : heatSurviving;
    const required = requirements.minHeatTransferChange.value as number;
    const margin = ratioMargin(r.heatFluxRatio, 1 + required);
    mechanisms.heat = assessed(
      margin,
      `heat delivered q/q₀ (${r.heatFluxRatio.toPrecision(4)}) reaches 1 + ${required}; margin = (q/q₀)/(1 + required) − 1`,
      `${heatSurviving >= 0 ? '+' : ''}${pct(heatSurviving)} heat transfer against the solid-filled wall`,
    );
    if (r.sensitivity) heatSweep = { lubricantConductivity: r.sensitivity.lubricantConductivity, nusseltRatio: r.sensitivity.nusseltRatio, heatFluxRatio: r.sensitivity.heatFluxRatio };
    notes.assume('Heat: the closed-form heat model with the surviving slip and the lubricant’s conductivity, at full grooves.');
  } else mechanisms.heat = { status: 'not-assessed', reason: heat.reason };

  return {
    mechanisms,
    couplings: {
      slipMethod: slip.result.method,
      interfacialShearRatio: slip.result.interfacialShearRatio,
      dragReductionClean: dragClean,
      slipRetainedBySurfactant: slipKept,
      dragReductionWithSurfactant: dragWithSurfactant,
      waveCredit,
      waveRegime,
      filledFractionAtServiceTime: filledAtService,
      creditedDragReductionStart: base === null ? null : filled[0] * base,
      creditedDragReductionAtServiceTime: dragEnd,
      heatTransferChangeClean: heatClean,
      heatTransferChangeWithSurfactant: heatSurviving,
    },
    serviceTime: { time: times, retainedFraction: filled, dragReduction: dragSeries },
    heatSweep,
    surfactantCurve,
    drainageSettled,
    notes,
  };
}
