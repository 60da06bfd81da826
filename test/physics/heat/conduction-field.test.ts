import { describe, expect, it } from 'vitest';
import { thermalSlipAdiabaticGrooves, thermalSlipLubricantGrooves } from '../../../src/physics/heat/thermal-slip.js';
import { nusseltUniformFluxPlates } from '../../../src/physics/heat/laminar.js';
import { type WallCell, solveHeatCrossSection, thermalSlipField } from '../../../src/physics/heat/conduction-field.js';

const smoothWall: WallCell = {
  pitch: 20e-6,
  grooveWidth: 0,
  grooveDepth: 5e-6,
  substrateThickness: 10e-6,
  workingConductivity: 0.6,
  lubricantConductivity: 0.2,
  solidConductivity: 0.2,
};
const sectionBase = {
  height: 200e-6,
  workingViscosity: 1e-3,
  lubricantViscosity: 1e-2,
  workingHeatCapacity: 4.17e6,
  lubricantHeatCapacity: 1.76e6,
  lubricantMotion: 'co-flowing' as const,
};


describe('field method: cross-section and conduction cell', () => {
  it('smooth wall, both walls heated: Nu = 8.235 (Shah & London 1978) within 0.1 %, f·Re = 24 (exact)', () => {
    const r = solveHeatCrossSection({ ...sectionBase, wall: smoothWall, heatedWalls: 'both' });
    expect(Math.abs(r.nusselt! / (140 / 17) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(r.frictionFactorReynolds / 24 - 1)).toBeLessThan(1e-3);
  });
  it('smooth wall, one wall heated, other insulated: Nu = 5.385 (Shah & London 1978) within 0.1 %', () => {
    const r = solveHeatCrossSection({ ...sectionBase, wall: smoothWall, heatedWalls: 'one' });
    expect(Math.abs(r.nusselt! / (70 / 13) - 1)).toBeLessThan(1e-3);
  });
  it('the overall conductance of the smooth case adds the wall resistance in series (1-D conduction, exact)', () => {
    const r = solveHeatCrossSection({ ...sectionBase, wall: smoothWall, heatedWalls: 'both' });
    const Dh = 400e-6;
    // the smooth cell has no groove layer: wall resistance s/k_s with s = 10 µm
    const expected = 1 / (1 / (140 / 17) + (0.6 * 10e-6) / (0.2 * Dh));
    expect(Math.abs(r.overallNusselt / expected - 1)).toBeLessThan(1e-3);
  });
  it('equal lubricant and solid conductivities give b_t = 0 (identical wall; FV exact for layered media)', () => {
    const r = thermalSlipField({ ...smoothWall, grooveWidth: 10e-6, lubricantConductivity: 0.2 });
    expect(Math.abs(r.thermalSlipLength)).toBeLessThan(1e-9 * smoothWall.pitch);
  });
  it('insulating grooves in a near-perfect conductor converge to Philip’s adiabatic-groove b_t at close to second order on the edge-graded mesh; within 1 % at the default grid (Philip 1972)', () => {
    const wall = { ...smoothWall, grooveWidth: 10e-6, lubricantConductivity: 1e-7, solidConductivity: 1e5 };
    const philip = thermalSlipAdiabaticGrooves(20e-6, 0.5);
    const coarse = thermalSlipField(wall, 48).thermalSlipLength;
    const fine = thermalSlipField(wall, 96).thermalSlipLength;
    const order = Math.log2(Math.abs(coarse / philip - 1) / Math.abs(fine / philip - 1));
    expect(order).toBeGreaterThan(1.5);
    expect(Math.abs((2 * fine - coarse) / philip - 1)).toBeLessThan(0.01);
    expect(Math.abs(thermalSlipField(wall).thermalSlipLength / philip - 1)).toBeLessThan(0.01);
  });
  it('closed-form laminate estimate is within 5 % of the field for a conductive lubricant, d/w = ½ (team comparison, k_o/k_s = 2 and 5)', () => {
    for (const k of [0.4, 1.0]) {
      const field = thermalSlipField({ ...smoothWall, grooveWidth: 10e-6, grooveDepth: 5e-6, lubricantConductivity: k }).thermalSlipLength;
      const closed = thermalSlipLubricantGrooves(20e-6, 10e-6, 5e-6, 0.6, k, 0.2).thermalSlipLength;
      expect(field).toBeLessThan(0);
      expect(Math.abs(closed / field - 1)).toBeLessThan(0.05);
    }
  });
  it('superposition 1/Nu = 1/Nu_slip + b_t/D_h: field Nu against the closed form fed with the field’s own b and b_t (P/H = 0.05), 1 %', () => {
    const wall = { ...smoothWall, pitch: 10e-6, grooveWidth: 5e-6, grooveDepth: 5e-6, lubricantConductivity: 0.6 };
    const section = solveHeatCrossSection({ ...sectionBase, wall, lubricantViscosity: 2e-3, heatedWalls: 'both' });
    const bt = thermalSlipField(wall).thermalSlipLength;
    const closed = nusseltUniformFluxPlates(section.slipLength / 200e-6, bt / 200e-6)!;
    expect(section.slipLength).toBeGreaterThan(0);
    expect(Math.abs(closed / section.nusselt! - 1)).toBeLessThan(0.01);
  });
  it('zero-net-flux lubricant slips less than co-flowing lubricant (back-pressure opposes the lid drag; physics)', () => {
    const wall = { ...smoothWall, grooveWidth: 10e-6 };
    const co = solveHeatCrossSection({ ...sectionBase, wall, heatedWalls: 'both' });
    const zero = solveHeatCrossSection({ ...sectionBase, wall, heatedWalls: 'both', lubricantMotion: 'zero-net-flux' });
    expect(zero.slipLength).toBeLessThan(co.slipLength);
    expect(zero.slipLength).toBeGreaterThan(0);
  });
});
