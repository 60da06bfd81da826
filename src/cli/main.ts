/**
 * Command line: `oilskin [--catalogue lab.json] <calculation> <scenario.json | ->`
 * runs the same validation and compute as POST /v1/<calculation> and prints
 * the same JSON. `--catalogue` (else OILSKIN_CATALOGUE_FILE) adds a lab's own
 * fluids and surfactants, as it does for the service.
 * Exit 0 with the envelope on stdout; exit 2 with the problem document on
 * stderr for bad input, or the reasons on stderr for a bad catalogue file;
 * exit 1 for anything else. `--html report.html` also writes the calculation's
 * HTML report where it has one (assess), the same page as `Accept: text/html`.
 * `oilskin sweep` and `oilskin merge-shards` stream their output (src/cli/sweep.ts, merge.ts).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import type { Envelope } from '../api/envelope.js';
import { uninstallUserCatalogue } from '../materials/user-catalogue.js';
import { parseBody, runInline, problemFromError } from '../api/calculation.js';
import { catalogueFlag } from '../api/config.js';
import { CatalogueFileError, loadUserCatalogue } from '../api/user-catalogue-file.js';
import { ProblemError } from '../api/problem.js';
import { safeStringify } from '../api/envelope.js';
import { CALCULATIONS, calculationByName } from '../api/routes/index.js';
import { nodeIo, type CliIo } from './io.js';
import { runMergeCli } from './merge.js';
import { runSweepCli } from './sweep.js';

function usage(): string {
  const reports = CALCULATIONS.filter((c) => c.present?.contentTypes['text/html']).map((c) => c.name);
  return `usage: oilskin [--catalogue lab.json] <calculation> <file.json | -> [--html report.html]\n       oilskin [--catalogue lab.json] sweep <sweep.json> [--csv out.csv] [--ndjson out.ndjson] [--shard i/n]\n       oilskin merge-shards <shard.ndjson>... [--ndjson merged.ndjson] [--csv merged.csv]\ncalculations: ${CALCULATIONS.map((c) => c.name).join(', ')}\n--html (writes the HTML report): ${reports.join(', ')}`;
}

type CliResult = { code: number; stdout: string; stderr: string };

/** The arguments without `--catalogue file` / `--catalogue=file`. */
function withoutCatalogueFlag(argv: readonly string[]): string[] {
  return argv.filter((arg, i) => !(arg === '--catalogue' || arg.startsWith('--catalogue=') || (i > 0 && argv[i - 1] === '--catalogue')));
}

export function runCli(
  argv: readonly string[],
  readInput: (path: string) => string = (p) => readFileSync(p === '-' ? 0 : p, 'utf8'),
  env: NodeJS.ProcessEnv = process.env,
): CliResult {
  const catalogueFile = catalogueFlag(argv) ?? (env.OILSKIN_CATALOGUE_FILE || undefined);
  const rest = withoutCatalogueFlag(argv);
  if (catalogueFile === undefined) return runCalculation(rest, readInput);
  const refused = installCatalogueFile(catalogueFile);
  if (refused !== undefined) return { code: 2, stdout: '', stderr: refused };
  try {
    return runCalculation(rest, readInput);
  } finally {
    uninstallUserCatalogue();
  }
}

/** Load a lab's catalogue file; the message for stderr when the file is refused, else undefined. */
function installCatalogueFile(file: string): string | undefined {
  try {
    loadUserCatalogue(file);
    return undefined;
  } catch (error) {
    if (error instanceof CatalogueFileError) return `oilskin: ${error.message}\n`;
    throw error;
  }
}

function runCalculation(argv: readonly string[], readInput: (path: string) => string): CliResult {
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

/**
 * {@link runCli}, plus `--html <file>`: the calculation's HTML report written to the file (the JSON still on
 * stdout). Exit 2 with usage when the calculation has no report or the file name is missing.
 */
export async function runCliWithReport(
  argv: readonly string[],
  readInput: (path: string) => string = (p) => readFileSync(p === '-' ? 0 : p, 'utf8'),
  writeOutput: (path: string, text: string) => void = (p, text) => writeFileSync(p, text),
): Promise<CliResult> {
  const at = argv.indexOf('--html');
  if (at < 0) return runCli(argv, readInput);
  const target = argv[at + 1];
  const rest = [...argv.slice(0, at), ...argv.slice(at + 2)];
  const definition = rest.map((a) => calculationByName(a)).find((d) => d !== undefined);
  if (!target || target.startsWith('--') || !definition?.present?.contentTypes['text/html']) return { code: 2, stdout: '', stderr: usage() + '\n' };
  let text = '';
  const out = runCli(rest, (p) => (text = readInput(p)));
  if (out.code !== 0) return out;
  try {
    const input = parseBody(definition, JSON.parse(text));
    const page = await definition.present.render(JSON.parse(out.stdout) as Envelope, input, { accept: 'text/html', query: {} });
    if (!page) throw new Error('the calculation returned no HTML report');
    writeOutput(target, page.body);
  } catch (error) {
    const problem = error instanceof ProblemError ? error.problem : problemFromError(error);
    return { code: problem.status < 500 ? 2 : 1, stdout: out.stdout, stderr: JSON.stringify(problem, null, 2) + '\n' };
  }
  return { code: 0, stdout: out.stdout, stderr: `report written to ${target}\n` };
}

/** The commands that stream their output, by name. */
const STREAMING: Record<string, (args: readonly string[], io: CliIo) => Promise<number>> = { sweep: runSweepCli, 'merge-shards': runMergeCli };

/** Entry of bin/oilskin.js: run a command, write its output, resolve to the exit code. */
export async function main(argv: readonly string[], io: CliIo = nodeIo()): Promise<number> {
  const [name, ...rest] = withoutCatalogueFlag(argv);
  const streaming = name !== undefined && Object.hasOwn(STREAMING, name) ? STREAMING[name] : undefined;
  if (streaming) {
    const catalogueFile = catalogueFlag(argv) ?? (process.env.OILSKIN_CATALOGUE_FILE || undefined);
    const refused = catalogueFile === undefined ? undefined : installCatalogueFile(catalogueFile);
    if (refused !== undefined) {
      io.stderr.write(refused);
      return 2;
    }
    return streaming(rest, io);
  }
  const { code, stdout, stderr } = await runCliWithReport(argv, io.readText);
  process.stdout.write(stdout);
  io.stderr.write(stderr);
  return code;
}
