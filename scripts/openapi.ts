/**
 * Write (--write) or verify (--check) openapi/openapi.json against the
 * document generated from the zod schemas. --check exits 1 on any drift.
 */
import { readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { buildOpenApiDocument } from '../src/api/openapi.js';

const target = new URL('../openapi/openapi.json', import.meta.url);
const generated = `${JSON.stringify(buildOpenApiDocument(), null, 2)}\n`;
const mode = process.argv[2];

if (mode === '--write') {
  mkdirSync(new URL('../openapi/', import.meta.url), { recursive: true });
  writeFileSync(target, generated);
  console.log('openapi/openapi.json written');
} else if (mode === '--check') {
  let committed = '';
  try {
    committed = readFileSync(target, 'utf8');
  } catch {
    console.error('openapi/openapi.json is missing; run npm run openapi:write');
    process.exit(1);
  }
  if (committed !== generated) {
    console.error('openapi/openapi.json differs from the code; run npm run openapi:write and commit it');
    process.exit(1);
  }
  console.log('openapi/openapi.json matches the code');
} else {
  console.error('usage: tsx scripts/openapi.ts --write | --check');
  process.exit(2);
}
