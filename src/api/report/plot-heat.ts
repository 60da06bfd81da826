/**
 * Plot (d): change of heat transfer against the smooth (solid-filled) wall
 * over the lubricant's thermal conductivity, with the design's value marked.
 */
import type { TopLevelSpec } from 'vega-lite';
import { logPosition, markerLayers, referenceLineLayers, type SpecPart } from './layers.js';
import { interpolateOnLogAxis, isDrawable, isDrawableOnLog, requireSameLength } from './plot-data.js';
import { COLOURS, PLOT_HEIGHT, PLOT_WIDTH, renderPlot, type RenderOptions } from './render.js';

export interface HeatPlotInput {
  /** Lubricant thermal conductivities, W/(m·K), increasing. */
  lubricantConductivity: readonly number[];
  /** Nu/Nu_smooth at each conductivity (1 = no change); null where undefined. */
  nusseltRatio: readonly (number | null)[];
  /** q/q₀: heat delivered at the same temperature difference over that of the solid-filled wall, where known. */
  heatFluxRatio?: readonly (number | null)[];
  /** The design's lubricant conductivity, W/(m·K). */
  designConductivity?: number;
  /** The solid's conductivity, W/(m·K); dotted line where given. */
  solidConductivity?: number;
  /** Minimum heat-transfer ratio (a requirement); dashed line where given. */
  minNusseltRatio?: number;
}

const SERIES = { nusselt: 'Nu / Nu smooth', overall: 'heat delivered q/q₀' } as const;

/** Vega-Lite specification of plot (d); see {@link plotHeat}. */
export function heatSpec(input: HeatPlotInput): TopLevelSpec {
  const k = input.lubricantConductivity;
  requireSameLength('nusseltRatio', k, input.nusseltRatio);
  if (input.heatFluxRatio) requireSameLength('heatFluxRatio', k, input.heatFluxRatio);
  const series = (name: string, ratios: readonly (number | null)[]) =>
    k.flatMap((conductivity, i) => {
      const r = ratios[i];
      return isDrawableOnLog(conductivity) && isDrawable(r) ? [{ k: conductivity, change: r - 1, series: name }] : [];
    });
  const rows = [...series(SERIES.nusselt, input.nusseltRatio), ...(input.heatFluxRatio ? series(SERIES.overall, input.heatFluxRatio) : [])];
  const x = logPosition('lubricant thermal conductivity (W/(m·K))', [...rows.map((r) => r.k), input.designConductivity, input.solidConductivity]);
  const y: SpecPart = { type: 'quantitative', title: 'heat transfer change', axis: { format: '+.2~%' }, scale: { zero: true } };
  const names = input.heatFluxRatio ? [SERIES.nusselt, SERIES.overall] : [SERIES.nusselt];
  const layers: SpecPart[] = [
    ...referenceLineLayers('y', { value: 0, label: 'no change', dashed: false, colour: '#999999' }),
    {
      data: { values: rows },
      mark: { type: 'line', strokeWidth: 2, point: { filled: true, size: 18 } },
      encoding: {
        x: { ...x, field: 'k' },
        y: { ...y, field: 'change' },
        color: { field: 'series', type: 'nominal', title: null, scale: { domain: names, range: [COLOURS.drag, COLOURS.retained] } },
      },
    },
  ];
  if (isDrawable(input.minNusseltRatio)) {
    layers.push(...referenceLineLayers('y', { value: input.minNusseltRatio - 1, label: `required ≥ ${((input.minNusseltRatio - 1) * 100).toFixed(0)} %` }));
  }
  if (isDrawableOnLog(input.solidConductivity)) {
    layers.push(...referenceLineLayers('x', { value: input.solidConductivity, label: 'solid', colour: COLOURS.boundary }));
  }
  const design = input.designConductivity;
  if (isDrawableOnLog(design)) {
    const ratio = interpolateOnLogAxis(k, input.nusseltRatio, design);
    if (ratio === null) {
      layers.push(...referenceLineLayers('x', { value: design, label: 'this design', colour: COLOURS.marker }));
    } else {
      layers.push(...markerLayers({ x: design, y: ratio - 1, label: 'this design' }, x, y));
    }
  }
  return {
    title: { text: 'Heat transfer against the lubricant conductivity', subtitle: 'change against the solid-filled, no-slip wall' },
    width: PLOT_WIDTH,
    height: PLOT_HEIGHT,
    layer: layers,
  } as unknown as TopLevelSpec;
}

/** Plot (d) as a standalone SVG document. */
export async function plotHeat(input: HeatPlotInput, options?: RenderOptions): Promise<string> {
  return renderPlot(heatSpec(input), options);
}
