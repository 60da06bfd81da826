/**
 * A lab's own catalogue file: served by GET /v1/fluids and /v1/surfactants
 * marked as user-supplied, used by calculations (inline and in the solver
 * threads) with a note and the file in the provenance, and refused at
 * start-up with a message naming the entry and the field when it is broken.
 * Expected values are the file's own (invented demo values in
 * examples/catalogue-lab.json) and the interpolation the README documents.
 */
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { CatalogueFileError, readUserCatalogue } from '../../src/api/user-catalogue-file.js';
import { FluidsResponse, SurfactantsResponse } from '../../src/api/schemas/responses/catalogue.js';
import { uninstallUserCatalogue } from '../../src/materials/user-catalogue.js';
import { runCli } from '../../src/cli/main.js';

const LAB = new URL('../../examples/catalogue-lab.json', import.meta.url).pathname;
const lab = JSON.parse(readFileSync(LAB, 'utf8'));
const dir = mkdtempSync(join(tmpdir(), 'oilskin-catalogue-'));

/** The example file with one change, written to a temporary file. */
function variant(name: string, change: (copy: typeof lab) => void, format: 'json' | 'yaml' = 'json'): string {
  const copy = structuredClone(lab);
  change(copy);
  const path = join(dir, `${name}.${format}`);
  writeFileSync(path, JSON.stringify(copy, null, 2));
  return path;
}

function refusal(path: string): string {
  try {
    readUserCatalogue(path);
  } catch (error) {
    expect(error).toBeInstanceOf(CatalogueFileError);
    return (error as Error).message;
  }
  throw new Error('the file was accepted');
}

const channel = { kind: 'channel', height: '10 mm', bulkVelocity: '0.5 m/s' };
const texture = { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' };

describe('a user catalogue file', () => {
  let app: FastifyInstance;
  beforeAll(async () => {
    app = await makeApp({ catalogueFile: LAB });
  });
  afterAll(async () => {
    await app.close();
    uninstallUserCatalogue();
  });

  it('adds its fluids and surfactants to the listings, marked user; built-in entries stay and say built-in', async () => {
    const fluids = FluidsResponse.parse((await app.inject('/v1/fluids')).json());
    const byId = new Map(fluids.fluids.map((f) => [f.id, f]));
    expect(byId.get('water')?.origin).toBe('built-in');
    const oil = byId.get('lab-polyalphaolefin-6')!;
    expect(oil.origin).toBe('user');
    expect(oil.role).toBe('lubricant');
    expect(oil.safety).toMatch(/Combustible/);
    expect(oil.properties.density?.source).toBe('user:lab-polyalphaolefin-6');
    expect(fluids.references.some((r) => r.key === 'user:lab-polyalphaolefin-6' && r.citation.includes('Example Lab'))).toBe(true);
    const surfactants = SurfactantsResponse.parse((await app.inject('/v1/surfactants')).json());
    const ctab = surfactants.surfactants.find((s) => s.id === 'lab-cetyltrimethylammonium-bromide')!;
    expect(ctab.origin).toBe('user');
    expect(ctab.molarMass?.value).toBeCloseTo(0.36445, 12);
    expect(surfactants.surfactants.find((s) => s.id === 'sds')?.origin).toBe('built-in');
  });

  it('is used by a calculation: values from the file (tables interpolated, viscosity log-linearly), a note, the file and its hash in the provenance, its safety note', async () => {
    const res = await app.inject({
      method: 'POST',
      url: '/v1/flow',
      payload: { workingFluid: { id: 'lab-cooling-loop-water', temperature: '40 degC' }, flow: channel, texture },
    });
    expect(res.statusCode).toBe(200);
    const body = res.json();
    const fluid = body.inputs.workingFluid;
    // Linear between the file's 20 °C and 60 °C points: (1038 + 1019)/2.
    expect(fluid.density).toEqual({ value: 1028.5, source: 'user:lab-cooling-loop-water' });
    // Linear in ln μ: the geometric mean of 2.4 and 0.95 mPa·s.
    expect(fluid.viscosity.value).toBeCloseTo(Math.sqrt(2.4e-3 * 0.95e-3), 15);
    expect(body.warnings).toContainEqual(expect.objectContaining({ code: 'user-catalogue-entry', severity: 'info' }));
    expect(body.provenance.userCatalogue).toEqual({
      file: 'catalogue-lab.json',
      sha256: createHash('sha256').update(readFileSync(LAB)).digest('hex'),
      entries: ['lab-cooling-loop-water'],
    });
    expect(body.safety).toEqual([
      { id: 'lab-cooling-loop-water', name: 'water with 30 % ethylene glycol by mass', parts: ['workingFluid'], origin: 'user', note: lab.fluids[1].safety },
    ]);
    // A constant outside its stated range carries the usual extrapolation caution; freezing is still impossible.
    const cold = await app.inject({ method: 'POST', url: '/v1/flow', payload: { workingFluid: { id: 'lab-cooling-loop-water', temperature: '-20 degC' }, flow: channel } });
    expect(cold.statusCode).toBe(422);
    expect(cold.json().errors[0].path).toBe('workingFluid.temperature');
  });

  it('converts a kinematic-viscosity table with the entry density, and a mass concentration with the entry molar mass', async () => {
    const { DesignSchema } = await import('../../src/api/schemas/design.js');
    const parsed = DesignSchema.parse({ waterQuality: { surfactant: { id: 'lab-cetyltrimethylammonium-bromide' }, bulkConcentration: '1 mg/L' } });
    expect(parsed.waterQuality!.bulkConcentration).toBeCloseTo(1e-3 / 0.36445, 12);
    const res = await app.inject({
      method: 'POST',
      url: '/v1/slip',
      payload: { lubricant: { id: 'lab-polyalphaolefin-6', temperature: '25 degC' }, workingFluid: { id: 'water' }, flow: channel, texture, options: { method: 'closed-form' } },
    });
    expect(res.statusCode).toBe(200);
    // 50 cSt at 25 °C times the density 840 − 22·25/40 = 826.25 kg/m³ (linear between the 0 and 40 °C points).
    expect(res.json().inputs.lubricant.viscosity.value).toBeCloseTo(50e-6 * 826.25, 12);
    expect(res.json().inputs.lubricant.interfacialTensionWater).toEqual({ value: 0.048, source: 'user:lab-polyalphaolefin-6' });
    expect(res.json().provenance.userCatalogue.entries).toEqual(['lab-polyalphaolefin-6']);
  });

  it('reaches the solver threads: a field solve in the pool uses the user lubricant', async () => {
    const pooled = await makeApp({ catalogueFile: LAB, workerThreads: 1, queueTimeoutMs: 60_000 });
    try {
      await pooled.solverPool.ready();
      const payload = { lubricant: { id: 'lab-polyalphaolefin-6' }, workingFluid: { id: 'water' }, flow: channel, texture, options: { method: 'field' } };
      const res = await pooled.inject({ method: 'POST', url: '/v1/slip', payload });
      expect(res.json()).not.toHaveProperty('status');
      expect(res.statusCode).toBe(200);
      const inline = await app.inject({ method: 'POST', url: '/v1/slip', payload });
      expect(res.json().inputs).toEqual(inline.json().inputs);
      expect(res.json().result.interfacialShearRatio).toBe(inline.json().result.interfacialShearRatio);
      expect(res.json().inputs.lubricant.density.source).toBe('user:lab-polyalphaolefin-6');
    } finally {
      await pooled.close();
    }
  });
});

describe('a broken user catalogue', () => {
  it('is refused with a message naming the file, the entry and the field', () => {
    const negative = refusal(variant('negative', (c) => (c.fluids[0].properties.viscosity = { value: '-3 mPa.s' })));
    expect(negative).toMatch(/negative\.json/);
    expect(negative).toMatch(/fluids\[0\] \(id "lab-polyalphaolefin-6"\)\.properties\.viscosity/);
    const shadow = refusal(variant('shadow', (c) => (c.fluids[1].id = 'water')));
    expect(shadow).toMatch(/fluids\[1\] \(id "water"\)\.id: "water" is a built-in entry/);
    // A former built-in id still resolves to its entry, so it is reserved too.
    const former = refusal(variant('former', (c) => (c.surfactants[0].id = 'triton-x-100')));
    expect(former).toMatch(/surfactants\[0\] \(id "triton-x-100"\)\.id: "triton-x-100" is a built-in entry/);
    const twice = refusal(variant('twice', (c) => (c.fluids[1].id = c.fluids[0].id)));
    expect(twice).toMatch(/appears twice/);
    const unit = refusal(variant('unit', (c) => (c.surfactants[0].molarMass = '364 g/m')));
    expect(unit).toMatch(/surfactants\[0\] \(id "lab-cetyltrimethylammonium-bromide"\)\.molarMass/);
    expect(unit).toMatch(/wrong dimension/);
    const unknown = refusal(variant('unknown', (c) => (c.fluids[0].properties.colour = 'amber')));
    expect(unknown).toMatch(/fluids\[0\] \(id "lab-polyalphaolefin-6"\)\.properties\.colour: unknown field/);
    const missing = refusal(variant('missing', (c) => delete c.fluids[0].properties.density));
    expect(missing).toMatch(/properties\.density: missing required property/);
    expect(refusal(join(dir, 'absent.json'))).toMatch(/cannot be read/);
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, '{ "fluids": [ ');
    expect(refusal(bad)).toMatch(/cannot be parsed as JSON/);
  });

  it('stops the service at start-up (child process): exit 78, one message on stderr, nothing listening', () => {
    const broken = variant('start-up', (c) => (c.fluids[0].properties.density = { table: [['20 degC', '800 kg/m^3']] }));
    const child = spawnSync(process.execPath, ['--import', 'tsx', 'src/api/server.ts'], {
      env: { ...process.env, OILSKIN_CATALOGUE_FILE: broken, OILSKIN_PORT: '0', OILSKIN_WORKERS: '0' },
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(child.status).toBe(78);
    expect(child.stderr).toMatch(/^oilskin: cannot start: user catalogue .*start-up\.json is not valid:/);
    expect(child.stderr).toMatch(/fluids\[0\] \(id "lab-polyalphaolefin-6"\)\.properties\.density\.table/);
    expect(child.stdout).not.toMatch(/listening/i);
  });
});

describe('YAML and the command line', () => {
  it('reads the same catalogue from YAML (JSON is YAML)', () => {
    const path = variant('lab', () => {}, 'yaml');
    const fromYaml = readUserCatalogue(path);
    const fromJson = readUserCatalogue(LAB);
    expect(fromYaml.fluids).toEqual(fromJson.fluids);
    const indented = join(dir, 'block.yml');
    writeFileSync(
      indented,
      [
        'fluids:',
        '  - id: lab-light-oil',
        '    name: light paraffinic oil',
        '    role: lubricant',
        '    description: demo entry',
        '    source: { citation: invented demo values }',
        '    referenceTemperature: 20 degC',
        '    properties:',
        '      density: 850 kg/m^3',
        '      viscosity: 20 mPa.s',
      ].join('\n'),
    );
    expect(readUserCatalogue(indented).fluids[0]!.properties.viscosity).toEqual({ value: 0.02 });
  });

  it('--catalogue adds the file for one CLI run; a broken file exits 2 naming the entry and field', () => {
    const design = JSON.stringify({ workingFluid: { id: 'lab-cooling-loop-water' }, flow: channel });
    const ok = runCli(['--catalogue', LAB, 'flow', 'design.json'], () => design, {});
    expect(ok.code).toBe(0);
    expect(JSON.parse(ok.stdout).provenance.userCatalogue.entries).toEqual(['lab-cooling-loop-water']);
    // Without the flag the entry is unknown again (the run removed it).
    const without = runCli(['flow', 'design.json'], () => design, {});
    expect(without.code).toBe(2);
    expect(JSON.parse(without.stderr).errors[0].path).toBe('workingFluid.id');
    // The environment variable does the same; the flag may also follow the calculation.
    expect(runCli(['flow', 'design.json'], () => design, { OILSKIN_CATALOGUE_FILE: LAB }).code).toBe(0);
    expect(runCli(['flow', 'design.json', `--catalogue=${LAB}`], () => design, {}).code).toBe(0);
    const broken = runCli(['--catalogue', variant('cli', (c) => (c.fluids[1].role = 'coolant')), 'flow', 'design.json'], () => design, {});
    expect(broken.code).toBe(2);
    expect(broken.stderr).toMatch(/fluids\[1\] \(id "lab-cooling-loop-water"\)\.role/);
  });
});
