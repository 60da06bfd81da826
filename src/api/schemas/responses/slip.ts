/** Response of POST /v1/slip, and the drag change other responses share. */
import { z } from '../zod.js';
import { envelopeSchema, num, SourcedNumberSchema } from './common.js';

export const DragChangeSchema = z
  .discriminatedUnion('kind', [
    z.strictObject({
      kind: z.literal('laminar-fixed-flow-rate'),
      dragReduction: num('DR = 1 − Δp/Δp₀ at equal flow rate; positive = less drag'),
      geometry: z.enum(['channel-both-walls', 'channel-one-wall', 'pipe']),
      slipLength: num('Slip length along the mean flow used, m'),
      lengthScale: num('Channel height H or pipe radius R, m'),
    }),
    z.strictObject({
      kind: z.literal('turbulent-fixed-bulk-reynolds'),
      deltaUPlus: num('Virtual-origin shift ΔU⁺'),
      dragReduction: num('DR = 1 − τ_w/τ_w0 at fixed bulk Reynolds number; positive = less drag'),
      frictionVelocityReduced: num('u_τ of the slipping wall, m/s'),
      slipLengthAlongFlowPlus: num('Slip along the flow in the reduced wall units'),
      slipLengthSpanwisePlus: num('Spanwise slip in the reduced wall units'),
      smoothSkinFriction: num('C_f0 of the smooth wall'),
      iterations: z.number().int(),
    }),
    z.strictObject({ kind: z.literal('turbulent-log-law-shift'), deltaUPlus: num('ΔU⁺ in smooth-wall units (no C_f to convert it to a drag change)') }),
    z.strictObject({ kind: z.literal('not-evaluated'), reason: z.string() }),
  ])
  .openapi('DragChange', { description: 'Laminar: pressure-drop change at fixed flow rate; turbulent: ΔU⁺ and the drag change at fixed bulk Reynolds number' });

const runStats = z.strictObject({ unknowns: z.number().int(), iterations: z.number().int(), residual: z.number(), grid: z.tuple([z.number().int(), z.number().int()]) });

export const SlipResultSchema = z
  .strictObject({
    slipLengthLongitudinal: num('b_∥ for flow along the grooves, m'),
    slipLengthTransverse: num('b_⊥ for flow across the grooves, m'),
    slipLengthAlongFlow: num('Slip tensor projected on the flow direction, b_∥cos²θ + b_⊥sin²θ, m'),
    slipLengthCrossFlow: num('Cross-flow component (b_∥ − b_⊥) sinθ cosθ, m'),
    slipLengthSpanwise: num('Slip in the spanwise direction of the mean flow, m'),
    localSlipLength: z
      .strictObject({ longitudinalMean: num('m'), longitudinalCentre: num('m'), transverseMean: num('m'), transverseCentre: num('m') })
      .openapi({ description: 'Local slip of the lubricant-filled groove' }),
    interfacialShearRatio: num('Mean interfacial shear along the grooves over the wall shear, for the flow at its angle (used by retention)'),
    interfacialShearRatioLongitudinal: num('The same ratio for flow along the grooves'),
    wallUnits: z.strictObject({
      slipLengthLongitudinalPlus: num('b_∥⁺'),
      slipLengthTransversePlus: num('b_⊥⁺'),
      pitchPlus: num('P⁺'),
      grooveWidthPlus: num('w⁺'),
    }),
    textureReynoldsNumber: num('Reynolds number inside the texture (Stokes assumption needs ≲ 1)'),
    drag: DragChangeSchema,
    method: z.enum(['exact-core', 'closed-form', 'field']).openapi({ description: 'Method that answered' }),
    closedFormError: z
      .strictObject({ slipLengthLongitudinal: SourcedNumberSchema, slipLengthTransverse: SourcedNumberSchema })
      .openapi({ description: 'Relative error of the closed form against the exact solution; source measured (against the exact core or the field solver) or error-map (outside the core’s measured range under closed-form)' }),
    fieldSolverStats: z.strictObject({ longitudinal: runStats.optional(), transverse: runStats.optional(), wallTimeMs: num('ms, indicative') }).optional(),
  })
  .openapi('SlipResult');

export const SlipResponse = envelopeSchema('SlipResponse', SlipResultSchema);
