// After the build: index the pages for search (pagefind), then write a versioned service worker
// that precaches every file a page can use (precache.mjs), so the whole handbook works offline
// after the first visit.
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { gunzipSync } from "node:zlib";
import { join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";
import zopfli from "@gfx/zopfli";
import { transformSync } from "esbuild";
import * as pagefind from "pagefind";
import { precacheSelection, transferSize } from "./precache.mjs";
import { settleSearchFields } from "./search-fields.mjs";
import { withFormulasAsText } from "./math-text.mjs";

/** @param {string} dir @param {RegExp} [name] @returns {string[]} every file under `dir` whose name matches (.html files by default) */
function filesUnder(dir, name = /\.html$/) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? filesUnder(join(dir, entry.name), name) : name.test(entry.name) ? [join(dir, entry.name)] : [],
  );
}

/**
 * A page's HTML as the search index reads it: formulas as text (math-text.mjs), an `id` kept on
 * headings only, and a space after a table's caption and each header cell. Pagefind stores every
 * element with an id as an anchor, with its whole text, in the page's fragment, but builds its
 * section results (sub_results, which the search page shows) from headings alone: the ids of the
 * bibliography's entries, the calculator's section and the like only repeated their text in the
 * download. It also runs a caption and header cells together ("calculatorClassRm nominal"), which
 * makes words no one searches for. The served page is unchanged.
 * @param {string} html
 */
export function htmlForSearch(html) {
  return withFormulasAsText(html)
    .replace(/<(?!h[1-6]\b)([a-zA-Z][\w-]*)(\s[^>]*?)?\sid="[^"]*"/g, "<$1$2")
    .replace(/<\/(th|caption)>/g, " </$1>");
}

/** Built pages left out of the search index. */
export const NOT_INDEXED = new Set(["404.html", "search/index.html"]);

/** How long a page request may take before the saved copy is shown instead [ms]. */
export const NETWORK_TIMEOUT_MS = 3000;

/**
 * The service worker's source. Install downloads every file in `files` into a cache named after the
 * version, all or nothing: if any file fails, the new cache is deleted, the open pages are told why
 * (OfflineRegistration.astro shows it), and install fails, so a visitor keeps the previous complete
 * copy (or none) and never a partial one. Pages are fetched from the network first (navigation
 * preload where the browser has it), so a new deploy reaches returning visitors even when its
 * offline copy cannot be installed; the saved copy is used when the network fails, answers with a
 * server error, or takes longer than NETWORK_TIMEOUT_MS. Everything else comes from the saved copy
 * of this version first, so a page never mixes files of two offline versions.
 */
export function serviceWorkerSource({ version, base, files }) {
  return `// Whirlbook offline cache, generated at build time. Version ${version}.
const CACHE = ${JSON.stringify(`whirlbook-${version}`)};
const BASE = ${JSON.stringify(base)};
const FILES = ${JSON.stringify(files)};
const TIMEOUT = ${NETWORK_TIMEOUT_MS};
// Put into a cache while its install runs, removed when every file is in: a cache that still holds
// it was cut short (the browser closed mid-install) and is deleted by the next install.
const INSTALLING = BASE + "__installing";
const saved = (request) => caches.match(request, { cacheName: CACHE, ignoreSearch: true, ignoreVary: true });
async function tell(message) {
  for (const client of await self.clients.matchAll({ includeUncontrolled: true, type: "window" })) client.postMessage(message);
}
self.addEventListener("install", (event) => {
  event.waitUntil((async () => {
    for (const key of await caches.keys()) {
      if (!key.startsWith("whirlbook-") || key === CACHE) continue;
      const cache = await caches.open(key);
      if ((await cache.keys()).length === 0 || (await cache.match(INSTALLING))) await caches.delete(key);
    }
    const cache = await caches.open(CACHE);
    await cache.put(INSTALLING, new Response(""));
    const abort = new AbortController();
    try {
      await Promise.all(FILES.map(async (url) => {
        const response = await fetch(url, { cache: "no-cache", signal: abort.signal }).catch(() => {
          throw new Error(url + " could not be downloaded");
        });
        if (!response.ok) throw new Error(url + " could not be downloaded (HTTP " + response.status + ")");
        await cache.put(url, response);
      }));
      await cache.delete(INSTALLING);
    } catch (error) {
      abort.abort();
      await caches.delete(CACHE);
      await tell({ type: "whirlbook:offline-failed", reason: String(error && error.message || error) });
      throw error;
    }
  })());
});
self.addEventListener("message", (event) => {
  if (event.data === "whirlbook:activate") self.skipWaiting();
});
self.addEventListener("activate", (event) => {
  event.waitUntil((async () => {
    const keys = await caches.keys();
    await Promise.all(keys.filter((key) => key.startsWith("whirlbook-") && key !== CACHE).map((key) => caches.delete(key)));
    if (self.registration.navigationPreload) await self.registration.navigationPreload.enable();
    await self.clients.claim();
  })());
});
async function page(event, url) {
  const network = (async () => (await event.preloadResponse) || fetch(event.request))();
  event.waitUntil(network.then(() => undefined, () => undefined));
  let timer;
  const late = new Promise((resolve) => { timer = setTimeout(resolve, TIMEOUT); });
  const response = await Promise.race([network, late]).catch(() => undefined);
  clearTimeout(timer);
  if (response && response.status < 500) return response;
  const copy = (await saved(url.pathname)) || (url.pathname.endsWith("/") ? undefined : await saved(url.pathname + "/"));
  if (copy) return copy;
  try {
    return response || (await network);
  } catch (error) {
    const missing = await saved(BASE + "404.html");
    if (missing) return missing;
    throw error;
  }
}
self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || !url.pathname.startsWith(BASE)) return;
  if (request.mode === "navigate") return event.respondWith(page(event, url));
  event.respondWith(saved(request).then((copy) => copy || fetch(request)));
});
`;
}

/** Astro integration: search index and service worker, after every build. */
export function offlineAndSearch() {
  let base = "/";
  return {
    name: "whirlbook:offline-and-search",
    hooks: {
      "astro:config:done": ({ config }) => {
        base = config.base.endsWith("/") ? config.base : `${config.base}/`;
      },
      "astro:build:done": async ({ dir, logger }) => {
        const root = fileURLToPath(dir);
        const fallbacks = settleSearchFields(root);
        logger.info(`search fields: ${fallbacks} entries open their calculator (their field is shown only for some choices)`);
        const { index, errors } = await pagefind.createIndex({
          rootSelector: "main",
          excludeSelectors: [".calc", ".site-nav", ".chapter-nav", ".chart", ".katex", ".no-search"],
        });
        if (!index) throw new Error(`search index failed: ${errors.join("; ")}`);
        // Each page is indexed with its formulas as text (math-text.mjs): the served page is unchanged.
        for (const file of filesUnder(root)) {
          const path = relative(root, file).split(sep).join("/");
          // "Page not found" and the search page itself are never a useful result.
          if (NOT_INDEXED.has(path)) continue;
          const added = await index.addHTMLFile({
            url: `/${path.replace(/(^|\/)index\.html$/, "$1")}`,
            content: htmlForSearch(readFileSync(file, "utf8")),
          });
          if (added.errors.length) throw new Error(`search index failed on ${path}: ${added.errors.join("; ")}`);
        }
        const written = await index.writeFiles({ outputPath: join(root, "pagefind") });
        if (written.errors.length) throw new Error(`search index failed: ${written.errors.join("; ")}`);
        await pagefind.close();
        // The handbook renders its own results; pagefind's ready-made interfaces are not shipped. Its
        // web worker is not either: the search page runs the search on the page (components/search/
        // search.ts sets noWorker; a few hundred words of index take milliseconds), so the offline
        // copy does not carry the same search code twice.
        for (const file of readdirSync(join(root, "pagefind"))) {
          if (/^pagefind-(ui|modular-ui|component-ui|highlight|worker)\./.test(file)) rmSync(join(root, "pagefind", file));
        }
        // The index, its fragments and its WebAssembly are gzip files that pagefind's script unpacks
        // itself, served as they are: packed again by zopfli (same format, about 4 % smaller).
        for (const file of filesUnder(join(root, "pagefind"), /\.(pagefind|pf_index|pf_fragment|pf_meta)$/)) {
          writeFileSync(file, await zopfli.gzipAsync(gunzipSync(readFileSync(file)), { numiterations: 15 }));
        }
        // pagefind.js comes with its whitespace removed but its names whole: shorten them too.
        const script = join(root, "pagefind", "pagefind.js");
        writeFileSync(script, transformSync(readFileSync(script, "utf8"), { minify: true, format: "esm", target: "es2022" }).code);

        const { files, excluded } = precacheSelection(root);
        // The version names the cache: it changes with any precached file and with the worker's own
        // code, so an install never writes into the cache the running worker serves from.
        const hash = createHash("sha256").update(serviceWorkerSource({ version: "", base, files: [] }));
        for (const file of files) hash.update(file).update(readFileSync(join(root, file)));
        const version = hash.digest("hex").slice(0, 12);
        const urls = files.map((file) => base + file.replace(/(^|\/)index\.html$/, "$1"));
        writeFileSync(join(root, "sw.js"), serviceWorkerSource({ version, base, files: urls }));
        const size = transferSize(root, files);
        logger.info(
          `offline cache: ${files.length} files, ${(size.raw / 1024).toFixed(0)} KB raw, ${(size.gzip / 1024).toFixed(0)} KB gzip (${excluded.size} files left out: nothing uses them)`,
        );
        logger.info(`search index written; offline cache version ${version}`);
      },
    },
  };
}
