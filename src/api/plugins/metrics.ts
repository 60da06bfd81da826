/**
 * Prometheus metrics at GET /metrics: request count and duration histogram per
 * route and status, event-loop lag and process metrics (prom-client defaults),
 * and the worker pool (queued and running solves, threads lost and replaced).
 */
import type { FastifyInstance } from 'fastify';
import fp from 'fastify-plugin';
import { Counter, Gauge, Histogram, Registry, collectDefaultMetrics } from 'prom-client';
import type { PoolStats } from '../pool.js';

declare module 'fastify' {
  interface FastifyRequest {
    startedAt?: bigint;
  }
  interface FastifyInstance {
    /** The registry /metrics exposes; other plugins add their metrics to it. */
    metricsRegistry: Registry;
  }
}

export default fp(
  async function metricsPlugin(app: FastifyInstance, options: { poolStats: () => PoolStats }) {
    const registry = new Registry();
    app.decorate('metricsRegistry', registry);
    collectDefaultMetrics({ register: registry, prefix: 'oilskin_', eventLoopMonitoringPrecision: 20 });
    const requests = new Counter({
      name: 'oilskin_http_requests_total',
      help: 'HTTP requests by route, method and status code',
      labelNames: ['route', 'method', 'status_code'],
      registers: [registry],
    });
    const duration = new Histogram({
      name: 'oilskin_http_request_duration_seconds',
      help: 'HTTP request duration by route, method and status code',
      labelNames: ['route', 'method', 'status_code'],
      buckets: [0.0005, 0.001, 0.0025, 0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
      registers: [registry],
    });
    new Gauge({
      name: 'oilskin_solver_queue_depth',
      help: 'Heavy solves waiting for a worker thread',
      registers: [registry],
      collect() {
        this.set(options.poolStats().waiting);
      },
    });
    new Gauge({
      name: 'oilskin_solver_running',
      help: 'Heavy solves computing on a worker thread',
      registers: [registry],
      collect() {
        this.set(options.poolStats().running);
      },
    });
    new Gauge({
      name: 'oilskin_solver_threads_lost',
      help: 'Worker threads killed (over budget, client gone) or failed and replaced since start',
      registers: [registry],
      collect() {
        this.set(options.poolStats().threadsLost);
      },
    });

    // Callback-style: these run on every request, and an async hook costs a promise and a microtask turn each.
    app.addHook('onRequest', (request, _reply, done) => {
      request.startedAt = process.hrtime.bigint();
      done();
    });
    // The labelled series of each route, method and status, looked up once: prom-client hashes a labels object on
    // every inc/observe (sorting its keys), a cost every request paid twice.
    const series = new Map<string, { count: { inc(): void }; duration: { observe(seconds: number): void } }>();
    app.addHook('onResponse', (request, reply, done) => {
      // Unmatched URLs share one label so scanners cannot blow up the label set.
      const route = request.routeOptions.url ?? 'unmatched';
      const key = `${route} ${request.method} ${reply.statusCode}`;
      let labelled = series.get(key);
      if (labelled === undefined) {
        const labels = { route, method: request.method, status_code: String(reply.statusCode) };
        labelled = { count: requests.labels(labels), duration: duration.labels(labels) };
        series.set(key, labelled);
      }
      labelled.count.inc();
      if (request.startedAt !== undefined) labelled.duration.observe(Number(process.hrtime.bigint() - request.startedAt) / 1e9);
      done();
    });

    app.get('/metrics', { schema: { hide: true } }, async (_request, reply) => {
      reply.type(registry.contentType);
      return registry.metrics();
    });
  },
  { name: 'oilskin-metrics' },
);
