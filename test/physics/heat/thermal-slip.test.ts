import { describe, expect, it } from 'vitest';
import { stripedThermalSlip, thermalSlipAdiabaticGrooves, thermalSlipIsofluxRidges, thermalSlipLubricantGrooves } from '../../../src/physics/heat/thermal-slip.js';

const ZETA3 = 1.2020569031595942; // Apéry's constant ζ(3) (OEIS A002117)

describe('thermal slip closed forms', () => {
  it('adiabatic grooves: P = 1, φ = ½ gives ln2/(2π) = 0.1103178 (Philip 1972 formula, exact value)', () => {
    expect(thermalSlipAdiabaticGrooves(1, 0.5)).toBeCloseTo(Math.LN2 / (2 * Math.PI), 14);
  });
  it('isoflux ridges at φ = ½: Σ_odd 1/n³/(π³/4) = 7ζ(3)/(2π³) = 0.135685 (exact from the series, sin² = 1 on odd n)', () => {
    expect(thermalSlipIsofluxRidges(1, 0.5)).toBeCloseTo((7 * ZETA3) / (2 * Math.PI ** 3), 9);
  });
  it('isoflux ridges exceed isothermal ridges (a uniform-flux source is hotter on average than an isothermal one; physical bound)', () => {
    for (const phi of [0.2, 0.5, 0.8]) {
      expect(thermalSlipIsofluxRidges(1, phi)).toBeGreaterThan(thermalSlipAdiabaticGrooves(1, phi));
    }
  });
  it('striped homogenisation with infinite local slip reduces to Philip (Belyaev & Vinogradova 2010 limit)', () => {
    expect(stripedThermalSlip(1, 0.7, 1e15)).toBeCloseTo(thermalSlipAdiabaticGrooves(1, 0.7), 12);
  });
  it('equal lubricant and solid conductivities give b_t = 0 exactly (identical wall; exact)', () => {
    const r = thermalSlipLubricantGrooves(20e-6, 10e-6, 5e-6, 0.6, 0.2, 0.2);
    expect(r.thermalSlipLength).toBe(0);
  });
  it('insulating lubricant in a perfectly conducting solid tends to the adiabatic-groove limit (Philip 1972)', () => {
    const r = thermalSlipLubricantGrooves(1, 0.5, 0.5, 1, 1e-9, 1e12);
    expect(r.thermalSlipLength).toBeCloseTo(thermalSlipAdiabaticGrooves(1, 0.5), 6);
  });
  it('lid-problem identity d/w = ½: local resistance = (k_w/k_o) w/4 (Σ_odd tanh(nπ/2)/n³ = π³/32, exact)', () => {
    const r = thermalSlipLubricantGrooves(2, 1, 0.5, 0.6, 0.15, 1e9);
    expect(r.grooveExcessResistance).toBeCloseTo((0.6 / 0.15) * 0.25 - 0.6 * 0.25 / 1e9, 12);
  });
  it('a conductive lubricant gives a negative thermal slip (enhancement), sign per physics of parallel resistances', () => {
    expect(thermalSlipLubricantGrooves(20e-6, 10e-6, 5e-6, 0.6, 1.0, 0.2).thermalSlipLength).toBeLessThan(0);
  });
});
