/** GET /openapi.json and the interactive docs at GET /docs. */
import type { FastifyInstance } from 'fastify';
import swagger from '@fastify/swagger';
import swaggerUi from '@fastify/swagger-ui';
import { buildOpenApiDocument } from '../openapi.js';

export default async function docsPlugin(app: FastifyInstance) {
  const document = buildOpenApiDocument();
  await app.register(swagger, { mode: 'static', specification: { document: document as never } });
  await app.register(swaggerUi, { routePrefix: '/docs', uiConfig: { deepLinking: true }, staticCSP: true });
  app.get('/openapi.json', async () => document);
}
