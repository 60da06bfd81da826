/** Physical constants used across the models, SI. */

/** Standard gravitational acceleration, m/s² (CGPM 1901, exact by definition). */
export const STANDARD_GRAVITY = 9.80665;
/** Molar gas constant, J/(mol·K) (CODATA 2018, exact since the 2019 SI). */
export const GAS_CONSTANT = 8.314462618;
/** von Kármán constant of the log law used throughout (κ = 0.41; common practice, no source). */
export const KARMAN_CONSTANT = 0.41;

/**
 * Dispersive (London) part of water's surface tension, N/m: 21.8 mN/m at 20 °C. The split of a surface tension
 * into dispersive and polar parts originates with Fowkes (1964, fowkes1964), whose paper was not reachable with
 * our tools. The value and its temperature are read in public probe-liquid tables (through the code index): one
 * lists water as 72.8 mN/m in all, 21.8 dispersive and 51.0 polar, "mN/m at 20 C", citing Owens & Wendt (1969) and
 * van Oss (1994); others list the same 21.8 citing Jasper (1972) and Good & van Oss (1991). One table read gives
 * another split (29.1 dispersive, 43.7 polar): the split belongs to the method that uses it, and this one is the
 * geometric-mean (Fowkes, Owens–Wendt) convention the wetting model follows.
 */
export const WATER_SURFACE_TENSION_DISPERSIVE = 21.8e-3;
