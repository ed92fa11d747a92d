/**
 * Documentation of the bolted-joint modules in calc/loads/ (preload, joint stiffness, slip, tapped
 * threads, inch hardware): every exported function has a doc comment; every one that states a formula
 * says what it returns, gives an example and names bibliography keys that exist. The older load
 * modules (bolts, rims) are held to the general rules of tests/calc/meta.test.ts.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { isSourceKey, SOURCES } from "../../../calc/sources/index.ts";

const dir = fileURLToPath(new URL("../../../calc/loads/", import.meta.url));
const keys = Object.keys(SOURCES);
const JOINT_FILES = ["inch-fasteners.ts", "joint.ts", "joint-data.ts", "joint-inputs.ts", "joint-stiffness.ts", "preload.ts", "slip.ts", "tapped-thread.ts"];

function exportedFunctions(file: string): { name: string; doc: string }[] {
  const source = ts.createSourceFile(file, readFileSync(join(dir, file), "utf8"), ts.ScriptTarget.Latest, true);
  return source.statements
    .filter(
      (s): s is ts.FunctionDeclaration => ts.isFunctionDeclaration(s) && !!s.name && !!ts.getModifiers(s)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword),
    )
    .map((s) => ({
      name: s.name!.text,
      doc: ts
        .getJSDocCommentsAndTags(s)
        .map((d) => d.getFullText())
        .join("\n"),
    }));
}

const functions = JOINT_FILES.flatMap((file) => exportedFunctions(file).map((f) => ({ file, ...f })));

describe("calc/loads/ documentation", () => {
  it("finds the exported functions", () => {
    expect(functions.length).toBeGreaterThan(20);
  });

  it.each(functions.map((f) => [`${f.file} ${f.name}`, f] as const))("%s has a doc comment", (_, f) => {
    expect(f.doc.trim().length).toBeGreaterThan(20);
  });

  it.each(functions.filter((f) => /Formula/.test(f.doc)).map((f) => [`${f.file} ${f.name}`, f] as const))(
    "%s (a formula) names existing source keys, says what it returns and gives an example",
    (_, f) => {
      expect(keys.some((key) => f.doc.includes(key))).toBe(true);
      expect(f.doc).toMatch(/@returns/);
      expect(f.doc).toMatch(/@example/);
      const listed = [...f.doc.matchAll(/Sources:([\s\S]*?)(?:\.\s*\n|\*\/)/g)].flatMap((m) =>
        [...m[1]!.matchAll(/[a-z0-9]+(?:-[a-z0-9]+)+/g)].map((k) => k[0]),
      );
      expect(listed.length).toBeGreaterThan(0);
      expect(listed.filter((k) => !isSourceKey(k))).toEqual([]);
    },
  );

  it("cites only existing keys in the formula comments of the function bodies", () => {
    for (const file of JOINT_FILES) {
      const text = readFileSync(join(dir, file), "utf8");
      const cited = [...text.matchAll(/\/\/ ([a-z0-9]+(?:-[a-z0-9]+)+)(?=[ ,;:]|$)/gm)].map((m) => m[1]!);
      expect(
        cited.filter((k) => !isSourceKey(k)),
        file,
      ).toEqual([]);
    }
  });
});
