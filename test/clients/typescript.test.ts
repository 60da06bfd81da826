/**
 * The generated TypeScript client against a live service (a child process on
 * 127.0.0.1, started with the platform's PORT/HOST rather than ours): every
 * operation of the committed OpenAPI document is called once through the
 * client, with the document's own example body for calculations.
 */
import { afterAll, beforeAll, describe, expect, expectTypeOf, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { startService, type ChildService } from '../../bench/child-service.js';
import {
  OilskinProblem,
  oilskinClient,
  type Design,
  type DesignPath,
  type DesignWindowRequest,
  type OilskinClient,
  type ResultOf,
  type SweepLine,
  type SweepRequest,
} from '../../clients/typescript/index.js';

type Operation = { operationId: string; requestBody?: { content: { 'application/json': { example?: unknown; schema?: { $ref?: string } } } } };
const document = JSON.parse(readFileSync(new URL('../../openapi/openapi.json', import.meta.url), 'utf8')) as {
  paths: Record<string, Record<string, Operation>>;
};

let service: ChildService;
let client: OilskinClient;
beforeAll(async () => {
  // PORT and HOST, not OILSKIN_PORT/OILSKIN_HOST: the container-platform convention must reach a real process.
  service = await startService({ sources: true, platformVariables: true, env: { OILSKIN_WORKERS: '1' } });
  client = oilskinClient({ baseUrl: service.base });
}, 300_000);
afterAll(() => {
  service?.child.kill('SIGTERM');
});

/** The client's named method for an operation, when it has one. */
function namedCall(operationId: string, example: unknown): (() => Promise<unknown>) | undefined {
  const body = example as Design;
  const calls: Record<string, () => Promise<unknown>> = {
    assess: () => client.assess(body),
    sweep: () => client.sweep(example as SweepRequest),
    designWindow: () => client.designWindow(example as DesignWindowRequest),
    flow: () => client.flow(body),
    wetting: () => client.wetting(body),
    retention: () => client.retention(body),
    slip: () => client.slip(body),
    waves: () => client.waves(body),
    surfactant: () => client.surfactant(body),
    heat: () => client.heat(body),
    listFluids: () => client.fluids(),
    listSurfactants: () => client.surfactants(),
    liveness: () => client.health(),
    readiness: () => client.ready(),
    metrics: () => client.metrics(),
  };
  return calls[operationId];
}

describe('TypeScript client against a live service', () => {
  it('listens on the PORT and HOST the platform gave', () => {
    expect(service.base).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
  });

  it('calls every operation of the OpenAPI document once', async () => {
    const called: string[] = [];
    for (const [path, item] of Object.entries(document.paths)) {
      for (const [method, operation] of Object.entries(item)) {
        const body = operation.requestBody?.content['application/json'];
        const example = (body?.example ?? {}) as Design;
        const takesDesign = body?.schema?.$ref === '#/components/schemas/Design';
        const named = namedCall(operation.operationId, body?.example ?? {});
        let answer: unknown;
        if (named) answer = await named();
        else if (takesDesign) answer = await client.calculate(path as DesignPath, example);
        else if (method === 'post') {
          // Another request shape (a sweep, a search): through openapi-fetch with the document's example, JSON answer.
          const response = await client.http.request('post', path as '/v1/flow', { body: example });
          expect(response.response.status, `POST ${path}: ${JSON.stringify(response.error)}`).toBe(200);
          answer = response.data;
        } else answer = (await client.http.GET(path as '/healthz')).data;
        expect(answer, `${method.toUpperCase()} ${path}`).toBeDefined();
        if (takesDesign) expect((answer as { provenance: { inputsHash: string } }).provenance.inputsHash, path).toMatch(/^[0-9a-f]{64}$/);
        called.push(`${method} ${path}`);
      }
    }
    const operations = Object.entries(document.paths).flatMap(([path, item]) => Object.keys(item).map((m) => `${m} ${path}`));
    expect(called.sort()).toEqual(operations.sort());
    expect(called).toContain('post /v1/flow');
    expect(called).toContain('get /v1/fluids');
  }, 240_000);

  it('returns typed results', async () => {
    const design: Design = {
      workingFluid: { id: 'water', temperature: '20 degC' },
      flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
    };
    const answer = await client.flow(design);
    expectTypeOf(answer.result.wallShearStress).toEqualTypeOf<number>();
    expectTypeOf(answer).toEqualTypeOf<ResultOf<'/v1/flow'>>();
    // Dean (1978), J. Fluids Eng. 100, 215: c_f = 0.073 Re_m^(-1/4), Re_m = U·H/ν on the full height, τ_w = c_f ρ U²/2,
    // evaluated with the water properties the answer echoes as its inputs (U = 1 m/s, H = 10 mm).
    const water = answer.inputs.workingFluid!;
    const density = water.density!.value;
    const reynolds = (density * 1 * 0.01) / water.viscosity!.value;
    expect(answer.result.wallShearStress).toBeCloseTo(0.5 * 0.073 * reynolds ** -0.25 * density * 1 ** 2, 6);
    const fluids = await client.fluids();
    expect(fluids.fluids.map((f) => f.id)).toContain('water');
  });

  it('revalidates a result by its ETag: 304 with no compute', async () => {
    const design = JSON.parse(readFileSync(new URL('../../examples/flow-channel.json', import.meta.url), 'utf8')) as Design;
    // A light result is kept from its second computation on (the service's admission rule), as a polled design is.
    await client.revalidate('/v1/flow', design, '"none"');
    const first = await client.revalidate('/v1/flow', design, '"none"');
    expect(first.status).toBe(200);
    if (first.status !== 200) return;
    expect(first.etag).toBe(`"${first.body.provenance.inputsHash}"`);
    const again = await client.revalidate('/v1/flow', design, first.etag);
    expect(again).toEqual({ status: 304, etag: first.etag });
    expect(await client.metrics()).toMatch(/oilskin_result_cache_hits_total\{calculation="flow"\} [1-9]/);
  });

  it('throws a problem document naming the field', async () => {
    const bad = client.flow({ workingFluid: { id: 'water' }, flow: { kind: 'channel', height: '1 m/s', bulkVelocity: 1 } });
    await expect(bad).rejects.toBeInstanceOf(OilskinProblem);
    const error = (await bad.catch((e: unknown) => e)) as OilskinProblem;
    expect(error.status).toBe(422);
    expect(error.problem?.errors?.[0]?.path).toBe('flow.height');
  });

  it('types only design paths as calculations', () => {
    const path: DesignPath = '/v1/slip';
    // @ts-expect-error a catalogue is not a calculation
    const notACalculation: DesignPath = '/v1/fluids';
    expect([path, notACalculation]).toHaveLength(2);
  });

  describe('sweeps, the assessment and the design window through their own methods', () => {
    /** Three channel-flow points: small enough for a test, enough for a stream with several lines. */
    const sweepRequest: SweepRequest = {
      calculation: 'flow',
      design: { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' } },
      axes: [{ path: 'flow.bulkVelocity', values: ['0.5 m/s', '1 m/s', '2 m/s'] }],
    };

    it('gives the same points as JSON, as CSV and as streamed NDJSON lines, each equal to the single-point answer', async () => {
      const json = await client.sweep(sweepRequest);
      expect(json.points).toHaveLength(3);
      expect(json.failed).toBe(0);

      const lines: SweepLine[] = [];
      for await (const line of client.sweepLines(sweepRequest)) lines.push(line);
      expect(lines[0]?.kind).toBe('sweep');
      expect(lines.at(-1)).toEqual({ kind: 'end', points: 3, failed: 0 });
      const points = lines.filter((l): l is Extract<SweepLine, { kind: 'point' }> => l.kind === 'point');
      expect(points.map(({ kind: _kind, ...point }) => point)).toEqual(json.points);
      const progress = lines.filter((l) => l.kind === 'progress');
      expect(progress.at(-1)).toMatchObject({ done: 3, points: 3, failed: 0 });
      const header = lines[0] as Extract<SweepLine, { kind: 'sweep' }>;
      expect(header.sweepId).toBe(json.sweepId);
      expect(header.columns).toEqual(json.columns);

      const csv = (await client.sweepCsv(sweepRequest)).trim().split(/\r?\n/);
      expect(csv).toHaveLength(4);
      expect(csv[0]!.split(',')).toHaveLength(json.columns.length + 2); // index, the columns, error

      // Each point is the single-point calculation at that velocity (the sweep runs the same question).
      const single = await client.flow({ ...sweepRequest.design, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '2 m/s' } });
      expect(Object.values(json.points[2]!.values)).toContain(single.result.wallShearStress);
    });

    it('a caller may leave the stream early; a bad request is thrown as a problem naming the field', async () => {
      let seen = 0;
      for await (const line of client.sweepLines({ ...sweepRequest, axes: [{ path: 'flow.bulkVelocity', range: { from: '0.1 m/s', to: '3 m/s', points: 200 } }] })) {
        expect(line.kind).toBe('sweep');
        seen++;
        break;
      }
      expect(seen).toBe(1);
      const bad = async () => {
        for await (const _line of client.sweepLines({ ...sweepRequest, axes: [{ path: 'flow.bulkVelocity', values: ['1 mN/m'] }] })) void _line;
      };
      const error = (await bad().catch((e: unknown) => e)) as OilskinProblem;
      expect(error).toBeInstanceOf(OilskinProblem);
      expect(error.status).toBe(422);
      expect(error.problem?.errors?.[0]?.path).toBe('axes[0].values[0]');
      // The service is still answering after the abandoned stream.
      expect((await client.health()) as unknown).toBeDefined();
    });

    it('the assessment as JSON, as its HTML report and as one plot; the design window as JSON and as its plot', async () => {
      // The document's example without the sensitivities (each costs one more assessment): this test is about the client.
      const example = document.paths['/v1/assess']!.post!.requestBody!.content['application/json'].example as Design;
      const assessExample: Design = { ...example, options: { ...example.options, marginSensitivities: { enabled: false } } };
      const assessed = await client.assess(assessExample);
      expect(assessed.provenance.inputsHash).toMatch(/^[0-9a-f]{64}$/);
      const html = await client.assessReport(assessExample);
      expect(html).toMatch(/^<!doctype html>/i);
      expect(html).toContain('</html>');
      const svg = await client.assessPlot(assessExample, 'service-time');
      expect(svg).toMatch(/<svg[\s>]/);

      const windowExample = document.paths['/v1/design-window']!.post!.requestBody!.content['application/json'].example as DesignWindowRequest;
      const window = await client.designWindow(windowExample);
      expect(window.evaluated).toBeGreaterThan(0);
      expect(await client.designWindowPlot(windowExample)).toMatch(/<svg[\s>]/);
    }, 240_000);
  });
});
