import { buildApp } from './src/api/app.js';
import { testConfig } from './src/api/config.js';
const app = await buildApp(testConfig());
await app.ready();
const body = { design: {
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '25 um', grooveLength: '20 mm' },
  lubricant: { id: 'n-decane', temperature: '20 degC' }, workingFluid: { id: 'water', temperature: '20 degC' },
  contactAngles: { underWorkingFluid: { advancing: 120, receding: 80 } },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' }, options: { method: 'closed-form' } },
  search: { grooveWidth: { min: '5 um', max: '300 um' }, interfaceFraction: { min: 0.5, max: 0.5 }, grooveDepth: { min: '2 um', max: '200 um' }, coarsePoints: 5, refinements: 2 },
  requirements: { minDragReduction: 0.02, minRetainedFraction: 0.5 } };
const t0 = performance.now();
const res = await app.inject({ method: 'POST', url: '/v1/design-window', payload: body });
const j = res.json();
console.log(res.statusCode, performance.now() - t0, j.candidates, j.evaluated, j.feasibleCandidates, j.limitingShare, j.best, j.pareto?.length, j.boundary?.length, j.detail);
console.log(j.plane?.labels.map((r: string[]) => r.map((l) => l[0]).join('')).reverse().join('\n'));
await app.close();
