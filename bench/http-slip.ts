/**
 * HTTP latency of the default slip answer against the flow answer, same run: the service as a child process
 * on 127.0.0.1 (bench/child-service.ts, sources under tsx), autocannon with one connection (so latency is
 * the service's time per request, not queueing), the same 40 design documents cycled through each endpoint.
 * Rounds alternate flow / slip so that a change in the machine's load hits both; the figure is the ratio of
 * the median latencies (issue 12 asks for at most 3).
 *
 *   npx tsx bench/http-slip.ts [--rounds 2] [--amount 400]
 *
 * Cases: w/P 0.02–0.98, d/w 0.01–10, N = μ_o/μ_w 1e-4–1e4 (water at 20 °C; a lubricant given by its
 * properties), pitch 100 µm, wall shear 1 Pa, laminar. Every slip answer must say which method answered
 * (result.method); the counts are printed.
 */
import os from 'node:os';
import autocannon from 'autocannon';
import { startService } from './child-service.js';

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}
const rounds = arg('rounds', 2);
const amount = arg('amount', 400);

const FRACTIONS = [0.02, 0.1, 0.3, 0.5, 0.7, 0.9, 0.98, 0.6];
const DEPTHS = [0.01, 0.1, 0.5, 2, 10];
const RATIOS = [1e-4, 1e-2, 1, 1e2, 1e4];
const WATER_VISCOSITY = 1.0016e-3; // only sets the lubricant viscosity from N; the service resolves water itself

/** 40 design documents: every w/P with five depth ratios, the viscosity ratio rotating. */
const designs = FRACTIONS.flatMap((phi, i) =>
  DEPTHS.map((aspect, j) => {
    const pitch = 100e-6;
    const ratio = RATIOS[(i + 2 * j) % RATIOS.length];
    return {
      texture: { pitch, grooveWidth: phi * pitch, grooveDepth: aspect * phi * pitch },
      lubricant: { density: 900, viscosity: ratio * WATER_VISCOSITY, surfaceTension: 0.025 },
      workingFluid: { id: 'water', temperature: '20 degC' },
      interfacialTension: 0.04,
      flow: { kind: 'wall-shear', wallShearStress: 1, regime: 'laminar' },
    };
  }),
);

const service = await startService({ sources: true });
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    service.child.kill();
    process.exit(130);
  });
}
try {
  // Every case answers 200, and says which method answered.
  const methods: Record<string, number> = {};
  for (const design of designs) {
    const res = await fetch(`${service.base}/v1/slip`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(design) });
    const body = (await res.json()) as { result?: { method?: string } };
    if (res.status !== 200) throw new Error(`slip answered ${res.status} for ${JSON.stringify(design.texture)}: ${JSON.stringify(body).slice(0, 400)}`);
    const method = body.result?.method ?? 'unknown';
    methods[method] = (methods[method] ?? 0) + 1;
  }
  const requests = (path: string) => designs.map((design) => ({ method: 'POST' as const, path, headers: { 'content-type': 'application/json' }, body: JSON.stringify(design) }));
  // autocannon's histogram keeps whole milliseconds; the per-response times it emits are exact, so the
  // quantiles are taken from those.
  const pooled = { flow: [] as number[], slip: [] as number[] };
  const quantile = (sorted: number[], q: number): number => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
  const measure = async (path: string) => {
    const times: number[] = [];
    const r = await new Promise<autocannon.Result>((resolve, reject) => {
      const instance = autocannon({ url: service.base, connections: 1, amount, requests: requests(path), timeout: 60 }, (error: unknown, result: autocannon.Result) =>
        error ? reject(error instanceof Error ? error : new Error(String(error))) : resolve(result),
      );
      instance.on('response', (_client: unknown, _status: number, _bytes: number, responseTime: number) => times.push(responseTime));
    });
    const failed = r.non2xx + r.errors + r.timeouts;
    if (failed > 0) throw new Error(`${path}: ${failed} failed requests`);
    times.sort((a, b) => a - b);
    (path === '/v1/flow' ? pooled.flow : pooled.slip).push(...times);
    return { p50: quantile(times, 0.5), p90: quantile(times, 0.9), p99: quantile(times, 0.99), mean: times.reduce((a, b) => a + b, 0) / times.length, rps: r.requests.average };
  };
  // Uncounted warm-up of both (JIT, first worker hops).
  await autocannon({ url: service.base, connections: 1, amount: 80, requests: requests('/v1/flow'), timeout: 60 });
  await autocannon({ url: service.base, connections: 1, amount: 80, requests: requests('/v1/slip'), timeout: 60 });

  console.log('oilskin HTTP latency: POST /v1/slip (default method) against POST /v1/flow');
  console.log(
    `node ${process.version}, ${os.cpus().length} logical cores (${os.cpus()[0]?.model ?? 'unknown'}), load average ${os.loadavg().map((x) => x.toFixed(2)).join(' ')}; ` +
      `autocannon, 1 connection, ${amount} requests per round cycling through ${designs.length} designs, ${rounds} alternating rounds`,
  );
  console.log(`slip methods that answered the ${designs.length} designs: ${JSON.stringify(methods)}`);
  const ratios: number[] = [];
  for (let round = 1; round <= rounds; round++) {
    const flow = await measure('/v1/flow');
    const slip = await measure('/v1/slip');
    ratios.push(slip.p50 / flow.p50);
    for (const [name, r] of [['flow', flow], ['slip', slip]] as const) {
      console.log(`round ${round} /v1/${name}: median ${r.p50.toFixed(2)} ms, p90 ${r.p90.toFixed(2)} ms, p99 ${r.p99.toFixed(2)} ms, mean ${r.mean.toFixed(2)} ms, ${r.rps.toFixed(0)} req/s`);
    }
    console.log(`round ${round}: median latency ratio slip/flow ${(slip.p50 / flow.p50).toFixed(2)}`);
  }
  pooled.flow.sort((a, b) => a - b);
  pooled.slip.sort((a, b) => a - b);
  const flowMedian = quantile(pooled.flow, 0.5);
  const slipMedian = quantile(pooled.slip, 0.5);
  console.log(`per round: ${ratios.map((r) => r.toFixed(2)).join(', ')}`);
  console.log(
    `all rounds pooled: /v1/flow median ${flowMedian.toFixed(2)} ms, /v1/slip median ${slipMedian.toFixed(2)} ms, ratio ${(slipMedian / flowMedian).toFixed(2)} (load average now ${os.loadavg()[0].toFixed(2)})`,
  );
} finally {
  service.child.kill();
}
