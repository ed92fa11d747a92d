/**
 * The placement calculator in a real browser (Debian chromium via playwright-core): open a
 * permalink, read the outputs, edit, see the URL follow, see errors beside fields, and survive a
 * hostile link. Also runs axe-core on every page.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { axeViolations, useSite } from "../support/browser.ts";

const site = useSite();
const { origin, open } = site;

const out = (page: Page, name: string) => page.locator(`[data-out="${name}"]`).textContent();

describe("accelerometer placement in the browser", () => {
  it("answers a permalink with the right numbers", async () => {
    const { page, context, problems } = await open(
      "/chapters/acceleration/?v=1&u=metric&rpm=3000rpm&low=500rpm&r=12mm&fs=200g&m=20pct&step=0.09765625g&res=2pct&pm=45g&pr=60mm",
    );
    // r_max = 0.8 × 200 g / ω² at 3000 rpm = 15.9 mm; r_min at 500 rpm, 2 % = 8.65 mm (see tests/calc/rotation.test.ts).
    expect(await out(page, "max-radius")).toBe("15.9 mm");
    // With no headroom the edge is F/ω² = 19.9 mm (tests/calc/rotation.test.ts).
    expect(await out(page, "max-radius-bare")).toBe("19.9 mm");
    expect(await out(page, "min-radius")).toBe("8.65 mm");
    expect(await out(page, "accel-top")).toBe("121 gₙ");
    expect(await page.locator(".verdict").textContent()).toContain("Holds.");
    expect(await page.inputValue("#placement-calculator-topSpeed")).toBe("3000 rpm");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("updates outputs and the URL when an input changes", async () => {
    const { page, context } = await open("/chapters/acceleration/?v=1&rpm=3000rpm&r=12mm");
    await page.fill("#placement-calculator-radius", "30 mm");
    await expect.poll(() => page.locator(".verdict").textContent()).toContain("Fails: too far out.");
    expect(await out(page, "accel-top")).toBe("302 gₙ");
    await expect.poll(() => new URL(page.url()).searchParams.get("r")).toBe("30mm");
    expect(new URL(page.url()).searchParams.get("rpm")).toBe("3000rpm");
    await context.close();
  });

  it("shows a clear error beside a bad field and no NaN anywhere", async () => {
    const { page, context } = await open("/chapters/acceleration/");
    for (const [text, message] of [
      ["abc", "Sensor radius must start with a number"],
      ["-5", "Sensor radius must be greater than 0 mm and at most 2000 mm (got -5 mm)"],
      ["", "Sensor radius is required"],
      ["4 kg", 'Sensor radius has a unit "kg" that is not a length unit'],
    ] as const) {
      await page.fill("#placement-calculator-radius", text);
      const error = page.locator("#placement-calculator-radius-error");
      await expect.poll(() => error.textContent()).toContain(message);
      expect(await page.getAttribute("#placement-calculator-radius", "aria-invalid")).toBe("true");
      expect(await page.getAttribute("#placement-calculator-radius", "aria-describedby")).toContain("placement-calculator-radius-error");
    }
    await page.fill("#placement-calculator-topSpeed", "0");
    await expect.poll(() => page.locator("#placement-calculator-topSpeed-error").textContent()).toContain("Top speed must be greater than 0 rpm");
    const body = (await page.textContent("body")) ?? "";
    expect(body).not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });

  it("treats a hostile query string as text: no script runs, no markup appears", async () => {
    const hostile = `?r=${encodeURIComponent('"><img src=x onerror=alert(1)>')}&${encodeURIComponent("<script>alert(2)</script>")}=1&rpm=${encodeURIComponent("javascript:alert(3)")}`;
    const { page, context, problems, requests } = await open(`/chapters/acceleration/${hostile}`);
    expect(await page.locator("main img").count()).toBe(0);
    expect(await page.inputValue("#placement-calculator-radius")).toBe('"><img src=x onerror=alert(1)>');
    expect(await page.locator("#placement-calculator-radius-error").textContent()).toContain("Sensor radius must start with a number");
    expect(await page.locator(".calc-notices").textContent()).toContain("does not use; it was ignored");
    expect(problems).toEqual([]);
    expect(requests.filter((url) => !url.startsWith(origin()))).toEqual([]);
    await context.close();
  });

  it("switches to US units and back", async () => {
    const { page, context } = await open("/chapters/acceleration/?v=1&r=12mm&rpm=3000rpm&low=500rpm&res=2pct");
    await page.getByRole("radio", { name: "US", exact: true }).check();
    await expect.poll(() => page.inputValue("#placement-calculator-radius")).toBe("0.472441 in");
    expect(await out(page, "max-radius")).toBe("0.626 in");
    await expect.poll(() => new URL(page.url()).searchParams.get("u")).toBe("us");
    await page.getByRole("radio", { name: "Metric", exact: true }).check();
    await expect.poll(() => page.inputValue("#placement-calculator-radius")).toBe("12 mm");
    await context.close();
  });

  it("copies a link that reopens the same check", async () => {
    const { page, context } = await open("/chapters/acceleration/?v=1&r=12mm&rpm=3000rpm");
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: origin() });
    await page.fill("#placement-calculator-partMass", "80 g");
    await page.getByRole("button", { name: "Copy link to this check" }).click();
    await expect.poll(() => page.locator(".calc-status").textContent()).toMatch(/Link copied|Copy the selected link/);
    const link = await page.evaluate(() => navigator.clipboard.readText()).catch(() => page.inputValue(".calc-actions input[readonly]"));
    expect(link).toContain("pm=80g");
    const reopened = await open(link.replace(origin(), ""));
    expect(await reopened.page.inputValue("#placement-calculator-partMass")).toBe("80 g");
    expect(await out(reopened.page, "part-force")).toBe(await out(page, "part-force"));
    await reopened.context.close();
    await context.close();
  });
});

describe("accessibility (axe-core)", () => {
  for (const path of ["/", "/chapters/acceleration/", "/chapters/acceleration/?r=abc", "/404.html"]) {
    for (const colorScheme of ["light", "dark"] as const) {
      it(`finds no violations on ${path} (${colorScheme})`, async () => {
        const { page, context } = await open(path, { colorScheme });
        const result = await axeViolations(page);
        expect(result).toEqual([]);
        await context.close();
      });
    }
  }
});
