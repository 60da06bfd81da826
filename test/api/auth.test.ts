/**
 * API keys are checked on the route the router matched, so no spelling of a
 * /v1 path reaches a handler without a key: percent-encoding, double slashes,
 * case, a trailing slash, HEAD, OPTIONS. Requests go over a real socket with
 * the path exactly as written (no client-side normalisation).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { FastifyInstance } from 'fastify';
import fc from 'fast-check';
import { buildApp } from '../../src/api/app.js';
import { testConfig } from '../../src/api/config.js';

const KEY = 'k1';
let app: FastifyInstance;
let withCors: FastifyInstance;
let port: number;
let corsPort: number;

async function listen(instance: FastifyInstance): Promise<number> {
  await instance.listen({ port: 0, host: '127.0.0.1' });
  return (instance.server.address() as AddressInfo).port;
}

beforeAll(async () => {
  app = await buildApp(testConfig({ apiKeys: [KEY] }));
  port = await listen(app);
  withCors = await buildApp(testConfig({ apiKeys: [KEY], corsOrigins: ['https://lab.example'] }));
  corsPort = await listen(withCors);
});
afterAll(async () => {
  await app.close();
  await withCors.close();
});

const flowBody = JSON.stringify({ workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } });

/** One request with the path sent byte for byte as given. */
function send(method: string, path: string, options: { key?: string; body?: string; headers?: Record<string, string>; to?: number } = {}): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const headers: Record<string, string | number> = { ...(options.headers ?? {}) };
    if (options.key) headers['x-api-key'] = options.key;
    if (options.body !== undefined) {
      headers['content-type'] = 'application/json';
      headers['content-length'] = Buffer.byteLength(options.body);
    }
    const req = http.request({ host: '127.0.0.1', port: options.to ?? port, method, path, headers, agent: false }, (res) => {
      let body = '';
      res.on('data', (c: Buffer) => (body += c.toString()));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
    req.end(options.body);
  });
}

describe('API key on every spelling of a /v1 route', () => {
  const spellings: [string, string, string | undefined][] = [
    ['POST', '/%761/flow', flowBody],
    ['POST', '/v%31/flow', flowBody],
    ['POST', '/%76%31/flow', flowBody],
    ['POST', '/v1/%66low', flowBody],
    ['POST', '/v1/flow/', flowBody],
    ['GET', '/%761/fluids', undefined],
    ['GET', '/v1/fluids/', undefined],
    ['GET', '/v1/fluids?x=1', undefined],
    ['HEAD', '/v1/fluids', undefined],
    ['HEAD', '/%761/fluids', undefined],
  ];
  for (const [method, path, body] of spellings) {
    it(`${method} ${path}: 401 without a key, 200 with it (so the router did match it)`, async () => {
      const without = await send(method, path, { body });
      expect(without.status).toBe(401);
      const withKey = await send(method, path, { body, key: KEY });
      expect(withKey.status).toBe(200);
    });
  }

  it('paths the router does not match are 404 with or without a key, never a result', async () => {
    for (const path of ['//v1/fluids', '/V1/fluids', '/v1//fluids', '/v1/FLUIDS', '/%2Fv1/fluids']) {
      const res = await send('GET', path);
      expect(res.status, path).toBe(404);
      expect(res.body).not.toMatch(/"fluids"/);
    }
  });

  it('a wrong key is 401; the service endpoints stay open', async () => {
    expect((await send('GET', '/v1/fluids', { key: 'k2' })).status).toBe(401);
    expect((await send('GET', '/v1/fluids', { key: KEY.toUpperCase() })).status).toBe(401);
    expect((await send('GET', '/v1/fluids', { key: `${KEY}${KEY}` })).status).toBe(401);
    for (const path of ['/healthz', '/readyz', '/openapi.json']) expect((await send('GET', path)).status, path).toBe(200);
  });

  it('OPTIONS without CORS: no route answers it, nothing leaks', async () => {
    const res = await send('OPTIONS', '/v1/flow');
    expect([404, 405]).toContain(res.status);
    expect(res.body).not.toMatch(/wallShearStress/);
  });

  it('OPTIONS with CORS: the preflight is answered without a key (browsers send none), the request itself still needs one', async () => {
    const preflight = await send('OPTIONS', '/%761/flow', {
      to: corsPort,
      headers: { origin: 'https://lab.example', 'access-control-request-method': 'POST', 'access-control-request-headers': 'content-type,x-api-key' },
    });
    expect(preflight.status).toBe(204);
    expect(preflight.body).toBe('');
    expect((await send('POST', '/%761/flow', { to: corsPort, body: flowBody })).status).toBe(401);
  });

  it('fast-check: any percent-encoding of the letters of /v1/fluids is 401 without a key and 200 with it (seeded)', async () => {
    const path = '/v1/fluids';
    const encodeSome = (mask: boolean[], upper: boolean) =>
      [...path]
        .map((ch, i) => {
          if (ch === '/' || !mask[i]) return ch;
          const hex = ch.charCodeAt(0).toString(16);
          return `%${upper ? hex.toUpperCase() : hex}`;
        })
        .join('');
    await fc.assert(
      fc.asyncProperty(fc.array(fc.boolean(), { minLength: path.length, maxLength: path.length }), fc.boolean(), async (mask, upper) => {
        const spelled = encodeSome(mask, upper);
        expect((await send('GET', spelled)).status).toBe(401);
        expect((await send('GET', spelled, { key: KEY })).status).toBe(200);
      }),
      { seed: 4242, numRuns: 40, verbose: true },
    );
  });
});
