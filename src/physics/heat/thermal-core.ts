/**
 * Exact apparent thermal slip length of a lubricant-filled grooved wall by
 * modal matching: the conduction problem of ../heat.ts `thermalSlipField`
 * without a mesh.
 *
 * Problem: one period P; working liquid (conductivity k_w) above y = 0, a
 * textured layer −d < y < 0 of lubricant (k_o) in the groove |z| < w/2 and
 * solid (k_s) in the ridges, a solid substrate −d − s < y < −d (k_s) held at a
 * uniform temperature at its bottom, a uniform heat flux q far above. With
 * R = ΔT/q the total resistance and R_ref = (s + d)/k_s + L/k_w that of the
 * solid-filled wall, the thermal slip length is b_t = k_w (R − R_ref)
 * (positive = extra resistance), as in `thermalSlipField`.
 *
 * Method [derived, ours]. The layer is separable with the eigenmodes Z_j of
 * the piecewise-constant conductivity across it (../../numerics/layer-modes.ts):
 * T = Σ_j Z_j(z)[p_j sinh(μ_j (y + d)) − q_j sinh(μ_j y)]/sinh(μ_j d), so its
 * energy is diagonal in the traces p_j (top) and q_j (bottom). The liquid
 * above and the substrate below are Fourier series in z with diagonal
 * Dirichlet-to-Neumann maps (k_w α_n; k_s α_n coth(α_n s), k_s/s for the mean).
 * Writing both traces in the layer modes, the total energy is a symmetric
 * positive-definite quadratic form (a Galerkin method for the traces), whose
 * liquid and substrate blocks are Fourier overlap matrices of the modes,
 * since ∫ Z_j cos(αz) dz = 2 J_j cos(αa)/(α² − μ_j²) with J_j the slope jump
 * of Z_j at the groove wall (../../numerics/window-fourier.ts). Minimising it
 * with the heat input q gives the mean top temperature, hence R and b_t; the
 * Galerkin value of R rises monotonically with the number of modes. Truncating
 * the modes at μ ≤ Xπ/w (and keeping at least 32), the error falls like
 * X^(−2λ), λ the smallest corner exponent (the three-material lip, the groove
 * floor corners; ../../numerics/wedge-exponent.ts), so the values at X and X/2
 * from one nested Cholesky factorisation are Richardson-extrapolated. The
 * sequence jumps where a groove-type mode enters (near μw/π odd when k_o < k_s,
 * even when k_o > k_s), so both cut-offs sit midway between such modes: the
 * same phase of the sequence, which is what Richardson's rule assumes.
 *
 * Limits: k_o = k_s gives b_t = 0 exactly (returned without solving); k_o → 0
 * with k_s → ∞ gives Philip's adiabatic-groove value (P/π) ln sec(πφ/2); k_s → ∞
 * alone gives the longitudinal slip length with N = k_o/k_w.
 *
 * Accuracy and cost: measured in docs/slip-core.md against FreeFEM references
 * over every conductivity ratio in 1e-2–1e2, w/P 0.02–0.98, d/w 0.01–10,
 * s 0–2P. The mode count is about X/(2φ) for narrow grooves, so the cost of the
 * dense factorisation grows like φ^(−3) below w/P ≈ 0.2.
 *
 * References
 * 1. Philip J.R. (1972) Z. Angew. Math. Phys. 23, 353–372 (adiabatic-groove limit).
 * 2. Richardson L.F. (1911) Phil. Trans. R. Soc. Lond. A 210, 307–357, doi:10.1098/rsta.1911.0009 (richardson1911).
 */
import { choleskyInPlace, forwardSubstitute } from '../../numerics/cholesky.js';
import { extrapolateToInfiniteResolution } from '../../numerics/extrapolation.js';
import { layerModeTransform, twoPhaseLayerModes, type TwoPhaseLayerModes } from '../../numerics/layer-modes.js';
import { smallestWedgeExponent } from '../../numerics/wedge-exponent.js';
import { addWindowOverlapMatrix, windowFourierSums, type WindowSums } from '../../numerics/window-fourier.js';
import { ConvergenceError, DomainError } from '../../core/errors.js';
import type { Warning } from '../../core/notes.js';
import { type WallCell } from './conduction-field.js';
import { grooveGeometry, positiveInput, RangeCautions } from '../groove/core-input.js';

/**
 * The wall cell of the field method (../heat.ts `WallCell`: P, w, d, s, k_w, k_o, k_s in SI), plus the mode
 * cut-off X: modes with μ ≤ max(Xπ/w, 64π/P) (default 12; X rounded to the parity that falls between groove
 * resonances). Validated range: w/P 0.02–0.98, d/w 0.01–10,
 * s ≤ 2P, every conductivity ratio among k_w, k_o, k_s in 1e-2–1e2.
 */
export type ThermalGrooveInput = WallCell & { resolution?: number };

export interface ThermalGrooveSlip {
  /** Apparent thermal slip length b_t, m (positive = extra resistance against the solid-filled wall). */
  thermalSlipLength: number;
  /** |extrapolated − finest value|, m: a gauge of the truncation error, not a bound. */
  thermalSlipLengthErrorEstimate: number;
  /** Smallest corner exponent λ used for the extrapolation. */
  edgeExponent: number;
  /** Layer modes in the finest truncation. */
  modes: number;
  warnings: Warning[];
}

/** Smallest corner exponent of the cell: the lip (liquid, lubricant, solid) and the groove floor corners. */
export function thermalEdgeExponent(kw: number, ko: number, ks: number, withSubstrate: boolean): number {
  const lip = smallestWedgeExponent(
    [
      { angle: Math.PI, coefficient: kw },
      { angle: Math.PI / 2, coefficient: ko },
      { angle: Math.PI / 2, coefficient: ks },
    ],
    'periodic',
  );
  const floor = withSubstrate
    ? smallestWedgeExponent([{ angle: Math.PI / 2, coefficient: ko }, { angle: (3 * Math.PI) / 2, coefficient: ks }], 'periodic')
    : smallestWedgeExponent([{ angle: Math.PI / 2, coefficient: ks }, { angle: Math.PI / 2, coefficient: ko }], 'zero-value');
  return Math.min(lip, floor, 1);
}

/**
 * Thermal slip length of the grooved wall (module comment). Throws DomainError
 * for impossible input and ConvergenceError if the Galerkin matrix is not
 * positive definite (not observed in the validated range).
 */
export function thermalGrooveSlip(input: ThermalGrooveInput): ThermalGrooveSlip {
  const { pitch, width, depth } = grooveGeometry(input.pitch, input.grooveWidth, input.grooveDepth);
  const substrate = input.substrateThickness;
  if (typeof substrate !== 'number' || !Number.isFinite(substrate) || substrate < 0) {
    throw new DomainError('substrate thickness must be a finite number ≥ 0', { field: 'substrateThickness' });
  }
  const kw = positiveInput(input.workingConductivity, 'workingConductivity');
  const ko = positiveInput(input.lubricantConductivity, 'lubricantConductivity') / kw;
  const ks = positiveInput(input.solidConductivity, 'solidConductivity') / kw;
  const resolution = Math.max(2, input.resolution ?? 12);
  const phi = width / pitch;
  const cautions = new RangeCautions().geometry(phi, depth / width).check(substrate / pitch, 0, 2, 's/P');
  cautions.check(ko, 1e-2, 1e2, 'k_o/k_w').check(ks, 1e-2, 1e2, 'k_s/k_w').check(ko / ks, 1e-2, 1e2, 'k_o/k_s');
  const warnings = cautions.warnings;
  if (ko === ks) {
    // A uniform layer: the textured wall is the solid-filled wall (exact).
    return { thermalSlipLength: 0, thermalSlipLengthErrorEstimate: 0, edgeExponent: 1, modes: 1, warnings };
  }
  // Units P = k_w = q = 1 from here on. A substrate thinner than 1e-4 P is folded into the base
  // (its own resistance s/k_s cancels against the reference wall's to first order).
  const s = substrate / pitch < 1e-4 ? 0 : substrate / pitch;
  const d = depth / pitch;
  const lambda = thermalEdgeExponent(1, ko, ks, s > 0);
  // Cut-off μ ≤ max(Xπ/w, 2π·48/P): X groove half-wavelengths across the groove, and at least about 48 modes
  // (a thin ridge needs no more: measured, docs/slip-core.md). The coarse truncation is at half the cut-off.
  // Groove-type modes cluster near μw/π odd (k_o < k_s: the walls act as fixed-temperature ones) or even (k_o > k_s);
  // both truncations sit midway between two such clusters, so they cut the mode sequence at the same phase.
  const shift = ko > ks ? 1 : 0;
  const groove = (x: number): number => ((2 * Math.round((x - shift) / 2) + shift) * Math.PI) / phi;
  const cutoff = Math.max(groove(resolution), 2 * Math.PI * MINIMUM_MODES);
  const modes = twoPhaseLayerModes(1, phi / 2, ko, ks, cutoff);
  const count = modes.wavenumbers.length;
  const coarse = countBelow(modes.wavenumbers, cutoff === 2 * Math.PI * MINIMUM_MODES ? cutoff / 2 : groove(resolution / 2));
  const system = assemble(modes, phi / 2, d, s, ko, ks);
  if (!choleskyInPlace(system.matrix, system.size)) {
    throw new ConvergenceError('modal thermal slip: Galerkin matrix not positive definite', count, NaN);
  }
  const y = forwardSubstitute(system.matrix, system.rhs, system.size);
  const traces = s > 0 ? 2 : 1;
  // Mean top temperature of the truncation to the first m modes: Σ y_i² over their unknowns.
  const meanTop = (m: number): number => {
    let sum = 0;
    for (let i = 0; i < m * traces; i++) sum += y[i] * y[i];
    return sum;
  };
  const reference = (s + d) / ks;
  const fine = meanTop(count) - reference;
  const rough = meanTop(coarse) - reference;
  const extrapolated = extrapolateToInfiniteResolution(
    [modes.wavenumbers[coarse - 1], modes.wavenumbers[count - 1]],
    [rough, fine],
    [2 * lambda],
  ).value;
  return {
    thermalSlipLength: extrapolated * pitch,
    thermalSlipLengthErrorEstimate: Math.abs(extrapolated - fine) * pitch,
    edgeExponent: lambda,
    modes: count,
    warnings,
  };
}

/** Fewest modes in the finest truncation. */
const MINIMUM_MODES = 32;

function countBelow(sorted: Float64Array, limit: number): number {
  let m = 0;
  while (m < sorted.length && sorted[m] <= limit) m++;
  return Math.max(2, m);
}

/**
 * The Galerkin matrix and load (units P = k_w = q = 1). Unknowns: p_j (top trace) for each
 * mode, interleaved with q_j (bottom trace) when there is a substrate, so that every leading
 * block is a truncation in the mode count.
 */
function assemble(modes: TwoPhaseLayerModes, half: number, d: number, s: number, ko: number, ks: number): { matrix: Float64Array; rhs: Float64Array; size: number } {
  const count = modes.wavenumbers.length;
  const mu = modes.wavenumbers;
  // ∫ Z_j cos(αz) dz = g_j cos(αa)/(α² − μ_j²) with g_j = 2J_j; at α = 0 this is the mean: −2J_j/μ_j² (P for j = 0).
  const gains = Float64Array.from(modes.slopeJump, (jump) => 2 * jump);
  const mean = Float64Array.from(mu, (m, j) => (j === 0 ? 1 : -gains[j] / (m * m)));
  // Liquid: (2/P) Σ_n α_n Ẑ_i Ẑ_j.
  const liquid = overlapBlock(modes, half, gains, undefined, undefined);
  const traces = s > 0 ? 2 : 1;
  const size = count * traces;
  const matrix = new Float64Array(size * size);
  const rhs = new Float64Array(size);
  const at = (i: number, j: number): number => i * size + j;
  for (let i = 0; i < count; i++) {
    for (let j = 0; j < count; j++) matrix[at(traces * i, traces * j)] = liquid[i * count + j];
    rhs[traces * i] = mean[i];
  }
  // Layer: per mode, the 2 × 2 (or 1 × 1) sinh-profile energy.
  for (let j = 0; j < count; j++) {
    const norm = modes.weightedNorm[j];
    const m = mu[j];
    const diagonal = j === 0 ? norm / d : (norm * m) / Math.tanh(m * d);
    matrix[at(traces * j, traces * j)] += diagonal;
    if (traces === 2) {
      const coupling = j === 0 ? -norm / d : -(norm * m) / Math.sinh(m * d);
      matrix[at(2 * j + 1, 2 * j + 1)] += diagonal;
      matrix[at(2 * j, 2 * j + 1)] += coupling;
      matrix[at(2 * j + 1, 2 * j)] += coupling;
    }
  }
  if (traces === 2) {
    // Substrate: k_s[(1/(P s)) Ẑ_i(0) Ẑ_j(0) + (2/P) Σ_n α_n coth(α_n s) Ẑ_i Ẑ_j].
    const beta = 2 * Math.PI;
    const weight = (n: number): number => 1 / Math.tanh(beta * n * s);
    const substrate = overlapBlock(modes, half, gains, weight, Math.min(20_000, 20 / (beta * s)));
    for (let i = 0; i < count; i++) {
      for (let j = 0; j < count; j++) {
        matrix[at(2 * i + 1, 2 * j + 1)] += ks * (substrate[i * count + j] + (mean[i] * mean[j]) / s);
      }
    }
  }
  return { matrix, rhs, size };
}

/**
 * (2/P) Σ_n w_n α_n Ẑ_i(α_n) Ẑ_j(α_n) for all modes (P = 1), from the partial-fraction sums,
 * with the Fourier modes that coincide with a layer mode (left out of the sums) added back exactly.
 */
function overlapBlock(
  modes: TwoPhaseLayerModes,
  half: number,
  gains: Float64Array,
  weight: ((n: number) => number) | undefined,
  settles: number | undefined,
): Float64Array {
  const mu = modes.wavenumbers;
  const count = mu.length;
  const sums: WindowSums = windowFourierSums({ period: 1, halfWidth: half, wavenumbers: mu, weight, weightSettlesAt: settles });
  const block = new Float64Array(count * count);
  addWindowOverlapMatrix(block, count, sums, mu, gains, 2);
  for (let j = 0; j < count; j++) {
    const n = sums.coincident[j];
    if (n < 0) continue;
    const alpha = 2 * Math.PI * n;
    const w = weight ? weight(n) : 1;
    const c = Math.cos(alpha * half);
    const direct = layerModeTransform(modes, j, 1, half, n);
    block[j * count + j] += 2 * w * alpha * direct * direct;
    for (let i = 0; i < count; i++) {
      if (i === j) continue;
      const formula = (gains[i] * c) / (alpha * alpha - mu[i] * mu[i]);
      // What the partial fractions put in for this n: only σ_i's term (σ_j left it out).
      const included = (gains[i] * gains[j] * w * alpha * c * c * (1 / (alpha * alpha - mu[i] * mu[i]) - 1 / (alpha * alpha))) / (mu[i] * mu[i] - mu[j] * mu[j]);
      const correction = 2 * (w * alpha * formula * direct - included);
      block[i * count + j] += correction;
      block[j * count + i] += correction;
    }
  }
  return block;
}
