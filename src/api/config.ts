/** Service configuration from environment variables (documented in README.md). */
export interface ServiceConfig {
  port: number;
  host: string;
  logLevel: string;
  /** Largest request body accepted, bytes. */
  bodyLimit: number;
  /** API keys accepted in the `x-api-key` header; empty = no authentication. */
  apiKeys: string[];
  /** Requests per minute per client address; 0 disables rate limiting. */
  rateLimitPerMinute: number;
  /** Allowed CORS origins; empty = CORS disabled; "*" = any. */
  corsOrigins: string[];
  /** Worker threads for heavy solves (0 = run inline). */
  workerThreads: number;
  /** Queued heavy solves beyond which requests get 503. */
  maxQueuedSolves: number;
  /** Longest wait of a heavy solve for a worker thread, ms (503 + Retry-After beyond). */
  queueTimeoutMs: number;
  /** Compute budget of one heavy solve once a thread runs it, ms (422 beyond). */
  solveTimeoutMs: number;
  /** Heap limit of one worker thread, MB (the thread dies alone beyond it; its request gets 422). */
  workerMemoryMb: number;
  /** After SIGTERM: longest wait for in-flight requests before the process exits anyway, ms. */
  drainTimeoutMs: number;
  /** Longest time a client may take to send the request headers, ms. */
  headersTimeoutMs: number;
  /** Longest time a client may take to send the whole request (headers and body), ms. */
  requestTimeoutMs: number;
  /** Idle keep-alive connections are closed after this long, ms. */
  keepAliveTimeoutMs: number;
  /** Bound of the in-memory result cache (ETags of recent results, bodies of heavy ones), MB; 0 turns it off. */
  resultCacheMb: number;
  /** A lab's own fluids and surfactants (JSON or YAML), added to the built-in catalogue at start-up. */
  catalogueFile?: string;
  /** Most points one sweep request (one shard) may compute (413 beyond). */
  sweepMaxPoints: number;
  /** Compute budget of one sweep point, ms (the point fails with 'over its time budget' beyond). */
  sweepPointTimeoutMs: number;
}

/** The value of `--catalogue file` (or `--catalogue=file`) in command-line arguments, if given. */
export function catalogueFlag(argv: readonly string[]): string | undefined {
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (arg === '--catalogue') return argv[i + 1];
    if (arg.startsWith('--catalogue=')) return arg.slice('--catalogue='.length);
  }
  return undefined;
}

function intFrom(env: NodeJS.ProcessEnv, name: string, fallback: number, min = 0): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min) throw new Error(`${name} must be an integer ≥ ${min}, got "${raw}"`);
  return n;
}

function nonEmpty(value: string | undefined): string | undefined {
  return value === undefined || value.trim() === '' ? undefined : value.trim();
}

function listFrom(env: NodeJS.ProcessEnv, name: string): string[] {
  return (env[name] ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env, argv: readonly string[] = []): ServiceConfig {
  // The command-line flag wins over the environment.
  const catalogueFile = catalogueFlag(argv) ?? (env.OILSKIN_CATALOGUE_FILE || undefined);
  const config: ServiceConfig = {
    // Container platforms (Cloud Run, Heroku-style hosts, many PaaS) set PORT and sometimes HOST: ours win when set.
    port: intFrom(env, env.OILSKIN_PORT ? 'OILSKIN_PORT' : 'PORT', 8080),
    host: nonEmpty(env.OILSKIN_HOST) ?? nonEmpty(env.HOST) ?? '0.0.0.0',
    logLevel: env.OILSKIN_LOG_LEVEL ?? 'info',
    bodyLimit: intFrom(env, 'OILSKIN_BODY_LIMIT', 262_144),
    apiKeys: listFrom(env, 'OILSKIN_API_KEYS'),
    rateLimitPerMinute: intFrom(env, 'OILSKIN_RATE_LIMIT', 600),
    corsOrigins: listFrom(env, 'OILSKIN_CORS_ORIGINS'),
    workerThreads: intFrom(env, 'OILSKIN_WORKERS', 2),
    maxQueuedSolves: intFrom(env, 'OILSKIN_MAX_QUEUE', 64),
    queueTimeoutMs: intFrom(env, 'OILSKIN_QUEUE_TIMEOUT_MS', 10_000, 1),
    solveTimeoutMs: intFrom(env, 'OILSKIN_SOLVE_TIMEOUT_MS', 20_000, 1),
    // Below ~64 MB a thread cannot even load the model code (and piscina stops replacing threads that fail to start).
    workerMemoryMb: intFrom(env, 'OILSKIN_WORKER_MEMORY_MB', 512, 64),
    drainTimeoutMs: intFrom(env, 'OILSKIN_DRAIN_TIMEOUT_MS', 10_000, 1),
    headersTimeoutMs: intFrom(env, 'OILSKIN_HEADERS_TIMEOUT_MS', 10_000, 1),
    requestTimeoutMs: intFrom(env, 'OILSKIN_REQUEST_TIMEOUT_MS', 30_000, 1),
    keepAliveTimeoutMs: intFrom(env, 'OILSKIN_KEEP_ALIVE_TIMEOUT_MS', 5_000, 1),
    resultCacheMb: intFrom(env, 'OILSKIN_RESULT_CACHE_MB', 32),
    ...(catalogueFile === undefined ? {} : { catalogueFile }),
    sweepMaxPoints: intFrom(env, 'OILSKIN_SWEEP_MAX_POINTS', 100_000, 1),
    sweepPointTimeoutMs: intFrom(env, 'OILSKIN_SWEEP_POINT_TIMEOUT_MS', 20_000, 1),
  };
  // Node refuses a header limit longer than the whole-request limit.
  if (config.headersTimeoutMs > config.requestTimeoutMs) {
    throw new Error(`OILSKIN_HEADERS_TIMEOUT_MS (${config.headersTimeoutMs}) must not exceed OILSKIN_REQUEST_TIMEOUT_MS (${config.requestTimeoutMs})`);
  }
  return config;
}

/** Configuration for tests and the CLI: quiet, no limits that get in the way. */
export function testConfig(overrides: Partial<ServiceConfig> = {}): ServiceConfig {
  return { ...loadConfig({}), logLevel: 'silent', rateLimitPerMinute: 0, workerThreads: 0, ...overrides };
}
