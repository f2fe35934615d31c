import { defineConfig } from 'vitest/config';

// Three projects: `unit` is pure and fast (no threads, no SQLite files, no child processes), `math` holds
// the exhaustive cross-checks against independent references, `integration` uses real workers, SQLite
// files, the built CLI, Chromium and Slurm, so it gets a longer timeout.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['test/unit/**/*.test.ts'],
          // Refuses child processes, worker threads and SQLite files: those tests belong in integration.
          setupFiles: ['test/setup/unit-is-pure.ts'],
          // Pure tests can share module instances: one import of src per worker instead of one per file
          // (measured: 9.7 s instead of 29 s of CPU for the whole project). Do not leave global state behind.
          isolate: false,
          testTimeout: 120_000,
        },
      },
      {
        test: {
          name: 'math',
          include: ['test/math/**/*.test.ts'],
          // Exhaustive but in-process: no workers (they would run dist/), processes or SQLite files either.
          setupFiles: ['test/setup/unit-is-pure.ts'],
          testTimeout: 600_000,
        },
      },
      {
        test: {
          name: 'integration',
          include: ['test/integration/**/*.test.ts', 'test/e2e/**/*.test.ts'],
          // Workers and the spawned CLI run dist/: refuse to start when it is older than src/.
          globalSetup: ['test/setup/dist-is-fresh.ts'],
          testTimeout: 300_000,
          hookTimeout: 300_000,
        },
      },
    ],
  },
});
