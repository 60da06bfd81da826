import { describe, expect, it } from 'vitest';
import { REFERENCES, type Reference } from '../../src/core/references.js';
import * as catalogueSources from '../../src/materials/references.js';

const isReference = (value: unknown): value is Reference =>
  typeof value === 'object' && value !== null && typeof (value as Reference).key === 'string' && typeof (value as Reference).citation === 'string';

describe('one definition per reference', () => {
  const models = Object.entries(REFERENCES);
  const data = Object.values(catalogueSources).filter(isReference);

  it('each bibliography entry carries its own property name as key', () => {
    for (const [name, ref] of models) expect(ref.key).toBe(name);
  });

  it('no key is defined twice across the models’ literature and the catalogue’s data sources', () => {
    const keys = [...models.map(([, r]) => r.key), ...data.map((r) => r.key)];
    const repeated = keys.filter((k, i) => keys.indexOf(k) !== i);
    expect(repeated).toEqual([]);
    expect(data.length).toBeGreaterThan(10);
  });

  it('every DOI has the registry form 10.<registrant>/<suffix> and is not repeated inside its citation text', () => {
    for (const ref of [...models.map(([, r]) => r), ...data]) {
      if (ref.doi === undefined) continue;
      expect(ref.doi).toMatch(/^10\.\d{4,9}\/\S+$/);
      expect(ref.citation).not.toContain(ref.doi);
    }
  });
});
