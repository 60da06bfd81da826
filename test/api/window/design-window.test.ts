/**
 * POST /v1/design-window. The witness of feasibility is the single-question
 * endpoints: a design the window calls feasible must meet every requirement
 * when its answers are read from POST /v1/slip, /v1/waves and /v1/retention
 * (the assessment's rules: drag reduction credited at the service time, zero
 * when wavy, times the filled share; retained share of the timeline at the
 * service time; waves margin against the reserve); a design outside must fail
 * one of them. Tightening a requirement can only shrink the window.
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
}

let app: FastifyInstance;
let window: { feasible: Design[]; boundary: Design[]; best: Design; feasibleCandidates: number; evaluated: number; candidates: number; plane: { labels: string[][] } };
let tight: typeof window;
beforeAll(async () => {
  app = await makeApp();
  window = (await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search, requirements } })).json();
  tight = (await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search, requirements: { ...requirements, minDragReduction: 0.025 } } })).json();
}, 600_000);
afterAll(async () => {
  await app.close();
});

/** Every requirement's margin for a design, read from the single-question endpoints. */
async function marginsFromEndpoints(d: Design): Promise<number[]> {
  const body = { ...design, texture: { ...design.texture, grooveWidth: d.grooveWidth, pitch: d.pitch, grooveDepth: d.grooveDepth }, options: { method: 'closed-form', duration: 7200 } };
  const post = async (path: string) => (await app.inject({ method: 'POST', url: path, payload: body })).json();
  const [slip, waves, retention] = [await post('/v1/slip'), await post('/v1/waves'), await post('/v1/retention')];
  const last = retention.result.timeline.at(-1);
  expect(last.time).toBe(7200);
  const filled = last.retainedFraction;
  const credited = slip.result.drag.dragReduction * (waves.result.regime === 'wavy' ? 0 : 1) * filled;
  return [credited / requirements.minDragReduction - 1, waves.verdict.margin, filled / requirements.minRetainedFraction - 1];
}

describe('design window', () => {
  it('has feasible designs, a boundary, a best design, and evaluates fewer designs than the box holds', () => {
    DesignWindowResponseSchema.parse(window);
    expect(window.feasible.length).toBeGreaterThan(0);
    expect(window.boundary.length).toBeGreaterThan(0);
    expect(window.best.label).toBe('feasible');
    expect(window.evaluated).toBeLessThan(window.candidates);
  });

  it('every feasible design meets every requirement through the single endpoints', async () => {
    for (const d of window.feasible) {
      const margins = await marginsFromEndpoints(d);
      expect(Math.min(...margins), JSON.stringify(d)).toBeGreaterThanOrEqual(0);
    }
  }, 300_000);

  it('sampled designs outside the window fail at least one requirement', async () => {
    const outside = (window as unknown as { boundary: Design[] }).boundary.length > 0 ? await outsideSample() : [];
    expect(outside.length).toBeGreaterThan(3);
    for (const d of outside) expect(Math.min(...(await marginsFromEndpoints(d))), JSON.stringify(d)).toBeLessThan(0);
  }, 300_000);

  it('monotone: a tighter drag requirement keeps only designs that were feasible before', () => {
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

/** Evaluated designs the window labels infeasible: a handful across the plane. */
async function outsideSample(): Promise<Design[]> {
  const res = (await app.inject({ method: 'POST', url: '/v1/design-window', payload: { design, search: { ...search, refinements: 0 }, requirements } })).json();
  const all = res.feasible as Design[];
  expect(all.every((d) => d.label === 'feasible')).toBe(true);
  const plane = res.plane as { grooveWidths: number[]; grooveDepths: number[]; labels: string[][] };
  const out: Design[] = [];
  plane.labels.forEach((row, k) =>
    row.forEach((label, i) => {
      if (label !== 'feasible' && (i + k) % 3 === 0) out.push({ grooveWidth: plane.grooveWidths[i]!, pitch: plane.grooveWidths[i]! / 0.5, grooveDepth: plane.grooveDepths[k]!, label });
    }),
  );
  return out;
}
