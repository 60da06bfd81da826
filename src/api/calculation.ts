/**
 * How a calculation endpoint is defined once and served three ways: over HTTP
 * (inline or in the worker pool), from the CLI, and in the OpenAPI document.
 */
import type { ZodType, output } from 'zod';
import { ConvergenceError, DomainError, MissingInputError } from '../core/errors.js';
import { catalogue } from '../materials/lookup.js';
import { DesignContext } from '../physics/design/context.js';
import type { Question } from '../physics/design/document.js';
import { QUESTIONS } from '../physics/design/questions.js';
import { DesignSchema } from './schemas/design.js';
import { envelope, findNonFinite, type CalculationOutput, type Envelope } from './envelope.js';
import { problem, ProblemError, validationProblem, zodFieldErrors, type Problem } from './problem.js';

export interface CalculationDefinition<Body extends ZodType = ZodType> {
  /** Short name, also the CLI sub-command (`oilskin flow scenario.json`). */
  name: string;
  /** HTTP path under which it is served (POST). */
  path: string;
  summary: string;
  description: string;
  /** Request body schema: validation, TypeScript type and OpenAPI in one. */
  body: Body;
  /** Response envelope schema: OpenAPI document, fastify serialisation and the tests' parse. */
  response: ZodType;
  /** Heavy solves run in the worker-thread pool; closed forms inline. A function decides per request. */
  heavy: boolean | ((input: output<Body>) => boolean);
  /** Example request body for the docs (an invented demo scenario). */
  example: unknown;
  compute(input: output<Body>): CalculationOutput;
  /**
   * What a point of a sweep computes, when it differs from `compute`: the same answer without the parts only a
   * report or a plot reads (a sweep row holds single values), and the costly extras off unless the document asks.
   */
  computeInSweep?(input: output<Body>): CalculationOutput;
  /**
   * Other representations of the answer, chosen by the request (Accept header, query): the content type and body,
   * or undefined for the JSON envelope. `contentTypes` lists them for the OpenAPI document.
   */
  present?: {
    contentTypes: Record<string, string>;
    render(answer: Envelope, input: output<Body>, request: { accept: string; query: Record<string, unknown> }): Promise<{ contentType: string; body: string } | undefined>;
    /** Checked before the compute, so a bad query costs nothing: a ProblemError for an unknown representation. */
    check?(request: { accept: string; query: Record<string, unknown> }): void;
  };
}

export function defineCalculation<Body extends ZodType>(definition: CalculationDefinition<Body>): CalculationDefinition<Body> {
  return definition;
}

/**
 * A calculation that answers one question about the design document: the body
 * is the design schema, the compute step is that question of the composition
 * layer on a fresh design context.
 */
export function designCalculation(
  definition: Omit<CalculationDefinition<typeof DesignSchema>, 'body' | 'compute'> & { question: Question },
): CalculationDefinition<typeof DesignSchema> {
  const { question, ...rest } = definition;
  return { ...rest, body: DesignSchema, compute: (input) => QUESTIONS[question](new DesignContext(input, catalogue)) };
}

/** Validate a request body against the calculation's schema; throws a 422 ProblemError naming every bad field. */
export function parseBody<Body extends ZodType>(definition: CalculationDefinition<Body>, body: unknown): output<Body> {
  if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw validationProblem([{ path: '', message: 'the request body must be a JSON object' }]);
  }
  const parsed = definition.body.safeParse(body);
  if (!parsed.success) throw validationProblem(zodFieldErrors(parsed.error));
  return parsed.data;
}

/**
 * Titles by what happened, so a client (or a person) can tell them apart:
 * the code of a DomainError picks the title; anything else is "physically impossible".
 */
const DOMAIN_TITLES: Record<string, string> = {
  'missing-property': 'A required property is missing',
  'outside-model-range': 'The input is outside the range of the model',
  'over-work-limit': 'The calculation would exceed the work limits of the service',
  'unsupported-flow': 'This calculation does not cover that case',
  'unknown-surfactant': 'Unknown catalogue entry',
};

/**
 * Request path of a field named by the physics: the physics sees the resolved
 * design as `scenario`, the request has its parts at the top level.
 */
function requestPath(field: string | undefined): string {
  return (field ?? '').replace(/^scenario\./, '');
}

/** Map anything a calculation can throw to a problem document. Unknown errors are not the client's fault. */
export function problemFromError(error: unknown): Problem {
  if (error instanceof ProblemError) return error.problem;
  if (error instanceof ConvergenceError) {
    return problem(422, 'not-converged', 'The solver did not converge', error.message, {
      iterations: error.iterations,
      ...(error.field ? { errors: [{ path: requestPath(error.field), message: error.message }] } : {}),
    });
  }
  if (error instanceof MissingInputError) {
    return problem(422, 'missing-property', DOMAIN_TITLES['missing-property']!, error.message, { errors: [{ path: error.field ?? '', message: error.message }] });
  }
  if (error instanceof DomainError) {
    return problem(422, error.code, DOMAIN_TITLES[error.code] ?? 'The input is physically impossible', error.message, {
      errors: [{ path: requestPath(error.field), message: error.message }],
    });
  }
  return problem(500, 'internal', 'Internal error', 'The calculation failed unexpectedly; the failure was logged.');
}

/** Serializable form of a failure inside a worker thread (class identity does not cross threads). */
export interface ComputeFailure {
  failed: true;
  problem: Problem;
  message: string;
}

/** Run the compute step and refuse any result that holds a non-finite number. */
export function computeChecked<Body extends ZodType>(definition: CalculationDefinition<Body>, input: output<Body>): CalculationOutput {
  const out = definition.compute(input);
  const bad = findNonFinite({ result: out.result, verdict: out.verdict, inputs: out.inputs });
  if (bad) {
    throw new ProblemError(
      problem(422, 'non-finite-result', 'The calculation has no finite answer for this input', `the value at ${bad} is not finite; the input lies outside the numerical range of the model`, {
        errors: [{ path: '', message: `non-finite value at ${bad}` }],
      }),
    );
  }
  return out;
}

/** Run a calculation to an envelope, the same way for HTTP and CLI. Throws ProblemError. */
export function runInline<Body extends ZodType>(definition: CalculationDefinition<Body>, body: unknown): Envelope {
  const input = parseBody(definition, body);
  const start = performance.now();
  let out: CalculationOutput;
  try {
    out = computeChecked(definition, input);
  } catch (error) {
    const p = problemFromError(error);
    if (p.status >= 500) throw error;
    throw new ProblemError(p);
  }
  return envelope(out, performance.now() - start, input as object);
}
