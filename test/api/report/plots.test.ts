/**
 * The plot builders: each returns a standalone SVG whose data marks sit where
 * the data say. Expected positions follow from the definition of the axis
 * scales (a log scale maps x to W·ln(x/x₀)/ln(x₁/x₀); a linear one to
 * W·(x − x₀)/(x₁ − x₀); SVG y grows downwards), on inputs chosen so that
 * the domain ends are known exactly.
 */
import { describe, expect, it } from 'vitest';
import {
  designWindowGridCells,
  plotDesignWindow,
  plotHeat,
  plotServiceTime,
  plotSurfactant,
  plotWaveMap,
  renderPlot,
  scopeSvgIds,
} from '../../../src/api/report/index.js';
import { cellEdges, interpolateOnLogAxis, logTickValues, timeUnit } from '../../../src/api/report/plot-data.js';
import { COLOURS, PLOT_HEIGHT, PLOT_WIDTH } from '../../../src/api/report/render.js';
import { SMALL_WAVE_MAP } from './sample.js';
import { fill, markItems, translation } from './svg.js';

/** Renders and insists the library reported no flaw in the specification. */
async function rendered<I>(plot: (input: I, options?: { warnings?: string[] }) => Promise<string>, input: I): Promise<string> {
  const warnings: string[] = [];
  const svg = await plot(input, { warnings });
  expect(warnings).toEqual([]);
  expect(svg.startsWith('<svg')).toBe(true);
  expect(svg).not.toMatch(/NaN|Infinity/);
  return svg;
}

describe('plot data helpers', () => {
  it('log cells: edges at geometric midpoints, the outer ones mirrored (centres 1, 10, 100 → 10^-0.5 … 10^2.5)', () => {
    const edges = cellEdges([1, 10, 100], true);
    [-0.5, 0.5, 1.5, 2.5].forEach((e, i) => expect(edges[i]).toBeCloseTo(10 ** e, 12));
  });
  it('linear cells: edges at arithmetic midpoints (centres 0, 1, 3 → −0.5, 0.5, 2, 4)', () => {
    expect(cellEdges([0, 1, 3], false)).toEqual([-0.5, 0.5, 2, 4]);
    expect(() => cellEdges([1, 1], false)).toThrow(/increase/);
  });
  it('log ticks: 1-2-5 within three decades, whole decades beyond', () => {
    expect(logTickValues(0.1, 10)).toEqual([0.1, 0.2, 0.5, 1, 2, 5, 10]);
    expect(logTickValues(1e-6, 1e-2)).toEqual([1e-6, 1e-5, 1e-4, 1e-3, 1e-2]);
    expect(logTickValues(0, 1)).toEqual([]);
  });
  it('interpolation on a log axis: at the geometric mean of two abscissae the value is the mean of theirs', () => {
    expect(interpolateOnLogAxis([1e-4, 1e-2], [0.6, 0.2], 1e-3)).toBeCloseTo(0.4, 12);
    expect(interpolateOnLogAxis([1e-4, 1e-2], [0.6, 0.2], 1)).toBeNull();
  });
  it('time axis unit: seconds, minutes, hours or days by the largest time', () => {
    expect(timeUnit(100).symbol).toBe('s');
    expect(timeUnit(1800).symbol).toBe('min');
    expect(timeUnit(7200)).toEqual({ factor: 1 / 3600, symbol: 'h' });
    expect(timeUnit(3 * 86_400).symbol).toBe('d');
  });
});

describe('(a) retained fraction and drag reduction over the service time', () => {
  it('two panels, one line each, every drawable point a symbol; NaN, Infinity and null are left out', async () => {
    const svg = await rendered(plotServiceTime, {
      time: [0, 1800, Number.NaN, 5400, 7200],
      retainedFraction: [1, 0.8, 0.7, 0.6, Number.POSITIVE_INFINITY],
      dragReduction: [0.1, null, 0.07, 0.06, 0.05],
      requirements: { minRetainedFraction: 0.5, minDragReduction: 0.02, serviceTime: 3600 },
    });
    expect(markItems(svg, 'line').map((g) => g.length)).toEqual([1, 1]);
    // Retained: times 0, 1800, 5400 (NaN time and infinite value dropped); drag: 0, 5400, 7200.
    expect(markItems(svg, 'symbol').map((g) => g.length)).toEqual([3, 3]);
    expect(svg).toContain('service time (h)');
    expect(svg).toContain('required ≥ 50 %');
  });
  it('lengths that do not pair up are a programming error', async () => {
    await expect(plotServiceTime({ time: [0, 1], retainedFraction: [1], dragReduction: [0, 0] })).rejects.toThrow(/retainedFraction/);
  });
});

describe('(b) wave regime map', () => {
  const input = SMALL_WAVE_MAP;
  it('one cell per grid point, coloured by its regime', async () => {
    const svg = await rendered(plotWaveMap, input);
    const [cells] = markItems(svg, 'rect');
    expect(cells).toHaveLength(9);
    const count = (colour: string) => cells.filter((c) => fill(c) === colour).length;
    expect([count(COLOURS.calm), count(COLOURS.marginal), count(COLOURS.wavy)]).toEqual([3, 3, 3]);
  });
  it('the design point sits at its log-scale position: domain 10^-0.5…10^2.5 on both axes, so We_τ = 10 → x = W/2 and w⁺ = 1 → y = H·(1 − 1/6)', async () => {
    const svg = await rendered(plotWaveMap, input);
    const [marker] = markItems(svg, 'symbol');
    const [x, y] = translation(marker[0]);
    expect(x).toBeCloseTo(PLOT_WIDTH / 2, 6);
    expect(y).toBeCloseTo(PLOT_HEIGHT * (1 - 0.5 / 3), 6);
    expect(svg).toContain('this design');
  });
  it('the boundary line is drawn through the columns that have one', async () => {
    const svg = await rendered(plotWaveMap, input);
    expect(markItems(svg, 'line')).toHaveLength(1);
    expect(svg).toContain('calm–wavy boundary');
  });
  it('a ragged grid is a programming error', async () => {
    await expect(plotWaveMap({ ...input, regimes: input.regimes.slice(0, 2) })).rejects.toThrow(/rows/);
  });
});

describe('(c) slip kept against surfactant concentration', () => {
  const curve = { bulkConcentration: [1e-6, 1e-4, 1e-2], slipRetained: [1, 0.6, 0.2] };
  it('the stated concentration is marked on the curve: 1e-3 mM on decades 1e-6…1e-2 → x = 3W/4, kept 40 % (log interpolation) → y = 0.6 H', async () => {
    const svg = await rendered(plotSurfactant, { ...curve, statedConcentration: 1e-3 });
    const symbols = markItems(svg, 'symbol');
    const marker = symbols[symbols.length - 1];
    expect(marker).toHaveLength(1);
    const [x, y] = translation(marker[0]);
    expect(x).toBeCloseTo(PLOT_WIDTH * 0.75, 6);
    expect(y).toBeCloseTo(PLOT_HEIGHT * 0.6, 6);
    expect(svg).toContain('stated: 40 % kept');
  });
  it('a zero concentration cannot sit on a log axis: no marker, and the subtitle says so', async () => {
    const svg = await rendered(plotSurfactant, { ...curve, statedConcentration: 0 });
    expect(markItems(svg, 'symbol')).toHaveLength(1);
    expect(svg).toContain('not on a log axis');
  });
});

describe('(d) heat-transfer change against lubricant conductivity', () => {
  it('both series drawn with a legend; the design marked at its log position (0.1 on decades 0.01…10 → x = W/3)', async () => {
    const svg = await rendered(plotHeat, {
      lubricantConductivity: [0.01, 0.1, 1, 10],
      nusseltRatio: [0.9, 1, 1.2, 1.5],
      heatFluxRatio: [0.95, 1, 1.1, 1.2],
      designConductivity: 0.1,
      solidConductivity: 1,
    });
    expect(markItems(svg, 'line').map((g) => g.length)).toEqual([1, 1]);
    expect(svg).toContain('Nu / Nu smooth');
    expect(svg).toContain('heat delivered q/q₀');
    const symbols = markItems(svg, 'symbol');
    const [x] = translation(symbols[symbols.length - 1][0]);
    expect(x).toBeCloseTo(PLOT_WIDTH / 3, 6);
  });
});

describe('(e) design window', () => {
  const widths = [10e-6, 20e-6, 30e-6];
  const depths = [10e-6, 20e-6];
  const limiting = [
    ['lubricant retained', null, null],
    ['lubricant retained', null, 'waves calm'],
  ];
  it('one cell per design, feasible ones in the feasible colour, each limiting requirement in the legend', async () => {
    const svg = await rendered(plotDesignWindow, { cells: designWindowGridCells(widths, depths, limiting), best: { grooveWidth: 20e-6, grooveDepth: 15e-6 } });
    const [cells] = markItems(svg, 'rect');
    expect(cells).toHaveLength(6);
    expect(cells.filter((c) => fill(c) === COLOURS.feasible)).toHaveLength(3);
    expect(svg).toContain('lubricant retained');
    expect(svg).toContain('waves calm');
    expect(svg).toContain('groove width (µm)');
  });
  it('the best design sits at its linear position: widths 5…35 µm, depths 5…25 µm → (20, 15) µm at the centre', async () => {
    const svg = await rendered(plotDesignWindow, { cells: designWindowGridCells(widths, depths, limiting), best: { grooveWidth: 20e-6, grooveDepth: 15e-6 } });
    const [x, y] = translation(markItems(svg, 'symbol')[0][0]);
    expect(x).toBeCloseTo(PLOT_WIDTH / 2, 6);
    expect(y).toBeCloseTo(PLOT_HEIGHT / 2, 6);
  });
  it('text from the caller is escaped by the renderer', async () => {
    const svg = await rendered(plotDesignWindow, { cells: designWindowGridCells(widths, depths, limiting), note: '<script>alert(1)</script> & "co"' });
    expect(svg).not.toContain('<script');
    expect(svg).toContain('&lt;script&gt;alert(1)&lt;/script&gt; &amp;');
  });
});

describe('renderer', () => {
  it('makes no network request while drawing (fetch is replaced by a recorder for the duration)', async () => {
    const calls: string[] = [];
    const original = globalThis.fetch;
    globalThis.fetch = (async (resource: unknown) => {
      calls.push(String(resource));
      throw new Error('network use while rendering');
    }) as typeof fetch;
    try {
      await plotSurfactant({ bulkConcentration: [1e-6, 1e-4, 1e-2], slipRetained: [1, 0.6, 0.2], statedConcentration: 1e-3 });
      await plotServiceTime({ time: [0, 60], retainedFraction: [1, 0.9], dragReduction: [0.1, 0.09] });
    } finally {
      globalThis.fetch = original;
    }
    expect(calls).toEqual([]);
  });
  it('refuses a specification that would load data from a URL', async () => {
    await expect(renderPlot({ data: { url: 'https://example.org/data.json' }, mark: 'point' })).rejects.toThrow(/inline/);
  });
  it('is deterministic: the same input gives the same SVG', async () => {
    const input = { bulkConcentration: [1e-6, 1e-4, 1e-2], slipRetained: [1, 0.6, 0.2], statedConcentration: 1e-3 };
    expect(await plotSurfactant(input)).toBe(await plotSurfactant(input));
  });
  it('scopes ids and the references to them', () => {
    const svg = '<svg><defs><clipPath id="clip1"><rect/></clipPath></defs><g clip-path="url(#clip1)"><use href="#clip1"/></g></svg>';
    expect(scopeSvgIds(svg, 'figure-2')).toBe(
      '<svg><defs><clipPath id="figure-2-clip1"><rect/></clipPath></defs><g clip-path="url(#figure-2-clip1)"><use href="#figure-2-clip1"/></g></svg>',
    );
    expect(() => scopeSvgIds(svg, '"><script>')).toThrow(/prefix/);
  });
});
