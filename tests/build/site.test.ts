/**
 * Checks on the built site in dist/ (`npm test` builds first): every page exists, nothing comes
 * from another origin, the byte budgets hold, and formulas are MathML set at build time by one KaTeX version.
 */
import { describe, expect, it } from "vitest";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { join, resolve } from "node:path";
import { gzipSync } from "node:zlib";
import { fileURLToPath } from "node:url";
import { createWeigher } from "../../scripts/site/page-weight.mjs";

const dist = process.env.OUT_DIR ? resolve(process.env.OUT_DIR) : fileURLToPath(new URL("../../dist/", import.meta.url));
const contentDir = fileURLToPath(new URL("../../content/chapters/", import.meta.url));

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

const chapters = readdirSync(contentDir)
  .filter((f) => f.endsWith(".mdx"))
  .map((f) => {
    const source = readFileSync(join(contentDir, f), "utf8");
    return {
      slug: f.replace(/\.mdx$/, ""),
      calculator: /^calculator:\s*true\s*$/m.test(source),
      islands: (source.match(/<Calculator\b/g) ?? []).length,
    };
  });

const KB = 1024;
/** Budgets from the foundation issue, gzip bytes. */
const BUDGET = {
  chapterTotal: 60 * KB,
  chapterJs: 25 * KB,
  /** The only script allowed on pages that do not compute: the offline registration. */
  registration: 1 * KB,
  /** The build sheet carries every calculator's form (to read designs and write links), the design reader and the saved-designs store; a check's code loads only for a design that holds it. It has its own, larger budget. */
  buildSheetTotal: 85 * KB,
  buildSheetJs: 70 * KB,
  /** The search page's own script; the index loads only when a search runs. */
  searchJs: 5 * KB,
};

/**
 * Editor and simulation pages (the mass layout, spin-up) have their own JS budget: they carry an
 * editor or an integrator besides the shared calculator parts.
 */
// Steering loads its simulation (integrator, views, map) only on the reader's action, as a chunk of
// its own: its first script (22.6 KB gzip measured) fits the calculator budget, which now holds it.
const EDITOR_PAGES = new Set(["mass-layout", "spin-up"]);
const EDITOR_JS = 36 * KB;

/** "Save to design" on a calculator page: what its first press loads (the design writer and its dialog), gzip. */
const SAVE_JS = 6 * KB;

describe("the built site", () => {
  it("was built (run `npm run build` first)", () => {
    expect(existsSync(join(dist, "index.html"))).toBe(true);
  });

  it.each([
    "index.html",
    "404.html",
    "build-sheet/index.html",
    "search/index.html",
    "sw.js",
    "search-pages.json",
    "search-engine.js",
    ...chapters.map((c) => `chapters/${c.slug}/index.html`),
  ])("has %s", (page) => {
    expect(existsSync(join(dist, page))).toBe(true);
  });

  it("references no other origin from any page, stylesheet or script", () => {
    const offenders: string[] = [];
    for (const file of walk(dist)) {
      if (/\.(html)$/.test(file)) {
        const html = readFileSync(file, "utf8");
        for (const m of html.matchAll(/\b(?:src|href|action|srcset|poster|component-url|renderer-url)="([^"]*)"/g)) {
          if (/^(?:[a-z]+:)?\/\//i.test(m[1]!) || /^(?:https?|ftp):/i.test(m[1]!)) offenders.push(`${file}: ${m[1]}`);
        }
      } else if (/\.css$/.test(file)) {
        for (const m of readFileSync(file, "utf8").matchAll(/url\(\s*["']?([^"')]+)/g)) {
          if (/^(?:[a-z]+:)?\/\//i.test(m[1]!) && !m[1]!.startsWith("data:")) offenders.push(`${file}: ${m[1]}`);
        }
        if (/@import\s+url\(\s*["']?(?:https?:)?\/\//.test(readFileSync(file, "utf8"))) offenders.push(`${file}: @import`);
      } else if (/\.m?js$/.test(file)) {
        for (const m of readFileSync(file, "utf8").matchAll(/(?:import\s*\(|from)\s*["'](https?:\/\/[^"']+)/g)) offenders.push(`${file}: ${m[1]}`);
      }
    }
    expect(offenders).toEqual([]);
  });

  describe("byte budgets (gzip, deterministic)", () => {
    const weigh = createWeigher(dist, "/");

    it("ships only the offline registration (under 1 KB gzip) on the home and 404 pages", () => {
      for (const page of ["index.html", "404.html"]) {
        const weight = weigh(page);
        expect(weight.scripts, page).toEqual([]);
        expect(weight.inlineScripts, page).toBe(1);
        expect(weight.js, page).toBeLessThanOrEqual(BUDGET.registration);
        expect(readFileSync(join(dist, page), "utf8"), page).toContain("serviceWorker.register");
      }
    });

    it("keeps the build sheet within its own budget (85 KB, JS 70 KB) and loads the link codec only on use", () => {
      const sheet = weigh("build-sheet/index.html");
      expect(sheet.js).toBeLessThanOrEqual(BUDGET.buildSheetJs);
      expect(sheet.total).toBeLessThanOrEqual(BUDGET.buildSheetTotal);
      expect(sheet.lazyScripts.some((s: string) => /share\./.test(s))).toBe(true);
    });

    it.each(chapters.filter((c) => c.calculator).map((c) => c.slug))("loads “Save to design” on %s with its first press, under 6 KB gzip", (slug) => {
      const page = weigh(`chapters/${slug}/index.html`);
      const writer = page.lazyScripts.filter((s: string) => /\/(save|saved)\.[\w-]+\.js$/.test(s));
      expect(
        writer.some((s: string) => /\/save\./.test(s)),
        slug,
      ).toBe(true);
      const bytes = writer.reduce((sum: number, s: string) => sum + gzipSync(readFileSync(join(dist, s)), { level: 9 }).length, 0);
      expect(bytes).toBeLessThanOrEqual(SAVE_JS);
    });

    it("loads the search index only when a search runs", () => {
      const search = weigh("search/index.html");
      expect(search.js).toBeLessThanOrEqual(BUDGET.searchJs);
      expect(search.scripts.some((s: string) => s.includes("search-engine"))).toBe(false);
    });

    it.each(chapters.filter((c) => c.calculator && c.islands === 1).map((c) => c.slug))(
      "keeps %s (one calculator) within 60 KB, JS within its budget (25 KB; editors 36 KB)",
      (slug) => {
        const page = weigh(`chapters/${slug}/index.html`);
        expect(page.js).toBeGreaterThan(0);
        expect(page.js).toBeLessThanOrEqual(EDITOR_PAGES.has(slug) ? EDITOR_JS : BUDGET.chapterJs);
        expect(page.total).toBeLessThanOrEqual(BUDGET.chapterTotal);
      },
    );

    it("holds every page's first paint on one request, the site's shared stylesheet (a page's own small one is inline)", () => {
      const all = ["index.html", "404.html", "build-sheet/index.html", "search/index.html", ...chapters.map((c) => `chapters/${c.slug}/index.html`)];
      const shared = new Set<string>();
      for (const path of all) {
        const page = weigh(path);
        expect(page.renderBlocking, path).toBe(1);
        for (const sheet of page.stylesheets) shared.add(String(sheet));
      }
      expect([...shared]).toHaveLength(1);
    });

    it("ships no JavaScript but the registration on chapters without a calculator", () => {
      for (const c of chapters.filter((c) => !c.calculator)) expect(weigh(`chapters/${c.slug}/index.html`).js, c.slug).toBeLessThanOrEqual(BUDGET.registration);
    });

    it("lets pages reference only woff2 fonts, from this site", () => {
      for (const c of chapters) {
        const fonts = weigh(`chapters/${c.slug}/index.html`).fontsReferenced;
        // The math face, cut and renamed after its content at build time (scripts/site/math-font.mjs).
        expect(fonts, c.slug).toEqual([expect.stringMatching(/^\/_astro\/noto-sans-math-latin-400-normal\.[A-Za-z0-9_-]{8}\.woff2$/)]);
      }
    });
  });

  describe("formulas", () => {
    const page = readFileSync(join(dist, "chapters/acceleration/index.html"), "utf8");

    it("are MathML set at build time: no KaTeX JavaScript, stylesheet or TeX source in the page", () => {
      expect(page).toContain("<math ");
      expect(page).not.toMatch(/<script[^>]*katex/i);
      expect(page).not.toContain("<annotation");
      const css = walk(dist)
        .filter((f) => f.endsWith(".css"))
        .map((f) => readFileSync(f, "utf8"))
        .join("\n");
      expect(css).not.toContain(".katex");
      // The chapters' math stylesheet is small enough to travel inside the page.
      expect(page).toMatch(/<style>[^<]*math\{font-family:"?Handbook Math"?,math\}/);
    });

    it("set an exponent as a MathML superscript (a = ω²r)", () => {
      expect(page).toContain("<msup><mi>ω</mi><mn>2</mn></msup>");
    });

    it("come from a single installed KaTeX version, the one rehype-katex uses", () => {
      const require = createRequire(import.meta.url);
      const top = require("katex/package.json").version as string;
      const viaRehype = createRequire(require.resolve("rehype-katex"))("katex/package.json").version as string;
      expect(viaRehype).toBe(top);
      expect(top).toMatch(/^0\.16\./);
    });
  });

  describe("offline cache", () => {
    const sw = () => readFileSync(join(dist, "sw.js"), "utf8");

    // What it precaches (every file a page can use) is checked in delivery.test.ts.
    it("carries a version derived from the content, so a new deploy replaces the old cache", () => {
      expect(sw()).toMatch(/const CACHE = "whirlbook-[0-9a-f]{12}";/);
      expect(sw()).toContain('key.startsWith("whirlbook-") && key !== CACHE');
    });
  });

  it("has no broken internal link on any page (every href resolves to a built file)", () => {
    const broken: string[] = [];
    for (const file of walk(dist).filter((f) => f.endsWith(".html"))) {
      const html = readFileSync(file, "utf8");
      const pageDir = file.slice(0, file.lastIndexOf("/") + 1);
      for (const m of html.matchAll(/<a\b[^>]*\bhref="([^"]*)"/g)) {
        const href = m[1]!.replace(/&amp;/g, "&");
        if (/^(?:[a-z]+:|#)/i.test(href)) continue;
        const path = href.split(/[?#]/)[0]!;
        if (/%7B|%7D|[{}]/i.test(href)) {
          broken.push(`${file.slice(dist.length)}: ${href}`);
          continue;
        }
        const target = path === "" ? file : path.startsWith("/") ? join(dist, path) : join(pageDir, path);
        const candidates = [target, join(target, "index.html")];
        if (!candidates.some((c) => existsSync(c) && !c.endsWith("/"))) broken.push(`${file.slice(dist.length)}: ${href}`);
      }
    }
    expect(broken).toEqual([]);
  });

  it("lists each chapter's sources", () => {
    for (const c of chapters) {
      const html = readFileSync(join(dist, `chapters/${c.slug}/index.html`), "utf8");
      expect(html, c.slug).toContain('id="sources-heading"');
    }
  });
});
