/**
 * How the built site is delivered (reads dist/; `npm test` builds first): compressed copies of every
 * text file, one math font cut to the characters the formulas draw that never holds up text and is preloaded
 * only where math is, a search index of what a search is for, an offline cache that downloads only what a
 * page can use, and one strict Content Security Policy in every page and in the headers file.
 */
import { describe, expect, it } from "vitest";
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { createRequire } from "node:module";
import { brotliDecompressSync, gunzipSync } from "node:zlib";
import { Blob as FontBlob, Face } from "harfbuzzjs";
import {
  contentSecurityPolicy,
  HEADER_ONLY,
  inlineScriptHashes,
  inlineStyleHashes,
  parseHeadersFile,
  policyBreakers,
} from "../../scripts/site/content-security-policy.mjs";
import { ALWAYS_KEPT, mathFontUsage } from "../../scripts/site/math-font.mjs";
import { NOT_INDEXED, SEARCH_INDEX } from "../../scripts/site/offline-and-search.mjs";
import { precachedFiles, precacheSelection, transferSize } from "../../scripts/site/precache.mjs";
import { createWeigher } from "../../scripts/site/page-weight.mjs";

const dist = process.env.OUT_DIR ? resolve(process.env.OUT_DIR) : fileURLToPath(new URL("../../dist/", import.meta.url));

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}
const files = () => walk(dist).map((f) => f.slice(dist.length).replace(/\\/g, "/").replace(/^\//, ""));
const pages = () => files().filter((f) => f.endsWith(".html"));
const read = (file: string) => readFileSync(join(dist, file), "utf8");
/** fontverter (CommonJS, untyped): woff2 to a plain OpenType font harfbuzz reads. */
const fontverter = createRequire(import.meta.url)("fontverter") as { convert(font: Buffer, format: "sfnt"): Promise<Buffer> };
/** The characters a built font file maps (its cmap), read by harfbuzz. */
async function fontCharacters(path: string): Promise<Set<string>> {
  const face = new Face(new FontBlob(await fontverter.convert(readFileSync(path), "sfnt")), 0);
  return new Set([...face.collectUnicodes()].map((code) => String.fromCodePoint(code)));
}

const KIB = 1024;
/**
 * Ceiling for the first visit's offline download, gzip bytes (fonts count at their own, already
 * compressed, size). It grew with the chapters to 792 KiB (18 pages); then, for a lighter first
 * visit: the fonts cut to the characters the formulas use; the formulas as MathML in one math font
 * instead of KaTeX's markup and six fonts (737.4 -> 687.2 KiB); the pages' small stylesheets inside
 * them; and the search as the pages' text with a small engine (MiniSearch) in place of a prebuilt
 * index with its WebAssembly and code, the search reading the pages themselves (already in the
 * copy) instead of a second copy of their text (search 232.7 -> 19.3 KiB: the engine, the fields and
 * the list of pages): measured 481.5 KiB (493 045 B), 418.6 KiB as brotli, which is what a browser
 * given the .br copies downloads; ceilings 490 and 426 KiB.
 */
const PRECACHE_GZIP_CEILING = 490 * KIB;
/** The same download as brotli: what a browser gets when the server sends the .br copies. */
const PRECACHE_BROTLI_CEILING = 426 * KIB;

describe("compressed copies", () => {
  const text = () => files().filter((f) => /\.(html|css|js|svg|json)$/.test(f));

  it("exist beside every html, css, js, svg and json file, as .br and .gz", () => {
    expect(text().length).toBeGreaterThan(40);
    const missing = text().flatMap((f) => [`${f}.br`, `${f}.gz`].filter((copy) => !existsSync(join(dist, copy))));
    expect(missing).toEqual([]);
  });

  it("decompress to the very bytes of the file beside them", () => {
    const wrong: string[] = [];
    for (const f of text()) {
      const original = readFileSync(join(dist, f));
      if (!brotliDecompressSync(readFileSync(join(dist, `${f}.br`))).equals(original)) wrong.push(`${f}.br`);
      if (!gunzipSync(readFileSync(join(dist, `${f}.gz`))).equals(original)) wrong.push(`${f}.gz`);
    }
    expect(wrong).toEqual([]);
  });

  it("are smaller than the file for every page (brotli at most as large as gzip)", () => {
    for (const page of pages()) {
      const size = (suffix: string) => readFileSync(join(dist, page + suffix)).length;
      expect(size(".gz"), page).toBeLessThan(size(""));
      expect(size(".br"), page).toBeLessThanOrEqual(size(".gz"));
    }
  });

  it("are not made for files stored compressed already (fonts, search index)", () => {
    expect(files().filter((f) => /\.woff2\.(br|gz)$/.test(f))).toEqual([]);
  });
});

describe("the math font", () => {
  const usage = mathFontUsage(dist, "/");
  const mathPages = [...usage.pages].filter(([, uses]) => uses).map(([page]) => page);
  const fontFile = () => join(dist, usage.fonts[0]!.slice(1));

  it("is one face, which never hides text while it loads nor re-flows the page when late (font-display: optional)", () => {
    // In the site's stylesheet files and in the pages' inline ones.
    const css = [
      ...files()
        .filter((f) => f.endsWith(".css"))
        .map(read),
      ...pages().flatMap((page) => [...read(page).matchAll(/<style>([\s\S]*?)<\/style>/g)].map((m) => m[1]!)),
    ].join("\n");
    const faces = new Set(css.match(/@font-face\{[^}]*\}/g) ?? []);
    expect(faces.size).toBe(1);
    expect([...faces][0]).toContain("font-display:optional");
    expect(usage.fonts).toHaveLength(1);
  });

  it("is used by every chapter's math, and only there", () => {
    expect(mathPages.sort()).toEqual(
      pages()
        .filter((p) => p.startsWith("chapters/"))
        .sort(),
    );
  });

  it("is cut to the characters the formulas draw: it keeps each one the full face has, and the MATH table that sizes brackets and radicals", async () => {
    const inFont = await fontCharacters(fontFile());
    const full = fileURLToPath(new URL("../../node_modules/@fontsource/noto-sans-math/files/noto-sans-math-latin-400-normal.woff2", import.meta.url));
    const inFull = await fontCharacters(full);
    const missing = [...usage.chars].filter((c) => inFull.has(c) && !inFont.has(c));
    expect(missing).toEqual([]);
    for (const c of ALWAYS_KEPT) expect(inFont.has(c), c).toBe(true);
    // Glyphs a kept glyph's layout rules reach may come along; the full face maps some 3 000 characters.
    expect(inFont.size).toBeLessThan(usage.chars.size + ALWAYS_KEPT.length + 40);
    expect(inFull.size).toBeGreaterThan(2500);
    const sfnt = await fontverter.convert(readFileSync(fontFile()), "sfnt");
    const tables = Array.from({ length: sfnt.readUInt16BE(4) }, (_, i) => sfnt.toString("latin1", 12 + 16 * i, 16 + 16 * i));
    expect(tables).toContain("MATH");
  });

  it("is named after its cut content, and every page and stylesheet that names a face names that one", () => {
    expect(usage.fonts[0]).toMatch(/^\/_astro\/noto-sans-math-latin-400-normal\.[\w-]{8}\.woff2$/);
    const hash = (bytes: Buffer | string) => createHash("sha256").update(bytes).digest("base64url").slice(0, 8);
    expect(usage.fonts[0]!.endsWith(`.${hash(readFileSync(fontFile()))}.woff2`)).toBe(true);
    const naming = [...files().filter((f) => f.endsWith(".css")), ...pages()].filter((f) => /noto-sans-math/.test(read(f)));
    expect(naming.length).toBeGreaterThan(0);
    for (const f of naming) expect([...new Set(read(f).match(/\/_astro\/noto-sans-math[^)"'\s]*\.woff2/g))], f).toEqual(usage.fonts);
    // A stylesheet file that names it is named after its own content (so it changes with the face).
    for (const f of naming.filter((f) => f.endsWith(".css"))) expect(f.endsWith(`.${hash(read(f))}.css`), f).toBe(true);
  });

  it("is preloaded (as a font, with crossorigin) on pages with math only", () => {
    for (const page of pages()) {
      const preloads = [...read(page).matchAll(/<link rel="preload" href="([^"]+)" as="font" type="font\/woff2" crossorigin>/g)].map((m) => m[1]!);
      expect(preloads, page).toEqual(usage.pages.get(page) ? usage.fonts : []);
    }
  });
});

describe("offline cache", () => {
  const precached = () => precachedFiles(dist, "/");
  const selection = () => precacheSelection(dist);

  it("precaches every built file but those a page cannot use, each left out for a known reason", () => {
    const { excluded } = selection();
    const derived = (f: string) => f === "sw.js" || f === "_headers" || /\.(br|gz|map)$/.test(f);
    const built = files().filter((f) => !derived(f) && !excluded.has(f));
    expect(new Set(precached())).toEqual(new Set(built));
    for (const [file, reason] of excluded) {
      expect(`${file}: ${reason}`).toMatch(/^_astro\/[\w.-]+\.(js|css|woff2?): bundled file no page loads$/);
    }
  });

  it("holds every page, and every stylesheet, script (also those loaded on use) and font a page can request", () => {
    const weigh = createWeigher(dist, "/");
    const cached = new Set(precached());
    const usage = mathFontUsage(dist, "/");
    const missing: string[] = [];
    for (const page of pages()) {
      if (!cached.has(page)) missing.push(page);
      const w = weigh(page);
      for (const url of [...w.stylesheets, ...w.scripts, ...w.lazyScripts, ...(usage.pages.get(page) ? usage.fonts : [])]) {
        if (!cached.has(url.replace(/^\//, ""))) missing.push(`${page}: ${url}`);
      }
    }
    // What the search page loads on its first search.
    for (const f of ["search-fields.json", SEARCH_INDEX, "search-engine.js"]) if (!cached.has(f)) missing.push(f);
    expect(missing).toEqual([]);
  });

  it(`stays under ${PRECACHE_GZIP_CEILING / KIB} KiB gzip (${PRECACHE_BROTLI_CEILING / KIB} KiB brotli) on a first visit`, () => {
    const size = transferSize(dist, precached());
    expect(size.gzip).toBeLessThanOrEqual(PRECACHE_GZIP_CEILING);
    expect(size.brotli).toBeLessThanOrEqual(PRECACHE_BROTLI_CEILING);
    expect(size.brotli).toBeLessThan(size.gzip);
  });

  it("names its cache after the files and its own code, and replaces only whole caches", () => {
    const sw = read("sw.js");
    expect(sw).toMatch(/const CACHE = "whirlbook-[0-9a-f]{12}";/);
    expect(sw).toContain("await caches.delete(CACHE)");
    expect(sw).toContain('key.startsWith("whirlbook-") && key !== CACHE');
  });
});

describe("search", () => {
  const listed = () => JSON.parse(read(SEARCH_INDEX)) as string[];

  it("reads every page but the page-not-found and the search page, each a page of the offline copy", () => {
    const indexed = pages()
      .filter((p) => !NOT_INDEXED.has(p))
      .map((p) => p.replace(/(^|\/)index\.html$/, "$1"))
      .sort();
    expect([...listed()].sort()).toEqual(indexed);
    expect(NOT_INDEXED).toEqual(new Set(["404.html", "search/index.html"]));
    const cached = new Set(precachedFiles(dist, "/"));
    for (const url of listed()) expect(cached.has(`${url}index.html`), url).toBe(true);
  });

  it("ships no copy of the pages' text: the list of pages is all, and the engine reads the pages", () => {
    expect(read(SEARCH_INDEX).length).toBeLessThan(1024);
    expect(read("search-engine.js")).toMatch(/export\s*\{/);
    expect(read("search/index.html")).toContain("search-engine.js");
  });

  it("marks a source's locator as not searched, its author, title and publication stay searchable", () => {
    const html = read("chapters/fasteners/index.html");
    const entry = /Design\.<\/cite> McGraw-Hill, 9th ed\., 2011, <span class="no-search">ch\. 8 Screws, Fasteners, and the Design of Nonpermanent Joints/;
    expect(entry.test(html)).toBe(true);
  });
});

describe("content security policy", () => {
  const metaOf = (html: string) => /<meta http-equiv="Content-Security-Policy" content="([^"]+)">/.exec(html)?.[1];

  it("is the first thing after <meta charset> on every page, before any script or stylesheet", () => {
    for (const page of pages()) {
      const html = read(page);
      expect(html, page).toMatch(/<head><meta charset="utf-8"><meta http-equiv="Content-Security-Policy" content="[^"]+">/);
      expect(html.match(/http-equiv="Content-Security-Policy"/g)?.length, page).toBe(1);
    }
  });

  it("is one policy for the whole site, allowing exactly the hashes of the inline scripts and stylesheets", () => {
    const hashes = pages().flatMap((page) => inlineScriptHashes(read(page)));
    expect(new Set(hashes).size).toBe(2); // the offline registration and the search page's script
    const styleHashes = pages().flatMap((page) => inlineStyleHashes(read(page)));
    // The pages' own small stylesheets: the chapters' math, each calculator family's, the build sheet's.
    expect(new Set(styleHashes).size).toBeGreaterThanOrEqual(5);
    const policy = contentSecurityPolicy(hashes, styleHashes);
    for (const page of pages()) expect(metaOf(read(page)), page).toBe(policy);
    // The hash is of the script's text exactly as served.
    const registration = /<script>([\s\S]*?)<\/script>/.exec(read("index.html"))![1]!;
    expect(policy).toContain(`'sha256-${createHash("sha256").update(registration).digest("base64")}'`);
    const style = /<style>([\s\S]*?)<\/style>/.exec(read("chapters/spin-up/index.html"))![1]!;
    expect(policy).toMatch(new RegExp(`style-src-elem [^;]*'sha256-${createHash("sha256").update(style).digest("base64").replace(/[+/]/g, "\\$&")}'`));
  });

  it("is refused at build time by markup that would break it: style attributes, event handlers, javascript: URLs", () => {
    expect(policyBreakers('<p style="color:red">x</p>')).toEqual(["style attribute"]);
    expect(policyBreakers('<img src="x" onerror="y">')).toEqual(["event-handler attribute onerror"]);
    expect(policyBreakers('<a href="javascript:alert(1)">x</a>')).toEqual(["javascript: URL"]);
    expect(policyBreakers("<style>p{color:red}</style><p>x</p>")).toEqual([]);
    for (const page of pages()) expect(policyBreakers(read(page)), page).toEqual([]);
  });

  it("is strict: self only, no eval, no inline script, no plugins, no base or form elsewhere", () => {
    const policy = metaOf(read("index.html"))!;
    const directives: Record<string, string[]> = Object.fromEntries(policy.split(/;\s*/).map((d) => [d.split(" ")[0]!, d.split(" ").slice(1)]));
    expect(directives["default-src"]).toEqual(["'self'"]);
    expect(directives["script-src"]!.filter((s) => !s.startsWith("'sha256-"))).toEqual(["'self'"]);
    expect(directives["style-src-elem"]!.filter((s) => !s.startsWith("'sha256-"))).toEqual(["'self'"]);
    expect(directives["style-src"]).toEqual(directives["style-src-elem"]);
    expect(directives["style-src-attr"]).toEqual(["'none'"]);
    expect(directives["object-src"]).toEqual(["'none'"]);
    expect(directives["base-uri"]).toEqual(["'self'"]);
    expect(directives["form-action"]).toEqual(["'self'"]);
    expect(policy).not.toContain("'unsafe-eval'");
    expect(policy).not.toContain("'unsafe-inline'");
    expect(policy).not.toMatch(/https?:|\*|data:|blob:/);
  });

  it("is in _headers for every path, with frame-ancestors added, and hashed assets cached for a year", () => {
    const rules = parseHeadersFile(read("_headers"));
    const all = rules.find((r) => r.pattern.test("/chapters/spin-up/"))!;
    expect(Object.fromEntries(all.headers)["Content-Security-Policy"]).toBe(`${metaOf(read("index.html"))}; ${HEADER_ONLY}`);
    const assets = rules.filter((r) => r.pattern.test("/_astro/runtime.js")).flatMap((r) => r.headers);
    expect(Object.fromEntries(assets)["Cache-Control"]).toBe("public, max-age=31536000, immutable");
  });
});
