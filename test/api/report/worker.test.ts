/**
 * The renderer needs no DOM or canvas, so it runs in a worker thread of the
 * same kind of pool the service sends heavy work to, and gives the same SVG
 * there as on the main thread.
 */
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { describe, expect, it } from 'vitest';
import { plotSurfactant } from '../../../src/api/report/index.js';

describe('rendering in a worker thread', () => {
  it('renders the same SVG in a worker as on the main thread', async () => {
    const input = { bulkConcentration: [1e-6, 1e-4, 1e-2], slipRetained: [1, 0.6, 0.2], statedConcentration: 1e-3 };
    const pool = new Piscina({ filename: fileURLToPath(new URL('./render-in-worker.ts', import.meta.url)), maxThreads: 1, execArgv: ['--import', 'tsx'] });
    try {
      const fromWorker = (await pool.run(input)) as string;
      expect(fromWorker.startsWith('<svg')).toBe(true);
      expect(fromWorker).toBe(await plotSurfactant(input));
    } finally {
      await pool.destroy();
    }
  });
});
