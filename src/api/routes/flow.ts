/** POST /v1/flow — wall shear stress, friction velocity and viscous length of a flow. */
import { designCalculation } from '../calculation.js';
import { FlowResponse } from '../schemas/responses/flow.js';

export const flowCalculation = designCalculation({
  name: 'flow',
  path: '/v1/flow',
  question: 'flow',
  summary: 'Wall shear stress, friction velocity and viscous length of a flow',
  description:
    'Plane channel (laminar, or Dean 1978 turbulent), pipe (laminar, or Colebrook 1939 solved to machine precision), flat plate (Blasius, turbulent power law, Schlichting) or a given wall shear stress; with a texture, its sizes in viscous lengths. Needs workingFluid and flow.',
  response: FlowResponse,
  heavy: false,
  example: { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' } },
});
