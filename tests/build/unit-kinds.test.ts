/**
 * A calculator page carries the unit tables of the kinds its code names, and no others: the build
 * writes them into the page's entry (scripts/site/unit-kinds.mjs), and parsing and formatting
 * (calc/core/units.ts) read only registered kinds. These checks read the built entries: every kind a
 * calculator on the page declares an input in is there, the shared runtime holds no table, and a
 * page that shows few kinds carries few.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { UNITS } from "../../calc/core/unit-table.ts";
import { kindsNamed, sourceGraph } from "../../scripts/site/unit-kinds.mjs";

const dist = process.env.OUT_DIR ? resolve(process.env.OUT_DIR) : fileURLToPath(new URL("../../dist/", import.meta.url));
const widgets = fileURLToPath(new URL("../../components/calculators/", import.meta.url));
const calculatorsDir = fileURLToPath(new URL("../../calc/calculators/", import.meta.url));
const assets = join(dist, "_astro");
const scripts = readdirSync(assets).filter((f) => f.endsWith(".js"));

/** The kinds an entry registers, read from the tables the build wrote into it. */
function registered(file: string): string[] {
  const code = readFileSync(join(assets, file), "utf8");
  return [...code.matchAll(/\{kind:["'`](\w+)["'`],units:/g)].map((m) => m[1]!).sort();
}

const names = readdirSync(widgets)
  .filter((f) => f.endsWith(".tsx"))
  .map((f) => f.slice(0, -".tsx".length));

describe("unit tables on calculator pages", () => {
  it.each(names)("the %s entry registers every kind its calculators' inputs are in", async (name) => {
    const entry = scripts.find((f) => f.startsWith(`island-${name}.`));
    expect(entry, `island-${name}.*.js in dist/_astro`).toBeDefined();
    const kinds = registered(entry!);
    const graph = sourceGraph(join(widgets, `${name}.tsx`));
    // The calculators' forms the widget loads: the descriptors, and form modules of their own.
    const descriptors = graph.filter((file) => file.startsWith(calculatorsDir) || /^export const form\b/m.test(readFileSync(file, "utf8")));
    const forms = await Promise.all(descriptors.map(async (file) => ((await import(file)) as { form?: { inputs: Record<string, { kind: string }> } }).form));
    const declared = new Set(forms.flatMap((form) => Object.values(form?.inputs ?? {}).map((spec) => spec.kind)));
    expect(declared.size, `${name}: a calculator with inputs`).toBeGreaterThan(0);
    for (const kind of declared) expect(kinds, `${name} shows ${kind}`).toContain(kind);
    expect(kinds).toEqual(kindsNamed(graph, UNITS));
  });

  it("keeps the tables out of the runtime every calculator page shares", () => {
    const runtime = scripts.filter((f) => f.startsWith("runtime."));
    expect(runtime).toHaveLength(1);
    expect(registered(runtime[0]!)).toEqual([]);
    // Spellings only a table holds.
    expect(readFileSync(join(assets, runtime[0]!), "utf8")).not.toMatch(/millimetre|ounces|joules/);
  });

  it("gives a page that shows few kinds only those (the radius trim: lengths, angles, speeds)", () => {
    const entry = scripts.find((f) => f.startsWith("island-radius-trim."))!;
    const kinds = registered(entry);
    expect(kinds).toEqual(expect.arrayContaining(["angle", "angularSpeed", "length"]));
    expect(kinds.length).toBeLessThanOrEqual(8);
    expect(kinds).not.toContain("inertia");
  });
});
