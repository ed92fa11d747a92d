/**
 * Checks on the built site in dist/ (`npm test` builds first): every page exists, nothing comes
 * from another origin, the byte budgets hold, and KaTeX is rendered at build time with one version.
 */
import { describe, expect, it } from "vitest";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { join, resolve } from "node:path";
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
  /** The build sheet runs every calculator's code at once (all of calc/ plus the design reader); it has its own, larger budget. */
  buildSheetTotal: 85 * KB,
  buildSheetJs: 70 * KB,
  /** The search page's own script; the index loads only when a search runs. */
  searchJs: 5 * KB,
};

/**
 * Editor and simulation pages (the mass layout, spin-up) have their own JS budget: they carry an
 * editor or an integrator besides the shared calculator parts.
 */
const EDITOR_PAGES = new Set(["mass-layout", "spin-up", "steering"]);
const EDITOR_JS = 36 * KB;

/**
 * Pages over their budget, with the ceiling each may not exceed (measured size plus about 1 %).
 * Each entry is an open problem, not an allowance: remove it when the page fits its budget.
 */
const OVER_BUDGET: Record<string, { js: number; total: number }> = {
  // The calc contract (every public function refuses what it cannot compute, by name) added about
  // 0.9 KB gzip of checks to the code every calculator page shares, and pages with a chart load it as
  // a chunk of its own (+0.3 KB; pages without one are 1.4 KB lighter); the pages below were at or
  // near their budget before. Measured plus about 1 %.
  calibration: { js: 31_050, total: 60 * KB },
  // +50 B: the steering chapter's simulation shares the drift budget, which now loads as a chunk of its own.
  "heading-drift": { js: 26_950, total: 60 * KB },
  "heading-timing": { js: 25_950, total: 60 * KB },
  // Total over 60 KB: the chapter's math markup (HTML 19 KB gzip) with the editor.
  // The weapon-turn chapter's island made the code every calculator page shares 16 B gzip larger,
  // which took fasteners (3 B under) just over its budget and mass-layout over its ceiling.
  fasteners: { js: 25_850, total: 60 * KB },
  // The review's corrections, measured 36 871 → 37 938 B JS and 63 141 → 67 161 B in all: the spin
  // centre (wheels' side grip) and the couple lift, three inputs and their results; the rest of the
  // total is the chapter's new text and math. Measured plus about 1 %.
  "mass-layout": { js: 38_300, total: 67_850 },
  // Measured 38 630 → 39 494 B JS and 66 619 → 69 336 B in all: where the current limit acts and the
  // no-load loss growing with speed (two menus, one input, the stall current), and the chapter's text.
  "spin-up": { js: 39_900, total: 70_050 },
  // Measured 25 424 → 25 627 B JS: the strengths' basis (specified minimum or typical), a menu beside
  // the strengths that the material menu sets, and its value in the check.
  rims: { js: 25_650, total: 60 * KB },
};

/**
 * The build sheet's script over its 70 KB budget: it loads every calculator's check at once (the
 * contract's checks in each, then the weapon-turn check +3.8 KB and the steering check +3.7 KB).
 * Measured 81 844 B JS and 91 093 B in all; ceilings are that plus about 1 %. The way back under
 * budget is structural: load a check's code only for the sections a design holds.
 */
// The review's corrections (spin centre and couple lift in the mass check, where the current limit
// acts and the speed-dependent no-load loss in the spin-up check, the rims' strength basis) took it
// from 81 844 to 84 237 B JS and from 91 093 to 93 840 B in all; measured plus about 1 %.
const BUILD_SHEET_JS_CEILING = 85_100;
const BUILD_SHEET_TOTAL_CEILING = 94_800;

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
    "pagefind/pagefind.js",
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
      expect(sheet.js).toBeLessThanOrEqual(Math.max(BUDGET.buildSheetJs, BUILD_SHEET_JS_CEILING));
      expect(sheet.total).toBeLessThanOrEqual(Math.max(BUDGET.buildSheetTotal, BUILD_SHEET_TOTAL_CEILING));
      expect(sheet.lazyScripts.some((s: string) => /share\./.test(s))).toBe(true);
    });

    it("loads the search index only when a search runs", () => {
      const search = weigh("search/index.html");
      expect(search.js).toBeLessThanOrEqual(BUDGET.searchJs);
      expect(search.scripts.some((s: string) => s.includes("pagefind"))).toBe(false);
    });

    it.each(chapters.filter((c) => c.calculator && c.islands === 1 && !(c.slug in OVER_BUDGET)).map((c) => c.slug))(
      "keeps %s (one calculator) within 60 KB, JS within its budget (25 KB; editors 36 KB)",
      (slug) => {
        const page = weigh(`chapters/${slug}/index.html`);
        expect(page.js).toBeGreaterThan(0);
        expect(page.js).toBeLessThanOrEqual(EDITOR_PAGES.has(slug) ? EDITOR_JS : BUDGET.chapterJs);
        expect(page.total).toBeLessThanOrEqual(BUDGET.chapterTotal);
      },
    );

    it.each(Object.entries(OVER_BUDGET))("keeps %s under its recorded ceiling (over its budget: tracked, must not grow)", (slug, ceiling) => {
      const page = weigh(`chapters/${slug}/index.html`);
      expect(page.js).toBeLessThanOrEqual(ceiling.js);
      expect(page.total).toBeLessThanOrEqual(ceiling.total);
    });

    it("ships no JavaScript but the registration on chapters without a calculator", () => {
      for (const c of chapters.filter((c) => !c.calculator)) expect(weigh(`chapters/${c.slug}/index.html`).js, c.slug).toBeLessThanOrEqual(BUDGET.registration);
    });

    it("lets pages reference only woff2 fonts, from this site", () => {
      for (const c of chapters) {
        const fonts = weigh(`chapters/${c.slug}/index.html`).fontsReferenced;
        for (const font of fonts) expect(font, c.slug).toMatch(/^\/_astro\/KaTeX_[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+\.woff2$/);
      }
    });
  });

  describe("formulas", () => {
    const page = readFileSync(join(dist, "chapters/acceleration/index.html"), "utf8");

    it("are rendered to HTML at build time (no KaTeX JavaScript)", () => {
      expect(page).toContain('class="katex"');
      expect(page).not.toMatch(/<script[^>]*katex/i);
    });

    it("render an exponent with KaTeX 0.16's superscript markup, styled by the same version's CSS", () => {
      // a = ω²r: the 2 sits in a .msupsub/.vlist structure; KaTeX 0.16 CSS sizes it via .sizing.reset-size6.size3.
      expect(page).toMatch(/class="msupsub"/);
      expect(page).toMatch(/class="sizing reset-size6 size3 mtight"/);
      const css = walk(dist)
        .filter((f) => f.endsWith(".css"))
        .map((f) => readFileSync(f, "utf8"))
        .join("\n");
      expect(css).toContain(".katex .sizing.reset-size6.size3");
      expect(css).toContain(".katex .msupsub");
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
