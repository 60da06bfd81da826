/**
 * Service entry point: listen, and on SIGTERM/SIGINT drain and exit 0.
 *
 * Drain: readiness fails at once (the load balancer stops sending), the
 * listener closes, idle keep-alive connections are closed at once and again
 * whenever one falls idle, every response carries `connection: close`, and
 * in-flight requests get up to OILSKIN_DRAIN_TIMEOUT_MS to finish. After that
 * the remaining connections are cut and their solves aborted. Kubernetes
 * kills the pod after its grace period, so the drain limit must stay below it
 * (docker/k8s/deployment.yaml: preStop 5 s + drain 10 s < 30 s).
 */
import type { FastifyInstance } from 'fastify';
import { buildApp } from './app.js';
import { loadConfig, type ServiceConfig } from './config.js';
import { CatalogueFileError } from './user-catalogue-file.js';

let config: ServiceConfig;
let app: FastifyInstance;
try {
  config = loadConfig(process.env, process.argv.slice(2));
  app = await buildApp(config);
} catch (error) {
  // A configuration mistake (a bad user catalogue, a malformed setting) is reported in one message, not a stack trace.
  if (error instanceof CatalogueFileError || (error instanceof Error && /^OILSKIN_/.test(error.message))) {
    process.stderr.write(`oilskin: cannot start: ${error.message}\n`);
    process.exit(78);
  }
  throw error;
}

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  app.draining = true;
  app.log.info({ signal, drainTimeoutMs: config.drainTimeoutMs }, 'shutting down: finishing in-flight requests');
  const server = app.server;
  const sweep = setInterval(() => server.closeIdleConnections(), 100);
  const deadline = setTimeout(() => {
    app.log.warn('drain limit reached: closing the remaining connections');
    server.closeAllConnections();
    void app.solverPool.close();
  }, config.drainTimeoutMs);
  // Last resort, should closing itself hang: the process must not outlive the grace period.
  setTimeout(() => process.exit(0), config.drainTimeoutMs + 2000).unref();
  try {
    await app.close();
    process.exit(0);
  } catch (error) {
    app.log.error({ err: error }, 'error during shutdown');
    process.exit(1);
  } finally {
    clearInterval(sweep);
    clearTimeout(deadline);
  }
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));

await app.listen({ port: config.port, host: config.host });
