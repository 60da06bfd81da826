/** Solver-thread side of the pool: run one calculation's compute step; failures come back as data. */
import { workerData } from 'node:worker_threads';
import { installUserCatalogue, type UserCatalogueData } from '../materials/user-catalogue.js';
import { computeChecked, problemFromError, type ComputeFailure } from './calculation.js';
import type { CalculationOutput } from './envelope.js';
import type { SolverTask, TaskSkipped } from './pool.js';
import { calculationByName } from './routes/index.js';

// In a solver thread: the user catalogue the main thread validated (src/api/pool.ts). In the main thread workerData is undefined.
const given = (workerData as { userCatalogue?: UserCatalogueData } | undefined)?.userCatalogue;
if (given !== undefined) installUserCatalogue(given);

export default function runInWorker(task: SolverTask): CalculationOutput | ComputeFailure | TaskSkipped {
  // Given up while it waited (queue budget, client gone): nothing to compute.
  if (task.cancelled && Atomics.load(task.cancelled, 0) === 1) {
    task.started?.close();
    return { skipped: true };
  }
  // Tell the pool the compute budget starts now (the time before was queue wait).
  task.started?.postMessage(0);
  task.started?.close();
  return computeSafely(task.name, task.input);
}

export function computeSafely(name: string, input: unknown): CalculationOutput | ComputeFailure {
  const definition = calculationByName(name);
  if (!definition) return { failed: true, problem: problemFromError(new Error(`unknown calculation ${name}`)), message: 'unknown calculation' };
  try {
    return computeChecked(definition, input as never);
  } catch (error) {
    return { failed: true, problem: problemFromError(error), message: error instanceof Error ? error.message : String(error) };
  }
}
