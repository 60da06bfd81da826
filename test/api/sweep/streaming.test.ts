/**
 * NDJSON over a real socket: lines arrive while the sweep is still running
 * (counted in pool tasks started, not in wall-clock time), every line is
 * valid JSON, and a client that goes away stops the work.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { request } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { FastifyInstance } from 'fastify';
import { makeApp } from '../helpers.js';

let app: FastifyInstance;
let port: number;
beforeAll(async () => {
  app = await makeApp({ sweepMaxPoints: 1_000_000 });
  await app.listen({ port: 0, host: '127.0.0.1' });
  port = (app.server.address() as AddressInfo).port;
});
afterAll(async () => {
  await app.close();
});

const body = (points: number) =>
  JSON.stringify({
    calculation: 'flow',
    design: { workingFluid: { id: 'water', temperature: '20 degC' }, flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' } },
    axes: [{ path: 'flow.bulkVelocity', range: { from: '0.01 m/s', to: '5 m/s', points } }],
  });

/** POST the sweep; `onLine` sees each complete line as it arrives and may end the request. */
function stream(payload: string, onLine: (line: string, stop: () => void) => void): Promise<void> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port, method: 'POST', path: '/v1/sweep', headers: { 'content-type': 'application/json', accept: 'application/x-ndjson' } }, (res) => {
      let buffer = '';
      let stopped = false;
      const stop = () => {
        stopped = true;
        req.destroy();
        resolve();
      };
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => {
        buffer += chunk;
        let newline: number;
        while (!stopped && (newline = buffer.indexOf('\n')) >= 0) {
          onLine(buffer.slice(0, newline), stop);
          buffer = buffer.slice(newline + 1);
        }
      });
      res.on('end', () => resolve());
      res.on('error', () => resolve());
    });
    req.on('error', (error) => (req.destroyed ? resolve() : reject(error)));
    req.end(payload);
  });
}

describe('NDJSON streaming', () => {
  it('lines are valid JSON (sweep, points in order, progress, end) and the first points arrive before the last batch starts', async () => {
    const run = vi.spyOn(app.solverPool, 'run');
    const lines: { kind: string; index?: number; done?: number }[] = [];
    let tasksAtFirstPoint = -1;
    await stream(body(20_000), (line) => {
      const parsed = JSON.parse(line) as { kind: string; index?: number };
      if (parsed.kind === 'point' && tasksAtFirstPoint < 0) tasksAtFirstPoint = run.mock.calls.length;
      lines.push(parsed);
    });
    const tasks = run.mock.calls.length;
    run.mockRestore();
    expect(lines[0]!.kind).toBe('sweep');
    expect(lines.at(-1)).toEqual({ kind: 'end', points: 20_000, failed: 0 });
    const points = lines.filter((l) => l.kind === 'point');
    expect(points.map((p) => p.index)).toEqual(Array.from({ length: 20_000 }, (_, i) => i));
    expect(lines.filter((l) => l.kind === 'progress').at(-1)!.done).toBe(20_000);
    // Streamed, not buffered: when the first point reached the client, most batches had not been handed to the pool.
    expect(tasks).toBeGreaterThan(4);
    expect(tasksAtFirstPoint).toBeGreaterThan(0);
    expect(tasksAtFirstPoint).toBeLessThan(tasks);
  });

  it('a lost connection stops the work: no batch starts after the client is gone', async () => {
    const run = vi.spyOn(app.solverPool, 'run');
    await stream(body(400_000), (line, stop) => {
      if ((JSON.parse(line) as { kind: string }).kind === 'point') stop();
    });
    await new Promise((r) => setTimeout(r, 300));
    const afterClose = run.mock.calls.length;
    await new Promise((r) => setTimeout(r, 700));
    const later = run.mock.calls.length;
    run.mockRestore();
    expect(later).toBe(afterClose);
    // 400 000 points need at least 98 batches of the largest size; only a few ran.
    expect(later).toBeLessThan(98);
  });
});
