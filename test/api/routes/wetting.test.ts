import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const groove = { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' };
const design = { texture: groove, lubricant: { id: 'n-decane' }, workingFluid: { id: 'water' } };

describe('POST /v1/wetting', () => {
  it('groove critical angle cos θ_c = w/(w + 2d) = 5/9, θ_c = 56.25° (Bico, Thiele & Quéré 2002, specialised to grooves)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/wetting', payload: { ...design, contactAngles: { underWorkingFluid: { advancing: 40, receding: 15 } } } });
    expect(res.statusCode).toBe(200);
    expect(res.json().result.criticalAngle).toBeCloseTo((Math.acos(5 / 9) * 180) / Math.PI, 8);
    expect(res.json().inputs.interfacialTension.source).toBe('catalogue');
  });
  it('a lubricant at 120° under water is not-wetting and the verdict says so (Smith et al. 2013 criterion θ > θ_c)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/wetting', payload: { ...design, contactAngles: { underWorkingFluid: { advancing: 130, receding: 110, equilibrium: 120 } } } });
    const body = res.json();
    expect(body.result.state).toBe('not-wetting');
    expect(body.verdict.passes).toBe(false);
    expect(body.verdict.margin).toBeLessThan(0);
    expect(body.result.verdict).toBeUndefined();
  });
  it('receding above advancing → 422 naming the receding angle', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/wetting', payload: { ...design, contactAngles: { underWorkingFluid: { advancing: 10, receding: 30 } } } });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('contactAngles.underWorkingFluid.receding');
  });
  it('no contact angles → 422 "missing required property" naming contactAngles and the question', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/wetting', payload: design });
    expect(res.statusCode).toBe(422);
    expect(res.json().title).toBe('A required property is missing');
    expect(res.json().errors[0].path).toBe('contactAngles');
    expect(res.json().detail).toMatch(/wetting needs/);
  });
});
