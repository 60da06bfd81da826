/** Every calculation endpoint, in the order the docs list them. */
import type { CalculationDefinition } from '../calculation.js';
import { flowCalculation } from './flow.js';
import { slipCalculation } from './slip.js';
import { wavesCalculation } from './waves.js';
import { wettingCalculation } from './wetting.js';
import { retentionCalculation } from './retention.js';
import { heatCalculation } from './heat.js';
import { surfactantCalculation } from './surfactant.js';
import { assessCalculation } from './assess.js';

export const CALCULATIONS: readonly CalculationDefinition[] = [flowCalculation, wettingCalculation, retentionCalculation, slipCalculation, wavesCalculation, surfactantCalculation, heatCalculation, assessCalculation].map(
  (c) => c as unknown as CalculationDefinition,
);

export function calculationByName(name: string): CalculationDefinition | undefined {
  return CALCULATIONS.find((c) => c.name === name);
}
