/**
 * Fixed-step integration of first-order systems y' = f(t, y) by the classical
 * fourth-order Runge–Kutta method (Hairer, Nørsett & Wanner 1993, Solving
 * Ordinary Differential Equations I, 2nd ed., Springer, §II.1, Table 1.2).
 * Global error O(h⁴); meant for smooth boundary-value shooting on a fixed
 * interval where a few thousand steps reach rounding-level accuracy.
 */

/** Right-hand side: writes f(t, y) into `derivative` (same length as y). */
export type OdeRightHandSide = (t: number, state: Float64Array, derivative: Float64Array) => void;

/**
 * Integrate from t0 to t1 in `steps` equal RK4 steps and return the state at t1
 * (a new array; `initial` is not modified). The right-hand side may be evaluated
 * at t0 itself, so a system with a removable singularity there must supply its limit.
 */
export function integrateRungeKutta4(
  rightHandSide: OdeRightHandSide,
  t0: number,
  initial: ArrayLike<number>,
  t1: number,
  steps: number,
): Float64Array {
  if (!(Number.isInteger(steps) && steps >= 1)) throw new RangeError('steps must be a positive integer');
  const n = initial.length;
  const y = Float64Array.from(initial);
  const k1 = new Float64Array(n);
  const k2 = new Float64Array(n);
  const k3 = new Float64Array(n);
  const k4 = new Float64Array(n);
  const stage = new Float64Array(n);
  const h = (t1 - t0) / steps;
  for (let s = 0; s < steps; s++) {
    const t = t0 + s * h;
    rightHandSide(t, y, k1);
    for (let i = 0; i < n; i++) stage[i] = y[i] + 0.5 * h * k1[i];
    rightHandSide(t + 0.5 * h, stage, k2);
    for (let i = 0; i < n; i++) stage[i] = y[i] + 0.5 * h * k2[i];
    rightHandSide(t + 0.5 * h, stage, k3);
    for (let i = 0; i < n; i++) stage[i] = y[i] + h * k3[i];
    rightHandSide(t + h, stage, k4);
    for (let i = 0; i < n; i++) y[i] += (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
  }
  return y;
}
