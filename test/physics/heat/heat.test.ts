import { describe, expect, it } from 'vitest';
import { nusseltUniformFluxTube, nusseltUniformTemperature } from '../../../src/physics/heat/laminar.js';
import { gnielinskiNusselt } from '../../../src/physics/heat/turbulent.js';
import { type HeatInput, evaluateHeat } from '../../../src/physics/heat/heat.js';
import { DomainError } from '../../../src/core/errors.js';
import type { FluidState } from '../../../src/core/fluid.js';
import type { FlowState } from '../../../src/physics/scenario.js';

function fluid(props: Partial<FluidState>): FluidState {
  return { id: 'custom', name: 'demo', temperature: 293.15, origins: {}, references: [], warnings: [], density: 1000, viscosity: 1e-3, ...props };
}
const water = fluid({ density: 998, viscosity: 1.0e-3, thermalConductivity: 0.6, specificHeat: 4180 });
const conductiveLubricant = fluid({ density: 1100, viscosity: 10e-3, thermalConductivity: 0.4, specificHeat: 1600 });
function laminarChannel(height: number, bulkVelocity: number): FlowState {
  const tau = (6 * 1e-3 * bulkVelocity) / height;
  const ut = Math.sqrt(tau / 998);
  return {
    kind: 'channel',
    wallShearStress: tau,
    frictionVelocity: ut,
    viscousLength: 1e-3 / 998 / ut,
    bulkVelocity,
    reynoldsNumber: (bulkVelocity * height * 998) / 1e-3,
    regime: 'laminar',
    height,
    texturedWalls: 2,
  };
}
function demoInput(overrides: Partial<HeatInput> = {}): HeatInput {
  return {
    scenario: {
      texture: { grooveWidth: 10e-6, pitch: 20e-6, grooveDepth: 10e-6, flowAngle: 0 },
      lubricant: conductiveLubricant,
      workingFluid: water,
      flow: laminarChannel(200e-6, 0.05),
    },
    solid: { thermalConductivity: 0.2, substrateThickness: 20e-6 },
    heating: 'uniform-flux',
    heatedWalls: 'both',
    lubricantMotion: 'co-flowing',
    method: 'closed-form',
    slip: { slipLengthLongitudinal: 1e-6 },
    ...overrides,
  };
}

describe('evaluateHeat', () => {
  it('missing conductivity or heat capacity → DomainError naming the field', () => {
    const input = demoInput();
    const noK = { ...input, scenario: { ...input.scenario, lubricant: { ...conductiveLubricant, thermalConductivity: undefined } } };
    expect(() => evaluateHeat(noK)).toThrow(DomainError);
    try {
      evaluateHeat(noK);
    } catch (e) {
      expect((e as DomainError).field).toBe('scenario.lubricant.thermalConductivity');
    }
    const noC = { ...input, scenario: { ...input.scenario, workingFluid: { ...water, specificHeat: undefined } } };
    expect(() => evaluateHeat(noC)).toThrow(/specificHeat/);
  });
  it('groove wider than the pitch and a plate flow are rejected with DomainError', () => {
    const input = demoInput();
    expect(() => evaluateHeat({ ...input, scenario: { ...input.scenario, texture: { ...input.scenario.texture, grooveWidth: 30e-6 } } })).toThrow(DomainError);
    expect(() => evaluateHeat({ ...input, scenario: { ...input.scenario, flow: { ...input.scenario.flow, kind: 'plate' } } })).toThrow(DomainError);
  });
  it('a smooth-equivalent wall (equal conductivities, no slip) gives ratio 1 exactly (identity)', () => {
    const input = demoInput({ slip: { slipLengthLongitudinal: 0 } });
    const r = evaluateHeat({ ...input, solid: { thermalConductivity: 0.4, substrateThickness: 20e-6 } }).result;
    expect(r.thermalSlipLength).toBe(0);
    expect(r.nusseltRatio).toBe(1);
    expect(r.nusseltSmooth).toBeCloseTo(140 / 17, 12);
  });
  it('conductive lubricant in a low-conductivity solid raises heat transfer by about 20 % (common practice, no source)', () => {
    for (const method of ['closed-form', 'field'] as const) {
      const r = evaluateHeat(demoInput({ method })).result;
      expect(r.nusseltRatio!).toBeGreaterThan(1.1);
      expect(r.nusseltRatio!).toBeLessThan(1.35);
      expect(r.method).toBe(method);
    }
  });
  it('auto takes b_t from the exact thermal core with the closed-form Nu (method exact-core); a closed-form run keeps the textbook b_t', () => {
    const auto = evaluateHeat(demoInput({ method: 'auto' }));
    expect(auto.result.method).toBe('exact-core');
    expect(auto.models).toContain('heat.thermal-slip-exact-core');
    expect(auto.models).not.toContain('heat.cross-section-field');
    expect(auto.result.closedFormError).toBeNull();
    const closed = evaluateHeat(demoInput()).result;
    expect(closed.method).toBe('closed-form');
    expect(closed.thermalSlipLength).toBe(closed.thermalSlipLengthClosedForm);
    expect(auto.result.thermalSlipLengthClosedForm).toBe(closed.thermalSlipLengthClosedForm);
  });
  it('field run reports the closed form’s error against it; closed-form run does not', () => {
    const field = evaluateHeat(demoInput({ method: 'field' })).result;
    expect(field.method).toBe('field');
    expect(field.closedFormError).not.toBeNull();
    expect(field.closedFormError!.nusselt.source).toBe('measured');
    expect(Math.abs(field.closedFormError!.nusselt.value)).toBeLessThan(0.05);
    expect(evaluateHeat(demoInput()).result.closedFormError).toBeNull();
  });
  it('headline q/q₀ = U/U₀, h = Nu k_w/D_h, Re on D_h = 2H, and the smooth pressure gradient 12μU/H² (exact plane Poiseuille)', () => {
    const r = evaluateHeat(demoInput()).result;
    const H = 200e-6;
    expect(r.overallHeatTransferCoefficient / r.overallHeatTransferCoefficientSmooth).toBeCloseTo(r.heatFluxRatio, 12);
    expect(r.heatTransferCoefficient!).toBeCloseTo((r.nusselt! * 0.6) / (2 * H), 8);
    expect(r.heatTransferCoefficientSmooth).toBeCloseTo(((140 / 17) * 0.6) / (2 * H), 8); // Nu₀ = 140/17 (Shah & London 1978)
    expect(r.reynoldsNumber).toBeCloseTo((0.05 * 2 * H * 998) / 1e-3, 8);
    expect(r.pressureGradientSmooth).toBeCloseTo((12 * 1e-3 * 0.05) / H ** 2, 6);
    expect(r.pressureGradient / r.pressureGradientSmooth).toBeCloseTo(r.frictionRatio, 12);
    // With the wall's own resistance in series, the headline moves less than the Nusselt ratio (1/U = R_wall + 1/h).
    expect(Math.abs(r.heatFluxRatio - 1)).toBeLessThan(Math.abs(r.nusseltRatio! - 1));
  });
  it('uniform wall temperature uses the eigenproblem: no slip, no thermal slip → 7.541 (Shah & London 1978)', () => {
    const input = demoInput({ heating: 'uniform-temperature', slip: { slipLengthLongitudinal: 0 } });
    const r = evaluateHeat({ ...input, solid: { thermalConductivity: 0.4, substrateThickness: 0 } }).result;
    expect(r.nusselt!).toBeCloseTo(7.541, 3);
  });
  it('pipe: tube closed form with ratios on R; zero slip → 4.364 (Shah & London 1978), plug-like slip raises Nu toward 8', () => {
    const input = demoInput({ slip: { slipLengthLongitudinal: 0 } });
    const pipe: FlowState = { ...input.scenario.flow, kind: 'pipe', height: undefined, diameter: 400e-6 };
    const equal = { thermalConductivity: 0.4, substrateThickness: 0 };
    const r0 = evaluateHeat({ ...input, solid: equal, scenario: { ...input.scenario, flow: pipe } }).result;
    expect(r0.nusselt!).toBeCloseTo(48 / 11, 10);
    const r1 = evaluateHeat({ ...input, solid: equal, slip: { slipLengthLongitudinal: 50e-6 }, scenario: { ...input.scenario, flow: pipe } }).result;
    expect(r1.nusselt!).toBeCloseTo(nusseltUniformFluxTube(0.25, 0)!, 12);
    expect(r1.frictionRatio).toBeCloseTo(200 / 400, 12); // R/(R + 4b): exact laminar Navier-slip pipe flow at fixed flow rate, Q ∝ R⁴(1 + 4b/R)
  });
  it('turbulent flow: labelled low confidence, smooth Nu from Gnielinski on D_h = 2H', () => {
    const input = demoInput();
    const flow: FlowState = { ...input.scenario.flow, regime: 'turbulent', reynoldsNumber: 5000, viscousLength: 2e-6 };
    const out = evaluateHeat({ ...input, scenario: { ...input.scenario, flow }, slip: { slipLengthLongitudinal: 1e-6, deltaUPlus: 0.5 } });
    expect(out.result.confidence).toBe('low');
    expect(out.warnings.some((w) => w.code === 'turbulent-estimate')).toBe(true);
    expect(out.result.nusseltSmooth).toBeCloseTo(gnielinskiNusselt(1e4, (1e-3 * 4180) / 0.6), 12);
  });
  it('flags a pitch that is not small against the channel and a high groove Péclet number', () => {
    const input = demoInput();
    const coarse = { ...input.scenario, texture: { ...input.scenario.texture, pitch: 40e-6, grooveWidth: 20e-6 }, flow: laminarChannel(200e-6, 5) };
    const out = evaluateHeat({ ...input, scenario: coarse, slip: { slipLengthLongitudinal: 5e-6 } });
    expect(out.warnings.some((w) => w.code === 'pitch-not-small')).toBe(true);
    expect(out.warnings.some((w) => w.code === 'lubricant-advection')).toBe(true);
  });
  it('sensitivity sweep: monotone in lubricant conductivity, best at the upper end, finite everywhere', () => {
    const r = evaluateHeat(demoInput({ sensitivity: { points: 7 } })).result;
    const s = r.sensitivity!;
    expect(s.lubricantConductivity.length).toBe(7);
    for (let i = 1; i < 7; i++) expect(s.heatFluxRatio[i]!).toBeGreaterThan(s.heatFluxRatio[i - 1]!);
    expect(s.bestLubricantConductivity).toBe(s.lubricantConductivity[6]);
    for (const v of s.heatFluxRatio) expect(Number.isFinite(v)).toBe(true);
  });
  it('sweep: the exact core at every point under auto; the field thermal slip up to 25 points under field, closed form (with a notice) beyond', () => {
    const exact = evaluateHeat(demoInput({ method: 'auto', sensitivity: { points: 30 } }));
    expect(exact.result.sensitivity!.thermalSlipMethod).toBe('exact-core');
    expect(exact.warnings.some((w) => w.code === 'sensitivity-closed-form')).toBe(false);
    const short = evaluateHeat(demoInput({ method: 'field', sensitivity: { points: 3 } }));
    expect(short.result.sensitivity!.thermalSlipMethod).toBe('field');
    expect(short.result.sensitivity!.lubricantConductivity[0]).toBeCloseTo(0.1 * 0.2, 12); // 0.1·min(k_w, k_o, k_s)
    const long = evaluateHeat(demoInput({ method: 'field', sensitivity: { points: 30 } }));
    expect(long.result.sensitivity!.thermalSlipMethod).toBe('closed-form');
    expect(long.warnings.some((w) => w.code === 'sensitivity-closed-form')).toBe(true);
    expect(() => evaluateHeat(demoInput({ sensitivity: { points: 1 } }))).toThrow(DomainError);
  });
  it('one heated wall, field method: a very viscous lubricant of the solid’s conductivity behaves as a smooth wall, Nu = 5.385 (Shah & London 1978) within 0.3 %', () => {
    const input = demoInput({ method: 'field', heatedWalls: 'one', slip: { slipLengthLongitudinal: 0 } });
    const stiff = { ...conductiveLubricant, viscosity: 1e3, thermalConductivity: 0.2 };
    const r = evaluateHeat({ ...input, scenario: { ...input.scenario, lubricant: stiff } }).result;
    expect(r.method).toBe('field');
    // identical wall: b_t = 0 up to the linear solver's stopping tolerance (1e-12 relative residual leaves ~1e-9·P of noise)
    expect(Math.abs(r.thermalSlipLength)).toBeLessThan(1e-8 * 20e-6);
    expect(Math.abs(r.nusselt! / (70 / 13) - 1)).toBeLessThan(3e-3);
    expect(Math.abs(r.frictionRatio - 1)).toBeLessThan(1e-3);
  });
  it('uniform wall temperature with slip and thermal slip uses the shooting eigenvalue with b/H and b_t/H (wiring; eigenvalues checked against scipy above)', () => {
    const r = evaluateHeat(demoInput({ heating: 'uniform-temperature' })).result;
    const expected = nusseltUniformTemperature('plates-both', 1e-6 / 200e-6, r.thermalSlipLength / 200e-6).nusselt;
    expect(r.nusselt!).toBeCloseTo(expected, 12);
    expect(r.nusseltSmooth).toBeCloseTo(7.541, 3); // Shah & London (1978)
  });
  it('transitional flow is flagged and labelled low confidence', () => {
    const input = demoInput();
    const flow: FlowState = { ...input.scenario.flow, regime: 'transitional', reynoldsNumber: 3000, viscousLength: 3e-6 };
    const out = evaluateHeat({ ...input, scenario: { ...input.scenario, flow } });
    expect(out.warnings.some((w) => w.code === 'transitional-flow')).toBe(true);
    expect(out.result.confidence).toBe('low');
  });
});
