/**
 * Pit-ready: the build sheet, saved designs, export and import, whole-design links, offline use,
 * search and print, in Debian chromium.
 */
import { describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { cpSync, readFileSync, readdirSync, writeFileSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { startStaticServer } from "../../scripts/static-server.mjs";
import { DIST_DIR, axeViolations, useSite, waitForIslands } from "../support/browser.ts";
import { demoDesign, designToText } from "../../calc/index.ts";
import { LEGACY_KEY as STORE_KEY } from "../../components/design/saved.ts";

const site = useSite();
const { origin } = site;
const scratch = mkdtempSync(join(tmpdir(), "whirlbook-design-"));

async function openSheet(context: BrowserContext, hash = "#demo"): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${origin()}/build-sheet/${hash}`);
  await waitForIslands(page);
  return page;
}

const checkFigure = (page: Page, id: string) => page.locator(`[data-out="${id}-figure"]`).textContent();

describe("build sheet", () => {
  it("runs every check on the demo design", async () => {
    const context = await site.browser().newContext();
    const page = await openSheet(context);
    expect(await page.locator("[data-out=overall]").textContent()).toContain("Fails: at least one check fails.");
    // Same figures as the command line and tests/calc/design.test.ts (same calc code).
    expect(await checkFigure(page, "placement")).toBe("217 gₙ");
    // Nine checks and the mass layout's couple lift.
    expect(await page.locator("li.check").count()).toBe(10);
    const link = await page.locator('[data-check="placement"] a').getAttribute("href");
    expect(link).toMatch(/^\/chapters\/acceleration\/\?v=1&.*r=33\.\d+mm.*#placement-calculator$/);
    await context.close();
  });

  it("saves a design, keeps it across a reload, duplicates it and deletes with undo", async () => {
    const context = await site.browser().newContext();
    const page = await openSheet(context);
    await page.fill("#design-name", "Test robot");
    await page.getByRole("button", { name: "Save in this browser" }).click();
    await expect.poll(() => page.locator(".design-list li").count()).toBe(1);
    await page.reload();
    await waitForIslands(page);
    await expect.poll(() => page.inputValue("#design-name")).toBe("Test robot");
    await page.getByRole("button", { name: "Duplicate Test robot" }).click();
    await expect.poll(() => page.locator(".design-name").allTextContents()).toEqual(["Test robot", "Test robot (copy)"]);
    await page.getByRole("button", { name: "Delete Test robot (copy)" }).click();
    await expect.poll(() => page.locator(".design-list li").count()).toBe(1);
    await page.getByRole("button", { name: "Undo", exact: true }).click();
    await expect.poll(() => page.locator(".design-name").allTextContents()).toEqual(["Test robot", "Test robot (copy)"]);
    await context.close();
  });

  it("exports a file and imports it back; a partly invalid file keeps its valid values and never overwrites without asking", async () => {
    const context = await site.browser().newContext({ acceptDownloads: true });
    const page = await openSheet(context);
    await page.getByRole("button", { name: "Save in this browser" }).click();
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export file" }).click()]);
    const exported = JSON.parse(readFileSync((await download.path())!, "utf8"));
    // The demo itself never changes: what is saved is a named copy.
    expect(exported.name).toBe("Demo copy");
    const fastenersBefore = await checkFigure(page, "fasteners[0]");
    expect(fastenersBefore).toBeTruthy();
    exported.placement.radius = -1;
    exported.fasteners[0].count = 2; // a valid change: two bolts share the load, so the figure moves
    const file = join(scratch, "edited.json");
    writeFileSync(file, JSON.stringify(exported));
    await page.setInputFiles('input[type="file"]', file);
    await expect
      .poll(() => page.locator(".calc-notices").first().textContent())
      .toContain(
        "Accelerometer placement (placement.radius): Sensor radius must be greater than 0 mm and at most 2000 mm (got -1000 mm); the default, 20 mm, was used.",
      );
    // The valid values of the file come through beside the refused one: the fastener check now uses two bolts.
    await expect.poll(() => checkFigure(page, "fasteners[0]")).not.toBe(fastenersBefore);
    expect(await checkFigure(page, "fasteners[0]")).toBeTruthy();
    await page.getByRole("button", { name: "Save in this browser" }).click();
    await expect.poll(() => page.locator('[role="alertdialog"]').textContent()).toContain("already called");
    await page.getByRole("button", { name: "Keep both" }).click();
    await expect.poll(() => page.locator(".design-name").allTextContents()).toEqual(["Demo copy", "Demo copy (2)"]);
    await page.setInputFiles('input[type="file"]', { name: "junk.json", mimeType: "application/json", buffer: Buffer.from("{ not json") });
    await expect.poll(() => page.locator('[role="alert"]').first().textContent()).toContain("junk.json could not be opened: The file is not valid JSON");
    expect(await page.locator(".design-list li").count()).toBe(2);
    await context.close();
  });

  it("opens a copied whole-design link in a fresh browser with the same results, and explains a truncated one", async () => {
    const context = await site.browser().newContext();
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: origin() });
    const page = await openSheet(context);
    await page.fill("#design-name", "Shared robot");
    await page.getByRole("button", { name: "Copy link to this design" }).click();
    const link = await page.inputValue("#design-link");
    expect(link).toMatch(/#d1\.\d+\.[A-Za-z0-9_-]+\.[0-9a-f]{8}$/);
    const figures = await page.locator("[data-out$=-figure]").allTextContents();
    await context.close();

    const fresh = await site.browser().newContext();
    const other = await fresh.newPage();
    await other.goto(link);
    await waitForIslands(other);
    await expect.poll(() => other.inputValue("#design-name")).toBe("Shared robot");
    // A design of the builder's own loads the code of the checks it holds, then shows them.
    await expect.poll(() => other.locator("[data-out$=-figure]").allTextContents()).toEqual(figures);
    expect(await other.locator(".sheet-status").count()).toBe(0);
    expect(await other.locator(".design-list li").count()).toBe(0);
    await other.goto(link.slice(0, link.length - 300));
    await other.reload();
    await waitForIslands(other);
    await expect.poll(() => other.locator('[role="alert"]').first().textContent()).toContain("This design link is cut short");
    await fresh.close();
  });

  it("takes a calculator's state into a new design with “Save to design”", async () => {
    const context = await site.browser().newContext();
    const page = await context.newPage();
    await page.goto(`${origin()}/chapters/acceleration/?v=1&rpm=3000rpm&r=12mm&low=500rpm&res=2pct`);
    await waitForIslands(page);
    await page.getByRole("button", { name: "Save to design" }).click();
    await page.getByRole("dialog").getByRole("button", { name: "Save" }).click();
    await expect.poll(() => page.locator(".calc-status").textContent()).toContain("Saved into “My robot” › Accelerometer placement");
    const sheet = await openSheet(context, "");
    await expect.poll(() => sheet.inputValue("#design-name")).toBe("My robot");
    // 3000 rpm at 12 mm: 314.16² × 0.012 = 1184 m/s² = 121 g (as on the chapter page).
    await expect.poll(() => checkFigure(sheet, "placement")).toBe("121 gₙ");
    await context.close();
  });

  /** A browser whose saved designs are stored as `text` before the build sheet opens. */
  async function withStore(text: string) {
    const context = await site.browser().newContext();
    await context.addInitScript(([key, value]) => localStorage.setItem(key!, value!), [STORE_KEY, text]);
    return { context, page: await openSheet(context, "") };
  }

  // The page is rendered at build time without the browser's storage: what storage adds must come
  // out the same as if the page had been drawn in the browser (hydration keeps the server's markup).
  it("says at once, as an alert in the notice style, that the saved designs could not be read", async () => {
    const { context, page } = await withStore("{not json");
    const alert = page.getByRole("alert");
    await expect.poll(() => alert.textContent()).toContain("The saved designs in this browser could not be read; a copy of the stored data was kept aside.");
    expect(await alert.getAttribute("class")).toBe("calc-notices");
    await alert.getByRole("button", { name: "Dismiss" }).click();
    expect(await page.getByRole("alert").count()).toBe(0);
    await context.close();
  });

  it("opens the readable saved design and lists it, and says how many could not be read", async () => {
    const kept = JSON.parse(designToText({ ...demoDesign(), name: "Kept robot" }));
    const { context, page } = await withStore(
      JSON.stringify({
        designs: [
          { id: "a", design: kept },
          { id: "b", design: { format: "other" } },
        ],
        activeId: "a",
      }),
    );
    const alert = page.getByRole("alert");
    await expect.poll(() => alert.textContent()).toContain("A saved design could not be read; a copy of the stored data was kept aside in this browser.");
    expect(await alert.getAttribute("class")).toBe("calc-notices");
    await expect.poll(() => page.inputValue("#design-name")).toBe("Kept robot");
    expect(await page.locator(".design-list li .design-name").allTextContents()).toEqual(["Kept robot"]);
    expect(await page.locator(".design-list li .design-actions button").count()).toBe(3);
    expect(await page.getByRole("button", { name: "Open Kept robot" }).count()).toBe(1);
    await context.close();
  });

  it("prints on at most two A4 or Letter pages", async () => {
    const context = await site.browser().newContext();
    const page = await openSheet(context);
    await page.emulateMedia({ media: "print", colorScheme: "light" });
    for (const format of ["A4", "Letter"] as const) {
      const pdf = await page.pdf({ format, printBackground: false });
      const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
      expect(pages, format).toBeGreaterThanOrEqual(1);
      expect(pages, format).toBeLessThanOrEqual(2);
    }
    const text = await page.locator("main").textContent();
    expect(text).toContain("Demo: invented 1.4 kg whole-body spinner");
    expect(text).toContain("Safety.");
    await context.close();
  });
});

describe("offline", () => {
  it("serves every page, calculator, the build sheet and search with the network off after one visit", async () => {
    const context = await site.browser().newContext();
    const page = await context.newPage();
    await page.goto(`${origin()}/`);
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.reload();
    await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
    await context.setOffline(true);
    const pages = ["/", "/build-sheet/", "/search/", "/404.html", ...readdirSync(join(DIST_DIR, "chapters")).map((slug) => `/chapters/${slug}/`)];
    for (const path of pages) {
      const response = await page.goto(`${origin()}${path}?v=1`);
      expect(response?.ok(), path).toBe(true);
      expect(await page.locator("h1").count(), path).toBeGreaterThan(0);
      await waitForIslands(page);
    }
    await page.goto(`${origin()}/chapters/acceleration/?v=1&rpm=3000rpm&r=12mm`);
    await waitForIslands(page);
    expect(await page.locator('[data-out="accel-top"]').textContent()).toBe("121 gₙ");
    await page.goto(`${origin()}/search/?q=headroom`);
    await expect.poll(() => page.locator("#search-results li").count(), { timeout: 10_000 }).toBeGreaterThan(0);
    // The steering simulation computes in a worker, whose code comes from the offline copy as well.
    await page.goto(`${origin()}/chapters/steering/?sim=1`);
    await expect.poll(() => page.locator('#steering-calculator [data-out="sim-speed"]').textContent(), { timeout: 10_000 }).toMatch(/ m\/s$/);
    await context.close();
  });
});

describe("a new deploy", () => {
  it("installs beside the old one, says an update is ready, and replaces the old cache on reload", async () => {
    // Serve a copy of the site, visit it, then deploy a "new version" (a service worker whose cache
    // version differs) into the same folder, as a static host would.
    const root = mkdtempSync(join(tmpdir(), "whirlbook-deploy-"));
    cpSync(DIST_DIR, root, { recursive: true });
    const copy = await startStaticServer({ root: `${root}/`, port: 0 });
    const context = await site.browser().newContext();
    const page = await context.newPage();
    await page.goto(copy.url);
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.reload();
    await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
    const before = await page.evaluate(() => caches.keys());
    expect(before).toHaveLength(1);
    const sw = readFileSync(join(root, "sw.js"), "utf8");
    writeFileSync(join(root, "sw.js"), sw.replace(/whirlbook-[0-9a-f]{12}/, "whirlbook-0000000000ff"));
    await page.evaluate(async () => {
      await (await navigator.serviceWorker.getRegistration())!.update();
    });
    const banner = page.locator("#sw-update");
    await expect.poll(() => banner.textContent(), { timeout: 15_000 }).toContain("A new version of the handbook is ready.");
    await Promise.all([page.waitForEvent("load"), banner.getByRole("button", { name: "Reload to update" }).click()]);
    await expect.poll(() => page.evaluate(() => caches.keys()), { timeout: 15_000 }).toEqual(["whirlbook-0000000000ff"]);
    await context.close();
    await copy.close();
  });
});

describe("search", () => {
  it("finds a term and lands on the section that holds it", async () => {
    const context = await site.browser().newContext();
    const page = await context.newPage();
    await page.goto(`${origin()}/search/?q=headroom`);
    await expect.poll(() => page.locator("#search-results li").count(), { timeout: 10_000 }).toBeGreaterThan(0);
    // The calculator field of that name comes first, then the section that explains it.
    const hrefs = await page.locator("#search-results li a").evaluateAll((links) => links.map((a) => a.getAttribute("href")));
    expect(hrefs.slice(0, 2)).toEqual(["/chapters/acceleration/#placement-calculator-margin", "/chapters/acceleration/#how-far-out-the-sensor-may-go"]);
    await page.fill("#search-input", "balance grade");
    // Both balance chapters use the term; the longer mass-layout chapter now ranks just below the quick check.
    await expect.poll(() => page.locator("#search-results li a").first().getAttribute("href"), { timeout: 10_000 }).toMatch(/mass-layout|quick-balance/);
    await context.close();
  });
});

describe("accessibility (axe-core) of the pit pages", () => {
  for (const path of ["/build-sheet/#demo", "/search/?q=headroom"]) {
    for (const colorScheme of ["light", "dark"] as const) {
      it(`finds no violations on ${path} (${colorScheme})`, async () => {
        const context = await site.browser().newContext({ colorScheme, viewport: { width: 390, height: 844 } });
        const page = await context.newPage();
        await page.goto(`${origin()}${path}`);
        await waitForIslands(page);
        await page.waitForTimeout(300);
        const result = await axeViolations(page);
        expect(result).toEqual([]);
        await context.close();
      });
    }
  }
});
