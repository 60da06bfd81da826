import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  dittusBoelterNusselt,
  gnielinskiNusselt,
  kaderThermalConstant,
  nusseltUniformFluxOneWall,
  nusseltUniformFluxPlates,
  nusseltUniformFluxTube,
  nusseltUniformTemperature,
  petukhovFrictionFactor,
  stripedThermalSlip,
  thermalSlipAdiabaticGrooves,
  thermalSlipIsofluxRidges,
  thermalSlipLubricantGrooves,
  turbulentHeatTransfer,
} from '../../src/physics/heat.js';

interface LaminarFixture {
  uniformFlux: { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[];
  uniformTemperature: { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[];
  plugUniformTemperature: { plates: number; tube: number };
}
const laminar = JSON.parse(
  readFileSync(new URL('../../fixtures/heat/laminar.json', import.meta.url), 'utf8'),
) as LaminarFixture;

const ZETA3 = 1.2020569031595942; // Apéry's constant ζ(3) (OEIS A002117)

describe('thermal slip closed forms', () => {
  it('adiabatic grooves: P = 1, φ = ½ gives ln2/(2π) = 0.1103178 (Philip 1972 formula, exact value)', () => {
    expect(thermalSlipAdiabaticGrooves(1, 0.5)).toBeCloseTo(Math.LN2 / (2 * Math.PI), 14);
  });
  it('isoflux ridges at φ = ½: Σ_odd 1/n³/(π³/4) = 7ζ(3)/(2π³) = 0.135685 (exact from the series, sin² = 1 on odd n)', () => {
    expect(thermalSlipIsofluxRidges(1, 0.5)).toBeCloseTo((7 * ZETA3) / (2 * Math.PI ** 3), 9);
  });
  it('isoflux ridges exceed isothermal ridges (a uniform-flux source is hotter on average than an isothermal one; physical bound)', () => {
    for (const phi of [0.2, 0.5, 0.8]) {
      expect(thermalSlipIsofluxRidges(1, phi)).toBeGreaterThan(thermalSlipAdiabaticGrooves(1, phi));
    }
  });
  it('striped homogenisation with infinite local slip reduces to Philip (Belyaev & Vinogradova 2010 limit)', () => {
    expect(stripedThermalSlip(1, 0.7, 1e15)).toBeCloseTo(thermalSlipAdiabaticGrooves(1, 0.7), 12);
  });
  it('equal lubricant and solid conductivities give b_t = 0 exactly (identical wall; exact)', () => {
    const r = thermalSlipLubricantGrooves(20e-6, 10e-6, 5e-6, 0.6, 0.2, 0.2);
    expect(r.thermalSlipLength).toBe(0);
  });
  it('insulating lubricant in a perfectly conducting solid tends to the adiabatic-groove limit (Philip 1972)', () => {
    const r = thermalSlipLubricantGrooves(1, 0.5, 0.5, 1, 1e-9, 1e12);
    expect(r.thermalSlipLength).toBeCloseTo(thermalSlipAdiabaticGrooves(1, 0.5), 6);
  });
  it('lid-problem identity d/w = ½: local resistance = (k_w/k_o) w/4 (Σ_odd tanh(nπ/2)/n³ = π³/32, exact)', () => {
    const r = thermalSlipLubricantGrooves(2, 1, 0.5, 0.6, 0.15, 1e9);
    expect(r.grooveExcessResistance).toBeCloseTo((0.6 / 0.15) * 0.25 - 0.6 * 0.25 / 1e9, 12);
  });
  it('a conductive lubricant gives a negative thermal slip (enhancement), sign per physics of parallel resistances', () => {
    expect(thermalSlipLubricantGrooves(20e-6, 10e-6, 5e-6, 0.6, 1.0, 0.2).thermalSlipLength).toBeLessThan(0);
  });
});

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
  it('Shah & London (1978): plates 7.541, tube 3.657; one wall heated other insulated 4.861 (from memory)', () => {
    expect(nusseltUniformTemperature('plates-both', 0, 0).nusselt).toBeCloseTo(7.541, 3);
    expect(nusseltUniformTemperature('tube', 0, 0).nusselt).toBeCloseTo(3.657, 3);
    expect(nusseltUniformTemperature('one-wall', 0, 0).nusselt).toBeCloseTo(4.861, 3);
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

describe('turbulent correlations', () => {
  it('Petukhov f at Re = 1e4: (0.790 ln 1e4 − 1.64)^−2 = 0.031479 (computed from Petukhov 1970 formula)', () => {
    expect(petukhovFrictionFactor(1e4)).toBeCloseTo(0.031479, 5);
  });
  it('Gnielinski (1976) at Re = 1e4, Pr = 7 ≈ 79.5 and Dittus–Boelter (1930) ≈ 79.4 (computed from the published correlations)', () => {
    expect(gnielinskiNusselt(1e4, 7)).toBeCloseTo(79.5, 1);
    expect(dittusBoelterNusselt(1e4, 7)).toBeCloseTo(79.4, 1);
  });
  it('Kader (1981) β(0.71) ≈ 3.85 (air; value from memory)', () => {
    expect(kaderThermalConstant(0.71)).toBeCloseTo(3.85, 1);
  });
  it('a smooth wall gives ratio 1; a thermal resistance lowers Nu; drag reduction from ΔU+ ≈ 18 % at Re_m ≈ 1e4, ΔU+ from ℓ+ = 2 (physics.md §4 computed check)', () => {
    const base = { reynolds: 2e4, prandtl: 7, viscousLength: 5e-6, thermalSlipLength: 0 };
    expect(turbulentHeatTransfer(base).heatTransferRatio).toBe(1);
    expect(turbulentHeatTransfer({ ...base, thermalSlipLength: 2e-6 }).heatTransferRatio).toBeLessThan(1);
    const dr = turbulentHeatTransfer({ ...base, deltaUPlus: 2 }).dragReduction;
    expect(dr).toBeGreaterThan(0.1);
    expect(dr).toBeLessThan(0.25);
  });
});
