/** POST /v1/waves — do capillary waves on the lubricant interface stay calm? */
import { Notes } from '../../physics/common.js';
import { evaluateSlip } from '../../physics/slip.js';
import { evaluateWaves } from '../../physics/waves.js';
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
    map: z.boolean().optional().openapi({ description: 'Also compute the regime map over a (We_τ, w⁺) grid, for plotting (default false; given mapResolution implies true)' }),
    mapResolution: z.number().int().min(2).max(100).optional().openapi({ description: 'Cells per axis of the regime map (default 24); implies map: true' }),
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
    map: z.looseObject({}).optional().openapi({ description: 'Regime over a (We_τ, w⁺) grid with the design point, for plotting (only when asked for: map or mapResolution)' }),
  })
  .openapi('WavesResult');

const VerdictSchema = z
  .object({ calm: z.boolean(), margin: z.number().openapi({ description: 'Relative margin to the wavy boundary (positive = calm side)' }) })
  .openapi('WavesVerdict');

/** Cells per axis of the regime map when it is asked for without a resolution. */
const DEFAULT_MAP_CELLS = 24;

function wantsMap(input: { map?: boolean; mapResolution?: number }): boolean {
  return input.map === true || input.mapResolution !== undefined;
}

export const wavesCalculation = defineCalculation({
  name: 'waves',
  path: '/v1/waves',
  summary: 'Interface wave stability: calm, marginal or wavy',
  description:
    'Wall-unit numbers and the inertial–capillary number Λ = w⁺ We_τ^(1/3) (calm below 1), confined Kelvin–Helmholtz stability with capillarity, gravity and finite depths (pinned fundamental spanwise mode), a critical-layer screen, depinning and Rayleigh–Taylor checks; design limits; the regime map when asked for (map: true, in the worker pool; without it the answer is computed inline). The interface drift comes from the closed-form slip length.',
  body: WavesRequest,
  response: envelopeSchema('WavesResponse', z.looseObject({}), WavesResultSchema, VerdictSchema),
  // Without the map the answer is closed forms and one-dimensional root finding (about 1–2 ms):
  // inline. The map costs 25–50 evaluations per cell (24² cells by default, tens of ms): worker pool.
  heavy: (input) => wantsMap(input),
  example: {
    texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um' },
    lubricant: { fluid: 'n-dodecane', temperature: '20 degC' },
    workingFluid: { fluid: 'water', temperature: '20 degC' },
    flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  },
  compute(input) {
    const notes = new Notes();
    const { scenario } = resolveDesign(input, notes, true);
    const slip = evaluateSlip({ scenario, method: 'closed-form' });
    notes.assume('Interface drift from the closed-form longitudinal slip length (see /v1/slip).');
    notes.cite(...slip.references);
    const map = wantsMap(input);
    const waves = evaluateWaves({
      scenario,
      slipLengthLongitudinal: slip.result.slipLengthLongitudinal,
      ...(input.gravity ? { gravity: input.gravity } : {}),
      // No map asked for: the smallest one (2 × 2), dropped from the answer.
      mapResolution: map ? (input.mapResolution ?? DEFAULT_MAP_CELLS) : 2,
    });
    notes.merge(waves);
    const { verdict, map: regimeMap, ...rest } = waves.result;
    const result = map ? { ...rest, map: regimeMap } : rest;
    return { inputs: { ...designEcho(scenario, input.flow), map }, result, verdict, ...notes };
  },
});
