/**
 * The committed design list of the surfactant robustness sweep
 * (fixtures/surfactant/sweep_designs.json, from generate_sweep_designs.py) and
 * how one design is evaluated: the way /v1/surfactant does it, with the clean
 * slip from the closed-form slip model (the slip core is timed elsewhere) and
 * the interface solver forced (method "solver"), including the 21-point
 * concentration curve and the half-slip root. Shared by bench/surfactant-sweep.ts
 * (all designs) and test/physics/surfactant/sweep.test.ts (a subset).
 */
import { readFileSync } from 'node:fs';
import { resolveSurfactant } from '../src/materials/surfactants.js';
import type { ResolvedSurfactant } from '../src/core/surfactant.js';
import { ConvergenceError } from '../src/core/errors.js';
import type { Scenario } from '../src/physics/scenario.js';
import { evaluateSlip } from '../src/physics/slip/slip.js';
import { evaluateSurfactant, type SurfactantMethod, type SurfactantResult } from '../src/physics/surfactant/surfactant.js';

export interface SweepDesign {
  id: number;
  part: string;
  surfactant: 'sds' | 'octylphenol-ethoxylate';
  concentrationOverCmc: number;
  /** mol/m³ */
  bulkConcentration: number;
  /** Pa */
  wallShearStress: number;
  /** μ_lubricant/μ_water */
  viscosityRatio: number;
  /** degrees */
  flowAngle: number;
  /** m, or null (no groove length: flow across the grooves) */
  grooveLength: number | null;
  grooveWidth: number;
  pitch: number;
  grooveDepth: number;
}

export function loadSweepDesigns(): SweepDesign[] {
  const text = readFileSync(new URL('../fixtures/surfactant/sweep_designs.json', import.meta.url), 'utf8');
  return (JSON.parse(text) as { designs: SweepDesign[] }).designs;
}

/**
 * One design in every `stride`, the offset cycling from block to block so the
 * subset alternates surfactants and flow angles (ids alternate both).
 */
export function sweepSubset(designs: SweepDesign[], stride: number): SweepDesign[] {
  if (stride <= 1) return designs;
  return designs.filter((_, i) => i % stride === Math.floor(i / stride) % stride);
}

/** Water at 25 °C (demo values: density, viscosity and surface tension rounded from the catalogue). */
const WATER_VISCOSITY = 0.00089;
const TEMPERATURE = 298.15;

export function sweepScenario(d: SweepDesign): Scenario {
  const rho = 997;
  const common = { temperature: TEMPERATURE, origins: {}, references: [], warnings: [] };
  return {
    texture: { grooveWidth: d.grooveWidth, pitch: d.pitch, grooveDepth: d.grooveDepth, flowAngle: d.flowAngle },
    lubricant: { ...common, id: 'lubricant', name: 'lubricant', density: 960, viscosity: d.viscosityRatio * WATER_VISCOSITY },
    workingFluid: { ...common, id: 'water', name: 'water', density: rho, viscosity: WATER_VISCOSITY, surfaceTension: 0.072 },
    flow: {
      kind: 'wall-shear',
      wallShearStress: d.wallShearStress,
      frictionVelocity: Math.sqrt(d.wallShearStress / rho),
      viscousLength: WATER_VISCOSITY / rho / Math.sqrt(d.wallShearStress / rho),
      regime: 'turbulent',
    },
    interfacialTension: 0.04,
  };
}

const SURFACTANTS = new Map<string, ResolvedSurfactant>();
function surfactantOf(id: string): ResolvedSurfactant {
  let s = SURFACTANTS.get(id);
  if (!s) {
    // The catalogue holds air–water constants only; /v1/surfactant lets them stand in for an oil–water interface.
    s = resolveSurfactant({ id, interfaceType: 'air-water' });
    SURFACTANTS.set(id, s);
  }
  return s;
}

export interface SweepOutcome {
  design: SweepDesign;
  /** No exception and no point (or curve point) answered by the scaling fallback. */
  converged: boolean;
  /** Threw (ConvergenceError = not converged; anything else is a defect). */
  error?: string;
  fallbackWarnings: number;
  /** Wall-clock and CPU time of evaluateSurfactant, ms. */
  wallMs: number;
  cpuMs: number;
  result?: SurfactantResult;
}

export function runSweepDesign(d: SweepDesign, method: SurfactantMethod = 'solver'): SweepOutcome {
  const scenario = sweepScenario(d);
  const slip = evaluateSlip({ scenario, method: 'closed-form' }).result;
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  try {
    const o = evaluateSurfactant({
      scenario,
      surfactant: surfactantOf(d.surfactant),
      bulkConcentration: d.bulkConcentration,
      temperature: TEMPERATURE,
      method,
      cleanSlip: {
        slipLengthLongitudinal: slip.slipLengthLongitudinal,
        slipLengthTransverse: slip.slipLengthTransverse,
        localSlipLengthMean: slip.localSlipLength.longitudinalMean,
      },
      ...(d.grooveLength !== null ? { grooveLength: d.grooveLength } : {}),
    });
    const wallMs = performance.now() - t0;
    const cpuMs = process.cpuUsage(c0).user / 1000;
    const fallbackWarnings = o.warnings.filter((w) => w.code === 'solver-fallback-scaling' || w.code === 'curve-solver-fallback').length;
    return { design: d, converged: fallbackWarnings === 0, fallbackWarnings, wallMs, cpuMs, result: o.result };
  } catch (error) {
    const wallMs = performance.now() - t0;
    const cpuMs = process.cpuUsage(c0).user / 1000;
    const kind = error instanceof ConvergenceError ? 'not converged' : 'defect';
    return { design: d, converged: false, error: `${kind}: ${(error as Error).message}`, fallbackWarnings: 0, wallMs, cpuMs };
  }
}
