/** Physical constants used across the models, SI. */

/** Standard gravitational acceleration, m/s² (CGPM 1901, exact by definition). */
export const STANDARD_GRAVITY = 9.80665;
/** Molar gas constant, J/(mol·K) (CODATA 2018, exact since the 2019 SI). */
export const GAS_CONSTANT = 8.314462618;
/** von Kármán constant of the log law used throughout (κ = 0.41; common practice, no source). */
export const KARMAN_CONSTANT = 0.41;
