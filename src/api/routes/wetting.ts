/** POST /v1/wetting — is the lubricant-in-texture state stable under the working fluid? */
import { Notes } from '../../core/notes.js';
import { evaluateWetting } from '../../physics/wetting/wetting.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { fluidEcho, resolveFluidInput, resolveTexture } from '../resolve.js';
import { ContactAnglesSchema, FluidSchema, TextureSchema } from '../schemas/scenario.js';
import { SurfaceTension } from '../schemas/quantities.js';
import { z } from '../schemas/zod.js';

export const WettingRequest = z
  .strictObject({
    texture: TextureSchema,
    lubricant: FluidSchema,
    workingFluid: FluidSchema,
    contactAngles: ContactAnglesSchema,
    interfacialTension: SurfaceTension.optional().openapi({ description: 'Lubricant–working-fluid interfacial tension (default: catalogue, else Fowkes estimate)' }),
  })
  .openapi('WettingRequest');

const WettingResultSchema = z
  .looseObject({
    roughnessRatio: z.number().openapi({ description: 'r = 1 + 2d/P' }),
    topSolidFraction: z.number().openapi({ description: 'φ_s = (P − w)/P' }),
    criticalAngle: z.number().openapi({ description: 'Hemiwicking critical angle θ_c, degrees' }),
    equilibriumAngleUnderWorkingFluid: z.looseObject({ value: z.number(), origin: z.string() }),
    spreadingCoefficients: z.looseObject({}),
    state: z.enum(['film-covered', 'infused-exposed-tops', 'not-wetting']),
    energyMargin: z.looseObject({ value: z.number(), towards: z.string() }).openapi({ description: 'J/m² to the nearest other state' }),
    fillsSpontaneously: z.boolean(),
    interfacialTension: z.looseObject({ value: z.number(), origin: z.string() }),
  })
  .openapi('WettingResult');

const VerdictSchema = z
  .object({ stable: z.boolean().openapi({ description: 'The lubricant wets the texture at equilibrium (not displaced by the working fluid)' }), margin: z.number().openapi({ description: 'Energy margin, J/m²' }) })
  .openapi('WettingVerdict');

export const wettingCalculation = defineCalculation({
  name: 'wetting',
  path: '/v1/wetting',
  summary: 'Thermodynamic wetting state of the lubricant in the texture',
  description:
    'Roughness ratio, top solid fraction and hemiwicking critical angle (Bico, Thiele & Quéré 2002); the lubricant angle under the working fluid (given, or by Young’s law from in-air angles); spreading coefficients (cloaking); the state (film-covered, infused with exposed tops, not wetting) after Smith et al. (2013) with its energy margin; the interfacial tension used and its origin.',
  body: WettingRequest,
  response: envelopeSchema('WettingResponse', z.looseObject({}), WettingResultSchema, VerdictSchema),
  heavy: false,
  example: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
    lubricant: { id: 'n-decane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    contactAngles: { underWorkingFluid: { advancing: 40, receding: 15 } },
  },
  compute(input) {
    const notes = new Notes();
    const lubricant = resolveFluidInput(input.lubricant, 'lubricant', notes);
    const workingFluid = resolveFluidInput(input.workingFluid, 'workingFluid', notes);
    const texture = resolveTexture(input.texture);
    const wetting = evaluateWetting({
      texture,
      lubricant,
      workingFluid,
      contactAngles: input.contactAngles,
      ...(input.interfacialTension === undefined ? {} : { interfacialTension: input.interfacialTension }),
    });
    notes.merge(wetting);
    const r = wetting.result;
    return {
      inputs: { texture, lubricant: fluidEcho(lubricant), workingFluid: fluidEcho(workingFluid), contactAngles: input.contactAngles, interfacialTension: r.interfacialTension.value },
      result: r,
      verdict: r.verdict,
      ...notes,
    };
  },
});
