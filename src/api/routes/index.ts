/** Every calculation endpoint, in the order the docs list them. */
import type { CalculationDefinition } from '../calculation.js';
import { flowCalculation } from './flow.js';

export const CALCULATIONS: readonly CalculationDefinition[] = [flowCalculation as unknown as CalculationDefinition];

export function calculationByName(name: string): CalculationDefinition | undefined {
  return CALCULATIONS.find((c) => c.name === name);
}
