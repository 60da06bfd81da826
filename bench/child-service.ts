/** What the harnesses share: the service as a child process on loopback, and a seeded random generator. */
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';

export interface ChildService {
  child: ChildProcess;
  base: string;
  /** Why the process ended, or null while it runs. */
  died: () => string | null;
  /** The last 200 kB of its log. */
  log: () => string;
}

/**
 * Start the service (the compiled server, or the sources under tsx) on
 * 127.0.0.1 with a free port and no rate limit; `env` adds or overrides
 * variables. Resolves once it is ready (its solver threads loaded).
 */
export async function startService(options: {
  sources: boolean;
  env?: Record<string, string>;
  /** Give the port and address as the platform's PORT and HOST instead of OILSKIN_PORT and OILSKIN_HOST. */
  platformVariables?: boolean;
}): Promise<ChildService> {
  const root = fileURLToPath(new URL('..', import.meta.url));
  // The port is chosen here (a free one from the kernel), not read from the service's log: the log level is the caller's.
  const port = await freePort();
  const child = spawn(process.execPath, options.sources ? ['--import', 'tsx', 'src/api/server.ts'] : ['dist/src/api/server.js'], {
    cwd: root,
    env: {
      ...process.env,
      ...(options.platformVariables ? { OILSKIN_PORT: '', OILSKIN_HOST: '', PORT: String(port), HOST: '127.0.0.1' } : { OILSKIN_PORT: String(port), OILSKIN_HOST: '127.0.0.1' }),
      OILSKIN_RATE_LIMIT: '0',
      OILSKIN_LOG_LEVEL: 'info',
      ...options.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  let died: string | null = null;
  child.stdout!.on('data', (c: Buffer) => (log = (log + c.toString()).slice(-200_000)));
  child.stderr!.on('data', (c: Buffer) => (log = (log + c.toString()).slice(-200_000)));
  child.on('exit', (code, signal) => (died = `exit code ${code}, signal ${signal}`));
  const base = `http://127.0.0.1:${port}`;
  // Ready once its solver threads have loaded the model code (GET /readyz answers 200).
  for (let i = 0; i < 1200 && !died; i++) {
    const ready = await fetch(`${base}/readyz`).then(
      (r) => r.ok,
      () => false,
    );
    if (ready) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  return { child, base, died: () => died, log: () => log };
}

/** mulberry32: a small seeded generator in [0, 1), so a run can be repeated. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A TCP port on 127.0.0.1 that is free right now. */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address !== null ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}
