import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Four projects share one run: pure modules (the client's too), the HTTP API through supertest,
// client components rendered in jsdom with Testing Library, and end-to-end journeys in Debian's Chromium.

// A test process that dies of a fatal error (out of memory, a V8 check) leaves a Node report here, which
// .ci/run prints with the files that never finished.
const diagnostics = {
  execArgv: ['--report-on-fatalerror', '--report-compact', `--report-directory=${fileURLToPath(new URL('./.tmp/node-reports', import.meta.url))}`],
};

export default defineConfig({
  test: {
    onConsoleLog: undefined,
    projects: [
      {
        // The client's pure modules (tests/unit/client) import '@/…' as the app does.
        resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
        test: {
          ...diagnostics,
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          ...diagnostics,
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
          testTimeout: 20_000,
        },
      },
      {
        // The client's '@/…' imports, as in vite.config.ts, so component tests load src/ as the app does.
        resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
        test: {
          ...diagnostics,
          name: 'component',
          include: ['tests/component/**/*.test.tsx'],
          environment: 'jsdom',
          setupFiles: ['tests/setup/fail-on-console-error.ts', 'tests/setup/testing-library.ts'],
        },
      },
      {
        test: {
          ...diagnostics,
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/e2e/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          // A page on a busy two-core machine can take seconds to settle: polls wait up to 15 s, not vitest's 1 s.
          expect: { poll: { timeout: 15_000 } },
          fileParallelism: false,
        },
      },
    ],
  },
});
