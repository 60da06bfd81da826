/**
 * The exact flat-interface slip of the groove cell in both directions at closed-form cost: the modal
 * longitudinal core (../groove/groove-cell-longitudinal.ts) and the tabulated-operator transverse core
 * (../groove/groove-cell-transverse.ts), with their measured range. Method and measured error of both:
 * docs/slip-core.md. Any flow angle follows from the two: for Stokes flow over a texture that does not vary
 * along the grooves the effective slip is a symmetric tensor with eigenvectors along and across the grooves
 * (Bazant & Vinogradova 2008; Kamrin, Bazant & Stone 2010), so b(θ) = b_∥ cos²θ + b_⊥ sin²θ
 * (./stripe-slip.ts, obliqueSlipLengths).
 *
 * Inside the range the answers are within the bounds of docs/slip-core.md (slip lengths 1e-4 longitudinal,
 * 2e-3 transverse against the field solver; interfacial shear ratio 2e-3). Outside it the cores still answer,
 * with a caution per quantity outside (code `outside-validated-range`); their accuracy there is not measured.
 */
import type { Warning } from '../../core/notes.js';
import { BoundedCache } from '../../numerics/memo.js';
import { longitudinalGrooveSlip, type LongitudinalGrooveSlip } from '../groove/groove-cell-longitudinal.js';
import { TRANSVERSE_CORE_RANGE, transverseGrooveSlip, type TransverseGrooveInput, type TransverseGrooveSlip } from '../groove/groove-cell-transverse.js';

/** The range over which both cores' errors were measured (docs/slip-core.md); N = 0 is exact (Philip 1972). */
export const EXACT_CORE_RANGE = TRANSVERSE_CORE_RANGE;

export interface ExactGrooveSlip {
  longitudinal: LongitudinalGrooveSlip;
  transverse: TransverseGrooveSlip;
  /** True when w/P, d/w and N all lie inside {@link EXACT_CORE_RANGE} (or N = 0). */
  insideRange: boolean;
  /** Range cautions of both cores, each once. */
  warnings: Warning[];
}

/**
 * Interface fractions the cores are run at, beyond the measured range: the longitudinal core's Fourier sums grow
 * like 1/φ (at w/P = 1e-3 about 20 times its cost at 0.02, a few ms) and thinner ridges than 1e-3 P are beyond its
 * mode counts. Outside this reach the callers answer with the closed form and a caution.
 */
export const EXACT_CORE_REACH = { interfaceFraction: [1e-3, 0.999] } as const;

/** Whether the cores are run for this interface fraction (see {@link EXACT_CORE_REACH}). */
export function exactCoreReaches(interfaceFraction: number): boolean {
  return interfaceFraction >= EXACT_CORE_REACH.interfaceFraction[0] && interfaceFraction <= EXACT_CORE_REACH.interfaceFraction[1];
}

/** Whether a groove cell lies inside the range where both cores' errors were measured. */
export function insideExactCoreRange(interfaceFraction: number, depthOverWidth: number, viscosityRatio: number): boolean {
  const within = (value: number, [low, high]: readonly [number, number]) => value >= low && value <= high;
  return (
    within(interfaceFraction, EXACT_CORE_RANGE.interfaceFraction) &&
    within(depthOverWidth, EXACT_CORE_RANGE.depthOverWidth) &&
    (viscosityRatio === 0 || within(viscosityRatio, EXACT_CORE_RANGE.viscosityRatio))
  );
}

/**
 * Both directions of the exact groove-cell slip (SI in, SI out: lengths m, velocities m/s, stresses Pa).
 * Throws DomainError for impossible input (non-positive lengths, w ≥ P, N < 0), ConvergenceError if a
 * Galerkin matrix is not positive definite (not observed over the measured range).
 */
export function exactGrooveSlip(input: TransverseGrooveInput): ExactGrooveSlip {
  // One design asks for the same cell more than once (an assessment's slip under its own method, and the
  // closed form's measured error for the waves): the answer is kept for the few most recent cells.
  const key = `${input.pitch}|${input.grooveWidth}|${input.grooveDepth}|${input.viscosityRatio}|${input.appliedShear}|${input.waterViscosity}`;
  return RECENT_CELLS.getOrCompute(key, () => solveGrooveCell(input));
}

/** The last few cells' answers (exact inputs as the key; results are never mutated by callers). */
const RECENT_CELLS = new BoundedCache<ExactGrooveSlip>(16);

function solveGrooveCell(input: TransverseGrooveInput): ExactGrooveSlip {
  const longitudinal = longitudinalGrooveSlip(input);
  const transverse = transverseGrooveSlip(input);
  const insideRange = insideExactCoreRange(input.grooveWidth / input.pitch, input.grooveDepth / input.grooveWidth, input.viscosityRatio);
  const warnings: Warning[] = [];
  for (const w of [...longitudinal.warnings, ...transverse.warnings]) {
    if (!warnings.some((seen) => seen.code === w.code && seen.message === w.message)) warnings.push(w);
  }
  return { longitudinal, transverse, insideRange, warnings };
}
