import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';
import { surfactantCalculation } from '../../../src/api/routes/surfactant.js';
import { runInline } from '../../../src/api/calculation.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const example = surfactantCalculation.example as Record<string, unknown> & { waterQuality: Record<string, unknown> };

describe('POST /v1/surfactant', () => {
  it('clean limit: zero concentration reproduces the /v1/slip slip length along the flow exactly (same design, same slip method)', async () => {
    const s = (await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, waterQuality: { ...example.waterQuality, bulkConcentration: 0 } } })).json();
    const slip = (await app.inject({ method: 'POST', url: '/v1/slip', payload: example })).json();
    expect(s.result.slipRetained).toBe(1);
    expect(s.result.slipLength).toBe(slip.result.slipLengthAlongFlow);
    expect(s.result.drag.dragReduction).toBeCloseTo(slip.result.drag.dragReduction, 12);
  });
  it('traces far below the CMC (8.1 mM for SDS, SurfPro) remove a large part of the slip (common practice, no source)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, waterQuality: { ...example.waterQuality, bulkConcentration: '0.05 mM' } } });
    expect(res.statusCode).toBe(200);
    expect(res.json().result.slipRetained).toBeLessThan(0.5);
    expect(res.json().result.drag.dragReduction).toBeLessThan(res.json().result.cleanDrag.dragReduction);
  });
  it('without oil–water data the air–water constants stand in, with a warning', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: example });
    expect(res.json().warnings.map((w: { code: string }) => w.code)).toContain('oil-water-constants-missing');
    expect(res.json().inputs.waterQuality.surfactant).toEqual({ id: 'sds', name: 'sodium dodecyl sulfate', interfaceType: 'air-water' });
  });
  it('the interface solver answers where it used to return 422 "did not converge" (SDS at 100 Pa; the nonionic at 0.01 Pa)', async () => {
    for (const [id, wallShearStress] of [
      ['sds', 100],
      ['octylphenol-ethoxylate', 0.01],
    ] as const) {
      const payload = {
        ...example,
        flow: { kind: 'wall-shear', wallShearStress },
        waterQuality: { surfactant: { id }, bulkConcentration: '0.001 mM' },
        options: { ...(example.options as object), surfactantMethod: 'solver' },
      };
      const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload });
      expect(res.statusCode).toBe(200);
      const body = res.json();
      expect(body.result.points[0].method).toBe('solver');
      expect(body.result.slipRetained).toBeGreaterThanOrEqual(0);
      expect(body.result.slipRetained).toBeLessThanOrEqual(1);
      expect(body.warnings.map((w: { code: string }) => w.code)).not.toContain('solver-fallback-scaling');
    }
  });
  it('the solver path (finite oblique grooves, two concentrations) returns exactly the fields of the published schema', () => {
    const body = {
      ...example,
      texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '50 um', flowAngle: 30, grooveLength: '5 mm' },
      waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: ['0.001 mM', '0.01 mM'] },
      options: { method: 'closed-form', surfactantMethod: 'solver' },
    };
    const parsed = surfactantCalculation.response.safeParse(JSON.parse(JSON.stringify(runInline(surfactantCalculation, body))));
    expect(parsed.success, JSON.stringify(parsed.error?.issues.slice(0, 3))).toBe(true);
  });
  it('an unknown surfactant is 422 naming waterQuality.surfactant.id', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, waterQuality: { ...example.waterQuality, surfactant: { id: 'soap-of-mystery' } } } });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('waterQuality.surfactant.id');
  });
  it('no water quality → 422 missing required property naming waterQuality', async () => {
    const { waterQuality: _w, ...rest } = example;
    const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: rest });
    expect(res.statusCode).toBe(422);
    expect(res.json().errors[0].path).toBe('waterQuality');
  });
});
