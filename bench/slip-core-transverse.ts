/**
 * Transverse slip core benchmark: the fast Galerkin method (src/physics/groove/groove-cell-transverse.ts) against
 * the groove-cell field solver (src/physics/groove/groove-cell.ts) on the committed grid of cases
 * (fixtures/slip/transverse_field_reference.json: 49 cases over w/P 0.02–0.98, d/w 0.01–10, N 1e-4–1e4),
 * plus the FreeFEM whole-cell reference (fixtures/slip/transverse_cell_freefem.json) for the secondary
 * quantities.
 *
 *   npx tsx bench/slip-core-transverse.ts            field values and times from the committed reference
 *   npx tsx bench/slip-core-transverse.ts --live     re-run the field solver here (about 20 min)
 *
 * Printed per case: fast b_⊥, field b_⊥ (Richardson 32/64 cells per pitch), relative difference, the field
 * solver's own error estimate, time per evaluation of each. Then the throughput of the fast method
 * (evaluations per second on one core, all cases in a loop) and the error summary.
 */
import os from 'node:os';
import { solveTransverseCell } from '../src/physics/groove/groove-cell.js';
import { transverseGrooveSlip } from '../src/physics/groove/groove-cell-transverse.js';
import { belyaevVinogradovaSlipLengthTransverse, grooveLocalSlipLengths } from '../src/physics/slip/stripe-slip.js';
import reference from '../fixtures/slip/transverse_field_reference.json' with { type: 'json' };
import freefem from '../fixtures/slip/transverse_cell_freefem.json' with { type: 'json' };

const live = process.argv.includes('--live');
const pad = (s: string | number, n: number): string => String(s).padStart(n);
const fast = (phi: number, aspect: number, N: number) => transverseGrooveSlip({ pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: N });

/** Median time per call in ms over `rounds` rounds of `count` calls (after a warm-up). */
function timePerCall(run: () => void, count: number, rounds = 5): number {
  for (let k = 0; k < count; k++) run();
  const times: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let k = 0; k < count; k++) run();
    times.push((performance.now() - t0) / count);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

console.log('oilskin transverse slip core benchmark');
console.log(`node ${process.version}, ${os.cpus().length} logical cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg().map((x) => x.toFixed(2)).join(' ')}`);
console.log(`field values: ${live ? 'computed now' : `committed reference (${reference.solver}; times as measured by its generator, node ${reference.node})`}; fast method timed here, median of 5 rounds of 50 calls, single thread\n`);
console.log(`${pad('w/P', 6)}${pad('d/w', 6)}${pad('N', 8)}${pad('b fast', 13)}${pad('b field', 13)}${pad('rel.diff', 10)}${pad('field err', 10)}${pad('ms fast', 9)}${pad('ms field', 10)}`);

const differences: number[] = [];
let fieldTotal = 0;
let fastTotal = 0;
for (const c of reference.cases) {
  const { interfaceFraction: phi, depthOverWidth: aspect, viscosityRatio: N } = c;
  const value = fast(phi, aspect, N).slipLength;
  const msFast = timePerCall(() => fast(phi, aspect, N), 50);
  let field = c.extrapolated.slipLength as number;
  let fieldError = c.errorEstimate.slipLength as number;
  let msField = c.seconds * 1000;
  if (live) {
    const input = { pitch: 1, grooveWidth: phi, grooveDepth: aspect * phi, viscosityRatio: N, extrapolate: false };
    const t0 = performance.now();
    const coarse = solveTransverseCell({ ...input, cellsPerPitch: 32 }).slipLength;
    const fine = solveTransverseCell({ ...input, cellsPerPitch: 64 }).slipLength;
    msField = performance.now() - t0;
    field = (4 * fine - coarse) / 3;
    fieldError = Math.abs(field - fine);
  }
  const difference = value / field - 1;
  // Below 1e-8 P the field solver does not resolve b_⊥ (a difference of two numbers of order H = 4P); the
  // witness there is the large-N cavity limit (test/physics/groove/groove-cell-transverse.test.ts).
  const resolved = field > 1e-8;
  if (resolved) differences.push(difference);
  fieldTotal += msField;
  fastTotal += msFast;
  console.log(
    `${pad(phi, 6)}${pad(aspect, 6)}${pad(N.toExponential(0), 8)}${pad(value.toExponential(5), 13)}${pad(field.toExponential(5), 13)}` +
      `${pad((difference * 100).toFixed(3) + '%', 10)}${pad(((fieldError / field) * 100).toFixed(3) + '%', 10)}${pad(msFast.toFixed(4), 9)}${pad(msField.toFixed(0), 10)}` +
      (resolved ? '' : '  (b below 1e-8 P: not resolved by the field solver, left out of the summary)'),
  );
}
const worst = Math.max(...differences.map(Math.abs));
const mean = differences.reduce((s, d) => s + Math.abs(d), 0) / differences.length;
console.log(`\n${differences.length} of ${reference.cases.length} cases resolved by the field solver: largest |fast/field − 1| = ${(worst * 100).toFixed(3)} %, mean ${(mean * 100).toFixed(3)} %`);
console.log(`time per evaluation: fast ${(fastTotal / reference.cases.length).toFixed(4)} ms (mean over cases), field ${(fieldTotal / reference.cases.length / 1000).toFixed(1)} s; ratio ${(fieldTotal / fastTotal).toExponential(2)}`);

// Throughput: every case in turn, one core, as a sweep would call it.
{
  const cases = reference.cases;
  let calls = 0;
  const t0 = performance.now();
  while (performance.now() - t0 < 2000) {
    for (const c of cases) fast(c.interfaceFraction, c.depthOverWidth, c.viscosityRatio);
    calls += cases.length;
  }
  const seconds = (performance.now() - t0) / 1000;
  console.log(`throughput: ${(calls / seconds).toFixed(0)} transverse evaluations per second on one core (${calls} calls in ${seconds.toFixed(1)} s)`);
  // Baseline in the same run: the textbook closed form (cavity local slip + Belyaev–Vinogradova/Asmolov–Vinogradova).
  const closedForm = (c: (typeof cases)[number]): number =>
    belyaevVinogradovaSlipLengthTransverse(1, c.interfaceFraction, grooveLocalSlipLengths(c.interfaceFraction, c.depthOverWidth * c.interfaceFraction, c.viscosityRatio).transverseMean);
  let baseline = 0;
  const t1 = performance.now();
  while (performance.now() - t1 < 1000) {
    for (const c of cases) closedForm(c);
    baseline += cases.length;
  }
  const baselineRate = baseline / ((performance.now() - t1) / 1000);
  console.log(`baseline, textbook closed form in the same run: ${baselineRate.toFixed(0)} per second; the fast core takes ${(baselineRate / (calls / seconds)).toFixed(2)} times its time`);
  const worstClosedForm = Math.max(...cases.map((c) => Math.abs(closedForm(c) / (c.extrapolated.slipLength as number) - 1)));
  console.log(`textbook closed form against the field solver on the same cases: largest error ${(worstClosedForm * 100).toFixed(1)} %`);
}

// Secondary quantities against the FreeFEM whole-cell reference.
console.log('\nFreeFEM whole-cell reference (P2+bubble/P1dc, two meshes, Richardson): relative differences of the fast method');
console.log(`${pad('w/P', 6)}${pad('d/w', 6)}${pad('N', 8)}${pad('b', 10)}${pad('ū', 10)}${pad('u(0)', 10)}${pad('τ_i/τ', 10)}${pad('flux', 10)}`);
for (const c of freefem.cases) {
  const r = fast(c.interfaceFraction, c.depthOverWidth, c.viscosityRatio);
  const e = c.extrapolated;
  const rel = (a: number, b: number): string => pad(((a / b - 1) * 100).toFixed(3) + '%', 10);
  console.log(
    `${pad(c.interfaceFraction, 6)}${pad(c.depthOverWidth, 6)}${pad(c.viscosityRatio.toExponential(0), 8)}${rel(r.slipLength, e.slipLength)}${rel(r.meanInterfaceVelocity, e.meanInterfaceVelocity)}` +
      `${rel(r.centreInterfaceVelocity, e.centreInterfaceVelocity)}${rel(r.interfacialShearRatio, e.interfacialShearRatio)}${rel(r.lubricantFlux, e.lubricantFlux)}`,
  );
}
