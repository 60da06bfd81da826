/**
 * The built-in fluid catalogue: water and seawater here, the lubricant
 * families in their own modules (alkanes, silicones, lubricants). Every
 * property names its source; a value that was recalled and could not be
 * confirmed against that source during writing carries the recalled-value tag
 * of records.ts in its note.
 * Temperatures are kelvin, values SI.
 */
import { REFERENCES, type Reference } from '../core/references.js';
import { N_DECANE, N_DODECANE, N_HEXADECANE } from './alkanes.js';
import { GALLIUM, MINERAL_OIL_LIGHT, PERFLUORODECALIN, PFPE_GENERIC } from './lubricants.js';
import { constant, around, type Range } from './records.js';
import {
  IAPWS_CONDUCTIVITY_2011,
  IAPWS_SR6_08,
  IAPWS_SURFACE_TENSION_2014,
  IAPWS_VISCOSITY_2008,
  SHARQAWY_2010,
  TEOS10_SALINITY,
  UNESCO_EOS80,
} from './references.js';
import {
  DEFAULT_SEAWATER_SALINITY,
  seawaterDensity,
  seawaterFreezingPoint,
  seawaterSpecificHeat,
  seawaterSurfaceTension,
  seawaterThermalConductivity,
  seawaterViscosity,
} from './seawater.js';
import * as MATERIAL_REFERENCES from './references.js';
import { SILICONE_OILS } from './silicones.js';
import type { CatalogueFluid, PropertyRecord } from './types.js';
import { userFluid, userFluids, type CatalogueOrigin } from './user-catalogue.js';
import type { FluidPropertyName } from '../core/fluid.js';
import { PROPERTY_UNITS } from './types.js';
import {
  WATER_SURFACE_TENSION_DISPERSIVE,
  waterDensity,
  waterSpecificHeat,
  waterSurfaceTension,
  waterThermalConductivity,
  waterViscosity,
} from './water.js';

// ---------------------------------------------------------------------------------------------
// Water and seawater
// ---------------------------------------------------------------------------------------------

/**
 * Normal boiling point of water at 101.325 kPa on ITS-90, K: saturated liquid of IAPWS-95 (W. Wagner & A. Pruß 2002,
 * J. Phys. Chem. Ref. Data 31, 387), 373.1243 K as evaluated by the iapws package
 * (fixtures/materials/water_seawater.json; checked in the water tests).
 */
const WATER_NORMAL_BOILING_POINT = 373.124;
const WATER_LIQUID_RANGE: Range = { min: 273.15, max: 373.15 };

const WATER: CatalogueFluid = {
  id: 'water',
  name: 'Water (pure, liquid, 0.1 MPa)',
  role: 'working-fluid',
  description:
    'Pure liquid water at 0.1 MPa. Density and specific heat from the IAPWS 0.1 MPa Gibbs function ' +
    '(SR6-08), viscosity and thermal conductivity from the IAPWS 2008 and 2011 formulations at that ' +
    'density (critical enhancement omitted), surface tension from the IAPWS 2014 release.',
  freezingPoint: 273.15,
  boilingPoint: WATER_NORMAL_BOILING_POINT,
  referenceTemperature: 293.15,
  properties: {
    density: { at: waterDensity, validRange: WATER_LIQUID_RANGE, source: IAPWS_SR6_08 },
    viscosity: { at: waterViscosity, validRange: WATER_LIQUID_RANGE, source: IAPWS_VISCOSITY_2008 },
    surfaceTension: {
      at: waterSurfaceTension,
      validRange: { min: 273.16, max: WATER_LIQUID_RANGE.max },
      source: IAPWS_SURFACE_TENSION_2014,
      note: 'Against the saturated vapour; taken as the value against air (common practice, no source).',
    },
    surfaceTensionDispersive: constant(WATER_SURFACE_TENSION_DISPERSIVE, around(20, 5), REFERENCES.fowkes1964, 'at 20 °C only'),
    thermalConductivity: {
      at: waterThermalConductivity,
      validRange: { min: 273.16, max: WATER_LIQUID_RANGE.max },
      source: IAPWS_CONDUCTIVITY_2011,
    },
    specificHeat: { at: waterSpecificHeat, validRange: WATER_LIQUID_RANGE, source: IAPWS_SR6_08 },
  },
};

/**
 * Property records of seawater of absolute salinity `absoluteSalinity` (g/kg).
 * The catalogue entry uses {@link DEFAULT_SEAWATER_SALINITY}; `resolveFluid`
 * builds a fresh set when a request gives its own salinity.
 */
export function seawaterRecords(absoluteSalinity: number): CatalogueFluid['properties'] {
  const s = absoluteSalinity;
  return {
    density: {
      at: (t) => seawaterDensity(t, s),
      validRange: { min: 271.15, max: 313.15 },
      source: UNESCO_EOS80,
      note: 'EOS-80 at one atmosphere; absolute salinity converted to practical salinity by TEOS-10 (teos10-2010).',
    },
    viscosity: { at: (t) => seawaterViscosity(t, s), validRange: { min: 273.15, max: 453.15 }, source: SHARQAWY_2010 },
    surfaceTension: {
      at: (t) => seawaterSurfaceTension(t, s),
      validRange: { min: 273.15, max: 313.15 },
      source: SHARQAWY_2010,
    },
    thermalConductivity: {
      at: (t) => seawaterThermalConductivity(t, s),
      validRange: { min: 273.15, max: 453.15 },
      source: SHARQAWY_2010,
    },
    specificHeat: {
      at: (t) => seawaterSpecificHeat(t, s),
      validRange: { min: 273.15, max: 453.15 },
      source: SHARQAWY_2010,
    },
  };
}

/** Salinity ranges (g/kg) of the seawater correlations, for extrapolation warnings. */
export const SEAWATER_SALINITY_RANGES: Partial<Record<FluidPropertyName, Range>> = {
  density: { min: 0, max: 42 },
  viscosity: { min: 0, max: 150 },
  surfaceTension: { min: 0, max: 40 },
  thermalConductivity: { min: 0, max: 160 },
  specificHeat: { min: 0, max: 180 },
};

const SEAWATER: CatalogueFluid = {
  id: 'seawater',
  name: 'Seawater (absolute salinity 35 g/kg unless given)',
  role: 'working-fluid',
  description:
    'Standard seawater at atmospheric pressure; absolute salinity in g/kg (default 35, request field ' +
    '`salinity`). Density from EOS-80 (Millero & Poisson 1981), transport properties, specific heat and ' +
    'surface tension from the correlations reviewed by Sharqawy, Lienhard & Zubair (2010). The freezing ' +
    'point follows the salinity; the boiling limit is that of pure water (salt raises it by about 0.5 K).',
  freezingPoint: seawaterFreezingPoint(DEFAULT_SEAWATER_SALINITY),
  boilingPoint: WATER_NORMAL_BOILING_POINT,
  referenceTemperature: 293.15,
  properties: seawaterRecords(DEFAULT_SEAWATER_SALINITY),
};

/** Every built-in fluid. */
export const FLUIDS: readonly CatalogueFluid[] = Object.freeze([
  WATER,
  SEAWATER,
  N_DECANE,
  N_DODECANE,
  N_HEXADECANE,
  ...SILICONE_OILS,
  PFPE_GENERIC,
  PERFLUORODECALIN,
  MINERAL_OIL_LIGHT,
  GALLIUM,
]);

const BY_ID = new Map(FLUIDS.map((fluid) => [fluid.id, fluid]));

/** Catalogue ids in catalogue order, the user catalogue's (src/materials/user-catalogue.ts) after the built-in ones. */
export function fluidIds(): string[] {
  return [...FLUIDS, ...userFluids()].map((fluid) => fluid.id);
}

/** The catalogue entry with this id (built-in, else the user catalogue's), or undefined. */
export function getFluid(id: string): CatalogueFluid | undefined {
  return BY_ID.get(id) ?? userFluid(id);
}

/** Whether an id is a built-in entry or one of the user catalogue's; undefined when it is neither. */
export function fluidOrigin(id: string): CatalogueOrigin | undefined {
  return BY_ID.has(id) ? 'built-in' : userFluid(id) === undefined ? undefined : 'user';
}

/**
 * One property of one fluid as listed by `GET /v1/fluids`: the catalogue's
 * sourced-value shape, shared with the surfactant listing.
 */
export interface PropertyListing {
  /** Value at the fluid's reference temperature, SI. */
  value: number;
  unit: string;
  /** Key of the source in the listing's `references`. */
  source: string;
  validRange: { min: number; max: number };
  note?: string;
}

/** JSON-ready description of one catalogue fluid. */
export interface FluidListing {
  id: string;
  name: string;
  role: CatalogueFluid['role'];
  description: string;
  /** K, or null when the catalogue has no limit. */
  freezingPoint: number | null;
  /** K, or null when the catalogue has no limit. */
  boilingPoint: number | null;
  referenceTemperature: number;
  safety: string | null;
  /** built-in, or user: from the lab's catalogue file, not reviewed with the built-in catalogue. */
  origin: CatalogueOrigin;
  properties: Partial<Record<FluidPropertyName, PropertyListing>>;
}

/** Every catalogue source, so that a key named in a description or safety note can be listed with its citation. */
const CITABLE: readonly Reference[] = [
  ...Object.values(MATERIAL_REFERENCES).filter(
    (value): value is Reference => typeof value === 'object' && value !== null && 'key' in value && 'citation' in value,
  ),
  REFERENCES.fowkes1964,
];

/**
 * JSON-ready catalogue for `GET /v1/fluids`: every fluid, and the references it cites — those of its values
 * and those whose keys its description or safety note names (a flash point's source, for instance).
 */
export function catalogueListing(): { fluids: FluidListing[]; references: Reference[] } {
  const references = new Map<string, Reference>();
  const fluids = [...FLUIDS, ...userFluids()].map((fluid): FluidListing => {
    const text = `${fluid.description} ${fluid.safety ?? ''}`;
    for (const reference of CITABLE) {
      if (text.includes(reference.key)) references.set(reference.key, reference);
    }
    const properties: Partial<Record<FluidPropertyName, PropertyListing>> = {};
    for (const [name, record] of Object.entries(fluid.properties) as [FluidPropertyName, PropertyRecord][]) {
      references.set(record.source.key, record.source);
      properties[name] = {
        value: record.at(fluid.referenceTemperature),
        unit: PROPERTY_UNITS[name],
        source: record.source.key,
        validRange: { min: record.validRange.min, max: record.validRange.max },
        ...(record.note === undefined ? {} : { note: record.note }),
      };
    }
    return {
      id: fluid.id,
      name: fluid.name,
      role: fluid.role,
      description: fluid.description,
      freezingPoint: fluid.freezingPoint ?? null,
      boilingPoint: fluid.boilingPoint ?? null,
      referenceTemperature: fluid.referenceTemperature,
      safety: fluid.safety ?? null,
      origin: BY_ID.has(fluid.id) ? 'built-in' : 'user',
      properties,
    };
  });
  return { fluids, references: [...references.values()] };
}

/** References every seawater evaluation also rests on (salinity scale). */
export const SEAWATER_EXTRA_REFERENCES: readonly Reference[] = [TEOS10_SALINITY];
