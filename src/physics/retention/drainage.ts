/**
 * Shear- and gravity-driven drainage of lubricant along streamwise grooves:
 * the lumped closed form and the one-dimensional finite-volume model.
 *
 * Lumped model [derived; mechanism of Wexler, Jacobi & Stone 2015, ref. 1]: a
 * filled length L (full cross-section w·d) behind a receding front whose meniscus
 * holds the capillary pressure −Δp_max, ahead of an exit at the working-fluid
 * pressure. The net flux out is (τ_i Q̂_s − Q̂_p Δp_max/L)/μ_o, so volume
 * conservation w d dL/dt = −Q gives
 *   dL/dt = −V_s (1 − L∞/L),  V_s = τ_i Q̂_s/(μ_o w d),  L∞ = Δp_max/G,  G = τ_i Q̂_s/Q̂_p,
 * with the closed-form solution (separable: L dL/(L − L∞) = −V_s dt)
 *   t(L) = [(L₀ − L) + L∞ ln((L₀ − L∞)/(L − L∞))]/V_s     (L∞ < L ≤ L₀).
 * The same equation, with L∞ replaced by the pinning critical length, describes
 * a pinned plug that slides out of an open end until it is short enough to hold.
 *
 * Finite-volume model [derived]: the state is the filled fraction f of the
 * groove cross-section in each cell, f = A/(w d). Across the groove the
 * lubricant–working-fluid interface is a circular arc pinned at the two top
 * edges (sag s > 0 into the groove, s < 0 bulging out); its curvature
 * κ = 8s/(w² + 4s²) sets the capillary pressure p = −γκ (lubricant minus working
 * fluid), and the arc's segment area sets the filling, giving p(f). The sag ends
 * where the meniscus can no longer stay pinned: at the receding-angle curvature
 * or when it touches the floor (whichever comes first: the largest capillary
 * suction −Δp_max of retention.ts). Below that filling a cell holds a receding
 * front: p stays at −Δp_max and the cell empties at the rate the column behind
 * draws from it. Face flux, with the duct coefficients at the local equivalent
 * depth h = f d (Q̂_s, Q̂_p of groove-duct.ts, ref. 2):
 *   Q = [τ_i Q̂_s(h) − Q̂_p(h)(∂p/∂x − b)]/μ_o,  b = (ρ_o − ρ_w) g sin α (along the flow),
 * multiplied by a smooth availability factor of the donor cell so an empty cell
 * gives nothing. Ends: an open end is a meniscus pinned at the groove end that
 * lets lubricant out only when the lubricant pressure would exceed the working
 * fluid's (p = 0); a closed end or a segment barrier holds it until the bulge
 * over the groove reaches the spill curvature κ_spill = 2 sin θ_A/w (Gibbs'
 * edge criterion for a 90° edge, ref. 3), beyond which the excess spills out of
 * the groove and is counted as lost. Time integration: variable-step BDF2 in
 * flux form (src/numerics/conservation-bdf2.ts), so the volume plus the
 * cumulative loss is conserved to rounding.
 *
 * Validity: Stokes flow in the groove (groove Reynolds number ≪ 1), slowly
 * varying filling along the groove (length scales ≫ w, d), flat-interface duct
 * coefficients at the equivalent depth, no thermally activated creep (ref. 4:
 * near L∞ the real drainage is slower than this model), no plug break-up, and
 * no advancing-angle hysteresis inside the groove (a front that moves upstream
 * re-imbibes at the receding suction; rare under downstream shear). Accuracy:
 * first order in the cell size (steady volume 2.8 % off the steadyColumn
 * quadrature at 120 cells in a 50 mm groove with θ_R = 0, 1.5 % at 240).
 *
 * References:
 *  [1] Wexler, J. S., Jacobi, I. & Stone, H. A. 2015 Shear-driven failure of
 *      liquid-infused surfaces. Phys. Rev. Lett. 114, 168301. doi:10.1103/PhysRevLett.114.168301
 *  [2] Shah, R. K. & London, A. L. 1978 Laminar Flow Forced Convection in Ducts. Academic Press.
 *  [3] Oliver, J. F., Huh, C. & Mason, S. G. 1977 Resistance to spreading of liquids
 *      by sharp edges (oliver1977, whose citation says which details are unconfirmed).
 *  [4] Colosqui, C. E., Wexler, J. S., Liu, Y. & Stone, H. A. 2016 Crossover from
 *      shear-driven to thermally activated drainage of liquid-infused microscale
 *      capillaries. Phys. Rev. Fluids 1, 064101. doi:10.1103/PhysRevFluids.1.064101
 */
import { integrateConservationChain, type ConservationChain } from '../../numerics/conservation-bdf2.js';
import { uniformMonotoneCubics } from '../../numerics/interpolation.js';
import { brent } from '../../numerics/roots.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import { capillaryPressureCurve } from './meniscus.js';
import { pressureDrivenGrooveFlux, shearDrivenGrooveFlux } from '../groove/groove-duct.js';

/**
 * Time for the lumped filled length to fall from L₀ to L (module comment):
 * t = [(L₀ − L) + L∞ ln((L₀ − L∞)/(L − L∞))]/V_s.
 * @param initialLength L₀, m; @param length L, m (L∞ < L ≤ L₀)
 * @param retainedLength L∞, m (≥ 0); @param drainageSpeed V_s, m/s (> 0)
 * @returns s; Infinity is never returned: L ≤ L∞ gives a DomainError.
 */
export function lumpedDrainageTime(initialLength: number, length: number, retainedLength: number, drainageSpeed: number): number {
  if (!(drainageSpeed > 0) || !(retainedLength >= 0) || !(length > retainedLength) || !(length <= initialLength)) {
    throw new DomainError('lumped drainage time needs L∞ < L ≤ L₀ and V_s > 0', { field: 'length' });
  }
  const logTerm = retainedLength > 0 ? retainedLength * Math.log((initialLength - retainedLength) / (length - retainedLength)) : 0;
  return (initialLength - length + logTerm) / drainageSpeed;
}

/**
 * Filled length of the lumped model at time t (inverse of {@link lumpedDrainageTime}
 * by Brent's method); L₀ ≤ L∞ stays put.
 */
export function lumpedRetainedLength(time: number, initialLength: number, retainedLength: number, drainageSpeed: number): number {
  // No drainage yet, or less than the rounding of L₀ (the inversion has nothing to resolve).
  if (initialLength <= retainedLength || !(drainageSpeed * time > Number.EPSILON * initialLength)) return initialLength;
  if (retainedLength === 0) return Math.max(0, initialLength - drainageSpeed * time);
  const f = (length: number): number => lumpedDrainageTime(initialLength, length, retainedLength, drainageSpeed) - time;
  // Bracket: t(lo) ≥ time + L∞/V_s because the logarithm alone exceeds V_s·time/L∞ there.
  // Kept a few ulps above L∞ so the logarithm stays finite when the exponential underflows.
  const gap = Math.max((initialLength - retainedLength) * Math.exp(-(drainageSpeed * time) / retainedLength - 1), 8 * Number.EPSILON * retainedLength);
  const lo = retainedLength + gap;
  if (f(lo) <= 0) return lo;
  const root = brent(f, lo, initialLength, { xTolerance: 1e-15 * initialLength });
  if (!root.converged) throw new ConvergenceError('lumped drainage inversion', root.iterations, root.residual);
  return root.root;
}

/** Inputs of the finite-volume drainage model, SI. */
export interface DrainageInput {
  grooveWidth: number;
  grooveDepth: number;
  /** Length of one segment between barriers (the whole groove when there are none), m. */
  segmentLength: number;
  /** Number of segments in series along the groove (≥ 1). */
  segments: number;
  /** Ends of the whole groove; barriers between segments are always closed. */
  grooveEnds: 'open' | 'closed';
  interfacialTension: number;
  /** τ_i on the lubricant interface, Pa, positive downstream. */
  interfacialShearStress: number;
  lubricantViscosity: number;
  /** b = (ρ_o − ρ_w) g sin α along the flow, Pa/m (positive pushes the lubricant downstream). */
  bodyForceGradient: number;
  /** Largest capillary suction curvature κ_max at a receding front, 1/m (> 0). */
  recedingCurvature: number;
  /** Spill curvature at closed ends and barriers, 1/m (≥ 0). */
  spillCurvature: number;
  /** Initial filled fraction of each segment, placed against its downstream end (0 < f ≤ 1). */
  initialFill: number;
  /** s (> 0). */
  duration: number;
  /** Cells per segment (default chosen so the whole groove has about 120, at least 30 per segment). */
  cellsPerSegment?: number;
  /** Points in the returned timeline (default 150, at most 200). */
  timelinePoints?: number;
  /** Local-error tolerances of the time integrator on the cell fillings (defaults 1e-3, 1e-3). */
  relativeTolerance?: number;
  /** Step budget of the time integration (default 200 000). */
  maxSteps?: number;
  absoluteTolerance?: number;
}

export interface TimelinePoint {
  time: number;
  /** Lubricant volume over the volume of the full grooves. */
  retainedFraction: number;
  /** Equivalent full-section filled length per segment, m. */
  retainedLength: number;
}

export interface DrainageResult {
  timeline: TimelinePoint[];
  finalRetainedFraction: number;
  /** Time to reach 90 % of the change from the initial to the final fraction, s; null when nothing changed. */
  timeTo90PercentChange: number | null;
  /** |V + V_lost − V₀|/V₀ at the end. */
  conservationError: number;
  cells: number;
  steps: number;
  rejectedSteps: number;
  /** Filled fraction per cell at the end (downstream order). */
  finalFill: number[];
  /** Filling below which a cell holds a receding front. */
  frontFill: number;
}

function smoothAvailability(fill: number, threshold: number): number {
  if (fill <= 0) return 0;
  if (fill >= threshold) return 1;
  const u = fill / threshold;
  return u * u * (3 - 2 * u);
}

/**
 * One-dimensional finite-volume drainage of lubricant along grooves with segment
 * barriers (module comment). Throws DomainError for impossible input and
 * ConvergenceError if the time integration fails.
 */
export function solveDrainage(input: DrainageInput): DrainageResult {
  const {
    grooveWidth: w,
    grooveDepth: d,
    segmentLength,
    segments,
    interfacialTension: gamma,
    interfacialShearStress: tau,
    lubricantViscosity: mu,
    bodyForceGradient: body,
    recedingCurvature,
    spillCurvature,
    initialFill,
    duration,
  } = input;
  const positive: [number, string][] = [
    [w, 'grooveWidth'],
    [d, 'grooveDepth'],
    [segmentLength, 'segmentLength'],
    [gamma, 'interfacialTension'],
    [mu, 'lubricantViscosity'],
    [recedingCurvature, 'recedingCurvature'],
    [duration, 'duration'],
  ];
  for (const [v, field] of positive) {
    if (!(Number.isFinite(v) && v > 0)) throw new DomainError(`${field} must be positive and finite`, { field });
  }
  if (!(Number.isInteger(segments) && segments >= 1)) throw new DomainError('segments must be a positive integer', { field: 'segments' });
  if (!(initialFill > 0 && initialFill <= 1)) throw new DomainError('initial fill must lie in (0, 1]', { field: 'initialFill' });
  if (!Number.isFinite(tau) || !Number.isFinite(body) || !(spillCurvature >= 0)) {
    throw new DomainError('shear, body force and spill curvature must be finite', { field: 'interfacialShearStress' });
  }

  const perSegment = input.cellsPerSegment ?? Math.max(30, Math.min(200, Math.round(120 / segments)));
  const n = perSegment * segments;
  const dx = segmentLength / perSegment;
  const { curve, frontFill, fullBulgeFill, suction } = capillaryPressureCurve(w, d, gamma, recedingCurvature);
  const bulgePressure = gamma * (2 / w);
  const pressureOf = (fill: number): number => {
    if (fill <= frontFill) return -suction;
    if (fill >= fullBulgeFill) return bulgePressure * (1 + 10 * (fill - fullBulgeFill));
    return curve.value(fill);
  };
  // Duct coefficients tabulated over the equivalent depths the model can reach, on a uniform grid and read
  // together (one interval search per face).
  const depthLow = frontFill * d * 0.999;
  const depthHigh = fullBulgeFill * d * 1.001 + d * 0.5;
  const tablePoints = 80;
  const depthStep = (depthHigh - depthLow) / tablePoints;
  const shearFlux = new Float64Array(tablePoints + 1);
  const pressureFlux = new Float64Array(tablePoints + 1);
  for (let k = 0; k <= tablePoints; k++) {
    const h = depthLow + depthStep * k;
    shearFlux[k] = shearDrivenGrooveFlux(w, h);
    pressureFlux[k] = pressureDrivenGrooveFlux(w, h);
  }
  const ductCoefficients = uniformMonotoneCubics(depthLow, depthStep, [shearFlux, pressureFlux]);
  const coefficients = new Float64Array(2);
  const availabilityThreshold = 0.05 * frontFill;
  const spillPressure = gamma * spillCurvature;
  const openEnds = input.grooveEnds === 'open';

  const capacity = w * d * dx;
  // Per cell, once per flux evaluation: capillary pressure and the duct coefficients at its equivalent depth
  // (a face reads those of the fuller of its two cells, an end face those of its one cell).
  const cellFill = new Float64Array(n).fill(Number.NaN);
  const cellPressure = new Float64Array(n);
  const cellShear = new Float64Array(n);
  const cellConductance = new Float64Array(n);
  const fluxWithGradient = (cell: number, gradient: number): number => (tau * cellShear[cell] - cellConductance[cell] * (gradient - body)) / mu;
  const chain: ConservationChain = {
    size: n,
    capacities: new Float64Array(n).fill(capacity),
    faceFluxes(fill: Float64Array, leaving: Float64Array, entering: Float64Array): void {
      for (let i = 0; i < n; i++) {
        const f = fill[i];
        // A cell whose filling is the one of the previous evaluation keeps its values (the Jacobian's colour
        // evaluations move a third of the cells).
        if (f === cellFill[i]) continue;
        cellFill[i] = f;
        cellPressure[i] = pressureOf(f);
        ductCoefficients(d * Math.min(Math.max(f, frontFill), fullBulgeFill + 0.5), coefficients);
        cellShear[i] = coefficients[0];
        cellConductance[i] = coefficients[1];
      }
      for (let face = 0; face <= n; face++) {
        const left = face - 1;
        const right = face;
        const atSegmentStart = face % perSegment === 0;
        if (atSegmentStart) {
          // An end or a barrier: each side lets lubricant out only past its threshold pressure.
          const isUpstreamEnd = face === 0;
          const isDownstreamEnd = face === n;
          let out = 0;
          if (left >= 0) {
            const threshold = isDownstreamEnd && openEnds ? 0 : spillPressure;
            const q = fluxWithGradient(left, (threshold - cellPressure[left]) / (dx / 2));
            out = Math.max(0, q) * smoothAvailability(fill[left], availabilityThreshold);
          }
          let into = 0;
          if (right < n) {
            const threshold = isUpstreamEnd && openEnds ? 0 : spillPressure;
            const q = fluxWithGradient(right, (cellPressure[right] - threshold) / (dx / 2));
            into = Math.min(0, q) * smoothAvailability(fill[right], availabilityThreshold);
          }
          leaving[face] = out;
          entering[face] = into;
          continue;
        }
        const fl = fill[left];
        const fr = fill[right];
        const q = fluxWithGradient(fl >= fr ? left : right, (cellPressure[right] - cellPressure[left]) / dx);
        const donor = q >= 0 ? fl : fr;
        const value = q * smoothAvailability(donor, availabilityThreshold);
        leaving[face] = value;
        entering[face] = value;
      }
    },
  };

  // Initial state: each segment filled against its downstream end.
  const y0 = new Float64Array(n);
  for (let s = 0; s < segments; s++) {
    const filledCells = initialFill * perSegment;
    for (let k = 0; k < perSegment; k++) {
      const fromEnd = perSegment - k; // cells counted from the downstream end, 1-based
      const share = Math.min(1, Math.max(0, filledCells - (fromEnd - 1)));
      y0[s * perSegment + k] = share;
    }
  }
  const totalCapacityVolume = w * d * segmentLength * segments;
  const initialVolume = y0.reduce((a, b) => a + b, 0) * capacity;

  // Accepted-step history for the timeline and the 90 % time.
  const times: number[] = [0];
  const volumes: number[] = [initialVolume];
  const characteristicSpeed = Math.abs(tau * shearDrivenGrooveFlux(w, d)) / (mu * w * d) + Math.abs(body) * pressureDrivenGrooveFlux(w, d) / (mu * w * d);
  const firstStep = Math.min(duration * 1e-4, characteristicSpeed > 0 ? (0.01 * dx) / characteristicSpeed : duration * 1e-4);
  const result = integrateConservationChain(chain, y0, 0, duration, {
    initialStep: Math.max(firstStep, duration * 1e-12),
    // A cap well above what the error control allows while anything drains: it only bounds the steps across a
    // state at rest, where the timeline between accepted steps is linear anyway (was duration/20: 13 more steps).
    maxStep: duration / 5,
    relativeTolerance: input.relativeTolerance ?? 1e-3,
    absoluteTolerance: input.absoluteTolerance ?? 1e-3,
    newtonTolerance: 1e-11,
    // Drained to its steady column long before the duration (the usual case): the rest of the timeline is flat (a cell
    // may still move by 1e-4 of its filling: a tenth of the local tolerance, far below the cells' own error).
    restTolerance: 1e-4,
    ...(input.maxSteps === undefined ? {} : { maxSteps: input.maxSteps }),
    onStep(time, fill) {
      let volume = 0;
      for (let i = 0; i < n; i++) volume += Math.max(0, fill[i]);
      times.push(time);
      volumes.push(volume * capacity);
    },
  });
  if (!result.converged) {
    throw new ConvergenceError(`drainage time integration failed: ${result.reason ?? 'unknown'}`, result.steps, result.conservationError);
  }

  const sampleAt = (t: number): number => {
    let lo = 0;
    let hi = times.length - 1;
    if (t >= times[hi]) return volumes[hi];
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (times[mid] <= t) lo = mid;
      else hi = mid;
    }
    const u = (t - times[lo]) / (times[hi] - times[lo]);
    return volumes[lo] + u * (volumes[hi] - volumes[lo]);
  };
  const points = Math.max(2, Math.min(200, input.timelinePoints ?? 150));
  const timeline: TimelinePoint[] = [];
  for (let k = 0; k < points; k++) {
    // Quadratic spacing: dense early, where drainage is fastest.
    const t = duration * (k / (points - 1)) ** 2;
    const volume = sampleAt(t);
    timeline.push({ time: t, retainedFraction: volume / totalCapacityVolume, retainedLength: volume / (w * d * segments) });
  }
  const finalVolume = volumes[volumes.length - 1];
  const change = finalVolume - initialVolume;
  let timeTo90: number | null = null;
  if (Math.abs(change) > 1e-9 * initialVolume) {
    const target = initialVolume + 0.9 * change;
    for (let k = 1; k < times.length; k++) {
      const a = volumes[k - 1] - target;
      const b = volumes[k] - target;
      if (a === 0) {
        timeTo90 = times[k - 1];
        break;
      }
      if (a * b < 0 || b === 0) {
        timeTo90 = times[k - 1] + ((times[k] - times[k - 1]) * a) / (a - b);
        break;
      }
    }
  }
  return {
    timeline,
    finalRetainedFraction: finalVolume / totalCapacityVolume,
    timeTo90PercentChange: timeTo90,
    conservationError: result.conservationError,
    cells: n,
    steps: result.steps,
    rejectedSteps: result.rejectedSteps,
    finalFill: Array.from(result.y),
    frontFill,
  };
}
