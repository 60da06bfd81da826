/**
 * Closed-form effective slip of a wall with periodic streamwise stripes
 * (grooves holding a lubricant or gas between no-slip ridges), and the local
 * slip length of a lubricant-filled groove. All lengths in metres; the flat
 * interface and Stokes flow in the texture are assumed throughout.
 *
 * Symbols: period P, groove (stripe) width w, interface fraction φ = w/P,
 * groove depth d, viscosity ratio N = μ_lubricant/μ_working, local slip length
 * b_s on the stripes, effective slip lengths b_∥ (flow along the stripes) and
 * b_⊥ (across them).
 */
import { DomainError } from '../../core/errors.js';
import { grooveLidVelocityCentre, grooveLidVelocityMean } from '../groove/groove-duct.js';

function requirePositive(value: number, field: string, what: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new DomainError(`${what} must be a positive finite number`, { field });
}

function interfaceFraction(pitch: number, grooveWidth: number): number {
  requirePositive(pitch, 'texture.pitch', 'texture pitch');
  requirePositive(grooveWidth, 'texture.grooveWidth', 'groove width');
  if (!(grooveWidth < pitch)) {
    throw new DomainError('groove width must be smaller than the pitch (the ridges need a finite width)', {
      field: 'texture.grooveWidth',
    });
  }
  return grooveWidth / pitch;
}

/**
 * Longitudinal effective slip length of shear-free stripes (perfect local slip),
 * b_∥ = (P/π) ln sec(πφ/2)  [1, 2].
 * @param pitch P, m (> 0)
 * @param grooveWidth w, m (0 < w < P)
 * @returns b_∥, m. Example: P = 1, φ = ½ gives ln 2/(2π) = 0.1103178.
 * Valid: Stokes flow, flat shear-free interface, layer thickness ≫ P.
 * References: [1] Philip 1972, ZAMP 23, 353; [2] Lauga & Stone 2003, J. Fluid Mech. 489, 55.
 */
export function philipSlipLengthLongitudinal(pitch: number, grooveWidth: number): number {
  const phi = interfaceFraction(pitch, grooveWidth);
  return (pitch / Math.PI) * Math.log(1 / Math.cos((Math.PI * phi) / 2));
}

/**
 * Transverse effective slip length of shear-free stripes, b_⊥ = b_∥/2 =
 * (P/2π) ln sec(πφ/2)  [1, 2]; same parameters and validity as
 * {@link philipSlipLengthLongitudinal}.
 */
export function philipSlipLengthTransverse(pitch: number, grooveWidth: number): number {
  return philipSlipLengthLongitudinal(pitch, grooveWidth) / 2;
}

/**
 * Longitudinal effective slip length of stripes with a finite, uniform local
 * slip length b_s (Belyaev & Vinogradova 2010 [1], their approximate formula):
 *   b_∥ = (P/π) ln sec(πφ/2) / (1 + (P/(π b_s)) ln[sec(πφ/2) + tan(πφ/2)]).
 * Limits: b_s → ∞ gives Philip's b_∥; b_s → 0 gives b_∥ → b_s ln sec/ln(sec + tan),
 * which is below the exact area average φ b_s (about 21 % low at φ = ½) — the
 * formula is an approximation, most accurate for b_s ≳ P [1].
 * @param pitch P, m (> 0)
 * @param grooveWidth w, m (0 < w < P)
 * @param localSlipLength b_s, m (≥ 0; Infinity allowed internally for a shear-free stripe)
 * @returns b_∥, m.
 * Reference: [1] Belyaev & Vinogradova 2010, J. Fluid Mech. 652, 489 (equation form from
 * memory; the limits above are checked in the tests).
 */
export function belyaevVinogradovaSlipLengthLongitudinal(pitch: number, grooveWidth: number, localSlipLength: number): number {
  const phi = interfaceFraction(pitch, grooveWidth);
  if (!(localSlipLength >= 0)) throw new DomainError('local slip length must be non-negative', { field: 'localSlipLength' });
  if (localSlipLength === 0) return 0;
  const half = (Math.PI * phi) / 2;
  const secant = 1 / Math.cos(half);
  const shearFree = (pitch / Math.PI) * Math.log(secant);
  const resistance = Number.isFinite(localSlipLength)
    ? (pitch / (Math.PI * localSlipLength)) * Math.log(secant + Math.tan(half))
    : 0;
  return shearFree / (1 + resistance);
}

/**
 * Transverse effective slip length of stripes with local slip b_s from the
 * relation b_⊥[b_s] = ½ b_∥[2 b_s] (Asmolov & Vinogradova 2012 [1], exact for
 * one-dimensional textures), applied here to the Belyaev–Vinogradova b_∥ [2]:
 *   b_⊥ = (P/2π) ln sec(πφ/2) / (1 + (P/(2π b_s)) ln[sec(πφ/2) + tan(πφ/2)]).
 * Parameters as {@link belyaevVinogradovaSlipLengthLongitudinal}.
 * References: [1] Asmolov & Vinogradova 2012, J. Fluid Mech. 706, 108;
 * [2] Belyaev & Vinogradova 2010, J. Fluid Mech. 652, 489.
 */
export function belyaevVinogradovaSlipLengthTransverse(pitch: number, grooveWidth: number, localSlipLength: number): number {
  return 0.5 * belyaevVinogradovaSlipLengthLongitudinal(pitch, grooveWidth, 2 * localSlipLength);
}

/**
 * Effective slip tensor of a striped wall seen by a mean flow at angle θ to the
 * stripes ([derived]: the slip length is a symmetric tensor with eigenvalues b_∥ and b_⊥ [1, 2], rotated by θ):
 * along the flow b(θ) = b_∥ cos²θ + b_⊥ sin²θ, across it
 * (the slip velocity component perpendicular to the mean shear, per unit of it)
 * b_×(θ) = (b_∥ − b_⊥) sin θ cos θ.
 * @param slipLengthLongitudinal b_∥, m
 * @param slipLengthTransverse b_⊥, m
 * @param flowAngle θ, degrees (0 = flow along the grooves)
 * @returns { alongFlow, crossFlow } in m.
 * References: [1] Kamrin, Bazant & Stone 2010 (kamrinBazantStone2010: the surface mobility tensor);
 * [2] Belyaev & Vinogradova 2010 (belyaevVinogradova2010: eigenvalues of the slip-length tensor).
 */
export function obliqueSlipLengths(
  slipLengthLongitudinal: number,
  slipLengthTransverse: number,
  flowAngle: number,
): { alongFlow: number; crossFlow: number } {
  if (!Number.isFinite(flowAngle)) throw new DomainError('flow angle must be finite', { field: 'texture.flowAngle' });
  const theta = (flowAngle * Math.PI) / 180;
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  return {
    alongFlow: slipLengthLongitudinal * c * c + slipLengthTransverse * s * s,
    crossFlow: (slipLengthLongitudinal - slipLengthTransverse) * s * c,
  };
}

export interface GrooveLocalSlip {
  /** Mean over the groove mouth of the longitudinal local slip, m. */
  longitudinalMean: number;
  /** Longitudinal local slip at the groove centre line, m. */
  longitudinalCentre: number;
  /** Transverse (recirculating, zero net flux) local slip, mean over the mouth, m. */
  transverseMean: number;
  /** Transverse local slip at the groove centre, m. */
  transverseCentre: number;
}

/**
 * Lid velocity of a rectangular cavity (width w, depth d) driven by a uniform
 * shear stress τ on its flat, impermeable lid, as a length μu/(τw): columns d/w,
 * mean over the lid, centre value. Produced by fixtures/slip/generate_cavity_lid.py
 * (2-D Stokes, stream function–vorticity finite differences, three grids and
 * Richardson extrapolation; estimated error ≤ 4e-5 w). Beyond d/w = 3 the values
 * are converged to 1e-7 (the recirculation is confined to an eddy of depth ≈ w).
 */
const CAVITY_LID_TABLE: readonly (readonly [number, number, number])[] = [
  [0.025, 0.006142377601374079, 0.0062500715258899915],
  [0.05, 0.012069415817646329, 0.012500143051661689],
  [0.1, 0.023277727767989614, 0.025000285638992523],
  [0.15, 0.0336235885288915, 0.03750059279121763],
  [0.2, 0.04310786355179907, 0.05000704093252199],
  [0.25, 0.05173043962911413, 0.0624725621383073],
  [0.3, 0.05949105060764842, 0.07466810628549328],
  [0.4, 0.07242239313701922, 0.09678518004486751],
  [0.5, 0.08193997287100353, 0.11406071457624105],
  [0.6, 0.08831838215026101, 0.1259375829511336],
  [0.7, 0.09216369361116739, 0.13319841886494477],
  [0.8, 0.09424626224234005, 0.13717186232914247],
  [1.0, 0.09571259598749327, 0.1400034953517739],
  [1.25, 0.09596941170418825, 0.14050932077534437],
  [1.5, 0.09598272624565257, 0.1405365135164417],
  [2.0, 0.09598300296561771, 0.1405370575537348],
  [3.0, 0.09598306079616191, 0.14053716744173303],
];

/**
 * Cavity lid velocity as a length over w, μu/(τw), for the mean (column 1) or the
 * centre (column 2), by 4-point Lagrange interpolation over the table with the
 * exact shallow node (0, 0) — the values rise like (d/w)/4 and then saturate, a
 * smooth function on the table spacing; constant beyond the table.
 */
function cavityLidVelocity(depthOverWidth: number, column: 1 | 2): number {
  const last = CAVITY_LID_TABLE[CAVITY_LID_TABLE.length - 1];
  if (depthOverWidth >= last[0]) return last[column];
  const xs = [0, ...CAVITY_LID_TABLE.map((row) => row[0])];
  const ys = [0, ...CAVITY_LID_TABLE.map((row) => row[column])];
  let i = 1;
  while (i < xs.length - 1 && xs[i] < depthOverWidth) i++;
  const start = Math.min(Math.max(i - 2, 0), xs.length - 4);
  let value = 0;
  for (let j = start; j < start + 4; j++) {
    let basis = 1;
    for (let k = start; k < start + 4; k++) if (k !== j) basis *= (depthOverWidth - xs[k]) / (xs[j] - xs[k]);
    value += basis * ys[j];
  }
  return value;
}

/**
 * Local slip lengths of a lubricant-filled rectangular groove, from the groove
 * alone: shear τ on its flat lid, no slip on side walls and floor, the working
 * liquid's shear taken uniform over the mouth (Schönecker, Baier & Hardt 2014 [1]
 * use the same local-slip picture and point out that the local slip is
 * anisotropic). Local slip b_s = μ_w u_lid/τ = (lid velocity as a length)/N.
 *
 * Longitudinal [derived, ../groove/groove-duct.ts]:
 *   mean   b̄_s = (w/N)(8/π³) Σ_odd tanh(nπd/w)/n³  (→ d/N shallow, 0.27137 w/N deep, w/(4N) at d/w = ½),
 *   centre b_c = (w/N)(4/π²) Σ_odd (−1)^((n−1)/2) tanh(nπd/w)/n²  (→ d/N shallow, 0.37123 w/N deep).
 *
 * Transverse: across the groove the lubricant cannot leave the cavity and
 * recirculates with zero net flux. Shallow limit [derived, lubrication]: the profile
 * u(y) = a y + c y² (y up from the floor) with u(0) = 0, μ_o u'(d) = τ and ∫₀ᵈ u dy = 0
 * gives c = 3τ/(4μ_o d), a = −τ/(2μ_o), so u(d) = τd/(4μ_o): b_s,⊥ = d/(4N). For finite
 * d/w the lid velocity of the shear-driven cavity is taken from the tabulated 2-D
 * Stokes solution (CAVITY_LID_TABLE): deep limit mean 0.09598 w/N, centre 0.14054 w/N.
 *
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @param viscosityRatio N = μ_lubricant/μ_working, > 0
 * @returns the four local slip lengths, m.
 * Reference: [1] Schönecker, Baier & Hardt 2014, J. Fluid Mech. 740, 168.
 */
export function grooveLocalSlipLengths(grooveWidth: number, grooveDepth: number, viscosityRatio: number): GrooveLocalSlip {
  requirePositive(viscosityRatio, 'lubricant.viscosity', 'viscosity ratio');
  const depthOverWidth = grooveDepth / grooveWidth;
  // Below the first table node the shallow limit d/4 with the table's first-node correction is exact to O((d/w)²).
  const transverse = (column: 1 | 2) =>
    depthOverWidth < CAVITY_LID_TABLE[0][0]
      ? (grooveDepth / (4 * viscosityRatio)) * (1 - (1 - (4 * CAVITY_LID_TABLE[0][column]) / CAVITY_LID_TABLE[0][0]) * (depthOverWidth / CAVITY_LID_TABLE[0][0]))
      : (grooveWidth * cavityLidVelocity(depthOverWidth, column)) / viscosityRatio;
  return {
    longitudinalMean: grooveLidVelocityMean(grooveWidth, grooveDepth) / viscosityRatio,
    longitudinalCentre: grooveLidVelocityCentre(grooveWidth, grooveDepth) / viscosityRatio,
    transverseMean: transverse(1),
    transverseCentre: transverse(2),
  };
}

/**
 * Mean interfacial shear over the wall shear for stripes with a uniform local
 * slip b_s [derived]: far from the wall u → (τ/μ)(y + b_eff) and the periodic
 * part of the disturbance averages to zero on every plane, so the plane mean of
 * the wall velocity is τ b_eff/μ; it is carried by the stripes only (u = 0 on the
 * ridges), so the mean stripe velocity is τ b_eff/(μφ), and the Navier condition
 * u = b_s ∂u/∂y gives a mean stripe shear τ_i = τ b_eff/(φ b_s). Hence
 *   τ_i/τ = b_eff/(φ b_s),
 * which → 1 as b_s → 0 (exact limit b_eff → φ b_s) and → 0 for a shear-free stripe.
 * @param effectiveSlipLength b_eff, m (≥ 0)
 * @param localSlipLength b_s, m (> 0)
 * @param interfaceFractionValue φ = w/P (0 < φ < 1)
 * @returns τ_i/τ, dimensionless, clipped to [0, 1/φ] (the ridges cannot carry negative shear).
 */
export function interfacialShearRatioFromSlip(
  effectiveSlipLength: number,
  localSlipLength: number,
  interfaceFractionValue: number,
): number {
  if (!(localSlipLength > 0) || !Number.isFinite(localSlipLength)) return 0;
  const ratio = effectiveSlipLength / (interfaceFractionValue * localSlipLength);
  return Math.min(Math.max(ratio, 0), 1 / interfaceFractionValue);
}
