/**
 * The two ways a calculation refuses an input: the input is physically
 * impossible ({@link DomainError}), or an iteration did not reach its
 * tolerance ({@link ConvergenceError}). Physics never throws for physically
 * meaningful input; it returns a result with a warning instead. The API maps
 * both to 422 problem documents naming the field.
 */

/**
 * Input that is physically impossible (a groove wider than its pitch, a fluid
 * frozen at the requested temperature). `field` names the offending input by
 * its path in the request where the caller knows it (dot-separated).
 */
export class DomainError extends Error {
  /** Path of the offending input; the design composition rewrites internal paths to document paths. */
  field: string | undefined;
  readonly code: string;
  constructor(message: string, options: { field?: string; code?: string } = {}) {
    super(message);
    this.name = 'DomainError';
    this.field = options.field;
    this.code = options.code ?? 'impossible-input';
  }
}

/** An iterative solve that did not reach its tolerance; mapped to 422 with the count. */
export class ConvergenceError extends DomainError {
  readonly iterations: number;
  readonly residual: number;
  constructor(message: string, iterations: number, residual: number, field?: string) {
    // A non-finite residual is described in words: the API keeps the tokens NaN and Infinity out of every response.
    super(`${message} (after ${iterations} iterations, residual ${Number.isFinite(residual) ? residual.toExponential(3) : 'not finite'})`, {
      field,
      code: 'not-converged',
    });
    this.name = 'ConvergenceError';
    this.iterations = iterations;
    this.residual = residual;
  }
}

/** Throws a DomainError naming `field` unless `value` is a positive finite number. */
export function requirePositive(value: number, field: string, what = field): void {
  if (!(Number.isFinite(value) && value > 0)) throw new DomainError(`${what} must be a positive finite number`, { field });
}

/** Throws a DomainError naming `field` unless 0 < `value` < 1. */
export function requireFraction(value: number, field: string): void {
  if (!(Number.isFinite(value) && value > 0 && value < 1)) {
    throw new DomainError(`${field} must lie strictly between 0 and 1`, { field });
  }
}

/**
 * A part of the design that a question needs is missing: `field` is its path
 * in the design document, `question` the calculation that needs it. The API
 * answers 422 "missing required property".
 */
export class MissingInputError extends DomainError {
  readonly question: string;
  constructor(field: string, question: string, why: string) {
    // An expected outcome, not a fault: an assessment meets one for every part a document leaves out (each
    // sensitivity step and sweep point again), and the stack trace V8 captures would cost more than the question.
    const limit = Error.stackTraceLimit;
    Error.stackTraceLimit = 0;
    try {
      super(`${field} is required: ${question} needs ${why}`, { field, code: 'missing-property' });
    } finally {
      Error.stackTraceLimit = limit;
    }
    this.name = 'MissingInputError';
    this.question = question;
  }
}
