/**
 * GET /openapi.json and the interactive docs at GET /docs.
 *
 * The served document says what this replica enforces: the API-key scheme and
 * the per-operation `security` (the lock icons of the docs page) appear only
 * when keys are configured. The committed openapi/openapi.json is the full
 * contract, with the key scheme.
 */
import type { FastifyInstance } from 'fastify';
import swagger from '@fastify/swagger';
import swaggerUi from '@fastify/swagger-ui';
import { buildOpenApiDocument } from '../openapi.js';

/** Title of the docs page (the browser tab and bookmarks show it). */
export const DOCS_TITLE = 'oilskin — API reference';

/** The word "oilskin" as the docs page's top-bar logo, in place of the docs library's own. */
const LOGO_SVG = `<svg xmlns="http://www.w3.org/2000/svg" width="120" height="32" viewBox="0 0 120 32"><text x="0" y="24" font-family="sans-serif" font-size="22" font-weight="600" fill="#ffffff">oilskin</text></svg>`;

/** The document without the API-key scheme and without per-operation security (no keys configured). */
export function withoutSecurity(document: Record<string, unknown>): Record<string, unknown> {
  const paths = document.paths as Record<string, Record<string, Record<string, unknown>>>;
  const open: Record<string, Record<string, Record<string, unknown>>> = {};
  for (const [path, item] of Object.entries(paths)) {
    open[path] = Object.fromEntries(
      Object.entries(item).map(([method, operation]) => {
        const { security: _security, ...rest } = operation;
        const responses = { ...(rest.responses as Record<string, unknown>) };
        delete responses['401'];
        return [method, { ...rest, responses }];
      }),
    );
  }
  const components = { ...(document.components as Record<string, unknown>) };
  delete components.securitySchemes;
  return { ...document, paths: open, components };
}

export default async function docsPlugin(app: FastifyInstance, options: { apiKeysConfigured: boolean }) {
  const full = buildOpenApiDocument();
  const document = options.apiKeysConfigured ? full : withoutSecurity(full);
  await app.register(swagger, { mode: 'static', specification: { document: document as never } });
  await app.register(swaggerUi, {
    routePrefix: '/docs',
    uiConfig: { deepLinking: true },
    staticCSP: true,
    theme: { title: DOCS_TITLE },
    logo: { type: 'image/svg+xml', content: Buffer.from(LOGO_SVG), href: '/docs' },
  });
  app.get('/openapi.json', async () => document);
}
