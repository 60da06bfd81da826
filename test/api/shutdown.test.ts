/** Graceful shutdown with a real child process: SIGTERM stops accepting, finishes in-flight requests, exits 0. */
import { describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import http from 'node:http';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

function waitForListening(child: ReturnType<typeof spawn>): Promise<number> {
  return new Promise((resolve, reject) => {
    let buffer = '';
    const timer = setTimeout(() => reject(new Error(`server did not start: ${buffer}`)), 30_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      buffer += chunk.toString();
      const m = buffer.match(/Server listening at http:\/\/127\.0\.0\.1:(\d+)/);
      if (m) {
        clearTimeout(timer);
        resolve(Number(m[1]));
      }
    });
    child.on('exit', (code) => reject(new Error(`server exited early with ${code}: ${buffer}`)));
  });
}

describe('graceful shutdown', () => {
  it('finishes a request that is in flight when SIGTERM arrives, then exits 0', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'src/api/server.ts'], {
      cwd: root,
      env: { ...process.env, OILSKIN_PORT: '0', OILSKIN_HOST: '127.0.0.1', OILSKIN_WORKERS: '0', OILSKIN_LOG_LEVEL: 'info' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    const port = await waitForListening(child);

    const body = JSON.stringify({ workingFluid: { id: 'water' }, flow: { kind: 'wall-shear', wallShearStress: 1 } });
    const half = Math.floor(body.length / 2);
    const response = new Promise<{ status: number; text: string }>((resolve, reject) => {
      const req = http.request(
        { host: '127.0.0.1', port, path: '/v1/flow', method: 'POST', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) } },
        (res) => {
          let text = '';
          res.on('data', (c: Buffer) => (text += c.toString()));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, text }));
        },
      );
      req.on('error', reject);
      req.write(body.slice(0, half));
      // The request is now in flight: headers and half the body are on the wire.
      setTimeout(() => {
        child.kill('SIGTERM');
        setTimeout(() => req.end(body.slice(half)), 300);
      }, 200);
    });

    const { status, text } = await response;
    expect(status).toBe(200);
    expect(JSON.parse(text).result.wallShearStress).toBe(1);
    expect(await exited).toBe(0);

    // New connections are refused once it has gone.
    await expect(
      new Promise((resolve, reject) => http.get({ host: '127.0.0.1', port, path: '/healthz' }, resolve).on('error', reject)),
    ).rejects.toThrow();
  });
});
