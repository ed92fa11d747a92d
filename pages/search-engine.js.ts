/**
 * The search engine (MiniSearch, a general-purpose full-text search library) as one small ES module,
 * /search-engine.js: the search page imports it on the first search, with the pages' text
 * (search-pages.json) and the calculators' fields (search-fields.json), and indexes them in the
 * browser. Bundled here rather than into the page's inline script, which stays under 5 KB.
 */
import { buildSync } from "esbuild";

export function GET(): Response {
  const code = buildSync({
    stdin: { contents: 'export { default } from "minisearch";', resolveDir: process.cwd(), loader: "js" },
    bundle: true,
    minify: true,
    format: "esm",
    target: "es2022",
    write: false,
  }).outputFiles[0]!.text;
  return new Response(code, { headers: { "Content-Type": "text/javascript" } });
}
