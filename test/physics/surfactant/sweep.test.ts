/**
 * Robustness of the surfactant interface solvers (issue 12, item 2): a
 * deterministic tenth of the committed sweep (fixtures/surfactant/
 * sweep_designs.json, 60 of 600 designs; the whole sweep is
 * bench/surfactant-sweep.ts) answered the way /v1/surfactant answers, solver
 * forced. No timing here: speed is measured in the bench.
 */
import { describe, expect, it } from 'vitest';
import { loadSweepDesigns, runSweepDesign, sweepSubset, type SweepOutcome } from '../../../bench/surfactant-sweep-designs.js';

const designs = sweepSubset(loadSweepDesigns(), 10);
const outcomes: SweepOutcome[] = designs.map((d) => runSweepDesign(d));

const finiteEverywhere = (v: unknown): boolean => {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(finiteEverywhere);
  if (v && typeof v === 'object') return Object.values(v).every(finiteEverywhere);
  return true;
};

describe('surfactant sweep subset (60 designs: both surfactants, c/CMC 1e-6–10, 0.01–100 Pa, N 0.01–100, 0° and 90°, grooves 1 mm–1 m)', () => {
  it('covers the ranges it claims', () => {
    expect(designs.length).toBe(60);
    expect(new Set(designs.map((d) => d.surfactant)).size).toBe(2);
    expect(new Set(designs.map((d) => d.flowAngle))).toEqual(new Set([0, 90]));
    expect(Math.min(...designs.map((d) => d.wallShearStress))).toBeLessThan(0.05);
    expect(Math.max(...designs.map((d) => d.wallShearStress))).toBeGreaterThan(20);
    expect(Math.min(...designs.map((d) => d.concentrationOverCmc))).toBeLessThan(1e-5);
    expect(Math.max(...designs.map((d) => d.concentrationOverCmc))).toBeGreaterThan(1);
  });
  it('zero non-converged answers: no exception, no scaling fallback for any point, curve point or half-slip iterate', () => {
    const failed = outcomes.filter((o) => !o.converged).map((o) => `design ${o.design.id}: ${o.error ?? `${o.fallbackWarnings} fallback warning(s)`}`);
    expect(failed).toEqual([]);
  });
  it('every answer is finite, with the slip retained in [0, 1] and every point from the solver', () => {
    for (const o of outcomes) {
      const r = o.result;
      expect(r).toBeDefined();
      if (!r) continue;
      expect(finiteEverywhere(r)).toBe(true);
      for (const p of r.points) {
        expect(p.method).toBe('solver');
        expect(p.slipRetained).toBeGreaterThanOrEqual(0);
        expect(p.slipRetained).toBeLessThanOrEqual(1 + 1e-12);
        // converged: relative residual within the tolerance, or within 100× it at the rounding floor (numerics/steady-state.ts)
        if (p.solver) expect(p.solver.residual).toBeLessThanOrEqual(100 * p.solver.tolerance);
      }
      for (const x of r.curve.slipRetained) expect(x).toBeGreaterThanOrEqual(0);
    }
  });
  it('along finite grooves the answer obeys the groove force balance: slip retained = 1 − Δσ/(τ_w L_g) (continuum identity of the long-wave model, to its first-order discretisation)', () => {
    let checked = 0;
    for (const o of outcomes) {
      const d = o.design;
      const p = o.result?.points[0];
      if (d.flowAngle !== 0 || d.grooveLength === null || !p?.grooveProfile) continue;
      const t = p.grooveProfile.tensionChange;
      const drop = t[0] - t[t.length - 1];
      expect(Math.abs(p.slipRetained - (1 - drop / (d.wallShearStress * d.grooveLength)))).toBeLessThan(2e-3);
      checked++;
    }
    expect(checked).toBeGreaterThan(20);
  });
});
