/**
 * Small builders for catalogue property records, shared by the fluid
 * families (alkanes, silicones, other lubricants). Temperatures in kelvin,
 * values SI.
 */
import type { Reference } from '../core/references.js';
import type { PropertyRecord } from './types.js';

export const CELSIUS_ZERO = 273.15;

/**
 * The tag of a value that was recalled and not confirmed against a source read while writing. Notes that
 * contain it make the resolvers warn; the literal phrase is defined here once.
 */
export const RECALLED_TAG = 'from memory';
export const FROM_MEMORY = `${RECALLED_TAG}: recalled, not confirmed against the source while writing`;

export type Range = { min: number; max: number };

function withNote(record: Omit<PropertyRecord, 'note'>, note?: string): PropertyRecord {
  return note === undefined ? record : { ...record, note };
}

/** A property that the source gives at one temperature only. */
export function constant(value: number, validRange: Range, source: Reference, note?: string): PropertyRecord {
  return withNote({ at: () => value, validRange, source }, note);
}

/** A property given as a function of temperature (K) by its source. */
export function fromFunction(
  at: (temperature: number) => number,
  validRange: Range,
  source: Reference,
  note?: string,
): PropertyRecord {
  return withNote({ at, validRange, source }, note);
}

/** Celsius-linear property y = a − b t (the form Jasper 1972 tabulates for surface tensions). */
export function linearInCelsius(
  intercept: number,
  slope: number,
  validRange: Range,
  source: Reference,
  note?: string,
): PropertyRecord {
  return withNote({ at: (temperature) => intercept - slope * (temperature - CELSIUS_ZERO), validRange, source }, note);
}

/**
 * Piecewise-linear interpolation through tabulated (T, y) points, sorted by
 * temperature; outside the table the end segments are extended linearly
 * (the record's valid range says where that is an extrapolation).
 */
export function tabulated(points: readonly (readonly [number, number])[]): (temperature: number) => number {
  if (points.length < 2) throw new Error('a table needs at least two points');
  return (temperature) => {
    let i = 1;
    while (i < points.length - 1 && temperature > points[i][0]) i++;
    const [t0, y0] = points[i - 1];
    const [t1, y1] = points[i];
    return y0 + ((y1 - y0) * (temperature - t0)) / (t1 - t0);
  };
}

/** Celsius-centred range celsius ± halfWidth, optionally floored (e.g. at a melting point), in kelvin. */
export function around(celsius: number, halfWidth: number, floor?: number): Range {
  const min = CELSIUS_ZERO + celsius - halfWidth;
  return { min: floor === undefined ? min : Math.max(min, floor), max: CELSIUS_ZERO + celsius + halfWidth };
}
