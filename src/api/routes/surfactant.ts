/** POST /v1/surfactant — how much of the slip survives traces of surfactant? */
import { designCalculation } from '../calculation.js';
import { SurfactantResponse } from '../schemas/responses/surfactant.js';

export const surfactantCalculation = designCalculation({
  name: 'surfactant',
  path: '/v1/surfactant',
  question: 'surfactant',
  summary: 'Slip surviving surfactant contamination',
  description:
    'Marangoni immobilisation of the interface by traces of surfactant: Langmuir–Szyszkowski equilibrium, the scaling theory of Landel et al. (2020) extended to a lubricant below the interface, and an interface solver (options.surfactantMethod); the concentration that halves the slip, a curve, and the drag change with the reduced slip. The clean slip comes from the slip solution (options.method). Needs texture, lubricant, workingFluid, flow and waterQuality.',
  response: SurfactantResponse,
  heavy: true,
  example: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '50 um', flowAngle: 90 },
    lubricant: { id: 'silicone-oil-5cst', temperature: '25 degC' },
    workingFluid: { id: 'water', temperature: '25 degC' },
    flow: { kind: 'channel', height: '5 mm', bulkVelocity: '0.1 m/s' },
    interfacialTension: '40 mN/m',
    waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: '0.001 mM' },
    options: { method: 'closed-form', surfactantMethod: 'scaling' },
  },
});
