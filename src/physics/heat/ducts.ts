/**
 * Validation geometry of the field machinery: fully developed laminar flow and
 * heat transfer in rectangular ducts, whose friction factors and Nusselt
 * numbers Shah & London (1978, shahLondon1978) tabulate.
 */
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { solveCellDiffusion } from '../../numerics/cell-diffusion.js';
import { requireSolved, uniformCells } from './conduction-field.js';

export interface RectangularDuctResult {
  /** Fanning f·Re on D_h. */
  frictionFactorReynolds: number;
  /** Nu on D_h, axially uniform flux with peripherally uniform wall temperature (H1). */
  nusseltUniformFlux: number;
  /** Nu on D_h, uniform wall temperature (T), by inverse iteration. */
  nusseltUniformTemperature: number;
  inverseIterations: number;
}

/**
 * Fully developed laminar flow and heat transfer in a rectangular duct of
 * aspect ratio α = short/long side, on the finite-volume field machinery used
 * by {@link solveHeatCrossSection} (so the duct tables of Shah & London (Shah & London 1978)
 * validate it) [derived]:
 *  ∇²u = −1 (u = 0 on the walls): f·Re = D_h²/(2ū);
 *  ∇²T = u/ū (T = 0 on the walls): Nu_H1 = (A/Per) D_h/(−T_b);
 *  −∇²φ = λ² (u/ū) φ (φ = 0 on the walls), smallest λ²: Nu_T = λ² D_h²/4
 *  (energy balance h = k λ² A/Per, D_h = 4A/Per).
 * @param aspectRatio α, 0 < α ≤ 1
 * @param cellsAcrossShortSide grid cells across the short side (default 64; long side α⁻¹ times more)
 */
export function rectangularDuctLaminar(aspectRatio: number, cellsAcrossShortSide = 64): RectangularDuctResult {
  if (!(Number.isFinite(aspectRatio) && aspectRatio > 0 && aspectRatio <= 1)) {
    throw new DomainError('aspect ratio must lie in (0, 1]', { field: 'aspectRatio' });
  }
  const ny = Math.max(8, Math.round(cellsAcrossShortSide));
  const nx = Math.max(ny, Math.round(ny / aspectRatio));
  const width = 1;
  const height = aspectRatio;
  const widths = uniformCells(width, nx);
  const heights = uniformCells(height, ny);
  const n = nx * ny;
  const area = width * height;
  const perimeter = 2 * (width + height);
  const Dh = (4 * area) / perimeter;
  const common = {
    widths,
    heights,
    coefficient: new Float64Array(n).fill(1),
    bottom: { kind: 'value', value: 0 } as const,
    top: { kind: 'value', value: 0 } as const,
    sides: 'zero-value' as const,
    tolerance: 1e-12,
    maxIterations: 600,
  };
  const flow = solveCellDiffusion({ ...common, source: new Float64Array(n).fill(-1) });
  requireSolved(flow, 'duct velocity');
  let sum = 0;
  for (let c = 0; c < n; c++) sum += flow.field[c];
  const mean = sum / n;
  const shape = Float64Array.from(flow.field, (u) => u / mean);
  const heat = solveCellDiffusion({ ...common, source: shape });
  requireSolved(heat, 'duct temperature');
  let mixed = 0;
  for (let c = 0; c < n; c++) mixed += shape[c] * heat.field[c];
  const bulk = mixed / n;
  // Inverse iteration on −∇²φ = λ² Û φ: φ ← A⁻¹(Û φ), Rayleigh quotient λ² = (φ_k, Ûφ_k)/(φ_{k+1}, Ûφ_k).
  let phi: Float64Array = Float64Array.from(shape);
  let eigen = 0;
  let previous = Number.POSITIVE_INFINITY;
  let iterations = 0;
  for (; iterations < 200; iterations++) {
    const weighted = Float64Array.from(phi, (v, c) => -shape[c] * v);
    const next = solveCellDiffusion({ ...common, source: weighted, initialGuess: phi });
    requireSolved(next, 'duct eigenfunction');
    let numerator = 0;
    let denominator = 0;
    let norm = 0;
    for (let c = 0; c < n; c++) {
      numerator += phi[c] * shape[c] * phi[c];
      denominator += next.field[c] * shape[c] * phi[c];
      norm = Math.max(norm, Math.abs(next.field[c]));
    }
    eigen = numerator / denominator;
    phi = Float64Array.from(next.field, (v) => v / norm);
    if (Math.abs(eigen - previous) <= 1e-11 * eigen) break;
    previous = eigen;
  }
  if (iterations >= 200) throw new ConvergenceError('duct eigenvalue', iterations, Math.abs(eigen - previous));
  return {
    frictionFactorReynolds: (Dh * Dh) / (2 * mean),
    nusseltUniformFlux: ((area / perimeter) * Dh) / -bulk,
    nusseltUniformTemperature: (eigen * Dh * Dh) / 4,
    inverseIterations: iterations,
  };
}
