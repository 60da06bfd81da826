import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { recalledClaims, recalledClaimsDocument } from '../scripts/recalled-claims.js';

/**
 * Claims recalled and not confirmed against a readable source may only go down
 * (docs/citations-ledger.md has the research). Lower the ceiling when you
 * confirm one; never raise it.
 */
const CEILING_SRC = 23;
/** The same in tests: expected values recalled rather than read. */
const CEILING_TEST = 2;

describe('recalled claims', () => {
  it(`at most ${CEILING_SRC} in src/ (lines tagged "from memory" or using the catalogue's FROM_MEMORY note)`, () => {
    const claims = recalledClaims('src');
    expect(claims.length, claims.map((c) => `${c.file}:${c.line}`).join('\n')).toBeLessThanOrEqual(CEILING_SRC);
  });
  it(`at most ${CEILING_TEST} in test/`, () => {
    // This file and the lister name the tag without making a claim.
    const claims = recalledClaims('test').filter((c) => !c.file.endsWith('citations.test.ts'));
    expect(claims.length, claims.map((c) => `${c.file}:${c.line}`).join('\n')).toBeLessThanOrEqual(CEILING_TEST);
  });
  it('docs/recalled-claims.md lists exactly the claims in src/ (regenerate: npx tsx scripts/recalled-claims.ts --write)', () => {
    const written = readFileSync(new URL('../docs/recalled-claims.md', import.meta.url), 'utf8');
    expect(written).toBe(recalledClaimsDocument(recalledClaims('src')));
  });
  it('the lister finds a tagged line (a check that could fail)', () => {
    // The catalogue's recalled note is defined in records.ts; silicones.ts uses it.
    expect(recalledClaims('src').some((c) => c.file === 'src/materials/silicones.ts')).toBe(true);
  });
});
