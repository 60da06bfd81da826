/**
 * Work bounds known before a solve starts (src/physics/solver-budget.ts) and
 * the continuum bound (src/physics/continuum.ts).
 *
 * Witnesses: the grid count is checked against the grids the solver itself
 * reports; the depth cut is a limit of our own solver (fluid deeper than four
 * groove widths is at rest, so cutting it there leaves the slip unchanged
 * within the solver's own accuracy, 0.1–0.3 % per src/numerics/groove-cell.ts);
 * the bound on cells over every admissible geometry is a property test.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveLongitudinalCell, solveTransverseCell } from '../../../src/physics/groove/groove-cell.js';
import { GROOVE_CELL_LIMITS, grooveCellGridSize, planGrooveCellSolve, WorkLimitError } from '../../../src/physics/groove/solver-budget.js';
import { checkContinuumScale, CONTINUUM_LIMITS } from '../../../src/physics/continuum.js';
import { DomainError } from '../../../src/core/errors.js';
import { Notes } from '../../../src/core/notes.js';

describe('groove-cell grid counted before the solve', () => {
  // Interface fraction φ = w/P, depth ratio d/w: narrow, wide, shallow, deep, middle.
  const cases: [number, number][] = [
    [0.5, 1],
    [0.02, 4],
    [0.98, 0.5],
    [0.3, 0.02],
  ];
  for (const [phi, depthRatio] of cases) {
    it(`φ = ${phi}, d/w = ${depthRatio}: the count matches the solver's own grid (columns exactly, rows within one)`, () => {
      const pitch = 1e-4;
      const geometry = { pitch, grooveWidth: phi * pitch, grooveDepth: depthRatio * phi * pitch };
      const solved = solveLongitudinalCell({ ...geometry, viscosityRatio: 1, extrapolate: false, maxIterations: 400 });
      const counted = grooveCellGridSize({ ...geometry, cellsPerPitch: 48, domainHeight: 4 * pitch });
      expect(counted.columns).toBe(solved.grid.nx);
      expect(Math.abs(counted.rows - solved.grid.ny)).toBeLessThanOrEqual(1);
    });
  }
});

describe('deep grooves are cut where the field has decayed', () => {
  it('slip lengths with the groove cut at 4 widths equal those at 8 widths within 2e-4 (the solver’s own error is 1e-3–3e-3)', () => {
    const pitch = 1;
    for (const [phi, ratio] of [
      [0.1, 1],
      [0.5, 20],
    ]) {
      const w = phi * pitch;
      const at = (depth: number) => ({
        longitudinal: solveLongitudinalCell({ pitch, grooveWidth: w, grooveDepth: depth, viscosityRatio: ratio }).slipLength,
        transverse: solveTransverseCell({ pitch, grooveWidth: w, grooveDepth: depth, viscosityRatio: ratio }).slipLength,
      });
      const cut = at(GROOVE_CELL_LIMITS.resolvedDepthInWidths * w);
      const deeper = at(2 * GROOVE_CELL_LIMITS.resolvedDepthInWidths * w);
      expect(Math.abs(cut.longitudinal / deeper.longitudinal - 1)).toBeLessThan(2e-4);
      expect(Math.abs(cut.transverse / deeper.transverse - 1)).toBeLessThan(2e-4);
    }
  });

  it('the plan solves a groove 10¹⁶ widths deep on the grid of one 4 widths deep', () => {
    const plan = planGrooveCellSolve({ pitch: 4e-5, grooveWidth: 2e-5, grooveDepth: 2e11 });
    expect(plan.solvedDepth).toBe(8e-5);
    expect(plan.cells.longitudinal).toBe(grooveCellGridSize({ pitch: 4e-5, grooveWidth: 2e-5, grooveDepth: 8e-5, cellsPerPitch: 48, domainHeight: 1.6e-4 }).cells);
  });
});

describe('every admissible geometry fits the bound; the rest is refused naming the field', () => {
  it('fast-check: φ in [0.01, 0.99], any depth ratio 1e-3 … 1e25, any pitch: a plan within the cell limit', () => {
    fc.assert(
      fc.property(
        // Just inside the limits, so that rounding of w/P at the edge does not decide.
        fc.double({ min: GROOVE_CELL_LIMITS.minInterfaceFraction * (1 + 1e-9), max: (1 - GROOVE_CELL_LIMITS.minInterfaceFraction) * (1 - 1e-9), noNaN: true }),
        fc.double({ min: -3, max: 25, noNaN: true }),
        fc.double({ min: -9, max: -1.3, noNaN: true }),
        (phi, logDepthRatio, logPitch) => {
          const pitch = 10 ** logPitch;
          const plan = planGrooveCellSolve({ pitch, grooveWidth: phi * pitch, grooveDepth: 10 ** logDepthRatio * phi * pitch });
          expect(Math.max(plan.cells.longitudinal, plan.cells.transverse)).toBeLessThanOrEqual(GROOVE_CELL_LIMITS.maxCells);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('grooves or ridges narrower than 1 % of the pitch: WorkLimitError naming texture.grooveWidth with the limit', () => {
    for (const phi of [1e-16, 0.005, 0.995]) {
      try {
        planGrooveCellSolve({ pitch: 1e-4, grooveWidth: phi * 1e-4, grooveDepth: 1e-5 });
        expect.unreachable(`φ = ${phi} should be refused`);
      } catch (error) {
        expect(error).toBeInstanceOf(WorkLimitError);
        expect((error as WorkLimitError).field).toBe('texture.grooveWidth');
        expect((error as WorkLimitError).limit).toMatch(/0\.0?1|0\.99/);
      }
    }
  });

  it('a grid asked for beyond the cell limit is refused, naming the texture', () => {
    expect(() => planGrooveCellSolve({ pitch: 1e-4, grooveWidth: 5e-5, grooveDepth: 5e-5, cellsPerPitch: 2000 })).toThrow(WorkLimitError);
  });
});

describe('continuum bound', () => {
  const texture = (grooveWidth: number) => ({ grooveWidth, grooveDepth: 2e-5, pitch: 4e-5 });
  it('below 1 nm: refused, naming the field (outside the model), before any solve', () => {
    for (const width of [4.755668529426223e-21, 0.5e-9]) {
      try {
        checkContinuumScale(texture(width), new Notes());
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(DomainError);
        expect((error as DomainError).field).toBe('texture.grooveWidth');
        expect((error as DomainError).code).toBe('outside-model-range');
      }
    }
  });
  it('between 1 nm and 100 nm: the continuum-limit caution; from 100 nm on: nothing', () => {
    for (const [width, warned] of [
      [CONTINUUM_LIMITS.smallestLength, true],
      [50e-9, true],
      [CONTINUUM_LIMITS.cautionLength, false],
      [1e-6, false],
    ] as const) {
      const notes = new Notes();
      checkContinuumScale(texture(width), notes);
      expect(notes.warnings.some((w) => w.code === 'continuum-limit'), String(width)).toBe(warned);
    }
  });
});
