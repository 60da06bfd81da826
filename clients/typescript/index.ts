/**
 * Typed TypeScript client of the oilskin service.
 *
 * The types (`schema.d.ts`) are generated from the committed OpenAPI document
 * by openapi-typescript (`npm run client:write`); the calls go through
 * openapi-fetch. This file is the small hand-written layer on top: one method
 * per question (the assessment with its HTML report, sweeps as JSON, CSV or a
 * streamed NDJSON iterator, the design window), problem documents thrown as
 * `OilskinProblem`, and revalidation of a result by its ETag.
 *
 * ```ts
 * const oilskin = oilskinClient({ baseUrl: 'http://127.0.0.1:8080' });
 * const { result, warnings } = await oilskin.flow({
 *   workingFluid: { id: 'water', temperature: '20 degC' },
 *   flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
 * });
 * for await (const line of oilskin.sweepLines(request)) {
 *   if (line.kind === 'progress') console.log(`${line.done}/${line.points}`);
 *   if (line.kind === 'point') rows.push(line.values);
 * }
 * ```
 *
 * Runs wherever `fetch` exists (Node 20.19+, browsers, Deno, Bun).
 */
import createClient, { type Client } from 'openapi-fetch';
import type { components, paths } from './schema.js';

export type { components, paths } from './schema.js';

/** The one design document every calculation accepts. */
export type Design = components['schemas']['Design'];
/** An RFC 9457 problem document (every 4xx and 5xx). */
export type Problem = components['schemas']['Problem'];
export type FluidsCatalogue = components['schemas']['FluidsResponse'];
export type SurfactantsCatalogue = components['schemas']['SurfactantsResponse'];
export type AssessResponse = components['schemas']['AssessResponse'];
export type SweepRequest = components['schemas']['SweepRequest'];
export type SweepResponse = components['schemas']['SweepResponse'];
export type DesignWindowRequest = components['schemas']['DesignWindowRequest'];
export type DesignWindowResponse = components['schemas']['DesignWindowResponse'];

/**
 * The lines of a streamed sweep (`Accept: application/x-ndjson`), in order: one `sweep` line (the JSON answer's
 * header), a `point` line per point with `progress` lines between them, one `end` line. The point and header shapes
 * come from the generated JSON answer; the document describes the stream only as text, so the progress and end lines
 * are written out here.
 */
export type SweepLine =
  | ({ kind: 'sweep' } & Omit<SweepResponse, 'points' | 'failed'>)
  | ({ kind: 'point' } & SweepResponse['points'][number])
  | { kind: 'progress'; done: number; points: number; failed: number; elapsedMs: number }
  | { kind: 'end'; points: number; failed: number };

/** Every POST path whose body is the design document: the calculations (new ones join when the types are regenerated). */
export type DesignPath = {
  [P in keyof paths]: paths[P] extends { post: { requestBody: { content: { 'application/json': Design } } } } ? P : never;
}[keyof paths];

/** The JSON body of the 200 answer of a calculation path. */
export type ResultOf<P extends DesignPath> = paths[P] extends { post: { responses: { 200: { content: { 'application/json': infer R } } } } } ? R : never;

/** Answer of a revalidation: the result when it changed, or 304 when the tag still names it. */
export type Revalidated<R> = { status: 200; etag: string; body: R } | { status: 304; etag: string };

/** A 4xx/5xx answer of the service, with its problem document (field paths in `problem.errors`). */
export class OilskinProblem extends Error {
  constructor(
    readonly status: number,
    readonly problem: Problem | undefined,
    readonly retryAfterSeconds: number | undefined,
  ) {
    super(problem ? `${status} ${problem.title}${problem.detail ? `: ${problem.detail}` : ''}` : `HTTP ${status}`);
    this.name = 'OilskinProblem';
  }
}

export interface OilskinClientOptions {
  /** Where the service listens, e.g. `http://127.0.0.1:8080`. */
  baseUrl: string;
  /** Sent as `x-api-key` when the service has keys configured. */
  apiKey?: string;
  /** A fetch of your own (proxy, retries, tests); the global one by default. */
  fetch?: typeof globalThis.fetch;
}

function isProblem(value: unknown): value is Problem {
  return typeof value === 'object' && value !== null && 'status' in value && 'title' in value;
}

function failure(response: Response, error: unknown): OilskinProblem {
  const retryAfter = Number(response.headers.get('retry-after'));
  return new OilskinProblem(response.status, isProblem(error) ? error : undefined, Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : undefined);
}

/** The body of a 2xx answer; anything else is thrown as OilskinProblem. */
function bodyOf<T>(answer: { data?: T; error?: unknown; response: Response }): T {
  if (!answer.response.ok || answer.data === undefined) throw failure(answer.response, answer.error);
  return answer.data;
}

const JSON_ONLY = { accept: 'application/json' };

/** A POST of a design to a path, as openapi-fetch types it for the path-generic methods below. */
type PostDesign = (
  path: DesignPath,
  init: { body: Design; headers?: Record<string, string> },
) => Promise<{ data?: unknown; error?: unknown; response: Response }>;

export function oilskinClient(options: OilskinClientOptions) {
  const http: Client<paths> = createClient<paths>({
    baseUrl: options.baseUrl.replace(/\/+$/, ''),
    ...(options.fetch ? { fetch: options.fetch } : {}),
    headers: options.apiKey ? { 'x-api-key': options.apiKey } : {},
  });
  const post = http.POST as unknown as PostDesign;
  // The representations openapi-fetch does not parse (HTML, SVG, CSV, a stream) are fetched directly.
  const fetchFn = options.fetch ?? globalThis.fetch;
  const baseUrl = options.baseUrl.replace(/\/+$/, '');
  const authHeaders: Record<string, string> = options.apiKey ? { 'x-api-key': options.apiKey } : {};

  /** Any calculation by its path: `calculate('/v1/slip', design)`. */
  async function calculate<P extends DesignPath>(path: P, design: Design): Promise<ResultOf<P>> {
    return bodyOf(await post(path, { body: design })) as ResultOf<P>;
  }

  /** POST a JSON body asking for another representation; the text of a 2xx answer, anything else thrown. */
  async function postForText(path: '/v1/assess' | '/v1/sweep' | '/v1/design-window', body: unknown, accept: string, query = ''): Promise<Response> {
    const response = await fetchFn(`${baseUrl}${path}${query}`, {
      method: 'POST',
      headers: { ...authHeaders, 'content-type': 'application/json', accept },
      body: JSON.stringify(body),
    });
    if (!response.ok) throw failure(response, await response.json().catch(() => undefined));
    return response;
  }

  /**
   * A sweep streamed as NDJSON, one parsed line at a time as the service computes them: memory stays flat whatever
   * the number of points, and progress lines arrive while it works. Breaking out of the loop closes the connection,
   * which cancels the rest of the sweep on the service.
   */
  async function* sweepLines(request: SweepRequest, init: { signal?: AbortSignal } = {}): AsyncGenerator<SweepLine, void, undefined> {
    const controller = new AbortController();
    const onAbort = () => controller.abort(init.signal?.reason);
    init.signal?.addEventListener('abort', onAbort, { once: true });
    try {
      const response = await fetchFn(`${baseUrl}/v1/sweep`, {
        method: 'POST',
        headers: { ...authHeaders, 'content-type': 'application/json', accept: 'application/x-ndjson' },
        body: JSON.stringify(request),
        signal: controller.signal,
      });
      if (!response.ok) throw failure(response, await response.json().catch(() => undefined));
      if (response.body === null) return;
      const decoder = new TextDecoder();
      const reader = response.body.getReader();
      let pending = '';
      for (;;) {
        const { done, value } = await reader.read();
        pending += done ? decoder.decode() : decoder.decode(value, { stream: true });
        let newline: number;
        while ((newline = pending.indexOf('\n')) >= 0) {
          const line = pending.slice(0, newline).trim();
          pending = pending.slice(newline + 1);
          if (line !== '') yield JSON.parse(line) as SweepLine;
        }
        if (done) break;
      }
      if (pending.trim() !== '') yield JSON.parse(pending) as SweepLine;
    } finally {
      init.signal?.removeEventListener('abort', onAbort);
      // Stops the download when the caller left the loop early (no-op once the stream has ended).
      controller.abort();
    }
  }

  /**
   * Ask again for a result the caller holds under `etag` (its `provenance.inputsHash`
   * in quotes, as the ETag header gave it): 304 costs the service no compute.
   */
  async function revalidate<P extends DesignPath>(path: P, design: Design, etag: string): Promise<Revalidated<ResultOf<P>>> {
    const answer = await post(path, { body: design, headers: { 'if-none-match': etag } });
    const tag = answer.response.headers.get('etag') ?? etag;
    if (answer.response.status === 304) return { status: 304, etag: tag };
    return { status: 200, etag: tag, body: bodyOf(answer) as ResultOf<P> };
  }

  return {
    /** The openapi-fetch client itself, for anything the methods below do not cover. */
    http,
    calculate,
    revalidate,
    flow: (design: Design) => calculate('/v1/flow', design),
    wetting: (design: Design) => calculate('/v1/wetting', design),
    retention: (design: Design) => calculate('/v1/retention', design),
    slip: (design: Design) => calculate('/v1/slip', design),
    waves: (design: Design) => calculate('/v1/waves', design),
    surfactant: (design: Design) => calculate('/v1/surfactant', design),
    heat: (design: Design) => calculate('/v1/heat', design),
    /** Every mechanism on one design, with the couplings, one verdict and the margins' sensitivities. */
    assess: (design: Design): Promise<AssessResponse> => calculate('/v1/assess', design),
    /** The assessment as the self-contained HTML report (inline CSS and SVG), for a lab record. */
    assessReport: async (design: Design): Promise<string> => (await postForText('/v1/assess', design, 'text/html')).text(),
    /** One plot of the assessment as SVG. */
    assessPlot: async (design: Design, plot: 'service-time' | 'wave-map' | 'surfactant' | 'heat'): Promise<string> =>
      (await postForText('/v1/assess', design, 'image/svg+xml', `?plot=${encodeURIComponent(plot)}`)).text(),
    /** A sweep (or one shard of it) as one JSON document. */
    // (Asked for as JSON; the generated type of the 200 body is the union of every representation.)
    sweep: async (request: SweepRequest): Promise<SweepResponse> => bodyOf(await http.POST('/v1/sweep', { body: request, headers: JSON_ONLY })) as SweepResponse,
    /** A sweep as CSV text (a header row, then one row per point), for a spreadsheet or a file. */
    sweepCsv: async (request: SweepRequest): Promise<string> => (await postForText('/v1/sweep', request, 'text/csv')).text(),
    sweepLines,
    /** The groove widths and depths (and pitches) that meet every requirement. */
    designWindow: async (request: DesignWindowRequest): Promise<DesignWindowResponse> =>
      bodyOf(await http.POST('/v1/design-window', { body: request, headers: JSON_ONLY })) as DesignWindowResponse,
    /** The design window plotted as SVG (groove width × depth). */
    designWindowPlot: async (request: DesignWindowRequest): Promise<string> => (await postForText('/v1/design-window', request, 'image/svg+xml')).text(),
    fluids: async (): Promise<FluidsCatalogue> => bodyOf(await http.GET('/v1/fluids')),
    surfactants: async (): Promise<SurfactantsCatalogue> => bodyOf(await http.GET('/v1/surfactants')),
    /** Liveness: resolves when the process answers. */
    health: async () => bodyOf(await http.GET('/healthz')),
    /** Readiness: throws OilskinProblem 503 while the replica starts or drains. */
    ready: async () => bodyOf(await http.GET('/readyz')),
    /** Prometheus text exposition. */
    metrics: async (): Promise<string> => bodyOf(await http.GET('/metrics', { parseAs: 'text' })),
  };
}

export type OilskinClient = ReturnType<typeof oilskinClient>;
