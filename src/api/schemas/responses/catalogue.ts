/** Responses of GET /v1/fluids and GET /v1/surfactants: the catalogues' one sourced-value shape. */
import { z } from '../zod.js';
import { ReferenceSchema } from './common.js';

export const CatalogueValueSchema = z
  .strictObject({
    value: z.number().openapi({ description: 'SI (fluids: at the reference temperature)' }),
    unit: z.string(),
    source: z.string().openapi({ description: 'Key of the source in the listing’s references' }),
    validRange: z.strictObject({ min: z.number(), max: z.number() }).optional().openapi({ description: 'Temperature range of the source, K (fluids)' }),
    note: z.string().optional().openapi({ description: 'e.g. "at 25 °C only"; a value recalled and not confirmed against its source says so here' }),
  })
  .openapi('CatalogueValue');

const value = CatalogueValueSchema.optional();

const ORIGIN = z
  .enum(['built-in', 'user'])
  .openapi({ description: 'built-in: the service’s own catalogue; user: an entry of the lab’s catalogue file (OILSKIN_CATALOGUE_FILE), its values the lab’s own' });

export const FluidListingSchema = z
  .strictObject({
    id: z.string(),
    name: z.string(),
    role: z.enum(['working-fluid', 'lubricant']),
    description: z.string(),
    freezingPoint: z.number().nullable().openapi({ description: 'K; null when the catalogue has no limit' }),
    boilingPoint: z.number().nullable().openapi({ description: 'K; null when the catalogue has no limit' }),
    referenceTemperature: z.number().openapi({ description: 'K' }),
    safety: z.string().nullable().openapi({ description: 'Handling and safety notes (flammability, decomposition); repeated in the `safety` list of every response that uses the fluid' }),
    origin: ORIGIN,
    properties: z.strictObject({
      density: value,
      viscosity: value,
      surfaceTension: value,
      surfaceTensionDispersive: value,
      interfacialTensionWater: value,
      thermalConductivity: value,
      specificHeat: value,
    }),
  })
  .openapi('FluidListing');

export const FluidsResponse = z.strictObject({ fluids: z.array(FluidListingSchema), references: z.array(ReferenceSchema) }).openapi('FluidsResponse');

const adsorption = z.strictObject({
  maximumSurfaceExcess: value,
  langmuirConstant: value,
  adsorptionRate: value,
  desorptionRate: value,
  surfaceDiffusivity: value,
  gibbsPrefactor: value,
});

export const SurfactantListingSchema = z
  .strictObject({
    id: z.string(),
    name: z.string(),
    kind: z.enum(['anionic', 'cationic', 'nonionic']),
    description: z.string(),
    bulkDiffusivity: value,
    criticalMicelleConcentration: value,
    molarMass: value,
    safety: z.string().nullable().openapi({ description: 'Handling and safety notes; repeated in the `safety` list of every response that uses the surfactant' }),
    origin: ORIGIN,
    interfaces: z.strictObject({ 'air-water': adsorption.optional(), 'oil-water': adsorption.optional() }).openapi({ description: 'Adsorption data per interface type' }),
  })
  .openapi('SurfactantListing');

export const SurfactantsResponse = z
  .strictObject({ surfactants: z.array(SurfactantListingSchema), references: z.array(ReferenceSchema) })
  .openapi('SurfactantsResponse');
