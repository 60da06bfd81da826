/** Solver-thread side of the pool: run one calculation's compute step, or a named task (a batch of sweep points); failures come back as data. */
import { workerData } from 'node:worker_threads';
import { installUserCatalogue, type UserCatalogueData } from '../materials/user-catalogue.js';
import { computeChecked, problemFromError, type ComputeFailure } from './calculation.js';
import type { CalculationOutput } from './envelope.js';
import type { SolverTask, TaskSkipped } from './pool.js';
import { calculationByName } from './routes/index.js';
import { runSweepBatch, SWEEP_BATCH_TASK } from './sweep/points.js';
import { runWindowBatch, WINDOW_BATCH_TASK } from './window/run.js';

// In a solver thread: the user catalogue the main thread validated (src/api/pool.ts). In the main thread workerData is undefined.
const given = (workerData as { userCatalogue?: UserCatalogueData } | undefined)?.userCatalogue;
if (given !== undefined) installUserCatalogue(given);

/** Tasks a solver thread runs besides the calculations, by name. */
const TASKS: Record<string, (input: unknown) => unknown> = { [SWEEP_BATCH_TASK]: runSweepBatch, [WINDOW_BATCH_TASK]: runWindowBatch };

export default function runInWorker(task: SolverTask): unknown {
  // Given up while it waited (queue budget, client gone): nothing to compute.
  if (task.cancelled && Atomics.load(task.cancelled, 0) === 1) {
    task.started?.close();
    return { skipped: true } satisfies TaskSkipped;
  }
  // Tell the pool the compute budget starts now (the time before was queue wait).
  task.started?.postMessage(0);
  task.started?.close();
  return computeSafely(task.name, task.input);
}

export function computeSafely(name: string, input: unknown): unknown {
  const task = Object.hasOwn(TASKS, name) ? TASKS[name] : undefined;
  if (task) {
    try {
      return task(input);
    } catch (error) {
      return { failed: true, problem: problemFromError(error), message: error instanceof Error ? error.message : String(error) } satisfies ComputeFailure;
    }
  }
  return computeCalculation(name, input);
}

/** One calculation's compute step by its name; failures come back as data. */
export function computeCalculation(name: string, input: unknown): CalculationOutput | ComputeFailure {
  const definition = calculationByName(name);
  if (!definition) return { failed: true, problem: problemFromError(new Error(`unknown calculation ${name}`)), message: 'unknown calculation' };
  try {
    return computeChecked(definition, input as never);
  } catch (error) {
    return { failed: true, problem: problemFromError(error), message: error instanceof Error ? error.message : String(error) };
  }
}
