import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveLongitudinalCell } from '../../../src/physics/groove/groove-cell.js';
import { grooveLidVelocityCentre, grooveLidVelocityMean } from '../../../src/physics/groove/groove-duct.js';
import { longitudinalGrooveSlip } from '../../../src/physics/groove/groove-cell-longitudinal.js';
import { expectDomainError } from '../expect-domain-error.js';
import { longitudinalReferences } from '../../../fixtures/slip-core/references.js';

/** Philip (1972) ZAMP 23, 353; Lauga & Stone (2003) J. Fluid Mech. 489, 55: b_∥ = (P/π) ln sec(πφ/2). */
const philip = (pitch: number, fraction: number): number => (pitch / Math.PI) * Math.log(1 / Math.cos((Math.PI * fraction) / 2));

const relative = (a: number, b: number): number => Math.abs(a / b - 1);

describe('longitudinal slip core: exact limits', () => {
  it.each([0.02, 0.3, 0.5, 0.9, 0.98])('N = 0 is Philip (1972) exactly at w/P = %f', (phi) => {
    const r = longitudinalGrooveSlip({ pitch: 2e-5, grooveWidth: phi * 2e-5, grooveDepth: 1e-5, viscosityRatio: 0 });
    expect(r.slipLength).toBeCloseTo(philip(2e-5, phi), 18);
    expect(r.interfacialShearRatio).toBe(0);
    expect(r.meanLocalSlip).toBeNull();
    expect(r.localSlipAtCentre).toBeNull();
  });
  it.each([0.02, 0.5, 0.98])('N = 1e-4 tends to Philip (1972) within 0.2 percent at w/P = %f (and stays below it)', (phi) => {
    for (const aspect of [0.01, 1, 10]) {
      const r = longitudinalGrooveSlip({ pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: 1e-4 });
      expect(r.slipLength).toBeLessThan(philip(1, phi));
      // A shallow groove's local slip d/N is finite, so the slip is below Philip by more; the deep ones within 0.2 %.
      if (aspect >= 1) expect(relative(r.slipLength, philip(1, phi))).toBeLessThan(2e-3);
    }
  });
  it('large N: mean and centre local slip tend to the lid-sheared duct values (exact series; d/w = ½ gives w/(4N), Σ_odd tanh(nπ/2)/n³ = π³/32)', () => {
    const w = 0.5;
    for (const aspect of [0.01, 0.5, 10]) {
      const d = aspect * w;
      const r = longitudinalGrooveSlip({ pitch: 1, grooveWidth: w, grooveDepth: d, viscosityRatio: 1e4 });
      expect(relative((r.meanLocalSlip as number) * 1e4, grooveLidVelocityMean(w, d))).toBeLessThan(1e-4);
      expect(relative((r.localSlipAtCentre as number) * 1e4, grooveLidVelocityCentre(w, d))).toBeLessThan(1e-4);
      expect(Math.abs(r.interfacialShearRatio - 1)).toBeLessThan(1e-4);
    }
    const half = longitudinalGrooveSlip({ pitch: 1, grooveWidth: w, grooveDepth: w / 2, viscosityRatio: 1e4 });
    expect(relative((half.meanLocalSlip as number) * 1e4, w / 4)).toBeLessThan(1e-4);
  });
  it('shallow grooves: mean local slip → d/N (Couette flow in the groove, exact limit); deep: → (7ζ(3)/π³) w/N = 0.27138 w/N', () => {
    const shallow = longitudinalGrooveSlip({ pitch: 1, grooveWidth: 0.5, grooveDepth: 0.005, viscosityRatio: 1e3 });
    expect(relative((shallow.meanLocalSlip as number) * 1e3, 0.005)).toBeLessThan(0.015); // side walls: O(d/w)
    const deep = longitudinalGrooveSlip({ pitch: 1, grooveWidth: 0.5, grooveDepth: 5, viscosityRatio: 1e4 });
    expect(relative((deep.meanLocalSlip as number) * 1e4, ((7 * 1.2020569031595942) / Math.PI ** 3) * 0.5)).toBeLessThan(2e-4);
  });
  it('mean interface velocity is P b/w (flux balance, exact) and results scale with τ/μ_w and P (dimensional analysis)', () => {
    const base = { pitch: 1, grooveWidth: 0.6, grooveDepth: 0.3, viscosityRatio: 2 };
    const r = longitudinalGrooveSlip(base);
    expect(r.meanInterfaceVelocity).toBeCloseTo(r.slipLength / 0.6, 14);
    const scaled = longitudinalGrooveSlip({ pitch: 3e-5, grooveWidth: 1.8e-5, grooveDepth: 0.9e-5, viscosityRatio: 2, appliedShear: 5, waterViscosity: 1e-3 });
    expect(relative(scaled.slipLength, 3e-5 * r.slipLength)).toBeLessThan(1e-12);
    expect(relative(scaled.meanInterfaceVelocity, (5 / 1e-3) * 3e-5 * r.meanInterfaceVelocity)).toBeLessThan(1e-12);
    expect(relative(scaled.meanInterfaceShear, 5 * r.meanInterfaceShear)).toBeLessThan(1e-12);
    expect(relative(scaled.lubricantFlux, (5 / 1e-3) * (3e-5) ** 3 * r.lubricantFlux)).toBeLessThan(1e-12);
    expect(relative(scaled.meanLocalSlip as number, 3e-5 * (r.meanLocalSlip as number))).toBeLessThan(1e-12);
  });
  it('slip falls and the shear ratio rises monotonically with N (more viscous lubricant, less slip)', () => {
    let previous = { slip: Infinity, ratio: -Infinity };
    for (const n of [1e-4, 1e-2, 1, 1e2, 1e4]) {
      const r = longitudinalGrooveSlip({ pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5, viscosityRatio: n });
      expect(r.slipLength).toBeLessThan(previous.slip);
      expect(r.interfacialShearRatio).toBeGreaterThan(previous.ratio);
      previous = { slip: r.slipLength, ratio: r.interfacialShearRatio };
    }
  });
});

describe('longitudinal slip core against independent references', () => {
  it('matches the scipy finite-difference reference (fixtures/groove-cell/generate_longitudinal_reference.py) within its uncertainty', () => {
    const fixture = JSON.parse(readFileSync(new URL('../../../fixtures/groove-cell/longitudinal_reference.json', import.meta.url), 'utf8')) as {
      cases: { pitch: number; grooveWidth: number; grooveDepth: number; viscosityRatio: number; slipLength: number; uncertainty: number }[];
    };
    for (const c of fixture.cases) {
      const r = longitudinalGrooveSlip(c);
      expect(Math.abs(r.slipLength - c.slipLength)).toBeLessThanOrEqual(Math.max(2 * c.uncertainty, 1e-4 * c.slipLength));
    }
  });

  it('matches the FreeFEM references (fixtures/slip-core/generate_longitudinal.py) over the range: b within 2e-4, shear ratio and mean local slip within 2e-3, centre local slip and flux within 5e-4', () => {
    const fixture = { cases: longitudinalReferences() };
    expect(fixture.cases.length).toBeGreaterThanOrEqual(40);
    for (const c of fixture.cases) {
      const r = longitudinalGrooveSlip({ pitch: 1, grooveWidth: c.fraction, grooveDepth: c.depthOverWidth * c.fraction, viscosityRatio: c.viscosityRatio });
      const label = JSON.stringify([c.fraction, c.depthOverWidth, c.viscosityRatio]);
      expect(Math.abs(r.slipLength - c.slipLength), label).toBeLessThanOrEqual(2e-4 * c.slipLength + 2 * c.slipLengthUncertainty);
      expect(Math.abs(r.interfacialShearRatio - c.interfacialShearRatio), label).toBeLessThanOrEqual(2e-3 * c.interfacialShearRatio + 2 * c.interfacialShearRatioUncertainty);
      expect(Math.abs((r.localSlipAtCentre as number) - c.localSlipAtCentre), label).toBeLessThanOrEqual(5e-4 * c.localSlipAtCentre + 2 * c.localSlipAtCentreUncertainty);
      expect(relative(r.lubricantFlux, c.lubricantFlux), label).toBeLessThan(5e-4);
      // Mean local slip = mean interface velocity / mean interfacial shear (τ = μ_w = 1): the shear's uncertainty carries over.
      const meanLocal = c.meanInterfaceVelocity / c.interfacialShearRatio;
      expect(relative(r.meanLocalSlip as number, meanLocal), label).toBeLessThan(2e-3 + 2 * c.interfacialShearRatioUncertainty / c.interfacialShearRatio);
    }
  });

  it('agrees with the finite-volume field solver (Richardson-extrapolated, its own reference method) within 0.5 % on a fixed set of cases', () => {
    for (const [phi, aspect, n] of [
      [0.5, 0.5, 1],
      [0.3, 2, 0.1],
      [0.8, 0.2, 10],
    ]) {
      const input = { pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: n };
      const core = longitudinalGrooveSlip(input);
      const field = solveLongitudinalCell(input);
      expect(relative(core.slipLength, field.slipLength)).toBeLessThan(5e-3);
      expect(relative(core.interfacialShearRatio, field.interfacialShearRatio)).toBeLessThan(1e-2); // the field solver's shear is first order at the lip
    }
  });
});

describe('longitudinal slip core: impossible and out-of-range input', () => {
  it('throws DomainError naming the field for impossible geometry or a negative ratio', () => {
    const good = { pitch: 1, grooveWidth: 0.5, grooveDepth: 0.5, viscosityRatio: 1 };
    const bad: [Partial<typeof good>, string][] = [
      [{ pitch: 0 }, 'pitch'],
      [{ grooveWidth: 1 }, 'grooveWidth'],
      [{ grooveDepth: Number.NaN }, 'grooveDepth'],
      [{ viscosityRatio: -1 }, 'viscosityRatio'],
    ];
    for (const [change, field] of bad) expectDomainError(() => longitudinalGrooveSlip({ ...good, ...change }), field);
  });
  it('outside the validated range: a finite result and a caution', () => {
    const r = longitudinalGrooveSlip({ pitch: 1, grooveWidth: 0.995, grooveDepth: 50, viscosityRatio: 1e6 });
    expect(Number.isFinite(r.slipLength) && r.slipLength > 0).toBe(true);
    expect(r.warnings.map((w) => w.code)).toContain('outside-validated-range');
  });
});
