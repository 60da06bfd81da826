/**
 * The coarse finite-volume timeline a caller that reads the steady share once settled may ask for
 * (src/physics/retention/timeline.ts `settledBy`), against the full grid: the expected values are the full grid's
 * own solution (the drainage model's 120 cells, first order in the cell size), so the test bounds the cost of the
 * coarser grid in the timeline and checks that nothing else of the retention answer moves.
 */
import { describe, expect, it } from 'vitest';
import type { FluidState } from '../../../src/core/fluid.js';
import { evaluateFlow } from '../../../src/physics/flow/flow.js';
import type { Scenario } from '../../../src/physics/scenario.js';
import { evaluateRetention, type RetentionInput } from '../../../src/physics/retention/retention.js';
import { COARSE_CELLS_PER_SEGMENT, drainageTimeline } from '../../../src/physics/retention/timeline.js';
import { Notes } from '../../../src/core/notes.js';

function fluid(id: string, props: Partial<FluidState>): FluidState {
  return { id, name: id, temperature: 293.15, density: 998, viscosity: 1.0e-3, origins: {}, references: [], warnings: [], ...props };
}

/** Largest difference between two timelines sampled at the same times (share of the groove volume). */
function largestGap(a: { time: number; retainedFraction: number }[], b: { time: number; retainedFraction: number }[]): number {
  expect(a.map((p) => p.time)).toEqual(b.map((p) => p.time));
  return Math.max(...a.map((p, k) => Math.abs(p.retainedFraction - b[k].retainedFraction)));
}

// Invented demo designs: a 20 mm groove of a light oil under a laminar 2 mm channel at 0.5 m/s (settles in seconds),
// and a 100 mm groove of a wetting lubricant under a turbulent 10 mm channel at 1 m/s (drains to a few per cent).
// Measured gaps: 0.0095 and 0.042 of the groove volume, both in the steep part of the drainage (the 120-cell solution
// is itself first order in its cells: its steady volume lies 2.8 % off the steady column's quadrature in a 50 mm
// groove, src/physics/retention/drainage.ts).
/** A groove of the given size and lubricant under water in a channel flow, open ends, a 2 h duration. */
function grooveUnderChannel(
  groove: { width: number; depth: number; pitch: number; length: number },
  lubricant: { density: number; viscosity: number; interfacialTension: number },
  channel: { height: number; bulkVelocity: number },
  angles: { advancing: number; receding: number },
): RetentionInput {
  const scenario: Scenario = {
    texture: { grooveWidth: groove.width, grooveDepth: groove.depth, pitch: groove.pitch, flowAngle: 0 },
    lubricant: fluid('oil', { density: lubricant.density, viscosity: lubricant.viscosity }),
    workingFluid: fluid('water', {}),
    flow: evaluateFlow({ density: 998, viscosity: 1.0e-3 }, { kind: 'channel', ...channel }).result,
    interfacialTension: lubricant.interfacialTension,
  };
  return { scenario, contactAngles: { underWorkingFluid: angles }, grooveLength: groove.length, grooveEnds: 'open', duration: 7200 };
}

// [name, groove w/d/P/length (m), lubricant ρ/μ/γ, channel height/bulk velocity, angles θ_A/θ_R, bound on the gap]
type Row = [string, [number, number, number, number], [number, number, number], [number, number], [number, number], number];
const rows: Row[] = [
  ['a 20 mm groove settling within seconds', [30e-6, 15e-6, 60e-6, 0.02], [773, 3.4e-3, 0.0535], [2e-3, 0.5], [60, 20], 0.012],
  ['a 100 mm groove of a wetting lubricant draining within a minute', [50e-6, 20e-6, 100e-6, 0.1], [730, 0.92e-3, 0.0523], [10e-3, 1], [46, 0], 0.05],
];
const designs: [string, RetentionInput, number][] = rows.map(([name, [width, depth, pitch, length], [density, viscosity, interfacialTension], [height, bulkVelocity], [advancing, receding], bound]) => [
  name,
  grooveUnderChannel({ width, depth, pitch, length }, { density, viscosity, interfacialTension }, { height, bulkVelocity }, { advancing, receding }),
  bound,
]);

describe('drainage timeline on the coarse grid for a caller that reads the steady share once settled', () => {
  for (const [name, input, bound] of designs) {
    it(`${name}: ${COARSE_CELLS_PER_SEGMENT} cells per segment, the timeline within ${bound} of the full grid's, the steady share, binding mechanism and verdict unchanged`, () => {
      const full = evaluateRetention(input).result;
      const coarse = evaluateRetention({ ...input, settledBy: 360 }).result;
      expect(full.timelineModel).toBe('finite-volume');
      expect(full.timelineCellsPerSegment).toBe(120);
      expect(coarse.timelineCellsPerSegment).toBe(COARSE_CELLS_PER_SEGMENT);
      const gap = largestGap(coarse.timeline, full.timeline);
      expect(gap).toBeLessThan(bound);
      // The coarse grid is a different solution, not the same one relabelled.
      expect(gap).toBeGreaterThan(1e-6);
      expect(coarse.retainedFraction).toBe(full.retainedFraction);
      expect(coarse.bindingMechanism).toBe(full.bindingMechanism);
      expect(coarse.verdict).toEqual(full.verdict);
      // Both settle early (the caller's rule reads 90 % of the change within 360 s).
      expect(full.timeTo90PercentChange!).toBeLessThan(360);
      expect(coarse.timeTo90PercentChange!).toBeLessThan(360);
      expect(coarse.conservationError!).toBeLessThan(1e-12);
    });
  }

  it('the lumped plug model is not affected (no cells)', () => {
    const notes = new Notes();
    const t = drainageTimeline(
      {
        grooveWidth: 50e-6,
        grooveDepth: 20e-6,
        segmentLength: 0.05,
        segments: 1,
        grooveEnds: 'open',
        interfacialTension: 0.02,
        interfacialShearStress: 1,
        lubricantViscosity: 0.02,
        bodyForceGradient: 0,
        recedingCurvature: 4e4,
        spillCurvature: 4e4,
        initialFill: 1,
        duration: 60,
        retainedLength: 0.01,
        finiteVolume: false,
        settledBy: 3,
      },
      notes,
    );
    expect(t.timelineModel).toBe('lumped-plug');
    expect(t.cellsPerSegment).toBeNull();
  });
});
