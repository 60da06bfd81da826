import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';

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
  lubricant: { id: 'n-hexadecane', temperature: '25 degC' },
  workingFluid: { id: 'water', temperature: '25 degC' },
  flow: { kind: 'wall-shear', wallShearStress: '1 Pa', regime: 'laminar' },
};

describe('POST /v1/slip', () => {
  it('shear-free limit check through the API: a near-inviscid lubricant approaches Philip (1972) b = (P/π) ln sec(πφ/2)', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/slip',
      payload: { ...design, lubricant: { density: 1.2, viscosity: 1e-9, surfaceTension: 0.02 }, interfacialTension: 0.07, options: { method: 'closed-form' } },
    });
    expect(res.statusCode).toBe(200);
    const philip = (100e-6 / Math.PI) * Math.log(1 / Math.cos(Math.PI / 4));
    expect(res.json().result.slipLengthLongitudinal / philip).toBeCloseTo(1, 3);
    expect(res.json().inputs.options.method).toBe('closed-form');
  });
  it('field solver through the worker pool agrees with itself inline and reports its stats', async () => {
    const body = { ...design, options: { method: 'field' } };
    const inline = (await app.inject({ method: 'POST', url: '/v1/slip', payload: body })).json();
    const viaPool = (await pooled.inject({ method: 'POST', url: '/v1/slip', payload: body })).json();
    expect(viaPool.result.method).toBe('field');
    expect(viaPool.result.slipLengthLongitudinal).toBe(inline.result.slipLengthLongitudinal);
    expect(viaPool.result.closedFormError.slipLengthLongitudinal.source).toBe('measured');
  });
  it('a wide groove under strong shear carries the wavy-interface warning on the drag result', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/slip',
      payload: { ...design, texture: { grooveWidth: '2 mm', pitch: '3 mm', grooveDepth: '0.2 mm' }, flow: { kind: 'wall-shear', wallShearStress: '50 Pa' }, interfacialTension: '5 mN/m', options: { method: 'closed-form' } },
    });
    expect(res.statusCode).toBe(200);
    expect(res.json().warnings.map((w: { code: string }) => w.code)).toContain('wavy-interface-drag-unreliable');
  });
  it('without a lubricant → 422 missing required property naming lubricant', async () => {
    const { lubricant: _l, ...rest } = design;
    const res = await app.inject({ method: 'POST', url: '/v1/slip', payload: rest });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('lubricant');
  });
});
