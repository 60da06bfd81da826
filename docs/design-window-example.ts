/**
 * The README's worked design window: examples/design-window.json searched in
 * process (no threads), its summary printed and its plot written to
 * docs/design-window.svg. Run: npx tsx docs/design-window-example.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { createSolverPool } from '../src/api/pool.js';
import { computeSafely } from '../src/api/worker.js';
import { planWindow, runWindow, windowAnswer, windowPlot } from '../src/api/window/run.js';

const request = JSON.parse(readFileSync(new URL('../examples/design-window.json', import.meta.url), 'utf8')) as unknown;
const plan = planWindow(request);
const pool = createSolverPool({ threads: 0, maxQueued: 1, queueTimeoutMs: 1, solveTimeoutMs: 1, workerMemoryMb: 512, inline: computeSafely });
const start = performance.now();
const window = await runWindow(plan, request, pool, 0);
const seconds = (performance.now() - start) / 1000;
const answer = windowAnswer(plan, window);
const um = (x: number) => `${(x * 1e6).toPrecision(3)} µm`;
console.log(`${answer.candidates} candidates, ${answer.evaluated} evaluated, ${answer.feasibleCandidates} feasible, ${seconds.toFixed(1)} s`);
console.log('limiting share', JSON.stringify(answer.limitingShare));
if (answer.best) {
  const b = answer.best;
  console.log(`best: w ${um(b.grooveWidth)}, P ${um(b.pitch)}, d ${um(b.grooveDepth)}, DR ${b.dragReduction?.toFixed(4)}, retained ${b.retainedFraction?.toFixed(3)}, waves margin ${b.waveMargin?.toFixed(3)}`);
}
console.log(`pareto ${answer.pareto.length}, boundary ${answer.boundary.length}`);
const feasibleWidths = answer.feasible.map((d) => d.grooveWidth);
console.log(`feasible widths ${um(Math.min(...feasibleWidths))} – ${um(Math.max(...feasibleWidths))}`);
writeFileSync(new URL('./design-window.svg', import.meta.url), await windowPlot(window));
