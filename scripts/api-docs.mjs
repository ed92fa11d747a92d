// Writes the README's calculation-module reference from calc/'s doc comments: for each module,
// every exported function with its one-line summary, its inputs and what it returns.
// Usage: npm run docs:api   (tests/calc/meta.test.ts checks that the README lists every function)
import { readFileSync, readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";

const root = fileURLToPath(new URL("../", import.meta.url));
const calcDir = join(root, "calc");
const START = "<!-- api:start -->";
const END = "<!-- api:end -->";

/** Module order and titles; anything else in calc/ follows alphabetically. */
const TITLES = {
  "units.ts": "Units",
  "unit-definitions.ts": "Unit provenance",
  "inputs.ts": "Input declarations",
  "errors.ts": "Errors",
  "rotation.ts": "Rotation and accelerometer placement",
  "heading.ts": "Heading drift, timing and smoothing",
  "calibration.ts": "Calibration fit",
  "csv.ts": "Calibration data (CSV)",
  "mass.ts": "Mass layout and balance",
  "materials.ts": "Materials",
  "fasteners.ts": "ISO metric fasteners",
  "loads.ts": "Centrifugal loads, bolts and rims",
  "motor.ts": "DC motor",
  "drivetrain.ts": "Spin-up simulation",
  "design.ts": "Design file",
  "checks.ts": "Build-sheet checks",
  "demo-design.ts": "Demo design",
};

function clean(text) {
  return text.replace(/\s+/g, " ").replace(/\|/g, "\\|").trim();
}

function describe(file) {
  const source = ts.createSourceFile(file, readFileSync(join(calcDir, file), "utf8"), ts.ScriptTarget.Latest, true);
  const rows = [];
  for (const statement of source.statements) {
    if (!ts.canHaveModifiers(statement) || !ts.getModifiers(statement)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword)) continue;
    let name = null;
    let params = "";
    if (ts.isFunctionDeclaration(statement) && statement.name) {
      name = statement.name.text;
      params = statement.parameters
        .map((p) => (ts.isObjectBindingPattern(p.name) ? `{ ${p.name.elements.map((e) => e.name.getText()).join(", ")} }` : p.name.getText()))
        .join(", ");
    } else continue;
    const docs = ts.getJSDocCommentsAndTags(statement);
    if (docs.some((d) => d.getFullText().includes("@internal"))) continue;
    const comment = docs.map((d) => (typeof d.comment === "string" ? d.comment : (ts.getTextOfJSDocComment(d.comment) ?? ""))).join(" ");
    const summary = clean(comment.split(/\n\s*\n|(?<=\.)\s/)[0] ?? "");
    const returns = docs.flatMap((d) =>
      (d.tags ?? [])
        .filter((t) => t.tagName.text === "returns")
        .map((t) =>
          clean((ts.getTextOfJSDocComment(t.comment) ?? "").split(/\n\s*\n|\s(?:Assumptions|Assumption|Examples?|Sources?|Formula|Notes?|Limits?):/)[0] ?? ""),
        ),
    );
    rows.push(`| \`${name}(${params})\` | ${summary} | ${returns[0] ?? ""} |`);
  }
  return rows;
}

const files = readdirSync(calcDir, { recursive: true }).filter(
  (f) => f.endsWith(".ts") && !["index.ts", "sources/index.ts", "sources/types.ts", "core/constants.ts"].includes(f),
);
files.sort((a, b) => (a in TITLES ? Object.keys(TITLES).indexOf(a) : 99) - (b in TITLES ? Object.keys(TITLES).indexOf(b) : 99) || a.localeCompare(b));
const parts = [
  START,
  "",
  "Generated from the doc comments by `npm run docs:api`; each function's doc comment in calc/ has the formula, units, assumptions, an example and its sources.",
  "",
];
for (const file of files) {
  const rows = describe(file);
  if (rows.length === 0) continue;
  parts.push(`#### ${TITLES[file] ?? file} (\`calc/${file}\`)`, "", "| Function | What it does | Returns |", "|---|---|---|", ...rows, "");
}
// Every calculator's declared inputs: name, label, kind, SI range and URL key.
const calc = await import("../calc/index.ts");
parts.push("#### Calculator inputs and their URL keys", "");
for (const [exportName, value] of Object.entries(calc)) {
  if (!/Inputs$/.test(exportName) || typeof value !== "object" || value === null) continue;
  const specs = Object.entries(value).filter(([, spec]) => spec && typeof spec === "object" && "urlKey" in spec);
  if (specs.length === 0) continue;
  parts.push(
    `\`${exportName}\`: ${specs.map(([name, spec]) => `\`${spec.urlKey}\` ${name} (${spec.kind}, ${spec.minOpen ? "(" : "["}${Number(spec.min.toPrecision(6))}, ${Number(spec.max.toPrecision(6))}] SI)`).join("; ")}.`,
    "",
  );
}
parts.push(END);
const readmePath = join(root, "README.md");
const readme = readFileSync(readmePath, "utf8");
const next = readme.includes(START)
  ? readme.replace(new RegExp(`${START}[\\s\\S]*?${END}`), parts.join("\n"))
  : readme.replace("### Sources (`calc/sources.ts`)", `### Reference of every function\n\n${parts.join("\n")}\n\n### Sources (\`calc/sources.ts\`)`);
writeFileSync(readmePath, next);
console.log(`README: ${files.length} modules documented`);
