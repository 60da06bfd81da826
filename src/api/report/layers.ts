/**
 * Vega-Lite layer fragments the plot builders share: a labelled reference line
 * (a requirement, the design's value) and a labelled marker point. Kept as plain
 * objects; `renderPlot` compiles and checks the assembled specification.
 */
import { logExtent, logTickValues } from './plot-data.js';
import { COLOURS } from './render.js';

/** A fragment of a Vega-Lite specification (checked when the whole is compiled). */
export type SpecPart = Record<string, unknown>;

export interface ReferenceLine {
  /** Position on the plot's own axis scale (already in display units). */
  value: number;
  /** Short text drawn beside the line. */
  label: string;
  colour?: string;
  dashed?: boolean;
}

/** A vertical (`axis: 'x'`) or horizontal (`axis: 'y'`) line across the panel, with its label. */
export function referenceLineLayers(axis: 'x' | 'y', line: ReferenceLine, fieldType: 'quantitative' = 'quantitative'): SpecPart[] {
  const colour = line.colour ?? COLOURS.requirement;
  const data = { values: [{ at: line.value, label: line.label }] };
  const position = { [axis]: { field: 'at', type: fieldType } };
  const rule: SpecPart = {
    data,
    mark: { type: 'rule', color: colour, strokeWidth: 1.5, ...(line.dashed === false ? {} : { strokeDash: [6, 4] }) },
    encoding: position,
  };
  const text: SpecPart = {
    data,
    mark:
      axis === 'x'
        ? { type: 'text', color: colour, align: 'left', baseline: 'top', dx: 4, y: 4, fontSize: 11 }
        : { type: 'text', color: colour, align: 'right', baseline: 'bottom', dy: -3, x: 'width', fontSize: 11 },
    encoding: { ...position, text: { field: 'label' } },
  };
  return [rule, text];
}

export interface MarkerPoint {
  x: number;
  y: number;
  label: string;
}

/** The design's point: a filled diamond with a white rim and its label, drawn above everything else. */
export function markerLayers(point: MarkerPoint, x: SpecPart, y: SpecPart): SpecPart[] {
  const data = { values: [point] };
  return [
    {
      data,
      mark: { type: 'point', shape: 'diamond', filled: true, size: 140, color: COLOURS.marker, stroke: 'white', strokeWidth: 1.5, opacity: 1 },
      encoding: { x: { ...x, field: 'x' }, y: { ...y, field: 'y' } },
    },
    {
      data,
      mark: { type: 'text', align: 'left', baseline: 'middle', dx: 9, fontSize: 11, fontWeight: 'bold', color: COLOURS.marker },
      encoding: { x: { ...x, field: 'x' }, y: { ...y, field: 'y' }, text: { field: 'label' } },
    },
  ];
}

/** Axis labels of a log axis: plain decimals from 0.001 to 9999, compact powers of ten (2e-5) outside. */
const LOG_LABEL = "datum.value >= 0.001 && datum.value < 10000 ? format(datum.value, '~r') : replace(format(datum.value, '.0e'), 'e+', 'e')";

/** The whole decades enclosing an extent (at least one decade wide). */
function decadesAround([low, high]: readonly [number, number]): readonly [number, number] {
  const lowExponent = Math.floor(Math.log10(low));
  const highExponent = Math.max(Math.ceil(Math.log10(high)), lowExponent + 1);
  return [Number(`1e${lowExponent}`), Number(`1e${highExponent}`)];
}

/**
 * Position channel on a log scale over whole decades around the drawable
 * values given (the data and every marker on that axis), with ticks to fit;
 * `domain` pins the scale instead.
 */
export function logPosition(title: string, values: readonly (number | null | undefined)[], domain?: readonly [number, number]): SpecPart {
  const extent = logExtent(values);
  const range = domain ?? (extent ? decadesAround(extent) : undefined);
  const ticks = range ? logTickValues(range[0], range[1]) : [];
  return {
    type: 'quantitative',
    title,
    scale: { type: 'log', ...(range ? { domain: range, nice: false } : {}) },
    axis: { labelExpr: LOG_LABEL, ...(ticks.length >= 2 ? { values: ticks } : {}) },
  };
}
