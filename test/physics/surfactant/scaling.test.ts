import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import {
  LANDEL_FIT,
  SHORT_PERIOD_LIMIT,
  cleanTransverseCoefficients,
  marangoniScaling,
  philipTransverse,
  slipWithMarangoni,
} from '../../../src/physics/surfactant/scaling.js';
import { resolveSurfactant } from '../../../src/materials/surfactants.js';
import { GAS_CONSTANT } from '../../../src/core/constants.js';

const ref = JSON.parse(readFileSync(new URL('../../../fixtures/surfactant/references.json', import.meta.url), 'utf8'));
const sds = resolveSurfactant({ id: 'sds', interfaceType: 'air-water' });

describe('clean coefficients of Landel et al. (2020)', () => {
  it('long period: E0 = φ/(4 − 3φ), F0 = 1/(4 − 3φ) (eq. C8)', () => {
    for (const phi of [0.2, 0.5, 0.8]) {
      const c = cleanTransverseCoefficients(2e3, phi);
      expect(c.method).toBe('long-period');
      expect(c.meanCoefficient).toBeCloseTo(phi / (4 - 3 * phi), 14);
      expect(c.centreCoefficient).toBeCloseTo(1 / (4 - 3 * phi), 14);
    }
  });
  it('series (§4) at L = 1000 approaches the long-period closed form C8 (Richardson 400/800 terms, within 0.5 %)', () => {
    for (const phi of [0.2, 0.5, 0.8]) {
      const a = cleanTransverseCoefficients(1e3, phi, 400);
      const b = cleanTransverseCoefficients(1e3, phi, 800);
      const E = 2 * b.meanCoefficient - a.meanCoefficient;
      const F = 2 * b.centreCoefficient - a.centreCoefficient;
      expect(Math.abs(E / (phi / (4 - 3 * phi)) - 1)).toBeLessThan(5e-3);
      expect(Math.abs(F / (1 / (4 - 3 * phi)) - 1)).toBeLessThan(5e-3);
    }
  });
  it('series at L = 0.001 approaches the short-period closed form C20 (Richardson, within 0.5 %)', () => {
    for (const phi of [0.2, 0.5, 0.8]) {
      const a = cleanTransverseCoefficients(1e-3, phi, 400);
      const b = cleanTransverseCoefficients(1e-3, phi, 800);
      const s = 1e-3 / (4 * Math.PI);
      const lnSec = -Math.log(Math.cos((Math.PI * phi) / 2));
      const E20 = (s * lnSec) / (1 + s * lnSec);
      const F20 = (s * Math.acosh(1 / Math.cos((Math.PI * phi) / 2))) / (1 + s * lnSec);
      expect(Math.abs((2 * b.meanCoefficient - a.meanCoefficient) / E20 - 1)).toBeLessThan(5e-3);
      expect(Math.abs((2 * b.centreCoefficient - a.centreCoefficient) / F20 - 1)).toBeLessThan(5e-3);
    }
  });
  it('up to L = 0.4 the series converges to the short-period closed form C20 (Landel et al. 2020, eq. C20): its distance halves with each doubling of the terms', () => {
    for (const L of [0.06, SHORT_PERIOD_LIMIT]) {
      for (const phi of [0.2, 0.7]) {
        const s = L / (4 * Math.PI);
        const lnSec = -Math.log(Math.cos((Math.PI * phi) / 2));
        const E20 = (s * lnSec) / (1 + s * lnSec);
        const [e200, e400, e800] = [200, 400, 800].map((n) => cleanTransverseCoefficients(L, phi, n).meanCoefficient);
        const distances = [Math.abs(e200 / E20 - 1), Math.abs(e400 / E20 - 1), Math.abs(e800 / E20 - 1)];
        expect(distances[0] / distances[1]).toBeGreaterThan(1.6);
        expect(distances[1] / distances[2]).toBeGreaterThan(1.6);
        const answered = cleanTransverseCoefficients(L, phi);
        expect(answered.method).toBe('short-period');
        expect(answered.meanCoefficient).toBeCloseTo(E20, 15);
      }
    }
    expect(cleanTransverseCoefficients(SHORT_PERIOD_LIMIT * 1.01, 0.5).method).toBe('series');
  });
  it('a repeated (L, φ) is answered from the cache with the Richardson value of 400 and 200 terms', () => {
    const [L, phi] = [1.7, 0.45];
    const first = cleanTransverseCoefficients(L, phi);
    const again = cleanTransverseCoefficients(L, phi);
    const fresh = 2 * cleanTransverseCoefficients(L, phi, 400).meanCoefficient - cleanTransverseCoefficients(L, phi, 200).meanCoefficient;
    expect(again).toEqual(first);
    expect(again.meanCoefficient).toBe(fresh);
  });
  it('series converges with the number of terms (successive differences halve: first-order convergence)', () => {
    const e = [200, 400, 800].map((n) => cleanTransverseCoefficients(0.01, 0.5, n).meanCoefficient);
    const r = (e[0] - e[1]) / (e[1] - e[2]);
    expect(r).toBeGreaterThan(1.6);
    expect(r).toBeLessThan(2.5);
  });
  it('short period reduces to Philip (1972): λ = 2E/(1 − E) → (L/2π) ln sec(πφ/2) (exact limit)', () => {
    for (const phi of [0.2, 0.5, 0.8]) {
      const L = 1e-4;
      const c = cleanTransverseCoefficients(L, phi);
      const lambda = (2 * c.meanCoefficient) / (1 - c.meanCoefficient);
      const philip = philipTransverse(L, phi, 1).slipLength;
      expect(Math.abs(lambda / philip - 1)).toBeLessThan(1e-12);
    }
  });
  it('Philip closed forms match the quadrature of the velocity profile (fixture generate_references.py)', () => {
    for (const c of ref.philip.cases) {
      const p = philipTransverse(ref.philip.pitch, c.phi, ref.philip.shearRate);
      expect(Math.abs(p.slipLength / c.slipLength - 1)).toBeLessThan(1e-13);
      expect(Math.abs((ref.philip.shearRate * p.slipLength) / c.meanVelocityByQuadrature - 1)).toBeLessThan(1e-9);
      expect(Math.abs(p.centreVelocity / c.centreVelocity - 1)).toBeLessThan(1e-13);
    }
  });
});

describe('Marangoni reduction factor, eq. (4.29) of Landel et al. (2020)', () => {
  const base = { gapLength: 50e-6, shearRate: 1000, viscosity: 1e-3, surfactant: sds, temperature: 298.15 };
  const uc = philipTransverse(100e-6, 0.5, 1000).centreVelocity;
  it('fitted constants a1 = 2.30, a2 = 0.319, δ0 = 1.68, δ1 = 0.0528 (Landel et al. 2020, eqs. 4.29, 3.20–3.22)', () => {
    expect(LANDEL_FIT).toEqual({ a1: 2.3, a2: 0.319, delta0: 1.68, delta1: 0.0528 });
  });
  it('our h-free form equals the paper’s nondimensional (4.29) for any channel half-height h (algebraic identity)', () => {
    const c0 = 0.01;
    const ours = marangoniScaling({ ...base, centreVelocity: uc, bulkConcentration: c0 }).marangoniReduction;
    for (const h of [20e-6, 1e-3]) {
      const U = 1000 * h;
      const g = 50e-6 / h;
      const k = (sds.adsorptionRate! * c0) / sds.desorptionRate!;
      const Pe = (h * U) / sds.bulkDiffusivity;
      const PeI = (h * U) / sds.surfaceDiffusivity;
      const Bi = (sds.desorptionRate! * h) / U;
      const chi = (sds.desorptionRate! * h) / (sds.adsorptionRate! * sds.maximumSurfaceExcess);
      const Ma = (sds.gibbsPrefactor * GAS_CONSTANT * 298.15 * sds.maximumSurfaceExcess) / (1e-3 * U);
      const delta = g * 1.68 * Math.pow(1 + 0.0528 * g * g * Pe, -1 / 3);
      const F0 = uc / (2 * U);
      const top = 2.3 * k * Ma * F0;
      const paper = top / (1 / PeI + (0.319 * g * g * Bi) / (1 + (Bi * Pe * delta) / chi) + top);
      expect(Math.abs(ours / paper - 1)).toBeLessThan(1e-12);
    }
  });
  it('clean limit: c = 0 gives γ_Ma = 0 (Ma·k → 0)', () => {
    expect(marangoniScaling({ ...base, centreVelocity: uc, bulkConcentration: 0 }).marangoniReduction).toBe(0);
  });
  it('immobilised limit: γ_Ma → 1 as the Marangoni term dominates (Ma → ∞)', () => {
    const r = marangoniScaling({ ...base, shearRate: 1e-3, centreVelocity: uc * 1e-6, bulkConcentration: 1 });
    expect(r.marangoniReduction).toBeGreaterThan(0.999);
    expect(r.marangoniReduction).toBeLessThan(1);
  });
  it('γ_Ma increases with concentration (monotone in k)', () => {
    const g = [1e-5, 1e-4, 1e-3, 1e-2].map((c) => marangoniScaling({ ...base, centreVelocity: uc, bulkConcentration: c }).marangoniReduction);
    for (let i = 1; i < g.length; i++) expect(g[i]).toBeGreaterThan(g[i - 1]);
  });
  it('dilute flag follows k = K c ≤ 1 (validity of the theory)', () => {
    expect(marangoniScaling({ ...base, centreVelocity: uc, bulkConcentration: 1 }).flags.dilute).toBe(true);
    expect(marangoniScaling({ ...base, centreVelocity: uc, bulkConcentration: 8 }).flags.dilute).toBe(false);
  });
  it('slip with uniform Marangoni: γ = 0 reproduces the clean slip exactly, γ = 1 gives a no-slip interface (half-space and channel)', () => {
    expect(slipWithMarangoni(3.7e-6, 0)).toBe(3.7e-6);
    expect(slipWithMarangoni(3.7e-6, 1)).toBe(0);
    expect(slipWithMarangoni(3.7e-6, 0, 50e-6)).toBeCloseTo(3.7e-6, 18);
    expect(slipWithMarangoni(3.7e-6, 1, 50e-6)).toBe(0);
  });
});
