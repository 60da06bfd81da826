/**
 * Registers every calculation as POST <path>; heavy ones go through the worker
 * pool. The 200 response is serialised from the calculation's typed response
 * schema (fastify compiles it), not by the app's generic serializer: fields the
 * schema does not list never reach the wire, and serialisation is faster.
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

export default async function calculationRoutes(app: FastifyInstance, options: { pool: SolverPool }) {
  for (const definition of CALCULATIONS) {
    app.post(definition.path, { schema: { response: { 200: responseJsonSchema(definition.response) } } }, async (request, reply) => {
      const input = parseBody(definition, request.body);
      const wanted = { accept: request.headers.accept ?? '', query: (request.query ?? {}) as Record<string, unknown> };
      definition.present?.check?.(wanted);
      const start = performance.now();
      const heavy = typeof definition.heavy === 'function' ? definition.heavy(input) : definition.heavy;
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
      reply.header('cache-control', 'no-store');
      const answer = envelope(out, performance.now() - start, input as object);
      const other = definition.present ? await definition.present.render(answer, input, wanted) : undefined;
      if (other) {
        reply.type(other.contentType);
        // (The route's reply type knows only the JSON schema; another representation is a string.)
        return (reply as FastifyReply).send(other.body);
      }
      reply.type('application/json; charset=utf-8');
      reply.serializer(reply.getSerializationFunction('200') as (payload: unknown) => string);
      return answer;
    });
  }
}
