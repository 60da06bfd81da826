/**
 * A lab's own fluids and surfactants, added to the built-in catalogue at
 * start-up from a file (the api reads and validates it:
 * src/api/user-catalogue-file.ts). This module takes the validated entries as
 * plain data in SI (so the same data can be handed to the solver threads),
 * builds catalogue records from them and keeps them apart from the built-in
 * entries, so every listing and response can say which is which.
 *
 * A property is a constant or a table over temperature. A table is
 * interpolated piecewise-linearly, the viscosity linearly in ln μ (viscosity
 * falls about exponentially with temperature: common practice, no source);
 * its valid range is the table's span unless the file states one. A constant
 * is valid at the entry's reference temperature only unless the file states
 * a range, so any other temperature carries the usual extrapolation caution.
 */
import type { FluidPropertyName } from '../core/fluid.js';
import type { Reference } from '../core/references.js';
import { tabulated, type Range } from './records.js';
import type { CatalogueSurfactant, InterfaceAdsorptionData, SourcedValue } from './surfactants.js';
import type { CatalogueFluid, FluidRole, PropertyRecord } from './types.js';

/** Where a user entry's values come from, as the lab states it. */
export interface UserSource {
  citation: string;
  doi?: string;
}

/** One property of a user fluid, SI: a constant `value` or a `table` of [temperature K, value] pairs. */
export interface UserPropertyData {
  value?: number;
  table?: [number, number][];
  validRange?: Range;
  source?: UserSource;
  note?: string;
}

export type UserFluidPropertyName = FluidPropertyName | 'kinematicViscosity';

export interface UserFluidData {
  id: string;
  name: string;
  role: FluidRole;
  description: string;
  source: UserSource;
  referenceTemperature: number;
  freezingPoint?: number;
  boilingPoint?: number;
  safety?: string;
  properties: Partial<Record<UserFluidPropertyName, UserPropertyData>>;
}

/** A user value of a surfactant, SI. */
export interface UserSurfactantValue {
  value: number;
  source?: UserSource;
  note?: string;
}

export type UserAdsorptionData = Partial<Record<keyof InterfaceAdsorptionData, UserSurfactantValue>>;

export interface UserSurfactantData {
  id: string;
  name: string;
  kind: CatalogueSurfactant['kind'];
  description: string;
  source: UserSource;
  safety?: string;
  molarMass?: UserSurfactantValue;
  bulkDiffusivity?: UserSurfactantValue;
  criticalMicelleConcentration?: UserSurfactantValue;
  interfaces: Partial<Record<'air-water' | 'oil-water', UserAdsorptionData>>;
}

/** A validated user catalogue: plain, structured-clonable data. */
export interface UserCatalogueData {
  /** The file it was read from, as given. */
  file: string;
  /** SHA-256 (hex) of the file's bytes, so a response can name the exact version. */
  sha256: string;
  title?: string;
  fluids: UserFluidData[];
  surfactants: UserSurfactantData[];
}

/** How a response or listing names where an entry comes from. */
export type CatalogueOrigin = 'built-in' | 'user';

let installed: { data: UserCatalogueData; fluids: Map<string, CatalogueFluid>; surfactants: Map<string, CatalogueSurfactant> } | undefined;
let generation = 0;

function reference(owner: string, property: string | undefined, source: UserSource): Reference {
  return {
    key: property === undefined ? `user:${owner}` : `user:${owner}:${property}`,
    citation: `${source.citation} (user catalogue entry "${owner}")`,
    ...(source.doi === undefined ? {} : { doi: source.doi }),
  };
}

function sortedTable(table: [number, number][]): [number, number][] {
  return [...table].sort((a, b) => a[0] - b[0]);
}

function propertyRecord(fluid: UserFluidData, name: UserFluidPropertyName, data: UserPropertyData): PropertyRecord {
  const source = data.source === undefined ? reference(fluid.id, undefined, fluid.source) : reference(fluid.id, name, data.source);
  const note = data.note;
  if (data.table !== undefined) {
    const table = sortedTable(data.table);
    const logarithmic = name === 'viscosity' || name === 'kinematicViscosity';
    const line = tabulated(logarithmic ? table.map(([t, y]) => [t, Math.log(y)] as [number, number]) : table);
    const at = logarithmic ? (t: number) => Math.exp(line(t)) : line;
    const validRange = data.validRange ?? { min: table[0]![0], max: table[table.length - 1]![0] };
    return { at, validRange, source, ...(note === undefined ? {} : { note }) };
  }
  const value = data.value as number;
  const validRange = data.validRange ?? { min: fluid.referenceTemperature, max: fluid.referenceTemperature };
  return { at: () => value, validRange, source, ...(note === undefined ? {} : { note }) };
}

/** The catalogue entry of a user fluid; a kinematic viscosity becomes the dynamic one with the entry's density. */
export function userFluidEntry(fluid: UserFluidData): CatalogueFluid {
  const properties: CatalogueFluid['properties'] = {};
  for (const [name, data] of Object.entries(fluid.properties) as [UserFluidPropertyName, UserPropertyData][]) {
    if (name !== 'kinematicViscosity') properties[name] = propertyRecord(fluid, name, data);
  }
  const kinematic = fluid.properties.kinematicViscosity;
  const density = properties.density;
  if (kinematic !== undefined && properties.viscosity === undefined && density !== undefined) {
    const nu = propertyRecord(fluid, 'kinematicViscosity', kinematic);
    properties.viscosity = {
      at: (t) => nu.at(t) * density.at(t),
      validRange: { min: Math.max(nu.validRange.min, density.validRange.min), max: Math.min(nu.validRange.max, density.validRange.max) },
      source: nu.source,
      note: `kinematic viscosity times the entry's density${kinematic.note === undefined ? '' : `; ${kinematic.note}`}`,
    };
  }
  return {
    id: fluid.id,
    name: fluid.name,
    role: fluid.role,
    description: fluid.description,
    referenceTemperature: fluid.referenceTemperature,
    properties,
    ...(fluid.freezingPoint === undefined ? {} : { freezingPoint: fluid.freezingPoint }),
    ...(fluid.boilingPoint === undefined ? {} : { boilingPoint: fluid.boilingPoint }),
    ...(fluid.safety === undefined ? {} : { safety: fluid.safety }),
  };
}

function sourcedValue(owner: UserSurfactantData, name: string, value: UserSurfactantValue | undefined): SourcedValue | undefined {
  if (value === undefined) return undefined;
  const source = value.source === undefined ? reference(owner.id, undefined, owner.source) : reference(owner.id, name, value.source);
  return { value: value.value, source, ...(value.note === undefined ? {} : { note: value.note }) };
}

/** The catalogue entry of a user surfactant. */
export function userSurfactantEntry(surfactant: UserSurfactantData): CatalogueSurfactant {
  const interfaces: CatalogueSurfactant['interfaces'] = {};
  for (const [type, data] of Object.entries(surfactant.interfaces) as ['air-water' | 'oil-water', UserAdsorptionData][]) {
    const entry: InterfaceAdsorptionData = {};
    for (const [name, value] of Object.entries(data) as [keyof InterfaceAdsorptionData, UserSurfactantValue][]) {
      entry[name] = sourcedValue(surfactant, `${type}.${name}`, value);
    }
    interfaces[type] = entry;
  }
  const optional = (name: 'molarMass' | 'bulkDiffusivity' | 'criticalMicelleConcentration') => {
    const value = sourcedValue(surfactant, name, surfactant[name]);
    return value === undefined ? {} : { [name]: value };
  };
  return {
    id: surfactant.id,
    name: surfactant.name,
    kind: surfactant.kind,
    description: surfactant.description,
    ...optional('molarMass'),
    ...optional('bulkDiffusivity'),
    ...optional('criticalMicelleConcentration'),
    ...(surfactant.safety === undefined ? {} : { safety: surfactant.safety }),
    interfaces,
  };
}

/**
 * Add a validated user catalogue (replacing any installed before). The
 * caller has checked that no id repeats or shadows a built-in one.
 */
export function installUserCatalogue(data: UserCatalogueData): void {
  installed = {
    data,
    fluids: new Map(data.fluids.map((f) => [f.id, userFluidEntry(f)])),
    surfactants: new Map(data.surfactants.map((s) => [s.id, userSurfactantEntry(s)])),
  };
  generation++;
}

/** Remove the user catalogue (tests). */
export function uninstallUserCatalogue(): void {
  installed = undefined;
  generation++;
}

/** Changes whenever the user catalogue does, for caches keyed by catalogue id. */
export function userCatalogueGeneration(): number {
  return generation;
}

/** The installed user catalogue's data (file, hash, entries), if any. */
export function userCatalogue(): UserCatalogueData | undefined {
  return installed?.data;
}

export function userFluid(id: string): CatalogueFluid | undefined {
  return installed?.fluids.get(id);
}

export function userFluids(): CatalogueFluid[] {
  return installed === undefined ? [] : [...installed.fluids.values()];
}

export function userSurfactant(id: string): CatalogueSurfactant | undefined {
  return installed?.surfactants.get(id);
}

export function userSurfactants(): CatalogueSurfactant[] {
  return installed === undefined ? [] : [...installed.surfactants.values()];
}
