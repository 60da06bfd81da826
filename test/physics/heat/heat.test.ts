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
  evaluateHeat,
  petukhovFrictionFactor,
  rectangularDuctLaminar,
  solveHeatCrossSection,
  stripedThermalSlip,
  thermalSlipField,
  thermalSlipAdiabaticGrooves,
  thermalSlipIsofluxRidges,
  thermalSlipLubricantGrooves,
  turbulentHeatTransfer,
  type HeatInput,
  type WallCell,
} from '../../../src/physics/heat/heat.js';
import { DomainError } from '../../../src/core/errors.js';
import type { FluidState } from '../../../src/core/fluid.js';
import type { FlowState } from '../../../src/physics/scenario.js';

interface LaminarFixture {
  uniformFlux: { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[];
  uniformTemperature: { x: number; y: number; platesBoth: number; oneWall: number; tube: number }[];
  plugUniformTemperature: { plates: number; tube: number };
}
const laminar = JSON.parse(
  readFileSync(new URL('../../../fixtures/heat/laminar.json', import.meta.url), 'utf8'),
) as LaminarFixture;

const ducts = JSON.parse(readFileSync(new URL('../../../fixtures/heat/ducts.json', import.meta.url), 'utf8')) as {
  ducts: { aspectRatio: number; frictionFactorReynolds: number }[];
};

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
    expect(dr).toBeGreaterThan(0.16);
    expect(dr).toBeLessThan(0.2);
  });
});

// Demo materials (invented numbers, demo scenario only; none is a check value).
function fluid(props: Partial<FluidState>): FluidState {
  return { id: 'custom', name: 'demo', temperature: 293.15, origins: {}, references: [], warnings: [], density: 1000, viscosity: 1e-3, ...props };
}
const water = fluid({ density: 998, viscosity: 1.0e-3, thermalConductivity: 0.6, specificHeat: 4180 });
const conductiveLubricant = fluid({ density: 1100, viscosity: 10e-3, thermalConductivity: 0.4, specificHeat: 1600 });
function laminarChannel(height: number, bulkVelocity: number): FlowState {
  const tau = (6 * 1e-3 * bulkVelocity) / height;
  const ut = Math.sqrt(tau / 998);
  return {
    kind: 'channel',
    wallShearStress: tau,
    frictionVelocity: ut,
    viscousLength: 1e-3 / 998 / ut,
    bulkVelocity,
    reynoldsNumber: (bulkVelocity * height * 998) / 1e-3,
    regime: 'laminar',
    height,
    texturedWalls: 2,
  };
}
function demoInput(overrides: Partial<HeatInput> = {}): HeatInput {
  return {
    scenario: {
      texture: { grooveWidth: 10e-6, pitch: 20e-6, grooveDepth: 10e-6, flowAngle: 0 },
      lubricant: conductiveLubricant,
      workingFluid: water,
      flow: laminarChannel(200e-6, 0.05),
    },
    solid: { thermalConductivity: 0.2, substrateThickness: 20e-6 },
    heating: 'uniform-flux',
    heatedWalls: 'both',
    lubricantMotion: 'co-flowing',
    method: 'closed-form',
    slip: { slipLengthLongitudinal: 1e-6 },
    ...overrides,
  };
}
const smoothWall: WallCell = {
  pitch: 20e-6,
  grooveWidth: 0,
  grooveDepth: 5e-6,
  substrateThickness: 10e-6,
  workingConductivity: 0.6,
  lubricantConductivity: 0.2,
  solidConductivity: 0.2,
};
const sectionBase = {
  height: 200e-6,
  workingViscosity: 1e-3,
  lubricantViscosity: 1e-2,
  workingHeatCapacity: 4.17e6,
  lubricantHeatCapacity: 1.76e6,
  lubricantMotion: 'co-flowing' as const,
};

describe('field method: cross-section and conduction cell', () => {
  it('smooth wall, both walls heated: Nu = 8.235 (Shah & London 1978) within 0.1 %, f·Re = 24 (exact)', () => {
    const r = solveHeatCrossSection({ ...sectionBase, wall: smoothWall, heatedWalls: 'both' });
    expect(Math.abs(r.nusselt! / (140 / 17) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(r.frictionFactorReynolds / 24 - 1)).toBeLessThan(1e-3);
  });
  it('smooth wall, one wall heated, other insulated: Nu = 5.385 (Shah & London 1978) within 0.1 %', () => {
    const r = solveHeatCrossSection({ ...sectionBase, wall: smoothWall, heatedWalls: 'one' });
    expect(Math.abs(r.nusselt! / (70 / 13) - 1)).toBeLessThan(1e-3);
  });
  it('the overall conductance of the smooth case adds the wall resistance in series (1-D conduction, exact)', () => {
    const r = solveHeatCrossSection({ ...sectionBase, wall: smoothWall, heatedWalls: 'both' });
    const Dh = 400e-6;
    // the smooth cell has no groove layer: wall resistance s/k_s with s = 10 µm
    const expected = 1 / (1 / (140 / 17) + (0.6 * 10e-6) / (0.2 * Dh));
    expect(Math.abs(r.overallNusselt / expected - 1)).toBeLessThan(1e-3);
  });
  it('equal lubricant and solid conductivities give b_t = 0 (identical wall; FV exact for layered media)', () => {
    const r = thermalSlipField({ ...smoothWall, grooveWidth: 10e-6, lubricantConductivity: 0.2 });
    expect(Math.abs(r.thermalSlipLength)).toBeLessThan(1e-9 * smoothWall.pitch);
  });
  it('insulating grooves in a near-perfect conductor: first-order convergence to Philip’s adiabatic-groove b_t, extrapolated within 1 % (Philip 1972)', () => {
    const wall = { ...smoothWall, grooveWidth: 10e-6, lubricantConductivity: 1e-7, solidConductivity: 1e5 };
    const philip = thermalSlipAdiabaticGrooves(20e-6, 0.5);
    const coarse = thermalSlipField(wall, 48).thermalSlipLength;
    const fine = thermalSlipField(wall, 96).thermalSlipLength;
    expect(Math.abs(fine / philip - 1)).toBeLessThan(Math.abs(coarse / philip - 1)); // converging
    expect(Math.abs((2 * fine - coarse) / philip - 1)).toBeLessThan(0.01);
  });
  it('closed-form laminate estimate is within 5 % of the field for a conductive lubricant, d/w = ½ (team comparison, k_o/k_s = 2 and 5)', () => {
    for (const k of [0.4, 1.0]) {
      const field = thermalSlipField({ ...smoothWall, grooveWidth: 10e-6, grooveDepth: 5e-6, lubricantConductivity: k }).thermalSlipLength;
      const closed = thermalSlipLubricantGrooves(20e-6, 10e-6, 5e-6, 0.6, k, 0.2).thermalSlipLength;
      expect(field).toBeLessThan(0);
      expect(Math.abs(closed / field - 1)).toBeLessThan(0.05);
    }
  });
  it('superposition 1/Nu = 1/Nu_slip + b_t/D_h: field Nu against the closed form fed with the field’s own b and b_t (P/H = 0.05), 1 %', () => {
    const wall = { ...smoothWall, pitch: 10e-6, grooveWidth: 5e-6, grooveDepth: 5e-6, lubricantConductivity: 0.6 };
    const section = solveHeatCrossSection({ ...sectionBase, wall, lubricantViscosity: 2e-3, heatedWalls: 'both' });
    const bt = thermalSlipField(wall).thermalSlipLength;
    const closed = nusseltUniformFluxPlates(section.slipLength / 200e-6, bt / 200e-6)!;
    expect(section.slipLength).toBeGreaterThan(0);
    expect(Math.abs(closed / section.nusselt! - 1)).toBeLessThan(0.01);
  });
  it('zero-net-flux lubricant slips less than co-flowing lubricant (back-pressure opposes the lid drag; physics)', () => {
    const wall = { ...smoothWall, grooveWidth: 10e-6 };
    const co = solveHeatCrossSection({ ...sectionBase, wall, heatedWalls: 'both' });
    const zero = solveHeatCrossSection({ ...sectionBase, wall, heatedWalls: 'both', lubricantMotion: 'zero-net-flux' });
    expect(zero.slipLength).toBeLessThan(co.slipLength);
    expect(zero.slipLength).toBeGreaterThan(0);
  });
});

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

describe('evaluateHeat', () => {
  it('missing conductivity or heat capacity → DomainError naming the field', () => {
    const input = demoInput();
    const noK = { ...input, scenario: { ...input.scenario, lubricant: { ...conductiveLubricant, thermalConductivity: undefined } } };
    expect(() => evaluateHeat(noK)).toThrow(DomainError);
    try {
      evaluateHeat(noK);
    } catch (e) {
      expect((e as DomainError).field).toBe('scenario.lubricant.thermalConductivity');
    }
    const noC = { ...input, scenario: { ...input.scenario, workingFluid: { ...water, specificHeat: undefined } } };
    expect(() => evaluateHeat(noC)).toThrow(/specificHeat/);
  });
  it('groove wider than the pitch and a plate flow are rejected with DomainError', () => {
    const input = demoInput();
    expect(() => evaluateHeat({ ...input, scenario: { ...input.scenario, texture: { ...input.scenario.texture, grooveWidth: 30e-6 } } })).toThrow(DomainError);
    expect(() => evaluateHeat({ ...input, scenario: { ...input.scenario, flow: { ...input.scenario.flow, kind: 'plate' } } })).toThrow(DomainError);
  });
  it('a smooth-equivalent wall (equal conductivities, no slip) gives ratio 1 exactly (identity)', () => {
    const input = demoInput({ slip: { slipLengthLongitudinal: 0 } });
    const r = evaluateHeat({ ...input, solid: { thermalConductivity: 0.4, substrateThickness: 20e-6 } }).result;
    expect(r.thermalSlipLength).toBe(0);
    expect(r.heatTransferRatio).toBe(1);
    expect(r.nusseltSmooth).toBeCloseTo(140 / 17, 12);
  });
  it('conductive lubricant in a low-conductivity solid raises heat transfer by about 20 % (common practice, no source)', () => {
    for (const method of ['closed-form', 'field'] as const) {
      const r = evaluateHeat(demoInput({ method })).result;
      expect(r.heatTransferRatio!).toBeGreaterThan(1.1);
      expect(r.heatTransferRatio!).toBeLessThan(1.35);
      expect(r.method).toBe(method);
    }
  });
  it('field run reports the closed form’s error against it; closed-form run does not', () => {
    const field = evaluateHeat(demoInput({ method: 'auto' })).result;
    expect(field.method).toBe('field');
    expect(field.closedFormError).not.toBeNull();
    expect(Math.abs(field.closedFormError!)).toBeLessThan(0.05);
    expect(evaluateHeat(demoInput()).result.closedFormError).toBeNull();
  });
  it('uniform wall temperature uses the eigenproblem: no slip, no thermal slip → 7.541 (Shah & London 1978)', () => {
    const input = demoInput({ heating: 'uniform-temperature', slip: { slipLengthLongitudinal: 0 } });
    const r = evaluateHeat({ ...input, solid: { thermalConductivity: 0.4, substrateThickness: 0 } }).result;
    expect(r.nusselt!).toBeCloseTo(7.541, 3);
  });
  it('pipe: tube closed form with ratios on R; zero slip → 4.364 (Shah & London 1978), plug-like slip raises Nu toward 8', () => {
    const input = demoInput({ slip: { slipLengthLongitudinal: 0 } });
    const pipe: FlowState = { ...input.scenario.flow, kind: 'pipe', height: undefined, diameter: 400e-6 };
    const equal = { thermalConductivity: 0.4, substrateThickness: 0 };
    const r0 = evaluateHeat({ ...input, solid: equal, scenario: { ...input.scenario, flow: pipe } }).result;
    expect(r0.nusselt!).toBeCloseTo(48 / 11, 10);
    const r1 = evaluateHeat({ ...input, solid: equal, slip: { slipLengthLongitudinal: 50e-6 }, scenario: { ...input.scenario, flow: pipe } }).result;
    expect(r1.nusselt!).toBeCloseTo(nusseltUniformFluxTube(0.25, 0)!, 12);
    expect(r1.frictionRatio).toBeCloseTo(200 / 400, 12); // R/(R + 4b), physics.md §4 laminar pipe formula
  });
  it('turbulent flow: labelled low confidence, smooth Nu from Gnielinski on D_h = 2H', () => {
    const input = demoInput();
    const flow: FlowState = { ...input.scenario.flow, regime: 'turbulent', reynoldsNumber: 5000, viscousLength: 2e-6 };
    const out = evaluateHeat({ ...input, scenario: { ...input.scenario, flow }, slip: { slipLengthLongitudinal: 1e-6, deltaUPlus: 0.5 } });
    expect(out.result.confidence).toBe('low');
    expect(out.warnings.some((w) => w.code === 'turbulent-estimate')).toBe(true);
    expect(out.result.nusseltSmooth).toBeCloseTo(gnielinskiNusselt(1e4, (1e-3 * 4180) / 0.6), 12);
  });
  it('flags a pitch that is not small against the channel and a high groove Péclet number', () => {
    const input = demoInput();
    const coarse = { ...input.scenario, texture: { ...input.scenario.texture, pitch: 40e-6, grooveWidth: 20e-6 }, flow: laminarChannel(200e-6, 5) };
    const out = evaluateHeat({ ...input, scenario: coarse, slip: { slipLengthLongitudinal: 5e-6 } });
    expect(out.warnings.some((w) => w.code === 'pitch-not-small')).toBe(true);
    expect(out.warnings.some((w) => w.code === 'lubricant-advection')).toBe(true);
  });
  it('sensitivity sweep: monotone in lubricant conductivity, best at the upper end, finite everywhere', () => {
    const r = evaluateHeat(demoInput({ sensitivity: { points: 7 } })).result;
    const s = r.sensitivity!;
    expect(s.lubricantConductivity.length).toBe(7);
    for (let i = 1; i < 7; i++) expect(s.overallConductanceRatio[i]!).toBeGreaterThan(s.overallConductanceRatio[i - 1]!);
    expect(s.bestLubricantConductivity).toBe(s.lubricantConductivity[6]);
    for (const v of s.overallConductanceRatio) expect(Number.isFinite(v)).toBe(true);
  });
  it('sweep: field thermal slip up to 25 points, closed form (with a notice) beyond', () => {
    const short = evaluateHeat(demoInput({ method: 'auto', sensitivity: { points: 3 } }));
    expect(short.result.sensitivity!.thermalSlipMethod).toBe('field');
    expect(short.result.sensitivity!.lubricantConductivity[0]).toBeCloseTo(0.1 * 0.2, 12); // 0.1·min(k_w, k_o, k_s)
    const long = evaluateHeat(demoInput({ method: 'auto', sensitivity: { points: 30 } }));
    expect(long.result.sensitivity!.thermalSlipMethod).toBe('closed-form');
    expect(long.warnings.some((w) => w.code === 'sensitivity-closed-form')).toBe(true);
    expect(() => evaluateHeat(demoInput({ sensitivity: { points: 1 } }))).toThrow(DomainError);
  });
  it('one heated wall, field method: a very viscous lubricant of the solid’s conductivity behaves as a smooth wall, Nu = 5.385 (Shah & London 1978) within 0.3 %', () => {
    const input = demoInput({ method: 'field', heatedWalls: 'one', slip: { slipLengthLongitudinal: 0 } });
    const stiff = { ...conductiveLubricant, viscosity: 1e3, thermalConductivity: 0.2 };
    const r = evaluateHeat({ ...input, scenario: { ...input.scenario, lubricant: stiff } }).result;
    expect(r.method).toBe('field');
    // identical wall: b_t = 0 up to the linear solver's stopping tolerance (1e-12 relative residual leaves ~1e-9·P of noise)
    expect(Math.abs(r.thermalSlipLength)).toBeLessThan(1e-8 * 20e-6);
    expect(Math.abs(r.nusselt! / (70 / 13) - 1)).toBeLessThan(3e-3);
    expect(Math.abs(r.frictionRatio - 1)).toBeLessThan(1e-3);
  });
  it('uniform wall temperature with slip and thermal slip uses the shooting eigenvalue with b/H and b_t/H (wiring; eigenvalues checked against scipy above)', () => {
    const r = evaluateHeat(demoInput({ heating: 'uniform-temperature' })).result;
    const expected = nusseltUniformTemperature('plates-both', 1e-6 / 200e-6, r.thermalSlipLength / 200e-6).nusselt;
    expect(r.nusselt!).toBeCloseTo(expected, 12);
    expect(r.nusseltSmooth).toBeCloseTo(7.541, 3); // Shah & London (1978)
  });
  it('transitional flow is flagged and labelled low confidence', () => {
    const input = demoInput();
    const flow: FlowState = { ...input.scenario.flow, regime: 'transitional', reynoldsNumber: 3000, viscousLength: 3e-6 };
    const out = evaluateHeat({ ...input, scenario: { ...input.scenario, flow } });
    expect(out.warnings.some((w) => w.code === 'transitional-flow')).toBe(true);
    expect(out.result.confidence).toBe('low');
  });
});
