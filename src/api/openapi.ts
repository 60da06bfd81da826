/**
 * The OpenAPI 3.1 document, generated from the same zod schemas that validate
 * requests. Committed as openapi/openapi.json; `npm run openapi:check` fails
 * when the two differ.
 */
import { OpenAPIRegistry, OpenApiGeneratorV31 } from '@asteasolutions/zod-to-openapi';
import { z } from './schemas/zod.js';
import { ProblemSchema } from './problem.js';
import { SERVICE_VERSION } from './envelope.js';
import { CALCULATIONS } from './routes/index.js';
import { FluidsResponse, SurfactantsResponse } from './schemas/responses/catalogue.js';
import { registerSweepPaths } from './sweep/openapi.js';
import { registerWindowPaths } from './window/openapi.js';

const problemContent = { 'application/problem+json': { schema: ProblemSchema } };

const errorResponses = {
  400: { description: 'Malformed JSON', content: problemContent },
  401: { description: 'Missing or wrong API key (when keys are configured)', content: problemContent },
  413: { description: 'Request body too large', content: problemContent },
  415: { description: 'Content type is not application/json', content: problemContent },
  422: { description: 'Invalid, dimensionally wrong or physically impossible input; or a solve that did not converge', content: problemContent },
  429: { description: 'Rate limited', content: problemContent },
  503: { description: 'Overloaded or shutting down', content: problemContent },
};
/** HTTP caching (RFC 9110): the validator a client sends back, the tag and policy it receives, the 304 it gets. */
const conditionalHeaders = z.object({
  'if-none-match': z.string().optional().openapi({ description: 'The ETag of a result the client holds; when it names this result the answer is 304 with no body (and, when the service remembers the tag, no compute).', example: '"5f2b…"' }),
});
const cachingHeaders = (cacheControl: string) => ({
  ETag: { description: 'Strong entity tag: for a calculation, its inputs hash (provenance.inputsHash) in quotes; for a catalogue, the SHA-256 of its body.', schema: { type: 'string' as const } },
  'Cache-Control': { description: cacheControl, schema: { type: 'string' as const } },
});
const CATALOGUE_CACHING = cachingHeaders('public, max-age=300 (private behind API keys): the catalogue is fixed while the service runs');
const notModified = { 304: { description: 'Not modified: the If-None-Match tag names this result (no body)' } };
const methodNotAllowed = { 405: { description: 'Method not allowed on this path', content: problemContent } };

let cached: Record<string, unknown> | undefined;

export function buildOpenApiDocument(): Record<string, unknown> {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'apiKey', { type: 'apiKey', in: 'header', name: 'x-api-key' });

  for (const c of CALCULATIONS) {
    registry.registerPath({
      method: 'post',
      path: c.path,
      operationId: c.name.replace(/-(\w)/g, (_m, ch: string) => ch.toUpperCase()),
      summary: c.summary,
      description: c.description,
      tags: ['calculations'],
      security: [{}, { apiKey: [] }],
      request: { headers: conditionalHeaders, body: { required: true, content: { 'application/json': { schema: c.body, example: c.example } } } },
      responses: {
        200: {
          description: 'The result with its inputs, warnings, assumptions, references and provenance',
          headers: cachingHeaders('no-cache: a client may keep the result and revalidate it with If-None-Match'),
          content: {
            'application/json': { schema: c.response },
            ...Object.fromEntries(Object.entries(c.present?.contentTypes ?? {}).map(([type, description]) => [type, { schema: { type: 'string', description } }])),
          },
        },
        ...notModified,
        ...errorResponses,
      },
    });
  }

  registerSweepPaths(registry, problemContent, errorResponses);
  registerWindowPaths(registry, problemContent, errorResponses);

  registry.registerPath({
    method: 'get',
    path: '/v1/fluids',
    operationId: 'listFluids',
    request: { headers: conditionalHeaders },
    summary: 'The built-in fluid catalogue',
    description: 'Every fluid with each property value at its reference temperature, unit, valid temperature range and source key, and the references those keys name.',
    tags: ['catalogues'],
    responses: {
      200: { description: 'The catalogue', headers: CATALOGUE_CACHING, content: { 'application/json': { schema: FluidsResponse } } },
      ...notModified,
      429: errorResponses[429],
    },
  });

  registry.registerPath({
    method: 'get',
    path: '/v1/surfactants',
    operationId: 'listSurfactants',
    request: { headers: conditionalHeaders },
    summary: 'The built-in surfactant catalogue',
    description:
      'Each surfactant with, per interface type (air–water, oil–water where data exist), maximum surface excess, Langmuir constant, rate constants, diffusivities, Gibbs prefactor and critical micelle concentration, each with its source.',
    tags: ['catalogues'],
    responses: {
      200: { description: 'The catalogue', headers: CATALOGUE_CACHING, content: { 'application/json': { schema: SurfactantsResponse } } },
      ...notModified,
      429: errorResponses[429],
    },
  });

  const status = z.object({ status: z.string() });
  for (const [path, summary, id] of [
    ['/healthz', 'Liveness: the process is up', 'liveness'],
    ['/readyz', 'Readiness: the replica accepts work', 'readiness'],
  ] as const) {
    registry.registerPath({
      method: 'get',
      path,
      operationId: id,
      summary,
      tags: ['service'],
      responses: { 200: { description: 'OK', content: { 'application/json': { schema: status } } }, ...methodNotAllowed, 503: errorResponses[503] },
    });
  }
  registry.registerPath({
    method: 'get',
    path: '/metrics',
    operationId: 'metrics',
    summary: 'Prometheus metrics (text exposition format)',
    tags: ['service'],
    responses: { 200: { description: 'Metrics', content: { 'text/plain': { schema: z.string() } } }, ...methodNotAllowed },
  });

  const generator = new OpenApiGeneratorV31(registry.definitions);
  cached = generator.generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'oilskin',
      version: SERVICE_VERSION,
      description:
        'Calculation service for liquid-infused surfaces: flow conditions, wetting state, lubricant retention, interface waves, slip and drag, surfactant sensitivity and heat transfer. Numbers are SI; strings with units are converted; angles are degrees. Errors are RFC 9457 problem details.\n\n' +
        '**Caution.** Results are engineering estimates from published models within stated validity ranges, not a design approval. Where a result feeds a decision about a pressurised line, a food- or medical-contact coating, or the handling of lubricants, solvents and surfactants, follow the applicable codes and standards and the safety data sheets of the products actually used, and have the decision checked by a qualified engineer. Read the warnings of every response: a result outside its validity range says so there.',
      license: { name: 'Proprietary', identifier: 'LicenseRef-Proprietary' },
      contact: { name: 'oilskin team' },
    },
    servers: [{ url: '/', description: 'This service' }],
    tags: [
      { name: 'calculations', description: 'Physics calculations (POST, JSON in and out)' },
      { name: 'catalogues', description: 'Built-in data with sources' },
      { name: 'service', description: 'Health, readiness and metrics' },
    ],
  }) as unknown as Record<string, unknown>;
  return cached;
}
