/**
 * Renders docs/assess-report.png, the screenshot of the worked assessment in the README: the report of
 * examples/assess-demo.json (the page `Accept: text/html` returns) opened in headless Chromium (Debian's package,
 * or OILSKIN_CHROMIUM) with playwright-core; the top of the page (verdict, design, verdict table, first plot).
 *   npx tsx docs/assess-screenshot.ts
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { runCliWithReport } from '../src/cli/main.js';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'oilskin-docs-'));
const report = join(work, 'report.html');
const out = await runCliWithReport(['assess', here('../examples/assess-demo.json'), '--html', report], (p) => readFileSync(p, 'utf8'), (p, t) => writeFileSync(p, t));
if (out.code !== 0) throw new Error(out.stderr);
const browser = await chromium.launch({ executablePath: process.env.OILSKIN_CHROMIUM ?? '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
try {
  const page = await browser.newPage({ viewport: { width: 900, height: 1500 } });
  await page.goto(pathToFileURL(report).href, { waitUntil: 'load' });
  await page.screenshot({ path: here('assess-report.png') });
} finally {
  await browser.close();
  rmSync(work, { recursive: true, force: true });
}
console.log('wrote docs/assess-report.png');
