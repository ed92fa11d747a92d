/**
 * The Content Security Policy in a real browser: every page loads, hydrates, computes and searches
 * without one violation (nor a console error), and script or style injected into a page does not apply.
 */
import { describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { DIST_DIR, useSite, waitForIslands } from "../support/browser.ts";

const site = useSite();
const { origin } = site;

const PAGES = ["/", "/404.html", "/build-sheet/#demo", "/search/", ...readdirSync(join(DIST_DIR, "chapters")).map((slug) => `/chapters/${slug}/`)];

type Watched = { page: Page; context: BrowserContext; violations: () => Promise<string[]>; problems: string[] };

/** A fresh browser context whose pages record policy violations (from their first script on) and console errors. */
async function watched(): Promise<Watched> {
  const context = await site.browser().newContext({ viewport: { width: 390, height: 844 } });
  await context.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { __violations: string[] }).__violations = seen;
    addEventListener("securitypolicyviolation", (event) =>
      seen.push(`${event.effectiveDirective}: ${event.blockedURI || "inline"} (${event.sourceFile}:${event.lineNumber})`),
    );
  });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on("pageerror", (error) => problems.push(`pageerror: ${error.message}`));
  page.on("console", (message) => {
    if (message.type() === "error") problems.push(`console ${message.type()}: ${message.text()}`);
  });
  const violations = () => page.evaluate(() => (window as unknown as { __violations: string[] }).__violations);
  return { page, context, violations, problems };
}

describe("the content security policy", () => {
  it("is broken by no page, calculator or search (no violation, no console error)", async () => {
    const { page, context, violations, problems } = await watched();
    const seen: string[] = [];
    for (const path of PAGES) {
      const response = await page.goto(`${origin()}${path}`);
      expect(response?.ok(), path).toBe(true);
      await waitForIslands(page);
      seen.push(...(await violations()).map((v) => `${path} ${v}`));
    }
    // A calculator recomputing and redrawing its outputs.
    await page.goto(`${origin()}/chapters/acceleration/?v=1&rpm=3000rpm&r=12mm`);
    await waitForIslands(page);
    await page.fill("#placement-calculator-radius", "30 mm");
    await expect.poll(() => page.locator('[data-out="accel-top"]').textContent()).toBe("302 gₙ");
    seen.push(...(await violations()));
    // A search: the engine and the index load and run.
    await page.goto(`${origin()}/search/?q=headroom`);
    await expect.poll(() => page.locator("#search-results li").count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await page.fill("#search-input", "balance grade");
    await expect.poll(() => page.locator("#search-results li a").first().getAttribute("href"), { timeout: 10_000 }).toMatch(/mass-layout/);
    seen.push(...(await violations()));
    expect(seen).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("is sent as a header too, the same policy as the page's own plus frame-ancestors", async () => {
    const { page, context } = await watched();
    for (const path of ["/", "/chapters/spin-up/", "/no-such-page/"]) {
      const response = await page.goto(`${origin()}${path}`);
      const meta = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute("content");
      expect(meta, path).toMatch(/^default-src 'self'; script-src 'self' 'sha256-/);
      expect(response?.headers()["content-security-policy"], path).toBe(`${meta}; frame-ancestors 'none'`);
    }
    await context.close();
  });

  it("blocks script and style injected into a page: an inline script, an event-handler attribute, a script from another origin, a <style> element, a style attribute", async () => {
    const { page, context, violations } = await watched();
    await page.goto(`${origin()}/chapters/acceleration/`);
    await waitForIslands(page);
    // Injected the way a markup injection would arrive: as DOM the page's own code could be tricked into building.
    await page.evaluate(() => {
      const inline = document.createElement("script");
      inline.textContent = "window.__ran = 'inline'";
      document.body.append(inline);
      const img = document.createElement("img");
      img.setAttribute("onerror", "window.__ran = 'handler'");
      img.src = "/no-such-image.png";
      document.body.append(img);
      const foreign = document.createElement("script");
      foreign.src = "http://127.0.0.2:9/x.js";
      document.body.append(foreign);
      // Styles injected as markup: a <style> element and a style attribute (a page's own scripts set
      // styles through the CSSOM, which stays allowed).
      const sheet = document.createElement("style");
      sheet.textContent = "body { visibility: hidden }";
      document.head.append(sheet);
      const p = document.createElement("p");
      p.setAttribute("style", "display: none");
      p.id = "styled";
      document.body.append(p);
      (document.querySelector("main") as HTMLElement).style.outline = "1px solid red";
    });
    // Each is reported once per policy that blocks it: the page's <meta> and the server's header.
    const kinds = async () => [...new Set((await violations()).map((v) => v.replace(/ \(.*$/, "")))].sort();
    await expect
      .poll(kinds)
      .toEqual([
        "script-src-attr: inline",
        "script-src-elem: http://127.0.0.2:9/x.js",
        "script-src-elem: inline",
        "style-src-attr: inline",
        "style-src-elem: inline",
      ]);
    expect(await page.evaluate(() => (window as unknown as { __ran?: string }).__ran)).toBeUndefined();
    const styles = await page.evaluate(() => ({
      body: getComputedStyle(document.body).visibility,
      p: getComputedStyle(document.getElementById("styled") as HTMLElement).display,
      main: getComputedStyle(document.querySelector("main") as HTMLElement).outlineStyle,
    }));
    expect(styles).toEqual({ body: "visible", p: "block", main: "solid" });
    await context.close();
  });
});
