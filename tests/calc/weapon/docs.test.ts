/**
 * The weapon modules' own documentation check (the top-level meta test reads calc/*.ts only):
 * every exported function has a doc comment; every function that states a formula names its
 * sources by existing bibliography keys, says what it returns and gives an example; every key of
 * the weapon bibliography is used.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { SOURCES } from "../../../calc/sources/index.ts";
import { WEAPON_SOURCES } from "../../../calc/sources/weapon.ts";

const dir = fileURLToPath(new URL("../../../calc/weapon/", import.meta.url));
const files = readdirSync(dir).filter((f) => f.endsWith(".ts"));
const texts = Object.fromEntries(files.map((f) => [f, readFileSync(join(dir, f), "utf8")]));

interface Exported {
  module: string;
  name: string;
  doc: string;
}

function exportedFunctions(file: string): Exported[] {
  const source = ts.createSourceFile(file, texts[file]!, ts.ScriptTarget.Latest, true);
  const found: Exported[] = [];
  for (const statement of source.statements) {
    const exported = ts.canHaveModifiers(statement) && ts.getModifiers(statement)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword);
    if (exported && ts.isFunctionDeclaration(statement) && statement.name) {
      const doc = ts
        .getJSDocCommentsAndTags(statement)
        .map((d) => d.getFullText())
        .join("\n");
      found.push({ module: file, name: statement.name.text, doc });
    }
  }
  return found;
}

const functions = files.flatMap(exportedFunctions);
const physics = functions.filter((f) => /Formula/.test(f.doc));

describe("calc/weapon documentation", () => {
  it("finds the modules and their functions", () => {
    expect(files).toEqual(expect.arrayContaining(["gyroscopic.ts", "shaft.ts", "bearings.ts", "impact.ts"]));
    expect(physics.length).toBeGreaterThan(30);
  });

  it.each(functions.map((f) => [`${f.module} ${f.name}`, f] as const))("%s has a doc comment", (_, f) => {
    expect(f.doc.trim().length).toBeGreaterThan(10);
  });

  it.each(physics.map((f) => [`${f.module} ${f.name}`, f] as const))("%s names existing source keys, what it returns, and an example", (_, f) => {
    const listed = /Sources:([^@]*?)(?:\*\/|$)/s.exec(f.doc)?.[1] ?? "";
    const keys = listed.match(/[a-z0-9]+(?:[-.][a-z0-9]+)+/g) ?? [];
    expect(keys.length, `${f.name} lists no sources`).toBeGreaterThan(0);
    for (const key of keys) expect(Object.hasOwn(SOURCES, key), `${f.name}: unknown source key ${key}`).toBe(true);
    expect(f.doc).toMatch(/@returns/);
    expect(f.doc).toMatch(/@example/);
  });

  it("uses every entry of the weapon bibliography", () => {
    const all = Object.values(texts).join("\n");
    const unused = Object.keys(WEAPON_SOURCES).filter((key) => !all.includes(key));
    expect(unused).toEqual([]);
  });

  it("names a source key on every line that computes a published formula (lines with a `// key` comment exist in each physics module)", () => {
    for (const file of ["gyroscopic.ts", "tipping.ts", "shaft.ts", "beams.ts", "bearings.ts", "impact.ts"]) {
      const cited = (texts[file]!.match(/\/\/ [a-z0-9]+(?:-[a-z0-9]+)+/g) ?? []).map((c) => c.slice(3));
      expect(cited.length, file).toBeGreaterThan(2);
      for (const key of cited) expect(Object.hasOwn(SOURCES, key), `${file}: ${key}`).toBe(true);
    }
  });
});
