/**
 * Computing the rows of a sweep: point i's document is the plan's design with
 * the axis values of i set at their paths; the parts an axis touched are
 * validated again (a groove wider than its pitch is caught here, as the single
 * endpoint would catch it), then the calculation runs exactly as its own
 * endpoint runs it. A point that fails is a row carrying its problem; it never
 * stops the sweep. Runs on a solver thread as the task `sweep-batch`.
 */
import { computeChecked, problemFromError } from '../calculation.js';
import { BoundedCache } from '../../numerics/memo.js';
import { canonicalJson } from '../envelope.js';
import { validationProblem, zodFieldErrors, type FieldError, type Problem } from '../problem.js';
import { valueAt, withValueAt } from './paths.js';
import { planSweep, type SweepPlan } from './plan.js';

/** One cell: a number (SI), a string, a boolean, or null where the point has no value. */
export type Cell = number | string | boolean | null;

/** What a failed point reports: the problem document's essentials. */
export interface PointProblem {
  title: string;
  status: number;
  detail?: string;
  errors?: { path: string; message: string }[];
}

export interface Row {
  /** Global index of the point in the whole sweep. */
  index: number;
  values: Cell[];
  problem?: PointProblem;
}

/** The value of each axis at point `index`: grid with the last axis varying fastest, or zipped. */
export function axisIndices(plan: Pick<SweepPlan, 'axes' | 'combine'>, index: number): number[] {
  if (plan.combine === 'zip') return plan.axes.map(() => index);
  const picks = new Array<number>(plan.axes.length);
  let rest = index;
  for (let a = plan.axes.length - 1; a >= 0; a--) {
    const n = plan.axes[a]!.values.length;
    picks[a] = rest % n;
    rest = Math.floor(rest / n);
  }
  return picks;
}

function cell(value: unknown): Cell {
  if (value === undefined || value === null) return null;
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  if (typeof value === 'string' || typeof value === 'boolean') return value;
  return canonicalJson(value);
}

function pointProblem(p: Problem): PointProblem {
  return { title: p.title, status: p.status, ...(p.detail === undefined ? {} : { detail: p.detail }), ...(p.errors ? { errors: p.errors } : {}) };
}

/** Parts remembered per part on the slow path: enough for the inner axes of a grid, bounded for a long single axis. */
const MEMO_PER_PART = 4096;

/** The part `part` of point `picks`, parsed, or the field errors that make it invalid. */
function pointPart(plan: SweepPlan, part: SweepPlan['parts'][number], picks: readonly number[]): { data: unknown } | { errors: FieldError[] } {
  if (part.template) {
    let data: unknown = part.template;
    for (const a of part.axes) data = withValueAt(data, plan.axes[a]!.path.slice(1), plan.axes[a]!.values[picks[a]!]);
    return { data };
  }
  let key = 0;
  for (const a of part.axes) key = key * plan.axes[a]!.values.length + picks[a]!;
  const known = part.memo.get(key);
  if (known) return known;
  let raw = (plan.base as Record<string, unknown>)[part.name];
  for (const a of part.axes) raw = withValueAt(raw, plan.axes[a]!.path.slice(1), plan.axes[a]!.values[picks[a]!]);
  const parsed = part.schema.safeParse(raw);
  const out = parsed.success
    ? { data: parsed.data }
    : { errors: zodFieldErrors(parsed.error).map((e) => ({ path: e.path ? `${part.name}.${e.path}` : part.name, message: e.message })) };
  if (part.memo.size < MEMO_PER_PART) part.memo.set(key, out);
  return out;
}

/** The design document of point `index` (validated), or the problem that makes it invalid. */
export function pointDocument(plan: SweepPlan, index: number, picks: readonly number[] = axisIndices(plan, index)): { document: Record<string, unknown> } | { problem: PointProblem } {
  const doc: Record<string, unknown> = { ...(plan.base as Record<string, unknown>) };
  for (const part of plan.parts) {
    const at = pointPart(plan, part, picks);
    if ('errors' in at) return { problem: pointProblem(validationProblem(at.errors).problem) };
    doc[part.name] = at.data;
  }
  return { document: doc };
}

/** Compute one point's row. */
export function evaluatePoint(plan: SweepPlan, index: number): Row {
  const picks = axisIndices(plan, index);
  const at = pointDocument(plan, index, picks);
  let out: Record<string, unknown> | undefined;
  let failed: PointProblem | undefined;
  if ('problem' in at) failed = at.problem;
  else {
    try {
      out = computeChecked(plan.pointDefinition, at.document) as unknown as Record<string, unknown>;
    } catch (error) {
      failed = pointProblem(problemFromError(error));
    }
  }
  const values = plan.columns.map((column): Cell => {
    switch (column.source.kind) {
      case 'axis': {
        const a = column.source.axis;
        return cell(plan.axes[a]!.values[picks[a]!]);
      }
      case 'warnings':
        return out ? (out.warnings as { code: string }[]).map((w) => w.code).join(';') : null;
      case 'output':
        return out ? cell(valueAt(out, column.source.path)) : null;
    }
  });
  return failed ? { index, values, problem: failed } : { index, values };
}

/** Rows of points start … end − 1. */
export function evaluatePoints(plan: SweepPlan, start: number, end: number): Row[] {
  const rows: Row[] = [];
  for (let i = start; i < end; i++) rows.push(evaluatePoint(plan, i));
  return rows;
}

/** Name of the solver-thread task that computes a batch of sweep points. */
export const SWEEP_BATCH_TASK = 'sweep-batch';

export interface SweepBatch {
  /** The sweep request as the client sent it (each thread plans it once and keeps the plan for the next batch). */
  request: unknown;
  /** Key of the request (its canonical JSON), so a thread finds its plan without comparing bodies. */
  key: string;
  start: number;
  end: number;
}

/** Plans a thread has made, most recent last; a handful, since a thread serves few sweeps at once. */
const plans = new BoundedCache<SweepPlan>(8);

/** The solver-thread side of a batch: rows of points start … end − 1. */
export function runSweepBatch(input: unknown): Row[] {
  const batch = input as SweepBatch;
  const plan = plans.getOrCompute(batch.key, () => planSweep(batch.request));
  return evaluatePoints(plan, batch.start, batch.end);
}
