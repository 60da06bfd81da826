import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/core/errors.js';
import { STANDARD_GRAVITY } from '../../../src/core/constants.js';
import { evaluateFlow } from '../../../src/physics/flow/flow.js';
import type { FlowState, Scenario } from '../../../src/physics/scenario.js';
import type { FluidState } from '../../../src/core/fluid.js';
import { evaluateWaves, waveRoughnessWarning, wavesVerdict, WAVY_INTERFACE_WARNING_CODE, type WavesInput } from '../../../src/physics/waves/waves.js';
import type { WaveRegime } from '../../../src/physics/waves/criteria.js';
import { velocityPlusAtWallDistance } from '../../../src/physics/flow/wall-profile.js';

// Fluids: water at 20 °C (ρ = 998.2 kg/m³, μ = 1.002 mPa·s; IAPWS values, common practice),
// a hexadecane-like oil (ρ = 773 kg/m³, γ_ow = 0.053 N/m, round values near the catalogue's n-hexadecane) — inputs, not check values.
function fluid(name: string, density: number, viscosity: number): FluidState {
  return { id: 'custom', name, temperature: 293.15, density, viscosity, origins: {}, references: [], warnings: [] };
}
const water = fluid('water', 998.2, 1.002e-3);
const hexadecane = fluid('n-hexadecane', 773, 3.34e-3);

function wallShearFlow(wallShearStress: number, regime: FlowState['regime'] = 'turbulent'): FlowState {
  const frictionVelocity = Math.sqrt(wallShearStress / water.density);
  return {
    kind: 'wall-shear',
    wallShearStress,
    frictionVelocity,
    viscousLength: water.viscosity / water.density / frictionVelocity,
    regime,
  };
}

function design(options: { grooveWidth?: number; interfacialTension?: number; flow?: FlowState; lubricant?: FluidState } = {}): Scenario {
  const grooveWidth = options.grooveWidth ?? 30e-6;
  return {
    texture: { grooveWidth, pitch: 2 * grooveWidth, grooveDepth: grooveWidth, flowAngle: 0 },
    lubricant: options.lubricant ?? hexadecane,
    workingFluid: water,
    flow: options.flow ?? wallShearFlow(3.65),
    interfacialTension: options.interfacialTension ?? 0.053,
  };
}

const REGIME_RANK: Record<WaveRegime, number> = { calm: 0, marginal: 1, wavy: 2 };

function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

describe('Rayleigh–Taylor limit of the pinned interface (capillary cut-off k_c = √(Δρg/γ), Chandrasekhar 1961 ch. X)', () => {
  const dense = fluid('perfluoropolyether (demo)', 1900, 0.1);
  const gamma = 0.05;
  const limit = Math.PI * Math.sqrt(gamma / ((1900 - 998.2) * STANDARD_GRAVITY));

  it('stable just below w = π/k_c, unstable (wavy, no velocity needed) just above, on a downward-facing wall', () => {
    const below = evaluateWaves({
      scenario: design({ grooveWidth: 0.98 * limit, interfacialTension: gamma, lubricant: dense, flow: wallShearFlow(1e-4) }),
      gravity: { inclination: 0, facing: 'down' },
      mapResolution: 4,
    }).result;
    expect(below.staticChecks.rayleighTaylor.destabilising).toBe(true);
    expect(below.staticChecks.rayleighTaylor.stable).toBe(true);
    expect(below.kelvinHelmholtz.criticalVelocityDifference).toBeGreaterThan(0);
    expect(below.staticChecks.rayleighTaylor.maxGrooveWidth! / limit - 1).toBeCloseTo(0, 12);

    const above = evaluateWaves({
      scenario: design({ grooveWidth: 1.02 * limit, interfacialTension: gamma, lubricant: dense, flow: wallShearFlow(1e-4) }),
      gravity: { inclination: 0, facing: 'down' },
      mapResolution: 4,
    });
    expect(above.result.staticChecks.rayleighTaylor.stable).toBe(false);
    expect(above.result.kelvinHelmholtz.criticalVelocityDifference).toBe(0);
    expect(above.result.regime).toBe('wavy');
    expect(above.warnings.map((x) => x.code)).toContain('rayleigh-taylor-unstable');
  });

  it('the same groove facing up is stabilised by gravity', () => {
    const up = evaluateWaves({
      scenario: design({ grooveWidth: 1.5 * limit, interfacialTension: gamma, lubricant: dense, flow: wallShearFlow(1e-4) }),
      gravity: { inclination: 0, facing: 'up' },
      mapResolution: 4,
    }).result;
    expect(up.staticChecks.rayleighTaylor.destabilising).toBe(false);
    expect(up.loadRatios['rayleigh-taylor']).toBe(0);
  });
});

describe('evaluateWaves: scaling, trends and the regime boundary', () => {
  it('the calm/wavy boundary has slope −1/3 in log(w⁺) against log(We_τ) (common practice, no source)', () => {
    const { map } = evaluateWaves({ scenario: design(), mapResolution: 16 }).result;
    const points = map.frictionCapillaryNumbers
      .map((weT, i) => [Math.log(weT), map.boundaryGrooveWidthPlus[i]] as const)
      .filter((p): p is readonly [number, number] => p[1] !== null);
    expect(points.length).toBeGreaterThan(10);
    for (let i = 1; i < points.length; i++) {
      const slope = (Math.log(points[i][1]) - Math.log(points[i - 1][1])) / (points[i][0] - points[i - 1][0]);
      expect(slope).toBeCloseTo(-1 / 3, 6);
    }
    // on the boundary, Λ = w⁺ We_τ^(1/3) = 1
    expect(points[0][1] * Math.cbrt(Math.exp(points[0][0]))).toBeCloseTo(1, 9);
  });

  it('the reported widest calm groove follows w⁺ = 2^(−1/12) We_τ^(−1/3) as the tension changes (calm band edge Π = 2^(−1/4) of criteria.ts, Λ³ = Π)', () => {
    const tensions = [0.06, 0.03, 0.01, 0.004];
    const limits = tensions.map((gamma) => evaluateWaves({ scenario: design({ interfacialTension: gamma }), mapResolution: 2 }).result);
    for (const r of limits) {
      expect(r.designLimits.maxGrooveWidthPlus! / (2 ** (-1 / 12) * r.scaling.frictionCapillaryNumber ** (-1 / 3)) - 1).toBeCloseTo(0, 8);
    }
    const slope =
      Math.log(limits[3].designLimits.maxGrooveWidthPlus! / limits[0].designLimits.maxGrooveWidthPlus!) /
      Math.log(limits[3].scaling.frictionCapillaryNumber / limits[0].scaling.frictionCapillaryNumber);
    expect(slope).toBeCloseTo(-1 / 3, 8);
  });

  it('wider grooves move towards wavy, narrower towards calm (monotonic Λ and regime)', () => {
    // Λ = w⁺ We_τ^(1/3) is linear in w at fixed flow and tension (definition): one width on the trade boundary Λ = 1,
    // inside the marginal band.
    const lambdaAt60 = evaluateWaves({ scenario: design({ grooveWidth: 60e-6 }), mapResolution: 2 }).result.scaling.inertialCapillaryNumber;
    const widths = [5e-6, 20e-6, 60e-6, 120e-6, 200e-6, 400e-6, 1e-3, 60e-6 / lambdaAt60].sort((x, y) => x - y);
    const results = widths.map((w) => evaluateWaves({ scenario: design({ grooveWidth: w }), mapResolution: 2 }).result);
    for (let i = 1; i < results.length; i++) {
      expect(results[i].scaling.inertialCapillaryNumber).toBeGreaterThan(results[i - 1].scaling.inertialCapillaryNumber);
      expect(REGIME_RANK[results[i].regime]).toBeGreaterThanOrEqual(REGIME_RANK[results[i - 1].regime]);
      expect(results[i].verdict.margin).toBeLessThan(results[i - 1].verdict.margin);
    }
    expect(results[0].regime).toBe('calm');
    expect(results.at(-1)!.regime).toBe('wavy');
    expect(results.map((r) => r.regime)).toContain('marginal');
  });

  it('lower interfacial tension moves towards wavy, higher towards calm', () => {
    const tensions = [0.07, 0.03, 0.01, 3e-3, 1e-3, 3e-4, 1e-4];
    const results = tensions.map((gamma) => evaluateWaves({ scenario: design({ grooveWidth: 60e-6, interfacialTension: gamma }), mapResolution: 2 }).result);
    for (let i = 1; i < results.length; i++) {
      expect(results[i].scaling.inertialCapillaryNumber).toBeGreaterThan(results[i - 1].scaling.inertialCapillaryNumber);
      expect(REGIME_RANK[results[i].regime]).toBeGreaterThanOrEqual(REGIME_RANK[results[i - 1].regime]);
    }
    expect(results[0].regime).toBe('calm');
    expect(results.at(-1)!.regime).toBe('wavy');
    // the lowest calm tension reported at the first design lies where Λ = 2^(−1/12)
    const minimum = results[0].designLimits.minInterfacialTension!;
    const atMinimum = evaluateWaves({ scenario: design({ grooveWidth: 60e-6, interfacialTension: minimum }), mapResolution: 2 }).result;
    expect(atMinimum.scaling.inertialCapillaryNumber).toBeCloseTo(2 ** (-1 / 12), 8);
  });

  // Convention chosen (see test/api/routes/assess.test.ts): bulk Reynolds number U_b h/ν and Weber number ρU_b²h/γ both
  // on the half-height h, the length of Kim, Moin & Moser's channel (1987, J. Fluid Mech. 177, 133; abstract: Reynolds
  // number 3300 on the centreline velocity and the half-width).
  it('channel at U_b h/ν ≈ 3000 (half-height h): doubling the bulk Weber number ρU_b²h/γ (halving γ) raises Λ by 2^(1/3) and doubles every load ratio (definitions: each ratio ∝ 1/γ without gravity)', () => {
    const flow = evaluateFlow({ density: water.density, viscosity: water.viscosity }, { kind: 'channel', height: 6.02e-3, bulkVelocity: 1 }).result;
    expect(Math.abs(flow.reynoldsNumber! / 2 - 3000)).toBeLessThan(10);
    // γ = ρU_b²h/We with U_b = 1 m/s and h = 3.01 mm
    const tensionAt = (weber: number) => (water.density * 3.01e-3) / weber;
    const base = evaluateWaves({ scenario: design({ flow, grooveWidth: 140e-6, interfacialTension: tensionAt(100) }), mapResolution: 2 }).result;
    const doubled = evaluateWaves({ scenario: design({ flow, grooveWidth: 140e-6, interfacialTension: tensionAt(200) }), mapResolution: 2 }).result;
    expect(doubled.scaling.bulkWeberNumber! / base.scaling.bulkWeberNumber!).toBeCloseTo(2, 12);
    expect(doubled.scaling.inertialCapillaryNumber / base.scaling.inertialCapillaryNumber).toBeCloseTo(2 ** (1 / 3), 12);
    for (const key of ['inertial-capillary', 'kelvin-helmholtz', 'depinning'] as const) {
      expect(base.loadRatios[key]).toBeGreaterThan(0);
      expect(doubled.loadRatios[key] / base.loadRatios[key]).toBeCloseTo(2, 6);
    }
  });

  it('one doubling of the Weber number never moves a design towards calm, and carries one from inside the calm band to wavy: the marginal band spans a factor √2 in Λ³, less than the doubling (bands of criteria.ts; calm at We = 100 turning wavy at We = 200, common practice, no source)', () => {
    const flow = evaluateFlow({ density: water.density, viscosity: water.viscosity }, { kind: 'channel', height: 6.02e-3, bulkVelocity: 1 }).result;
    const seen = new Set<string>();
    for (const grooveWidth of [20e-6, 60e-6, 100e-6, 140e-6, 200e-6, 400e-6]) {
      for (const gamma of [0.1, 0.03, 0.01, 3e-3]) {
        const at = (tension: number) => evaluateWaves({ scenario: design({ flow, grooveWidth, interfacialTension: tension }), mapResolution: 2 }).result.regime;
        const before = at(gamma);
        const after = at(gamma / 2);
        seen.add(`${before}->${after}`);
        expect(REGIME_RANK[after]).toBeGreaterThanOrEqual(REGIME_RANK[before]);
      }
    }
    expect(seen).toContain('calm->calm');
    // Λ³ = 0.8 (inside the calm band, under 2^(−1/4) ≈ 0.841) becomes 1.6 (over the wavy edge 2^(1/4) ≈ 1.189); the
    // width is scaled from a reference width, Λ being linear in w at fixed flow and tension (definition).
    const gamma = 0.01;
    const reference = evaluateWaves({ scenario: design({ flow, grooveWidth: 60e-6, interfacialTension: gamma }), mapResolution: 2 }).result;
    const grooveWidth = (60e-6 * Math.cbrt(0.8)) / reference.scaling.inertialCapillaryNumber;
    const before = evaluateWaves({ scenario: design({ flow, grooveWidth, interfacialTension: gamma }), mapResolution: 2 }).result;
    const after = evaluateWaves({ scenario: design({ flow, grooveWidth, interfacialTension: gamma / 2 }), mapResolution: 2 }).result;
    expect(before.scaling.inertialCapillaryNumber ** 3).toBeCloseTo(0.8, 10);
    expect(before.regime).toBe('calm');
    expect(after.regime).toBe('wavy');
  });

  it('wall-unit numbers follow their definitions: We_τ = μu_τ/γ = ρu_τ²ℓ_ν/γ, We_f = w⁺ We_τ, Λ³ = w⁺³ We_τ (algebraic identities)', () => {
    const r = evaluateWaves({ scenario: design(), mapResolution: 2 }).result.scaling;
    const uTau = Math.sqrt(3.65 / water.density);
    expect(r.frictionCapillaryNumber).toBeCloseTo((water.viscosity * uTau) / 0.053, 15);
    expect(r.frictionCapillaryNumber / ((water.density * uTau ** 2 * r.viscousLength) / 0.053)).toBeCloseTo(1, 12);
    expect(r.frictionWeberNumber / (r.grooveWidthPlus * r.frictionCapillaryNumber)).toBeCloseTo(1, 12);
    expect(r.inertialCapillaryNumber ** 3 / (r.grooveWidthPlus ** 3 * r.frictionCapillaryNumber)).toBeCloseTo(1, 12);
  });
});

describe('evaluateWaves: bands, verdict and margin agree with their documentation (src/physics/waves/criteria.ts)', () => {
  const lambdaAt = (grooveWidth: number) => evaluateWaves({ scenario: design({ grooveWidth }), mapResolution: 2 }).result;
  const base = lambdaAt(30e-6);
  // Λ = w⁺ We_τ^(1/3) is linear in w at fixed flow and tension (definition), so this width puts Λ at 0.997.
  const width = (30e-6 * 0.997) / base.scaling.inertialCapillaryNumber;
  it('Λ = 0.997, just under the trade boundary Λ = 1, is marginal, not calm; margin = 1 − 2^(1/4)Λ³ ≈ −0.178 (band edge Λ = 2^(−1/12) ≈ 0.944, Π = 2^(−1/4) ≈ 0.841)', () => {
    const r = lambdaAt(width);
    expect(r.scaling.inertialCapillaryNumber).toBeCloseTo(0.997, 10);
    expect(r.governingCriterion).toBe('inertial-capillary');
    expect(r.regime).toBe('marginal');
    expect(r.verdict.passes).toBe(false);
    expect(r.verdict.margin).toBeCloseTo(1 - 2 ** 0.25 * 0.997 ** 3, 10);
    expect(r.verdict.criterion).toContain('0.841');
    expect(r.verdict.criterion).toContain('0.944');
  });
  it('the margin is 1 − Π_max/2^(−1/4) over the reported load ratios, and passes exactly when it is positive', () => {
    for (const w of [10e-6, 30e-6, 100e-6, width, 300e-6]) {
      const r = lambdaAt(w);
      expect(r.verdict.margin).toBeCloseTo(1 - Math.max(...Object.values(r.loadRatios)) / 2 ** -0.25, 12);
      expect(r.verdict.passes).toBe(r.verdict.margin > 0);
    }
  });
});

describe('evaluateWaves: design outputs', () => {
  const example = JSON.parse(readFileSync(new URL('./waves-demo-input.json', import.meta.url), 'utf8')) as WavesInput;
  const worked = evaluateWaves(example);

  it('worked example (demo): every number finite, map contains the design point, curve has 121 points', () => {
    expect(allFinite(worked.result)).toBe(true);
    const { map } = worked.result;
    expect(map.regimes.length).toBe(24);
    expect(map.regimes[0].length).toBe(24);
    expect(map.designPoint.frictionCapillaryNumber).toBeGreaterThanOrEqual(map.frictionCapillaryNumbers[0]);
    expect(map.designPoint.frictionCapillaryNumber).toBeLessThanOrEqual(map.frictionCapillaryNumbers.at(-1)!);
    expect(map.designPoint.grooveWidthPlus).toBeGreaterThanOrEqual(map.grooveWidthsPlus[0]);
    expect(worked.result.kelvinHelmholtz.growthRateCurve.length).toBe(121);
  });

  it('map cells follow the Λ bands where the scaling criterion governs (2^(−1/12) and 2^(1/12) band edges)', () => {
    const { map } = worked.result;
    let checked = 0;
    map.grooveWidthsPlus.forEach((wPlus, row) => {
      map.frictionCapillaryNumbers.forEach((weT, column) => {
        const lambda = wPlus * Math.cbrt(weT);
        // depinning load 1.7 w⁺ We_τ stays below ½ in these cells, so Λ decides
        if (1.7 * wPlus * weT > 0.25) return;
        if (lambda < 0.99 * 2 ** (-1 / 12)) expect(map.regimes[row][column]).toBe('calm');
        else if (lambda > 1.01 * 2 ** (1 / 12)) expect(map.regimes[row][column]).toBe('wavy');
        else if (lambda > 1.01 * 2 ** (-1 / 12) && lambda < 0.99 * 2 ** (1 / 12)) expect(map.regimes[row][column]).toBe('marginal');
        checked++;
      });
    });
    expect(checked).toBeGreaterThan(400);
  });

  it('the neutral curve of the growth-rate plot has its least value at the critical ΔU', () => {
    const kh = worked.result.kelvinHelmholtz;
    const least = Math.min(...kh.growthRateCurve.map((p) => p.neutralVelocityDifference));
    expect(least).toBeGreaterThanOrEqual(kh.criticalVelocityDifference * (1 - 1e-12));
    expect(least / kh.criticalVelocityDifference - 1).toBeLessThan(2e-3); // curve spacing 6 % in k around a quadratic minimum
  });

  it('depinning: the p′_rms band of waves/criteria.ts (2.5–3.4 τ_w; its source is unconfirmed, see farabeeCasarella1991) against 2γ/w, warning once exceeded', () => {
    const checks = worked.result.staticChecks;
    expect(checks.wallPressureFluctuationLow / (2.5 * 3.65)).toBeCloseTo(1, 2);
    expect(checks.wallPressureFluctuationHigh / (3.4 * 3.65)).toBeCloseTo(1, 2);
    expect(checks.depinningPressure).toBeCloseTo((2 * 0.053) / 30e-6, 6);
    // 1 mm groove, γ = 1 mN/m, τ_w = 10 Pa: 3.4·10 Pa > 2·1e-3/1e-3 = 2 Pa
    const out = evaluateWaves({ scenario: design({ grooveWidth: 1e-3, interfacialTension: 1e-3, flow: wallShearFlow(10) }), mapResolution: 2 });
    expect(out.result.staticChecks.depinningRatio).toBeGreaterThan(1);
    expect(out.warnings.map((w) => w.code)).toContain('depinning-by-pressure-fluctuations');
  });

  it('the closed form and the finite-depth critical ΔU agree for a groove as deep as wide (coth(√3π) − 1 ≈ 4e-5)', () => {
    const kh = worked.result.kelvinHelmholtz;
    expect(Math.abs(kh.criticalVelocityDifference / kh.deepLayerCriticalVelocityDifference - 1)).toBeLessThan(1e-4);
  });

  it('the design limits are where the margin crosses zero', () => {
    const limits = worked.result.designLimits;
    const atWidth = evaluateWaves({
      ...example,
      scenario: { ...example.scenario, texture: { ...example.scenario.texture, grooveWidth: limits.maxGrooveWidth! } },
      mapResolution: 2,
    }).result;
    expect(atWidth.verdict.margin).toBeCloseTo(0, 8);
    const flowAtLimit: FlowState = { ...example.scenario.flow, frictionVelocity: limits.maxFrictionVelocity! };
    const atVelocity = evaluateWaves({ ...example, scenario: { ...example.scenario, flow: flowAtLimit }, mapResolution: 2 }).result;
    expect(atVelocity.verdict.margin).toBeCloseTo(0, 8);
  });

  it('a wide groove at high shear is wavy, carries the drag warning, and its growth is positive at the most unstable wavelength', () => {
    const out = evaluateWaves({ scenario: design({ grooveWidth: 2e-3, interfacialTension: 2e-3, flow: wallShearFlow(40) }), mapResolution: 2 });
    expect(out.result.regime).toBe('wavy');
    expect(out.warnings.map((w) => w.code)).toContain(WAVY_INTERFACE_WARNING_CODE);
    expect(waveRoughnessWarning('calm')).toBeNull();
    const kh = out.result.kelvinHelmholtz;
    expect(kh.velocityDifferenceImposed).toBeGreaterThan(kh.criticalVelocityDifference);
    expect(kh.maxGrowthRate).toBeGreaterThan(0);
    const peak = (2 * Math.PI) / kh.mostUnstableWavelength!;
    for (const point of kh.growthRateCurve) expect(point.growthRate).toBeLessThanOrEqual(kh.maxGrowthRate * (1 + 1e-9));
    expect(peak).toBeGreaterThan(0);
  });

  it('critical-layer screen: a soft wide interface has its critical height above the sublayer, consistent with the wall law', () => {
    const out = evaluateWaves({ scenario: design({ grooveWidth: 0.93e-3, interfacialTension: 0.05, flow: wallShearFlow(3.65) }), mapResolution: 2 });
    const layer = out.result.criticalLayer;
    expect(layer.exists).toBe(true);
    expect(layer.criticalHeightPlus!).toBeGreaterThan(5);
    expect(velocityPlusAtWallDistance(layer.criticalHeightPlus!)).toBeCloseTo(out.result.kelvinHelmholtz.slowestWaveSpeedPlus, 9);
    expect(out.warnings.map((w) => w.code)).toContain('critical-layer-present');
    // the worked example's stiff 30 µm interface outruns the channel's centreline velocity
    expect(worked.result.criticalLayer.exists).toBe(false);
    expect(worked.result.criticalLayer.criticalHeightPlus).toBeNull();
  });

  it('laminar, plate and pipe flows give finite results with the laminar caution', () => {
    const laminar = evaluateFlow({ density: water.density, viscosity: water.viscosity }, { kind: 'channel', height: 1e-3, bulkVelocity: 0.5 }).result;
    const pipe = evaluateFlow({ density: water.density, viscosity: water.viscosity }, { kind: 'pipe', diameter: 0.05, bulkVelocity: 2 }).result;
    const plate = evaluateFlow({ density: water.density, viscosity: water.viscosity }, { kind: 'plate', freeStreamVelocity: 5, distance: 1 }).result;
    for (const flow of [laminar, pipe, plate]) {
      const out = evaluateWaves({ scenario: design({ flow }), gravity: { inclination: 90, facing: 'vertical' }, slipLengthLongitudinal: 2e-6, mapResolution: 3 });
      expect(allFinite(out.result)).toBe(true);
    }
    const lam = evaluateWaves({ scenario: design({ flow: laminar }), mapResolution: 2 });
    expect(lam.warnings.map((w) => w.code)).toContain('laminar-flow-wave-scaling');
    expect(lam.result.staticChecks.wallPressureFluctuationHigh).toBe(0);
  });

  it('extreme but meaningful inputs (τ_w 1e-12–1e8 Pa, w 1 nm–1 m, γ 1 µN/m–10 N/m, every facing) give finite numbers, never a throw', () => {
    const dense = fluid('dense lubricant', 1900, 0.1);
    for (const tau of [1e-12, 1, 1e8]) {
      for (const w of [1e-9, 1e-4, 1]) {
        for (const gamma of [1e-6, 10]) {
          for (const facing of ['up', 'down', 'vertical'] as const) {
            const out = evaluateWaves({
              scenario: design({ grooveWidth: w, interfacialTension: gamma, lubricant: dense, flow: wallShearFlow(tau) }),
              gravity: { inclination: 30, facing },
              slipLengthLongitudinal: w / 10,
              mapResolution: 2,
            });
            expect(allFinite(out.result)).toBe(true);
          }
        }
      }
    }
  });

  it('missing or impossible input is a DomainError naming the field', () => {
    const noTension: Scenario = { ...design(), interfacialTension: undefined };
    expect(() => evaluateWaves({ scenario: noTension })).toThrowError(DomainError);
    try {
      evaluateWaves({ scenario: noTension });
    } catch (error) {
      expect((error as DomainError).field).toBe('interfacialTension');
    }
    expect(() => evaluateWaves({ scenario: design({ grooveWidth: -1e-6 }) })).toThrowError(/grooveWidth/);
    expect(() => evaluateWaves({ scenario: design(), slipLengthLongitudinal: Number.NaN })).toThrowError(DomainError);
    expect(() => evaluateWaves({ scenario: design(), gravity: { inclination: 0, facing: 'sideways' as 'up' } })).toThrowError(/gravity.facing/);
    const clamped = evaluateWaves({ scenario: design(), mapResolution: 1 });
    expect(clamped.result.map.regimes.length).toBe(2);
    expect(clamped.warnings.map((w) => w.code)).toContain('map-resolution-clamped');
  });
});

describe('wavesVerdict: the verdict alone, for the assessment', () => {
  // Witness: the full evaluation of the same input (same criteria, same notes apart from the design-limit search).
  const dense = fluid('perfluoropolyether (demo)', 1900, 0.1);
  const cases: [string, WavesInput, WaveRegime][] = [
    ['demo input', JSON.parse(readFileSync(new URL('./waves-demo-input.json', import.meta.url), 'utf8')) as WavesInput, 'calm'],
    ['wide grooves, low tension (wavy)', { scenario: design({ grooveWidth: 300e-6, interfacialTension: 1e-3 }), mapResolution: 4 }, 'wavy'],
    ['denser lubricant above (Rayleigh–Taylor)', { scenario: design({ grooveWidth: 10e-3, interfacialTension: 0.05, lubricant: dense, flow: wallShearFlow(1e-4) }), gravity: { inclination: 0, facing: 'down' }, mapResolution: 4 }, 'wavy'],
  ];
  it.each(cases)('%s: regime, margin, governing criterion and warnings equal evaluateWaves’s', (_name, input, regime) => {
    const full = evaluateWaves(input);
    const lean = wavesVerdict(input);
    expect(full.result.regime).toBe(regime);
    expect(lean.result.regime).toBe(full.result.regime);
    expect(lean.result.margin).toBe(full.result.verdict.margin);
    expect(lean.result.governingCriterion).toBe(full.result.governingCriterion);
    const skipped = new Set(['design-limit-not-found', 'map-resolution-clamped']);
    expect(lean.warnings.map((w) => w.code)).toEqual(full.warnings.map((w) => w.code).filter((c) => !skipped.has(c)));
    expect(lean.references.map((r) => r.key)).toEqual(full.references.map((r) => r.key));
  });
});
