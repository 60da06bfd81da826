/** Liveness (process is up) and readiness (accepting work: solver threads loaded, not shutting down). */
import type { FastifyInstance } from 'fastify';
import fp from 'fastify-plugin';
import { problem } from '../problem.js';
import { sendProblem } from './errors.js';

declare module 'fastify' {
  interface FastifyInstance {
    /** Set when SIGTERM arrives: readiness fails so the load balancer drains this replica. */
    draining: boolean;
    /** Set once the solver threads have loaded the model code: until then readiness fails. */
    solversReady: boolean;
  }
}

export default fp(
  async function healthPlugin(app: FastifyInstance) {
    app.decorate('draining', false);
    app.decorate('solversReady', false);
    app.get('/healthz', async () => ({ status: 'ok' }));
    app.get('/readyz', async (_request, reply) => {
      if (app.draining) return sendProblem(reply, problem(503, 'draining', 'Shutting down', 'This replica is draining.'));
      if (!app.solversReady) return sendProblem(reply, problem(503, 'starting', 'Starting', 'The solver threads are still loading the model code.'));
      return { status: 'ready' };
    });
  },
  { name: 'oilskin-health' },
);
