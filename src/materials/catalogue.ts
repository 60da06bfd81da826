/**
 * The built-in fluid catalogue. Every property names its source; a value that
 * was recalled and could not be confirmed against that source during writing
 * carries `note: 'from memory …'`. Temperatures are kelvin, values SI.
 */
import { REFERENCES, type Reference } from '../core/references.js';
import { alkaneMolarMass, dipprDensity105, dipprPolynomial100, dipprViscosity101 } from './dippr.js';
import {
  IAPWS_CONDUCTIVITY_2011,
  IAPWS_SR6_08,
  IAPWS_SURFACE_TENSION_2014,
  IAPWS_VISCOSITY_2008,
  JASPER_1972,
  MINERAL_OIL_DATA,
  PDMS_FLUID_DATA,
  PERFLUORODECALIN_DATA,
  PERRY_CONDUCTIVITY,
  PERRY_DENSITY,
  PERRY_HEAT_CAPACITY,
  PERRY_VISCOSITY,
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
import type { CatalogueFluid, PropertyRecord } from './types.js';
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

// ---------------------------------------------------------------------------------------------
// n-alkanes
// ---------------------------------------------------------------------------------------------

interface AlkaneData {
  id: string;
  name: string;
  formula: string;
  carbonAtoms: number;
  meltingPoint: number;
  boilingPoint: number;
  /** Perry's Table 2-32, DIPPR Eq. 105: C1 (mol/m³), C2, C3 (K), C4; range min..max K. */
  density: readonly [number, number, number, number];
  densityRange: Range;
  /** Perry's Table 2-313, DIPPR Eq. 101: C1..C5; range min..max K. */
  viscosity: readonly [number, number, number, number, number];
  viscosityRange: Range;
  /** Perry's Table 2-315, DIPPR Eq. 100 (W/(m·K)); range min..max K. */
  thermalConductivity: readonly number[];
  thermalConductivityRange: Range;
  /** Perry's Table 2-153, DIPPR Eq. 100 (J/(kmol·K)); range min..max K. */
  specificHeat: readonly number[];
  specificHeatRange: Range;
  /** Jasper (1972) γ = a − b t, t in °C: a in mN/m, b in mN/(m·K). */
  jasper: readonly [number, number];
  /** N/m at 25 °C */
  interfacialTensionWater25: number;
  flashPointCelsius: number;
}

const PERRY_NOTE =
  'DIPPR coefficients of the Perry table, taken from a public transcription of the table (not re-checked ' +
  'against the printed page); worked values agree with CRC Handbook data to within 2 %.';
const JASPER_NOTE =
  "Coefficients a, b of γ = a − b·t (t in °C) as reproduced in Lange's Handbook of Chemistry; the " +
  'linear form holds over the measured range, so far from room temperature it is an extrapolation.';

function alkane(data: AlkaneData): CatalogueFluid {
  const freezing = data.meltingPoint;
  const molarMass = alkaneMolarMass(data.carbonAtoms);
  const [a, b] = data.jasper;
  const tension = linearInCelsius(a * 1e-3, b * 1e-3, { min: freezing, max: data.boilingPoint }, JASPER_1972, JASPER_NOTE);
  return {
    id: data.id,
    name: data.name,
    role: 'lubricant',
    description:
      `${data.name} (${data.formula}), a model hydrocarbon lubricant. Density, viscosity, thermal ` +
      "conductivity and specific heat from the DIPPR correlations in Perry's Handbook (8th ed.), surface " +
      'tension linear in temperature after Jasper (1972), interfacial tension against water at 25 °C.',
    freezingPoint: freezing,
    boilingPoint: data.boilingPoint,
    referenceTemperature: 298.15,
    safety:
      `Flammable liquid (flash point about ${data.flashPointCelsius} °C, from memory); aspiration hazard. ` +
      "Consult the supplier's safety data sheet.",
    properties: {
      density: {
        at: dipprDensity105(...data.density, molarMass),
        validRange: data.densityRange,
        source: PERRY_DENSITY,
        note: PERRY_NOTE,
      },
      viscosity: {
        at: dipprViscosity101(...data.viscosity),
        validRange: data.viscosityRange,
        source: PERRY_VISCOSITY,
        note: PERRY_NOTE,
      },
      surfaceTension: tension,
      surfaceTensionDispersive: {
        ...tension,
        source: REFERENCES.fowkes1964,
        note: 'Equal to the total surface tension for saturated hydrocarbons (Fowkes 1964); values from Jasper (1972).',
      },
      interfacialTensionWater: constant(
        data.interfacialTensionWater25,
        around(25, 10, freezing),
        ZEPPIERI_2001,
        `at 25 °C; ${FROM_MEMORY}`,
      ),
      thermalConductivity: {
        at: dipprPolynomial100(data.thermalConductivity),
        validRange: data.thermalConductivityRange,
        source: PERRY_CONDUCTIVITY,
        note: PERRY_NOTE,
      },
      specificHeat: {
        at: dipprPolynomial100(data.specificHeat, 1 / (molarMass * 1000)),
        validRange: data.specificHeatRange,
        source: PERRY_HEAT_CAPACITY,
        note: PERRY_NOTE,
      },
    },
  };
}

// Melting and normal boiling points: CRC Handbook (from memory; they agree with the DIPPR triple points
// of the Perry tables to 0.1 K).
const N_DECANE = alkane({
  id: 'n-decane',
  name: 'n-Decane',
  formula: 'C10H22',
  carbonAtoms: 10,
  meltingPoint: 243.5,
  boilingPoint: 447.3,
  density: [410.84, 0.25175, 617.7, 0.28571],
  densityRange: { min: 243.51, max: 447.3 },
  viscosity: [-9.6489, 1181.1, -0.24367, 9.0522e34, -15],
  viscosityRange: { min: 243.51, max: 447.3 },
  thermalConductivity: [0.2063, -0.00025],
  thermalConductivityRange: { min: 243.51, max: 447.3 },
  specificHeat: [278620, -197.91, 1.0737],
  specificHeatRange: { min: 243.51, max: 447.3 },
  jasper: [25.67, 0.092],
  interfacialTensionWater25: 52.0e-3,
  flashPointCelsius: 46,
});

const N_DODECANE = alkane({
  id: 'n-dodecane',
  name: 'n-Dodecane',
  formula: 'C12H26',
  carbonAtoms: 12,
  meltingPoint: 263.6,
  boilingPoint: 489.5,
  density: [332.67, 0.24664, 658, 0.28571],
  densityRange: { min: 263.57, max: 489.5 },
  viscosity: [-7.8244, 1191.9, -0.49963, 3.9572e23, -10],
  viscosityRange: { min: 263.57, max: 489.5 },
  thermalConductivity: [0.2047, -0.0002326],
  thermalConductivityRange: { min: 263.57, max: 489.47 },
  specificHeat: [508210, -1368.7, 3.1015],
  // The Perry heat-capacity fit for dodecane only spans 263.57–330 K.
  specificHeatRange: { min: 263.57, max: 330 },
  jasper: [27.12, 0.0884],
  interfacialTensionWater25: 52.8e-3,
  flashPointCelsius: 71,
});

const N_HEXADECANE = alkane({
  id: 'n-hexadecane',
  name: 'n-Hexadecane',
  formula: 'C16H34',
  carbonAtoms: 16,
  meltingPoint: 291.3,
  boilingPoint: 560.0,
  density: [232.89, 0.23659, 723, 0.28571],
  densityRange: { min: 291.31, max: 560.0 },
  viscosity: [-20.182, 2203.5, 1.2289, 0, 0],
  viscosityRange: { min: 291.31, max: 560.0 },
  thermalConductivity: [0.20749, -0.00021917],
  thermalConductivityRange: { min: 291.31, max: 560.0 },
  specificHeat: [370350, 231.47, 0.68632],
  specificHeatRange: { min: 291.31, max: 560.0 },
  jasper: [29.18, 0.0854],
  interfacialTensionWater25: 53.3e-3,
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
    surfaceTensionDispersive: constant(
      17e-3,
      around(20, 5),
      PFPE_FLUID_DATA,
      `taken equal to the total surface tension (apolar fluorinated oil); ${FROM_MEMORY}`,
    ),
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
    surfaceTensionDispersive: constant(
      17.6e-3,
      around(25, 5),
      PERFLUORODECALIN_DATA,
      `taken equal to the total surface tension (apolar perfluorocarbon); ${FROM_MEMORY}`,
    ),
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
      REFERENCES.fowkes1964,
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
