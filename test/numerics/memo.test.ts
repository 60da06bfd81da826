import { describe, expect, it } from 'vitest';
import { BoundedCache } from '../../src/numerics/memo.js';

describe('BoundedCache', () => {
  it('computes once per key and returns the stored value after', () => {
    const cache = new BoundedCache<number>(4);
    let calls = 0;
    const square = (x: number) => cache.getOrCompute(String(x), () => (calls++, x * x));
    expect([square(3), square(3), square(4)]).toEqual([9, 9, 16]);
    expect(calls).toBe(2);
  });
  it('keeps at most its capacity and lets the least recently used entry go first', () => {
    const cache = new BoundedCache<string>(2);
    let calls = 0;
    const get = (k: string) => cache.getOrCompute(k, () => (calls++, k.toUpperCase()));
    get('a');
    get('b');
    get('a'); // a is now the most recent
    get('c'); // b leaves
    expect(cache.size).toBe(2);
    calls = 0;
    get('a');
    expect(calls).toBe(0);
    get('b');
    expect(calls).toBe(1);
  });
});
