/**
 * Linear polydimethylsiloxane (silicone oil) lubricants by nominal viscosity
 * grade (kinematic viscosity at 25 °C, mm²/s = cSt).
 *
 * Temperature dependence (our model, stated in every record's note): each
 * property is the grade's value at 25 °C times the relative temperature
 * dependence of the polydimethylsiloxane heat-transfer fluid that Melinder
 * (2010) tabulates from −80 to 100 °C:
 *   ρ_M(T) = 1172.35 − 0.9025·T                 kg/m³
 *   c_p,M(T) = 1223.69 + 1.48417·T               J/(kg·K)
 *   μ_M(T) = exp(6.36183 − 0.0636352·T + 7.51428e-5·T²)   Pa·s
 *   k_M(T) = 0.207526 − 2.84167e-4·T             W/(m·K)
 * (T in K; coefficients as transcribed in the CoolProp library). So
 * μ(T) = ν_grade·ρ₂₅·μ_M(T)/μ_M(298.15 K): a 25 °C value scaled by a
 * handbook relation. Melinder's fluid is a low grade (about 3 mm²/s); using
 * its relative temperature dependence for the heavier grades is an
 * assumption: its viscosity ratio μ(60 °C)/μ(25 °C) differs from that of the
 * handbook's second polydimethylsiloxane fluid by about 6 % (see the tests).
 * Surface tension follows the grade-independent fit of Darhuber et al.
 * (2003), 0–100 °C.
 */
import {
  DARHUBER_2003,
  MELINDER_2010,
  PDMS_FLUID_DATA,
  SERAT_2017,
} from './references.js';
import { CELSIUS_ZERO, FROM_MEMORY, fromFunction, linearInCelsius, type Range } from './records.js';
import type { CatalogueFluid } from './types.js';

const REFERENCE_TEMPERATURE = 298.15;

/** Melinder (2010) polydimethylsiloxane fluid no. 1: the published fits (T in K, SI values). */
export const MELINDER_PDMS = {
  density: (t: number) => 1172.35 - 0.9025 * t,
  specificHeat: (t: number) => 1223.69 + 1.48417 * t,
  viscosity: (t: number) => Math.exp(6.36183 - 0.0636352 * t + 7.51428e-5 * t * t),
  thermalConductivity: (t: number) => 0.207526 - 2.84167e-4 * t,
  /** The handbook's range, −80 to 100 °C. */
  validRange: { min: 193.15, max: 373.15 } as Range,
} as const;

/** Darhuber et al. (2003) surface tension of PDMS: 21.5 − 0.06 t mN/m, t in °C, 0–100 °C. */
const PDMS_SURFACE_TENSION = { intercept: 21.5e-3, slope: 0.06e-3, validRange: { min: 273.15, max: 373.15 } };

/**
 * What was searched, without a readable table, for the grade values below (25 °C density and thermal
 * conductivity, pour point) and for an interfacial tension against water: the polymer data handbook entry
 * for polydimethylsiloxane (A. C. M. Kuo 1999, Polymer Data Handbook, Oxford University Press: opening page
 * only), the thermal-conductivity measurements on poly(methylsiloxane) liquids of V. G. Nemzer et al. (1997,
 * J. Chem. Eng. Data 42, 328: abstract only), the European Pharmacopoeia dimeticone monograph (the part read
 * has no density table), the lubricant tables of liquid-infused-surface papers (Smith et al. 2013, Soft
 * Matter 9, 1772, and others: abstracts only), and PDMS–water interfacial-tension measurements (none found).
 * Searched again without a readable table: the Kuo (1999) entry in a full reproduction (only its opening is
 * reachable), V. G. Nemzer & L. V. Nemzer (1998, J. Chem. Eng. Data 43, thermophysical properties of liquid
 * poly(methylsiloxane)s: title only), and J. Chem. Eng. Data records in the NIST TRC ThermoML archive.
 */
const GRADE_VALUES_SEARCHED =
  'searched without a readable table: the PDMS entry of the Polymer Data Handbook (Kuo 1999), Nemzer et al. ' +
  '(1997, J. Chem. Eng. Data 42, 328), the European Pharmacopoeia dimeticone monograph, lubricant tables of ' +
  'liquid-infused-surface papers';

/**
 * The grade's kinematic viscosity at 25 °C is its definition; the other three numbers are typical values for
 * the grade, recalled and not confirmed against a source (from memory; what was searched: above).
 */
interface SiliconeGrade {
  /** Nominal kinematic viscosity at 25 °C, cSt (mm²/s): the grade's definition. */
  grade: number;
  /** kg/m³ at 25 °C (recalled). */
  density: number;
  /** W/(m·K) at 25 °C (recalled). */
  thermalConductivity: number;
  /** Pour point, °C (recalled): requests colder than this are refused. */
  pourPointCelsius: number;
}

const SILICONE_GRADES: SiliconeGrade[] = [
  { grade: 5, density: 913, thermalConductivity: 0.117, pourPointCelsius: -65 },
  { grade: 10, density: 935, thermalConductivity: 0.134, pourPointCelsius: -65 },
  { grade: 20, density: 950, thermalConductivity: 0.142, pourPointCelsius: -60 },
  { grade: 50, density: 960, thermalConductivity: 0.151, pourPointCelsius: -55 },
  { grade: 100, density: 965, thermalConductivity: 0.155, pourPointCelsius: -55 },
  { grade: 1000, density: 970, thermalConductivity: 0.159, pourPointCelsius: -50 },
];

/** f(T)/f(25 °C) for one of Melinder's fits. */
function relativeTo25(fit: (t: number) => number): (t: number) => number {
  const at25 = fit(REFERENCE_TEMPERATURE);
  return (t) => fit(t) / at25;
}

const DENSITY_RATIO = relativeTo25(MELINDER_PDMS.density);
const VISCOSITY_RATIO = relativeTo25(MELINDER_PDMS.viscosity);
const CONDUCTIVITY_RATIO = relativeTo25(MELINDER_PDMS.thermalConductivity);

const SCALED_NOTE =
  'temperature dependence relative to 25 °C from the polydimethylsiloxane fluid of Melinder (2010), ' +
  'applied to this grade (an assumption for grades heavier than the handbook fluid)';

function siliconeOil(data: SiliconeGrade): CatalogueFluid {
  const range = MELINDER_PDMS.validRange;
  const kinematic = data.grade * 1e-6;
  const tension = linearInCelsius(
    PDMS_SURFACE_TENSION.intercept,
    PDMS_SURFACE_TENSION.slope,
    PDMS_SURFACE_TENSION.validRange,
    DARHUBER_2003,
    'one fit for polydimethylsiloxane irrespective of grade; published grade values at 25 °C scatter by about ±1 mN/m around it',
  );
  return {
    id: `silicone-oil-${data.grade}cst`,
    name: `Polydimethylsiloxane, ${data.grade} cSt (silicone oil)`,
    role: 'lubricant',
    description:
      `Linear trimethylsiloxy-terminated polydimethylsiloxane, nominal kinematic viscosity ${data.grade} mm²/s ` +
      'at 25 °C. Values at 25 °C for the grade, scaled with temperature by the handbook relations of Melinder ' +
      '(2010) for a polydimethylsiloxane fluid (−80 to 100 °C); surface tension from the fit of Darhuber et al. ' +
      '(2003). No interfacial tension against water is listed: no source for it could be read (searched: ' +
      'liquid-infused-surface papers that tabulate their lubricants, PDMS–water tensiometry papers); give a ' +
      'measured value, or the Fowkes estimate stands in with its warning.',
    freezingPoint: CELSIUS_ZERO + data.pourPointCelsius,
    referenceTemperature: REFERENCE_TEMPERATURE,
    safety:
      'Low toxicity; combustible. No flash point is listed for these polydisperse grades: the DIPPR flash points ' +
      'of the linear dimethylsiloxane oligomers rise with chain length from 27 °C (octamethyltrisiloxane) to ' +
      `182 °C (hexacosamethyldodecasiloxane, the largest listed) (${SERAT_2017.key}), so the light grades are ` +
      "the most flammable. Spills are very slippery. Consult the supplier's safety data sheet.",
    properties: {
      density: fromFunction(
        (t) => data.density * DENSITY_RATIO(t),
        range,
        MELINDER_2010,
        `${data.density} kg/m³ at 25 °C (${PDMS_FLUID_DATA.key}, typical for the grade; ${FROM_MEMORY}; ` +
          `${GRADE_VALUES_SEARCHED}); ${SCALED_NOTE}`,
      ),
      viscosity: fromFunction(
        (t) => kinematic * data.density * VISCOSITY_RATIO(t),
        range,
        MELINDER_2010,
        `nominal grade ${data.grade} mm²/s at 25 °C × the 25 °C density (the European Pharmacopoeia dimeticone ` +
          'monograph, 20–1300 mm²/s grades, allows 90–110 % of the nominal value at 25 °C, as reproduced on a ' +
          `supplier's page); ${SCALED_NOTE}`,
      ),
      surfaceTension: tension,
      surfaceTensionDispersive: {
        ...tension,
        note: 'taken equal to the total surface tension: polydimethylsiloxane treated as apolar (common practice, no source)',
      },
      thermalConductivity: fromFunction(
        (t) => data.thermalConductivity * CONDUCTIVITY_RATIO(t),
        range,
        MELINDER_2010,
        `${data.thermalConductivity} W/(m·K) at 25 °C (${PDMS_FLUID_DATA.key}, typical for the grade; ` +
          `${FROM_MEMORY}; ${GRADE_VALUES_SEARCHED}); ${SCALED_NOTE}`,
      ),
      specificHeat: fromFunction(
        MELINDER_PDMS.specificHeat,
        range,
        MELINDER_2010,
        'the handbook fluid itself (about 3 mm²/s); the handbook tabulates no heavier grade, so heavier grades are taken equal',
      ),
    },
  };
}

/** Every silicone-oil grade, lightest first. */
export const SILICONE_OILS: readonly CatalogueFluid[] = SILICONE_GRADES.map(siliconeOil);
