/**
 * Kills solver threads at random moments while they load the model code, the
 * way the pool does when a solve goes over budget or its client leaves, and
 * reports whether the process survived.
 *
 *   npm run build && npx tsx bench/thread-kill.ts [--entry compiled|esm] [--rounds 150] [--seed 1]
 *
 * --entry compiled (default) loads dist/src/api/worker-entry.cjs, the file the
 * pool hands to piscina; --entry esm loads dist/src/api/worker.js directly,
 * as the pool did before: piscina's require() then takes Node's synchronous
 * require(esm) path, and a termination during its instantiation aborts the
 * process (FATAL ERROR: v8::Module::IsGraphAsync ... must be used on an
 * instantiated module). Each thread is loaded exactly as piscina loads it:
 * require(), then await the export. Delays are uniform over 1.2 × the
 * measured load time, from a seeded generator; the round number is printed
 * as it goes, so a crash shows how far it got.
 */
import { Worker } from 'node:worker_threads';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { seededRandom } from './child-service.js';

function option(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}

const entryKind = option('entry', 'compiled');
const rounds = Number(option('rounds', '150'));
const random = seededRandom(Number(option('seed', '1')));

const target = fileURLToPath(new URL(entryKind === 'esm' ? '../dist/src/api/worker.js' : '../dist/src/api/worker-entry.cjs', import.meta.url));
if (!existsSync(target)) {
  console.error(`${target} is missing: run npm run build first`);
  process.exit(2);
}
const code = `Promise.resolve(require(${JSON.stringify(target)})).then(() => require('node:worker_threads').parentPort.postMessage('loaded'))`;

function loadOnce(): Promise<number> {
  const start = performance.now();
  return new Promise((resolve, reject) => {
    const worker = new Worker(code, { eval: true });
    worker.once('message', () => void worker.terminate().then(() => resolve(performance.now() - start)));
    worker.once('error', reject);
  });
}

const loadMs = await loadOnce();
console.log(`entry ${entryKind} (${target}), Node ${process.version}, load ${loadMs.toFixed(0)} ms, ${rounds} rounds, seed ${option('seed', '1')}`);
let loaded = 0;
for (let round = 1; round <= rounds; round++) {
  const worker = new Worker(code, { eval: true });
  worker.on('message', () => loaded++);
  worker.on('error', () => {});
  await new Promise((resolve) => setTimeout(resolve, random() * 1.2 * loadMs));
  await worker.terminate();
  if (round % 10 === 0) console.log(`round ${round}`);
}
console.log(`survived ${rounds} rounds (${loaded} threads had finished loading when killed, ${rounds - loaded} were killed while loading)`);
