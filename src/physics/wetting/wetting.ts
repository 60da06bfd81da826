/**
 * Thermodynamic state of a lubricant held in streamwise grooves under a working
 * liquid: is the lubricant-in-texture state stable, and which of three states
 * does the surface sit in?
 *
 * Energies per unit projected area of the textured wall (groove texture, one
 * period P, groove width w, depth d; roughness ratio r = 1 + 2d/P, top solid
 * fraction φ_s = (P − w)/P) for the three candidate states under the working
 * fluid, with γ_os, γ_sw, γ_ow the solid–lubricant, solid–working-fluid and
 * lubricant–working-fluid tensions [derived; the same bookkeeping as ref. 2]:
 *   film-covered            E₁ = r γ_os + γ_ow
 *   infused, exposed tops   E₂ = (r − φ_s) γ_os + φ_s γ_sw + (1 − φ_s) γ_ow
 *   not wetting (displaced) E₃ = r γ_sw
 * so E₂ − E₁ = φ_s S_os(w) with the spreading coefficient
 *   S_os(w) = γ_sw − γ_os − γ_ow = γ_ow (cos θ_os(w) − 1)        (Young's law),
 * and E₃ − E₂ = γ_ow [(r − φ_s) cos θ_os(w) − (1 − φ_s)], which changes sign at the
 * hemiwicking critical angle of Bico, Thiele & Quéré [1]
 *   cos θ_c = (1 − φ_s)/(r − φ_s) = w/(w + 2d) for grooves.
 * States (ref. 2's criteria, our names): film-covered when S_os(w) ≥ 0 (θ_os(w) = 0);
 * infused-exposed-tops when 0 < θ_os(w) < θ_c; not-wetting when θ_os(w) > θ_c (the
 * working fluid displaces the lubricant at equilibrium; only contact-line pinning
 * can then hold it, see retention.ts).
 *
 * The lubricant's angle under the working fluid (measured through the lubricant)
 * is taken, in this order: as given; from the in-air angles by Young's law,
 *   cos θ_os(w) = (γ_oa cos θ_os(a) − γ_wa cos θ_ws(a))/γ_ow   [derived, ref. 2];
 * or from the advancing and receding angles under the working fluid by Tadmor's
 * relation [4] (tadmorEquilibriumAngle below, with the status of its formula).
 *
 * Missing interfacial tension: catalogue value against water for water and
 * seawater, otherwise the Fowkes estimate [3] γ_ow = γ_o + γ_w − 2√(γ_o^d γ_w^d).
 *
 * References:
 *  [1] Bico, J., Thiele, U. & Quéré, D. 2002 Wetting of textured surfaces.
 *      Colloids Surf. A 206, 41–46. doi:10.1016/S0927-7757(02)00061-4
 *  [2] Smith, J. D., Dhiman, R., Anand, S., Reza-Garduno, E., Cohen, R. E.,
 *      McKinley, G. H. & Varanasi, K. K. 2013 Droplet mobility on
 *      lubricant-impregnated surfaces. Soft Matter 9, 1772–1780. doi:10.1039/C2SM27032C
 *  [3] Fowkes, F. M. 1964 Attractive forces at interfaces. Ind. Eng. Chem.
 *      56(12), 40–52. doi:10.1021/ie50660a008
 *  [4] Tadmor, R. 2004 Line energy and the relation between advancing, receding,
 *      and Young contact angles. Langmuir 20(18), 7659–7664. doi:10.1021/la049410h
 */
import type { FluidState } from '../../core/fluid.js';
import { WATER_SURFACE_TENSION_DISPERSIVE } from '../../core/constants.js';
import { DomainError } from '../../core/errors.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import { REFERENCES } from '../../core/references.js';
import type { Texture } from '../scenario.js';
import type { SourcedNumber, Verdict } from '../../core/values.js';

/**
 * The warning of a lubricant the working fluid displaces at equilibrium. One
 * wording, shared by wetting and retention, so a composed answer (the
 * assessment) carries it once.
 */
export function warnNotWetting(notes: Notes): void {
  notes.warn(
    'not-wetting-relies-on-pinning',
    'the working fluid displaces the lubricant at equilibrium: it can be held in the grooves only by contact-line pinning',
    'warning',
  );
}


/** Contact angles (degrees) of the lubricant on the flat solid under the working fluid, through the lubricant. */
export interface AnglesUnderWorkingFluid {
  advancing: number;
  receding: number;
  equilibrium?: number;
}

export interface ContactAngles {
  underWorkingFluid?: AnglesUnderWorkingFluid;
  /** Each liquid's own angle on the flat solid in air, degrees. */
  inAir?: { lubricant: number; workingFluid: number };
}

export interface WettingInput {
  texture: Texture;
  lubricant: FluidState;
  workingFluid: FluidState;
  contactAngles: ContactAngles;
  /** Lubricant–working-fluid interfacial tension, N/m. */
  interfacialTension?: number;
}

export type WettingState = 'film-covered' | 'infused-exposed-tops' | 'not-wetting';
export type InterfacialTensionOrigin = 'input' | 'catalogue' | 'fowkes-estimate';
export type AngleOrigin = 'input' | 'young-from-air' | 'tadmor-from-hysteresis';

export interface WettingResult {
  /** r = 1 + 2d/P, true over projected area. */
  roughnessRatio: number;
  /** φ_s = (P − w)/P. */
  topSolidFraction: number;
  /** θ_c, degrees: cos θ_c = (1 − φ_s)/(r − φ_s). */
  criticalAngle: number;
  /** θ_os(w), degrees, and where it came from. */
  equilibriumAngleUnderWorkingFluid: SourcedNumber<AngleOrigin>;
  spreadingCoefficients: {
    /** S_os(w) = γ_sw − γ_os − γ_ow, N/m (≤ 0 when only the angle under the working fluid is known). */
    lubricantOnSolidUnderWorkingFluid: number;
    /** S_ow(a) = γ_wa − γ_ow − γ_oa, N/m; null without both surface tensions. */
    lubricantOnWorkingFluidInAir: number | null;
    /** S_ow(a) > 0: the lubricant spreads over (cloaks) the working fluid in air. */
    cloaking: boolean | null;
  };
  state: WettingState;
  /** Energy per unit projected area, J/m², separating the state from the nearest other state. */
  energyMargin: number;
  /** The state {@link energyMargin} separates it from. */
  nearestState: WettingState;
  /** E₁, E₂, E₃ relative to the film-covered state, J/m². */
  stateEnergies: Record<WettingState, number>;
  /** Hemiwicking: the lubricant's angle in the filling medium is below θ_c. */
  fillsSpontaneously: boolean;
  /** Medium the texture is filled from in that judgement (air when in-air angles are given). */
  fillingMedium: 'air' | 'working-fluid';
  interfacialTension: SourcedNumber<InterfacialTensionOrigin>;
  /**
   * Stable (passes) when the lubricant-filled texture, film-covered or infused, has the lower energy than the
   * state displaced by the working fluid; margin = (E_displaced − E_wetting)/γ_ow.
   */
  verdict: Verdict;
}

const DEG = Math.PI / 180;

function checkAngle(value: number, field: string): void {
  if (!(Number.isFinite(value) && value >= 0 && value <= 180)) {
    throw new DomainError('contact angle must lie between 0 and 180 degrees', { field });
  }
}

/** Validates a groove texture and returns r and φ_s (module comment). */
export function grooveTextureRatios(texture: Texture): { roughnessRatio: number; topSolidFraction: number } {
  const { grooveWidth: w, pitch: p, grooveDepth: d } = texture;
  if (!(Number.isFinite(w) && w > 0)) throw new DomainError('groove width must be positive', { field: 'texture.grooveWidth' });
  if (!(Number.isFinite(d) && d > 0)) throw new DomainError('groove depth must be positive', { field: 'texture.grooveDepth' });
  if (!(Number.isFinite(p) && p > w)) throw new DomainError('pitch must exceed the groove width', { field: 'texture.pitch' });
  return { roughnessRatio: 1 + (2 * d) / p, topSolidFraction: (p - w) / p };
}

/**
 * Hemiwicking critical angle of a groove texture [1]:
 * cos θ_c = (1 − φ_s)/(r − φ_s), which for grooves is w/(w + 2d).
 * @param roughnessRatio r ≥ 1
 * @param topSolidFraction φ_s, 0 ≤ φ_s < 1
 * @returns θ_c in degrees (0–90).
 */
export function hemiwickingCriticalAngle(roughnessRatio: number, topSolidFraction: number): number {
  if (!(roughnessRatio >= 1) || !(topSolidFraction >= 0 && topSolidFraction < 1)) {
    throw new DomainError('roughness ratio must be ≥ 1 and top solid fraction in [0, 1)', { field: 'texture' });
  }
  const cosine = (1 - topSolidFraction) / (roughnessRatio - topSolidFraction);
  return Math.acos(Math.min(1, cosine)) / DEG;
}

/**
 * Fowkes (1964) estimate of the interfacial tension between a liquid that
 * interacts only by dispersion forces and another liquid:
 * γ_12 = γ_1 + γ_2 − 2√(γ_1^d γ_2^d) [3].
 * @param surfaceTension1 γ_1, N/m; @param dispersive1 γ_1^d, N/m (≤ γ_1)
 * @param surfaceTension2 γ_2, N/m; @param dispersive2 γ_2^d, N/m (≤ γ_2)
 * @returns N/m, floored at 0. Valid when at most one liquid is polar; hexadecane/water
 *   gives 51.3 mN/m against about 53 mN/m measured.
 */
export function fowkesInterfacialTension(
  surfaceTension1: number,
  dispersive1: number,
  surfaceTension2: number,
  dispersive2: number,
): number {
  for (const [v, name] of [
    [surfaceTension1, 'lubricant.surfaceTension'],
    [dispersive1, 'lubricant.surfaceTensionDispersive'],
    [surfaceTension2, 'workingFluid.surfaceTension'],
    [dispersive2, 'workingFluid.surfaceTensionDispersive'],
  ] as const) {
    if (!(Number.isFinite(v) && v > 0)) throw new DomainError('surface tensions must be positive', { field: name });
  }
  return Math.max(0, surfaceTension1 + surfaceTension2 - 2 * Math.sqrt(dispersive1 * dispersive2));
}

/**
 * Young angle from the advancing and receding angles, after Tadmor's line-energy construction [4]
 * (the paper's record and abstract were read: a line energy, fixed by θ_A and θ_R and the drop volume, lets
 * θ₀ be back-calculated; the equation as printed there was not read, so the form below stands on its own
 * derivation) [derived]: a line-energy term ∝ 1/r that opposes the contact-line motion gives
 * cos θ_A = cos θ₀ − c/r_A and cos θ_R = cos θ₀ + c/r_R for drops of one volume; eliminating c,
 *   cos θ₀ = (Γ_A cos θ_A + Γ_R cos θ_R)/(Γ_A + Γ_R),
 * where Γ_X ∝ r_X is the base radius of a spherical cap of fixed volume at contact angle θ_X,
 * Γ_X = (sin³θ_X/(2 − 3cos θ_X + cos³θ_X))^(1/3) (cap volume πr³(2 − 3cos θ + cos³θ)/(3 sin³θ)).
 * The test recovers θ₀ from angles generated by that forward model with cap volumes integrated numerically.
 * Degrees in, degrees out.
 */
export function tadmorEquilibriumAngle(advancing: number, receding: number): number {
  const weight = (theta: number): number => {
    const c = Math.cos(theta * DEG);
    const s = Math.sin(theta * DEG);
    const denominator = 2 - 3 * c + c ** 3;
    // θ → 0: Γ → (sin³θ/(3θ⁴/4))^(1/3) → ∞ as (4/(3θ))^(1/3); cap at a tiny angle to stay finite.
    if (denominator <= 1e-300 || s <= 0) return theta < 90 ? 1e100 : 0;
    return Math.cbrt((s * s * s) / denominator);
  };
  const ga = weight(advancing);
  const gr = weight(receding);
  if (!(ga + gr > 0)) return 0.5 * (advancing + receding);
  const cosine = (ga * Math.cos(advancing * DEG) + gr * Math.cos(receding * DEG)) / (ga + gr);
  return Math.acos(Math.max(-1, Math.min(1, cosine))) / DEG;
}

/** Whether a catalogue fluid is water or seawater, for the catalogue interfacial tension. */
function isWater(fluid: FluidState): boolean {
  return /water/i.test(fluid.id) || /water/i.test(fluid.name);
}

/**
 * Interfacial tension between lubricant and working fluid: input, catalogue
 * (against water), or the Fowkes estimate with a warning.
 */
export function resolveInterfacialTension(
  lubricant: FluidState,
  workingFluid: FluidState,
  given: number | undefined,
  notes: Notes,
): SourcedNumber<InterfacialTensionOrigin> {
  if (given !== undefined) {
    if (!(Number.isFinite(given) && given > 0)) throw new DomainError('interfacial tension must be positive', { field: 'interfacialTension' });
    return { value: given, source: 'input' };
  }
  if (isWater(workingFluid) && lubricant.interfacialTensionWater !== undefined && lubricant.interfacialTensionWater > 0) {
    if (/sea/i.test(workingFluid.id)) {
      notes.warn('interfacial-tension-fresh-water', 'catalogue interfacial tension is against fresh water; seawater salts shift it by a few per cent', 'info');
    }
    return { value: lubricant.interfacialTensionWater, source: 'catalogue' };
  }
  const gammaO = lubricant.surfaceTension;
  const gammaW = workingFluid.surfaceTension;
  if (gammaO === undefined || gammaW === undefined) {
    throw new DomainError('interfacial tension unknown: give it, or surface tensions of both liquids for the Fowkes estimate', {
      field: 'interfacialTension',
    });
  }
  let gammaOd = lubricant.surfaceTensionDispersive;
  if (gammaOd === undefined) {
    gammaOd = gammaO;
    notes.assume('lubricant taken as purely dispersive (γ^d = γ) for the Fowkes estimate');
  }
  let gammaWd = workingFluid.surfaceTensionDispersive;
  if (gammaWd === undefined) {
    if (!isWater(workingFluid)) {
      throw new DomainError('working fluid lacks a dispersive surface-tension component for the Fowkes estimate', {
        field: 'workingFluid.surfaceTensionDispersive',
      });
    }
    gammaWd = WATER_SURFACE_TENSION_DISPERSIVE;
  }
  const value = fowkesInterfacialTension(gammaO, gammaOd, gammaW, gammaWd);
  notes.cite(REFERENCES.fowkes1964);
  notes.warn(
    'interfacial-tension-estimated',
    `interfacial tension estimated by Fowkes' geometric-mean rule (${(value * 1e3).toFixed(1)} mN/m); typically within a few mN/m for alkane/water, less reliable for polar or fluorinated lubricants`,
    'caution',
  );
  if (!(value > 0)) throw new DomainError('Fowkes estimate gives no interfacial tension: the liquids would mix', { field: 'interfacialTension' });
  return { value, source: 'fowkes-estimate' };
}

/**
 * Wetting state of the lubricant-in-texture under the working fluid (module comment, refs. 1–4).
 * @returns geometry ratios, θ_c, θ_os(w), spreading coefficients, state with its
 *   energy margin (J/m²), spontaneous filling and the interfacial tension used.
 */
export function evaluateWetting(input: WettingInput): Outcome<WettingResult> {
  const notes = new Notes();
  notes.model('wetting.three-state-energies').cite(REFERENCES.bico2002, REFERENCES.smith2013);
  const { roughnessRatio, topSolidFraction } = grooveTextureRatios(input.texture);
  const criticalAngle = hemiwickingCriticalAngle(roughnessRatio, topSolidFraction);
  const cosCritical = Math.cos(criticalAngle * DEG);
  const tension = resolveInterfacialTension(input.lubricant, input.workingFluid, input.interfacialTension, notes);
  const gamma = tension.value;

  const under = input.contactAngles.underWorkingFluid;
  const inAir = input.contactAngles.inAir;
  if (under) {
    checkAngle(under.advancing, 'contactAngles.underWorkingFluid.advancing');
    checkAngle(under.receding, 'contactAngles.underWorkingFluid.receding');
    if (under.receding > under.advancing) {
      throw new DomainError('receding angle cannot exceed the advancing angle', { field: 'contactAngles.underWorkingFluid.receding' });
    }
    if (under.equilibrium !== undefined) checkAngle(under.equilibrium, 'contactAngles.underWorkingFluid.equilibrium');
  }
  if (inAir) {
    checkAngle(inAir.lubricant, 'contactAngles.inAir.lubricant');
    checkAngle(inAir.workingFluid, 'contactAngles.inAir.workingFluid');
  }

  // γ_sw − γ_os from Young's law in air, when possible: it also gives the sign of S_os(w) beyond θ = 0.
  let solidTensionDifference: number | null = null;
  if (inAir && input.lubricant.surfaceTension !== undefined && input.workingFluid.surfaceTension !== undefined) {
    solidTensionDifference =
      input.lubricant.surfaceTension * Math.cos(inAir.lubricant * DEG) - input.workingFluid.surfaceTension * Math.cos(inAir.workingFluid * DEG);
  } else if (inAir && !(under?.equilibrium !== undefined)) {
    throw new DomainError('in-air angles need the surface tensions of both liquids', { field: 'contactAngles.inAir' });
  }

  let cosTheta: number;
  let origin: AngleOrigin;
  if (under?.equilibrium !== undefined) {
    cosTheta = Math.cos(under.equilibrium * DEG);
    origin = 'input';
  } else if (solidTensionDifference !== null) {
    cosTheta = solidTensionDifference / gamma;
    origin = 'young-from-air';
    notes.assume("angle under the working fluid from the in-air angles by Young's law (flat, homogeneous solid)");
  } else if (under) {
    cosTheta = Math.cos(tadmorEquilibriumAngle(under.advancing, under.receding) * DEG);
    origin = 'tadmor-from-hysteresis';
    notes.cite(REFERENCES.tadmor2004);
    notes.warn('equilibrium-angle-estimated', "equilibrium angle under the working fluid estimated from the advancing and receding angles (Tadmor's relation)", 'caution');
  } else {
    throw new DomainError('contact angles needed: under the working fluid, or in air for both liquids', { field: 'contactAngles' });
  }
  const theta = Math.acos(Math.max(-1, Math.min(1, cosTheta))) / DEG;
  const spreadingUnder =
    origin === 'young-from-air' && solidTensionDifference !== null ? solidTensionDifference - gamma : gamma * (Math.min(1, cosTheta) - 1);

  let spreadingInAir: number | null = null;
  if (input.lubricant.surfaceTension !== undefined && input.workingFluid.surfaceTension !== undefined) {
    spreadingInAir = input.workingFluid.surfaceTension - gamma - input.lubricant.surfaceTension;
  }

  // Energies relative to the film-covered state, J/m² (module comment).
  const cosClamped = Math.max(-1, Math.min(1, cosTheta));
  // γ_sw − γ_os: from the in-air Young relations when used (it may exceed γ_ow), else γ_ow cos θ_os(w).
  const solidDifference = origin === 'young-from-air' && solidTensionDifference !== null ? solidTensionDifference : gamma * cosClamped;
  const energyInfused = topSolidFraction * spreadingUnder;
  const energyDisplaced =
    energyInfused + (roughnessRatio - topSolidFraction) * solidDifference - (1 - topSolidFraction) * gamma;
  const stateEnergies: Record<WettingState, number> = {
    'film-covered': 0,
    'infused-exposed-tops': energyInfused,
    'not-wetting': energyDisplaced,
  };
  let state: WettingState;
  if (spreadingUnder >= 0) state = 'film-covered';
  else if (cosClamped > cosCritical) state = 'infused-exposed-tops';
  else state = 'not-wetting';
  // A film-covered state can only be confirmed when S_os(w) is known beyond θ = 0.
  if (state === 'film-covered' && origin !== 'young-from-air') {
    notes.warn('film-state-marginal', 'zero contact angle given: the film-covered state is at its boundary (spreading coefficient not known beyond zero)', 'info');
  }
  const own = stateEnergies[state];
  let towards: WettingState = state;
  let margin = Infinity;
  for (const other of Object.keys(stateEnergies) as WettingState[]) {
    if (other === state) continue;
    const gap = stateEnergies[other] - own;
    if (gap < margin) {
      margin = gap;
      towards = other;
    }
  }
  if (state === 'not-wetting') warnNotWetting(notes);

  let fillingMedium: 'air' | 'working-fluid';
  let fillsSpontaneously: boolean;
  if (inAir) {
    fillingMedium = 'air';
    fillsSpontaneously = inAir.lubricant < criticalAngle;
  } else {
    fillingMedium = 'working-fluid';
    fillsSpontaneously = theta < criticalAngle;
  }

  return outcome(
    {
      roughnessRatio,
      topSolidFraction,
      criticalAngle,
      equilibriumAngleUnderWorkingFluid: { value: theta, source: origin },
      spreadingCoefficients: {
        lubricantOnSolidUnderWorkingFluid: spreadingUnder,
        lubricantOnWorkingFluidInAir: spreadingInAir,
        cloaking: spreadingInAir === null ? null : spreadingInAir > 0,
      },
      state,
      energyMargin: Math.max(0, margin),
      nearestState: towards,
      stateEnergies,
      fillsSpontaneously,
      fillingMedium,
      interfacialTension: tension,
      verdict: wettingVerdict(stateEnergies, gamma, criticalAngle),
    },
    notes,
  );
}

/**
 * Verdict of the wetting question: passes when the better of the two wetting
 * states (film-covered, infused) lies below the displaced state; the margin is
 * their energy gap per unit projected area in units of γ_ow (dimensionless,
 * zero at θ_os(w) = θ_c).
 */
function wettingVerdict(energies: Record<WettingState, number>, interfacialTension: number, criticalAngle: number): Verdict {
  const wetting = Math.min(energies['film-covered'], energies['infused-exposed-tops']);
  const margin = (energies['not-wetting'] - wetting) / interfacialTension;
  return {
    passes: margin > 0,
    margin,
    criterion: `stable: the lubricant-filled texture has a lower energy than the texture displaced by the working fluid, i.e. the lubricant's angle under the working fluid below θ_c = ${criticalAngle.toFixed(1)}°; margin = (E_displaced − E_wetting)/γ_ow per unit projected area`,
  };
}
