/** POST /v1/slip — slip lengths and drag change of a lubricant-infused grooved wall. */
import { designCalculation } from '../calculation.js';
import { SlipResponse } from '../schemas/responses/slip.js';

export const slipCalculation = designCalculation({
  name: 'slip',
  path: '/v1/slip',
  question: 'slip',
  summary: 'Slip lengths and drag change of the surface in this flow',
  description:
    'Longitudinal and transverse effective slip lengths of lubricant-filled grooves, exact for a flat interface by default (the fast groove-cell cores, result.method exact-core; options.method closed-form gives the textbook estimate of Philip 1972 and Belyaev & Vinogradova 2010 with the lid-sheared duct local slip and its measured error, field the finite-volume field solver), projected on the flow direction (slip tensor); laminar pressure-drop change at fixed flow rate, or the turbulent virtual-origin shift (Fukagata et al. 2006) and drag change at fixed bulk Reynolds number. Warns when the interface is wavy (waves) or the lubricant is displaced (wetting). Needs texture, lubricant, workingFluid and flow.',
  response: SlipResponse,
  // The exact cores and the closed forms cost well under a millisecond: inline. The field solver: worker pool.
  heavy: (input) => input.options?.method === 'field',
  example: {
    texture: { grooveWidth: '20 um', pitch: '40 um', grooveDepth: '20 um', flowAngle: 0 },
    lubricant: { id: 'silicone-oil-5cst', temperature: '25 degC' },
    workingFluid: { id: 'water', temperature: '25 degC' },
    flow: { kind: 'channel', height: '5 mm', bulkVelocity: '0.6 m/s' },
    options: { method: 'auto' },
  },
});
