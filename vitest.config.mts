import { defineConfig } from 'vitest/config';

// Three suites: pure unit tests, API tests against real PostgreSQL and the fakes, and the
// browser tests. The test command runs unit+api first, then e2e against the exported web build.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'api',
          // The reliability suite attacks the same real app and services, so it shares their setup.
          include: ['tests/api/**/*.test.ts', 'tests/reliability/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/api/globalSetup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/e2e/globalSetup.ts'],
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
