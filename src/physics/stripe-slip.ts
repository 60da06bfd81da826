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
import { DomainError, type Reference } from './common.js';
import { grooveLidVelocityCentre, grooveLidVelocityMean } from './groove-duct.js';

export const STRIPE_SLIP_REFERENCES = {
  philip1972: {
    key: 'philip1972',
    citation: 'Philip, J. R. 1972 Flows satisfying mixed no-slip and no-shear conditions. Z. Angew. Math. Phys. (ZAMP) 23, 353–372.',
  },
  laugaStone2003: {
    key: 'laugaStone2003',
    citation: 'Lauga, E. & Stone, H. A. 2003 Effective slip in pressure-driven Stokes flow. J. Fluid Mech. 489, 55–77.',
  },
  belyaevVinogradova2010: {
    key: 'belyaevVinogradova2010',
    citation:
      'Belyaev, A. V. & Vinogradova, O. I. 2010 Effective slip in pressure-driven flow past super-hydrophobic stripes. J. Fluid Mech. 652, 489–499.',
    doi: '10.1017/S0022112010000741',
  },
  asmolovVinogradova2012: {
    key: 'asmolovVinogradova2012',
    citation:
      'Asmolov, E. S. & Vinogradova, O. I. 2012 Effective slip boundary condition for arbitrary one-dimensional surfaces. J. Fluid Mech. 706, 108–117.',
    doi: '10.1017/jfm.2012.228',
  },
  schoenecker2014: {
    key: 'schoenecker2014',
    citation:
      'Schönecker, C., Baier, T. & Hardt, S. 2014 Influence of the enclosed fluid on the flow over a microstructured surface in the Cassie state. J. Fluid Mech. 740, 168–195.',
  },
} satisfies Record<string, Reference>;

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
 * stripes [1, 2]: along the flow b(θ) = b_∥ cos²θ + b_⊥ sin²θ, across it
 * (the slip velocity component perpendicular to the mean shear, per unit of it)
 * b_×(θ) = (b_∥ − b_⊥) sin θ cos θ.
 * @param slipLengthLongitudinal b_∥, m
 * @param slipLengthTransverse b_⊥, m
 * @param flowAngle θ, degrees (0 = flow along the grooves)
 * @returns { alongFlow, crossFlow } in m.
 * References: [1] Bazant & Vinogradova 2008, J. Fluid Mech. 613, 125 (tensorial slip);
 * [2] Belyaev & Vinogradova 2010, J. Fluid Mech. 652, 489.
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

export const TENSOR_SLIP_REFERENCE: Reference = {
  key: 'bazantVinogradova2008',
  citation: 'Bazant, M. Z. & Vinogradova, O. I. 2008 Tensorial hydrodynamic slip. J. Fluid Mech. 613, 125–134 (pages from memory).',
};

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
 * Local slip lengths of a lubricant-filled rectangular groove, from the groove
 * alone: shear τ on its flat lid, no slip on side walls and floor, the working
 * liquid's shear transmitted unchanged (valid when the groove's lid shear is
 * close to uniform; Schönecker, Baier & Hardt 2014 [1] use the same local-slip
 * picture, with an aspect-ratio dependent slip).
 *
 * Longitudinal [derived, src/physics/groove-duct.ts]: b_s = μ_w u_lid/τ, i.e.
 *   mean   b̄_s = (w/N)(8/π³) Σ_odd tanh(nπd/w)/n³  (→ d/N shallow, 0.27137 w/N deep, w/(4N) at d/w = ½),
 *   centre b_c = (w/N)(4/π²) Σ_odd (−1)^((n−1)/2) tanh(nπd/w)/n²  (→ d/N shallow, 0.37123 w/N deep).
 *
 * Transverse [derived, lubrication]: across the groove the lubricant cannot leave
 * the cavity, so it recirculates with zero net flux. For a shallow groove the
 * profile u(y) = a y + c y² (y up from the floor) with u(0) = 0, μ_o u'(d) = τ and
 * ∫₀ᵈ u dy = 0 gives c = 3τ/(4μ_o d), a = −τ/(2μ_o), so u(d) = τd/(4μ_o) and
 *   b_s,⊥ = d/(4N), uniform across the mouth (mean = centre).
 * This is the shallow-groove limit (d ≲ 0.3 w); for deeper grooves the
 * recirculation is confined to an eddy of depth about w and the formula
 * overestimates — the caller warns and prefers the field solver there.
 *
 * @param grooveWidth w, m (> 0)
 * @param grooveDepth d, m (> 0)
 * @param viscosityRatio N = μ_lubricant/μ_working, > 0
 * @returns the four local slip lengths, m.
 * Reference: [1] Schönecker, Baier & Hardt 2014, J. Fluid Mech. 740, 168.
 */
export function grooveLocalSlipLengths(grooveWidth: number, grooveDepth: number, viscosityRatio: number): GrooveLocalSlip {
  requirePositive(viscosityRatio, 'lubricant.viscosity', 'viscosity ratio');
  const transverse = grooveDepth / (4 * viscosityRatio);
  return {
    longitudinalMean: grooveLidVelocityMean(grooveWidth, grooveDepth) / viscosityRatio,
    longitudinalCentre: grooveLidVelocityCentre(grooveWidth, grooveDepth) / viscosityRatio,
    transverseMean: transverse,
    transverseCentre: transverse,
  };
}

/** Depth-to-width ratio beyond which the shallow-groove transverse local slip is not trusted (common practice, no source). */
export const TRANSVERSE_LOCAL_SLIP_SHALLOW_LIMIT = 0.3;

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
