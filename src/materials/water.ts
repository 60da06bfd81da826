/**
 * Liquid water at 0.1 MPa from the IAPWS formulations. All temperatures are
 * ITS-90 kelvin; results are SI.
 *
 * References
 * 1. IAPWS SR6-08(2011); Pátek, Hrubý, Klomfar, Součková & Harvey (2009),
 *    J. Phys. Chem. Ref. Data 38, 21–29, doi:10.1063/1.3043575.
 * 2. IAPWS R12-08; Huber et al. (2009), J. Phys. Chem. Ref. Data 38, 101–125,
 *    doi:10.1063/1.3088050.
 * 3. IAPWS R15-11; Huber et al. (2012), J. Phys. Chem. Ref. Data 41, 033102,
 *    doi:10.1063/1.4738955.
 * 4. IAPWS R1-76(2014); Vargaftik, Volkov & Voljak (1983), J. Phys. Chem. Ref.
 *    Data 12, 817–820, doi:10.1063/1.555688.
 */

/** Critical temperature of water, K (IAPWS-95, ref. 2 and 3). */
export const WATER_CRITICAL_TEMPERATURE = 647.096;
/** Critical density of water, kg/m³ (IAPWS-95, ref. 2 and 3). */
export const WATER_CRITICAL_DENSITY = 322;
/** Specific gas constant of water used by ref. 1, J/(kg·K). */
const WATER_GAS_CONSTANT = 461.51805;

/** Validity of the 0.1 MPa Gibbs function of ref. 1, K. */
export const SR6_08_RANGE = { min: 253.15, max: 383.15 } as const;

// Ref. 1, Table 2: coefficients of g(T) = R T_r [c1 + c2 τ + c3 τ ln τ + Σ a_i α^n_i + Σ b_i β^m_i],
// τ = T/T_r, α = T_r/(T_a − T), β = T_r/(T − T_b); terms 5..10 give v(T) at p0 = 0.1 MPa.
const REDUCING_TEMPERATURE = 10;
const ALPHA_POLE = 593;
const BETA_POLE = 232;
const P0 = 1e5;
const C3 = -8.983025854;
/** [a_i, n_i] of the Gibbs energy (i = 1..3). */
const GIBBS_ALPHA: ReadonlyArray<readonly [number, number]> = [
  [-1.66147053e5, 4],
  [2.70878164e6, 5],
  [-1.557191544e8, 7],
];
/** [b_i, m_i] of the Gibbs energy (i = 1..4). */
const GIBBS_BETA: ReadonlyArray<readonly [number, number]> = [
  [-8.237426256e-1, 2],
  [1.908956353, 3],
  [-2.017597384, 4],
  [8.546361348e-1, 5],
];
const VOLUME_CONSTANT = 1.93763157e-2;
/** [a_i, n_i] of the specific volume (i = 6..10). */
const VOLUME_ALPHA: ReadonlyArray<readonly [number, number]> = [
  [6.74458446e3, 4],
  [-2.22521604e5, 5],
  [1.00231247e8, 7],
  [-1.63552118e9, 8],
  [8.32299658e9, 9],
];
/** [b_i, m_i] of the specific volume (i = 5..10). */
const VOLUME_BETA: ReadonlyArray<readonly [number, number]> = [
  [5.78545292e-3, 1],
  [-1.53195665e-2, 2],
  [3.11337859e-2, 3],
  [-4.23546241e-2, 4],
  [3.38713507e-2, 5],
  [-1.19946761e-2, 6],
];

/**
 * Density of liquid water at 0.1 MPa, ρ = 1/v with
 * v(T) = (R T_r/p0) [a5 + Σ_{i=6}^{10} a_i α^{n_i} + Σ_{i=5}^{10} b_i β^{m_i}],
 * α = T_r/(593 K − T), β = T_r/(T − 232 K), T_r = 10 K, p0 = 0.1 MPa (ref. 1, Eq. 4 with Table 2).
 *
 * @param temperature T, K. Valid 253.15–383.15 K (liquid and metastable liquid at 0.1 MPa).
 * @returns kg/m³. Worked example: 998.2065 kg/m³ at 293.15 K (IAPWS-95 gives the same to 1e-4).
 */
export function waterDensity(temperature: number): number {
  const alpha = REDUCING_TEMPERATURE / (ALPHA_POLE - temperature);
  const beta = REDUCING_TEMPERATURE / (temperature - BETA_POLE);
  let bracket = VOLUME_CONSTANT;
  for (const [a, n] of VOLUME_ALPHA) bracket += a * alpha ** n;
  for (const [b, m] of VOLUME_BETA) bracket += b * beta ** m;
  const specificVolume = ((WATER_GAS_CONSTANT * REDUCING_TEMPERATURE) / P0) * bracket;
  return 1 / specificVolume;
}

/**
 * Isobaric specific heat capacity of liquid water at 0.1 MPa,
 * c_p = −R [c3 + τ Σ n_i(n_i+1) a_i α^{n_i+2} + τ Σ m_i(m_i+1) b_i β^{m_i+2}] (ref. 1, from −T ∂²g/∂T²).
 *
 * @param temperature T, K. Valid 253.15–383.15 K.
 * @returns J/(kg·K). Worked example: 4184.06 J/(kg·K) at 293.15 K.
 */
export function waterSpecificHeat(temperature: number): number {
  const tau = temperature / REDUCING_TEMPERATURE;
  const alpha = REDUCING_TEMPERATURE / (ALPHA_POLE - temperature);
  const beta = REDUCING_TEMPERATURE / (temperature - BETA_POLE);
  let sum = 0;
  for (const [a, n] of GIBBS_ALPHA) sum += n * (n + 1) * a * alpha ** (n + 2);
  for (const [b, m] of GIBBS_BETA) sum += m * (m + 1) * b * beta ** (m + 2);
  return -WATER_GAS_CONSTANT * (C3 + tau * sum);
}

// Ref. 2, Table 1 (H_i of the dilute-gas term) and Table 2 (H_ij of the residual term).
const VISCOSITY_DILUTE = [1.67752, 2.20462, 0.6366564, -0.241605];
const VISCOSITY_RESIDUAL: ReadonlyArray<readonly [number, number, number]> = [
  [0, 0, 5.20094e-1], [1, 0, 8.50895e-2], [2, 0, -1.08374], [3, 0, -2.89555e-1],
  [0, 1, 2.22531e-1], [1, 1, 9.99115e-1], [2, 1, 1.88797], [3, 1, 1.26613], [5, 1, 1.20573e-1],
  [0, 2, -2.81378e-1], [1, 2, -9.06851e-1], [2, 2, -7.72479e-1], [3, 2, -4.89837e-1], [4, 2, -2.5704e-1],
  [0, 3, 1.61913e-1], [1, 3, 2.57399e-1],
  [0, 4, -3.25372e-2], [3, 4, 6.98452e-2],
  [4, 5, 8.72102e-3],
  [3, 6, -4.35673e-3], [5, 6, -5.93264e-4],
];

/**
 * Viscosity of water from the IAPWS 2008 formulation without its critical
 * enhancement (μ̄2 = 1, which ref. 2 allows outside a small region around the
 * critical point): μ = μ* μ̄0(T̄) μ̄1(T̄, ρ̄), μ* = 1 μPa·s,
 * μ̄0 = 100 √T̄ / Σ_{i=0}^{3} H_i/T̄^i,
 * μ̄1 = exp[ρ̄ Σ_i Σ_j H_ij (1/T̄ − 1)^i (ρ̄ − 1)^j], T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³ (ref. 2, Eqs. 10–12).
 *
 * @param temperature T, K. Formulation valid 253.15–1173.15 K over the fluid range of IAPWS-95.
 * @param density ρ, kg/m³ (from {@link waterDensity} at 0.1 MPa).
 * @returns Pa·s. Worked example (ref. 2, Table 4): 889.735100 µPa·s at 298.15 K, 998 kg/m³.
 */
export function waterViscosityAtDensity(temperature: number, density: number): number {
  const reducedTemperature = temperature / WATER_CRITICAL_TEMPERATURE;
  const reducedDensity = density / WATER_CRITICAL_DENSITY;
  let dilute = 0;
  VISCOSITY_DILUTE.forEach((h, i) => (dilute += h / reducedTemperature ** i));
  const mu0 = (100 * Math.sqrt(reducedTemperature)) / dilute;
  const x = 1 / reducedTemperature - 1;
  const y = reducedDensity - 1;
  let residual = 0;
  for (const [i, j, h] of VISCOSITY_RESIDUAL) residual += h * x ** i * y ** j;
  const mu1 = Math.exp(reducedDensity * residual);
  return mu0 * mu1 * 1e-6;
}

/**
 * Viscosity of liquid water at 0.1 MPa: {@link waterViscosityAtDensity} at the
 * SR6-08 density (ref. 1 and 2).
 *
 * @param temperature T, K. Valid 253.15–383.15 K (range of the density).
 * @returns Pa·s. Worked example: 1.0016 mPa·s at 293.15 K.
 */
export function waterViscosity(temperature: number): number {
  return waterViscosityAtDensity(temperature, waterDensity(temperature));
}

// Ref. 3, Table 1 (L_k of the dilute-gas term) and Table 2 (L_ij, rows i = 0..4, columns j = 0..5).
const CONDUCTIVITY_DILUTE = [2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4];
const CONDUCTIVITY_RESIDUAL: ReadonlyArray<ReadonlyArray<number>> = [
  [1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634, 0.00609859258],
  [2.33771842, -2.78843778, 1.53616167, -0.463045512, 0.0832827019, -0.00719201245],
  [2.19650529, -4.54580785, 3.55777244, -1.40944978, 0.275418278, -0.0205938816],
  [-1.21051378, 1.60812989, -0.621178141, 0.0716373224, 0, 0],
  [-2.720337, 4.57586331, -3.18369245, 1.1168348, -0.19268305, 0.012913842],
];

/**
 * Thermal conductivity of water from the IAPWS 2011 formulation without its
 * critical enhancement λ̄2 (below 0.1 % of λ in liquid water at 0.1 MPa, ref. 3 §2.6):
 * λ = λ* λ̄0(T̄) λ̄1(T̄, ρ̄), λ* = 1 mW/(m·K),
 * λ̄0 = √T̄ / Σ_{k=0}^{4} L_k/T̄^k,
 * λ̄1 = exp[ρ̄ Σ_{i=0}^{4} (1/T̄ − 1)^i Σ_{j=0}^{5} L_ij (ρ̄ − 1)^j] (ref. 3, Eqs. 10, 16, 17).
 *
 * @param temperature T, K. Formulation valid 273.16–1173.15 K.
 * @param density ρ, kg/m³.
 * @returns W/(m·K). Worked example (ref. 3, Table 4, λ̄2 = 0): 607.712868 mW/(m·K) at 298.15 K, 998 kg/m³.
 */
export function waterThermalConductivityAtDensity(temperature: number, density: number): number {
  const reducedTemperature = temperature / WATER_CRITICAL_TEMPERATURE;
  const reducedDensity = density / WATER_CRITICAL_DENSITY;
  let dilute = 0;
  CONDUCTIVITY_DILUTE.forEach((l, k) => (dilute += l / reducedTemperature ** k));
  const lambda0 = Math.sqrt(reducedTemperature) / dilute;
  const x = 1 / reducedTemperature - 1;
  const y = reducedDensity - 1;
  let outer = 0;
  CONDUCTIVITY_RESIDUAL.forEach((row, i) => {
    let inner = 0;
    row.forEach((l, j) => (inner += l * y ** j));
    outer += x ** i * inner;
  });
  const lambda1 = Math.exp(reducedDensity * outer);
  return lambda0 * lambda1 * 1e-3;
}

/**
 * Thermal conductivity of liquid water at 0.1 MPa:
 * {@link waterThermalConductivityAtDensity} at the SR6-08 density (ref. 1 and 3).
 *
 * @param temperature T, K. Valid 273.16–383.15 K.
 * @returns W/(m·K). Worked example: 0.5980 W/(m·K) at 293.15 K.
 */
export function waterThermalConductivity(temperature: number): number {
  return waterThermalConductivityAtDensity(temperature, waterDensity(temperature));
}

/**
 * Surface tension of water against its vapour (and, to within the release's
 * uncertainty, air), σ = B τ^μ (1 + b τ), τ = 1 − T/T_c, B = 235.8 mN/m,
 * b = −0.625, μ = 1.256 (ref. 4).
 *
 * @param temperature T, K. Valid from the triple point (273.16 K) to T_c; the
 *   release says it extrapolates reasonably to 248.15 K.
 * @returns N/m. Worked example: 72.74 mN/m at 293.15 K.
 */
export function waterSurfaceTension(temperature: number): number {
  const tau = Math.max(0, 1 - temperature / WATER_CRITICAL_TEMPERATURE);
  return 235.8e-3 * tau ** 1.256 * (1 - 0.625 * tau);
}

/** Dispersive (London) component of the surface tension of water: one definition, in core (its sources there). */
export { WATER_SURFACE_TENSION_DISPERSIVE } from '../core/constants.js';
