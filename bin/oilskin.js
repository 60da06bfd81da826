#!/usr/bin/env node
// Command-line entry: runs the compiled CLI (built by `npm run build`, which `npm ci` runs via prepare).
import { main } from '../dist/src/cli/main.js';

process.exitCode = await main(process.argv.slice(2));
