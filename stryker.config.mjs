// @ts-check
/**
 * Mutation testing of calc/ with StrykerJS and its Vitest runner: small, realistic mistakes are
 * planted in the code one at a time, and the unit tests of calc/ must notice each. Run it with
 * `npm run mutate` (see scripts/mutate.mjs for the arguments); it is slow and not part of `npm test`.
 *
 * @type {import('@stryker-mutator/api/core').PartialStrykerOptions}
 */
export default {
  testRunner: "vitest",
  vitest: { configFile: "tests/support/vitest.mutation.config.ts", related: true },
  coverageAnalysis: "perTest",
  // calc/ holds the numbers; the bibliography (calc/sources/) is text, and calc/index.ts only re-exports.
  mutate: ["calc/**/*.ts", "!calc/index.ts", "!calc/sources/**"],
  // The machine is shared: one test runner at a time unless told otherwise.
  concurrency: 1,
  // A busy machine runs a test several times slower than an idle one.
  timeoutMS: 20_000,
  timeoutFactor: 3,
  dryRunTimeoutMinutes: 30,
  reporters: ["clear-text", "progress-append-only", "json"],
  jsonReporter: { fileName: "reports/mutation/mutation.json" },
  clearTextReporter: { allowColor: false, logTests: false, reportScoreTable: true, reportMutants: true },
  incrementalFile: "reports/mutation/stryker-incremental.json",
  ignorePatterns: ["dist", ".astro", "reports", "test-results"],
  tempDirName: ".stryker-tmp",
  cleanTempDir: "always",
  thresholds: { high: 90, low: 75, break: null },
};
