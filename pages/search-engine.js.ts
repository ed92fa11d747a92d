/**
 * The search engine as one small ES module, /search-engine.js: MiniSearch (a general-purpose
 * full-text search library) and the reader of a page's text (components/search/page-text.ts). The
 * search page imports it on the first search, reads the pages listed in search-pages.json and
 * indexes them in the browser. Bundled here rather than into the page's inline script, which stays
 * under 5 KB.
 */
import { buildSync } from "esbuild";

export function GET(): Response {
  const code = buildSync({
    stdin: {
      contents: 'export { default } from "minisearch"; export { pageSections } from "./components/search/page-text.ts";',
      resolveDir: process.cwd(),
      loader: "js",
    },
    bundle: true,
    minify: true,
    format: "esm",
    target: "es2022",
    write: false,
  }).outputFiles[0]!.text;
  return new Response(code, { headers: { "Content-Type": "text/javascript" } });
}
