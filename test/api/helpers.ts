import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import { buildApp } from '../../src/api/app.js';
import { testConfig, type ServiceConfig } from '../../src/api/config.js';

export async function makeApp(overrides: Partial<ServiceConfig> = {}): Promise<FastifyInstance> {
  const app = await buildApp(testConfig(overrides));
  await app.ready();
  return app;
}

/** True when no number anywhere in the JSON text is NaN/Infinity (JSON cannot carry them; null would mark a guard hit). */
export function hasNoNonFinite(text: string): boolean {
  return !/\b(NaN|Infinity)\b/.test(text);
}

/** An example request body from examples/ (invented demo scenarios). */
export function example(name: string): Record<string, unknown> {
  return JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8')) as Record<string, unknown>;
}
