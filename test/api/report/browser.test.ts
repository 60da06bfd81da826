/**
 * The report in a real browser: headless Chromium (Debian's package, driven by
 * playwright-core with the installed executable) opens a report built from
 * the sample data as a saved file, as a lab would. Every plot must be drawn
 * (an SVG whose data marks have a size), nothing may be requested besides the
 * file itself, the console must stay free of errors (a blocked fetch or a
 * policy violation would show there), and the page must fit an A4 text width
 * in print layout. A screenshot and a PDF print go to .ci/artefacts/. The
 * assessment's own report (POST /v1/assess, Accept: text/html) gets the same
 * checks and its screenshot (.ci/artefacts/assess-report-screenshot.png).
 *
 * Without a browser the test skips and says why; `.ci/run` installs one.
 */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { FastifyInstance } from 'fastify';
import { chromium } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp } from '../helpers.js';
import { sampleReportPage } from './sample.js';

const CHROMIUM = process.env.OILSKIN_CHROMIUM ?? '/usr/bin/chromium';
const ARTEFACTS = fileURLToPath(new URL('../../../.ci/artefacts/', import.meta.url));
const LAUNCH_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
/** A4 width less 14 mm margins each side (the page's @page rule), in CSS px at 96 px/in. */
const A4_TEXT_WIDTH_PX = Math.floor(((210 - 2 * 14) / 25.4) * 96);

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

interface FigureState {
  caption: string;
  hasSvg: boolean;
  dataMarks: number;
  drawnDataMarks: number;
  width: number;
  height: number;
}

const skipWithoutBrowser = (context: { skip(note?: string): void }) => {
  if (!existsSync(CHROMIUM)) {
    const why = `no browser at ${CHROMIUM} (install Debian's chromium: apt-get install -y chromium, or set OILSKIN_CHROMIUM): the real-browser check of the report is skipped`;
    console.warn(`SKIPPED: ${why}`);
    context.skip(why);
  }
};

type Page = Awaited<ReturnType<Awaited<ReturnType<typeof chromium.launchPersistentContext>>['newPage']>>;

/**
 * Opens `html`, saved as .ci/artefacts/<name>.html, in a fresh headless Chromium; records every request and console
 * error, measures each figure's drawn data marks and saves <name>-screenshot.png; then runs `more` on the page.
 */
async function inBrowser(
  html: string,
  name: string,
  more?: (page: Page, seen: { requests: string[]; consoleErrors: string[]; url: string }) => Promise<void>,
): Promise<{ figures: FigureState[]; requests: string[]; consoleErrors: string[]; url: string }> {
  mkdirSync(ARTEFACTS, { recursive: true });
  const reportPath = join(ARTEFACTS, `${name}.html`);
  writeFileSync(reportPath, html);
  const url = pathToFileURL(reportPath).href;
  const userDataDir = mkdtempSync(join(tmpdir(), 'oilskin-chromium-'));
  const browser = await chromium.launchPersistentContext(userDataDir, {
    executablePath: CHROMIUM,
    headless: true,
    args: LAUNCH_FLAGS,
    viewport: { width: 900, height: 1200 },
  });
  try {
    const requests: string[] = [];
    const consoleErrors: string[] = [];
    browser.on('request', (request) => requests.push(request.url()));
    const page = browser.pages()[0] ?? (await browser.newPage());
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(message.text());
    });
    page.on('pageerror', (error) => consoleErrors.push(String(error)));
    await page.goto(url, { waitUntil: 'load' });
    const figures: FigureState[] = await page.$$eval('figure[data-plot]', (elements) =>
      elements.map((figure) => {
        const svg = figure.querySelector('svg');
        const marks = svg ? Array.from(svg.querySelectorAll('g.role-mark > path, g.role-mark > text')) : [];
        const drawn = marks.filter((m) => {
          // The page's own SVG API (the test compiles without DOM types).
          const box = (m as unknown as { getBBox(): { width: number; height: number } }).getBBox();
          return box.width > 0 || box.height > 0;
        });
        const box = svg?.getBoundingClientRect();
        return {
          caption: figure.querySelector('figcaption')?.textContent ?? '',
          hasSvg: svg !== null,
          dataMarks: marks.length,
          drawnDataMarks: drawn.length,
          width: box?.width ?? 0,
          height: box?.height ?? 0,
        };
      }),
    );
    await page.screenshot({ path: join(ARTEFACTS, `${name}-screenshot.png`), fullPage: true });
    await more?.(page, { requests, consoleErrors, url });
    return { figures, requests, consoleErrors, url };
  } finally {
    await browser.close();
    rmSync(userDataDir, { recursive: true, force: true });
  }
}

function expectEveryPlotDrawn(figures: readonly FigureState[], count: number): void {
  expect(figures).toHaveLength(count);
  for (const f of figures) {
    expect(f.hasSvg, f.caption).toBe(true);
    expect(f.dataMarks, f.caption).toBeGreaterThan(0);
    expect(f.drawnDataMarks, f.caption).toBe(f.dataMarks);
    expect(f.width, f.caption).toBeGreaterThan(200);
    expect(f.height, f.caption).toBeGreaterThan(100);
  }
}

describe('HTML report in headless Chromium', () => {
  it('draws every plot, requests nothing but its own file, logs no console error and fits A4 in print', async (context) => {
    skipWithoutBrowser(context);
    const { html, page: pageInput } = await sampleReportPage(app);
    const seen = await inBrowser(html, 'report-sample', async (page, { requests, consoleErrors, url }) => {
      // Print layout on an A4 text width: nothing wider than the paper.
      await page.emulateMedia({ media: 'print' });
      await page.setViewportSize({ width: A4_TEXT_WIDTH_PX, height: 1000 });
      const overflow = await page.evaluate(() => {
        const root = (globalThis as unknown as { document: { documentElement: { scrollWidth: number; clientWidth: number } } }).document.documentElement;
        return root.scrollWidth - root.clientWidth;
      });
      expect(overflow).toBeLessThanOrEqual(0);
      const pdfPath = join(ARTEFACTS, 'report-print.pdf');
      await page.pdf({ path: pdfPath, format: 'A4', printBackground: true });
      expect(statSync(pdfPath).size).toBeGreaterThan(10_000);
      expect(requests).toEqual([url]);
      expect(consoleErrors).toEqual([]);
    });
    expectEveryPlotDrawn(seen.figures, pageInput.figures.length);
    expect(seen.requests).toEqual([seen.url]);
    expect(seen.consoleErrors).toEqual([]);
  });

  it('the assessment report of POST /v1/assess (Accept: text/html): the four plots drawn, no request, no console error', async (context) => {
    skipWithoutBrowser(context);
    const design = JSON.parse(readFileSync(fileURLToPath(new URL('../../../examples/assess-demo.json', import.meta.url)), 'utf8'));
    const res = await app.inject({ method: 'POST', url: '/v1/assess', payload: { ...design, options: { ...design.options, marginSensitivities: { enabled: false } } }, headers: { accept: 'text/html' } });
    expect(res.statusCode, res.body).toBe(200);
    const seen = await inBrowser(res.body, 'assess-report');
    expectEveryPlotDrawn(seen.figures, 4);
    expect(seen.requests).toEqual([seen.url]);
    expect(seen.consoleErrors).toEqual([]);
  }, 120_000);
});
