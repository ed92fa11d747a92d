/**
 * The stylesheets keep to the type scale (components/layout/site.css): sizes from `--text-xs` to
 * `--text-xl` (or the base 1rem, the headings' and print's own), weights 400 and 700. Each other
 * size, weight or style is one more font the browser looks up and prepares during a page's first
 * layout, which on a slow phone is one of the longest tasks of the load.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const components = fileURLToPath(new URL("../../components/", import.meta.url));
const sheets = readdirSync(components, { recursive: true })
  .map(String)
  .filter((f) => f.endsWith(".css"));

/** The declarations of a stylesheet outside its print rules (paper has no first layout to spare). */
function screenDeclarations(css: string): string[] {
  const withoutPrint = css.replace(/@media print\s*\{(?:[^{}]*\{[^{}]*\})*[^{}]*\}/g, "");
  return [...withoutPrint.matchAll(/(font-size|font-weight)\s*:\s*([^;}]+)/g)].map((m) => `${m[1]}: ${m[2]!.trim()}`);
}

describe("the type scale", () => {
  it("finds the stylesheets", () => {
    expect(sheets).toContain(join("layout", "site.css"));
  });

  it.each(sheets)("%s sizes text from the scale and weighs it 400 or 700", (sheet) => {
    const allowed = /^font-size: (var\(--text-(xs|s|l|xl)\)( !important)?|1rem|106\.25%)$|^font-weight: (400|700|normal|bold|inherit)$/;
    const off = screenDeclarations(readFileSync(join(components, sheet), "utf8")).filter((d) => !allowed.test(d));
    expect(off).toEqual([]);
  });

  it("defines the four steps once, in the site's root rule", () => {
    const site = readFileSync(join(components, "layout", "site.css"), "utf8");
    for (const step of ["xs", "s", "l", "xl"]) expect(site.match(new RegExp(`--text-${step}:`, "g")), step).toHaveLength(1);
  });
});
