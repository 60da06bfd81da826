/**
 * Sweep of the lubricant's thermal conductivity for the heat model: the
 * Nusselt and heat-flux ratios over a log-spaced range, and the conductivity
 * that delivers the most heat. The heat model supplies how the thermal slip and
 * the ratios follow from a conductivity (closed form or conduction field,
 * laminar or turbulent), with the velocity slip held fixed.
 */
import { DomainError } from '../../core/errors.js';

export interface HeatSensitivity {
  /** Lubricant conductivities, W/(m·K), log-spaced. */
  lubricantConductivity: number[];
  /** Nu/Nu₀ at each (null where the apparent Nu is undefined). */
  nusseltRatio: (number | null)[];
  /** q/q₀, heat delivered at the same temperature difference, at each (null where the estimate fails). */
  heatFluxRatio: (number | null)[];
  /** Conductivity with the largest heat-flux ratio on the sweep, W/(m·K). */
  bestLubricantConductivity: number;
  bestHeatFluxRatio: number;
  /** Which b_t model the sweep used. */
  thermalSlipMethod: 'exact-core' | 'closed-form' | 'field';
}

export interface SweepInput {
  /** Number of conductivities, 2–101. */
  points: number;
  /** Range of lubricant conductivities, W/(m·K). */
  low: number;
  high: number;
  /** b_t at a lubricant conductivity, m. */
  thermalSlip: (conductivity: number) => number;
  /** Nu/Nu₀ and q/q₀ at a thermal slip (null where undefined). */
  ratiosAt: (thermalSlipLength: number) => { nusseltRatio: number | null; heatFluxRatio: number | null };
  thermalSlipMethod: 'exact-core' | 'closed-form' | 'field';
}

/** The sweep; DomainError naming options.sensitivity.points for a bad count or when no point is finite. */
export function conductivitySweep(input: SweepInput): HeatSensitivity {
  const { points, low, high } = input;
  if (!(Number.isInteger(points) && points >= 2 && points <= 101)) {
    throw new DomainError('sensitivity points must be an integer between 2 and 101', { field: 'sensitivity.points' });
  }
  const lubricantConductivity: number[] = [];
  const nusseltRatio: (number | null)[] = [];
  const heatFluxRatio: (number | null)[] = [];
  let best = -1;
  for (let p = 0; p < points; p++) {
    const k = low * (high / low) ** (p / (points - 1));
    const ratios = input.ratiosAt(input.thermalSlip(k));
    lubricantConductivity.push(k);
    nusseltRatio.push(ratios.nusseltRatio);
    heatFluxRatio.push(ratios.heatFluxRatio);
    const v = ratios.heatFluxRatio;
    if (v !== null && (best < 0 || v > (heatFluxRatio[best] as number))) best = p;
  }
  if (best < 0) throw new DomainError('no sweep point gives a positive thermal resistance', { field: 'sensitivity.points' });
  return {
    lubricantConductivity,
    nusseltRatio,
    heatFluxRatio,
    bestLubricantConductivity: lubricantConductivity[best],
    bestHeatFluxRatio: heatFluxRatio[best] as number,
    thermalSlipMethod: input.thermalSlipMethod,
  };
}
