/**
 * Small data helpers shared by the plot builders: filtering what cannot be
 * drawn, cell edges of gridded maps, display units for the axes.
 */

/** A number that can be drawn on a linear axis. */
export function isDrawable(value: number | null | undefined): value is number {
  return typeof value === 'number' && Number.isFinite(value);
}

/** A number that can be drawn on a logarithmic axis (finite and positive). */
export function isDrawableOnLog(value: number | null | undefined): value is number {
  return isDrawable(value) && value > 0;
}

/**
 * Edges of the cells around grid centres: midpoints between neighbours (geometric
 * midpoints on a log axis), the outer edges mirrored, so the cells tile the map.
 * Throws for fewer than one centre or unsorted centres (a programming error).
 */
export function cellEdges(centres: readonly number[], log: boolean): number[] {
  const n = centres.length;
  if (n === 0) throw new Error('a gridded map needs at least one centre per axis');
  for (let i = 1; i < n; i++) {
    if (!(centres[i] > centres[i - 1])) throw new Error('grid centres must increase strictly');
  }
  const toAxis = (v: number) => (log ? Math.log(v) : v);
  const fromAxis = (v: number) => (log ? Math.exp(v) : v);
  if (n === 1) {
    // One cell: a decade (log) or ±10 % (linear) around it, only so it has an area.
    return log ? [centres[0] / Math.sqrt(10), centres[0] * Math.sqrt(10)] : [centres[0] * 0.9, centres[0] * 1.1];
  }
  const a = centres.map(toAxis);
  const edges = [a[0] - (a[1] - a[0]) / 2];
  for (let i = 1; i < n; i++) edges.push((a[i - 1] + a[i]) / 2);
  edges.push(a[n - 1] + (a[n - 1] - a[n - 2]) / 2);
  return edges.map(fromAxis);
}

export interface DisplayUnit {
  /** Multiply an SI value by this to get the displayed value. */
  factor: number;
  /** Unit symbol shown in the axis title. */
  symbol: string;
}

/** Time unit for an axis whose largest value is `seconds`: s, min, h or d, whichever keeps the numbers readable. */
export function timeUnit(seconds: number): DisplayUnit {
  if (seconds >= 2 * 86_400) return { factor: 1 / 86_400, symbol: 'd' };
  if (seconds >= 2 * 3600) return { factor: 1 / 3600, symbol: 'h' };
  if (seconds >= 120) return { factor: 1 / 60, symbol: 'min' };
  return { factor: 1, symbol: 's' };
}

/** Length unit for an axis whose largest value is `metres`: nm, µm or mm. */
export function lengthUnit(metres: number): DisplayUnit {
  if (metres < 1e-6) return { factor: 1e9, symbol: 'nm' };
  if (metres < 1e-3) return { factor: 1e6, symbol: 'µm' };
  return { factor: 1e3, symbol: 'mm' };
}

/** Linear interpolation of y at x in log(x) over sorted xs; null outside the range. */
export function interpolateOnLogAxis(xs: readonly number[], ys: readonly (number | null)[], x: number): number | null {
  if (!isDrawableOnLog(x)) return null;
  for (let i = 1; i < xs.length; i++) {
    const x0 = xs[i - 1];
    const x1 = xs[i];
    const y0 = ys[i - 1];
    const y1 = ys[i];
    if (x >= x0 && x <= x1 && isDrawable(y0) && isDrawable(y1) && x0 > 0) {
      const s = x1 === x0 ? 0 : Math.log(x / x0) / Math.log(x1 / x0);
      return y0 + s * (y1 - y0);
    }
  }
  return null;
}

/** Throws when two arrays meant to pair element by element differ in length (a programming error). */
export function requireSameLength(name: string, a: readonly unknown[], b: readonly unknown[]): void {
  if (a.length !== b.length) throw new Error(`${name}: ${a.length} abscissae but ${b.length} values`);
}

/**
 * Tick values for a log axis over [low, high]: 1-2-5 steps within each decade
 * up to three decades, whole decades beyond (fewer labels, no crowding).
 * Empty when the range is not drawable.
 */
export function logTickValues(low: number, high: number): number[] {
  if (!isDrawableOnLog(low) || !isDrawableOnLog(high) || high < low) return [];
  const steps = high / low <= 1e3 ? [1, 2, 5] : [1];
  const ticks: number[] = [];
  for (let e = Math.floor(Math.log10(low)); e <= Math.ceil(Math.log10(high)); e++) {
    for (const s of steps) {
      // Built from the decimal string so 3 × 10⁻⁵ is exactly the double 3e-5.
      const v = Number(`${s}e${e}`);
      if (v >= low * (1 - 1e-12) && v <= high * (1 + 1e-12)) ticks.push(v);
    }
  }
  return ticks;
}

/** Smallest and largest drawable value on a log axis, or null when there is none. */
export function logExtent(values: readonly (number | null | undefined)[]): [number, number] | null {
  let low = Infinity;
  let high = -Infinity;
  for (const v of values) {
    if (isDrawableOnLog(v)) {
      low = Math.min(low, v);
      high = Math.max(high, v);
    }
  }
  return low <= high ? [low, high] : null;
}
