/**
 * Shared vocabulary of every physics module: warnings, references, domain
 * errors and the outcome envelope. Physics functions take SI numbers and
 * return plain objects; they never throw for physically meaningful input
 * (a result plus a warning instead) and throw {@link DomainError} only for
 * input that has no physical meaning (the API maps it to 422).
 */

/** How much a warning matters to the person reading the result. */
export type Severity = 'info' | 'caution' | 'warning';

export interface Warning {
  /** Stable machine-readable code, kebab-case (e.g. `transitional-flow`). */
  code: string;
  severity: Severity;
  message: string;
}

export interface Reference {
  /** Short key, e.g. `dean1978`. */
  key: string;
  /** Full citation: authors, year, title, journal, volume, pages. */
  citation: string;
  doi?: string;
}

/**
 * Input that is physically impossible (a groove wider than its pitch, a fluid
 * frozen at the requested temperature). `field` names the offending input by
 * its path in the request where the caller knows it (dot-separated).
 */
export class DomainError extends Error {
  readonly field: string | undefined;
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
    super(`${message} (after ${iterations} iterations, residual ${residual.toExponential(3)})`, {
      field,
      code: 'not-converged',
    });
    this.name = 'ConvergenceError';
    this.iterations = iterations;
    this.residual = residual;
  }
}

/**
 * Accumulates the warnings, assumptions, references and model identifiers a
 * calculation produces, so composed calculations can merge them without
 * duplicates.
 */
export class Notes {
  readonly warnings: Warning[] = [];
  readonly assumptions: string[] = [];
  readonly references: Reference[] = [];
  readonly models: string[] = [];

  warn(code: string, message: string, severity: Severity = 'warning'): this {
    if (!this.warnings.some((w) => w.code === code && w.message === message)) {
      this.warnings.push({ code, severity, message });
    }
    return this;
  }

  assume(text: string): this {
    if (!this.assumptions.includes(text)) this.assumptions.push(text);
    return this;
  }

  cite(...refs: Reference[]): this {
    for (const ref of refs) {
      if (!this.references.some((r) => r.key === ref.key)) this.references.push(ref);
    }
    return this;
  }

  model(id: string): this {
    if (!this.models.includes(id)) this.models.push(id);
    return this;
  }

  merge(other: NotesLike): this {
    for (const w of other.warnings) this.warn(w.code, w.message, w.severity);
    for (const a of other.assumptions) this.assume(a);
    this.cite(...other.references);
    for (const m of other.models ?? []) this.model(m);
    return this;
  }
}

export interface NotesLike {
  warnings: readonly Warning[];
  assumptions: readonly string[];
  references: readonly Reference[];
  models?: readonly string[];
}

/** Standard envelope returned by top-level physics calculations. */
export interface Outcome<T> extends NotesLike {
  result: T;
  models: string[];
}

export function outcome<T>(result: T, notes: Notes): Outcome<T> {
  return {
    result,
    warnings: notes.warnings,
    assumptions: notes.assumptions,
    references: notes.references,
    models: notes.models,
  };
}

/** Standard gravitational acceleration, m/s² (CGPM 1901, exact by definition). */
export const STANDARD_GRAVITY = 9.80665;
/** Molar gas constant, J/(mol·K) (CODATA 2018, exact since the 2019 SI). */
export const GAS_CONSTANT = 8.314462618;
/** von Kármán constant of the log law used throughout (κ = 0.41; common practice, no source). */
export const KARMAN_CONSTANT = 0.41;
