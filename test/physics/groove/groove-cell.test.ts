import { describe, expect, it } from 'vitest';
import { CellInputError } from '../../../src/numerics/cell-diffusion.js';
import { sumOdd } from '../../../src/numerics/series.js';
import { solveLongitudinalCell } from '../../../src/physics/groove/groove-cell.js';
import reference from '../../../fixtures/groove-cell/longitudinal_reference.json' with { type: 'json' };

/** Philip (1972) ZAMP 23, 353; Lauga & Stone (2003) J. Fluid Mech. 489, 55: b_∥ = (P/π) ln sec(πφ/2). */
const philipLongitudinal = (pitch: number, fraction: number): number => (pitch / Math.PI) * Math.log(1 / Math.cos((Math.PI * fraction) / 2));

describe('longitudinal groove cell', () => {
  it.each([0.5, 0.75, 0.9])('N = 0, φ = %f: b_∥ within 0.2 percent of Philip (1972) at the default grid', (fraction) => {
    const r = solveLongitudinalCell({ pitch: 1e-4, grooveWidth: fraction * 1e-4, grooveDepth: 1e-4, viscosityRatio: 0 });
    expect(r.converged).toBe(true);
    expect(Math.abs(r.slipLength / philipLongitudinal(1e-4, fraction) - 1)).toBeLessThan(2e-3);
    expect(r.interfacialShearRatio).toBe(0);
    expect(r.meanLocalSlip).toBeNull();
  });

  it.each([0.1, 0.25])('N = 0, φ = %f: b_∥ within 0.2 percent of Philip (1972) with cellsPerPitch = 64 (default grid: 0.2–0.3 percent)', (fraction) => {
    const r = solveLongitudinalCell({ pitch: 1, grooveWidth: fraction, grooveDepth: 1, viscosityRatio: 0, cellsPerPitch: 64 });
    expect(Math.abs(r.slipLength / philipLongitudinal(1, fraction) - 1)).toBeLessThan(2e-3);
  });

  it('grid convergence for N = 0, φ = 0.5 (Philip exact): observed order 1.6–2.2 on the √r-graded mesh', () => {
    const exact = philipLongitudinal(1, 0.5);
    const errors = [16, 32, 64].map((n) =>
      Math.abs(solveLongitudinalCell({ pitch: 1, grooveWidth: 0.5, grooveDepth: 1, viscosityRatio: 0, cellsPerPitch: n, extrapolate: false }).slipLength - exact),
    );
    const orders = [Math.log2(errors[0] / errors[1]), Math.log2(errors[1] / errors[2])];
    for (const p of orders) {
      expect(p).toBeGreaterThan(1.6);
      expect(p).toBeLessThan(2.2);
    }
  });

  it('result does not depend on the domain height H (4 P against 10 P, relative change < 1e-5)', () => {
    const base = { pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5, viscosityRatio: 0.5, extrapolate: false };
    const b4 = solveLongitudinalCell({ ...base, domainHeight: 4 }).slipLength;
    const b10 = solveLongitudinalCell({ ...base, domainHeight: 10 }).slipLength;
    expect(Math.abs(b10 / b4 - 1)).toBeLessThan(1e-5);
  });

  it('interface profiles are mirror-symmetric about the groove centre', () => {
    const r = solveLongitudinalCell({ pitch: 1, grooveWidth: 0.6, grooveDepth: 0.3, viscosityRatio: 2 });
    const m = r.interfaceVelocity.length;
    for (let q = 0; q < m; q++) {
      expect(r.interfacePositions[q] + r.interfacePositions[m - 1 - q]).toBeCloseTo(0, 12);
      expect(Math.abs(r.interfaceVelocity[q] - r.interfaceVelocity[m - 1 - q])).toBeLessThan(1e-9 * r.maxVelocity);
    }
  });

  it('N = 1000, d/w = 1/2: mean local slip → w/(4N), the lid-sheared duct identity (exact, Σ_odd tanh(nπ/2)/n³ = π³/32)', () => {
    const w = 0.5;
    const N = 1000;
    const r = solveLongitudinalCell({ pitch: 1, grooveWidth: w, grooveDepth: w / 2, viscosityRatio: N, cellsPerPitch: 64 });
    expect(Math.abs((r.meanLocalSlip as number) / (w / (4 * N)) - 1)).toBeLessThan(5e-3);
    // Solid-like limit: the shear on the mouth is the applied shear, the slip tiny.
    expect(Math.abs(r.interfacialShearRatio - 1)).toBeLessThan(5e-3);
    expect(r.slipLength).toBeGreaterThan(0);
    expect(r.slipLength).toBeLessThan(1e-3 * philipLongitudinal(1, w));
  });

  it('shallow groove d/w = 0.02, N = 1000: mean local slip matches the lid-sheared duct series and tends to the Couette value d/N', () => {
    const w = 0.5;
    const d = 0.02 * w;
    const N = 1000;
    // Mean lid slip of a lid-sheared rectangular duct (derived from the duct series, see physics notes §4):
    // b̄_s = (w/N)(8/π³) Σ_odd tanh(nπd/w)/n³.
    const series = (w / N) * (8 / Math.PI ** 3) * sumOdd((n) => Math.tanh((n * Math.PI * d) / w) / n ** 3, { decayPower: 3 }).sum;
    expect(Math.abs(series / (d / N) - 1)).toBeLessThan(0.03); // published shallow (Couette) limit d/N
    const r = solveLongitudinalCell({ pitch: 1, grooveWidth: w, grooveDepth: d, viscosityRatio: N, cellsPerPitch: 64 });
    expect(Math.abs((r.meanLocalSlip as number) / series - 1)).toBeLessThan(1e-2);
  });

  it('lubricant flux equals the integral of the groove velocity and is positive; the slip falls monotonically with N', () => {
    const base = { pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5 };
    const slips = [0.01, 0.1, 1, 10, 100].map((N) => solveLongitudinalCell({ ...base, viscosityRatio: N }));
    for (let k = 1; k < slips.length; k++) expect(slips[k].slipLength).toBeLessThan(slips[k - 1].slipLength);
    expect(slips[0].slipLength).toBeLessThan(philipLongitudinal(1, 0.5));
    for (const s of slips) expect(s.lubricantFlux).toBeGreaterThan(0);
  });

  it('handles the extremes of the stated range (w/P 0.02 … 0.98, d/w 0.02 … 5, N 0 … 1000) with finite results', () => {
    for (const [phi, aspect, N] of [
      [0.02, 5, 1000],
      [0.98, 0.02, 0],
      [0.98, 5, 1e-3],
      [0.02, 0.02, 1],
    ]) {
      const r = solveLongitudinalCell({ pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: N });
      expect(Number.isFinite(r.slipLength)).toBe(true);
      expect(r.slipLength).toBeGreaterThanOrEqual(0);
      expect(r.slipLength).toBeLessThan(philipLongitudinal(1, phi) * 1.01);
    }
  });

  it.each(reference.cases)(
    'finite N = $viscosityRatio, d = $grooveDepth P: b_∥ agrees with the independent scipy finite-difference reference (fixtures/groove-cell, Richardson with observed order)',
    (c) => {
      const r = solveLongitudinalCell({ pitch: c.pitch, grooveWidth: c.grooveWidth, grooveDepth: c.grooveDepth, viscosityRatio: c.viscosityRatio });
      // The reference's own uncertainty (its extrapolation step) dominates; our result must sit inside it.
      expect(Math.abs(r.slipLength - c.slipLength)).toBeLessThan(Math.max(c.uncertainty, 2e-4 * c.slipLength));
    },
  );

  it('rejects impossible geometry with a CellInputError naming the field', () => {
    expect(() => solveLongitudinalCell({ pitch: 1, grooveWidth: 1.2, grooveDepth: 1, viscosityRatio: 0 })).toThrow(/grooveWidth/);
    expect(() => solveLongitudinalCell({ pitch: -1, grooveWidth: 0.5, grooveDepth: 1, viscosityRatio: 0 })).toThrow(CellInputError);
    expect(() => solveLongitudinalCell({ pitch: 1, grooveWidth: 0.5, grooveDepth: 1, viscosityRatio: Number.NaN })).toThrow(/viscosityRatio/);
  });
});
