/**
 * How a design refers to catalogue entries, and the lookup the physics needs
 * from the catalogue. A fluid and a surfactant are referenced the same way: a
 * catalogue `id` and/or explicit values, explicit values overriding the
 * catalogue. The materials layer implements {@link Catalogue}; the physics'
 * design composition receives it, so neither layer imports the other.
 */
import type { FluidState } from './fluid.js';
import type { InterfaceType, ResolvedSurfactant } from './surfactant.js';

/** A fluid: catalogue id and/or explicit property values, SI (temperature K, salinity g/kg). */
export interface FluidSpec {
  /** Catalogue id; omitted for a fluid described entirely by its values. */
  id?: string;
  temperature?: number;
  /** Absolute salinity, g/kg (seawater only). */
  salinity?: number;
  density?: number;
  viscosity?: number;
  /** Converted to dynamic viscosity with the density. */
  kinematicViscosity?: number;
  surfaceTension?: number;
  surfaceTensionDispersive?: number;
  interfacialTensionWater?: number;
  thermalConductivity?: number;
  specificHeat?: number;
}

/** Adsorption parameters of a surfactant at one interface, SI; any of them overrides the catalogue. */
export interface SurfactantParameters {
  /** Γ_m, mol/m². */
  maximumSurfaceExcess?: number;
  langmuirConstant?: number;
  adsorptionRate?: number;
  desorptionRate?: number;
  bulkDiffusivity?: number;
  surfaceDiffusivity?: number;
  gibbsPrefactor?: number;
  criticalMicelleConcentration?: number;
}

/** A surfactant: catalogue id and/or explicit adsorption parameters for the interface in question. */
export interface SurfactantSpec extends SurfactantParameters {
  id?: string;
  /** Display name of a surfactant given by its values. */
  name?: string;
}

export interface Catalogue {
  /** Resolve a fluid at its temperature; DomainError naming `${field}.<property>` for impossible input. */
  fluid(spec: FluidSpec, field: string): FluidState;
  /** Resolve a surfactant's parameters for one interface type; DomainError naming `${field}.<parameter>`. */
  surfactant(spec: SurfactantSpec, interfaceType: InterfaceType, field: string): ResolvedSurfactant;
  /** Interface types the catalogue has adsorption data for (undefined: not a catalogue id). */
  surfactantInterfaces(id: string): readonly InterfaceType[] | undefined;
  /** Display name of a catalogue surfactant. */
  surfactantName(id: string): string | undefined;
}
