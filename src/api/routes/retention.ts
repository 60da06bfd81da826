/** POST /v1/retention — how much lubricant stays in the grooves, and how fast the rest drains. */
import { designCalculation } from '../calculation.js';
import { RetentionResponse } from '../schemas/responses/retention.js';

export const retentionCalculation = designCalculation({
  name: 'retention',
  path: '/v1/retention',
  question: 'retention',
  summary: 'Lubricant retention under shear and gravity, drainage timeline and dissolution lifetime',
  description:
    'Capillary back-pressure (Wexler, Jacobi & Stone 2015) with the exact rectangular-groove flux series, contact-line pinning of plugs (Furmidge 1962) corrected for the back-flow, gravity along inclined grooves, and dissolution into once-through water; the binding mechanism, the retained fraction with a verdict, a drainage timeline, and the barrier spacing that keeps a target fill. The interfacial shear comes from the slip solution (options.method, default closed-form). Needs texture (with grooveLength or segmentLength), lubricant, workingFluid, flow, contactAngles.underWorkingFluid and an interfacial tension.',
  response: RetentionResponse,
  heavy: true,
  example: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um', grooveLength: '20 mm', grooveEnds: 'open' },
    lubricant: { id: 'n-decane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    flow: { kind: 'channel', height: '5 mm', bulkVelocity: '2 m/s' },
    contactAngles: { underWorkingFluid: { advancing: 46, receding: 0 } },
    options: { duration: '2 h' },
  },
});
