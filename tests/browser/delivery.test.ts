/**
 * Delivery as chromium sees it: text arrives brotli-compressed, and each page downloads exactly the
 * KaTeX fonts the build found its math to use (so the offline cache, which holds only those, is
 * complete), the preloaded ones once, all swapping in.
 */
import { describe, expect, it } from "vitest";
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { katexFontUsage } from "../../scripts/site/katex-fonts.mjs";
import { precachedFiles } from "../../scripts/site/precache.mjs";
import { DIST_DIR, useSite, waitForIslands } from "../support/browser.ts";

const site = useSite();
const { origin } = site;

const chapters = readdirSync(join(DIST_DIR, "chapters"));
const fontName = (url: string) => url.replace(/^.*\/(KaTeX_[^.]+)\..*$/, "$1");

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

  it("downloads on each page exactly the fonts the build found in its math, every one of them in the offline cache", async () => {
    const usage = katexFontUsage(DIST_DIR, "/");
    const precached = new Set(precachedFiles(DIST_DIR, "/"));
    const context = await site.browser().newContext({ serviceWorkers: "block", viewport: { width: 390, height: 844 } });
    for (const slug of chapters) {
      const page = await context.newPage();
      const fonts: string[] = [];
      page.on("request", (request) => {
        if (request.url().endsWith(".woff2")) fonts.push(new URL(request.url()).pathname);
      });
      await page.goto(`${origin()}/chapters/${slug}/`);
      await page.evaluate(() => document.fonts.ready);
      await page.waitForLoadState("networkidle");
      const expected = [...usage.pages.get(`chapters/${slug}/index.html`)!.keys()];
      expect(fonts.map(fontName).sort(), slug).toEqual(expected.map(fontName).sort());
      // Requested once each: the preload is the download the stylesheet then uses.
      expect(fonts.length, slug).toBe(new Set(fonts).size);
      for (const font of fonts) expect(precached.has(font.slice(1)), `${slug}: ${font}`).toBe(true);
      const faces = await page.evaluate(() => [...document.fonts].map((f) => `${f.family} ${f.display} ${f.status}`));
      expect(faces.length, slug).toBe(20);
      for (const face of faces) expect(face, slug).toMatch(/^KaTeX_\S+ swap (loaded|unloaded)$/);
      expect(faces.filter((f) => f.endsWith("loaded") && !f.endsWith("unloaded")).length, slug).toBe(expected.length);
      await page.close();
    }
    await context.close();
  });

  it("starts the two faces every chapter uses from the page's preload, the rest from the stylesheet", async () => {
    const context = await site.browser().newContext({ serviceWorkers: "block" });
    const page = await context.newPage();
    await page.goto(`${origin()}/chapters/acceleration/`);
    await page.evaluate(() => document.fonts.ready);
    const started = await page.evaluate(() =>
      performance
        .getEntriesByType("resource")
        .filter((e) => e.name.endsWith(".woff2"))
        .map((e) => `${e.name.replace(/^.*\/(KaTeX_[^.]+)\..*$/, "$1")} from ${(e as PerformanceResourceTiming).initiatorType}`)
        .sort(),
    );
    expect(started).toEqual(["KaTeX_Main-Regular from link", "KaTeX_Math-Italic from link", "KaTeX_Size1-Regular from css"]);
    await context.close();
  });
});
