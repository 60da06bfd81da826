/**
 * Sweeps and the design window, with POST /v1/flow's compute in the same run
 * as the baseline (the figures are ratios that survive a loaded machine):
 *  1. /v1/flow single points in process (runInline: parse, compute, envelope), points/s;
 *  2. a closed-form sweep (flow) in process, inline and over a pool of --threads solver threads, points/s;
 *  3. an assessment sweep through the sweep engine (600 designs), designs/s on one thread, and the same designs assessed directly
 *     (what the design window evaluates per candidate): the engine's share of the cost;
 *  Rates are given per second of wall time and per second of the process's CPU time (all threads).
 *  4. a design window over about 10⁴ candidates (105 × 105 lattice, pitch fraction fixed) on the pool, wall time;
 *  5. peak RSS while streaming --rows NDJSON rows of a flow sweep to a sink that honours back-pressure (run it with
 *     the service's heap bound, --max-old-space-size=384 as in `npm start` and the image, for the service's figure).
 * Run: node --expose-gc --max-old-space-size=384 --import tsx bench/sweep.ts [--threads 2] [--points 20000] [--rows 1000000] [--skip-window] [--skip-rss] [--only-rss]
 */
import { readFileSync } from 'node:fs';
import os from 'node:os';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { Readable } from 'node:stream';
import { getHeapStatistics } from 'node:v8';
import { runInline } from '../src/api/calculation.js';
import { createSolverPool } from '../src/api/pool.js';
import { flowCalculation } from '../src/api/routes/flow.js';
import { planSweep } from '../src/api/sweep/plan.js';
import { pointDocument } from '../src/api/sweep/points.js';
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
const demoWindow = JSON.parse(readFileSync(new URL('../examples/design-window.json', import.meta.url), 'utf8')) as { design: Record<string, unknown>; requirements: Record<string, unknown>; search: Record<string, unknown> };
const windowRequest = (coarsePoints: number, refinements: number) => ({ ...demoWindow, search: { ...demoWindow.search, coarsePoints, refinements } });

function pool(n: number) {
  return createSolverPool({ threads: n, maxQueued: 64, queueTimeoutMs: 3_600_000, solveTimeoutMs: 600_000, workerMemoryMb: 512, inline: computeSafely });
}

/** Rates per second of wall time and per second of CPU time of the whole process (every thread): on a shared,
 * loaded machine the second says what the code costs, the first what this run got. */
interface Rate {
  wall: number;
  cpu: number;
}
async function rate(n: number, work: () => unknown): Promise<Rate> {
  const cpu0 = process.cpuUsage();
  const start = performance.now();
  await work();
  const c = process.cpuUsage(cpu0);
  return { wall: n / ((performance.now() - start) / 1000), cpu: n / ((c.user + c.system) / 1e6) };
}

async function sweepRate(body: ReturnType<typeof flowSweep> | Record<string, unknown>, p: ReturnType<typeof pool>, concurrency: number): Promise<Rate> {
  const plan = planSweep(body);
  const n = plan.totalPoints;
  return rate(n, async () => {
    let count = 0;
    for await (const batch of sweepRows(plan, body, p, { concurrency, pointTimeoutMs: 20_000 })) count += batch.length;
    if (count !== n) throw new Error(`sweep gave ${count} rows, expected ${n}`);
  });
}

function flowRate(n: number): Promise<Rate> {
  return rate(n, () => {
    for (let i = 0; i < n; i++) runInline(flowCalculation, { ...flowDesign, flow: { ...flowDesign.flow, bulkVelocity: 0.01 + (5 * i) / n } });
  });
}

const fmt = (x: number) => Math.round(x).toLocaleString('en-US');
const both = (r: Rate, unit: string) => `${fmt(r.wall)} ${unit}/s (${fmt(r.cpu)} per CPU-second)`;
console.log(`bench/sweep.ts — ${os.cpus().length} cores ${os.cpus()[0]?.model.trim()}, Node ${process.version}, load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, threads ${threads}`);

const only = process.argv.includes('--only-rss');
let b = Number.NaN;
const median = (xs: Rate[], k: keyof Rate) => [...xs].sort((x, y) => x[k] - y[k])[Math.floor(xs.length / 2)]![k];
const medians = (xs: Rate[]): Rate => ({ wall: median(xs, 'wall'), cpu: median(xs, 'cpu') });
// 1 and 2: alternate baseline and sweep, three rounds, medians.
const inline = pool(0);
const threaded = pool(only ? 0 : threads);
await threaded.ready();
if (!only) {
  await flowRate(2000);
  await sweepRate(flowSweep(2000), inline, 2);
  await sweepRate(flowSweep(2000), threaded, 2 * threads);
  const base: Rate[] = [];
  const sweepInline: Rate[] = [];
  const sweepPool: Rate[] = [];
  for (let round = 0; round < 3; round++) {
    base.push(await flowRate(Math.min(points, 20_000)));
    sweepInline.push(await sweepRate(flowSweep(points), inline, 2));
    sweepPool.push(await sweepRate(flowSweep(points), threaded, 2 * threads));
  }
  const baseline = medians(base);
  b = baseline.wall;
  const si = medians(sweepInline);
  const sp = medians(sweepPool);
  console.log(`/v1/flow compute in process (parse, compute, envelope): ${both(baseline, 'points')}`);
  console.log(`flow sweep, inline (one thread): ${both(si, 'points')} = ${(si.wall / b).toFixed(2)} × /v1/flow`);
  console.log(`flow sweep, pool of ${threads} threads: ${both(sp, 'points')} = ${(sp.wall / b).toFixed(2)} × /v1/flow`);
}

// 3: an assessment sweep (the README's demo design over width × depth) through the sweep engine on one thread, and
// the same designs assessed directly (the window's evaluation): the engine's share is the difference.
if (!only) {
  const plan = planWindow(windowRequest(5, 0));
  const design = { ...demoWindow.design, requirements: demoWindow.requirements } as Record<string, unknown>;
  const body = {
    calculation: 'assess',
    design,
    axes: [
      // 600 distinct designs (20 × 30): long enough a run that a timer tick or one collection does not set the rate.
      { path: 'texture.grooveWidth', range: { from: '5 um', to: '45 um', points: 20, spacing: 'log' } },
      { path: 'texture.grooveDepth', range: { from: '2 um', to: '200 um', points: 30, spacing: 'log' } },
    ],
  };
  const swept = planSweep(body);
  const candidates = Array.from({ length: swept.totalPoints }, (_, i) => {
    const doc = pointDocument(swept, i) as { document: { texture: { grooveWidth: number; pitch: number; grooveDepth: number } } };
    return { grooveWidth: doc.document.texture.grooveWidth, pitch: doc.document.texture.pitch, grooveDepth: doc.document.texture.grooveDepth };
  });
  // Three warm-up passes of each, alternating (the rate still climbs over the first few as the compiler warms to
  // the assessment's code), then three measured passes of each, alternating: the medians are reported.
  const directly = () => rate(candidates.length, () => evaluateCandidates(plan.spec.document, plan.spec.requirements, catalogue, candidates));
  for (let pass = 0; pass < 3; pass++) {
    await sweepRate(body, inline, 2);
    await directly();
  }
  const sweptRuns: Rate[] = [];
  const directRuns: Rate[] = [];
  for (let pass = 0; pass < 3; pass++) {
    sweptRuns.push(await sweepRate(body, inline, 2));
    directRuns.push(await directly());
  }
  const viaSweep = medians(sweptRuns);
  const direct = medians(directRuns);
  console.log(`assessment sweep (no sensitivities), inline, one thread: ${both(viaSweep, 'designs')} = 1/${fmt(b / viaSweep.wall)} of /v1/flow`);
  console.log(`the same designs assessed directly (no sweep engine), one thread: ${both(direct, 'designs')}; engine share ${(100 * (1 - viaSweep.cpu / direct.cpu)).toFixed(0)} % of CPU`);
}

// 4: design window over ~10⁴ candidates on the pool.
if (!only && !process.argv.includes('--skip-window')) {
  const request = windowRequest(14, 3);
  const plan = planWindow(request);
  const cpu0 = process.cpuUsage();
  const start = performance.now();
  const w = await runWindow(plan, request, threaded, threads);
  const seconds = (performance.now() - start) / 1000;
  const c = process.cpuUsage(cpu0);
  console.log(
    `design window: ${w.candidates} candidates, ${w.evaluated} evaluated (${((100 * w.evaluated) / w.candidates).toFixed(1)} %), ${w.feasibleCandidates} feasible, ${seconds.toFixed(1)} s on ${threads} threads (${((c.user + c.system) / 1e6).toFixed(1)} CPU-seconds)`,
  );
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
          // Before a collection: RSS and the heap V8 holds (committed, live and garbage) and outside it (buffers);
          // after one (under --expose-gc), what is live.
          const held = process.memoryUsage();
          (globalThis as { gc?: () => void }).gc?.();
          const use = process.memoryUsage();
          const mb = (x: number) => (x / 2 ** 20).toFixed(0);
          marks.push(`${m.toExponential(0)} rows: RSS ${mb(held.rss)} MB, main heap committed ${mb(held.heapTotal)} MB, external ${mb(held.external)} MB, live after GC ${mb(use.heapUsed)} MB`);
        }
      }
      done();
    },
  });
  const start = performance.now();
  const rssStart = process.memoryUsage().rss;
  await pipeline(Readable.from(ndjsonChunks(plan, sweepRows(plan, body, streamPool, { concurrency: Math.max(2, 2 * threads), pointTimeoutMs: 20_000 }), { progress: true })), sink);
  clearInterval(sampler);
  await streamPool.close();
  console.log(
    `NDJSON stream of ${fmt(rows)} rows: ${((performance.now() - start) / 1000).toFixed(1)} s, main heap limit ${(getHeapStatistics().heap_size_limit / 2 ** 20).toFixed(0)} MB, RSS at start ${(rssStart / 2 ** 20).toFixed(0)} MB, peak ${(peak / 2 ** 20).toFixed(0)} MB; ${marks.join(', ')}`,
  );
}
