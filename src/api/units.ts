/**
 * Parsing of quantity strings typed by people ("30 um", "52 mN/m", "20 degC",
 * "3.4 mPa.s", "10 cSt") into SI numbers, with mathjs's unit system doing the
 * conversion and the dimension check.
 */
import { create, all, type Unit } from 'mathjs';

const math = create(all);
// Units the trade uses that mathjs lacks: the stokes (kinematic viscosity),
// molar concentration (M = mol/L), and parts per million / billion, read as
// mass fractions (the water-quality convention: 1 ppm = 1 mg/kg).
math.createUnit('St', { definition: '1e-4 m^2/s', prefixes: 'short' });
math.createUnit('M', { definition: '1 mol/L', prefixes: 'short' });
math.createUnit('ppm', { definition: '1e-6 kg/kg' });
math.createUnit('ppb', { definition: '1e-9 kg/kg' });

export class UnitError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UnitError';
  }
}

/** A readable quantity whose dimension is not the one asked for. */
export class DimensionError extends UnitError {
  constructor(message: string) {
    super(message);
    this.name = 'DimensionError';
  }
}

/** Normalise the spellings people type into mathjs syntax. */
function normalise(text: string): string {
  return text
    .trim()
    .replace(/[µμ]/g, 'u')
    .replace(/°\s*C\b/g, 'degC')
    .replace(/°\s*F\b/g, 'degF')
    .replace(/°/g, 'deg')
    .replace(/[·⋅×]/g, '*')
    .replace(/(?<=[A-Za-z])\.(?=[A-Za-z])/g, '*')
    .replace(/²/g, '^2')
    .replace(/³/g, '^3')
    .replace(/−/g, '-');
}

/**
 * Convert a quantity string to a number in the SI unit `siUnit` (a mathjs unit
 * expression such as "m", "N/m", "Pa*s", "K"). Throws {@link UnitError} with a
 * person-readable reason for an unknown unit, a missing number or a wrong
 * dimension.
 */
export function parseQuantity(text: string, siUnit: string): number {
  if (text.length > 100) throw new UnitError('quantity string is longer than 100 characters');
  const key = `${siUnit}|${text}`;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const value = convert(text, siUnit);
  // Engineers repeat the same few strings ("50 um", "20 degC"): a bounded memo saves the parser.
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, value);
  return value;
}

/**
 * Convert a quantity string to the first of several SI units whose dimension
 * it has (a surfactant concentration may be molar, mass per volume or a mass
 * fraction). A bare number in a string takes the first unit. Throws
 * {@link UnitError} when it is unreadable or fits none of them.
 */
export function parseQuantityAs<Unit extends string>(text: string, siUnits: readonly Unit[]): { unit: Unit; value: number } {
  for (const unit of siUnits) {
    try {
      return { unit, value: parseQuantity(text, unit) };
    } catch (error) {
      if (!(error instanceof DimensionError)) throw error;
    }
  }
  throw new DimensionError(`"${text}" has the wrong dimension: expected a quantity convertible to ${siUnits.join(' or ')}`);
}

const CACHE_LIMIT = 10_000;
const cache = new Map<string, number>();

/**
 * A number followed by a unit, the way people type a quantity. The number is the one mathjs's unit parser reads
 * (optional sign, digits with at most one dot, an exponent only when digits follow it), so "4e3 m" and "4 erg" split as
 * mathjs splits them.
 */
const NUMBER_THEN_UNIT = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([A-Za-z].*)$/s;

/** A unit text read once (its dimension checked against the SI unit), for every number typed before it. */
interface UnitReading {
  unit: Unit;
  si: Unit;
  /**
   * mathjs's own conversion factors, for a unit without an offset against the SI unit: the value in SI is
   * x·in[0]·in[1]·…/out[0]/out[1]/…, the products and quotients mathjs forms in the same order (normalising
   * into base units, then denormalising into the SI unit), so the number is the one its Unit objects give,
   * bit for bit, without building them. Null where offsets differ (degC, degF): the Unit path then converts.
   */
  factors: { into: number[]; outOf: number[] } | null;
}

/** The factor (value × prefix)^power mathjs multiplies by for each part of a unit (its _normalize applied to 1 per part). */
function partFactors(unit: Unit): number[] {
  const parts = (unit as unknown as { units: unknown[] }).units;
  const normalise = (unit as unknown as { _normalize: (this: { units: unknown[] }, value: number) => number })._normalize;
  return parts.map((part) => normalise.call({ units: [part] }, 1));
}

/** Whether mathjs's conversion of `unit` into `si` is the plain ratio of normalised values (no offset to adjust). */
function withoutOffset(unit: Unit, si: Unit): boolean {
  const parts = (u: Unit) => (u as unknown as { units: { unit: { offset: number } }[] }).units;
  const derived = (u: Unit) => (u as unknown as { _isDerived: () => boolean })._isDerived();
  const a = parts(unit);
  const b = parts(si);
  return derived(unit) || a.length === 0 || b.length === 0 || a[0].unit.offset === b[0].unit.offset;
}
/** mathjs's Unit constructor also takes a valueless Unit for the unit (a copy of it is made); its types list only a name. */
const UnitOfReading = math.Unit as unknown as new (value: number, valuelessUnit: Unit) => Unit;
const UNIT_READINGS_LIMIT = 1_000;
const unitReadings = new Map<string, UnitReading | null>();

/** The reading of a unit text in an SI unit, or null when it is not one mathjs reads with that dimension. */
function unitReading(unitText: string, siUnit: string): UnitReading | null {
  const key = `${siUnit}|${unitText}`;
  let reading = unitReadings.get(key);
  if (reading === undefined) {
    try {
      const unit = math.unit(unitText);
      const si = math.unit(siUnit);
      reading = unit.value === null && unit.equalBase(si) ? { unit, si, factors: withoutOffset(unit, si) ? { into: partFactors(unit), outOf: partFactors(si) } : null } : null;
    } catch {
      reading = null;
    }
    if (unitReadings.size >= UNIT_READINGS_LIMIT) unitReadings.clear();
    unitReadings.set(key, reading);
  }
  return reading;
}

/**
 * "0.512 m/s": the number with the unit text read once. The arithmetic is mathjs's own (its conversion factors in
 * its order, {@link UnitReading}; a Unit built from the number where offsets differ), so the value is the one the
 * whole-string parse gives — the inputs hash depends on it — without parsing the string again (a new number in a
 * design otherwise costs some 40 µs; building the Units alone cost about 28 µs per request in a server profile). Undefined when the text is not of that form, or anything fails: the whole-string
 * parse then decides, with its messages.
 */
function convertFast(normalised: string, siUnit: string): number | undefined {
  const parts = NUMBER_THEN_UNIT.exec(normalised);
  if (parts === null) return undefined;
  const reading = unitReading(parts[2]!, siUnit);
  if (reading === null) return undefined;
  let value: number;
  if (reading.factors === null) {
    value = new UnitOfReading(parseFloat(parts[1]!), reading.unit).to(reading.si).toNumber();
  } else {
    value = parseFloat(parts[1]!);
    for (const f of reading.factors.into) value *= f;
    for (const f of reading.factors.outOf) value /= f;
  }
  return Number.isFinite(value) ? Number(value.toPrecision(15)) : undefined;
}

function convert(text: string, siUnit: string): number {
  const normalised = normalise(text);
  const fast = convertFast(normalised, siUnit);
  if (fast !== undefined) return fast;
  let unit: Unit;
  try {
    unit = math.unit(normalised);
  } catch (error) {
    // A bare number in a string is SI, like a JSON number.
    const n = Number(normalised);
    if (normalised !== '' && Number.isFinite(n)) return n;
    throw new UnitError(`cannot read "${text}" as a quantity: ${(error as Error).message}`);
  }
  if (unit.value === null) throw new UnitError(`"${text}" has a unit but no number`);
  const reference = math.unit(siUnit);
  if (!unit.equalBase(reference)) {
    throw new DimensionError(`"${text}" has the wrong dimension: expected a quantity convertible to ${siUnit}`);
  }
  const value = unit.toNumber(siUnit);
  if (!Number.isFinite(value)) throw new UnitError(`"${text}" is not a finite quantity`);
  // Strip binary noise from prefix scaling (30 um → 3e-5, not 2.9999999999999997e-5).
  return Number(value.toPrecision(15));
}
