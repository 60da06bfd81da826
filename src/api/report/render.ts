/**
 * Server-side plot rendering: a Vega-Lite specification is compiled to Vega
 * and drawn by Vega's headless string renderer (`View.toSVG()`), which needs
 * no browser, DOM or canvas module. Every plot of the service goes through
 * {@link renderPlot}, so the look (fonts, sizes, colours) is set in one place.
 *
 * Why this library: see DEVELOPERS.md ("Plots and the HTML report").
 */
import type { LoggerInterface } from 'vega';
import type { TopLevelSpec } from 'vega-lite';

/**
 * Generic font families only: the SVG and the page then never ask for a font
 * file, and every viewer falls back to a local sans-serif face.
 */
export const FONT_STACK = 'Helvetica, Arial, sans-serif';

/** Plot area of one panel, CSS px; with axes and legend a plot stays within an A4 text width (≈ 170 mm). */
export const PLOT_WIDTH = 440;
export const PLOT_HEIGHT = 220;

/** Colours with a meaning, defined once and used by every plot and the page. */
export const COLOURS = {
  retained: '#1f5f8b',
  drag: '#b5542a',
  calm: '#cfe6d3',
  marginal: '#f3dc9b',
  wavy: '#eab0a3',
  boundary: '#444444',
  marker: '#000000',
  requirement: '#7a7a7a',
  feasible: '#4f9d69',
} as const;

/**
 * Colours for the requirements that limit a design window, in order: six of
 * the eight colours of M. Okabe & K. Ito, "Color Universal Design (CUD): How
 * to make figures and presentations that are friendly to Colorblind people"
 * (J*Fly web page, 2002, modified 2008, jfly.uni-koeln.de/color/; title,
 * authors and dates read, its RGB table not reached: the hex values are the
 * ones independent implementations of the set agree on), without its black
 * and without its bluish green, so that green stays the colour of
 * "feasible"; the seventh, grey #999999, is our addition, not one of the
 * eight.
 */
export const CATEGORY_COLOURS = ['#E69F00', '#56B4E9', '#D55E00', '#0072B2', '#CC79A7', '#F0E442', '#999999'] as const;

const THEME = {
  font: FONT_STACK,
  background: 'white',
  padding: 8,
  view: { stroke: '#bbbbbb' },
  // No spoken description per data item (hundreds of map cells would each get one, tripling the SVG);
  // axes and titles keep theirs, and the page describes each figure in its caption.
  mark: { aria: false },
  axis: { labelFontSize: 11, titleFontSize: 12, titleFontWeight: 'normal', gridColor: '#e6e6e6', labelColor: '#222222', titleColor: '#222222' },
  legend: { labelFontSize: 11, titleFontSize: 12, titleFontWeight: 'normal', orient: 'bottom', direction: 'horizontal', labelLimit: 260 },
  title: { fontSize: 13, fontWeight: 'bold', anchor: 'start', subtitleFontSize: 11, subtitleColor: '#444444' },
} as const;

export interface RenderOptions {
  /** Receives the library's warnings (each one a flaw in a specification); without it they are dropped, not logged. */
  warnings?: string[];
}

type Libraries = [typeof import('vega'), typeof import('vega-lite')];
let libraries: Promise<Libraries> | undefined;

/**
 * The libraries are imported on first use, not at start-up: a process that
 * never draws does not pay for loading them, and a worker thread started with
 * tsx (tests, `npm run dev`) can load them (their modules use top-level await,
 * which tsx's CommonJS path in a worker cannot require).
 */
function loadLibraries(): Promise<Libraries> {
  libraries ??= Promise.all([import('vega'), import('vega-lite')]);
  return libraries;
}

function collectingLogger(vega: Libraries[0], sink: string[] | undefined): LoggerInterface {
  return vega.logger(vega.Warn, undefined, (_method, _level, args) => {
    sink?.push(args.map(String).join(' '));
  });
}

/**
 * Renders a Vega-Lite specification to a standalone SVG document string.
 * Data must be inline (`data.values` or named `datasets`): a URL in the
 * specification is refused, so rendering never touches the network.
 */
export async function renderPlot(spec: TopLevelSpec, options: RenderOptions = {}): Promise<string> {
  if (hasKey(spec, 'url')) throw new Error('plot specifications must carry their data inline, not by URL');
  const [vega, vegaLite] = await loadLibraries();
  const log = collectingLogger(vega, options.warnings);
  const { spec: vegaSpec } = vegaLite.compile({ ...spec, config: { ...THEME, ...(spec.config ?? {}) } } as TopLevelSpec, { logger: log });
  const view = new vega.View(vega.parse(vegaSpec), { renderer: 'none', logger: log });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

function hasKey(value: unknown, key: string): boolean {
  if (value === null || typeof value !== 'object') return false;
  if (Array.isArray(value)) return value.some((v) => hasKey(v, key));
  return Object.entries(value).some(([k, v]) => k === key || hasKey(v, key));
}

/**
 * Gives every `id` in an SVG document a prefix and rewrites the references to
 * it, so several plots can share one HTML page: the renderer numbers its clip
 * paths per plot, and two inline SVGs with the same id would clip each other.
 */
export function scopeSvgIds(svg: string, prefix: string): string {
  if (!/^[A-Za-z][A-Za-z0-9_-]*$/.test(prefix)) throw new Error(`invalid id prefix: ${prefix}`);
  return svg
    .replace(/\bid="([^"]+)"/g, (_m, id: string) => `id="${prefix}-${id}"`)
    .replace(/url\(#([^)]+)\)/g, (_m, id: string) => `url(#${prefix}-${id})`)
    .replace(/\bhref="#([^"]+)"/g, (_m, id: string) => `href="#${prefix}-${id}"`);
}
