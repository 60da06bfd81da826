/**
 * Load mixes against a running service, over loopback only.
 *
 *   npm run build && npx tsx bench/load.ts [--mix cheap|heavy|both] [--duration 60]
 *                                          [--connections 100] [--heavy-connections 20] [--sources]
 *
 * Starts the service as a child process (compiled server, or the sources
 * under tsx with --sources) on 127.0.0.1 with its defaults (two worker
 * threads, queue wait 10 s, compute 20 s) and no rate limit, then runs
 * autocannon:
 * - cheap mix: POST /v1/flow, /v1/waves (no map) and /v1/slip with
 *   method "closed-form", in turn, 100 connections for 60 s;
 * - heavy mix: field solves (POST /v1/slip method "field" and "auto"),
 *   20 connections for 60 s: the pool saturates on purpose, so 503 with
 *   Retry-After is the expected answer beyond what two threads can do.
 * Each mix first runs --warm seconds (default 15) uncounted. Reports
 * throughput, status counts (and whether every 503 carried Retry-After),
 * p50/p99 latency, the service's RSS before the warm-up, at the start of the
 * run, at its peak and at the end, and the latency of GET /healthz probed
 * every 500 ms during the run.
 */
import os from 'node:os';
import { readFileSync } from 'node:fs';
import type { IncomingHttpHeaders } from 'node:http';
import autocannon from 'autocannon';
import { startService } from './child-service.js';

function option(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}
const mix = option('mix', 'both');
const duration = Number(option('duration', '60'));
const cheapConnections = Number(option('connections', '100'));
const heavyConnections = Number(option('heavy-connections', '20'));
/** Seconds of the same mix run first and not counted: V8 grows its heap to the working set under load. */
const warmSeconds = Number(option('warm', '15'));

function rssMb(pid: number): number {
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    return Number(status.match(/VmRSS:\s+(\d+) kB/)?.[1] ?? Number.NaN) / 1024;
  } catch {
    return Number.NaN;
  }
}

// --log-level warn takes the service's request log (two lines per request, read by this process) out of the measurement.
const service = await startService({ sources: process.argv.includes('--sources'), env: { OILSKIN_LOG_LEVEL: option('log-level', 'info') } });
const { base, child } = service;

const design = {
  texture: { grooveWidth: '20 um', pitch: '40 um', grooveDepth: '20 um' },
  lubricant: { id: 'silicone-oil-5cst', temperature: '25 degC' },
  workingFluid: { id: 'water', temperature: '25 degC' },
  flow: { kind: 'channel', height: '5 mm', bulkVelocity: '0.6 m/s' },
};
const post = (path: string, body: unknown) => ({ method: 'POST' as const, path, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
const MIXES = {
  cheap: [
    post('/v1/flow', { workingFluid: design.workingFluid, flow: design.flow, texture: design.texture }),
    post('/v1/waves', { ...design, lubricant: { id: 'n-dodecane', temperature: '25 degC' } }),
    post('/v1/slip', { ...design, options: { method: 'closed-form' } }),
  ],
  heavy: [post('/v1/slip', { ...design, options: { method: 'field' } }), post('/v1/slip', { ...design, lubricant: { id: 'n-hexadecane', temperature: '25 degC' }, options: { method: 'auto' } })],
};

async function run(name: 'cheap' | 'heavy', connections: number) {
  // Warm up (threads loaded, code compiled, heap grown to the working set) before measuring.
  const rssCold = rssMb(child.pid!);
  if (warmSeconds > 0) await autocannon({ url: base, connections, duration: warmSeconds, requests: MIXES[name], timeout: 60 });
  const rssStart = rssMb(child.pid!);
  let rssPeak = rssStart;
  const health: number[] = [];
  let healthFailures = 0;
  const probe = setInterval(async () => {
    rssPeak = Math.max(rssPeak, rssMb(child.pid!));
    const t = performance.now();
    try {
      const res = await fetch(`${base}/healthz`, { signal: AbortSignal.timeout(10_000) });
      await res.text();
      if (res.ok) health.push(performance.now() - t);
      else healthFailures++;
    } catch {
      healthFailures++;
    }
  }, 500);
  let withRetryAfter = 0;
  let withoutRetryAfter = 0;
  const requests = MIXES[name].map((r) => ({
    ...r,
    onResponse: (status: number, _body: string, _context: object, headers?: IncomingHttpHeaders) => {
      if (status !== 503) return;
      const h: unknown = headers ?? {};
      // autocannon hands headers as a flat [name, value, ...] list in some versions.
      const flat = Array.isArray(h) ? (h as string[]) : Object.entries(h as Record<string, unknown>).flat();
      if (flat.some((x) => String(x).toLowerCase() === 'retry-after')) withRetryAfter++;
      else withoutRetryAfter++;
    },
  }));
  // A request may wait up to the queue budget (10 s) and then compute up to 20 s: give it 60 s before calling it a timeout.
  const result = await autocannon({ url: base, connections, duration, requests, timeout: 60 });
  clearInterval(probe);
  const rssEnd = rssMb(child.pid!);
  health.sort((a, b) => a - b);
  const q = (p: number) => (health.length ? health[Math.min(health.length - 1, Math.floor(p * health.length))].toFixed(1) : 'n/a');
  const statuses = Object.fromEntries(Object.entries(result.statusCodeStats as Record<string, { count: number }>).map(([k, v]) => [k, v.count]));
  console.log(`\n${name} mix: ${connections} connections, ${duration} s, ${requests.map((r) => `${r.method} ${r.path}`).join(' + ')}`);
  console.log(`  throughput ${result.requests.average.toFixed(0)} req/s (${result.requests.total} requests), statuses ${JSON.stringify(statuses)}, errors ${result.errors}, timeouts ${result.timeouts}`);
  console.log(`  503: ${withRetryAfter} with Retry-After, ${withoutRetryAfter} without`);
  console.log(`  latency p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, max ${result.latency.max} ms`);
  console.log(
    `  RSS ${rssCold.toFixed(0)} MB before the ${warmSeconds} s warm-up, ${rssStart.toFixed(0)} MB at the start of the run, ${rssPeak.toFixed(0)} MB peak, ${rssEnd.toFixed(0)} MB at the end (${(((rssEnd - rssStart) / rssStart) * 100).toFixed(1)} % over the run)`,
  );
  console.log(`  /healthz during the run: ${health.length} probes, p50 ${q(0.5)} ms, p99 ${q(0.99)} ms, max ${q(1)} ms, failed ${healthFailures}`);
}

console.log(`load: ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg()[0].toFixed(1)}, Node ${process.version}, service ${process.argv.includes('--sources') ? 'from sources' : 'compiled'}`);
if (mix === 'cheap' || mix === 'both') await run('cheap', cheapConnections);
if (mix === 'heavy' || mix === 'both') await run('heavy', heavyConnections);
const died = service.died();
console.log(`\nservice process: ${died ? `DIED (${died})` : 'alive at the end'}`);
if (!died) child.kill('SIGTERM');
