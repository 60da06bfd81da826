import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { wavesCalculation } from '../../src/api/routes/waves.js';

let app: FastifyInstance;
let pooled: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
  // One real worker thread: heavy solves cross a thread boundary as in production.
  pooled = await makeApp({ workerThreads: 1 });
});
afterAll(async () => {
  await app.close();
  await pooled.close();
});

const design = {
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '50 um' },
  lubricant: { fluid: 'n-hexadecane', temperature: '25 degC' },
  workingFluid: { fluid: 'water', temperature: '25 degC' },
  flow: { kind: 'wall-shear', wallShearStress: '1 Pa', regime: 'laminar' },
};

describe('POST /v1/slip', () => {
  it('shear-free limit check through the API: a near-inviscid lubricant approaches Philip (1972) b = (P/π) ln sec(πφ/2)', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/slip',
      payload: { ...design, lubricant: { density: 1.2, viscosity: 1e-9, surfaceTension: 0.02 }, interfacialTension: 0.07, method: 'closed-form' },
    });
    expect(res.statusCode).toBe(200);
    const philip = (100e-6 / Math.PI) * Math.log(1 / Math.cos(Math.PI / 4));
    expect(res.json().result.slipLengthLongitudinal / philip).toBeCloseTo(1, 3);
  });
  it('field solver through the worker pool agrees with itself inline and reports its stats', async () => {
    const body = { ...design, method: 'field' };
    const inline = (await app.inject({ method: 'POST', url: '/v1/slip', payload: body })).json();
    const viaPool = (await pooled.inject({ method: 'POST', url: '/v1/slip', payload: body })).json();
    expect(viaPool.result.methodUsed).toBe('field');
    expect(viaPool.result.slipLengthLongitudinal).toBe(inline.result.slipLengthLongitudinal);
  });
  it('a wide groove under strong shear carries the wavy-interface warning on the drag result', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/slip',
      payload: { ...design, texture: { grooveWidth: '2 mm', pitch: '3 mm', grooveDepth: '0.2 mm' }, flow: { kind: 'wall-shear', wallShearStress: '50 Pa' }, interfacialTension: '5 mN/m', method: 'closed-form' },
    });
    expect(res.statusCode).toBe(200);
    expect(res.json().warnings.map((w: { code: string }) => w.code)).toContain('wavy-interface-drag-unreliable');
  });
});

describe('POST /v1/waves', () => {
  it('the documented example is calm with a positive margin, and its verdict is lifted to the envelope', async () => {
    const res = await pooled.inject({ method: 'POST', url: '/v1/waves', payload: wavesCalculation.example as object });
    expect(res.statusCode).toBe(200);
    const body = res.json();
    expect(body.verdict.calm).toBe(body.result.regime === 'calm');
    expect(body.result.verdict).toBeUndefined();
    // Λ = w⁺ We_τ^(1/3) by definition (common practice, no source)
    const wu = body.result.wallUnits;
    expect(wu.inertialCapillaryNumber).toBeCloseTo(wu.grooveWidthPlus * Math.cbrt(wu.frictionCapillaryNumber), 10);
  });
  it('cheap by default: computed inline, no regime map; the map only when asked for, through the pool, with the same verdict', async () => {
    const example = wavesCalculation.example as object;
    expect(typeof wavesCalculation.heavy === 'function' && wavesCalculation.heavy({ ...example } as never)).toBe(false);
    expect(typeof wavesCalculation.heavy === 'function' && wavesCalculation.heavy({ ...example, map: true } as never)).toBe(true);
    const plain = (await app.inject({ method: 'POST', url: '/v1/waves', payload: example })).json();
    expect(plain.result.map).toBeUndefined();
    const mapped = (await pooled.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, map: true } })).json();
    expect(mapped.result.map.regimes.length).toBe(24);
    const resolved = (await pooled.inject({ method: 'POST', url: '/v1/waves', payload: { ...example, mapResolution: 5 } })).json();
    expect(resolved.result.map.regimes.length).toBe(5);
    // The map changes nothing else.
    const { map: _map, ...withoutMap } = mapped.result;
    expect(withoutMap).toEqual(plain.result);
    expect(mapped.verdict).toEqual(plain.verdict);
  });
  it('no interfacial tension and no way to estimate it → 422 naming interfacialTension', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/waves',
      payload: { ...design, lubricant: { density: 900, viscosity: 0.01 } },
    });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('interfacialTension');
  });
});
