/** `oilskin assess design.json --html report.html`: the JSON on stdout, the report (the Accept: text/html page) in the file. */
import { describe, expect, it } from 'vitest';
import { runCliWithReport } from '../../src/cli/main.js';

/** Invented demo design (closed forms, no sensitivities: quick). */
const design = {
  texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um' },
  lubricant: { id: 'n-hexadecane', temperature: '20 degC' },
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  options: { method: 'closed-form', marginSensitivities: { enabled: false } },
};

describe('CLI assess --html', () => {
  it('writes the self-contained report and prints the assessment', async () => {
    const written: Record<string, string> = {};
    const out = await runCliWithReport(['assess', 'design.json', '--html', 'report.html'], () => JSON.stringify(design), (p, text) => (written[p] = text));
    expect(out.code, out.stderr).toBe(0);
    expect(JSON.parse(out.stdout).result.overall.verdict).toMatch(/works|fails/);
    expect(written['report.html']).toMatch(/^<!DOCTYPE html>/);
    expect(written['report.html']).toMatch(/<figure /);
    expect(out.stderr).toMatch(/report written to report.html/);
  }, 120_000);

  it('--html on a calculation without a report, or without a file name: exit 2 with usage', async () => {
    expect((await runCliWithReport(['flow', 'x.json', '--html', 'r.html'], () => '{}')).code).toBe(2);
    expect((await runCliWithReport(['assess', 'x.json', '--html'], () => '{}')).stderr).toMatch(/usage/);
  });

  it('bad input: exit 2, the problem on stderr, no report written', async () => {
    const written: string[] = [];
    const out = await runCliWithReport(['assess', 'x.json', '--html', 'r.html'], () => JSON.stringify({ ...design, flow: undefined }), (p) => written.push(p));
    expect(out.code).toBe(2);
    expect(JSON.parse(out.stderr).errors[0].path).toBe('flow');
    expect(written).toEqual([]);
  });
});
