/**
 * The sweep request: one design document, the calculation to run on it, the
 * axes (paths into the document, each with a list of values or a linear or
 * logarithmic range), how the axes combine, the output columns and the shard.
 * Names are ours; the design is the same document every calculation takes.
 */
import { z } from '../schemas/zod.js';
import { DesignSchema } from '../schemas/design.js';

const DOCUMENT_PATH = /^[A-Za-z][A-Za-z0-9]*(\.[A-Za-z][A-Za-z0-9]*){0,5}$/;
const OUTPUT_PATH = /^[A-Za-z][A-Za-z0-9-]*(\.[A-Za-z][A-Za-z0-9-]*){0,7}$/;

const Bound = z.union([z.number(), z.string().max(100)]);

export const SweepRangeSchema = z
  .strictObject({
    from: Bound.openapi({ description: 'First value (a number in SI or a string with a unit)', example: '10 um' }),
    to: Bound.openapi({ description: 'Last value (included)', example: '100 um' }),
    points: z.number().int().min(2).max(1_000_000).openapi({ description: 'Number of values, both ends included' }),
    spacing: z.enum(['linear', 'log']).optional().openapi({ description: 'Even steps (linear, default) or even ratios (log; both ends must be positive)' }),
  })
  .openapi('SweepRange');

export const SweepAxisSchema = z
  .strictObject({
    path: z.string().max(200).regex(DOCUMENT_PATH, 'a dot-separated path into the design document, e.g. texture.grooveWidth').openapi({ example: 'texture.grooveWidth' }),
    values: z
      .array(z.union([z.number(), z.string().max(100), z.boolean(), z.record(z.string(), z.unknown())]))
      .min(1)
      .max(10_000)
      .optional()
      .openapi({ description: 'The values, in order: numbers (SI), strings with units, catalogue ids, enum values, or whole parts of the document' }),
    range: SweepRangeSchema.optional(),
  })
  .superRefine((axis, ctx) => {
    if ((axis.values === undefined) === (axis.range === undefined)) ctx.addIssue({ code: 'custom', path: ['values'], message: 'give either values or range' });
  })
  .openapi('SweepAxis', { description: 'One varied input: a path into the design document and its values' });

export const ShardSchema = z
  .strictObject({
    index: z.number().int().min(0).openapi({ description: 'Which slice, from 0 to count − 1' }),
    count: z.number().int().min(1).max(1_000_000).openapi({ description: 'Number of equal contiguous slices of the sweep' }),
  })
  .superRefine((s, ctx) => {
    if (s.index >= s.count) ctx.addIssue({ code: 'custom', path: ['index'], message: `shard index ${s.index} must be below the shard count ${s.count}` });
  })
  .openapi('Shard', { description: 'A contiguous slice of the points: slice i holds points ⌊i·N/count⌋ to ⌊(i+1)·N/count⌋ − 1' });

export const SweepRequestSchema = z
  .strictObject({
    calculation: z.string().min(1).max(64).openapi({ description: 'Name of the calculation to run at every point (flow, wetting, retention, slip, waves, surfactant, heat, …)', example: 'flow' }),
    design: DesignSchema,
    axes: z.array(SweepAxisSchema).min(1).max(8),
    combine: z
      .enum(['grid', 'zip'])
      .optional()
      .openapi({ description: 'grid (default): every combination, the first axis varying slowest; zip: the i-th values of every axis together (equal lengths)' }),
    columns: z
      .array(z.string().max(200).regex(OUTPUT_PATH, 'a dot-separated path into the response, e.g. result.wallShearStress'))
      .min(1)
      .max(100)
      .optional()
      .openapi({ description: 'Output columns by path into the single-point response (result.…, verdict.…, inputs.…, or warnings); default: the calculation’s main results' }),
    shard: ShardSchema.optional(),
  })
  .openapi('SweepRequest', { description: 'A calculation over a grid of input values of one design document' });

export type SweepRequest = z.output<typeof SweepRequestSchema>;
export type SweepAxis = z.output<typeof SweepAxisSchema>;
