/** The sweep's place in the OpenAPI document: request, the three answer forms, the limit. */
import type { OpenAPIRegistry, ResponseConfig, ZodContentObject } from '@asteasolutions/zod-to-openapi';
import { z } from '../schemas/zod.js';
import { SweepRequestSchema } from './schema.js';

const cellSchema = z.union([z.number(), z.string(), z.boolean(), z.null()]);

export const SweepResponseSchema = z
  .strictObject({
    calculation: z.string(),
    sweepId: z.string().openapi({ description: 'SHA-256 of the canonical request without its shard: equal for every shard of one sweep' }),
    totalPoints: z.number().int().openapi({ description: 'Points of the whole sweep (every shard)' }),
    shard: z.strictObject({ index: z.number().int(), count: z.number().int(), start: z.number().int(), end: z.number().int() }).openapi({ description: 'The slice computed: points start … end − 1' }),
    columns: z.array(z.strictObject({ name: z.string(), unit: z.string().nullable().openapi({ description: 'SI unit, null where dimensionless or not stated' }) })),
    points: z.array(
      z.strictObject({
        index: z.number().int(),
        values: z.record(z.string(), cellSchema).openapi({ description: 'One value per column, by column name; null where the point has none' }),
        problem: z
          .strictObject({ title: z.string(), status: z.number().int(), detail: z.string().optional(), errors: z.array(z.strictObject({ path: z.string(), message: z.string() })).optional() })
          .optional()
          .openapi({ description: 'Why this point failed (as the single-point endpoint would answer it)' }),
      }),
    ),
    failed: z.number().int().openapi({ description: 'Points that failed' }),
  })
  .openapi('SweepResponse');

const EXAMPLE = {
  calculation: 'flow',
  design: { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' } },
  axes: [
    { path: 'flow.bulkVelocity', range: { from: '0.1 m/s', to: '3 m/s', points: 30, spacing: 'log' } },
    { path: 'flow.height', values: ['5 mm', '10 mm', '20 mm'] },
  ],
};

export function registerSweepPaths(registry: OpenAPIRegistry, problemContent: ZodContentObject, errorResponses: Record<number, ResponseConfig>): void {
  registry.registerPath({
    method: 'post',
    path: '/v1/sweep',
    operationId: 'sweep',
    summary: 'Any calculation over a grid of input values',
    description:
      'Runs the named calculation at every point of a grid (or zip) of axes: dot paths into the design document, each with a list of values or a linear or log range (unit strings allowed). Output columns are paths into the single-point response (default: the calculation’s main results) plus the warning codes. Accept: application/json (default), text/csv (header row with SI units, an error column with the problem title of a failed point) or application/x-ndjson (streamed as points finish, with progress lines; closing the connection stops the sweep). Points are in a fixed order (grid: first axis slowest); shard {index, count} selects a contiguous slice so that shards concatenated equal the whole. A point that fails is a row with its problem, never a failed sweep. An assessment point computes no sensitivities unless the design sets options.marginSensitivities.enabled to true, and no plot data (the heat-plot conductivity sweep).',
    tags: ['calculations'],
    security: [{}, { apiKey: [] }],
    request: { body: { required: true, content: { 'application/json': { schema: SweepRequestSchema, example: EXAMPLE } } } },
    responses: {
      200: {
        description: 'The points, in index order',
        content: {
          'application/json': { schema: SweepResponseSchema },
          'text/csv': { schema: z.string().openapi({ description: 'index, one column per axis and output ("name (unit)"), error' }) },
          'application/x-ndjson': { schema: z.string().openapi({ description: 'Lines of kind sweep, point, progress and end' }) },
        },
      },
      ...errorResponses,
      413: { description: 'More points than one request may compute (OILSKIN_SWEEP_MAX_POINTS); the detail says how many shards', content: problemContent },
    },
  });
}
