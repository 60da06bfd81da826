import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { FluidState } from '../../../src/core/fluid.js';
import { DomainError } from '../../../src/core/errors.js';
import { STANDARD_GRAVITY } from '../../../src/core/constants.js';
import { evaluateFlow } from '../../../src/physics/flow/flow.js';
import type { FlowState, Scenario } from '../../../src/physics/scenario.js';
import { evaluateRetention, type RetentionInput } from '../../../src/physics/retention/retention.js';
import { backPressureGradient, maximumCapillaryCurvature } from '../../../src/physics/retention/holding.js';

const reference = JSON.parse(readFileSync(new URL('../../../fixtures/retention/retention_reference.json', import.meta.url), 'utf8')) as {
  example: { retainedLength: number; gradient: number; curvature: number };
};

function fluid(id: string, props: Partial<FluidState>): FluidState {
  return { id, name: id, temperature: 293.15, density: 998, viscosity: 1.0e-3, origins: {}, references: [], warnings: [], ...props };
}
const water = fluid('water', {});
const shearFlow = (tau: number): FlowState => ({ kind: 'wall-shear', wallShearStress: tau, frictionVelocity: Math.sqrt(tau / 998), viscousLength: 1e-3 / 998 / Math.sqrt(tau / 998), regime: 'laminar' });
const channel = (height: number, velocity: number): FlowState => evaluateFlow({ density: 998, viscosity: 1.0e-3 }, { kind: 'channel', height, bulkVelocity: velocity }).result;

function exampleInput(overrides: Partial<RetentionInput> = {}, lubricantViscosity = 0.02): RetentionInput {
  const scenario: Scenario = {
    texture: { grooveWidth: 50e-6, grooveDepth: 20e-6, pitch: 100e-6, flowAngle: 0 },
    lubricant: fluid('oil', { density: 960, viscosity: lubricantViscosity }),
    workingFluid: water,
    flow: shearFlow(1),
    interfacialTension: 0.02,
  };
  return { scenario, contactAngles: { underWorkingFluid: { advancing: 20, receding: 0 } }, grooveLength: 0.05, grooveEnds: 'open', duration: 60, ...overrides };
}

describe('back-pressure gradient G = τ Q̂_s/Q̂_p: series limits (exact)', () => {
  it('shallow groove G → 3τ/(2d) (Couette drag against a half-Poiseuille back-flow)', () => {
    const d = 1e-6;
    expect((backPressureGradient(1e-2, d, 1) * d) / 1).toBeCloseTo(1.5, 3);
  });
  it('deep groove G → τ/d (lid-driven flux w³/12 against the deep-duct back-flow d w³/12)', () => {
    const d = 1e-2;
    expect((backPressureGradient(1e-5, d, 1) * d) / 1).toBeCloseTo(1, 3);
  });
});

describe('capillary back-pressure retained length L∞ = γκ_max/G', () => {
  it('computed example γ = 0.020 N/m, τ = 1 Pa, w = 50 µm, d = 20 µm, θ_R = 0 → L∞ = 10.71 mm (computed from the formula; numpy series in the fixture)', () => {
    const r = evaluateRetention(exampleInput()).result.mechanisms.capillaryBackPressure;
    expect(r.curvatureLimit).toBe('floor-touching');
    expect(r.maximumCurvature).toBeCloseTo(reference.example.curvature, 6);
    expect(r.backPressureGradient / reference.example.gradient).toBeCloseTo(1, 10);
    expect(r.retainedLength / reference.example.retainedLength).toBeCloseTo(1, 10);
    expect(r.retainedLength * 1e3).toBeCloseTo(10.71, 2);
    // Paired with the exact limits: τ/d ≤ G ≤ 3τ/(2d) bounds L∞ between γκd/(1.5τ) and γκd/τ.
    const gammaKappa = 0.02 * r.maximumCurvature;
    expect(r.retainedLength).toBeGreaterThan((gammaKappa * 20e-6) / 1.5);
    expect(r.retainedLength).toBeLessThan(gammaKappa * 20e-6);
  });

  it('curvature limits: receding angle (sag ≤ d), floor-touching arc, none for θ_R ≥ 90° (circle geometry)', () => {
    const w = 50e-6;
    const receding = maximumCapillaryCurvature(w, 20e-6, 60);
    expect(receding.limit).toBe('receding-angle');
    expect(receding.curvature).toBeCloseTo((2 * Math.cos(Math.PI / 3)) / w, 6);
    const floor = maximumCapillaryCurvature(w, 20e-6, 0);
    expect(floor.curvature).toBeCloseTo((8 * 20e-6) / (w * w + 4 * 400e-12), 6);
    expect(maximumCapillaryCurvature(w, 20e-6, 95)).toEqual({ curvature: 0, limit: 'none' });
  });

  it('retained length is independent of the lubricant viscosity; the drainage time scales with it (lumped model, exact)', () => {
    const thin = evaluateRetention(exampleInput({ duration: 30 }, 0.01)).result;
    const thick = evaluateRetention(exampleInput({ duration: 300 }, 0.1)).result;
    expect(thick.retainedLength).toBe(thin.retainedLength);
    expect(thick.criticalPlugLength).toBe(thin.criticalPlugLength);
    expect(thick.timeTo90PercentChange! / thin.timeTo90PercentChange!).toBeCloseTo(10, 1);
  });

  it('the interfacial shear ratio from the slip solution scales L∞ as 1/τ_i (exact, L∞ ∝ 1/G ∝ 1/τ_i)', () => {
    const full = evaluateRetention(exampleInput()).result;
    const half = evaluateRetention(exampleInput({ interfacialShearRatio: 0.5 })).result;
    expect(half.mechanisms.capillaryBackPressure.retainedLength / full.mechanisms.capillaryBackPressure.retainedLength).toBeCloseTo(2, 12);
    expect(half.interfacialShearStress).toEqual({ value: 0.5, source: 'slip-solution' });
    expect(full.interfacialShearStress.source).toBe('smooth-wall-assumed');
  });
});

describe('contact-line pinning L_c = kγ(cos θ_R − cos θ_A)(w + 2d)/(G w d)', () => {
  const pinned = (w: number, d: number) =>
    evaluateRetention({
      ...exampleInput(),
      scenario: { ...exampleInput().scenario, texture: { grooveWidth: w, grooveDepth: d, pitch: 2 * w, flowAngle: 0 } },
      contactAngles: { underWorkingFluid: { advancing: 150, receding: 100 } },
    }).result.mechanisms.contactLinePinning;
  it('shallow limit: back-flow makes L_c 2/3 of the naive force balance (exact limit, G d/τ → 3/2)', () => {
    const p = pinned(1e-3, 1e-6);
    expect(p.criticalPlugLength / p.forceBalancePlugLength).toBeCloseTo(2 / 3, 3);
  });
  it('deep limit: the two agree (G d/τ → 1)', () => {
    const p = pinned(1e-6, 1e-2); // d/w = 10⁴: the O(w/d) correction is about 3e-5
    expect(p.criticalPlugLength / p.forceBalancePlugLength).toBeCloseTo(1, 3);
  });
  it('pinning pressure follows the Furmidge form (definition, k = 1)', () => {
    const p = pinned(50e-6, 20e-6);
    const dcos = Math.cos((100 * Math.PI) / 180) - Math.cos((150 * Math.PI) / 180);
    expect(p.pinningPressure).toBeCloseTo((0.02 * dcos * 90e-6) / (50e-6 * 20e-6), 8);
    expect(p.shapeFactor).toBe(1);
  });
});

describe('gravity along the groove', () => {
  it('vertical groove without shear: the capillary hold length equals the hydrostatic hold height γκ/(Δρ g) (identity at α = 90°)', () => {
    const input = exampleInput({ inclination: { angle: 90, direction: 'with-flow' } });
    input.scenario = { ...input.scenario, flow: shearFlow(0) };
    const r = evaluateRetention(input).result;
    const g = r.mechanisms.gravity;
    expect(g.bodyForceGradient).toBeCloseTo((960 - 998) * STANDARD_GRAVITY, 10);
    expect(g.capillaryHoldLength).toBeCloseTo(g.hydrostaticHoldHeight!, 12);
    expect(r.dominantDrive).toBe('gravity');
  });
  it('a heavy lubricant drained downhill with the flow keeps less than uphill (sign of the drive)', () => {
    const heavy = (direction: 'with-flow' | 'against-flow') => {
      const input = exampleInput({ inclination: { angle: 30, direction } });
      input.scenario = { ...input.scenario, lubricant: fluid('heavy-oil', { density: 1900, viscosity: 0.02 }) };
      return evaluateRetention(input).result.mechanisms.capillaryBackPressure;
    };
    const down = heavy('with-flow');
    const up = heavy('against-flow');
    expect(down.retainedLengthWithGravity).toBeLessThan(down.retainedLength);
    expect(up.retainedLengthWithGravity).toBeGreaterThan(up.retainedLength);
  });
});

describe('facts of the trade (common practice, no source) on invented but plausible designs', () => {
  it('wetting lubricant, hysteresis 46°, open streamwise grooves, turbulent water at Re ≈ 10⁴: drains almost completely within about 1.5 h', () => {
    // Invented design: 20 × 10 µm grooves, 0.3 m long, 100 cSt silicone-like oil, γ = 35 mN/m, 10 mm channel at 1 m/s.
    const flow = channel(0.01, 1);
    expect(flow.reynoldsNumber!).toBeGreaterThan(9000);
    expect(flow.reynoldsNumber!).toBeLessThan(11000);
    const r = evaluateRetention({
      scenario: {
        texture: { grooveWidth: 20e-6, grooveDepth: 10e-6, pitch: 40e-6, flowAngle: 0 },
        lubricant: fluid('silicone-like-oil', { density: 965, viscosity: 0.0965 }),
        workingFluid: water,
        flow,
        interfacialTension: 0.035,
      },
      contactAngles: { underWorkingFluid: { advancing: 46, receding: 0 } },
      grooveLength: 0.3,
      grooveEnds: 'open',
      duration: 3 * 3600,
    });
    const res = r.result;
    expect(res.bindingMechanism).toBe('capillary-back-pressure');
    expect(res.verdict.passes).toBe(false);
    expect(res.finalRetainedFraction).toBeLessThan(0.1);
    // Measured 1.07 h; "about 1.5 h" taken as the order of magnitude 0.3–5 h.
    expect(res.timeTo90PercentChange! / 3600).toBeGreaterThan(0.3);
    expect(res.timeTo90PercentChange! / 3600).toBeLessThan(5);
    expect(res.conservationError!).toBeLessThan(1e-10);
    expect(res.timeline.length).toBeLessThanOrEqual(200);
    expect(r.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['creep-near-retained-length', 'flat-sample-hysteresis']));
  });

  it('partially wetting lubricant (angle above 90°), hysteresis 122°: keeps about half as millimetre-long pinned plugs of the critical length', () => {
    // Invented design: 100 × 50 µm grooves, 5 mm sample, γ = 35 mN/m, 3 mm channel at 3.33 m/s (Re ≈ 10⁴).
    const flow = channel(0.003, 3.33);
    const r = evaluateRetention({
      scenario: {
        texture: { grooveWidth: 100e-6, grooveDepth: 50e-6, pitch: 200e-6, flowAngle: 0 },
        lubricant: fluid('partially-wetting-oil', { density: 900, viscosity: 0.05 }),
        workingFluid: water,
        flow,
        interfacialTension: 0.035,
      },
      contactAngles: { underWorkingFluid: { advancing: 170, receding: 48 } },
      grooveLength: 0.005,
      grooveEnds: 'open',
      duration: 3600,
      wettingState: 'not-wetting',
    });
    const res = r.result;
    expect(res.bindingMechanism).toBe('contact-line-pinning');
    // Longest plug = the pinning-versus-shear critical length, millimetre order.
    expect(res.retainedLength).toBe(res.criticalPlugLength);
    expect(res.criticalPlugLength).toBeGreaterThan(0.5e-3);
    expect(res.criticalPlugLength).toBeLessThan(5e-3);
    expect(res.retainedFraction).toBeGreaterThan(0.25);
    expect(res.retainedFraction).toBeLessThan(0.75);
    expect(res.finalRetainedFraction).toBeCloseTo(res.retainedFraction, 3);
    expect(r.warnings.some((w) => w.code === 'not-wetting-relies-on-pinning')).toBe(true);
  });
});

describe('steady share and timeline end never contradict each other silently', () => {
  it('a timeline cut short (1 s of a viscous lubricant) ends far above the steady share and a warning says it is still draining', () => {
    const r = evaluateRetention(exampleInput({ duration: 1 }, 1.0));
    expect(r.result.finalRetainedFraction - r.result.retainedFraction).toBeGreaterThan(0.02);
    const warning = r.warnings.find((w) => w.code === 'timeline-differs-from-steady-state');
    expect(warning?.message).toMatch(/still changing/);
  });
  it('a timeline long enough to settle agrees with the steady share within 2 % of the groove volume and carries no such warning', () => {
    const r = evaluateRetention(exampleInput({ duration: 7200 }));
    expect(Math.abs(r.result.finalRetainedFraction - r.result.retainedFraction)).toBeLessThan(0.02);
    expect(r.warnings.map((w) => w.code)).not.toContain('timeline-differs-from-steady-state');
  });
});

describe('recommendations and bad input', () => {
  it('barriers at the recommended spacing keep the target fill (consistency of the closed forms)', () => {
    const long = evaluateRetention(exampleInput({ grooveLength: 0.1, duration: 10 })).result;
    expect(long.verdict.passes).toBe(false);
    const spacing = long.recommendations.maxSegmentLength;
    // The steady column of one open segment keeps just 90 % at that length (bisection target).
    const share = (length: number) => evaluateRetention(exampleInput({ grooveLength: length, duration: 1 })).result.retainedFraction;
    expect(share(spacing * 0.99)).toBeGreaterThanOrEqual(0.9);
    expect(share(spacing * 1.01)).toBeLessThan(0.9);
    // Below the full-section estimate L∞/0.9 because the sagging meniscus holds less per length.
    expect(spacing).toBeLessThan(long.retainedLength / 0.9);
    const cut = evaluateRetention(exampleInput({ grooveLength: 0.1, segmentLength: spacing * 0.999, duration: 10 })).result;
    expect(cut.retainedFraction).toBeGreaterThanOrEqual(0.9);
    expect(cut.verdict.passes).toBe(true);
    // Shallow-groove scaling L∞ ∝ γκ d/τ with the floor-touching κ: deeper and narrower help here.
    expect(long.recommendations.depth).toBe('deeper');
    expect(long.recommendations.width).toBe('narrower');
  });
  it('impossible input throws DomainError naming the field', () => {
    const noTension = exampleInput();
    noTension.scenario = { ...noTension.scenario, interfacialTension: undefined };
    expect(() => evaluateRetention(noTension)).toThrow(DomainError);
    expect(() => evaluateRetention(exampleInput({ contactAngles: {} }))).toThrow(/angles under the working fluid/);
    expect(() => evaluateRetention(exampleInput({ initialFill: 1.5 }))).toThrow(DomainError);
    expect(() => evaluateRetention(exampleInput({ grooveLength: undefined }))).toThrow(DomainError);
  });
});
