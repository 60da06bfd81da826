import { beforeAll, describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runCli } from '../../src/cli/main.js';
import { runInline } from '../../src/api/calculation.js';
import { flowCalculation } from '../../src/api/routes/flow.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const scenario = JSON.parse(
  JSON.stringify({ workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' } }),
);

describe('CLI', () => {
  beforeAll(() => {
    // npm ci builds dist/ through `prepare`; build here too when the tree has not been built.
    if (!existsSync(join(root, 'dist/src/cli/main.js'))) {
      spawnSync('npx', ['tsc', '-p', 'tsconfig.build.json'], { cwd: root, stdio: 'ignore' });
    }
  }, 120_000);

  it('prints the same envelope as the HTTP route (same code path)', () => {
    const out = runCli(['flow', 'scenario.json'], () => JSON.stringify(scenario));
    expect(out.code).toBe(0);
    const cli = JSON.parse(out.stdout);
    const direct = runInline(flowCalculation, scenario);
    expect(cli.result).toEqual(JSON.parse(JSON.stringify(direct.result)));
    expect(cli.provenance.inputsHash).toBe(direct.provenance.inputsHash);
  });

  it('bad input: exit code 2 and the problem document on stderr naming the field', () => {
    const out = runCli(['flow', 'x.json'], () => JSON.stringify({ ...scenario, flow: { kind: 'channel', height: '-1 mm', bulkVelocity: 1 } }));
    expect(out.code).toBe(2);
    expect(out.stdout).toBe('');
    expect(JSON.parse(out.stderr).errors[0].path).toBe('flow.height');
  });

  it('unknown calculation or no file: exit 2 with usage', () => {
    expect(runCli(['teleport', 'x.json']).code).toBe(2);
    expect(runCli([]).stderr).toMatch(/usage/);
  });

  it('`oilskin flow file.json` runs as a real process from bin/', () => {
    const dir = mkdtempSync(join(tmpdir(), 'oilskin-cli-'));
    const good = join(dir, 'good.json');
    const bad = join(dir, 'bad.json');
    writeFileSync(good, JSON.stringify(scenario));
    writeFileSync(bad, '{ not json');
    const stdout = execFileSync(process.execPath, [join(root, 'bin/oilskin.js'), 'flow', good], { encoding: 'utf8' });
    expect(JSON.parse(stdout).result.regime).toBe('turbulent');
    const failed = spawnSync(process.execPath, [join(root, 'bin/oilskin.js'), 'flow', bad], { encoding: 'utf8' });
    expect(failed.status).toBe(2);
    expect(JSON.parse(failed.stderr).status).toBe(400);
  });
});
