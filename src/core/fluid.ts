/**
 * A fluid as the models see it: property values at one temperature, SI, with
 * where each value came from. The materials layer produces it from the
 * catalogue and a request's overrides; the physics layer consumes it.
 */
import type { Reference } from './references.js';
import type { Warning } from './notes.js';

/** Thermophysical properties the calculations use, SI units. */
export interface FluidPropertySet {
  /** kg/m³ */
  density: number;
  /** Pa·s */
  viscosity: number;
  /** Surface tension against air, N/m. */
  surfaceTension?: number;
  /** Dispersive (London) component of the surface tension, N/m (for the Fowkes estimate). */
  surfaceTensionDispersive?: number;
  /** Interfacial tension against water, N/m (lubricants only). */
  interfacialTensionWater?: number;
  /** W/(m·K) */
  thermalConductivity?: number;
  /** J/(kg·K) */
  specificHeat?: number;
}

export type FluidPropertyName = keyof FluidPropertySet;

/** A fluid resolved at one temperature, with explicit overrides applied. */
export interface FluidState extends FluidPropertySet {
  /** Catalogue id, or "custom" when every value was given explicitly. */
  id: string;
  name: string;
  temperature: number;
  /** Where each property value came from: catalogue source key, or "input". */
  origins: Partial<Record<FluidPropertyName, string>>;
  references: Reference[];
  warnings: Warning[];
}
