import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import {
  blasiusSkinFriction,
  colebrookFrictionFactor,
  deanSkinFriction,
  evaluateFlow,
  haalandFrictionFactor,
  turbulentPlateSkinFriction,
} from '../../../src/physics/flow/flow.js';

// Water at 20 °C: ρ = 998.21 kg/m³ (IAPWS-95), μ = 1.0016 mPa·s (IAPWS 2008).
const water20 = { density: 998.21, viscosity: 1.0016e-3 };

describe('plane channel', () => {
  it('Dean (1978) reproduces Re_tau ≈ 180 at Re_m ≈ 5600 (Kim, Moin & Moser 1987, J. Fluid Mech. 177, 133) within 3 %', () => {
    const nu = water20.viscosity / water20.density;
    const H = 0.01;
    const U = (5600 * nu) / H;
    const r = evaluateFlow(water20, { kind: 'channel', height: H, bulkVelocity: U }).result;
    expect(r.regime).toBe('turbulent');
    expect(Math.abs(r.frictionReynoldsNumber! / 180 - 1)).toBeLessThan(0.03);
  });
  it('water at 20 °C, 1 m/s, 10 mm: bulk Reynolds number about 10 000 (common practice, no source)', () => {
    const r = evaluateFlow(water20, { kind: 'channel', height: 0.01, bulkVelocity: 1 }).result;
    expect(r.reynoldsNumber!).toBeGreaterThan(9500);
    expect(r.reynoldsNumber!).toBeLessThan(10500);
    // computed from Dean's formula C_f = 0.073 Re^-1/4 at Re = 9966: 0.007306, τ_w = 3.65 Pa, u_τ = 0.0604 m/s
    expect(r.skinFrictionCoefficient!).toBeCloseTo(0.073 * r.reynoldsNumber! ** -0.25, 12);
    expect(r.wallShearStress).toBeCloseTo(3.645, 2);
    expect(r.frictionVelocity).toBeCloseTo(0.0604, 3);
    expect(r.viscousLength * 1e6).toBeCloseTo(16.6, 0);
  });
  it('laminar plane Poiseuille: τ_w = 6 μ U / H exactly (exact solution)', () => {
    const r = evaluateFlow(water20, { kind: 'channel', height: 100e-6, bulkVelocity: 0.1 }).result;
    expect(r.regime).toBe('laminar');
    expect(r.wallShearStress).toBeCloseTo((6 * water20.viscosity * 0.1) / 100e-6, 10);
  });
  it('flags the transitional range', () => {
    const nu = water20.viscosity / water20.density;
    const out = evaluateFlow(water20, { kind: 'channel', height: 0.01, bulkVelocity: (3000 * nu) / 0.01 });
    expect(out.result.regime).toBe('transitional');
    expect(out.warnings.map((w) => w.code)).toContain('transitional-flow');
  });
  it('Dean at Re = 10⁴ is 0.073/10 (exact arithmetic of the correlation)', () => {
    expect(deanSkinFriction(1e4)).toBeCloseTo(0.0073, 15);
  });
});

describe('pipe', () => {
  const fixture = JSON.parse(readFileSync(new URL('../../../fixtures/flow/colebrook.json', import.meta.url), 'utf8')) as {
    cases: { reynolds: number; relativeRoughness: number; frictionFactor: number }[];
  };
  it('Colebrook matches the scipy brentq reference (fixtures/flow/generate_colebrook.py) to 1e-12', () => {
    for (const c of fixture.cases) {
      const f = colebrookFrictionFactor(c.reynolds, c.relativeRoughness).frictionFactor;
      expect(Math.abs(f / c.frictionFactor - 1)).toBeLessThan(1e-12);
    }
  });
  it('Haaland (1983) stays within its stated ±1.5 % of Colebrook over 4e3–1e8', () => {
    for (const c of fixture.cases) {
      if (c.relativeRoughness > 0.01) continue;
      const f = haalandFrictionFactor(c.reynolds, c.relativeRoughness);
      expect(Math.abs(f / c.frictionFactor - 1)).toBeLessThan(0.02);
    }
  });
  it('Moody chart readings: f(1e5, ε/D = 1e-3) ≈ 0.0222, smooth f(1e4) ≈ 0.0309 (Moody 1944 chart, common practice)', () => {
    expect(colebrookFrictionFactor(1e5, 1e-3).frictionFactor).toBeCloseTo(0.0222, 3);
    expect(colebrookFrictionFactor(1e4, 0).frictionFactor).toBeCloseTo(0.0309, 3);
  });
  it('laminar Hagen–Poiseuille f = 64/Re exactly, τ_w = 8 μ U / D (exact solution)', () => {
    const D = 1e-3;
    const U = 0.5;
    const r = evaluateFlow(water20, { kind: 'pipe', diameter: D, bulkVelocity: U }).result;
    expect(r.regime).toBe('laminar');
    expect(r.wallShearStress).toBeCloseTo((8 * water20.viscosity * U) / D, 10);
  });
});

describe('flat plate', () => {
  it('Blasius laminar c_f = 0.664/√Re_x exactly (Blasius 1908)', () => {
    expect(blasiusSkinFriction(1e4)).toBe(0.00664);
    const r = evaluateFlow(water20, { kind: 'plate', freeStreamVelocity: 0.1, distance: 0.1 }).result;
    expect(r.regime).toBe('laminar');
    expect(r.skinFrictionCoefficient!).toBeCloseTo(0.664 / Math.sqrt(r.reynoldsNumber!), 14);
  });
  it('turbulent c_f at Re_x = 1e6: 0.0592·10^-1.2 = 0.003735 (Prandtl power law, Schlichting & Gersten 2017)', () => {
    expect(turbulentPlateSkinFriction(1e6).value).toBeCloseTo(0.0037353, 6);
  });
  it("Schlichting's formula beyond 1e7: (2·8 − 0.65)^-2.3 at Re_x = 1e8 = 0.001870 (hand arithmetic of the formula)", () => {
    const t = turbulentPlateSkinFriction(1e8);
    expect(t.correlation).toBe('schlichting');
    expect(t.value).toBeCloseTo(15.35 ** -2.3, 12);
    expect(t.value).toBeCloseTo(0.00187, 5);
  });
});

describe('wall units', () => {
  it('expresses the texture in viscous lengths ℓ_ν = ν/u_τ (definition)', () => {
    const out = evaluateFlow(water20, { kind: 'wall-shear', wallShearStress: 1 }, { grooveWidth: 50e-6, pitch: 100e-6, grooveDepth: 20e-6, flowAngle: 0 });
    const ut = Math.sqrt(1 / water20.density);
    const lv = water20.viscosity / water20.density / ut;
    expect(out.result.wallUnits!.grooveWidthPlus).toBeCloseTo(50e-6 / lv, 10);
  });
});
