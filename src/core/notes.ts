/**
 * What every calculation says besides its numbers: warnings, assumptions,
 * references and the identifiers of the models it ran, accumulated without
 * duplicates so that composed calculations can merge them. Shared by the
 * physics and the materials layers.
 */
import type { ModelId } from './models.js';
import type { Reference } from './references.js';

/** How much a warning matters to the person reading the result. */
export type Severity = 'info' | 'caution' | 'warning';

export interface Warning {
  /** Stable machine-readable code, kebab-case (e.g. `transitional-flow`). */
  code: string;
  severity: Severity;
  message: string;
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
  readonly models: ModelId[] = [];

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

  model(id: ModelId): this {
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
  models?: readonly ModelId[];
}

/** Standard envelope returned by top-level physics calculations. */
export interface Outcome<T> extends NotesLike {
  result: T;
  models: ModelId[];
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
