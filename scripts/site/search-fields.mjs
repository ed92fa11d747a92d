// After the build, before the search index and the offline cache: each calculator field's search
// entry (search-fields.json, written by pages/search-fields.json.ts) opens its page at the field
// when the built page has that field's element, and at the calculator otherwise (a field shown only
// for some choices, such as a spinner's wheels, has no element until it is shown).
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";

/**
 * Rewrites search-fields.json in the built folder `root`; returns how many entries fell back to
 * their calculator. No file, nothing to do.
 * @param {string} root
 */
export function settleSearchFields(root) {
  const file = join(root, "search-fields.json");
  if (!existsSync(file)) return 0;
  /** @type {{ url: string, calculatorUrl?: string }[]} */
  const entries = JSON.parse(readFileSync(file, "utf8"));
  /** @type {Map<string, string>} */
  const pages = new Map();
  let fallbacks = 0;
  const settled = entries.map(({ calculatorUrl, ...entry }) => {
    const [path = "", id = ""] = entry.url.split("#");
    if (!pages.has(path)) pages.set(path, existsSync(join(root, path, "index.html")) ? readFileSync(join(root, path, "index.html"), "utf8") : "");
    if (calculatorUrl && !pages.get(path)?.includes(`id="${id}"`)) {
      fallbacks += 1;
      return { ...entry, url: calculatorUrl };
    }
    return entry;
  });
  writeFileSync(file, JSON.stringify(settled));
  return fallbacks;
}
