import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY } from '../../../src/core/constants.js';
import {
  confinedCriticalVelocityDifference,
  criticalVelocityDifference,
  fastestGrowingMode,
  interfaceGrowthRate,
  slowestWaveSpeed,
  type TwoLayerInterface,
} from '../../../src/physics/waves/dispersion.js';

// Layers: a hexadecane-like oil (ρ = 773 kg/m³, γ_ow = 0.053 N/m, round values near the catalogue's n-hexadecane) under water at 20 °C (ρ = 998.2 kg/m³) — inputs, not check values.
function deepLayers(overrides: Partial<TwoLayerInterface>): TwoLayerInterface {
  return {
    wallSideDensity: 773,
    outerDensity: 998.2,
    wallSideVelocity: 0,
    outerVelocity: 0,
    interfacialTension: 0.053,
    normalGravity: 0,
    spanwiseWavenumber: 0,
    ...overrides,
  };
}

describe('confined Kelvin–Helmholtz closed form (derived in the doc comment)', () => {
  const w = 50e-6;
  const layers = deepLayers({ spanwiseWavenumber: Math.PI / w });

  it('matches brute-force minimisation of the dispersion relation over k', () => {
    // Brute force: for each k on a dense grid, bisect on ΔU for the onset of growth
    // using only interfaceGrowthRate (the dispersion relation), then take the least.
    let best = Infinity;
    let bestK = 0;
    const points = 4001;
    for (let i = 0; i < points; i++) {
      const k = (Math.PI / w) * 10 ** (-1 + (2 * i) / (points - 1));
      let lo = 0;
      let hi = 100;
      for (let j = 0; j < 80; j++) {
        const mid = 0.5 * (lo + hi);
        if (interfaceGrowthRate({ ...layers, outerVelocity: mid }, k) > 0) hi = mid;
        else lo = mid;
      }
      if (hi < best) {
        best = hi;
        bestK = k;
      }
    }
    const closed = confinedCriticalVelocityDifference(773, 998.2, 0.053, w);
    expect(best / closed.velocityDifference - 1).toBeCloseTo(0, 6);
    // k* = √2 π/w to the grid spacing (0.12 % in k)
    expect(Math.abs(bestK / closed.wavenumber - 1)).toBeLessThan(2e-3);
  });

  it('the library minimiser reproduces the closed form to 1e-9 and k* to 1e-4', () => {
    const closed = confinedCriticalVelocityDifference(773, 998.2, 0.053, w);
    const numeric = criticalVelocityDifference(layers);
    expect(numeric.value / closed.velocityDifference - 1).toBeCloseTo(0, 9);
    expect(Math.abs(numeric.wavenumber / (Math.SQRT2 * Math.PI / w) - 1)).toBeLessThan(1e-4);
  });

  it('closed-form value for equal densities ρ: ΔU_c² = (2/ρ)(3√3π/2)γ/w = 3√3πγ/(ρw) (algebra of the formula)', () => {
    const rho = 1000;
    const value = confinedCriticalVelocityDifference(rho, rho, 0.05, 1e-4).velocityDifference;
    expect(value ** 2).toBeCloseTo((3 * Math.sqrt(3) * Math.PI * 0.05) / (rho * 1e-4), 9);
  });
});

describe('unconfined limits (published)', () => {
  it('minimum wind speed for air over water: the published closed form (Lamb 1932 §268; Chandrasekhar 1961 ch. XI), ≈ 6.46 m/s with these inputs', () => {
    // Inputs: air over water at room temperature, ρ_air/ρ_water = 0.00129, γ = 74 mN/m, g = 9.81 m/s².
    const rhoWater = 1000;
    const rhoAir = 1.29;
    const gamma = 0.074;
    const g = 9.81;
    const layers = deepLayers({ wallSideDensity: rhoWater, outerDensity: rhoAir, interfacialTension: gamma, normalGravity: g });
    const numeric = criticalVelocityDifference(layers).value;
    // Published closed form U⁴ = 4gγ(ρ₁+ρ₂)²Δρ/(ρ₁²ρ₂²) (Chandrasekhar 1961 ch. XI; Lamb 1932 §268).
    const closed = ((4 * g * gamma * (rhoWater + rhoAir) ** 2 * (rhoWater - rhoAir)) / (rhoWater ** 2 * rhoAir ** 2)) ** 0.25;
    expect(numeric / closed - 1).toBeCloseTo(0, 9);
    expect(numeric).toBeGreaterThan(6.4);
    expect(numeric).toBeLessThan(6.55);
  });

  it('gravity–capillary minimum phase speed ≈ 23 cm/s at λ ≈ 1.7 cm (Lamb 1932 §267; 23.1 cm/s at 1.73 cm in Encyclopaedia Britannica "capillary wave", as quoted at cnblogs.com/erichf/p/14010544.html)', () => {
    const rhoWater = 998.2;
    const rhoAir = 1.204;
    const gamma = 0.0728;
    const layers = deepLayers({ wallSideDensity: rhoWater, outerDensity: rhoAir, interfacialTension: gamma, normalGravity: STANDARD_GRAVITY });
    const slowest = slowestWaveSpeed(layers);
    // Two deep fluids: c_min⁴ = 4gγΔρ/(ρ₁+ρ₂)², → 4gγ/ρ without air (Lamb 1932 §267).
    const closed = ((4 * STANDARD_GRAVITY * gamma * (rhoWater - rhoAir)) / (rhoWater + rhoAir) ** 2) ** 0.25;
    expect(slowest.value / closed - 1).toBeCloseTo(0, 9);
    expect(Math.abs(slowest.value - 0.231)).toBeLessThan(0.003);
    const wavelength = (2 * Math.PI) / slowest.wavenumber;
    expect(Math.abs(wavelength - 0.0173)).toBeLessThan(0.0003);
    // Vacuum limit 4gγ/ρ is within 0.15 % (air density ratio 1.2e-3)
    expect(Math.abs(slowest.value / ((4 * STANDARD_GRAVITY * gamma) / rhoWater) ** 0.25 - 1)).toBeLessThan(1.5e-3);
  });
});

describe('finite depths, gravity and confinement against the scipy fixture (fixtures/waves/generate_dispersion.py)', () => {
  type FixtureCase = {
    name: string;
    layers: Omit<TwoLayerInterface, 'outerVelocity' | 'wallSideDepth' | 'outerDepth'> & { wallSideDepth: number | null; outerDepth: number | null };
    velocityDifferenceForSamples: number;
    criticalVelocityDifference: number;
    criticalWavenumber: number;
    slowestWaveSpeed: number;
    slowestWaveWavenumber: number;
    growthSamples: { wavenumber: number; growthRate: number }[];
  };
  const fixture = JSON.parse(readFileSync(new URL('../../../fixtures/waves/dispersion.json', import.meta.url), 'utf8')) as { cases: FixtureCase[] };
  for (const c of fixture.cases) {
    const layers: TwoLayerInterface = {
      ...c.layers,
      wallSideDepth: c.layers.wallSideDepth ?? undefined,
      outerDepth: c.layers.outerDepth ?? undefined,
      outerVelocity: c.layers.wallSideVelocity,
    };
    it(`${c.name}: critical ΔU, slowest wave and growth rates`, () => {
      const critical = criticalVelocityDifference(layers);
      expect(critical.value / c.criticalVelocityDifference - 1).toBeCloseTo(0, 7);
      expect(Math.abs(critical.wavenumber / c.criticalWavenumber - 1)).toBeLessThan(1e-3);
      const slowest = slowestWaveSpeed(layers);
      expect(slowest.value / c.slowestWaveSpeed - 1).toBeCloseTo(0, 7);
      const moving = { ...layers, outerVelocity: layers.wallSideVelocity + c.velocityDifferenceForSamples };
      for (const sample of c.growthSamples) {
        const sigma = interfaceGrowthRate(moving, sample.wavenumber);
        if (sample.growthRate === 0) expect(sigma).toBe(0);
        else expect(sigma / sample.growthRate - 1).toBeCloseTo(0, 7);
      }
    });
  }
});

describe('stability without a velocity difference', () => {
  it('a confined interface at rest has no growing mode (σ² = −K R/(a₁ + a₂) < 0 for every k when R > 0)', () => {
    const rest = deepLayers({ spanwiseWavenumber: 1 });
    expect(fastestGrowingMode(rest)).toEqual({ wavenumber: 0, value: 0 });
    for (const k of [1e-3, 1, 1e3]) expect(interfaceGrowthRate(rest, k)).toBe(0);
  });
});
