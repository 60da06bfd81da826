import { expect } from 'vitest';
import { DomainError } from '../../src/core/errors.js';

/** Asserts that `run` throws a DomainError naming `field` (the API maps it to 422 with that path). */
export function expectDomainError(run: () => unknown, field: string): void {
  try {
    run();
  } catch (e) {
    expect(e).toBeInstanceOf(DomainError);
    expect((e as DomainError).field).toBe(field);
    return;
  }
  expect.unreachable(`expected a DomainError for ${field}`);
}
