// After the build: index the pages for search (pagefind), then write a versioned service worker
// that precaches every file, so the whole handbook works offline after the first visit.
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";
import * as pagefind from "pagefind";

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

/** The service worker's source: precache `files`, serve them cache-first, replace old caches. */
export function serviceWorkerSource({ version, base, files }) {
  return `// Whirlbook offline cache, generated at build time. Version ${version}.
const CACHE = ${JSON.stringify(`whirlbook-${version}`)};
const BASE = ${JSON.stringify(base)};
const FILES = ${JSON.stringify(files)};
self.addEventListener("install", (event) => {
  event.waitUntil(caches.open(CACHE).then((cache) => cache.addAll(FILES)));
});
self.addEventListener("message", (event) => {
  if (event.data === "whirlbook:activate") self.skipWaiting();
});
self.addEventListener("activate", (event) => {
  event.waitUntil(
    caches.keys()
      .then((keys) => Promise.all(keys.filter((key) => key.startsWith("whirlbook-") && key !== CACHE).map((key) => caches.delete(key))))
      .then(() => self.clients.claim()),
  );
});
self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || !url.pathname.startsWith(BASE)) return;
  event.respondWith((async () => {
    const cache = await caches.open(CACHE);
    const hit = await cache.match(request, { ignoreSearch: true })
      ?? (request.mode === "navigate" && !url.pathname.endsWith("/") ? await cache.match(url.pathname + "/") : undefined);
    if (hit) return hit;
    try {
      return await fetch(request);
    } catch (error) {
      if (request.mode === "navigate") {
        const missing = await cache.match(BASE + "404.html");
        if (missing) return missing;
      }
      throw error;
    }
  })());
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
        const { index, errors } = await pagefind.createIndex({
          rootSelector: "main",
          excludeSelectors: [".calc", ".site-nav", ".chapter-nav", ".chart", ".katex", ".no-search"],
        });
        if (!index) throw new Error(`search index failed: ${errors.join("; ")}`);
        await index.addDirectory({ path: root });
        const written = await index.writeFiles({ outputPath: join(root, "pagefind") });
        if (written.errors.length) throw new Error(`search index failed: ${written.errors.join("; ")}`);
        await pagefind.close();
        // The handbook renders its own results; pagefind's ready-made interfaces are not shipped.
        for (const file of readdirSync(join(root, "pagefind"))) {
          if (/^pagefind-(ui|modular-ui|component-ui|highlight)\./.test(file)) rmSync(join(root, "pagefind", file));
        }

        const files = walk(root)
          .map((file) => relative(root, file).split(sep).join("/"))
          .filter((file) => file !== "sw.js" && !file.endsWith(".map"))
          .sort();
        const hash = createHash("sha256");
        for (const file of files) hash.update(file).update(readFileSync(join(root, file)));
        const version = hash.digest("hex").slice(0, 12);
        const urls = files.map((file) => base + file.replace(/(^|\/)index\.html$/, "$1"));
        writeFileSync(join(root, "sw.js"), serviceWorkerSource({ version, base, files: urls }));
        logger.info(`search index and offline cache written (${files.length} files, version ${version})`);
      },
    },
  };
}
