/** Response of POST /v1/assess. */
import { z } from '../zod.js';
import { DesignEchoSchema, envelopeSchema, num, numOrNull, VerdictSchema } from './common.js';

const MECHANISMS = ['wetting', 'retention', 'waves', 'slipAndDrag', 'surfactant', 'heat'] as const;
const MechanismEnum = z.enum(MECHANISMS);
const KnobEnum = z.enum(['grooveWidth', 'pitch', 'grooveDepth', 'interfacialTension', 'lubricantViscosity']);

const MechanismSchema = z
  .union([
    z.strictObject({ status: z.literal('assessed'), verdict: VerdictSchema, summary: z.string() }),
    z.strictObject({ status: z.literal('not-assessed'), reason: z.string().openapi({ description: 'What is missing, or why the model does not cover the case' }) }),
  ])
  .openapi('MechanismAssessment');

const requirement = z.strictObject({ value: z.number().nullable(), source: z.enum(['input', 'default']) });

const perMechanism = <T extends z.ZodType>(schema: T) => z.strictObject(Object.fromEntries(MECHANISMS.map((m) => [m, schema.optional()])) as Record<(typeof MECHANISMS)[number], z.ZodOptional<T>>);

export const AssessResultSchema = z
  .strictObject({
    requirements: z
      .strictObject({
        minDragReduction: requirement,
        serviceTime: requirement,
        minRetainedFraction: requirement,
        minWaveMargin: requirement,
        tolerableSurfactantConcentration: requirement,
        minSlipRetained: requirement,
        minHeatTransferChange: requirement,
      })
      .openapi({ description: 'The requirements in effect, each with whether it was given or defaulted' }),
    overall: z.strictObject({
      verdict: z.enum(['works', 'works-with-conditions', 'fails']),
      limitingMechanism: MechanismEnum.nullable().openapi({ description: 'The assessed mechanism with the smallest margin' }),
      conditions: z.array(z.string()),
      summary: z.string(),
    }),
    mechanisms: z.strictObject(Object.fromEntries(MECHANISMS.map((m) => [m, MechanismSchema])) as Record<(typeof MECHANISMS)[number], typeof MechanismSchema>),
    couplings: z
      .strictObject({
        slipMethod: z.enum(['exact-core', 'closed-form', 'field']),
        interfacialShearRatio: num('τ_i/τ_w of the slip solution, fed to the retention'),
        dragReductionClean: numOrNull('Drag reduction of the clean, full, flat interface'),
        slipRetainedBySurfactant: num('Share of the clean slip surviving the stated surfactant concentration'),
        dragReductionWithSurfactant: numOrNull('Drag reduction with the surviving slip'),
        waveCredit: num('1 when calm, marginal or unknown; 0 when wavy'),
        waveRegime: z.enum(['calm', 'marginal', 'wavy']).nullable(),
        filledFractionAtServiceTime: num('Filled share of the grooves at the service time'),
        creditedDragReductionStart: numOrNull('Credited drag reduction at the start of service'),
        creditedDragReductionAtServiceTime: numOrNull('Credited drag reduction at the service time'),
        heatTransferChangeClean: numOrNull('q/q₀ − 1 with the clean slip'),
        heatTransferChangeWithSurfactant: numOrNull('q/q₀ − 1 with the surviving slip'),
      })
      .openapi({ description: 'What each coupling carried from one model to the next, and its effect' }),
    serviceTime: z.strictObject({ time: z.array(z.number()), retainedFraction: z.array(z.number()), dragReduction: z.array(z.number().nullable()) }),
    surfactantCurve: z
      .strictObject({ bulkConcentration: z.array(z.number()), slipRetained: z.array(z.number()), stated: num('mol/m³'), statedSlipRetained: z.number() })
      .nullable(),
    heatSweep: z
      .strictObject({ lubricantConductivity: z.array(z.number()), nusseltRatio: z.array(z.number().nullable()), heatFluxRatio: z.array(z.number().nullable()) })
      .nullable(),
    sensitivities: z
      .strictObject({
        relativeStep: z.number(),
        limitingMechanism: MechanismEnum.nullable(),
        knobs: z.array(
          z.strictObject({
            knob: KnobEnum,
            value: num('SI'),
            perturbedValue: num('SI'),
            marginDerivatives: perMechanism(z.number().nullable()).openapi({ description: 'Δmargin/Δln(knob) per assessed mechanism' }),
          }),
        ),
        ranked: z.array(z.strictObject({ knob: KnobEnum, change: z.enum(['increase', 'decrease']), derivative: z.number(), marginGainForTenPercent: z.number() })),
        skipped: z.array(z.strictObject({ knob: KnobEnum, reason: z.string() })),
      })
      .nullable(),
  })
  .openapi('AssessResult');

/** The common envelope, with the requirements in effect echoed among the inputs (they are part of what was answered). */
export const AssessResponse = envelopeSchema('AssessEnvelope', AssessResultSchema)
  .extend({ inputs: DesignEchoSchema.extend({ requirements: z.record(z.string(), z.number().nullable()).optional() }) })
  .openapi('AssessResponse');
