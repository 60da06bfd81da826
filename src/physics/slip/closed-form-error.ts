/**
 * How far the closed-form slip lengths (./stripe-slip.ts) read from the exact
 * flat-interface solution of the groove-cell field solver: a measured error
 * map over interface fraction, depth ratio and viscosity ratio, and its
 * interpolation. `auto` in ./slip.ts runs the field solver where this map puts
 * the closed form 1 % or more off.
 */

/**
 * Measured relative error |b_closed − b_field|/b_field of the closed forms
 * (Belyaev–Vinogradova with the groove-alone mean local slip; transverse through
 * Asmolov–Vinogradova with the cavity local slip) against the groove-cell field
 * solver (default grid), from `npx tsx bench/slip-error-map.ts` (2026-12-02; table
 * in the slip report). The closed form always reads low; the error grows from
 * about 0.5 % at N = 0.01 to about 21 % at N ≥ 10 (the Belyaev–Vinogradova
 * small-slip limit ln sec/ln(sec + tan) instead of φ).
 */
export const ERROR_MAP = {
  interfaceFractions: [0.2, 0.5, 0.8, 0.95],
  depthRatios: [0.1, 0.5, 1.0, 2.0],
  viscosityRatios: [0.01, 0.1, 1.0, 10.0, 100.0],
  /** |relative error| of b_∥, indexed [φ][d/w][N]. */
  longitudinal: [
    [
      [0.0129, 0.0752, 0.1786, 0.2103, 0.2143],
      [0.0059, 0.0348, 0.1387, 0.2034, 0.2135],
      [0.0055, 0.0318, 0.1334, 0.2022, 0.2134],
      [0.0055, 0.0317, 0.1331, 0.2022, 0.2134],
    ],
    [
      [0.0126, 0.0787, 0.1799, 0.2094, 0.2132],
      [0.0049, 0.0362, 0.1418, 0.2031, 0.2125],
      [0.0045, 0.0331, 0.1366, 0.2020, 0.2124],
      [0.0045, 0.0330, 0.1364, 0.2020, 0.2123],
    ],
    [
      [0.0154, 0.0881, 0.1776, 0.2003, 0.2031],
      [0.0058, 0.0412, 0.1435, 0.1950, 0.2025],
      [0.0053, 0.0375, 0.1384, 0.1940, 0.2024],
      [0.0052, 0.0374, 0.1381, 0.1939, 0.2024],
    ],
    [
      [0.0186, 0.0918, 0.1568, 0.1705, 0.1721],
      [0.0055, 0.0378, 0.1220, 0.1650, 0.1715],
      [0.0047, 0.0329, 0.1163, 0.1639, 0.1714],
      [0.0046, 0.0327, 0.1160, 0.1639, 0.1714],
    ],
  ],
  /** |relative error| of b_⊥, indexed [φ][d/w][N]. */
  transverse: [
    [
      [0.0186, 0.1044, 0.1933, 0.2151, 0.2177],
      [0.0047, 0.0446, 0.1564, 0.2108, 0.2185],
      [0.0030, 0.0331, 0.1394, 0.2043, 0.2144],
      [0.0029, 0.0325, 0.1389, 0.2043, 0.2144],
    ],
    [
      [0.0208, 0.1094, 0.1942, 0.2143, 0.2167],
      [0.0051, 0.0454, 0.1545, 0.2059, 0.2132],
      [0.0035, 0.0348, 0.1409, 0.2030, 0.2125],
      [0.0035, 0.0345, 0.1406, 0.2030, 0.2125],
    ],
    [
      [0.0256, 0.1174, 0.1887, 0.2046, 0.2065],
      [0.0062, 0.0494, 0.1520, 0.1965, 0.2027],
      [0.0042, 0.0370, 0.1384, 0.1940, 0.2024],
      [0.0041, 0.0367, 0.1382, 0.1940, 0.2024],
    ],
    [
      [0.0309, 0.1163, 0.1645, 0.1744, 0.1756],
      [0.0047, 0.0392, 0.1248, 0.1658, 0.1718],
      [0.0016, 0.0223, 0.1088, 0.1629, 0.1713],
      [0.0016, 0.0219, 0.1084, 0.1629, 0.1713],
    ],
  ],
};

/** Index of the interval of a sorted grid holding x (clamped) and the linear weight in it. */
function bracketOf(grid: readonly number[], x: number): [number, number] {
  if (x <= grid[0]) return [0, 0];
  if (x >= grid[grid.length - 1]) return [grid.length - 2, 1];
  let i = 0;
  while (x > grid[i + 1]) i++;
  return [i, (x - grid[i]) / (grid[i + 1] - grid[i])];
}

/**
 * Error along N at one (φ, d/w) node: linear in log N – log error between the
 * measured N; clamped above N = 100 (the error saturates); below N = 0.01 the
 * first log–log slope is continued (the error vanishes as N → 0, where both the
 * closed form and the solver reduce to Philip's exact result).
 */
function errorAlongViscosityRatio(errors: readonly number[], viscosityRatio: number): number {
  const logN = ERROR_MAP.viscosityRatios.map(Math.log10);
  const x = Math.log10(viscosityRatio);
  const logE = errors.map((e) => Math.log10(Math.max(e, 1e-6)));
  if (x >= logN[logN.length - 1]) return errors[errors.length - 1];
  if (x <= logN[0]) {
    const slope = Math.max((logE[1] - logE[0]) / (logN[1] - logN[0]), 0);
    return 10 ** (logE[0] + slope * (x - logN[0]));
  }
  const [i, t] = bracketOf(logN, x);
  return 10 ** ((1 - t) * logE[i] + t * logE[i + 1]);
}

/**
 * Estimated relative error of the closed forms at interface fraction φ, depth
 * ratio d/w and viscosity ratio N: the measured map, interpolated linearly in φ and
 * log(d/w) (clamped to the measured ranges 0.2 ≤ φ ≤ 0.95, 0.1 ≤ d/w ≤ 2) and
 * log–log in N.
 */
export function closedFormErrorEstimate(
  interfaceFraction: number,
  depthOverWidth: number,
  viscosityRatio: number,
): { longitudinal: number; transverse: number } {
  const [i, s] = bracketOf(ERROR_MAP.interfaceFractions, interfaceFraction);
  const [j, t] = bracketOf(ERROR_MAP.depthRatios.map(Math.log10), Math.log10(depthOverWidth));
  const at = (table: readonly (readonly (readonly number[])[])[]) => {
    const e = (a: number, b: number) => errorAlongViscosityRatio(table[a][b], viscosityRatio);
    return (1 - s) * ((1 - t) * e(i, j) + t * e(i, j + 1)) + s * ((1 - t) * e(i + 1, j) + t * e(i + 1, j + 1));
  };
  return { longitudinal: at(ERROR_MAP.longitudinal), transverse: at(ERROR_MAP.transverse) };
}
