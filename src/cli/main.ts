/**
 * Command line: `oilskin [--catalogue lab.json] <calculation> <scenario.json | ->`
 * runs the same validation and compute as POST /v1/<calculation> and prints
 * the same JSON. `--catalogue` (else OILSKIN_CATALOGUE_FILE) adds a lab's own
 * fluids and surfactants, as it does for the service.
 * Exit 0 with the envelope on stdout; exit 2 with the problem document on
 * stderr for bad input, or the reasons on stderr for a bad catalogue file;
 * exit 1 for anything else.
 */
import { readFileSync } from 'node:fs';
import { uninstallUserCatalogue } from '../materials/user-catalogue.js';
import { runInline, problemFromError } from '../api/calculation.js';
import { catalogueFlag } from '../api/config.js';
import { CatalogueFileError, loadUserCatalogue } from '../api/user-catalogue-file.js';
import { ProblemError } from '../api/problem.js';
import { safeStringify } from '../api/envelope.js';
import { CALCULATIONS, calculationByName } from '../api/routes/index.js';

function usage(): string {
  return `usage: oilskin [--catalogue lab.json] <calculation> <file.json | ->\ncalculations: ${CALCULATIONS.map((c) => c.name).join(', ')}`;
}

type CliResult = { code: number; stdout: string; stderr: string };

export function runCli(
  argv: readonly string[],
  readInput: (path: string) => string = (p) => readFileSync(p === '-' ? 0 : p, 'utf8'),
  env: NodeJS.ProcessEnv = process.env,
): CliResult {
  const catalogueFile = catalogueFlag(argv) ?? (env.OILSKIN_CATALOGUE_FILE || undefined);
  const rest = argv.filter((arg, i) => !(arg === '--catalogue' || arg.startsWith('--catalogue=') || (i > 0 && argv[i - 1] === '--catalogue')));
  if (catalogueFile === undefined) return runCalculation(rest, readInput);
  try {
    loadUserCatalogue(catalogueFile);
  } catch (error) {
    if (error instanceof CatalogueFileError) return { code: 2, stdout: '', stderr: `oilskin: ${error.message}\n` };
    throw error;
  }
  try {
    return runCalculation(rest, readInput);
  } finally {
    uninstallUserCatalogue();
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
