/**
 * The shape of calc/: no import cycles (type imports count), no file over 600 lines, and no
 * import of the UI, the DOM or Node's own modules, so that every layer can be read and tested alone.
 */
import { readdirSync, readFileSync } from "node:fs";
import { dirname, join, normalize, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const calcDir = fileURLToPath(new URL("../../calc/", import.meta.url));
const files = (readdirSync(calcDir, { recursive: true }) as string[]).filter((f) => f.endsWith(".ts")).sort();
const IMPORT = /(?:^|\n)\s*(?:import|export)\s[^;]*?\sfrom\s*["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;

function importsOf(file: string): string[] {
  const text = readFileSync(join(calcDir, file), "utf8");
  return [...text.matchAll(IMPORT)].map((m) => m[1] ?? m[2] ?? "");
}

const graph = new Map(
  files.map((file) => [
    file,
    importsOf(file)
      .filter((spec) => spec.startsWith("."))
      .map((spec) => normalize(join(dirname(file), spec))),
  ]),
);

/** Every strongly connected component of more than one file (or a file importing itself): Tarjan's algorithm. */
function cycles(): string[][] {
  let index = 0;
  const indexOf = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string) => {
    indexOf.set(v, index);
    low.set(v, index);
    index += 1;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!indexOf.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, indexOf.get(w)!));
    }
    if (low.get(v) === indexOf.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || (graph.get(v) ?? []).includes(v)) found.push(component.sort());
    }
  };
  for (const v of graph.keys()) if (!indexOf.has(v)) visit(v);
  return found;
}

describe("calc/ structure", () => {
  it("reads the whole module", () => {
    expect(files.length).toBeGreaterThan(30);
  });

  it("has no import cycle, type imports included", () => {
    expect(cycles()).toEqual([]);
  });

  it("resolves every relative import to a file of calc/", () => {
    const missing = [...graph].flatMap(([file, targets]) => targets.filter((t) => !graph.has(t)).map((t) => `${file} -> ${t}`));
    expect(missing).toEqual([]);
  });

  it("keeps every file to about 600 lines", () => {
    const long = files.map((f) => [f, readFileSync(join(calcDir, f), "utf8").split("\n").length] as const).filter(([, n]) => n > 600);
    expect(long).toEqual([]);
  });

  it("never imports the UI, the DOM or Node's own modules", () => {
    const outside = files.flatMap((file) =>
      importsOf(file)
        .filter(
          (spec) =>
            spec.startsWith("node:") || spec.includes("components/") || relative(calcDir, normalize(join(calcDir, dirname(file), spec))).startsWith(".."),
        )
        .map((spec) => `${file}: ${spec}`),
    );
    expect(outside).toEqual([]);
  });
});
