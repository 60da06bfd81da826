/**
 * A sweep made ready to run: the calculation from the registry, the design
 * parsed once, every axis value converted to SI once, the number of points,
 * the shard's slice, the columns. Point i of the sweep is a pure function of
 * the plan and i, so any thread (or any replica, or any pod of a batch job)
 * computes the same row for the same i.
 */
import type { ZodType } from 'zod';
import { calculationByName, CALCULATIONS } from '../routes/index.js';
import type { CalculationDefinition } from '../calculation.js';
import { canonicalJson, inputsHash } from '../envelope.js';
import { problem, ProblemError, validationProblem, zodFieldErrors, type FieldError } from '../problem.js';
import { quantityDefinitionOf } from '../schemas/quantities.js';
import type { DesignInput } from '../schemas/design.js';
import { outputColumns, type Column } from './columns.js';
import { childSchema, numberPatchable, schemaAt, withValueAt } from './paths.js';
import { SweepRequestSchema, type SweepAxis, type SweepRequest } from './schema.js';

export interface PlannedAxis {
  /** Path into the design document. */
  path: string[];
  /** The values at this axis, parsed by the document's schema (SI numbers, ids, enum values, parts). */
  values: unknown[];
}

export interface ShardSlice {
  index: number;
  count: number;
  /** First point of the slice (global index). */
  start: number;
  /** One past the last point of the slice. */
  end: number;
}

export interface SweepPlan {
  definition: CalculationDefinition;
  /** The definition a point runs: its compute is the calculation's sweep variant where it has one. */
  pointDefinition: CalculationDefinition;
  /** The design every point starts from (parsed, SI). */
  base: DesignInput;
  axes: PlannedAxis[];
  combine: 'grid' | 'zip';
  /** Points of the whole sweep (all shards). */
  totalPoints: number;
  shard: ShardSlice;
  columns: Column[];
  /** Top-level parts of the document an axis changes: validated again at every point, or patched (see PlannedPart). */
  parts: PlannedPart[];
  /** SHA-256 of the canonical request without its shard: the same for every shard of one sweep. */
  sweepId: string;
}

/**
 * A top-level part of the document that axes change. When every such axis sets numbers along a path the schema
 * checks no further (paths.ts: numberPatchable), the part is parsed once with the first point's values (`template`)
 * and each point only sets its numbers into a copy of it: what a parse of the point's part would give, without the
 * parse. Otherwise each point's part is parsed again, and distinct parts are remembered (`memo`, a bounded number).
 */
export interface PlannedPart {
  name: string;
  schema: ZodType;
  /** The axes whose paths lie in this part. */
  axes: number[];
  /** Parsed part of point 0 whose axis numbers each point overwrites (fast path), when that is safe. */
  template?: Record<string, unknown>;
  /** Parsed parts (or the problem) by the combined index of the part's axes (slow path). */
  memo: Map<number, { data: unknown } | { errors: FieldError[] }>;
}

/** Service limits a plan is checked against. */
export interface SweepLimits {
  /** Most points one request (one shard) may compute. */
  maxPoints: number;
}

/** The largest sweep whose point indices are exact in floating point. */
const LARGEST_SWEEP = Number.MAX_SAFE_INTEGER;

/** Round to 15 significant digits, so a range step does not print as 0.30000000000000004. */
function tidy(x: number): number {
  return Number(x.toPrecision(15));
}

function rangeValues(from: number, to: number, points: number, spacing: 'linear' | 'log'): number[] {
  if (spacing === 'log') {
    const a = Math.log(from);
    const b = Math.log(to);
    return Array.from({ length: points }, (_, k) => (k === 0 ? from : k === points - 1 ? to : tidy(Math.exp(a + ((b - a) * k) / (points - 1)))));
  }
  return Array.from({ length: points }, (_, k) => (k === 0 ? from : k === points - 1 ? to : tidy(from + ((to - from) * k) / (points - 1))));
}

function planAxis(documentSchema: ZodType, axis: SweepAxis, i: number, errors: FieldError[]): PlannedAxis | undefined {
  const path = axis.path.split('.');
  const at = schemaAt(documentSchema, path);
  if (!('schema' in at)) {
    const where = path.slice(0, at.missingAt).join('.') || 'the design document';
    errors.push({ path: `axes[${i}].path`, message: `${where} has no ${path[at.missingAt]}; it has: ${at.allowed.join(', ')}` });
    return undefined;
  }
  const leaf = at.schema;
  const parse = (raw: unknown, where: string): unknown => {
    const parsed = leaf.safeParse(raw);
    if (parsed.success) return parsed.data;
    for (const e of zodFieldErrors(parsed.error)) errors.push({ path: e.path ? `${where}.${e.path}` : where, message: e.message });
    return undefined;
  };
  if (axis.values) return { path, values: axis.values.map((v, j) => parse(v, `axes[${i}].values[${j}]`)) };
  const range = axis.range!;
  const from = parse(range.from, `axes[${i}].range.from`);
  const to = parse(range.to, `axes[${i}].range.to`);
  if (from === undefined || to === undefined) return undefined;
  if (typeof from !== 'number' || typeof to !== 'number') {
    errors.push({ path: `axes[${i}].range`, message: `${axis.path} is not a number; give its values as a list` });
    return undefined;
  }
  const spacing = range.spacing ?? 'linear';
  if (spacing === 'log' && !(from > 0 && to > 0)) {
    errors.push({ path: `axes[${i}].range`, message: 'a log range needs a positive first and last value' });
    return undefined;
  }
  return { path, values: rangeValues(from, to, range.points, spacing) };
}

/** The contiguous slice `index` of `count` over `total` points: sizes differ by at most one, slices tile 0…total. */
export function shardSlice(total: number, index: number, count: number): ShardSlice {
  // Exact integer arithmetic where the product would lose digits.
  const edge = (k: number) => (total * count <= LARGEST_SWEEP ? Math.floor((k * total) / count) : Number((BigInt(k) * BigInt(total)) / BigInt(count)));
  return { index, count, start: edge(index), end: edge(index + 1) };
}

function planPart(name: string, schema: ZodType, base: Record<string, unknown>, axes: readonly PlannedAxis[]): PlannedPart {
  const on = axes.flatMap((a, i) => (a.path[0] === name ? [i] : []));
  const part: PlannedPart = { name, schema, axes: on, memo: new Map() };
  const numbers = on.every((i) => axes[i]!.path.length > 1 && axes[i]!.values.every((v) => typeof v === 'number') && numberPatchable(schema, axes[i]!.path.slice(1)));
  if (!numbers) return part;
  let first: unknown = base[name];
  for (const i of on) first = withValueAt(first, axes[i]!.path.slice(1), axes[i]!.values[0]);
  const parsed = schema.safeParse(first);
  if (parsed.success && parsed.data !== null && typeof parsed.data === 'object') part.template = parsed.data as Record<string, unknown>;
  return part;
}

/** Parse and check a sweep request (422 naming the field, 413 beyond the point limit) and make its plan. */
export function planSweep(body: unknown, limits?: SweepLimits): SweepPlan {
  if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw validationProblem([{ path: '', message: 'the request body must be a JSON object' }]);
  }
  const parsed = SweepRequestSchema.safeParse(body);
  if (!parsed.success) throw validationProblem(zodFieldErrors(parsed.error));
  const request: SweepRequest = parsed.data;
  const definition = calculationByName(request.calculation);
  if (!definition) {
    throw validationProblem([{ path: 'calculation', message: `unknown calculation "${request.calculation}"; one of: ${CALCULATIONS.map((c) => c.name).join(', ')}` }]);
  }
  const errors: FieldError[] = [];
  const axes = request.axes.map((axis, i) => planAxis(definition.body, axis, i, errors));
  const combine = request.combine ?? 'grid';
  if (errors.length === 0 && combine === 'zip') {
    const n = axes[0]!.values.length;
    axes.forEach((a, i) => {
      if (a!.values.length !== n) errors.push({ path: `axes[${i}]`, message: `zipped axes must have equal lengths: axis 0 has ${n} values, axis ${i} has ${a!.values.length}` });
    });
  }
  const columns: Column[] = request.axes.map((axis, i) => ({
    name: axis.path,
    unit: errors.length === 0 ? (quantityDefinitionOf((schemaAt(definition.body, axes[i]!.path) as { schema: ZodType }).schema)?.unitLabel ?? null) : null,
    source: { kind: 'axis', axis: i },
  }));
  try {
    columns.push(...outputColumns(definition, request.columns));
  } catch (error) {
    if (!(error instanceof ProblemError)) throw error;
    errors.push(...(error.problem.errors ?? []));
  }
  if (errors.length > 0) throw validationProblem(errors);
  const planned = axes as PlannedAxis[];
  const totalPoints = combine === 'zip' ? planned[0]!.values.length : planned.reduce((n, a) => n * a.values.length, 1);
  const shard = shardSlice(Math.min(totalPoints, LARGEST_SWEEP), request.shard?.index ?? 0, request.shard?.count ?? 1);
  const points = shard.end - shard.start;
  if (totalPoints > LARGEST_SWEEP || (limits && points > limits.maxPoints)) {
    const limit = Math.min(limits?.maxPoints ?? LARGEST_SWEEP, LARGEST_SWEEP);
    const shards = Math.ceil(totalPoints / limit);
    throw new ProblemError(
      problem(413, 'sweep-too-large', 'The sweep has more points than one request may compute', `${points} points asked, at most ${limit} per request; split the sweep into at least ${shards} shards with "shard": { "index": i, "count": ${shards} } and send them one by one or to several replicas.`, {
        errors: [{ path: 'axes', message: `${points} points over the limit of ${limit} points per request` }],
      }),
    );
  }
  const partNames = [...new Set(planned.map((a) => a.path[0]!))];
  const parts = partNames.map((name) => planPart(name, childSchema(definition.body, name)!, request.design as Record<string, unknown>, planned));
  const { shard: _shard, ...withoutShard } = request;
  return {
    definition,
    pointDefinition: definition.computeInSweep ? { ...definition, compute: definition.computeInSweep } : definition,
    base: request.design,
    axes: planned,
    combine,
    totalPoints,
    shard,
    columns,
    parts,
    sweepId: inputsHash(JSON.parse(canonicalJson(withoutShard))),
  };
}
