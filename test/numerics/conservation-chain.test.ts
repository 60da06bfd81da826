import { describe, expect, it } from 'vitest';
import { integrateConservationChain, type ConservationChain } from '../../src/numerics/conservation-bdf2.js';
import { monotoneCubic } from '../../src/numerics/interpolation.js';

describe('monotone cubic interpolation (Fritsch & Carlson 1980)', () => {
  it('reproduces linear data exactly, value and derivative (exact: the Hermite cubic of a line is the line)', () => {
    const xs = [0, 0.3, 1, 1.7, 4];
    const f = monotoneCubic(
      xs,
      xs.map((x) => 2 * x - 1),
    );
    for (const x of [0.1, 0.5, 1.2, 3.3]) {
      expect(f.value(x)).toBeCloseTo(2 * x - 1, 14);
      expect(f.derivative(x)).toBeCloseTo(2, 13);
    }
  });
  it('stays monotone through step-like monotone data, where an ordinary cubic spline overshoots (the method’s defining property)', () => {
    const xs = [0, 1, 2, 3, 4, 5];
    const ys = [0, 0, 0.01, 1, 1, 1];
    const f = monotoneCubic(xs, ys);
    let previous = -Infinity;
    for (let k = 0; k <= 500; k++) {
      const v = f.value((5 * k) / 500);
      expect(v).toBeGreaterThanOrEqual(previous - 1e-15);
      expect(v).toBeGreaterThanOrEqual(-1e-15);
      expect(v).toBeLessThanOrEqual(1 + 1e-15);
      previous = v;
    }
  });
});

function diffusionChain(n: number, diffusivity: number, dx: number): ConservationChain {
  return {
    size: n,
    capacities: new Float64Array(n).fill(dx),
    faceFluxes(y, leaving, entering) {
      leaving[0] = 0;
      entering[0] = 0;
      leaving[n] = 0;
      entering[n] = 0;
      for (let face = 1; face < n; face++) {
        const q = (-diffusivity * (y[face] - y[face - 1])) / dx;
        leaving[face] = q;
        entering[face] = q;
      }
    },
  };
}

describe('flux-form BDF2 on a conservation chain', () => {
  it('diffusion with closed ends: the slowest discrete mode decays as exp(−λ₁t), λ₁ = (4D/Δx²) sin²(π/2N) (exact semi-discrete solution)', () => {
    const n = 40;
    const dx = 1 / n;
    const diffusivity = 1;
    const chain = diffusionChain(n, diffusivity, dx);
    const y0 = Array.from({ length: n }, (_, i) => 1 + Math.cos((Math.PI * (i + 0.5)) / n));
    const lambda = ((4 * diffusivity) / (dx * dx)) * Math.sin(Math.PI / (2 * n)) ** 2;
    const t1 = 0.2;
    const steps: number[] = [];
    const errorAt = (rtol: number): number => {
      const r = integrateConservationChain(chain, y0, 0, t1, { initialStep: 1e-6, relativeTolerance: rtol, absoluteTolerance: rtol });
      steps.push(r.steps);
      expect(r.converged).toBe(true);
      // The constant mode is conserved to rounding.
      expect(r.conservationError).toBeLessThan(1e-13);
      let worst = 0;
      for (let i = 0; i < n; i++) worst = Math.max(worst, Math.abs(r.y[i] - (1 + Math.cos((Math.PI * (i + 0.5)) / n) * Math.exp(-lambda * t1))));
      return worst;
    };
    const coarse = errorAt(1e-4);
    const fine = errorAt(1e-7);
    expect(coarse).toBeLessThan(1e-3);
    expect(fine).toBeLessThan(5e-6);
    // Second order: the step count grows as tol^(−1/2), ×31.6 for a 1000-fold tighter tolerance (measured 82 → 2230).
    expect(steps[1] / steps[0]).toBeGreaterThan(15);
    expect(steps[1] / steps[0]).toBeLessThan(60);
  });

  it('outflow through an end: y(t) = e^{−kt} and y + cumulative loss = y₀ to rounding (exact solution, exact invariant)', () => {
    const k = 3;
    const chain: ConservationChain = {
      size: 1,
      capacities: [1],
      faceFluxes(y, leaving, entering) {
        entering[0] = 0;
        leaving[1] = k * y[0];
      },
    };
    const r = integrateConservationChain(chain, [1], 0, 1, { initialStep: 1e-5, relativeTolerance: 1e-8, absoluteTolerance: 1e-10 });
    expect(r.y[0]).toBeCloseTo(Math.exp(-k), 6);
    expect(Math.abs(r.y[0] + r.cumulativeLoss - 1)).toBeLessThan(1e-14);
  });
});

describe('work bound of the integration', () => {
  it('the step budget counts rejected attempts too, so the work is known before the integration starts', () => {
    // A step start far too large for the tolerance: most early attempts are rejected.
    const n = 40;
    const y0 = new Float64Array(n).map((_, i) => (i < n / 2 ? 1 : 0));
    const budget = 25;
    const result = integrateConservationChain(diffusionChain(n, 1, 1 / n), y0, 0, 10, {
      initialStep: 5,
      relativeTolerance: 1e-8,
      absoluteTolerance: 1e-10,
      maxSteps: budget,
    });
    expect(result.converged).toBe(false);
    expect(result.rejectedSteps).toBeGreaterThan(0);
    expect(result.steps + result.rejectedSteps).toBeLessThanOrEqual(budget);
    expect(result.reason).toMatch(/step attempts/);
  });
});
