// Mutation check of the riskiest rules: who may call a route, cancelling a run, and the hour classifier's branches.
// `npm run mutation` (CPU-heavy; not part of `npm test` or CI). Scores are kept in docs/benchmarks.md.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'vitest.mutation.config.ts', related: false },
  mutate: [
    'server/auth/access.ts',
    // The run queue's cancel path only (its `cancel` method and the catch that tells a cancel from a failure).
    'server/runs/queue.ts:150-165',
    'server/runs/queue.ts:177-190',
    'shared/scenario/classify.ts',
  ],
  coverageAnalysis: 'perTest',
  concurrency: 1,
  timeoutMS: 30_000,
  reporters: ['clear-text', 'progress-append-only', 'json'],
  jsonReporter: { fileName: 'reports/mutation/mutation.json' },
  // Root-anchored: a bare 'reports' would also drop server/reports/, and a test file that then fails to import is
  // skipped without a word (its suite fails, no test fails), leaving every mutant it covers 'survived' or 'no coverage'.
  ignorePatterns: ['/dist', '/data', '/reports', '/test-results', '/.tmp'],
  tempDirName: '.stryker-tmp',
};
