/** POST /v1/slip — slip lengths and drag change of a lubricant-infused grooved wall. */
import { Notes } from '../../core/notes.js';
import { evaluateSlip, type SlipMethod } from '../../physics/slip/slip.js';
import { evaluateWaves, waveRoughnessWarning } from '../../physics/waves/waves.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { designEcho, resolveDesign } from '../resolve.js';
import { DesignShape, MethodSchema } from '../schemas/scenario.js';
import { z } from '../schemas/zod.js';

export const SlipRequest = z.strictObject({ ...DesignShape, method: MethodSchema }).openapi('SlipRequest');

const n = (description: string) => z.number().openapi({ description });

const SlipResultSchema = z
  .looseObject({
    slipLengthLongitudinal: n('b_∥ for flow along the grooves, m'),
    slipLengthTransverse: n('b_⊥ for flow across the grooves, m'),
    slipLengthAlongFlow: n('Slip tensor projected on the flow direction, b_∥cos²θ + b_⊥sin²θ, m'),
    slipLengthCrossFlow: n('Cross-flow component (b_∥ − b_⊥) sinθ cosθ, m'),
    slipLengthSpanwise: n('Slip in the spanwise direction of the mean flow, m'),
    localSlipLength: z.looseObject({}).openapi({ description: 'Local slip of the lubricant-filled groove (mean and centre, longitudinal and transverse), m' }),
    interfacialShearRatio: n('Mean interfacial shear over wall shear (used by /v1/retention)'),
    wallUnits: z.looseObject({}).openapi({ description: 'Slip lengths, pitch and groove width in viscous lengths' }),
    textureReynoldsNumber: n('Reynolds number inside the texture (Stokes assumption needs ≲ 1)'),
    drag: z.looseObject({ kind: z.string() }).openapi({
      description: 'Laminar: pressure-drop reduction at fixed flow rate; turbulent: ΔU⁺ and drag reduction at fixed bulk Reynolds number (positive = less drag)',
    }),
    methodUsed: z.enum(['closed-form', 'field']),
    closedFormError: z.looseObject({}).openapi({ description: 'Relative error of the closed form against the field solver (measured or from the error map)' }),
  })
  .openapi('SlipResult');

export const slipCalculation = defineCalculation({
  name: 'slip',
  path: '/v1/slip',
  summary: 'Slip lengths and drag change of the surface in this flow',
  description:
    'Longitudinal and transverse effective slip lengths of lubricant-filled grooves (Philip 1972, Belyaev & Vinogradova 2010 with the lid-sheared duct local slip, or the exact groove-cell field solver), projected on the flow direction; laminar pressure-drop change at fixed flow rate, or the turbulent virtual-origin shift (Fukagata et al. 2006) and drag change at fixed bulk Reynolds number. Carries the wave verdict of /v1/waves when the interface is wavy.',
  body: SlipRequest,
  response: envelopeSchema('SlipResponse', z.looseObject({}), SlipResultSchema),
  heavy: (input) => input.method !== 'closed-form',
  example: {
    texture: { grooveWidth: '20 um', pitch: '40 um', grooveDepth: '20 um', flowAngle: 0 },
    lubricant: { id: 'silicone-oil-5cst', temperature: '25 degC' },
    workingFluid: { id: 'water', temperature: '25 degC' },
    flow: { kind: 'channel', height: '5 mm', bulkVelocity: '0.6 m/s' },
    method: 'auto',
  },
  compute(input) {
    const notes = new Notes();
    const { scenario } = resolveDesign(input, notes, false);
    const method: SlipMethod = input.method ?? 'auto';
    const slip = evaluateSlip({ scenario, method });
    notes.merge(slip);
    if (scenario.interfacialTension !== undefined) {
      // Only the regime is needed here: the smallest regime map keeps this cheap.
      const waves = evaluateWaves({ scenario, slipLengthLongitudinal: slip.result.slipLengthLongitudinal, mapResolution: 2 });
      const warning = waveRoughnessWarning(waves.result.regime);
      if (warning) notes.warn(warning.code, warning.message, warning.severity);
      notes.assume(`Interface wave regime from /v1/waves: ${waves.result.regime}.`);
    } else {
      notes.warn('wave-regime-unknown', 'No interfacial tension is known for this pair, so the wave regime (which can void the drag reduction) was not checked; give interfacialTension.', 'caution');
    }
    return { inputs: { ...designEcho(scenario, input.flow), method }, result: slip.result, ...notes };
  },
});
