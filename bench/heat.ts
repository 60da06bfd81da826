/**
 * Heat-transfer change: worked example (examples/heat-worked-example.json, an
 * invented demo scenario), field-solver convergence and cost, closed form vs field.
 * Run: npx tsx bench/heat.ts
 */
import { readFileSync } from 'node:fs';
import os from 'node:os';
import { DesignSchema } from '../src/api/schemas/design.js';
import { catalogue } from '../src/materials/lookup.js';
import { DesignContext } from '../src/physics/design/context.js';
import { evaluateHeat, type HeatInput } from '../src/physics/heat/heat.js';
import { solveHeatCrossSection, thermalSlipField } from '../src/physics/heat/conduction-field.js';
import { rectangularDuctLaminar } from '../src/physics/heat/ducts.js';
import { thermalSlipAdiabaticGrooves } from '../src/physics/heat/thermal-slip.js';

const time = <R>(f: () => R): [R, number] => {
  const t0 = performance.now();
  const r = f();
  return [r, performance.now() - t0];
};
console.log(`node ${process.version}, ${os.cpus().length} cores (shared), ${os.cpus()[0]?.model ?? ''}`);

// The worked example as the service reads it: unit strings converted by the design schema, fluids from the catalogue.
const document = DesignSchema.parse(JSON.parse(readFileSync(new URL('../examples/heat-worked-example.json', import.meta.url), 'utf8')));
const ctx = new DesignContext(document, catalogue);
const scenario = ctx.scenario('heat', 'optional');
const water = scenario.workingFluid;
const flow = scenario.flow;
const lubricant = scenario.lubricant;
const base: HeatInput = {
  scenario,
  solid: document.solid!,
  heating: document.heating?.condition ?? 'uniform-flux',
  heatedWalls: document.heating?.heatedWalls ?? 'both',
  lubricantMotion: 'co-flowing',
  method: document.options?.method ?? 'auto',
  slip: { slipLengthLongitudinal: 0 },
  ...(document.options?.sensitivity ? { sensitivity: document.options.sensitivity } : {}),
};
console.log('\n1. Worked example (examples/heat-worked-example.json)');
console.log(`water k = ${water.thermalConductivity} W/(m K), cp = ${water.specificHeat} J/(kg K), Re_H = ${flow.reynoldsNumber?.toFixed(2)}, regime ${flow.regime}`);
const [field, fieldMs] = time(() => evaluateHeat(base));
// The slip model is wired in by the API; here the closed form is fed the field's own slip length.
const [closed, closedMs] = time(() => evaluateHeat({ ...base, method: 'closed-form', slip: { slipLengthLongitudinal: field.result.slipLength } }));
for (const [name, r, ms] of [['field (auto)', field, fieldMs], ['closed-form', closed, closedMs]] as const) {
  const x = r.result;
  console.log(
    `${name}: b_t = ${(x.thermalSlipLength * 1e6).toFixed(3)} um, b = ${(x.slipLength * 1e6).toFixed(4)} um, Nu = ${x.nusselt?.toFixed(4)}, ` +
      `Nu0 = ${x.nusseltSmooth.toFixed(4)}, ratio = ${x.nusseltRatio?.toFixed(4)}, overall = ${x.heatFluxRatio.toFixed(4)}, ` +
      `friction = ${x.frictionRatio.toFixed(5)}, closedFormError = ${x.closedFormError?.nusselt.value.toExponential(3) ?? 'n/a'}, Pe_g = ${x.groovePecletNumber.toExponential(2)}, ${ms.toFixed(0)} ms`,
  );
  console.log(`   warnings: ${r.warnings.map((w) => w.code).join(', ') || 'none'}`);
}
const s = field.result.sensitivity!;
console.log('   sensitivity (k_o W/(m K) : Nu/Nu0 : overall)');
for (let i = 0; i < s.lubricantConductivity.length; i++) {
  console.log(`   ${s.lubricantConductivity[i].toPrecision(3)}\t${s.nusseltRatio[i]?.toFixed(4)}\t${s.heatFluxRatio[i]?.toFixed(4)}`);
}
console.log(`   best k_o = ${s.bestLubricantConductivity.toPrecision(3)} (overall ${s.bestHeatFluxRatio.toFixed(4)})`);

console.log('\n2. Conduction cell b_t vs grid (adiabatic-groove extreme against Philip 1972; demo wall)');
const extreme = { pitch: 20e-6, grooveWidth: 10e-6, grooveDepth: 5e-6, substrateThickness: 10e-6, workingConductivity: 0.6, lubricantConductivity: 1e-7, solidConductivity: 1e5 };
const demo = { ...extreme, grooveDepth: 10e-6, lubricantConductivity: 0.4, solidConductivity: 0.2 };
const philip = thermalSlipAdiabaticGrooves(20e-6, 0.5);
console.log('cells/P  cells   extreme rel.err   demo b_t (um)   ms');
for (const c of [32, 64, 128]) {
  const [e] = time(() => thermalSlipField(extreme, c));
  const [d, ms] = time(() => thermalSlipField(demo, c));
  console.log(`${c}\t${d.cells}\t${(e.thermalSlipLength / philip - 1).toExponential(3)}\t${(d.thermalSlipLength * 1e6).toFixed(5)}\t${ms.toFixed(0)}`);
}

console.log('\n3. Cross-section, smooth walls: Nu error vs Shah & London and cost');
const smooth = { ...demo, grooveWidth: 0 };
for (const walls of ['both', 'one'] as const) {
  const [r, ms] = time(() =>
    solveHeatCrossSection({ wall: smooth, height: 200e-6, heatedWalls: walls, workingViscosity: 1e-3, lubricantViscosity: 1e-2, workingHeatCapacity: 4.18e6, lubricantHeatCapacity: 1.76e6, lubricantMotion: 'co-flowing' }),
  );
  const exact = walls === 'both' ? 140 / 17 : 70 / 13;
  console.log(`${walls}: Nu = ${r.nusselt?.toFixed(6)} (exact ${exact.toFixed(6)}), rel. err ${(r.nusselt! / exact - 1).toExponential(2)}, fRe = ${r.frictionFactorReynolds.toFixed(5)}, ${r.cells} cells, ${ms.toFixed(0)} ms`);
}

console.log('\n4. Rectangular ducts (64 cells across the short side; Richardson with 32)');
console.log('aspect  fRe        Nu_H1     Nu_T      ms');
for (const a of [1, 0.5, 0.25, 0.125]) {
  const c = rectangularDuctLaminar(a, 32);
  const [f, ms] = time(() => rectangularDuctLaminar(a, 64));
  const ex = (p: number, q: number) => (q + (q - p) / 3).toFixed(4);
  console.log(`${a}\t${ex(c.frictionFactorReynolds, f.frictionFactorReynolds)}\t${ex(c.nusseltUniformFlux, f.nusseltUniformFlux)}\t${ex(c.nusseltUniformTemperature, f.nusseltUniformTemperature)}\t${ms.toFixed(0)}`);
}

console.log('\n5. Cross-section with grooves (worked-example wall, co-flowing lubricant): Nu and b vs grid');
console.log('cells/P  cells   Nu          b (um)      ms');
for (const c of [32, 64, 128]) {
  const [r, ms] = time(() =>
    solveHeatCrossSection({
      wall: { ...demo, workingConductivity: water.thermalConductivity! },
      height: 200e-6,
      heatedWalls: 'both',
      workingViscosity: water.viscosity,
      lubricantViscosity: lubricant.viscosity,
      workingHeatCapacity: water.density * water.specificHeat!,
      lubricantHeatCapacity: lubricant.density * lubricant.specificHeat!,
      lubricantMotion: 'co-flowing',
      cellsPerPitch: c,
    }),
  );
  console.log(`${c}\t${r.cells}\t${r.nusselt?.toFixed(6)}\t${(r.slipLength * 1e6).toFixed(5)}\t${ms.toFixed(0)}`);
}
