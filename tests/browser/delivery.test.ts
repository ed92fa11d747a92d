/**
 * Delivery as chromium sees it: text arrives brotli-compressed, and each page with math downloads
 * the one math font once, from its preload, from the offline cache's list.
 */
import { describe, expect, it } from "vitest";
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { mathFontUsage } from "../../scripts/site/math-font.mjs";
import { precachedFiles } from "../../scripts/site/precache.mjs";
import { DIST_DIR, useSite, waitForIslands } from "../support/browser.ts";

const site = useSite();
const { origin } = site;

const chapters = readdirSync(join(DIST_DIR, "chapters"));

describe("delivery in chromium", () => {
  it("receives pages, stylesheets and scripts brotli-compressed", async () => {
    // No service worker: every response comes from the server.
    const context = await site.browser().newContext({ serviceWorkers: "block" });
    const page = await context.newPage();
    const encodings: Record<string, string | undefined> = {};
    page.on("response", async (response) => {
      const url = new URL(response.url());
      if (/(\/|\.html|\.css|\.js)$/.test(url.pathname)) encodings[url.pathname] = (await response.allHeaders())["content-encoding"];
    });
    await page.goto(`${origin()}/chapters/spin-up/`);
    await waitForIslands(page);
    await page.waitForLoadState("networkidle");
    const kinds = Object.keys(encodings).map((path) => path.replace(/^.*(\/|\.html|\.css|\.js)$/, "$1"));
    expect(new Set(kinds)).toEqual(new Set(["/", ".css", ".js"]));
    expect(Object.entries(encodings).filter(([, encoding]) => encoding !== "br")).toEqual([]);
    await context.close();
  });

  it("downloads on each chapter the math font, once, from its preload, and it is in the offline cache", async () => {
    const usage = mathFontUsage(DIST_DIR, "/");
    const precached = new Set(precachedFiles(DIST_DIR, "/"));
    const context = await site.browser().newContext({ serviceWorkers: "block", viewport: { width: 390, height: 844 } });
    for (const slug of chapters) {
      const page = await context.newPage();
      const fonts: string[] = [];
      page.on("request", (request) => {
        if (/\.(woff2?|ttf|otf)(\?|$)/.test(request.url())) fonts.push(request.url());
      });
      await page.goto(`${origin()}/chapters/${slug}/`);
      await page.evaluate(() => document.fonts.ready);
      await page.waitForLoadState("networkidle");
      expect(usage.pages.get(`chapters/${slug}/index.html`), slug).toBe(true);
      // Requested once, from this site: the preload is the download the stylesheet then uses.
      expect(fonts, slug).toEqual(usage.fonts.map((url) => `${origin()}${url}`));
      for (const font of usage.fonts) expect(precached.has(font.slice(1)), `${slug}: ${font}`).toBe(true);
      const faces = await page.evaluate(() => [...document.fonts].map((f) => `${f.family} ${f.display} ${f.status}`));
      expect(faces, slug).toEqual([expect.stringMatching(/^"?Handbook Math"? optional loaded$/)]);
      const started = await page.evaluate(() =>
        performance
          .getEntriesByType("resource")
          .filter((e) => e.name.endsWith(".woff2"))
          .map((e) => (e as PerformanceResourceTiming).initiatorType),
      );
      expect(started, slug).toEqual(["link"]);
      await page.close();
    }
    await context.close();
  });

  it("draws formulas in the math font, exponents smaller than their base", async () => {
    const context = await site.browser().newContext({ serviceWorkers: "block" });
    const page = await context.newPage();
    await page.goto(`${origin()}/chapters/acceleration/`);
    await page.evaluate(() => document.fonts.ready);
    const drawn = await page.evaluate(() => {
      const sup = document.querySelector("math msup") as Element;
      const [base, exponent] = [...sup.children];
      const size = (e: Element | undefined) => Number.parseFloat(getComputedStyle(e as Element).fontSize);
      return {
        family: getComputedStyle(sup).fontFamily,
        checked: document.fonts.check(`16px "Handbook Math"`, "ω"),
        base: size(base),
        exponent: size(exponent),
        raised: (exponent as Element).getBoundingClientRect().bottom < (base as Element).getBoundingClientRect().bottom,
      };
    });
    expect(drawn.family).toMatch(/^"?Handbook Math"?, math$/);
    expect(drawn.checked).toBe(true);
    expect(drawn.exponent).toBeLessThan(drawn.base * 0.8);
    expect(drawn.raised).toBe(true);
    await context.close();
  });
});
