/**
 * Surfactant solvers: convergence study and solver-versus-scaling comparison.
 * Run: npx tsx bench/surfactant.ts
 */
import { readFileSync } from 'node:fs';
import { resolveSurfactant } from '../src/materials/surfactants.js';
import { solveLongWaveGroove, solveTransverseInterface } from '../src/physics/surfactant/solver.js';
import { marangoniScaling, philipTransverse } from '../src/physics/surfactant/scaling.js';
import { evaluateSurfactant } from '../src/physics/surfactant/surfactant.js';

const sds = resolveSurfactant({ id: 'sds', interfaceType: 'air-water' });
const T = 298.15;
const mu = 1e-3;
const time = <R>(f: () => R): [R, number] => {
  const t0 = performance.now();
  const r = f();
  return [r, performance.now() - t0];
};

console.log('1. Transverse solver, clean gap, P = 100 µm, φ = 0.5, γ̇ = 1000 1/s: slip vs Philip (1972)');
console.log('cells  gapCells  b_solver (m)    b_Philip (m)    rel. error   ms');
for (const cells of [64, 128, 256, 512]) {
  const [r, ms] = time(() => solveTransverseInterface({ pitch: 100e-6, grooveWidth: 50e-6, shearRate: 1000, viscosity: mu, surfactant: sds, bulkConcentration: 0, temperature: T, cells }));
  const b = philipTransverse(100e-6, r.gasFractionResolved, 1000).slipLength;
  console.log(`${r.cells}\t${r.gapCells}\t${r.cleanSlipLength.toExponential(6)}\t${b.toExponential(6)}\t${(r.cleanSlipLength / b - 1).toExponential(3)}\t${ms.toFixed(0)}`);
}

console.log('\n2. Transverse solver with SDS (air–water), same grating: slip retained vs cells (Newton tolerance 1e-10)');
console.log('c (mol/m³)  cells  retained     linear       iterations  residual    stagnantCap  ms');
for (const c of [1e-4, 1e-3, 1e-2]) {
  for (const cells of [64, 128, 256, 512]) {
    const [r, ms] = time(() => solveTransverseInterface({ pitch: 100e-6, grooveWidth: 50e-6, shearRate: 1000, viscosity: mu, surfactant: sds, bulkConcentration: c, temperature: T, cells }));
    console.log(`${c}\t${r.cells}\t${r.slipRetained.toFixed(6)}\t${r.linearSlipRetained.toFixed(6)}\t${r.iterations}\t${r.residual.toExponential(2)}\t${r.stagnantCap}\t${ms.toFixed(0)}`);
  }
}

console.log('\n3. Long-wave groove model (SDS, L_g = 1 mm, U_c = 0.02 m/s, γ̇ = 1000 1/s) vs scipy solve_bvp fixture');
const ref = JSON.parse(readFileSync(new URL('../fixtures/surfactant/references.json', import.meta.url), 'utf8'));
for (const c of ref.longwave.cases) {
  for (const cells of [50, 100, 200, 400]) {
    const [r, ms] = time(() => solveLongWaveGroove({ ...c, surfactant: sds, temperature: T, cells, extrapolate: false }));
    console.log(`c=${c.bulkConcentration}\tcells=${cells}\tretained=${r.slipRetained.toFixed(6)}\tscipy=${c.slipRetained.toFixed(6)}\tdiff=${(r.slipRetained - c.slipRetained).toExponential(2)}\titer=${r.iterations}\t${ms.toFixed(0)} ms`);
  }
}

{
  const c = ref.longwave.cases[0];
  const [r, ms] = time(() => solveLongWaveGroove({ ...c, surfactant: sds, temperature: T, cells: 200 }));
  console.log(`default (Richardson 200/100 cells): retained=${r.slipRetained.toFixed(6)}\tscipy=${c.slipRetained.toFixed(6)}\tdiff=${(r.slipRetained - c.slipRetained).toExponential(2)}\t${ms.toFixed(0)} ms`);
}

console.log('\n4. Solver (128 cells) vs scaling theory, SDS air–water, gas below, φ = 0.5');
console.log('P (µm)  γ̇ (1/s)  c (mol/m³)  solver   theory   ratio   exchange/D_I term   theory flags stagnant cap');
for (const [P, gd] of [[10e-6, 100], [10e-6, 1000], [100e-6, 10], [100e-6, 100], [100e-6, 1000]] as const) {
  for (const c of [1e-4, 1e-3, 1e-2]) {
    const r = solveTransverseInterface({ pitch: P, grooveWidth: P / 2, shearRate: gd, viscosity: mu, surfactant: sds, bulkConcentration: c, temperature: T, cells: 128 });
    const s = marangoniScaling({ gapLength: P / 2, centreVelocity: philipTransverse(P, 0.5, gd).centreVelocity, shearRate: gd, viscosity: mu, surfactant: sds, bulkConcentration: c, temperature: T });
    const th = 1 - s.marangoniReduction;
    const dom = (s.terms.exchange / s.terms.surfaceDiffusion).toFixed(2);
    console.log(`${P * 1e6}\t${gd}\t${c}\t${r.slipRetained.toFixed(4)}\t${th.toFixed(4)}\t${(r.slipRetained / th).toFixed(3)}\t${dom}\t${s.flags.stagnantCapLikely}${r.stagnantCap ? ' (solver: cap)' : ''}`);
  }
}

console.log('\n5. evaluateSurfactant end to end (demo scenario: water, τ_w = 0.89 Pa, P = 100 µm, w = 50 µm, gas; 21-point curve + half-slip root)');
{
  const fluid = (name: string, density: number, viscosity: number, extra = {}) => ({ id: name, name, temperature: T, density, viscosity, origins: {}, references: [], warnings: [], ...extra });
  const scenario = {
    texture: { grooveWidth: 50e-6, pitch: 100e-6, grooveDepth: 20e-6, flowAngle: 90 },
    lubricant: fluid('air', 1.18, 1.8e-5),
    workingFluid: fluid('water', 997, 0.00089, { surfaceTension: 0.072 }),
    flow: { kind: 'wall-shear' as const, wallShearStress: 0.89, frictionVelocity: 0.03, viscousLength: 3e-5, regime: 'laminar' as const },
  };
  for (const method of ['scaling', 'solver', 'auto'] as const) {
    const [o, ms] = time(() =>
      evaluateSurfactant({ scenario, surfactant: sds, bulkConcentration: [1e-3], temperature: T, method, cleanSlip: { slipLengthLongitudinal: 11e-6, slipLengthTransverse: 5.5e-6, localSlipLengthMean: 1e-3 } }),
    );
    console.log(`${method}\tretained(1 µM)=${o.result.slipRetained.toFixed(4)}\tregime=${o.result.regime}\thalf-slip c=${o.result.concentrationForHalfSlip?.toExponential(3)} mol/m³\t${ms.toFixed(0)} ms`);
  }
}
