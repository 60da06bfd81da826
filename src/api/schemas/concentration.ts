/**
 * Surfactant concentrations as people write them: molar (a JSON number in
 * mol/m³, or "0.1 mM"), mass per volume ("1 mg/L") or mass fraction in the
 * working fluid ("1 ppm" = 1 mg/kg, "250 ppb", "2 mg/kg").
 *
 * The leaf schema reads the string and keeps which kind it is; the design
 * document's transform then converts mass concentrations to molar ones with
 * the surfactant's molar mass M (the document's `molarMass`, else the
 * catalogue's), so the physics only ever sees mol/m³:
 *   c = ρ_m / M                 (mass per volume ρ_m, kg/m³)
 *   c = w · ρ_wf / M            (mass fraction w, working-fluid density ρ_wf)
 * ρ_wf is the working fluid's density as the calculation will use it (given,
 * or the catalogue's at the document's temperature); when none can be had, a
 * nominal 1000 kg/m³ (1 kg/L; common practice, no source), and the response
 * says which was used. Each conversion is recorded as an assumption for the
 * response (concentrationNotes).
 */
import { catalogue } from '../../materials/lookup.js';
import { getSurfactant } from '../../materials/surfactants.js';
import { parseQuantityAs, UnitError } from '../units.js';
import { z } from './zod.js';
import { Concentration, MassConcentration } from './quantities.js';

/** A concentration given by mass, before the molar mass is known. */
export interface MassConcentrationGiven {
  /** per-volume: kg/m³; fraction: kg/kg. */
  basis: 'per-volume' | 'fraction';
  value: number;
  /** As the client wrote it, for the response's note. */
  text: string;
}

export type SurfactantConcentrationValue = number | MassConcentrationGiven;

/** Density of water used for a mass fraction when the working fluid's is unknown, kg/m³ (1 kg/L; common practice, no source). */
export const NOMINAL_WATER_DENSITY = 1000;

const ACCEPTED =
  'give a molar concentration (a number in mol/m³, or e.g. "0.1 mM"), a mass concentration (e.g. "1 mg/L") or a mass fraction in the working fluid (e.g. "1 ppm" = 1 mg/kg); ' +
  "mass concentrations are converted with the surfactant's molar mass";

function forward(result: z.ZodSafeParseResult<number>, ctx: z.RefinementCtx): number {
  if (result.success) return result.data;
  for (const issue of result.error.issues) ctx.addIssue({ code: 'custom', message: issue.message });
  return z.NEVER;
}

/** A surfactant concentration: molar, or by mass (converted by the design document's transform). */
export const SurfactantConcentration = z
  .union([z.number(), z.string()])
  .transform((raw, ctx): SurfactantConcentrationValue => {
    if (typeof raw === 'number') return forward(Concentration.safeParse(raw), ctx);
    let parsed: { unit: 'mol/m^3' | 'kg/m^3' | 'kg/kg'; value: number };
    try {
      parsed = parseQuantityAs(raw, ['mol/m^3', 'kg/m^3', 'kg/kg'] as const);
    } catch (error) {
      ctx.addIssue({ code: 'custom', message: `${error instanceof UnitError ? error.message : 'unreadable quantity'}; ${ACCEPTED}` });
      return z.NEVER;
    }
    if (parsed.unit === 'mol/m^3') return forward(Concentration.safeParse(parsed.value), ctx);
    if (parsed.unit === 'kg/m^3') return { basis: 'per-volume', value: forward(MassConcentration.safeParse(parsed.value), ctx), text: raw };
    if (!(parsed.value >= 0 && parsed.value < 1)) {
      ctx.addIssue({ code: 'custom', message: `mass fraction ${parsed.value} ("${raw}") is outside [0, 1)` });
      return z.NEVER;
    }
    return { basis: 'fraction', value: parsed.value, text: raw };
  })
  .openapi({
    description:
      'Surfactant concentration [mol/m³; ≥ 0, ≤ 10000]. A string may be molar ("0.1 mM"), a mass concentration ("1 mg/L") or a mass fraction in the working fluid ("1 ppm" = 1 mg/kg, "250 ppb"); mass concentrations are converted with the molar mass (surfactant.molarMass, else the catalogue’s), a mass fraction also with the working fluid’s density.',
    example: '1 mg/L',
  });

/** The parts of the parsed document the conversion reads. */
interface WorkingFluidPart {
  id?: string;
  temperature?: number;
  salinity?: number;
  density?: number;
}
interface SurfactantPart {
  id?: string;
  name?: string;
  molarMass?: number;
  criticalMicelleConcentration?: SurfactantConcentrationValue;
}
interface WaterQualityPart<S extends SurfactantPart> {
  surfactant: S;
  bulkConcentration: SurfactantConcentrationValue | SurfactantConcentrationValue[];
}

type MolarSurfactant<S extends SurfactantPart> = Omit<S, 'molarMass' | 'criticalMicelleConcentration'> & { criticalMicelleConcentration?: number };
type MolarDesign<D> = D extends { waterQuality?: WaterQualityPart<infer S> }
  ? Omit<D, 'waterQuality'> & { waterQuality?: { surfactant: MolarSurfactant<S>; bulkConcentration: number | number[] } }
  : D;

const NOTES = new WeakMap<object, readonly string[]>();

/** The unit conversions made while parsing this document (assumptions for the response). */
export function concentrationNotes(document: object): readonly string[] {
  return NOTES.get(document) ?? [];
}

function workingFluidDensity(fluid: WorkingFluidPart | undefined): { value: number; said: string } {
  if (fluid?.density !== undefined) return { value: fluid.density, said: 'the working fluid density given' };
  if (fluid?.id !== undefined) {
    try {
      const { id, temperature, salinity } = fluid;
      const state = catalogue.fluid(
        { id, ...(temperature === undefined ? {} : { temperature }), ...(salinity === undefined ? {} : { salinity }) },
        'workingFluid',
      );
      return { value: state.density, said: `the density of ${state.name} at ${state.temperature} K (${state.origins.density ?? 'catalogue'})` };
    } catch {
      // The calculation reports the working fluid's own problem; the nominal density below only keeps the parse going.
    }
  }
  return { value: NOMINAL_WATER_DENSITY, said: 'a nominal 1 kg/L (no working fluid density known)' };
}

/**
 * Transform of the design document: every surfactant concentration to mol/m³,
 * `molarMass` removed (the models take molar values only). A mass
 * concentration without a molar mass is an issue at
 * `waterQuality.surfactant.molarMass`.
 */
export function molarConcentrations<D extends { workingFluid?: WorkingFluidPart; waterQuality?: WaterQualityPart<SurfactantPart> }>(
  design: D,
  ctx: z.RefinementCtx,
): MolarDesign<D> {
  const water = design.waterQuality;
  if (water === undefined) return design as MolarDesign<D>;
  const { molarMass: givenMolarMass, criticalMicelleConcentration: givenCmc, ...surfactant } = water.surfactant;
  const notes: string[] = [];
  let missing = false;
  const convert = (value: SurfactantConcentrationValue, path: string): number => {
    if (typeof value === 'number') return value;
    const entry = surfactant.id === undefined ? undefined : getSurfactant(surfactant.id);
    const molarMass = givenMolarMass ?? entry?.molarMass?.value;
    if (molarMass === undefined) {
      if (!missing) {
        const whose = surfactant.id === undefined ? 'a surfactant given by its values' : entry ? `"${surfactant.id}" in the catalogue` : `the unknown surfactant "${surfactant.id}"`;
        ctx.addIssue({
          code: 'custom',
          path: ['waterQuality', 'surfactant', 'molarMass'],
          message: `${path} "${value.text}" is a mass concentration: converting it to mol/m³ needs the molar mass, which is not known for ${whose}; give waterQuality.surfactant.molarMass (e.g. "288.38 g/mol") or a molar concentration`,
        });
        missing = true;
      }
      return 0;
    }
    const massSource = givenMolarMass !== undefined ? 'given' : `${entry?.molarMass?.source.key}`;
    const massText = `molar mass ${(molarMass * 1000).toPrecision(5)} g/mol (${massSource})`;
    let molar: number;
    if (value.basis === 'per-volume') {
      molar = value.value / molarMass;
      notes.push(`${path}: "${value.text}" converted to ${molar.toPrecision(5)} mol/m³ with the ${massText}.`);
    } else {
      const density = workingFluidDensity(design.workingFluid);
      molar = (value.value * density.value) / molarMass;
      notes.push(
        `${path}: "${value.text}" read as a mass fraction and converted to ${molar.toPrecision(5)} mol/m³ with ${density.said}, ${density.value.toPrecision(5)} kg/m³, and the ${massText}.`,
      );
    }
    return molar;
  };
  const bulk = water.bulkConcentration;
  const bulkConcentration = Array.isArray(bulk)
    ? bulk.map((v, i) => convert(v, `waterQuality.bulkConcentration[${i}]`))
    : convert(bulk, 'waterQuality.bulkConcentration');
  const cmc = givenCmc === undefined ? undefined : convert(givenCmc, 'waterQuality.surfactant.criticalMicelleConcentration');
  if (missing) return z.NEVER;
  const out = {
    ...design,
    waterQuality: { ...water, surfactant: { ...surfactant, ...(cmc === undefined ? {} : { criticalMicelleConcentration: cmc }) }, bulkConcentration },
  };
  if (notes.length > 0) NOTES.set(out, notes);
  return out as unknown as MolarDesign<D>;
}
