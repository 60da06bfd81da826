/**
 * `oilskin merge-shards shard-0.ndjson shard-1.ndjson … [--ndjson out.ndjson] [--csv out.csv]`:
 * joins the NDJSON files of one sweep's shards (from `oilskin sweep --shard`,
 * a batch job's pods, or POST /v1/sweep answers) into the whole sweep, and
 * refuses to when they do not make it up: shards of different sweeps, a
 * count that differs, a shard missing or given twice, a slice that does not
 * start where the previous one ended, points out of order or missing inside a
 * shard, a shard without its end line (cut short). The files may come in any
 * order; their headers say which slice each holds. The merged file equals the
 * unsharded sweep's, byte for byte (progress lines are dropped).
 */
import { csvHeader, csvRow, ndjsonLine, type EndLine, type PointLine, type SweepHeader } from '../api/sweep/format.js';
import { shardSlice } from '../api/sweep/plan.js';
import type { CliIo, OutputSink } from './io.js';
import { CliUsageError, optionValues, reportFailure } from './options.js';

export const MERGE_USAGE = 'usage: oilskin merge-shards <shard.ndjson>... [--ndjson merged.ndjson] [--csv merged.csv]   (none named: NDJSON on standard output)';

/** Shards that do not make up one sweep: exit 2 with every reason. */
export class ShardMismatchError extends CliUsageError {}

async function firstLine(io: CliIo, path: string): Promise<string | undefined> {
  for await (const line of io.readLines(path)) return line;
  return undefined;
}

function parseHeader(text: string | undefined, path: string): SweepHeader {
  let header: SweepHeader | undefined;
  try {
    header = text === undefined ? undefined : (JSON.parse(text) as SweepHeader);
  } catch {
    header = undefined;
  }
  if (header?.kind !== 'sweep' || typeof header.shard?.index !== 'number') throw new ShardMismatchError(`${path}: the first line is not a sweep header`);
  return header;
}

/** Check the headers against each other; the files ordered by shard index. */
export function checkShardHeaders(shards: readonly { path: string; header: SweepHeader }[]): { path: string; header: SweepHeader }[] {
  const problems: string[] = [];
  const first = shards[0]!.header;
  const same = (h: SweepHeader) =>
    h.sweepId === first.sweepId && h.calculation === first.calculation && h.totalPoints === first.totalPoints && JSON.stringify(h.columns) === JSON.stringify(first.columns);
  for (const s of shards) {
    if (!same(s.header)) problems.push(`${s.path} belongs to another sweep (sweep id ${s.header.sweepId.slice(0, 12)}…, not ${first.sweepId.slice(0, 12)}…)`);
    if (s.header.shard.count !== first.shard.count) problems.push(`${s.path} is shard ${s.header.shard.index} of ${s.header.shard.count}, not of ${first.shard.count}`);
  }
  const count = first.shard.count;
  const byIndex = new Map<number, string[]>();
  for (const s of shards) byIndex.set(s.header.shard.index, [...(byIndex.get(s.header.shard.index) ?? []), s.path]);
  const missing = Array.from({ length: count }, (_, i) => i).filter((i) => !byIndex.has(i));
  if (missing.length > 0) problems.push(`shards missing: ${missing.slice(0, 20).join(', ')}${missing.length > 20 ? ` and ${missing.length - 20} more` : ''} (of ${count})`);
  for (const [index, paths] of byIndex) if (paths.length > 1) problems.push(`shard ${index} given twice: ${paths.join(', ')}`);
  const ordered = [...shards].sort((a, b) => a.header.shard.index - b.header.shard.index);
  for (const s of ordered) {
    const expected = shardSlice(first.totalPoints, s.header.shard.index, count);
    if (s.header.shard.start !== expected.start || s.header.shard.end !== expected.end) {
      problems.push(`${s.path}: shard ${s.header.shard.index} holds points ${s.header.shard.start}–${s.header.shard.end - 1}, expected ${expected.start}–${expected.end - 1}`);
    }
  }
  if (problems.length > 0) throw new ShardMismatchError(problems.join('\n'));
  return ordered;
}

export async function runMergeCli(args: readonly string[], io: CliIo): Promise<number> {
  let sinks: { format: 'csv' | 'ndjson'; sink: OutputSink }[] = [];
  try {
    const { positional, options } = optionValues(args, ['ndjson', 'csv'], []);
    if (positional.length === 0) throw new CliUsageError('name the shard files');
    const headers = [];
    for (const path of positional) headers.push({ path, header: parseHeader(await firstLine(io, path), path) });
    const ordered = checkShardHeaders(headers);
    const first = ordered[0]!.header;
    const merged: SweepHeader = { ...first, shard: shardSlice(first.totalPoints, 0, 1) };
    const named = (['ndjson', 'csv'] as const).filter((f) => options[f] !== undefined);
    sinks = (named.length > 0 ? named : (['ndjson'] as const)).map((format) => ({ format, sink: io.output(options[format] ?? '-') }));
    for (const { format, sink } of sinks) await sink.write(format === 'ndjson' ? ndjsonLine(merged) : csvHeader(merged.columns));
    let failed = 0;
    for (const { path, header } of ordered) {
      let next = header.shard.start;
      let ended = false;
      let lineNumber = 0;
      let ndjson = '';
      let csv = '';
      const flush = async () => {
        for (const { format, sink } of sinks) await sink.write(format === 'ndjson' ? ndjson : csv);
        ndjson = '';
        csv = '';
      };
      for await (const text of io.readLines(path)) {
        lineNumber++;
        if (lineNumber === 1 || text.trim() === '') continue;
        if (ended) throw new ShardMismatchError(`${path}:${lineNumber}: a line after the end line`);
        let line: PointLine | EndLine | { kind: string };
        try {
          line = JSON.parse(text) as PointLine | EndLine | { kind: string };
        } catch {
          throw new ShardMismatchError(`${path}:${lineNumber}: not a JSON line (the file is damaged or cut short)`);
        }
        if (line.kind === 'progress') continue;
        if (line.kind === 'end') {
          const end = line as EndLine;
          if (end.points !== header.shard.end - header.shard.start) throw new ShardMismatchError(`${path}: its end line counts ${end.points} points, the slice has ${header.shard.end - header.shard.start}`);
          ended = true;
          continue;
        }
        if (line.kind !== 'point') throw new ShardMismatchError(`${path}:${lineNumber}: unexpected line of kind ${JSON.stringify(line.kind)}`);
        const point = line as PointLine;
        if (point.index !== next) throw new ShardMismatchError(`${path}:${lineNumber}: point ${point.index} where point ${next} belongs (points missing or out of order)`);
        next++;
        if (point.problem) failed++;
        ndjson += `${text}\n`;
        csv += csvRow({ index: point.index, values: first.columns.map((c) => point.values[c.name] ?? null), ...(point.problem ? { problem: point.problem } : {}) });
        if (ndjson.length > 1 << 16) await flush();
      }
      await flush();
      if (!ended) throw new ShardMismatchError(`${path}: no end line after point ${next - 1}: the shard was cut short (points ${next}–${header.shard.end - 1} missing)`);
      if (next !== header.shard.end) throw new ShardMismatchError(`${path}: points ${next}–${header.shard.end - 1} missing`);
    }
    for (const { format, sink } of sinks) {
      if (format === 'ndjson') await sink.write(ndjsonLine({ kind: 'end', points: first.totalPoints, failed }));
      await sink.commit();
    }
    sinks = [];
    return 0;
  } catch (error) {
    for (const { sink } of sinks) await sink.abort();
    return reportFailure(error, io, MERGE_USAGE);
  }
}
