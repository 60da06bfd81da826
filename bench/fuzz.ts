/**
 * Schema-driven fuzzing of a running service, over loopback only.
 *
 *   npm run build && npx tsx bench/fuzz.ts [--cheap 10000] [--heavy 2000] [--seed 1] [--minutes 120]
 *                                          [--only flow,slip] [--sources]
 *
 * Starts the service as a child process (the compiled server, or the sources
 * under tsx with --sources) on 127.0.0.1 with two worker threads and no rate
 * limit, reads the OpenAPI document it serves, and for every POST operation
 * sends bodies built from the operation's schema and example: the example
 * with one to three leaves replaced (a number scaled by 10^±8, a value drawn
 * from the leaf's schema, or a hostile value: wrong type, NaN/Infinity
 * strings, zero, negative, 1e±300, a tiny width, an unknown unit, a deep
 * object), or a body drawn from the schema alone, now and then with an
 * unknown field or a required one left out. Everything is drawn from one
 * seeded generator, so a run can be repeated. Counts per endpoint are bounded
 * (--cheap for closed-form endpoints, --heavy for those that may run field
 * solves) and so is the whole run (--minutes).
 *
 * Reported per endpoint: requests, status counts, 5xx (503 apart), hangs
 * (no answer within 30 s), NaN/Infinity in a body (it would not parse), 422s that name no field,
 * p50/p99 latency; and whether the service process died. Exit code 1 when
 * any 5xx other than 503, hang, NaN or death was seen.
 */
import { seededRandom, startService } from './child-service.js';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
interface Schema {
  $ref?: string;
  type?: string;
  enum?: Json[];
  properties?: Record<string, Schema>;
  required?: string[];
  additionalProperties?: boolean | Schema;
  items?: Schema;
  minItems?: number;
  maxItems?: number;
  anyOf?: Schema[];
  oneOf?: Schema[];
  allOf?: Schema[];
  example?: Json;
  minimum?: number;
  maximum?: number;
}

function option(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}
const flag = (name: string) => process.argv.includes(`--${name}`);

const seedText = option('seed', '1');
const random = seededRandom(Number(seedText));
const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
const chance = (p: number) => random() < p;

// Endpoints whose compute is closed forms (inline) unless a body asks for more; the rest may run field solves.
const CHEAP = new Set(['/v1/flow', '/v1/wetting', '/v1/waves']);
const UNITS = ['m', 'mm', 'um', 'nm', 'Pa', 'kPa', 'mN/m', 'N/m', 'degC', 'K', 'degF', 'm/s', 'km/h', 'mPa*s', 'cP', 'cSt', 'mM', 'uM', 'mg/L', 'kg/m^3', 'W/(m*K)', 'J/(kg*K)', 's', 'h', 'deg', 'furlong', ''];
const HOSTILE: Json[] = ['NaN', 'Infinity', '-Infinity', '', ' ', '1e309 m', '--1 m', 'x'.repeat(200), 0, -1, -0.0, 1e300, -1e300, 1e-300, 4.755668529426223e-21, true, false, null, [], {}, [1, 2, 3], { value: 1, unit: 'm' }];

let components: Record<string, Schema> = {};
function resolve(schema: Schema): Schema {
  let s = schema;
  while (s.$ref) s = components[s.$ref.replace('#/components/schemas/', '')] ?? {};
  if (s.allOf) {
    const merged: Schema = {};
    for (const part of s.allOf) Object.assign(merged, resolve(part));
    return merged;
  }
  return s;
}

function randomNumber(): number {
  if (chance(0.1)) return pick([0, 1, -1, 2, 180, 90]);
  const magnitude = 10 ** (random() * 50 - 25);
  return chance(0.85) ? magnitude : -magnitude;
}

/** A value drawn from a schema (depth-limited). */
function fromSchema(schema: Schema, depth = 0): Json {
  const s = resolve(schema);
  const branches = s.oneOf ?? s.anyOf;
  if (branches) return fromSchema(pick(branches), depth);
  if (s.enum) return pick(s.enum);
  switch (s.type) {
    case 'object': {
      const out: Record<string, Json> = {};
      const required = new Set(s.required ?? []);
      for (const [key, prop] of Object.entries(s.properties ?? {})) {
        if (depth > 6) break;
        if (required.has(key) ? !chance(0.03) : chance(0.4)) out[key] = fromSchema(prop, depth + 1);
      }
      if (chance(0.03)) out[`unknown${Math.floor(random() * 10)}`] = 1;
      return out;
    }
    case 'array': {
      const n = Math.floor(random() * Math.min(6, (s.maxItems ?? 6) + 1));
      return Array.from({ length: n }, () => fromSchema(s.items ?? {}, depth + 1));
    }
    case 'number':
    case 'integer':
      return s.type === 'integer' ? Math.round(randomNumber()) : randomNumber();
    case 'boolean':
      return chance(0.5);
    case 'string':
      if (chance(0.6)) return `${randomNumber().toPrecision(3)} ${pick(UNITS)}`.trim();
      return s.example !== undefined && chance(0.5) ? s.example : pick(['', 'water', 'n-dodecane', 'sds', 'abc', '20 degC']);
    default:
      return pick(HOSTILE);
  }
}

/** Schema of the value at `path` inside `schema` (following the example's shape), or undefined. */
function schemaAt(schema: Schema, path: (string | number)[]): Schema | undefined {
  let s: Schema | undefined = schema;
  for (const key of path) {
    if (!s) return undefined;
    const r = resolve(s);
    if (typeof key === 'number') {
      s = r.items ?? (r.anyOf ?? r.oneOf)?.map(resolve).find((b) => b.items)?.items;
    } else {
      const candidates = [r, ...((r.oneOf ?? r.anyOf ?? []).map(resolve))];
      s = candidates.map((c) => c.properties?.[key]).find((p) => p !== undefined);
    }
  }
  return s;
}

function leaves(value: Json, path: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== 'object') return [path];
  const entries: [string | number, Json][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  return [path, ...entries.flatMap(([k, v]) => leaves(v, [...path, k]))];
}

function setAt(root: Json, path: (string | number)[], value: Json | undefined): Json {
  if (path.length === 0) return value ?? null;
  const copy = structuredClone(root) as Record<string | number, Json>;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, Json>;
  const last = path[path.length - 1];
  if (value === undefined) delete node[last];
  else node[last] = value;
  return copy;
}

/** Scale the number in a value ("30 um" → "0.0041 um", 2 → 3.1e5), keeping its unit. */
function scaled(value: Json): Json | undefined {
  const factor = 10 ** (random() * 16 - 8);
  if (typeof value === 'number') return value * factor;
  if (typeof value === 'string') {
    const m = value.match(/^\s*(-?[\d.]+(?:e-?\d+)?)\s*(.*)$/i);
    if (m) return `${(Number(m[1]) * factor).toPrecision(4)} ${m[2]}`.trim();
  }
  return undefined;
}

function body(schema: Schema, example: Json): Json {
  if (chance(0.25)) return fromSchema(schema);
  let out = example;
  const mutations = 1 + Math.floor(random() * 3);
  for (let i = 0; i < mutations; i++) {
    const path = pick(leaves(out).filter((p) => p.length > 0));
    if (!path) break;
    const current = path.reduce<Json>((node, key) => (node as Record<string | number, Json>)[key], out);
    const roll = random();
    let value: Json | undefined;
    if (roll < 0.45) value = scaled(current) ?? fromSchema(schemaAt(schema, path) ?? {});
    else if (roll < 0.7) value = fromSchema(schemaAt(schema, path) ?? {});
    else if (roll < 0.95) value = pick(HOSTILE);
    else value = chance(0.5) ? undefined : JSON.parse('{"a":'.repeat(60) + '1' + '}'.repeat(60));
    out = setAt(out, path, value);
  }
  return out;
}

interface Tally {
  requests: number;
  statuses: Record<string, number>;
  serverErrors: number;
  unavailable: number;
  hangs: number;
  nonFinite: number;
  unnamed: number;
  latencies: number[];
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function main() {
  const cheapCount = Number(option('cheap', '10000'));
  const heavyCount = Number(option('heavy', '2000'));
  const deadline = Date.now() + Number(option('minutes', '120')) * 60_000;
  const only = option('only', '').split(',').filter(Boolean);
  const service = await startService({ sources: flag('sources'), env: { OILSKIN_WORKERS: '2' } });
  const { base, child } = service;
  const died = () => service.died();
  const document = (await (await fetch(`${base}/openapi.json`)).json()) as {
    paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: Schema; example?: Json }> } }>>;
    components: { schemas: Record<string, Schema> };
  };
  components = document.components.schemas;
  const targets = Object.entries(document.paths)
    .filter(([path, ops]) => ops.post?.requestBody && (only.length === 0 || only.some((o) => path.endsWith(`/${o}`))))
    .map(([path, ops]) => {
      const content = ops.post.requestBody!.content['application/json'];
      return { path, schema: content.schema, example: content.example ?? fromSchema(content.schema), count: CHEAP.has(path) ? cheapCount : heavyCount };
    });

  console.log(`fuzz: seed ${seedText}, ${targets.length} endpoints, service ${flag('sources') ? 'from sources (tsx)' : 'compiled'} on ${base}, Node ${process.version}`);
  const results: Record<string, Tally> = {};
  for (const target of targets) {
    const tally: Tally = { requests: 0, statuses: {}, serverErrors: 0, unavailable: 0, hangs: 0, nonFinite: 0, unnamed: 0, latencies: [] };
    results[target.path] = tally;
    const concurrency = CHEAP.has(target.path) ? 8 : 2;
    let sent = 0;
    const worker = async () => {
      while (sent < target.count && Date.now() < deadline && !died()) {
        sent++;
        const payload = JSON.stringify(body(target.schema, target.example));
        const start = performance.now();
        try {
          const res = await fetch(base + target.path, {
            method: 'POST',
            headers: { 'content-type': 'application/json' },
            body: payload,
            signal: AbortSignal.timeout(30_000),
          });
          const text = await res.text();
          tally.latencies.push(performance.now() - start);
          tally.requests++;
          tally.statuses[res.status] = (tally.statuses[res.status] ?? 0) + 1;
          if (res.status === 503) tally.unavailable++;
          else if (res.status >= 500) {
            tally.serverErrors++;
            console.log(`5xx on ${target.path}: ${text.slice(0, 300)}\n  body: ${payload.slice(0, 600)}`);
          }
          // JSON has no NaN or Infinity: a body carrying one does not parse.
          let parsed: unknown;
          try {
            parsed = JSON.parse(text);
          } catch {
            tally.nonFinite++;
            console.log(`unparseable body on ${target.path}: ${text.slice(0, 300)}`);
          }
          if (res.status === 422 && parsed) {
            const problem = parsed as { errors?: { path: string }[]; detail?: string };
            if (!problem.errors?.some((e) => e.path !== '')) {
              tally.unnamed++;
              if (tally.unnamed <= 3) console.log(`422 naming no field on ${target.path}: ${problem.detail}\n  body: ${payload.slice(0, 400)}`);
            }
          }
        } catch (error) {
          tally.requests++;
          if ((error as Error).name === 'TimeoutError') {
            tally.hangs++;
            console.log(`hang on ${target.path}: ${payload.slice(0, 600)}`);
          } else {
            tally.statuses[(error as Error).name] = (tally.statuses[(error as Error).name] ?? 0) + 1;
          }
        }
      }
    };
    const started = performance.now();
    await Promise.all(Array.from({ length: concurrency }, worker));
    tally.latencies.sort((a, b) => a - b);
    console.log(
      `${target.path}: ${tally.requests} requests in ${((performance.now() - started) / 1000).toFixed(0)} s, statuses ${JSON.stringify(tally.statuses)}, ` +
        `5xx ${tally.serverErrors}, 503 ${tally.unavailable}, hangs ${tally.hangs}, NaN ${tally.nonFinite}, unnamed 422 ${tally.unnamed}, ` +
        `p50 ${percentile(tally.latencies, 50).toFixed(1)} ms, p99 ${percentile(tally.latencies, 99).toFixed(1)} ms`,
    );
  }
  const alive = !died();
  console.log('\n| endpoint | requests | 2xx | 4xx | 5xx (503) | hangs | NaN | 422 without a field | p50 ms | p99 ms |');
  console.log('|---|---|---|---|---|---|---|---|---|---|');
  for (const [path, t] of Object.entries(results)) {
    const count = (lo: number, hi: number) => Object.entries(t.statuses).reduce((n, [s, c]) => (Number(s) >= lo && Number(s) < hi ? n + c : n), 0);
    console.log(
      `| ${path} | ${t.requests} | ${count(200, 300)} | ${count(400, 500)} | ${t.serverErrors} (${t.unavailable}) | ${t.hangs} | ${t.nonFinite} | ${t.unnamed} | ${percentile(t.latencies, 50).toFixed(1)} | ${percentile(t.latencies, 99).toFixed(1)} |`,
    );
  }
  console.log(`service process: ${alive ? 'alive at the end' : `DIED (${died()})`}`);
  if (alive) child.kill('SIGTERM');
  const bad = !alive || Object.values(results).some((t) => t.serverErrors > 0 || t.hangs > 0 || t.nonFinite > 0);
  process.exitCode = bad ? 1 : 0;
}

await main();
