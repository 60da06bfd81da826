/**
 * Quantity strings: a number followed by a unit is read with the unit text parsed once (src/api/units.ts,
 * convertFast). Its value must be the one mathjs gives for the whole string, to the last bit after the 15-digit
 * rounding, because the inputs hash (which clients keep) is computed from it. The reference is mathjs itself
 * (a general-purpose units library, independent of our fast path), called on the whole string.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { create, all } from 'mathjs';
import { parseQuantity, UnitError } from '../../src/api/units.js';

const math = create(all);
math.createUnit('St', { definition: '1e-4 m^2/s', prefixes: 'short' });

/** mathjs on the whole string, rounded as the service rounds. */
function wholeString(text: string, siUnit: string): number {
  return Number(math.unit(text).toNumber(siUnit).toPrecision(15));
}

/** Unit spellings the service's schemas meet, with their SI unit: prefixes, compounds, powers and offset units. */
const UNITS: readonly (readonly [string, string])[] = [
  ['um', 'm'],
  ['mm', 'm'],
  ['km', 'm'],
  ['inch', 'm'],
  ['m/s', 'm/s'],
  ['km/h', 'm/s'],
  ['mN/m', 'N/m'],
  ['mPa*s', 'Pa*s'],
  ['cSt', 'm^2/s'],
  ['kg/m^3', 'kg/m^3'],
  ['g/cm^3', 'kg/m^3'],
  ['W/(m*K)', 'W/(m*K)'],
  ['J/(kg*K)', 'J/(kg*K)'],
  ['degC', 'K'],
  ['degF', 'K'],
  ['K', 'K'],
  ['Pa', 'Pa'],
  ['deg', 'deg'],
];

describe('quantity strings: number and unit', () => {
  it('equal mathjs on the whole string for any number and unit (seeded)', () => {
    const number = fc.oneof(
      fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }).map((x) => String(x)),
      fc.double({ min: 0, max: 1000, noNaN: true }).chain((x) => fc.integer({ min: 0, max: 9 }).map((digits) => x.toFixed(digits))),
      fc.tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: -30, max: 30 })).map(([m, e]) => `${m}e${e}`),
    );
    const space = fc.constantFrom('', ' ', '  ');
    fc.assert(
      fc.property(number, space, fc.constantFrom(...UNITS), (n, s, [unit, si]) => {
        const text = `${n}${s}${unit}`;
        expect(parseQuantity(text, si)).toBe(wholeString(text, si));
      }),
      { seed: 15_0002, numRuns: 2000, verbose: true },
    );
  });

  it('a known conversion: 2 inch = 0.0508 m (the inch is exactly 25.4 mm, International Yard and Pound Agreement of 1 July 1959)', () => {
    expect(parseQuantity('2 inch', 'm')).toBe(0.0508);
    expect(parseQuantity('2.5e1 inch', 'm')).toBe(0.635);
  });

  it('still refuses what the whole-string parse refuses, with its messages', () => {
    expect(() => parseQuantity('3 m/s', 'm')).toThrow(/wrong dimension/);
    expect(() => parseQuantity('3 furlongs-ish', 'm')).toThrow(UnitError);
    expect(() => parseQuantity('1e999 m', 'm')).toThrow(/not a finite quantity/);
    expect(() => parseQuantity('m', 'm')).toThrow(/no number/);
  });
});
