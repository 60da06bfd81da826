/**
 * Problems that name the field and say what happened (missing, not valid,
 * physically impossible, outside the model, over the work limits, did not
 * converge), and the regression cases of unbounded work from tiny geometry,
 * over HTTP (inline) and from the CLI: the same guard everywhere.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { readFileSync } from 'node:fs';
import { makeApp } from './helpers.js';
import { problemFromError } from '../../src/api/calculation.js';
import { ConvergenceError } from '../../src/core/errors.js';
import { slipCalculation } from '../../src/api/routes/slip.js';
import { runCli } from '../../src/cli/main.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

async function post(url: string, payload: unknown) {
  const res = await app.inject({ method: 'POST', url, payload: payload as object });
  return { status: res.statusCode, body: res.json() as { type?: string; title?: string; detail?: string; errors?: { path: string; message: string }[]; warnings?: { code: string }[]; result?: Record<string, unknown> } };
}

const slipExample = slipCalculation.example as Record<string, Record<string, unknown>>;
const withGrooveWidth = (grooveWidth: unknown, method = 'auto') => ({ ...slipExample, texture: { ...slipExample.texture, grooveWidth }, options: { method } });

describe('problem titles say what happened and paths name the request field', () => {
  it('a pipe roughness larger than the diameter: physically impossible, naming flow.roughness (was a non-finite result with an empty path)', async () => {
    const { status, body } = await post('/v1/flow', { workingFluid: { id: 'water' }, flow: { kind: 'pipe', diameter: '10 mm', bulkVelocity: '2 m/s', roughness: '50 mm' } });
    expect(status).toBe(422);
    expect(body.title).toBe('The input is physically impossible');
    expect(body.errors?.[0].path).toBe('flow.roughness');
  });

  it('absurdly small flow quantities are refused naming the field (they underflowed to a non-finite result with an empty path)', async () => {
    const channel = { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' };
    for (const [flow, path] of [
      [{ ...channel, bulkVelocity: 1e-300 }, 'flow.bulkVelocity'],
      [{ ...channel, height: 1e-300 }, 'flow.height'],
      [{ kind: 'wall-shear', wallShearStress: 1e-300 }, 'flow.wallShearStress'],
    ] as const) {
      const { status, body } = await post('/v1/flow', { workingFluid: { id: 'water' }, flow });
      expect(status, path).toBe(422);
      expect(body.errors?.[0].path).toBe(path);
    }
  });

  it('a lubricant without a specific heat for /v1/heat: "A required property is missing", path as in the request', async () => {
    const heat = JSON.parse(readFileSync(new URL('../../examples/heat-worked-example.json', import.meta.url), 'utf8'));
    const { specificHeat: _dropped, ...lubricant } = heat.lubricant;
    const { status, body } = await post('/v1/heat', { ...heat, lubricant, options: { method: 'closed-form' } });
    expect(status).toBe(422);
    expect(body.title).toBe('A required property is missing');
    expect(body.type).toMatch(/missing-property$/);
    expect(body.errors?.[0].path).toBe('lubricant.specificHeat');
  });

  it('a required field left out of the body: missing, not "invalid"', async () => {
    const { texture: _texture, ...rest } = slipExample;
    const { status, body } = await post('/v1/slip', rest);
    expect(status).toBe(422);
    expect(body.title).toBe('A required property is missing');
    expect(body.errors?.map((e) => e.path)).toContain('texture');
  });

  it('a value of the wrong type: not valid', async () => {
    const { status, body } = await post('/v1/slip', withGrooveWidth(true));
    expect(status).toBe(422);
    expect(body.title).toBe('The request is not valid');
    expect(body.errors?.[0].path).toBe('texture.grooveWidth');
  });

  it('bulkConcentration by mass without a known molar mass names waterQuality.surfactant.molarMass; a wrong dimension lists every accepted form', async () => {
    const surfactant = (await import('../../src/api/routes/surfactant.js')).surfactantCalculation.example as object;
    const quality = (surfactant as { waterQuality: object }).waterQuality;
    // A surfactant given by its values has no catalogue molar mass: "1 mg/L" cannot be converted.
    const byValues = { name: 'lab surfactant', maximumSurfaceExcess: 3e-6, langmuirConstant: 0.2, bulkDiffusivity: 5e-10, gibbsPrefactor: 1 };
    for (const value of ['1 mg/L', ['0.1 mM', '1 ppm']]) {
      const { status, body } = await post('/v1/surfactant', { ...surfactant, waterQuality: { surfactant: byValues, bulkConcentration: value } });
      expect(status).toBe(422);
      const error = body.errors?.[0];
      expect(error?.path).toBe('waterQuality.surfactant.molarMass');
      expect(error?.message).toMatch(/mass concentration/);
      expect(error?.message).toMatch(/g\/mol/);
    }
    for (const [value, path] of [
      ['1 m/s', 'waterQuality.bulkConcentration'],
      [['0.1 mM', '1 m/s'], 'waterQuality.bulkConcentration[1]'],
    ] as const) {
      const { status, body } = await post('/v1/surfactant', { ...surfactant, waterQuality: { ...quality, bulkConcentration: value } });
      expect(status).toBe(422);
      const error = body.errors?.[0];
      expect(error?.path).toBe(path);
      expect(error?.message).toMatch(/wrong dimension/);
      expect(error?.message).toMatch(/mol\/m³/);
      expect(error?.message).toMatch(/0\.1 mM/);
      expect(error?.message).toMatch(/1 mg\/L/);
      expect(error?.message).toMatch(/1 ppm/);
    }
  });

  it('a solver that did not converge: its own title, the iteration count, and the request path', () => {
    const p = problemFromError(new ConvergenceError('groove-cell transverse solver did not converge', 400, 1e-3, 'scenario.texture.grooveDepth'));
    expect(p.title).toBe('The solver did not converge');
    expect(p.iterations).toBe(400);
    expect(p.errors?.[0].path).toBe('texture.grooveDepth');
  });
});

describe('regression: unbounded work from tiny geometry (the /v1/slip example with grooveWidth 4.755668529426223e-21)', () => {
  const tiny = withGrooveWidth(4.755668529426223e-21);

  it('HTTP, inline: 422 naming texture.grooveWidth and the 1 nm bound, before any solve', async () => {
    const { status, body } = await post('/v1/slip', tiny);
    expect(status).toBe(422);
    expect(body.title).toBe('The input is outside the range of the model');
    expect(body.errors?.[0].path).toBe('texture.grooveWidth');
    expect(body.errors?.[0].message).toMatch(/1 nm/);
  });

  it('CLI: exit 2 with the same problem', () => {
    const out = runCli(['slip', 'tiny.json'], () => JSON.stringify(tiny));
    expect(out.code).toBe(2);
    const problem = JSON.parse(out.stderr);
    expect(problem.errors[0].path).toBe('texture.grooveWidth');
  });

  it('1 nm, 10 nm and 0.1 µm grooves at a 40 µm pitch: a result from the closed form, with the continuum caution below 100 nm and the reason the field solver did not run', async () => {
    for (const [width, continuum] of [
      ['1 nm', true],
      ['10 nm', true],
      ['0.1 um', false],
    ] as const) {
      const { status, body } = await post('/v1/slip', withGrooveWidth(width));
      expect(status, width).toBe(200);
      const codes = body.warnings?.map((w) => w.code) ?? [];
      expect(codes.includes('continuum-limit'), width).toBe(continuum);
      expect(codes, width).toContain('field-solver-unavailable');
      expect(body.result?.method).toBe('closed-form');
    }
  });

  it('method "field" asked for a groove too narrow for its grid: 422 over the work limits, naming texture.grooveWidth and the limit', async () => {
    const { status, body } = await post('/v1/slip', withGrooveWidth('0.1 um', 'field'));
    expect(status).toBe(422);
    expect(body.title).toBe('The calculation would exceed the work limits of the service');
    expect(body.errors?.[0].path).toBe('texture.grooveWidth');
    expect(body.errors?.[0].message).toMatch(/0\.01/);
  });
});
