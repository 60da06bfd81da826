/**
 * GET /v1/fluids and GET /v1/surfactants — the built-in catalogues with every value's unit, range and source.
 * A catalogue is fixed once the service has started: it is serialised once, its ETag is the SHA-256 of that body,
 * and a client that sends the tag back gets 304.
 */
import { createHash } from 'node:crypto';
import type { FastifyInstance } from 'fastify';
import { catalogueListing } from '../../materials/index.js';
import { surfactantListing } from '../../materials/surfactants.js';
import { safeStringify } from '../envelope.js';
import { etagMatches, sendNotModified } from '../plugins/result-cache.js';

export default async function catalogueRoutes(app: FastifyInstance, options: { apiKeysConfigured: boolean }) {
  // Behind API keys a shared cache must not hand the catalogue to callers without one.
  const cacheControl = `${options.apiKeysConfigured ? 'private' : 'public'}, max-age=300`;
  const serve = (path: string, listing: unknown) => {
    const body = Buffer.from(safeStringify(listing));
    const etag = `"${createHash('sha256').update(body).digest('hex')}"`;
    app.get(path, async (request, reply) => {
      if (etagMatches(request.headers['if-none-match'], etag)) return sendNotModified(reply, etag, cacheControl);
      return reply.header('etag', etag).header('cache-control', cacheControl).type('application/json; charset=utf-8').send(body);
    });
  };
  serve('/v1/fluids', catalogueListing());
  serve('/v1/surfactants', surfactantListing());
}
