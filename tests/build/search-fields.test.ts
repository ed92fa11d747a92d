/**
 * The built search entries of the calculators' fields (dist/search-fields.json): each opens a built
 * page at an element that exists there, and the file is kept for offline use.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import type { SearchEntry } from "../../components/search/entries.ts";

const dist = process.env.OUT_DIR ? resolve(process.env.OUT_DIR) : fileURLToPath(new URL("../../dist/", import.meta.url));

describe("search-fields.json", () => {
  const entries = JSON.parse(readFileSync(join(dist, "search-fields.json"), "utf8")) as SearchEntry[];

  it("opens every field and result at an element of its built page", () => {
    const missing = entries.filter((entry) => {
      const [path, anchor] = entry.url.split("#") as [string, string];
      const html = readFileSync(join(dist, path, "index.html"), "utf8");
      return !html.includes(`id="${anchor}"`);
    });
    expect(missing.map((e) => e.url)).toEqual([]);
    expect(entries.length).toBeGreaterThan(150);
  });

  it("keeps the field's own address where the page has the field, and the calculator's otherwise", () => {
    const urls = entries.map((e) => e.url);
    expect(urls).toContain("chapters/spin-up/#spin-up-calculator-motorKv");
    expect(urls).toContain("chapters/acceleration/#placement-calculator-step");
    // Shown only when the question is "which radius for this mass": the calculator opens instead.
    expect(urls).not.toContain("chapters/mass-layout/#mass-calculator-counterweightMass");
    expect(entries.filter((e) => /-calculator-/.test(e.url)).length).toBeGreaterThan(entries.filter((e) => e.kind !== "output").length / 2);
    expect(entries.some((e) => "calculatorUrl" in e)).toBe(false);
  });

  it("is in the offline cache", () => {
    expect(readFileSync(join(dist, "sw.js"), "utf8")).toContain('"/search-fields.json"');
  });
});
