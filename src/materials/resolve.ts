/**
 * From a request's fluid description (catalogue id and/or explicit values) to
 * a resolved {@link FluidState} at one temperature.
 */
import { DomainError } from '../core/errors.js';
import { Notes } from '../core/notes.js';
import type { Reference } from '../core/references.js';
import type { FluidSpec } from '../core/catalogue.js';
import {
  SEAWATER_EXTRA_REFERENCES,
  SEAWATER_SALINITY_RANGES,
  getFluid,
  fluidIds,
  seawaterRecords,
} from './catalogue.js';
import { DEFAULT_SEAWATER_SALINITY, seawaterFreezingPoint } from './seawater.js';
import type { CatalogueFluid, PropertyRecord } from './types.js';
import type { FluidPropertyName, FluidPropertySet, FluidState } from '../core/fluid.js';

const PROPERTY_NAMES: readonly FluidPropertyName[] = [
  'density',
  'viscosity',
  'surfaceTension',
  'surfaceTensionDispersive',
  'interfacialTensionWater',
  'thermalConductivity',
  'specificHeat',
];

/** Temperature of a custom fluid given without one, K (20 °C; common practice, no source). */
export const CUSTOM_FLUID_TEMPERATURE = 293.15;

/** Largest meaningful absolute salinity, g/kg: a mass fraction of salt below one. */
const SALINITY_LIMIT = 1000;

function celsiusText(kelvin: number): string {
  return `${Math.round((kelvin - 273.15) * 10) / 10} °C`;
}

function checkPositive(value: number | undefined, path: string, what: string): void {
  if (value === undefined) return;
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new DomainError(`${what} must be a finite number greater than zero (got ${String(value)})`, {
      field: path,
    });
  }
}

/**
 * Resolve a fluid at one temperature. Explicit values in `spec` override the
 * catalogue (origin `input`); every other value comes from the catalogue with
 * its source key as origin and its reference in `references`.
 *
 * Throws DomainError (field path in `field`) for: an unknown id (`.id`); a
 * custom fluid without density or viscosity (`.density`, `.viscosity`); a
 * non-positive or non-finite value (`.<property>`, `.temperature`,
 * `.salinity`); a temperature at or below the freezing point or above the
 * boiling point (`.temperature`); a dispersive component larger than the
 * surface tension (`.surfaceTensionDispersive`). A temperature inside those
 * limits but outside a property's valid range gives the value plus a
 * `property-extrapolated` warning.
 */
export function resolveFluid(spec: FluidSpec, field = 'fluid'): FluidState {
  const { kinematicViscosity, ...rest } = spec;
  if (kinematicViscosity === undefined) return resolveDynamic(rest, field);
  checkPositive(kinematicViscosity, `${field}.kinematicViscosity`, 'kinematicViscosity');
  if (rest.viscosity !== undefined) {
    throw new DomainError('give viscosity or kinematicViscosity, not both', { field: `${field}.kinematicViscosity` });
  }
  // ν → μ with the density the fluid has: given, else the catalogue's at this temperature.
  const density = rest.density ?? (rest.id === undefined ? undefined : resolveDynamic(rest, field).density);
  if (density === undefined) {
    throw new DomainError('a kinematic viscosity needs the density: give density or a catalogue id', { field: `${field}.density` });
  }
  const state = resolveDynamic({ ...rest, viscosity: kinematicViscosity * density }, field);
  state.origins.viscosity = 'input (kinematic viscosity × density)';
  return state;
}

function resolveDynamic(spec: Omit<FluidSpec, 'kinematicViscosity'>, field: string): FluidState {
  for (const name of PROPERTY_NAMES) checkPositive(spec[name], `${field}.${name}`, name);
  checkPositive(spec.temperature, `${field}.temperature`, 'temperature');
  if (spec.salinity !== undefined) {
    if (!Number.isFinite(spec.salinity) || spec.salinity < 0 || spec.salinity >= SALINITY_LIMIT) {
      throw new DomainError(
        `salinity is absolute salinity in g/kg and must lie in [0, ${SALINITY_LIMIT}) (got ${String(spec.salinity)})`,
        { field: `${field}.salinity` },
      );
    }
  }
  const state = spec.id === undefined ? resolveCustom(spec, field) : resolveCatalogue(spec.id, spec, field);
  const { surfaceTension, surfaceTensionDispersive } = state;
  if (surfaceTension !== undefined && surfaceTensionDispersive !== undefined && surfaceTensionDispersive > surfaceTension) {
    throw new DomainError(
      `the dispersive component (${surfaceTensionDispersive} N/m) cannot exceed the surface tension (${surfaceTension} N/m)`,
      { field: `${field}.surfaceTensionDispersive` },
    );
  }
  return state;
}

function resolveCustom(spec: FluidSpec, field: string): FluidState {
  if (spec.density === undefined) {
    throw new DomainError('density is required when no catalogue fluid is named', { field: `${field}.density` });
  }
  if (spec.viscosity === undefined) {
    throw new DomainError('viscosity is required when no catalogue fluid is named', { field: `${field}.viscosity` });
  }
  const notes = new Notes();
  if (spec.salinity !== undefined) {
    notes.warn('salinity-ignored', 'salinity is used by the catalogue fluid "seawater" only and was ignored', 'info');
  }
  const values: Partial<FluidPropertySet> = {};
  const origins: FluidState['origins'] = {};
  for (const name of PROPERTY_NAMES) {
    const value = spec[name];
    if (value !== undefined) {
      values[name] = value;
      origins[name] = 'input';
    }
  }
  return {
    ...(values as FluidPropertySet),
    id: 'custom',
    name: 'custom fluid',
    temperature: spec.temperature ?? CUSTOM_FLUID_TEMPERATURE,
    origins,
    references: [],
    warnings: notes.warnings,
  };
}

function resolveCatalogue(id: string, spec: FluidSpec, field: string): FluidState {
  const fluid = getFluid(id);
  if (fluid === undefined) {
    throw new DomainError(`unknown fluid "${id}"; known fluids: ${fluidIds().join(', ')}`, { field: `${field}.id` });
  }
  const notes = new Notes();
  let records: CatalogueFluid['properties'] = fluid.properties;
  let freezingPoint = fluid.freezingPoint;
  let name = fluid.name;
  let salinityRangeCheck: ((property: FluidPropertyName) => void) | undefined;
  if (fluid.id === 'seawater') {
    const salinity = spec.salinity ?? DEFAULT_SEAWATER_SALINITY;
    if (spec.salinity !== undefined && spec.salinity !== DEFAULT_SEAWATER_SALINITY) {
      records = seawaterRecords(salinity);
      freezingPoint = seawaterFreezingPoint(salinity);
    }
    name = `Seawater (absolute salinity ${salinity} g/kg)`;
    notes.cite(...SEAWATER_EXTRA_REFERENCES);
    salinityRangeCheck = (property) => {
      const range = SEAWATER_SALINITY_RANGES[property];
      if (range !== undefined && (salinity < range.min || salinity > range.max)) {
        notes.warn(
          'salinity-extrapolated',
          `${property} of seawater: the correlation holds for ${range.min}–${range.max} g/kg; evaluated at ${salinity} g/kg`,
          'caution',
        );
      }
    };
  } else if (spec.salinity !== undefined) {
    notes.warn('salinity-ignored', `salinity is used by "seawater" only and was ignored for "${fluid.id}"`, 'info');
  }

  const temperature = spec.temperature ?? fluid.referenceTemperature;
  if (freezingPoint !== undefined && temperature < freezingPoint) {
    throw new DomainError(
      `${fluid.id} freezes at ${celsiusText(freezingPoint)}; requested ${celsiusText(temperature)}`,
      { field: `${field}.temperature`, code: 'fluid-frozen' },
    );
  }
  if (fluid.boilingPoint !== undefined && temperature > fluid.boilingPoint) {
    throw new DomainError(
      `${fluid.id} boils (or decomposes) at ${celsiusText(fluid.boilingPoint)}; requested ${celsiusText(temperature)}`,
      { field: `${field}.temperature`, code: 'fluid-boiling' },
    );
  }

  const values: Partial<FluidPropertySet> = {};
  const origins: FluidState['origins'] = {};
  const references: Reference[] = [];
  for (const property of PROPERTY_NAMES) {
    const override = spec[property];
    if (override !== undefined) {
      values[property] = override;
      origins[property] = 'input';
      continue;
    }
    const record: PropertyRecord | undefined = records[property];
    if (record === undefined) continue;
    const value = record.at(temperature);
    if (!Number.isFinite(value) || value <= 0) {
      notes.warn('property-unavailable', `${property} of ${fluid.id} has no meaningful value at ${temperature} K`);
      continue;
    }
    if (temperature < record.validRange.min || temperature > record.validRange.max) {
      notes.warn(
        'property-extrapolated',
        `${property} of ${fluid.id}: the source (${record.source.key}) holds for ` +
          `${record.validRange.min}–${record.validRange.max} K; evaluated at ${temperature} K`,
        'caution',
      );
    }
    salinityRangeCheck?.(property);
    values[property] = value;
    origins[property] = record.source.key;
    if (!references.some((r) => r.key === record.source.key)) references.push(record.source);
  }
  notes.cite(...references);
  if (values.density === undefined || values.viscosity === undefined) {
    // Cannot happen for the built-in catalogue (every entry has both); guarded so no NaN escapes.
    throw new DomainError(`${fluid.id} has no density or viscosity at ${temperature} K`, {
      field: `${field}.temperature`,
    });
  }
  return {
    ...(values as FluidPropertySet),
    id: fluid.id,
    name,
    temperature,
    origins,
    references: salinityRangeCheck === undefined ? references : [...references, ...SEAWATER_EXTRA_REFERENCES],
    warnings: notes.warnings,
  };
}
