/** oilskin sweep and merge-shards, run in process on files in a temporary folder. */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../src/cli/main.js';
import { nodeIo } from '../../src/cli/io.js';
import { parseShard } from '../../src/cli/sweep.js';

const dir = mkdtempSync(join(tmpdir(), 'oilskin-sweep-'));
const at = (name: string) => join(dir, name);
const sweepFile = at('sweep.json');
writeFileSync(
  sweepFile,
  JSON.stringify({
    calculation: 'slip',
    design: {
      texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '25 um' },
      lubricant: { id: 'n-hexadecane', temperature: '20 degC' },
      workingFluid: { id: 'water', temperature: '20 degC' },
      flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
      options: { method: 'closed-form' },
    },
    // 23 × 5 = 115 points (not a multiple of 4: the slices differ in size), some wider than the pitch (failed rows).
    axes: [
      { path: 'texture.grooveWidth', range: { from: '5 um', to: '115 um', points: 23 } },
      { path: 'texture.grooveDepth', range: { from: '1 um', to: '100 um', points: 5, spacing: 'log' } },
    ],
  }),
);

/** Run the CLI in process; standard error captured. */
async function cli(...args: string[]): Promise<{ code: number; stderr: string }> {
  let stderr = '';
  const io = { ...nodeIo(), stderr: { write: (t: string) => void (stderr += t), isTTY: false } };
  const code = await main(args, io);
  return { code, stderr };
}

describe('oilskin sweep and merge-shards', () => {
  it('4 shards merged equal the unsharded sweep byte for byte (NDJSON and CSV), whatever order the files come in', async () => {
    expect((await cli('sweep', sweepFile, '--ndjson', at('all.ndjson'), '--csv', at('all.csv'), '--threads', '0', '--quiet')).code).toBe(0);
    for (let i = 0; i < 4; i++) expect((await cli('sweep', sweepFile, '--shard', `${i}/4`, '--ndjson', at(`shard-${i}.ndjson`), '--threads', '0', '--quiet')).code).toBe(0);
    const merged = await cli('merge-shards', at('shard-2.ndjson'), at('shard-0.ndjson'), at('shard-3.ndjson'), at('shard-1.ndjson'), '--ndjson', at('merged.ndjson'), '--csv', at('merged.csv'));
    expect(merged.code, merged.stderr).toBe(0);
    expect(readFileSync(at('merged.ndjson'))).toEqual(readFileSync(at('all.ndjson')));
    expect(readFileSync(at('merged.csv'))).toEqual(readFileSync(at('all.csv')));
    const all = readFileSync(at('all.ndjson'), 'utf8').trim().split('\n');
    expect(all).toHaveLength(117);
    expect(JSON.parse(all.at(-1)!).failed).toBeGreaterThan(0);
    // Each shard file is a contiguous slice of the whole: sizes 28, 29, 29, 29.
    const sizes = [0, 1, 2, 3].map((i) => readFileSync(at(`shard-${i}.ndjson`), 'utf8').trim().split('\n').length - 2);
    expect(sizes).toEqual([28, 29, 29, 29]);
  });

  it('refuses shards that do not make up the sweep: one missing, one twice, one cut short, one of another sweep', async () => {
    const shards = [0, 1, 2, 3].map((i) => at(`shard-${i}.ndjson`));
    const missing = await cli('merge-shards', shards[0]!, shards[1]!, shards[3]!, '--ndjson', at('bad.ndjson'));
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/shards missing: 2 \(of 4\)/);
    expect(existsSync(at('bad.ndjson'))).toBe(false);
    expect(existsSync(at('bad.ndjson.partial'))).toBe(false);
    const twice = await cli('merge-shards', ...shards, shards[1]!);
    expect(twice.stderr).toMatch(/shard 1 given twice/);
    const lines = readFileSync(shards[2]!, 'utf8').trim().split('\n');
    writeFileSync(at('cut.ndjson'), lines.slice(0, -3).join('\n') + '\n');
    const cut = await cli('merge-shards', shards[0]!, shards[1]!, at('cut.ndjson'), shards[3]!, '--ndjson', at('bad.ndjson'));
    expect(cut.code).toBe(2);
    expect(cut.stderr).toMatch(/cut short/);
    const gap = [...lines.slice(0, 3), ...lines.slice(4)];
    writeFileSync(at('gap.ndjson'), gap.join('\n') + '\n');
    expect((await cli('merge-shards', shards[0]!, shards[1]!, at('gap.ndjson'), shards[3]!)).stderr).toMatch(/missing or out of order/);
    const header = JSON.parse(lines[0]!);
    writeFileSync(at('other.ndjson'), [JSON.stringify({ ...header, sweepId: 'f'.repeat(64) }), ...lines.slice(1)].join('\n') + '\n');
    expect((await cli('merge-shards', shards[0]!, shards[1]!, at('other.ndjson'), shards[3]!)).stderr).toMatch(/belongs to another sweep/);
  });

  it('bad command lines: exit 2 with the reason', async () => {
    expect((await cli('sweep', sweepFile, '--shard', '4/4')).stderr).toMatch(/0 ≤ i < n/);
    expect((await cli('sweep', sweepFile, '--bogus')).code).toBe(2);
    writeFileSync(at('bad-sweep.json'), JSON.stringify({ calculation: 'flow', design: {}, axes: [{ path: 'texture.nope', values: [1] }] }));
    const bad = await cli('sweep', at('bad-sweep.json'), '--threads', '0');
    expect(bad.code).toBe(2);
    expect(JSON.parse(bad.stderr).errors[0].path).toBe('axes[0].path');
    expect(parseShard('3/16')).toEqual({ index: 3, count: 16 });
  });
});
