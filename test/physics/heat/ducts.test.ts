import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { rectangularDuctLaminar } from '../../../src/physics/heat/ducts.js';

const ducts = JSON.parse(readFileSync(new URL('../../../fixtures/heat/ducts.json', import.meta.url), 'utf8')) as {
  ducts: { aspectRatio: number; frictionFactorReynolds: number; nusseltUniformFlux: number; nusseltUniformTemperature: number }[];
};

describe('rectangular ducts on the field machinery (Richardson-extrapolated from two grids)', () => {
  // Witnesses: fixtures/heat/generate_ducts.py — f·Re by the exact series (mpmath), Nu_H1 by the exact double sine
  // series and Nu_T by a sine-Galerkin eigenvalue (numpy/scipy), converged to < 3e-9; a method unrelated to the
  // finite-volume field solver checked here.
  for (const row of ducts.ducts) {
    it(`aspect ${row.aspectRatio}: f·Re = ${row.frictionFactorReynolds.toFixed(3)}, Nu_H1 = ${row.nusseltUniformFlux.toFixed(4)}, Nu_T = ${row.nusseltUniformTemperature.toFixed(4)} (fixtures/heat/generate_ducts.py)`, () => {
      const coarseCells = row.aspectRatio < 0.2 ? 12 : 20;
      const coarse = rectangularDuctLaminar(row.aspectRatio, coarseCells);
      const fine = rectangularDuctLaminar(row.aspectRatio, 2 * coarseCells);
      const extrapolate = (a: number, b: number) => b + (b - a) / 3; // second-order scheme
      expect(Math.abs(extrapolate(coarse.frictionFactorReynolds, fine.frictionFactorReynolds) / row.frictionFactorReynolds - 1)).toBeLessThan(1e-3);
      expect(Math.abs(extrapolate(coarse.nusseltUniformFlux, fine.nusseltUniformFlux) / row.nusseltUniformFlux - 1)).toBeLessThan(2e-3);
      expect(Math.abs(extrapolate(coarse.nusseltUniformTemperature, fine.nusseltUniformTemperature) / row.nusseltUniformTemperature - 1)).toBeLessThan(2e-3);
    });
  }
});
