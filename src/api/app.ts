/**
 * The fastify application, assembled from plugins: third-party ones first
 * (CORS, rate limit), then ours (errors, metrics, health, auth, docs, routes).
 */
import { randomUUID, timingSafeEqual } from 'node:crypto';
import Fastify, { LogController, type FastifyInstance, type FastifyReply, type FastifyRequest } from 'fastify';
import cors from '@fastify/cors';
import rateLimit from '@fastify/rate-limit';
import type { ServiceConfig } from './config.js';
import { safeStringify } from './envelope.js';
import { problem } from './problem.js';
import errorsPlugin, { sendProblem } from './plugins/errors.js';
import metricsPlugin from './plugins/metrics.js';
import healthPlugin from './plugins/health.js';
import resultCachePlugin from './plugins/result-cache.js';
import docsPlugin from './plugins/docs.js';
import calculationRoutes from './routes/calculations.js';
import catalogueRoutes from './routes/catalogue.js';
import sweepRoutes from './routes/sweep.js';
import designWindowRoutes from './routes/design-window.js';
import { createSolverPool, type SolverPool } from './pool.js';
import { computeSafely } from './worker.js';
import { loadUserCatalogue } from './user-catalogue-file.js';

declare module 'fastify' {
  interface FastifyInstance {
    solverPool: SolverPool;
  }
}

const REQUEST_ID = /^[A-Za-z0-9._:-]{1,128}$/;

/**
 * One access line per request, on completion, carrying what fastify's two default lines (on arrival and on
 * completion) carried between them: method, URL, host, client address, status and response time. At info level the
 * two lines cost about 16 µs of CPU per request (a bare-route-sized share of the cheap path), the one line about half.
 */
class AccessLog extends LogController {
  override incomingRequest(): void {}

  override requestCompleted(error: Error | null | undefined, request: FastifyRequest, reply: FastifyReply): void {
    if (error) reply.log.error({ req: request, res: reply, err: error, responseTime: reply.elapsedTime }, 'request errored');
    else reply.log.info({ req: request, res: reply, responseTime: reply.elapsedTime }, 'request completed');
  }
}

function keyMatches(given: string, keys: readonly string[]): boolean {
  const a = Buffer.from(given);
  return keys.some((k) => {
    const b = Buffer.from(k);
    return a.length === b.length && timingSafeEqual(a, b);
  });
}

/** Routes that need an API key when keys are configured: everything under /v1. */
export function isProtectedRoute(routeUrl: string | undefined): boolean {
  return routeUrl !== undefined && (routeUrl === '/v1' || routeUrl.startsWith('/v1/'));
}

export async function buildApp(config: ServiceConfig, options: { logStream?: NodeJS.WritableStream } = {}): Promise<FastifyInstance> {
  // A bad user catalogue stops start-up here (CatalogueFileError naming the entry and field), before anything listens.
  const userCatalogue = config.catalogueFile === undefined ? undefined : loadUserCatalogue(config.catalogueFile);
  const app = Fastify({
    logger: {
      level: config.logLevel,
      redact: ['req.headers["x-api-key"]', 'req.headers.authorization'],
      ...(options.logStream ? { stream: options.logStream } : {}),
    },
    bodyLimit: config.bodyLimit,
    // Slow clients: headers, the whole request and an idle keep-alive connection each have a limit;
    // Node checks the first two every connectionsCheckingInterval (30 s by default, far too coarse).
    http: { headersTimeout: config.headersTimeoutMs, connectionsCheckingInterval: Math.min(1000, config.headersTimeoutMs) },
    requestTimeout: config.requestTimeoutMs,
    keepAliveTimeout: config.keepAliveTimeoutMs,
    // A client's request id is kept when it is safe to log; otherwise a fresh one.
    genReqId: (req) => {
      const given = req.headers['x-request-id'];
      return typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
    },
    logController: new AccessLog(),
    return503OnClosing: true,
    forceCloseConnections: 'idle',
    onProtoPoisoning: 'error',
    onConstructorPoisoning: 'error',
    routerOptions: { ignoreTrailingSlash: true },
  });

  app.setReplySerializer((payload) => safeStringify(payload));
  // Only JSON bodies: text/plain would otherwise reach the handlers as a string.
  app.removeContentTypeParser('text/plain');

  const pool = createSolverPool({
    threads: config.workerThreads,
    maxQueued: config.maxQueuedSolves,
    queueTimeoutMs: config.queueTimeoutMs,
    solveTimeoutMs: config.solveTimeoutMs,
    workerMemoryMb: config.workerMemoryMb,
    inline: computeSafely,
    ...(userCatalogue === undefined ? {} : { userCatalogue }),
    onThreadError: (error) => app.log.error({ err: error }, 'solver thread failed'),
  });
  app.decorate('solverPool', pool);
  app.addHook('onClose', async () => pool.close());

  // Callback-style hooks on every request: an async hook costs a promise and a microtask turn per request (bench/http.ts).
  app.addHook('onSend', (request, reply, payload, done) => {
    reply.header('x-request-id', request.id);
    // Draining: a keep-alive client gets its answer and then the connection is closed, so it reconnects elsewhere.
    if (app.draining) reply.header('connection', 'close');
    done(null, payload);
  });

  if (config.corsOrigins.length > 0) {
    await app.register(cors, { origin: config.corsOrigins.includes('*') ? true : config.corsOrigins, exposedHeaders: ['x-request-id'] });
  }
  await app.register(errorsPlugin);
  if (config.rateLimitPerMinute > 0) {
    await app.register(rateLimit, {
      max: config.rateLimitPerMinute,
      timeWindow: '1 minute',
      allowList: (request) => ['/healthz', '/readyz', '/metrics'].includes(request.routeOptions.url ?? ''),
      errorResponseBuilder: (_request, context) => {
        const err = new Error(`Rate limit of ${context.max} requests per ${context.after} exceeded; retry in ${context.after}.`) as Error & { statusCode: number };
        err.statusCode = 429;
        return err;
      },
    });
  }
  await app.register(metricsPlugin, { poolStats: () => pool.stats() });
  await app.register(resultCachePlugin, { maxBytes: config.resultCacheMb * 1024 * 1024, registry: app.metricsRegistry });
  await app.register(healthPlugin);
  void pool.ready().then(() => {
    app.solversReady = true;
  });

  if (config.apiKeys.length > 0) {
    app.addHook('onRequest', async (request, reply) => {
      // The route the router matched (after it decoded %76, ignored a trailing slash, mapped HEAD to GET),
      // not the raw URL: every route under /v1 needs a key, whatever spelling reached it.
      if (!isProtectedRoute(request.routeOptions.url)) return;
      const key = request.headers['x-api-key'];
      if (typeof key !== 'string' || !keyMatches(key, config.apiKeys)) {
        return sendProblem(reply, problem(401, 'unauthorized', 'Missing or wrong API key', 'Send a valid key in the x-api-key header.'), {
          'www-authenticate': 'ApiKey header="x-api-key"',
        });
      }
    });
  }

  if (userCatalogue !== undefined) {
    app.log.info(
      { file: userCatalogue.file, sha256: userCatalogue.sha256, fluids: userCatalogue.fluids.map((f) => f.id), surfactants: userCatalogue.surfactants.map((s) => s.id) },
      'user catalogue added',
    );
  }
  await app.register(docsPlugin, { apiKeysConfigured: config.apiKeys.length > 0 });
  await app.register(catalogueRoutes, { apiKeysConfigured: config.apiKeys.length > 0 });
  await app.register(calculationRoutes, { pool });
  await app.register(sweepRoutes, { pool, config });
  await app.register(designWindowRoutes, { pool, config });
  return app;
}
