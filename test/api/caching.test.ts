/**
 * HTTP caching: the inputs hash as a strong ETag, If-None-Match answered 304
 * without compute, repeated heavy requests served from the bounded result
 * cache, catalogues with Cache-Control and ETag. The expected behaviour is
 * RFC 9110 §8.8.3 (ETag), §13.1.2 (If-None-Match, weak comparison), §15.4.5 (304).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { example, makeApp } from './helpers.js';
import { ResultLru, etagMatches } from '../../src/api/plugins/result-cache.js';

const flowBody = {
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
};
/** The same design in SI numbers: one cache entry with the unit-string spelling. */
const flowBodySi = {
  texture: { grooveDepth: 20e-6, pitch: 100e-6, grooveWidth: 50e-6 },
  flow: { bulkVelocity: 1, height: 0.01, kind: 'channel' },
  workingFluid: { temperature: 293.15, id: 'water' },
};
/** Heavy (worker-pool path): heat with the closed-form method, no sensitivity sweep. */
const heatBody = { ...example('heat-worked-example.json'), options: { method: 'closed-form' } };

/** Value of one Prometheus sample, 0 when absent. */
async function metric(app: FastifyInstance, name: string, calculation: string): Promise<number> {
  const text = (await app.inject('/metrics')).body;
  const m = text.match(new RegExp(`^${name}\\{calculation="${calculation}"\\} (\\d+)`, 'm'));
  return m ? Number(m[1]) : 0;
}

let app: FastifyInstance;
let noCache: FastifyInstance;
let keyed: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
  noCache = await makeApp({ resultCacheMb: 0 });
  keyed = await makeApp({ apiKeys: ['k-1'] });
});
afterAll(async () => {
  await Promise.all([app.close(), noCache.close(), keyed.close()]);
});

describe('calculations: ETag and If-None-Match', () => {
  it('a repeated heavy request with If-None-Match gets 304, no body and no compute; the metrics show the hit', async () => {
    const first = await app.inject({ method: 'POST', url: '/v1/heat', payload: heatBody });
    expect(first.statusCode).toBe(200);
    const etag = first.headers.etag as string;
    expect(etag).toBe(`"${first.json().provenance.inputsHash}"`);
    expect(etag).toMatch(/^"[0-9a-f]{64}"$/);
    expect(first.headers['cache-control']).toBe('no-cache');
    expect(await metric(app, 'oilskin_calculations_computed_total', 'heat')).toBe(1);

    const again = await app.inject({ method: 'POST', url: '/v1/heat', payload: heatBody, headers: { 'if-none-match': etag } });
    expect(again.statusCode).toBe(304);
    expect(again.body).toBe('');
    expect(again.headers.etag).toBe(etag);
    expect(await metric(app, 'oilskin_result_cache_hits_total', 'heat')).toBe(1);
    expect(await metric(app, 'oilskin_calculations_computed_total', 'heat')).toBe(1);
  });

  it('a repeated heavy request without a validator gets the remembered bytes, not a new compute', async () => {
    const body = { ...heatBody, workingFluid: { id: 'water', temperature: '30 degC' } };
    const first = await app.inject({ method: 'POST', url: '/v1/heat', payload: body });
    const before = await metric(app, 'oilskin_calculations_computed_total', 'heat');
    const second = await app.inject({ method: 'POST', url: '/v1/heat', payload: body });
    expect(second.statusCode).toBe(200);
    expect(second.body).toBe(first.body);
    expect(second.headers.etag).toBe(first.headers.etag);
    expect(second.headers['content-type']).toMatch(/^application\/json/);
    expect(await metric(app, 'oilskin_calculations_computed_total', 'heat')).toBe(before);
  });

  it('a light result is kept from its second computation on: once is not remembered, twice is (admission rule of result-cache.ts)', async () => {
    const body = { ...flowBody, flow: { ...flowBody.flow, bulkVelocity: '0.731 m/s' } };
    const computed = () => metric(app, 'oilskin_calculations_computed_total', 'flow');
    const start = await computed();
    await app.inject({ method: 'POST', url: '/v1/flow', payload: body });
    await app.inject({ method: 'POST', url: '/v1/flow', payload: body });
    expect(await computed()).toBe(start + 2);
    const third = await app.inject({ method: 'POST', url: '/v1/flow', payload: body });
    expect(third.statusCode).toBe(200);
    expect(await computed()).toBe(start + 2);
  });

  it('a light calculation answers If-None-Match with 304 without compute, whatever the spelling of the same design', async () => {
    // Computed twice, so it is kept (a light result is admitted on its second computation).
    await app.inject({ method: 'POST', url: '/v1/flow', payload: flowBody });
    const first = await app.inject({ method: 'POST', url: '/v1/flow', payload: flowBody });
    const etag = first.headers.etag as string;
    const computed = await metric(app, 'oilskin_calculations_computed_total', 'flow');
    const hits = await metric(app, 'oilskin_result_cache_hits_total', 'flow');
    const again = await app.inject({ method: 'POST', url: '/v1/flow', payload: flowBodySi, headers: { 'if-none-match': `W/"other", ${etag}` } });
    expect(again.statusCode).toBe(304);
    expect(await metric(app, 'oilskin_result_cache_hits_total', 'flow')).toBe(hits + 1);
    expect(await metric(app, 'oilskin_calculations_computed_total', 'flow')).toBe(computed);
    // A light result keeps its bytes too: repeated without a validator, in either spelling, it is not computed again.
    for (const payload of [flowBody, flowBodySi]) {
      const repeated = await app.inject({ method: 'POST', url: '/v1/flow', payload });
      expect(repeated.statusCode).toBe(200);
      expect(repeated.body).toBe(first.body);
      expect(repeated.headers.etag).toBe(etag);
      expect(repeated.headers['cache-control']).toBe('no-cache');
    }
    expect(await metric(app, 'oilskin_calculations_computed_total', 'flow')).toBe(computed);
    expect(await metric(app, 'oilskin_result_cache_hits_total', 'flow')).toBe(hits + 3);
  });

  it('the request text is looked up before validation, so a text that failed is refused again, never served', async () => {
    const text = JSON.stringify({ ...flowBody, flow: { ...flowBody.flow, bulkVelocity: '3 mN/m' } });
    for (let i = 0; i < 2; i++) {
      const res = await app.inject({ method: 'POST', url: '/v1/flow', payload: text, headers: { 'content-type': 'application/json' } });
      expect(res.statusCode).toBe(422);
      expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
      expect(res.json().errors[0].path).toBe('flow.bulkVelocity');
    }
    // The same document spelled with other whitespace and key order shares the parsed-document entry.
    const spaced = `{ "texture": ${JSON.stringify(flowBody.texture)}, "flow": ${JSON.stringify(flowBody.flow)}, "workingFluid": ${JSON.stringify(flowBody.workingFluid)} }`;
    const computed = await metric(app, 'oilskin_calculations_computed_total', 'flow');
    const res = await app.inject({ method: 'POST', url: '/v1/flow', payload: spaced, headers: { 'content-type': 'application/json' } });
    expect(res.statusCode).toBe(200);
    expect(await metric(app, 'oilskin_calculations_computed_total', 'flow')).toBe(computed);
  });

  it('the text-keeping JSON parser still refuses prototype keys, empty and malformed bodies', async () => {
    for (const payload of ['{"__proto__": {"x": 1}}', '', '{"flow": ']) {
      const res = await app.inject({ method: 'POST', url: '/v1/flow', payload, headers: { 'content-type': 'application/json' } });
      expect(res.statusCode).toBe(400);
      expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
    }
  });

  it('another tag, or another design, gets 200 with the body', async () => {
    const stale = await app.inject({ method: 'POST', url: '/v1/flow', payload: flowBody, headers: { 'if-none-match': `"${'0'.repeat(64)}"` } });
    expect(stale.statusCode).toBe(200);
    expect(stale.json().result.wallShearStress).toBeGreaterThan(0);
    const other = await app.inject({
      method: 'POST',
      url: '/v1/flow',
      payload: { ...flowBody, flow: { ...flowBody.flow, bulkVelocity: '2 m/s' } },
      headers: { 'if-none-match': stale.headers.etag as string },
    });
    expect(other.statusCode).toBe(200);
    expect(other.headers.etag).not.toBe(stale.headers.etag);
  });

  it('with the cache off (OILSKIN_RESULT_CACHE_MB=0) the tag still validates, after a compute', async () => {
    const first = await noCache.inject({ method: 'POST', url: '/v1/flow', payload: flowBody });
    const again = await noCache.inject({ method: 'POST', url: '/v1/flow', payload: flowBody, headers: { 'if-none-match': first.headers.etag as string } });
    expect(again.statusCode).toBe(304);
    expect(await metric(noCache, 'oilskin_calculations_computed_total', 'flow')).toBe(2);
    expect(await metric(noCache, 'oilskin_result_cache_hits_total', 'flow')).toBe(0);
  });

  it('a bad request is still 422 whatever validator it carries', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/flow', payload: { ...flowBody, flow: { kind: 'channel', height: '1 m/s' } }, headers: { 'if-none-match': '*' } });
    expect(res.statusCode).toBe(422);
  });

  it('behind API keys a validator does not bypass the key', async () => {
    const first = await keyed.inject({ method: 'POST', url: '/v1/flow', payload: flowBody, headers: { 'x-api-key': 'k-1' } });
    const res = await keyed.inject({ method: 'POST', url: '/v1/flow', payload: flowBody, headers: { 'if-none-match': first.headers.etag as string } });
    expect(res.statusCode).toBe(401);
  });
});

describe('catalogues: Cache-Control and ETag', () => {
  it.each(['/v1/fluids', '/v1/surfactants'])('%s carries a public max-age and a strong ETag, and answers its tag with 304', async (url) => {
    const first = await app.inject(url);
    expect(first.statusCode).toBe(200);
    expect(first.headers['cache-control']).toBe('public, max-age=300');
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^"[0-9a-f]{64}"$/);
    expect(first.json()).toBeTypeOf('object');
    const again = await app.inject({ url, headers: { 'if-none-match': etag } });
    expect(again.statusCode).toBe(304);
    expect(again.body).toBe('');
    expect(again.headers['cache-control']).toBe('public, max-age=300');
  });
  it('is private behind API keys (a shared cache must not serve it to callers without a key)', async () => {
    const res = await keyed.inject({ url: '/v1/fluids', headers: { 'x-api-key': 'k-1' } });
    expect(res.headers['cache-control']).toBe('private, max-age=300');
  });
});

describe('result LRU and tag comparison', () => {
  it('stays within its byte bound, evicting the least recently used entry first', () => {
    const body = 'x'.repeat(500); // counted as 1000 bytes (two per UTF-16 code unit)
    const lru = new ResultLru(3500);
    lru.set('a', { etag: '"a"', body });
    lru.set('b', { etag: '"b"', body });
    lru.set('c', { etag: '"c"', body });
    expect(lru.get('a')?.etag).toBe('"a"'); // a is now the most recent
    lru.set('d', { etag: '"d"', body });
    expect(lru.get('b')).toBeUndefined();
    expect(['a', 'c', 'd'].map((k) => lru.get(k)?.etag)).toEqual(['"a"', '"c"', '"d"']);
    expect(lru.stats().bytes).toBeLessThanOrEqual(3500);
    lru.set('huge', { etag: '"h"', body: 'x'.repeat(5_000) });
    expect(lru.get('huge')).toBeUndefined();
  });
  it('compares If-None-Match weakly (RFC 9110 §13.1.2): W/ prefixes ignored, lists and * understood', () => {
    expect(etagMatches('"x"', '"x"')).toBe(true);
    expect(etagMatches('W/"x"', '"x"')).toBe(true);
    expect(etagMatches('"y", "x"', '"x"')).toBe(true);
    expect(etagMatches('*', '"x"')).toBe(true);
    expect(etagMatches('"y"', '"x"')).toBe(false);
    expect(etagMatches('x', '"x"')).toBe(false);
    expect(etagMatches(undefined, '"x"')).toBe(false);
  });
});
