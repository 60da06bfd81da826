/**
 * The exact cores through the wired path (evaluateSlip, evaluateHeat with their default method): the
 * independent references reach the answers a user gets, not only the core functions.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { FluidState } from '../../../src/core/fluid.js';
import { evaluateFlow } from '../../../src/physics/flow/flow.js';
import { evaluateHeat } from '../../../src/physics/heat/heat.js';
import type { Scenario, Texture } from '../../../src/physics/scenario.js';
import { evaluateSlip } from '../../../src/physics/slip/slip.js';
import { philipSlipLengthLongitudinal, philipSlipLengthTransverse } from '../../../src/physics/slip/stripe-slip.js';
import { longitudinalReferences, thermalReferences } from '../../../fixtures/slip-core/references.js';

const fixture = <T>(path: string): T[] => (JSON.parse(readFileSync(new URL(`../../../fixtures/${path}`, import.meta.url), 'utf8')) as { cases: T[] }).cases;

interface TransverseReference {
  interfaceFraction: number;
  depthOverWidth: number;
  viscosityRatio: number;
  extrapolated: { slipLength: number };
  errorEstimate: { slipLength: number };
}

function fluid(id: string, props: Partial<FluidState>): FluidState {
  return { id, name: id, temperature: 293.15, origins: {}, references: [], warnings: [], density: 1000, viscosity: 1e-3, ...props };
}
const PITCH = 100e-6;
const WATER_VISCOSITY = 1e-3;
const water = fluid('demo-water', { density: 1000, viscosity: WATER_VISCOSITY, thermalConductivity: 0.6, specificHeat: 4180 });

/** A laminar channel of 5 mm at 0.05 m/s over a texture of pitch 100 µm: units P = 100 µm, τ from the flow. */
function scenario(fraction: number, depthOverWidth: number, viscosityRatio: number, flowAngle = 0, lubricant: Partial<FluidState> = {}): Scenario {
  const texture: Texture = { pitch: PITCH, grooveWidth: fraction * PITCH, grooveDepth: depthOverWidth * fraction * PITCH, flowAngle };
  const flow = evaluateFlow({ density: water.density, viscosity: water.viscosity }, { kind: 'channel', height: 5e-3, bulkVelocity: 0.05 }).result;
  return { texture, lubricant: fluid('demo-oil', { density: 900, viscosity: viscosityRatio * WATER_VISCOSITY, ...lubricant }), workingFluid: water, flow };
}
const relative = (a: number, b: number): number => Math.abs(a / b - 1);

describe('slip auto answers from the exact core (FreeFEM references, fixtures/slip-core/generate_longitudinal.py)', () => {
  const cases = longitudinalReferences();
  it('the 40 longitudinal cases: b_∥ within 2e-4, interfacial shear ratio and mean local slip within 2e-3, centre local slip within 5e-4 (the documented bounds), method exact-core', () => {
    expect(cases.length).toBeGreaterThanOrEqual(40);
    for (const c of cases) {
      const out = evaluateSlip({ scenario: scenario(c.fraction, c.depthOverWidth, c.viscosityRatio), method: 'auto' });
      const r = out.result;
      const label = JSON.stringify(c);
      expect(r.method, label).toBe('exact-core');
      expect(out.models, label).toContain('slip.groove-cell-exact-core');
      expect(relative(r.slipLengthLongitudinal / PITCH, c.slipLength), label).toBeLessThan(2e-4 + 2 * c.slipLengthUncertainty / c.slipLength);
      expect(relative(r.interfacialShearRatioLongitudinal, c.interfacialShearRatio), label).toBeLessThan(2e-3 + (2 * c.interfacialShearRatioUncertainty) / c.interfacialShearRatio);
      // Mean local slip = mean interface velocity / mean interfacial shear (both in units τ = μ_w = P = 1).
      const meanLocalSlip = c.meanInterfaceVelocity / c.interfacialShearRatio;
      expect(relative(r.localSlipLength.longitudinalMean / PITCH, meanLocalSlip), label).toBeLessThan(2e-3 + (2 * c.interfacialShearRatioUncertainty) / c.interfacialShearRatio);
      expect(relative(r.localSlipLength.longitudinalCentre / PITCH, c.localSlipAtCentre), label).toBeLessThan(5e-4 + (2 * c.localSlipAtCentreUncertainty) / c.localSlipAtCentre);
      // The closed form's error is measured against the exact value beside it.
      expect(r.closedFormError.slipLengthLongitudinal.source).toBe('measured');
    }
  });
});

describe('slip auto across the grooves against the field solver (fixtures/slip/transverse_field_reference.json, solveTransverseCell 32/64 cells with Richardson)', () => {
  it('b_⊥ within 0.5 % plus twice the field solver’s own error estimate on the 48 cases it resolves (b_⊥ > 1e-8 P)', () => {
    const cases = fixture<TransverseReference>('slip/transverse_field_reference.json').filter((c) => c.extrapolated.slipLength > 1e-8);
    expect(cases.length).toBeGreaterThanOrEqual(40);
    for (const c of cases) {
      const r = evaluateSlip({ scenario: scenario(c.interfaceFraction, c.depthOverWidth, c.viscosityRatio), method: 'auto' }).result;
      const allowed = 5e-3 + (2 * c.errorEstimate.slipLength) / c.extrapolated.slipLength;
      expect(r.method).toBe('exact-core');
      expect(relative(r.slipLengthTransverse / PITCH, c.extrapolated.slipLength), JSON.stringify(c)).toBeLessThan(allowed);
    }
  });
});

describe('any flow angle: the slip tensor (Bazant & Vinogradova 2008; Kamrin, Bazant & Stone 2010)', () => {
  it('b(θ) = b_∥ cos²θ + b_⊥ sin²θ and the cross term (b_∥ − b_⊥) sinθ cosθ, with b_∥ and b_⊥ the exact ones; θ = 0 and 90° are the two directions', () => {
    const along = evaluateSlip({ scenario: scenario(0.6, 0.5, 0.5, 0), method: 'auto' }).result;
    for (const angle of [0, 30, 45, 60, 90]) {
      const r = evaluateSlip({ scenario: scenario(0.6, 0.5, 0.5, angle), method: 'auto' }).result;
      const theta = (angle * Math.PI) / 180;
      expect(r.method).toBe('exact-core');
      expect(r.slipLengthLongitudinal).toBe(along.slipLengthLongitudinal);
      expect(r.slipLengthAlongFlow).toBeCloseTo(along.slipLengthLongitudinal * Math.cos(theta) ** 2 + along.slipLengthTransverse * Math.sin(theta) ** 2, 15);
      expect(r.slipLengthCrossFlow).toBeCloseTo((along.slipLengthLongitudinal - along.slipLengthTransverse) * Math.sin(theta) * Math.cos(theta), 15);
    }
    const across = evaluateSlip({ scenario: scenario(0.6, 0.5, 0.5, 90), method: 'auto' }).result;
    expect(relative(across.slipLengthAlongFlow, along.slipLengthTransverse)).toBeLessThan(1e-12);
  });
  it('a nearly inviscid lubricant (N = 1e-6) gives the shear-free values of Philip (1972) in both directions, b_⊥ = b_∥/2, within 1e-4 (Philip 1972; Lauga & Stone 2003)', () => {
    const r = evaluateSlip({ scenario: scenario(0.5, 1, 1e-6), method: 'auto' }).result;
    expect(r.method).toBe('exact-core');
    expect(relative(r.slipLengthLongitudinal, philipSlipLengthLongitudinal(PITCH, PITCH / 2))).toBeLessThan(1e-4);
    expect(relative(r.slipLengthTransverse, philipSlipLengthTransverse(PITCH, PITCH / 2))).toBeLessThan(1e-4);
  });
});

describe('closed-form and field stay available', () => {
  it('closed-form answers with the textbook estimate and its error measured against the exact core (7–21 % low at N ≥ 0.1 is the known size; here N = 1)', () => {
    const exact = evaluateSlip({ scenario: scenario(0.5, 0.5, 1), method: 'auto' }).result;
    const closed = evaluateSlip({ scenario: scenario(0.5, 0.5, 1), method: 'closed-form' });
    expect(closed.result.method).toBe('closed-form');
    expect(closed.result.closedFormError.slipLengthLongitudinal.source).toBe('measured');
    expect(closed.result.closedFormError.slipLengthLongitudinal.value).toBeCloseTo(relative(closed.result.slipLengthLongitudinal, exact.slipLengthLongitudinal), 12);
    expect(closed.result.closedFormError.slipLengthTransverse.value).toBeCloseTo(relative(closed.result.slipLengthTransverse, exact.slipLengthTransverse), 12);
    expect(closed.result.closedFormError.slipLengthTransverse.value).toBeGreaterThan(0.01);
    expect(closed.warnings.map((w) => w.code)).toContain('closed-form-approximate');
  });
  it('outside the measured range (w/P = 0.995, N = 3e4) auto still answers from the core, finite, with a caution naming the quantity', () => {
    const out = evaluateSlip({ scenario: scenario(0.995, 1, 3e4), method: 'auto' });
    expect(out.result.method).toBe('exact-core');
    expect(Number.isFinite(out.result.slipLengthLongitudinal) && out.result.slipLengthLongitudinal > 0).toBe(true);
    expect(Number.isFinite(out.result.slipLengthTransverse) && out.result.slipLengthTransverse > 0).toBe(true);
    const cautions = out.warnings.filter((w) => w.code === 'outside-validated-range');
    expect(cautions.some((w) => w.message.includes('w/P'))).toBe(true);
    expect(cautions.some((w) => /\bN\b/.test(w.message))).toBe(true);
  });
});

describe('heat auto takes the thermal slip from the exact core (FreeFEM references, fixtures/slip-core/generate_thermal.py)', () => {
  it('the 24 thermal cases through evaluateHeat: b_t within 3e-3, or 6e-6 P where |b_t| < 2e-3 P (the documented bound), method exact-core', () => {
    const cases = thermalReferences();
    expect(cases.length).toBeGreaterThanOrEqual(20);
    for (const c of cases) {
      const kW = 0.6;
      const base = scenario(c.fraction, c.depthOverWidth, 1, 0, { thermalConductivity: (c.lubricantConductivity / c.workingConductivity) * kW, specificHeat: 2000 });
      const out = evaluateHeat({
        scenario: { ...base, flow: { ...base.flow, height: 5e-3 } },
        solid: { thermalConductivity: (c.solidConductivity / c.workingConductivity) * kW, substrateThickness: c.substrateOverPitch * PITCH },
        heating: 'uniform-flux',
        heatedWalls: 'both',
        lubricantMotion: 'co-flowing',
        method: 'auto',
        slip: { slipLengthLongitudinal: 1e-6 },
      });
      const bt = out.result.thermalSlipLength / PITCH;
      const label = JSON.stringify(c);
      expect(out.result.method, label).toBe('exact-core');
      expect(out.models, label).toContain('heat.thermal-slip-exact-core');
      expect(Math.abs(bt - c.thermalSlipLength), label).toBeLessThanOrEqual(Math.max(3e-3 * Math.abs(c.thermalSlipLength), 6e-6) + 2 * c.uncertainty);
    }
  });
});
