/**
 * Sweeps and the design window, with POST /v1/flow's compute in the same run
 * as the baseline (the figures are ratios that survive a loaded machine):
 *  1. /v1/flow single points in process (runInline: parse, compute, envelope), points/s;
 *  2. a closed-form sweep (flow) in process, inline and over a pool of --threads solver threads, points/s;
 *  3. the assessment-rule evaluation of the design window, designs/s on one core (the assessment's requirements on
 *     the questions: credited drag, retained share at the service time, waves; inline, one thread);
 *  4. a design window over about 10⁴ candidates (105 × 105 lattice, pitch fraction fixed) on the pool, wall time;
 *  5. peak RSS while streaming --rows NDJSON rows of a flow sweep to a sink that honours back-pressure.
 * Run: npx tsx bench/sweep.ts [--threads 2] [--points 20000] [--rows 1000000] [--skip-window] [--skip-rss] [--only-rss]
 */
import { readFileSync } from 'node:fs';
import os from 'node:os';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { Readable } from 'node:stream';
import { runInline } from '../src/api/calculation.js';
import { createSolverPool } from '../src/api/pool.js';
import { flowCalculation } from '../src/api/routes/flow.js';
import { planSweep } from '../src/api/sweep/plan.js';
import { sweepRows } from '../src/api/sweep/run.js';
import { ndjsonChunks } from '../src/api/sweep/stream.js';
import { computeSafely } from '../src/api/worker.js';
import { planWindow, runWindow } from '../src/api/window/run.js';
import { catalogue } from '../src/materials/lookup.js';
import { evaluateCandidates } from '../src/physics/design/window.js';

const arg = (name: string, fallback: number) => {
  const at = process.argv.indexOf(`--${name}`);
  return at > 0 ? Number(process.argv[at + 1]) : fallback;
};
const threads = arg('threads', 2);
const points = arg('points', 20_000);
const rows = arg('rows', 1_000_000);

const flowDesign = { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' }, texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' } };
const flowSweep = (n: number) => ({ calculation: 'flow', design: flowDesign, axes: [{ path: 'flow.bulkVelocity', range: { from: '0.01 m/s', to: '5 m/s', points: n } }] });
/** The README's worked window (examples/design-window.json) on a lattice of the size asked for. */
const demoWindow = JSON.parse(readFileSync(new URL('../examples/design-window.json', import.meta.url), 'utf8')) as { search: Record<string, unknown> };
const windowRequest = (coarsePoints: number, refinements: number) => ({ ...demoWindow, search: { ...demoWindow.search, coarsePoints, refinements } });

function pool(n: number) {
  return createSolverPool({ threads: n, maxQueued: 64, queueTimeoutMs: 3_600_000, solveTimeoutMs: 600_000, workerMemoryMb: 512, inline: computeSafely });
}

async function sweepRate(n: number, p: ReturnType<typeof pool>, concurrency: number): Promise<number> {
  const body = flowSweep(n);
  const plan = planSweep(body);
  const start = performance.now();
  let count = 0;
  for await (const batch of sweepRows(plan, body, p, { concurrency, pointTimeoutMs: 20_000 })) count += batch.length;
  if (count !== n) throw new Error(`sweep gave ${count} rows, expected ${n}`);
  return n / ((performance.now() - start) / 1000);
}

function flowRate(n: number): number {
  const start = performance.now();
  for (let i = 0; i < n; i++) runInline(flowCalculation, { ...flowDesign, flow: { ...flowDesign.flow, bulkVelocity: 0.01 + (5 * i) / n } });
  return n / ((performance.now() - start) / 1000);
}

const fmt = (x: number) => Math.round(x).toLocaleString('en-US');
console.log(`bench/sweep.ts — ${os.cpus().length} cores ${os.cpus()[0]?.model.trim()}, Node ${process.version}, load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, threads ${threads}`);

const only = process.argv.includes('--only-rss');
let b = Number.NaN;
// 1 and 2: alternate baseline and sweep, three rounds, medians.
const inline = pool(0);
const threaded = pool(only ? 0 : threads);
await threaded.ready();
if (!only) {
flowRate(2000);
await sweepRate(2000, inline, 2);
await sweepRate(2000, threaded, 2 * threads);
const base: number[] = [];
const sweepInline: number[] = [];
const sweepPool: number[] = [];
for (let round = 0; round < 3; round++) {
  base.push(flowRate(Math.min(points, 20_000)));
  sweepInline.push(await sweepRate(points, inline, 2));
  sweepPool.push(await sweepRate(points, threaded, 2 * threads));
}
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
b = median(base);
console.log(`/v1/flow compute in process (parse, compute, envelope): ${fmt(b)} points/s`);
console.log(`flow sweep, inline (one thread): ${fmt(median(sweepInline))} points/s = ${(median(sweepInline) / b).toFixed(2)} × /v1/flow`);
console.log(`flow sweep, pool of ${threads} threads: ${fmt(median(sweepPool))} points/s = ${(median(sweepPool) / b).toFixed(2)} × /v1/flow`);
}

// 3: the window's assessment-rule evaluation on one core.
if (!only) {
  const plan = planWindow(windowRequest(5, 0));
  const candidates = Array.from({ length: 60 }, (_, i) => ({ grooveWidth: 5e-6 * 60 ** (i / 59), pitch: 2 * 5e-6 * 60 ** (i / 59), grooveDepth: 2e-6 * 100 ** (((i * 7) % 60) / 59) }));
  evaluateCandidates(plan.spec.document, plan.spec.requirements, catalogue, candidates.slice(0, 5));
  const start = performance.now();
  evaluateCandidates(plan.spec.document, plan.spec.requirements, catalogue, candidates);
  const perSecond = candidates.length / ((performance.now() - start) / 1000);
  console.log(`assessment-rule evaluation (slip, waves, retention timeline), one core: ${perSecond.toFixed(1)} designs/s = 1/${fmt(b / perSecond)} of /v1/flow`);
}

// 4: design window over ~10⁴ candidates on the pool.
if (!only && !process.argv.includes('--skip-window')) {
  const request = windowRequest(14, 3);
  const plan = planWindow(request);
  const start = performance.now();
  const w = await runWindow(plan, request, threaded, threads);
  const seconds = (performance.now() - start) / 1000;
  console.log(`design window: ${w.candidates} candidates, ${w.evaluated} evaluated (${((100 * w.evaluated) / w.candidates).toFixed(1)} %), ${w.feasibleCandidates} feasible, ${seconds.toFixed(1)} s on ${threads} threads`);
}
await threaded.close();

// 5: peak RSS while streaming NDJSON rows.
if (!process.argv.includes('--skip-rss')) {
  const body = flowSweep(rows);
  const plan = planSweep(body);
  const streamPool = pool(threads);
  await streamPool.ready();
  let written = 0;
  let peak = 0;
  const marks: string[] = [];
  const sampler = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 50);
  const sink = new Writable({
    highWaterMark: 1 << 16,
    write(chunk: Buffer, _encoding, done) {
      const before = written;
      written += chunk.toString().split('\n').length - 1;
      for (const m of [1e4, 1e5, 2e5, 5e5, 1e6]) {
        if (before < m && written >= m) {
          // Under --expose-gc the heap figure is what is live, not what awaits collection.
          (globalThis as { gc?: () => void }).gc?.();
          const use = process.memoryUsage();
          marks.push(`${m.toExponential(0)} rows: RSS ${(use.rss / 2 ** 20).toFixed(0)} MB, main heap ${(use.heapUsed / 2 ** 20).toFixed(0)} MB`);
        }
      }
      done();
    },
  });
  const start = performance.now();
  const rssStart = process.memoryUsage().rss;
  await pipeline(Readable.from(ndjsonChunks(plan, sweepRows(plan, body, streamPool, { concurrency: 2 * threads, pointTimeoutMs: 20_000 }), { progress: true })), sink);
  clearInterval(sampler);
  await streamPool.close();
  console.log(
    `NDJSON stream of ${fmt(rows)} rows: ${((performance.now() - start) / 1000).toFixed(1)} s, RSS at start ${(rssStart / 2 ** 20).toFixed(0)} MB, peak ${(peak / 2 ** 20).toFixed(0)} MB; ${marks.join(', ')}`,
  );
}
