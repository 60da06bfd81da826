/**
 * Warm starts of the interface solvers along a list of concentrations (the
 * points, the concentration curve, the half-slip root): every solve keeps its
 * state, and a new concentration starts from the nearest solved one in log c
 * or from the secant prediction of the two nearest (ours).
 */
import type { GrooveState } from './groove.js';
import type { InterfaceState } from './solver.js';

/** Solver states of earlier solves, so a neighbouring concentration starts close to its answer. */
export interface WarmStarts {
  solved: Array<{ logConcentration: number; transverse?: InterfaceState; groove?: GrooveState }>;
}

/** The stored state of the nearest concentration (in log c) that has the wanted kind. */
export function nearestState<K extends 'transverse' | 'groove'>(warm: WarmStarts, c: number, kind: K): WarmStarts['solved'][number][K] | undefined {
  return nearestEntries(warm, c, kind)[0]?.[kind];
}

function nearestEntries(warm: WarmStarts, c: number, kind: 'transverse' | 'groove'): WarmStarts['solved'] {
  const target = Math.log(c);
  return warm.solved.filter((e) => e[kind] !== undefined).sort((a, b) => Math.abs(a.logConcentration - target) - Math.abs(b.logConcentration - target));
}

/**
 * Transverse starts for concentration c: the nearest solved state and the secant prediction in log c
 * from the two nearest (tension profile s = v·s_eq extrapolated linearly; ours).
 */
export function transverseStarts(warm: WarmStarts, c: number): InterfaceState[] {
  const near = nearestEntries(warm, c, 'transverse');
  const out: InterfaceState[] = [];
  const a = near[0];
  const b = near[1];
  if (a?.transverse) out.push(a.transverse);
  if (a?.transverse && b?.transverse && a.transverse.gapCells === b.transverse.gapCells && a.logConcentration !== b.logConcentration) {
    const t = (Math.log(c) - a.logConcentration) / (a.logConcentration - b.logConcentration);
    const sa = a.transverse;
    const sb = b.transverse;
    const tension = sa.tension.map((v, i) => Math.max(0, v * sa.equilibriumTension + t * (v * sa.equilibriumTension - sb.tension[i] * sb.equilibriumTension)));
    out.push({ cells: sa.cells, gapCells: sa.gapCells, tension, equilibriumTension: 1 });
  }
  return out;
}
