import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { lumpedDrainageTime, lumpedRetainedLength, solveDrainage, type DrainageInput } from '../../../src/physics/retention/drainage.js';
import { capillaryPressureCurve, COLUMN_INTERVALS, steadyColumn } from '../../../src/physics/retention/meniscus.js';
import { pressureDrivenGrooveFlux, shearDrivenGrooveFlux } from '../../../src/physics/groove/groove-duct.js';
import { DomainError } from '../../../src/core/errors.js';

interface LumpedCase {
  initialLength: number;
  retainedLength: number;
  drainageSpeed: number;
  times: number[];
  lengths: number[];
}
const reference = JSON.parse(readFileSync(new URL('../../../fixtures/retention/retention_reference.json', import.meta.url), 'utf8')) as {
  lumped: LumpedCase[];
};

describe('lumped drainage dL/dt = −V_s(1 − L∞/L)', () => {
  it('closed form t(L) and its inverse match scipy solve_ivp (Radau, rtol 1e-12; fixtures/retention/generate_retention_reference.py)', () => {
    for (const c of reference.lumped) {
      c.times.forEach((t, k) => {
        const length = lumpedRetainedLength(t, c.initialLength, c.retainedLength, c.drainageSpeed);
        expect(Math.abs(length - c.lengths[k])).toBeLessThan(1e-9 * c.initialLength);
      });
    }
  });
  it('L∞ = 0 reduces to plain advection L₀ − V_s t (exact limit)', () => {
    expect(lumpedDrainageTime(0.02, 0.005, 0, 1e-4)).toBeCloseTo(150, 12);
  });
  it('rejects lengths at or below L∞ (the time diverges there)', () => {
    expect(() => lumpedDrainageTime(0.05, 0.01, 0.01, 1e-3)).toThrow(DomainError);
  });
});

describe('capillary pressure versus filling (pinned circular arc)', () => {
  it('flat interface at full fill, largest suction at the front fill, semicircle bulge at 2γ/w (geometry of a circular arc)', () => {
    const w = 50e-6;
    const d = 50e-6;
    const gamma = 0.02;
    const { curve, frontFill, fullBulgeFill, suction } = capillaryPressureCurve(w, d, gamma, 2 / w);
    expect(Math.abs(curve.value(1))).toBeLessThan(1e-6 * gamma * (2 / w));
    // θ_R = 0 with d = w: the receding semicircle, area deficit πw²/8, suction 2γ/w.
    expect(frontFill).toBeCloseTo(1 - (Math.PI * w * w) / 8 / (w * d), 12);
    expect(suction).toBeCloseTo((2 * gamma) / w, 6);
    expect(fullBulgeFill).toBeCloseTo(1 + (Math.PI * w * w) / 8 / (w * d), 12);
    expect(curve.value(fullBulgeFill)).toBeCloseTo((2 * gamma) / w, 6);
  });
});

function verificationCase(recedingAngle: number, cells: number): { input: DrainageInput; L0: number; Linf: number; Vs: number } {
  // Deep-ish groove d = w so the compliance of the pinned meniscus is small near θ_R → 90°.
  const w = 50e-6;
  const d = 50e-6;
  const gamma = 0.02;
  const tau = 1;
  const mu = 0.01;
  const kappa = (2 * Math.cos((recedingAngle * Math.PI) / 180)) / w;
  const G = (tau * shearDrivenGrooveFlux(w, d)) / pressureDrivenGrooveFlux(w, d);
  const Linf = (gamma * kappa) / G;
  const L0 = 5 * Linf;
  const Vs = (tau * shearDrivenGrooveFlux(w, d)) / (mu * w * d);
  return {
    L0,
    Linf,
    Vs,
    input: {
      grooveWidth: w,
      grooveDepth: d,
      segmentLength: L0,
      segments: 1,
      grooveEnds: 'open',
      interfacialTension: gamma,
      interfacialShearStress: tau,
      lubricantViscosity: mu,
      bodyForceGradient: 0,
      recedingCurvature: kappa,
      spillCurvature: 2 / w,
      initialFill: 1,
      duration: (3 * L0) / Vs,
      cellsPerSegment: cells,
    },
  };
}

describe('finite-volume drainage against the lumped closed form (derived limit: compliance 1 − f_front → 0)', () => {
  it('largest timeline deviation from the lumped L(t), relative to L₀, shrinks with the meniscus compliance and stays below 1.1 %', () => {
    const deviations: number[] = [];
    const compliances: number[] = [];
    for (const angle of [80, 88]) {
      const { input, L0, Linf, Vs } = verificationCase(angle, 100);
      const r = solveDrainage(input);
      let worst = 0;
      for (const p of r.timeline) worst = Math.max(worst, Math.abs(p.retainedLength - lumpedRetainedLength(p.time, L0, Linf, Vs)) / L0);
      deviations.push(worst);
      compliances.push(1 - r.frontFill);
      // Volume conservation of the flux-form BDF2 update (requirement: 1e-10 relative).
      expect(r.conservationError).toBeLessThan(1e-10);
      // Steady state: the lumped L∞/L₀ = 0.2, less the sagged volume of the column.
      expect(r.finalRetainedFraction).toBeGreaterThan(0.2 * (1 - compliances[compliances.length - 1]) - 0.005);
      expect(r.finalRetainedFraction).toBeLessThan(0.2 + 0.002);
    }
    // Measured: 1.0 % at 80° (compliance 0.029), 0.19 % at 88° (compliance 0.0058): error ∝ compliance.
    expect(deviations[0]).toBeLessThan(0.011);
    expect(deviations[1]).toBeLessThan(0.0025);
    expect(deviations[1] / deviations[0]).toBeLessThan((compliances[1] / compliances[0]) * 1.5);
  });

  it('conserves volume to 1e-10 with closed ends, barriers, spill-over and gravity (volume + cumulative loss)', () => {
    const { input } = verificationCase(60, 40);
    const closed = solveDrainage({ ...input, grooveEnds: 'closed', segments: 3, segmentLength: input.segmentLength / 3, bodyForceGradient: 2e4, initialFill: 0.8 });
    expect(closed.conservationError).toBeLessThan(1e-10);
    expect(closed.timeline.length).toBeLessThanOrEqual(200);
    // A closed segment loses lubricant only by spilling: it keeps more than an open one.
    const open = solveDrainage({ ...input, grooveEnds: 'open', segments: 3, segmentLength: input.segmentLength / 3, bodyForceGradient: 2e4, initialFill: 0.8 });
    expect(open.conservationError).toBeLessThan(1e-10);
    expect(closed.finalRetainedFraction).toBeGreaterThan(open.finalRetainedFraction);
  });

  it('retained length at steady state does not depend on the lubricant viscosity; the drainage time scales with it (lumped model, exact)', () => {
    const { input } = verificationCase(85, 60);
    const slow = solveDrainage({ ...input, lubricantViscosity: 0.1, duration: input.duration * 10 });
    const fast = solveDrainage(input);
    expect(Math.abs(slow.finalRetainedFraction - fast.finalRetainedFraction)).toBeLessThan(2e-3);
    expect(slow.timeTo90PercentChange! / fast.timeTo90PercentChange!).toBeCloseTo(10, 0);
  });
});

describe('finite-volume steady state against the steady-column quadrature (independent route: Simpson quadrature of dp/dx = G(h))', () => {
  it('large meniscus compliance (θ_R = 0, floor-touching arc): the retained volume converges at first order in Δx to the quadrature', () => {
    const w = 50e-6;
    const d = 20e-6;
    const kappa = (8 * d) / (w * w + 4 * d * d);
    const L = 0.05;
    const column = steadyColumn({ grooveWidth: w, grooveDepth: d, interfacialTension: 0.02, interfacialShearStress: 1, bodyForceGradient: 0, recedingCurvature: kappa, endCurvature: 0, maxLength: L });
    const expected = column.equivalentLength / L;
    // The sag shortens the column below the full-section L∞ = 10.71 mm (thinner layer, steeper back-pressure).
    expect(column.length).toBeLessThan(0.01071);
    const errors = [60, 120, 240].map((cells) => {
      const r = solveDrainage({ grooveWidth: w, grooveDepth: d, segmentLength: L, segments: 1, grooveEnds: 'open', interfacialTension: 0.02, interfacialShearStress: 1, lubricantViscosity: 0.02, bodyForceGradient: 0, recedingCurvature: kappa, spillCurvature: 0, initialFill: 1, duration: 3000, cellsPerSegment: cells });
      expect(r.conservationError).toBeLessThan(1e-10);
      return Math.abs(r.finalRetainedFraction - expected) / expected;
    });
    // Measured: 4.2 %, 2.8 %, 1.5 %.
    expect(errors[2]).toBeLessThan(0.02);
    expect(errors[0] / errors[1]).toBeGreaterThan(1.2);
    expect(errors[1] / errors[2]).toBeGreaterThan(1.5);
  });
});

describe('steady-column quadrature: convergence of its Simpson rule (our own quadrature against itself at 32× the intervals)', () => {
  it('the default intervals agree with 3 200 intervals to 1e-9, for free and truncated columns, open and closed ends, with gravity', () => {
    const base = { grooveWidth: 50e-6, grooveDepth: 20e-6, interfacialTension: 0.02, interfacialShearStress: 1, bodyForceGradient: 0, endCurvature: 0 };
    const floorArc = (8 * 20e-6) / (50e-6 ** 2 + 4 * 20e-6 ** 2);
    const cases = [
      { ...base, recedingCurvature: floorArc, maxLength: 0.05 }, // free column, floor-touching arc
      { ...base, recedingCurvature: floorArc, maxLength: 0.004 }, // cut by the segment
      { ...base, recedingCurvature: (2 * Math.cos((60 * Math.PI) / 180)) / 50e-6, maxLength: 0.05 }, // receding at 60°
      { ...base, recedingCurvature: floorArc, endCurvature: (2 * Math.sin((80 * Math.PI) / 180)) / 50e-6, maxLength: 0.05 }, // closed end
      { ...base, recedingCurvature: floorArc, bodyForceGradient: 300, maxLength: 0.02 }, // gravity along the flow
      { ...base, grooveDepth: 2e-6, recedingCurvature: (8 * 2e-6) / (50e-6 ** 2 + 4 * 2e-6 ** 2), maxLength: 0.003 }, // shallow, cut
    ];
    for (const [i, c] of cases.entries()) {
      const fine = steadyColumn({ ...c, intervals: 3200 });
      const used = steadyColumn(c);
      expect(used.truncated, `case ${i}`).toBe(fine.truncated);
      expect(Math.abs(used.length / fine.length - 1), `case ${i} length`).toBeLessThan(1e-9);
      expect(Math.abs(used.equivalentLength / fine.equivalentLength - 1), `case ${i} volume`).toBeLessThan(1e-9);
    }
    expect(COLUMN_INTERVALS).toBeLessThanOrEqual(100);
  });
});
