/**
 * Plot (b): the wave regime map, calm / marginal / wavy over the friction
 * capillary number We_τ = μ u_τ/γ and the groove width in wall units
 * w⁺ = w u_τ/ν, with the calm–wavy boundary and the design's point.
 */
import type { TopLevelSpec } from 'vega-lite';
import type { WaveRegime } from '../../physics/waves/criteria.js';
import { logPosition, markerLayers, type SpecPart } from './layers.js';
import { cellEdges, isDrawableOnLog } from './plot-data.js';
import { COLOURS, PLOT_HEIGHT, PLOT_WIDTH, renderPlot, type RenderOptions } from './render.js';

export interface WaveMapPlotInput {
  /** Column centres, We_τ (positive, increasing). */
  frictionCapillaryNumbers: readonly number[];
  /** Row centres, w⁺ (positive, increasing). */
  grooveWidthsPlus: readonly number[];
  /** Regime of each cell, indexed [row][column]. */
  regimes: readonly (readonly WaveRegime[])[];
  /** Per column, the w⁺ of the calm–wavy boundary (null where there is none); drawn as a line where given. */
  boundaryGrooveWidthPlus?: readonly (number | null)[];
  /** The design's own point. */
  designPoint: { frictionCapillaryNumber: number; grooveWidthPlus: number };
}

const REGIMES: readonly WaveRegime[] = ['calm', 'marginal', 'wavy'];

/** Vega-Lite specification of plot (b); see {@link plotWaveMap}. */
export function waveMapSpec(input: WaveMapPlotInput): TopLevelSpec {
  const columns = input.frictionCapillaryNumbers;
  const rows = input.grooveWidthsPlus;
  if (input.regimes.length !== rows.length || input.regimes.some((r) => r.length !== columns.length)) {
    throw new Error(`regimes must be ${rows.length} rows of ${columns.length} columns`);
  }
  if (![...columns, ...rows].every(isDrawableOnLog)) throw new Error('map axes must be positive and finite');
  const xEdges = cellEdges(columns, true);
  const yEdges = cellEdges(rows, true);
  const cells = input.regimes.flatMap((row, i) =>
    row.map((regime, j) => ({ x0: xEdges[j], x1: xEdges[j + 1], y0: yEdges[i], y1: yEdges[i + 1], regime })),
  );
  const design = input.designPoint;
  const designDrawable = isDrawableOnLog(design.frictionCapillaryNumber) && isDrawableOnLog(design.grooveWidthPlus);
  const xDomain: [number, number] = [Math.min(xEdges[0], designDrawable ? design.frictionCapillaryNumber : Infinity), Math.max(xEdges[xEdges.length - 1], designDrawable ? design.frictionCapillaryNumber : 0)];
  const yDomain: [number, number] = [Math.min(yEdges[0], designDrawable ? design.grooveWidthPlus : Infinity), Math.max(yEdges[yEdges.length - 1], designDrawable ? design.grooveWidthPlus : 0)];
  const x = logPosition('friction capillary number We_τ = μu_τ/γ', [], xDomain);
  const y = logPosition('groove width in wall units w⁺', [], yDomain);
  const boundary = (input.boundaryGrooveWidthPlus ?? []).flatMap((wPlus, j) =>
    j < columns.length && isDrawableOnLog(wPlus) ? [{ x: columns[j], y: wPlus }] : [],
  );
  const regimeScale = { domain: REGIMES, range: [COLOURS.calm, COLOURS.marginal, COLOURS.wavy] };
  const layers: SpecPart[] = [
    {
      data: { values: cells },
      // Each cell outlined in its own colour: hides the hairline seams a viewer leaves between adjacent rectangles.
      mark: { type: 'rect', strokeWidth: 0.6, clip: true },
      encoding: {
        x: { ...x, field: 'x0' },
        x2: { field: 'x1' },
        y: { ...y, field: 'y0' },
        y2: { field: 'y1' },
        color: {
          field: 'regime',
          type: 'nominal',
          title: 'interface',
          scale: regimeScale,
        },
        stroke: { field: 'regime', type: 'nominal', legend: null, scale: regimeScale },
      },
    },
  ];
  if (boundary.length > 1) {
    layers.push({
      data: { values: boundary },
      mark: { type: 'line', color: COLOURS.boundary, strokeWidth: 1.5, strokeDash: [6, 3], clip: true },
      encoding: { x: { ...x, field: 'x' }, y: { ...y, field: 'y' } },
    });
  }
  if (designDrawable) layers.push(...markerLayers({ x: design.frictionCapillaryNumber, y: design.grooveWidthPlus, label: 'this design' }, x, y));
  const subtitle = [boundary.length > 1 ? 'dashed line: calm–wavy boundary' : '', designDrawable ? '' : 'the design point could not be placed on this map'].filter((s) => s !== '');
  return {
    title: { text: 'Interface wave regime', subtitle: subtitle.join('; ') },
    width: PLOT_WIDTH,
    height: PLOT_HEIGHT,
    layer: layers,
  } as unknown as TopLevelSpec;
}

/** Plot (b) as a standalone SVG document. */
export async function plotWaveMap(input: WaveMapPlotInput, options?: RenderOptions): Promise<string> {
  return renderPlot(waveMapSpec(input), options);
}
