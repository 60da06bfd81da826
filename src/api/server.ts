/**
 * Service entry point: listen, and on SIGTERM/SIGINT stop accepting, finish
 * in-flight requests, stop the worker pool and exit 0.
 */
import { buildApp } from './app.js';
import { loadConfig } from './config.js';

const config = loadConfig();
const app = await buildApp(config);

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  app.draining = true;
  app.log.info({ signal }, 'shutting down: finishing in-flight requests');
  try {
    await app.close();
    process.exit(0);
  } catch (error) {
    app.log.error({ err: error }, 'error during shutdown');
    process.exit(1);
  }
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));

await app.listen({ port: config.port, host: config.host });
