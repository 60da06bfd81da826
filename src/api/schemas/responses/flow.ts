/** Response of POST /v1/flow. */
import { z } from '../zod.js';
import { envelopeSchema, num } from './common.js';

export const FlowRegimeSchema = z.enum(['laminar', 'transitional', 'turbulent']);

export const FlowResultSchema = z
  .strictObject({
    kind: z.enum(['channel', 'pipe', 'plate', 'wall-shear']),
    wallShearStress: num('τ_w on a smooth no-slip wall, Pa'),
    frictionVelocity: num('u_τ = √(τ_w/ρ), m/s'),
    viscousLength: num('ℓ_ν = ν/u_τ, m'),
    bulkVelocity: num('Bulk or free-stream velocity, m/s').optional(),
    reynoldsNumber: num('On the full channel height, the pipe diameter or the plate distance').optional(),
    frictionReynoldsNumber: num('Re_τ = u_τ (H/2 or D/2)/ν').optional(),
    skinFrictionCoefficient: num('Fanning coefficient τ_w/(½ρU²)').optional(),
    regime: FlowRegimeSchema,
    height: num('Channel full height, m').optional(),
    diameter: num('Pipe diameter, m').optional(),
    distance: num('Plate: distance from the leading edge, m').optional(),
    texturedWalls: z.union([z.literal(1), z.literal(2)]).optional(),
    wallUnits: z
      .strictObject({ grooveWidthPlus: num('w⁺ = w/ℓ_ν'), pitchPlus: num('P⁺ = P/ℓ_ν'), grooveDepthPlus: num('d⁺ = d/ℓ_ν') })
      .optional()
      .openapi({ description: 'Texture sizes in viscous lengths (when the design has a texture)' }),
  })
  .openapi('FlowResult');

export const FlowResponse = envelopeSchema('FlowResponse', FlowResultSchema);
