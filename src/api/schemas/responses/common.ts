/**
 * The parts every calculation response shares: warnings, references,
 * provenance, the verdict, the sourced value, the echo of the normalised
 * design, and the envelope around a result. Response schemas are strict, so
 * a field the code returns but the schema does not list fails the tests that
 * parse real responses; fastify serialises responses with them.
 */
import { MODEL_IDS } from '../../../core/models.js';
import { z } from '../zod.js';

/** A number with its description (unit in words). */
export const num = (description: string) => z.number().openapi({ description });
/** A number that is null where the quantity is undefined or not evaluated. */
export const numOrNull = (description: string) => z.number().nullable().openapi({ description });

export const WarningSchema = z
  .strictObject({
    code: z.string().openapi({ description: 'Stable machine-readable code' }),
    severity: z.enum(['info', 'caution', 'warning']),
    message: z.string(),
  })
  .openapi('Warning');

export const ReferenceSchema = z.strictObject({ key: z.string(), citation: z.string(), doi: z.string().optional() }).openapi('Reference');

export const ProvenanceSchema = z
  .strictObject({
    service: z.string(),
    version: z.string(),
    models: z.array(z.enum(MODEL_IDS)).openapi({ description: 'Identifiers of the models that produced the result (registry: src/physics/design/models.ts)' }),
    inputsHash: z.string().openapi({ description: 'SHA-256 of the canonical JSON of the normalised inputs' }),
    computeMs: z.number().openapi({ description: 'Compute time of the calculation, ms' }),
    userCatalogue: z
      .strictObject({
        file: z.string().openapi({ description: 'File name of the user catalogue (OILSKIN_CATALOGUE_FILE or --catalogue)' }),
        sha256: z.string().openapi({ description: 'SHA-256 of the file as read at start-up' }),
        entries: z.array(z.string()).openapi({ description: 'Ids of the user entries this response used' }),
      })
      .optional()
      .openapi({ description: 'Present when the calculation used an entry of the user catalogue' }),
  })
  .openapi('Provenance');

export const SafetyNoteSchema = z
  .strictObject({
    id: z.string().openapi({ description: 'Catalogue id of the fluid or surfactant' }),
    name: z.string(),
    parts: z.array(z.enum(['lubricant', 'workingFluid', 'waterQuality.surfactant'])).openapi({ description: 'Where the design uses it' }),
    origin: z.enum(['built-in', 'user']).openapi({ description: 'built-in catalogue, or the lab’s user catalogue' }),
    note: z.string().openapi({ description: 'Flammability, decomposition, handling, as the catalogue states them; the product’s own safety data sheet and local rules govern' }),
  })
  .openapi('SafetyNote');

export const VerdictSchema = z
  .strictObject({
    passes: z.boolean().openapi({ description: 'The answer to the yes/no question' }),
    margin: z.number().openapi({ description: 'Dimensionless reserve: positive exactly when the design passes, 0 on the boundary, negative beyond it (definition in criterion)' }),
    criterion: z.string().openapi({ description: 'What was compared and how the margin is defined, in words' }),
  })
  .openapi('Verdict');

export const SourcedNumberSchema = z
  .strictObject({
    value: z.number(),
    source: z.string().openapi({ description: 'Where the value came from: a reference key, "input", or the estimate that produced it' }),
  })
  .openapi('SourcedNumber');

const sourced = SourcedNumberSchema.optional();

export const FluidEchoSchema = z
  .strictObject({
    id: z.string().openapi({ description: 'Catalogue id, or "custom"' }),
    name: z.string(),
    temperature: num('K'),
    density: sourced.openapi({ description: 'kg/m³' }),
    viscosity: sourced.openapi({ description: 'Pa·s' }),
    surfaceTension: sourced.openapi({ description: 'N/m' }),
    surfaceTensionDispersive: sourced.openapi({ description: 'N/m' }),
    interfacialTensionWater: sourced.openapi({ description: 'N/m' }),
    thermalConductivity: sourced.openapi({ description: 'W/(m·K)' }),
    specificHeat: sourced.openapi({ description: 'J/(kg·K)' }),
    solubility: z.number().optional().openapi({ description: 'Lubricant: saturation solubility in the working fluid, kg/m³' }),
  })
  .openapi('FluidEcho', { description: 'A resolved fluid: every property value with its source' });

const angles = z.strictObject({ advancing: z.number(), receding: z.number(), equilibrium: z.number().optional() });

export const DesignEchoSchema = z
  .strictObject({
    texture: z
      .strictObject({
        grooveWidth: num('m'),
        pitch: num('m'),
        grooveDepth: num('m'),
        flowAngle: num('degrees'),
        grooveLength: num('m').optional(),
        segmentLength: num('m').optional(),
        grooveEnds: z.enum(['open', 'closed']).optional(),
      })
      .optional(),
    lubricant: FluidEchoSchema.optional(),
    workingFluid: FluidEchoSchema.optional(),
    interfacialTension: SourcedNumberSchema.optional().openapi({ description: 'N/m and its source: input, catalogue or fowkes-estimate' }),
    contactAngles: z.strictObject({ underWorkingFluid: angles.optional(), inAir: z.strictObject({ lubricant: z.number(), workingFluid: z.number() }).optional() }).optional(),
    flow: z
      .strictObject({
        kind: z.enum(['channel', 'pipe', 'plate', 'wall-shear']),
        height: z.number().optional(),
        bulkVelocity: z.number().optional(),
        texturedWalls: z.number().optional(),
        diameter: z.number().optional(),
        roughness: z.number().optional(),
        freeStreamVelocity: z.number().optional(),
        distance: z.number().optional(),
        wallShearStress: z.number().optional(),
        regime: z.enum(['laminar', 'transitional', 'turbulent']).optional(),
      })
      .optional()
      .openapi({ description: 'The flow as given, SI' }),
    orientation: z
      .strictObject({ inclination: z.number(), facing: z.enum(['up', 'down']).optional(), downslope: z.enum(['with-flow', 'against-flow', 'across-grooves']).optional() })
      .optional(),
    waterQuality: z
      .strictObject({
        surfactant: z.strictObject({ id: z.string(), name: z.string(), interfaceType: z.enum(['air-water', 'oil-water']) }),
        bulkConcentration: z.union([z.number(), z.array(z.number())]),
      })
      .optional(),
    solid: z.strictObject({ thermalConductivity: z.number(), substrateThickness: z.number() }).optional(),
    heating: z.strictObject({ condition: z.enum(['uniform-flux', 'uniform-temperature']), heatedWalls: z.enum(['one', 'both']) }).optional(),
    options: z
      .strictObject({
        method: z.enum(['auto', 'closed-form', 'field']).optional(),
        surfactantMethod: z.enum(['scaling', 'solver', 'auto']).optional(),
        duration: z.number().optional(),
        initialFill: z.number().optional(),
        targetFill: z.number().optional(),
        map: z.boolean().optional(),
        mapResolution: z.number().optional(),
        sensitivity: z.strictObject({ points: z.number() }).optional(),
      })
      .optional()
      .openapi({ description: 'The options in effect, defaults filled in' }),
  })
  .openapi('DesignEcho', { description: 'The parts of the design the calculation used, after unit conversion and catalogue look-up (SI)' });

/** The response of one calculation: its result (and verdict) in the common envelope. */
export function envelopeSchema(name: string, result: z.ZodType, verdict = false) {
  return z
    .strictObject({
      inputs: DesignEchoSchema,
      result,
      ...(verdict ? { verdict: VerdictSchema } : {}),
      warnings: z.array(WarningSchema),
      assumptions: z.array(z.string()),
      references: z.array(ReferenceSchema),
      safety: z.array(SafetyNoteSchema).openapi({ description: 'Safety notes of the catalogue fluids and surfactants the calculation used, one per entry' }),
      provenance: ProvenanceSchema,
    })
    .openapi(name);
}
