/**
 * Surfactant robustness sweep (issue 12, item 2): every design of
 * fixtures/surfactant/sweep_designs.json through the interface solver, the way
 * /v1/surfactant answers (points, 21-point curve, half-slip root).
 * Prints the count, the non-converged count (exceptions or scaling fallbacks),
 * the time per answer (median, p95, max; wall clock and CPU) and a table by
 * regime.
 *
 * Run: npx tsx bench/surfactant-sweep.ts [--every N] [--csv file]
 */
import { writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { loadSweepDesigns, runSweepDesign, sweepSubset, type SweepOutcome } from './surfactant-sweep-designs.js';

const args = process.argv.slice(2);
const every = Number(args[args.indexOf('--every') + 1]) || 1;
const csvPath = args.includes('--csv') ? args[args.indexOf('--csv') + 1] : undefined;

const quantile = (xs: number[], q: number): number => {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))];
};
const fmt = (x: number): string => (Number.isFinite(x) ? x.toFixed(0).padStart(6) : '     -');

const designs = sweepSubset(loadSweepDesigns(), every);
console.log(`Surfactant sweep: ${designs.length} designs (every ${every}), Node ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown'})`);
// Warm-up (JIT) on one design, not counted.
runSweepDesign(designs[0]);
const outcomes: SweepOutcome[] = [];
const started = performance.now();
for (const d of designs) {
  const o = runSweepDesign(d);
  outcomes.push(o);
  if (!o.converged) console.log(`  design ${d.id} (${d.part}): ${o.error ?? `${o.fallbackWarnings} scaling fallback warning(s)`}`);
}
const totalS = (performance.now() - started) / 1000;

const wall = outcomes.map((o) => o.wallMs);
const cpu = outcomes.map((o) => o.cpuMs);
const failed = outcomes.filter((o) => !o.converged);
console.log(`\ncount ${outcomes.length}, non-converged ${failed.length} (exceptions ${failed.filter((o) => o.error).length}, scaling fallbacks ${failed.filter((o) => !o.error).length}), total ${totalS.toFixed(1)} s`);
console.log(`time per answer, ms        median    p95    max`);
console.log(`  wall clock              ${fmt(quantile(wall, 0.5))} ${fmt(quantile(wall, 0.95))} ${fmt(Math.max(...wall))}`);
console.log(`  CPU (this process)      ${fmt(quantile(cpu, 0.5))} ${fmt(quantile(cpu, 0.95))} ${fmt(Math.max(...cpu))}`);
console.log(`answers over 1 s wall clock: ${wall.filter((t) => t > 1000).length}; over 1 s CPU: ${cpu.filter((t) => t > 1000).length}`);

console.log(`\nby regime (first concentration)   count  non-conv  wall median  p95    max   (ms)`);
const regimes = ['clean', 'partially-mobile', 'stagnant-cap', 'immobilised', '(failed)'];
for (const regime of regimes) {
  const group = outcomes.filter((o) => (o.result?.regime ?? '(failed)') === regime);
  if (group.length === 0) continue;
  const t = group.map((o) => o.wallMs);
  console.log(
    `  ${regime.padEnd(31)} ${String(group.length).padStart(5)} ${String(group.filter((o) => !o.converged).length).padStart(8)}     ${fmt(quantile(t, 0.5))} ${fmt(quantile(t, 0.95))} ${fmt(Math.max(...t))}`,
  );
}
console.log(`\nby part / flow angle                count  non-conv  wall median  p95    max   (ms)`);
for (const part of [...new Set(outcomes.map((o) => `${o.design.part} ${o.design.flowAngle}°`))]) {
  const group = outcomes.filter((o) => `${o.design.part} ${o.design.flowAngle}°` === part);
  const t = group.map((o) => o.wallMs);
  console.log(
    `  ${part.padEnd(31)} ${String(group.length).padStart(5)} ${String(group.filter((o) => !o.converged).length).padStart(8)}     ${fmt(quantile(t, 0.5))} ${fmt(quantile(t, 0.95))} ${fmt(Math.max(...t))}`,
  );
}

if (csvPath) {
  const rows = ['id,part,surfactant,c_over_cmc,wall_shear_Pa,viscosity_ratio,flow_angle,groove_length_m,converged,slip_retained,regime,half_slip_mol_m3,wall_ms,cpu_ms,error'];
  for (const o of outcomes) {
    const d = o.design;
    rows.push(
      [d.id, d.part, d.surfactant, d.concentrationOverCmc, d.wallShearStress, d.viscosityRatio, d.flowAngle, d.grooveLength ?? '', o.converged, o.result?.slipRetained ?? '', o.result?.regime ?? '', o.result?.concentrationForHalfSlip ?? '', o.wallMs.toFixed(1), o.cpuMs.toFixed(1), JSON.stringify(o.error ?? '')].join(','),
    );
  }
  writeFileSync(csvPath, rows.join('\n') + '\n');
  console.log(`\nper-design rows written to ${csvPath}`);
}
