import { describe, expect, it } from 'vitest';
import { thermalSlipField } from '../../../src/physics/heat/conduction-field.js';
import { longitudinalGrooveSlip } from '../../../src/physics/groove/groove-cell-longitudinal.js';
import { thermalGrooveSlip } from '../../../src/physics/heat/thermal-core.js';
import { expectDomainError } from '../expect-domain-error.js';
import { thermalReferences } from '../../../fixtures/slip-core/references.js';

/** Philip (1972) ZAMP 23, 353, conduction analogue (adiabatic grooves over isothermal ridges): b_t = (P/π) ln sec(πφ/2). */
const philip = (pitch: number, fraction: number): number => (pitch / Math.PI) * Math.log(1 / Math.cos((Math.PI * fraction) / 2));
const relative = (a: number, b: number): number => Math.abs(a / b - 1);

const wall = (fraction: number, aspect: number, substrate: number, ko: number, ks: number, kw = 1) => ({
  pitch: 1,
  grooveWidth: fraction,
  grooveDepth: aspect * fraction,
  substrateThickness: substrate,
  workingConductivity: kw,
  lubricantConductivity: ko,
  solidConductivity: ks,
});

describe('thermal slip core: exact limits', () => {
  it('equal lubricant and solid conductivity gives b_t = 0 exactly (a uniform layer is the reference wall)', () => {
    for (const s of [0, 0.7]) expect(thermalGrooveSlip(wall(0.4, 1, s, 3, 3)).thermalSlipLength).toBe(0);
  });
  it('nearly equal conductivities give a small b_t of the sign of k_s − k_o, growing with the contrast (continuity through zero)', () => {
    const above = thermalGrooveSlip(wall(0.5, 0.5, 0.5, 0.99, 1)).thermalSlipLength;
    const below = thermalGrooveSlip(wall(0.5, 0.5, 0.5, 1.01, 1)).thermalSlipLength;
    expect(above).toBeGreaterThan(0);
    expect(below).toBeLessThan(0);
    expect(Math.abs(above)).toBeLessThan(1e-2);
    expect(Math.abs(thermalGrooveSlip(wall(0.5, 0.5, 0.5, 0.9, 1)).thermalSlipLength)).toBeGreaterThan(5 * Math.abs(above));
  });
  it.each([0.1, 0.5, 0.9])('adiabatic grooves over isothermal ridges (k_o → 0, k_s → ∞) give Philip’s conduction analogue within 0.2 percent at w/P = %f', (phi) => {
    for (const s of [0, 0.5]) {
      const r = thermalGrooveSlip(wall(phi, 0.5, s, 1e-6, 1e6));
      expect(relative(r.thermalSlipLength, philip(1, phi))).toBeLessThan(2e-3);
    }
  });
  it('a perfectly conducting solid (k_s → ∞) gives the longitudinal slip length with N = k_o/k_w (the same Laplace problem)', () => {
    for (const [phi, aspect, n] of [
      [0.5, 0.5, 1],
      [0.3, 2, 0.1],
      [0.8, 0.1, 10],
    ]) {
      const thermal = thermalGrooveSlip(wall(phi, aspect, 0, n, 1e7)).thermalSlipLength;
      const slip = longitudinalGrooveSlip({ pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: n }).slipLength;
      expect(relative(thermal, slip)).toBeLessThan(1e-3);
    }
  });
  it('a thin uniform lubricant layer (w/P → 1) tends to the series resistance k_w d (1/k_o − 1/k_s) (exact 1-D limit)', () => {
    const r = thermalGrooveSlip(wall(0.98, 0.1, 0.5, 0.5, 2));
    const series = 0.98 * 0.1 * (1 / 0.5 - 1 / 2);
    expect(r.thermalSlipLength).toBeGreaterThan(0.9 * series);
    expect(r.thermalSlipLength).toBeLessThan(1.1 * series);
  });
  it('scales with P and depends on conductivity ratios only (dimensional analysis)', () => {
    const base = thermalGrooveSlip(wall(0.6, 0.7, 0.3, 0.2, 15)).thermalSlipLength;
    const scaled = thermalGrooveSlip({
      pitch: 4e-5,
      grooveWidth: 0.6 * 4e-5,
      grooveDepth: 0.42 * 4e-5,
      substrateThickness: 0.3 * 4e-5,
      workingConductivity: 0.6,
      lubricantConductivity: 0.12,
      solidConductivity: 9,
    }).thermalSlipLength;
    expect(relative(scaled, 4e-5 * base)).toBeLessThan(1e-12);
  });
});

describe('thermal slip core against independent references', () => {
  it('the finite-volume field solver (edge-graded mesh, close to second order) converges towards it: 0.2–1 % high at 32 cells per pitch, about 3.6 times closer at 64, and the order-2 Richardson value of the two within 5e-4 (k_o = 0.25 k_w, k_s = 40 k_w, w/P = ½, d/w = 1, s = P/2)', () => {
    const P = 20e-6;
    const input = { pitch: P, grooveWidth: P / 2, grooveDepth: P / 2, substrateThickness: P / 2, workingConductivity: 0.6, lubricantConductivity: 0.15, solidConductivity: 24 };
    const core = thermalGrooveSlip(input).thermalSlipLength;
    const coarse = thermalSlipField(input, 32).thermalSlipLength;
    const fine = thermalSlipField(input, 64).thermalSlipLength;
    expect(relative(coarse, core)).toBeGreaterThan(2e-3);
    expect(relative(coarse, core)).toBeLessThan(1e-2);
    expect(relative(coarse, core) / relative(fine, core)).toBeGreaterThan(3);
    expect(relative((4 * fine - coarse) / 3, core)).toBeLessThan(5e-4);
  });

  it('matches the FreeFEM references (fixtures/slip-core/generate_thermal.py): 0.3 percent, or 6e-6 P where |b_t| < 2e-3 P (the documented bound)', () => {
    const fixture = { cases: thermalReferences() };
    expect(fixture.cases.length).toBeGreaterThanOrEqual(20);
    for (const c of fixture.cases) {
      const r = thermalGrooveSlip(wall(c.fraction, c.depthOverWidth, c.substrateOverPitch, c.lubricantConductivity, c.solidConductivity, c.workingConductivity));
      const allowed = Math.max(3e-3 * Math.abs(c.thermalSlipLength), 6e-6) + 2 * c.uncertainty;
      expect(Math.abs(r.thermalSlipLength - c.thermalSlipLength), JSON.stringify(c)).toBeLessThanOrEqual(allowed);
    }
  });
});

describe('thermal slip core: impossible and out-of-range input', () => {
  it('throws DomainError naming the field', () => {
    const good = wall(0.5, 1, 0.5, 0.2, 10);
    for (const [change, field] of [
      [{ substrateThickness: -1 }, 'substrateThickness'],
      [{ lubricantConductivity: 0 }, 'lubricantConductivity'],
      [{ grooveWidth: 2 }, 'grooveWidth'],
    ] as const) {
      expectDomainError(() => thermalGrooveSlip({ ...good, ...change }), field);
    }
  });
  it('conductivity ratios beyond 1e-2–1e2 give a finite result and a caution', () => {
    const r = thermalGrooveSlip(wall(0.5, 1, 0.5, 1e-4, 1e4));
    expect(Number.isFinite(r.thermalSlipLength)).toBe(true);
    expect(r.warnings.map((w) => w.code)).toContain('outside-validated-range');
  });
});
