/**
 * Graceful shutdown with a real child process: on SIGTERM readiness fails,
 * idle keep-alive connections are closed at once, in-flight requests finish
 * (their keep-alive connections then close), and the process exits 0; what
 * is still running at the drain limit is cut off and the process exits 0.
 * No test asserts a time: each one checks from the log which path the drain
 * took, with limits chosen so that the other path would be visible.
 */
import { describe, expect, it } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

interface Server {
  child: ChildProcess;
  port: number;
  exited: Promise<number | null>;
  log: () => string;
}

async function startServer(env: Record<string, string>): Promise<Server> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/api/server.ts'], {
    cwd: root,
    env: { ...process.env, OILSKIN_PORT: '0', OILSKIN_HOST: '127.0.0.1', OILSKIN_WORKERS: '0', OILSKIN_LOG_LEVEL: 'info', OILSKIN_RATE_LIMIT: '0', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let buffer = '';
  child.stdout!.on('data', (chunk: Buffer) => (buffer += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (buffer += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  const port = await new Promise<number>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start: ${buffer}`)), 120_000);
    const check = () => {
      const m = buffer.match(/Server listening at http:\/\/127\.0\.0\.1:(\d+)/);
      if (m) {
        clearTimeout(timer);
        resolve(Number(m[1]));
      }
    };
    child.stdout!.on('data', check);
    child.on('exit', (code) => reject(new Error(`server exited early with ${code}: ${buffer}`)));
  });
  return { child, port, exited, log: () => buffer };
}

function request(
  port: number,
  options: { method?: string; path: string; body?: string; agent?: http.Agent },
): Promise<{ status: number; text: string; headers: http.IncomingHttpHeaders; socketClosed: Promise<void> }> {
  return new Promise((resolve, reject) => {
    const headers: Record<string, string | number> = {};
    if (options.body !== undefined) {
      headers['content-type'] = 'application/json';
      headers['content-length'] = Buffer.byteLength(options.body);
    }
    const req = http.request({ host: '127.0.0.1', port, path: options.path, method: options.method ?? 'GET', headers, agent: options.agent }, (res) => {
      let text = '';
      const socketClosed = new Promise<void>((r) => (res.socket.destroyed ? r() : res.socket.once('close', () => r())));
      res.on('data', (c: Buffer) => (text += c.toString()));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, text, headers: res.headers, socketClosed }));
    });
    req.on('error', reject);
    req.end(options.body);
  });
}

const flowBody = JSON.stringify({ workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } });
const heatExample = JSON.parse(readFileSync(new URL('../../examples/heat-worked-example.json', import.meta.url), 'utf8'));
/** Seconds of compute in a worker thread (field method, 25-point field sweep). */
const slowHeatBody = JSON.stringify({ ...heatExample, options: { method: 'field', sensitivity: { points: 25 } } });

describe('graceful shutdown', () => {
  it('finishes a request that is in flight when SIGTERM arrives, then exits 0', async () => {
    const server = await startServer({});
    const { port } = server;
    const half = Math.floor(flowBody.length / 2);
    const response = new Promise<{ status: number; text: string }>((resolve, reject) => {
      const req = http.request(
        { host: '127.0.0.1', port, path: '/v1/flow', method: 'POST', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(flowBody) } },
        (res) => {
          let text = '';
          res.on('data', (c: Buffer) => (text += c.toString()));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, text }));
        },
      );
      req.on('error', reject);
      req.write(flowBody.slice(0, half));
      // The request is now in flight: headers and half the body are on the wire.
      setTimeout(() => {
        server.child.kill('SIGTERM');
        setTimeout(() => req.end(flowBody.slice(half)), 300);
      }, 200);
    });

    const { status, text } = await response;
    expect(status).toBe(200);
    expect(JSON.parse(text).result.wallShearStress).toBe(1);
    expect(await server.exited).toBe(0);

    // New connections are refused once it has gone.
    await expect(new Promise((resolve, reject) => http.get({ host: '127.0.0.1', port, path: '/healthz' }, resolve).on('error', reject))).rejects.toThrow();
  });

  it('with idle keep-alive clients attached, exits 0 without waiting for their keep-alive timeout or the drain limit', async () => {
    // Keep-alive timeout and drain limit far longer than the test's own time limit: only closing
    // the idle connections at once lets the process exit in time.
    const server = await startServer({ OILSKIN_KEEP_ALIVE_TIMEOUT_MS: '600000', OILSKIN_DRAIN_TIMEOUT_MS: '600000', OILSKIN_REQUEST_TIMEOUT_MS: '600000' });
    const agents = Array.from({ length: 5 }, () => new http.Agent({ keepAlive: true, maxSockets: 1 }));
    const first = await Promise.all(agents.map((agent) => request(server.port, { path: '/v1/fluids', agent })));
    expect(first.map((r) => r.status)).toEqual([200, 200, 200, 200, 200]);
    expect(first.every((r) => r.headers.connection === 'keep-alive')).toBe(true);
    server.child.kill('SIGTERM');
    expect(await server.exited).toBe(0);
    await Promise.all(first.map((r) => r.socketClosed));
    expect(server.log()).not.toMatch(/drain limit reached/);
    for (const agent of agents) agent.destroy();
  }, 180_000);

  it('a keep-alive client with a request in flight gets its answer with Connection: close, then the process exits 0', async () => {
    const server = await startServer({ OILSKIN_WORKERS: '1', OILSKIN_KEEP_ALIVE_TIMEOUT_MS: '600000', OILSKIN_DRAIN_TIMEOUT_MS: '600000' });
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    // Warm the worker thread so the heavy request below computes at once.
    expect((await request(server.port, { method: 'POST', path: '/v1/heat', body: JSON.stringify(heatExample), agent })).status).toBe(200);
    // About a second of compute (field method without a sweep): SIGTERM arrives while it runs.
    const inFlight = request(server.port, { method: 'POST', path: '/v1/heat', body: JSON.stringify({ ...heatExample, options: { method: 'field' } }), agent });
    await new Promise((r) => setTimeout(r, 300));
    server.child.kill('SIGTERM');
    const answer = await inFlight;
    expect(answer.status).toBe(200);
    expect(answer.headers.connection).toBe('close');
    await answer.socketClosed;
    expect(await server.exited).toBe(0);
    expect(server.log()).not.toMatch(/drain limit reached/);
    agent.destroy();
  }, 180_000);

  it('heavy solves still running at the drain limit are cut off and the process exits 0', async () => {
    const server = await startServer({ OILSKIN_WORKERS: '2', OILSKIN_DRAIN_TIMEOUT_MS: '1000', OILSKIN_SOLVE_TIMEOUT_MS: '600000', OILSKIN_QUEUE_TIMEOUT_MS: '600000' });
    const outcomes = Array.from({ length: 6 }, () =>
      request(server.port, { method: 'POST', path: '/v1/heat', body: slowHeatBody }).then(
        (r) => r.status,
        () => 'reset',
      ),
    );
    // Let the requests reach the service before the signal.
    await new Promise((r) => setTimeout(r, 500));
    server.child.kill('SIGTERM');
    expect(await server.exited).toBe(0);
    expect(server.log()).toMatch(/drain limit reached/);
    // None of them got a result: each was cut off (or refused while the service closed).
    for (const outcome of await Promise.all(outcomes)) expect(outcome).not.toBe(200);
  }, 180_000);
});

describe('manifests leave room for the drain', () => {
  it('preStop pause plus the drain limit fit inside the Kubernetes grace period', async () => {
    const { parse } = await import('yaml');
    const deployment = parse(readFileSync(new URL('../../docker/k8s/deployment.yaml', import.meta.url), 'utf8'));
    const spec = deployment.spec.template.spec;
    const container = spec.containers[0];
    const drainEnv = container.env.find((e: { name: string }) => e.name === 'OILSKIN_DRAIN_TIMEOUT_MS');
    const { loadConfig } = await import('../../src/api/config.js');
    const drainMs = loadConfig(drainEnv ? { OILSKIN_DRAIN_TIMEOUT_MS: drainEnv.value } : {}).drainTimeoutMs;
    const preStopMs = Number(String(container.lifecycle.preStop.exec.command.join(' ')).match(/setTimeout\(\(\) *=> *\{\}, *(\d+)\)/)?.[1]);
    expect(Number.isFinite(preStopMs)).toBe(true);
    // Both, plus the 2 s the server allows itself after the drain limit, must end before the kill.
    expect(preStopMs + drainMs + 2000).toBeLessThan(spec.terminationGracePeriodSeconds * 1000);
  });
});
