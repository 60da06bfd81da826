/** POST /v1/heat — how the liquid-infused wall changes heat transfer against the solid-filled wall. */
import { designCalculation } from '../calculation.js';
import { HeatResponse } from '../schemas/responses/heat.js';

export const heatCalculation = designCalculation({
  name: 'heat',
  path: '/v1/heat',
  question: 'heat',
  summary: 'Heat-transfer change of the surface against the solid-filled wall',
  description:
    'The headline heatFluxRatio: heat delivered per unit area at the same temperature difference, against the same wall with its grooves filled by the solid; with the Nusselt-number ratio, heat-transfer coefficients, Reynolds number and pressure drop. Apparent thermal slip length (closed forms, or the exact conduction solution on the groove cell); laminar fully developed channel or pipe Nusselt numbers with slip and thermal slip (closed forms, shooting eigenproblem, or velocity and temperature solved together on the cross-section); turbulent estimate from Gnielinski (1976) with shifted log laws (low confidence); a sweep over the lubricant conductivity (options.sensitivity). Needs texture, lubricant and workingFluid with thermal conductivity and specific heat, a channel or pipe flow, and solid.',
  response: HeatResponse,
  heavy: true,
  example: {
    texture: { grooveWidth: '10 um', pitch: '20 um', grooveDepth: '10 um' },
    lubricant: { id: 'n-dodecane', temperature: '25 degC' },
    workingFluid: { id: 'water', temperature: '25 degC' },
    flow: { kind: 'channel', height: '200 um', bulkVelocity: '0.05 m/s' },
    solid: { thermalConductivity: '0.2 W/(m*K)', substrateThickness: '20 um' },
    options: { method: 'closed-form' },
  },
});
