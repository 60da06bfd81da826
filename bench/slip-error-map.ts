/**
 * Error map of the closed-form slip (Belyaev–Vinogradova stripes with the
 * lid-sheared-duct mean local slip; transverse via Asmolov–Vinogradova with the
 * shallow-groove recirculation slip) against the groove-cell field solver, over
 * interface fraction φ, depth ratio d/w and viscosity ratio N. Prints one row per
 * case and the time per field solve. The `auto` rule in src/physics/slip/slip.ts is
 * read off this table.
 *
 * Run: npx tsx bench/slip-error-map.ts [cellsPerPitch]
 */
import os from 'node:os';
import { solveLongitudinalCell, solveTransverseCell, type GrooveCellInput, type GrooveCellResult } from '../src/physics/groove/groove-cell.js';
import {
  belyaevVinogradovaSlipLengthLongitudinal,
  belyaevVinogradovaSlipLengthTransverse,
  grooveLocalSlipLengths,
} from '../src/physics/slip/stripe-slip.js';

type Solver = (input: GrooveCellInput) => GrooveCellResult;

function tryRun(solve: Solver, input: GrooveCellInput): { slip: number; ms: number } | undefined {
  try {
    const t0 = performance.now();
    const r = solve(input);
    return { slip: r.slipLength, ms: performance.now() - t0 };
  } catch {
    return undefined;
  }
}

const cellsPerPitch = process.argv[2] ? Number(process.argv[2]) : undefined;
console.log(`# slip error map — Node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), cellsPerPitch ${cellsPerPitch ?? 'default'}`);
console.log('phi\td/w\tN\tbs/P\tb_par_cf/P\tb_par_field/P\terr_par\tb_perp_cf/P\tb_perp_field/P\terr_perp\tms_par\tms_perp');
const longitudinal: Solver = solveLongitudinalCell;
const transverse: Solver = solveTransverseCell;
const pitch = 1;
for (const phi of [0.2, 0.5, 0.8, 0.95]) {
  for (const depthRatio of [0.1, 0.5, 1, 2]) {
    for (const N of [0.01, 0.1, 1, 10, 100]) {
      const w = phi * pitch;
      const d = depthRatio * w;
      const local = grooveLocalSlipLengths(w, d, N);
      const parCf = belyaevVinogradovaSlipLengthLongitudinal(pitch, w, local.longitudinalMean);
      const perpCf = belyaevVinogradovaSlipLengthTransverse(pitch, w, local.transverseMean);
      const input: GrooveCellInput = { pitch, grooveWidth: w, grooveDepth: d, viscosityRatio: N, cellsPerPitch };
      const par = tryRun(longitudinal, input);
      const perp = tryRun(transverse, input);
      const err = (cf: number, f?: { slip: number }) => (f ? ((cf - f.slip) / f.slip).toFixed(4) : 'n/a');
      const row = [
        phi,
        depthRatio,
        N,
        (local.longitudinalMean / pitch).toPrecision(3),
        parCf.toPrecision(5),
        par ? par.slip.toPrecision(5) : 'n/a',
        err(parCf, par),
        perpCf.toPrecision(5),
        perp ? perp.slip.toPrecision(5) : 'n/a',
        err(perpCf, perp),
        par ? par.ms.toFixed(1) : '-',
        perp ? perp.ms.toFixed(1) : '-',
      ].join('\t');
      console.log(row);
    }
  }
}
