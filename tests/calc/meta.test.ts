/**
 * Meta test: every exported function of calc/ carries its doc comment, and every physics function
 * names at least one bibliography key that exists; every bibliography entry is complete.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { SOURCES } from "#calc";

const calcDir = fileURLToPath(new URL("../../calc/", import.meta.url));
/** Modules of plumbing rather than physics: a doc comment is required, a formula and source key are not. */
const PLUMBING = new Set([
  "index.ts",
  "core/errors.ts",
  "core/inputs.ts",
  "core/units.ts",
  "sources/index.ts",
  "sources/types.ts",
  "core/constants.ts",
  "heading/csv.ts",
]);
const keys = Object.keys(SOURCES);

interface Exported {
  module: string;
  name: string;
  doc: string;
}

function exportedFunctions(file: string): Exported[] {
  const text = readFileSync(join(calcDir, file), "utf8");
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const found: Exported[] = [];
  const docOf = (node: ts.Node) =>
    ts
      .getJSDocCommentsAndTags(node)
      .map((d) => d.getFullText())
      .join("\n");
  for (const statement of source.statements) {
    const exported = ts.canHaveModifiers(statement) && ts.getModifiers(statement)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword);
    if (!exported) continue;
    if (ts.isFunctionDeclaration(statement) && statement.name) {
      found.push({ module: file, name: statement.name.text, doc: docOf(statement) });
    } else if (ts.isVariableStatement(statement)) {
      for (const declaration of statement.declarationList.declarations) {
        const init = declaration.initializer;
        if (init && (ts.isArrowFunction(init) || ts.isFunctionExpression(init)) && ts.isIdentifier(declaration.name)) {
          found.push({ module: file, name: declaration.name.text, doc: docOf(statement) });
        }
      }
    }
  }
  return found;
}

const modules = (readdirSync(calcDir, { recursive: true }) as string[]).filter((f) => f.endsWith(".ts")).sort();
/** Helpers shared between calc/ modules but not part of the documented API say `@internal`. */
const functions = modules.flatMap(exportedFunctions);
const publicFunctions = functions.filter((f) => !f.doc.includes("@internal"));

describe("calc/ documentation", () => {
  it("finds the exported functions", () => {
    expect(functions.length).toBeGreaterThan(20);
  });

  it.each(functions.map((f) => [`${f.module} ${f.name}`, f] as const))("%s has a doc comment", (_, f) => {
    expect(f.doc.trim().length, `${f.module}: ${f.name}`).toBeGreaterThan(10);
  });

  // A function that states a formula is a physics function: it must cite its source and say what it returns.
  it.each(functions.filter((f) => !PLUMBING.has(f.module) && /Formula|\$[^$]+\$/.test(f.doc)).map((f) => [`${f.module} ${f.name}`, f] as const))(
    "%s (a formula) names an existing source key and documents what it returns",
    (_, f) => {
      expect(
        keys.some((key) => f.doc.includes(key)),
        `${f.module}: ${f.name} cites no key of calc/sources/index.ts`,
      ).toBe(true);
      expect(/@returns|\breturns?\b/i.test(f.doc), `${f.module}: ${f.name} has no @returns`).toBe(true);
    },
  );

  it("keeps docs/calc-api.md in step with calc/ (npm run docs:api)", async () => {
    const { renderApiDocs, API_DOCS } = await import("../../scripts/api-docs.mjs");
    expect(readFileSync(API_DOCS, "utf8"), "docs/calc-api.md is out of date: run npm run docs:api").toBe(await renderApiDocs());
  });

  it("lists every documented exported function in docs/calc-api.md", () => {
    const reference = readFileSync(fileURLToPath(new URL("../../docs/calc-api.md", import.meta.url)), "utf8");
    const missing = publicFunctions.filter((f) => f.module.includes("/") && !f.module.startsWith("sources/") && !reference.includes(`\`${f.name}(`));
    expect(missing.map((f) => `${f.module}: ${f.name}`)).toEqual([]);
  });

  it("has a complete entry for every bibliography key", () => {
    for (const [key, source] of Object.entries(SOURCES)) {
      expect(key).toMatch(/^[a-z0-9]+(?:[-.][a-z0-9]+)*$/);
      expect(source.author.length, key).toBeGreaterThan(2);
      expect(source.title.length, key).toBeGreaterThan(2);
      expect(source.publication.length, key).toBeGreaterThan(2);
      expect(JSON.stringify(source), key).not.toMatch(/https?:\/\//);
    }
  });
});
