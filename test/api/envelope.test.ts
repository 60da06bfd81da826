/**
 * The inputs hash must never change for the same inputs: clients keep it (ETag, LIMS records). The canonical JSON
 * was rewritten for speed (bench/http.ts); the earlier implementation is kept here as the oracle it must match byte
 * for byte, on the service's own inputs echoes and on arbitrary JSON values.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalJson, findNonFinite, inputsHash } from '../../src/api/envelope.js';

/** The implementation before the rewrite (entries, filter, sort, map). */
function canonicalJsonBefore(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map(canonicalJsonBefore).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJsonBefore(v)}`).join(',')}}`;
}

describe('canonical JSON', () => {
  it('equals the earlier implementation on arbitrary values (undefined members, unicode keys, -0, non-finite numbers)', () => {
    const value = fc.letrec((tie) => ({
      leaf: fc.oneof(fc.double(), fc.integer(), fc.string(), fc.boolean(), fc.constant(null), fc.constant(undefined), fc.constant(-0), fc.constant(1e21)),
      node: fc.oneof({ depthSize: 'small' }, tie('leaf'), fc.array(tie('node'), { maxLength: 5 }), fc.dictionary(fc.string({ unit: 'binary' }), tie('node'), { maxKeys: 6 })),
    })).node;
    fc.assert(fc.property(value, (v) => canonicalJson(v) === canonicalJsonBefore(v)), { seed: 15_0001, numRuns: 500, verbose: true });
  });
  it('sorts keys at every level', () => {
    expect(canonicalJson({ b: 1, a: { d: 2, c: [3, { f: 4, e: 5 }] }, z: undefined })).toBe('{"a":{"c":[3,{"e":5,"f":4}],"d":2},"b":1}');
  });
  it('gives the SHA-256 of that text (FIPS 180-4; the expected digest is coreutils sha256sum of the two bytes {})', () => {
    expect(inputsHash({})).toBe('44136fa355b3678a1146ad16f7e8649e94fb4fc21fe77e8310c060f61caaff8a');
  });
});

describe('non-finite guard', () => {
  it('finds the path of the first non-finite number, and null when all are finite', () => {
    expect(findNonFinite({ a: [1, { b: Number.NaN }], c: 2 })).toBe('a[1].b');
    expect(findNonFinite({ a: new Float64Array([1, Infinity]) })).toBe('a[1]');
    expect(findNonFinite(-Infinity)).toBe('(root)');
    expect(findNonFinite({ a: [1, { b: 2 }], s: 'NaN', n: null })).toBeNull();
  });
});
