/** Response of POST /v1/retention. */
import { z } from '../zod.js';
import { envelopeSchema, num, numOrNull, SourcedNumberSchema } from './common.js';

export const TimelinePointSchema = z.strictObject({
  time: num('s'),
  retainedFraction: num('Lubricant volume over the volume of the full grooves'),
  retainedLength: num('Equivalent full-section filled length per segment, m'),
});

export const RetentionResultSchema = z
  .strictObject({
    interfacialShearStress: SourcedNumberSchema.openapi({ description: 'τ_i, Pa; source slip-solution or smooth-wall-assumed' }),
    mechanisms: z.strictObject({
      capillaryBackPressure: z.strictObject({
        maximumCurvature: num('1/m'),
        curvatureLimit: z.enum(['receding-angle', 'floor-touching', 'none']),
        maximumCapillaryPressure: num('Pa'),
        backPressureGradient: num('G = τ_i Q̂_s/Q̂_p, Pa/m'),
        retainedLength: num('L∞ under shear alone, m'),
        retainedLengthWithGravity: num('m'),
        steadyColumn: z.strictObject({ length: num('m'), equivalentLength: num('Volume/(w d), m') }).nullable(),
      }),
      contactLinePinning: z.strictObject({
        pinningPressure: num('Pa'),
        shapeFactor: num('Furmidge shape factor k'),
        criticalPlugLength: num('L_c with the back-flow, shear alone, m'),
        forceBalancePlugLength: num('Force balance without back-flow, m'),
        retainedLengthWithGravity: num('m'),
      }),
      gravity: z.strictObject({
        bodyForceGradient: num('(ρ_o − ρ_w) g sin α along the grooves, Pa/m, positive downstream'),
        capillaryHoldLength: numOrNull('Gravity alone: capillary hold length, m'),
        pinningHoldLength: numOrNull('Gravity alone: pinning hold length, m'),
        hydrostaticHoldHeight: numOrNull('γ κ_max/(|Δρ| g), m'),
      }),
      dissolution: z.strictObject({
        lifetime: numOrNull('s'),
        massTransferCoefficient: numOrNull('m/s'),
        diffusivity: numOrNull('m²/s'),
        correlation: z.enum(['leveque', 'shaw-hanratty']).nullable(),
      }),
    }),
    bindingMechanism: z.enum(['capillary-back-pressure', 'contact-line-pinning', 'dissolution', 'none']),
    dominantDrive: z.enum(['shear', 'gravity']),
    retainedLength: num('Steady retained length per segment of the binding mechanism (full section), m'),
    criticalPlugLength: num('Longest plug pinning holds against the shear, m'),
    retainedFraction: num('Steady retained share of the groove volume (the verdict uses it)'),
    segmentLength: num('m'),
    segments: z.number().int(),
    timeline: z.array(TimelinePointSchema),
    timelineModel: z.enum(['finite-volume', 'lumped-plug']),
    finalRetainedFraction: num('Retained share at the end of the timeline (a warning explains a difference from retainedFraction)'),
    timeTo90PercentChange: numOrNull('s'),
    conservationError: numOrNull('Relative volume conservation of the finite-volume solve'),
    timelineCellsPerSegment: z.number().int().nullable().openapi({ description: 'Cells per segment of the finite-volume timeline (null for the lumped plug model)' }),
    dissolutionLifetime: numOrNull('s'),
    recommendations: z.strictObject({
      maxSegmentLength: num('Longest barrier spacing that keeps the target fill at steady state, m'),
      targetFill: num('fraction'),
      widthSensitivity: num('d ln L/d ln w'),
      depthSensitivity: num('d ln L/d ln d'),
      width: z.enum(['narrower', 'wider', 'either']),
      depth: z.enum(['shallower', 'deeper', 'either']),
    }),
  })
  .openapi('RetentionResult');

export const RetentionResponse = envelopeSchema('RetentionResponse', RetentionResultSchema, true);
