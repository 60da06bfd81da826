/**
 * examples/python/oilskin_lab.py run with the machine's python3 against live
 * services (two child processes on 127.0.0.1, so the fan-out really spans
 * several URLs). Skipped when python3 is absent; a step whose route this
 * service does not serve yet (per its own /openapi.json) is skipped with a
 * message saying which route.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { startService, type ChildService } from '../../bench/child-service.js';

const script = fileURLToPath(new URL('../../examples/python/oilskin_lab.py', import.meta.url));
const python = spawnSync('python3', ['--version'], { encoding: 'utf8' });
const hasPython = python.status === 0;
if (!hasPython) console.warn('python3 is not installed: the Python example is not run (install python3 to run it)');

let services: ChildService[] = [];
let routes: string[] = [];
let dir = '';
beforeAll(async () => {
  if (!hasPython) return;
  dir = mkdtempSync(join(tmpdir(), 'oilskin-python-'));
  services = await Promise.all([0, 1].map(() => startService({ sources: true, env: { OILSKIN_WORKERS: '1' } })));
  const document = (await (await fetch(`${services[0]!.base}/openapi.json`)).json()) as { paths: Record<string, unknown> };
  routes = Object.keys(document.paths);
}, 300_000);
afterAll(() => {
  for (const s of services) s.child.kill('SIGTERM');
  if (dir) rmSync(dir, { recursive: true, force: true });
});

function runExample(...args: string[]) {
  const urls = services.flatMap((s) => ['--url', s.base]);
  return spawnSync('python3', [script, ...urls, ...args], { encoding: 'utf8', timeout: 180_000 });
}

/** Skip this test, saying which route is missing, when the service does not serve it yet. */
function needsRoute(route: string, skip: (note?: string) => void): void {
  if (!routes.includes(route)) {
    const note = `${route} is not served by this build of the service yet: this step of the Python example is skipped`;
    console.warn(note);
    skip(note);
  }
}

describe.skipIf(!hasPython)('Python example (standard library only) against live services', () => {
  it('one assessment: prints the overall verdict and every mechanism, exit 0', (ctx) => {
    needsRoute('/v1/assess', ctx.skip);
    const run = runExample('--steps', 'assess');
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/^assessment: (works|works-with-conditions|fails) \(limiting: \w+\)/m);
    for (const mechanism of ['wetting', 'retention', 'waves', 'slipAndDrag', 'surfactant', 'heat']) expect(run.stdout).toContain(`  ${mechanism}`);
  });

  it('a streamed sweep with a progress display, written to a CSV file, exit 0', async (ctx) => {
    needsRoute('/v1/sweep', ctx.skip);
    const csvPath = join(dir, 'sweep.csv');
    const run = runExample('--steps', 'sweep', '--csv', csvPath);
    expect(run.status, run.stderr).toBe(0);
    expect(run.stderr).toMatch(/progress: 60\/60 points, 0 failed/);
    expect(run.stdout).toContain(`sweep: 60 points (0 failed) written to ${csvPath}`);
    const lines = readFileSync(csvPath, 'utf8').trim().split(/\r?\n/);
    expect(lines).toHaveLength(61);
    const header = lines[0]!.split(',');
    expect(header.slice(0, 3)).toEqual(['index', 'flow.height (m)', 'flow.bulkVelocity (m/s)']);
    const tau = header.indexOf('result.wallShearStress (Pa)');
    const first = lines[1]!.split(',');
    // Laminar plane Poiseuille flow (exact): τ_w = 6 μ U / H at the first point (H = 5 mm, U = 0.1 m/s, bulk Reynolds
    // number about 500), with the viscosity of water the service echoes for this design.
    const single = await fetch(`${services[0]!.base}/v1/flow`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '5 mm', bulkVelocity: '0.1 m/s' } }),
    });
    const echo = (await single.json()) as { inputs: { workingFluid: { viscosity: { value: number } } }; result: { wallShearStress: number } };
    expect(Number(first[tau])).toBeCloseTo((6 * echo.inputs.workingFluid.viscosity.value * 0.1) / 0.005, 10);
    expect(Number(first[tau])).toBe(echo.result.wallShearStress);
  });

  it('shards fanned out over two services, merged and checked, exit 0', (ctx) => {
    needsRoute('/v1/sweep', ctx.skip);
    const run = runExample('--steps', 'fanout', '--shards', '6');
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toMatch(new RegExp(`fan-out: 60 points in 6 shards over 2 services \\(3 on ${services[0]!.base}, 3 on ${services[1]!.base}\\)`));
  });

  it('reports a failed step on stderr and exits 1 (here: a service that does not answer)', () => {
    const run = spawnSync('python3', [script, '--url', 'http://127.0.0.1:9', '--steps', 'sweep', '--csv', join(dir, 'never.csv')], { encoding: 'utf8', timeout: 60_000 });
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/^sweep failed: /m);
  });

  it('refuses unknown steps with exit 2', () => {
    const run = spawnSync('python3', [script, '--steps', 'everything'], { encoding: 'utf8' });
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/unknown steps/);
  });
});
