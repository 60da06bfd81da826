import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { example, makeApp } from '../helpers.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const worked = example('heat-worked-example.json') as Record<string, unknown> & { options: Record<string, unknown> };

describe('POST /v1/heat', () => {
  it('a conductive lubricant in a low-conductivity solid raises laminar heat transfer by about 20 % (common practice, no source)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/heat', payload: { ...worked, options: { ...worked.options, sensitivity: undefined } } });
    expect(res.statusCode).toBe(200);
    const r = res.json().result;
    expect(r.nusseltRatio).toBeGreaterThan(1.1);
    expect(r.nusseltRatio).toBeLessThan(1.4);
    expect(r.thermalSlipLength).toBeLessThan(0);
    expect(r.heatFluxRatio).toBeGreaterThan(1);
  });
  it('smooth-wall reference of the example is Shah & London’s 140/17 = 8.235 for both walls under uniform flux', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/heat', payload: { ...worked, options: { method: 'closed-form' } } });
    expect(res.json().result.nusseltSmooth).toBeCloseTo(140 / 17, 6);
  });
  it('a lubricant given without its specific heat → 422 missing required property naming lubricant.specificHeat (not an internal path)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/heat', payload: { ...worked, lubricant: { density: 900, viscosity: '10 mPa.s', thermalConductivity: 0.15 } } });
    expect(res.statusCode).toBe(422);
    expect(res.json().title).toBe('A required property is missing');
    expect(res.json().errors[0].path).toBe('lubricant.specificHeat');
  });
});
