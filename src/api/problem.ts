/**
 * RFC 9457 problem details. Every error the service sends is one of these,
 * with media type application/problem+json.
 */
import type { ZodError } from 'zod';
import { z } from './schemas/zod.js';

export interface FieldError {
  /** Dot-separated path of the offending field in the request body ("texture.grooveWidth"); "" for the body. */
  path: string;
  message: string;
}

export interface Problem {
  type: string;
  title: string;
  status: number;
  detail?: string;
  instance?: string;
  errors?: FieldError[];
  /** Iterations spent by a solver that did not converge. */
  iterations?: number;
}

const TYPE_BASE = 'https://oilskin.invalid/problems/';

export class ProblemError extends Error {
  readonly problem: Problem;
  readonly headers: Record<string, string>;
  constructor(problem: Problem, headers: Record<string, string> = {}) {
    super(problem.detail ?? problem.title);
    this.problem = problem;
    this.headers = headers;
  }
}

export function problem(status: number, slug: string, title: string, detail?: string, extra: Partial<Problem> = {}): Problem {
  return { type: TYPE_BASE + slug, title, status, ...(detail === undefined ? {} : { detail }), ...extra };
}

export function pathToString(path: readonly PropertyKey[]): string {
  return path.map((p) => (typeof p === 'number' ? `[${p}]` : String(p))).join('.').replace(/\.\[/g, '[');
}

/** Flatten zod issues into field errors; unknown keys get their own path. */
export function zodFieldErrors(error: ZodError, prefix = ''): FieldError[] {
  const out: FieldError[] = [];
  for (const issue of error.issues) {
    const base = pathToString(issue.path);
    const withPrefix = (p: string) => [prefix, p].filter((s) => s !== '').join('.');
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) out.push({ path: withPrefix([base, key].filter((s) => s !== '').join('.')), message: `unknown field "${key}"` });
    } else {
      out.push({ path: withPrefix(base), message: issue.message });
    }
  }
  return out;
}

export function validationProblem(errors: FieldError[]): ProblemError {
  const first = errors[0];
  return new ProblemError(
    problem(422, 'validation', 'The request is not valid', first ? `${first.path || 'body'}: ${first.message}` : undefined, { errors }),
  );
}

export const ProblemSchema = z
  .object({
    type: z.string().openapi({ description: 'URI identifying the problem type' }),
    title: z.string(),
    status: z.number().int(),
    detail: z.string().optional(),
    instance: z.string().optional(),
    errors: z
      .array(z.object({ path: z.string().openapi({ description: 'Dot-separated path of the offending field' }), message: z.string() }))
      .optional(),
    iterations: z.number().int().optional(),
  })
  .openapi('Problem', { description: 'RFC 9457 problem details' });
