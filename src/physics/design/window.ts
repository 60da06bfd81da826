/**
 * The design window: the grooves (width, pitch or interface fraction, depth)
 * and candidate lubricants that satisfy every requirement in the given
 * service conditions. Searched adaptively (./window-search.ts) per lubricant;
 * the answer holds the evaluated feasible designs, the boundary of the
 * feasible region, the Pareto front between credited drag reduction, retained
 * share and waves margin, the best design by the stated objective, the share
 * of the candidates each requirement limits, and the width × depth plane
 * through the best design for the plot. The Pareto front and the best design
 * are taken over the evaluated designs: the coarse lattice and every
 * refinement at the boundary, where the optimum of a requirement-bounded
 * objective lies when the objective grows towards the boundary.
 */
import type { Catalogue } from '../../core/catalogue.js';
import type { DesignDocument } from './document.js';
import { evaluateCandidate, type CandidateOutcome, type WindowRequirements } from './window-candidate.js';
import { FEASIBLE, searchWindow, type SearchDimension, type SearchSettings } from './window-search.js';

export interface Bounds {
  min: number;
  max: number;
}

export interface WindowSpec {
  /** Service conditions and everything else of the design (the texture's searched fields are overwritten). */
  document: DesignDocument;
  grooveWidth: Bounds;
  /** Either the pitch or the interface fraction w/P is searched (default: the document's pitch, fixed). */
  pitch?: Bounds;
  interfaceFraction?: Bounds;
  grooveDepth: Bounds;
  /** Catalogue ids of candidate lubricants (default: the document's lubricant). */
  lubricants?: string[];
  requirements: WindowRequirements;
  objective: Objective;
  search: SearchSettings;
}

export type Objective = 'dragReduction' | 'retainedFraction' | 'waveMargin';

export interface Candidate {
  grooveWidth: number;
  pitch: number;
  grooveDepth: number;
  lubricant?: string;
}

export interface WindowDesign extends Candidate, CandidateOutcome {
  interfaceFraction: number;
}

export interface DesignWindow {
  /** Candidate designs in the searched box (lattice points × lubricants). */
  candidates: number;
  /** Designs the models evaluated. */
  evaluated: number;
  /** Candidates labelled feasible (evaluated, or inside a cell whose corners are all feasible). */
  feasibleCandidates: number;
  feasible: WindowDesign[];
  boundary: WindowDesign[];
  pareto: WindowDesign[];
  objective: Objective;
  best: WindowDesign | null;
  /** Share of the candidates labelled by each requirement that limits them ("feasible" included). */
  limitingShare: Record<string, number>;
  /** The width × depth plane through the best design (or the middle of the box): for the plot. */
  plane: { lubricant?: string; pitch?: number; interfaceFraction?: number; grooveWidths: number[]; grooveDepths: number[]; labels: string[][] };
}

/** The document of one candidate. */
export function candidateDocument(base: DesignDocument, c: Candidate): DesignDocument {
  const texture = { ...base.texture, grooveWidth: c.grooveWidth, pitch: c.pitch, grooveDepth: c.grooveDepth };
  return { ...base, texture, ...(c.lubricant === undefined ? {} : { lubricant: { ...base.lubricant, id: c.lubricant } }) };
}

/** Evaluate candidates one after another on this thread. */
export function evaluateCandidates(base: DesignDocument, requirements: WindowRequirements, catalogue: Catalogue, candidates: readonly Candidate[]): CandidateOutcome[] {
  return candidates.map((c) => evaluateCandidate(candidateDocument(base, c), requirements, catalogue));
}

function dominates(a: WindowDesign, b: WindowDesign, keys: readonly Objective[]): boolean {
  let better = false;
  for (const k of keys) {
    const x = a[k] ?? -Infinity;
    const y = b[k] ?? -Infinity;
    if (x < y) return false;
    if (x > y) better = true;
  }
  return better;
}

/** Non-dominated designs (maximising every objective that has values). */
export function paretoFront(designs: readonly WindowDesign[]): WindowDesign[] {
  const keys = (['dragReduction', 'retainedFraction', 'waveMargin'] as const).filter((k) => designs.some((d) => d[k] !== null));
  return designs.filter((d) => !designs.some((e) => e !== d && dominates(e, d, keys)));
}

/**
 * Search the window. `evaluate` answers a batch of candidates (in order); by default on this thread,
 * the API passes one that spreads the batch over its worker pool.
 */
export async function designWindow(
  spec: WindowSpec,
  catalogue: Catalogue,
  evaluate: (candidates: Candidate[]) => Promise<CandidateOutcome[]> | CandidateOutcome[] = (c) => evaluateCandidates(spec.document, spec.requirements, catalogue, c),
): Promise<DesignWindow> {
  const basePitch = spec.document.texture?.pitch;
  const byFraction = spec.interfaceFraction !== undefined;
  const second: SearchDimension = byFraction
    ? { name: 'interfaceFraction', ...spec.interfaceFraction!, scale: 'linear' }
    : { name: 'pitch', ...(spec.pitch ?? { min: basePitch ?? NaN, max: basePitch ?? NaN }), scale: 'log' };
  const dimensions: SearchDimension[] = [{ name: 'grooveWidth', ...spec.grooveWidth, scale: 'log' }, second, { name: 'grooveDepth', ...spec.grooveDepth, scale: 'log' }];
  const toCandidate = (p: readonly number[], lubricant: string | undefined): Candidate => ({
    grooveWidth: p[0]!,
    pitch: byFraction ? p[0]! / p[1]! : p[1]!,
    grooveDepth: p[2]!,
    ...(lubricant === undefined ? {} : { lubricant }),
  });
  const lubricants: (string | undefined)[] = spec.lubricants && spec.lubricants.length > 0 ? spec.lubricants : [undefined];
  let candidates = 0;
  let evaluatedCount = 0;
  let feasibleCandidates = 0;
  const counts: Record<string, number> = {};
  const evaluatedDesigns: WindowDesign[] = [];
  const boundary: WindowDesign[] = [];
  const searches = [];
  for (const lubricant of lubricants) {
    const result = await searchWindow<CandidateOutcome>(dimensions, spec.search, (points) => evaluate(points.map((p) => toCandidate(p, lubricant))));
    searches.push({ lubricant, result });
    candidates += result.candidates;
    evaluatedCount += result.evaluated.length;
    for (const label of result.labels) counts[label] = (counts[label] ?? 0) + 1;
    feasibleCandidates += result.labels.filter((l) => l === FEASIBLE).length;
    const n = result.pointsPerDimension;
    const strides = n.map((_, a) => n.slice(a + 1).reduce((p, x) => p * x, 1));
    for (const e of result.evaluated) {
      const c = toCandidate(e.point, lubricant);
      const design: WindowDesign = { ...c, interfaceFraction: c.grooveWidth / c.pitch, ...e.outcome };
      evaluatedDesigns.push(design);
      if (e.outcome.label !== FEASIBLE) continue;
      const flat = e.indices.reduce((f, i, a) => f + i * strides[a]!, 0);
      const edge = e.indices.some((i, a) => [i - 1, i + 1].some((j) => j >= 0 && j < n[a]! && result.labels[flat + (j - i) * strides[a]!] !== FEASIBLE));
      if (edge) boundary.push(design);
    }
  }
  const feasible = evaluatedDesigns.filter((d) => d.label === FEASIBLE);
  const best = feasible.reduce<WindowDesign | null>((b, d) => ((d[spec.objective] ?? -Infinity) > (b?.[spec.objective] ?? -Infinity) ? d : b), null);
  const limitingShare = Object.fromEntries(Object.entries(counts).map(([k, v]) => [k, v / candidates]));

  // The plot's plane: through the best design's pitch (or fraction) and lubricant, else the middle of the box.
  const home = searches.find((s) => s.lubricant === best?.lubricant) ?? searches[0]!;
  const { values, pointsPerDimension: n, labels } = home.result;
  const secondValue = best ? (byFraction ? best.interfaceFraction : best.pitch) : values[1]![Math.floor((n[1]! - 1) / 2)]!;
  const j = values[1]!.reduce((bi, v, i) => (Math.abs(v - secondValue) < Math.abs(values[1]![bi]! - secondValue) ? i : bi), 0);
  const plane = {
    ...(home.lubricant === undefined ? {} : { lubricant: home.lubricant }),
    ...(byFraction ? { interfaceFraction: values[1]![j]! } : { pitch: values[1]![j]! }),
    grooveWidths: values[0]!,
    grooveDepths: values[2]!,
    labels: values[2]!.map((_, k) => values[0]!.map((_, i) => labels[i * n[1]! * n[2]! + j * n[2]! + k]!)),
  };
  return {
    candidates,
    evaluated: evaluatedCount,
    feasibleCandidates,
    feasible,
    boundary,
    pareto: paretoFront(feasible),
    objective: spec.objective,
    best,
    limitingShare,
    plane,
  };
}
