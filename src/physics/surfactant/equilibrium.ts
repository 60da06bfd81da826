/**
 * Equilibrium adsorption of a soluble surfactant at a fluid interface:
 * Langmuir isotherm, Szyszkowski equation of state and the Gibbs adsorption
 * equation, with the critical-micelle-concentration check.
 *
 * References:
 * [1] Chang, C.-H. & Franses, E. I. (1995) Colloids Surf. A 100, 1–45,
 *     doi:10.1016/0927-7757(94)03061-4 (Langmuir isotherm and the
 *     Szyszkowski/Langmuir equation of state of the Langmuir framework; no
 *     equation numbers are cited).
 * [2] Prosser, A. J. & Franses, E. I. (2001) Colloids Surf. A 178, 1–40,
 *     doi:10.1016/S0927-7757(00)00706-8 (prefactor n = 2 for ionic
 *     surfactants without salt in the Gibbs equation).
 */
import { DomainError } from '../../core/errors.js';
import { GAS_CONSTANT } from '../../core/constants.js';
import { Notes } from '../../core/notes.js';
import type { ResolvedSurfactant } from '../../core/surfactant.js';

/**
 * Langmuir isotherm Γ = Γ_m K c / (1 + K c) [1].
 * @param bulkConcentration c, mol/m³ (≥ 0)
 * @param maximumSurfaceExcess Γ_m, mol/m²
 * @param langmuirConstant K, m³/mol
 * @returns Γ, mol/m². Valid below the CMC (monomers only), ideal dilute bulk.
 */
export function langmuirSurfaceExcess(bulkConcentration: number, maximumSurfaceExcess: number, langmuirConstant: number): number {
  const kc = langmuirConstant * bulkConcentration;
  return (maximumSurfaceExcess * kc) / (1 + kc);
}

/**
 * Szyszkowski (Langmuir) equation of state σ = σ0 + n R T Γ_m ln(1 − Γ/Γ_m) [1].
 * @param surfaceExcess Γ, mol/m² (0 ≤ Γ < Γ_m)
 * @param cleanTension σ0, N/m
 * @param gibbsPrefactor n (1 nonionic, 2 ionic without salt [2])
 * @param temperature T, K
 * @param maximumSurfaceExcess Γ_m, mol/m²
 * @returns σ, N/m (may fall below zero far above the CMC, where the model no longer holds)
 */
export function szyszkowskiTension(
  surfaceExcess: number,
  cleanTension: number,
  gibbsPrefactor: number,
  temperature: number,
  maximumSurfaceExcess: number,
): number {
  return cleanTension + gibbsPrefactor * GAS_CONSTANT * temperature * maximumSurfaceExcess * Math.log1p(-surfaceExcess / maximumSurfaceExcess);
}

/**
 * Szyszkowski equation in the bulk concentration, σ = σ0 − n R T Γ_m ln(1 + K c),
 * obtained by inserting the Langmuir isotherm [1].
 * @param bulkConcentration c, mol/m³; other parameters as {@link szyszkowskiTension}; K in m³/mol.
 */
export function szyszkowskiTensionOfConcentration(
  bulkConcentration: number,
  cleanTension: number,
  gibbsPrefactor: number,
  temperature: number,
  maximumSurfaceExcess: number,
  langmuirConstant: number,
): number {
  return cleanTension - gibbsPrefactor * GAS_CONSTANT * temperature * maximumSurfaceExcess * Math.log1p(langmuirConstant * bulkConcentration);
}

/**
 * Gibbs adsorption equation Γ = −(1/(n R T)) dσ/d ln c [2].
 * @param tensionSlope dσ/d ln c, N/m
 * @param gibbsPrefactor n; @param temperature T, K
 * @returns Γ, mol/m²
 */
export function gibbsSurfaceExcess(tensionSlope: number, gibbsPrefactor: number, temperature: number): number {
  return -tensionSlope / (gibbsPrefactor * GAS_CONSTANT * temperature);
}

/**
 * Gibbs (Marangoni) elasticity of the Langmuir layer, E = −Γ dσ/dΓ = n R T Γ_m Γ/(Γ_m − Γ), N/m
 * (derivative of the Szyszkowski equation [1]).
 */
export function gibbsElasticity(surfaceExcess: number, gibbsPrefactor: number, temperature: number, maximumSurfaceExcess: number): number {
  return (gibbsPrefactor * GAS_CONSTANT * temperature * maximumSurfaceExcess * surfaceExcess) / (maximumSurfaceExcess - surfaceExcess);
}

export interface SurfactantEquilibrium {
  /** c, mol/m³. */
  bulkConcentration: number;
  /** Γ, mol/m². */
  surfaceExcess: number;
  /** Γ/Γ_m. */
  coverage: number;
  /** k = K c, the paper's dimensionless concentration (dilute when ≪ 1). */
  dimensionlessConcentration: number;
  /** σ, N/m (when the clean tension is known). */
  surfaceTension?: number;
  /** σ0 − σ, N/m. */
  surfaceTensionDrop: number;
  /** E = −Γ dσ/dΓ, N/m. */
  gibbsElasticity: number;
  aboveCriticalMicelleConcentration: boolean;
}

/**
 * Equilibrium state of the interface at bulk concentration c: Langmuir Γ,
 * Szyszkowski σ and its drop. Above the CMC the monomer concentration stays
 * near the CMC, so the isotherm overstates adsorption: warn (caution).
 * @param cleanTension σ0, N/m, optional (the drop σ0 − σ does not need it)
 */
export function surfactantEquilibrium(
  surfactant: ResolvedSurfactant,
  bulkConcentration: number,
  temperature: number,
  notes: Notes,
  cleanTension?: number,
): SurfactantEquilibrium {
  if (!Number.isFinite(bulkConcentration) || bulkConcentration < 0) {
    throw new DomainError('bulk concentration must be a finite number ≥ 0 mol/m³', { field: 'bulkConcentration' });
  }
  if (!Number.isFinite(temperature) || temperature <= 0) {
    throw new DomainError('temperature must be positive (K)', { field: 'temperature' });
  }
  const gm = surfactant.maximumSurfaceExcess;
  const gamma = langmuirSurfaceExcess(bulkConcentration, gm, surfactant.langmuirConstant);
  const drop = gibbsPrefactorTerm(surfactant, temperature) * Math.log1p(surfactant.langmuirConstant * bulkConcentration);
  const cmc = surfactant.criticalMicelleConcentration;
  const above = cmc !== undefined && bulkConcentration > cmc;
  if (above) {
    notes.warn(
      'above-critical-micelle-concentration',
      `bulk concentration ${bulkConcentration} mol/m³ exceeds the CMC ${cmc} mol/m³: micelles form, the Langmuir isotherm no longer applies and the interface is effectively saturated`,
      'caution',
    );
  }
  const result: SurfactantEquilibrium = {
    bulkConcentration,
    surfaceExcess: gamma,
    coverage: gamma / gm,
    dimensionlessConcentration: surfactant.langmuirConstant * bulkConcentration,
    surfaceTensionDrop: drop,
    gibbsElasticity: gibbsElasticity(gamma, surfactant.gibbsPrefactor, temperature, gm),
    aboveCriticalMicelleConcentration: above,
  };
  if (cleanTension !== undefined && Number.isFinite(cleanTension)) {
    result.surfaceTension = cleanTension - drop;
    if (result.surfaceTension <= 0) {
      notes.warn('negative-tension', 'the Szyszkowski equation gives a non-positive tension: far outside its range', 'warning');
    }
  }
  return result;
}

/** n R T Γ_m, N/m: the tension scale of the Szyszkowski equation. */
export function gibbsPrefactorTerm(surfactant: ResolvedSurfactant, temperature: number): number {
  return surfactant.gibbsPrefactor * GAS_CONSTANT * temperature * surfactant.maximumSurfaceExcess;
}
