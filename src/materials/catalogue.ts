/**
 * The built-in fluid catalogue. Every property names its source; a value that
 * was recalled and could not be confirmed against that source during writing
 * carries `note: 'from memory …'`. Temperatures are kelvin, values SI.
 */
import type { Reference } from '../physics/common.js';
import {
  CRC_HANDBOOK,
  FOWKES_1964,
  IAPWS_CONDUCTIVITY_2011,
  IAPWS_SR6_08,
  IAPWS_SURFACE_TENSION_2014,
  IAPWS_VISCOSITY_2008,
  JASPER_1972,
  MINERAL_OIL_DATA,
  PDMS_FLUID_DATA,
  PERFLUORODECALIN_DATA,
  PFPE_FLUID_DATA,
  SHARQAWY_2010,
  TEOS10_SALINITY,
  UNESCO_EOS80,
  ZEPPIERI_2001,
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
import type { CatalogueFluid, FluidPropertyName, PropertyRecord } from './types.js';
import { PROPERTY_UNITS } from './types.js';
import {
  WATER_SURFACE_TENSION_DISPERSIVE,
  waterDensity,
  waterSpecificHeat,
  waterSurfaceTension,
  waterThermalConductivity,
  waterViscosity,
} from './water.js';

const CELSIUS_ZERO = 273.15;
const FROM_MEMORY = 'from memory: recalled, not confirmed against the source while writing';

type Range = { min: number; max: number };

/** A property that the source gives at one temperature only. */
function constant(value: number, validRange: Range, source: Reference, note?: string): PropertyRecord {
  return { at: () => value, validRange, source, ...(note === undefined ? {} : { note }) };
}

/** Celsius-linear property y = a − b t (the form Jasper 1972 tabulates for surface tensions). */
function linearInCelsius(
  intercept: number,
  slope: number,
  validRange: Range,
  source: Reference,
  note?: string,
): PropertyRecord {
  return {
    at: (temperature) => intercept - slope * (temperature - CELSIUS_ZERO),
    validRange,
    source,
    ...(note === undefined ? {} : { note }),
  };
}

function around(celsius: number, halfWidth: number, floor?: number): Range {
  const min = CELSIUS_ZERO + celsius - halfWidth;
  return { min: floor === undefined ? min : Math.max(min, floor), max: CELSIUS_ZERO + celsius + halfWidth };
}

// ---------------------------------------------------------------------------------------------
// Water and seawater
// ---------------------------------------------------------------------------------------------

/** Normal boiling point of water at 101.325 kPa on ITS-90, K (IAPWS-95; from memory). */
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
    surfaceTensionDispersive: constant(WATER_SURFACE_TENSION_DISPERSIVE, around(20, 5), FOWKES_1964, 'at 20 °C only'),
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

// ---------------------------------------------------------------------------------------------
// n-alkanes
// ---------------------------------------------------------------------------------------------

interface AlkaneData {
  id: string;
  name: string;
  formula: string;
  meltingPoint: number;
  boilingPoint: number;
  /** kg/m³ at 20 °C */
  density20: number;
  /** Pa·s at 25 °C */
  viscosity25: number;
  /** Jasper γ = a − b t: a in N/m, b in N/(m·K) */
  tensionIntercept: number;
  tensionSlope: number;
  /** N/m at 25 °C */
  interfacialTensionWater25: number;
  /** W/(m·K) at 25 °C */
  thermalConductivity25: number;
  /** J/(kg·K) at 25 °C */
  specificHeat25: number;
  flashPointCelsius: number;
}

function alkane(data: AlkaneData): CatalogueFluid {
  const freezing = data.meltingPoint;
  return {
    id: data.id,
    name: data.name,
    role: 'lubricant',
    description:
      `${data.name} (${data.formula}), a model hydrocarbon lubricant. Surface tension varies linearly with ` +
      'temperature after Jasper (1972); the other properties are single values near room temperature ' +
      '(narrow valid range; outside it the value is returned with a warning).',
    freezingPoint: freezing,
    boilingPoint: data.boilingPoint,
    referenceTemperature: Math.max(298.15, Math.ceil(freezing + 5)),
    safety:
      `Flammable liquid (flash point about ${data.flashPointCelsius} °C, from memory); aspiration hazard. ` +
      "Consult the supplier's safety data sheet.",
    properties: {
      density: constant(data.density20, around(20, 10, freezing), CRC_HANDBOOK, `at 20 °C; ${FROM_MEMORY}`),
      viscosity: constant(data.viscosity25, around(25, 5, freezing), CRC_HANDBOOK, `at 25 °C; ${FROM_MEMORY}`),
      surfaceTension: linearInCelsius(
        data.tensionIntercept,
        data.tensionSlope,
        { min: freezing, max: CELSIUS_ZERO + 100 },
        JASPER_1972,
        FROM_MEMORY,
      ),
      surfaceTensionDispersive: linearInCelsius(
        data.tensionIntercept,
        data.tensionSlope,
        { min: freezing, max: CELSIUS_ZERO + 100 },
        FOWKES_1964,
        'Equal to the total surface tension for saturated hydrocarbons (Fowkes 1964); values from Jasper (1972).',
      ),
      interfacialTensionWater: constant(
        data.interfacialTensionWater25,
        around(25, 10, freezing),
        ZEPPIERI_2001,
        `at 25 °C; ${FROM_MEMORY}`,
      ),
      thermalConductivity: constant(
        data.thermalConductivity25,
        around(25, 10, freezing),
        CRC_HANDBOOK,
        `at 25 °C; ${FROM_MEMORY}`,
      ),
      specificHeat: constant(data.specificHeat25, around(25, 10, freezing), CRC_HANDBOOK, `at 25 °C; ${FROM_MEMORY}`),
    },
  };
}

const N_DECANE = alkane({
  id: 'n-decane',
  name: 'n-Decane',
  formula: 'C10H22',
  meltingPoint: 243.5,
  boilingPoint: 447.3,
  density20: 730.0,
  viscosity25: 0.838e-3,
  tensionIntercept: 25.67e-3,
  tensionSlope: 0.09197e-3,
  interfacialTensionWater25: 52.0e-3,
  thermalConductivity25: 0.131,
  specificHeat25: 2210,
  flashPointCelsius: 46,
});

const N_DODECANE = alkane({
  id: 'n-dodecane',
  name: 'n-Dodecane',
  formula: 'C12H26',
  meltingPoint: 263.6,
  boilingPoint: 489.5,
  density20: 749.5,
  viscosity25: 1.383e-3,
  tensionIntercept: 27.12e-3,
  tensionSlope: 0.08843e-3,
  interfacialTensionWater25: 52.8e-3,
  thermalConductivity25: 0.140,
  specificHeat25: 2210,
  flashPointCelsius: 71,
});

const N_HEXADECANE = alkane({
  id: 'n-hexadecane',
  name: 'n-Hexadecane',
  formula: 'C16H34',
  meltingPoint: 291.3,
  boilingPoint: 560.0,
  density20: 773.3,
  viscosity25: 3.032e-3,
  tensionIntercept: 29.22e-3,
  tensionSlope: 0.0868e-3,
  interfacialTensionWater25: 53.3e-3,
  thermalConductivity25: 0.140,
  specificHeat25: 2210,
  flashPointCelsius: 135,
});

// ---------------------------------------------------------------------------------------------
// Silicone oils (linear PDMS) by nominal viscosity grade
// ---------------------------------------------------------------------------------------------

interface SiliconeGrade {
  /** Nominal kinematic viscosity at 25 °C, cSt (mm²/s). */
  grade: number;
  /** kg/m³ at 25 °C */
  density: number;
  /** N/m at 25 °C */
  surfaceTension: number;
  /** W/(m·K) at 25 °C */
  thermalConductivity: number;
  /** Pour point, °C */
  pourPointCelsius: number;
  flashPointCelsius: number;
}

const SILICONE_GRADES: SiliconeGrade[] = [
  { grade: 5, density: 913, surfaceTension: 19.7e-3, thermalConductivity: 0.117, pourPointCelsius: -65, flashPointCelsius: 135 },
  { grade: 10, density: 935, surfaceTension: 20.1e-3, thermalConductivity: 0.134, pourPointCelsius: -65, flashPointCelsius: 163 },
  { grade: 20, density: 950, surfaceTension: 20.6e-3, thermalConductivity: 0.142, pourPointCelsius: -60, flashPointCelsius: 232 },
  { grade: 50, density: 960, surfaceTension: 20.8e-3, thermalConductivity: 0.151, pourPointCelsius: -55, flashPointCelsius: 280 },
  { grade: 100, density: 965, surfaceTension: 20.9e-3, thermalConductivity: 0.155, pourPointCelsius: -55, flashPointCelsius: 300 },
  { grade: 1000, density: 970, surfaceTension: 21.2e-3, thermalConductivity: 0.159, pourPointCelsius: -50, flashPointCelsius: 300 },
];

function siliconeOil(data: SiliconeGrade): CatalogueFluid {
  const range = around(25, 3);
  const kinematic = data.grade * 1e-6;
  return {
    id: `silicone-oil-${data.grade}cst`,
    name: `Silicone oil ${data.grade} cSt (polydimethylsiloxane)`,
    role: 'lubricant',
    description:
      `Linear trimethylsiloxy-terminated polydimethylsiloxane, nominal kinematic viscosity ${data.grade} mm²/s ` +
      'at 25 °C; dynamic viscosity = grade × density. Values at 25 °C only (narrow valid range). No ' +
      'interfacial tension against water is listed: published PDMS/water values scatter and none is ' +
      'accepted as definitive (Owen, Silicone surface fundamentals); use the Fowkes estimate or give a measured value.',
    freezingPoint: CELSIUS_ZERO + data.pourPointCelsius,
    referenceTemperature: 298.15,
    safety:
      `Low toxicity; combustible (flash point about ${data.flashPointCelsius} °C, from memory). Spills are very ` +
      "slippery. Consult the supplier's safety data sheet.",
    properties: {
      density: constant(data.density, range, PDMS_FLUID_DATA, `typical value for the grade; ${FROM_MEMORY}`),
      viscosity: constant(
        kinematic * data.density,
        range,
        PDMS_FLUID_DATA,
        'nominal grade × typical density; grades are specified to a few per cent. PDMS viscosity falls with temperature, so the value holds near 25 °C only.',
      ),
      surfaceTension: constant(data.surfaceTension, range, PDMS_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
      surfaceTensionDispersive: constant(
        data.surfaceTension,
        range,
        PDMS_FLUID_DATA,
        `taken equal to the total surface tension (PDMS treated as apolar); ${FROM_MEMORY}`,
      ),
      thermalConductivity: constant(data.thermalConductivity, range, PDMS_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
    },
  };
}

// ---------------------------------------------------------------------------------------------
// Fluorinated lubricants and mineral oil
// ---------------------------------------------------------------------------------------------

const PFPE_GENERIC: CatalogueFluid = {
  id: 'pfpe-generic',
  name: 'Perfluoropolyether oil (generic, ≈ 80 cSt grade)',
  role: 'lubricant',
  description:
    'A generic perfluoropolyether lubricant with the typical properties of the ≈ 80 cSt (at 20 °C) grade of ' +
    'a common poly(hexafluoropropylene oxide) oil family, the class used in the first slippery ' +
    'liquid-infused porous surfaces. Single values near room temperature.',
  freezingPoint: CELSIUS_ZERO - 36,
  boilingPoint: CELSIUS_ZERO + 300,
  referenceTemperature: 293.15,
  safety:
    'Chemically inert and non-flammable, but above about 300 °C it decomposes to toxic fluorinated products ' +
    "(hydrogen fluoride, carbonyl fluoride); do not heat in the open or smoke near it. Consult the supplier's SDS.",
  properties: {
    density: constant(1910, around(20, 5), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
    viscosity: constant(1910 * 82e-6, around(20, 3), PFPE_FLUID_DATA, `82 cSt at 20 °C × density; ${FROM_MEMORY}`),
    surfaceTension: constant(17e-3, around(20, 5), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
    interfacialTensionWater: constant(49e-3, around(20, 5), PFPE_FLUID_DATA, FROM_MEMORY),
    thermalConductivity: constant(0.087, around(20, 10), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
    specificHeat: constant(1000, around(20, 10), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
  },
};

const PERFLUORODECALIN: CatalogueFluid = {
  id: 'perfluorodecalin',
  name: 'Perfluorodecalin',
  role: 'lubricant',
  description:
    'Perfluorodecalin (C10F18, cis/trans mixture), a volatile low-viscosity perfluorocarbon lubricant. ' +
    'Single values at 25 °C. It evaporates noticeably at room temperature, so films thin over time.',
  freezingPoint: CELSIUS_ZERO - 10,
  boilingPoint: CELSIUS_ZERO + 142,
  referenceTemperature: 298.15,
  safety:
    'Non-flammable and of low toxicity; vapour is heavier than air. Thermal decomposition releases hydrogen ' +
    "fluoride. Consult the supplier's safety data sheet.",
  properties: {
    density: constant(1917, around(25, 5), PERFLUORODECALIN_DATA, `at 25 °C; ${FROM_MEMORY}`),
    viscosity: constant(5.1e-3, around(25, 3), PERFLUORODECALIN_DATA, `at 25 °C; ${FROM_MEMORY}`),
    surfaceTension: constant(17.6e-3, around(25, 5), PERFLUORODECALIN_DATA, `at 25 °C; ${FROM_MEMORY}`),
  },
};

const MINERAL_OIL_LIGHT: CatalogueFluid = {
  id: 'mineral-oil-light',
  name: 'Light mineral oil (white oil)',
  role: 'lubricant',
  description:
    'Light white mineral oil (a mixture of saturated hydrocarbons). Properties vary between suppliers and ' +
    'lots by tens of per cent in viscosity: measure and override where it matters. Single values at 25 °C.',
  referenceTemperature: 298.15,
  safety:
    "Combustible; aspiration hazard if swallowed. Consult the supplier's safety data sheet.",
  properties: {
    density: constant(838, around(25, 5), MINERAL_OIL_DATA, `at 25 °C; ${FROM_MEMORY}`),
    viscosity: constant(838 * 30e-6, around(25, 3), MINERAL_OIL_DATA, `≈ 30 cSt at 25 °C × density; ${FROM_MEMORY}`),
    surfaceTension: constant(30e-3, around(25, 5), MINERAL_OIL_DATA, `typical value; ${FROM_MEMORY}`),
    surfaceTensionDispersive: constant(
      30e-3,
      around(25, 5),
      FOWKES_1964,
      `equal to the total for saturated hydrocarbons (Fowkes 1964); total ${FROM_MEMORY}`,
    ),
  },
};

/** Every built-in fluid. */
export const FLUIDS: readonly CatalogueFluid[] = Object.freeze([
  WATER,
  SEAWATER,
  N_DECANE,
  N_DODECANE,
  N_HEXADECANE,
  ...SILICONE_GRADES.map(siliconeOil),
  PFPE_GENERIC,
  PERFLUORODECALIN,
  MINERAL_OIL_LIGHT,
]);

const BY_ID = new Map(FLUIDS.map((fluid) => [fluid.id, fluid]));

/** Catalogue ids in catalogue order. */
export function fluidIds(): string[] {
  return FLUIDS.map((fluid) => fluid.id);
}

/** The catalogue entry with this id, or undefined. */
export function getFluid(id: string): CatalogueFluid | undefined {
  return BY_ID.get(id);
}

/** One property of one fluid as listed by `GET /v1/fluids`. */
export interface PropertyListing {
  /** Value at the fluid's reference temperature, SI. */
  value: number;
  unit: string;
  validRange: { min: number; max: number };
  source: { key: string; citation: string; doi?: string };
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
  properties: Partial<Record<FluidPropertyName, PropertyListing>>;
}

/** JSON-ready description of every catalogue fluid, for `GET /v1/fluids`. */
export function catalogueListing(): FluidListing[] {
  return FLUIDS.map((fluid) => {
    const properties: Partial<Record<FluidPropertyName, PropertyListing>> = {};
    for (const [name, record] of Object.entries(fluid.properties) as [FluidPropertyName, PropertyRecord][]) {
      const { key, citation, doi } = record.source;
      properties[name] = {
        value: record.at(fluid.referenceTemperature),
        unit: PROPERTY_UNITS[name],
        validRange: { min: record.validRange.min, max: record.validRange.max },
        source: doi === undefined ? { key, citation } : { key, citation, doi },
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
      properties,
    };
  });
}

/** References every seawater evaluation also rests on (salinity scale). */
export const SEAWATER_EXTRA_REFERENCES: readonly Reference[] = [TEOS10_SALINITY];
