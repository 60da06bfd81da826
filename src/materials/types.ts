/**
 * Shapes of the built-in catalogue. Every property value has a source; a
 * value recalled but not confirmed against its source says so in `note`
 * (the recalled-value tag of records.ts). Temperatures are kelvin, everything else SI.
 */
import type { FluidPropertyName } from '../core/fluid.js';
import type { Reference } from '../core/references.js';


export const PROPERTY_UNITS: Record<FluidPropertyName, string> = {
  density: 'kg/m^3',
  viscosity: 'Pa*s',
  surfaceTension: 'N/m',
  surfaceTensionDispersive: 'N/m',
  interfacialTensionWater: 'N/m',
  thermalConductivity: 'W/(m*K)',
  specificHeat: 'J/(kg*K)',
};

/** What the catalogue says about one property of one fluid. */
export interface PropertyRecord {
  /** Property as a function of temperature (K); constant properties ignore it. */
  at: (temperature: number) => number;
  /** Temperature range (K) over which the source's formula or datum holds. */
  validRange: { min: number; max: number };
  /** Where the value comes from (one entry may serve many properties). */
  source: Reference;
  /** e.g. the recalled-value tag, "at 25 °C only", "nominal grade value". */
  note?: string;
}

export type FluidRole = 'working-fluid' | 'lubricant';

export interface CatalogueFluid {
  id: string;
  name: string;
  role: FluidRole;
  description: string;
  /** Melting / pour point, K: a request colder than this is impossible (422). */
  freezingPoint?: number;
  /** Normal boiling point (or decomposition), K: a request hotter is impossible (422). */
  boilingPoint?: number;
  /** Default temperature when a request gives none, K. */
  referenceTemperature: number;
  properties: Partial<Record<FluidPropertyName, PropertyRecord>>;
  /** Handling and safety notes for the docs (flammability, data sheet advice). */
  safety?: string;
}
