/**
 * The search page in Debian chromium: real queries and the result each lists first, a field hit
 * that opens its calculator with that field in view, and a nonsense word that finds nothing and
 * says so.
 */
import { describe, expect, it } from "vitest";
import { useSite } from "../support/browser.ts";

const site = useSite();

describe("search page", () => {
  it.each([
    { query: "kv", first: "Motor Kv (rpm/V)", href: "/chapters/spin-up/#spin-up-calculator-motorKv" },
    { query: "counterweight", first: "Counterweight mass (g, oz)", href: "/chapters/mass-layout/#mass-calculator" },
    { query: "burst", first: "Estimated burst speed", href: "/chapters/rims/#rim-calculator" },
    { query: "bias", first: "Sensor offset (gₙ)", href: "/chapters/heading-drift/#drift-calculator-bias" },
    { query: "LSB", first: "Resolution (1 LSB) (gₙ)", href: "/chapters/acceleration/#placement-calculator-step" },
    { query: "tip speed", first: "Tip speed", href: "/chapters/rims/#rim-calculator" },
  ])("lists $first first for “$query”", async ({ query, first, href }) => {
    const { page, context, problems } = await site.open(`/search/?q=${encodeURIComponent(query)}`);
    const link = page.locator("#search-results li a").first();
    await expect.poll(() => link.textContent(), { timeout: 10_000 }).toBe(first);
    expect(await link.getAttribute("href")).toBe(href);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("opens the calculator with the field found in view", async () => {
    const { page, context } = await site.open("/search/?q=kv", { width: 1280 });
    await page.locator("#search-results li a").first().click();
    await page.waitForURL(/#spin-up-calculator-motorKv$/);
    await page.waitForFunction(() => document.querySelector("[data-island][data-hydrated]"));
    const box = await page.locator("#spin-up-calculator-motorKv").boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y).toBeGreaterThanOrEqual(0);
    expect(box!.y).toBeLessThan(844);
    await context.close();
  });

  it("keeps the formulas in a page's excerpt", async () => {
    const { page, context } = await site.open("/search/?q=headroom");
    const excerpt = page.locator('#search-results li:has(a[href="/chapters/acceleration/#how-far-out-the-sensor-may-go"]) p').nth(1);
    await expect.poll(() => excerpt.textContent(), { timeout: 10_000 }).toContain("F_s = 200 g_n");
    expect(await excerpt.textContent()).toContain("top speed ω_top");
    await context.close();
  });

  it("finds nothing for a nonsense word, and says so", async () => {
    const { page, context } = await site.open("/search/?q=xqzvwk");
    await expect
      .poll(() => page.textContent("#search-status"), { timeout: 10_000 })
      .toBe("Nothing found for “xqzvwk”: no page or calculator field has that word.");
    expect(await page.locator("#search-results li").count()).toBe(0);
    await context.close();
  });
});

describe("search offline", () => {
  it("finds pages and fields with no network once the offline copy is saved, reading the saved pages", async () => {
    const context = await site.browser().newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.goto(`${site.origin()}/`);
    // Installed and active: every file of the offline copy is saved.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    await context.setOffline(true);
    await page.goto(`${site.origin()}/search/?q=hoop%20stress`);
    const first = page.locator("#search-results li a").first();
    await expect.poll(() => first.textContent(), { timeout: 15_000 }).toMatch(/^Rims and disks/);
    await page.fill("#search-input", "kv");
    await expect.poll(() => first.textContent(), { timeout: 10_000 }).toBe("Motor Kv (rpm/V)");
    await context.close();
  });
});
