/**
 * The groove meniscus of the drainage model (./drainage.ts): a circular arc
 * pinned at the two top edges of the groove, its sag for a curvature, the
 * capillary pressure as a function of the filled fraction of the cross-section,
 * and the steady filled column that a receding front and an end meniscus hold
 * against the shear and gravity along the groove. Derivations in ./drainage.ts.
 */
import { monotoneCubic, type Interpolant } from '../../numerics/interpolation.js';
import { pressureDrivenGrooveFlux, shearDrivenGrooveFlux } from '../groove/groove-duct.js';

function segmentArea(chord: number, sag: number): number {
  const s = Math.abs(sag);
  if (s === 0) return 0;
  const radius = (chord * chord + 4 * s * s) / (8 * s);
  const half = Math.asin(Math.min(1, chord / (2 * radius)));
  // s ≤ chord/2 here, so the arc is at most a semicircle.
  return radius * radius * half - (chord / 2) * (radius - s);
}

/** Smaller sag of the pinned arc with curvature κ over chord w: s = [1 − √(1 − κ²w²/4)]/κ. */
export function sagForCurvature(chord: number, curvature: number): number {
  if (curvature === 0) return 0;
  const k = Math.abs(curvature);
  const root = Math.sqrt(Math.max(0, 1 - (k * k * chord * chord) / 4));
  return (Math.sign(curvature) * (1 - root)) / k;
}

/** Capillary pressure versus filling, p(f), for a pinned arc (module comment). */
export function capillaryPressureCurve(
  width: number,
  depth: number,
  interfacialTension: number,
  recedingCurvature: number,
): { curve: Interpolant; frontFill: number; fullBulgeFill: number; suction: number } {
  const sagMax = Math.min(sagForCurvature(width, Math.min(recedingCurvature, 2 / width)), depth);
  const sagMin = -width / 2;
  const points = 400;
  const fills: number[] = [];
  const pressures: number[] = [];
  for (let k = points; k >= 0; k--) {
    const u = k / points;
    const s = sagMin + (sagMax - sagMin) * u;
    const fill = 1 - (Math.sign(s) * segmentArea(width, s)) / (width * depth);
    const curvature = (8 * s) / (width * width + 4 * s * s);
    fills.push(fill);
    pressures.push(-interfacialTension * curvature);
  }
  return {
    curve: monotoneCubic(fills, pressures),
    frontFill: fills[0],
    fullBulgeFill: fills[fills.length - 1],
    suction: -pressures[0],
  };
}

/**
 * Simpson intervals of the steady-column quadrature: 100 keep it within 1e-9 of a 3 200-interval
 * quadrature on the tested cases (test/physics/retention/drainage.test.ts), at a quarter of the
 * 400 it used to take (each sample evaluates both duct coefficients).
 */
export const COLUMN_INTERVALS = 100;

export interface SteadyColumnInput {
  grooveWidth: number;
  grooveDepth: number;
  interfacialTension: number;
  interfacialShearStress: number;
  bodyForceGradient: number;
  recedingCurvature: number;
  /** Curvature of the end meniscus, 1/m: 0 (open end) or the spill curvature (closed end, bulging). */
  endCurvature: number;
  maxLength: number;
  /** Simpson intervals over the sag range (default {@link COLUMN_INTERVALS}). */
  intervals?: number;
}

export interface SteadyColumn {
  length: number;
  equivalentLength: number;
  truncated: boolean;
}

/**
 * Steady lubricant column of the finite-volume model, by quadrature [derived]:
 * zero net flux everywhere means dp/dx = G(h) + b with G(h) = τ_i Q̂_s(h)/Q̂_p(h) at the
 * local equivalent depth h = f d, so walking upstream from the end meniscus (sag s_end:
 * 0 at an open end, the spill bulge at a closed one) to the receding front (largest sag),
 *   L = ∫ γ κ'(s) ds/|G(h(s)) + b|,   V/(w d) = ∫ f(s) γ κ'(s) ds/|G(h(s)) + b|,
 * with κ(s) = 8s/(w² + 4s²). The column is cut at `maxLength` (the segment).
 * @returns filled length (m) and equivalent full-section length V/(w d) (m).
 */
export function steadyColumn(input: SteadyColumnInput): SteadyColumn {
  return steadyColumnProfile(input)(input.maxLength);
}

/**
 * The steady column of {@link steadyColumn} for any cut: the integrand is sampled once and each call
 * `cut(maxLength)` only accumulates the Simpson intervals up to it (what a search over the segment length
 * needs: the samples do not depend on the cut). Same values as {@link steadyColumn} for each maxLength.
 */
export function steadyColumnProfile(input: Omit<SteadyColumnInput, 'maxLength'>): (maxLength: number) => SteadyColumn {
  const { grooveWidth: w, grooveDepth: d, interfacialTension: gamma, interfacialShearStress: tau, bodyForceGradient: body } = input;
  const sagFront = Math.min(sagForCurvature(w, Math.min(input.recedingCurvature, 2 / w)), d);
  const sagEnd = -sagForCurvature(w, Math.min(input.endCurvature, 2 / w));
  const slope = (s: number): number => (8 * (w * w - 4 * s * s)) / (w * w + 4 * s * s) ** 2;
  const fillAt = (s: number): number => 1 - (Math.sign(s) * segmentArea(w, s)) / (w * d);
  const intervals = input.intervals ?? COLUMN_INTERVALS;
  const step = (sagFront - sagEnd) / intervals;
  // Integrand samples at the interval ends and midpoints (2·intervals + 1 of them): dx/ds and dv/ds.
  const dx = new Float64Array(2 * intervals + 1);
  const dv = new Float64Array(2 * intervals + 1);
  for (let j = 0; j <= 2 * intervals; j++) {
    const s = sagEnd + (j / 2) * step;
    const f = fillAt(s);
    const h = Math.max(f, 1e-6) * d;
    const drive = Math.abs((tau * shearDrivenGrooveFlux(w, h)) / pressureDrivenGrooveFlux(w, h) + body);
    dx[j] = drive > 0 ? (gamma * slope(s)) / drive : Number.MAX_VALUE;
    dv[j] = f * dx[j];
  }
  // The share θ of an interval whose integral of the quadratic through its three samples (Simpson's own
  // interpolant) is given.
  const partial = (theta: number, a: number, m: number, b: number): number =>
    step * theta * (a + (theta * (-3 * a + 4 * m - b)) / 2 + ((theta * theta) * (2 * a - 4 * m + 2 * b)) / 3);
  return (maxLength: number): SteadyColumn => {
    let length = 0;
    let volume = 0;
    for (let k = 0; k < intervals; k++) {
      const [l, m, r] = [2 * k, 2 * k + 1, 2 * k + 2];
      // Simpson's rule on each sub-interval.
      const dLength = (step / 6) * (dx[l] + 4 * dx[m] + dx[r]);
      const dVolume = (step / 6) * (dv[l] + 4 * dv[m] + dv[r]);
      if (length + dLength >= maxLength) {
        // The column ends inside this interval: the share θ of it that makes up the rest of the length, by bisection.
        const rest = maxLength - length;
        let lo = 0;
        let hi = 1;
        for (let iteration = 0; iteration < 60 && hi - lo > 1e-15; iteration++) {
          const theta = 0.5 * (lo + hi);
          if (partial(theta, dx[l], dx[m], dx[r]) < rest) lo = theta;
          else hi = theta;
        }
        const theta = 0.5 * (lo + hi);
        return { length: maxLength, equivalentLength: volume + partial(theta, dv[l], dv[m], dv[r]), truncated: true };
      }
      length += dLength;
      volume += dVolume;
    }
    return { length, equivalentLength: volume, truncated: false };
  };
}
