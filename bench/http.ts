/**
 * HTTP benchmark: autocannon against POST /v1/flow and against a bare fastify
 * route returning a small JSON object, same connections, pipelining and
 * duration, one after the other in this process. Prints requests/s, the ratio
 * and p50/p99 latency. Run: npm run bench:http [-- --duration 10 --connections 10]
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

async function run(url: string, method: 'GET' | 'POST', body?: string) {
  const result = await autocannon({
    url,
    method,
    connections,
    pipelining,
    duration,
    headers: { 'content-type': 'application/json' },
    ...(body ? { body } : {}),
  });
  return { rps: result.requests.average, p50: result.latency.p50, p99: result.latency.p99, errors: result.errors, non2xx: result.non2xx };
}

const bare = Fastify({ logger: false });
bare.get('/small', async () => ({ status: 'ok', value: 1.5 }));
await bare.listen({ port: 0, host: '127.0.0.1' });
const bareUrl = `http://127.0.0.1:${(bare.server.address() as { port: number }).port}/small`;

const app = await buildApp(testConfig({ logLevel: 'silent', rateLimitPerMinute: 0 }));
await app.listen({ port: 0, host: '127.0.0.1' });
const appUrl = `http://127.0.0.1:${(app.server.address() as { port: number }).port}/v1/flow`;
const body = JSON.stringify({
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
});

console.log(`conditions: ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), Node ${process.version}, connections ${connections}, pipelining ${pipelining}, duration ${duration} s each`);
const baseline = await run(bareUrl, 'GET');
const flow = await run(appUrl, 'POST', body);
console.log(`bare fastify GET /small : ${baseline.rps.toFixed(0)} req/s, p50 ${baseline.p50} ms, p99 ${baseline.p99} ms`);
console.log(`oilskin POST /v1/flow   : ${flow.rps.toFixed(0)} req/s, p50 ${flow.p50} ms, p99 ${flow.p99} ms, non-2xx ${flow.non2xx}, errors ${flow.errors}`);
console.log(`ratio /v1/flow / bare   : ${(flow.rps / baseline.rps).toFixed(2)}`);
await app.close();
await bare.close();
