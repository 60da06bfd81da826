/**
 * Running the design window for the API: the request made into the physics'
 * window specification, the candidates of each search level spread over the
 * worker pool in batches (task `design-window-batch`), and the plot of the
 * width × depth plane through the best design.
 */
import { catalogue } from '../../materials/lookup.js';
import { BoundedCache } from '../../numerics/memo.js';
import type { DesignDocument } from '../../physics/design/document.js';
import { designWindow, evaluateCandidates, type Candidate, type DesignWindow, type WindowSpec } from '../../physics/design/window.js';
import { effectiveRequirements } from '../../physics/design/assess-requirements.js';
import { assessmentRequirements, REQUIREMENT_WORDS, type CandidateOutcome } from '../../physics/design/window-candidate.js';
import { FEASIBLE } from '../../physics/design/window-search.js';
import { canonicalJson, inputsHash } from '../envelope.js';
import type { SolverPool } from '../pool.js';
import { problem, ProblemError, validationProblem, zodFieldErrors } from '../problem.js';
import { designWindowGridCells, plotDesignWindow } from '../report/plot-design-window.js';
import { WindowRequestSchema } from './schema.js';

/** Most candidates (lattice points × lubricants) one window may hold: bounds the label array, not the work. */
export const MAX_WINDOW_CANDIDATES = 2_000_000;

export const WINDOW_BATCH_TASK = 'design-window-batch';

export interface WindowPlan {
  spec: WindowSpec;
  key: string;
}

/** Parse and check a design-window request (422 naming the field) into the physics' specification. */
export function planWindow(body: unknown): WindowPlan {
  if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw validationProblem([{ path: '', message: 'the request body must be a JSON object' }]);
  }
  const parsed = WindowRequestSchema.safeParse(body);
  if (!parsed.success) throw validationProblem(zodFieldErrors(parsed.error));
  const r = parsed.data;
  const s = r.search;
  const document = r.design as DesignDocument;
  if (s.pitch === undefined && s.interfaceFraction === undefined && document.texture?.pitch === undefined) {
    throw validationProblem([{ path: 'search.pitch', message: 'search the pitch or the interface fraction, or give design.texture.pitch to hold it fixed' }]);
  }
  if (s.pitch === undefined && s.interfaceFraction === undefined && document.texture!.pitch <= s.grooveWidth.max) {
    throw validationProblem([{ path: 'search.grooveWidth.max', message: `the widest groove must stay below the fixed pitch ${document.texture!.pitch} m` }]);
  }
  if (s.pitch !== undefined && s.pitch.min <= s.grooveWidth.max) {
    throw validationProblem([{ path: 'search.pitch.min', message: 'the smallest pitch must exceed the widest groove (a ridge must remain); or search the interface fraction' }]);
  }
  const coarsePoints = s.coarsePoints ?? 9;
  const refinements = s.refinements ?? 3;
  const perDimension = (coarsePoints - 1) * 2 ** refinements + 1;
  const searched = [s.grooveWidth, s.pitch ?? s.interfaceFraction, s.grooveDepth].filter((b) => b !== undefined && b.min !== b.max).length;
  const candidates = perDimension ** searched * (s.lubricants?.length ?? 1);
  if (candidates > MAX_WINDOW_CANDIDATES) {
    throw new ProblemError(
      problem(413, 'window-too-large', 'The design window has more candidates than one request may hold', `${candidates} candidates (${perDimension} per searched dimension); at most ${MAX_WINDOW_CANDIDATES}: lower search.coarsePoints or search.refinements, or fix a dimension`, {
        errors: [{ path: 'search', message: `${candidates} candidates over the limit of ${MAX_WINDOW_CANDIDATES}` }],
      }),
    );
  }
  const spec: WindowSpec = {
    document,
    grooveWidth: s.grooveWidth,
    ...(s.pitch ? { pitch: s.pitch } : {}),
    ...(s.interfaceFraction ? { interfaceFraction: s.interfaceFraction } : {}),
    grooveDepth: s.grooveDepth,
    ...(s.lubricants ? { lubricants: s.lubricants } : {}),
    // The window's requirements over the document's own (the part POST /v1/assess reads).
    requirements: { ...document.requirements, ...r.requirements },
    objective: r.objective ?? 'dragReduction',
    search: { coarsePoints, refinements },
  };
  return { spec, key: inputsHash(JSON.parse(canonicalJson(parsed.data))) };
}

/** Plans a thread has made: a handful, since a thread serves few windows at once. */
const plans = new BoundedCache<WindowPlan>(8);

/** Solver-thread side: outcomes of a batch of candidates. */
export function runWindowBatch(input: unknown): CandidateOutcome[] {
  const { request, key, candidates } = input as { request: unknown; key: string; candidates: Candidate[] };
  const plan = plans.getOrCompute(key, () => planWindow(request));
  return evaluateCandidates(plan.spec.document, plan.spec.requirements, catalogue, candidates);
}

/** Search the window with the candidates of each level spread over the pool (batches of about equal size per thread). */
export async function runWindow(plan: WindowPlan, request: unknown, pool: SolverPool, threads: number, signal?: AbortSignal): Promise<DesignWindow> {
  return designWindow(plan.spec, catalogue, async (candidates) => {
    const batches = Math.max(1, Math.min(candidates.length, 4 * Math.max(1, threads)));
    const size = Math.ceil(candidates.length / batches);
    const parts = [];
    for (let i = 0; i < candidates.length; i += size) {
      const task = { request, key: plan.key, candidates: candidates.slice(i, i + size) };
      parts.push(pool.run<CandidateOutcome[]>(WINDOW_BATCH_TASK, task, { ...(signal ? { signal } : {}), solveTimeoutMs: 60_000 + 2_000 * size }));
    }
    return (await Promise.all(parts)).flat();
  });
}

/** The answer: the window with labels in words, the requirements in effect and what the search assumed. */
export function windowAnswer(plan: WindowPlan, window: DesignWindow) {
  const words = (label: string) => (label === FEASIBLE ? FEASIBLE : (REQUIREMENT_WORDS as Record<string, string>)[label] ?? label);
  const design = <T extends { label: string }>(d: T) => ({ ...d, label: words(d.label) });
  const doc = plan.spec.document;
  const water = doc.waterQuality;
  const stated = water === undefined ? undefined : Array.isArray(water.bulkConcentration) ? water.bulkConcentration[0] : water.bulkConcentration;
  const effective = effectiveRequirements(assessmentRequirements(plan.spec.requirements), {
    ...(doc.options?.duration === undefined ? {} : { duration: doc.options.duration }),
    ...(stated === undefined ? {} : { statedConcentration: stated }),
  });
  const inEffect: Record<string, number | boolean> = { stableWetting: plan.spec.requirements.stableWetting ?? false };
  for (const [k, v] of Object.entries(effective)) if (v.value !== null) inEffect[k] = v.value;
  return {
    requirements: inEffect,
    objective: window.objective,
    candidates: window.candidates,
    evaluated: window.evaluated,
    feasibleCandidates: window.feasibleCandidates,
    limitingShare: Object.fromEntries(Object.entries(window.limitingShare).map(([k, v]) => [words(k), v])),
    best: window.best ? design(window.best) : null,
    pareto: window.pareto.map(design),
    boundary: window.boundary.map(design),
    feasible: window.feasible.map(design),
    plane: { ...window.plane, labels: window.plane.labels.map((row) => row.map(words)) },
    assumptions: [
      `Slip method ${plan.spec.document.options?.method ?? 'auto'} (options.method, as in the assessment).`,
      'Each candidate is assessed as POST /v1/assess assesses it (without sensitivities): feasible exactly when the overall verdict is not "fails" (and the wetting verdict passes when stableWetting is asked for); otherwise labelled by the limiting mechanism, the smallest margin. Every mechanism the document has the parts for is assessed: wetting, retention, waves, slip and drag, surfactant, heat.',
      'Adaptive search: the coarse lattice, then cells whose corners differ refined by halving down to the finest lattice; a candidate inside a cell whose corners agree takes their label. The Pareto front and the best design are taken over the evaluated designs.',
    ],
  };
}

/** The plot of the plane through the best design. */
export function windowPlot(window: DesignWindow): Promise<string> {
  const { plane } = window;
  const limiting = plane.labels.map((row) => row.map((l) => (l === FEASIBLE ? null : ((REQUIREMENT_WORDS as Record<string, string>)[l] ?? l))));
  const fixed = plane.pitch !== undefined ? `pitch ${(plane.pitch * 1e6).toPrecision(3)} µm` : `interface fraction ${plane.interfaceFraction!.toPrecision(3)}`;
  return plotDesignWindow({
    cells: designWindowGridCells(plane.grooveWidths, plane.grooveDepths, limiting, 'log'),
    ...(window.best ? { best: { grooveWidth: window.best.grooveWidth, grooveDepth: window.best.grooveDepth } } : {}),
    scale: 'log',
    note: `${fixed}${plane.lubricant ? `, ${plane.lubricant}` : ''}; ${window.evaluated} of ${window.candidates} candidates evaluated`,
  });
}
