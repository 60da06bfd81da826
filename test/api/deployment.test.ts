/** No Docker engine here: check what can be checked without building the image. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse, parseAllDocuments } from 'yaml';
import type { FastifyInstance } from 'fastify';
import { makeApp } from './helpers.js';
import { loadConfig } from '../../src/api/config.js';

const read = (p: string) => readFileSync(new URL(`../../${p}`, import.meta.url), 'utf8');

let app: FastifyInstance;
beforeAll(async () => {
  app = await makeApp();
});
afterAll(async () => {
  await app.close();
});

describe('Kubernetes manifests', () => {
  const deployment = parse(read('docker/k8s/deployment.yaml'));
  const service = parse(read('docker/k8s/service.yaml'));
  const hpa = parse(read('docker/k8s/hpa.yaml'));
  const container = deployment.spec.template.spec.containers[0];

  it('probes point at routes that answer 200', async () => {
    for (const probe of [container.livenessProbe, container.readinessProbe]) {
      const res = await app.inject({ method: 'GET', url: probe.httpGet.path });
      expect(res.statusCode).toBe(200);
    }
  });
  it('ports agree: container port = service target = the port the service listens on', () => {
    const port = container.ports.find((p: { name: string }) => p.name === service.spec.ports[0].targetPort);
    expect(port).toBeDefined();
    const envPort = container.env.find((e: { name: string }) => e.name === 'OILSKIN_PORT').value;
    expect(Number(envPort)).toBe(port.containerPort);
    expect(loadConfig({ OILSKIN_PORT: envPort }).port).toBe(port.containerPort);
  });
  it('has resource requests and limits, a SIGTERM grace period, and the HPA targets the Deployment', () => {
    expect(container.resources.requests.cpu).toBeDefined();
    expect(container.resources.limits.memory).toBeDefined();
    expect(deployment.spec.template.spec.terminationGracePeriodSeconds).toBeGreaterThanOrEqual(10);
    expect(hpa.spec.scaleTargetRef.name).toBe(deployment.metadata.name);
    expect(service.spec.selector).toEqual(deployment.spec.selector.matchLabels);
  });
});

describe('Dockerfile and compose', () => {
  const dockerfile = read('Dockerfile');
  it('is multi-stage on an official slim image of a supported Node LTS, runs as non-root, has a HEALTHCHECK on /healthz', () => {
    // Node.js release policy (nodejs.org/en/about/releases): an even release is supported to April 30 three years after its
    // April release (v18: 2022-04-19 to 2025-04-30), so v20 ended on 2026-04-30; v22 runs to 2027, v24 to 2028.
    expect(dockerfile.match(/^FROM node:(22|24)[\w.-]*slim/gm)?.length).toBeGreaterThanOrEqual(2);
    expect(dockerfile).not.toMatch(/^FROM node:(1\d|20|21|23)\b/m);
    expect(dockerfile).toMatch(/--omit=dev/);
    expect(dockerfile).toMatch(/^USER node/m);
    expect(dockerfile).toMatch(/HEALTHCHECK[\s\S]*\/healthz/);
  });
  it('leaves PORT and HOST to the platform: the image sets neither OILSKIN_PORT nor OILSKIN_HOST, the health check follows PORT', () => {
    expect(dockerfile).not.toMatch(/^ENV[^\n]*OILSKIN_(PORT|HOST)/m);
    expect(dockerfile).not.toMatch(/^\s+OILSKIN_(PORT|HOST)=/m);
    expect(dockerfile).toMatch(/HEALTHCHECK[\s\S]*process\.env\.PORT/);
  });
  it('starts the compiled server that `npm run build` produces', () => {
    const pkg = JSON.parse(read('package.json'));
    expect(dockerfile).toContain('dist/src/api/server.js');
    expect(pkg.scripts.start).toContain('dist/src/api/server.js');
  });
  it('bounds the main thread’s heap the same way in the image and in `npm start` (RSS flat while a sweep streams: bench/sweep.ts)', () => {
    const pkg = JSON.parse(read('package.json'));
    const flag = /--max-old-space-size=(\d+)/;
    const image = dockerfile.match(new RegExp(`CMD \\[[^\\]]*"${flag.source}"`));
    const start = (pkg.scripts.start as string).match(flag);
    expect(image?.[1]).toBeDefined();
    expect(start?.[1]).toBe(image?.[1]);
  });
  it('compose maps the container port the service listens on', () => {
    const docs = parseAllDocuments(read('docker/compose.yaml')).map((d) => d.toJS());
    const svc = docs[0].services.oilskin;
    expect(svc.ports[0]).toBe(`8080:${svc.environment.OILSKIN_PORT}`);
  });
});
