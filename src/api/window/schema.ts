/** The design-window request: the design (service conditions), the box to search, the requirements, the objective. */
import { z } from '../schemas/zod.js';
import { DesignSchema } from '../schemas/design.js';
import { RequirementsSchema } from '../schemas/assess.js';
import { Fraction, TextureLength } from '../schemas/quantities.js';

const lengthBounds = (what: string) =>
  z
    .strictObject({ min: TextureLength, max: TextureLength })
    .superRefine((b, ctx) => {
      if (b.min > b.max) ctx.addIssue({ code: 'custom', path: ['max'], message: `the largest ${what} must not be below the smallest` });
    })
    .openapi({ description: `Smallest and largest ${what} (equal: held fixed)` });

export const WindowRequestSchema = z
  .strictObject({
    design: DesignSchema.openapi({ description: 'Service conditions and the rest of the design; the searched texture fields are overwritten per candidate' }),
    search: z
      .strictObject({
        grooveWidth: lengthBounds('groove width'),
        pitch: lengthBounds('pitch').optional(),
        interfaceFraction: z
          .strictObject({ min: Fraction, max: Fraction })
          .superRefine((b, ctx) => {
            if (b.min > b.max) ctx.addIssue({ code: 'custom', path: ['max'], message: 'the largest interface fraction must not be below the smallest' });
            if (b.min <= 0 || b.max >= 1) ctx.addIssue({ code: 'custom', path: ['min'], message: 'the interface fraction w/P lies strictly between 0 and 1' });
          })
          .optional()
          .openapi({ description: 'Interface fraction w/P searched instead of the pitch' }),
        grooveDepth: lengthBounds('groove depth'),
        lubricants: z.array(z.string().min(1).max(64)).min(1).max(8).optional().openapi({ description: 'Catalogue ids of candidate lubricants (default: the design’s lubricant)' }),
        coarsePoints: z.number().int().min(2).max(33).optional().openapi({ description: 'Coarse lattice points per searched dimension (default 9)' }),
        refinements: z.number().int().min(0).max(5).optional().openapi({ description: 'Halvings of the coarse step at the boundary (default 3)' }),
      })
      .superRefine((s, ctx) => {
        if (s.pitch !== undefined && s.interfaceFraction !== undefined) ctx.addIssue({ code: 'custom', path: ['interfaceFraction'], message: 'search the pitch or the interface fraction, not both' });
      }),
    // The assessment's fields, inlined (an allOf of two closed objects would accept nothing).
    requirements: z
      .strictObject({
        ...RequirementsSchema.shape,
        stableWetting: z.boolean().optional().openapi({ description: 'Also require a stable infused wetting state (default false: pinning may hold the lubricant)' }),
      })
      .optional()
      .openapi({
        description:
          'What every design must achieve: the assessment’s requirements (POST /v1/assess, same defaults), over those of design.requirements, plus stableWetting',
      }),
    objective: z.enum(['dragReduction', 'retainedFraction', 'waveMargin']).optional().openapi({ description: 'What the best design maximises (default dragReduction)' }),
  })
  .openapi('DesignWindowRequest');

export type WindowRequest = z.output<typeof WindowRequestSchema>;
