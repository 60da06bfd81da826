import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';
import { retentionCalculation } from '../../../src/api/routes/retention.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const groove = { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um', grooveLength: '50 mm' };

describe('POST /v1/retention', () => {
  it('at a given interfacial shear the retained length does not depend on the lubricant viscosity: L∞·τ_i is invariant (Wexler, Jacobi & Stone 2015: L∞ = Δp_max/G with G ∝ τ_i)', async () => {
    const base = {
      texture: groove,
      workingFluid: { id: 'water' },
      flow: { kind: 'wall-shear', wallShearStress: '1 Pa', regime: 'turbulent' },
      contactAngles: { underWorkingFluid: { advancing: 30, receding: 0 } },
      interfacialTension: '20 mN/m',
      options: { duration: '1 h' },
    };
    const thin = (await app.inject({ method: 'POST', url: '/v1/retention', payload: { ...base, lubricant: { density: 900, viscosity: '5 mPa.s' } } })).json();
    const thick = (await app.inject({ method: 'POST', url: '/v1/retention', payload: { ...base, lubricant: { density: 900, viscosity: '50 mPa.s' } } })).json();
    expect(thin.result.retainedLength).toBeGreaterThan(0);
    // The more viscous lubricant slips less, so it feels more interfacial shear (from the slip solution).
    expect(thick.result.interfacialShearStress.value).toBeGreaterThan(thin.result.interfacialShearStress.value);
    const invariant = (r: { retainedLength: number; interfacialShearStress: { value: number } }) => r.retainedLength * r.interfacialShearStress.value;
    expect(invariant(thick.result) / invariant(thin.result)).toBeCloseTo(1, 6);
    expect(thin.result.timeline.length).toBeGreaterThan(10);
    expect(thin.inputs.options).toEqual({ method: 'auto', duration: 3600, initialFill: 1, targetFill: 0.9 });
  });
  it('the verdict is lifted to the envelope with its criterion', async () => {
    const body = (await app.inject({ method: 'POST', url: '/v1/retention', payload: retentionCalculation.example as object })).json();
    expect(body.verdict.passes).toBe(body.result.retainedFraction >= 0.9);
    expect(body.verdict.criterion).toMatch(/target fill 0.9/);
    expect(body.result.verdict).toBeUndefined();
  });
  it('no groove length and no segment length → 422 missing required property naming texture.grooveLength', async () => {
    const example = retentionCalculation.example as { texture: Record<string, unknown> };
    const { grooveLength: _g, ...texture } = example.texture;
    const res = await app.inject({ method: 'POST', url: '/v1/retention', payload: { ...example, texture } });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('texture.grooveLength');
  });
  it('an inclined wall without the down-slope direction → 422 naming orientation.downslope', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/retention', payload: { ...(retentionCalculation.example as object), orientation: { inclination: 20, facing: 'up' } } });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('orientation.downslope');
  });
});
