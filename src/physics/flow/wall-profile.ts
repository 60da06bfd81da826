/**
 * Mean streamwise velocity near a smooth wall in wall units, from Spalding's
 * single formula for the law of the wall, which covers the viscous sublayer,
 * the buffer layer and the logarithmic layer in one expression and is
 * explicit in y⁺:
 *
 *   y⁺ = u⁺ + e^(−κB) [e^(κu⁺) − 1 − κu⁺ − (κu⁺)²/2 − (κu⁺)³/6]
 *
 * with Spalding's own fit constants κ = 0.4, B = 5.5 (his printed coefficient
 * e^(−κB) = 0.1108). These are the constants of the fit, kept together with
 * it; the log-law κ of the drag calculations is {@link KARMAN_CONSTANT}.
 *
 * References:
 *  1. Spalding, D. B. (1961). A single formula for the "law of the wall".
 *     J. Appl. Mech. 28(3), 455–458. doi:10.1115/1.3641728
 *
 * Validity: smooth wall, zero pressure gradient, inner region (y⁺ up to a few
 * hundred; the wake of the outer flow is not represented).
 */
import { safeNewton } from '../../numerics/roots.js';

/** Spalding's fit constant κ (Spalding 1961). */
const SPALDING_KAPPA = 0.4;
/** Spalding's fit constant B (Spalding 1961). */
const SPALDING_INTERCEPT = 5.5;
/** Largest u⁺ evaluated: e^(κu⁺) stays far from overflow, and y⁺ there (~10¹⁷³) exceeds any flow. */
const MAX_VELOCITY_PLUS = 1000;

/** Edge of the viscous sublayer in wall units, y⁺ = 5 (common practice, no source). */
export const VISCOUS_SUBLAYER_EDGE_PLUS = 5;

/**
 * Wall distance y⁺ at which the mean velocity equals u⁺ (Spalding 1961).
 * @param velocityPlus u⁺ = u/u_τ, dimensionless, ≥ 0 (negative values give 0).
 * @returns y⁺ = y u_τ/ν, dimensionless.
 */
export function wallDistanceAtVelocityPlus(velocityPlus: number): number {
  const u = Math.min(Math.max(velocityPlus, 0), MAX_VELOCITY_PLUS);
  const x = SPALDING_KAPPA * u;
  // For small κu⁺ the bracket cancels to ~x⁴/24; the series avoids the loss of digits.
  const bracket = x < 1e-2 ? x ** 4 / 24 + x ** 5 / 120 + x ** 6 / 720 : Math.expm1(x) - x - (x * x) / 2 - (x * x * x) / 6;
  return u + Math.exp(-SPALDING_KAPPA * SPALDING_INTERCEPT) * bracket;
}

/**
 * Mean velocity u⁺ at wall distance y⁺: the inverse of
 * {@link wallDistanceAtVelocityPlus}, solved by safeguarded Newton in
 * 0 ≤ u⁺ ≤ y⁺ (the bracket holds because every extra term of the formula is
 * non-negative).
 * @param wallDistancePlus y⁺ ≥ 0, dimensionless.
 */
export function velocityPlusAtWallDistance(wallDistancePlus: number): number {
  if (!(wallDistancePlus > 0)) return 0;
  const yPlus = Math.min(wallDistancePlus, wallDistanceAtVelocityPlus(MAX_VELOCITY_PLUS));
  const scale = Math.exp(-SPALDING_KAPPA * SPALDING_INTERCEPT);
  const residual = (u: number) => {
    const x = SPALDING_KAPPA * u;
    return {
      value: wallDistanceAtVelocityPlus(u) - yPlus,
      derivative: 1 + scale * SPALDING_KAPPA * (Math.expm1(x) - x - (x * x) / 2),
    };
  };
  const upper = Math.min(yPlus, MAX_VELOCITY_PLUS);
  if (residual(upper).value === 0) return upper;
  const root = safeNewton(residual, 0, upper, Math.min(yPlus, 2.5 * Math.log(1 + yPlus) + 5));
  return Number.isFinite(root.root) ? root.root : upper;
}
