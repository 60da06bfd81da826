/** Response of POST /v1/heat. */
import { z } from '../zod.js';
import { envelopeSchema, num, numOrNull, SourcedNumberSchema } from './common.js';

export const HeatResultSchema = z
  .strictObject({
    heatFluxRatio: num(
      'The headline: q/q₀, heat delivered per unit wall area at the same temperature difference between the heated substrate and the bulk liquid, against the same wall with its grooves filled by the solid (= U/U₀)',
    ),
    nusseltRatio: numOrNull('Nusselt-number ratio Nu/Nu₀ on the ridge-top plane: the fluid-side film alone, without the wall’s own conduction'),
    thermalSlipLength: num('Apparent thermal slip length b_t, m (positive = added resistance, negative = enhancement)'),
    thermalSlipLengthClosedForm: num('b_t of the closed form, m'),
    slipLength: num('Velocity slip length used, m'),
    nusselt: numOrNull('Nu on D_h = 2H or D; null where the apparent Nu is undefined'),
    nusseltSmooth: num('Nu₀ of the solid-filled, no-slip wall'),
    heatTransferCoefficient: numOrNull('Fluid-side h = Nu k_w/D_h, W/(m²·K)'),
    heatTransferCoefficientSmooth: num('h₀, W/(m²·K)'),
    overallHeatTransferCoefficient: num('U from the substrate bottom to the bulk, W/(m²·K)'),
    overallHeatTransferCoefficientSmooth: num('U₀, W/(m²·K)'),
    reynoldsNumber: num('On the hydraulic diameter'),
    frictionRatio: num('Pressure-drop ratio at the same flow rate'),
    pressureGradient: num('Pressure drop per unit length, Pa/m'),
    pressureGradientSmooth: num('Of the smooth channel or pipe, Pa/m'),
    frictionFactorReynolds: numOrNull('Fanning f·Re on D_h (laminar), else null'),
    method: z.enum(['exact-core', 'closed-form', 'field', 'field-thermal-slip']).openapi({ description: 'Method that answered (exact-core: thermal slip from the exact core, the default)' }),
    closedFormError: z.strictObject({ nusselt: SourcedNumberSchema }).nullable().openapi({ description: '(Nu_closed − Nu_field)/Nu_field where the field cross-section ran' }),
    regime: z.enum(['laminar', 'turbulent']),
    confidence: z.enum(['normal', 'low']),
    groovePecletNumber: num('u_i w/α_o of the lubricant'),
    sensitivity: z
      .strictObject({
        lubricantConductivity: z.array(z.number()),
        nusseltRatio: z.array(z.number().nullable()),
        heatFluxRatio: z.array(z.number().nullable()),
        bestLubricantConductivity: num('W/(m·K)'),
        bestHeatFluxRatio: num('q/q₀ at the best conductivity'),
        thermalSlipMethod: z.enum(['exact-core', 'closed-form', 'field']),
      })
      .optional()
      .openapi({ description: 'Sweep of the lubricant conductivity' }),
  })
  .openapi('HeatResult');

export const HeatResponse = envelopeSchema('HeatResponse', HeatResultSchema);
