/**
 * Running a sweep: the shard's points cut into batches, each batch one task
 * of the worker pool (so a thread's per-task cost is paid once per batch, not
 * per point), a few batches in flight per thread, rows handed on in index
 * order whatever order the batches finish in. Batches grow until one takes
 * about 50 ms. A batch that fails as a whole (over its time or memory budget)
 * is run again point by point with each point's own budget, so only the point
 * at fault becomes a failed row; a busy pool is retried; a caller that goes
 * away (the signal) stops the work: no further batch is started and those in
 * flight are cancelled.
 */
import { setImmediate as yieldToEventLoop, setTimeout as sleep } from 'node:timers/promises';
import { ClientGoneError, type SolverPool } from '../pool.js';
import { ProblemError, type Problem } from '../problem.js';
import type { SweepPlan } from './plan.js';
import { axisIndices, SWEEP_BATCH_TASK, type Row, type SweepBatch } from './points.js';

export interface SweepRunOptions {
  signal?: AbortSignal;
  /** Batches in flight at once. */
  concurrency: number;
  /** Compute budget of one point, ms; a batch gets the sum of its points'. */
  pointTimeoutMs: number;
  /** Called after each row is handed on: rows done and failed so far. */
  onProgress?: (done: number, failed: number) => void;
}

/** Target compute time of one batch, ms: long against the per-task cost, short against a progress update. */
const TARGET_BATCH_MS = 50;
const MAX_BATCH = 4096;
const BUSY_RETRIES = 6;

/** The row of a point whose computation failed as a whole: its axis values and the problem. */
export function failedRow(plan: SweepPlan, index: number, p: Problem): Row {
  const picks = axisIndices(plan, index);
  const values = plan.columns.map((c) => {
    if (c.source.kind !== 'axis') return null;
    const v = plan.axes[c.source.axis]!.values[picks[c.source.axis]!];
    return typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean' ? v : null;
  });
  return { index, values, problem: { title: p.title, status: p.status, ...(p.detail ? { detail: p.detail } : {}) } };
}

/** Rows of the plan's shard, in index order, one batch at a time. */
export async function* sweepRows(plan: SweepPlan, request: unknown, pool: SolverPool, options: SweepRunOptions): AsyncGenerator<Row[]> {
  const { signal } = options;
  const run = (start: number, end: number): Promise<Row[]> => {
    const batch: SweepBatch = { request, key: plan.sweepId, start, end };
    return pool.run<Row[]>(SWEEP_BATCH_TASK, batch, { ...(signal ? { signal } : {}), solveTimeoutMs: (end - start) * options.pointTimeoutMs });
  };

  async function resilient(start: number, end: number): Promise<Row[]> {
    for (let attempt = 0; ; attempt++) {
      try {
        return await run(start, end);
      } catch (error) {
        if (signal?.aborted || !(error instanceof ProblemError)) throw error;
        const p = error.problem;
        if (p.status === 503 && attempt < BUSY_RETRIES) {
          await sleep(100 * 2 ** attempt);
          continue;
        }
        if (p.status >= 500) throw error;
        if (end - start === 1) return [failedRow(plan, start, p)];
        const rows: Row[] = [];
        for (let i = start; i < end; i++) rows.push(...(await resilient(i, i + 1)));
        return rows;
      }
    }
  }

  let next = plan.shard.start;
  let size = 32;
  let msPerPoint = 0;
  const inFlight: { promise: Promise<Row[]>; points: number; issued: number }[] = [];
  const issue = () => {
    while (inFlight.length < options.concurrency && next < plan.shard.end) {
      const end = Math.min(plan.shard.end, next + size);
      const promise = resilient(next, end);
      // Settled in order below; an early failure must not count as unhandled meanwhile.
      promise.catch(() => {});
      inFlight.push({ promise, points: end - next, issued: performance.now() });
      next = end;
    }
  };

  let done = 0;
  let failed = 0;
  try {
    issue();
    while (inFlight.length > 0) {
      if (signal?.aborted) throw new ClientGoneError();
      const head = inFlight.shift()!;
      const rows = await head.promise;
      const perPoint = (performance.now() - head.issued) / head.points / Math.max(1, inFlight.length + 1);
      msPerPoint = msPerPoint === 0 ? perPoint : 0.5 * msPerPoint + 0.5 * perPoint;
      size = Math.max(1, Math.min(MAX_BATCH, Math.floor(TARGET_BATCH_MS / Math.max(msPerPoint, 1e-4))));
      issue();
      done += rows.length;
      for (const row of rows) if (row.problem) failed++;
      options.onProgress?.(done, failed);
      yield rows;
      // Inline pools compute on this thread: let the event loop write, read and notice a closed connection.
      await yieldToEventLoop();
    }
  } finally {
    // Stopped early (the consumer returned or failed): nothing more is started; running tasks see the signal.
    next = plan.shard.end;
  }
}
