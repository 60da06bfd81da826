/**
 * Plot (a): retained lubricant fraction and drag reduction over the service
 * time, two panels on one shared time axis.
 */
import type { TopLevelSpec } from 'vega-lite';
import { referenceLineLayers, type SpecPart } from './layers.js';
import { isDrawable, requireSameLength, timeUnit } from './plot-data.js';
import { COLOURS, PLOT_HEIGHT, PLOT_WIDTH, renderPlot, type RenderOptions } from './render.js';

export interface ServiceTimePlotInput {
  /** Times since the start of service, s (increasing). */
  time: readonly number[];
  /** Fraction of the groove volume still filled with lubricant at each time, 0–1. */
  retainedFraction: readonly (number | null)[];
  /** Drag reduction against the smooth wall at each time, as a fraction (0.1 = 10 % less drag; negative = more drag); null where none is credited. */
  dragReduction: readonly (number | null)[];
  /** Requirements drawn as dashed lines, where given. */
  requirements?: {
    /** Minimum retained fraction, 0–1. */
    minRetainedFraction?: number;
    /** Minimum drag reduction, fraction. */
    minDragReduction?: number;
    /** Service time the requirements apply at, s. */
    serviceTime?: number;
  };
}

const PANEL_HEIGHT = Math.round(PLOT_HEIGHT * 0.7);
const MAX_POINTS_SHOWN = 40;

/** Vega-Lite specification of plot (a); see {@link plotServiceTime}. */
export function serviceTimeSpec(input: ServiceTimePlotInput): TopLevelSpec {
  requireSameLength('retainedFraction', input.time, input.retainedFraction);
  requireSameLength('dragReduction', input.time, input.dragReduction);
  const times = input.time.filter(isDrawable);
  const unit = timeUnit(Math.max(0, ...times, input.requirements?.serviceTime ?? 0));
  const rows = (values: readonly (number | null)[]) =>
    input.time.flatMap((t, i) => {
      const v = values[i];
      return isDrawable(t) && isDrawable(v) ? [{ t: t * unit.factor, v }] : [];
    });
  const x = { field: 't', type: 'quantitative', title: `service time (${unit.symbol})`, scale: { zero: true } };
  const req = input.requirements ?? {};
  // Sample points are drawn while they can be told apart; a dense timeline reads better as a line.
  const showPoints = input.time.length <= MAX_POINTS_SHOWN;
  const serviceLine = (): SpecPart[] =>
    isDrawable(req.serviceTime) ? referenceLineLayers('x', { value: req.serviceTime * unit.factor, label: 'service time' }) : [];
  const panel = (values: readonly (number | null)[], colour: string, y: SpecPart, extra: SpecPart[]): SpecPart => ({
    width: PLOT_WIDTH,
    height: PANEL_HEIGHT,
    layer: [
      ...extra,
      ...serviceLine(),
      {
        data: { values: rows(values) },
        mark: { type: 'line', color: colour, strokeWidth: 2, ...(showPoints ? { point: { filled: true, size: 18, color: colour } } : {}) },
        encoding: { x, y: { field: 'v', type: 'quantitative', ...y } },
      },
    ],
  });
  const retainedPanel = panel(
    input.retainedFraction,
    COLOURS.retained,
    { title: 'lubricant retained', axis: { format: '.0%' }, scale: { domain: [0, 1] } },
    isDrawable(req.minRetainedFraction) ? referenceLineLayers('y', { value: req.minRetainedFraction, label: `required ≥ ${(req.minRetainedFraction * 100).toFixed(0)} %` }) : [],
  );
  const dragPanel = panel(
    input.dragReduction,
    COLOURS.drag,
    { title: 'drag reduction', axis: { format: '.2~%' }, scale: { zero: true } },
    [
      ...referenceLineLayers('y', { value: 0, label: 'no change', dashed: false, colour: '#999999' }),
      ...(isDrawable(req.minDragReduction) ? referenceLineLayers('y', { value: req.minDragReduction, label: `required ≥ ${(req.minDragReduction * 100).toFixed(0)} %` }) : []),
    ],
  );
  return {
    title: { text: 'Lubricant retained and drag reduction over the service time' },
    vconcat: [retainedPanel, dragPanel],
    resolve: { scale: { x: 'shared' } },
  } as unknown as TopLevelSpec;
}

/** Plot (a) as a standalone SVG document. */
export async function plotServiceTime(input: ServiceTimePlotInput, options?: RenderOptions): Promise<string> {
  return renderPlot(serviceTimeSpec(input), options);
}
