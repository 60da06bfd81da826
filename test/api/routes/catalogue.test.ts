import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';
import { FluidsResponse, SurfactantsResponse } from '../../../src/api/schemas/responses/catalogue.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

describe('GET /v1/fluids and GET /v1/surfactants: one sourced-value shape', () => {
  it('lists every fluid; each value names a source found in the references; the response parses against its schema', async () => {
    const body = (await app.inject('/v1/fluids')).json();
    expect(FluidsResponse.safeParse(body).success).toBe(true);
    const keys = new Set(body.references.map((r: { key: string }) => r.key));
    for (const fluid of body.fluids) for (const v of Object.values(fluid.properties) as { source: string }[]) expect(keys.has(v.source)).toBe(true);
    expect(body.fluids.map((f: { id: string }) => f.id)).toContain('water');
  });
  it('lists SDS and a nonionic with sourced values per interface, in the same shape', async () => {
    const body = (await app.inject('/v1/surfactants')).json();
    expect(SurfactantsResponse.safeParse(body).success).toBe(true);
    const ids = body.surfactants.map((s: { id: string }) => s.id);
    expect(ids).toContain('sds');
    expect(ids).toContain('octylphenol-ethoxylate');
    const keys = new Set(body.references.map((r: { key: string }) => r.key));
    expect(keys.has(body.surfactants[0].interfaces['air-water'].langmuirConstant.source)).toBe(true);
  });
});
