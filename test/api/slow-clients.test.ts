/**
 * Slow clients are cut off: headers trickled at a byte at a time, a body
 * trickled after complete headers, an idle keep-alive connection. Each test
 * sends until the server closes the socket and fails if it never does (a
 * bounded number of bytes), so nothing here asserts a time.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import net from 'node:net';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { FastifyInstance } from 'fastify';
import { buildApp } from '../../src/api/app.js';
import { testConfig } from '../../src/api/config.js';

let app: FastifyInstance;
let port: number;
beforeAll(async () => {
  app = await buildApp(testConfig({ headersTimeoutMs: 1000, requestTimeoutMs: 2000, keepAliveTimeoutMs: 500 }));
  await app.listen({ port: 0, host: '127.0.0.1' });
  port = (app.server.address() as AddressInfo).port;
});
afterAll(async () => {
  await app.close();
});

/**
 * Write `head` at once, then `trickle` one byte every 200 ms until the server
 * closes the connection; resolves with what the server sent, or with
 * `cutOff: false` once every byte was sent without the server closing.
 */
function trickle(head: string, trickleText: string): Promise<{ cutOff: boolean; received: string }> {
  return new Promise((resolve, reject) => {
    const socket = net.connect(port, '127.0.0.1');
    let received = '';
    let closed = false;
    socket.on('data', (c: Buffer) => (received += c.toString()));
    socket.on('error', () => {});
    socket.on('close', () => {
      closed = true;
      resolve({ cutOff: true, received });
    });
    socket.on('connect', async () => {
      socket.write(head);
      for (const ch of trickleText) {
        await new Promise((r) => setTimeout(r, 200));
        if (closed) return;
        socket.write(ch);
      }
      socket.end();
      resolve({ cutOff: false, received });
    });
    socket.on('timeout', () => reject(new Error('socket timeout')));
  });
}

describe('slow clients', () => {
  it('headers sent a byte at a time are cut off with 408 (OILSKIN_HEADERS_TIMEOUT_MS)', async () => {
    // 60 header bytes at 5 per second would take 12 s; the limit is 1 s.
    const result = await trickle('POST /v1/flow HTTP/1.1\r\n', 'Host: 127.0.0.1\r\nX-Padding: aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa\r\n');
    expect(result.cutOff).toBe(true);
    expect(result.received).toMatch(/^HTTP\/1\.1 408/);
  });

  it('a body sent a byte at a time after complete headers is cut off (OILSKIN_REQUEST_TIMEOUT_MS)', async () => {
    const body = JSON.stringify({ workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } });
    const head = `POST /v1/flow HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\nContent-Length: ${body.length}\r\n\r\n`;
    const result = await trickle(head, body);
    expect(result.cutOff).toBe(true);
    expect(result.received).not.toMatch(/^HTTP\/1\.1 200/);
  });

  it('the same request sent at full speed succeeds (the limits do not hurt normal clients)', async () => {
    const res = await app.inject({ method: 'POST', url: '/v1/flow', payload: { workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } } });
    expect(res.statusCode).toBe(200);
  });

  it('an idle keep-alive connection is closed by the server (OILSKIN_KEEP_ALIVE_TIMEOUT_MS)', async () => {
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    const socketClosed = await new Promise<boolean>((resolve, reject) => {
      const req = http.get({ host: '127.0.0.1', port, path: '/healthz', agent }, (res) => {
        res.resume();
        res.on('end', () => {
          // The response is complete; the socket now idles in the agent until the server closes it.
          req.socket?.once('close', () => resolve(true));
        });
      });
      req.on('error', reject);
    });
    agent.destroy();
    expect(socketClosed).toBe(true);
  });
});
