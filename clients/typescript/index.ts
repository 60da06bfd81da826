/**
 * Typed TypeScript client of the oilskin service.
 *
 * The types (`schema.d.ts`) are generated from the committed OpenAPI document
 * by openapi-typescript (`npm run client:write`); the calls go through
 * openapi-fetch. This file is the small hand-written layer on top: one method
 * per question, problem documents thrown as `OilskinProblem`, and
 * revalidation of a result by its ETag.
 *
 * ```ts
 * const oilskin = oilskinClient({ baseUrl: 'http://127.0.0.1:8080' });
 * const { result, warnings } = await oilskin.flow({
 *   workingFluid: { id: 'water', temperature: '20 degC' },
 *   flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
 * });
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

  /** Any calculation by its path: `calculate('/v1/slip', design)`. */
  async function calculate<P extends DesignPath>(path: P, design: Design): Promise<ResultOf<P>> {
    return bodyOf(await post(path, { body: design })) as ResultOf<P>;
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
