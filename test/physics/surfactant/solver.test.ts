import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { absoluteDerivativeStencil, solveLongWaveGroove, solveTransverseInterface } from '../../../src/physics/surfactant/solver.js';
import { marangoniScaling, philipTransverse } from '../../../src/physics/surfactant/scaling.js';
import { resolveSurfactant } from '../../../src/materials/surfactants.js';
import { ConvergenceError } from '../../../src/core/errors.js';
import { GAS_CONSTANT } from '../../../src/core/constants.js';

const ref = JSON.parse(readFileSync(new URL('../../../fixtures/surfactant/references.json', import.meta.url), 'utf8'));
const sds = resolveSurfactant({ id: 'sds', interfaceType: 'air-water' });
const T = 298.15;
const base = { pitch: 100e-6, grooveWidth: 50e-6, shearRate: 1000, viscosity: 1e-3, surfactant: sds, temperature: T };

describe('half-space operator', () => {
  it('|∂| stencil reproduces −2μ|k| on a single mode: |∂| cos(2πmx) = 2πm cos(2πmx) (exact for resolved modes)', () => {
    const N = 32;
    const c = absoluteDerivativeStencil(N);
    const m = 3;
    for (let i = 0; i < N; i++) {
      let acc = 0;
      for (let j = 0; j < N; j++) acc += c[Math.abs(i - j)] * Math.cos((2 * Math.PI * m * j) / N);
      expect(acc).toBeCloseTo(2 * Math.PI * m * Math.cos((2 * Math.PI * m * i) / N), 10);
    }
  });
});

describe('transverse interface solver, clean limit', () => {
  it('shear-free gap: slip converges to Philip (1972) b = (P/2π) ln sec(πφ/2), error ≈ 1/N (0.7 % at 256 cells)', () => {
    const errors = [64, 128, 256].map((cells) => {
      const r = solveTransverseInterface({ ...base, bulkConcentration: 0, cells });
      const exact = philipTransverse(base.pitch, r.gasFractionResolved, base.shearRate).slipLength;
      return r.cleanSlipLength / exact - 1;
    });
    expect(errors[2]).toBeGreaterThan(0);
    expect(errors[2]).toBeLessThan(0.008);
    expect(errors[0] / errors[1]).toBeGreaterThan(1.8);
    expect(errors[1] / errors[2]).toBeGreaterThan(1.8);
  });
  it('gap-centre velocity matches Philip’s profile (γ̇P/2π) arccosh(1/cos(πφ/2)) within 1 % (fixture)', () => {
    const r = solveTransverseInterface({ ...base, bulkConcentration: 0, cells: 256 });
    const exact = ref.philip.cases.find((c: { phi: number }) => c.phi === 0.5).centreVelocity;
    expect(Math.abs(Math.max(...r.profile.cleanVelocity) / exact - 1)).toBeLessThan(0.01);
  });
  it('weak lubricant slip b_local ≪ P: effective slip → φ b_local (area average; common practice, no source)', () => {
    const r = solveTransverseInterface({ ...base, localSlipLength: 1e-9, bulkConcentration: 0, cells: 128 });
    expect(Math.abs(r.cleanSlipLength / (0.5 * 1e-9) - 1)).toBeLessThan(0.005);
  });
  it('c = 0 retains the clean slip exactly', () => {
    const r = solveTransverseInterface({ ...base, bulkConcentration: 0, cells: 64 });
    expect(r.slipRetained).toBe(1);
    expect(r.iterations).toBe(0);
  });
});

describe('transverse interface solver with surfactant', () => {
  it('immobilised limit: at 1 mM SDS the interface tends to no slip (retained < 0.2 %)', () => {
    const r = solveTransverseInterface({ ...base, bulkConcentration: 1, cells: 64 });
    expect(r.slipRetained).toBeGreaterThan(0);
    expect(r.slipRetained).toBeLessThan(0.002);
    expect(r.residual).toBeLessThanOrEqual(100 * r.tolerance);
  });
  it('agrees with the scaling theory where surface diffusion dominates (P = 10 µm, γ̇ = 100 1/s): retained within 15 %', () => {
    const input = { ...base, pitch: 10e-6, grooveWidth: 5e-6, shearRate: 100 };
    const uc = philipTransverse(10e-6, 0.5, 100).centreVelocity;
    for (const c of [1e-4, 1e-3]) {
      const r = solveTransverseInterface({ ...input, bulkConcentration: c, cells: 128 });
      const s = marangoniScaling({ gapLength: 5e-6, centreVelocity: uc, shearRate: 100, viscosity: 1e-3, surfactant: sds, bulkConcentration: c, temperature: T });
      expect(s.flags.stagnantCapLikely).toBe(false);
      expect(Math.abs(r.slipRetained / (1 - s.marangoniReduction) - 1)).toBeLessThan(0.15);
    }
  });
  it('lubricant below (our extension): solver with local drag vs scaling with the slowed gap-centre velocity, within 15 %', () => {
    const input = { ...base, pitch: 10e-6, grooveWidth: 5e-6, shearRate: 100, localSlipLength: 1e-6 };
    const clean = solveTransverseInterface({ ...input, bulkConcentration: 0, cells: 128 });
    const ph = philipTransverse(10e-6, 0.5, 100);
    const uc = (ph.centreVelocity * clean.cleanSlipLength) / ph.slipLength;
    const r = solveTransverseInterface({ ...input, bulkConcentration: 1e-3, cells: 128 });
    const s = marangoniScaling({ gapLength: 5e-6, centreVelocity: uc, shearRate: 100, viscosity: 1e-3, surfactant: sds, bulkConcentration: 1e-3, temperature: T });
    expect(Math.abs(r.slipRetained / (1 - s.marangoniReduction) - 1)).toBeLessThan(0.15);
    // and the lubricant makes the surface less sensitive than gas at the same concentration
    const gas = solveTransverseInterface({ ...input, localSlipLength: undefined, bulkConcentration: 1e-3, cells: 128 });
    expect(r.slipRetained).toBeGreaterThan(gas.slipRetained);
  });
  it('grid convergence: retained slip changes by < 0.5 % from 64 to 128 cells (1 µM SDS, stagnant cap)', () => {
    const a = solveTransverseInterface({ ...base, bulkConcentration: 1e-3, cells: 64 });
    const b = solveTransverseInterface({ ...base, bulkConcentration: 1e-3, cells: 128 });
    expect(Math.abs(a.slipRetained / b.slipRetained - 1)).toBeLessThan(0.005);
  });
  it('stagnant cap: the nonlinear (Newton) solve finds a downstream cap and far more slip than the linearised problem', () => {
    const r = solveTransverseInterface({ ...base, bulkConcentration: 1e-3, cells: 128 });
    expect(r.stagnantCap).toBe(true);
    expect(r.slipRetained).toBeGreaterThan(1.5 * r.linearSlipRetained);
    // surfactant piles up downstream: Γ rises along the gap and σ falls
    expect(r.profile.surfaceExcess[r.gapCells - 1]).toBeGreaterThan(r.profile.surfaceExcess[0]);
    expect(r.surfaceTensionDrop).toBeGreaterThan(0);
  });
  it('dilute small-Marangoni limit: linear and nonlinear solutions coincide (0.01 µM SDS, P = 10 µm)', () => {
    const r = solveTransverseInterface({ ...base, pitch: 10e-6, grooveWidth: 5e-6, shearRate: 100, bulkConcentration: 1e-5, cells: 64 });
    expect(Math.abs(r.slipRetained - r.linearSlipRetained)).toBeLessThan(1e-3);
  });
  it('non-convergence raises ConvergenceError with the iteration count', () => {
    let caught: unknown;
    try {
      solveTransverseInterface({ ...base, bulkConcentration: 1e-3, cells: 64, maxIterations: 1 });
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ConvergenceError);
    expect((caught as ConvergenceError).iterations).toBeGreaterThan(0);
  });
});

describe('long-wave model along finite streamwise grooves', () => {
  for (const c of ref.longwave.cases) {
    it(`agrees with scipy solve_bvp (fixture) for L_g = ${c.grooveLength} m, c = ${c.bulkConcentration} mol/m³: first order in the cells, Richardson 100/200 within 2e-4`, () => {
      const coarse = solveLongWaveGroove({ ...c, surfactant: sds, temperature: T, cells: 100, extrapolate: false });
      const fine = solveLongWaveGroove({ ...c, surfactant: sds, temperature: T, cells: 200, extrapolate: false });
      const auto = solveLongWaveGroove({ ...c, surfactant: sds, temperature: T, cells: 200 });
      // the same Richardson combination, to the solver tolerance (the coarse grid now starts from the fine solution)
      expect(Math.abs(auto.slipRetained - Math.min(1, 2 * fine.slipRetained - coarse.slipRetained))).toBeLessThan(1e-12);
      expect(Math.abs(fine.slipRetained - c.slipRetained)).toBeLessThan(1.5e-3);
      expect(Math.abs(2 * fine.slipRetained - coarse.slipRetained - c.slipRetained)).toBeLessThan(2e-4);
      expect(Math.abs(fine.surfaceTensionDrop / c.surfaceTensionDrop - 1)).toBeLessThan(0.01);
    });
  }
  it('force balance: retained = 1 − Δσ/(τ_w L_g) (integral of U = U_c(1 − τ_M/τ_w); exact in the continuum)', () => {
    const r = solveLongWaveGroove({ grooveLength: 1e-3, cleanInterfaceVelocity: 0.02, shearRate: 1000, viscosity: 1e-3, surfactant: sds, bulkConcentration: 1e-2, temperature: T, cells: 200, extrapolate: false });
    expect(Math.abs(r.slipRetained - (1 - r.surfaceTensionDrop / (1 * 1e-3)))).toBeLessThan(2e-3);
  });
  it('longer grooves keep more slip; c = 0 keeps all of it', () => {
    const run = (Lg: number, c: number) =>
      solveLongWaveGroove({ grooveLength: Lg, cleanInterfaceVelocity: 0.02, shearRate: 1000, viscosity: 1e-3, surfactant: sds, bulkConcentration: c, temperature: T, cells: 100 }).slipRetained;
    expect(run(1e-3, 0)).toBe(1);
    expect(run(1e-2, 1e-2)).toBeGreaterThan(run(1e-3, 1e-2));
  });
  it('tension scale n R T Γ_m of SDS at 298.15 K is 19.3 mN/m (n = 2, Γ_m = 3.9e-6; arithmetic of the Szyszkowski prefactor)', () => {
    expect(2 * GAS_CONSTANT * T * 3.9e-6).toBeCloseTo(0.019336, 5);
  });
});
