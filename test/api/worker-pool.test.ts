/**
 * The solver-thread pool under abuse: threads killed and re-created many times
 * under concurrent load, queue wait kept apart from compute, cancellation by
 * the caller. The contract: the process survives, and a killed or timed-out
 * thread costs exactly the one request it was running (422 or 503).
 *
 * Budgets here are chosen with margins of 10× or more over the work they
 * bound, so the outcomes do not depend on how busy the machine is; nothing
 * asserts a wall-clock time.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { parseBody } from '../../src/api/calculation.js';
import { ClientGoneError, createSolverPool, type PoolOptions, type SolverPool } from '../../src/api/pool.js';
import { ProblemError } from '../../src/api/problem.js';
import { calculationByName } from '../../src/api/routes/index.js';
import { computeSafely } from '../../src/api/worker.js';

const heat = calculationByName('heat')!;
const flow = calculationByName('flow')!;
const heatExample = JSON.parse(readFileSync(new URL('../../examples/heat-worked-example.json', import.meta.url), 'utf8'));
/** Seconds of compute: the field method with a 25-point field sweep of the lubricant conductivity. */
const slowInput = parseBody(heat, { ...heatExample, options: { method: 'field', sensitivity: { points: 25 } } });
/** About a millisecond of compute. */
const fastInput = parseBody(flow, flow.example);

const pools: SolverPool[] = [];
function makePool(overrides: Partial<PoolOptions>): SolverPool {
  const pool = createSolverPool({
    threads: 2,
    maxQueued: 100,
    queueTimeoutMs: 600_000,
    solveTimeoutMs: 600_000,
    workerMemoryMb: 512,
    inline: computeSafely,
    ...overrides,
  });
  pools.push(pool);
  return pool;
}
afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

/** Resolves once a solve is computing on a thread (threads take a while to load the model code). */
async function startedComputing(pool: SolverPool): Promise<void> {
  while (pool.stats().running === 0) await new Promise((r) => setTimeout(r, 20));
}

/** Resolves once the threads have loaded the model code (a solve given up while queued does not kill a loading thread). */
async function warmUp(pool: SolverPool): Promise<void> {
  while ((await outcome(pool.run('flow', fastInput))) !== 'ok');
}

/** Outcome of one pool run: 'ok', the problem status and slug, or the error's name. */
async function outcome(run: Promise<unknown>): Promise<string> {
  try {
    await run;
    return 'ok';
  } catch (error) {
    if (error instanceof ProblemError) return `${error.problem.status} ${error.problem.type.split('/').pop()}`;
    return error instanceof Error ? error.name : String(error);
  }
}

describe('solver threads killed and re-created under concurrent load', () => {
  it('every over-budget solve costs its own request (422), every other request succeeds, the process survives', async () => {
    // 300 ms of compute: the slow solve needs seconds, the fast one a millisecond.
    const pool = makePool({ threads: 2, solveTimeoutMs: 300 });
    const slow = 6;
    const fast = 6;
    const runs: Promise<string>[] = [];
    for (let i = 0; i < slow + fast; i++) {
      runs.push(outcome(i % 2 === 0 ? pool.run('heat', slowInput) : pool.run('flow', fastInput)));
    }
    const results = await Promise.all(runs);
    expect(pool.stats().threadsLost).toBe(slow);
    const slowResults = results.filter((_, i) => i % 2 === 0);
    const fastResults = results.filter((_, i) => i % 2 === 1);
    // Each slow solve lost its thread (6 threads killed and replaced) and only its own request failed.
    expect(slowResults).toEqual(new Array(slow).fill('422 solve-timeout'));
    expect(fastResults).toEqual(new Array(fast).fill('ok'));
    // The pool still works afterwards.
    expect(await outcome(pool.run('flow', fastInput))).toBe('ok');
  }, 300_000);

  it('callers giving up at random moments (queued, on a thread still loading, computing): each costs only its own request (seeded)', async () => {
    const pool = makePool({ threads: 2 });
    // fast-check chooses when each of 8 callers gives up, 0–1.5 s after asking: some solves are still queued
    // (flagged and skipped, no thread killed), some compute (their thread is killed and replaced).
    const seed = 20_240_610;
    await fc.assert(
      fc.asyncProperty(fc.array(fc.integer({ min: 0, max: 1500 }), { minLength: 8, maxLength: 8 }), async (delays) => {
        const runs = delays.map((delay) => {
          const controller = new AbortController();
          setTimeout(() => controller.abort(), delay);
          return outcome(pool.run('heat', slowInput, { signal: controller.signal }));
        });
        const results = await Promise.all(runs);
        expect(results).toEqual(new Array(8).fill('ClientGoneError'));
        expect(pool.stats()).toMatchObject({ waiting: 0, running: 0 });
        expect(await outcome(pool.run('flow', fastInput))).toBe('ok');
      }),
      { seed, numRuns: 2, verbose: true },
    );
  }, 300_000);
});

describe('queue wait and compute are separate budgets', () => {
  it('a solve that waits too long for a thread gets 503 with Retry-After; the one computing finishes', async () => {
    const pool = makePool({ threads: 1, queueTimeoutMs: 500 });
    await warmUp(pool);
    const running = outcome(pool.run('heat', slowInput));
    await startedComputing(pool);
    let queued: unknown;
    try {
      await pool.run('flow', fastInput);
    } catch (error) {
      queued = error;
    }
    expect(queued).toBeInstanceOf(ProblemError);
    const p = queued as ProblemError;
    expect(p.problem.status).toBe(503);
    expect(p.problem.type).toMatch(/queue-timeout$/);
    expect(Number(p.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(await running).toBe('ok');
  }, 300_000);

  it('compute over budget is 422 naming what the caller can change', async () => {
    const pool = makePool({ threads: 1, solveTimeoutMs: 200 });
    try {
      await pool.run('heat', slowInput);
      expect.unreachable('the solve should be over its budget');
    } catch (error) {
      const p = (error as ProblemError).problem;
      expect(p.status).toBe(422);
      expect(p.title).toMatch(/over its time budget/);
      expect(p.detail).toMatch(/closed-form/);
      expect(p.detail).toMatch(/points/);
    }
  });

  it('beyond the queue bound a request is refused at once with 503 and Retry-After', async () => {
    const pool = makePool({ threads: 1, maxQueued: 1 });
    const controller = new AbortController();
    const first = outcome(pool.run('heat', slowInput, { signal: controller.signal }));
    await startedComputing(pool);
    const second = outcome(pool.run('heat', slowInput, { signal: controller.signal }));
    expect(await outcome(pool.run('flow', fastInput))).toBe('503 overloaded');
    controller.abort();
    expect([await first, await second]).toEqual(['ClientGoneError', 'ClientGoneError']);
  });
});

describe('cancellation by the caller', () => {
  it('aborting a running solve kills its thread (replaced) and the next request runs', async () => {
    const pool = makePool({ threads: 1 });
    // With the thread loaded, the slow solve goes straight to it and the fast one waits behind it.
    await pool.ready();
    const controller = new AbortController();
    const slowRun = pool.run('heat', slowInput, { signal: controller.signal });
    const fastRun = outcome(pool.run('flow', fastInput));
    await startedComputing(pool);
    expect(pool.stats()).toEqual({ waiting: 1, running: 1, threadsLost: 0 });
    controller.abort();
    await expect(slowRun).rejects.toBeInstanceOf(ClientGoneError);
    expect(pool.stats().threadsLost).toBe(1);
    expect(await fastRun).toBe('ok');
  });

  it('giving up a queued solve frees its place in the queue and kills no thread', async () => {
    const pool = makePool({ threads: 1 });
    const blocker = new AbortController();
    const running = outcome(pool.run('heat', slowInput, { signal: blocker.signal }));
    await startedComputing(pool);
    const controller = new AbortController();
    const queued = outcome(pool.run('flow', fastInput, { signal: controller.signal }));
    expect(pool.stats().waiting).toBe(1);
    controller.abort();
    expect(await queued).toBe('ClientGoneError');
    expect(pool.stats()).toEqual({ waiting: 0, running: 1, threadsLost: 0 });
    blocker.abort();
    expect(await running).toBe('ClientGoneError');
  });
});

describe('the thread entry', () => {
  /** Load a file the way piscina does (require, then await the export) with Node's ESM loader tracing on. */
  function loadTraced(file: string): { traced: string; status: number | null } {
    const script = `Promise.resolve(require(${JSON.stringify(file)})).then((h) => { if (typeof (h.default ?? h) !== 'function' && typeof h !== 'object') process.exit(3); })`;
    const run = spawnSync(process.execPath, ['-e', script], { env: { ...process.env, NODE_DEBUG: 'esm' }, encoding: 'utf8', timeout: 120_000, maxBuffer: 256 * 1024 * 1024 });
    return { traced: run.stderr, status: run.status };
  }
  const dist = (file: string) => fileURLToPath(new URL(`../../dist/src/api/${file}`, import.meta.url));

  it('the compiled entry (what piscina loads in production) never takes the require(esm) path; the ES module file would', () => {
    // Built by `npm ci` (prepare) and `npm run build`.
    expect(existsSync(dist('worker-entry.cjs')), 'dist/ is missing: run npm run build').toBe(true);
    const entry = loadTraced(dist('worker-entry.cjs'));
    expect(entry.status).toBe(0);
    expect(entry.traced).not.toMatch(/importSyncForRequire/);
    // The check can fail: the ES module itself goes through require(esm) (Node ≥ 20.19), which is what crashed.
    const esm = loadTraced(dist('worker.js'));
    expect(esm.traced).toMatch(/importSyncForRequire/);
  });

  it('the pool hands piscina the CommonJS entry, from the build and from the sources alike', () => {
    const pool = readFileSync(new URL('../../src/api/pool.ts', import.meta.url), 'utf8');
    expect(pool).toMatch(/'\.\/worker-entry\.cjs'/);
    expect(pool).toMatch(/'\.\/worker-entry\.cts'/);
    expect(pool).not.toMatch(/'\.\/worker\.js'/);
  });
});

describe('readiness waits for the solver threads', () => {
  it('/readyz is 503 "starting" while the threads load the model code, 200 once they have', async () => {
    const { buildApp } = await import('../../src/api/app.js');
    const { testConfig } = await import('../../src/api/config.js');
    const app = await buildApp(testConfig({ workerThreads: 2 }));
    try {
      // Loading the model code takes a thread hundreds of milliseconds at least; this asks at once.
      const early = await app.inject('/readyz');
      expect(early.statusCode).toBe(503);
      expect(early.json().type).toMatch(/starting$/);
      await app.solverPool.ready();
      expect((await app.inject('/readyz')).statusCode).toBe(200);
      // The warm-up computed nothing and lost no thread.
      expect(app.solverPool.stats()).toEqual({ waiting: 0, running: 0, threadsLost: 0 });
    } finally {
      await app.close();
    }
  }, 300_000);
});

describe('over HTTP: a client that disconnects cancels its solve', () => {
  it('closing the connection while the solve computes kills its thread; the service keeps answering', async () => {
    const { buildApp } = await import('../../src/api/app.js');
    const { testConfig } = await import('../../src/api/config.js');
    const http = await import('node:http');
    // The replacement thread loads every model before it takes work; on a loaded machine that can outlast the
    // default 10 s queue wait, which would turn the follow-up request into a 503 that says nothing about the kill.
    const app = await buildApp(testConfig({ workerThreads: 1, queueTimeoutMs: 120_000 }));
    try {
      await app.listen({ port: 0, host: '127.0.0.1' });
      const port = (app.server.address() as { port: number }).port;
      const body = JSON.stringify({ ...heatExample, options: { method: 'field', sensitivity: { points: 25 } } });
      const req = http.request({ host: '127.0.0.1', port, path: '/v1/heat', method: 'POST', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) } });
      req.on('error', () => {});
      req.end(body);
      await startedComputing(app.solverPool);
      req.destroy();
      while (app.solverPool.stats().running > 0) await new Promise((r) => setTimeout(r, 20));
      expect(app.solverPool.stats()).toEqual({ waiting: 0, running: 0, threadsLost: 1 });
      const next = await app.inject({ method: 'POST', url: '/v1/heat', payload: { ...heatExample, options: { method: 'closed-form' } } });
      expect(next.statusCode).toBe(200);
    } finally {
      await app.close();
    }
  }, 300_000);
});
