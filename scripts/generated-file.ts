/**
 * One rule for committed generated files (the OpenAPI document, the client's types): `--write` writes the
 * generated text, `--check` exits 1 when the committed file differs, naming the command that fixes it.
 */
import { readFileSync, writeFileSync, mkdirSync } from 'node:fs';

export function writeOrCheck(mode: string | undefined, target: URL, generated: string, names: { file: string; write: string; script: string }): void {
  if (mode === '--write') {
    mkdirSync(new URL('./', target), { recursive: true });
    writeFileSync(target, generated);
    console.log(`${names.file} written`);
  } else if (mode === '--check') {
    let committed = '';
    try {
      committed = readFileSync(target, 'utf8');
    } catch {
      console.error(`${names.file} is missing; run ${names.write}`);
      process.exit(1);
    }
    if (committed !== generated) {
      console.error(`${names.file} differs from its source; run ${names.write} and commit it`);
      process.exit(1);
    }
    console.log(`${names.file} matches its source`);
  } else {
    console.error(`usage: tsx ${names.script} --write | --check`);
    process.exit(2);
  }
}
