/**
 * Prints one closing line that CI reads: "N passed, N failed, N skipped", alone on the last line.
 */
import type { Reporter, TestModule } from "vitest/node";

export default class SummaryReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>, unhandledErrors: ReadonlyArray<unknown>): void {
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    for (const module of testModules) {
      if (module.state() === "failed" && [...module.children.allTests()].length === 0) failed += 1;
      for (const test of module.children.allTests()) {
        const state = test.result().state;
        if (state === "passed") passed += 1;
        else if (state === "failed") failed += 1;
        else skipped += 1;
      }
    }
    failed += unhandledErrors.length;
    process.stdout.write(`\n${passed} passed, ${failed} failed, ${skipped} skipped\n`);
  }
}
