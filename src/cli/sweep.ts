/**
 * `oilskin sweep sweep.json [--csv out.csv] [--ndjson out.ndjson] [--json out.json] [--shard i/n] [--threads n] [--quiet]`:
 * the sweep of POST /v1/sweep on this machine, its work spread over a pool of
 * solver threads, written as it finishes (NDJSON on standard output when no
 * output is named). `--shard i/n` (i from 0 to n − 1, as a batch job's
 * completion index) computes slice i of n; `oilskin merge-shards` joins the
 * slices. A progress bar is drawn on standard error when it is a terminal.
 * Exit 0 when the sweep ran (failed points are rows), 2 for a bad request, 1
 * otherwise.
 */
import { availableParallelism } from 'node:os';
import { createSolverPool } from '../api/pool.js';
import { computeSafely } from '../api/worker.js';
import { csvHeader, csvRow, ndjsonLine, pointLine, sweepHeader } from '../api/sweep/format.js';
import { planSweep } from '../api/sweep/plan.js';
import { sweepRows } from '../api/sweep/run.js';
import type { CliIo, OutputSink } from './io.js';
import { CliUsageError, optionValues, reportFailure } from './options.js';

export const SWEEP_USAGE =
  'usage: oilskin sweep <sweep.json | -> [--csv out.csv] [--ndjson out.ndjson] [--json out.json] [--shard i/n] [--threads n] [--quiet]\n' +
  '  outputs may be "-" (standard output); none named: NDJSON on standard output. --shard i/n: slice i (0 … n−1) of n.';

/** `i/n` → { index: i, count: n }, 0 ≤ i < n. */
export function parseShard(text: string): { index: number; count: number } {
  const m = /^(\d+)\/(\d+)$/.exec(text.trim());
  const index = m ? Number(m[1]) : NaN;
  const count = m ? Number(m[2]) : NaN;
  if (!m || !Number.isSafeInteger(index) || !Number.isSafeInteger(count) || count < 1 || index >= count) {
    throw new CliUsageError(`--shard wants i/n with 0 ≤ i < n (the slice index counts from 0), got "${text}"`);
  }
  return { index, count };
}

function progressBar(done: number, points: number, failed: number, elapsedMs: number): string {
  const width = 30;
  const fraction = points === 0 ? 1 : done / points;
  const filled = Math.round(fraction * width);
  return `\r[${'#'.repeat(filled)}${'-'.repeat(width - filled)}] ${(fraction * 100).toFixed(0).padStart(3)}% ${done}/${points} points, ${failed} failed, ${(elapsedMs / 1000).toFixed(1)} s`;
}

export async function runSweepCli(args: readonly string[], io: CliIo): Promise<number> {
  let sinks: { format: 'csv' | 'ndjson' | 'json'; sink: OutputSink }[] = [];
  try {
    const { positional, options, flags } = optionValues(args, ['csv', 'ndjson', 'json', 'shard', 'threads'], ['quiet']);
    if (positional.length !== 1) throw new CliUsageError('give one sweep file');
    let body: Record<string, unknown>;
    try {
      body = JSON.parse(io.readText(positional[0]!)) as Record<string, unknown>;
    } catch (error) {
      throw new CliUsageError(`cannot read the sweep file: ${(error as Error).message}`);
    }
    if (options.shard !== undefined && body && typeof body === 'object') body = { ...body, shard: parseShard(options.shard) };
    const threads = options.threads !== undefined ? Number(options.threads) : Number(io.env.OILSKIN_WORKERS ?? availableParallelism());
    if (!Number.isInteger(threads) || threads < 0 || threads > 256) throw new CliUsageError(`--threads wants a whole number from 0 to 256, got "${options.threads}"`);
    const plan = planSweep(body);
    const pointTimeoutMs = Number(io.env.OILSKIN_SWEEP_POINT_TIMEOUT_MS ?? 20_000);
    const pool = createSolverPool({
      threads,
      maxQueued: 4 * threads + 4,
      queueTimeoutMs: 24 * 3600 * 1000,
      solveTimeoutMs: pointTimeoutMs,
      workerMemoryMb: Number(io.env.OILSKIN_WORKER_MEMORY_MB ?? 512),
      inline: computeSafely,
    });
    const named = (['ndjson', 'csv', 'json'] as const).filter((f) => options[f] !== undefined);
    sinks = (named.length > 0 ? named : (['ndjson'] as const)).map((format) => ({ format, sink: io.output(options[format] ?? '-') }));
    const header = sweepHeader(plan);
    const points = plan.shard.end - plan.shard.start;
    const started = performance.now();
    const bar = io.stderr.isTTY === true && !flags.has('quiet');
    let failed = 0;
    let lastDraw = 0;
    try {
      await pool.ready();
      for (const { format, sink } of sinks) {
        if (format === 'ndjson') await sink.write(ndjsonLine(header));
        if (format === 'csv') await sink.write(csvHeader(header.columns));
        if (format === 'json') await sink.write(`${JSON.stringify({ ...header, kind: undefined, points: undefined }).slice(0, -1)},"points":[`);
      }
      let done = 0;
      for await (const rows of sweepRows(plan, body, pool, { concurrency: 2 * Math.max(1, threads), pointTimeoutMs })) {
        for (const { format, sink } of sinks) {
          let chunk = '';
          rows.forEach((row, k) => {
            if (format === 'csv') chunk += csvRow(row);
            else {
              const line = pointLine(header.columns, row);
              if (format === 'ndjson') chunk += ndjsonLine(line);
              else chunk += `${done + k === 0 ? '' : ','}${JSON.stringify({ ...line, kind: undefined })}`;
            }
          });
          await sink.write(chunk);
        }
        done += rows.length;
        for (const row of rows) if (row.problem) failed++;
        const now = performance.now();
        if (bar && (now - lastDraw > 100 || done === points)) {
          lastDraw = now;
          io.stderr.write(progressBar(done, points, failed, now - started));
        }
      }
      for (const { format, sink } of sinks) {
        if (format === 'ndjson') await sink.write(ndjsonLine({ kind: 'end', points: done, failed }));
        if (format === 'json') await sink.write(`],"failed":${failed}}\n`);
        await sink.commit();
      }
      sinks = [];
    } finally {
      await pool.close();
    }
    if (!flags.has('quiet')) io.stderr.write(`${bar ? '\n' : ''}sweep ${plan.definition.name}: ${points} points (shard ${plan.shard.index}/${plan.shard.count}), ${failed} failed, ${((performance.now() - started) / 1000).toFixed(1)} s\n`);
    return 0;
  } catch (error) {
    for (const { sink } of sinks) await sink.abort();
    return reportFailure(error, io, SWEEP_USAGE);
  }
}
