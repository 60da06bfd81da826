import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';
import { wavesCalculation } from '../../../src/api/routes/waves.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp({ workerThreads: 1 });
});
afterAll(async () => {
  await app.close();
});

const example = wavesCalculation.example as Record<string, unknown>;

describe('POST /v1/waves', () => {
  it('the documented example is calm with a positive margin, and its verdict is lifted to the envelope', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/waves', payload: example });
    expect(res.statusCode).toBe(200);
    const body = res.json();
    expect(body.verdict.passes).toBe(body.result.regime === 'calm');
    expect(body.verdict.margin).toBeGreaterThan(0);
    expect(body.result.verdict).toBeUndefined();
    // Λ = w⁺ We_τ^(1/3) by definition (common practice, no source)
    const s = body.result.scaling;
    expect(s.inertialCapillaryNumber).toBeCloseTo(s.grooveWidthPlus * Math.cbrt(s.frictionCapillaryNumber), 10);
  });
  it('cheap by default: computed inline, no regime map; the map only when asked for, through the pool, with the same verdict', async () => {
    expect(typeof wavesCalculation.heavy === 'function' && wavesCalculation.heavy({ ...example } as never)).toBe(false);
    expect(typeof wavesCalculation.heavy === 'function' && wavesCalculation.heavy({ ...example, options: { map: true } } as never)).toBe(true);
    const plain = (await app.inject({ method: 'POST', url: '/v1/waves', payload: example })).json();
    expect(plain.result.map).toBeUndefined();
    const mapped = (await app.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, options: { map: true } } })).json();
    expect(mapped.result.map.regimes.length).toBe(24);
    const resolved = (await app.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, options: { mapResolution: 5 } } })).json();
    expect(resolved.result.map.regimes.length).toBe(5);
    // The map changes nothing else.
    const { map: _map, ...withoutMap } = mapped.result;
    expect(withoutMap).toEqual(plain.result);
    expect(mapped.verdict).toEqual(plain.verdict);
  });
  it('no interfacial tension and no way to estimate it → 422 missing required property naming interfacialTension', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, lubricant: { density: 900, viscosity: 0.01 } } });
    expect(res.statusCode).toBe(422);
    expect(res.json().title).toBe('A required property is missing');
    expect(res.json().errors[0].path).toBe('interfacialTension');
  });
  it('a downward-facing wall feels gravity against the interface (Rayleigh–Taylor load grows with width; physics)', async () => {
    const up = (await app.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, orientation: { inclination: 0, facing: 'up' } } })).json();
    const down = (await app.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, orientation: { inclination: 0, facing: 'down' } } })).json();
    expect(up.result.kelvinHelmholtz.normalGravity).toBeGreaterThan(0);
    expect(down.result.kelvinHelmholtz.normalGravity).toBeLessThan(0);
  });
});
