/**
 * The design document: one schema for a design and its service conditions,
 * accepted whole by every calculation endpoint. Strict at every level (an
 * unknown field is a 422, so a typo is never silently ignored); every part is
 * optional here, and each endpoint names the parts its question needs
 * (422 "missing required property"). Composed from the quantity schemas of
 * ./quantities.ts; its parsed output is the physics' DesignDocument.
 */
import type { DesignDocument } from '../../physics/design/document.js';
import { z } from './zod.js';
import {
  AdsorptionRate,
  ContactAngle,
  Density,
  DesorptionRate,
  Diffusivity,
  Duration,
  DynamicViscosity,
  FlowAngle,
  FlowLength,
  Fraction,
  GibbsPrefactor,
  KinematicViscosity,
  LangmuirConstant,
  MassConcentration,
  MolarMass,
  Roughness,
  Salinity,
  ShearStress,
  SpecificHeat,
  SurfaceExcess,
  SurfaceTension,
  Temperature,
  TextureLength,
  ThermalConductivity,
  Velocity,
  WallInclination,
} from './quantities.js';
import { molarConcentrations, SurfactantConcentration } from './concentration.js';

const catalogueId = (what: string, listing: string, example: string) =>
  z.string().min(1).max(64).openapi({ description: `Catalogue id of the ${what} (${listing})`, example });

export const TextureSchema = z
  .strictObject({
    grooveWidth: TextureLength.openapi({ description: 'Groove width w', example: '50 um' }),
    pitch: TextureLength.openapi({ description: 'Texture period P (groove + ridge)', example: '100 um' }),
    grooveDepth: TextureLength.openapi({ description: 'Groove depth d', example: '20 um' }),
    flowAngle: FlowAngle.optional().openapi({ description: 'Angle between the flow and the grooves, degrees (0 = along, default)' }),
    grooveLength: FlowLength.optional().openapi({ description: 'Total length of the grooves along the flow (retention; finite grooves in the surfactant model)', example: '20 mm' }),
    segmentLength: FlowLength.optional().openapi({ description: 'Barrier spacing when the grooves are cut into segments', example: '2 mm' }),
    grooveEnds: z.enum(['open', 'closed']).optional().openapi({ description: 'Whether lubricant can leave at the downstream end (default open); closed or segmented grooves recirculate their lubricant' }),
  })
  .superRefine((t, ctx) => {
    if (t.grooveWidth >= t.pitch) {
      ctx.addIssue({ code: 'custom', path: ['grooveWidth'], message: `groove width ${t.grooveWidth} m must be smaller than the pitch ${t.pitch} m (a ridge must remain)` });
    }
  })
  .openapi('Texture', { description: 'Grooves: width, period, depth, the angle of the flow to them, their length and ends' });

const fluidProperties = {
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
};

function checkFluid(f: { id?: string; density?: number; viscosity?: number; kinematicViscosity?: number }, ctx: z.RefinementCtx): void {
  if (f.id === undefined && f.density === undefined) ctx.addIssue({ code: 'custom', path: ['density'], message: 'give a catalogue id or an explicit density' });
  if (f.id === undefined && f.viscosity === undefined && f.kinematicViscosity === undefined) {
    ctx.addIssue({ code: 'custom', path: ['viscosity'], message: 'give a catalogue id or an explicit viscosity' });
  }
  if (f.viscosity !== undefined && f.kinematicViscosity !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['kinematicViscosity'], message: 'give viscosity or kinematicViscosity, not both' });
  }
}

export const FluidSchema = z
  .strictObject({ id: catalogueId('fluid', 'GET /v1/fluids', 'water').optional(), ...fluidProperties })
  .superRefine(checkFluid)
  .openapi('Fluid', { description: 'A catalogue fluid at a temperature, and/or explicit property values (explicit values override the catalogue)' });

export const LubricantSchema = z
  .strictObject({
    id: catalogueId('lubricant', 'GET /v1/fluids', 'n-hexadecane').optional(),
    ...fluidProperties,
    solubility: MassConcentration.optional().openapi({ description: 'Saturation solubility in the working fluid, for the dissolution lifetime' }),
  })
  .superRefine(checkFluid)
  .openapi('Lubricant', { description: 'The lubricant held in the grooves: referenced like any fluid, plus its solubility in the working fluid' });

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

export const OrientationSchema = z
  .strictObject({
    inclination: WallInclination,
    facing: z.enum(['up', 'down']).optional().openapi({ description: 'Which way the textured face looks: up (lubricant below the working fluid) or down (lubricant above it); needed for waves unless the wall is vertical' }),
    downslope: z
      .enum(['with-flow', 'against-flow', 'across-grooves'])
      .optional()
      .openapi({ description: 'Where the down-slope direction points relative to the flow along the grooves; needed for retention on an inclined wall' }),
  })
  .openapi('Orientation', { description: 'The wall against gravity; omitted: gravity neglected' });

export const SurfactantSchema = z
  .strictObject({
    id: catalogueId('surfactant', 'GET /v1/surfactants', 'sds').optional(),
    name: z.string().max(100).optional().openapi({ description: 'Display name of a surfactant given by its values' }),
    maximumSurfaceExcess: SurfaceExcess.optional(),
    langmuirConstant: LangmuirConstant.optional(),
    adsorptionRate: AdsorptionRate.optional(),
    desorptionRate: DesorptionRate.optional(),
    bulkDiffusivity: Diffusivity.optional().openapi({ description: 'Bulk diffusivity D' }),
    surfaceDiffusivity: Diffusivity.optional().openapi({ description: 'Surface diffusivity D_s' }),
    gibbsPrefactor: GibbsPrefactor.optional(),
    criticalMicelleConcentration: SurfactantConcentration.optional().openapi({ description: 'Critical micelle concentration (molar, or by mass like the bulk concentration)' }),
    molarMass: MolarMass.optional().openapi({ description: 'Molar mass, for concentrations given by mass (default: the catalogue value)' }),
  })
  .openapi('Surfactant', {
    description: 'A catalogue surfactant and/or explicit adsorption parameters for the interface in question (explicit values override the catalogue), referenced like a fluid',
  });

export const WaterQualitySchema = z
  .strictObject({
    surfactant: SurfactantSchema,
    bulkConcentration: z
      .union([SurfactantConcentration, z.array(SurfactantConcentration).min(1).max(50)])
      .openapi({ description: 'Bulk concentration (molar; "1 mg/L" and "1 ppm" are converted with the molar mass), or a list (at most 50) for a curve' }),
  })
  .openapi('WaterQuality', { description: 'The surfactant in the working fluid and its concentration' });

export const SolidSchema = z
  .strictObject({
    thermalConductivity: ThermalConductivity.openapi({ description: 'Conductivity of the textured solid' }),
    substrateThickness: TextureLength.openapi({ description: 'Solid below the groove floor', example: '20 um' }),
  })
  .openapi('Solid', { description: 'The textured solid, for heat transfer' });

export const HeatingSchema = z
  .strictObject({
    condition: z.enum(['uniform-flux', 'uniform-temperature']).optional().openapi({ description: 'Thermal boundary condition (default uniform-flux)' }),
    heatedWalls: z.enum(['one', 'both']).optional().openapi({ description: 'Channel: heated textured walls (default both); a pipe is heated all round' }),
  })
  .openapi('Heating', { description: 'How the wall is heated' });

export const OptionsSchema = z
  .strictObject({
    method: z
      .enum(['auto', 'closed-form', 'field'])
      .optional()
      .openapi({ description: 'Slip and thermal-slip method. auto (default; retention: closed-form): closed form where its measured error is below 1 %, the groove-cell field solver elsewhere' }),
    surfactantMethod: z.enum(['scaling', 'solver', 'auto']).optional().openapi({ description: 'Surfactant model: scaling theory (Landel et al. 2020), interface solver, or auto (default)' }),
    grooveContent: z
      .enum(['lubricant', 'gas'])
      .optional()
      .openapi({ description: 'What the surfactant model puts below the interface (default: gas when the lubricant is under 5 % as viscous as the working fluid)' }),
    duration: Duration.optional().openapi({ description: 'Length of the drainage timeline (default 2 h)' }),
    initialFill: Fraction.optional().openapi({ description: 'Initially filled fraction of each segment (default 1)' }),
    targetFill: Fraction.optional().openapi({ description: 'Fill fraction the retention verdict and the barrier spacing aim at (default 0.9)' }),
    map: z.boolean().optional().openapi({ description: 'Waves: also compute the regime map over a (We_τ, w⁺) grid, for plotting (default false; computed in the worker pool)' }),
    mapResolution: z.number().int().min(2).max(100).optional().openapi({ description: 'Cells per axis of the wave regime map (default 24); implies map: true' }),
    sensitivity: z.strictObject({ points: z.number().int().min(2).max(101) }).optional().openapi({ description: 'Sweep of the lubricant conductivity (heat)' }),
  })
  .openapi('Options', { description: 'The knobs of the methods; defaults as stated' });

export const DesignSchema = z
  .strictObject({
    texture: TextureSchema.optional(),
    lubricant: LubricantSchema.optional(),
    workingFluid: FluidSchema.optional().openapi({ description: 'The liquid flowing over the surface' }),
    interfacialTension: SurfaceTension.optional().openapi({
      description: 'Lubricant–working-fluid interfacial tension; default: catalogue value against water, else the Fowkes estimate (with a warning)',
    }),
    contactAngles: ContactAnglesSchema.optional(),
    flow: FlowSchema.optional(),
    orientation: OrientationSchema.optional(),
    waterQuality: WaterQualitySchema.optional(),
    solid: SolidSchema.optional(),
    heating: HeatingSchema.optional(),
    options: OptionsSchema.optional(),
  })
  // Mass concentrations to molar ones, once the surfactant and working fluid are known (./concentration.ts).
  .transform(molarConcentrations)
  .openapi('Design', {
    description:
      'A design and its service conditions, the same document for every calculation. Each endpoint uses the parts its question needs and answers 422 "missing required property" naming a part it lacks.',
  });

export type DesignInput = z.output<typeof DesignSchema>;

/** Compile-time check: the parsed document is what the physics' composition takes. */
type _ParsedDesignIsPhysicsDocument = DesignInput extends DesignDocument ? true : never;
export const DESIGN_SCHEMA_MATCHES_PHYSICS: _ParsedDesignIsPhysicsDocument = true;
