/** GET /v1/fluids — the built-in fluid catalogue with every value's unit, range and source. */
import type { FastifyInstance } from 'fastify';
import { catalogueListing } from '../../materials/index.js';

export default async function catalogueRoutes(app: FastifyInstance) {
  const fluids = { fluids: catalogueListing() };
  app.get('/v1/fluids', async (_request, reply) => {
    reply.header('cache-control', 'public, max-age=3600');
    return fluids;
  });
}
