/**
 * Schemas of the design parts every calculation shares: texture, fluids and
 * flow. Composed from the quantity schemas; no field is defined twice.
 */
import { z } from './zod.js';
import {
  ContactAngle,
  Density,
  DynamicViscosity,
  FlowLength,
  FlowAngle,
  KinematicViscosity,
  Roughness,
  Salinity,
  ShearStress,
  SpecificHeat,
  SurfaceTension,
  Temperature,
  TextureLength,
  ThermalConductivity,
  Velocity,
} from './quantities.js';

export const TextureSchema = z
  .strictObject({
    grooveWidth: TextureLength.openapi({ description: 'Groove width w', example: '50 um' }),
    pitch: TextureLength.openapi({ description: 'Texture period P (groove + ridge)', example: '100 um' }),
    grooveDepth: TextureLength.openapi({ description: 'Groove depth d', example: '20 um' }),
    flowAngle: FlowAngle.optional().openapi({ description: 'Angle between the flow and the grooves, degrees (0 = along, default)' }),
  })
  .superRefine((t, ctx) => {
    if (t.grooveWidth >= t.pitch) {
      ctx.addIssue({
        code: 'custom',
        path: ['grooveWidth'],
        message: `groove width ${t.grooveWidth} m must be smaller than the pitch ${t.pitch} m (a ridge must remain)`,
      });
    }
  })
  .openapi('Texture', { description: 'Streamwise grooves: width, period, depth, and the angle of the flow to them' });

export type TextureInput = z.output<typeof TextureSchema>;

export const FluidSchema = z
  .strictObject({
    id: z.string().min(1).max(64).optional().openapi({ description: 'Catalogue id (GET /v1/fluids)', example: 'water' }),
    temperature: Temperature.optional().openapi({ description: 'Temperature (default: the catalogue reference temperature)' }),
    salinity: Salinity.optional(),
    density: Density.optional(),
    viscosity: DynamicViscosity.optional(),
    kinematicViscosity: KinematicViscosity.optional(),
    surfaceTension: SurfaceTension.optional().openapi({ description: 'Surface tension against air' }),
    surfaceTensionDispersive: SurfaceTension.optional().openapi({ description: 'Dispersive component of the surface tension (Fowkes)' }),
    interfacialTensionWater: SurfaceTension.optional().openapi({ description: 'Interfacial tension against water (lubricants)' }),
    thermalConductivity: ThermalConductivity.optional(),
    specificHeat: SpecificHeat.optional(),
  })
  .superRefine((f, ctx) => {
    if (f.id === undefined && f.density === undefined) {
      ctx.addIssue({ code: 'custom', path: ['density'], message: 'give a catalogue id or an explicit density' });
    }
    if (f.id === undefined && f.viscosity === undefined && f.kinematicViscosity === undefined) {
      ctx.addIssue({ code: 'custom', path: ['viscosity'], message: 'give a catalogue id or an explicit viscosity' });
    }
    if (f.viscosity !== undefined && f.kinematicViscosity !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['kinematicViscosity'], message: 'give viscosity or kinematicViscosity, not both' });
    }
  })
  .openapi('Fluid', {
    description: 'A fluid from the catalogue at a temperature, and/or explicit property values (explicit values override the catalogue)',
  });

export type FluidInput = z.output<typeof FluidSchema>;

export const FlowSchema = z
  .discriminatedUnion('kind', [
    z.strictObject({
      kind: z.literal('channel'),
      height: FlowLength.openapi({ description: 'Full height H of the plane channel', example: '10 mm' }),
      bulkVelocity: Velocity.openapi({ description: 'Bulk (mean) velocity U' }),
      texturedWalls: z.union([z.literal(1), z.literal(2)]).optional().openapi({ description: 'How many walls carry the texture (default 2)' }),
    }),
    z.strictObject({
      kind: z.literal('pipe'),
      diameter: FlowLength.openapi({ description: 'Pipe diameter D', example: '25 mm' }),
      bulkVelocity: Velocity.openapi({ description: 'Bulk (mean) velocity U' }),
      roughness: Roughness.optional(),
    }),
    z.strictObject({
      kind: z.literal('plate'),
      freeStreamVelocity: Velocity.openapi({ description: 'Free-stream velocity' }),
      distance: FlowLength.openapi({ description: 'Distance x from the leading edge', example: '0.5 m' }),
    }),
    z.strictObject({
      kind: z.literal('wall-shear'),
      wallShearStress: ShearStress.openapi({ description: 'Wall shear stress τ_w on a smooth wall' }),
      regime: z.enum(['laminar', 'transitional', 'turbulent']).optional().openapi({ description: 'Flow regime (default turbulent)' }),
    }),
  ])
  .openapi('Flow', { description: 'The flow over the wall, or the wall shear stress it imposes' });

export type FlowInput = z.output<typeof FlowSchema>;

/** Echo schema of a resolved fluid (normalised SI), for the OpenAPI document. */
export const FluidStateSchema = z
  .object({
    id: z.string(),
    name: z.string(),
    temperature: z.number().openapi({ description: 'K' }),
    density: z.number().openapi({ description: 'kg/m³' }),
    viscosity: z.number().openapi({ description: 'Pa·s' }),
    surfaceTension: z.number().optional().openapi({ description: 'N/m' }),
    surfaceTensionDispersive: z.number().optional().openapi({ description: 'N/m' }),
    interfacialTensionWater: z.number().optional().openapi({ description: 'N/m' }),
    thermalConductivity: z.number().optional().openapi({ description: 'W/(m·K)' }),
    specificHeat: z.number().optional().openapi({ description: 'J/(kg·K)' }),
    origins: z.record(z.string(), z.string()).openapi({ description: 'Where each value came from: catalogue source key or "input"' }),
  })
  .openapi('FluidState');

/** The design parts most calculations share: texture, the two liquids, the flow, and the interfacial tension. */
export const DesignShape = {
  texture: TextureSchema,
  lubricant: FluidSchema.openapi({ description: 'The lubricant held in the grooves' }),
  workingFluid: FluidSchema.openapi({ description: 'The liquid flowing over the surface' }),
  flow: FlowSchema,
  interfacialTension: SurfaceTension.optional().openapi({
    description: 'Lubricant–working-fluid interfacial tension; default: catalogue value against water, else the Fowkes estimate (with a warning)',
  }),
};

export const MethodSchema = z
  .enum(['auto', 'closed-form', 'field'])
  .optional()
  .openapi({ description: 'auto (default): closed form where its measured error is below 1 %, field solver elsewhere' });

export const ContactAnglesSchema = z
  .strictObject({
    underWorkingFluid: z
      .strictObject({
        advancing: ContactAngle.openapi({ description: 'Advancing angle of the lubricant on the flat solid under the working fluid, through the lubricant, degrees' }),
        receding: ContactAngle.openapi({ description: 'Receding angle, degrees' }),
        equilibrium: ContactAngle.optional().openapi({ description: 'Equilibrium (Young) angle, degrees; default from advancing and receding' }),
      })
      .superRefine((a, ctx) => {
        if (a.receding > a.advancing) ctx.addIssue({ code: 'custom', path: ['receding'], message: 'the receding angle cannot exceed the advancing angle' });
      })
      .optional(),
    inAir: z
      .strictObject({
        lubricant: ContactAngle.openapi({ description: 'Lubricant on the flat solid in air, degrees' }),
        workingFluid: ContactAngle.openapi({ description: 'Working fluid on the flat solid in air, degrees' }),
      })
      .optional(),
  })
  .openapi('ContactAngles', { description: 'Contact angles on the flat, untextured solid' });
