import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import {
  gibbsSurfaceExcess,
  langmuirSurfaceExcess,
  surfactantEquilibrium,
  szyszkowskiTension,
  szyszkowskiTensionOfConcentration,
} from '../../../src/physics/surfactant/equilibrium.js';
import { resolveSurfactant } from '../../../src/materials/surfactants.js';
import { Notes } from '../../../src/core/notes.js';

const ref = JSON.parse(readFileSync(new URL('../../../fixtures/surfactant/references.json', import.meta.url), 'utf8'));
const eq = ref.equilibrium;

describe('Langmuir–Szyszkowski equilibrium', () => {
  it('SDS-like constants at c = 1 mM: σ = 68.82 mN/m, Γ = 5.92e-7 mol/m² (worked example from Chang & Franses 1995 constants; fixture generate_references.py)', () => {
    const g = langmuirSurfaceExcess(1, 3.9e-6, 0.179);
    expect(g).toBeCloseTo(5.92e-7, 9);
    const sigma = szyszkowskiTension(g, 0.072, 2, 298.15, 3.9e-6);
    expect(sigma * 1e3).toBeCloseTo(68.82, 2);
  });
  it('matches the fixture values over four decades of concentration (generate_references.py)', () => {
    for (const p of eq.points) {
      const g = langmuirSurfaceExcess(p.c, eq.maximumSurfaceExcess, eq.langmuirConstant);
      expect(Math.abs(g / p.surfaceExcess - 1)).toBeLessThan(1e-12);
      const s = szyszkowskiTensionOfConcentration(p.c, eq.cleanTension, eq.gibbsPrefactor, eq.temperature, eq.maximumSurfaceExcess, eq.langmuirConstant);
      expect(Math.abs(s - p.surfaceTension)).toBeLessThan(1e-14);
    }
  });
  it('Szyszkowski–Gibbs consistency: a numerical derivative of σ(ln c) returns the Langmuir Γ (exact identity of the Langmuir framework)', () => {
    for (const c of [1e-5, 1e-3, 0.1, 1, 8]) {
      const h = 1e-4;
      const sp = szyszkowskiTensionOfConcentration(c * Math.exp(h), 0.072, 2, 298.15, 3.9e-6, 0.179);
      const sm = szyszkowskiTensionOfConcentration(c * Math.exp(-h), 0.072, 2, 298.15, 3.9e-6, 0.179);
      const gibbs = gibbsSurfaceExcess((sp - sm) / (2 * h), 2, 298.15);
      const langmuir = langmuirSurfaceExcess(c, 3.9e-6, 0.179);
      expect(Math.abs(gibbs / langmuir - 1)).toBeLessThan(1e-6);
    }
  });
  it('scipy numerical derivative of σ(ln c) agrees with our Langmuir Γ (fixture)', () => {
    for (const p of eq.points) {
      expect(Math.abs(langmuirSurfaceExcess(p.c, 3.9e-6, 0.179) / p.gibbsSurfaceExcess - 1)).toBeLessThan(1e-8);
    }
  });
  it('equation of state in Γ and in c agree (insert the isotherm; exact)', () => {
    const c = 2.5;
    const a = szyszkowskiTension(langmuirSurfaceExcess(c, 3.9e-6, 0.179), 0.072, 2, 298.15, 3.9e-6);
    const b = szyszkowskiTensionOfConcentration(c, 0.072, 2, 298.15, 3.9e-6, 0.179);
    expect(Math.abs(a - b)).toBeLessThan(1e-15);
  });
  it('clean interface at c = 0: Γ = 0, σ = σ0 (exact)', () => {
    const s = resolveSurfactant({ id: 'sds', interfaceType: 'air-water' });
    const r = surfactantEquilibrium(s, 0, 298.15, new Notes(), 0.072);
    expect(r.surfaceExcess).toBe(0);
    expect(r.surfaceTension).toBe(0.072);
  });
  it('warns above the CMC of SDS (8.1 mM at 25 °C; SurfPro data file) and not below it', () => {
    const s = resolveSurfactant({ id: 'sds', interfaceType: 'air-water' });
    const above = new Notes();
    expect(surfactantEquilibrium(s, 10, 298.15, above).aboveCriticalMicelleConcentration).toBe(true);
    expect(above.warnings.some((w) => w.code === 'above-critical-micelle-concentration')).toBe(true);
    const below = new Notes();
    surfactantEquilibrium(s, 5, 298.15, below);
    expect(below.warnings.length).toBe(0);
  });
});
