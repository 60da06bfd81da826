/** Registers every calculation as POST <path>; heavy ones go through the worker pool. */
import type { FastifyInstance } from 'fastify';
import { parseBody } from '../calculation.js';
import { envelope } from '../envelope.js';
import type { SolverPool } from '../pool.js';
import { computeSafely } from '../worker.js';
import { ProblemError } from '../problem.js';
import { CALCULATIONS } from './index.js';

export default async function calculationRoutes(app: FastifyInstance, options: { pool: SolverPool }) {
  for (const definition of CALCULATIONS) {
    app.post(definition.path, async (request, reply) => {
      const input = parseBody(definition, request.body);
      const start = performance.now();
      const heavy = typeof definition.heavy === 'function' ? definition.heavy(input) : definition.heavy;
      const out = heavy
        ? await options.pool.run(definition.name, input)
        : (() => {
            const r = computeSafely(definition.name, input);
            if ('failed' in r) throw new ProblemError(r.problem);
            return r;
          })();
      reply.header('cache-control', 'no-store');
      return envelope(out, performance.now() - start);
    });
  }
}
