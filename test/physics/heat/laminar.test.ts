import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { nusseltUniformFluxOneWall, nusseltUniformFluxPlates, nusseltUniformFluxTube, nusseltUniformTemperature } from '../../../src/physics/heat/laminar.js';

interface LaminarFixture {
  uniformFlux: { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[];
  uniformTemperature: { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[];
  plugUniformTemperature: { plates: number; tube: number };
}
const laminar = JSON.parse(
  readFileSync(new URL('../../../fixtures/heat/laminar.json', import.meta.url), 'utf8'),
) as LaminarFixture;

describe('laminar uniform-flux closed forms', () => {
  it('Shah & London (1978): plates both walls 8.235 = 140/17, one wall heated other insulated 5.385 = 70/13, tube 4.364 = 48/11', () => {
    expect(nusseltUniformFluxPlates(0, 0)).toBeCloseTo(140 / 17, 12);
    expect(nusseltUniformFluxPlates(0, 0)).toBeCloseTo(8.235, 3);
    expect(nusseltUniformFluxOneWall(0, 0)).toBeCloseTo(5.385, 3);
    expect(nusseltUniformFluxTube(0, 0)).toBeCloseTo(4.364, 3);
  });
  it('plug-flow limits 12 (plates) and 8 (tube) (exact slug-flow solutions, Shah & London 1978)', () => {
    expect(nusseltUniformFluxPlates(1e7, 0)).toBeCloseTo(12, 5);
    expect(nusseltUniformFluxTube(1e7, 0)).toBeCloseTo(8, 5);
  });
  it('matches the sympy derivation at sample points (fixtures/heat/generate_laminar.py; tube ratios converted D → R)', () => {
    for (const p of laminar.uniformFlux) {
      expect(nusseltUniformFluxPlates(p.x, p.y)).toBeCloseTo(p.platesBoth, 11);
      expect(nusseltUniformFluxOneWall(p.x, p.y)).toBeCloseTo(p.oneWall, 11);
      expect(nusseltUniformFluxTube(2 * p.x, 2 * p.y)).toBeCloseTo(p.tube, 11);
    }
  });
  it('superposition 1/Nu = 1/Nu_slip + b_t/D_h holds (series resistances; D_h = 2H, D)', () => {
    const x = 0.04;
    const y = 0.03;
    expect(1 / nusseltUniformFluxPlates(x, y)!).toBeCloseTo(1 / nusseltUniformFluxPlates(x, 0)! + y / 2, 13);
    expect(1 / nusseltUniformFluxOneWall(x, y)!).toBeCloseTo(1 / nusseltUniformFluxOneWall(x, 0)! + y / 2, 13);
    // tube: β_t = b_t/R, so b_t/D = β_t/2
    expect(1 / nusseltUniformFluxTube(x, y)!).toBeCloseTo(1 / nusseltUniformFluxTube(x, 0)! + y / 2, 13);
  });
  it('returns null instead of a negative or infinite Nu when the total resistance is not positive', () => {
    expect(nusseltUniformFluxPlates(0, -0.5)).toBeNull();
  });
});

describe('laminar uniform-temperature eigenproblem (shooting)', () => {
  it('no slip: plates 7.5407, tube 3.6568, one wall heated other insulated 4.8607 (scipy DOP853 shooting, fixtures/heat/laminar.json)', () => {
    const noSlip = (laminar.uniformTemperature as { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[]).find((p) => p.x === 0 && p.y === 0)!;
    expect(nusseltUniformTemperature('plates-both', 0, 0).nusselt).toBeCloseTo(noSlip.platesBoth, 8);
    expect(nusseltUniformTemperature('tube', 0, 0).nusselt).toBeCloseTo(noSlip.tube, 8);
    expect(nusseltUniformTemperature('one-wall', 0, 0).nusselt).toBeCloseTo(noSlip.oneWall, 8);
  });
  it('plug-flow limits π² (plates) and j₀,₁² = 5.783 (tube) (exact: cos and J₀ eigenfunctions)', () => {
    expect(nusseltUniformTemperature('plates-both', 1e8, 0).nusselt).toBeCloseTo(Math.PI ** 2, 5);
    expect(nusseltUniformTemperature('tube', 1e8, 0).nusselt).toBeCloseTo(2.404825557695773 ** 2, 5);
    expect(laminar.plugUniformTemperature.tube).toBeCloseTo(5.783, 3);
  });
  it('agrees with scipy DOP853 shooting at slip and thermal-slip sample points (fixtures/heat/generate_laminar.py)', () => {
    for (const p of laminar.uniformTemperature) {
      expect(nusseltUniformTemperature('plates-both', p.x, p.y).nusselt).toBeCloseTo(p.platesBoth, 8);
      expect(nusseltUniformTemperature('one-wall', p.x, p.y).nusselt).toBeCloseTo(p.oneWall, 8);
      expect(nusseltUniformTemperature('tube', 2 * p.x, 2 * p.y).nusselt).toBeCloseTo(p.tube, 8);
    }
  });
});
