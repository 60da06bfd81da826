/**
 * Every failure becomes an RFC 9457 problem document: malformed JSON 400,
 * unknown route 404, wrong method 405, oversized body 413, wrong content type
 * 415, invalid or impossible input 422, rate limited 429, overloaded 503.
 * Nothing a client sends can produce a 5xx other than 503.
 */
import type { FastifyError, FastifyInstance, FastifyReply } from 'fastify';
import fp from 'fastify-plugin';
import { problem, ProblemError, type Problem } from '../problem.js';
import { problemFromError } from '../calculation.js';

export function sendProblem(reply: FastifyReply, p: Problem, headers: Record<string, string> = {}): FastifyReply {
  for (const [k, v] of Object.entries(headers)) reply.header(k, v);
  return reply.code(p.status).type('application/problem+json').send({ ...p, instance: reply.request.url });
}

function problemFromFastify(error: FastifyError & { statusCode?: number }): Problem | null {
  switch (error.code) {
    case 'FST_ERR_CTP_BODY_TOO_LARGE':
      return problem(413, 'body-too-large', 'The request body is too large', error.message);
    case 'FST_ERR_CTP_INVALID_MEDIA_TYPE':
      return problem(415, 'unsupported-media-type', 'Unsupported content type', 'Send the request body as application/json.');
    case 'FST_ERR_CTP_EMPTY_JSON_BODY':
      return problem(400, 'malformed-json', 'The request body is empty', error.message, { errors: [{ path: '', message: error.message }] });
    case 'FST_ERR_CTP_INVALID_CONTENT_LENGTH':
      return problem(400, 'bad-request', 'Invalid content length', error.message);
    default:
      break;
  }
  if (error.statusCode === 429) {
    return problem(429, 'rate-limited', 'Too many requests', error.message);
  }
  if (error.statusCode === 400 || error instanceof SyntaxError) {
    const message = /prototype|constructor/i.test(error.message) ? 'the body contains a forbidden key (__proto__ or constructor.prototype)' : error.message;
    return problem(400, 'malformed-json', 'The request body is not valid JSON', message, { errors: [{ path: '', message }] });
  }
  if (typeof error.statusCode === 'number' && error.statusCode >= 400 && error.statusCode < 500) {
    return problem(error.statusCode, 'client-error', error.message || 'Bad request', error.message);
  }
  return null;
}

export default fp(
  async function errorsPlugin(app: FastifyInstance) {
    // route path -> methods, to tell 405 from 404
    const methodsByPath = new Map<string, Set<string>>();
    app.addHook('onRoute', (route) => {
      const methods = Array.isArray(route.method) ? route.method : [route.method];
      const set = methodsByPath.get(route.url) ?? new Set<string>();
      for (const m of methods) set.add(m.toUpperCase());
      methodsByPath.set(route.url, set);
    });

    app.setNotFoundHandler((request, reply) => {
      const path = request.url.split('?')[0];
      const allowed = methodsByPath.get(path);
      if (allowed && !allowed.has(request.method)) {
        const list = [...allowed].filter((m) => m !== 'HEAD').join(', ');
        return sendProblem(reply, problem(405, 'method-not-allowed', 'Method not allowed', `${request.method} is not allowed on ${path}; use ${list}.`), {
          allow: list,
        });
      }
      return sendProblem(reply, problem(404, 'not-found', 'Not found', `No resource at ${path}.`));
    });

    app.setErrorHandler((error: FastifyError, request, reply) => {
      if (error instanceof ProblemError) return sendProblem(reply, error.problem, error.headers);
      const fromFastify = problemFromFastify(error);
      if (fromFastify) {
        if (fromFastify.status === 429) {
          const retry = reply.getHeader('retry-after');
          if (retry !== undefined) reply.header('retry-after', retry);
        }
        return sendProblem(reply, fromFastify);
      }
      const p = problemFromError(error);
      if (p.status >= 500) request.log.error({ err: error }, 'calculation failed');
      return sendProblem(reply, p);
    });
  },
  { name: 'oilskin-errors' },
);
