import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { readFileSync } from 'node:fs';
import { makeApp } from './helpers.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const groove = { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' };

describe('POST /v1/wetting', () => {
  it('groove critical angle cos θ_c = w/(w + 2d) = 5/9, θ_c = 56.25° (Bico, Thiele & Quéré 2002, specialised to grooves)', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/wetting',
      payload: { texture: groove, lubricant: { id: 'n-decane' }, workingFluid: { id: 'water' }, contactAngles: { underWorkingFluid: { advancing: 40, receding: 15 } } },
    });
    expect(res.statusCode).toBe(200);
    expect(res.json().result.criticalAngle).toBeCloseTo((Math.acos(5 / 9) * 180) / Math.PI, 8);
  });
  it('a lubricant at 120° under water is not-wetting and the verdict says so (Smith et al. 2013 criterion θ > θ_c)', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/wetting',
      payload: { texture: groove, lubricant: { id: 'n-decane' }, workingFluid: { id: 'water' }, contactAngles: { underWorkingFluid: { advancing: 130, receding: 110, equilibrium: 120 } } },
    });
    expect(res.json().result.state).toBe('not-wetting');
    expect(res.json().verdict.passes).toBe(false);
  });
  it('receding above advancing → 422 naming the receding angle', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/wetting',
      payload: { texture: groove, lubricant: { id: 'n-decane' }, workingFluid: { id: 'water' }, contactAngles: { underWorkingFluid: { advancing: 10, receding: 30 } } },
    });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('contactAngles.underWorkingFluid.receding');
  });
});

describe('POST /v1/retention', () => {
  it('at a given interfacial shear the retained length does not depend on the lubricant viscosity: L∞·τ_i is invariant (Wexler, Jacobi & Stone 2015: L∞ = Δp_max/G with G ∝ τ_i)', async () => {
    const base = {
      texture: groove,
      workingFluid: { id: 'water' },
      flow: { kind: 'wall-shear', wallShearStress: '1 Pa', regime: 'turbulent' },
      contactAngles: { underWorkingFluid: { advancing: 30, receding: 0 } },
      interfacialTension: '20 mN/m',
      grooveLength: '50 mm',
      duration: '1 h',
    };
    const thin = (await app.inject({ method: 'POST', url: '/v1/retention', payload: { ...base, lubricant: { density: 900, viscosity: '5 mPa.s' } } })).json();
    const thick = (await app.inject({ method: 'POST', url: '/v1/retention', payload: { ...base, lubricant: { density: 900, viscosity: '50 mPa.s' } } })).json();
    expect(thin.result.retainedLength).toBeGreaterThan(0);
    // The more viscous lubricant slips less, so it feels more interfacial shear (from the slip solution).
    expect(thick.result.interfacialShearStress.value).toBeGreaterThan(thin.result.interfacialShearStress.value);
    const invariant = (r: { retainedLength: number; interfacialShearStress: { value: number } }) => r.retainedLength * r.interfacialShearStress.value;
    expect(invariant(thick.result) / invariant(thin.result)).toBeCloseTo(1, 6);
    expect(thin.result.timeline.length).toBeGreaterThan(10);
  });
});

describe('POST /v1/heat', () => {
  it('a conductive lubricant in a low-conductivity solid raises laminar heat transfer by about 20 % (common practice, no source)', async () => {
    const body = JSON.parse(readFileSync(new URL('../../examples/heat-worked-example.json', import.meta.url), 'utf8'));
    const res = await app.inject({ method: 'POST', url: '/v1/heat', payload: { ...body, sensitivity: undefined } });
    expect(res.statusCode).toBe(200);
    const r = res.json().result;
    expect(r.nusseltRatio).toBeGreaterThan(1.1);
    expect(r.nusseltRatio).toBeLessThan(1.4);
    expect(r.thermalSlipLength).toBeLessThan(0);
  });
  it('smooth-wall reference of the example is Shah & London’s 140/17 = 8.235 for both walls under uniform flux', async () => {
    const body = JSON.parse(readFileSync(new URL('../../examples/heat-worked-example.json', import.meta.url), 'utf8'));
    const res = await app.inject({ method: 'POST', url: '/v1/heat', payload: { ...body, method: 'closed-form', sensitivity: undefined } });
    expect(res.json().result.nusseltSmooth).toBeCloseTo(140 / 17, 6);
  });
});
