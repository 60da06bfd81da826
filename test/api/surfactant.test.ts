import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { surfactantCalculation } from '../../src/api/routes/surfactant.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const example = surfactantCalculation.example as Record<string, unknown>;

describe('POST /v1/surfactant', () => {
  it('clean limit: zero concentration reproduces the /v1/slip slip length along the flow exactly (same slip method)', async () => {
    const s = (await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, bulkConcentration: 0 } })).json();
    const { surfactant: _s, bulkConcentration: _c, method: _m, slipMethod, ...design } = example;
    const slip = (await app.inject({ method: 'POST', url: '/v1/slip', payload: { ...design, method: slipMethod } })).json();
    expect(s.result.slipRetained).toBe(1);
    expect(s.result.slipLength).toBe(slip.result.slipLengthAlongFlow);
    expect(s.result.drag.dragReduction).toBeCloseTo(slip.result.drag.dragReduction, 12);
  });
  it('traces far below the CMC (8.2 mM for SDS) remove a large part of the slip (common practice, no source)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, bulkConcentration: '0.05 mM' } });
    expect(res.statusCode).toBe(200);
    expect(res.json().result.slipRetained).toBeLessThan(0.5);
    expect(res.json().result.drag.dragReduction).toBeLessThan(res.json().result.cleanDrag.dragReduction);
  });
  it('without oil–water data the air–water constants stand in, with a warning', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: example });
    expect(res.json().warnings.map((w: { code: string }) => w.code)).toContain('oil-water-constants-missing');
  });
  it('the interface solver answers where it used to return 422 "did not converge" (SDS at 100 Pa; the nonionic at 0.01 Pa)', async () => {
    for (const [id, wallShearStress] of [
      ['sds', 100],
      ['triton-x-100', 0.01],
    ] as const) {
      const payload = { ...example, flow: { kind: 'wall-shear', wallShearStress }, surfactant: { id }, bulkConcentration: '0.001 mM', method: 'solver' };
      const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload });
      expect(res.statusCode).toBe(200);
      const body = res.json();
      expect(body.result.points[0].method).toBe('solver');
      expect(body.result.slipRetained).toBeGreaterThanOrEqual(0);
      expect(body.result.slipRetained).toBeLessThanOrEqual(1);
      expect(body.warnings.map((w: { code: string }) => w.code)).not.toContain('solver-fallback-scaling');
    }
  });
  it('an unknown surfactant is 422 naming surfactant.id', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, surfactant: { id: 'soap-of-mystery' } } });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('surfactant.id');
  });
});

describe('GET /v1/surfactants', () => {
  it('lists SDS and a nonionic with sourced values per interface', async () => {
    const body = (await app.inject('/v1/surfactants')).json();
    const ids = body.surfactants.map((s: { id: string }) => s.id);
    expect(ids).toContain('sds');
    expect(ids).toContain('triton-x-100');
    expect(body.references.length).toBeGreaterThan(0);
  });
});
