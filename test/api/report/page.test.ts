/**
 * The HTML report page: self-contained (nothing to fetch, no script), every
 * caller string escaped, ids unique across the inlined plots, every section
 * present. The page is text, so these checks read the markup; the browser
 * test opens it in a real browser.
 */
import { describe, expect, it } from 'vitest';
import { buildReportPage, formatMargin, plotWaveMap, STANDARD_SAFETY_CAUTION, type ReportPageInput } from '../../../src/api/report/index.js';
import { SMALL_WAVE_MAP } from './sample.js';

const HOSTILE = `<script>alert("x")</script><img src=x onerror=alert(1)> & 'quoted' \u0007`;

const mapInput = SMALL_WAVE_MAP;

async function page(overrides: Partial<ReportPageInput> = {}): Promise<ReportPageInput> {
  const svg = await plotWaveMap(mapInput);
  return {
    title: 'Test design',
    design: [{ label: 'Grooves', value: '30 µm wide' }],
    inputs: { texture: { grooveWidth: 3e-5 } },
    provenance: { service: 'oilskin', version: '0.1.0', inputsHash: 'ab'.repeat(32), generatedAt: '2026-01-01T00:00:00Z', models: ['waves:inertial-capillary-scaling'] },
    overall: { verdict: 'fails', limitingMechanism: 'interface waves' },
    mechanisms: [
      { mechanism: 'interface waves', status: 'fail', verdict: 'wavy', margin: -0.42, requirement: 'calm' },
      { mechanism: 'lubricant retention', status: 'pass', verdict: '80 % retained', margin: 0.6, requirement: 'retained ≥ 50 %' },
    ],
    figures: [
      { svg, caption: 'first map' },
      { svg, caption: 'second map' },
    ],
    assumptions: ['Fully developed flow.'],
    warnings: [
      { code: 'a-note', severity: 'info', message: 'just so you know' },
      { code: 'b-bad', severity: 'warning', message: 'outside the validity range' },
    ],
    references: [{ key: 'philip1972', citation: 'J. R. Philip (1972) ...', doi: '10.1007/BF01593949' }],
    ...overrides,
  };
}

describe('report page', () => {
  it('is one HTML document with every section, the verdict table one row per mechanism, and the standard safety caution', async () => {
    const html = buildReportPage(await page());
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    for (const heading of ['Safety caution', 'Design', 'Verdict by mechanism', 'Plots', 'Assumptions', 'Warnings', 'References', 'Appendix: normalised inputs (SI)']) {
      expect(html).toContain(`<h2>${heading}</h2>`);
    }
    expect(html).toContain('This design fails — limited by interface waves');
    expect(html.match(/<tbody>.*?<\/tbody>/gs)?.find((t) => t.includes('interface waves'))?.match(/<tr>/g)).toHaveLength(2);
    expect(html).toContain(STANDARD_SAFETY_CAUTION);
    expect(html).toContain('ab'.repeat(32));
    expect(html.match(/<figure /g)).toHaveLength(2);
  });

  it('fetches nothing: no script, stylesheet link, image, frame or external url(); a policy in the page forbids loading anything', async () => {
    const html = buildReportPage(await page());
    expect(html).not.toMatch(/<script|<link|<img|<iframe|<object|<embed|@import|\bsrc\s*=/i);
    expect(html).not.toMatch(/url\(\s*["']?(?!#)/i);
    expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'">`);
    // The only links are DOIs a reader may follow; an anchor is not loaded with the page.
    const hrefs = [...html.matchAll(/href="([^"]*)"/g)].map((m) => m[1]);
    expect(hrefs.every((h) => h.startsWith('#') || h.startsWith('https://doi.org/'))).toBe(true);
  });

  it('escapes every caller string (title, design, verdicts, captions, notes, references, inputs) and drops control characters', async () => {
    const html = buildReportPage(
      await page({
        title: HOSTILE,
        design: [{ label: HOSTILE, value: HOSTILE }],
        inputs: { name: HOSTILE },
        overall: { verdict: 'works', limitingMechanism: HOSTILE, summary: HOSTILE },
        mechanisms: [{ mechanism: HOSTILE, status: 'pass', verdict: HOSTILE, margin: 0.1, requirement: HOSTILE }],
        figures: [{ svg: await plotWaveMap(mapInput), caption: HOSTILE }],
        assumptions: [HOSTILE],
        warnings: [{ code: HOSTILE, severity: 'caution', message: HOSTILE }],
        references: [{ key: HOSTILE, citation: HOSTILE, doi: HOSTILE }],
        safetyCaution: HOSTILE,
      }),
    );
    expect(html).not.toMatch(/<script|<img/);
    expect(html.includes('\u0007')).toBe(false);
    expect(html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;&lt;img src=x onerror=alert(1)&gt; &amp; &#39;quoted&#39;');
  });

  it('gives the ids of each inlined plot a figure prefix, so two plots with the same clip-path id stay apart', async () => {
    const input = await page();
    const rawIds = input.figures.map((f) => [...f.svg.matchAll(/\bid="([^"]+)"/g)].map((m) => m[1]));
    // Without scoping the two plots would share ids (the renderer numbers clip paths per plot).
    expect(rawIds[0].length).toBeGreaterThan(0);
    expect(rawIds[0]).toEqual(rawIds[1]);
    const html = buildReportPage(input);
    const ids = [...html.matchAll(/\bid="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
    const refs = [...html.matchAll(/url\(#([^)]+)\)/g)].map((m) => m[1]);
    expect(refs.length).toBeGreaterThan(0);
    expect(refs.every((r) => ids.includes(r))).toBe(true);
  });

  it('refuses a "plot" that is not plain SVG: script, embedded HTML, an external reference, an event handler', async () => {
    const base = await page();
    for (const svg of [
      '<div>not svg</div>',
      '<svg><script>alert(1)</script></svg>',
      '<svg><foreignObject><p>x</p></foreignObject></svg>',
      '<svg><image href="https://example.org/a.png"/></svg>',
      '<svg><rect fill="url(https://example.org/p.svg#g)"/></svg>',
      '<svg><rect onclick="alert(1)"/></svg>',
    ]) {
      expect(() => buildReportPage({ ...base, figures: [{ svg, caption: 'x' }] }), svg).toThrow(/figure 1/);
    }
  });

  it('lists warnings by severity, most severe first', async () => {
    const html = buildReportPage(await page());
    expect(html.indexOf('b-bad')).toBeLessThan(html.indexOf('a-note'));
  });

  it('is deterministic for the same input', async () => {
    const input = await page();
    expect(buildReportPage(input)).toBe(buildReportPage(input));
  });
});

describe('margin text', () => {
  it('signed percentage with two significant digits; a true minus sign; a dash where there is no margin', () => {
    expect(formatMargin(0.25)).toBe('+25 %');
    expect(formatMargin(-0.853)).toBe('−85 %');
    expect(formatMargin(0.0123)).toBe('+1.2 %');
    expect(formatMargin(2.5)).toBe('+250 %');
    expect(formatMargin(0)).toBe('0 %');
    expect(formatMargin(null)).toBe('—');
    expect(formatMargin(Number.NaN)).toBe('—');
  });
});
