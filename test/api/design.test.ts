/**
 * One design document for every endpoint, and typed results: the same full
 * document answers every calculation; every response (served, and the raw
 * compute output before serialisation) parses against its published strict
 * schema; every request example is a valid design document; the OpenAPI
 * document has no untyped object.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { runInline } from '../../src/api/calculation.js';
import { buildOpenApiDocument } from '../../src/api/openapi.js';
import { CALCULATIONS } from '../../src/api/routes/index.js';
import { DesignSchema } from '../../src/api/schemas/design.js';
import { example, hasNoNonFinite, makeApp } from './helpers.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const design = example('design.json');

describe('the same design document on every calculation endpoint', () => {
  it.each(CALCULATIONS.map((c) => [c.path, c] as const))('%s answers the full document with 200 and a response that parses against its schema', async (_path, calc) => {
    const res = await app.inject({ method: 'POST', url: calc.path, payload: design });
    expect(res.statusCode, res.body.slice(0, 300)).toBe(200);
    expect(hasNoNonFinite(res.body)).toBe(true);
    const parsed = calc.response.safeParse(res.json());
    expect(parsed.success, JSON.stringify(parsed.error?.issues.slice(0, 3))).toBe(true);
  });
});

describe('typed results: the raw output, before serialisation, has exactly the published fields', () => {
  for (const calc of CALCULATIONS) {
    it(`${calc.name}: its example and the full design`, () => {
      for (const body of [calc.example, design]) {
        const out = JSON.parse(JSON.stringify(runInline(calc, body)));
        const parsed = calc.response.safeParse(out);
        expect(parsed.success, JSON.stringify(parsed.error?.issues.slice(0, 3))).toBe(true);
      }
    });
  }
});

describe('request examples and missing parts', () => {
  it('every documented request example (routes and examples/) is a valid design document', () => {
    for (const body of [...CALCULATIONS.map((c) => c.example), design, example('flow-channel.json'), example('heat-worked-example.json'), example('waves-worked-example.json')]) {
      const parsed = DesignSchema.safeParse(body);
      expect(parsed.success, JSON.stringify(parsed.error?.issues.slice(0, 3))).toBe(true);
    }
  });
  it.each(CALCULATIONS.map((c) => [c.path, c] as const))('%s on an empty document → 422 missing required property naming a part and the question', async (_path, calc) => {
    const res = await app.inject({ method: 'POST', url: calc.path, payload: {} });
    expect(res.statusCode).toBe(422);
    const body = res.json();
    expect(body.title).toBe('A required property is missing');
    expect(body.errors[0].path).toMatch(/^(texture|lubricant|workingFluid|flow|contactAngles|waterQuality|solid)$/);
    expect(body.detail).toContain(`${calc.name} needs`);
  });
});

describe('the OpenAPI document', () => {
  const doc = buildOpenApiDocument() as {
    paths: Record<string, { post?: { requestBody: { content: Record<string, { schema: { $ref?: string } }> } } }>;
    components: { schemas: Record<string, unknown> };
  };
  it('every calculation takes the one Design component as its body', () => {
    for (const calc of CALCULATIONS) expect(doc.paths[calc.path].post!.requestBody.content['application/json'].schema.$ref).toBe('#/components/schemas/Design');
  });
  it('has no untyped object: every object schema lists its properties (or types its map values)', () => {
    const untyped: string[] = [];
    const walk = (node: unknown, path: string): void => {
      if (Array.isArray(node)) return node.forEach((n, i) => walk(n, `${path}[${i}]`));
      if (node === null || typeof node !== 'object') return;
      const schema = node as Record<string, unknown>;
      if (schema.type === 'object' && schema.properties === undefined && (schema.additionalProperties === undefined || schema.additionalProperties === true)) untyped.push(path);
      for (const [k, v] of Object.entries(schema)) walk(v, `${path}.${k}`);
    };
    walk(doc.components.schemas, 'components.schemas');
    walk(doc.paths, 'paths');
    expect(untyped).toEqual([]);
  });
});
