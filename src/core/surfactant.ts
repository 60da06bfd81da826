/**
 * A surfactant as the models see it: adsorption parameters for one interface
 * type, SI, with where each value came from. Adsorption constants belong to an
 * interface (air–water, oil–water), not to the surfactant alone.
 */
import type { Warning } from './notes.js';
import type { Reference } from './references.js';

export type InterfaceType = 'air-water' | 'oil-water';

/** Surfactant parameters resolved for one interface, ready for the physics (SI). */
export interface ResolvedSurfactant {
  /** Catalogue id, or "custom". */
  id: string;
  name: string;
  interfaceType: InterfaceType;
  /** Γ_m, mol/m². */
  maximumSurfaceExcess: number;
  /** K, m³/mol. */
  langmuirConstant: number;
  /** κ_a, m³/(mol·s); absent = diffusion-controlled (instantaneous) exchange. */
  adsorptionRate?: number;
  /** κ_d, 1/s; absent = diffusion-controlled (instantaneous) exchange. */
  desorptionRate?: number;
  /** D, m²/s. */
  bulkDiffusivity: number;
  /** D_I, m²/s. */
  surfaceDiffusivity: number;
  /** n, dimensionless. */
  gibbsPrefactor: number;
  /** CMC, mol/m³, when known. */
  criticalMicelleConcentration?: number;
  /** Where each value came from: a reference key, "input" or "derived". */
  origins: Record<string, string>;
  references: Reference[];
  warnings: Warning[];
}
