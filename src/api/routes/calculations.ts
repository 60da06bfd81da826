/**
 * Registers every calculation as POST <path>; heavy ones go through the worker
 * pool. The 200 response is serialised from the calculation's typed response
 * schema (fastify compiles it), not by the app's generic serializer: fields the
 * schema does not list never reach the wire, and serialisation is faster.
 * Results carry their inputs hash as a strong ETag; the result cache
 * (plugins/result-cache.ts) answers If-None-Match and repeated requests.
 *
 * The JSON body parser of these routes keeps the request text beside the parsed
 * value: a request whose text was answered before is answered from the cache
 * before validation (the same text always parses and validates to the same
 * document, and only 200 answers are remembered), so a client that repeats a
 * request costs about what a bare route costs (bench/http.ts).
 */
import type { FastifyInstance, FastifyReply } from 'fastify';
import type { ZodType } from 'zod';
import { parseBody } from '../calculation.js';
import { envelope } from '../envelope.js';
import { ClientGoneError, type SolverPool } from '../pool.js';
import { computeCalculation } from '../worker.js';
import { ProblemError } from '../problem.js';
import { z } from '../schemas/zod.js';
import { CALCULATIONS } from './index.js';
import { etagMatches, sendNotModified, type CachedResult } from '../plugins/result-cache.js';

const JSON_TYPE = 'application/json; charset=utf-8';

declare module 'fastify' {
  interface FastifyRequest {
    /** The JSON request text as received (calculation routes only): the result cache's first key. */
    jsonText?: string;
  }
}

/** JSON Schema of a response schema, as fastify's serializer compiler takes it. */
export function responseJsonSchema(schema: ZodType): Record<string, unknown> {
  const { $schema: _dialect, ...json } = z.toJSONSchema(schema, { io: 'output', unrepresentable: 'any' }) as Record<string, unknown>;
  return json;
}

/** An AbortSignal that fires when the client closes its connection before the response is written. */
function clientGoneSignal(reply: FastifyReply): { signal: AbortSignal; release: () => void } {
  const controller = new AbortController();
  const response = reply.raw;
  const onClose = () => {
    if (!response.writableFinished) controller.abort();
  };
  response.on('close', onClose);
  return { signal: controller.signal, release: () => response.off('close', onClose) };
}

/** Calculation responses may be stored by a client but must be revalidated (If-None-Match with the ETag). */
const CALCULATION_CACHE_CONTROL = 'no-cache';

/** Answer from a remembered result: 304 when the client's validator names it, else the remembered bytes. */
function sendKnown(reply: FastifyReply, known: CachedResult, ifNoneMatch: string | string[] | undefined): FastifyReply {
  if (etagMatches(ifNoneMatch, known.etag)) return sendNotModified(reply, known.etag, CALCULATION_CACHE_CONTROL);
  return reply.header('etag', known.etag).header('cache-control', CALCULATION_CACHE_CONTROL).type(JSON_TYPE).send(known.body);
}

export default async function calculationRoutes(app: FastifyInstance, options: { pool: SolverPool }) {
  const cache = app.resultCache;
  // The usual JSON parser (same limits, same refusal of __proto__ and constructor.prototype), keeping the text.
  const parseJson = app.getDefaultJsonParser('error', 'error');
  app.removeContentTypeParser('application/json');
  app.addContentTypeParser('application/json', { parseAs: 'string' }, (request, text, done) => {
    request.jsonText = text as string;
    parseJson(request, text as string, done);
  });
  for (const definition of CALCULATIONS) {
    // A calculation with other representations (assess: HTML, SVG) is not cached: its key would need the Accept header and query.
    const cached = cache.lru.enabled && !definition.present;
    app.post(definition.path, { schema: { response: { 200: responseJsonSchema(definition.response) } } }, async (request, reply) => {
      const ifNoneMatch = request.headers['if-none-match'];
      const textKey = cached && request.jsonText !== undefined ? cache.textKey(definition.name, request.jsonText) : undefined;
      if (textKey !== undefined) {
        const known = cache.lru.get(textKey);
        if (known) {
          cache.hit(definition.name);
          return sendKnown(reply, known, ifNoneMatch);
        }
      }
      const input = parseBody(definition, request.body);
      const wanted = { accept: request.headers.accept ?? '', query: (request.query ?? {}) as Record<string, unknown> };
      definition.present?.check?.(wanted);
      const heavy = typeof definition.heavy === 'function' ? definition.heavy(input) : definition.heavy;
      const key = cached ? cache.key(definition.name, input) : undefined;
      if (key !== undefined) {
        const known = cache.lru.get(key);
        if (known) {
          cache.hit(definition.name);
          if (textKey !== undefined) cache.lru.set(textKey, known);
          return sendKnown(reply, known, ifNoneMatch);
        }
        cache.miss(definition.name);
      }

      const start = performance.now();
      let out;
      if (heavy) {
        const gone = clientGoneSignal(reply);
        try {
          out = await options.pool.run(definition.name, input, { signal: gone.signal });
        } catch (error) {
          if (error instanceof ClientGoneError) {
            request.log.info('client closed the connection; its solve was cancelled');
            // Nobody is listening; 499 (client closed request) is only for the logs and metrics.
            // (The route's reply type knows only the 200 schema; 499 has no body.)
            return (reply as FastifyReply).code(499).send();
          }
          throw error;
        } finally {
          gone.release();
        }
      } else {
        const r = computeCalculation(definition.name, input);
        if ('failed' in r) throw new ProblemError(r.problem);
        out = r;
      }
      cache.computed(definition.name);
      const result = envelope(out, performance.now() - start, input as object);
      const other = definition.present ? await definition.present.render(result, input, wanted) : undefined;
      if (other) {
        reply.header('cache-control', 'no-store').type(other.contentType);
        // (The route's reply type knows only the JSON schema; another representation is a string.)
        return (reply as FastifyReply).send(other.body);
      }
      const etag = `"${result.provenance.inputsHash}"`;
      // Serialised by the typed response schema (fastify's compiled serializer), once, so the body can be kept.
      const body = (reply.getSerializationFunction('200') as (payload: unknown) => string)(result);
      if (key !== undefined && (heavy || cache.sightings.seenBefore(key))) {
        const entry = { etag, body };
        cache.lru.set(key, entry);
        if (textKey !== undefined) cache.lru.set(textKey, entry);
      }
      if (etagMatches(ifNoneMatch, etag)) return sendNotModified(reply, etag, CALCULATION_CACHE_CONTROL);
      reply.header('etag', etag).header('cache-control', CALCULATION_CACHE_CONTROL).type(JSON_TYPE);
      return reply.send(body);
    });
  }
}
