/**
 * The printed build sheet, in Debian chromium: the demo design printed to PDF on A4 and Letter
 * fits one or two pages, and its QR code, read back from the print view's pixels by a QR reader
 * (jsqr), is a link that reopens the same design with the same values.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import type { BrowserContext, Page } from "playwright-core";
import { demoDesign } from "../../calc/index.ts";
import { designFromFragment } from "../../components/design/share.ts";
import { useSite, waitForIslands } from "../support/browser.ts";

const site = useSite();
const jsqrSource = readFileSync(createRequire(import.meta.url).resolve("jsqr/dist/jsQR.js"), "utf8");

/** A sheet whose print command draws the print view but opens no dialog (headless has none to close). */
async function openSheet(context: BrowserContext, path: string): Promise<Page> {
  const page = await context.newPage();
  await page.addInitScript(() => {
    window.print = () => {};
  });
  await page.goto(`${site.origin()}${path}`);
  await waitForIslands(page);
  return page;
}

/** Counts the pages of a PDF that chromium wrote. */
const pageCount = (pdf: Buffer) => (pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;

/** Reads a QR code from a PNG in a blank page (a canvas and jsqr; no page policy in the way). */
async function readQr(context: BrowserContext, png: Buffer): Promise<string | null> {
  const page = await context.newPage();
  await page.addScriptTag({ content: jsqrSource });
  const text = await page.evaluate(async (data) => {
    const image = new Image();
    image.src = `data:image/png;base64,${data}`;
    await image.decode();
    const canvas = document.createElement("canvas");
    canvas.width = image.naturalWidth;
    canvas.height = image.naturalHeight;
    const context2d = canvas.getContext("2d")!;
    context2d.drawImage(image, 0, 0);
    const pixels = context2d.getImageData(0, 0, canvas.width, canvas.height);
    // @ts-expect-error jsQR is the reader's global, added above
    return (window.jsQR(pixels.data, pixels.width, pixels.height) as { data: string } | null)?.data ?? null;
  }, png.toString("base64"));
  await page.close();
  return text;
}

/** Every check as the print view shows it: verdict, title, figure, rule, result and inputs. */
const printedChecks = (page: Page) => page.locator("li.check").allInnerTexts();

describe("printed build sheet", () => {
  it("prints the demo on one or two A4 or Letter pages, titled by the robot's name, with each check's inputs and nothing screen-only", async () => {
    const context = await site.browser().newContext();
    const page = await openSheet(context, "/build-sheet/#demo");
    await page.getByRole("button", { name: "Print" }).click();
    await page.locator(".print-link svg").waitFor({ state: "attached" });
    await page.emulateMedia({ media: "print", colorScheme: "light" });
    for (const format of ["A4", "Letter"] as const) {
      const pages = pageCount(await page.pdf({ format }));
      expect(pages, format).toBeGreaterThanOrEqual(1);
      expect(pages, format).toBeLessThanOrEqual(2);
    }
    const [printed = ""] = await page.locator("main").allInnerTexts();
    expect(printed.startsWith("Demo: invented 1.4 kg whole-body spinner\n")).toBe(true);
    expect(printed).toMatch(/Build sheet\. Units: metric\. Last changed 2026-11-30\. Printed \d{4}-\d{2}-\d{2}\./);
    expect(printed).toContain("Inputs: Spin speed 2400 rpm");
    expect(printed).toContain("Number of bolts 1 ·");
    for (const screenOnly of [
      "Saved in this browser",
      "The demo design:",
      "Open in the calculator",
      "Designs saved in this browser",
      "Save to design",
      "Copy link",
    ]) {
      expect(printed, screenOnly).not.toContain(screenOnly);
    }
    await context.close();
  });

  it("prints a QR code that a reader decodes to a link reopening the same design, with the same values", async () => {
    // Six device pixels per CSS pixel: about 7 pixels per module of the demo's version-36 code.
    const context = await site.browser().newContext({ deviceScaleFactor: 6 });
    const page = await openSheet(context, "/build-sheet/#demo");
    await page.getByRole("button", { name: "Print" }).click();
    await page.locator(".print-link svg").waitFor({ state: "attached" });
    await page.emulateMedia({ media: "print", colorScheme: "light" });
    const link = await readQr(context, await page.locator(".print-link [data-print=code]").screenshot());
    expect(link).toBe(await page.locator(".print-link").getAttribute("data-address"));
    expect(link!.startsWith(`${site.origin()}/build-sheet/#d1.`)).toBe(true);
    // The link's design is the demo, value for value.
    const reading = designFromFragment(link!.slice(link!.indexOf("#")));
    expect(reading.kind === "design" && reading.reading.ok && reading.reading.design).toEqual(demoDesign());
    const original = await printedChecks(page);

    // Opened in a browser that has never seen the design: the same checks with the same inputs.
    const elsewhere = await site.browser().newContext();
    const reopened = await openSheet(elsewhere, link!.slice(site.origin().length));
    await expect.poll(() => reopened.inputValue("#design-name")).toBe("Demo: invented 1.4 kg whole-body spinner");
    await reopened.getByRole("button", { name: "Print" }).click();
    await reopened.locator(".print-link svg").waitFor({ state: "attached" });
    await reopened.emulateMedia({ media: "print", colorScheme: "light" });
    // The checks' code loads on demand after the design is read: wait for the cards, not only the name.
    await expect.poll(() => printedChecks(reopened)).toEqual(original);
    await elsewhere.close();
    await context.close();
  });

  it("draws the code also when printing starts from the browser's own print command", async () => {
    const context = await site.browser().newContext();
    const page = await openSheet(context, "/build-sheet/#demo");
    await page.evaluate(() => window.dispatchEvent(new Event("beforeprint")));
    await page.locator(".print-link svg").waitFor({ state: "attached" });
    await page.emulateMedia({ media: "print" });
    expect((await page.locator("li.check").allInnerTexts())[0]).toContain("Inputs:");
    expect(await page.locator(".print-link").isVisible()).toBe(true);
    await context.close();
  });
});
