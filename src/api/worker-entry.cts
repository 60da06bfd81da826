/**
 * CommonJS entry of the solver threads: the file the pool hands to piscina.
 *
 * Why a CommonJS file: piscina loads a task file with require() first. On
 * Node 20.19+ a require() of an ES module takes the synchronous require(esm)
 * path, and a worker terminated (a solve over its budget, a client gone) while
 * that path instantiates the module graph aborts the whole process: V8 checks
 * in ModuleWrap::InstantiateSync that the graph is instantiated before asking
 * whether it is asynchronous (FATAL ERROR: v8::Module::IsGraphAsync ... must
 * be used on an instantiated module). This file is plain CommonJS, so require()
 * takes the old path, and it loads the ES module graph with import(), whose
 * asynchronous path turns a termination into an ordinary worker exit.
 * Reproduction: bench/thread-kill.ts; regression test: test/api/worker-pool.test.ts.
 *
 * piscina awaits the exported promise and uses the function it resolves to,
 * so the thread reports ready only once the graph is loaded. The file is
 * plain JavaScript (no TypeScript syntax): run from the sources it is loaded
 * as it is, and tsx, which compiles required TypeScript to CommonJS in worker
 * threads, loads worker.ts the CommonJS way (no require(esm) there either).
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- CommonJS on purpose, see above
module.exports = __filename.endsWith('.cts') ? require('./worker.ts').default : import('./worker.js').then((loaded) => loaded.default);
