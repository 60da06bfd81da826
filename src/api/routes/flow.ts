/** POST /v1/flow — wall shear stress, friction velocity and viscous length of a flow. */
import { Notes } from '../../core/notes.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { fluidEcho, resolveFlow, resolveFluidInput, resolveTexture } from '../resolve.js';
import { FlowSchema, FluidSchema, FluidStateSchema, TextureSchema } from '../schemas/scenario.js';
import { z } from '../schemas/zod.js';

export const FlowRequest = z
  .strictObject({
    workingFluid: FluidSchema,
    flow: FlowSchema,
    texture: TextureSchema.optional(),
  })
  .openapi('FlowRequest');

const FlowResultSchema = z
  .object({
    kind: z.enum(['channel', 'pipe', 'plate', 'wall-shear']),
    wallShearStress: z.number().openapi({ description: 'τ_w on a smooth no-slip wall, Pa' }),
    frictionVelocity: z.number().openapi({ description: 'u_τ = √(τ_w/ρ), m/s' }),
    viscousLength: z.number().openapi({ description: 'ℓ_ν = ν/u_τ, m' }),
    bulkVelocity: z.number().optional().openapi({ description: 'Bulk or free-stream velocity, m/s' }),
    reynoldsNumber: z.number().optional().openapi({ description: 'On the full channel height, the pipe diameter or the plate distance' }),
    frictionReynoldsNumber: z.number().optional().openapi({ description: 'Re_τ = u_τ (H/2 or D/2)/ν' }),
    skinFrictionCoefficient: z.number().optional().openapi({ description: 'Fanning coefficient τ_w/(½ρU²)' }),
    regime: z.enum(['laminar', 'transitional', 'turbulent']),
    height: z.number().optional(),
    diameter: z.number().optional(),
    distance: z.number().optional(),
    texturedWalls: z.number().optional(),
    wallUnits: z
      .object({ grooveWidth: z.number(), pitch: z.number(), grooveDepth: z.number() })
      .optional()
      .openapi({ description: 'Texture sizes in viscous lengths (w⁺, P⁺, d⁺)' }),
  })
  .openapi('FlowResult');

const FlowInputsEcho = z.object({
  workingFluid: FluidStateSchema,
  flow: z.record(z.string(), z.unknown()),
  texture: z.record(z.string(), z.unknown()).optional(),
});

export const flowCalculation = defineCalculation({
  name: 'flow',
  path: '/v1/flow',
  summary: 'Wall shear stress, friction velocity and viscous length of a flow',
  description:
    'Plane channel (laminar, or Dean 1978 turbulent), pipe (laminar, or Colebrook 1939 solved to machine precision), flat plate (Blasius, turbulent power law, Schlichting) or a given wall shear stress. With a texture, its sizes in viscous lengths.',
  body: FlowRequest,
  response: envelopeSchema('FlowResponse', FlowInputsEcho, FlowResultSchema),
  heavy: false,
  example: { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' } },
  compute(input) {
    const notes = new Notes();
    const fluid = resolveFluidInput(input.workingFluid, 'workingFluid', notes);
    const texture = input.texture ? resolveTexture(input.texture) : undefined;
    const result = resolveFlow(input.flow, fluid, notes, texture);
    return {
      inputs: { workingFluid: fluidEcho(fluid), flow: input.flow, ...(texture ? { texture } : {}) },
      result,
      ...notes,
    };
  },
});
