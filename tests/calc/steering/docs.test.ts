/**
 * The house rules of calc/ for the new folders calc/numerics/ and calc/steering/ (the meta test
 * reads calc/'s top level only): every exported function and class has a doc comment, every one
 * that states a formula names an existing source key and says what it returns, and carries an
 * example; every source key the steering modules list exists.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { describe, expect, it } from "vitest";
import { SOURCES } from "../../../calc/sources/index.ts";
import { STEERING_SOURCE_KEYS } from "../../../calc/steering/index.ts";

const keys = Object.keys(SOURCES);
const folders = ["numerics", "steering"].map((f) => fileURLToPath(new URL(`../../../calc/${f}/`, import.meta.url)));

interface Exported {
  module: string;
  name: string;
  doc: string;
}

function exported(dir: string, file: string): Exported[] {
  const text = readFileSync(join(dir, file), "utf8");
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const docOf = (node: ts.Node) =>
    ts
      .getJSDocCommentsAndTags(node)
      .map((d) => d.getFullText())
      .join("\n");
  const found: Exported[] = [];
  for (const statement of source.statements) {
    const isExported = ts.canHaveModifiers(statement) && ts.getModifiers(statement)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword);
    if (!isExported) continue;
    if ((ts.isFunctionDeclaration(statement) || ts.isClassDeclaration(statement)) && statement.name) {
      found.push({ module: file, name: statement.name.text, doc: docOf(statement) });
    }
  }
  return found;
}

const all = folders.flatMap((dir) =>
  readdirSync(dir)
    .filter((f) => f.endsWith(".ts"))
    .flatMap((f) => exported(dir, f)),
);

describe("calc/numerics and calc/steering documentation", () => {
  it("finds the exported functions", () => {
    expect(all.length).toBeGreaterThan(25);
  });

  it.each(all.map((f) => [`${f.module} ${f.name}`, f] as const))("%s has a doc comment", (_, f) => {
    expect(f.doc.trim().length).toBeGreaterThan(10);
  });

  it.each(all.filter((f) => /Formula/.test(f.doc)).map((f) => [`${f.module} ${f.name}`, f] as const))(
    "%s (a formula) names an existing source key, says what it returns, and shows an example",
    (_, f) => {
      expect(
        keys.some((key) => f.doc.includes(key)),
        `${f.name} cites no key`,
      ).toBe(true);
      expect(/@returns|\breturns?\b/i.test(f.doc), `${f.name} has no @returns`).toBe(true);
      expect(/@example|Example/.test(f.doc) || f.name.endsWith("Into"), `${f.name} has no example`).toBe(true);
    },
  );

  it("lists only source keys that exist", () => {
    for (const key of STEERING_SOURCE_KEYS) expect(keys, key).toContain(key);
  });
});
