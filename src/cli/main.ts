/**
 * Command line: `oilskin <calculation> <scenario.json | ->` runs the same
 * validation and compute as POST /v1/<calculation> and prints the same JSON.
 * Exit 0 with the envelope on stdout; exit 2 with the problem document on
 * stderr for bad input; exit 1 for anything else. `oilskin sweep` and
 * `oilskin merge-shards` stream their output (src/cli/sweep.ts, merge.ts).
 */
import { readFileSync } from 'node:fs';
import { runInline, problemFromError } from '../api/calculation.js';
import { ProblemError } from '../api/problem.js';
import { safeStringify } from '../api/envelope.js';
import { CALCULATIONS, calculationByName } from '../api/routes/index.js';
import { nodeIo, type CliIo } from './io.js';
import { runMergeCli } from './merge.js';
import { runSweepCli } from './sweep.js';

function usage(): string {
  return `usage: oilskin <calculation> <file.json | ->\n       oilskin sweep <sweep.json> [--csv out.csv] [--ndjson out.ndjson] [--shard i/n]\n       oilskin merge-shards <shard.ndjson>... [--ndjson merged.ndjson] [--csv merged.csv]\ncalculations: ${CALCULATIONS.map((c) => c.name).join(', ')}`;
}

export function runCli(argv: readonly string[], readInput: (path: string) => string = (p) => readFileSync(p === '-' ? 0 : p, 'utf8')): {
  code: number;
  stdout: string;
  stderr: string;
} {
  const [name, file] = argv;
  if (!name || name === '--help' || name === '-h') return { code: name ? 0 : 2, stdout: name ? usage() + '\n' : '', stderr: name ? '' : usage() + '\n' };
  const definition = calculationByName(name);
  if (!definition || !file) return { code: 2, stdout: '', stderr: usage() + '\n' };
  let body: unknown;
  try {
    body = JSON.parse(readInput(file));
  } catch (error) {
    const problem = { type: 'https://oilskin.invalid/problems/malformed-json', title: 'The input is not valid JSON', status: 400, detail: (error as Error).message };
    return { code: 2, stdout: '', stderr: JSON.stringify(problem, null, 2) + '\n' };
  }
  try {
    return { code: 0, stdout: JSON.stringify(JSON.parse(safeStringify(runInline(definition, body))), null, 2) + '\n', stderr: '' };
  } catch (error) {
    const problem = error instanceof ProblemError ? error.problem : problemFromError(error);
    return { code: problem.status < 500 ? 2 : 1, stdout: '', stderr: JSON.stringify(problem, null, 2) + '\n' };
  }
}

/** The commands that stream their output, by name. */
const STREAMING: Record<string, (args: readonly string[], io: CliIo) => Promise<number>> = { sweep: runSweepCli, 'merge-shards': runMergeCli };

/** Entry of bin/oilskin.js: run a command, write its output, resolve to the exit code. */
export async function main(argv: readonly string[], io: CliIo = nodeIo()): Promise<number> {
  const [name, ...rest] = argv;
  const streaming = name !== undefined && Object.hasOwn(STREAMING, name) ? STREAMING[name] : undefined;
  if (streaming) return streaming(rest, io);
  const { code, stdout, stderr } = runCli(argv, io.readText);
  process.stdout.write(stdout);
  io.stderr.write(stderr);
  return code;
}
