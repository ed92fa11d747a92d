import { defineConfig } from "vitest/config";

/**
 * The unit tests of calc/ alone, for mutation testing (`npm run mutate`): no build, no browser, no
 * components, no command-line tests (they start a separate Node process, where a planted mistake
 * is never switched on), and not the structure and documentation tests (they read the files' text,
 * which the tool rewrites). A generous timeout: a mutant that makes a test slow on a busy
 * machine is not a failure, and the mutation tool sets its own timeouts for endless loops.
 *
 * WHIRLBOOK_MUTATION_SKIP (a pattern, set by `npm run mutate -- --skip …`) leaves out the tests whose
 * full names match it, e.g. a property test that simulates dozens of drives for every mutant it covers
 * (the score is then a lower bound).
 *
 * WHIRLBOOK_MUTATION_TESTS (a JSON list of globs, set by `npm run mutate -- --tests …`) narrows the
 * test files. It narrows them here rather than through Stryker's own `testFiles` option, which runs
 * the mutants of module-level tables (STATUS_WORDS, UNITS) with the mutant switched on only after the
 * module has loaded, so that those mutants survive whatever the tests check.
 */
export default defineConfig({
  oxc: { jsx: { runtime: "automatic", importSource: "preact" } },
  test: {
    setupFiles: ["tests/support/all-units.ts"],
    root: new URL("../..", import.meta.url).pathname,
    include: process.env.WHIRLBOOK_MUTATION_TESTS ? JSON.parse(process.env.WHIRLBOOK_MUTATION_TESTS) : ["tests/calc/**/*.test.ts"],
    // These read the files' text (lines, imports, doc comments), which the mutation tool rewrites.
    exclude: ["tests/calc/structure.test.ts", "tests/calc/meta.test.ts"],
    testTimeout: 120_000,
    ...(process.env.WHIRLBOOK_MUTATION_SKIP ? { testNamePattern: new RegExp(`^(?!.*(?:${process.env.WHIRLBOOK_MUTATION_SKIP}))`) } : {}),
    // The contract fuzz test (tests/calc/contract.test.ts) at a tenth of its runs: under the tool's
    // instrumentation a full run outlasts its timeout, and it runs again for every mutant it covers.
    env: { CONTRACT_RUNS: process.env.CONTRACT_RUNS ?? "0.1" },
  },
});
