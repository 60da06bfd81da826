/**
 * A sweep's rows as the text of each answer form, one chunk per batch (the
 * rows of a batch written at once: one write per batch, not per row), and as
 * one JSON document.
 */
import { csvHeader, csvRow, ndjsonLine, pointLine, sweepHeader, type PointLine, type SweepHeader } from './format.js';
import type { SweepPlan } from './plan.js';
import type { Row } from './points.js';

export interface NdjsonOptions {
  /** Write progress lines (HTTP: a client draws a bar from them); files leave them out. */
  progress: boolean;
  /** Least time between two progress lines, ms. */
  progressEveryMs?: number;
}

/** NDJSON text: the sweep line, the point lines (and progress lines), the end line. */
export async function* ndjsonChunks(plan: SweepPlan, batches: AsyncIterable<Row[]>, options: NdjsonOptions): AsyncGenerator<string> {
  const started = performance.now();
  const points = plan.shard.end - plan.shard.start;
  const header = sweepHeader(plan);
  yield ndjsonLine(header);
  let done = 0;
  let failed = 0;
  let lastProgress = -Infinity;
  const every = options.progressEveryMs ?? 250;
  for await (const rows of batches) {
    let chunk = '';
    for (const row of rows) {
      chunk += ndjsonLine(pointLine(header.columns, row));
      if (row.problem) failed++;
    }
    done += rows.length;
    const now = performance.now();
    if (options.progress && (now - lastProgress >= every || done === points)) {
      lastProgress = now;
      chunk += ndjsonLine({ kind: 'progress', done, points, failed, elapsedMs: Math.round(now - started) });
    }
    yield chunk;
  }
  yield ndjsonLine({ kind: 'end', points: done, failed });
}

/** CSV text: the header row, then one row per point. */
export async function* csvChunks(plan: SweepPlan, batches: AsyncIterable<Row[]>): AsyncGenerator<string> {
  yield csvHeader(plan.columns);
  for await (const rows of batches) {
    let chunk = '';
    for (const row of rows) chunk += csvRow(row);
    yield chunk;
  }
}

export interface SweepDocument extends Omit<SweepHeader, 'kind'> {
  points: Omit<PointLine, 'kind'>[];
  failed: number;
}

/** The whole answer as one JSON document. */
export async function sweepDocument(plan: SweepPlan, batches: AsyncIterable<Row[]>): Promise<SweepDocument> {
  const { kind: _kind, ...header } = sweepHeader(plan);
  const points: Omit<PointLine, 'kind'>[] = [];
  let failed = 0;
  for await (const rows of batches) {
    for (const row of rows) {
      const { kind: _point, ...line } = pointLine(header.columns, row);
      points.push(line);
      if (row.problem) failed++;
    }
  }
  return { ...header, points, failed };
}
