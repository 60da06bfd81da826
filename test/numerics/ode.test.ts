import { describe, expect, it } from 'vitest';
import { integrateRungeKutta4 } from '../../src/numerics/ode.js';

describe('integrateRungeKutta4', () => {
  it("y' = y from 0 to 1 gives e (exact solution), error falling as h⁴", () => {
    const run = (steps: number) => integrateRungeKutta4((_t, y, dy) => { dy[0] = y[0]; }, 0, [1], 1, steps)[0];
    const e10 = Math.abs(run(10) - Math.E);
    const e20 = Math.abs(run(20) - Math.E);
    expect(Math.abs(run(1000) - Math.E)).toBeLessThan(1e-13);
    expect(e10 / e20).toBeGreaterThan(14); // 2⁴ = 16 for a fourth-order method
    expect(e10 / e20).toBeLessThan(18);
  });
  it('harmonic oscillator over one period returns to its start (exact solution cos t, −sin t)', () => {
    const y = integrateRungeKutta4((_t, s, d) => { d[0] = s[1]; d[1] = -s[0]; }, 0, [1, 0], 2 * Math.PI, 2000);
    expect(y[0]).toBeCloseTo(1, 10); // RK4 global error ≈ h⁴·T/120 ≈ 5e-12 here
    expect(y[1]).toBeCloseTo(0, 10);
  });
  it('rejects a non-integer step count', () => {
    expect(() => integrateRungeKutta4(() => undefined, 0, [1], 1, 0.5)).toThrow(RangeError);
  });
});
