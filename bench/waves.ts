/**
 * Cost of one /v1/waves evaluation against the regime-map resolution.
 * Run: npx tsx bench/waves.ts
 * The map dominates (resolution² cells, each with a Kelvin–Helmholtz
 * minimisation over k), so the expected growth exponent is about 2.
 */
import { readFileSync } from 'node:fs';
import os from 'node:os';
import { DesignSchema } from '../src/api/schemas/design.js';
import { catalogue } from '../src/materials/lookup.js';
import { DesignContext } from '../src/physics/design/context.js';
import { evaluateWaves, type WavesInput } from '../src/physics/waves/waves.js';

// The worked example as the service reads it (unit strings converted, fluids from the catalogue).
const ctx = new DesignContext(DesignSchema.parse(JSON.parse(readFileSync(new URL('../examples/waves-worked-example.json', import.meta.url), 'utf8'))), catalogue);
const input: WavesInput = {
  scenario: ctx.scenario('waves', 'required'),
  slipLengthLongitudinal: ctx.slip('waves', 'closed-form').result.slipLengthLongitudinal,
  gravity: { inclination: 0, facing: 'up' },
};
console.log(`node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), shared machine`);
console.log('input: examples/waves-worked-example.json');
for (let i = 0; i < 30; i++) evaluateWaves({ ...input, mapResolution: 8 }); // JIT warm-up
const rows: { resolution: number; milliseconds: number }[] = [];
for (const resolution of [4, 8, 16, 32, 64, 128]) {
  evaluateWaves({ ...input, mapResolution: resolution }); // warm-up
  const repeats = resolution <= 16 ? 20 : resolution <= 64 ? 5 : 2;
  const start = performance.now();
  for (let i = 0; i < repeats; i++) evaluateWaves({ ...input, mapResolution: resolution });
  rows.push({ resolution, milliseconds: (performance.now() - start) / repeats });
}
for (let i = 0; i < rows.length; i++) {
  const exponent = i === 0 ? '' : `  growth exponent ${(Math.log(rows[i].milliseconds / rows[i - 1].milliseconds) / Math.log(rows[i].resolution / rows[i - 1].resolution)).toFixed(2)}`;
  console.log(`mapResolution ${String(rows[i].resolution).padStart(4)}: ${rows[i].milliseconds.toFixed(2).padStart(9)} ms per evaluation${exponent}`);
}
