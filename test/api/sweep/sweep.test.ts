/**
 * POST /v1/sweep. The witness of every value in a sweep is the single-point
 * endpoint: a sampled row must equal what POST /v1/<calculation> answers for
 * that point's document, to the last bit (same code path, so no tolerance).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';
import { SweepResponseSchema } from '../../../src/api/sweep/openapi.js';

const design = {
  workingFluid: { id: 'water', temperature: '20 degC' },
  lubricant: { id: 'n-hexadecane', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
  options: { method: 'closed-form' },
};
const velocities = ['0.2 m/s', '0.5 m/s', '1 m/s', '2 m/s'];
const widths = ['10 um', '40 um', '80 um'];
const grid = {
  design,
  axes: [
    { path: 'flow.bulkVelocity', values: velocities },
    { path: 'texture.grooveWidth', values: widths },
  ],
};

/** The design of grid point i (last axis fastest) with the raw unit strings, as a person would post it. */
function pointDesign(i: number): Record<string, unknown> {
  const v = velocities[Math.floor(i / widths.length)]!;
  const w = widths[i % widths.length]!;
  return { ...design, flow: { ...design.flow, bulkVelocity: v }, texture: { ...design.texture, grooveWidth: w } };
}

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp({ sweepMaxPoints: 50 });
});
afterAll(async () => {
  await app.close();
});

const sweep = (body: unknown, accept = 'application/json') => app.inject({ method: 'POST', url: '/v1/sweep', payload: body as object, headers: { accept } });

describe('CSV', () => {
  it('parses with a standard CSV parser; the header names columns with SI units; sampled rows equal POST /v1/flow', async () => {
    const res = await sweep({ ...grid, calculation: 'flow' }, 'text/csv');
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    const records = parse(res.body, { columns: true }) as Record<string, string>[];
    expect(records).toHaveLength(12);
    expect(Object.keys(records[0]!)).toEqual([
      'index',
      'flow.bulkVelocity (m/s)',
      'texture.grooveWidth (m)',
      'result.wallShearStress (Pa)',
      'result.frictionVelocity (m/s)',
      'result.viscousLength (m)',
      'result.reynoldsNumber',
      'result.regime',
      'warnings',
      'error',
    ]);
    for (const i of [0, 4, 11]) {
      const single = (await app.inject({ method: 'POST', url: '/v1/flow', payload: pointDesign(i) })).json();
      const row = records[i]!;
      expect(Number(row.index)).toBe(i);
      expect(Number(row['flow.bulkVelocity (m/s)'])).toBe(single.inputs.flow.bulkVelocity);
      expect(Number(row['result.wallShearStress (Pa)'])).toBe(single.result.wallShearStress);
      expect(Number(row['result.viscousLength (m)'])).toBe(single.result.viscousLength);
      expect(row['result.regime']).toBe(single.result.regime);
      expect(row.error).toBe('');
    }
  });

  it('slip: chosen columns by path (nested and input echo) equal POST /v1/slip', async () => {
    const columns = ['result.slipLengthLongitudinal', 'result.drag.dragReduction', 'inputs.lubricant.viscosity.value'];
    const res = await sweep({ ...grid, calculation: 'slip', columns }, 'text/csv');
    const records = parse(res.body, { columns: true }) as Record<string, string>[];
    for (const i of [1, 7]) {
      const single = (await app.inject({ method: 'POST', url: '/v1/slip', payload: pointDesign(i) })).json();
      expect(Number(records[i]!['result.slipLengthLongitudinal (m)'])).toBe(single.result.slipLengthLongitudinal);
      expect(Number(records[i]!['result.drag.dragReduction'])).toBe(single.result.drag.dragReduction);
      expect(Number(records[i]!['inputs.lubricant.viscosity.value'])).toBe(single.inputs.lubricant.viscosity.value);
    }
  });

  it('assess: default columns (verdict, limiting mechanism, margins) equal POST /v1/assess; sensitivities only when the design asks', async () => {
    const body = { calculation: 'assess', design, axes: [{ path: 'texture.grooveWidth', values: widths }] };
    const json = (await sweep(body)).json();
    SweepResponseSchema.parse(json);
    expect(json.columns.map((c: { name: string }) => c.name)).toContain('result.mechanisms.slipAndDrag.verdict.margin');
    for (const i of [0, 2]) {
      const single = (await app.inject({ method: 'POST', url: '/v1/assess', payload: { ...design, texture: { ...design.texture, grooveWidth: widths[i] } } })).json();
      const values = json.points[i].values;
      expect(values['result.overall.verdict']).toBe(single.result.overall.verdict);
      expect(values['result.overall.limitingMechanism']).toBe(single.result.overall.limitingMechanism);
      expect(values['result.mechanisms.slipAndDrag.verdict.margin']).toBe(single.result.mechanisms.slipAndDrag.verdict.margin);
      expect(values['result.mechanisms.waves.verdict.margin']).toBe(single.result.mechanisms.waves.verdict.margin);
      // The single endpoint computes sensitivities by default; a sweep point does not.
      expect(single.result.sensitivities).not.toBeNull();
    }
    const columns = ['result.sensitivities.relativeStep'];
    const off = (await sweep({ ...body, columns })).json();
    expect(off.points.map((p: { values: Record<string, unknown> }) => p.values['result.sensitivities.relativeStep'])).toEqual([null, null, null]);
    const asked = { ...body, columns, design: { ...design, options: { ...design.options, marginSensitivities: { enabled: true } } }, axes: [{ path: 'texture.grooveWidth', values: ['40 um'] }] };
    expect((await sweep(asked)).json().points[0].values['result.sensitivities.relativeStep']).toBe(0.02);
  }, 120_000);

  it('a failing point is a row with its problem title in the error column; the sweep goes on', async () => {
    const body = { calculation: 'flow', design, axes: [{ path: 'texture.grooveWidth', values: ['20 um', '150 um', '60 um'] }] };
    const records = parse((await sweep(body, 'text/csv')).body, { columns: true }) as Record<string, string>[];
    expect(records.map((r) => r.error)).toEqual(['', 'The request is not valid', '']);
    expect(records[1]!['result.wallShearStress (Pa)']).toBe('');
    expect(Number(records[2]!['result.wallShearStress (Pa)'])).toBeGreaterThan(0);
    const json = (await sweep(body)).json();
    // The answer is what the OpenAPI document says it is.
    SweepResponseSchema.parse(json);
    expect(json.failed).toBe(1);
    expect(json.points[1].problem.errors[0].path).toBe('texture.grooveWidth');
  });
});

describe('axes, order and shards', () => {
  it('grid order: first axis slowest; zip pairs the i-th values; log range has exact ends and a constant ratio', async () => {
    const g = (await sweep({ ...grid, calculation: 'flow' })).json();
    expect(g.points.map((p: { values: Record<string, number> }) => p.values['texture.grooveWidth']).slice(0, 4)).toEqual([1e-5, 4e-5, 8e-5, 1e-5]);
    const zip = {
      calculation: 'flow',
      design,
      combine: 'zip',
      axes: [
        { path: 'flow.bulkVelocity', range: { from: '0.1 m/s', to: '10 m/s', points: 5, spacing: 'log' } },
        { path: 'flow.height', values: ['1 mm', '2 mm', '4 mm', '8 mm', '16 mm'] },
      ],
    };
    const z = (await sweep(zip)).json();
    const u = z.points.map((p: { values: Record<string, number> }) => p.values['flow.bulkVelocity']);
    // Log spacing by definition (common practice, no source): ends as given, equal ratios between neighbours.
    expect(u[0]).toBe(0.1);
    expect(u[4]).toBe(10);
    for (let k = 1; k < 5; k++) expect(u[k] / u[k - 1]).toBeCloseTo(10 ** 0.5, 12);
    expect(z.points[3].values['flow.height']).toBe(0.008);
  });

  it('shards concatenated equal the whole sweep (contiguous slices, sizes within one)', async () => {
    const whole = (await sweep({ ...grid, calculation: 'flow' })).json();
    const parts = [];
    for (let index = 0; index < 5; index++) parts.push((await sweep({ ...grid, calculation: 'flow', shard: { index, count: 5 } })).json());
    expect(parts.flatMap((p) => p.points)).toEqual(whole.points);
    expect(parts.map((p) => p.points.length)).toEqual([2, 2, 3, 2, 3]);
    expect(new Set(parts.map((p) => p.sweepId))).toEqual(new Set([whole.sweepId]));
  });

  it('a lubricant by catalogue id is an axis too', async () => {
    const res = (await sweep({ calculation: 'slip', design, axes: [{ path: 'lubricant.id', values: ['n-hexadecane', 'n-decane'] }], columns: ['inputs.lubricant.viscosity.value'] })).json();
    expect(res.failed).toBe(0);
    expect(res.points[0].values['inputs.lubricant.viscosity.value']).not.toBe(res.points[1].values['inputs.lubricant.viscosity.value']);
  });
});

describe('refusals', () => {
  it('over the point limit: 413 naming the limit and how to shard; a shard under it passes', async () => {
    const body = { calculation: 'flow', design, axes: [{ path: 'flow.bulkVelocity', range: { from: 0.1, to: 2, points: 120 } }] };
    const res = await sweep(body);
    expect(res.statusCode).toBe(413);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    expect(res.json().detail).toMatch(/120 points asked, at most 50 per request/);
    expect(res.json().errors[0].path).toBe('axes');
    expect((await sweep({ ...body, shard: { index: 2, count: 3 } })).statusCode).toBe(200);
  });

  it('422 naming the field: unknown path, wrong unit, unknown calculation, unknown column, unequal zip, shard index', async () => {
    const cases: [unknown, string][] = [
      [{ calculation: 'flow', design, axes: [{ path: 'texture.grooveWidht', values: [1e-5] }] }, 'axes[0].path'],
      [{ calculation: 'flow', design, axes: [{ path: 'texture.grooveWidth', values: ['10 um', '3 m/s'] }] }, 'axes[0].values[1]'],
      [{ calculation: 'nonsense', design, axes: [{ path: 'texture.grooveWidth', values: [1e-5] }] }, 'calculation'],
      [{ calculation: 'flow', design, axes: [{ path: 'texture.grooveWidth', values: [1e-5] }], columns: ['result.nothing'] }, 'columns[0]'],
      [{ calculation: 'flow', design, combine: 'zip', axes: [{ path: 'flow.height', values: [0.01] }, { path: 'flow.bulkVelocity', values: [1, 2] }] }, 'axes[1]'],
      [{ calculation: 'flow', design, axes: [{ path: 'flow.regime', range: { from: 1, to: 2, points: 2 } }] }, 'axes[0].range.from'],
      [{ calculation: 'flow', design, axes: [{ path: 'flow.height', values: [0.01] }], shard: { index: 3, count: 3 } }, 'shard.index'],
    ];
    for (const [body, path] of cases) {
      const res = await sweep(body);
      expect(res.statusCode, JSON.stringify(body)).toBe(422);
      expect(res.json().errors.map((e: { path: string }) => e.path)).toContain(path);
    }
  });
});
