// After the build: list the pages a search reads, then write a versioned service worker that
// precaches every file a page can use (precache.mjs), so the whole handbook works offline after the
// first visit.
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";
import { precacheSelection, transferSize } from "./precache.mjs";
import { settleSearchFields } from "./search-fields.mjs";

/** @param {string} dir @param {RegExp} [name] @returns {string[]} every file under `dir` whose name matches (.html files by default) */
function filesUnder(dir, name = /\.html$/) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? filesUnder(join(dir, entry.name), name) : name.test(entry.name) ? [join(dir, entry.name)] : [],
  );
}

/** Built pages left out of the search index: "page not found" and the search page are never a useful result. */
export const NOT_INDEXED = new Set(["404.html", "search/index.html"]);

/**
 * The pages a search reads, as addresses relative to the site's base. The search page fetches them
 * on the first search (from the offline copy once it is saved) and reads their text itself
 * (components/search/page-text.ts), so their text is downloaded once, as pages, not again as an index.
 */
export const SEARCH_INDEX = "search-pages.json";

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

/** Astro integration: the list of pages a search reads and the service worker, after every build. */
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
        const pages = filesUnder(root)
          .map((file) => relative(root, file).split(sep).join("/"))
          .filter((path) => !NOT_INDEXED.has(path))
          .sort()
          .map((path) => path.replace(/(^|\/)index\.html$/, "$1"));
        writeFileSync(join(root, SEARCH_INDEX), JSON.stringify(pages));
        logger.info(`search: ${pages.length} pages to read`);

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
        logger.info(`offline cache version ${version}`);
      },
    },
  };
}
