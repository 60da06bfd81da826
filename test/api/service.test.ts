import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { readFileSync } from 'node:fs';
import { makeApp } from './helpers.js';
import { buildOpenApiDocument } from '../../src/api/openapi.js';
import { withoutSecurity } from '../../src/api/plugins/docs.js';
import { findNonFinite, safeStringify, canonicalJson } from '../../src/api/envelope.js';
import { computeChecked } from '../../src/api/calculation.js';
import { ProblemError } from '../../src/api/problem.js';
import { defineCalculation } from '../../src/api/calculation.js';
import { z } from '../../src/api/schemas/zod.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

describe('service endpoints', () => {
  it('GET /healthz and /readyz answer 200', async () => {
    expect((await app.inject('/healthz')).json()).toEqual({ status: 'ok' });
    expect((await app.inject('/readyz')).statusCode).toBe(200);
  });
  it('GET /readyz answers 503 problem while draining', async () => {
    app.draining = true;
    const res = await app.inject('/readyz');
    app.draining = false;
    expect(res.statusCode).toBe(503);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
  });
  it('GET /openapi.json serves the committed document (openapi:check keeps them equal), without the key scheme when no keys are set', async () => {
    const served = (await app.inject('/openapi.json')).json();
    const committed = JSON.parse(readFileSync(new URL('../../openapi/openapi.json', import.meta.url), 'utf8'));
    expect(served).toEqual(withoutSecurity(committed));
    expect(served.openapi).toBe('3.1.0');
    expect(Object.keys(served.paths)).toContain('/v1/flow');
  });
  it('GET /docs serves the interactive documentation', async () => {
    const res = await app.inject('/docs/');
    expect([200, 302]).toContain(res.statusCode);
    const page = res.statusCode === 302 ? await app.inject(String(res.headers.location)) : res;
    expect(page.body).toMatch(/swagger/i);
  });
  it('GET /metrics exposes request counts, duration histogram, event-loop lag and process metrics', async () => {
    await app.inject({ method: 'POST', url: '/v1/flow', payload: { workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } } });
    const text = (await app.inject('/metrics')).body;
    expect(text).toMatch(/oilskin_http_requests_total\{route="\/v1\/flow",method="POST",status_code="200"\} 1/);
    expect(text).toMatch(/oilskin_http_request_duration_seconds_bucket/);
    expect(text).toMatch(/oilskin_nodejs_eventloop_lag_seconds/);
    expect(text).toMatch(/oilskin_process_cpu_user_seconds_total/);
  });
  it('GET /v1/fluids lists every fluid with values, units, ranges and sources', async () => {
    const { fluids } = (await app.inject('/v1/fluids')).json();
    expect(fluids.length).toBeGreaterThanOrEqual(8);
    const ids = fluids.map((f: { id: string }) => f.id);
    for (const id of ['water', 'seawater', 'n-decane', 'n-dodecane', 'n-hexadecane']) expect(ids).toContain(id);
  });
  it('every operation in the document has an operationId and a 422 problem response', () => {
    const doc = buildOpenApiDocument() as { paths: Record<string, Record<string, { operationId?: string; responses: Record<string, unknown> }>> };
    for (const [path, ops] of Object.entries(doc.paths)) {
      for (const op of Object.values(ops)) {
        expect(op.operationId, path).toBeTruthy();
        if (path.startsWith('/v1/') && path !== '/v1/fluids' && path !== '/v1/surfactants') expect(op.responses['422'], path).toBeDefined();
      }
    }
  });
});

describe('non-finite guard', () => {
  const broken = defineCalculation({
    name: 'broken',
    path: '/v1/broken',
    summary: 's',
    description: 'd',
    body: z.object({}),
    response: z.object({}),
    heavy: false,
    example: {},
    compute: () => ({ inputs: {}, result: { value: Number.NaN }, warnings: [], assumptions: [], references: [], models: [] }),
  });
  it('a calculation that produces NaN is refused with 422 naming the value, not sent', () => {
    expect(() => computeChecked(broken, {})).toThrow(ProblemError);
    try {
      computeChecked(broken, {});
    } catch (error) {
      expect((error as ProblemError).problem.status).toBe(422);
      expect((error as ProblemError).problem.detail).toMatch(/result\.value/);
    }
  });
  it('the reply serializer turns any stray NaN/Infinity into null (last line of defence)', () => {
    expect(safeStringify({ a: Number.NaN, b: [Infinity, 1], c: new Float64Array([2, -Infinity]) })).toBe('{"a":null,"b":[null,1],"c":[2,null]}');
    expect(findNonFinite({ a: [1, { b: Infinity }] })).toBe('a[1].b');
  });
  it('canonical JSON sorts keys at every level so the inputs hash is stable', () => {
    expect(canonicalJson({ b: 1, a: { d: 2, c: [3, { f: 4, e: 5 }] } })).toBe('{"a":{"c":[3,{"e":5,"f":4}],"d":2},"b":1}');
  });
});

describe('authentication, rate limit and overload', () => {
  it('with API keys configured, /v1 needs x-api-key; health stays open', async () => {
    const secured = await makeApp({ apiKeys: ['k-123'] });
    const body = { workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } };
    expect((await secured.inject({ method: 'POST', url: '/v1/flow', payload: body })).statusCode).toBe(401);
    expect((await secured.inject({ method: 'POST', url: '/v1/flow', payload: body, headers: { 'x-api-key': 'k-123' } })).statusCode).toBe(200);
    expect((await secured.inject('/healthz')).statusCode).toBe(200);
    await secured.close();
  });
  it('beyond the rate limit → 429 problem with Retry-After', async () => {
    const limited = await makeApp({ rateLimitPerMinute: 2 });
    const statuses: number[] = [];
    let last;
    for (let i = 0; i < 3; i++) {
      last = await limited.inject('/v1/fluids');
      statuses.push(last.statusCode);
    }
    expect(statuses).toEqual([200, 200, 429]);
    expect(last!.headers['content-type']).toMatch(/problem\+json/);
    expect(last!.headers['retry-after']).toBeDefined();
    await limited.close();
  });
});

describe('logs', () => {
  it('pino JSON log lines carry the request id that the response header echoes', async () => {
    const { Writable } = await import('node:stream');
    const lines: string[] = [];
    const stream = new Writable({
      write(chunk, _enc, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const { buildApp } = await import('../../src/api/app.js');
    const { testConfig } = await import('../../src/api/config.js');
    const logged = await buildApp(testConfig({ logLevel: 'info' }), { logStream: stream });
    const res = await logged.inject({ method: 'GET', url: '/healthz', headers: { 'x-request-id': 'trace-7' } });
    await logged.close();
    expect(res.headers['x-request-id']).toBe('trace-7');
    const records = lines.map((l) => JSON.parse(l));
    expect(records.some((r) => r.reqId === 'trace-7' && r.msg === 'request completed')).toBe(true);
    // One access line per request (not fastify's two), carrying what the arrival line carried.
    const access = records.filter((r) => r.reqId === 'trace-7');
    expect(access).toHaveLength(1);
    expect(access[0]).toMatchObject({ req: { method: 'GET', url: '/healthz' }, res: { statusCode: 200 } });
    expect(access[0].responseTime).toBeGreaterThanOrEqual(0);
  });
});
