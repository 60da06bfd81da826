/**
 * The assessment's overall verdict and requirement defaults, on hand-made mechanism verdicts: the expected answers
 * follow from the rule documented in src/physics/design/assess.ts (our own definition, no outside source).
 */
import { describe, expect, it } from 'vitest';
import { overallVerdict, THIN_MARGIN, type MechanismAssessment, type MechanismName } from '../../../src/physics/design/assess.js';
import { effectiveRequirements, REQUIREMENT_DEFAULTS } from '../../../src/physics/design/assess-requirements.js';
import { evaluateMechanisms, MECHANISMS } from '../../../src/physics/design/assess-mechanisms.js';
import { DesignContext } from '../../../src/physics/design/context.js';
import type { DesignDocument } from '../../../src/physics/design/document.js';
import { catalogue } from '../../../src/materials/lookup.js';

const ok = (margin: number): MechanismAssessment => ({ status: 'assessed', verdict: { passes: margin >= 0, margin, criterion: 'test' }, summary: 'test' });
const none: MechanismAssessment = { status: 'not-assessed', reason: 'not given' };
const all = (over: Partial<Record<MechanismName, MechanismAssessment>>): Record<MechanismName, MechanismAssessment> => ({
  wetting: ok(0.5),
  retention: ok(0.5),
  waves: ok(0.5),
  slipAndDrag: ok(0.5),
  surfactant: ok(0.5),
  heat: ok(0.5),
  ...over,
});

describe('overall verdict', () => {
  it('fails when any assessed mechanism misses its requirement, and names the smallest margin', () => {
    const o = overallVerdict(all({ waves: ok(-0.2), heat: ok(-0.7) }), 'calm');
    expect(o.verdict).toBe('fails');
    expect(o.limitingMechanism).toBe('heat');
  });
  it('works with conditions on a thin margin or a marginal wave regime; works otherwise', () => {
    expect(overallVerdict(all({ surfactant: ok(THIN_MARGIN / 2) }), 'calm').verdict).toBe('works-with-conditions');
    expect(overallVerdict(all({}), 'marginal').verdict).toBe('works-with-conditions');
    expect(overallVerdict(all({}), 'calm').verdict).toBe('works');
  });
  it('a displaced lubricant held by pinning (wetting fails, retention passes) is a condition, not the limit', () => {
    const o = overallVerdict(all({ wetting: ok(-0.3), retention: ok(0.4) }), 'calm');
    expect(o.verdict).toBe('works-with-conditions');
    expect(o.limitingMechanism).toBe('retention');
    expect(overallVerdict(all({ wetting: ok(-0.3), retention: none }), 'calm').verdict).toBe('fails');
  });
  it('mechanisms not assessed are listed, never limiting', () => {
    const o = overallVerdict(all({ heat: none, surfactant: none }), 'calm');
    expect(o.verdict).toBe('works');
    expect(o.limitingMechanism).not.toBe('heat');
    expect(o.summary).toMatch(/Not assessed: surfactant, heat transfer/);
  });
});

describe('requirements in effect', () => {
  it('given values win, then the document (duration, stated concentration), then the defaults', () => {
    const r = effectiveRequirements({ minDragReduction: 0.1 }, { duration: 600, statedConcentration: 0.01 });
    expect(r.minDragReduction).toEqual({ value: 0.1, source: 'input' });
    expect(r.serviceTime).toEqual({ value: 600, source: 'default' });
    expect(r.tolerableSurfactantConcentration).toEqual({ value: 0.01, source: 'default' });
    expect(r.minRetainedFraction).toEqual({ value: REQUIREMENT_DEFAULTS.minRetainedFraction, source: 'default' });
    expect(effectiveRequirements({}, {}).tolerableSurfactantConcentration.value).toBeNull();
  });
});

describe('margins only (the sensitivity steps and assessmentMargins)', () => {
  // Invented demo designs (SI): hexadecane in a laminar 2 mm channel, decane in a turbulent 10 mm one, and the
  // turbulent one with a low interfacial tension (wavy). Witness: the full evaluation of the same design.
  const laminar: DesignDocument = {
    texture: { grooveWidth: 30e-6, pitch: 60e-6, grooveDepth: 15e-6, grooveLength: 0.02, grooveEnds: 'open' },
    lubricant: { id: 'n-hexadecane', temperature: 293.15 },
    workingFluid: { id: 'water', temperature: 293.15 },
    contactAngles: { underWorkingFluid: { advancing: 60, receding: 20 } },
    flow: { kind: 'channel', height: 2e-3, bulkVelocity: 0.5 },
    waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: 1e-3 },
    solid: { thermalConductivity: 0.2, substrateThickness: 20e-6 },
    options: { method: 'closed-form', surfactantMethod: 'scaling' },
  };
  const turbulent: DesignDocument = {
    ...laminar,
    texture: { grooveWidth: 50e-6, pitch: 100e-6, grooveDepth: 20e-6, grooveLength: 0.1, grooveEnds: 'open' },
    lubricant: { id: 'n-decane', temperature: 293.15 },
    contactAngles: { underWorkingFluid: { advancing: 170, receding: 48, equilibrium: 100 } },
    flow: { kind: 'channel', height: 0.01, bulkVelocity: 1 },
  };
  const wavy: DesignDocument = { ...turbulent, interfacialTension: 1e-4 };
  it.each([
    ['laminar', laminar],
    ['turbulent', turbulent],
    ['turbulent, wavy', wavy],
  ] as const)('%s: every margin and the wave regime equal the full evaluation’s', (name, design) => {
    const requirements = effectiveRequirements({ serviceTime: 7200 }, {});
    const full = evaluateMechanisms(new DesignContext(design, catalogue), requirements);
    const lean = evaluateMechanisms(new DesignContext(design, catalogue), requirements, { marginsOnly: true });
    for (const name of MECHANISMS) {
      const a = full.mechanisms[name];
      const b = lean.mechanisms[name];
      expect(b.status, name).toBe(a.status);
      if (a.status === 'assessed' && b.status === 'assessed') expect(b.verdict.margin, name).toBe(a.verdict.margin);
    }
    expect(lean.couplings.waveRegime).toBe(full.couplings.waveRegime);
    if (name === 'turbulent, wavy') expect(full.couplings.waveRegime).toBe('wavy');
    expect(lean.couplings.creditedDragReductionAtServiceTime).toBe(full.couplings.creditedDragReductionAtServiceTime);
  });

  it('a drainage settled long before the service time is read as the steady column, and a step told so skips the finite-volume timeline with the same margins (witness: the full evaluation of the stepped design)', () => {
    const requirements = effectiveRequirements({ serviceTime: 7200 }, {});
    const base = evaluateMechanisms(new DesignContext(laminar, catalogue), requirements);
    // The laminar demo drains to its steady column within seconds of a two-hour service time.
    expect(base.drainageSettled).toBe(true);
    expect(base.notes.assumptions.some((a) => a.startsWith('Retention at the service time: the drainage settles'))).toBe(true);
    // A sensitivity-sized step (2 % wider grooves), evaluated in full and as a step told the base settled.
    const stepped: DesignDocument = { ...laminar, texture: { ...laminar.texture!, grooveWidth: 30e-6 * 1.02 } };
    const full = evaluateMechanisms(new DesignContext(stepped, catalogue), requirements);
    const step = evaluateMechanisms(new DesignContext(stepped, catalogue), requirements, { marginsOnly: true, drainageSettled: true });
    expect(full.drainageSettled).toBe(true);
    for (const name of MECHANISMS) {
      const a = full.mechanisms[name];
      const b = step.mechanisms[name];
      expect(b.status, name).toBe(a.status);
      if (a.status === 'assessed' && b.status === 'assessed') expect(b.verdict.margin, name).toBe(a.verdict.margin);
    }
    // The step did not solve the timeline: it carries the lumped plug's, not the finite-volume one.
    expect(step.notes.models).toContain('retention.drainage-lumped-plug');
    expect(full.notes.models).toContain('retention.drainage-finite-volume');
    // A service time within the drainage (a tenth of a second) is not settled: the timeline is read.
    const short = evaluateMechanisms(new DesignContext(laminar, catalogue), effectiveRequirements({ serviceTime: 0.1 }, {}));
    expect(short.drainageSettled).toBe(false);
  });
});

describe('warnings across the assessment’s models', () => {
  it('a displaced lubricant (θ_e = 100°, hysteresis 122°) is warned of once, though wetting and retention both see it (our rule: one code, one line)', async () => {
    const { assessDesign } = await import('../../../src/physics/design/assess.js');
    const { DesignSchema } = await import('../../../src/api/schemas/design.js');
    const input = DesignSchema.parse({
      texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um', grooveLength: '20 mm', grooveEnds: 'open' },
      lubricant: { id: 'n-hexadecane', temperature: '20 degC' },
      workingFluid: { id: 'water', temperature: '20 degC' },
      contactAngles: { underWorkingFluid: { advancing: 170, receding: 48, equilibrium: 100 } },
      flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
      options: { method: 'closed-form' },
    });
    const codes = assessDesign(new DesignContext(input, catalogue), {}, { sensitivities: false }).warnings.map((w) => w.code);
    expect(codes.filter((c) => c === 'not-wetting-relies-on-pinning')).toHaveLength(1);
    expect(new Set(codes).size).toBe(codes.length);
  });
});
