/**
 * The schema of a user catalogue file: a lab's own lubricants, working fluids
 * and surfactants (README, "Adding your own fluids"). Every value goes
 * through the same quantity schemas as the fluid and surfactant values of a
 * design document (units, bounds), and the entries have the shape of the
 * built-in records (src/materials/types.ts, src/materials/surfactants.ts); a
 * test passes every built-in entry, written in this format, through it.
 * The parsed output is SI, ready for src/materials/user-catalogue.ts.
 */
import type { UserCatalogueData } from '../../materials/user-catalogue.js';
import { z } from './zod.js';
import {
  AdsorptionRate,
  Concentration,
  Density,
  DesorptionRate,
  Diffusivity,
  DynamicViscosity,
  GibbsPrefactor,
  KinematicViscosity,
  LangmuirConstant,
  MolarMass,
  SpecificHeat,
  SurfaceExcess,
  SurfaceTension,
  Temperature,
  ThermalConductivity,
  quantity,
} from './quantities.js';

/** A fluid's freezing or boiling limit: a temperature, with room for liquid metals (gallium boils near 2500 K). */
const LimitTemperature = quantity({
  quantity: 'temperature',
  siUnit: 'K',
  unitLabel: 'K',
  min: 0,
  minInclusive: false,
  max: 10_000,
  description: 'Freezing or boiling limit of the fluid; a number is kelvin',
  example: '-40 degC',
});

const text = (max: number) => z.string().trim().min(1).max(max);

export const UserSourceSchema = z.strictObject({
  citation: text(1000).describe('Where the values come from: a paper, a handbook table, or the lab’s own measurement (instrument, notebook, date)'),
  doi: text(200).optional(),
});

/** Lowercase generic ids, as the built-in catalogue's (never a trade name). */
const EntryId = z
  .string()
  .regex(/^[a-z0-9][a-z0-9.-]{0,63}$/, 'an id is 1–64 lowercase letters, digits, dots or hyphens, starting with a letter or digit');

const TemperatureRange = z
  .strictObject({ min: Temperature, max: Temperature })
  .refine((r) => r.min <= r.max, { message: 'min must not exceed max', path: ['max'] });

type Quantity = typeof Density;

/** A fluid property: a bare quantity (a constant), or { value | table, validRange?, source?, note? }. */
function fluidProperty(quantity: Quantity) {
  const detailed = z
    .strictObject({
      value: quantity.optional(),
      table: z
        .array(z.tuple([Temperature, quantity]))
        .min(2)
        .max(200)
        .optional()
        .describe('[temperature, value] pairs, at least two'),
      validRange: TemperatureRange.optional(),
      source: UserSourceSchema.optional(),
      note: text(500).optional(),
    })
    .superRefine((p, ctx) => {
      if ((p.value === undefined) === (p.table === undefined)) ctx.addIssue({ code: 'custom', path: ['value'], message: 'give either value or table' });
      if (p.table !== undefined && new Set(p.table.map(([t]) => t)).size !== p.table.length) {
        ctx.addIssue({ code: 'custom', path: ['table'], message: 'the table repeats a temperature' });
      }
    });
  return z.union([quantity.transform((value) => ({ value })), detailed]);
}

/** A surfactant value: a bare quantity, or { value, source?, note? }. */
function surfactantValue(quantity: Quantity) {
  return z.union([
    quantity.transform((value) => ({ value })),
    z.strictObject({ value: quantity, source: UserSourceSchema.optional(), note: text(500).optional() }),
  ]);
}

export const UserFluidSchema = z
  .strictObject({
    id: EntryId,
    name: text(200).describe('A generic chemical description, e.g. "poly-alpha-olefin, 6 cSt"'),
    role: z.enum(['working-fluid', 'lubricant']),
    description: text(2000),
    source: UserSourceSchema,
    referenceTemperature: Temperature.describe('Temperature of the listing, and the default of a request that gives none'),
    freezingPoint: LimitTemperature.optional(),
    boilingPoint: LimitTemperature.optional(),
    safety: text(2000).optional().describe('Flammability, decomposition, handling: repeated in every response that uses the fluid'),
    properties: z.strictObject({
      density: fluidProperty(Density),
      viscosity: fluidProperty(DynamicViscosity).optional(),
      kinematicViscosity: fluidProperty(KinematicViscosity).optional(),
      surfaceTension: fluidProperty(SurfaceTension).optional(),
      surfaceTensionDispersive: fluidProperty(SurfaceTension).optional(),
      interfacialTensionWater: fluidProperty(SurfaceTension).optional(),
      thermalConductivity: fluidProperty(ThermalConductivity).optional(),
      specificHeat: fluidProperty(SpecificHeat).optional(),
    }),
  })
  .superRefine((f, ctx) => {
    if ((f.properties.viscosity === undefined) === (f.properties.kinematicViscosity === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['properties', 'viscosity'], message: 'give viscosity or kinematicViscosity (one of them)' });
    }
    if (f.freezingPoint !== undefined && f.freezingPoint >= f.referenceTemperature) {
      ctx.addIssue({ code: 'custom', path: ['freezingPoint'], message: 'the freezing point must lie below the reference temperature' });
    }
    if (f.boilingPoint !== undefined && f.boilingPoint <= f.referenceTemperature) {
      ctx.addIssue({ code: 'custom', path: ['boilingPoint'], message: 'the boiling point must lie above the reference temperature' });
    }
  });

const AdsorptionSchema = z.strictObject({
  maximumSurfaceExcess: surfactantValue(SurfaceExcess).optional(),
  langmuirConstant: surfactantValue(LangmuirConstant).optional(),
  adsorptionRate: surfactantValue(AdsorptionRate).optional(),
  desorptionRate: surfactantValue(DesorptionRate).optional(),
  surfaceDiffusivity: surfactantValue(Diffusivity).optional(),
  gibbsPrefactor: surfactantValue(GibbsPrefactor).optional(),
});

export const UserSurfactantSchema = z.strictObject({
  id: EntryId,
  name: text(200),
  kind: z.enum(['anionic', 'cationic', 'nonionic']),
  description: text(2000),
  source: UserSourceSchema,
  safety: text(2000).optional(),
  molarMass: surfactantValue(MolarMass).optional(),
  bulkDiffusivity: surfactantValue(Diffusivity).optional(),
  criticalMicelleConcentration: surfactantValue(Concentration).optional(),
  interfaces: z.strictObject({ 'air-water': AdsorptionSchema.optional(), 'oil-water': AdsorptionSchema.optional() }),
});

/** The whole file; `file` and `sha256` are added by the reader. */
export const UserCatalogueFileSchema = z.strictObject({
  title: text(200).optional(),
  fluids: z.array(UserFluidSchema).max(500).optional(),
  surfactants: z.array(UserSurfactantSchema).max(500).optional(),
});

/** Compile-time check: the parsed file is the materials layer's data shape. */
type Parsed = z.output<typeof UserCatalogueFileSchema>;
type _FileMatchesData = Required<Pick<Parsed, 'fluids' | 'surfactants'>> extends Pick<UserCatalogueData, 'fluids' | 'surfactants'> ? true : never;
export const USER_CATALOGUE_SCHEMA_MATCHES_DATA: _FileMatchesData = true;
