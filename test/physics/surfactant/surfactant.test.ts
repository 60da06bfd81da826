import { describe, expect, it } from 'vitest';
import { evaluateSurfactant, type SurfactantInput } from '../../../src/physics/surfactant/surfactant.js';
import { resolveSurfactant } from '../../../src/materials/surfactants.js';
import { DomainError } from '../../../src/core/errors.js';
import type { Scenario } from '../../../src/physics/scenario.js';

// Demo scenario (invented numbers): water over a gas-filled or oil-filled transverse grating, τ_w = 0.89 Pa.
const fluid = (name: string, density: number, viscosity: number, extra = {}) => ({
  id: name,
  name,
  temperature: 298.15,
  density,
  viscosity,
  origins: {},
  references: [],
  warnings: [],
  ...extra,
});
const scenario = (flowAngle = 90): Scenario => ({
  texture: { grooveWidth: 50e-6, pitch: 100e-6, grooveDepth: 20e-6, flowAngle },
  lubricant: fluid('air', 1.18, 1.8e-5),
  workingFluid: fluid('water', 997, 0.00089, { surfaceTension: 0.072 }),
  flow: { kind: 'wall-shear', wallShearStress: 0.89, frictionVelocity: 0.03, viscousLength: 3e-5, regime: 'laminar' },
});
const sds = resolveSurfactant({ id: 'sds', interfaceType: 'air-water' });
const cleanSlip = { slipLengthLongitudinal: 11e-6, slipLengthTransverse: 5.5e-6, localSlipLengthMean: 1e-3 };
const input = (over: Partial<SurfactantInput> = {}): SurfactantInput => ({
  scenario: scenario(),
  surfactant: sds,
  bulkConcentration: 0,
  temperature: 298.15,
  method: 'scaling',
  cleanSlip,
  underlying: 'gas',
  curve: { points: 9 },
  ...over,
});

describe('evaluateSurfactant', () => {
  it('clean limit: c = 0 reproduces the clean slip exactly, both methods', () => {
    for (const method of ['scaling', 'solver'] as const) {
      const o = evaluateSurfactant(input({ method, solver: { cells: 64 } }));
      expect(o.result.slipLength).toBe(cleanSlip.slipLengthTransverse);
      expect(o.result.slipRetained).toBe(1);
      expect(o.result.regime).toBe('clean');
    }
  });
  it('immobilised limit: near the CMC the slip falls to that of a no-slip interface (< 1 % retained)', () => {
    for (const method of ['scaling', 'solver'] as const) {
      const o = evaluateSurfactant(input({ method, bulkConcentration: 5, solver: { cells: 64 } }));
      expect(o.result.slipRetained).toBeLessThan(0.01);
      expect(o.result.regime).toBe('immobilised');
    }
  });
  it('fact of the trade (common practice, no source): traces far below the CMC cancel most of the slip — 10 µM SDS (CMC/800) loses > 90 %', () => {
    for (const method of ['scaling', 'solver'] as const) {
      const o = evaluateSurfactant(input({ method, bulkConcentration: 0.01, solver: { cells: 64 } }));
      expect(o.result.slipRetained).toBeLessThan(0.1);
      expect(o.result.points[0].equilibrium.bulkConcentration).toBeLessThan(8.1 / 100);
    }
  });
  it('concentrationForHalfSlip is a root: the slip retained there is 0.5, and it lies orders of magnitude below the CMC', () => {
    const o = evaluateSurfactant(input({ curve: { points: 15 } }));
    const half = o.result.concentrationForHalfSlip;
    expect(half).not.toBeNull();
    const at = evaluateSurfactant(input({ bulkConcentration: half as number })).result.slipRetained;
    expect(Math.abs(at - 0.5)).toBeLessThan(1e-6);
    expect(half as number).toBeLessThan(8.1e-3);
  });
  it('curve of slip retained decreases monotonically with concentration', () => {
    const o = evaluateSurfactant(input({ curve: { points: 15 } }));
    const r = o.result.curve.slipRetained;
    for (let i = 1; i < r.length; i++) expect(r[i]).toBeLessThanOrEqual(r[i - 1]);
  });
  it('a list of concentrations gives one point each; auto uses the solver where the scaling theory flags a stagnant cap', () => {
    const o = evaluateSurfactant(input({ method: 'auto', bulkConcentration: [0, 1e-3], solver: { cells: 64 }, curve: { points: 5 } }));
    expect(o.result.points.length).toBe(2);
    expect(o.result.points[0].method).toBe('scaling');
    expect(o.result.points[1].method).toBe('solver');
    expect(o.result.points[1].solver?.iterations).toBeGreaterThan(0);
    expect(o.result.points[1].regime).toBe('stagnant-cap');
  });
  it('warns above the CMC (SDS 8.1 mM at 25 °C, SurfPro data file)', () => {
    const o = evaluateSurfactant(input({ bulkConcentration: 10 }));
    expect(o.warnings.some((w) => w.code === 'above-critical-micelle-concentration')).toBe(true);
  });
  it('infinitely long streamwise grooves: longitudinal slip unaffected (no streamwise gradient), with a warning', () => {
    const o = evaluateSurfactant(input({ scenario: scenario(0), bulkConcentration: 1e-3 }));
    expect(o.result.slipLength).toBe(cleanSlip.slipLengthLongitudinal);
    expect(o.warnings.some((w) => w.code === 'infinite-grooves')).toBe(true);
  });
  it('finite streamwise grooves (long-wave model): slip reduced, less so for longer grooves', () => {
    const run = (grooveLength: number, method: 'scaling' | 'solver') =>
      evaluateSurfactant(input({ scenario: scenario(0), bulkConcentration: 1e-2, grooveLength, method, solver: { grooveCells: 100 }, curve: { points: 3 } })).result.slipRetained;
    for (const method of ['scaling', 'solver'] as const) {
      expect(run(1e-3, method)).toBeLessThan(1);
      expect(run(1e-2, method)).toBeGreaterThan(run(1e-3, method));
    }
  });
  it('a lubricant below the interface (our extension) makes the slip less sensitive than gas at the same concentration', () => {
    const lub = { slipLengthLongitudinal: 4e-6, slipLengthTransverse: 2e-6, localSlipLengthMean: 2e-6 };
    const gas = evaluateSurfactant(input({ bulkConcentration: 1e-3 })).result.slipRetained;
    const oil = evaluateSurfactant(input({ bulkConcentration: 1e-3, underlying: 'lubricant', cleanSlip: lub })).result.slipRetained;
    expect(oil).toBeGreaterThan(gas);
  });
  it('without the underlying flag, a lubricant < 5 % as viscous as water (air here) is treated as gas', () => {
    const a = evaluateSurfactant(input({ bulkConcentration: 1e-3, underlying: undefined }));
    const b = evaluateSurfactant(input({ bulkConcentration: 1e-3, underlying: 'gas' }));
    expect(a.result.slipRetained).toBe(b.result.slipRetained);
    expect(a.assumptions.some((t) => t.includes('treated as gas'))).toBe(true);
  });
  it('channel flow: clean limit exact through the channel relation of Landel et al. (2020)', () => {
    const sc = scenario();
    sc.flow = { ...sc.flow, kind: 'channel', height: 400e-6 };
    const o = evaluateSurfactant(input({ scenario: sc }));
    expect(o.result.slipLength).toBeCloseTo(cleanSlip.slipLengthTransverse, 18);
  });
  it('a solver that finds no steady state within its budget answers with the scaling theory and a warning naming the regime, not an error', () => {
    const o = evaluateSurfactant(input({ method: 'solver', bulkConcentration: 1e-3, solver: { cells: 64, maxIterations: 1 }, curve: { points: 3 } }));
    const p = o.result.points[0];
    expect(p.method).toBe('scaling');
    expect(p.solver).toBeUndefined();
    expect(p.slipRetained).toBe(evaluateSurfactant(input({ method: 'scaling', bulkConcentration: 1e-3, curve: { points: 3 } })).result.slipRetained);
    const w = o.warnings.find((x) => x.code === 'solver-fallback-scaling');
    expect(w?.message).toMatch(/regime/);
    expect(o.warnings.some((x) => x.code === 'curve-solver-fallback')).toBe(true);
  });
  it('impossible input is a DomainError', () => {
    expect(() => evaluateSurfactant(input({ bulkConcentration: -1 }))).toThrow(DomainError);
    const bad = scenario();
    bad.texture = { ...bad.texture, grooveWidth: 200e-6 };
    expect(() => evaluateSurfactant(input({ scenario: bad }))).toThrow(DomainError);
    expect(() => evaluateSurfactant(input({ temperature: 0 }))).toThrow(DomainError);
  });
  it('output is finite everywhere (no NaN or Infinity) and cites its sources', () => {
    const o = evaluateSurfactant(input({ method: 'solver', bulkConcentration: [0, 1e-3], solver: { cells: 64 }, curve: { points: 5 } }));
    const walk = (v: unknown): void => {
      if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
      else if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === 'object') Object.values(v).forEach(walk);
    };
    walk(o.result);
    expect(o.references.some((r) => r.key === 'landel2020')).toBe(true);
  });
});
