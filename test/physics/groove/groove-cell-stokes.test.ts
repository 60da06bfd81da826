import { describe, expect, it } from 'vitest';
import { solveTransverseCell, solveLongitudinalCell, CellInputError } from '../../../src/physics/groove/groove-cell.js';

/** Philip (1972) ZAMP 23, 353; Lauga & Stone (2003) J. Fluid Mech. 489, 55: b_⊥ = (P/2π) ln sec(πφ/2), half of b_∥. */
const philipTransverse = (pitch: number, fraction: number): number => (pitch / (2 * Math.PI)) * Math.log(1 / Math.cos((Math.PI * fraction) / 2));

describe('transverse groove cell (2-D Stokes)', () => {
  it.each([0.25, 0.5, 0.9])('N = 0, φ = %f: b_⊥ within 0.2 percent of (P/2π) ln sec(πφ/2) (Philip 1972; Lauga & Stone 2003)', (fraction) => {
    const r = solveTransverseCell({ pitch: 2e-5, grooveWidth: fraction * 2e-5, grooveDepth: 1e-5, viscosityRatio: 0 });
    expect(r.converged).toBe(true);
    expect(r.direction).toBe('transverse');
    expect(Math.abs(r.slipLength / philipTransverse(2e-5, fraction) - 1)).toBeLessThan(2e-3);
    expect(r.interfacialShearRatio).toBe(0);
  });

  it('grid convergence for N = 0, φ = 0.5 (exact: Philip / 2): observed order 1.3–2.2 without extrapolation', () => {
    const exact = philipTransverse(1, 0.5);
    const errors = [16, 32, 64].map((n) =>
      Math.abs(solveTransverseCell({ pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5, viscosityRatio: 0, cellsPerPitch: n, extrapolate: false }).slipLength - exact),
    );
    for (const p of [Math.log2(errors[0] / errors[1]), Math.log2(errors[1] / errors[2])]) {
      expect(p).toBeGreaterThan(1.3);
      expect(p).toBeLessThan(2.2);
    }
  });

  it('shallow groove d/w = 0.02, N = 1000: mean local slip → d/(4N) (zero-net-flux Couette–Poiseuille profile, exact for d ≪ w) within 1 %', () => {
    const w = 0.5;
    const d = 0.02 * w;
    const N = 1000;
    const r = solveTransverseCell({ pitch: 1, grooveWidth: w, grooveDepth: d, viscosityRatio: N, cellsPerPitch: 48 });
    expect(Math.abs((r.meanLocalSlip as number) / (d / (4 * N)) - 1)).toBeLessThan(1e-2);
    // Same profile u = U η(3η − 2), η = (y + d)/d, U = τ d/(4 μ_o): eddy flux max|ψ| = (4/27) U d = τ d²/(27 μ_o) [derived].
    expect(Math.abs(r.lubricantFlux / ((d * d) / (27 * N)) - 1)).toBeLessThan(3e-2);
    expect(Math.abs(r.interfacialShearRatio - 1)).toBeLessThan(1e-3);
  });

  it('result does not depend on the domain height H (4 P against 10 P, relative change < 1e-6)', () => {
    const base = { pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5, viscosityRatio: 0.5, extrapolate: false, cellsPerPitch: 16 };
    const b4 = solveTransverseCell({ ...base, domainHeight: 4 }).slipLength;
    const b10 = solveTransverseCell({ ...base, domainHeight: 10 }).slipLength;
    expect(Math.abs(b10 / b4 - 1)).toBeLessThan(1e-6);
  });

  it('Stokes reversibility: interface velocity mirror-symmetric about the groove centre', () => {
    const r = solveTransverseCell({ pitch: 1, grooveWidth: 0.6, grooveDepth: 0.3, viscosityRatio: 2, cellsPerPitch: 16 });
    const m = r.interfaceVelocity.length;
    for (let q = 0; q < m; q++) {
      expect(r.interfacePositions[q] + r.interfacePositions[m - 1 - q]).toBeCloseTo(0, 12);
      expect(Math.abs(r.interfaceVelocity[q] - r.interfaceVelocity[m - 1 - q])).toBeLessThan(1e-8 * r.maxVelocity);
    }
  });

  it('b_⊥/b_∥ → 1/2 as N → 0 (Philip limit) and stays below 1/2 for finite N (the recirculating cavity has the lower local slip; shallow limits d/(4N) against d/N, both tested)', () => {
    for (const N of [0.01, 1, 10]) {
      const base = { pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5, viscosityRatio: N, cellsPerPitch: 24 };
      const ratio = solveTransverseCell(base).slipLength / solveLongitudinalCell(base).slipLength;
      expect(ratio).toBeLessThanOrEqual(0.5 + 2e-3);
      if (N === 0.01) expect(ratio).toBeGreaterThan(0.49);
    }
  });

  it('N = 1000: solid-like limit, b_⊥ → 0 and the mouth carries the applied shear', () => {
    const r = solveTransverseCell({ pitch: 1, grooveWidth: 0.5, grooveDepth: 0.25, viscosityRatio: 1000, cellsPerPitch: 24 });
    expect(r.slipLength).toBeGreaterThan(0);
    expect(r.slipLength).toBeLessThan(1e-3 * philipTransverse(1, 0.5));
    expect(Math.abs(r.interfacialShearRatio - 1)).toBeLessThan(2e-3);
  });

  it('extremes of the stated range give finite, bounded results', () => {
    for (const [phi, aspect, N] of [
      [0.02, 5, 1000],
      [0.98, 0.02, 0],
      [0.98, 2, 1e-3],
    ]) {
      const r = solveTransverseCell({ pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: N, cellsPerPitch: 16 });
      expect(Number.isFinite(r.slipLength)).toBe(true);
      expect(r.slipLength).toBeGreaterThanOrEqual(0);
      expect(r.slipLength).toBeLessThan(philipTransverse(1, phi) * 1.01);
    }
  });

  it('same input contract as the longitudinal solver', () => {
    expect(() => solveTransverseCell({ pitch: 1, grooveWidth: 1, grooveDepth: 1, viscosityRatio: 0 })).toThrow(CellInputError);
    expect(() => solveTransverseCell({ pitch: 1, grooveWidth: 0.5, grooveDepth: 0, viscosityRatio: 0 })).toThrow(/grooveDepth/);
  });
});
