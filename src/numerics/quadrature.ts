/**
 * Numerical quadrature: fixed Gauss–Legendre rules (nodes from the Newton
 * iteration on Legendre polynomials, Press et al. 2007, Numerical Recipes 3rd
 * ed., §4.6) and adaptive Gauss–Kronrod 7–15 (Piessens et al. 1983, QUADPACK,
 * Springer; node values from Kronrod's tables as printed there).
 */

const ruleCache = new Map<number, { nodes: Float64Array; weights: Float64Array }>();

/** Gauss–Legendre nodes and weights on [−1, 1] for n points. */
export function gaussLegendreRule(n: number): { nodes: Float64Array; weights: Float64Array } {
  const cached = ruleCache.get(n);
  if (cached) return cached;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  const m = Math.floor((n + 1) / 2);
  for (let i = 0; i < m; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let pp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p1 = 1;
      let p2 = 0;
      for (let j = 0; j < n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j + 1) * z * p2 - j * p3) / (j + 1);
      }
      pp = (n * (z * p1 - p2)) / (z * z - 1);
      const z1 = z;
      z = z1 - p1 / pp;
      if (Math.abs(z - z1) < 1e-15) break;
    }
    nodes[i] = -z;
    nodes[n - 1 - i] = z;
    weights[i] = 2 / ((1 - z * z) * pp * pp);
    weights[n - 1 - i] = weights[i];
  }
  const rule = { nodes, weights };
  ruleCache.set(n, rule);
  return rule;
}

/** ∫_a^b f with an n-point Gauss–Legendre rule on each of `panels` equal panels. */
export function gaussLegendre(f: (x: number) => number, a: number, b: number, n = 20, panels = 1): number {
  const { nodes, weights } = gaussLegendreRule(n);
  const h = (b - a) / panels;
  let total = 0;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * h;
    let s = 0;
    for (let i = 0; i < n; i++) s += weights[i] * f(mid + 0.5 * h * nodes[i]);
    total += 0.5 * h * s;
  }
  return total;
}

const XGK = [
  0.9914553711208126, 0.9491079123427585, 0.8648644233597691,
  0.7415311855993945, 0.5860872354676911, 0.4058451513773972,
  0.20778495500789848, 0,
];
const WGK = [
  0.022935322010529224, 0.06309209262997856, 0.10479001032225019,
  0.14065325971552592, 0.1690047266392679, 0.19035057806478542,
  0.20443294007529889, 0.20948214108472782,
];
const WG = [0.1294849661688697, 0.27970539148927664, 0.3818300505051189, 0.4179591836734694];

function kronrod15(f: (x: number) => number, a: number, b: number): { value: number; error: number } {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fc = f(c);
  let resK = fc * WGK[7];
  let resG = fc * WG[3];
  for (let j = 0; j < 7; j++) {
    const x = h * XGK[j];
    const f1 = f(c - x);
    const f2 = f(c + x);
    resK += WGK[j] * (f1 + f2);
    if (j % 2 === 1) resG += WG[(j - 1) / 2] * (f1 + f2);
  }
  return { value: resK * h, error: Math.abs((resK - resG) * h) };
}

export interface QuadratureResult {
  value: number;
  error: number;
  evaluations: number;
  converged: boolean;
}

/** Adaptive Gauss–Kronrod (7–15) by interval bisection of the worst panel. */
export function adaptiveQuadrature(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { absoluteTolerance?: number; relativeTolerance?: number; maxPanels?: number } = {},
): QuadratureResult {
  const absTol = options.absoluteTolerance ?? 1e-14;
  const relTol = options.relativeTolerance ?? 1e-12;
  const maxPanels = options.maxPanels ?? 2000;
  const panels: { a: number; b: number; value: number; error: number }[] = [];
  const first = kronrod15(f, a, b);
  panels.push({ a, b, ...first });
  let value = first.value;
  let error = first.error;
  let evaluations = 15;
  while (error > Math.max(absTol, relTol * Math.abs(value)) && panels.length < maxPanels) {
    let worst = 0;
    for (let i = 1; i < panels.length; i++) if (panels[i].error > panels[worst].error) worst = i;
    const p = panels[worst];
    const m = 0.5 * (p.a + p.b);
    const left = kronrod15(f, p.a, m);
    const right = kronrod15(f, m, p.b);
    evaluations += 30;
    panels[worst] = { a: p.a, b: m, ...left };
    panels.push({ a: m, b: p.b, ...right });
    value = 0;
    error = 0;
    for (const q of panels) {
      value += q.value;
      error += q.error;
    }
  }
  return { value, error, evaluations, converged: error <= Math.max(absTol, relTol * Math.abs(value)) };
}
