/**
 * Input checks and validated-range cautions shared by the modal slip cores
 * (./longitudinal.ts, ./thermal.ts). Impossible input throws DomainError naming
 * the field; meaningful input outside the range where the cores' accuracy was
 * measured (docs/slip-core.md) gets a result and a caution.
 */
import { DomainError } from '../../core/errors.js';
import type { Warning } from '../../core/notes.js';

export function positiveInput(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || !(value > 0)) {
    throw new DomainError(`${field} must be a positive finite number`, { field });
  }
  return value;
}

/** Pitch, groove width and depth, checked: all positive, w < P. */
export function grooveGeometry(pitch: unknown, grooveWidth: unknown, grooveDepth: unknown): { pitch: number; width: number; depth: number } {
  const p = positiveInput(pitch, 'pitch');
  const width = positiveInput(grooveWidth, 'grooveWidth');
  const depth = positiveInput(grooveDepth, 'grooveDepth');
  if (!(width < p)) throw new DomainError('groove width must be smaller than the pitch', { field: 'grooveWidth' });
  return { pitch: p, width, depth };
}

/** Collects the cautions for values outside the validated range. */
export class RangeCautions {
  readonly warnings: Warning[] = [];

  /** Cautions unless low ≤ value ≤ high; `what` names the quantity as the user reads it. */
  check(value: number, low: number, high: number, what: string): this {
    if (value < low || value > high) {
      this.warnings.push({
        code: 'outside-validated-range',
        severity: 'caution',
        message: `${what} = ${value.toPrecision(3)} is outside ${low}–${high}, where the modal core's accuracy was measured.`,
      });
    }
    return this;
  }

  /** The geometry envelope common to both cores: 0.02 ≤ w/P ≤ 0.98, 0.01 ≤ d/w ≤ 10. */
  geometry(fraction: number, depthRatio: number): this {
    return this.check(fraction, 0.02, 0.98, 'w/P').check(depthRatio, 0.01, 10, 'd/w');
  }
}
