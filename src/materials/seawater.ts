/**
 * Seawater at atmospheric pressure as a function of temperature and
 * absolute salinity. Salinity throughout is absolute (reference-composition)
 * salinity S_A in g/kg, the TEOS-10 convention; the default is 35 g/kg.
 *
 * References
 * 1. Millero & Poisson (1981), Deep-Sea Res. 28A, 625–629,
 *    doi:10.1016/0198-0149(81)90122-9 (EOS-80 at one atmosphere, as printed in
 *    Fofonoff & Millard 1983, UNESCO Tech. Pap. Mar. Sci. 44).
 * 2. IOC, SCOR & IAPSO (2010), TEOS-10, IOC Manuals and Guides 56: S_R = (35.16504/35) S_P.
 * 3. Sharqawy, Lienhard & Zubair (2010), Desalination and Water Treatment 16,
 *    354–380, doi:10.5004/dwt.2010.1079.
 * 4. IAPWS R1-76(2014), surface tension of pure water (see water.ts).
 */
import { waterSurfaceTension } from './water.js';

/** Default absolute salinity, g/kg (TEOS-10 standard seawater, ref. 2). */
export const DEFAULT_SEAWATER_SALINITY = 35;
/** Ratio of reference-composition salinity to practical salinity, (g/kg) per PSS-78 unit (ref. 2). */
const SALINITY_PER_PRACTICAL = 35.16504 / 35;

/** IPTS-68 Celsius temperature from ITS-90 kelvin, t68 = 1.00024 t90 (ref. 1 as used in ref. 3). */
function celsius68(temperature: number): number {
  return 1.00024 * (temperature - 273.15);
}

/** Practical salinity S_P (PSS-78) from absolute salinity S_A in g/kg (ref. 2). */
export function practicalSalinity(absoluteSalinity: number): number {
  return absoluteSalinity / SALINITY_PER_PRACTICAL;
}

/**
 * Density of seawater at one standard atmosphere, EOS-80 (ref. 1):
 * ρ = ρ_w(t) + A(t) S + B(t) S^1.5 + C S², with S practical salinity, t IPTS-68 °C,
 * ρ_w = 999.842594 + 6.793952e-2 t − 9.095290e-3 t² + 1.001685e-4 t³ − 1.120083e-6 t⁴ + 6.536332e-9 t⁵,
 * A = 0.824493 − 4.0899e-3 t + 7.6438e-5 t² − 8.2467e-7 t³ + 5.3875e-9 t⁴,
 * B = −5.72466e-3 + 1.0227e-4 t − 1.6546e-6 t², C = 4.8314e-4.
 *
 * @param temperature T, K (ITS-90). Valid 271–313 K (−2 to 40 °C).
 * @param absoluteSalinity S_A, g/kg; converted to S_P by ref. 2. Valid S_P 0–42.
 * @returns kg/m³. Worked example (ref. 1 check value): S_P = 35, t68 = 25 °C gives 1023.34306 kg/m³.
 */
export function seawaterDensity(temperature: number, absoluteSalinity: number): number {
  return seawaterDensityPractical(celsius68(temperature), practicalSalinity(absoluteSalinity));
}

/**
 * EOS-80 one-atmosphere density in the variables of ref. 1 (t68 in °C, S_P);
 * see {@link seawaterDensity}. Exposed for the check values printed in ref. 1.
 */
export function seawaterDensityPractical(celsiusIpts68: number, salinityPractical: number): number {
  const t = celsiusIpts68;
  const s = Math.max(0, salinityPractical);
  const pure =
    999.842594 + t * (6.793952e-2 + t * (-9.09529e-3 + t * (1.001685e-4 + t * (-1.120083e-6 + t * 6.536332e-9))));
  const a = 0.824493 + t * (-4.0899e-3 + t * (7.6438e-5 + t * (-8.2467e-7 + t * 5.3875e-9)));
  const b = -5.72466e-3 + t * (1.0227e-4 - t * 1.6546e-6);
  return pure + a * s + b * s ** 1.5 + 4.8314e-4 * s * s;
}

/**
 * Freezing temperature of seawater at atmospheric pressure (UNESCO 1983, in
 * Fofonoff & Millard, ref. 1): t_f = −0.0575 S + 1.710523e-3 S^1.5 − 2.154996e-4 S² (°C, S practical salinity).
 *
 * @param absoluteSalinity S_A, g/kg. Valid S_P 4–40.
 * @returns K. Worked example: S_P = 35 gives −1.922 °C.
 */
export function seawaterFreezingPoint(absoluteSalinity: number): number {
  const s = Math.max(0, practicalSalinity(absoluteSalinity));
  const celsius = -0.0575 * s + 1.710523e-3 * s ** 1.5 - 2.154996e-4 * s * s;
  // The formula is IPTS-68; the offset at −2 °C is below 1 mK.
  return 273.15 + celsius / 1.00024;
}

/**
 * Dynamic viscosity of seawater, ref. 3 Eq. 22 (after Isdale, Spence & Tudhope 1972):
 * μ_sw = μ_w (1 + A S + B S²), S in kg/kg, t in °C (IPTS-68),
 * A = 1.541 + 1.998e-2 t − 9.52e-5 t², B = 7.974 − 7.561e-2 t + 4.724e-4 t²,
 * μ_w = 4.2844e-5 + [0.157 (t + 64.993)² − 91.296]⁻¹ Pa·s (ref. 3 Eq. 23, pure water).
 *
 * @param temperature T, K. Valid 273–453 K (0–180 °C).
 * @param absoluteSalinity S_A, g/kg. Valid 0–150 g/kg. Accuracy ±1.5 % (ref. 3).
 * @returns Pa·s. Worked example: S = 35 g/kg, 20 °C ≈ 1.08 mPa·s.
 */
export function seawaterViscosity(temperature: number, absoluteSalinity: number): number {
  const t = celsius68(temperature);
  const s = Math.max(0, absoluteSalinity) / 1000;
  const pure = 4.2844e-5 + 1 / (0.157 * (t + 64.993) ** 2 - 91.296);
  const a = 1.541 + 1.998e-2 * t - 9.52e-5 * t * t;
  const b = 7.974 - 7.561e-2 * t + 4.724e-4 * t * t;
  return pure * (1 + a * s + b * s * s);
}

/**
 * Thermal conductivity of seawater, ref. 3 Eq. 13 (after Jamieson & Tudhope 1970):
 * log10 k = log10(240 + 0.0002 S) + 0.434 [2.3 − (343.5 + 0.037 S)/T68] [1 − T68/(647.3 + 0.03 S)]^(1/3),
 * k in mW/(m·K), S in g/kg, T68 in K (IPTS-68).
 *
 * @param temperature T, K. Valid 273–453 K.
 * @param absoluteSalinity S_A, g/kg. Valid 0–160 g/kg. Accuracy ±3 % (ref. 3).
 * @returns W/(m·K). Worked example: S = 35 g/kg, 20 °C ≈ 0.596 W/(m·K).
 */
export function seawaterThermalConductivity(temperature: number, absoluteSalinity: number): number {
  const s = Math.max(0, absoluteSalinity);
  const kelvin68 = celsius68(temperature) + 273.15;
  const ratio = Math.max(0, 1 - kelvin68 / (647.3 + 0.03 * s));
  const log10k =
    Math.log10(240 + 0.0002 * s) + 0.434 * (2.3 - (343.5 + 0.037 * s) / kelvin68) * Math.cbrt(ratio);
  return 10 ** log10k * 1e-3;
}

/**
 * Isobaric specific heat of seawater, ref. 3 Eq. 9 (after Jamieson et al. 1969):
 * c_p = A + B T68 + C T68² + D T68³ kJ/(kg·K), T68 in K, S in g/kg,
 * A = 5.328 − 9.76e-2 S + 4.04e-4 S², B = −6.913e-3 + 7.351e-4 S − 3.15e-6 S²,
 * C = 9.6e-6 − 1.927e-6 S + 8.23e-9 S², D = 2.5e-9 + 1.666e-9 S − 7.125e-12 S².
 *
 * @param temperature T, K. Valid 273–453 K.
 * @param absoluteSalinity S_A, g/kg. Valid 0–180 g/kg. Accuracy ±0.28 % (ref. 3).
 * @returns J/(kg·K). Worked example: S = 35 g/kg, 20 °C ≈ 4.00 kJ/(kg·K).
 */
export function seawaterSpecificHeat(temperature: number, absoluteSalinity: number): number {
  const s = Math.max(0, absoluteSalinity);
  const t = celsius68(temperature) + 273.15;
  const a = 5.328 - 9.76e-2 * s + 4.04e-4 * s * s;
  const b = -6.913e-3 + 7.351e-4 * s - 3.15e-6 * s * s;
  const c = 9.6e-6 - 1.927e-6 * s + 8.23e-9 * s * s;
  const d = 2.5e-9 + 1.666e-9 * s - 7.125e-12 * s * s;
  return (a + t * (b + t * (c + t * d))) * 1e3;
}

/**
 * Surface tension of seawater against air, ref. 3 Eq. 28:
 * σ_sw = σ_w (1 + 3.766e-4 S + 2.347e-6 S t), S in g/kg, t in °C, σ_w from IAPWS (ref. 4).
 *
 * @param temperature T, K. Valid 273–313 K (0–40 °C).
 * @param absoluteSalinity S_A, g/kg. Valid 0–40 g/kg. Accuracy ±0.2 % (ref. 3).
 * @returns N/m. Worked example: S = 35 g/kg, 20 °C ≈ 73.8 mN/m.
 */
export function seawaterSurfaceTension(temperature: number, absoluteSalinity: number): number {
  const s = Math.max(0, absoluteSalinity);
  const t = celsius68(temperature);
  return waterSurfaceTension(temperature) * (1 + 3.766e-4 * s + 2.347e-6 * s * t);
}
