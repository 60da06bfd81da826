/**
 * The four wave checks of ./waves.ts as comparable load ratios, and the regime,
 * governing criterion and margin they give.
 *
 * Regime. Each check is expressed as a load ratio Π (a pressure ratio, so
 * the four are comparable): Π_Λ = Λ³ (dynamic pressure ρ(u_τ w⁺)² over the
 * capillary pressure γ/w), Π_KH = (ΔU/ΔU_c)², Π_dep = p′_rms/(2γ/w),
 * Π_RT = Δρ g_⊥ w²/(π²γ). The published (trade) boundary between calm and
 * wavy interfaces is Λ = 1, i.e. Π_Λ = 1 (common practice, no source); the
 * physical criteria have their thresholds at Π = 1.
 *
 * Bands (our own choice): the marginal band spans a factor √2 in the load
 * ratio, centred on the boundary (a factor 2^(1/4) either side), so that a
 * verdict of "calm" keeps a reserve and yet one doubling of the Weber number
 * (halving the tension doubles every Π) can carry a design from calm to
 * wavy, as the trade reports it does for a liquid-infused channel wall at a
 * bulk Reynolds number of about 3000 (calm at We = 100, wavy at We = 200;
 * common practice, no source). An earlier band of a factor two either side
 * put calm and wavy a factor four apart, so no doubling could cross it.
 *   calm      every Π < 2^(−1/4) ≈ 0.841  (Λ < 2^(−1/12) ≈ 0.944)
 *   marginal  otherwise, unless wavy      (0.944 ≤ Λ ≤ 2^(1/12) ≈ 1.059)
 *   wavy      Π_Λ > 2^(1/4) ≈ 1.189 (Λ > 1.059), or Π_KH, Π_dep or Π_RT ≥ 1
 * So a design at Λ = 0.997 is marginal, not calm: it sits on the trade
 * boundary without the reserve a calm verdict promises.
 *
 * Verdict: passes when the regime is calm. Margin = 1 − Π_max/Π_calm with
 * Π_calm = 2^(−1/4) (the fraction of the calm band's load still unused): 1
 * for an unloaded interface, 0 at the calm edge, 1 − 2^(1/4) ≈ −0.189 on the
 * trade boundary Λ = 1 (Π = 1), 1 − √2 ≈ −0.414 at the wavy edge of the
 * scaling criterion. The design limits are where the margin is 0.
 */
import { brent } from '../../numerics/roots.js';
import { criticalVelocityDifference, type TwoLayerInterface, type WavenumberExtremum } from './dispersion.js';
import { velocityPlusAtWallDistance } from '../flow/wall-profile.js';

export type WaveRegime = 'calm' | 'marginal' | 'wavy';
export type WaveCriterion = 'inertial-capillary' | 'kelvin-helmholtz' | 'depinning' | 'rayleigh-taylor';

/** Half-width of the marginal band as a factor on the load ratio Π (see the module comment). */
const BAND_FACTOR = 2 ** 0.25;
/** Cut-offs of the load ratio Π (see the module comment). */
export const CALM_LIMIT = 1 / BAND_FACTOR;
export const SCALING_WAVY_LIMIT = BAND_FACTOR;
export const PHYSICAL_WAVY_LIMIT = 1;
/**
 * p′_rms/τ_w band attributed to Farabee & Casarella 1991 (farabeeCasarella1991, whose citation says the band
 * is unconfirmed). Safety: the upper value is what triggers the depinning warning; a higher true level would
 * make depinning start at lower flow — and one was read: McGrath & Simpson (1987), NASA CR-4051 (abstract),
 * measured p′/τ_w near 3.8 in a zero-pressure-gradient boundary layer (momentum-thickness Reynolds number
 * 3000–18 800, smallest transducer), above this band.
 */
export const PRESSURE_FLUCTUATION_LOW = 2.5;
export const PRESSURE_FLUCTUATION_HIGH = 3.4;

/** What stays fixed while the design limits and the map vary w, γ or u_τ. */
export interface FixedConditions {
  lubricantDensity: number;
  workingDensity: number;
  workingViscosity: number;
  grooveDepth: number;
  outerDepth: number | undefined;
  normalGravity: number;
  slipLength: number;
  laminar: boolean;
}

export interface DesignPoint {
  grooveWidth: number;
  interfacialTension: number;
  frictionVelocity: number;
}

export interface CriteriaEvaluation {
  layers: TwoLayerInterface;
  viscousLength: number;
  grooveWidthPlus: number;
  frictionCapillaryNumber: number;
  inertialCapillaryNumber: number;
  velocityDifferenceImposed: number;
  velocityDifferenceHeight: number;
  critical: WavenumberExtremum;
  depinningPressure: number;
  pressureFluctuationHigh: number;
  bondNumber: number;
  rayleighTaylorDestabilising: boolean;
  ratios: Record<WaveCriterion, number>;
}

/**
 * Mean velocity above the interface at height y, relative to the interface,
 * in wall units: the linear sublayer in laminar flow, Spalding's law in
 * turbulent flow (Navier slip shifts the whole near-wall profile by u_s, so
 * the profile relative to the interface is the smooth-wall one).
 */
function relativeVelocityPlus(wallDistancePlus: number, laminar: boolean): number {
  return laminar ? wallDistancePlus : velocityPlusAtWallDistance(wallDistancePlus);
}

export function evaluateCriteria(fixed: FixedConditions, point: DesignPoint): CriteriaEvaluation {
  const { grooveWidth: w, interfacialTension: gamma, frictionVelocity: uTau } = point;
  const kinematicViscosity = fixed.workingViscosity / fixed.workingDensity;
  const viscousLength = kinematicViscosity / uTau;
  const grooveWidthPlus = w / viscousLength;
  const frictionCapillaryNumber = (fixed.workingViscosity * uTau) / gamma;
  const inertialCapillaryNumber = grooveWidthPlus * Math.cbrt(frictionCapillaryNumber);
  // The most dangerous confined wave, k* = √2 π/w, decays over 1/K* = w/(√3 π):
  // the wave feels the mean-velocity difference accumulated over that height.
  const velocityDifferenceHeight = w / (Math.sqrt(3) * Math.PI);
  const velocityDifferenceImposed = uTau * relativeVelocityPlus(velocityDifferenceHeight / viscousLength, fixed.laminar);
  const slipVelocity = (uTau * uTau * fixed.slipLength) / kinematicViscosity;
  const layers: TwoLayerInterface = {
    wallSideDensity: fixed.lubricantDensity,
    outerDensity: fixed.workingDensity,
    wallSideDepth: fixed.grooveDepth,
    outerDepth: fixed.outerDepth,
    wallSideVelocity: slipVelocity,
    outerVelocity: slipVelocity + velocityDifferenceImposed,
    interfacialTension: gamma,
    normalGravity: fixed.normalGravity,
    spanwiseWavenumber: Math.PI / w,
  };
  const critical = criticalVelocityDifference(layers);
  const depinningPressure = (2 * gamma) / w;
  const wallShearStress = fixed.workingDensity * uTau * uTau;
  const pressureFluctuationHigh = fixed.laminar ? 0 : PRESSURE_FLUCTUATION_HIGH * wallShearStress;
  const gravityLoad = (fixed.lubricantDensity - fixed.workingDensity) * fixed.normalGravity;
  const bondNumber = (Math.abs(gravityLoad) * w * w) / gamma;
  const rayleighTaylorDestabilising = gravityLoad < 0;
  const rayleighTaylorRatio = rayleighTaylorDestabilising ? bondNumber / (Math.PI * Math.PI) : 0;
  const kelvinHelmholtzRatio = critical.value > 0 ? (velocityDifferenceImposed / critical.value) ** 2 : 0;
  return {
    layers,
    viscousLength,
    grooveWidthPlus,
    frictionCapillaryNumber,
    inertialCapillaryNumber,
    velocityDifferenceImposed,
    velocityDifferenceHeight,
    critical,
    depinningPressure,
    pressureFluctuationHigh,
    bondNumber,
    rayleighTaylorDestabilising,
    ratios: {
      'inertial-capillary': inertialCapillaryNumber ** 3,
      'kelvin-helmholtz': kelvinHelmholtzRatio,
      depinning: pressureFluctuationHigh / depinningPressure,
      'rayleigh-taylor': rayleighTaylorRatio,
    },
  };
}

export function governing(ratios: Record<WaveCriterion, number>): WaveCriterion {
  let best: WaveCriterion = 'inertial-capillary';
  for (const key of Object.keys(ratios) as WaveCriterion[]) if (ratios[key] > ratios[best]) best = key;
  return best;
}

export function regimeOf(ratios: Record<WaveCriterion, number>): WaveRegime {
  if (
    ratios['inertial-capillary'] > SCALING_WAVY_LIMIT ||
    ratios['kelvin-helmholtz'] >= PHYSICAL_WAVY_LIMIT ||
    ratios.depinning >= PHYSICAL_WAVY_LIMIT ||
    ratios['rayleigh-taylor'] >= PHYSICAL_WAVY_LIMIT
  ) {
    return 'wavy';
  }
  return Math.max(...Object.values(ratios)) >= CALM_LIMIT ? 'marginal' : 'calm';
}

/** Verdict margin: 1 − Π_max/Π_calm (module comment). */
export function marginOf(ratios: Record<WaveCriterion, number>): number {
  return 1 - Math.max(...Object.values(ratios)) / CALM_LIMIT;
}

/**
 * Root of g(ln x) = 0 for a monotonic load in x, searched over 30 e-folds
 * either side of x0 (ln-space Brent). Null when no sign change is found.
 */
export function solveOnLogScale(g: (x: number) => number, x0: number): number | null {
  const f = (s: number) => g(Math.exp(s));
  const lo = Math.log(x0) - 30;
  const hi = Math.log(x0) + 30;
  const flo = f(lo);
  const fhi = f(hi);
  if (!(flo * fhi < 0)) return null;
  const root = brent(f, lo, hi, { xTolerance: 1e-12 });
  return root.converged && Number.isFinite(root.root) ? Math.exp(root.root) : null;
}

const CRITERION_WORDS: Record<WaveCriterion, string> = {
  'inertial-capillary': 'inertial–capillary load Λ³',
  'kelvin-helmholtz': 'Kelvin–Helmholtz load (ΔU/ΔU_c)²',
  depinning: 'depinning load p′_rms/(2γ/w)',
  'rayleigh-taylor': 'Rayleigh–Taylor load Δρg_⊥w²/(π²γ)',
};

/** The calm band's edge in words, for the criterion and the endpoint's description. */
export const CALM_WORDS =
  `${CALM_LIMIT.toPrecision(3)} (Λ = w⁺We_τ^(1/3) below ${Math.cbrt(CALM_LIMIT).toPrecision(3)}, a factor 2^(1/4) in pressure under the trade boundary Λ = 1)`;

/** The criterion of the waves verdict in words, with the governing load. */
export function wavesCriterion(ratios: Record<WaveCriterion, number>): string {
  const key = governing(ratios);
  return (
    `calm: every load ratio Π below ${CALM_WORDS}; ` +
    `governing: ${CRITERION_WORDS[key]} = ${ratios[key].toPrecision(3)}; margin = 1 − Π_max/${CALM_LIMIT.toPrecision(3)}`
  );
}
