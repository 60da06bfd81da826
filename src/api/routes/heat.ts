/** POST /v1/heat — how the liquid-infused wall changes heat transfer against the solid-filled wall. */
import { Notes } from '../../core/notes.js';
import { evaluateHeat } from '../../physics/heat/heat.js';
import { evaluateSlip } from '../../physics/slip/slip.js';
import { defineCalculation } from '../calculation.js';
import { envelopeSchema } from '../envelope.js';
import { designEcho, resolveDesign } from '../resolve.js';
import { TextureLength, ThermalConductivity } from '../schemas/quantities.js';
import { DesignShape, MethodSchema } from '../schemas/scenario.js';
import { z } from '../schemas/zod.js';

export const HeatRequest = z
  .strictObject({
    ...DesignShape,
    solid: z.strictObject({
      thermalConductivity: ThermalConductivity.openapi({ description: 'Conductivity of the textured solid' }),
      substrateThickness: TextureLength.openapi({ description: 'Solid below the groove floor', example: '20 um' }),
    }),
    heating: z.enum(['uniform-flux', 'uniform-temperature']).optional().openapi({ description: 'Thermal boundary condition (default uniform-flux)' }),
    heatedWalls: z.enum(['one', 'both']).optional().openapi({ description: 'Channel: heated textured walls (default both); a pipe is heated all round' }),
    lubricantMotion: z.enum(['co-flowing', 'zero-net-flux']).optional().openapi({ description: 'Open grooves co-flow; closed grooves recirculate with zero net flux (default co-flowing)' }),
    method: MethodSchema,
    sensitivity: z.strictObject({ points: z.number().int().min(2).max(101) }).optional().openapi({ description: 'Sweep of the lubricant conductivity for plotting' }),
  })
  .openapi('HeatRequest');

const HeatResultSchema = z
  .looseObject({
    thermalSlipLength: z.number().openapi({ description: 'Apparent thermal slip length b_t, m (positive = added resistance, negative = enhancement)' }),
    slipLength: z.number().openapi({ description: 'Velocity slip length used, m' }),
    nusselt: z.number().nullable().openapi({ description: 'Nu on D_h = 2H or D; null where the apparent Nu is undefined' }),
    nusseltSmooth: z.number().openapi({ description: 'Nu of the solid-filled, no-slip wall' }),
    nusseltRatio: z.number().nullable().openapi({ description: 'Nu / Nu_smooth at the same flow rate' }),
    heatFluxRatio: z.number().openapi({ description: 'Heat delivered at the same temperature difference, relative to the solid-filled wall' }),
    frictionRatio: z.number().openapi({ description: 'f·Re / (f·Re)_smooth' }),
    method: z.string(),
    closedFormError: z.looseObject({}).nullable(),
    confidence: z.enum(['normal', 'low']),
    sensitivity: z.looseObject({}).optional(),
  })
  .openapi('HeatResult');

export const heatCalculation = defineCalculation({
  name: 'heat',
  path: '/v1/heat',
  summary: 'Heat-transfer change of the surface against the solid-filled wall',
  description:
    'Apparent thermal slip length (closed forms, or the exact conduction solution on the groove cell with fluid, lubricant and solid conductivities and the substrate); laminar fully developed channel or pipe Nusselt numbers with slip and thermal slip (closed forms for uniform flux, shooting eigenproblem for uniform wall temperature, or velocity and temperature solved together on the cross-section); turbulent estimate from Gnielinski (1976) with shifted log laws (low confidence); a sweep over the lubricant conductivity.',
  body: HeatRequest,
  response: envelopeSchema('HeatResponse', z.looseObject({}), HeatResultSchema),
  heavy: true,
  example: {
    texture: { grooveWidth: '10 um', pitch: '20 um', grooveDepth: '10 um' },
    lubricant: { id: 'n-dodecane', temperature: '25 degC' },
    workingFluid: { id: 'water', temperature: '25 degC' },
    flow: { kind: 'channel', height: '200 um', bulkVelocity: '0.05 m/s' },
    solid: { thermalConductivity: '0.2 W/(m*K)', substrateThickness: '20 um' },
    method: 'closed-form',
  },
  compute(input) {
    const notes = new Notes();
    const { scenario } = resolveDesign(input, notes, false);
    const method = input.method ?? 'auto';
    // The velocity slip feeds the heat model; the field heat method re-solves it on the cross-section.
    const slip = evaluateSlip({ scenario, method: method === 'field' ? 'field' : 'closed-form' });
    notes.cite(...slip.references);
    const drag = slip.result.drag;
    const heat = evaluateHeat({
      scenario,
      solid: input.solid,
      heating: input.heating ?? 'uniform-flux',
      heatedWalls: input.heatedWalls ?? 'both',
      lubricantMotion: input.lubricantMotion ?? 'co-flowing',
      method,
      slip: {
        slipLengthLongitudinal: slip.result.slipLengthAlongFlow,
        ...(drag.kind === 'turbulent-fixed-bulk-reynolds' ? { deltaUPlus: drag.deltaUPlus, dragReduction: drag.dragReduction } : {}),
      },
      ...(input.sensitivity ? { sensitivity: input.sensitivity } : {}),
    });
    notes.merge(heat);
    return {
      inputs: { ...designEcho(scenario, input.flow), solid: input.solid, heating: input.heating ?? 'uniform-flux', heatedWalls: input.heatedWalls ?? 'both', lubricantMotion: input.lubricantMotion ?? 'co-flowing', method },
      result: heat.result,
      ...notes,
    };
  },
});
