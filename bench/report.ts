/**
 * Cost of the report's plots and page: one-off cost of loading the plotting
 * libraries, then the median time to render each plot (Vega-Lite compile,
 * Vega parse, dataflow run, SVG string) and the whole page, each against one
 * POST /v1/flow through app.inject in the same run (the baseline the issue's
 * latency goals are counted in). Inputs are the sample from the existing
 * endpoints (test/api/report/sample.ts).
 * Run: npx tsx bench/report.ts [--repeats 15]
 */
import os from 'node:os';
import { buildApp } from '../src/api/app.js';
import { testConfig } from '../src/api/config.js';
import { buildReportPage, plotDesignWindow, plotHeat, plotServiceTime, plotSurfactant, plotWaveMap } from '../src/api/report/index.js';
import { DEMO_DESIGN, sampleInputs, sampleReportPage } from '../test/api/report/sample.js';

const at = process.argv.indexOf('--repeats');
const repeats = at > 0 ? Number(process.argv[at + 1]) : 15;

async function median(run: () => Promise<unknown>): Promise<number> {
  await run(); // warm-up
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    await run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

console.log(`node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, shared machine`);
console.log(`median of ${repeats} runs after one warm-up\n`);

const app = await buildApp(testConfig());
await app.ready();
const inputs = await sampleInputs(app);

let start = performance.now();
await plotSurfactant(inputs.surfactant);
console.log(`first plot in this process (loads vega + vega-lite): ${(performance.now() - start).toFixed(0)} ms`);

const flowPayload = { flow: DEMO_DESIGN.flow, workingFluid: DEMO_DESIGN.workingFluid };
const flow = await median(async () => {
  const res = await app.inject({ method: 'POST', url: '/v1/flow', payload: flowPayload });
  if (res.statusCode !== 200) throw new Error(`/v1/flow ${res.statusCode}: ${res.body}`);
});
console.log(`baseline POST /v1/flow (inject):   ${flow.toFixed(2).padStart(8)} ms\n`);

const plots: [string, () => Promise<string>, string][] = [
  ['(a) service time', () => plotServiceTime(inputs.serviceTime), `${inputs.serviceTime.time.length} times × 2 series`],
  ['(b) wave regime map', () => plotWaveMap(inputs.waveMap), `${inputs.waveMap.grooveWidthsPlus.length}×${inputs.waveMap.frictionCapillaryNumbers.length} cells`],
  ['(c) surfactant curve', () => plotSurfactant(inputs.surfactant), `${inputs.surfactant.bulkConcentration.length} points`],
  ['(d) heat vs conductivity', () => plotHeat(inputs.heat), `${inputs.heat.lubricantConductivity.length} points × 2 series`],
  ['(e) design window', () => plotDesignWindow(inputs.designWindow), `${inputs.designWindow.cells.length} cells`],
];
console.log('plot                          ms/plot   × /v1/flow   SVG kB   data');
for (const [name, run, size] of plots) {
  const ms = await median(run);
  const kb = (await run()).length / 1024;
  console.log(`${name.padEnd(28)}${ms.toFixed(1).padStart(9)}${(ms / flow).toFixed(0).padStart(12)}${kb.toFixed(0).padStart(9)}   ${size}`);
}

start = performance.now();
const { page } = await sampleReportPage(app);
console.log(`\nsample page, 5 plots rendered one after the other + page: ${(performance.now() - start).toFixed(0)} ms (includes the five endpoint calls of the sample)`);
const html = await median(async () => buildReportPage(page));
console.log(`page assembly alone (plots already rendered):   ${html.toFixed(2)} ms, ${(buildReportPage(page).length / 1024).toFixed(0)} kB`);
await app.close();
