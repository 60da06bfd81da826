/** Option parsing and failure reporting shared by the long-running CLI commands. */
import { problemFromError } from '../api/calculation.js';
import { ProblemError } from '../api/problem.js';
import type { CliIo } from './io.js';

/** A command line the command cannot use (exit 2 with the usage). */
export class CliUsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CliUsageError';
  }
}

/** Split arguments into positional ones, `--name value` options and `--flag` switches; unknown options are refused. */
export function optionValues(
  args: readonly string[],
  valued: readonly string[],
  switches: readonly string[],
): { positional: string[]; options: Record<string, string | undefined>; flags: Set<string> } {
  const positional: string[] = [];
  const options: Record<string, string | undefined> = {};
  const flags = new Set<string>();
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (!arg.startsWith('--')) {
      positional.push(arg);
      continue;
    }
    const name = arg.slice(2);
    if (switches.includes(name)) flags.add(name);
    else if (valued.includes(name)) {
      const value = args[++i];
      if (value === undefined) throw new CliUsageError(`${arg} needs a value`);
      options[name] = value;
    } else throw new CliUsageError(`unknown option ${arg}`);
  }
  return { positional, options, flags };
}

/** Exit code for a failure, its report on standard error: 2 with the problem or usage for bad input, 1 otherwise. */
export function reportFailure(error: unknown, io: CliIo, usage: string): number {
  if (error instanceof CliUsageError) {
    io.stderr.write(`${error.message}\n${usage}\n`);
    return 2;
  }
  const problem = error instanceof ProblemError ? error.problem : problemFromError(error);
  io.stderr.write(`${JSON.stringify(problem, null, 2)}\n`);
  return problem.status < 500 ? 2 : 1;
}
