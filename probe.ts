import { buildApp } from './src/api/app.js';
import { testConfig } from './src/api/config.js';
const app = await buildApp(testConfig());
await app.ready();
const body = {
  calculation: 'flow',
  design: { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' }, texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' } },
  axes: [ { path: 'flow.bulkVelocity', range: { from: '0.1 m/s', to: '2 m/s', points: 3 } }, { path: 'texture.grooveWidth', values: ['20 um', '150 um'] } ],
};
for (const accept of ['application/json', 'text/csv', 'application/x-ndjson']) {
  const res = await app.inject({ method: 'POST', url: '/v1/sweep', payload: body, headers: { accept } });
  console.log(res.statusCode, res.headers['content-type']); console.log(res.body.slice(0, 1500));
}
const bad = await app.inject({ method: 'POST', url: '/v1/sweep', payload: { ...body, axes: [{ path: 'texture.grooveWidht', values: [1] }] } });
console.log(bad.statusCode, bad.body);
const big = await app.inject({ method: 'POST', url: '/v1/sweep', payload: { ...body, axes: [{ path: 'flow.bulkVelocity', range: { from: 0.1, to: 2, points: 1000000 } }] } });
console.log(big.statusCode, big.body);
await app.close();
