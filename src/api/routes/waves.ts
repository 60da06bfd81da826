/** POST /v1/waves — do capillary waves on the lubricant interface stay calm? */
import { designCalculation } from '../calculation.js';
import { wavesMapWanted } from '../../physics/design/questions.js';
import { WavesResponse } from '../schemas/responses/waves.js';

export const wavesCalculation = designCalculation({
  name: 'waves',
  path: '/v1/waves',
  question: 'waves',
  summary: 'Interface wave stability: calm, marginal or wavy',
  description:
    'Wall-unit numbers and the inertial–capillary number Λ = w⁺ We_τ^(1/3) (trade boundary Λ = 1; a calm verdict needs Λ below 2^(−1/12) ≈ 0.944, a factor 2^(1/4) in pressure under it), confined Kelvin–Helmholtz stability with capillarity, gravity and finite depths (pinned fundamental spanwise mode), a critical-layer screen, depinning and Rayleigh–Taylor checks; design limits; the regime map when asked for (options.map, computed in the worker pool; without it the answer is computed inline). The interface drift comes from the closed-form slip length. Needs texture, lubricant, workingFluid, flow and an interfacial tension; orientation.facing on an inclined, not vertical wall.',
  response: WavesResponse,
  // Without the map the answer is closed forms and one-dimensional root finding (about 1–2 ms): inline.
  // The map costs 25–50 evaluations per cell (24² cells by default, tens of ms): worker pool.
  heavy: (input) => wavesMapWanted(input.options),
  example: {
    texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um' },
    lubricant: { id: 'n-dodecane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  },
});
