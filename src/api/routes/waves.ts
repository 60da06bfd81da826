/** POST /v1/waves — do capillary waves on the lubricant interface stay calm? */
import { Notes } from '../../core/notes.js';
import { evaluateSlip } from '../../physics/slip/slip.js';
import { evaluateWaves } from '../../physics/waves/waves.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { designEcho, resolveDesign } from '../resolve.js';
import { Inclination } from '../schemas/quantities.js';
import { DesignShape } from '../schemas/scenario.js';
import { z } from '../schemas/zod.js';

export const WavesRequest = z
  .strictObject({
    ...DesignShape,
    gravity: z
      .strictObject({
        inclination: Inclination,
        facing: z.enum(['up', 'down', 'vertical']).openapi({ description: 'Which way the textured face looks (down: lubricant above the working fluid)' }),
      })
      .optional()
      .openapi({ description: 'Wall orientation; omitted: gravity neglected' }),
    mapResolution: z.number().int().min(2).max(100).optional().openapi({ description: 'Cells per axis of the regime map (default 24)' }),
  })
  .openapi('WavesRequest');

const WavesResultSchema = z
  .looseObject({
    wallUnits: z.looseObject({}).openapi({ description: 'w⁺, We_τ = μ_w u_τ/γ, friction and bulk Weber numbers, Λ = w⁺ We_τ^(1/3)' }),
    kelvinHelmholtz: z.looseObject({}).openapi({ description: 'Confined Kelvin–Helmholtz: growth-rate curve, most unstable wavelength, critical ΔU, slowest wave speed' }),
    criticalLayer: z.looseObject({}).openapi({ description: 'Whether the slowest confined wave can be fed by the mean flow above the sublayer' }),
    staticChecks: z.looseObject({}).openapi({ description: 'Depinning pressure against wall-pressure fluctuations; Rayleigh–Taylor' }),
    regime: z.enum(['calm', 'marginal', 'wavy']),
    designLimits: z.looseObject({}).openapi({ description: 'Widest groove, lowest interfacial tension and highest friction velocity that keep the interface calm' }),
    map: z.looseObject({}).openapi({ description: 'Regime over a (We_τ, w⁺) grid with the design point, for plotting' }),
  })
  .openapi('WavesResult');

const VerdictSchema = z
  .object({ calm: z.boolean(), margin: z.number().openapi({ description: 'Relative margin to the wavy boundary (positive = calm side)' }) })
  .openapi('WavesVerdict');

export const wavesCalculation = defineCalculation({
  name: 'waves',
  path: '/v1/waves',
  summary: 'Interface wave stability: calm, marginal or wavy',
  description:
    'Wall-unit numbers and the inertial–capillary number Λ = w⁺ We_τ^(1/3) (calm below 1), confined Kelvin–Helmholtz stability with capillarity, gravity and finite depths (pinned fundamental spanwise mode), a critical-layer screen, depinning and Rayleigh–Taylor checks; design limits and a regime map. The interface drift comes from the closed-form slip length.',
  body: WavesRequest,
  response: envelopeSchema('WavesResponse', z.looseObject({}), WavesResultSchema, VerdictSchema),
  // The regime map costs tens of milliseconds: keep it off the event loop.
  heavy: true,
  example: {
    texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um' },
    lubricant: { id: 'n-dodecane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  },
  compute(input) {
    const notes = new Notes();
    const { scenario } = resolveDesign(input, notes, true);
    const slip = evaluateSlip({ scenario, method: 'closed-form' });
    notes.assume('Interface drift from the closed-form longitudinal slip length (see /v1/slip).');
    notes.cite(...slip.references);
    const waves = evaluateWaves({
      scenario,
      slipLengthLongitudinal: slip.result.slipLengthLongitudinal,
      ...(input.gravity ? { gravity: input.gravity } : {}),
      ...(input.mapResolution ? { mapResolution: input.mapResolution } : {}),
    });
    notes.merge(waves);
    const { verdict, ...result } = waves.result;
    return { inputs: designEcho(scenario, input.flow), result, verdict, ...notes };
  },
});
