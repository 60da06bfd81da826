/**
 * Worker-thread pool for heavy solves (field solver, surfactant interface
 * solver, drainage timeline, sweeps), so the event loop keeps answering
 * health checks and cheap requests. With zero threads (tests, CLI) the same
 * compute runs inline.
 *
 * Two budgets, kept apart: the time a solve may wait for a thread (queue
 * wait: beyond it the service is saturated, 503 with Retry-After) and the time
 * it may compute once a thread has started it (compute: beyond it the input
 * asks for too much work, 422 saying what to change). The thread tells the
 * pool when it starts a task through a message port sent with the task. A
 * caller's AbortSignal (the client closed its connection) cancels the solve
 * at either stage: a queued one is flagged so that the thread that picks it
 * up skips it (no thread is killed for a solve that never started, not even
 * one still loading the model code); a running one loses its thread, which
 * piscina replaces.
 */
import { fileURLToPath } from 'node:url';
import { MessageChannel, type MessagePort } from 'node:worker_threads';
import { Piscina } from 'piscina';
import type { CalculationOutput } from './envelope.js';
import type { ComputeFailure } from './calculation.js';
import type { UserCatalogueData } from '../materials/user-catalogue.js';
import { problem, ProblemError } from './problem.js';

export interface SolverPool {
  /** Run one calculation's compute step; `signal` aborts it (queued or running). */
  run(name: string, input: unknown, options?: { signal?: AbortSignal }): Promise<CalculationOutput>;
  /** Solves waiting for a thread, solves computing, and threads lost (killed or failed, then replaced) so far. */
  stats(): PoolStats;
  /** Resolves once every thread has loaded the model code (at once without threads). */
  ready(): Promise<void>;
  close(): Promise<void>;
}

export interface PoolStats {
  waiting: number;
  running: number;
  threadsLost: number;
}

export interface PoolOptions {
  threads: number;
  /** Solves that may wait for a thread; one more is refused with 503. */
  maxQueued: number;
  /** Longest wait for a thread, ms (503 + Retry-After beyond). */
  queueTimeoutMs: number;
  /** Longest compute once started, ms (422 beyond). */
  solveTimeoutMs: number;
  /** Heap limit of one solver thread, MB: a thread that exceeds it dies alone (one request fails), not the process. */
  workerMemoryMb: number;
  /** The validated user catalogue, installed in every solver thread before it takes a task. */
  userCatalogue?: UserCatalogueData;
  /** Inline runner used when threads = 0. */
  inline: (name: string, input: unknown) => CalculationOutput | ComputeFailure;
  /** Told about thread failures that belong to no request (logged by the app). */
  onThreadError?: (error: unknown) => void;
}

/** Task sent to a solver thread (src/api/worker.ts). */
export interface SolverTask {
  name: string;
  input: unknown;
  /** The thread posts one message here when it starts computing. */
  started?: MessagePort;
  /** Set to 1 by the pool when the task was given up while queued: the thread skips it. */
  cancelled?: Int32Array;
}

/** What a thread returns for a task that was given up before it started. */
export interface TaskSkipped {
  skipped: true;
}

type StopReason = 'queue' | 'compute' | 'client';

/** Thrown when the caller went away; nobody is left to read a response. */
export class ClientGoneError extends Error {
  constructor() {
    super('the client closed the connection');
    this.name = 'ClientGoneError';
  }
}

function unwrap(out: CalculationOutput | ComputeFailure): CalculationOutput {
  if ('failed' in out) throw new ProblemError(out.problem);
  return out;
}

/** Where the solver-thread entry lives: the compiled CommonJS file, or its TypeScript source under tsx. */
function workerEntry(): { filename: string; execArgv: string[] } {
  const here = import.meta.url;
  const fromSources = here.endsWith('.ts');
  return {
    filename: fileURLToPath(new URL(fromSources ? './worker-entry.cts' : './worker-entry.cjs', here)),
    // Running from TypeScript sources (tests, `npm run dev`): let the thread load .ts too.
    execArgv: fromSources ? ['--import', 'tsx'] : [],
  };
}

export function createSolverPool(options: PoolOptions): SolverPool {
  if (options.threads === 0) {
    return {
      run: async (name, input) => unwrap(options.inline(name, input)),
      stats: () => ({ waiting: 0, running: 0, threadsLost: 0 }),
      ready: async () => {},
      close: async () => {},
    };
  }
  const entry = workerEntry();
  const piscina = new Piscina({
    ...entry,
    // Every thread is started (and loads the model code) up front, and replaced when one is lost.
    minThreads: options.threads,
    maxThreads: options.threads,
    idleTimeout: Number.POSITIVE_INFINITY,
    resourceLimits: { maxOldGenerationSizeMb: options.workerMemoryMb },
    // Validated once in the main thread; the threads install the same data (src/api/worker.ts), never re-read the file.
    workerData: { userCatalogue: options.userCatalogue },
  });
  // piscina emits 'error' for a thread that fails with no task on it; unheard, that would end the process.
  piscina.on('error', (error: unknown) => options.onThreadError?.(error));
  let threadsLost = 0;
  piscina.on('workerDestroy', () => {
    if (!closing) threadsLost++;
  });

  // One skipped task per thread, all at once: abortable tasks only go to idle threads, so each lands on its own
  // thread and comes back once that thread has loaded the model code.
  const warmed = Promise.all(
    Array.from({ length: options.threads }, () => {
      const cancelled = new Int32Array(new SharedArrayBuffer(4));
      cancelled[0] = 1;
      const task: SolverTask = { name: '', input: null, cancelled };
      return piscina.run(task, { signal: new AbortController().signal });
    }),
  ).then(
    () => undefined,
    () => undefined,
  );

  let waiting = 0;
  let running = 0;
  let closing = false;
  let destroyed: Promise<void> | undefined;
  /** Recent compute time, ms (exponential mean), for the Retry-After estimate. */
  let typicalComputeMs = 1000;

  function retryAfterSeconds(): string {
    const seconds = Math.ceil(((waiting / options.threads + 1) * typicalComputeMs) / 1000);
    return String(Math.min(60, Math.max(1, seconds)));
  }

  function busy(detail: string, slug = 'overloaded'): ProblemError {
    return new ProblemError(problem(503, slug, 'The service is busy', detail), { 'retry-after': retryAfterSeconds() });
  }

  function stopError(why: StopReason): Error {
    switch (why) {
      case 'client':
        return new ClientGoneError();
      case 'queue':
        return busy(`No solver thread became free within ${options.queueTimeoutMs} ms; retry shortly.`, 'queue-timeout');
      case 'compute':
        return new ProblemError(
          problem(
            422,
            'solve-timeout',
            'The solve is over its time budget',
            `The calculation did not finish within ${options.solveTimeoutMs} ms of compute. Ask for less work: method "closed-form" where the endpoint offers it, fewer sensitivity or sweep points, or a texture whose groove width, depth and pitch are closer to one another.`,
          ),
        );
    }
  }

  /** The thread died under a request (out of memory, a fault in native code): that request fails, the pool replaces the thread. */
  function threadFailure(error: unknown): Error {
    if ((error as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY') {
      return new ProblemError(
        problem(422, 'solve-memory', 'The solve is over its memory budget', `The calculation needed more than the ${options.workerMemoryMb} MB a solver thread may use; ask for less work (a coarser method or fewer points).`),
      );
    }
    options.onThreadError?.(error);
    return busy('The solver thread failed while computing this request; retry.', 'solver-thread-failed');
  }

  return {
    async run(name, input, runOptions = {}) {
      const callerSignal = runOptions.signal;
      if (callerSignal?.aborted) throw new ClientGoneError();
      if (closing) throw busy('This replica is shutting down; retry on another.', 'draining');
      if (waiting >= options.maxQueued) throw busy(`${waiting} solves are already waiting for a solver thread; retry shortly.`);

      const controller = new AbortController();
      const { port1, port2 } = new MessageChannel();
      const cancelled = new Int32Array(new SharedArrayBuffer(4));
      let stoppedBy: StopReason | undefined;
      let queued = true;
      let startedAt = 0;
      let computeTimer: NodeJS.Timeout | undefined;
      waiting++;

      return new Promise<CalculationOutput>((resolve, reject) => {
        let settled = false;
        const settle = (outcome: () => CalculationOutput) => {
          if (settled) return;
          settled = true;
          if (queued) waiting--;
          if (startedAt > 0) running--;
          clearTimeout(queueTimer);
          clearTimeout(computeTimer);
          callerSignal?.removeEventListener('abort', onCallerAbort);
          port1.close();
          try {
            resolve(outcome());
          } catch (error) {
            reject(error);
          }
        };
        const stop = (why: StopReason) => {
          if (stoppedBy) return;
          stoppedBy = why;
          if (queued) {
            // Not started: flag the task so the thread that picks it up skips it. No thread is killed
            // (it may be loading the model code, or about to be free for the next solve).
            Atomics.store(cancelled, 0, 1);
            settle(() => {
              throw stopError(why);
            });
          } else {
            // Computing: the only way to stop a synchronous solve is to end its thread; piscina replaces it.
            controller.abort();
          }
        };
        const onCallerAbort = () => stop('client');
        callerSignal?.addEventListener('abort', onCallerAbort, { once: true });
        const queueTimer = setTimeout(() => stop('queue'), options.queueTimeoutMs);
        port1.once('message', () => {
          queued = false;
          waiting--;
          running++;
          startedAt = performance.now();
          clearTimeout(queueTimer);
          // Cancelled in the instant between the thread's check and its start message: stop it now.
          if (stoppedBy) controller.abort();
          else computeTimer = setTimeout(() => stop('compute'), options.solveTimeoutMs);
        });

        const task: SolverTask = { name, input, started: port2, cancelled };
        piscina.run(task, { signal: controller.signal, transferList: [port2] }).then(
          (out: CalculationOutput | ComputeFailure | TaskSkipped) =>
            settle(() => {
              if ('skipped' in out) throw stopError(stoppedBy ?? 'client');
              if (startedAt > 0) typicalComputeMs = 0.8 * typicalComputeMs + 0.2 * (performance.now() - startedAt);
              return unwrap(out);
            }),
          (error: unknown) =>
            settle(() => {
              if (stoppedBy) throw stopError(stoppedBy);
              // The pool is being destroyed (shutdown past the drain limit): not a thread failure.
              if (closing) throw busy('This replica is shutting down; retry on another.', 'draining');
              throw threadFailure(error);
            }),
        );
      });
    },
    stats: () => ({ waiting, running, threadsLost }),
    ready: () => warmed,
    close() {
      closing = true;
      destroyed ??= piscina.destroy();
      return destroyed;
    },
  };
}
