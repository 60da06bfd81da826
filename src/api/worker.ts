/** Worker-thread entry: run one calculation's compute step; failures come back as data. */
import { computeChecked, problemFromError, type ComputeFailure } from './calculation.js';
import type { CalculationOutput } from './envelope.js';
import { calculationByName } from './routes/index.js';

export default function runInWorker(task: { name: string; input: unknown }): CalculationOutput | ComputeFailure {
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
