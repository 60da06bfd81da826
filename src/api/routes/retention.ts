/** POST /v1/retention — how much lubricant stays in the grooves, and how fast the rest drains. */
import { Notes } from '../../core/notes.js';
import { evaluateRetention } from '../../physics/retention/retention.js';
import { evaluateSlip, type SlipMethod } from '../../physics/slip/slip.js';
import { evaluateWetting } from '../../physics/wetting/wetting.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { designEcho, resolveDesign } from '../resolve.js';
import { Duration, FlowLength, Fraction, MassConcentration } from '../schemas/quantities.js';
import { ContactAnglesSchema, DesignShape, MethodSchema } from '../schemas/scenario.js';
import { z } from '../schemas/zod.js';

export const RetentionRequest = z
  .strictObject({
    ...DesignShape,
    contactAngles: ContactAnglesSchema,
    grooveLength: FlowLength.optional().openapi({ description: 'Total groove length (default: one segment)' }),
    segmentLength: FlowLength.optional().openapi({ description: 'Barrier spacing when the grooves are cut into segments' }),
    grooveEnds: z.enum(['open', 'closed']).optional().openapi({ description: 'Whether lubricant can leave at the downstream end (default open)' }),
    inclination: z
      .strictObject({
        angle: z.number().min(0).max(90).openapi({ description: 'Groove inclination from horizontal, degrees' }),
        direction: z.enum(['with-flow', 'against-flow']).openapi({ description: 'Where the along-groove component of gravity points' }),
      })
      .optional(),
    initialFill: Fraction.optional().openapi({ description: 'Initially filled fraction of each segment (default 1)' }),
    targetFill: Fraction.optional().openapi({ description: 'Fill fraction the verdict and the barrier spacing aim at (default 0.9)' }),
    duration: Duration.optional().openapi({ description: 'Length of the drainage timeline (default 2 h)' }),
    solubility: MassConcentration.optional().openapi({ description: 'Saturation solubility of the lubricant in the working fluid, for the dissolution lifetime' }),
    slipMethod: MethodSchema,
  })
  .openapi('RetentionRequest');

const RetentionResultSchema = z
  .looseObject({
    interfacialShearStress: z.looseObject({ value: z.number(), source: z.string() }),
    mechanisms: z.looseObject({}).openapi({ description: 'Capillary back-pressure, contact-line pinning, gravity and dissolution, side by side' }),
    bindingMechanism: z.string(),
    retainedLength: z.number().openapi({ description: 'Steady retained length per segment, m' }),
    criticalPlugLength: z.number().openapi({ description: 'Longest plug pinning holds against the shear, m' }),
    retainedFraction: z.number(),
    timeline: z.array(z.object({ time: z.number(), retainedFraction: z.number(), retainedLength: z.number() })),
    finalRetainedFraction: z.number(),
    timeTo90PercentChange: z.number().nullable(),
    dissolutionLifetime: z.number().nullable().openapi({ description: 's' }),
    recommendations: z.looseObject({}),
  })
  .openapi('RetentionResult');

const VerdictSchema = z.object({ retained: z.boolean(), margin: z.number() }).openapi('RetentionVerdict');

export const retentionCalculation = defineCalculation({
  name: 'retention',
  path: '/v1/retention',
  summary: 'Lubricant retention under shear and gravity, drainage timeline and dissolution lifetime',
  description:
    'Capillary back-pressure (Wexler, Jacobi & Stone 2015) with the exact rectangular-groove flux series, contact-line pinning of plugs (Furmidge 1962) corrected for the back-flow, gravity along inclined grooves, and dissolution into once-through water; the binding mechanism, the retained fraction with a verdict, a finite-volume drainage timeline, and the barrier spacing that keeps a target fill. The interfacial shear comes from the slip solution.',
  body: RetentionRequest,
  response: envelopeSchema('RetentionResponse', z.looseObject({}), RetentionResultSchema, VerdictSchema),
  heavy: true,
  example: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
    lubricant: { id: 'n-decane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    flow: { kind: 'channel', height: '5 mm', bulkVelocity: '2 m/s' },
    contactAngles: { underWorkingFluid: { advancing: 46, receding: 0 } },
    grooveLength: '20 mm',
    grooveEnds: 'open',
    duration: '2 h',
  },
  compute(input) {
    const notes = new Notes();
    const { scenario } = resolveDesign(input, notes, true);
    const slipMethod: SlipMethod = input.slipMethod ?? 'closed-form';
    const slip = evaluateSlip({ scenario, method: slipMethod });
    notes.cite(...slip.references);
    notes.assume(`Interfacial shear = wall shear × ${slip.result.interfacialShearRatio.toPrecision(4)} from the ${slip.result.method} slip solution.`);
    let wettingState;
    if (input.contactAngles.underWorkingFluid || input.contactAngles.inAir) {
      const wetting = evaluateWetting({ texture: scenario.texture, lubricant: scenario.lubricant, workingFluid: scenario.workingFluid, contactAngles: input.contactAngles, interfacialTension: scenario.interfacialTension });
      wettingState = wetting.result.state;
      notes.merge(wetting);
    }
    const retention = evaluateRetention({
      scenario,
      contactAngles: input.contactAngles,
      grooveEnds: input.grooveEnds ?? 'open',
      duration: input.duration ?? 7200,
      interfacialShearRatio: slip.result.interfacialShearRatio,
      ...(wettingState ? { wettingState } : {}),
      ...(input.grooveLength === undefined ? {} : { grooveLength: input.grooveLength }),
      ...(input.segmentLength === undefined ? {} : { segmentLength: input.segmentLength }),
      ...(input.inclination ? { inclination: input.inclination } : {}),
      ...(input.initialFill === undefined ? {} : { initialFill: input.initialFill }),
      ...(input.targetFill === undefined ? {} : { targetFill: input.targetFill }),
      ...(input.solubility === undefined ? {} : { solubility: { value: input.solubility, unit: 'kg/m3' as const } }),
    });
    notes.merge(retention);
    const { verdict, ...result } = retention.result;
    return { inputs: { ...designEcho(scenario, input.flow), contactAngles: input.contactAngles }, result, verdict, ...notes };
  },
});
