/**
 * What holds lubricant in a sheared groove (mechanisms 1–3 of ./retention.ts):
 * the largest capillary curvature of the receding meniscus and the back-pressure
 * gradient it must balance (capillary back-pressure, Wexler, Jacobi & Stone 2015,
 * wexler2015), the pinning pressure of a plug (Furmidge 1962, furmidge1962, with
 * the shape factor discussed by ElSherbini & Jacobi 2006, elsherbini2006), and the
 * retained lengths with gravity added to the drive. Symbols as in ./retention.ts.
 */
import type { AnglesUnderWorkingFluid } from '../wetting/wetting.js';
import { pressureDrivenGrooveFlux, shearDrivenGrooveFlux } from '../groove/groove-duct.js';

const DEG = Math.PI / 180;

export type CurvatureLimit = 'receding-angle' | 'floor-touching' | 'none';

/**
 * Largest capillary curvature a groove meniscus sustains before the front recedes
 * (mechanism 1): 2 cos θ_R/w if its pinned arc reaches θ_R with sag ≤ d, else 8d/(w² + 4d²).
 * @param grooveWidth w, m; @param grooveDepth d, m; @param recedingAngle θ_R, degrees
 * @returns curvature, 1/m (0 when θ_R ≥ 90°), and which limit applies.
 */
export function maximumCapillaryCurvature(
  grooveWidth: number,
  grooveDepth: number,
  recedingAngle: number,
): { curvature: number; limit: CurvatureLimit } {
  if (recedingAngle >= 90) return { curvature: 0, limit: 'none' };
  const cosine = Math.cos(recedingAngle * DEG);
  const sag = (grooveWidth * (1 - Math.sin(recedingAngle * DEG))) / (2 * cosine);
  if (sag <= grooveDepth) return { curvature: (2 * cosine) / grooveWidth, limit: 'receding-angle' };
  return { curvature: (8 * grooveDepth) / (grooveWidth ** 2 + 4 * grooveDepth ** 2), limit: 'floor-touching' };
}

/** Back-pressure gradient that cancels the shear-driven flux, G = τ Q̂_s/Q̂_p, Pa/m. */
export function backPressureGradient(grooveWidth: number, grooveDepth: number, interfacialShear: number): number {
  return (interfacialShear * shearDrivenGrooveFlux(grooveWidth, grooveDepth)) / pressureDrivenGrooveFlux(grooveWidth, grooveDepth);
}

/**
 * Steady retained length of the capillary mechanism, L∞ = γ κ_max/G (module comment).
 * @returns m; 0 when no capillary suction, and Infinity is never returned (G ≤ 0 gives the full `cap`).
 */
export function capillaryRetainedLength(interfacialTension: number, curvature: number, gradient: number, cap = Number.MAX_VALUE): number {
  const g = Math.abs(gradient);
  if (!(g > 0)) return cap;
  return Math.min(cap, (interfacialTension * curvature) / g);
}

/**
 * Pinning pressure of a plug, Δp_pin = k γ (cos θ_R − cos θ_A)(w + 2d)/(w d), Pa (mechanism 2).
 */
export function pinningPressure(
  interfacialTension: number,
  advancingAngle: number,
  recedingAngle: number,
  grooveWidth: number,
  grooveDepth: number,
  shapeFactor = 1,
): number {
  const hysteresis = Math.max(0, Math.cos(recedingAngle * DEG) - Math.cos(advancingAngle * DEG));
  return (shapeFactor * interfacialTension * hysteresis * (grooveWidth + 2 * grooveDepth)) / (grooveWidth * grooveDepth);
}

export interface HoldLengths {
  capillary: number;
  pinning: number;
  drive: number;
}

export function holdLengths(
  w: number,
  d: number,
  gamma: number,
  tau: number,
  body: number,
  angles: AnglesUnderWorkingFluid,
  shapeFactor: number,
  cap: number,
): HoldLengths & { gradient: number; curvature: { curvature: number; limit: CurvatureLimit }; pin: number } {
  const curvature = maximumCapillaryCurvature(w, d, angles.receding);
  const gradient = backPressureGradient(w, d, tau);
  const drive = gradient + body;
  const pin = pinningPressure(gamma, angles.advancing, angles.receding, w, d, shapeFactor);
  return {
    gradient,
    curvature,
    pin,
    drive,
    capillary: capillaryRetainedLength(gamma, curvature.curvature, drive, cap),
    pinning: capillaryRetainedLength(1, pin, drive, cap),
  };
}
