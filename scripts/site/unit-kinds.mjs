// Which quantity kinds a calculator page needs: the kinds its code names. calc/core/units.ts parses
// and formats only registered kinds (useUnits), so a page's entry registers the tables of the kinds
// named anywhere in the source its widget can load (static and dynamic imports, followed from file to
// file), and nothing else: the units table no longer rides along whole on every page. A kind is named
// as a string ("length") in an input declaration, a format call or a result's figure; a unit id named
// on its own ("rpm") brings its kind too. "us" is left out: in this code it names the US customary
// system far more often than the microsecond, whose kind (time) a page that shows times names anyway.
import { existsSync, readFileSync } from "node:fs";
import { dirname, resolve } from "node:path";

const IMPORT = /(?:\bfrom\s*|\bimport\s*\(?\s*)["'`](\.{1,2}\/[^"'`]+)["'`]/g;
const STRING = /["'`]([^"'`\n\\]{1,40})["'`]/g;
const TYPE_ONLY = /\b(?:import|export)\s+type\s[^;]*?from\s*["'`][^"'`]+["'`]/g;
const withoutComments = (text) => text.replace(/\/\*[\s\S]*?\*\//g, "").replace(/(^|[^:"'`\\])\/\/.*$/gm, "$1");

/** The project's source files reachable from `entry` by relative imports (static or dynamic). */
export function sourceGraph(entry) {
  const seen = new Set();
  const visit = (file) => {
    if (seen.has(file) || !existsSync(file)) return;
    seen.add(file);
    // Type-only imports bring no code (unit-table.ts names every kind but a page never loads it).
    for (const m of readFileSync(file, "utf8").replace(TYPE_ONLY, "").matchAll(IMPORT)) visit(resolve(dirname(file), m[1].replace(/\?.*$/, "")));
  };
  visit(resolve(entry));
  return [...seen];
}

/**
 * The kinds named in the files (sorted): string literals that are a kind's name, or a unit's id
 * (mapped to its kind; "us" excepted).
 *
 * @param {string[]} files source files
 * @param {Record<string, { kind: string }>} units every unit by id (calc/core/unit-table.ts UNITS)
 */
export function kindsNamed(files, units) {
  const kinds = new Set(Object.values(units).map((u) => u.kind));
  const found = new Set();
  for (const file of files) {
    for (const m of withoutComments(readFileSync(file, "utf8")).matchAll(STRING)) {
      const word = m[1];
      if (kinds.has(word)) found.add(word);
      else if (word !== "us" && Object.hasOwn(units, word)) found.add(units[word].kind);
    }
  }
  return [...found].sort();
}
