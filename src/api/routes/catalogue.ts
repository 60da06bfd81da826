/** GET /v1/fluids and GET /v1/surfactants — the built-in catalogues with every value's unit, range and source. */
import type { FastifyInstance } from 'fastify';
import { catalogueListing } from '../../materials/index.js';
import { surfactantListing } from '../../materials/surfactants.js';

export default async function catalogueRoutes(app: FastifyInstance) {
  const fluids = catalogueListing();
  app.get('/v1/fluids', async (_request, reply) => {
    reply.header('cache-control', 'public, max-age=3600');
    return fluids;
  });
  const surfactants = surfactantListing();
  app.get('/v1/surfactants', async (_request, reply) => {
    reply.header('cache-control', 'public, max-age=3600');
    return surfactants;
  });
}
