// Mutation testing (StrykerJS with its vitest runner): `npm run mutate` mutates the physics,
// `npm run mutate:solver` the solver. Slow by design, so it is in neither `npm test` nor CI.
// One test process at a time (the machine is shared); results are kept in
// reports/mutation/ and reused by the next run (incremental mode).
const scope = process.env.MUTATE_SCOPE === 'solver' ? 'solver' : 'physics';

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'vitest.mutate.config.ts', related: false },
  mutate: [`src/lib/${scope}/**/*.ts`, '!src/lib/**/*.d.ts', '!src/lib/solver/worker.ts'],
  coverageAnalysis: 'perTest',
  concurrency: 1,
  timeoutMS: 20000,
  timeoutFactor: 3,
  incremental: true,
  incrementalFile: `reports/mutation/${scope}-incremental.json`,
  reporters: ['clear-text', 'progress-append-only', 'json'],
  jsonReporter: { fileName: `reports/mutation/${scope}.json` },
  clearTextReporter: { allowColor: false, logTests: false, maxTestsToLog: 0 },
  ignorePatterns: ['e2e', 'bench', 'build', 'reports', 'test-results', 'playwright-report'],
  tempDirName: '.stryker-tmp',
  cleanTempDir: true,
};
