/** POST /v1/wetting — is the lubricant-in-texture state stable under the working fluid? */
import { designCalculation } from '../calculation.js';
import { WettingResponse } from '../schemas/responses/wetting.js';

export const wettingCalculation = designCalculation({
  name: 'wetting',
  path: '/v1/wetting',
  question: 'wetting',
  summary: 'Thermodynamic wetting state of the lubricant in the texture',
  description:
    'Roughness ratio, top solid fraction and hemiwicking critical angle (Bico, Thiele & Quéré 2002); the lubricant angle under the working fluid (given, or by Young’s law from in-air angles); spreading coefficients (cloaking); the state (film-covered, infused with exposed tops, not wetting) after Smith et al. (2013) with its energy margin; verdict: stable. Needs texture, lubricant, workingFluid and contactAngles.',
  response: WettingResponse,
  heavy: false,
  example: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
    lubricant: { id: 'n-decane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    contactAngles: { underWorkingFluid: { advancing: 40, receding: 15 } },
  },
});
