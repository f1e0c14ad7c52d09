import { defineConfig } from 'vitest/config';

// Only the tests that guard the rules `npm run mutation` mutates (stryker.config.mjs): role checks, run cancel and the
// hour classifier. Not part of `npm test`; vitest.config.ts stays the one suite.
export default defineConfig({
  test: {
    include: [
      'tests/unit/scenario/classify.test.ts',
      'tests/unit/access-rules.test.ts',
      'tests/api/roles.test.ts',
      'tests/api/runs.test.ts',
      'tests/api/sweep-cancel.test.ts',
    ],
    environment: 'node',
    setupFiles: ['tests/setup/fail-on-console-error.ts'],
    testTimeout: 20_000,
  },
});
