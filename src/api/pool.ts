/**
 * Worker-thread pool for heavy solves (field solver, surfactant interface
 * solver, drainage timeline, sweeps), so the event loop keeps answering
 * health checks and cheap requests. With zero threads (tests, CLI) the same
 * compute runs inline.
 */
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { CalculationOutput } from './envelope.js';
import type { ComputeFailure } from './calculation.js';
import { problem, ProblemError } from './problem.js';

export interface SolverPool {
  run(name: string, input: unknown): Promise<CalculationOutput>;
  queueDepth(): number;
  close(): Promise<void>;
}

export interface PoolOptions {
  threads: number;
  maxQueued: number;
  timeoutMs: number;
  /** Inline runner used when threads = 0. */
  inline: (name: string, input: unknown) => CalculationOutput | ComputeFailure;
}

function unwrap(out: CalculationOutput | ComputeFailure): CalculationOutput {
  if ('failed' in out) throw new ProblemError(out.problem);
  return out;
}

export function createSolverPool(options: PoolOptions): SolverPool {
  if (options.threads === 0) {
    return {
      run: async (name, input) => unwrap(options.inline(name, input)),
      queueDepth: () => 0,
      close: async () => {},
    };
  }
  const here = import.meta.url;
  const workerUrl = new URL(here.endsWith('.ts') ? './worker.ts' : './worker.js', here);
  const piscina = new Piscina({
    filename: fileURLToPath(workerUrl),
    minThreads: 1,
    maxThreads: options.threads,
    // Running from TypeScript sources (tests, `npm run dev`): let the worker load .ts too.
    execArgv: here.endsWith('.ts') ? ['--import', 'tsx'] : [],
    idleTimeout: 60_000,
  });
  return {
    async run(name, input) {
      if (piscina.queueSize >= options.maxQueued) {
        throw new ProblemError(problem(503, 'overloaded', 'The service is busy', 'Too many solves are queued; retry shortly.'), { 'retry-after': '2' });
      }
      const controller = new AbortController();
      const timer = setTimeout(() => controller.abort(), options.timeoutMs);
      try {
        const out = (await piscina.run({ name, input }, { signal: controller.signal })) as CalculationOutput | ComputeFailure;
        return unwrap(out);
      } catch (error) {
        if (controller.signal.aborted) {
          throw new ProblemError(
            problem(422, 'solve-timeout', 'The solve exceeded its time budget', `The calculation did not finish within ${options.timeoutMs} ms; use a coarser grid or fewer points.`),
          );
        }
        throw error;
      } finally {
        clearTimeout(timer);
      }
    },
    queueDepth: () => piscina.queueSize,
    close: () => piscina.destroy(),
  };
}
