/**
 * HTTP caching of calculations: the strong ETag of a result is its inputs hash
 * (`provenance.inputsHash`, which identifies the calculation), and a bounded
 * in-memory LRU remembers, per request, the ETag of its result and the
 * serialised response itself.
 *
 * - A request whose `If-None-Match` names the remembered ETag is answered 304
 *   without computing (a calculation POST is safe and idempotent: a query with
 *   a body, so a conditional request is treated as for GET).
 * - A repeated request is answered from the remembered bytes, light ones too:
 *   under load a light compute with its validation, hash and serialisation
 *   costs several times what sending kept bytes does (bench/http.ts). A light
 *   result is kept from its second computation on ({@link SightingTable}); a
 *   heavy one at once.
 *
 * Two keys lead to an entry. The request text as received (`textKey`) is
 * looked up first, before any parsing or validation: the same text always
 * gives the same document. Then the calculation name and the JSON of the
 * parsed document (`key`): the schema has normalised units and put the keys in
 * schema order, so "10 mm" and 0.01 share that entry. Sizes are counted in
 * bytes (key + body, a body counted under each key that holds it); the oldest
 * entries go first. `OILSKIN_RESULT_CACHE_MB` sets the bound (0 turns the
 * cache off; ETags and 304 after a compute still work).
 */
import type { FastifyInstance, FastifyReply } from 'fastify';
import fp from 'fastify-plugin';
import { Counter, Gauge, type Registry } from 'prom-client';

export interface CachedResult {
  /** Strong entity tag, quoted: `"<inputsHash>"`. */
  etag: string;
  /**
   * The serialised 200 body, kept as the string it was serialised to: a copy into a Buffer per answer cost about
   * 100 µs of CPU per request on traffic that never repeats (bench/http.ts, distinct bodies, 381 against 280 µs with
   * the cache off), while a heap string is collected like the rest of the request's garbage.
   */
  body: string;
}

export interface ResultCacheStats {
  entries: number;
  bytes: number;
  maxBytes: number;
}

/** A least-recently-used map bounded by the bytes of its keys and bodies. */
export class ResultLru {
  private readonly entries = new Map<string, CachedResult>();
  private size = 0;

  constructor(readonly maxBytes: number) {}

  get enabled(): boolean {
    return this.maxBytes > 0;
  }

  private static cost(key: string, entry: CachedResult): number {
    // UTF-16 key and body in the heap (two bytes per code unit at most), the tag and the Map's own overhead (about 100 bytes, common practice, no source).
    return 2 * key.length + 2 * entry.body.length + 2 * entry.etag.length + 100;
  }

  get(key: string): CachedResult | undefined {
    const entry = this.entries.get(key);
    if (entry) {
      this.entries.delete(key);
      this.entries.set(key, entry);
    }
    return entry;
  }

  set(key: string, entry: CachedResult): void {
    const cost = ResultLru.cost(key, entry);
    if (cost > this.maxBytes) return;
    const old = this.entries.get(key);
    if (old) {
      this.size -= ResultLru.cost(key, old);
      this.entries.delete(key);
    }
    this.entries.set(key, entry);
    this.size += cost;
    for (const [oldestKey, oldest] of this.entries) {
      if (this.size <= this.maxBytes) break;
      this.entries.delete(oldestKey);
      this.size -= ResultLru.cost(oldestKey, oldest);
    }
  }

  stats(): ResultCacheStats {
    return { entries: this.entries.size, bytes: this.size, maxBytes: this.maxBytes };
  }
}

/**
 * Admission of light results (our rule): a light result is kept only when its
 * key was seen before, so traffic that never repeats (a script stepping a
 * value) does not fill the cache and churn the heap: kept answers that are
 * evicted unread cost the computing path about 100 µs per request
 * (bench/http.ts, distinct bodies, 374–381 µs against 259–280 µs with the
 * cache off). A polled design is computed twice, then answered from the cache.
 * The memory of sightings is a fixed table of 32-bit FNV-1a hashes (no
 * allocation per request); a collision only admits a result early.
 */
export class SightingTable {
  private readonly hashes: Uint32Array;

  constructor(readonly slots = 1 << 16) {
    this.hashes = new Uint32Array(slots);
  }

  /** Whether `key` was seen before (a hash match in its slot); records it either way. */
  seenBefore(key: string): boolean {
    // FNV-1a over the UTF-16 code units (Fowler, Noll & Vo; constants of the 32-bit variant, common practice, no source).
    let h = 0x811c9dc5;
    for (let i = 0; i < key.length; i++) {
      h ^= key.charCodeAt(i);
      h = Math.imul(h, 0x01000193) >>> 0;
    }
    h = h === 0 ? 1 : h;
    const slot = h & (this.slots - 1);
    if (this.hashes[slot] === h) return true;
    this.hashes[slot] = h;
    return false;
  }
}

/**
 * Does an `If-None-Match` field value name this tag? Weak comparison, as RFC 9110
 * §13.1.2 prescribes for If-None-Match (a `W/` prefix is ignored); `*` names any tag.
 */
export function etagMatches(ifNoneMatch: string | string[] | undefined, etag: string): boolean {
  if (ifNoneMatch === undefined) return false;
  const field = Array.isArray(ifNoneMatch) ? ifNoneMatch.join(',') : ifNoneMatch;
  if (field.trim() === '*') return true;
  return field.split(',').some((tag) => tag.trim().replace(/^W\//, '') === etag);
}

/** Answer 304 Not Modified with the tag (RFC 9110 §15.4.5: no body, validators kept). */
export function sendNotModified(reply: FastifyReply, etag: string, cacheControl: string): FastifyReply {
  return reply.code(304).header('etag', etag).header('cache-control', cacheControl).send();
}

/** What a calculation route needs from the cache: the LRU and its counters. */
export interface ResultCache {
  lru: ResultLru;
  /** Sightings of light results' keys: a light result is kept from its second computation on. */
  sightings: SightingTable;
  /** The cache key of a parsed request. */
  key(calculation: string, input: unknown): string;
  /** The cache key of a request's text as received. */
  textKey(calculation: string, text: string): string;
  hit(calculation: string): void;
  miss(calculation: string): void;
  computed(calculation: string): void;
}

declare module 'fastify' {
  interface FastifyInstance {
    resultCache: ResultCache;
  }
}

export default fp(
  async function resultCachePlugin(app: FastifyInstance, options: { maxBytes: number; registry: Registry }) {
    const lru = new ResultLru(options.maxBytes);
    const registers = [options.registry];
    const hits = new Counter({ name: 'oilskin_result_cache_hits_total', help: 'Calculation requests answered from the result cache (304 or remembered body), by calculation', labelNames: ['calculation'], registers });
    const misses = new Counter({ name: 'oilskin_result_cache_misses_total', help: 'Calculation requests the result cache could not answer, by calculation', labelNames: ['calculation'], registers });
    const computed = new Counter({ name: 'oilskin_calculations_computed_total', help: 'Calculations actually computed (inline or on a solver thread), by calculation', labelNames: ['calculation'], registers });
    new Gauge({
      name: 'oilskin_result_cache_entries',
      help: 'Entries in the result cache',
      registers,
      collect() {
        this.set(lru.stats().entries);
      },
    });
    new Gauge({
      name: 'oilskin_result_cache_bytes',
      help: 'Bytes held by the result cache (keys and bodies), bounded by OILSKIN_RESULT_CACHE_MB',
      registers,
      collect() {
        this.set(lru.stats().bytes);
      },
    });
    // One labelled series per calculation, looked up once (prom-client hashes a labels object on every inc).
    const byCalculation = (counter: Counter) => {
      const series = new Map<string, { inc(): void }>();
      return (calculation: string) => {
        let labelled = series.get(calculation);
        if (labelled === undefined) {
          labelled = counter.labels({ calculation });
          series.set(calculation, labelled);
        }
        labelled.inc();
      };
    };
    app.decorate('resultCache', {
      lru,
      sightings: new SightingTable(),
      key: (calculation: string, input: unknown) => `${calculation}\n${JSON.stringify(input)}`,
      // A different separator, so a request text can never be taken for the JSON of a parsed document.
      textKey: (calculation: string, text: string) => `${calculation}\t${text}`,
      hit: byCalculation(hits),
      miss: byCalculation(misses),
      computed: byCalculation(computed),
    } satisfies ResultCache);
  },
  { name: 'oilskin-result-cache', dependencies: ['oilskin-metrics'] },
);
