#!/usr/bin/env node
// whirlbook check design.json [--json] [--units metric|us]
// Runs every check of the handbook on a design file with the same calc/ code the site uses and
// prints the build sheet. Exit code: 0 when nothing fails, 1 when a check fails, 2 for bad usage
// or an unreadable design file.
import { readFileSync } from "node:fs";

const USAGE = `Usage: whirlbook check <design.json> [--json] [--units metric|us]

Runs every Whirlbook check on a design file (exported from the build sheet) and prints the
results. Exit code 0: nothing fails; 1: at least one check fails; 2: bad usage or unreadable file.`;

const [major, minor] = process.versions.node.split(".").map(Number);
if (major < 22 || (major === 22 && minor < 18)) {
  console.error(`whirlbook needs Node 22.18 or newer (this is ${process.versions.node}); run it through npx or npm run inside the project.`);
  process.exit(2);
}

// calc/ finds its calculators by file name (import.meta.glob); this hook does that under Node.
const { register } = await import("node:module");
register("../scripts/node-glob.mjs", import.meta.url);

// Every unit table: a design file may hold any quantity.
await import("../calc/core/all-units.ts");
const { readDesignText, describeProblems } = await import("../calc/design/design.ts");
const { buildSheetText, overallStatus, terminalSafe } = await import("../calc/design/checks.ts");
const { runChecks } = await import("../calc/design/run-checks.ts");

// Everything this command prints may carry text from a shared design file or from the command line
// (a name, an unknown key, a file name): each such piece is escaped by itself with `shown` (line
// breaks too, so it cannot forge a line), and every write escapes what is left but its own line breaks.
const shown = (text) => terminalSafe(String(text));
const printable = (text) => text.split("\n").map(terminalSafe).join("\n");
const print = (text) => process.stdout.write(printable(text));
const { STATUS_WORDS } = await import("../calc/core/check.ts");

function fail(message) {
  process.stderr.write(`${printable(message)}\n`);
  process.exit(2);
}

const args = process.argv.slice(2);
if (args.includes("--help") || args.includes("-h")) {
  console.log(USAGE);
  process.exit(0);
}
const [command, ...rest] = args;
if (command !== "check") fail(`${command ? `Unknown command "${shown(command)}".` : "No command given."}\n\n${USAGE}`);

let file = null;
let json = false;
let units = null;
for (let i = 0; i < rest.length; i += 1) {
  const arg = rest[i];
  if (arg === "--json") json = true;
  else if (arg === "--units") units = rest[++i] ?? "";
  else if (arg.startsWith("--units=")) units = arg.slice("--units=".length);
  else if (arg.startsWith("-")) fail(`Unknown option "${shown(arg)}".\n\n${USAGE}`);
  else if (file === null) file = arg;
  else fail(`Only one design file at a time (got "${shown(file)}" and "${shown(arg)}").`);
}
if (file === null) fail(`No design file given.\n\n${USAGE}`);
if (units !== null && units !== "metric" && units !== "us") fail(`--units must be "metric" or "us" (got "${shown(units)}").`);

let text;
try {
  text = readFileSync(file, "utf8");
} catch (error) {
  fail(`Cannot read ${shown(file)}: ${error.code === "ENOENT" ? "no such file" : shown(error.message)}`);
}
const reading = readDesignText(text);
if (!reading.ok) {
  fail(
    `${shown(file)} is not a design Whirlbook can read:\n${describeProblems(reading.problems)
      .map((l) => `  ${shown(l)}`)
      .join("\n")}`,
  );
}
const system = units ?? reading.design.units;
const results = runChecks(reading.design, system);
const overall = overallStatus(results);
if (json) {
  // JSON.stringify escapes C0 controls but leaves DEL, C1, the separators and the direction controls
  // raw; print writes them as \uXXXX escapes, which a JSON string may hold for any character (they
  // can only be inside strings), so the parsed text is unchanged. "status" is the key a program
  // tests; "verdict" is the word the build sheet shows ("For information").
  const verdict = (status) => (status === "empty" ? "Nothing to check" : STATUS_WORDS[status]);
  const report = {
    design: reading.design.name,
    units: system,
    overall,
    overallVerdict: verdict(overall),
    problems: reading.problems,
    migratedFrom: reading.migratedFrom,
    checks: results.map((r) => ({ ...r, verdict: verdict(r.status) })),
  };
  print(`${JSON.stringify(report, null, 2)}\n`);
} else {
  if (reading.problems.length) {
    print(`Read ${shown(file)} with ${reading.problems.length} problem(s); valid values were kept:\n`);
    for (const line of describeProblems(reading.problems)) print(`  ${shown(line)}\n`);
    print("\n");
  }
  print(buildSheetText(reading.design, results));
}
process.exit(overall === "fails" ? 1 : 0);
