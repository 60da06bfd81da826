/**
 * POST /v1/design-window. The witness of feasibility is POST /v1/assess, as the
 * issue asks: every design the window calls feasible (evaluated, or inferred
 * inside a cell whose corners are all feasible) passes the assessment with the
 * same requirements (overall verdict not "fails"), and sampled designs outside
 * fail at least one requirement there (verdict "fails", and the window's label
 * is the assessment's limiting mechanism). Tightening a requirement can only
 * shrink the window.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { example, makeApp } from '../helpers.js';
import { DesignWindowResponseSchema } from '../../../src/api/window/openapi.js';

/** The README's worked window (an invented demo scenario), searched on a smaller lattice to keep the test short. */
const demo = example('design-window.json') as { design: Record<string, unknown> & { texture: Record<string, unknown> }; search: Record<string, unknown>; requirements: Record<string, unknown> };
const design = demo.design;
const search = { ...demo.search, coarsePoints: 5, refinements: 2 };
const requirements = { minDragReduction: 0.02, minRetainedFraction: 0.5, serviceTime: 7200 };

interface Design {
  grooveWidth: number;
  pitch: number;
  grooveDepth: number;
  label: string;
  margins?: Record<string, number>;
}

interface Window {
  feasible: Design[];
  boundary: Design[];
  best: Design;
  feasibleCandidates: number;
  evaluated: number;
  candidates: number;
  plane: { interfaceFraction: number; grooveWidths: number[]; grooveDepths: number[]; labels: string[][] };
}

let app: FastifyInstance;
let window: Window;
let tight: Window;
/** A looser drag requirement: a wide window, with candidates inside it that were never evaluated. */
let loose: Window;
const looseRequirements = { ...requirements, minDragReduction: 0.005 };
beforeAll(async () => {
  app = await makeApp();
  window = (await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search, requirements } })).json();
  tight = (await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search, requirements: { ...requirements, minDragReduction: 0.025 } } })).json();
  loose = (await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search, requirements: looseRequirements } })).json();
}, 600_000);
afterAll(async () => {
  await app.close();
});

/** The design posted to /v1/assess with the window's requirements (sensitivities off: they do not enter the verdict). */
async function assess(d: Pick<Design, 'grooveWidth' | 'pitch' | 'grooveDepth'>, given: Record<string, number> = requirements) {
  const body = {
    ...design,
    texture: { ...design.texture, grooveWidth: d.grooveWidth, pitch: d.pitch, grooveDepth: d.grooveDepth },
    requirements: given,
    options: { ...(design.options as object), marginSensitivities: { enabled: false } },
  };
  const res = await app.inject({ method: 'POST', url: '/v1/assess', payload: body });
  expect(res.statusCode).toBe(200);
  return res.json().result as { overall: { verdict: string; limitingMechanism: string }; mechanisms: Record<string, { status: string; verdict?: { margin: number } }> };
}

/** Plane points (width, depth) whose label satisfies `pick`, every `every`-th one. */
function planeSample(w: Window, pick: (label: string) => boolean, every: number): Design[] {
  const { plane } = w;
  const out: Design[] = [];
  plane.labels.forEach((row, k) =>
    row.forEach((label, i) => {
      if (pick(label)) out.push({ grooveWidth: plane.grooveWidths[i]!, pitch: plane.grooveWidths[i]! / plane.interfaceFraction, grooveDepth: plane.grooveDepths[k]!, label });
    }),
  );
  return out.filter((_, j) => j % every === 0);
}

const WINDOW_TO_ASSESSMENT: Record<string, string> = { 'drag reduction': 'slipAndDrag', 'heat transfer': 'heat' };

describe('design window', () => {
  it('has feasible designs, a boundary, a best design, and evaluates fewer designs than the box holds', () => {
    DesignWindowResponseSchema.parse(window);
    expect(window.feasible.length).toBeGreaterThan(0);
    expect(window.boundary.length).toBeGreaterThan(0);
    expect(window.best.label).toBe('feasible');
    expect(window.evaluated).toBeLessThan(window.candidates);
  });

  it('every design the window calls feasible passes POST /v1/assess with the same requirements, with the same margins', async () => {
    for (const d of window.feasible) {
      const a = await assess(d);
      expect(a.overall.verdict, JSON.stringify(d)).not.toBe('fails');
      // One definition: the window's margins are the assessment's (same code path, so equal to the bit).
      for (const [name, m] of Object.entries(d.margins!)) expect(a.mechanisms[name === 'dragReduction' ? 'slipAndDrag' : name]!.verdict!.margin).toBe(m);
    }
    // Candidates never evaluated but labelled feasible (inside a cell whose corners are all feasible): the wide window.
    const inferred = planeSample(loose, (l) => l === 'feasible', 1).filter((p) => !loose.feasible.some((d) => d.grooveWidth === p.grooveWidth && d.grooveDepth === p.grooveDepth));
    expect(inferred.length).toBeGreaterThan(2);
    for (const d of inferred.filter((_, j) => j % 3 === 0)) expect((await assess(d, looseRequirements)).overall.verdict, JSON.stringify(d)).not.toBe('fails');
  }, 300_000);

  it('sampled designs outside the window fail at least one requirement there, the one the window names', async () => {
    const outside = planeSample(window, (l) => l !== 'feasible', 9);
    expect(outside.length).toBeGreaterThan(3);
    for (const d of outside) {
      const a = await assess(d);
      expect(a.overall.verdict, JSON.stringify(d)).toBe('fails');
      expect(a.overall.limitingMechanism, JSON.stringify(d)).toBe(WINDOW_TO_ASSESSMENT[d.label] ?? d.label);
    }
  }, 300_000);

  it('monotone: a tighter drag requirement keeps only designs that were feasible before', () => {
    expect(loose.feasibleCandidates).toBeGreaterThan(window.feasibleCandidates);
    expect(tight.feasibleCandidates).toBeLessThanOrEqual(window.feasibleCandidates);
    window.plane.labels.forEach((row, i) =>
      row.forEach((label, j) => {
        if (tight.plane.labels[i]![j] === 'feasible') expect(label).toBe('feasible');
      }),
    );
    expect(tight.feasibleCandidates).toBeLessThan(window.feasibleCandidates);
  });

  it('Accept: image/svg+xml returns the plot of the window', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search: { ...search, refinements: 0 }, requirements }, headers: { accept: 'image/svg+xml' } });
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(res.body).toMatch(/^<svg[\s\S]*Design window[\s\S]*<\/svg>\s*$/);
  }, 120_000);

  it('refuses a box it cannot search, naming the field', async () => {
    const both = await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search: { ...search, pitch: { min: '1 mm', max: '2 mm' } }, requirements } });
    expect(both.statusCode).toBe(422);
    expect(both.json().errors[0].path).toBe('search.interfaceFraction');
    const big = await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search: { ...search, interfaceFraction: { min: 0.2, max: 0.8 }, coarsePoints: 33, refinements: 5 }, requirements } });
    expect(big.statusCode).toBe(413);
  });
});
