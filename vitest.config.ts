import { defineConfig } from "vitest/config";

/**
 * Three projects: `unit` (calc/ and component logic, no build needed), `build` (reads dist/),
 * `browser` (serves dist/ and drives Debian chromium). `npm test` builds first, then runs all.
 */
export default defineConfig({
  oxc: { jsx: { runtime: "automatic", importSource: "preact" } },
  test: {
    reporters: ["default", "./tests/support/summary-reporter.ts"],
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/calc/**/*.test.ts", "tests/components/**/*.test.{ts,tsx}", "tests/cli/**/*.test.ts"],
          setupFiles: ["tests/support/all-units.ts"],
        },
      },
      { extends: true, test: { name: "build", include: ["tests/build/**/*.test.ts"], setupFiles: ["tests/support/all-units.ts"] } },
      {
        extends: true,
        test: {
          name: "browser",
          include: ["tests/browser/**/*.test.ts"],
          // Node's side of the browser tests (expected values from calc/) reads every kind.
          setupFiles: ["tests/support/all-units.ts"],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
