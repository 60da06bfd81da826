/**
 * Cost of the report's plots and page: one-off cost of loading the plotting
 * libraries, then the median time to render each plot (Vega-Lite compile,
 * Vega parse, dataflow run, SVG string) and to assemble the page, each run
 * alternately with POST /v1/flow through app.inject (the baseline the issue's
 * latency goals are counted in), so the ratio survives a loaded machine. Inputs are the sample from the existing
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

const middle = (times: number[]) => [...times].sort((a, b) => a - b)[Math.floor(times.length / 2)];

async function timed(run: () => Promise<unknown>): Promise<number> {
  const start = performance.now();
  await run();
  return performance.now() - start;
}

/**
 * Medians of a task and of the baseline, run alternately so both see the same
 * load on a shared machine; one warm-up of each first.
 */
async function againstBaseline(run: () => Promise<unknown>, baseline: () => Promise<unknown>): Promise<{ ms: number; baselineMs: number }> {
  await run();
  await baseline();
  const task: number[] = [];
  const base: number[] = [];
  for (let i = 0; i < repeats; i++) {
    base.push(await timed(baseline));
    task.push(await timed(run));
  }
  return { ms: middle(task), baselineMs: middle(base) };
}

console.log(`node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, shared machine`);
console.log(`medians of ${repeats} runs after one warm-up, each plot alternated with POST /v1/flow (app.inject) as the baseline\n`);

const app = await buildApp(testConfig());
await app.ready();
const inputs = await sampleInputs(app);

let start = performance.now();
await plotSurfactant(inputs.surfactant);
console.log(`first plot in this process (loads vega + vega-lite): ${(performance.now() - start).toFixed(0)} ms`);

const flowPayload = { flow: DEMO_DESIGN.flow, workingFluid: DEMO_DESIGN.workingFluid };
const flow = async () => {
  const res = await app.inject({ method: 'POST', url: '/v1/flow', payload: flowPayload });
  if (res.statusCode !== 200) throw new Error(`/v1/flow ${res.statusCode}: ${res.body}`);
};

const plots: [string, () => Promise<string>, string][] = [
  ['(a) service time', () => plotServiceTime(inputs.serviceTime), `${inputs.serviceTime.time.length} times × 2 series`],
  ['(b) wave regime map', () => plotWaveMap(inputs.waveMap), `${inputs.waveMap.grooveWidthsPlus.length}×${inputs.waveMap.frictionCapillaryNumbers.length} cells`],
  ['(c) surfactant curve', () => plotSurfactant(inputs.surfactant), `${inputs.surfactant.bulkConcentration.length} points`],
  ['(d) heat vs conductivity', () => plotHeat(inputs.heat), `${inputs.heat.lubricantConductivity.length} points × 2 series`],
  ['(e) design window', () => plotDesignWindow(inputs.designWindow), `${inputs.designWindow.cells.length} cells`],
];
console.log('plot                          ms/plot   /v1/flow ms   ratio   SVG kB   data');
for (const [name, run, size] of plots) {
  const { ms, baselineMs } = await againstBaseline(run, flow);
  const kb = (await run()).length / 1024;
  console.log(`${name.padEnd(28)}${ms.toFixed(1).padStart(9)}${baselineMs.toFixed(2).padStart(14)}${(ms / baselineMs).toFixed(0).padStart(8)}${kb.toFixed(0).padStart(9)}   ${size}`);
}

start = performance.now();
const { page } = await sampleReportPage(app);
console.log(`\nsample page, 5 plots rendered one after the other + page: ${(performance.now() - start).toFixed(0)} ms (includes the five endpoint calls of the sample)`);
const assembly = await againstBaseline(async () => buildReportPage(page), flow);
console.log(`page assembly alone (plots already rendered): ${assembly.ms.toFixed(2)} ms (/v1/flow ${assembly.baselineMs.toFixed(2)} ms), ${(buildReportPage(page).length / 1024).toFixed(0)} kB`);
await app.close();
