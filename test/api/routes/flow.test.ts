import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { makeApp } from '../helpers.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const scenario = {
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
};

describe('POST /v1/flow', () => {
  it('answers the 20 °C water channel with the envelope (Re_m about 10 000: common practice, no source)', async () => {
    const res = await request(app.server).post('/v1/flow').send(scenario).expect(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.headers['x-request-id']).toBeTruthy();
    const body = res.body;
    expect(body.result.regime).toBe('turbulent');
    expect(body.result.reynoldsNumber).toBeGreaterThan(9500);
    expect(body.result.reynoldsNumber).toBeLessThan(10500);
    // Dean (1978) at Re ≈ 9966: τ_w ≈ 3.65 Pa (computed from the formula)
    expect(body.result.wallShearStress).toBeCloseTo(3.65, 1);
    expect(body.result.wallUnits.grooveWidthPlus).toBeCloseTo(50e-6 / body.result.viscousLength, 8);
    expect(body.inputs.texture.grooveWidth).toBeCloseTo(50e-6, 15);
    expect(body.inputs.workingFluid.temperature).toBeCloseTo(293.15, 10);
    expect(body.provenance.inputsHash).toMatch(/^[0-9a-f]{64}$/);
    expect(body.references.map((r: { key: string }) => r.key)).toContain('dean1978');
    expect(Array.isArray(body.warnings)).toBe(true);
    expect(Array.isArray(body.assumptions)).toBe(true);
  });

  it('gives the same inputsHash for the same design written in different units', async () => {
    const a = await request(app.server).post('/v1/flow').send(scenario).expect(200);
    const b = await request(app.server)
      .post('/v1/flow')
      .send({ ...scenario, flow: { bulkVelocity: 1, height: 0.01, kind: 'channel' }, texture: { pitch: 1e-4, grooveDepth: '0.02 mm', grooveWidth: 5e-5 } })
      .expect(200);
    expect(b.body.provenance.inputsHash).toBe(a.body.provenance.inputsHash);
  });

  it('accepts the request id a client sends and echoes it', async () => {
    const res = await request(app.server).post('/v1/flow').set('x-request-id', 'lims-run-42').send(scenario).expect(200);
    expect(res.headers['x-request-id']).toBe('lims-run-42');
  });

  it('accepts explicit fluid properties instead of a catalogue id, including kinematic viscosity in cSt', async () => {
    const res = await request(app.server)
      .post('/v1/flow')
      .send({ workingFluid: { density: 1000, kinematicViscosity: '1 cSt' }, flow: { kind: 'pipe', diameter: '25 mm', bulkVelocity: '2 m/s' } })
      .expect(200);
    // Re = U D / ν = 2 · 0.025 / 1e-6 = 50 000 (exact arithmetic)
    expect(res.body.result.reynoldsNumber).toBeCloseTo(50000, 6);
    expect(res.body.inputs.workingFluid.viscosity).toEqual({ value: expect.closeTo(1e-3, 12), source: 'input (kinematic viscosity × density)' });
  });

  it('rejects a length given as a velocity with 422 naming the field', async () => {
    const res = await request(app.server)
      .post('/v1/flow')
      .send({ ...scenario, flow: { kind: 'channel', height: '1 m/s', bulkVelocity: '1 m/s' } })
      .expect(422);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.errors[0].path).toBe('flow.height');
    expect(res.body.errors[0].message).toMatch(/dimension/);
  });

  it('rejects a groove wider than its pitch with 422 naming texture.grooveWidth', async () => {
    const res = await request(app.server)
      .post('/v1/flow')
      .send({ ...scenario, texture: { grooveWidth: '120 um', pitch: '100 um', grooveDepth: '20 um' } })
      .expect(422);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain('texture.grooveWidth');
  });

  it('rejects hexadecane below its freezing point (18 °C) with 422 naming the temperature', async () => {
    const res = await request(app.server)
      .post('/v1/flow')
      .send({ ...scenario, workingFluid: { id: 'n-hexadecane', temperature: '10 degC' } })
      .expect(422);
    expect(res.body.errors[0].path).toBe('workingFluid.temperature');
  });

  it('rejects an unknown catalogue id with 422 naming workingFluid.id', async () => {
    const res = await request(app.server)
      .post('/v1/flow')
      .send({ ...scenario, workingFluid: { id: 'unobtainium' } })
      .expect(422);
    expect(res.body.errors[0].path).toBe('workingFluid.id');
  });
});
