/** Response of POST /v1/wetting. */
import { z } from '../zod.js';
import { envelopeSchema, num, SourcedNumberSchema } from './common.js';

const WettingStateSchema = z.enum(['film-covered', 'infused-exposed-tops', 'not-wetting']);

export const WettingResultSchema = z
  .strictObject({
    roughnessRatio: num('r = 1 + 2d/P'),
    topSolidFraction: num('φ_s = (P − w)/P'),
    criticalAngle: num('Hemiwicking critical angle θ_c, degrees'),
    equilibriumAngleUnderWorkingFluid: SourcedNumberSchema.openapi({ description: 'θ_os(w), degrees; source input, young-from-air or tadmor-from-hysteresis' }),
    spreadingCoefficients: z.strictObject({
      lubricantOnSolidUnderWorkingFluid: num('S_os(w) = γ_sw − γ_os − γ_ow, N/m'),
      lubricantOnWorkingFluidInAir: z.number().nullable().openapi({ description: 'S_ow(a) = γ_wa − γ_ow − γ_oa, N/m; null without both surface tensions' }),
      cloaking: z.boolean().nullable().openapi({ description: 'S_ow(a) > 0: the lubricant spreads over the working fluid in air' }),
    }),
    state: WettingStateSchema,
    energyMargin: num('Energy per unit projected area separating the state from the nearest other state, J/m²'),
    nearestState: WettingStateSchema,
    stateEnergies: z.strictObject({ 'film-covered': z.number(), 'infused-exposed-tops': z.number(), 'not-wetting': z.number() }).openapi({ description: 'Energies relative to the film-covered state, J/m²' }),
    fillsSpontaneously: z.boolean(),
    fillingMedium: z.enum(['air', 'working-fluid']),
    interfacialTension: SourcedNumberSchema.openapi({ description: 'γ_ow used, N/m, and its source' }),
  })
  .openapi('WettingResult');

export const WettingResponse = envelopeSchema('WettingResponse', WettingResultSchema, true);
