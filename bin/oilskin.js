#!/usr/bin/env node
// Command-line entry: runs the compiled CLI (built by `npm run build`, which `npm ci` runs via prepare).
import { runCliWithReport } from '../dist/src/cli/main.js';

const { code, stdout, stderr } = await runCliWithReport(process.argv.slice(2));
process.stdout.write(stdout);
process.stderr.write(stderr);
process.exitCode = code;
