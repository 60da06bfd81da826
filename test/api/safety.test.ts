/**
 * The safety notes of the catalogue entries a calculation used travel with
 * its response (`safety`, one per entry), not only in the catalogue; and the
 * built-in entries, written in the user-catalogue format, pass the same
 * schema a lab's file must pass.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { catalogueListing, getFluid } from '../../src/materials/catalogue.js';
import { UserFluidSchema } from '../../src/api/schemas/user-catalogue.js';
import { runCli } from '../../src/cli/main.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const channel = { kind: 'channel', height: '10 mm', bulkVelocity: '0.5 m/s' };
const texture = { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' };
const post = async (url: string, payload: object) => (await app.inject({ method: 'POST', url, payload })).json();

describe('safety notes in responses', () => {
  it('a response that uses a flammable lubricant carries its catalogue note; water has none', async () => {
    const body = await post('/v1/slip', { lubricant: { id: 'n-hexadecane' }, workingFluid: { id: 'water' }, flow: channel, texture, options: { method: 'closed-form' } });
    const note = getFluid('n-hexadecane')!.safety!;
    expect(note).toMatch(/Flammable/);
    expect(body.safety).toEqual([{ id: 'n-hexadecane', name: getFluid('n-hexadecane')!.name, parts: ['lubricant'], origin: 'built-in', note }]);
  });

  it('only the parts the question used count: /v1/flow on the same design names no lubricant', async () => {
    const body = await post('/v1/flow', { lubricant: { id: 'n-hexadecane' }, workingFluid: { id: 'water' }, flow: channel, texture });
    expect(body.safety).toEqual([]);
  });

  it('one note per entry, naming every part that uses it (deduplicated)', async () => {
    const body = await post('/v1/slip', { lubricant: { id: 'n-decane' }, workingFluid: { id: 'n-decane' }, flow: channel, texture, options: { method: 'closed-form' } });
    expect(body.safety).toHaveLength(1);
    expect(body.safety[0]).toMatchObject({ id: 'n-decane', parts: ['lubricant', 'workingFluid'] });
  });

  it('the liquid-metal lubricant warns about aluminium; the CLI prints the same list', () => {
    const design = JSON.stringify({ lubricant: { id: 'gallium', temperature: '40 degC' }, workingFluid: { id: 'water', temperature: '40 degC' }, flow: channel, texture, options: { method: 'closed-form' } });
    const out = runCli(['slip', 'design.json'], () => design, {});
    expect(out.code).toBe(0);
    const safety = JSON.parse(out.stdout).safety;
    expect(safety.map((s: { id: string }) => s.id)).toEqual(['gallium']);
    expect(safety[0].note).toMatch(/aluminium/);
  });
});

describe('the user-catalogue schema and the built-in records', () => {
  it('accepts every built-in fluid written in the file format (value at the reference temperature, the source range)', () => {
    const { fluids, references } = catalogueListing();
    const citation = new Map(references.map((r) => [r.key, r.citation]));
    for (const fluid of fluids) {
      const properties = Object.fromEntries(
        Object.entries(fluid.properties).map(([name, p]) => [name, { value: p!.value, validRange: p!.validRange, source: { citation: citation.get(p!.source)! } }]),
      );
      const entry = {
        id: fluid.id,
        name: fluid.name,
        role: fluid.role,
        description: fluid.description,
        source: { citation: citation.get(fluid.properties.density!.source)! },
        referenceTemperature: fluid.referenceTemperature,
        ...(fluid.freezingPoint === null ? {} : { freezingPoint: fluid.freezingPoint }),
        ...(fluid.boilingPoint === null ? {} : { boilingPoint: fluid.boilingPoint }),
        ...(fluid.safety === null ? {} : { safety: fluid.safety }),
        properties,
      };
      const parsed = UserFluidSchema.safeParse(entry);
      expect(parsed.success, `${fluid.id}: ${JSON.stringify(parsed.error?.issues)}`).toBe(true);
    }
  });
});
