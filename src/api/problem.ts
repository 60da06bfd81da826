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

type Issue = ZodError['issues'][number];

/** A field that is absent (zod reports the type it expected and that it received undefined). */
function isMissing(issue: Issue): boolean {
  return issue.code === 'invalid_type' && /received undefined$/.test(issue.message);
}

/** True when every issue of a union branch says the value has the wrong type for that branch. */
function wrongTypeForBranch(issues: readonly Issue[]): boolean {
  return issues.every(
    (i) =>
      i.path.length === 0 &&
      (i.code === 'invalid_type' || (i.code === 'invalid_union' && (i as { errors?: Issue[][] }).errors?.every(wrongTypeForBranch) === true)),
  );
}

/** True when a union branch failed only because the value is absent. */
function absentInBranch(issues: readonly Issue[]): boolean {
  return issues.every((i) => isMissing(i) || (i.code === 'invalid_union' && (i as { errors?: Issue[][] }).errors?.every(absentInBranch) === true));
}

/** Types the branches of a union expected, for a message when the value fits none of them. */
function expectedTypes(branches: readonly (readonly Issue[])[]): string[] {
  const out = new Set<string>();
  for (const branch of branches) {
    for (const i of branch) {
      if (i.code === 'invalid_type') out.add(String((i as { expected?: unknown }).expected));
      else if (i.code === 'invalid_union') for (const t of expectedTypes((i as { errors?: Issue[][] }).errors ?? [])) out.add(t);
    }
  }
  return [...out];
}

/**
 * Flatten zod issues into field errors. Unknown keys get their own path; a
 * missing field says so; a value that fits no branch of a union (a quantity
 * or a list of them, say) gets the message of the branch its type matched
 * ("has the wrong dimension…"), not a bare "Invalid input".
 */
export function zodFieldErrors(error: ZodError, prefix = ''): FieldError[] {
  return flattenIssues(error.issues, [], prefix);
}

function flattenIssues(issues: readonly Issue[], base: readonly PropertyKey[], prefix: string): FieldError[] {
  const out: FieldError[] = [];
  const withPrefix = (p: string) => [prefix, p].filter((s) => s !== '').join('.');
  for (const issue of issues) {
    const path = [...base, ...issue.path];
    const at = pathToString(path);
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) out.push({ path: withPrefix([at, key].filter((s) => s !== '').join('.')), message: `unknown field "${key}"` });
    } else if (issue.code === 'invalid_union' && (issue as { errors?: Issue[][] }).errors?.length) {
      const branches = (issue as { errors: Issue[][] }).errors;
      const fitting = branches.find((b) => !wrongTypeForBranch(b));
      if (branches.every(absentInBranch)) out.push({ path: withPrefix(at), message: 'missing required property' });
      else if (fitting) out.push(...flattenIssues(fitting, path, prefix));
      else out.push({ path: withPrefix(at), message: `not valid: expected ${expectedTypes(branches).join(' or ')}` });
    } else if (isMissing(issue)) {
      out.push({ path: withPrefix(at), message: 'missing required property' });
    } else {
      out.push({ path: withPrefix(at), message: issue.message });
    }
  }
  return out;
}

export function validationProblem(errors: FieldError[]): ProblemError {
  const first = errors[0];
  const allMissing = errors.length > 0 && errors.every((e) => e.message === 'missing required property');
  return new ProblemError(
    problem(
      422,
      allMissing ? 'missing-property' : 'validation',
      allMissing ? 'A required property is missing' : 'The request is not valid',
      first ? `${first.path || 'body'}: ${first.message}` : undefined,
      { errors },
    ),
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
