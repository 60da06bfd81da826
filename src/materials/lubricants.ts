/**
 * Lubricants other than the n-alkanes and silicone oils: fluorinated oils,
 * light mineral oil, and liquid gallium, the catalogue's conductive
 * lubricant for heat transfer.
 */
import { REFERENCES } from '../core/references.js';
import {
  ASSAEL_2012,
  ASSAEL_2017,
  CRC_INORGANIC_CONSTANTS,
  CRC_MOLTEN_DENSITY,
  CRC_ORGANIC_CONSTANTS,
  GALLIUM_OXIDE_SKIN,
  JANAF_1998,
  MINERAL_OIL_DATA,
  PACANSKY_WALTMAN_1997,
  PERFLUORODECALIN_DATA,
  PFPE_FLUID_DATA,
  USP_LIGHT_MINERAL_OIL,
} from './references.js';
import { CELSIUS_ZERO, FROM_MEMORY, around, constant, fromFunction, tabulated } from './records.js';
import type { CatalogueFluid } from './types.js';

// ---------------------------------------------------------------------------------------------
// Fluorinated lubricants and mineral oil (single values near room temperature)
// ---------------------------------------------------------------------------------------------

/** Recalled surface tensions, each used for the total and (apolar liquids) for its dispersive part. */
const PFPE_SURFACE_TENSION = constant(17e-3, around(20, 5), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`);
const PERFLUORODECALIN_SURFACE_TENSION = constant(17.6e-3, around(25, 5), PERFLUORODECALIN_DATA, `at 25 °C; ${FROM_MEMORY}`);
const MINERAL_OIL_SURFACE_TENSION = constant(30e-3, around(25, 5), MINERAL_OIL_DATA, `typical value; ${FROM_MEMORY}`);

/**
 * Note of the dispersive part of a fluorinated oil's surface tension. Taking it equal to the total for an apolar
 * fluorinated liquid is common practice, no source. The number is the entry's total surface tension, whose own
 * note marks it as recalled; it is tagged there once rather than twice.
 */
const DISPERSIVE_EQUALS_TOTAL_FLUORINATED =
  'taken equal to the total surface tension, an apolar fluorinated liquid (common practice, no source); the number ' +
  'is the total above, whose note marks it as recalled';

export const PFPE_GENERIC: CatalogueFluid = {
  id: 'pfpe-generic',
  name: 'Perfluoropolyether oil, about 80 cSt at 20 °C (poly(hexafluoropropylene oxide))',
  role: 'lubricant',
  description:
    'A generic poly(hexafluoropropylene oxide) perfluoropolyether oil of about 80 mm²/s at 20 °C, the class ' +
    'used in the first slippery liquid-infused porous surfaces. Single values near room temperature, ' +
    "typical of suppliers' product information and recalled: no handbook or peer-reviewed table of this " +
    'class could be read (searched: liquid-infused-surface papers that tabulate their lubricants, e.g. Smith ' +
    'et al. 2013 Soft Matter 9, 1772, and Sett et al. 2017 ACS Appl. Mater. Interfaces, whose lubricant tables ' +
    'were not reachable; J. Chem. Eng. Data perfluoropolyether measurements and the NIST TRC ThermoML records of ' +
    'that journal, none found); measure and override.',
  // Pour point and upper limit of requests (taken as the decomposition onset on clean surfaces): recalled with the
  // rest of this entry (from memory); the upper limit is a cap on requests, not a safe working temperature.
  freezingPoint: CELSIUS_ZERO - 36,
  boilingPoint: CELSIUS_ZERO + 300,
  referenceTemperature: 293.15,
  safety:
    'Chemically inert and non-flammable, but hot perfluorinated ethers decompose to toxic gases, carbonyl ' +
    'fluoride among them, and Lewis-acidic surfaces such as aluminium fluoride catalyse the decomposition ' +
    `(${PACANSKY_WALTMAN_1997.key}); carbonyl fluoride hydrolyses to hydrogen fluoride in moist air (common ` +
    'practice, no source). On oxide or metal surfaces decomposition starts at lower temperatures than on clean ' +
    'inert ones: do not heat it in the open or smoke near it. Consult the supplier\'s SDS.',
  properties: {
    density: constant(1910, around(20, 5), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
    viscosity: constant(1910 * 82e-6, around(20, 3), PFPE_FLUID_DATA, `82 cSt at 20 °C × density; ${FROM_MEMORY}`),
    surfaceTension: PFPE_SURFACE_TENSION,
    surfaceTensionDispersive: { ...PFPE_SURFACE_TENSION, note: DISPERSIVE_EQUALS_TOTAL_FLUORINATED },
    interfacialTensionWater: constant(49e-3, around(20, 5), PFPE_FLUID_DATA, FROM_MEMORY),
    thermalConductivity: constant(0.087, around(20, 10), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
    specificHeat: constant(1000, around(20, 10), PFPE_FLUID_DATA, `typical value; ${FROM_MEMORY}`),
  },
};

export const PERFLUORODECALIN: CatalogueFluid = {
  id: 'perfluorodecalin',
  name: 'Perfluorodecalin',
  role: 'lubricant',
  description:
    'Perfluorodecalin (C10F18, cis/trans mixture), a volatile low-viscosity perfluorocarbon lubricant. ' +
    'Single values near 25 °C. It evaporates noticeably at room temperature, so films thin over time. Melting ' +
    `and boiling points and density from the CRC Handbook (${CRC_ORGANIC_CONSTANTS.key}). Viscosity and surface ` +
    'tension are recalled: the measurements found could be identified but their tables not read (searched ' +
    'again: "Surface tension of liquid fluorocompounds", J. Chem. Eng. Data 51 (2006) 1820, 283–327 K, ' +
    'abstract only; Liquids 3 (2023) 48, density and viscosity, abstract only; no NIST TRC ThermoML ' +
    'record of either was found).',
  freezingPoint: 264.95,
  boilingPoint: 416.15,
  referenceTemperature: 298.15,
  safety:
    'Non-flammable and of low toxicity; vapour is heavier than air. Thermal decomposition releases hydrogen ' +
    "fluoride (common practice, no source). Consult the supplier's safety data sheet.",
  properties: {
    density: constant(
      1930.525,
      around(25, 5),
      CRC_ORGANIC_CONSTANTS,
      'the CRC Handbook density; the transcription read drops the temperature of the entry (20 or 25 °C), so the ' +
        'range around 25 °C is ours',
    ),
    viscosity: constant(5.1e-3, around(25, 3), PERFLUORODECALIN_DATA, `at 25 °C; ${FROM_MEMORY}`),
    surfaceTension: PERFLUORODECALIN_SURFACE_TENSION,
    surfaceTensionDispersive: { ...PERFLUORODECALIN_SURFACE_TENSION, note: DISPERSIVE_EQUALS_TOTAL_FLUORINATED },
  },
};

export const MINERAL_OIL_LIGHT: CatalogueFluid = {
  id: 'mineral-oil-light',
  name: 'Light mineral oil (white oil)',
  role: 'lubricant',
  description:
    'Light white mineral oil (a mixture of saturated hydrocarbons). Properties vary between suppliers and ' +
    'lots by tens of per cent in viscosity: measure and override where it matters. Single values at 25 °C, ' +
    'recalled: as a mixture it has no handbook entry, and no peer-reviewed table of a light grade was found. ' +
    `The pharmacopoeial grade (${USP_LIGHT_MINERAL_OIL.key}) only bounds it: specific gravity 0.818–0.880, ` +
    'kinematic viscosity 3.0–34.4 mm²/s at 40 °C, a factor of ten (searched again for a measured light grade: ' +
    'only suppliers\' and popular pages).',
  referenceTemperature: 298.15,
  safety: "Combustible; aspiration hazard if swallowed. Consult the supplier's safety data sheet.",
  properties: {
    density: constant(
      838,
      around(25, 5),
      MINERAL_OIL_DATA,
      `at 25 °C; ${FROM_MEMORY}; inside the pharmacopoeial specific-gravity range 0.818–0.880 (${USP_LIGHT_MINERAL_OIL.key})`,
    ),
    viscosity: constant(838 * 30e-6, around(25, 3), MINERAL_OIL_DATA, `≈ 30 cSt at 25 °C × density; ${FROM_MEMORY}`),
    surfaceTension: MINERAL_OIL_SURFACE_TENSION,
    surfaceTensionDispersive: {
      ...MINERAL_OIL_SURFACE_TENSION,
      source: REFERENCES.fowkes1964,
      note:
        'equal to the total for saturated hydrocarbons (Fowkes 1964); the number is the total surface tension above, ' +
        'whose note marks it as recalled',
    },
  },
};

// ---------------------------------------------------------------------------------------------
// Liquid gallium: the conductive lubricant
// ---------------------------------------------------------------------------------------------

/** Melting point of gallium, K (CRC Handbook, crc2014-inorganic-constants; the gallium fixed point of ITS-90). */
export const GALLIUM_MELTING_POINT = 302.9146;
/** Normal boiling point of gallium, K (CRC Handbook). */
const GALLIUM_BOILING_POINT = 2502.15;
/** Standard atomic weight of gallium, kg/mol (IUPAC/CIAAW, 69.723 g/mol). */
const GALLIUM_MOLAR_MASS = 0.069723;
/**
 * Liquid density, kg/m³, by the reference correlation of Assael et al. (2012),
 * ρ = c₀ − c₁ (T − T_m), T_m = 302.914 K, 303–1500 K; uncertainty 0.4 % (95 % confidence).
 */
const GALLIUM_DENSITY = { atMelting: 6077, slope: 0.611, meltingPoint: 302.914, range: { min: 303, max: 1500 } } as const;
/** Solid density at 25 °C, kg/m³ (CRC physical constants): gallium expands on freezing. */
export const GALLIUM_SOLID_DENSITY = 5910;

/**
 * Viscosity of liquid gallium, Pa·s, by the reference correlation of Assael et al. (2012), Eq. 2 and
 * Table 5:
 * log₁₀(η / mPa·s) = −a₁ + a₂/T with a₁ = 0.4465, a₂ = 204.03 K, 304–800 K; uncertainty 13.5 %
 * (95 % confidence). 1.643 mPa·s at 35 °C, 1.260 mPa·s at 100 °C.
 */
function galliumViscosity(temperature: number): number {
  return 1e-3 * 10 ** (-0.4465 + 204.03 / temperature);
}

/**
 * Thermal conductivity of liquid gallium, W/(m·K), by the reference correlation of Assael et al.
 * (2017): λ = 28.403 + 0.071896 (T − 302.914 K), 303–850 K; uncertainty 15.9 % (95 % confidence).
 * 28.42 W/(m·K) at 30 °C.
 */
function galliumThermalConductivity(temperature: number): number {
  return 28.403 + 0.071896 * (temperature - 302.914);
}

/** NIST-JANAF liquid-gallium heat capacity, (K, J/(mol·K)), 302.92–600 K. */
const GALLIUM_HEAT_CAPACITY_TABLE: readonly (readonly [number, number])[] = [
  [302.92, 28.493],
  [350, 27.719],
  [400, 27.154],
  [450, 26.961],
  [500, 26.819],
  [600, 26.694],
];
const galliumMolarHeatCapacity = tabulated(GALLIUM_HEAT_CAPACITY_TABLE);

export const GALLIUM: CatalogueFluid = {
  id: 'gallium',
  name: 'Gallium (liquid metal)',
  role: 'lubricant',
  description:
    'Liquid gallium, the conductive lubricant for heat transfer: its thermal conductivity, about 28 W/(m·K) near ' +
    '30 °C, is some 200 times that of the oils in this catalogue, so gallium-filled grooves in a polymer or ' +
    'ceramic texture conduct heat better than the texture itself (common practice, no source) and give a ' +
    'negative thermal slip length. It does not mix with ' +
    'water, has a very low vapour pressure and stays liquid from 29.76 °C up, so it suits warm surfaces such ' +
    'as heat-exchanger plates; below its melting point a request is refused (it supercools readily, but that ' +
    'is not relied on). No surface or interfacial tension is listed: in air or neutral water an oxide skin ' +
    `forms whose surface stress mimics surface tension (${GALLIUM_OXIDE_SKIN.key}); give values measured ` +
    `under the conditions of use. Melting and boiling points from the CRC Handbook (${CRC_INORGANIC_CONSTANTS.key}); ` +
    'density and viscosity from the reference correlations of Assael et al. ' +
    '(2012), thermal conductivity from those of Assael et al. (2017), heat capacity from NIST-JANAF. A ' +
    'gallium–indium eutectic (liquid from about 15.5 °C) would serve cooler surfaces, but no readable source ' +
    'for its density, viscosity and conductivity was found, so it is not listed: give its values explicitly.',
  freezingPoint: GALLIUM_MELTING_POINT,
  boilingPoint: GALLIUM_BOILING_POINT,
  referenceTemperature: 313.15,
  safety:
    'Not flammable; low toxicity, but avoid skin contact and ingestion. Liquid gallium attacks aluminium and ' +
    'its alloys (liquid-metal embrittlement) and alloys with many other metals: keep it away from aluminium ' +
    'parts and heat exchangers (common practice, no source). It expands by about 3 % on freezing (CRC ' +
    'densities 5910 kg/m³ solid, 6080 kg/m³ liquid), which can burst a rigid container; it wets glass and ' +
    "many oxides through its oxide skin and stains. Consult the supplier's safety data sheet.",
  properties: {
    density: fromFunction(
      (t) => GALLIUM_DENSITY.atMelting - GALLIUM_DENSITY.slope * (t - GALLIUM_DENSITY.meltingPoint),
      GALLIUM_DENSITY.range,
      ASSAEL_2012,
      'ρ = 6077 − 0.611 (T − 302.914 K) kg/m³, the reference correlation (uncertainty 0.4 %); the CRC ' +
        `molten-element line (${CRC_MOLTEN_DENSITY.key}) agrees within 0.1 % (see the tests)`,
    ),
    viscosity: fromFunction(
      galliumViscosity,
      { min: 304, max: 800 },
      ASSAEL_2012,
      'log₁₀(η/mPa·s) = −0.4465 + 204.03 K/T, the reference correlation (uncertainty 13.5 %)',
    ),
    thermalConductivity: fromFunction(
      galliumThermalConductivity,
      { min: 303, max: 850 },
      ASSAEL_2017,
      'λ = 28.403 + 0.071896 (T − 302.914 K) W/(m·K), the reference correlation (uncertainty 15.9 %); the ' +
        'Wiedemann–Franz law applied to the electrical conductivity agrees within 5 % at 30 °C (see the tests)',
    ),
    specificHeat: fromFunction(
      (t) => galliumMolarHeatCapacity(t) / GALLIUM_MOLAR_MASS,
      { min: 302.92, max: 600 },
      JANAF_1998,
      'molar heat capacity of the JANAF table, interpolated linearly, divided by the atomic weight 69.723 g/mol',
    ),
  },
};
