/**
 * The way to an answer on a phone: from the top of a chapter the calculator is one tap away, and
 * while a field is edited the verdict and the numbers that answer the chapter's question stay on
 * screen in the result bar, and follow the edit. At 390 px (a phone) and 1280 px.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { useSite } from "../support/browser.ts";

const site = useSite();
const { open } = site;

/** Whether an element lies wholly inside the viewport. */
async function inView(page: Page, selector: string): Promise<boolean> {
  return page
    .locator(selector)
    .first()
    .evaluate((el) => {
      const r = el.getBoundingClientRect();
      return r.top >= 0 && r.bottom <= window.innerHeight + 0.5 && r.height > 0;
    });
}

/** Every chapter with a calculator, the calculator's anchor and the result bar figure to watch. */
const CHAPTERS = [
  { slug: "acceleration", anchor: "placement-calculator", bar: "accel-top" },
  { slug: "heading-drift", anchor: "drift-calculator", bar: "drift-rev" },
  { slug: "heading-timing", anchor: "timing-calculator", bar: "step" },
  { slug: "calibration", anchor: "calibration-calculator", bar: "radius" },
  { slug: "mass-layout", anchor: "mass-calculator", bar: "offset" },
  { slug: "fasteners", anchor: "fastener-calculator", bar: "sf" },
  { slug: "rims", anchor: "rim-calculator", bar: "sf" },
  { slug: "spin-up", anchor: "spin-up-calculator", bar: "time-100" },
] as const;

describe("the pit flow", () => {
  for (const width of [390, 1280]) {
    it.each(CHAPTERS)(
      `at ${width} px, $slug: one tap from the top reaches the calculator, and its result bar is on screen while a field is edited`,
      async ({ slug, anchor, bar }) => {
        const { page, context, problems } = await open(`/chapters/${slug}/`, { width });
        const link = page.locator(".to-calculator a").first();
        expect(await inView(page, ".to-calculator a")).toBe(true);
        expect(await link.getAttribute("href")).toBe(`#${anchor}`);
        await link.click();
        await expect.poll(() => page.evaluate((id) => Math.round(document.getElementById(id)!.getBoundingClientRect().top), anchor)).toBeLessThanOrEqual(1);
        // The first field of the form (the units switch above it is no field of the design).
        await page.locator(`#${anchor} form input`).first().focus();
        expect(await inView(page, `#${anchor} [data-result-bar]`)).toBe(true);
        expect(await page.locator(`#${anchor} [data-result-bar] [data-bar="${bar}"]`).first().textContent()).toMatch(/\d/);
        expect(problems).toEqual([]);
        await context.close();
      },
    );
  }

  it("keeps the verdict in the bar in step with an edit (placement: moving the sensor out to 30 mm fails it)", async () => {
    const { page, context } = await open(
      "/chapters/acceleration/?v=1&u=metric&rpm=3000rpm&low=500rpm&r=12mm&fs=200g&m=20pct&step=0.09765625g&res=2pct&pm=45g&pr=60mm",
    );
    await page.locator(".to-calculator a").click();
    const verdict = page.locator("#placement-calculator [data-result-bar] [data-bar=verdict]");
    expect(await verdict.textContent()).toBe("Holds");
    // The usable window 8.65–15.9 mm at these values (tests/browser/placement.test.ts, tests/calc/rotation.test.ts).
    expect(await page.locator('#placement-calculator [data-result-bar] [data-bar="window"]').textContent()).toBe("8.65 mm – 15.9 mm");
    await page.fill("#placement-calculator-radius", "30 mm");
    await expect.poll(() => verdict.textContent()).toBe("Fails: too far out");
    // a = ω²r at 3000 rpm and 30 mm = 302 g (the same figure the results show, tests/browser/placement.test.ts).
    expect(await page.locator('#placement-calculator [data-result-bar] [data-bar="accel-top"]').textContent()).toBe("302 gₙ");
    expect(await inView(page, "#placement-calculator [data-result-bar]")).toBe(true);
    await page.fill("#placement-calculator-radius", "abc");
    await expect.poll(() => page.locator("#placement-calculator [data-result-bar]").textContent()).toContain("No result yet: correct the marked field.");
    await context.close();
  });
});
