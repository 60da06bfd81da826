import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: 'forks',
    // Fixed fast-check seed for every property test (printed with any counterexample).
    setupFiles: ['test/setup-fast-check.ts'],
  },
});
