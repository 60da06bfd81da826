import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/core/errors.js';
import {
  grooveDuctDefiningSeries,
  grooveLidVelocityCentre,
  grooveLidVelocityMean,
  pressureDrivenGrooveFlux,
  rectangularDuctFrictionReynolds,
  shearDrivenGrooveFlux,
  zeroNetFluxPressureGradient,
} from '../../../src/physics/groove/groove-duct.js';

interface DuctCase {
  depthOverWidth: number;
  shearDrivenFlux: number;
  shearDrivenFluxErrorEstimate: number;
  lidVelocityMean: number;
  lidVelocityMeanErrorEstimate: number;
  lidVelocityCentre: number;
  lidVelocityCentreErrorEstimate: number;
  pressureDrivenFlux: number;
  pressureDrivenFluxErrorEstimate: number;
}
const fixture = JSON.parse(readFileSync(new URL('../../../fixtures/slip/groove_duct.json', import.meta.url), 'utf8')) as {
  cases: DuctCase[];
};

/** |actual − expected| within 3× the reference's own extrapolation-error estimate (floor 1e-7 absolute). */
function expectWithin(actual: number, expected: number, errorEstimate: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.max(3 * errorEstimate, 1e-7));
}

describe('lid-sheared groove (exact series)', () => {
  it('d/w = ½ gives mean lid velocity w/4 exactly (Σ_odd tanh(nπ/2)/n³ = π³/32, exact identity)', () => {
    expect(grooveLidVelocityMean(1, 0.5)).toBeCloseTo(0.25, 14);
    expect(grooveLidVelocityMean(2e-5, 1e-5)).toBeCloseTo(0.5e-5, 18);
  });
  it('shallow limit: mean and centre lid velocity → d (Couette flow u = τy/μ, exact limit)', () => {
    // Side-wall correction is O(d/w): relative deviation must shrink with d/w.
    const dev = (d: number) => Math.abs(grooveLidVelocityMean(1, d) / d - 1);
    expect(dev(1e-3)).toBeLessThan(2e-3);
    expect(dev(1e-4)).toBeLessThan(2e-4);
    expect(grooveLidVelocityCentre(1, 1e-4) / 1e-4).toBeCloseTo(1, 7);
  });
  it('deep limit: mean → (8/π³)(7ζ(3)/8) w = 0.2713773 w; centre → (4G/π²) w = 0.3712269 w (exact limits; ζ(3), Catalan G)', () => {
    expect(grooveLidVelocityMean(1, 20)).toBeCloseTo((7 * 1.2020569031595942) / Math.PI ** 3, 12);
    expect(grooveLidVelocityCentre(1, 20)).toBeCloseTo((4 * 0.915965594177219) / Math.PI ** 2, 12);
  });
  it('shear-driven flux: shallow → w d²/2, deep → w³/12 (exact limits)', () => {
    expect(shearDrivenGrooveFlux(1, 1e-4) / (1e-8 / 2)).toBeCloseTo(1, 3);
    expect(shearDrivenGrooveFlux(1, 30) * 12).toBeCloseTo(1, 12);
  });
  it('matches the scipy finite-difference reference (fixtures/slip/generate_groove_duct.py, Richardson-extrapolated)', () => {
    for (const c of fixture.cases) {
      expectWithin(shearDrivenGrooveFlux(1, c.depthOverWidth), c.shearDrivenFlux, c.shearDrivenFluxErrorEstimate);
      expectWithin(grooveLidVelocityMean(1, c.depthOverWidth), c.lidVelocityMean, c.lidVelocityMeanErrorEstimate);
      expectWithin(grooveLidVelocityCentre(1, c.depthOverWidth), c.lidVelocityCentre, c.lidVelocityCentreErrorEstimate);
    }
  });
  it('scales with the groove size: Q̂_s ∝ length³, lid velocity ∝ length (dimensional analysis)', () => {
    expect(shearDrivenGrooveFlux(3e-6, 1.5e-6) / shearDrivenGrooveFlux(1, 0.5)).toBeCloseTo(27e-18, 28);
    expect(grooveLidVelocityMean(3e-6, 6e-6) / grooveLidVelocityMean(1, 2)).toBeCloseTo(3e-6, 18);
  });
});

describe('pressure-driven groove with a stress-free lid', () => {
  it('matches the scipy finite-difference reference (fixtures/slip/generate_groove_duct.py)', () => {
    for (const c of fixture.cases) {
      expectWithin(pressureDrivenGrooveFlux(1, c.depthOverWidth), c.pressureDrivenFlux, c.pressureDrivenFluxErrorEstimate);
    }
  });
  it('the two series expansions agree where they meet (2d = w) and both limits hold: shallow w d³/3, deep d w³/12', () => {
    const below = pressureDrivenGrooveFlux(1, 0.5 * (1 - 1e-12));
    const above = pressureDrivenGrooveFlux(1, 0.5 * (1 + 1e-12));
    expect(Math.abs(above - below) / below).toBeLessThan(1e-10);
    expect(pressureDrivenGrooveFlux(1, 1e-3) / (1e-9 / 3)).toBeCloseTo(1, 2);
    expect(pressureDrivenGrooveFlux(1, 1e3) / (1e3 / 12)).toBeCloseTo(1, 3);
  });
  it('zero-net-flux gradient G = τQ̂_s/Q̂_p → 3τ/(2d) shallow, τ/d deep (derived limits, module comment)', () => {
    const d = 1e-4;
    expect(zeroNetFluxPressureGradient(1, d, 2) * d).toBeCloseTo(3, 3);
    expect(zeroNetFluxPressureGradient(1, 1e5, 2) * 1e5).toBeCloseTo(2, 4);
  });
});

describe('fast (dual, geometrically converging) forms against the defining series', () => {
  // Witness: the defining series of the module comment summed term by term (grooveDuctDefiningSeries).
  const ratios = Array.from({ length: 51 }, (_, i) => 10 ** (-4 + (10 * i) / 50));
  const worst = (fast: (w: number, d: number) => number, exact: (w: number, d: number) => number, from = 0): number =>
    Math.max(...ratios.filter((r) => r >= from).map((r) => Math.abs(fast(1, r) / exact(1, r) - 1)));
  it('mean lid velocity, shear-driven and pressure-driven flux agree to 1e-14 over d/w = 1e-4 … 1e6', () => {
    const errors = {
      lidVelocityMean: worst(grooveLidVelocityMean, grooveDuctDefiningSeries.lidVelocityMean),
      shearDrivenFlux: worst(shearDrivenGrooveFlux, grooveDuctDefiningSeries.shearDrivenFlux),
      pressureDrivenFlux: worst(pressureDrivenGrooveFlux, grooveDuctDefiningSeries.pressureDrivenFlux),
    };
    for (const [name, error] of Object.entries(errors)) expect(error, name).toBeLessThan(1e-14);
  });
  it('centre lid velocity agrees to 1e-12 over d/w = 1e-3 … 1e6 (the defining form loses digits as G − Σ for shallower grooves)', () => {
    expect(worst(grooveLidVelocityCentre, grooveDuctDefiningSeries.lidVelocityCentre, 1e-3)).toBeLessThan(1e-12);
  });
  it('very shallow groove d/w = 1e-5: dual and defining forms agree to 1e-13', () => {
    expect(Math.abs(grooveLidVelocityMean(1, 1e-5) / grooveDuctDefiningSeries.lidVelocityMean(1, 1e-5) - 1)).toBeLessThan(1e-13);
    expect(Math.abs(shearDrivenGrooveFlux(1, 1e-5) / grooveDuctDefiningSeries.shearDrivenFlux(1, 1e-5) - 1)).toBeLessThan(1e-13);
  });
  it('each function is continuous where it switches form (d/w = ½, 1/√8, 1/√2): relative jump below 1e-14', () => {
    const jump = (f: (w: number, d: number) => number, r: number) => Math.abs(f(1, r * (1 + 1e-15)) / f(1, r * (1 - 1e-15)) - 1);
    expect(jump(grooveLidVelocityMean, 0.5)).toBeLessThan(1e-14);
    expect(jump(grooveLidVelocityCentre, Math.SQRT1_2 / 2)).toBeLessThan(1e-14);
    expect(jump(shearDrivenGrooveFlux, Math.SQRT1_2)).toBeLessThan(1e-14);
  });
  it('the Dirichlet beta constants used by the fast forms: β(2) = Catalan = 0.915965594177219, β(4) = 0.98894455174110533 (OEIS A006752, A175572; alternating sums here)', () => {
    // Σ_{k<K} (−1)^k/(2k+1)^p plus half the next term (averaging the alternating partial sums) is within ~1/K^(p+1).
    const beta = (p: number, K: number): number => {
      let sum = 0;
      for (let k = 0; k < K; k++) sum += (k % 2 === 0 ? 1 : -1) / (2 * k + 1) ** p;
      return sum + ((K % 2 === 0 ? 1 : -1) * 0.5) / (2 * K + 1) ** p;
    };
    expect(beta(2, 1e6)).toBeCloseTo(0.915965594177219, 12);
    expect(beta(4, 1e4)).toBeCloseTo(0.9889445517411053, 14);
    // Their use: deep limits of the centre lid velocity and the dual shear flux's shallow correction, w d²/2 (1 − 128 β(4) d/(π⁴ w)).
    const r = 1e-3;
    expect(Math.abs(shearDrivenGrooveFlux(1, r) / (r * r * 0.5) - (1 - (128 * 0.9889445517411053 * r) / Math.PI ** 4))).toBeLessThan(1e-15);
  });
});

describe('rectangular duct f·Re', () => {
  // Exact series summed to 30 digits with mpmath by fixtures/heat/generate_ducts.py.
  const ducts = JSON.parse(readFileSync(new URL('../../../fixtures/heat/ducts.json', import.meta.url), 'utf8')) as {
    ducts: { aspectRatio: number; frictionFactorReynolds: number }[];
  };
  for (const { aspectRatio, frictionFactorReynolds } of ducts.ducts) {
    it(`aspect ${aspectRatio}: f·Re = ${frictionFactorReynolds.toFixed(4)} (exact series, fixtures/heat/ducts.json)`, () => {
      expect(Math.abs(rectangularDuctFrictionReynolds(aspectRatio) / frictionFactorReynolds - 1)).toBeLessThan(1e-9);
    });
  }
  it('parallel plates: f·Re → 24 as α → 0 (exact plane Poiseuille flow); α and 1/α are the same duct', () => {
    expect(rectangularDuctFrictionReynolds(1e-5)).toBeCloseTo(24, 2);
    expect(rectangularDuctFrictionReynolds(4)).toBe(rectangularDuctFrictionReynolds(0.25));
  });
});

describe('impossible input', () => {
  it('non-positive or non-finite dimensions throw DomainError naming the field', () => {
    expect(() => shearDrivenGrooveFlux(0, 1)).toThrow(DomainError);
    expect(() => pressureDrivenGrooveFlux(1, -1)).toThrow(DomainError);
    expect(() => grooveLidVelocityMean(1, Number.NaN)).toThrow(DomainError);
    expect(() => rectangularDuctFrictionReynolds(0)).toThrow(DomainError);
    try {
      grooveLidVelocityCentre(1, 0);
    } catch (e) {
      expect((e as DomainError).field).toBe('grooveDepth');
    }
  });
  it('extreme but meaningful ratios stay finite', () => {
    for (const d of [1e-9, 1e-6, 1e3, 1e6]) {
      for (const f of [shearDrivenGrooveFlux, pressureDrivenGrooveFlux, grooveLidVelocityMean, grooveLidVelocityCentre]) {
        const v = f(1, d);
        expect(Number.isFinite(v) && v > 0).toBe(true);
      }
    }
  });
});
