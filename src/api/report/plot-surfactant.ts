/**
 * Plot (c): fraction of the clean slip kept against the bulk surfactant
 * concentration (log axis), with the stated concentration marked.
 */
import type { TopLevelSpec } from 'vega-lite';
import { logPosition, markerLayers, referenceLineLayers, type SpecPart } from './layers.js';
import { interpolateOnLogAxis, isDrawable, isDrawableOnLog, requireSameLength } from './plot-data.js';
import { COLOURS, PLOT_HEIGHT, PLOT_WIDTH, renderPlot, type RenderOptions } from './render.js';

export interface SurfactantPlotInput {
  /** Bulk concentrations, mol/m³ (= mM), increasing. */
  bulkConcentration: readonly number[];
  /** Fraction of the clean slip length kept at each concentration, 0–1. */
  slipRetained: readonly (number | null)[];
  /** The water's stated concentration, mol/m³; marked where positive. */
  statedConcentration?: number;
  /** Slip kept at the stated concentration; interpolated on the curve when omitted. */
  statedSlipRetained?: number;
  /** Highest tolerable concentration (a requirement), mol/m³; dashed line where given. */
  tolerableConcentration?: number;
  /** Critical micelle concentration, mol/m³; dotted line where given. */
  criticalMicelleConcentration?: number;
}

/** Vega-Lite specification of plot (c); see {@link plotSurfactant}. */
export function surfactantSpec(input: SurfactantPlotInput): TopLevelSpec {
  requireSameLength('slipRetained', input.bulkConcentration, input.slipRetained);
  const curve = input.bulkConcentration.flatMap((c, i) => {
    const kept = input.slipRetained[i];
    return isDrawableOnLog(c) && isDrawable(kept) ? [{ c, kept }] : [];
  });
  const x = logPosition('bulk surfactant concentration (mM = mol/m³)', [
    ...curve.map((p) => p.c),
    input.statedConcentration,
    input.tolerableConcentration,
    input.criticalMicelleConcentration,
  ]);
  const top = Math.max(1, ...curve.map((p) => p.kept));
  const y: SpecPart = { type: 'quantitative', title: 'clean slip kept', scale: { domain: [0, top] }, axis: { format: '.0%' } };
  const layers: SpecPart[] = [
    {
      data: { values: curve },
      mark: { type: 'line', color: COLOURS.retained, strokeWidth: 2, point: { filled: true, size: 18, color: COLOURS.retained } },
      encoding: { x: { ...x, field: 'c' }, y: { ...y, field: 'kept' } },
    },
  ];
  if (isDrawableOnLog(input.criticalMicelleConcentration)) {
    layers.push(...referenceLineLayers('x', { value: input.criticalMicelleConcentration, label: 'CMC', colour: COLOURS.boundary }));
  }
  if (isDrawableOnLog(input.tolerableConcentration)) {
    layers.push(...referenceLineLayers('x', { value: input.tolerableConcentration, label: 'tolerable' }));
  }
  const stated = input.statedConcentration;
  let subtitle = '';
  if (isDrawableOnLog(stated)) {
    const kept = isDrawable(input.statedSlipRetained)
      ? input.statedSlipRetained
      : interpolateOnLogAxis(curve.map((p) => p.c), curve.map((p) => p.kept), stated);
    if (kept === null) {
      layers.push(...referenceLineLayers('x', { value: stated, label: 'stated', colour: COLOURS.marker }));
    } else {
      layers.push(...markerLayers({ x: stated, y: kept, label: `stated: ${(kept * 100).toFixed(0)} % kept` }, x, y));
    }
  } else if (stated !== undefined) {
    subtitle = 'stated concentration is zero (clean water): not on a log axis';
  }
  return {
    title: { text: 'Slip kept against surfactant concentration', ...(subtitle ? { subtitle } : {}) },
    width: PLOT_WIDTH,
    height: PLOT_HEIGHT,
    layer: layers,
  } as unknown as TopLevelSpec;
}

/** Plot (c) as a standalone SVG document. */
export async function plotSurfactant(input: SurfactantPlotInput, options?: RenderOptions): Promise<string> {
  return renderPlot(surfactantSpec(input), options);
}
