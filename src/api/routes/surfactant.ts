/** POST /v1/surfactant — how much of the slip survives traces of surfactant? */
import { Notes } from '../../core/notes.js';
import { evaluateSlip, type SlipMethod } from '../../physics/slip/slip.js';
import { dragChange } from '../../physics/slip/drag.js';
import { evaluateSurfactant } from '../../physics/surfactant/surfactant.js';
import { getSurfactant, resolveSurfactant } from '../../materials/surfactants.js';
import type { InterfaceType } from '../../core/surfactant.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { designEcho, resolveDesign } from '../resolve.js';
import { Concentration, FlowLength, Temperature } from '../schemas/quantities.js';
import { DesignShape, MethodSchema } from '../schemas/scenario.js';
import { z } from '../schemas/zod.js';

const positive = (description: string) => z.number().positive().max(1e12).openapi({ description });

export const SurfactantParametersSchema = z
  .strictObject({
    maximumSurfaceExcess: positive('Γ_m, mol/m²').optional(),
    langmuirConstant: positive('K, m³/mol').optional(),
    adsorptionRate: positive('κ_a, m³/(mol·s)').optional(),
    desorptionRate: positive('κ_d, 1/s').optional(),
    bulkDiffusivity: positive('D, m²/s').optional(),
    surfaceDiffusivity: positive('D_s, m²/s').optional(),
    gibbsPrefactor: z.number().min(1).max(3).optional().openapi({ description: 'n in σ = σ0 + nRTΓ_m ln(1 − Γ/Γ_m) (1 nonionic, 2 ionic without salt)' }),
    criticalMicelleConcentration: positive('CMC, mol/m³').optional(),
  })
  .openapi('SurfactantParameters', { description: 'Adsorption parameters for the interface in question (override or replace the catalogue)' });

export const SurfactantRequest = z
  .strictObject({
    ...DesignShape,
    surfactant: z
      .strictObject({
        id: z.string().min(1).max(64).optional().openapi({ description: 'Catalogue id (GET /v1/surfactants)', example: 'sds' }),
        name: z.string().max(100).optional(),
        parameters: SurfactantParametersSchema.optional(),
      })
      .openapi({ description: 'A catalogue surfactant and/or explicit parameters' }),
    bulkConcentration: z
      .union([Concentration, z.array(Concentration).min(1).max(50)])
      .openapi({ description: 'Bulk concentration, or a list (at most 50) for a curve' }),
    temperature: Temperature.optional().openapi({ description: 'Default: the working fluid temperature' }),
    method: z.enum(['scaling', 'solver', 'auto']).optional().openapi({ description: 'scaling theory (Landel et al. 2020), interface solver, or auto (default)' }),
    underlying: z.enum(['lubricant', 'gas']).optional().openapi({ description: 'What fills the grooves (default: gas when the lubricant is far less viscous than the working fluid)' }),
    grooveLength: FlowLength.optional().openapi({ description: 'Length of the streamwise grooves (finite grooves let surfactant build a gradient)' }),
    slipMethod: MethodSchema,
  })
  .openapi('SurfactantRequest');

const SurfactantResultSchema = z
  .looseObject({
    interfaceType: z.string(),
    cleanSlipLength: z.number().openapi({ description: 'Clean slip length along the flow, m (as /v1/slip)' }),
    slipLength: z.number().openapi({ description: 'Slip length with surfactant (first concentration), m' }),
    slipRetained: z.number().openapi({ description: 'Fraction of the clean slip that survives' }),
    regime: z.enum(['clean', 'partially-mobile', 'immobilised', 'stagnant-cap']),
    concentrationForHalfSlip: z.number().nullable().openapi({ description: 'Bulk concentration at which half the clean slip is lost, mol/m³' }),
    points: z.array(z.looseObject({})).openapi({ description: 'Per concentration: groups (Marangoni, Péclet, Biot, kinetic ratio), equilibrium, slip, Marangoni stress, tension drop, interface profile' }),
    curve: z.looseObject({}).openapi({ description: 'Slip retained against concentration, for plotting' }),
    drag: z.looseObject({ kind: z.string() }).openapi({ description: 'Drag change with the reduced slip (slip endpoint drag model)' }),
    cleanDrag: z.looseObject({ kind: z.string() }),
  })
  .openapi('SurfactantResult');

export const surfactantCalculation = defineCalculation({
  name: 'surfactant',
  path: '/v1/surfactant',
  summary: 'Slip surviving surfactant contamination',
  description:
    'Marangoni immobilisation of the interface by traces of surfactant: Langmuir–Szyszkowski equilibrium, the scaling theory of Landel et al. (2020) extended to a lubricant below the interface, and an interface solver (half-space Stokes, surface advection–diffusion with kinetic exchange, Newton for stagnant caps); the concentration that halves the slip, a curve, and the drag change with the reduced slip.',
  body: SurfactantRequest,
  response: envelopeSchema('SurfactantResponse', z.looseObject({}), SurfactantResultSchema),
  heavy: true,
  example: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '50 um', flowAngle: 90 },
    lubricant: { id: 'silicone-oil-5cst', temperature: '25 degC' },
    workingFluid: { id: 'water', temperature: '25 degC' },
    flow: { kind: 'channel', height: '5 mm', bulkVelocity: '0.1 m/s' },
    interfacialTension: '40 mN/m',
    surfactant: { id: 'sds' },
    bulkConcentration: '0.001 mM',
    method: 'scaling',
    slipMethod: 'closed-form',
  },
  compute(input) {
    const notes = new Notes();
    const { scenario } = resolveDesign(input, notes, false);
    const slipMethod: SlipMethod = input.slipMethod ?? 'auto';
    const slip = evaluateSlip({ scenario, method: slipMethod });
    notes.cite(...slip.references);
    notes.assume(`Clean slip from the ${slip.result.method} slip solution (as /v1/slip).`);
    const gasFilled = input.underlying === 'gas' || (input.underlying === undefined && scenario.lubricant.viscosity < 0.05 * scenario.workingFluid.viscosity);
    let interfaceType: InterfaceType = gasFilled ? 'air-water' : 'oil-water';
    const entry = input.surfactant.id === undefined ? undefined : getSurfactant(input.surfactant.id);
    const p = input.surfactant.parameters;
    const fullParameters = p?.maximumSurfaceExcess !== undefined && p.langmuirConstant !== undefined && p.bulkDiffusivity !== undefined && p.gibbsPrefactor !== undefined;
    if (interfaceType === 'oil-water' && entry && !entry.interfaces['oil-water'] && entry.interfaces['air-water'] && !fullParameters) {
      // Adsorption differs between interfaces; without oil–water data the air–water set is the only
      // sourced stand-in, and the user must know that the answer rests on it.
      interfaceType = 'air-water';
      notes.warn(
        'oil-water-constants-missing',
        `The catalogue has no oil–water adsorption data for ${entry.name}; its air–water constants stand in. Adsorption at an oil–water interface differs (often stronger): give surfactant.parameters measured for your lubricant.`,
        'warning',
      );
    }
    const surfactant = resolveSurfactant({
      ...(input.surfactant.id === undefined ? {} : { id: input.surfactant.id }),
      ...(input.surfactant.name === undefined ? {} : { name: input.surfactant.name }),
      ...(p === undefined ? {} : { parameters: p }),
      interfaceType,
    });
    const out = evaluateSurfactant({
      scenario,
      surfactant,
      bulkConcentration: input.bulkConcentration,
      temperature: input.temperature ?? scenario.workingFluid.temperature,
      method: input.method ?? 'auto',
      cleanSlip: {
        slipLengthLongitudinal: slip.result.slipLengthLongitudinal,
        slipLengthTransverse: slip.result.slipLengthTransverse,
        localSlipLengthMean: slip.result.localSlipLength.longitudinalMean,
      },
      ...(input.underlying === undefined ? {} : { underlying: input.underlying }),
      ...(input.grooveLength === undefined ? {} : { grooveLength: input.grooveLength }),
    });
    notes.merge(out);
    const retained = out.result.slipRetained;
    notes.assume('Drag with surfactant: slip along the flow and spanwise both scaled by the retained fraction, then the /v1/slip drag model.');
    const nu = scenario.workingFluid.viscosity / scenario.workingFluid.density;
    const drag = dragChange(scenario, out.result.slipLength, slip.result.slipLengthSpanwise * retained, nu, notes);
    return {
      inputs: {
        ...designEcho(scenario, input.flow),
        surfactant: { id: surfactant.id, name: surfactant.name, interfaceType },
        bulkConcentration: input.bulkConcentration,
        temperature: input.temperature ?? scenario.workingFluid.temperature,
        method: input.method ?? 'auto',
      },
      result: { ...out.result, drag, cleanDrag: slip.result.drag },
      ...notes,
    };
  },
});
