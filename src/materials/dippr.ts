/**
 * The DIPPR (AIChE Design Institute for Physical Properties) correlation
 * forms in which Perry's Chemical Engineers' Handbook tabulates liquid
 * properties. Each returns a function of temperature (K) giving SI values.
 *
 * References
 * 1. D. W. Green, R. H. Perry (eds.) (2008), Perry's Chemical Engineers'
 *    Handbook, 8th ed., McGraw-Hill, Section 2: Table 2-32 (liquid densities,
 *    Eq. 105), Table 2-153 (liquid heat capacities, Eq. 100), Table 2-313
 *    (liquid viscosities, Eq. 101), Table 2-315 (liquid thermal
 *    conductivities, Eq. 100); coefficients from the DIPPR 801 database.
 */

/**
 * DIPPR Eq. 105 (Rackett-type) liquid density:
 * ρ_molar = C1 / C2^(1 + (1 − T/C3)^C4), times the molar mass.
 *
 * @param c1 mol/m³ (Perry's kmol/m³ × 1000). @param c2 dimensionless. @param c3 K (critical temperature).
 * @param c4 dimensionless. @param molarMass kg/mol.
 * @returns ρ(T) in kg/m³, for T below C3 (ref. 1, Table 2-32).
 */
export function dipprDensity105(
  c1: number,
  c2: number,
  c3: number,
  c4: number,
  molarMass: number,
): (temperature: number) => number {
  return (temperature) => {
    const tau = Math.max(0, 1 - temperature / c3);
    return (c1 / c2 ** (1 + tau ** c4)) * molarMass;
  };
}

/**
 * DIPPR Eq. 101 liquid viscosity: μ = exp(C1 + C2/T + C3 ln T + C4 T^C5).
 *
 * @returns μ(T) in Pa·s (ref. 1, Table 2-313).
 */
export function dipprViscosity101(
  c1: number,
  c2: number,
  c3: number,
  c4: number,
  c5: number,
): (temperature: number) => number {
  return (temperature) => Math.exp(c1 + c2 / temperature + c3 * Math.log(temperature) + c4 * temperature ** c5);
}

/**
 * DIPPR Eq. 100 polynomial: y = C1 + C2 T + C3 T² + C4 T³ + C5 T⁴, scaled by `scale`
 * (e.g. 1/M to turn Perry's J/(kmol·K) heat capacities into J/(kg·K)).
 *
 * @returns y(T) in the table's unit times `scale` (ref. 1, Tables 2-153 and 2-315).
 */
export function dipprPolynomial100(
  coefficients: readonly number[],
  scale = 1,
): (temperature: number) => number {
  return (temperature) => {
    let value = 0;
    for (let i = coefficients.length - 1; i >= 0; i--) value = value * temperature + coefficients[i];
    return value * scale;
  };
}

/** Conventional standard atomic weights, kg/mol (IUPAC 2013 abridged values: C 12.011, H 1.008). */
export function alkaneMolarMass(carbonAtoms: number): number {
  return (carbonAtoms * 12.011 + (2 * carbonAtoms + 2) * 1.008) / 1000;
}
