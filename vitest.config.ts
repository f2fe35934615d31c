import { defineConfig } from 'vitest/config';

// Unit tests are fast and thread-free; integration and end-to-end tests use real workers, SQLite files
// and the built CLI, so they get a longer timeout.
export default defineConfig({
  test: {
    projects: [
      { test: { name: 'unit', include: ['test/unit/**/*.test.ts'], testTimeout: 120_000 } },
      {
        test: {
          name: 'integration',
          include: ['test/integration/**/*.test.ts', 'test/e2e/**/*.test.ts'],
          testTimeout: 300_000,
          hookTimeout: 300_000,
        },
      },
    ],
  },
});
