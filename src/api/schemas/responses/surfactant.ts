/** Response of POST /v1/surfactant. */
import { z } from '../zod.js';
import { envelopeSchema, num, numOrNull } from './common.js';
import { DragChangeSchema } from './slip.js';

const RegimeSchema = z.enum(['clean', 'partially-mobile', 'immobilised', 'stagnant-cap']);

const GroupsSchema = z
  .strictObject({
    dimensionlessConcentration: num('k = K c'),
    marangoniNumber: num('Ma on the gap length'),
    bulkPecletNumber: num('Pe = γ̇ g²/D'),
    interfacialPecletNumber: num('Pe_I'),
    biotNumber: num('Bi = κ_d/γ̇').optional(),
    kineticRatio: num('χ'),
    exchangeNumber: num('Kinetic exchange against advection').optional(),
    diffusiveExchangeNumber: num('Diffusion-limited exchange against advection'),
    diffusiveLayerThickness: num('δ, m'),
  })
  .openapi('SurfactantGroups');

const ProfileSchema = z
  .strictObject({
    position: z.array(z.number()),
    velocity: z.array(z.number()),
    cleanVelocity: z.array(z.number()),
    surfaceExcess: z.array(z.number()),
    marangoniStress: z.array(z.number()),
    tensionChange: z.array(z.number()),
  })
  .openapi('InterfaceProfile', { description: 'Along the gap (0 to w) or the groove (0 to L_g): velocity, clean velocity (m/s), Γ (mol/m²), Marangoni stress (Pa), σ − σ_eq (N/m)' });

const PointSchema = z.strictObject({
  bulkConcentration: num('mol/m³'),
  method: z.enum(['scaling', 'solver']).openapi({ description: 'Method used at this concentration' }),
  equilibrium: z.strictObject({
    bulkConcentration: num('mol/m³'),
    surfaceExcess: num('Γ, mol/m²'),
    coverage: num('Γ/Γ_m'),
    dimensionlessConcentration: num('K c'),
    surfaceTension: num('σ, N/m').optional(),
    surfaceTensionDrop: num('σ0 − σ, N/m'),
    gibbsElasticity: num('N/m'),
    aboveCriticalMicelleConcentration: z.boolean(),
  }),
  groups: GroupsSchema,
  groupsLongitudinal: GroupsSchema.optional(),
  marangoniReduction: num('γ_Ma, transverse gap'),
  marangoniReductionLongitudinal: num('γ_Ma, finite streamwise groove').optional(),
  slipLengthTransverse: num('m'),
  slipLengthLongitudinal: num('m'),
  slipLength: num('Along the flow, m'),
  slipRetained: num('Fraction of the clean slip along the flow'),
  regime: RegimeSchema,
  marangoniStress: num('Mean on the transverse gap, Pa'),
  surfaceTensionDrop: num('Along the transverse gap, N/m'),
  interfaceProfile: ProfileSchema,
  grooveProfile: ProfileSchema.optional(),
  validity: z.strictObject({
    dilute: z.boolean(),
    stokes: z.boolean(),
    belowCriticalMicelleConcentration: z.boolean(),
    uniformMarangoni: z.boolean(),
    longWave: z.boolean().optional(),
  }),
  solver: z
    .strictObject({
      iterations: z.number().int(),
      residual: z.number(),
      tolerance: z.number(),
      cells: z.number().int(),
      linearSlipRetained: z.number(),
      continuationSteps: z.number().int(),
      longWaveIterations: z.number().int().optional(),
    })
    .optional(),
});

export const SurfactantResultSchema = z
  .strictObject({
    interfaceType: z.enum(['air-water', 'oil-water']),
    cleanSlipLength: num('Clean slip length along the flow, m (as /v1/slip)'),
    points: z.array(PointSchema),
    slipLength: num('Slip length with surfactant (first concentration), m'),
    slipRetained: num('Fraction of the clean slip that survives (first concentration)'),
    regime: RegimeSchema,
    concentrationForHalfSlip: numOrNull('Bulk concentration at which half the clean slip is lost, mol/m³'),
    curve: z.strictObject({ method: z.enum(['scaling', 'solver', 'auto']), bulkConcentration: z.array(z.number()), slipRetained: z.array(z.number()) }),
    drag: DragChangeSchema.openapi({ description: 'Drag change with the reduced slip' }),
    cleanDrag: DragChangeSchema.openapi({ description: 'Drag change of the clean interface' }),
  })
  .openapi('SurfactantResult');

export const SurfactantResponse = envelopeSchema('SurfactantResponse', SurfactantResultSchema);
