/**
 * HTTP benchmark of the plain path: autocannon against POST /v1/flow and two
 * baselines, same connections, pipelining and duration, one after the other in
 * this process:
 * - fair: a bare fastify POST route that parses the same JSON body and returns
 *   a JSON body of the same size (the /v1/flow answer, serialised per request);
 * - old: a bare fastify GET of a tiny object (the earlier baseline, kept to
 *   compare with older figures).
 * Prints requests/s, p50/p99 latency and the ratios (oilskin / baseline) of the
 * rate and of p50 and p99 (for latency, baseline / oilskin: 1 means as fast).
 * Run: npm run bench:http [-- --duration 10 --connections 10 --pipelining 1 --cache-mb 32]
 */
import os from 'node:os';
import Fastify from 'fastify';
import autocannon from 'autocannon';
import { buildApp } from '../src/api/app.js';
import { testConfig } from '../src/api/config.js';

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
}

async function run(url: string, method: 'GET' | 'POST', body?: string): Promise<Figures> {
  const result = await autocannon({
    url,
    method,
    connections,
    pipelining,
    duration,
    headers: { 'content-type': 'application/json' },
    ...(body ? { body } : {}),
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

const body = JSON.stringify({
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
});

const app = await buildApp(testConfig({ logLevel: 'silent', rateLimitPerMinute: 0, resultCacheMb: cacheMb }));
await app.listen({ port: 0, host: '127.0.0.1' });
const appBase = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
const sample = await fetch(`${appBase}/v1/flow`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
const answerText = await sample.text();
if (!sample.ok) throw new Error(`POST /v1/flow answered ${sample.status}: ${answerText}`);
const answer = JSON.parse(answerText) as unknown;

const bare = Fastify({ logger: false });
bare.get('/small', async () => ({ status: 'ok', value: 1.5 }));
// Same body parsing (fastify's JSON parser), and an answer of the same size serialised on every request.
bare.post('/same-size', async (request) => {
  if (typeof request.body !== 'object' || request.body === null) throw new Error('no body');
  return answer;
});
await bare.listen({ port: 0, host: '127.0.0.1' });
const bareBase = `http://127.0.0.1:${(bare.server.address() as { port: number }).port}`;

console.log(
  `conditions: ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, Node ${process.version}, ` +
    `connections ${connections}, pipelining ${pipelining}, duration ${duration} s each, result cache ${cacheMb} MB, request ${body.length} B, answer ${answerText.length} B`,
);
const old = await run(`${bareBase}/small`, 'GET');
const fair = await run(`${bareBase}/same-size`, 'POST', body);
const flow = await run(`${appBase}/v1/flow`, 'POST', body);
const line = (name: string, f: Figures) =>
  console.log(`${name.padEnd(34)}: ${f.rps.toFixed(0).padStart(6)} req/s, p50 ${f.p50} ms, p99 ${f.p99} ms, ${f.bytes.toFixed(0)} B/answer, non-2xx ${f.non2xx}, errors ${f.errors}`);
line('bare fastify GET /small (old)', old);
line('bare fastify POST /same-size (fair)', fair);
line('oilskin POST /v1/flow', flow);
const ratios = (name: string, base: Figures) =>
  console.log(
    `ratio against ${name.padEnd(5)}: rate ${(flow.rps / base.rps).toFixed(2)}, p50 ${(base.p50 / Math.max(flow.p50, 1e-9)).toFixed(2)} (${base.p50}/${flow.p50} ms), p99 ${(base.p99 / Math.max(flow.p99, 1e-9)).toFixed(2)} (${base.p99}/${flow.p99} ms)`,
  );
ratios('fair', fair);
ratios('old', old);
await app.close();
await bare.close();
