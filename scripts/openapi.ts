/**
 * Write (--write) or verify (--check) openapi/openapi.json against the
 * document generated from the zod schemas. --check exits 1 on any drift.
 */
import { buildOpenApiDocument } from '../src/api/openapi.js';
import { writeOrCheck } from './generated-file.js';

writeOrCheck(process.argv[2], new URL('../openapi/openapi.json', import.meta.url), `${JSON.stringify(buildOpenApiDocument(), null, 2)}\n`, {
  file: 'openapi/openapi.json',
  write: 'npm run openapi:write',
  script: 'scripts/openapi.ts',
});
