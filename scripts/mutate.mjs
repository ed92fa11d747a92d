/**
 * `npm run mutate [path…] [-- --tests glob… --incremental --ignore-static]`: mutation testing of
 * calc/ (StrykerJS, configured in stryker.config.mjs) and its score.
 *
 *   npm run mutate                          every file of calc/ (long: hours on two cores)
 *   npm run mutate calc/core                the files of a folder
 *   npm run mutate calc/core/check.ts calc/design/checks.ts
 *   npm run mutate calc/core/check.ts:13-16  the lines 13 to 16 of a file
 *   npm run mutate calc/core/units.ts -- --tests "tests/calc/units*.test.ts"
 *                                           only those test files run (faster; the score is a lower bound)
 *   npm run mutate calc/drivetrain -- --skip "properties \\(fast-check\\)"
 *                                           leaves out the tests whose full names match (a pattern; the score is a lower bound)
 *   npm run mutate calc/core -- --incremental
 *                                           reuses the last run's results for unchanged code and tests
 *   npm run mutate calc/core -- --ignore-static
 *                                           skips mutants of module-level tables and constants, each of
 *                                           which reloads and reruns every test that imports the file
 *   npm run mutate calc -- --concurrency 2  test runners at once (default 1: the machine may be shared)
 *
 * The options after `--` go to this script, not to npm.
 *
 * Prints Stryker's table and surviving mutants, then one line: the score, the counts and the time.
 * The full report is written to reports/mutation/mutation.json. Exit 0 whatever the score.
 */
import { existsSync, statSync } from "node:fs";
import { Stryker } from "@stryker-mutator/core";

const args = process.argv.slice(2);
const paths = [];
const tests = [];
const skip = [];
let incremental = false;
let ignoreStatic = false;
let concurrency;
for (let i = 0; i < args.length; i++) {
  const arg = args[i];
  if (arg === "--incremental") incremental = true;
  else if (arg === "--ignore-static") ignoreStatic = true;
  else if (arg === "--tests") tests.push(args[++i] ?? "");
  else if (arg === "--skip") skip.push(args[++i] ?? "");
  else if (arg === "--concurrency") {
    concurrency = Number(args[++i]);
    if (!Number.isInteger(concurrency) || concurrency < 1) {
      console.error(`--concurrency takes a whole number of test runners, 1 or more (got ${JSON.stringify(args[i])}).`);
      process.exit(2);
    }
  } else if (arg.startsWith("--")) {
    console.error(`Unknown option ${JSON.stringify(arg)}: use paths, --tests <glob>, --skip <pattern>, --incremental, --ignore-static and --concurrency <n>.`);
    process.exit(2);
  } else paths.push(arg);
}

/** A folder becomes its TypeScript files; a file (or "file:from-to", a range of its lines) stays itself. */
function toPattern(path) {
  const clean = path.replace(/\/+$/, "");
  const lines = /:\d+(?:-\d+)?$/.exec(clean);
  if (lines && existsSync(clean.slice(0, lines.index))) return clean;
  if (!existsSync(clean)) {
    console.error(`No such file or folder: ${JSON.stringify(path)}.`);
    process.exit(2);
  }
  return statSync(clean).isDirectory() ? `${clean}/**/*.ts` : clean;
}

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
const options = { incremental, ignoreStatic, ...(concurrency ? { concurrency } : {}) };
if (paths.length > 0) options.mutate = [...paths.map(toPattern), "!calc/index.ts", "!calc/sources/**"];
// Narrowed in the Vitest config (see tests/support/vitest.mutation.config.ts), not with Stryker's testFiles.
if (tests.length > 0) process.env.WHIRLBOOK_MUTATION_TESTS = JSON.stringify(tests);
// Tests left out by name (a pattern each), in the Vitest config too.
if (skip.length > 0) process.env.WHIRLBOOK_MUTATION_SKIP = skip.join("|");

const started = Date.now();
const results = await new Stryker(options).runMutationTest();
const seconds = (Date.now() - started) / 1000;

const count = (status) => results.filter((r) => r.status === status).length;
const killed = count("Killed");
const timedOut = count("Timeout");
const survived = count("Survived");
const noCoverage = count("NoCoverage");
const detected = killed + timedOut;
const valid = detected + survived + noCoverage;
const score = valid === 0 ? 0 : (100 * detected) / valid;
const minutes = `${Math.floor(seconds / 60)} min ${Math.round(seconds % 60)} s`;
const scope = `scope: ${(options.mutate ?? ["calc/"]).filter((p) => !p.startsWith("!")).join(", ")}`;
if (results.length === 0) console.log(`\nNo mutants in ${scope} — ${minutes}`);
else
  console.log(
    `\nMutation score ${score.toFixed(2)} % (${detected} of ${valid} detected: ${killed} killed, ${timedOut} timed out; ${survived} survived, ${noCoverage} not covered; ${count("CompileError") + count("RuntimeError")} invalid, ${count("Ignored")} ignored) in ${minutes}` +
      ` — ${scope}${tests.length ? `; tests: ${tests.join(", ")}` : ""}${skip.length ? `; tests left out: ${skip.join(", ")}` : ""}${ignoreStatic ? "; static mutants ignored" : ""}`,
  );
