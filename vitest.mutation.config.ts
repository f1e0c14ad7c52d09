import { defineConfig } from 'vitest/config';

/** The tests that guard the rules `npm run mutation` mutates (stryker.config.mjs), by the file they guard. */
export const MUTATION_TESTS = {
  // The route-by-route role matrix (tests/api/roles.test.ts) also guards access.ts, but it starts the whole app per
  // run: about 25 min for access.ts's mutants on the shared machine, against seconds for the unit test of the check.
  access: ['tests/unit/access-rules.test.ts'],
  cancel: ['tests/api/run-cancel.test.ts', 'tests/api/runs.test.ts', 'tests/api/sweep-cancel.test.ts'],
  classify: ['tests/unit/scenario/classify.test.ts', 'tests/unit/scenario/classify-edges.test.ts'],
};

// Not part of `npm test`; vitest.config.ts stays the one suite. MUTATION_TESTS=access,cancel narrows a run to those sets.
const sets = (process.env.MUTATION_TESTS ?? 'access,cancel,classify').split(',') as Array<keyof typeof MUTATION_TESTS>;

export default defineConfig({
  test: {
    include: sets.flatMap((set) => MUTATION_TESTS[set]),
    environment: 'node',
    setupFiles: ['tests/setup/fail-on-console-error.ts'],
    testTimeout: 20_000,
  },
});
