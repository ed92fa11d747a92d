import { defineConfig } from "vitest/config";

/**
 * The unit tests of calc/ alone, for mutation testing (`npm run mutate`): no build, no browser, no
 * components, and no command-line tests (they start a separate Node process, where a planted
 * mistake is never switched on). A generous timeout: a mutant that makes a test slow on a busy
 * machine is not a failure, and the mutation tool sets its own timeouts for endless loops.
 */
export default defineConfig({
  oxc: { jsx: { runtime: "automatic", importSource: "preact" } },
  test: {
    root: new URL("../..", import.meta.url).pathname,
    include: ["tests/calc/**/*.test.ts"],
    testTimeout: 120_000,
  },
});
