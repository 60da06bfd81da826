/** The docs page and the served OpenAPI document: own title, lock icons only with keys, the safety caution. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { DOCS_TITLE } from '../../src/api/plugins/docs.js';

type Doc = {
  info: { title: string; description: string };
  components?: { securitySchemes?: Record<string, unknown> };
  paths: Record<string, Record<string, { security?: unknown[]; responses: Record<string, unknown> }>>;
};

let open: FastifyInstance;
let keyed: FastifyInstance;
beforeAll(async () => {
  open = await makeApp();
  keyed = await makeApp({ apiKeys: ['k-123'] });
});
afterAll(async () => {
  await open.close();
  await keyed.close();
});

async function page(app: FastifyInstance): Promise<string> {
  const res = await app.inject('/docs/');
  const html = res.statusCode === 302 ? await app.inject(String(res.headers.location)) : res;
  return html.body;
}

describe('docs page', () => {
  it("carries the service's own title, not the docs library's", async () => {
    for (const app of [open, keyed]) {
      const html = await page(app);
      expect(html).toContain(`<title>${DOCS_TITLE}</title>`);
      expect(html).not.toMatch(/<title>[^<]*swagger/i);
    }
  });
});

describe('served OpenAPI document', () => {
  it('has no key scheme and no per-operation security (so no lock icons) when no keys are configured', async () => {
    const doc = (await open.inject('/openapi.json')).json() as Doc;
    expect(doc.components?.securitySchemes).toBeUndefined();
    for (const [path, item] of Object.entries(doc.paths)) {
      for (const operation of Object.values(item)) {
        expect(operation.security, path).toBeUndefined();
        expect(operation.responses['401'], path).toBeUndefined();
      }
    }
  });
  it('declares the x-api-key scheme on the /v1 calculations when keys are configured', async () => {
    const doc = (await keyed.inject('/openapi.json')).json() as Doc;
    expect(doc.components?.securitySchemes?.apiKey).toEqual({ type: 'apiKey', in: 'header', name: 'x-api-key' });
    expect(doc.paths['/v1/flow']!.post!.security).toContainEqual({ apiKey: [] });
  });
  it('carries the safety caution in its description', async () => {
    const doc = (await open.inject('/openapi.json')).json() as Doc;
    expect(doc.info.title).toBe('oilskin');
    expect(doc.info.description).toMatch(/Caution/);
    expect(doc.info.description).toMatch(/not a design approval/);
    expect(doc.info.description).toMatch(/safety data sheets/);
  });
});
