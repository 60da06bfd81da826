import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

/**
 * The house's layering (DEVELOPERS.md): each folder of src/ may import only
 * itself and the folders listed for it. core and numerics import nothing of
 * ours; physics and materials never import each other.
 */
const ALLOWED: Record<string, readonly string[]> = {
  core: [],
  numerics: [],
  materials: ['core', 'numerics'],
  physics: ['core', 'numerics'],
  api: ['core', 'numerics', 'materials', 'physics'],
  cli: ['core', 'numerics', 'materials', 'physics', 'api'],
};

const src = resolve(dirname(fileURLToPath(import.meta.url)), '../src');

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : [];
  });
}

describe('layering of src/', () => {
  it('every folder of src/ has a rule', () => {
    const top = readdirSync(src).filter((name) => statSync(join(src, name)).isDirectory());
    expect(top.sort()).toEqual(Object.keys(ALLOWED).sort());
  });

  it('no file imports a layer above or beside its own', () => {
    const violations: string[] = [];
    for (const file of sources(src)) {
      const layer = relative(src, file).split('/')[0];
      const text = readFileSync(file, 'utf8');
      for (const match of text.matchAll(/(?:from|import)\s*\(?\s*'(\.[^']+)'/g)) {
        const target = relative(src, resolve(dirname(file), match[1])).split('/')[0];
        if (target !== layer && !ALLOWED[layer].includes(target)) violations.push(`${relative(src, file)} → ${match[1]}`);
      }
    }
    expect(violations).toEqual([]);
  });
});
