import { describe, expect, it } from 'vitest';
import { MissingInputError } from '../../../src/core/errors.js';
import { MODEL_IDS } from '../../../src/core/models.js';
import { REFERENCES } from '../../../src/core/references.js';
import { catalogue } from '../../../src/materials/lookup.js';
import { DesignContext } from '../../../src/physics/design/context.js';
import type { DesignDocument, Question } from '../../../src/physics/design/document.js';
import { MODELS } from '../../../src/physics/design/models.js';
import { QUESTIONS } from '../../../src/physics/design/questions.js';

// An invented demo design (SI): hexadecane in 50 µm grooves, water in a 2 mm laminar channel.
const design: DesignDocument = {
  texture: { grooveWidth: 50e-6, pitch: 100e-6, grooveDepth: 25e-6, grooveLength: 0.02, grooveEnds: 'open' },
  lubricant: { id: 'n-hexadecane', temperature: 298.15 },
  workingFluid: { id: 'water', temperature: 298.15 },
  contactAngles: { underWorkingFluid: { advancing: 40, receding: 10 } },
  flow: { kind: 'channel', height: 2e-3, bulkVelocity: 0.2 },
  orientation: { inclination: 30, facing: 'up', downslope: 'with-flow' },
  waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: 1e-3 },
  solid: { thermalConductivity: 0.2, substrateThickness: 20e-6 },
  heating: { condition: 'uniform-flux', heatedWalls: 'both' },
  options: { method: 'closed-form', surfactantMethod: 'scaling', duration: 600, mapResolution: 4 },
};
const questions = Object.keys(QUESTIONS) as Question[];

/** Paths of non-finite numbers in a value (typed arrays included). */
function nonFinite(value: unknown, path = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (ArrayBuffer.isView(value)) return Array.from(value as unknown as ArrayLike<number>).flatMap((v, i) => nonFinite(v, `${path}[${i}]`));
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
}

describe('the same design document answers every question', () => {
  it.each(questions)('%s: a result, finite numbers and only registered models', (question) => {
    const answer = QUESTIONS[question](new DesignContext(design, catalogue));
    expect(answer.result).toBeDefined();
    expect(nonFinite(answer.result)).toEqual([]);
    for (const id of answer.models) expect(MODEL_IDS).toContain(id);
    expect(answer.inputs).toHaveProperty(question === 'flow' ? 'flow' : 'texture');
  });

  it('one context computes the slip solution once per method and shares it between questions', () => {
    const ctx = new DesignContext(design, catalogue);
    const a = ctx.slip('retention', 'closed-form').result;
    QUESTIONS.waves(ctx);
    QUESTIONS.heat(ctx);
    expect(ctx.slip('slip', 'closed-form').result).toBe(a);
  });
});

describe('a question names the missing part it needs (path and question)', () => {
  const cases: [Question, string, (d: DesignDocument) => DesignDocument][] = [
    ['flow', 'flow', ({ flow: _f, ...d }) => d],
    ['wetting', 'contactAngles', ({ contactAngles: _c, ...d }) => d],
    ['retention', 'contactAngles.underWorkingFluid', (d) => ({ ...d, contactAngles: {} })],
    ['retention', 'texture.grooveLength', (d) => ({ ...d, texture: { grooveWidth: 50e-6, pitch: 100e-6, grooveDepth: 25e-6 } })],
    ['retention', 'orientation.downslope', (d) => ({ ...d, orientation: { inclination: 30, facing: 'up' } })],
    ['slip', 'lubricant', ({ lubricant: _l, ...d }) => d],
    ['waves', 'interfacialTension', (d) => ({ ...d, lubricant: { density: 900, viscosity: 0.01 } })],
    ['waves', 'orientation.facing', (d) => ({ ...d, orientation: { inclination: 30, downslope: 'with-flow' } })],
    ['surfactant', 'waterQuality', ({ waterQuality: _w, ...d }) => d],
    ['heat', 'solid', ({ solid: _s, ...d }) => d],
    ['heat', 'lubricant.specificHeat', (d) => ({ ...d, lubricant: { density: 900, viscosity: 0.01, thermalConductivity: 0.15 } })],
  ];
  it.each(cases)('%s without %s', (question, path, strip) => {
    let error: unknown;
    try {
      QUESTIONS[question](new DesignContext(strip(design), catalogue));
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(MissingInputError);
    expect((error as MissingInputError).field).toBe(path);
    expect((error as MissingInputError).question).toBe(question);
    expect((error as MissingInputError).message).toMatch(new RegExp(`^${path.replace('.', '\\.')} is required: ${question} needs `));
  });
});

describe('the chains between the models', () => {
  it('wetting → slip: a lubricant displaced at equilibrium (120° under water) flags the slip as unstable', () => {
    const answer = QUESTIONS.slip(new DesignContext({ ...design, contactAngles: { underWorkingFluid: { advancing: 130, receding: 110, equilibrium: 120 } } }, catalogue));
    expect(answer.warnings.map((w) => w.code)).toContain('lubricant-not-stable');
  });
  it('slip → retention: the interfacial shear of the slip solution drains the grooves (its ratio is stated)', () => {
    const answer = QUESTIONS.retention(new DesignContext(design, catalogue));
    expect(answer.assumptions.some((a) => /Interfacial shear = wall shear × 0\.\d+ from the closed-form slip solution/.test(a))).toBe(true);
    expect(answer.verdict?.criterion).toMatch(/target fill/);
  });
  it('by default retention, surfactant and heat take the exact-core slip (retention: its interfacial shear ratio, not the closed form’s)', () => {
    const { options: _closedForm, ...defaults } = design;
    const ctx = new DesignContext({ ...defaults, options: { surfactantMethod: 'scaling', duration: 600 } }, catalogue);
    const retention = QUESTIONS.retention(ctx);
    const exact = ctx.slip('retention', 'auto').result;
    const closed = ctx.slip('retention', 'closed-form').result;
    expect(exact.method).toBe('exact-core');
    expect(retention.assumptions).toContain(`Interfacial shear = wall shear × ${exact.interfacialShearRatio.toPrecision(4)} from the exact-core slip solution.`);
    // Hexadecane (N ≈ 3) in 50/100/25 µm grooves: the closed-form ratio differs from the exact one by more than 1 %.
    expect(Math.abs(closed.interfacialShearRatio / exact.interfacialShearRatio - 1)).toBeGreaterThan(0.01);
    expect(QUESTIONS.surfactant(ctx).assumptions).toContain('Clean slip from the exact-core slip solution (as slip).');
    expect(QUESTIONS.heat(ctx).models).toContain('heat.thermal-slip-exact-core');
  });
  it('internal paths of the models’ errors reach the caller as document paths (heat refuses a plate flow, naming flow.kind)', () => {
    let error: { field?: string } | undefined;
    try {
      QUESTIONS.heat(new DesignContext({ ...design, flow: { kind: 'plate', freeStreamVelocity: 1, distance: 0.1 } }, catalogue));
    } catch (e) {
      error = e as { field?: string };
    }
    expect(error?.field).toBe('flow.kind');
  });
});

describe('model registry', () => {
  it('has exactly one entry per model id, each with a function and known references', () => {
    expect(Object.keys(MODELS).sort()).toEqual([...MODEL_IDS].sort());
    for (const entry of Object.values(MODELS)) {
      expect(typeof entry.implementation).toBe('function');
      for (const key of entry.references) expect(REFERENCES).toHaveProperty(key);
    }
  });
});
