/**
 * POST /v1/design-window — the grooves (and lubricants) that satisfy every
 * requirement in the given service conditions. JSON by default; with
 * `Accept: image/svg+xml` the plot of the window (groove width × depth through
 * the best design, each region coloured by the requirement that limits it).
 */
import type { FastifyInstance } from 'fastify';
import type { ServiceConfig } from '../config.js';
import { ClientGoneError, type SolverPool } from '../pool.js';
import { planWindow, runWindow, windowAnswer, windowPlot } from '../window/run.js';

export const WINDOW_PATH = '/v1/design-window';

export default async function designWindowRoutes(app: FastifyInstance, options: { pool: SolverPool; config: ServiceConfig }) {
  const { pool, config } = options;
  app.post(WINDOW_PATH, async (request, reply) => {
    const plan = planWindow(request.body);
    const controller = new AbortController();
    const onClose = () => {
      if (!reply.raw.writableFinished) controller.abort();
    };
    reply.raw.on('close', onClose);
    const started = performance.now();
    try {
      const window = await runWindow(plan, request.body, pool, config.workerThreads, controller.signal);
      reply.header('cache-control', 'no-store');
      if (/image\/svg\+xml/i.test(request.headers.accept ?? '')) {
        reply.type('image/svg+xml; charset=utf-8');
        return await windowPlot(window);
      }
      return { ...windowAnswer(plan, window), computeMs: Math.round(performance.now() - started) };
    } catch (error) {
      if (error instanceof ClientGoneError) return reply.code(499).send();
      throw error;
    } finally {
      reply.raw.off('close', onClose);
    }
  });
}
