/**
 * Scalar root finding. Brent's method (Brent 1973, "Algorithms for
 * Minimization without Derivatives", Prentice-Hall, ch. 4) for bracketed
 * roots, and a safeguarded Newton iteration that falls back to bisection
 * whenever a step leaves the bracket.
 */

export interface RootResult {
  root: number;
  iterations: number;
  converged: boolean;
  /** |f(root)| at the returned point. */
  residual: number;
}

export interface RootOptions {
  /** Absolute tolerance on x (default 4·ε·|x| + 1e-300, i.e. machine precision). */
  xTolerance?: number;
  maxIterations?: number;
}

/**
 * Brent's method on [a, b] with f(a)·f(b) ≤ 0. Returns `converged: false`
 * (never throws) when the bracket is invalid or the iteration budget runs out.
 */
export function brent(f: (x: number) => number, a: number, b: number, options: RootOptions = {}): RootResult {
  const maxIterations = options.maxIterations ?? 200;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return { root: a, iterations: 0, converged: true, residual: 0 };
  if (fb === 0) return { root: b, iterations: 0, converged: true, residual: 0 };
  if (!(fa * fb < 0)) return { root: NaN, iterations: 0, converged: false, residual: NaN };
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 1; iter <= maxIterations; iter++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * (options.xTolerance ?? 1e-300);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) {
      return { root: b, iterations: iter, converged: true, residual: Math.abs(fb) };
    }
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return { root: b, iterations: maxIterations, converged: false, residual: Math.abs(fb) };
}

/**
 * Expand [a, b] geometrically (factor 1.6, as in Press et al. 2007, Numerical
 * Recipes 3rd ed., §9.1) until it brackets a sign change. Returns null if none
 * is found within `maxExpansions`. `lowerLimit` keeps the lower end above a bound
 * (e.g. 0 for strictly positive unknowns).
 */
export function expandBracket(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { maxExpansions?: number; lowerLimit?: number } = {},
): [number, number] | null {
  const maxExpansions = options.maxExpansions ?? 60;
  let fa = f(a);
  let fb = f(b);
  for (let i = 0; i < maxExpansions; i++) {
    if (fa * fb <= 0) return [a, b];
    if (Math.abs(fa) < Math.abs(fb)) {
      a += 1.6 * (a - b);
      if (options.lowerLimit !== undefined && a <= options.lowerLimit) a = 0.5 * (options.lowerLimit + b - (b - a) / 2.6);
      fa = f(a);
    } else {
      b += 1.6 * (b - a);
      fb = f(b);
    }
  }
  return null;
}

/**
 * Newton's method with a bracket safeguard: a step that leaves [lo, hi] or
 * does not halve the bracket is replaced by bisection (Press et al. 2007,
 * §9.4, "rtsafe"). f returns value and derivative.
 */
export function safeNewton(
  f: (x: number) => { value: number; derivative: number },
  lo: number,
  hi: number,
  x0: number,
  options: RootOptions = {},
): RootResult {
  const maxIterations = options.maxIterations ?? 100;
  const flo = f(lo).value;
  const fhi = f(hi).value;
  if (flo === 0) return { root: lo, iterations: 0, converged: true, residual: 0 };
  if (fhi === 0) return { root: hi, iterations: 0, converged: true, residual: 0 };
  if (!(flo * fhi < 0)) return { root: NaN, iterations: 0, converged: false, residual: NaN };
  let xl = flo < 0 ? lo : hi;
  let xh = flo < 0 ? hi : lo;
  let x = Math.min(Math.max(x0, Math.min(lo, hi)), Math.max(lo, hi));
  let dxOld = Math.abs(hi - lo);
  let dx = dxOld;
  let { value, derivative } = f(x);
  for (let iter = 1; iter <= maxIterations; iter++) {
    const outside = ((x - xh) * derivative - value) * ((x - xl) * derivative - value) > 0;
    if (outside || Math.abs(2 * value) > Math.abs(dxOld * derivative)) {
      dxOld = dx;
      dx = 0.5 * (xh - xl);
      x = xl + dx;
    } else {
      dxOld = dx;
      dx = value / derivative;
      x -= dx;
    }
    const tol = 4 * Number.EPSILON * Math.abs(x) + (options.xTolerance ?? 0);
    ({ value, derivative } = f(x));
    if (Math.abs(dx) <= tol || value === 0) {
      return { root: x, iterations: iter, converged: true, residual: Math.abs(value) };
    }
    if (value < 0) xl = x;
    else xh = x;
  }
  return { root: x, iterations: maxIterations, converged: false, residual: Math.abs(value) };
}
