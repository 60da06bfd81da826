import { describe, expect, it } from 'vitest';
import { solveCellDiffusion, CellInputError } from '../../src/numerics/cell-diffusion.js';
import { solveLongitudinalCell } from '../../src/numerics/groove-cell.js';
import { sumOdd } from '../../src/numerics/series.js';
import reference from '../../fixtures/groove-cell/longitudinal_reference.json' with { type: 'json' };

/** Philip (1972) ZAMP 23, 353; Lauga & Stone (2003) J. Fluid Mech. 489, 55: b_∥ = (P/π) ln sec(πφ/2). */
const philipLongitudinal = (pitch: number, fraction: number): number => (pitch / Math.PI) * Math.log(1 / Math.cos((Math.PI * fraction) / 2));

/**
 * Fanning f·Re of a rectangular duct, aspect ratio α ≤ 1, from the exact series
 * (Shah & London 1978, Laminar Flow Forced Convection in Ducts, Academic Press, ch. VII):
 * f·Re = 24 / ((1 − 192 α/π⁵ Σ_odd tanh(nπ/(2α))/n⁵)(1 + α)²).
 */
const ductFRe = (alpha: number): number => {
  const s = sumOdd((n) => Math.tanh((n * Math.PI) / (2 * alpha)) / n ** 5, { decayPower: 5 }).sum;
  return 24 / ((1 - ((192 * alpha) / Math.PI ** 5) * s) * (1 + alpha) ** 2);
};

/** Pressure-driven flow μ∇²u = dp/dx = −1 in an a × b rectangle with no-slip walls; returns f·Re on D_h. */
function solveDuct(a: number, b: number, nx: number, ny: number): { fRe: number; iterations: number } {
  const r = solveCellDiffusion({
    widths: new Float64Array(nx).fill(a / nx),
    heights: new Float64Array(ny).fill(b / ny),
    coefficient: new Float64Array(nx * ny).fill(1),
    source: new Float64Array(nx * ny).fill(-1),
    bottom: { kind: 'value', value: 0 },
    top: { kind: 'value', value: 0 },
    sides: 'zero-value',
  });
  expect(r.converged).toBe(true);
  let sum = 0;
  for (const v of r.field) sum += v;
  const mean = sum / (nx * ny);
  const hydraulicDiameter = (2 * a * b) / (a + b);
  // f·Re = (−dp/dx) D_h² / (2 μ ū)
  return { fRe: (hydraulicDiameter * hydraulicDiameter) / (2 * mean), iterations: r.iterations };
}

describe('general cell diffusion solver', () => {
  it('exact series reproduces the Shah & London (1978) rectangular-duct table (values from memory)', () => {
    expect(ductFRe(1)).toBeCloseTo(14.227, 3);
    expect(ductFRe(0.5)).toBeCloseTo(15.548, 3);
    expect(ductFRe(0.25)).toBeCloseTo(18.233, 3);
    expect(ductFRe(0.125)).toBeCloseTo(20.585, 3);
    expect(ductFRe(1e-3)).toBeCloseTo(24, 1); // parallel plates, f·Re = 24 (exact)
  });

  it.each([
    [1, 14.227],
    [0.5, 15.548],
    [0.25, 18.233],
    [0.125, 20.585],
  ])('rectangular duct aspect %f: f·Re (Richardson, 40 and 80 cells on the short side) within 0.01 percent of the exact series and of Shah & London', (alpha, table) => {
    const coarse = solveDuct(1, alpha, Math.round(40 / alpha), 40).fRe;
    const fine = solveDuct(1, alpha, Math.round(80 / alpha), 80).fRe;
    const fRe = (4 * fine - coarse) / 3;
    expect(Math.abs(fRe / ductFRe(alpha) - 1)).toBeLessThan(1e-4);
    expect(Math.abs(fRe / table - 1)).toBeLessThan(1e-4);
    // Without extrapolation the 80-cell grid alone is within 0.1 % (second order, see below).
    expect(Math.abs(fine / ductFRe(alpha) - 1)).toBeLessThan(1e-3);
  });

  it('duct grid convergence is second order (observed order 1.9–2.1 against the exact series)', () => {
    const exact = ductFRe(1);
    const e1 = Math.abs(solveDuct(1, 1, 32, 32).fRe - exact);
    const e2 = Math.abs(solveDuct(1, 1, 64, 64).fRe - exact);
    const e3 = Math.abs(solveDuct(1, 1, 128, 128).fRe - exact);
    expect(Math.log2(e1 / e2)).toBeGreaterThan(1.9);
    expect(Math.log2(e1 / e2)).toBeLessThan(2.1);
    expect(Math.log2(e2 / e3)).toBeGreaterThan(1.9);
    expect(Math.log2(e2 / e3)).toBeLessThan(2.1);
  });

  it('multigrid-preconditioned CG needs a grid-independent number of iterations (≤ 12 from 32² to 256²)', () => {
    for (const n of [32, 256]) expect(solveDuct(1, 1, n, n).iterations).toBeLessThanOrEqual(12);
  });

  it('lid-sheared duct identity: d/w = 1/2, shear τ on the lid gives mean lid velocity τ w /(4 μ) (Σ_odd tanh(nπ/2)/n³ = π³/32, exact)', () => {
    const w = 2e-6;
    const d = w / 2;
    const mu = 0.05;
    const tau = 3;
    const nx = 128;
    const ny = 64;
    const r = solveCellDiffusion({
      widths: new Float64Array(nx).fill(w / nx),
      heights: new Float64Array(ny).fill(d / ny),
      coefficient: new Float64Array(nx * ny).fill(mu),
      bottom: { kind: 'value', value: 0 },
      top: { kind: 'flux', value: tau },
      sides: 'zero-value',
    });
    let lid = 0;
    for (let i = 0; i < nx; i++) lid += r.field[(ny - 1) * nx + i] + (tau / mu) * (d / ny / 2);
    lid /= nx;
    // The identity itself, independently of the solver:
    expect(sumOdd((n) => Math.tanh((n * Math.PI) / 2) / n ** 3, { decayPower: 3 }).sum).toBeCloseTo(Math.PI ** 3 / 32, 12);
    expect(Math.abs(lid / ((tau * w) / (4 * mu)) - 1)).toBeLessThan(2e-3);
  });

  it('two-layer conduction: series resistance with harmonic face averaging is exact (layered slab, exact solution)', () => {
    // k = 1 below y = 0.5, k = 10 above; φ(0) = 0, flux q at the top: φ(1) = q (0.5/1 + 0.5/10).
    const nx = 4;
    const ny = 10;
    const k = new Float64Array(nx * ny);
    for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) k[j * nx + i] = j < 5 ? 1 : 10;
    const r = solveCellDiffusion({
      widths: new Float64Array(nx).fill(0.25),
      heights: new Float64Array(ny).fill(0.1),
      coefficient: k,
      bottom: { kind: 'value', value: 0 },
      top: { kind: 'flux', value: 2 },
    });
    const top = r.field[(ny - 1) * nx] + (2 / 10) * 0.05;
    expect(top).toBeCloseTo(2 * (0.5 + 0.05), 10);
  });

  it('rejects an undetermined problem (flux on both edges, periodic sides) and malformed input', () => {
    const base = { widths: [1, 1], heights: [1, 1], coefficient: [1, 1, 1, 1] };
    expect(() => solveCellDiffusion({ ...base, bottom: { kind: 'flux', value: 0 }, top: { kind: 'flux', value: 1 } })).toThrow(CellInputError);
    expect(() => solveCellDiffusion({ ...base, coefficient: [1, -1, 1, 1], bottom: { kind: 'value', value: 0 }, top: { kind: 'flux', value: 1 } })).toThrow(CellInputError);
    expect(() => solveCellDiffusion({ ...base, widths: [1, 0], bottom: { kind: 'value', value: 0 }, top: { kind: 'flux', value: 1 } })).toThrow(CellInputError);
  });

  it('reports non-convergence instead of throwing when the iteration cap is hit', () => {
    const n = 64;
    const r = solveCellDiffusion({
      widths: new Float64Array(n).fill(1 / n),
      heights: new Float64Array(n).fill(1 / n),
      coefficient: new Float64Array(n * n).fill(1),
      source: new Float64Array(n * n).fill(1),
      bottom: { kind: 'value', value: 0 },
      top: { kind: 'value', value: 0 },
      maxIterations: 2,
      tolerance: 1e-14,
    });
    expect(r.converged).toBe(false);
    expect(r.iterations).toBe(2);
    expect(Number.isFinite(r.residual)).toBe(true);
  });
});

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
