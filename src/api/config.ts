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
  /** Per-request time budget of a heavy solve, ms. */
  solveTimeoutMs: number;
}

function intFrom(env: NodeJS.ProcessEnv, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 0) throw new Error(`${name} must be a non-negative integer, got "${raw}"`);
  return n;
}

function listFrom(env: NodeJS.ProcessEnv, name: string): string[] {
  return (env[name] ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): ServiceConfig {
  return {
    port: intFrom(env, 'OILSKIN_PORT', 8080),
    host: env.OILSKIN_HOST ?? '0.0.0.0',
    logLevel: env.OILSKIN_LOG_LEVEL ?? 'info',
    bodyLimit: intFrom(env, 'OILSKIN_BODY_LIMIT', 262_144),
    apiKeys: listFrom(env, 'OILSKIN_API_KEYS'),
    rateLimitPerMinute: intFrom(env, 'OILSKIN_RATE_LIMIT', 600),
    corsOrigins: listFrom(env, 'OILSKIN_CORS_ORIGINS'),
    workerThreads: intFrom(env, 'OILSKIN_WORKERS', 2),
    maxQueuedSolves: intFrom(env, 'OILSKIN_MAX_QUEUE', 64),
    solveTimeoutMs: intFrom(env, 'OILSKIN_SOLVE_TIMEOUT_MS', 20_000),
  };
}

/** Configuration for tests and the CLI: quiet, no limits that get in the way. */
export function testConfig(overrides: Partial<ServiceConfig> = {}): ServiceConfig {
  return { ...loadConfig({}), logLevel: 'silent', rateLimitPerMinute: 0, workerThreads: 0, ...overrides };
}
