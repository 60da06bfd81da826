import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { FluidState } from '../../../src/core/fluid.js';
import { DomainError } from '../../../src/core/errors.js';
import { Notes } from '../../../src/core/notes.js';
import { evaluateFlow } from '../../../src/physics/flow/flow.js';
import type { Scenario } from '../../../src/physics/scenario.js';
import { dissolutionLifetime, LEVEQUE_MEAN_COEFFICIENT, wilkeChangDiffusivity } from '../../../src/physics/retention/dissolution.js';

const reference = JSON.parse(readFileSync(new URL('../../../fixtures/retention/retention_reference.json', import.meta.url), 'utf8')) as {
  levequeMeanCoefficient: number;
};

function fluid(id: string, props: Partial<FluidState>): FluidState {
  return { id, name: id, temperature: 293.15, density: 998, viscosity: 1.0e-3, origins: {}, references: [], warnings: [], ...props };
}

describe('dissolution lifetime', () => {
  it('mean Lévêque coefficient 3/(2Γ(4/3)9^(1/3)) = 0.8075 (scipy.special.gamma in the fixture)', () => {
    expect(LEVEQUE_MEAN_COEFFICIENT).toBeCloseTo(reference.levequeMeanCoefficient, 14);
  });
  it('Wilke–Chang scales as T/(μ V_b^0.6) (exact property of the correlation)', () => {
    const base = wilkeChangDiffusivity(293.15, 1e-3, 0.018015, 229e-6);
    expect(wilkeChangDiffusivity(2 * 293.15, 1e-3, 0.018015, 229e-6) / base).toBeCloseTo(2, 12);
    expect(wilkeChangDiffusivity(293.15, 2e-3, 0.018015, 229e-6) / base).toBeCloseTo(0.5, 12);
    expect(wilkeChangDiffusivity(293.15, 1e-3, 0.018015, 2 * 229e-6) / base).toBeCloseTo(2 ** -0.6, 12);
    // Order of magnitude of small-molecule diffusivities in water, 10⁻¹⁰–10⁻⁹ m²/s (common practice, no source).
    expect(base).toBeGreaterThan(1e-10);
    expect(base).toBeLessThan(1e-9);
  });
  it('decane in turbulent once-through water lasts months (order of magnitude; common practice, no source)', () => {
    const scenario: Scenario = {
      texture: { grooveWidth: 50e-6, grooveDepth: 20e-6, pitch: 100e-6, flowAngle: 0 },
      lubricant: fluid('decane', { density: 730, viscosity: 0.92e-3 }),
      workingFluid: fluid('water', {}),
      flow: evaluateFlow({ density: 998, viscosity: 1.0e-3 }, { kind: 'channel', height: 0.01, bulkVelocity: 1 }).result,
      interfacialTension: 0.02,
    };
    // Decane: M = 0.14228 kg/mol (C10H22). Le Bas volume 10 × 14.8 + 22 × 3.7 = 229.4 cm³/mol [derived] from the
    // atomic increments C 14.8, H 3.7 cm³/mol of a textbook table read ("Table 24.5, Atomic volume increments for
    // estimation of molecular volumes at the normal boiling point", Scribd document 373545244; book not named there).
    // Solubility about 0.05 mg/L is from memory: the IUPAC–NIST evaluation of decane–water (Haulait-Pirson & Hefter,
    // srdata.nist.gov sysID 38_238, read) recommends no value because the measurements disagree; an order-of-magnitude
    // test: the solubility would have to be off by ×10 to change its outcome.
    const solubility = { value: 5.2e-5, unit: 'kg/m3' as const, molarMass: 0.14228, molarVolumeAtBoilingPoint: (10 * 14.8 + 22 * 3.7) * 1e-6 };
    const r = dissolutionLifetime({ solubility, scenario, grooveLength: 0.05 }, new Notes());
    const months = r.lifetime! / (30 * 86400);
    expect(r.correlation).toBe('shaw-hanratty');
    expect(months).toBeGreaterThan(0.3);
    expect(months).toBeLessThan(30);
  });
});

describe('dissolution input checks', () => {
  const scenario: Scenario = {
    texture: { grooveWidth: 50e-6, grooveDepth: 20e-6, pitch: 100e-6, flowAngle: 0 },
    lubricant: fluid('oil', { density: 900, viscosity: 0.01 }),
    workingFluid: fluid('glycerol-mix', { density: 1100, viscosity: 5e-3 }),
    flow: { kind: 'wall-shear', wallShearStress: 1, frictionVelocity: 0.03, viscousLength: 1.5e-4, regime: 'laminar' },
  };
  it('a working fluid other than water needs an explicit diffusivity (Wilke–Chang is set up for water): DomainError naming it', () => {
    let error: unknown;
    try {
      dissolutionLifetime({ solubility: { value: 1e-3, unit: 'kg/m3', molarMass: 0.2 }, scenario, grooveLength: 0.01 }, new Notes());
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(DomainError);
    expect((error as DomainError).field).toBe('solubility.diffusivity');
  });
  it('laminar flow uses the Lévêque coefficient, which falls as L^(−1/3) with the strip length (exact property of the formula)', () => {
    const given = { value: 1e-3, unit: 'kg/m3' as const, diffusivity: 1e-9 };
    const short = dissolutionLifetime({ solubility: given, scenario, grooveLength: 0.01 }, new Notes());
    const long = dissolutionLifetime({ solubility: given, scenario, grooveLength: 0.08 }, new Notes());
    expect(short.correlation).toBe('leveque');
    expect(long.massTransferCoefficient! / short.massTransferCoefficient!).toBeCloseTo(0.5, 12);
  });
});
