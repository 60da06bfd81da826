/**
 * Exact fast core for the transverse groove cell: flow across lubricant-filled grooves.
 *
 * Problem (the flat-interface model of src/physics/groove/groove-cell.ts, solveTransverseCell): 2-D Stokes
 * flow across one period P of a wall with rectangular grooves of width w and depth d; water (μ_w)
 * above under a uniform far shear τ; lubricant (μ_o = N μ_w) in the groove; flat interface at the
 * mouth with no penetration and continuous velocity and shear stress; no slip on the solid.
 *
 * Method (ours; measured error below). The unknown is the interface velocity U(x) on the mouth, even
 * in x. Each side answers a mouth velocity with a shear stress through a linear map:
 *  - water, a half space over a periodic line with no penetration: Fourier mode k of U gives the wall
 *    shear −2μ_w|k|Û_k, so τ_water = τ − 2μ_w|K|U [derived: stream function (A + By)e^{−|k|y}e^{ikx}
 *    with v = 0 at y = 0];
 *  - lubricant, a lid-driven Stokes cavity: τ_cavity = μ_o T U with T depending on d/w only (scaled by 1/w).
 * Matching τ_water = τ_cavity on the mouth, U = 0 on the ridge tops, and testing with a basis g_j of
 * continuous piecewise polynomials on a mesh graded geometrically towards the groove edges (hp
 * refinement, surveyed in [3]; the convergence obtained here is measured, see Accuracy below)
 * gives the dense 32 × 32 system
 *     (W(φ) + (N/2) C(d/w)) a = r,   U(x) = (τ w/(4 μ_w)) Σ a_j g_j(2x/w),
 * with W_ij = ⟨g_i, |K| g_j⟩ (scale-free, φ = w/P only) and C_ij the cavity energy of the flows the lid
 * velocities g_i and g_j drive (d/w only). Both are tabulated by the committed generator
 * src/physics/groove/data/generate_transverse_groove_table.py: W exactly through the conformal map
 * t = tan(πx/P)/tan(πφ/2), under which |K| is diagonal on √(1 − t²)U_{n−1}(t) (finite Hilbert
 * transform of Chebyshev polynomials [4]); C by FreeFEM Taylor–Hood P2/P1 finite elements [5, 6] on
 * meshes graded towards the lid corners. At run time the tables are interpolated (cubic, uniform in
 * ln tan(πφ/2) and in ln(d/w)) and the system is solved by LU. Then
 *     b_⊥ = P φ² (r·a)/8,   ū = (τ/μ_w)(w/8)(r·a),   U(0) = (τ/μ_w)(w/4)a_0,
 *     mean interfacial shear / τ = (N/4) F·a   (F_j: consistent lid force of cavity flow j),
 *     centre interfacial shear / τ = 1 − k·a  (water side; the cavity's centre shear (N/2) G·a where it is
 *     below 0.02 τ, where the water-side form loses relative accuracy),
 *     recirculating flux = (τ w²/(8 μ_w)) max_y |Σ a_j ψ_j(0, y)| on the groove centre line.
 * N = 0 is Philip's shear-free result, b_⊥ = (P/2π) ln sec(πφ/2) [1, 2], returned in closed form.
 *
 * Accuracy (measured, docs/slip-core-transverse.md), relative in b_⊥: basis truncation ≤ 4e-6 (32 against
 * 45 functions); cavity-table mesh ≤ 1.1e-5 (spacing halved); table interpolation ≤ 2e-5 across w/P and
 * ≤ 3e-4 across d/w (held-out nodes, worst near d/w ≈ 1); N → 0 against Philip ≤ 5e-6; against the field
 * solver on the 48 of 49 cases it resolves (fixtures/slip/transverse_field_reference.json): ≤ 0.19 %, and
 * against FreeFEM on the whole cell (fixtures/slip/transverse_cell_freefem.json, 8 cases) ≤ 0.07 % in b_⊥ and
 * ≤ 0.3 % in the other returned quantities.
 * Cost: a 32 × 32 LU and about 3 000 table entries interpolated, some 3e4 floating-point operations; about
 * 2 000–7 300 evaluations per second per core measured under a load average of 11–15 on 2 cores
 * (bench/slip-core-transverse.ts, where the ratio to the textbook closed form is printed).
 *
 * Range: w/P 0.02–0.98, d/w 0.01–10, N = 0 and 1e-4–1e4 (validated). Outside it a result is still
 * returned with a warning: d/w > 3.3 is the deep-groove limit (the cavity flow decays like Moffatt's
 * corner eddies, by a factor of several hundred per groove width of depth), d/w < 0.005 extends
 * the lubrication scaling of the cavity map, w/P > 0.996 is evaluated at w/P = 0.996 (an underestimate).
 *
 * References
 * 1. Philip J.R. (1972) Flows satisfying mixed no-slip and no-shear conditions (philip1972, whose
 *    citation says which details are unconfirmed).
 * 2. Lauga E., Stone H.A. (2003) Effective slip in pressure-driven Stokes flow. J. Fluid Mech. 489,
 *    55–77. doi:10.1017/S0022112003004695.
 * 3. Babuška I., Suri M. (1990) The p- and h-p versions of the finite element method, an overview.
 *    Comput. Methods Appl. Mech. Eng. 80, 5–26 (babuskaSuri1990).
 * 4. Mason J.C., Handscomb D.C. (2003) Chebyshev Polynomials. Chapman & Hall/CRC (finite Hilbert
 *    transforms of the Chebyshev polynomials).
 * 5. Hecht F. (2012) New development in FreeFem++. J. Numer. Math. 20(3–4), 251–265.
 *    doi:10.1515/jnum-2012-0013 (hecht2012).
 * 6. Taylor C., Hood P. (1973) A numerical solution of the Navier–Stokes equations using the finite
 *    element technique. Comput. Fluids 1(1), 73–100. doi:10.1016/0045-7930(73)90027-3 (taylorHood1973).
 * 7. Schönecker C., Hardt S. (2013) Longitudinal and transverse flow over a cavity containing a second
 *    immiscible fluid. J. Fluid Mech.; arXiv:1206.5967 (schoeneckerHardt2013): the local-slip
 *    approximation of the same problem that this exact method replaces.
 */
import type { GrooveCellInput } from './groove-cell.js';
import { applyStencil, maxAbsChebyshevLobatto, uniformCubicStencil } from '../../numerics/interpolation.js';
import { solveDense } from '../../numerics/linalg.js';
import { DomainError } from '../../core/errors.js';
import type { Warning } from '../../core/notes.js';
import table from './data/transverse-groove-table.json' with { type: 'json' };

/**
 * The geometry and fluids of the groove cell, named and defaulted as for the field solver
 * (P, w, d in m; N = μ_lubricant/μ_water ≥ 0; appliedShear τ in Pa and waterViscosity μ_w in Pa·s, default 1).
 */
export type TransverseGrooveInput = Pick<GrooveCellInput, 'pitch' | 'grooveWidth' | 'grooveDepth' | 'viscosityRatio' | 'appliedShear' | 'waterViscosity'>;

export interface TransverseGrooveSlip {
  /** Effective slip length across the grooves b_⊥, m. */
  slipLength: number;
  /** Mean interfacial shear stress over the mouth divided by τ. */
  interfacialShearRatio: number;
  /** Mean interface velocity over the mouth, m/s. */
  meanInterfaceVelocity: number;
  /** Interface velocity at the groove centre, m/s. */
  centreInterfaceVelocity: number;
  /** Mean interface velocity over mean water-side shear rate on the mouth, m; null for N = 0. */
  meanLocalSlip: number | null;
  /** Interface velocity over water-side shear rate at the groove centre, m; null for N = 0. */
  localSlipAtCentre: number | null;
  /** Recirculating flux of the cavity eddy, max |ψ| on the groove centre line, m²/s (per unit groove length); 0 for N = 0. */
  lubricantFlux: number;
  warnings: Warning[];
}

interface Tables {
  size: number;
  rhs: Float64Array;
  water: { start: number; step: number; count: number; W: Float64Array[]; centreShear: Float64Array[] };
  cavity: { start: number; step: number; count: number; C: Float64Array[]; force: Float64Array[]; centreShear: Float64Array[]; psi: Float64Array[] };
}

/** The generator's JSON, converted once to typed rows (ψ rows flattened depth-major: index k·size + j). */
const TABLES: Tables = (() => {
  const size = table.basis.size;
  const rows = (list: number[][]): Float64Array[] => list.map((row) => Float64Array.from(row));
  const grid = ({ start, step, count }: { start: number; step: number; count: number }) => ({ start, step, count });
  const tables: Tables = {
    size,
    rhs: Float64Array.from(table.rhs),
    water: { ...grid(table.water), W: rows(table.water.nodes.map((n) => n.W)), centreShear: rows(table.water.nodes.map((n) => n.centreShear)) },
    cavity: {
      ...grid(table.cavity),
      C: rows(table.cavity.nodes.map((n) => n.C)),
      force: rows(table.cavity.nodes.map((n) => n.force)),
      centreShear: rows(table.cavity.nodes.map((n) => n.centreShear)),
      psi: rows(table.cavity.nodes.map((n) => n.psi.flat())),
    },
  };
  const packedLength = (size * (size + 1)) / 2;
  if (tables.water.W.length !== tables.water.count || tables.water.W.some((r) => r.length !== packedLength) || tables.cavity.C.some((r) => r.length !== packedLength)) {
    throw new Error('transverse groove table is malformed (regenerate it with its generator)');
  }
  return tables;
})();

/** Interface fractions and depth ratios inside which the error was measured. */
export const TRANSVERSE_CORE_RANGE = {
  interfaceFraction: [0.02, 0.98],
  depthOverWidth: [0.01, 10],
  viscosityRatio: [1e-4, 1e4],
} as const;

function positive(value: number | undefined, fallback: number, field: string, what: string): number {
  const v = value === undefined ? fallback : value;
  if (!(typeof v === 'number' && Number.isFinite(v) && v > 0)) throw new DomainError(`${what} must be a positive finite number`, { field });
  return v;
}

/**
 * Effective transverse slip length, interfacial shear and cavity flow of a lubricant-filled
 * rectangular groove, exact for the flat-interface model (method, accuracy and range in the module
 * comment above).
 * @returns lengths in m, velocities in m/s, the flux in m²/s; plus warnings for inputs outside the
 *   validated range.
 * Example: P = 1 m, w = 0.5 m, d = 0.25 m, N = 1 gives b_⊥ = 0.014735 m and an interfacial shear
 *   ratio of 0.7790 (the field solver gives 0.014736 m at 64 cells per pitch with Richardson).
 * @throws DomainError for impossible input (non-positive lengths, w ≥ P, N < 0 or not finite).
 */
export function transverseGrooveSlip(input: TransverseGrooveInput): TransverseGrooveSlip {
  const pitch = positive(input.pitch, NaN, 'texture.pitch', 'texture pitch');
  const width = positive(input.grooveWidth, NaN, 'texture.grooveWidth', 'groove width');
  const depth = positive(input.grooveDepth, NaN, 'texture.grooveDepth', 'groove depth');
  if (!(width < pitch)) throw new DomainError('groove width must be smaller than the pitch (the ridges need a finite width)', { field: 'texture.grooveWidth' });
  const ratio = input.viscosityRatio;
  if (!(typeof ratio === 'number' && Number.isFinite(ratio) && ratio >= 0)) {
    throw new DomainError('viscosity ratio must be a finite number ≥ 0', { field: 'lubricant.viscosity' });
  }
  const tau = input.appliedShear === undefined ? 1 : input.appliedShear;
  if (!(typeof tau === 'number' && Number.isFinite(tau))) throw new DomainError('applied shear must be finite', { field: 'appliedShear' });
  const muW = positive(input.waterViscosity, 1, 'waterViscosity', 'water viscosity');
  const phi = width / pitch;
  const depthOverWidth = depth / width;
  const warnings: Warning[] = [];
  const range = TRANSVERSE_CORE_RANGE;
  const outside = (value: number, [low, high]: readonly [number, number], what: string, severity: Warning['severity'], note = ''): void => {
    if (value >= low && value <= high) return;
    warnings.push({
      code: 'outside-validated-range',
      severity,
      message: `${what} = ${value.toPrecision(3)} is outside ${low}–${high}, where the transverse slip core's error was measured${note}`,
    });
  };
  outside(phi, range.interfaceFraction, 'interface fraction w/P', 'caution');
  outside(depthOverWidth, range.depthOverWidth, 'groove aspect d/w', depthOverWidth > range.depthOverWidth[1] ? 'info' : 'caution',
    depthOverWidth > range.depthOverWidth[1] ? ' (deep-groove limit: the result no longer depends on depth)' : '');
  if (ratio > 0) outside(ratio, range.viscosityRatio, 'viscosity ratio N', 'info', '; the result tends smoothly to its limit');
  if (ratio === 0) return shearFree(pitch, phi, tau, muW, warnings);

  const { size, water, cavity } = TABLES;
  const X = Math.log(Math.tan((Math.PI * phi) / 2));
  const waterStencil = uniformCubicStencil(water.start, water.step, water.count, X);
  if (waterStencil.clamped === 'above') {
    warnings.push({
      code: 'interface-fraction-clamped',
      severity: 'warning',
      message: `w/P = ${phi.toPrecision(4)} is beyond the table; the transverse result is that of w/P = ${(2 / Math.PI * Math.atan(Math.exp(water.start + (water.count - 1) * water.step))).toFixed(4)}, an underestimate of the slip`,
    });
  }
  const Y = Math.log(depthOverWidth);
  const cavityStencil = uniformCubicStencil(cavity.start, cavity.step, cavity.count, Y);
  // Cavity rows are stored times D/(1 + D), D = 2d/w; undo with the D of the point actually tabulated
  // (the deep end: the limit itself), or of the groove (shallow end: lubrication scaling, 1/D).
  const tabulatedD = 2 * Math.exp(cavityStencil.clamped === 'above' ? cavity.start + (cavity.count - 1) * cavity.step : Y);
  const unscale = (1 + tabulatedD) / tabulatedD;
  const W = applyStencil(waterStencil, water.W);
  const C = applyStencil(cavityStencil, cavity.C);
  const centreShearWater = applyStencil(waterStencil, water.centreShear);
  const force = applyStencil(cavityStencil, cavity.force);
  const centreShearCavity = applyStencil(cavityStencil, cavity.centreShear);
  const ratioC = ratio * unscale;
  const { a, slipLength, meanInterfaceVelocity, centreInterfaceVelocity, interfacialShearRatio, centreShearRatio } = solveMouthSystem(
    { pitch, width, ratio: ratioC, tau, muW },
    { water: W, cavity: C, centreShearWater, force, centreShearCavity },
  );
  const psi = new Float64Array(table.cavity.psiDepths.length);
  const psiRows = applyStencil(cavityStencil, cavity.psi);
  for (let k = 0; k < psi.length; k++) {
    let s = 0;
    for (let j = 0; j < size; j++) s += psiRows[k * size + j] * a[j];
    psi[k] = s;
  }
  const sampledDepth = Math.min(tabulatedD, 3);
  const lubricantFlux = ((Math.abs(tau) / muW) * width * width * sampledDepth * maxAbsChebyshevLobatto(psi).value) / 8;
  const finiteOrNull = (v: number): number | null => (Number.isFinite(v) && v !== 0 ? v : null);
  return {
    slipLength,
    interfacialShearRatio,
    meanInterfaceVelocity,
    centreInterfaceVelocity,
    meanLocalSlip: finiteOrNull(meanInterfaceVelocity / ((interfacialShearRatio * tau) / muW)),
    localSlipAtCentre: finiteOrNull(centreInterfaceVelocity / ((centreShearRatio * tau) / muW)),
    lubricantFlux,
    warnings,
  };
}

/** Mouth operators at one (w/P, d/w): packed upper triangles of W and of C (cavity rows already unscaled when N is folded in), and the shear functionals. */
export interface MouthOperators {
  water: Float64Array;
  cavity: Float64Array;
  centreShearWater: Float64Array;
  force: Float64Array;
  centreShearCavity: Float64Array;
}

/**
 * Solves (W + (N/2) C) a = r for the mouth coefficients and forms the observables (formulas in the
 * module comment). `ratio` multiplies the cavity rows as given (N times any table scaling). Exported
 * so the tests can feed held-out operators and measure the interpolation error alone.
 */
export function solveMouthSystem(
  scalars: { pitch: number; width: number; ratio: number; tau: number; muW: number },
  operators: MouthOperators,
): { a: Float64Array; slipLength: number; meanInterfaceVelocity: number; centreInterfaceVelocity: number; interfacialShearRatio: number; centreShearRatio: number } {
  const size = TABLES.size;
  const { pitch, width, ratio, tau, muW } = scalars;
  const phi = width / pitch;
  const matrix = new Float64Array(size * size);
  const half = 0.5 * ratio;
  let p = 0;
  for (let i = 0; i < size; i++) {
    for (let j = i; j < size; j++, p++) {
      const value = operators.water[p] + half * operators.cavity[p];
      matrix[i * size + j] = value;
      matrix[j * size + i] = value;
    }
  }
  const a = solveDense(matrix, TABLES.rhs, size);
  if (a === null || !a.every(Number.isFinite)) throw new Error('transverse groove system is singular (table corrupted)');
  const dot = (u: ArrayLike<number>, v: ArrayLike<number>): number => {
    let s = 0;
    for (let k = 0; k < size; k++) s += u[k] * v[k];
    return s;
  };
  const ra = dot(TABLES.rhs, a);
  const centreWater = 1 - dot(operators.centreShearWater, a);
  return {
    a,
    slipLength: (pitch * phi * phi * ra) / 8,
    meanInterfaceVelocity: ((tau / muW) * width * ra) / 8,
    centreInterfaceVelocity: ((tau / muW) * width * a[0]) / 4,
    interfacialShearRatio: 0.25 * ratio * dot(operators.force, a),
    // The water-side centre shear carries an absolute error of about 1e-5 τ; where the shear itself is that
    // small (nearly shear-free mouths) the cavity-side value, relative error about 1e-3, is the better one.
    centreShearRatio: centreWater >= 0.02 ? centreWater : half * dot(operators.centreShearCavity, a),
  };
}

/**
 * N = 0, shear-free mouth: b_⊥ = (P/2π) ln sec(πφ/2) [1, 2]; the interface velocity is half the
 * longitudinal one of Philip (1972), u(x) = (τP/(πμ_w)) arccosh(cos(πx/P)/cos(πφ/2)) [derived: the real
 * part of (τP/(πμ_w)) arccosh(cos(πz/P)/cos(πφ/2)), z = x + iy, is harmonic, vanishes on the ridges, has
 * no normal derivative on the mouth and tends to (τ/μ_w)(y + (P/π) ln sec(πφ/2)) far above, the longitudinal
 * slip of [1, 2]; the halving is checked in the test against the N → 0 limit of the Galerkin solution],
 * so U(0) = (τP/(2πμ_w)) arccosh sec(πφ/2).
 */
function shearFree(pitch: number, phi: number, tau: number, muW: number, warnings: Warning[]): TransverseGrooveSlip {
  const secant = 1 / Math.cos((Math.PI * phi) / 2);
  const slipLength = (pitch / (2 * Math.PI)) * Math.log(secant);
  return {
    slipLength,
    interfacialShearRatio: 0,
    meanInterfaceVelocity: (tau / muW) * (slipLength / phi),
    centreInterfaceVelocity: ((tau / muW) * pitch * Math.acosh(secant)) / (2 * Math.PI),
    meanLocalSlip: null,
    localSlipAtCentre: null,
    lubricantFlux: 0,
    warnings,
  };
}
