/**
 * Plot (e): the design window, the region of groove width × groove depth
 * where every requirement holds, each infeasible cell coloured by the
 * requirement that limits it, and the best design marked.
 */
import type { TopLevelSpec } from 'vega-lite';
import { logPosition, markerLayers, type SpecPart } from './layers.js';
import { cellEdges, isDrawable, isDrawableOnLog, lengthUnit } from './plot-data.js';
import { CATEGORY_COLOURS, COLOURS, PLOT_HEIGHT, PLOT_WIDTH, renderPlot, type RenderOptions } from './render.js';

/** One evaluated rectangle of the (width, depth) plane. */
export interface DesignWindowCell {
  /** Groove-width range the cell covers, m: [low, high]. */
  grooveWidth: readonly [number, number];
  /** Groove-depth range the cell covers, m: [low, high]. */
  grooveDepth: readonly [number, number];
  /** The requirement that fails first here, or null where every requirement holds. */
  limitingRequirement: string | null;
}

export interface DesignWindowPlotInput {
  cells: readonly DesignWindowCell[];
  /** The best design by the stated objective, m. */
  best?: { grooveWidth: number; grooveDepth: number };
  /** Axis scales (default linear). */
  scale?: 'linear' | 'log';
  /** What is held fixed over the plane (pitch, lubricant, flow), shown under the title. */
  note?: string;
}

export const FEASIBLE_LABEL = 'feasible';

/**
 * Cells of a regular grid: `limiting[i][j]` at (grooveWidths[j], grooveDepths[i]), the
 * cells' edges midway between the centres (geometric midpoints on a log scale).
 */
export function designWindowGridCells(
  grooveWidths: readonly number[],
  grooveDepths: readonly number[],
  limiting: readonly (readonly (string | null)[])[],
  scale: 'linear' | 'log' = 'linear',
): DesignWindowCell[] {
  if (limiting.length !== grooveDepths.length || limiting.some((row) => row.length !== grooveWidths.length)) {
    throw new Error(`limiting must be ${grooveDepths.length} rows of ${grooveWidths.length} columns`);
  }
  const w = cellEdges(grooveWidths, scale === 'log');
  const d = cellEdges(grooveDepths, scale === 'log');
  return limiting.flatMap((row, i) =>
    row.map((limitingRequirement, j) => ({ grooveWidth: [w[j], w[j + 1]] as const, grooveDepth: [d[i], d[i + 1]] as const, limitingRequirement })),
  );
}

/** Vega-Lite specification of plot (e); see {@link plotDesignWindow}. */
export function designWindowSpec(input: DesignWindowPlotInput): TopLevelSpec {
  const log = input.scale === 'log';
  const ok = log ? isDrawableOnLog : isDrawable;
  const drawable = input.cells.filter((c) => [...c.grooveWidth, ...c.grooveDepth].every(ok));
  const largest = drawable.reduce((m, c) => Math.max(m, c.grooveWidth[1], c.grooveDepth[1]), Math.max(input.best?.grooveWidth ?? 0, input.best?.grooveDepth ?? 0));
  const unit = lengthUnit(largest > 0 ? largest : 1e-4);
  const limits = [...new Set(drawable.flatMap((c) => (c.limitingRequirement === null ? [] : [c.limitingRequirement])))];
  const domain = [FEASIBLE_LABEL, ...limits];
  const range = [COLOURS.feasible, ...limits.map((_, i) => CATEGORY_COLOURS[i % CATEGORY_COLOURS.length])];
  const rows = drawable.map((c) => ({
    w0: c.grooveWidth[0] * unit.factor,
    w1: c.grooveWidth[1] * unit.factor,
    d0: c.grooveDepth[0] * unit.factor,
    d1: c.grooveDepth[1] * unit.factor,
    limit: c.limitingRequirement ?? FEASIBLE_LABEL,
  }));
  const position = (title: string, values: number[]): SpecPart =>
    log ? logPosition(title, values) : { type: 'quantitative', title, scale: { zero: false, nice: false } };
  const x = position(`groove width (${unit.symbol})`, rows.flatMap((r) => [r.w0, r.w1]));
  const y = position(`groove depth (${unit.symbol})`, rows.flatMap((r) => [r.d0, r.d1]));
  const layers: SpecPart[] = [
    {
      data: { values: rows },
      mark: { type: 'rect', stroke: 'white', strokeWidth: 0.5, strokeOpacity: 0.6 },
      encoding: {
        x: { ...x, field: 'w0' },
        x2: { field: 'w1' },
        y: { ...y, field: 'd0' },
        y2: { field: 'd1' },
        color: { field: 'limit', type: 'nominal', title: 'limited by', scale: { domain, range }, legend: { columns: 3 } },
      },
    },
  ];
  const best = input.best;
  if (best && ok(best.grooveWidth) && ok(best.grooveDepth)) {
    layers.push(...markerLayers({ x: best.grooveWidth * unit.factor, y: best.grooveDepth * unit.factor, label: 'best' }, x, y));
  }
  return {
    title: { text: 'Design window: groove width and depth', ...(input.note ? { subtitle: input.note } : {}) },
    width: PLOT_WIDTH,
    height: PLOT_HEIGHT,
    layer: layers,
  } as unknown as TopLevelSpec;
}

/** Plot (e) as a standalone SVG document. */
export async function plotDesignWindow(input: DesignWindowPlotInput, options?: RenderOptions): Promise<string> {
  return renderPlot(designWindowSpec(input), options);
}
