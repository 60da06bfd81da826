/**
 * n-Alkane lubricants: n-decane, n-dodecane, n-hexadecane. Density,
 * viscosity, thermal conductivity and heat capacity from the DIPPR
 * correlations tabulated in Perry's Handbook, surface tension linear in
 * temperature after Jasper (1972). Every valid range below is the range the
 * source table states for that coefficient set (an upper limit at the
 * critical temperature is cut by the boiling point the resolver enforces).
 */
import { alkaneMolarMass, dipprDensity105, dipprPolynomial100, dipprViscosity101 } from './dippr.js';
import {
  ASTM_D7094_DODECANE,
  CRC_ORGANIC_CONSTANTS,
  IEC_60079_20_1,
  JASPER_1972,
  PERRY_CONDUCTIVITY,
  PERRY_DENSITY,
  PERRY_HEAT_CAPACITY,
  PERRY_VISCOSITY,
  SERAT_2017,
  WU_HORNOF_1999,
  ZEPPIERI_2001,
} from './references.js';
import { REFERENCES, type Reference } from '../core/references.js';
import { FROM_MEMORY, around, constant, linearInCelsius, type Range } from './records.js';
import type { CatalogueFluid } from './types.js';

interface AlkaneData {
  id: string;
  name: string;
  formula: string;
  carbonAtoms: number;
  /** Melting and normal boiling points, K (CRC Handbook, Physical Constants of Organic Compounds). */
  meltingPoint: number;
  boilingPoint: number;
  /** Perry's Table 2-32, DIPPR Eq. 105: C1 (mol/m³), C2, C3 (K), C4, and the table's range. */
  density: readonly [number, number, number, number];
  densityRange: Range;
  /** Perry's Table 2-313, DIPPR Eq. 101: C1..C5, and the table's range. */
  viscosity: readonly [number, number, number, number, number];
  viscosityRange: Range;
  /** Perry's Table 2-315, DIPPR Eq. 100 (W/(m·K)), and the table's range. */
  thermalConductivity: readonly number[];
  thermalConductivityRange: Range;
  /** Perry's Table 2-153, DIPPR Eq. 100 (J/(kmol·K)), and the table's range. */
  specificHeat: readonly number[];
  specificHeatRange: Range;
  /** Jasper (1972) γ = a − b t, t in °C: a in mN/m, b in mN/(m·K); with the tabulated range in K. */
  jasper: readonly [number, number];
  jasperRange: Range;
  /** Interfacial tension against water near 25 °C, N/m, its source and what was read of it. */
  interfacialTensionWater: { value: number; source: Reference; note: string };
  /** Closed-cup flash point, °C, and where it comes from. */
  flashPoint: { celsius: number; source: Reference };
}

const PERRY_NOTE =
  "DIPPR coefficients and range of the Perry table as transcribed in the open-source chemicals library's " +
  'Perry tables (compared digit by digit; not re-checked against the printed page); worked values agree with ' +
  'the VDI Heat Atlas (PPDS) correlations to within a few per cent (see the catalogue tests).';
const JASPER_NOTE =
  "Coefficients a, b of γ = a − b·t (t in °C) and their temperature range as reproduced in Lange's Handbook of " +
  "Chemistry (16th ed.), read in the chemicals library's transcription; agree with the JPCRD reference " +
  'correlations of Mulero et al. (2012) to 0.2 % at 20 °C for decane and dodecane (see the catalogue tests).';

function flashPointText(flash: AlkaneData['flashPoint']): string {
  return `flash point about ${flash.celsius} °C (${flash.source.key})`;
}

function alkane(data: AlkaneData): CatalogueFluid {
  const molarMass = alkaneMolarMass(data.carbonAtoms);
  const [a, b] = data.jasper;
  const tension = linearInCelsius(a * 1e-3, b * 1e-3, data.jasperRange, JASPER_1972, JASPER_NOTE);
  return {
    id: data.id,
    name: data.name,
    role: 'lubricant',
    description:
      `${data.name} (${data.formula}), a model hydrocarbon lubricant. Density, viscosity, thermal ` +
      "conductivity and specific heat from the DIPPR correlations in Perry's Handbook (8th ed.), surface " +
      'tension linear in temperature after Jasper (1972), interfacial tension against water at 25 °C; melting ' +
      `and boiling points from the CRC Handbook (${CRC_ORGANIC_CONSTANTS.key}).`,
    freezingPoint: data.meltingPoint,
    boilingPoint: data.boilingPoint,
    referenceTemperature: 298.15,
    safety:
      `Flammable liquid (${flashPointText(data.flashPoint)}); aspiration hazard. ` +
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
        data.interfacialTensionWater.value,
        around(25, 10, data.meltingPoint),
        data.interfacialTensionWater.source,
        data.interfacialTensionWater.note,
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

/**
 * An alkane–water interfacial tension at 25 °C that Zeppieri et al. (2001) measured (10–60 °C, abstract read)
 * but whose tables could not be read: the value itself is recalled. Searched again for a readable value: the
 * NIST TRC ThermoML records of J. Chem. Eng. Data (none for this paper or for a decane– or dodecane–water
 * tension near 25 °C and 0.1 MPa was found) and abstracts of pendant-drop studies (none states the value).
 */
function recalledAgainstZeppieri(value: number): AlkaneData['interfacialTensionWater'] {
  return {
    value,
    source: ZEPPIERI_2001,
    note:
      'at 25 °C. Zeppieri et al. (2001) measured this alkane against water from 10 to 60 °C (abstract read), but ' +
      `their tables could not be read (searched by title, authors and DOI): the value is recalled, ${FROM_MEMORY}`,
  };
}

export const N_DECANE = alkane({
  id: 'n-decane',
  name: 'n-Decane',
  formula: 'C10H22',
  carbonAtoms: 10,
  meltingPoint: 243.54,
  boilingPoint: 447.25,
  density: [410.84, 0.25175, 617.7, 0.28571],
  densityRange: { min: 243.51, max: 617.7 },
  viscosity: [-9.6489, 1181.1, -0.24367, 9.0522e34, -15],
  viscosityRange: { min: 240.05, max: 494.16 },
  thermalConductivity: [0.2063, -0.00025],
  thermalConductivityRange: { min: 243.51, max: 447.3 },
  specificHeat: [278620, -197.91, 1.0737],
  specificHeatRange: { min: 243.51, max: 460 },
  jasper: [25.67, 0.092],
  jasperRange: { min: 243.45, max: 447.25 },
  interfacialTensionWater: recalledAgainstZeppieri(52.0e-3),
  // IEC 60079-20-1 lists 319.15 K.
  flashPoint: { celsius: 46, source: IEC_60079_20_1 },
});

export const N_DODECANE = alkane({
  id: 'n-dodecane',
  name: 'n-Dodecane',
  formula: 'C12H26',
  carbonAtoms: 12,
  meltingPoint: 263.6,
  boilingPoint: 489.45,
  density: [332.67, 0.24664, 658, 0.28571],
  densityRange: { min: 263.57, max: 658 },
  viscosity: [-7.8244, 1191.9, -0.49963, 3.9572e23, -10],
  viscosityRange: { min: 262.15, max: 526.4 },
  thermalConductivity: [0.2047, -0.0002326],
  thermalConductivityRange: { min: 263.57, max: 489.47 },
  specificHeat: [508210, -1368.7, 3.1015],
  // The Perry heat-capacity fit for dodecane only spans 263.57–330 K.
  specificHeatRange: { min: 263.57, max: 330 },
  jasper: [27.12, 0.0884],
  jasperRange: { min: 263.15, max: 489.15 },
  interfacialTensionWater: recalledAgainstZeppieri(52.8e-3),
  // Not in the IEC 60079-20-1 or DIPPR (Serat 2017) transcriptions; the value read lies between the DIPPR flash
  // points of n-undecane (65.9 °C) and n-tridecane (90.0 °C). The catalogue listed a recalled 71 °C before.
  flashPoint: { celsius: 77.5, source: ASTM_D7094_DODECANE },
});

export const N_HEXADECANE = alkane({
  id: 'n-hexadecane',
  name: 'n-Hexadecane',
  formula: 'C16H34',
  carbonAtoms: 16,
  meltingPoint: 291.33,
  boilingPoint: 560.05,
  density: [232.89, 0.23659, 723, 0.28571],
  densityRange: { min: 291.31, max: 723 },
  viscosity: [-20.182, 2203.5, 1.2289, 0, 0],
  viscosityRange: { min: 291.31, max: 564.15 },
  thermalConductivity: [0.20749, -0.00021917],
  thermalConductivityRange: { min: 291.31, max: 560.01 },
  specificHeat: [370350, 231.47, 0.68632],
  specificHeatRange: { min: 291.31, max: 560.01 },
  jasper: [29.18, 0.0854],
  jasperRange: { min: 291.35, max: 559.95 },
  // Zeppieri et al. (2001) measured hexane to dodecane only; the catalogue cited them for 53.3 mN/m before.
  interfacialTensionWater: {
    value: 53.5e-3,
    source: WU_HORNOF_1999,
    note:
      'the published value quoted, and reproduced by drop-volume tensiometry with hexadecane as the drop phase, ' +
      'by Wu & Hornof (1999) (abstract read); the abstract states no temperature (room temperature), so the ' +
      'range is ours: 25 °C ± 10 K, not below the melting point',
  },
  // DIPPR value 399.75 K (Serat et al. 2017); the catalogue listed a recalled 135 °C before.
  flashPoint: { celsius: 127, source: SERAT_2017 },
});

