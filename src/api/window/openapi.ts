/** The design window's place in the OpenAPI document. */
import type { OpenAPIRegistry, ResponseConfig, ZodContentObject } from '@asteasolutions/zod-to-openapi';
import { z } from '../schemas/zod.js';
import { WindowRequestSchema } from './schema.js';

const nullableNumber = z.number().nullable();

const WindowDesignSchema = z
  .object({
    grooveWidth: z.number().openapi({ description: 'm' }),
    pitch: z.number().openapi({ description: 'm' }),
    grooveDepth: z.number().openapi({ description: 'm' }),
    interfaceFraction: z.number(),
    lubricant: z.string().optional(),
    label: z.string().openapi({ description: '"feasible", or the requirement that limits the design (smallest margin), or "outside the models"' }),
    margins: z.record(z.string(), z.number()).openapi({ description: 'Margin of each requirement evaluated (dimensionless, ≥ 0 exactly when met)' }),
    dragReduction: nullableNumber.openapi({ description: 'Drag reduction credited at the service time' }),
    retainedFraction: nullableNumber.openapi({ description: 'Retained share of the groove volume at the service time' }),
    waveMargin: nullableNumber.openapi({ description: 'Waves margin 1 − Π_max/Π_calm (Π_calm = 2^(−1/4), the calm band edge)' }),
    problem: z.string().optional(),
  })
  .openapi('WindowDesign');

export const DesignWindowResponseSchema = z
  .object({
    requirements: z.record(z.string(), z.union([z.number(), z.boolean()])).openapi({ description: 'Requirements in effect (defaults filled in)' }),
    objective: z.enum(['dragReduction', 'retainedFraction', 'waveMargin']),
    candidates: z.number().int(),
    evaluated: z.number().int(),
    feasibleCandidates: z.number().int(),
    limitingShare: z.record(z.string(), z.number()).openapi({ description: 'Share of the candidates labelled by each requirement (and feasible)' }),
    best: WindowDesignSchema.nullable(),
    pareto: z.array(WindowDesignSchema),
    boundary: z.array(WindowDesignSchema),
    feasible: z.array(WindowDesignSchema),
    plane: z.object({
      lubricant: z.string().optional(),
      pitch: z.number().optional(),
      interfaceFraction: z.number().optional(),
      grooveWidths: z.array(z.number()),
      grooveDepths: z.array(z.number()),
      labels: z.array(z.array(z.string())).openapi({ description: 'labels[depth index][width index]' }),
    }),
    assumptions: z.array(z.string()),
    computeMs: z.number(),
  })
  .openapi('DesignWindowResponse');

/** A small window (3 × 3 coarse lattice, one refinement) over the invented demo channel of examples/design-window.json. */
const EXAMPLE = {
  design: {
    texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '25 um', grooveLength: '20 mm' },
    lubricant: { id: 'n-decane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    contactAngles: { underWorkingFluid: { advancing: 120, receding: 80 } },
    flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
    options: { method: 'closed-form' },
  },
  search: {
    grooveWidth: { min: '5 um', max: '300 um' },
    interfaceFraction: { min: 0.5, max: 0.5 },
    grooveDepth: { min: '2 um', max: '200 um' },
    coarsePoints: 3,
    refinements: 1,
  },
  requirements: { minDragReduction: 0.02, minRetainedFraction: 0.5, serviceTime: '2 h' },
  objective: 'dragReduction',
};

export function registerWindowPaths(registry: OpenAPIRegistry, problemContent: ZodContentObject, errorResponses: Record<number, ResponseConfig>): void {
  registry.registerPath({
    method: 'post',
    path: '/v1/design-window',
    operationId: 'designWindow',
    summary: 'Which grooves (and lubricants) meet every requirement',
    description:
      'Adaptive search of groove width, pitch (or interface fraction) and depth within bounds, for each candidate lubricant: the coarse lattice, then cells whose corners differ refined by halving. Returns the feasible designs, the boundary, the Pareto front (drag reduction, retained share, waves margin), the best design by the objective, the share of candidates each requirement limits, the number of designs evaluated; Accept: image/svg+xml returns the plot of the width × depth plane through the best design.',
    tags: ['calculations'],
    security: [{}, { apiKey: [] }],
    request: { body: { required: true, content: { 'application/json': { schema: WindowRequestSchema, example: EXAMPLE } } } },
    responses: {
      200: {
        description: 'The window',
        content: { 'application/json': { schema: DesignWindowResponseSchema }, 'image/svg+xml': { schema: z.string().openapi({ description: 'The plot of the window' }) } },
      },
      ...errorResponses,
      413: { description: 'More candidates than one request may hold', content: problemContent },
    },
  });
}
