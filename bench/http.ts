/**
 * HTTP benchmark of the plain path: autocannon against POST /v1/flow and two
 * baselines, same connections, pipelining and duration, one after the other in
 * this process:
 * - fair: a bare fastify POST route that parses the same JSON body and returns
 *   a JSON body of the same size (the /v1/flow answer, serialised per request);
 * - old: a bare fastify GET of a tiny object (the earlier baseline, kept to
 *   compare with older figures).
 * Two workloads: one body repeated (what a client polling one design sends;
 * the result cache can answer it), and a distinct body per request (a new
 * bulk velocity each time, so every request is validated and computed: the
 * computing path), each against the fair baseline fed the same bodies.
 * The servers run as child processes (bench/http-baseline.ts for the bare
 * routes, src/api/server.ts with no workers, no rate limit, no request logs),
 * so each one's CPU time per answered request is read apart from the load
 * generator's (/proc/<pid>/stat): on a shared machine that figure moves far
 * less than the rates do. Prints requests/s, p50/p99 latency, CPU µs per
 * request and the ratios (for rate: oilskin / baseline; for latency and CPU:
 * baseline / oilskin, so 1 means as fast).
 * Run: npm run bench:http [-- --duration 10 --connections 10 --pipelining 1 --cache-mb 32]
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import os, { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}
const duration = arg('duration', 10);
const connections = arg('connections', 10);
const pipelining = arg('pipelining', 1);
const cacheMb = arg('cache-mb', 32);

interface Figures {
  rps: number;
  p50: number;
  p99: number;
  non2xx: number;
  errors: number;
  bytes: number;
  /** CPU time of the server process per answered request, µs. */
  cpuUsPerRequest?: number;
}

/** What a run sends: nothing (GET), one body repeated, or a fresh body per request. */
type Payload = undefined | string | (() => string);

async function run(url: string, method: 'GET' | 'POST', payload: Payload): Promise<Figures> {
  const result = await autocannon({
    url,
    method,
    connections,
    pipelining,
    duration,
    headers: { 'content-type': 'application/json' },
    ...(typeof payload === 'string' ? { body: payload } : {}),
    ...(typeof payload === 'function' ? { requests: [{ method, setupRequest: (request: object) => ({ ...request, body: payload() }) }] } : {}),
  });
  return {
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    errors: result.errors,
    non2xx: result.non2xx,
    bytes: result.throughput.average / Math.max(result.requests.average, 1),
  };
}

/** The benchmark's design; `bulkVelocity` varies in the distinct-body runs. */
const design = (bulkVelocity: string) =>
  JSON.stringify({
    workingFluid: { id: 'water', temperature: '20 degC' },
    flow: { kind: 'channel', height: '10 mm', bulkVelocity },
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
  });
const body = design('1 m/s');
/**
 * A new design per request (0.5 to 1.5 m/s in steps of 1 µm/s, turbulent throughout), so no answer repeats within
 * a run and neither the result cache nor any memo can answer: the computing path.
 */
let distinctCount = 0;
const distinctBody = () => design(`${(0.5 + (distinctCount++ % 1_000_000) * 1e-6).toFixed(6)} m/s`);

/** A free loopback port. */
async function freePort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as net.AddressInfo;
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

/** Start a server script as a child process (tsx) and wait until `url` answers. */
async function child(script: string, env: Record<string, string>, url: string): Promise<ChildProcess> {
  const proc = spawn(process.execPath, ['--import', 'tsx', script], { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'ignore', 'inherit'] });
  for (let i = 0; i < 600; i++) {
    if (await fetch(url).then((r) => r.ok, () => false)) return proc;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`${script} did not start`);
}

/** CPU seconds (user + system) a process has used so far (/proc/<pid>/stat, Linux). */
function cpuSeconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100; // utime, stime (fields 14, 15) in USER_HZ = 100 ticks/s
}

/** autocannon against a child process, with the child's CPU time per answered request. */
async function measured(proc: ChildProcess, url: string, method: 'GET' | 'POST', payload: Payload): Promise<Figures> {
  const before = cpuSeconds(proc.pid!);
  const figures = await run(url, method, payload);
  const requests = figures.rps * duration;
  return { ...figures, cpuUsPerRequest: ((cpuSeconds(proc.pid!) - before) / Math.max(requests, 1)) * 1e6 };
}

const root = fileURLToPath(new URL('..', import.meta.url));
const appPort = await freePort();
const appBase = `http://127.0.0.1:${appPort}`;
const service = await child(
  'src/api/server.ts',
  { OILSKIN_PORT: String(appPort), OILSKIN_HOST: '127.0.0.1', OILSKIN_LOG_LEVEL: 'silent', OILSKIN_RATE_LIMIT: '0', OILSKIN_WORKERS: '0', OILSKIN_RESULT_CACHE_MB: String(cacheMb) },
  `${appBase}/healthz`,
);
const sample = await fetch(`${appBase}/v1/flow`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
const answerText = await sample.text();
if (!sample.ok) throw new Error(`POST /v1/flow answered ${sample.status}: ${answerText}`);
const answerFile = join(mkdtempSync(join(tmpdir(), 'oilskin-bench-')), 'answer.json');
writeFileSync(answerFile, answerText);
const barePort = await freePort();
const bareBase = `http://127.0.0.1:${barePort}`;
const bare = await child('bench/http-baseline.ts', { BASELINE_PORT: String(barePort), BASELINE_ANSWER: answerFile }, `${bareBase}/small`);

console.log(
  `conditions: ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, Node ${process.version}, ` +
    `connections ${connections}, pipelining ${pipelining}, duration ${duration} s each, servers in child processes, result cache ${cacheMb} MB, request ${body.length} B, answer ${answerText.length} B`,
);
try {
  const old = await measured(bare, `${bareBase}/small`, 'GET', undefined);
  const fair = await measured(bare, `${bareBase}/same-size`, 'POST', body);
  const flow = await measured(service, `${appBase}/v1/flow`, 'POST', body);
  const fairDistinct = await measured(bare, `${bareBase}/same-size`, 'POST', distinctBody);
  const flowDistinct = await measured(service, `${appBase}/v1/flow`, 'POST', distinctBody);
  const line = (name: string, f: Figures) =>
    console.log(
      `${name.padEnd(48)}: ${f.rps.toFixed(0).padStart(6)} req/s, p50 ${f.p50} ms, p99 ${f.p99} ms, CPU ${f.cpuUsPerRequest?.toFixed(0)} µs/request, ${f.bytes.toFixed(0)} B/answer, non-2xx ${f.non2xx}, errors ${f.errors}`,
    );
  line('bare fastify GET /small (old)', old);
  line('bare fastify POST /same-size (fair), one body', fair);
  line('oilskin POST /v1/flow, one body repeated', flow);
  line('bare fastify POST /same-size, distinct bodies', fairDistinct);
  line('oilskin POST /v1/flow, distinct bodies', flowDistinct);
  const ratios = (name: string, ours: Figures, base: Figures) =>
    console.log(
      `${name.padEnd(38)}: rate ${(ours.rps / base.rps).toFixed(2)}, CPU per request ${(base.cpuUsPerRequest! / ours.cpuUsPerRequest!).toFixed(2)}, ` +
        `p50 ${(base.p50 / Math.max(ours.p50, 1e-9)).toFixed(2)} (${base.p50}/${ours.p50} ms), p99 ${(base.p99 / Math.max(ours.p99, 1e-9)).toFixed(2)} (${base.p99}/${ours.p99} ms)`,
    );
  ratios('repeated body against fair', flow, fair);
  ratios('repeated body against old', flow, old);
  ratios('distinct bodies against fair (same)', flowDistinct, fairDistinct);
  ratios('distinct bodies against old', flowDistinct, old);
} finally {
  service.kill('SIGTERM');
  bare.kill('SIGTERM');
}
