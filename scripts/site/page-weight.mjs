// Page weight of a built page: the gzip bytes of its HTML (inline stylesheets included), of every stylesheet it links and of
// every script it can run (inline scripts, module scripts, island components and renderers, and
// everything they import), plus the font files its CSS can request and how many requests hold its
// first paint. Deterministic: same build, same bytes. Used by the budget tests and by `npm run bench`.
import { readFileSync, existsSync } from "node:fs";
import { gzipSync } from "node:zlib";
import { dirname, join, posix } from "node:path";

const gz = (/** @type {Buffer|string} */ data) => gzipSync(data, { level: 9 }).length;

/**
 * @param {string} distDir absolute path of dist/
 * @param {string} base the base path the site was built with ("/" or "/sub/")
 */
export function createWeigher(distDir, base = "/") {
  /** Maps a URL path used in the page to a file in dist/. */
  const fileFor = (urlPath) => {
    const path = urlPath.split(/[?#]/)[0];
    const relative = path.startsWith(base) ? path.slice(base.length) : path.replace(/^\//, "");
    return join(distDir, relative);
  };

  /**
   * JS files reachable from an entry. Static imports load with the page and count towards its
   * weight; dynamic `import()` chunks load only when used (a button, a search) and are listed
   * apart in `lazy`, with their own static closure.
   */
  const scriptClosure = (entryUrl, seen = new Set(), lazy = new Set()) => {
    if (seen.has(entryUrl)) return seen;
    seen.add(entryUrl);
    const file = fileFor(entryUrl);
    if (!existsSync(file)) throw new Error(`page references a missing script ${entryUrl}`);
    const code = readFileSync(file, "utf8");
    const resolve = (specifier) => (specifier.startsWith("/") ? specifier : posix.join(posix.dirname(entryUrl), specifier));
    for (const m of code.matchAll(/(?:import|export)\s*(?:[^"'`()]*?from\s*)?["'`]([^"'`]+\.js)["'`]/g)) {
      if (!/^[a-z]+:/i.test(m[1])) scriptClosure(resolve(m[1]), seen, lazy);
    }
    for (const m of code.matchAll(/import\(\s*["'`]([^"'`]+\.js)["'`]\s*\)/g)) {
      // A specifier built at run time (`${base}search-engine.js`) is not one of this build's chunks.
      if (!/^[a-z]+:/i.test(m[1]) && !m[1].includes("${")) lazy.add(resolve(m[1]));
    }
    return seen;
  };

  /**
   * @param {string} pagePath e.g. "chapters/acceleration/index.html"
   */
  return function weigh(pagePath) {
    const html = readFileSync(join(distDir, pagePath), "utf8");
    const css = [...html.matchAll(/<link[^>]+rel="stylesheet"[^>]*href="([^"]+)"/g)].map((m) => m[1]);
    const inlineScripts = [...html.matchAll(/<script\b[^>]*>([\s\S]*?)<\/script>/g)].filter(
      (m) => !/\bsrc=/.test(m[0]) && !/type="application\/(ld\+)?json"/.test(m[0]),
    );
    const entries = new Set([
      ...[...html.matchAll(/<script\b[^>]*\bsrc="([^"]+)"/g)].map((m) => m[1]),
      ...[...html.matchAll(/\b(?:component-url|renderer-url)="([^"]+)"/g)].map((m) => m[1]),
    ]);
    const scripts = new Set();
    const lazyEntries = new Set();
    for (const entry of entries) scriptClosure(entry, scripts, lazyEntries);
    const lazy = new Set();
    for (const entry of lazyEntries) if (!scripts.has(entry)) scriptClosure(entry, lazy, new Set());
    for (const src of scripts) lazy.delete(src);
    const cssBytes = css.reduce((sum, href) => sum + gz(readFileSync(fileFor(href))), 0);
    const jsBytes = [...scripts].reduce((sum, src) => sum + gz(readFileSync(fileFor(src))), 0) + inlineScripts.reduce((sum, m) => sum + gz(m[1]), 0);
    const fonts = new Set();
    const inlineStyles = [...html.matchAll(/<style\b[^>]*>([\s\S]*?)<\/style>/g)].map((m) => m[1]);
    for (const text of [...css.map((href) => readFileSync(fileFor(href), "utf8")), ...inlineStyles]) {
      for (const m of text.matchAll(/url\(([^)]+)\)/g)) fonts.add(m[1].replace(/["']/g, ""));
    }
    // Requests that hold the first paint: stylesheets (unless for print only) and classic scripts
    // in <head> that are neither async nor deferred. Module scripts are deferred; fonts swap in.
    const head = html.slice(0, html.indexOf("</head>") + 1 || html.length);
    const renderBlocking =
      [...head.matchAll(/<link\b[^>]*\brel="stylesheet"[^>]*>/g)].filter((m) => !/\bmedia="print"/.test(m[0])).length +
      [...head.matchAll(/<script\b[^>]*\bsrc="[^"]+"[^>]*>/g)].filter((m) => !/\b(async|defer)\b|type="module"/.test(m[0])).length;
    return {
      page: pagePath,
      renderBlocking,
      html: gz(html),
      css: cssBytes,
      js: jsBytes,
      total: gz(html) + cssBytes + jsBytes,
      scripts: [...scripts],
      /** Chunks loaded only on use (dynamic import), gzip bytes; not part of `js`. */
      lazyJs: [...lazy].reduce((sum, src) => sum + gz(readFileSync(fileFor(src))), 0),
      lazyScripts: [...lazy],
      inlineScripts: inlineScripts.length,
      /** Stylesheets carried in the page's <head> (their bytes are part of `html`). */
      inlineStyles: inlineStyles.length,
      stylesheets: css,
      fontsReferenced: [...fonts],
    };
  };
}

export { dirname };
