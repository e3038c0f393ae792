import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

const odexShim = fileURLToPath(new URL('./node_modules/odex/src/odex.js', import.meta.url));
const zodBrowser = fileURLToPath(new URL('./shared/zod-browser.ts', import.meta.url));

export default defineConfig(({ command, mode }) => ({
  plugins: [react(), tailwindcss()],
  // The browser build (and the dev server) gets zod with its compiler off (shared/zod-browser.ts);
  // tests in Node and the server keep the compiled parsers.
  resolve: { alias: [{ find: 'odex', replacement: odexShim }, ...(command === 'build' || mode !== 'test' ? [{ find: /^zod$/, replacement: zodBrowser }] : [])] },
  worker: { format: 'es' },
  // No data: URIs: the CSP allows fonts and images from 'self' only.
  // No source maps in the served build (they would publish the whole client source).
  build: { outDir: 'dist', sourcemap: false, chunkSizeWarningLimit: 1500, assetsInlineLimit: 0 },
  server: { proxy: { '/api': 'http://127.0.0.1:3000' } },
  test: {
    server: { deps: { inline: ['kysely'] } },
    // vitest's default is one worker fewer than the cores: a single worker on this 2-core machine.
    // Most test time is spent waiting on servers, child processes and databases, so two files
    // at a time halve the wall time without starving either.
    maxWorkers: 2,
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          // Pure functions and their fixtures: one module graph per worker instead of one per file
          // (importing the shared code again for each of 130 files was two thirds of this project's
          // time: 90 s → 30 s on this machine, the same 811 tests passing).
          isolate: false,
          include: ['tests/lint/**/*.test.ts', 'tests/reference/**/*.test.ts', 'shared/**/*.test.ts', 'server/**/*.test.ts', 'src/**/*.test.{ts,tsx}', 'cli/**/*.test.ts', 'workers/**/*.test.ts'],
          // A few unit tests run ESLint on probes or seed a whole demo database: seconds each on
          // a busy 2-core machine, beyond vitest's 5 s default.
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: { name: 'api', environment: 'node', include: ['tests/api/**/*.test.ts'], testTimeout: 30_000 },
      },
      {
        extends: true,
        // The same API tests on PostgreSQL: a throwaway cluster from Debian's package (README, "Running for a team").
        test: {
          name: 'api-pg',
          environment: 'node',
          include: ['tests/api/**/*.test.ts'],
          // the SQLite file backup drives its own SQLite server whatever the project; PostgreSQL's
          // backup and restore have their own test in tests/team/
          exclude: ['tests/api/backup-restore.test.ts'],
          env: { RIDEWRIGHT_TEST_DATABASE: 'postgres' },
          globalSetup: ['tests/api/helpers/postgres-global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        // Several server processes on one PostgreSQL database, copying SQLite into it, crashes on it.
        test: {
          name: 'team',
          environment: 'node',
          include: ['tests/team/**/*.test.ts'],
          globalSetup: ['tests/api/helpers/postgres-global-setup.ts'],
          testTimeout: 240_000,
          hookTimeout: 240_000,
        },
      },
      {
        extends: true,
        // The team's workers with real processes: redis-server on loopback, two worker processes, SIGKILL and restarts.
        test: { name: 'fleet', environment: 'node', include: ['tests/fleet/**/*.test.ts'], testTimeout: 240_000, hookTimeout: 120_000 },
      },
      {
        extends: true,
        // Fuzzed inputs and SIGKILL crash safety (server/THREAT-MODEL.md); bounded to a few minutes.
        test: { name: 'hardening', environment: 'node', include: ['tests/fuzz/**/*.test.ts', 'tests/crash/**/*.test.ts'], testTimeout: 240_000, hookTimeout: 60_000 },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          environment: 'node',
          include: ['tests/browser/**/*.test.ts'],
          globalSetup: ['tests/browser/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
}));
