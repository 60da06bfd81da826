/**
 * Throughput of the fluid catalogue: resolveFluid for a few representative
 * fluids and the full catalogueListing. Prints conditions and figures.
 * Run: npx tsx bench/materials.ts
 */
import os from 'node:os';
import { catalogueListing, resolveFluid } from '../src/materials/index.js';
import type { FluidSpec } from '../src/core/catalogue.js';

function timeIt(label: string, iterations: number, run: () => unknown): void {
  for (let i = 0; i < Math.min(1000, iterations); i++) run();
  const start = process.hrtime.bigint();
  for (let i = 0; i < iterations; i++) run();
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  console.log(`${label.padEnd(44)} ${(iterations / seconds).toExponential(3)} /s   ${((seconds / iterations) * 1e6).toFixed(2)} µs each`);
}

console.log(`node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), shared machine`);
const cases: Array<[string, FluidSpec]> = [
  ['water 80 °C', { id: 'water', temperature: 353.15 }],
  ['seawater 35 g/kg 20 °C', { id: 'seawater', temperature: 293.15 }],
  ['seawater 10 g/kg 20 °C (records rebuilt)', { id: 'seawater', temperature: 293.15, salinity: 10 }],
  ['n-hexadecane 25 °C', { id: 'n-hexadecane', temperature: 298.15 }],
  ['custom fluid', { density: 900, viscosity: 0.01 }],
];
for (const [label, spec] of cases) timeIt(`resolveFluid ${label}`, 200_000, () => resolveFluid(spec));
timeIt('catalogueListing (all fluids)', 20_000, () => catalogueListing());
