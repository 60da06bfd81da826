/**
 * The design document's parts that only the assessment reads: the requirements
 * the design must meet (each optional; the defaults are stated in the response)
 * and the settings of the margin sensitivities (options.marginSensitivities).
 * Built from the quantity schemas of ./quantities.ts; ./design.ts composes them.
 */
import type { AssessmentRequirements } from '../../physics/design/assess.js';
import { Concentration, Duration, Fraction } from './quantities.js';
import { z } from './zod.js';

export const RequirementsSchema = z
  .strictObject({
    minDragReduction: z.number().gt(0).max(1).optional().openapi({ description: 'Smallest drag reduction credited at the end of the service time, fraction (default 0.05)' }),
    serviceTime: Duration.optional().openapi({ description: 'Service time the retention and drag requirements apply at (default options.duration, else 2 h)' }),
    minRetainedFraction: Fraction.optional().openapi({ description: 'Smallest share of the groove volume still filled at the service time (default 0.5)' }),
    minWaveMargin: z.number().min(0).lt(1).optional().openapi({ description: 'Share of the calm band’s load that must stay unused, 0–1 (default 0: calm is enough)' }),
    tolerableSurfactantConcentration: Concentration.optional().openapi({ description: 'Highest surfactant concentration the design must tolerate (default: the water’s stated concentration)' }),
    minSlipRetained: Fraction.optional().openapi({ description: 'Share of the clean slip that must survive at the tolerable concentration (default 0.5)' }),
    minHeatTransferChange: z.number().gt(-1).max(10).optional().openapi({ description: 'Smallest heat-transfer change q/q₀ − 1 against the solid-filled wall (default −0.1)' }),
  })
  .openapi('Requirements', { description: 'What the design must achieve (read by the assessment); every value optional, the defaults are stated in the response' });

export const SensitivitySettingsSchema = z
  .strictObject({
    enabled: z.boolean().optional().openapi({ description: 'Compute the sensitivities (default true; each knob costs one more assessment)' }),
    relativeStep: z.number().min(0.001).max(0.2).optional().openapi({ description: 'Relative step of the one-sided finite differences (default 0.02)' }),
  })
  .openapi('MarginSensitivities', { description: 'Assessment: finite-difference sensitivities of every margin to w, P, d, γ and μ_o' });

type _RequirementsMatchPhysics = z.output<typeof RequirementsSchema> extends AssessmentRequirements ? true : never;
export const REQUIREMENTS_SCHEMA_MATCHES_PHYSICS: _RequirementsMatchPhysics = true;
