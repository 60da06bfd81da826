/**
 * Lifetime of the lubricant against dissolution into once-through working
 * fluid (mechanism 4 of ./retention.ts) [order of magnitude]: lifetime
 * t = ρ_o d/(k_m c_sat), the lubricant mass per unit interface area over the
 * dissolution flux with clean fluid outside. Mass-transfer coefficient k_m:
 * laminar, the Lévêque mean over the groove length L in the wall shear rate
 * S = τ_w/μ_w, k_m = [3/(2 Γ(4/3) 9^(1/3))] (D² S/L)^(1/3) = 0.8075 (D² S/L)^(1/3)
 * (Lévêque 1928, leveque1928; the coefficient is the mean over the length of the
 * Lévêque similarity solution [derived], 3/(2 Γ(4/3) 9^(1/3)) = 0.80755); turbulent,
 * Shaw & Hanratty's high-Schmidt correlation k_m = 0.0889 u_τ Sc^(−0.704)
 * (shawHanratty1977, whose citation says that its constants are unconfirmed), or the Lévêque value if larger
 * (short strips). Diffusivity of the lubricant in water from Wilke & Chang
 * (1955, wilkeChang1955): D = 7.4×10⁻⁸ (φ M_w)^½ T/(μ_w V_b^0.6) cm²/s (μ_w in
 * cP, V_b the molar volume at the normal boiling point in cm³/mol, φ = 2.6 for
 * water).
 */
import { DomainError } from '../../core/errors.js';
import type { Notes } from '../../core/notes.js';
import { REFERENCES } from '../../core/references.js';
import type { Scenario } from '../scenario.js';

/** Molar mass of water, kg/mol (IUPAC standard atomic weights). */
const WATER_MOLAR_MASS = 0.018015;
/** Wilke–Chang association factor of water (Wilke & Chang 1955). */
const WILKE_CHANG_WATER_ASSOCIATION = 2.6;
/** Γ(4/3) (Abramowitz & Stegun 1964, Table 6.1). */
const GAMMA_FOUR_THIRDS = 0.8929795115692492;
/** Mean Lévêque coefficient 3/(2 Γ(4/3) 9^(1/3)) (module comment). */
export const LEVEQUE_MEAN_COEFFICIENT = 3 / (2 * GAMMA_FOUR_THIRDS * Math.cbrt(9));

/**
 * Wilke–Chang (1955) diffusivity of a dilute solute in a solvent (Wilke & Chang 1955).
 * @param temperature T, K; @param solventViscosity μ, Pa·s; @param solventMolarMass M, kg/mol
 * @param soluteMolarVolume V_b at the normal boiling point, m³/mol; @param association φ (2.6 water)
 * @returns m²/s
 */
export function wilkeChangDiffusivity(
  temperature: number,
  solventViscosity: number,
  solventMolarMass: number,
  soluteMolarVolume: number,
  association = WILKE_CHANG_WATER_ASSOCIATION,
): number {
  const cgs = (7.4e-8 * Math.sqrt(association * solventMolarMass * 1e3) * temperature) / (solventViscosity * 1e3 * (soluteMolarVolume * 1e6) ** 0.6);
  return cgs * 1e-4;
}

/** Lévêque mean mass-transfer coefficient over a strip of length L in wall shear rate S, m/s (Lévêque 1928). */
export function levequeMassTransferCoefficient(diffusivity: number, wallShearRate: number, length: number): number {
  return LEVEQUE_MEAN_COEFFICIENT * Math.cbrt((diffusivity * diffusivity * wallShearRate) / length);
}

/** Shaw & Hanratty (1977) fully developed turbulent high-Schmidt coefficient k = 0.0889 u_τ Sc^−0.704, m/s (Shaw & Hanratty 1977). */
export function turbulentMassTransferCoefficient(frictionVelocity: number, schmidtNumber: number): number {
  return 0.0889 * frictionVelocity * schmidtNumber ** -0.704;
}

export interface Solubility {
  /** Saturation solubility of the lubricant in the working fluid. */
  value: number;
  /** kg/m³ (mass concentration) or mole fraction (needs molarMass). */
  unit: 'kg/m3' | 'mole-fraction';
  /** Lubricant molar mass, kg/mol (mole fraction conversion, Wilke–Chang volume estimate). */
  molarMass?: number;
  /** Lubricant molar volume at its normal boiling point, m³/mol (Wilke–Chang). */
  molarVolumeAtBoilingPoint?: number;
  /** Diffusivity of the lubricant in the working fluid, m²/s (skips Wilke–Chang). */
  diffusivity?: number;
}

export interface DissolutionEstimate {
  /** s; null without a solubility. */
  lifetime: number | null;
  /** k_m, m/s. */
  massTransferCoefficient: number | null;
  /** D, m²/s. */
  diffusivity: number | null;
  correlation: 'leveque' | 'shaw-hanratty' | null;
}

export const NO_DISSOLUTION: DissolutionEstimate = { lifetime: null, massTransferCoefficient: null, diffusivity: null, correlation: null };

export interface DissolutionInput {
  solubility: Solubility;
  scenario: Scenario;
  /** Length of groove the working fluid sweeps (the Lévêque strip length), m. */
  grooveLength: number;
}

/**
 * Dissolution lifetime of the lubricant in its grooves (module comment).
 * Throws DomainError for a negative solubility, a mole fraction without molar
 * mass, or a non-water working fluid without an explicit diffusivity.
 */
export function dissolutionLifetime(input: DissolutionInput, notes: Notes): DissolutionEstimate {
  const { solubility, scenario, grooveLength } = input;
  const { lubricant, workingFluid, flow, texture } = scenario;
  if (!(solubility.value >= 0 && Number.isFinite(solubility.value))) throw new DomainError('solubility must be non-negative', { field: 'solubility.value' });
  if (solubility.value === 0) return NO_DISSOLUTION;
  let saturation: number;
  if (solubility.unit === 'kg/m3') {
    saturation = solubility.value;
  } else {
    if (!(solubility.value < 1)) throw new DomainError('mole fraction must be below 1', { field: 'solubility.value' });
    if (!(solubility.molarMass && solubility.molarMass > 0)) throw new DomainError('mole-fraction solubility needs the lubricant molar mass', { field: 'solubility.molarMass' });
    // Dilute: c = x ρ_w M_o/M_w.
    saturation = (solubility.value * workingFluid.density * solubility.molarMass) / WATER_MOLAR_MASS;
  }
  let diffusivity = solubility.diffusivity;
  if (diffusivity === undefined) {
    if (!/water/i.test(workingFluid.id) && !/water/i.test(workingFluid.name)) {
      throw new DomainError('Wilke–Chang estimate implemented for water: give the diffusivity', { field: 'solubility.diffusivity' });
    }
    let volume = solubility.molarVolumeAtBoilingPoint;
    if (volume === undefined) {
      if (!(solubility.molarMass && solubility.molarMass > 0)) {
        throw new DomainError('give the diffusivity, or the molar mass for the Wilke–Chang estimate', { field: 'solubility.molarMass' });
      }
      volume = solubility.molarMass / lubricant.density;
      notes.assume('Wilke–Chang molar volume taken as the liquid molar volume at the working temperature (the boiling-point value is typically 10–20 % larger)');
    }
    diffusivity = wilkeChangDiffusivity(workingFluid.temperature, workingFluid.viscosity, WATER_MOLAR_MASS, volume);
    notes.cite(REFERENCES.wilkeChang1955);
  }
  if (!(diffusivity > 0 && Number.isFinite(diffusivity))) throw new DomainError('diffusivity must be positive', { field: 'solubility.diffusivity' });
  const shearRate = flow.wallShearStress / workingFluid.viscosity;
  const leveque = levequeMassTransferCoefficient(diffusivity, shearRate, grooveLength);
  let coefficient = leveque;
  let correlation: 'leveque' | 'shaw-hanratty' = 'leveque';
  notes.cite(REFERENCES.leveque1928);
  if (flow.regime !== 'laminar') {
    const schmidt = workingFluid.viscosity / (workingFluid.density * diffusivity);
    const turbulent = turbulentMassTransferCoefficient(flow.frictionVelocity, schmidt);
    notes.cite(REFERENCES.shawHanratty1977);
    if (turbulent > leveque) {
      coefficient = turbulent;
      correlation = 'shaw-hanratty';
    }
    if (flow.regime === 'transitional') notes.warn('dissolution-transitional', 'transitional flow: turbulent mass-transfer correlation used', 'caution');
  }
  const lifetime = (lubricant.density * texture.grooveDepth) / (coefficient * saturation);
  notes.model('retention.dissolution');
  notes.warn('dissolution-order-of-magnitude', 'dissolution lifetime is an order-of-magnitude estimate (clean once-through water, flat interface)', 'info');
  return { lifetime, massTransferCoefficient: coefficient, diffusivity, correlation };
}
