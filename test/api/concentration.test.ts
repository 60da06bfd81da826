/**
 * Surfactant concentrations by mass: "1 mg/L" and "1 ppm" are converted to
 * mol/m³ with the surfactant's molar mass (and, for a mass fraction, the
 * working fluid's density), and the response says how.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { surfactantCalculation } from '../../src/api/routes/surfactant.js';
import { DesignSchema } from '../../src/api/schemas/design.js';
import { getSurfactant } from '../../src/materials/surfactants.js';
import { resolveFluid } from '../../src/materials/resolve.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

const example = surfactantCalculation.example as Record<string, unknown> & { waterQuality: Record<string, unknown> };

// Sodium dodecyl sulfate, C12H25NaO4S: 288.38 g/mol. Witnesses: the sum of the IUPAC 1995 standard atomic weights
// (Coplen 1996, Atomic weights of the elements 1995, Pure Appl. Chem. 68, 2339–2359, Table 2), and the same
// 288.38 g/mol printed in the chemeurope.com encyclopedia entry "Sodium dodecyl sulfate".
const SDS_MOLAR_MASS = 0.28838; // kg/mol
const atomicWeights = { C: 12.0107, H: 1.00794, Na: 22.98977, O: 15.9994, S: 32.066 }; // Coplen (1996), Table 2
const relative = (a: number, b: number) => Math.abs(a / b - 1);

describe('mass concentrations of surfactants', () => {
  it('the catalogue molar mass of SDS is the formula C12H25NaO4S weighed with the standard atomic weights (288.38 g/mol)', () => {
    const { C, H, Na, O, S } = atomicWeights;
    const fromFormula = (12 * C + 25 * H + Na + 4 * O + S) / 1000;
    expect(fromFormula).toBeCloseTo(SDS_MOLAR_MASS, 5);
    expect(getSurfactant('sds')!.molarMass!.value).toBe(SDS_MOLAR_MASS);
    // The octylphenol ethoxylate: C14H22O(C2H4O)n, n = 9.5 as the catalogue entry describes it.
    expect(getSurfactant('octylphenol-ethoxylate')!.molarMass!.value).toBeCloseTo((33 * C + 60 * H + 10.5 * O) / 1000, 5);
  });

  it('"1 mg/L" of SDS equals the molar value 1e-3 kg/m³ / 0.28838 kg/mol = 3.46765e-3 mol/m³ (same result as the molar request)', async () => {
    const molar = 1e-3 / SDS_MOLAR_MASS;
    expect(molar).toBeCloseTo(3.46765e-3, 8);
    const byMass = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: '1 mg/L' } } });
    const byMoles = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: molar } } });
    expect(byMass.statusCode).toBe(200);
    const a = byMass.json();
    const b = byMoles.json();
    expect(relative(a.inputs.waterQuality.bulkConcentration, molar)).toBeLessThan(1e-12);
    expect(a.result).toEqual(b.result);
    expect(a.assumptions.join(' ')).toMatch(/"1 mg\/L" converted to 0\.003467[67] mol\/m³ with the molar mass 288\.38 g\/mol \(iupac-atomic-weights-1995\)/);
    // The same normalised inputs: a cache keyed by the inputs hash sees one calculation.
    expect(a.provenance.inputsHash).toBe(b.provenance.inputsHash);
  });

  it('"1 ppm" is a mass fraction (1 mg/kg): converted with the working fluid density at its temperature', () => {
    const parsed = DesignSchema.parse({ workingFluid: { id: 'water', temperature: '80 degC' }, waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: '1 ppm' } });
    const density = resolveFluid({ id: 'water', temperature: 353.15 }).density;
    expect(density).toBeLessThan(980); // water at 80 °C, not the nominal 1 kg/L
    expect(relative(parsed.waterQuality!.bulkConcentration as number, (1e-6 * density) / SDS_MOLAR_MASS)).toBeLessThan(1e-12);
    // An explicit density wins; no working fluid at all: the nominal 1 kg/L.
    const given = DesignSchema.parse({ workingFluid: { id: 'water', density: 1025 }, waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: '1 ppm' } });
    expect(relative(given.waterQuality!.bulkConcentration as number, (1e-6 * 1025) / SDS_MOLAR_MASS)).toBeLessThan(1e-12);
    const none = DesignSchema.parse({ waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: ['250 ppb', '2 mg/kg'] } });
    expect(none.waterQuality!.bulkConcentration).toEqual([(2.5e-7 * 1000) / SDS_MOLAR_MASS, (2e-6 * 1000) / SDS_MOLAR_MASS].map((v) => expect.closeTo(v, 15)));
  });

  it('a molar mass given in the document wins over the catalogue, and converts the critical micelle concentration too', () => {
    const parsed = DesignSchema.parse({
      waterQuality: { surfactant: { id: 'sds', molarMass: '300 g/mol', criticalMicelleConcentration: '2.4 g/L' }, bulkConcentration: '3 mg/L' },
    });
    expect(parsed.waterQuality!.bulkConcentration).toBeCloseTo(3e-3 / 0.3, 15);
    expect(parsed.waterQuality!.surfactant.criticalMicelleConcentration).toBeCloseTo(2.4 / 0.3, 12);
    // The models take molar values only: the molar mass is not passed on.
    expect('molarMass' in parsed.waterQuality!.surfactant).toBe(false);
  });

  it('out-of-range mass concentrations are refused naming the field', async () => {
    for (const value of ['2000 g/L', '2 kg/kg']) {
      const res = await app.inject({ method: 'POST', url: '/v1/surfactant', payload: { ...example, waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: value } } });
      expect(res.statusCode).toBe(422);
      expect(res.json().errors[0].path).toBe('waterQuality.bulkConcentration');
    }
  });
});
