import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveCellDiffusion, CellInputError } from '../../src/numerics/cell-diffusion.js';
import { sumOdd } from '../../src/numerics/series.js';

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

// f·Re of rectangular ducts by the exact series summed to 30 digits with mpmath (fixtures/heat/generate_ducts.py).
const exactDucts = (
  JSON.parse(readFileSync(new URL('../../fixtures/heat/ducts.json', import.meta.url), 'utf8')) as {
    ducts: { aspectRatio: number; frictionFactorReynolds: number }[];
  }
).ducts.map((d): [number, number] => [d.aspectRatio, d.frictionFactorReynolds]);

describe('general cell diffusion solver', () => {
  it('the test\'s own exact series agrees with the mpmath sum of fixtures/heat/ducts.json', () => {
    for (const [alpha, fRe] of exactDucts) expect(Math.abs(ductFRe(alpha) / fRe - 1)).toBeLessThan(1e-9);
    expect(ductFRe(1e-3)).toBeCloseTo(24, 1); // parallel plates, f·Re = 24 (exact)
  });

  it.each(exactDucts)('rectangular duct aspect %f: f·Re (Richardson, 40 and 80 cells on the short side) within 0.01 percent of the exact series (fixtures/heat/ducts.json)', (alpha, table) => {
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
