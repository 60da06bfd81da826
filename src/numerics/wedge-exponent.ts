/**
 * Leading singular exponent λ of the solution u ~ r^λ Θ(θ) of div(k grad u) = 0
 * near a corner where several wedge-shaped sectors of constant coefficient k
 * meet (a multi-material corner).
 *
 * In each sector Θ'' = −λ²Θ; across a sector boundary Θ and kΘ' are
 * continuous. The state (Θ, kΘ') is carried around the corner by 2 × 2
 * transfer matrices; λ is an eigenvalue when the state returns to itself
 * (a full turn, 'periodic') or when Θ vanishes at both ends of an open wedge
 * ('zero-value' ends, u = 0 on both bounding rays). This is the classical
 * corner analysis of elliptic problems in non-smooth domains (Kondrat'ev,
 * Grisvard; common practice, no source). The exponent sets
 * how fast a modal or finite-element approximation converges near the corner,
 * which the modal slip solvers use to extrapolate.
 */
import { brent } from './roots.js';

export interface WedgeSector {
  /** Opening angle of the sector, rad (> 0). */
  angle: number;
  /** Coefficient k in the sector (> 0, finite). */
  coefficient: number;
}

/** (Θ, kΘ') after one turn through the sectors, starting from (theta0, flux0). */
function carry(lambda: number, sectors: readonly WedgeSector[], theta0: number, flux0: number): [number, number] {
  let theta = theta0;
  let flux = flux0;
  for (const { angle, coefficient } of sectors) {
    const c = Math.cos(lambda * angle);
    const s = Math.sin(lambda * angle);
    const next = theta * c + (flux / (lambda * coefficient)) * s;
    flux = -lambda * coefficient * theta * s + flux * c;
    theta = next;
  }
  return [theta, flux];
}

/**
 * Smallest exponent λ in (0, upper] for the given sectors, or `upper` when none
 * lies below it (e.g. a homogeneous full turn, whose solutions are regular).
 * 'zero-value': u = 0 on both bounding rays of an open wedge. 'periodic': the
 * sectors close a full turn (their angles sum to 2π). `steps` sets the scan grid
 * (two roots closer than upper/steps may be missed; the physics callers' roots are
 * further apart than that for the coefficient ratios they allow).
 */
export function smallestWedgeExponent(sectors: readonly WedgeSector[], ends: 'zero-value' | 'periodic', upper = 1, steps = 100): number {
  const characteristic = (lambda: number): number => {
    if (ends === 'zero-value') return carry(lambda, sectors, 0, 1)[0];
    // Periodic: det(T − I) = 2 − trace(T) for the unimodular transfer matrix T.
    const [t11] = carry(lambda, sectors, 1, 0);
    const [, t22] = carry(lambda, sectors, 0, 1);
    return 2 - t11 - t22;
  };
  // Scan for the first sign change; in the periodic case roots of a weak contrast come in
  // close pairs either side of an integer, so the grid must be fine enough to see the first.
  let previous = characteristic(upper / steps / 4);
  let lo = upper / steps / 4;
  for (let i = 1; i <= steps; i++) {
    const x = (upper * i) / steps;
    const value = characteristic(x);
    if (value === 0) return x;
    if (previous * value < 0) {
      const r = brent(characteristic, lo, x);
      return r.converged ? r.root : x;
    }
    previous = value;
    lo = x;
  }
  return upper;
}
