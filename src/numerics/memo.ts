/**
 * A small least-recently-used cache for results that depend only on a few exact
 * inputs and cost far more to compute than to look up (dense solves, operator
 * inverses). Bounded, so a long-running service holding many designs keeps a
 * fixed footprint; keyed by the exact inputs, so a hit returns what a fresh
 * computation would.
 */
export class BoundedCache<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly capacity: number) {}

  /** The cached value of `key`, or `compute()` stored under it (the oldest entry leaves when full). */
  getOrCompute(key: string, compute: () => V): V {
    const hit = this.entries.get(key);
    if (hit !== undefined) {
      // Re-insert: a Map iterates in insertion order, so the first key is the least recently used.
      this.entries.delete(key);
      this.entries.set(key, hit);
      return hit;
    }
    const value = compute();
    if (this.entries.size >= this.capacity) {
      const oldest = this.entries.keys().next();
      if (!oldest.done) this.entries.delete(oldest.value);
    }
    this.entries.set(key, value);
    return value;
  }

  get size(): number {
    return this.entries.size;
  }
}
