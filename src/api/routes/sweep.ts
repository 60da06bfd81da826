/**
 * POST /v1/sweep — any calculation of the registry over a grid of input
 * values. The answer form follows the Accept header: application/json (one
 * document, default), text/csv or application/x-ndjson (both streamed as the
 * points finish, in index order). A client that closes its connection stops
 * the sweep: no further batch starts and the running ones are cancelled.
 */
import { Readable } from 'node:stream';
import type { FastifyInstance } from 'fastify';
import type { ServiceConfig } from '../config.js';
import type { SolverPool } from '../pool.js';
import { planSweep } from '../sweep/plan.js';
import { sweepRows } from '../sweep/run.js';
import { csvChunks, ndjsonChunks, sweepDocument } from '../sweep/stream.js';

export const SWEEP_PATH = '/v1/sweep';
export const NDJSON = 'application/x-ndjson';
export const CSV = 'text/csv';

/** The answer form a client asked for: the first of NDJSON or CSV named in its Accept header, else JSON. */
export function sweepFormat(accept: string | undefined): 'json' | 'csv' | 'ndjson' {
  const wanted = (accept ?? '').split(',').map((part) => part.split(';')[0]!.trim().toLowerCase());
  for (const type of wanted) {
    if (type === NDJSON) return 'ndjson';
    if (type === CSV) return 'csv';
    if (type === 'application/json') return 'json';
  }
  return 'json';
}

export default async function sweepRoutes(app: FastifyInstance, options: { pool: SolverPool; config: ServiceConfig }) {
  const { pool, config } = options;
  app.post(SWEEP_PATH, async (request, reply) => {
    const plan = planSweep(request.body, { maxPoints: config.sweepMaxPoints });
    const controller = new AbortController();
    const onClose = () => {
      if (!reply.raw.writableFinished) controller.abort();
    };
    reply.raw.on('close', onClose);
    const batches = sweepRows(plan, request.body, pool, {
      signal: controller.signal,
      concurrency: 2 * Math.max(1, config.workerThreads),
      pointTimeoutMs: config.sweepPointTimeoutMs,
    });
    reply.header('cache-control', 'no-store');
    const format = sweepFormat(request.headers.accept);
    if (format === 'json') {
      try {
        return await sweepDocument(plan, batches);
      } finally {
        reply.raw.off('close', onClose);
      }
    }
    reply.type(format === 'csv' ? `${CSV}; charset=utf-8` : `${NDJSON}; charset=utf-8`);
    if (format === 'csv') reply.header('content-disposition', `attachment; filename="sweep-${plan.definition.name}-${plan.shard.index}-of-${plan.shard.count}.csv"`);
    const chunks = format === 'csv' ? csvChunks(plan, batches) : ndjsonChunks(plan, batches, { progress: true });
    return reply.send(Readable.from(chunks, { objectMode: false }));
  });
}
