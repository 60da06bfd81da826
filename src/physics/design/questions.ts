/**
 * The composition layer: each question the service answers about a design, as
 * one function of a {@link DesignContext}. The chains between the models live
 * here and nowhere else:
 *   slip → interfacial shear → retention (the slip solution sets the shear that drains the grooves),
 *   slip → waves (the interface drift) and waves → slip validity (a wavy interface voids the drag change),
 *   wetting → slip and retention (a displaced lubricant is held by pinning alone),
 *   clean slip → surfactant (the slip the surfactant can take away), reduced slip → drag,
 *   slip → heat (the velocity slip that makes the flow plug-like).
 * An assessment of the whole design is these functions called on one context.
 */
import { DomainError, MissingInputError } from '../../core/errors.js';
import { Notes, type Warning } from '../../core/notes.js';
import type { ModelId } from '../../core/models.js';
import type { Reference } from '../../core/references.js';
import type { InterfaceType } from '../../core/surfactant.js';
import type { Verdict } from '../../core/values.js';
import type { FlowResult } from '../flow/flow.js';
import { evaluateHeat, type HeatInput, type HeatMethod, type HeatResult } from '../heat/heat.js';
import { evaluateRetention, type RetentionResult } from '../retention/retention.js';
import { dragChange, type DragChange } from '../slip/drag.js';
import type { SlipMethod, SlipResult } from '../slip/slip.js';
import { evaluateSurfactant, type SurfactantResult } from '../surfactant/surfactant.js';
import type { WaveRegime } from '../waves/criteria.js';
import type { WavesResult } from '../waves/result.js';
import { evaluateWaves, waveMarginAtDesign, waveRegimeAtDesign, waveRoughnessWarning, wavesVerdict, type WavesInput } from '../waves/waves.js';
import { evaluateWetting, type WettingResult } from '../wetting/wetting.js';
import type { DesignContext } from './context.js';
import type { Question } from './document.js';

/** One question's answer: the result, its verdict where the question is yes/no, and the notes. */
export interface Answer<R> {
  inputs: Record<string, unknown>;
  result: R;
  verdict?: Verdict;
  warnings: readonly Warning[];
  assumptions: readonly string[];
  references: readonly Reference[];
  models: readonly ModelId[];
}

/** Internal paths of the models' errors, rewritten to paths in the design document. */
const DOCUMENT_PATHS: [RegExp, string][] = [
  [/^scenario\./, ''],
  [/^gravity\.inclination$/, 'orientation.inclination'],
  [/^gravity\.facing$/, 'orientation.facing'],
  [/^inclination\.angle$/, 'orientation.inclination'],
  [/^(grooveLength|segmentLength|grooveWidth|grooveDepth)$/, 'texture.$1'],
  [/^(duration|initialFill|targetFill|method)$/, 'options.$1'],
  [/^sensitivity\./, 'options.sensitivity.'],
  [/^solubility\..*$/, 'lubricant.solubility'],
  [/^bulkConcentration$/, 'waterQuality.bulkConcentration'],
  [/^temperature$/, 'workingFluid.temperature'],
];

function documentPath(field: string): string {
  for (const [pattern, replacement] of DOCUMENT_PATHS) if (pattern.test(field)) return field.replace(pattern, replacement);
  return field;
}

/** Runs a question, gathers its notes with the context's, and names failures by their document path. */
function answer<R>(ctx: DesignContext, own: Notes, compute: () => { result: R; verdict?: Verdict }): Answer<R> {
  let out: { result: R; verdict?: Verdict };
  try {
    out = compute();
  } catch (error) {
    if (error instanceof DomainError && !(error instanceof MissingInputError) && error.field !== undefined) {
      error.field = documentPath(error.field);
    }
    throw error;
  }
  const notes = new Notes().merge(ctx.notes).merge(own);
  return {
    inputs: ctx.inputs(),
    result: out.result,
    ...(out.verdict === undefined ? {} : { verdict: out.verdict }),
    warnings: notes.warnings,
    assumptions: notes.assumptions,
    references: notes.references,
    models: notes.models,
  };
}

/** Lifts a verdict a model returns inside its result out into the answer. */
function lift<R extends { verdict: Verdict }>(result: R): { result: Omit<R, 'verdict'>; verdict: Verdict } {
  const { verdict, ...rest } = result;
  return { result: rest, verdict };
}

/** POST /v1/flow: wall shear stress, friction velocity and viscous length of the flow (texture in wall units when given). */
export function flowConditions(ctx: DesignContext): Answer<FlowResult> {
  return answer(ctx, new Notes(), () => ({ result: ctx.flow('flow') }));
}

/** POST /v1/wetting: is the lubricant-in-texture state stable under the working fluid? */
export function wettingState(ctx: DesignContext): Answer<Omit<WettingResult, 'verdict'>> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const wetting = wettingOf(ctx, 'wetting', notes, true) as WettingResult;
    return lift(wetting);
  });
}

/** The wetting model on the context's design (once); null when the document has no contact angles and they are optional. */
function wettingOf(ctx: DesignContext, question: Question, notes: Notes, required: boolean): WettingResult | null {
  const angles = ctx.document.contactAngles;
  if (angles === undefined || (angles.underWorkingFluid === undefined && angles.inAir === undefined)) {
    if (required) ctx.need(undefined, 'contactAngles', question);
    return null;
  }
  const out = evaluateWetting({
    texture: ctx.texture(question),
    lubricant: ctx.lubricant(question),
    workingFluid: ctx.workingFluid(question),
    contactAngles: angles,
    ...(ctx.document.interfacialTension === undefined ? {} : { interfacialTension: ctx.document.interfacialTension }),
  });
  notes.merge(out);
  ctx.echo('contactAngles', angles);
  ctx.echo('interfacialTension', out.result.interfacialTension);
  return out.result;
}

/** POST /v1/slip: slip lengths and the drag change, with the wave and wetting checks that can void them. */
export function slipAndDrag(ctx: DesignContext): Answer<SlipResult> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const method = ctx.document.options?.method ?? 'auto';
    const slip = ctx.slip('slip', method);
    notes.merge(slip.notes);
    ctx.echo('options', { method });
    const scenario = ctx.scenario('slip', 'optional');
    if (scenario.interfacialTension !== undefined) {
      // Only the regime at the design point is needed (no curves, limits or map): a fraction of the waves answer's cost.
      const regime = waveRegimeAtDesign({ scenario, slipLengthLongitudinal: slip.result.slipLengthLongitudinal, ...gravityOf(ctx, 'slip') });
      const warning = waveRoughnessWarning(regime);
      if (warning) notes.warn(warning.code, warning.message, warning.severity);
      notes.assume(`Interface wave regime (see waves): ${regime}.`);
    } else {
      notes.warn('wave-regime-unknown', 'No interfacial tension is known for this pair, so the wave regime (which can void the drag reduction) was not checked; give interfacialTension.', 'caution');
    }
    const wetting = wettingOf(ctx, 'slip', new Notes(), false);
    if (wetting?.state === 'not-wetting') {
      notes.warn(
        'lubricant-not-stable',
        'The wetting state is not-wetting: the working liquid displaces the lubricant at equilibrium, so the slip computed for a filled groove holds only while pinning keeps the lubricant in place.',
      );
    }
    return { result: slip.result };
  });
}

/** Gravity of the document's orientation as the waves model takes it, or nothing when the document has none. */
function gravityOf(ctx: DesignContext, question: Question): { gravity?: { inclination: number; facing: 'up' | 'down' | 'vertical' } } {
  const orientation = ctx.document.orientation;
  if (orientation === undefined) return {};
  ctx.echo('orientation', orientation);
  if (orientation.inclination >= 90) return { gravity: { inclination: 90, facing: 'vertical' } };
  const facing = ctx.need(orientation.facing, 'orientation.facing', question);
  return { gravity: { inclination: orientation.inclination, facing } };
}

/** Cells per axis of the wave regime map when it is asked for without a resolution. */
const DEFAULT_MAP_CELLS = 24;

/** Whether the waves answer carries the regime map: only when asked for (map, or a mapResolution). */
export function wavesMapWanted(options: { map?: boolean; mapResolution?: number } | undefined): boolean {
  return options?.map === true || options?.mapResolution !== undefined;
}

/** The waves model's inputs on the context's design: the interface drift from the closed-form slip (as waves). */
function wavesInputOf(ctx: DesignContext, notes: Notes): WavesInput {
  const scenario = ctx.scenario('waves', 'required');
  const slip = ctx.slip('waves', 'closed-form');
  notes.cite(...slip.notes.references);
  notes.assume('Interface drift from the closed-form longitudinal slip length (see slip).');
  return { scenario, slipLengthLongitudinal: slip.result.slipLengthLongitudinal, ...gravityOf(ctx, 'waves') };
}

/**
 * The waves verdict's regime and margin alone, without the growth curve, the design limits or the map:
 * the same inputs and criteria as {@link interfaceWaves}, for an assessment's sensitivity steps.
 */
export function interfaceWaveMargin(ctx: DesignContext): { regime: WaveRegime; margin: number } {
  return waveMarginAtDesign(wavesInputOf(ctx, new Notes()));
}

/**
 * The waves verdict (regime, margin, governing criterion) with the notes of {@link interfaceWaves}, without the
 * growth curve, the design limits and the map, none of which an assessment reads.
 */
export function interfaceWaveVerdict(ctx: DesignContext): Answer<{ regime: WaveRegime; margin: number; governingCriterion: string }> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const waves = wavesVerdict(wavesInputOf(ctx, notes));
    notes.merge(waves);
    return { result: waves.result };
  });
}

/** POST /v1/waves: do capillary waves on the interface stay calm? */
export function interfaceWaves(ctx: DesignContext): Answer<Omit<WavesResult, 'verdict' | 'map'> & { map?: WavesResult['map'] }> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const input = wavesInputOf(ctx, notes);
    const options = ctx.document.options;
    const map = wavesMapWanted(options);
    const waves = evaluateWaves({
      ...input,
      // No map asked for: the smallest one (2 × 2), dropped from the answer.
      mapResolution: map ? (options?.mapResolution ?? DEFAULT_MAP_CELLS) : 2,
    });
    notes.merge(waves);
    if (map) ctx.echo('options', { map, mapResolution: options?.mapResolution ?? DEFAULT_MAP_CELLS });
    const { map: _regimeMap, ...rest } = waves.result;
    return lift(map ? waves.result : rest);
  });
}

/** POST /v1/retention: how much lubricant stays in the grooves, and how fast the rest drains. */
export function lubricantRetention(
  ctx: DesignContext,
  overrides: { method?: SlipMethod; duration?: number; finiteVolumeTimeline?: boolean; unboundSteadyColumn?: boolean; timelinePoints?: number; settledBy?: number } = {},
): Answer<Omit<RetentionResult, 'verdict'>> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const doc = ctx.document;
    const scenario = ctx.scenario('retention', 'required');
    const angles = ctx.need(doc.contactAngles?.underWorkingFluid, 'contactAngles.underWorkingFluid', 'retention');
    const texture = doc.texture;
    if (texture?.grooveLength === undefined && texture?.segmentLength === undefined) ctx.need(undefined, 'texture.grooveLength', 'retention');
    const options = doc.options ?? {};
    const method = overrides.method ?? options.method ?? 'auto';
    const slip = ctx.slip('retention', method);
    notes.cite(...slip.notes.references);
    notes.assume(`Interfacial shear = wall shear × ${slip.result.interfacialShearRatio.toPrecision(4)} from the ${slip.result.method} slip solution.`);
    const wetting = wettingOf(ctx, 'retention', notes, false);
    const orientation = doc.orientation;
    let inclination: { angle: number; direction: 'with-flow' | 'against-flow' } | undefined;
    if (orientation !== undefined && orientation.inclination > 0) {
      ctx.echo('orientation', orientation);
      const downslope = ctx.need(orientation.downslope, 'orientation.downslope', 'retention');
      if (downslope === 'across-grooves') notes.assume('Gravity acts across the grooves: no drive along them.');
      else inclination = { angle: orientation.inclination, direction: downslope };
    }
    const solubility = doc.lubricant?.solubility;
    const effective = { method, duration: overrides.duration ?? options.duration ?? 7200, initialFill: options.initialFill ?? 1, targetFill: options.targetFill ?? 0.9 };
    ctx.echo('options', effective);
    const retention = evaluateRetention({
      scenario,
      contactAngles: { underWorkingFluid: angles },
      grooveEnds: texture?.grooveEnds ?? 'open',
      duration: effective.duration,
      initialFill: effective.initialFill,
      targetFill: effective.targetFill,
      interfacialShearRatio: slip.result.interfacialShearRatio,
      ...(wetting ? { wettingState: wetting.state } : {}),
      ...(texture?.grooveLength === undefined ? {} : { grooveLength: texture.grooveLength }),
      ...(texture?.segmentLength === undefined ? {} : { segmentLength: texture.segmentLength }),
      ...(inclination ? { inclination } : {}),
      ...(solubility === undefined ? {} : { solubility: { value: solubility, unit: 'kg/m3' as const } }),
      ...(overrides.finiteVolumeTimeline === undefined ? {} : { finiteVolumeTimeline: overrides.finiteVolumeTimeline }),
      ...(overrides.unboundSteadyColumn === undefined ? {} : { unboundSteadyColumn: overrides.unboundSteadyColumn }),
      ...(overrides.timelinePoints === undefined ? {} : { timelinePoints: overrides.timelinePoints }),
      ...(overrides.settledBy === undefined ? {} : { settledBy: overrides.settledBy }),
    });
    notes.merge(retention);
    return lift(retention.result);
  });
}

export interface SurfactantAnswer extends SurfactantResult {
  /** Drag change with the reduced slip (the slip model's drag function). */
  drag: DragChange;
  /** Drag change of the clean interface (as slip). */
  cleanDrag: DragChange;
}

/** POST /v1/surfactant: how much of the slip survives the water's surfactant? */
export function surfactantSensitivity(ctx: DesignContext, overrides: { bulkConcentration?: number | number[]; pointsOnly?: boolean } = {}): Answer<SurfactantAnswer> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const doc = ctx.document;
    const water = ctx.need(doc.waterQuality, 'waterQuality', 'surfactant');
    const scenario = ctx.scenario('surfactant', 'optional');
    const options = doc.options ?? {};
    const slip = ctx.slip('surfactant', options.method ?? 'auto');
    notes.cite(...slip.notes.references);
    notes.assume(`Clean slip from the ${slip.result.method} slip solution (as slip).`);
    const grooveContent = options.grooveContent;
    const gasFilled = grooveContent === 'gas' || (grooveContent === undefined && scenario.lubricant.viscosity < 0.05 * scenario.workingFluid.viscosity);
    let interfaceType: InterfaceType = gasFilled ? 'air-water' : 'oil-water';
    const { id } = water.surfactant;
    const catalogued = id === undefined ? undefined : ctx.catalogue.surfactantInterfaces(id);
    const s = water.surfactant;
    const fullParameters = s.maximumSurfaceExcess !== undefined && s.langmuirConstant !== undefined && s.bulkDiffusivity !== undefined && s.gibbsPrefactor !== undefined;
    if (interfaceType === 'oil-water' && catalogued && !catalogued.includes('oil-water') && catalogued.includes('air-water') && !fullParameters) {
      // Adsorption differs between interfaces; without oil–water data the air–water set is the only
      // sourced stand-in, and the user must know that the answer rests on it.
      interfaceType = 'air-water';
      notes.warn(
        'oil-water-constants-missing',
        `The catalogue has no oil–water adsorption data for ${ctx.catalogue.surfactantName(id as string)}; its air–water constants stand in. Adsorption at an oil–water interface differs (often stronger): give the surfactant's parameters measured for your lubricant.`,
        'warning',
      );
    }
    const surfactant = ctx.catalogue.surfactant(water.surfactant, interfaceType, 'waterQuality.surfactant');
    const surfactantMethod = options.surfactantMethod ?? 'auto';
    const bulkConcentration = overrides.bulkConcentration ?? water.bulkConcentration;
    ctx.echo('waterQuality', { surfactant: { id: surfactant.id, name: surfactant.name, interfaceType }, bulkConcentration: water.bulkConcentration });
    ctx.echo('options', { method: options.method ?? 'auto', surfactantMethod });
    const out = evaluateSurfactant({
      scenario,
      surfactant,
      bulkConcentration,
      temperature: scenario.workingFluid.temperature,
      method: surfactantMethod,
      cleanSlip: {
        slipLengthLongitudinal: slip.result.slipLengthLongitudinal,
        slipLengthTransverse: slip.result.slipLengthTransverse,
        localSlipLengthMean: slip.result.localSlipLength.longitudinalMean,
      },
      ...(grooveContent === undefined ? {} : { underlying: grooveContent }),
      ...(doc.texture?.grooveLength === undefined ? {} : { grooveLength: doc.texture.grooveLength }),
      ...(overrides.pointsOnly === true ? { pointsOnly: true } : {}),
    });
    notes.merge(out);
    notes.assume('Drag with surfactant: slip along the flow and spanwise both scaled by the retained fraction, then the slip model’s drag function.');
    const nu = scenario.workingFluid.viscosity / scenario.workingFluid.density;
    const drag = dragChange(scenario, out.result.slipLength, slip.result.slipLengthSpanwise * out.result.slipRetained, nu, notes);
    return { result: { ...out.result, drag, cleanDrag: slip.result.drag } };
  });
}

/** POST /v1/heat: how the surface changes heat transfer against the same wall with its grooves filled by the solid. */
export function heatTransfer(
  ctx: DesignContext,
  overrides: { method?: HeatMethod; slip?: HeatInput['slip']; sensitivity?: { points: number } } = {},
): Answer<HeatResult> {
  const notes = new Notes();
  return answer(ctx, notes, () => {
    const doc = ctx.document;
    const solid = ctx.need(doc.solid, 'solid', 'heat');
    const scenario = ctx.scenario('heat', 'optional');
    for (const fluid of ['lubricant', 'workingFluid'] as const) {
      ctx.fluidProperty(fluid, 'thermalConductivity', 'heat', `the thermal conductivity of the ${fluid === 'lubricant' ? 'lubricant' : 'working fluid'}`);
      ctx.fluidProperty(fluid, 'specificHeat', 'heat', `the specific heat of the ${fluid === 'lubricant' ? 'lubricant' : 'working fluid'}`);
    }
    const options = doc.options ?? {};
    const method = overrides.method ?? options.method ?? 'auto';
    const sensitivity = overrides.sensitivity ?? options.sensitivity;
    // The velocity slip feeds the heat model; the field heat method re-solves it on the cross-section.
    const slip = ctx.slip('heat', method);
    notes.cite(...slip.notes.references);
    const drag = slip.result.drag;
    const heating = { condition: doc.heating?.condition ?? 'uniform-flux', heatedWalls: doc.heating?.heatedWalls ?? 'both' } as const;
    // Closed or barrier-segmented grooves recirculate their lubricant with zero net flux; open grooves let it co-flow.
    const lubricantMotion = doc.texture?.grooveEnds === 'closed' || doc.texture?.segmentLength !== undefined ? 'zero-net-flux' : 'co-flowing';
    ctx.echo('solid', solid);
    ctx.echo('heating', heating);
    ctx.echo('options', { method, ...(sensitivity ? { sensitivity } : {}) });
    notes.assume(`Lubricant motion in the grooves: ${lubricantMotion} (from texture.grooveEnds and texture.segmentLength).`);
    const heat = evaluateHeat({
      scenario,
      solid,
      heating: heating.condition,
      heatedWalls: heating.heatedWalls,
      lubricantMotion,
      method,
      slip: overrides.slip ?? {
        slipLengthLongitudinal: slip.result.slipLengthAlongFlow,
        ...(drag.kind === 'turbulent-fixed-bulk-reynolds' ? { deltaUPlus: drag.deltaUPlus, dragReduction: drag.dragReduction } : {}),
      },
      ...(sensitivity ? { sensitivity } : {}),
    });
    notes.merge(heat);
    return { result: heat.result };
  });
}

/** Every question, by the name the API and the CLI use. */
export const QUESTIONS = {
  flow: flowConditions,
  wetting: wettingState,
  retention: lubricantRetention,
  slip: slipAndDrag,
  waves: interfaceWaves,
  surfactant: surfactantSensitivity,
  heat: heatTransfer,
} satisfies Record<Question, (ctx: DesignContext) => Answer<unknown>>;
