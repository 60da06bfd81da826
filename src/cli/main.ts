/**
 * Command line: `oilskin <calculation> <scenario.json | ->` runs the same
 * validation and compute as POST /v1/<calculation> and prints the same JSON.
 * Exit 0 with the envelope on stdout; exit 2 with the problem document on
 * stderr for bad input; exit 1 for anything else.
 */
import { readFileSync } from 'node:fs';
import { runInline, problemFromError } from '../api/calculation.js';
import { ProblemError } from '../api/problem.js';
import { safeStringify } from '../api/envelope.js';
import { CALCULATIONS, calculationByName } from '../api/routes/index.js';

function usage(): string {
  return `usage: oilskin <calculation> <file.json | ->\ncalculations: ${CALCULATIONS.map((c) => c.name).join(', ')}`;
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
