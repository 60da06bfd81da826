/**
 * The three forms of a sweep's answer, written row by row so that none needs
 * the whole sweep in memory except JSON:
 * - NDJSON: a `sweep` line (calculation, sweep id, shard, columns with units),
 *   one `point` line per point in index order, `progress` lines in between
 *   (HTTP only), and an `end` line (points, failed);
 * - CSV: a header row of column names with their SI units in parentheses, an
 *   `index` column first and an `error` column last (the title of a failed
 *   point's problem, empty otherwise);
 * - JSON: the same header fields and every point in one document.
 * The lines of a file (sweep, points, end) are a function of the request and
 * the point indices only, so shards concatenated give the whole sweep's bytes.
 */
import type { Column } from './columns.js';
import type { ShardSlice, SweepPlan } from './plan.js';
import type { Cell, PointProblem, Row } from './points.js';

export interface SweepHeader {
  kind: 'sweep';
  calculation: string;
  sweepId: string;
  totalPoints: number;
  shard: ShardSlice;
  columns: { name: string; unit: string | null }[];
}

export interface PointLine {
  kind: 'point';
  index: number;
  values: Record<string, Cell>;
  problem?: PointProblem;
}

export interface EndLine {
  kind: 'end';
  points: number;
  failed: number;
}

export interface ProgressLine {
  kind: 'progress';
  done: number;
  points: number;
  failed: number;
  elapsedMs: number;
}

export function sweepHeader(plan: SweepPlan, shard: ShardSlice = plan.shard): SweepHeader {
  return {
    kind: 'sweep',
    calculation: plan.definition.name,
    sweepId: plan.sweepId,
    totalPoints: plan.totalPoints,
    shard,
    columns: plan.columns.map((c: Column) => ({ name: c.name, unit: c.unit })),
  };
}

export function pointLine(columns: readonly { name: string }[], row: Row): PointLine {
  const values: Record<string, Cell> = {};
  columns.forEach((c, k) => {
    values[c.name] = row.values[k] ?? null;
  });
  return { kind: 'point', index: row.index, values, ...(row.problem ? { problem: row.problem } : {}) };
}

/** One NDJSON line (with its newline). */
export function ndjsonLine(value: SweepHeader | PointLine | EndLine | ProgressLine): string {
  return `${JSON.stringify(value)}\n`;
}

function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

function csvCell(value: Cell): string {
  if (value === null) return '';
  return csvField(String(value));
}

export function csvHeader(columns: readonly { name: string; unit: string | null }[]): string {
  return `${['index', ...columns.map((c) => (c.unit ? `${c.name} (${c.unit})` : c.name)), 'error'].map(csvField).join(',')}\r\n`;
}

export function csvRow(row: Row): string {
  return `${[String(row.index), ...row.values.map(csvCell), csvField(row.problem?.title ?? '')].join(',')}\r\n`;
}
