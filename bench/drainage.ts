/**
 * Cost and accuracy of the finite-volume drainage solver against grid size.
 * Run: npx tsx bench/drainage.ts
 * Case: w = d = 50 µm, γ = 0.02 N/m, τ_i = 1 Pa, μ_o = 0.01 Pa·s, receding angle 85°
 * (small meniscus compliance, where the lumped closed form applies), L₀ = 5 L∞,
 * duration 3 L₀/V_s. Error: largest |L_FV(t) − L_lumped(t)|/L₀ over the timeline.
 */
import os from 'node:os';
import { lumpedRetainedLength, solveDrainage } from '../src/physics/retention/drainage.js';
import { pressureDrivenGrooveFlux, shearDrivenGrooveFlux } from '../src/physics/groove/groove-duct.js';

const w = 50e-6;
const d = 50e-6;
const gamma = 0.02;
const tau = 1;
const mu = 0.01;
const kappa = (2 * Math.cos((85 * Math.PI) / 180)) / w;
const G = (tau * shearDrivenGrooveFlux(w, d)) / pressureDrivenGrooveFlux(w, d);
const Linf = (gamma * kappa) / G;
const L0 = 5 * Linf;
const Vs = (tau * shearDrivenGrooveFlux(w, d)) / (mu * w * d);

console.log(`node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown'}), shared machine`);
console.log('cells  ms/solve  steps  rejected  maxError/L0  conservation');
for (const cells of [50, 100, 200, 400]) {
  const start = performance.now();
  const r = solveDrainage({
    grooveWidth: w,
    grooveDepth: d,
    segmentLength: L0,
    segments: 1,
    grooveEnds: 'open',
    interfacialTension: gamma,
    interfacialShearStress: tau,
    lubricantViscosity: mu,
    bodyForceGradient: 0,
    recedingCurvature: kappa,
    spillCurvature: 2 / w,
    initialFill: 1,
    duration: (3 * L0) / Vs,
    cellsPerSegment: cells,
  });
  const elapsed = performance.now() - start;
  let worst = 0;
  for (const p of r.timeline) worst = Math.max(worst, Math.abs(p.retainedLength - lumpedRetainedLength(p.time, L0, Linf, Vs)) / L0);
  console.log(
    `${String(cells).padStart(5)}  ${elapsed.toFixed(0).padStart(8)}  ${String(r.steps).padStart(5)}  ${String(r.rejectedSteps).padStart(8)}  ${worst.toExponential(3).padStart(11)}  ${r.conservationError.toExponential(2)}`,
  );
}
