/**
 * Cost of the groove duct coefficients: the fast (dual, geometrically converging)
 * forms of src/physics/groove/groove-duct.ts against the defining series they
 * replace, in the same run, with the largest relative difference between them.
 * Run: npx tsx bench/groove-duct.ts
 */
import os from 'node:os';
import {
  grooveDuctDefiningSeries,
  grooveLidVelocityCentre,
  grooveLidVelocityMean,
  pressureDrivenGrooveFlux,
  shearDrivenGrooveFlux,
} from '../src/physics/groove/groove-duct.js';

type Coefficient = (w: number, d: number) => number;
const pairs: [string, Coefficient, Coefficient][] = [
  ['lid velocity, mean', grooveLidVelocityMean, grooveDuctDefiningSeries.lidVelocityMean],
  ['lid velocity, centre', grooveLidVelocityCentre, grooveDuctDefiningSeries.lidVelocityCentre],
  ['shear-driven flux', shearDrivenGrooveFlux, grooveDuctDefiningSeries.shearDrivenFlux],
  ['pressure-driven flux', pressureDrivenGrooveFlux, grooveDuctDefiningSeries.pressureDrivenFlux],
];
// Aspect ratios a drainage quadrature visits: a partly filled groove, d/w from 1e-3 to 10.
const ratios = Array.from({ length: 200 }, (_, i) => 10 ** (-3 + (4 * i) / 199));

function nanosecondsPerCall(f: Coefficient, repeats: number): number {
  let sink = 0;
  const start = performance.now();
  for (let k = 0; k < repeats; k++) for (const r of ratios) sink += f(1, r);
  const elapsed = performance.now() - start;
  if (!Number.isFinite(sink)) throw new Error('non-finite coefficient');
  return (elapsed * 1e6) / (repeats * ratios.length);
}

console.log(`node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), shared machine`);
console.log('coefficient            fast ns/call  defining ns/call  ratio  max relative difference (d/w 1e-3…10)');
for (const [name, fast, defining] of pairs) {
  nanosecondsPerCall(fast, 50); // warm-up
  const fastCost = nanosecondsPerCall(fast, 500);
  const definingCost = nanosecondsPerCall(defining, 2);
  const difference = Math.max(...ratios.map((r) => Math.abs(fast(1, r) / defining(1, r) - 1)));
  console.log(
    `${name.padEnd(22)} ${fastCost.toFixed(0).padStart(12)}  ${definingCost.toFixed(0).padStart(16)}  ${(definingCost / fastCost).toFixed(0).padStart(5)}  ${difference.toExponential(1)}`,
  );
}
