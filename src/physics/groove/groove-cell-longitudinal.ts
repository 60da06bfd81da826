/**
 * Exact longitudinal slip of a lubricant-filled groove cell at closed-form
 * cost: eigenfunction (modal) Galerkin matching of the working liquid above
 * and the lubricant in the groove, extrapolated in the number of modes.
 *
 * Problem (Stokes flow along the grooves, flat interface at the groove mouth):
 * one period P, groove |z| < w/2, −d < y < 0 holding lubricant of viscosity
 * N μ_w, working liquid of viscosity μ_w above, no slip (u = 0) on the ridge
 * tops, groove walls and floor, velocity and shear stress continuous across
 * the mouth, uniform shear τ far above. Laplace's equation in both fluids.
 *
 * Method [derived, ours]. With f(z) the interface velocity on the mouth,
 * (i) the liquid above is the Fourier series u = y τ/μ_w + b + Σ a_n cos(α_n z) e^{−α_n y},
 *     α_n = 2πn/P, whose shear on y = 0 is τ − μ_w Σ α_n a_n cos(α_n z)
 *     (a Dirichlet-to-Neumann map, diagonal in Fourier modes);
 * (ii) the groove is the series u = Σ c_m cos(k_m z) sinh(k_m (y + d))/sinh(k_m d),
 *     k_m = (2m + 1)π/w, which vanishes on walls and floor and whose shear on
 *     the mouth is N μ_w Σ c_m k_m coth(k_m d) cos(k_m z) (diagonal in groove modes).
 * Shear continuity on the mouth, tested with the groove modes (Galerkin), is a
 * symmetric positive-definite system for c_m: the groove block is diagonal and
 * the liquid block is the Fourier overlap matrix of ../../numerics/window-fourier.ts,
 * (8/P) k_i k_j Σ_n α_n cos²(α_n w/2)/((α_n² − k_i²)(α_n² − k_j²)). The slip
 * length is b = (1/P)∫ f dz, a quadratic functional of the solution, so the
 * M-mode Galerkin value rises monotonically to the exact one with error
 * ~ M^(−2λ), λ being the corner exponent at the groove lip (u ~ r^λ, from
 * tan(λπ) = −tan(λπ/2)/N; λ = ½ for N = 0, 2/3 for N = 1, → 1 for N → ∞).
 * One Cholesky factorisation gives the Galerkin values for every M ≤ M_max
 * (../../numerics/cholesky.ts); the sequence is extrapolated with the known
 * exponents (../../numerics/extrapolation.ts):
 *   b, lubricant flux:           last 4 M, exponents 2λ, 2λ+1, 2λ+2;
 *   mean interfacial shear:      last 5 M, exponents λ, λ+1, 2λ (a shear
 *                                functional converges only like M^(−λ));
 *   centre velocity and shear:   the alternating mode series summed by Euler's
 *                                transformation at M_max/2, 3M_max/4, M_max,
 *                                exponents 2λ, 2λ+1.
 * N = 0 (shear-free mouth) returns Philip's (1972) closed form exactly.
 *
 * Accuracy: measured in docs/slip-core.md against FreeFEM references over
 * w/P 0.02–0.98, d/w 0.01–10 and N 1e-4–1e4 (tests: against those, a scipy
 * finite-difference reference, Philip's limit and the lid-sheared duct limits).
 * Cost: O(M²/φ) overlap sums and an M³/6 factorisation, M = 24 to 48; about
 * 0.1 ms per call.
 *
 * References
 * 1. Philip J.R. (1972) Flows satisfying mixed no-slip and no-shear conditions.
 *    Z. Angew. Math. Phys. 23, 353–372.
 * 2. Schönecker C., Baier T., Hardt S. (2014) Influence of the enclosed fluid on
 *    the flow over a microstructured surface in the Cassie state. J. Fluid Mech.
 *    740, 168–195, doi:10.1017/jfm.2013.647 (schoenecker2014; a study of the same cell problem).
 * 3. Richardson L.F. (1911) Phil. Trans. R. Soc. Lond. A 210, 307–357, doi:10.1098/rsta.1911.0009 (richardson1911).
 */
import { choleskyInPlace, forwardSubstitute, leadingSolution, nestedProducts } from '../../numerics/cholesky.js';
import { extrapolateToInfiniteResolution } from '../../numerics/extrapolation.js';
import { eulerAlternatingTail } from '../../numerics/series.js';
import { BoundedCache } from '../../numerics/memo.js';
import { smallestWedgeExponent } from '../../numerics/wedge-exponent.js';
import { addWindowOverlapMatrix, windowFourierSums } from '../../numerics/window-fourier.js';
import { type GrooveCellInput, type GrooveCellResult } from './groove-cell.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import type { Warning } from '../../core/notes.js';
import { philipSlipLengthLongitudinal } from '../slip/stripe-slip.js';
import { grooveGeometry, positiveInput, RangeCautions } from './core-input.js';

/**
 * Same geometry and fluids as the field solver's input (../../numerics/groove-cell.ts), plus the mode count
 * M_max (default 24, more for w/P > 0.85 where the thin ridges need them; ≥ 12). Validated range: w/P 0.02–0.98,
 * d/w 0.01–10, N = 0 and 1e-4–1e4.
 */
export type LongitudinalGrooveInput = Pick<GrooveCellInput, 'pitch' | 'grooveWidth' | 'grooveDepth' | 'viscosityRatio' | 'appliedShear' | 'waterViscosity'> & {
  modes?: number;
};

/**
 * The field solver's summary quantities (../../numerics/groove-cell.ts, same names and units; the slip-length
 * error estimate here is the spread of the extrapolation), plus the lip's corner exponent, the modes used and
 * range cautions.
 */
export type LongitudinalGrooveSlip = Pick<
  GrooveCellResult,
  | 'slipLength'
  | 'slipLengthErrorEstimate'
  | 'meanInterfaceVelocity'
  | 'meanInterfaceShear'
  | 'interfacialShearRatio'
  | 'localSlipAtCentre'
  | 'meanLocalSlip'
  | 'lubricantFlux'
> & {
  /** Corner exponent λ at the groove lip (u ~ r^λ). */
  edgeExponent: number;
  /** Groove modes used (0 for the closed form at N = 0). */
  modes: number;
  warnings: Warning[];
};

/** Lip exponent: liquid half-plane (coefficient 1) and lubricant quadrant (N) between two no-slip rays. */
export function longitudinalEdgeExponent(viscosityRatio: number): number {
  if (viscosityRatio === 0) return 0.5;
  // It depends on N alone, which a sweep over the geometry or a design's sensitivity steps repeat.
  return EDGE_EXPONENTS.getOrCompute(String(viscosityRatio), () => lipExponent(viscosityRatio));
}

const EDGE_EXPONENTS = new BoundedCache<number>(64);

function lipExponent(viscosityRatio: number): number {
  return smallestWedgeExponent(
    [
      { angle: Math.PI, coefficient: 1 },
      { angle: Math.PI / 2, coefficient: viscosityRatio },
    ],
    'zero-value',
    1,
    8, // the one root lies in (½, 1): a coarse scan brackets it
  );
}

/**
 * Mode count for the measured accuracy (docs/slip-core.md): 24 groove modes resolve the lip to the extrapolation's
 * asymptotic range up to w/P = 0.85; thinner ridges (width (1 − φ)P) need the modes to resolve them too.
 */
function defaultModeCount(fraction: number): number {
  if (fraction <= 0.85) return 24;
  return fraction <= 0.93 ? 36 : 48;
}

/**
 * Longitudinal slip of the groove cell by modal matching (method in the module
 * comment). Throws DomainError for impossible input (non-positive lengths,
 * w ≥ P, N < 0) and ConvergenceError if the Galerkin matrix is not positive
 * definite (not observed in the validated range).
 */
export function longitudinalGrooveSlip(input: LongitudinalGrooveInput): LongitudinalGrooveSlip {
  const { pitch, width, depth } = grooveGeometry(input.pitch, input.grooveWidth, input.grooveDepth);
  const ratio = input.viscosityRatio;
  if (typeof ratio !== 'number' || !Number.isFinite(ratio) || ratio < 0) {
    throw new DomainError('viscosity ratio must be a finite number ≥ 0', { field: 'viscosityRatio' });
  }
  const shear = input.appliedShear ?? 1;
  if (!Number.isFinite(shear)) throw new DomainError('applied shear must be finite', { field: 'appliedShear' });
  const viscosity = input.waterViscosity === undefined ? 1 : positiveInput(input.waterViscosity, 'waterViscosity');
  const phi = width / pitch;
  const cautions = new RangeCautions().geometry(phi, depth / width);
  if (ratio !== 0) cautions.check(ratio, 1e-4, 1e4, 'N');
  const warnings = cautions.warnings;
  const velocityScale = (shear * pitch) / viscosity; // τP/μ_w
  if (ratio === 0) {
    // Shear-free mouth: Philip (1972) exactly; ∫ f dz = P b, so the mean interface velocity is (τ/μ_w) P b / w.
    const b = philipSlipLengthLongitudinal(pitch, width);
    return {
      slipLength: b,
      slipLengthErrorEstimate: 0,
      meanInterfaceVelocity: (shear / viscosity) * (b / phi),
      meanInterfaceShear: 0,
      interfacialShearRatio: 0,
      localSlipAtCentre: null,
      meanLocalSlip: null,
      lubricantFlux: 0,
      edgeExponent: 0.5,
      modes: 0,
      warnings,
    };
  }
  const lambda = longitudinalEdgeExponent(ratio);
  const modeCount = Math.max(12, Math.round(input.modes ?? defaultModeCount(phi)));
  const solution = solveModes(phi, depth / pitch, ratio, modeCount);

  // Extrapolation in the mode count (module comment).
  const fit = (sequence: Float64Array, first: number, exponents: number[], last = modeCount): number => {
    const resolutions = new Float64Array(last - first + 1);
    const values = new Float64Array(resolutions.length);
    for (let i = 0; i < resolutions.length; i++) {
      resolutions[i] = first + i;
      values[i] = sequence[first + i - 1];
    }
    return extrapolateToInfiniteResolution(resolutions, values, exponents).value;
  };
  const slipExponents = [2 * lambda, 2 * lambda + 1, 2 * lambda + 2];
  const b = fit(solution.slip, modeCount - 3, slipExponents);
  // The same fit four modes earlier: its spread from b gauges the extrapolation error.
  const bEarlier = fit(solution.slip, modeCount - 7, slipExponents, modeCount - 4);
  const flux = fit(solution.flux, modeCount - 3, slipExponents);
  const shearRatio = fit(solution.shear, modeCount - 4, [lambda, lambda + 1, 2 * lambda]);
  const centreModes = [Math.round(modeCount / 2), Math.round((3 * modeCount) / 4), modeCount];
  const centreValues = centreModes.map((m) => solution.centre(m));
  const centreExponents = [2 * lambda, 2 * lambda + 1];
  const centreVelocity = extrapolateToInfiniteResolution(centreModes, centreValues.map((v) => v.velocity), centreExponents).value;
  const centreShear = extrapolateToInfiniteResolution(centreModes, centreValues.map((v) => v.shear), centreExponents).value;

  const meanVelocity = b / phi; // in τP/μ_w
  return {
    slipLength: b * pitch,
    slipLengthErrorEstimate: Math.abs(b - bEarlier) * pitch,
    meanInterfaceVelocity: meanVelocity * velocityScale,
    meanInterfaceShear: shearRatio * shear,
    interfacialShearRatio: shearRatio,
    localSlipAtCentre: centreShear > 0 ? (centreVelocity / centreShear) * pitch : null,
    meanLocalSlip: shearRatio > 0 ? (meanVelocity / shearRatio) * pitch : null,
    lubricantFlux: flux * velocityScale * pitch * pitch,
    edgeExponent: lambda,
    modes: modeCount,
    warnings,
  };
}

interface ModalSolution {
  /** b(M)/P for M = 1 … M_max (entry M − 1). */
  slip: Float64Array;
  /** Mean interfacial shear ratio for each M. */
  shear: Float64Array;
  /** Lubricant flux/(τP³/μ_w) for each M. */
  flux: Float64Array;
  /** Centre velocity (units τP/μ_w) and centre shear ratio of the M-mode solution. */
  centre: (m: number) => { velocity: number; shear: number };
}

/** The Galerkin system in units P = τ = μ_w = 1 (module comment), with the sign-flipped unknowns c̃_m = (−1)^m c_m. */
function solveModes(phi: number, depth: number, ratio: number, modeCount: number): ModalSolution {
  const half = phi / 2;
  const k = new Float64Array(modeCount);
  for (let m = 0; m < modeCount; m++) k[m] = ((2 * m + 1) * Math.PI) / phi;
  const sums = windowFourierSums({ period: 1, halfWidth: half, wavenumbers: k });
  const matrix = new Float64Array(modeCount * modeCount);
  // Liquid block (2/P) Σ α Φ̂_i Φ̂_j with Φ̂_m(α) = ±2k_m cos(αa)/(k_m² − α²): gains 2k_m, scale 2.
  const gains = Float64Array.from(k, (km) => 2 * km);
  addWindowOverlapMatrix(matrix, modeCount, sums, k, gains, 2);
  const rhs = new Float64Array(modeCount);
  const shearWeights = new Float64Array(modeCount);
  const fluxWeights = new Float64Array(modeCount);
  const cothValues = new Float64Array(modeCount);
  for (let m = 0; m < modeCount; m++) {
    const km = k[m];
    // A Fourier mode with α_n = k_m has cos(α_n a) = 0: only the diagonal keeps its limit (2/P) α Φ̂² = 2 k a².
    if (sums.coincident[m] >= 0) matrix[m * modeCount + m] += 2 * km * half * half;
    const coth = 1 / Math.tanh(km * depth);
    cothValues[m] = coth;
    matrix[m * modeCount + m] += ratio * km * coth * half; // groove block: N k coth(k d) ∫cos² = N k coth · a
    rhs[m] = 2 / km; // ∫_mouth cos(k_m z) dz = 2(−1)^m/k_m
    shearWeights[m] = (2 * ratio * coth) / phi; // (1/w) ∫ N ∂u/∂y over the mouth
    fluxWeights[m] = (2 * Math.tanh((km * depth) / 2)) / (km * km);
  }
  if (!choleskyInPlace(matrix, modeCount)) {
    throw new ConvergenceError('modal longitudinal slip: Galerkin matrix not positive definite', modeCount, NaN);
  }
  const y = forwardSubstitute(matrix, rhs, modeCount);
  const slip = nestedProducts(y, y);
  const shear = nestedProducts(y, forwardSubstitute(matrix, shearWeights, modeCount));
  const flux = nestedProducts(y, forwardSubstitute(matrix, fluxWeights, modeCount));
  const centre = (m: number): { velocity: number; shear: number } => {
    const x = leadingSolution(matrix, modeCount, y, m);
    const stress = Float64Array.from(x, (v, i) => v * ratio * k[i] * cothValues[i]);
    // c_m = (−1)^m c̃_m: at z = 0 both series alternate; sum half directly, the rest by Euler's transformation.
    const split = Math.floor(m / 2);
    let velocity = 0;
    let shearSum = 0;
    for (let i = 0; i < split; i++) {
      const sign = i % 2 === 0 ? 1 : -1;
      velocity += sign * x[i];
      shearSum += sign * stress[i];
    }
    const differences = Math.min(8, m - split - 1);
    return {
      velocity: velocity + eulerAlternatingTail(x, split, differences),
      shear: shearSum + eulerAlternatingTail(stress, split, differences),
    };
  };
  return { slip, shear, flux, centre };
}
