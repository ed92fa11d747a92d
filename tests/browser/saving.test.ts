/**
 * Saving into a design, every path as a builder takes it, in Debian chromium: a calculator opened
 * from the build sheet saves back into that design and entry; a plain chapter visit asks once; the
 * demo is never changed; every save can be undone; two tabs never overwrite each other unseen; an
 * unreadable entry is kept aside once; a full or disabled storage is said, and nothing is shown as
 * saved that was not; the store of the first version is moved without loss.
 */
import { describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { axeViolations, useSite, waitForIslands } from "../support/browser.ts";
import { demoDesign, designToText } from "../../calc/index.ts";
import { ASIDE_PREFIX, DESIGN_PREFIX, LEGACY_KEY } from "../../components/design/saved.ts";
import { readFileSync } from "node:fs";

const site = useSite();
const { origin } = site;

async function open(context: BrowserContext, path: string): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${origin()}${path}`);
  await waitForIslands(page);
  return page;
}

/** Everything this site keeps in the browser's storage. */
const storageOf = (page: Page) => page.evaluate(() => Object.fromEntries(Object.keys(localStorage).map((k) => [k, localStorage.getItem(k)!])));

/** The designs stored, by name: { rev, design }. */
async function storedDesigns(page: Page): Promise<Record<string, { id: string; rev: number; design: Record<string, unknown> }>> {
  const all = await storageOf(page);
  return Object.fromEntries(
    Object.entries(all)
      .filter(([k]) => k.startsWith(DESIGN_PREFIX))
      .map(([, v]) => JSON.parse(v))
      .map((r) => [r.design.name, r]),
  );
}

const status = (page: Page) => page.locator(".calc-status").first();
const figure = (page: Page, id: string) => page.locator(`[data-out="${id}-figure"]`).textContent();
const bolts = (page: Page) => page.getByLabel(/^Number of bolts/);

/** Opens the build sheet on the demo and saves it, as the builder does first. */
async function demoCopy(context: BrowserContext): Promise<Page> {
  const sheet = await open(context, "/build-sheet/#demo");
  await sheet.getByRole("button", { name: "Save in this browser" }).click();
  await expect.poll(() => sheet.locator(".design-name").allTextContents()).toEqual(["Demo copy"]);
  // The copy is a design of this browser's own: its checks' code loads, then its cards show.
  await expect.poll(() => sheet.locator(".sheet-status").count()).toBe(0);
  return sheet;
}

/** Follows a check's "Open in the calculator" link in a new page of the same browser. */
async function openCheck(context: BrowserContext, sheet: Page, check: string): Promise<Page> {
  const href = await sheet.locator(`[data-check="${check}"] .check-link a`).getAttribute("href");
  return open(context, href!);
}

describe("a calculator opened from the build sheet", () => {
  it("says where it saves, carries the stored values exactly, updates that entry (no duplicate), across a reload, and the save can be undone", async () => {
    const context = await site.browser().newContext();
    const sheet = await demoCopy(context);
    const before = (await storedDesigns(sheet))["Demo copy"]!;
    const entries = (before.design.fasteners as unknown[]).length;
    const figureBefore = await figure(sheet, "fasteners[0]");
    await sheet.locator('[data-check="fasteners[0]"] .check-link a').click();
    await waitForIslands(sheet);
    const calc = sheet;
    await expect.poll(() => status(calc).textContent()).toBe("Saving into: “Demo copy” › “Counterweight washers (one M4 bolt)”.");
    // Saved as opened: every stored value comes back exactly (no rounding to the figure shown).
    await calc.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => status(calc).textContent()).toContain("Saved into “Demo copy” › “Counterweight washers (one M4 bolt)” (revision 2)");
    const same = (await storedDesigns(calc))["Demo copy"]!;
    expect(same.design.fasteners).toEqual(before.design.fasteners);
    // Two bolts instead of one, saved after a reload: the same entry changes, nothing is added.
    await bolts(calc).fill("2");
    await calc.reload();
    await waitForIslands(calc);
    await expect.poll(() => status(calc).textContent()).toBe("Saving into: “Demo copy” › “Counterweight washers (one M4 bolt)”.");
    expect(await bolts(calc).inputValue()).toBe("2");
    await calc.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => status(calc).textContent()).toContain("(revision 3). You can undo it from the build sheet.");
    const after = (await storedDesigns(calc))["Demo copy"]!;
    const list = after.design.fasteners as Record<string, unknown>[];
    expect(list).toHaveLength(entries);
    expect(list[0]).toEqual({ ...(before.design.fasteners as Record<string, unknown>[])[0], count: 2 });

    await calc.goto(`${origin()}/build-sheet/`);
    await waitForIslands(calc);
    await expect.poll(() => calc.inputValue("#design-name")).toBe("Demo copy");
    // A saved design loads the code of its checks, then shows them.
    await expect.poll(() => calc.locator('[data-check^="fasteners["]').count()).toBe(entries);
    const figureTwoBolts = await figure(calc, "fasteners[0]");
    expect(figureTwoBolts).not.toBe(figureBefore);
    expect(await calc.locator("#last-save").textContent()).toContain("Fasteners › Counterweight washers (one M4 bolt) saved from its calculator");
    await calc.getByRole("button", { name: "Undo last save" }).click();
    await expect.poll(() => figure(calc, "fasteners[0]")).toBe(figureBefore);
    expect(((await storedDesigns(calc))["Demo copy"]!.design.fasteners as Record<string, unknown>[])[0]!.count).toBe(1);
    await context.close();
  });

  it("copies a link a teammate can open: the calculator's values without the keys of this browser's design", async () => {
    const context = await site.browser().newContext();
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: origin() });
    const sheet = await open(context, "/build-sheet/#demo");
    await sheet.locator('[data-check="placement"] .check-link a').click();
    await waitForIslands(sheet);
    expect(new URL(sheet.url()).searchParams.get("save.to")).toBe("demo"); // this page saves into the demo's copy
    await sheet.getByRole("button", { name: "Copy link to this check" }).click();
    await expect.poll(() => status(sheet).textContent()).toMatch(/Link copied|Copy the selected link/);
    const copied = await sheet.evaluate(() => navigator.clipboard.readText()).catch(() => sheet.inputValue(".calc-actions input[readonly]"));
    const params = new URL(copied).searchParams;
    expect([...params.keys()].filter((k) => k.startsWith("save."))).toEqual([]);
    expect(params.get("r")).toBe(new URL(sheet.url()).searchParams.get("r")); // the values travel
    await context.close();
  });

  it("never changes the demo: the first save makes a named copy and says so", async () => {
    const context = await site.browser().newContext();
    const sheet = await open(context, "/build-sheet/#demo");
    expect(await figure(sheet, "placement")).toBe("217 gₙ");
    await sheet.locator('[data-check="placement"] .check-link a').click();
    await waitForIslands(sheet);
    const calc = sheet;
    await expect
      .poll(() => status(calc).textContent())
      .toBe("Saving into: a copy of “Demo: invented 1.4 kg whole-body spinner” › “Accelerometer placement” (the demo itself never changes).");
    await calc.getByRole("textbox", { name: /^Sensor radius/ }).fill("20 mm");
    await calc.getByRole("button", { name: "Save to design" }).click();
    await expect
      .poll(() => status(calc).textContent())
      .toContain("The demo itself never changes: saved into a new copy of it, “Demo copy”. Saved into “Demo copy” › Accelerometer placement (revision 1).");
    // A second save goes into the copy, not into yet another one.
    await calc.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => status(calc).textContent()).toContain("Saved into “Demo copy” › Accelerometer placement (revision 2)");
    expect(Object.keys(await storedDesigns(calc))).toEqual(["Demo copy"]);
    const copy = (await storedDesigns(calc))["Demo copy"]!.design;
    expect((copy.placement as { radius: number }).radius).toBe(0.02);
    // Everything else of the demo came along.
    expect(copy.fasteners).toEqual(JSON.parse(designToText(demoDesign())).fasteners);

    await sheet.goto(`${origin()}/build-sheet/#demo`);
    await waitForIslands(sheet);
    expect(await figure(sheet, "placement")).toBe("217 gₙ");
    expect(await sheet.locator("li.check").count()).toBe(10); // the demo's ten cards, the couple lift among them
    await context.close();
  });
});

describe("a calculator on a plain chapter visit", () => {
  it("asks once which design, by keyboard, in a dialog that fits 390 px, then saves there without asking again, also after a reload", async () => {
    const context = await site.browser().newContext({ viewport: { width: 390, height: 844 } });
    const page = await open(context, "/chapters/acceleration/?v=1&rpm=3000rpm&r=12mm");
    await page.getByRole("button", { name: "Save to design" }).focus();
    await page.keyboard.press("Enter");
    const dialog = page.getByRole("dialog", { name: "Save Accelerometer placement into which design?" });
    await expect.poll(() => dialog.isVisible()).toBe(true);
    const box = (await dialog.boundingBox())!;
    expect(box.x).toBeGreaterThanOrEqual(0);
    expect(box.x + box.width).toBeLessThanOrEqual(390);
    for (const button of await dialog.getByRole("button").all()) expect((await button.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    expect(await dialog.getByRole("radio", { name: "A new design, named:" }).isChecked()).toBe(true);
    expect(await axeViolations(page)).toEqual([]);
    await dialog.getByRole("textbox", { name: "Name of the new design" }).fill("Pit robot");
    await page.keyboard.press("Enter");
    await expect
      .poll(() => status(page).textContent())
      .toBe("Saved into “Pit robot” › Accelerometer placement (revision 1). You can undo it from the build sheet.");
    expect(await page.getByRole("dialog").count()).toBe(0);
    // Focus is back on the button that opened the dialog.
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe("Save to design");

    await page.reload();
    await waitForIslands(page);
    await expect.poll(() => status(page).textContent()).toBe("Saving into: “Pit robot” › “Accelerometer placement”.");
    await page.getByRole("textbox", { name: /^Sensor radius/ }).fill("15 mm");
    await page.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => status(page).textContent()).toContain("Saved into “Pit robot” › Accelerometer placement (revision 2)");
    const stored = await storedDesigns(page);
    expect(Object.keys(stored)).toEqual(["Pit robot"]);
    expect((stored["Pit robot"]!.design.placement as { radius: number }).radius).toBe(0.015);
    await context.close();
  });

  it("lets the builder pick a saved design and one of its entries, or a new entry; Escape saves nothing", async () => {
    const context = await site.browser().newContext();
    await demoCopy(context);
    const page = await open(context, "/chapters/fasteners/");
    await page.getByRole("button", { name: "Save to design" }).click();
    const dialog = page.getByRole("dialog");
    await expect.poll(() => dialog.isVisible()).toBe(true);
    await page.keyboard.press("Escape");
    await expect.poll(() => status(page).textContent()).toBe("Not saved: no design was chosen.");
    await page.getByRole("button", { name: "Save to design" }).click();
    expect(await dialog.getByRole("radio", { name: "Demo copy" }).isChecked()).toBe(true);
    const entries = (await storedDesigns(page))["Demo copy"]!.design.fasteners as { name: string }[];
    expect(await dialog.locator('input[name="entry"]').count()).toBe(entries.length + 1);
    // Typing a new design's name chooses a new design; choosing the saved one again brings back its entries.
    await dialog.getByRole("textbox", { name: "Name of the new design" }).focus();
    expect(await dialog.getByRole("radio", { name: "A new design, named:" }).isChecked()).toBe(true);
    expect(await dialog.locator('input[name="entry"]').count()).toBe(1);
    await dialog.getByRole("radio", { name: "Demo copy" }).check();
    await dialog.getByRole("radio", { name: `Replace “${entries[1]!.name}”` }).check();
    await dialog.getByRole("button", { name: "Save" }).click();
    await expect.poll(() => status(page).textContent()).toContain(`Saved into “Demo copy” › “${entries[1]!.name}” (revision 2)`);
    const after = (await storedDesigns(page))["Demo copy"]!.design.fasteners as { name: string }[];
    expect(after.map((e) => e.name)).toEqual(entries.map((e) => e.name));
    await expect.poll(() => status(page).textContent()).toContain("revision 2");
    await context.close();
  });
});

describe("two tabs", () => {
  it("never overwrite each other unseen: the second save into a changed entry asks, keeps both; an open build sheet follows", async () => {
    const context = await site.browser().newContext();
    const sheet = await demoCopy(context);
    const first = await openCheck(context, sheet, "fasteners[0]");
    const second = await openCheck(context, sheet, "fasteners[0]");
    await expect.poll(() => status(second).textContent()).toContain("Saving into: “Demo copy”");
    const entries = ((await storedDesigns(sheet))["Demo copy"]!.design.fasteners as unknown[]).length;

    await bolts(first).fill("2");
    await first.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => status(first).textContent()).toContain("(revision 2)");
    // The build sheet left open reads the change (storage event) and says so.
    await expect.poll(() => sheet.locator('.calc-status[role="status"]').textContent()).toContain("was changed in another tab");
    await expect.poll(() => sheet.locator('[data-check="fasteners[0]"] .check-rule').textContent()).toContain("2 ×");

    await bolts(second).fill("3");
    await second.getByRole("button", { name: "Save to design" }).click();
    const dialog = second.getByRole("dialog", { name: "Fasteners was changed elsewhere" });
    await expect.poll(() => dialog.isVisible()).toBe(true);
    await dialog.getByRole("button", { name: "Save as a new entry" }).click();
    await expect.poll(() => status(second).textContent()).toContain("(revision 3)");
    const list = (await storedDesigns(sheet))["Demo copy"]!.design.fasteners as { count: number }[];
    expect(list).toHaveLength(entries + 1);
    expect(list[0]!.count).toBe(2);
    expect(list.at(-1)!.count).toBe(3);
    await expect.poll(() => sheet.locator('[data-check^="fasteners["]').count()).toBe(entries + 1);
    await context.close();
  });

  it("a build sheet that renames a design another tab changed in the same instant does not save over it, and says so", async () => {
    const context = await site.browser().newContext();
    const a = await demoCopy(context);
    // Another tab's write whose storage event has not reached this tab yet (a page gets no event for its own writes).
    await a.evaluate((prefix) => {
      const key = Object.keys(localStorage).find((k) => k.startsWith(prefix))!;
      const record = JSON.parse(localStorage.getItem(key)!);
      localStorage.setItem(key, JSON.stringify({ ...record, rev: record.rev + 1, design: { ...record.design, name: "Renamed in B" } }));
    }, DESIGN_PREFIX);
    await a.fill("#design-name", "Renamed in A");
    const dialog = a.getByRole("alertdialog");
    await expect.poll(() => dialog.textContent()).toContain("was changed in another tab after this sheet read it");
    expect((await storedDesigns(a))["Renamed in B"]).toBeTruthy();
    await dialog.getByRole("button", { name: "Save my version as a copy" }).click();
    await expect.poll(() => a.locator(".design-name").allTextContents()).toEqual(["Renamed in B", "Renamed in A (this tab)"]);
    await context.close();
  });
});

describe("storage faults", () => {
  it("keeps an unreadable entry aside once: loaded 100 times, the storage does not grow", async () => {
    const context = await site.browser().newContext({ acceptDownloads: true });
    // The same unreadable entry is there at every load.
    await context.addInitScript((key) => localStorage.setItem(key, "{unreadable"), `${DESIGN_PREFIX}broken`);
    const page = await open(context, "/build-sheet/");
    await expect.poll(() => page.getByRole("alert").textContent()).toContain("A saved design could not be read; a copy of the stored data was kept aside");
    const size = (all: Record<string, string>) => Object.entries(all).reduce((n, [k, v]) => n + k.length + v.length, 0);
    const first = await storageOf(page);
    for (let i = 0; i < 99; i += 1) {
      await page.reload({ waitUntil: "domcontentloaded" });
      await waitForIslands(page);
    }
    await expect.poll(() => page.getByRole("alert").textContent()).toContain("kept aside");
    const last = await storageOf(page);
    expect(Object.keys(last).sort()).toEqual(Object.keys(first).sort());
    expect(size(last)).toBe(size(first));
    // The way to see it and make room: download what was kept aside, then delete it.
    const kept = page.locator(".designs p", { hasText: "unreadable item(s) kept aside" });
    expect(await kept.textContent()).toContain("1 unreadable item(s) kept aside in this browser (1 KB).");
    const [download] = await Promise.all([page.waitForEvent("download"), kept.getByRole("button", { name: "Download them" }).click()]);
    expect(Object.values(JSON.parse(readFileSync((await download.path())!, "utf8")))).toEqual(["{unreadable"]);
    await kept.getByRole("button", { name: "Delete them" }).click();
    await expect.poll(() => kept.count()).toBe(0);
    expect(Object.keys(await storageOf(page)).filter((k) => k.startsWith(ASIDE_PREFIX))).toEqual([]);
    await context.close();
  }, 150_000);

  it("says the storage is full, with the way out, and shows nothing as saved; once room is made, it saves", async () => {
    const context = await site.browser().newContext();
    const sheet = await open(context, "/build-sheet/#demo");
    await sheet.evaluate(() => {
      for (let size = 1 << 20, i = 0; size >= 16; ) {
        try {
          localStorage.setItem(`filler.${i++}`, "x".repeat(size));
        } catch {
          size >>= 1;
        }
      }
    });
    await sheet.getByRole("button", { name: "Save in this browser" }).click();
    await expect.poll(() => sheet.getByRole("alert").textContent()).toContain("Not saved: this browser's storage for this site is full.");
    expect(await sheet.getByRole("alert").textContent()).toContain("export the designs you want to keep (Export file), then delete them");
    expect(await sheet.locator(".design-list li").count()).toBe(0);
    expect(await sheet.locator('.calc-status[role="status"]').textContent()).not.toContain("Saved");
    expect(await sheet.locator(".sheet-meta").first().textContent()).toContain("The demo design");

    const calc = await open(context, "/chapters/acceleration/");
    await calc.getByRole("button", { name: "Save to design" }).click();
    await calc.getByRole("dialog").getByRole("button", { name: "Save" }).click();
    await expect.poll(() => status(calc).textContent()).toContain("Not saved: this browser's storage for this site is full.");
    await sheet.reload();
    await waitForIslands(sheet);
    expect(await sheet.locator(".design-list li").count()).toBe(0);

    await sheet.evaluate(() => {
      for (const key of Object.keys(localStorage)) if (key.startsWith("filler.")) localStorage.removeItem(key);
    });
    await calc.getByRole("button", { name: "Save to design" }).click();
    await calc.getByRole("dialog").getByRole("button", { name: "Save" }).click();
    await expect.poll(() => status(calc).textContent()).toContain("Saved into “My robot” › Accelerometer placement (revision 1)");
    await context.close();
  });

  it("tells storage that is turned off apart from a full one", async () => {
    const context = await site.browser().newContext();
    await context.addInitScript(() =>
      Object.defineProperty(window, "localStorage", {
        get() {
          throw new DOMException("Access is denied for this document.", "SecurityError");
        },
      }),
    );
    const calc = await open(context, "/chapters/acceleration/");
    await calc.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => status(calc).textContent()).toContain("Not saved: this browser does not let this site store data");
    const sheet = await open(context, "/build-sheet/#demo");
    await sheet.getByRole("button", { name: "Save in this browser" }).click();
    await expect.poll(() => sheet.getByRole("alert").textContent()).toContain("does not let this site store data");
    expect(await sheet.locator(".design-list li").count()).toBe(0);
    await context.close();
  });

  it("reports saved values that were out of range and reset, instead of dropping them silently", async () => {
    const context = await site.browser().newContext();
    const design = JSON.parse(designToText({ ...demoDesign(), name: "Odd robot" }));
    design.placement.radius = -1;
    await context.addInitScript(
      ([key, text]) => {
        if (!sessionStorage.getItem("seeded")) localStorage.setItem(key!, text!);
        sessionStorage.setItem("seeded", "1");
      },
      [`${DESIGN_PREFIX}odd`, JSON.stringify({ id: "odd", rev: 1, design })],
    );
    const page = await open(context, "/build-sheet/");
    await expect.poll(() => page.getByRole("alert").textContent()).toContain("In the saved design “Odd robot”, some values could not be read and were reset");
    expect(await page.getByRole("alert").textContent()).toContain("Sensor radius must be greater than 0 mm");
    await context.close();
  });
});

describe("designs saved by an earlier version (one key for all)", () => {
  it("are moved to one key each without loss, and open as before", async () => {
    const context = await site.browser().newContext();
    const kept = JSON.parse(designToText({ ...demoDesign(), name: "Old robot" }));
    const other = JSON.parse(designToText({ ...demoDesign(), name: "Older robot" }));
    await context.addInitScript(
      ([key, text]) => {
        if (!sessionStorage.getItem("seeded")) localStorage.setItem(key!, text!);
        sessionStorage.setItem("seeded", "1");
      },
      [
        LEGACY_KEY,
        JSON.stringify({
          designs: [
            { id: "o1", design: kept },
            { id: "o2", design: other },
          ],
          activeId: "o2",
        }),
      ],
    );
    // A calculator visited first already offers them.
    const page = await open(context, "/chapters/acceleration/");
    await page.getByRole("button", { name: "Save to design" }).click();
    await expect.poll(() => page.getByRole("dialog").getByRole("radio").allInnerTexts()).toEqual(["", "", ""]);
    expect(await page.getByRole("dialog").locator(".save-dialog-choice label").allTextContents()).toEqual([
      " Old robot",
      " Older robot",
      " A new design, named:",
    ]);
    await page.keyboard.press("Escape");
    await page.goto(`${origin()}/build-sheet/`);
    await waitForIslands(page);
    await expect.poll(() => page.inputValue("#design-name")).toBe("Older robot");
    const stored = await storedDesigns(page);
    expect(stored["Old robot"]).toEqual({ id: "o1", rev: 1, design: kept });
    expect(stored["Older robot"]).toEqual({ id: "o2", rev: 1, design: other });
    expect((await storageOf(page))[LEGACY_KEY]).toBeUndefined();
    await page.reload();
    await waitForIslands(page);
    expect((await page.locator(".design-name").allTextContents()).sort()).toEqual(["Old robot", "Older robot"]);
    await context.close();
  });
});
