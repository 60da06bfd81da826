import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { rectangularDuctLaminar } from '../../../src/physics/heat/ducts.js';

const ducts = JSON.parse(readFileSync(new URL('../../../fixtures/heat/ducts.json', import.meta.url), 'utf8')) as {
  ducts: { aspectRatio: number; frictionFactorReynolds: number }[];
};

describe('rectangular ducts on the field machinery (Richardson-extrapolated from two grids)', () => {
  // Shah & London (1978) tables, values from memory: Nu_H1 and Nu_T for aspect ratios 1, 0.5, 0.25, 0.125.
  const table: Record<number, { h1: number; t: number }> = {
    1: { h1: 3.608, t: 2.976 },
    0.5: { h1: 4.123, t: 3.391 },
    0.25: { h1: 5.331, t: 4.439 },
    0.125: { h1: 6.49, t: 5.597 },
  };
  for (const row of ducts.ducts) {
    it(`aspect ${row.aspectRatio}: f·Re = ${row.frictionFactorReynolds.toFixed(3)} (exact series, fixtures/heat/generate_ducts.py), Nu_H1 ${table[row.aspectRatio].h1}, Nu_T ${table[row.aspectRatio].t} (Shah & London 1978, from memory)`, () => {
      const coarseCells = row.aspectRatio < 0.2 ? 12 : 20;
      const coarse = rectangularDuctLaminar(row.aspectRatio, coarseCells);
      const fine = rectangularDuctLaminar(row.aspectRatio, 2 * coarseCells);
      const extrapolate = (a: number, b: number) => b + (b - a) / 3; // second-order scheme
      expect(Math.abs(extrapolate(coarse.frictionFactorReynolds, fine.frictionFactorReynolds) / row.frictionFactorReynolds - 1)).toBeLessThan(1e-3);
      expect(Math.abs(extrapolate(coarse.nusseltUniformFlux, fine.nusseltUniformFlux) / table[row.aspectRatio].h1 - 1)).toBeLessThan(2e-3);
      expect(Math.abs(extrapolate(coarse.nusseltUniformTemperature, fine.nusseltUniformTemperature) / table[row.aspectRatio].t - 1)).toBeLessThan(2e-3);
    });
  }
});
