/**
 * Bad deploys never strand a visitor. Each test serves a copy of the built site and breaks it the
 * way a real deploy can: sw.js left out, or a file of the offline copy left out. A first visitor is
 * told there is no offline copy (and no half-filled cache stays behind); a returning visitor gets
 * the new pages from the site, is told the offline copy was not updated, keeps a complete older
 * offline copy, and gets the fixed deploy when it comes.
 */
import { describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { startStaticServer } from "../../scripts/static-server.mjs";
import { DIST_DIR, useSite } from "../support/browser.ts";

const site = useSite();

/** A copy of the built site in a folder of its own, served on its own port. */
async function deploy() {
  const root = mkdtempSync(join(tmpdir(), "whirlbook-bad-deploy-"));
  cpSync(DIST_DIR, root, { recursive: true });
  const server = await startStaticServer({ root: `${root}/`, port: 0 });
  return { root, server, origin: server.url.replace(/\/$/, "") };
}

/** Removes a file and its compressed copies from a deploy. */
function remove(root: string, path: string) {
  for (const suffix of ["", ".br", ".gz"]) rmSync(join(root, path + suffix), { force: true });
}

/** Changes a file of a deploy (its compressed copies go: they would be the old text). */
function edit(root: string, path: string, change: (text: string) => string) {
  const text = readFileSync(join(root, path), "utf8");
  const changed = change(text);
  expect(changed).not.toBe(text);
  remove(root, path);
  writeFileSync(join(root, path), changed);
}

/** A deploy whose offline copy has a new version (what any change to the site gives sw.js). */
function newVersion(root: string, version: string) {
  edit(root, "sw.js", (text) => text.replace(/whirlbook-[0-9a-f]{12}/, `whirlbook-${version}`));
}

/** A second edition of the home page, to tell which deploy a page came from. */
const SECOND_EDITION = (text: string) => text.replace("<h1>Whirlbook</h1>", "<h1>Whirlbook, second edition</h1>");

/** Opens a page, recording uncaught errors (an unhandled rejection counts). */
async function visit(context: BrowserContext, url: string) {
  const page = await context.newPage();
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(error.message));
  await page.goto(url);
  return { page, errors };
}

/** Visits until the offline copy is installed and controls the page: a returning visitor. */
async function returningVisitor(context: BrowserContext, origin: string) {
  const { page, errors } = await visit(context, `${origin}/`);
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
  return { page, errors };
}

/** Waits until no new version is being installed (checked twice, a moment apart). */
async function noInstallRunning(page: Page) {
  const installing = () => page.evaluate(async () => Boolean((await navigator.serviceWorker.getRegistration())?.installing));
  for (let i = 0; i < 2; i += 1) {
    await expect.poll(installing, { timeout: 15_000 }).toBe(false);
    await page.waitForTimeout(300);
  }
}

const notice = (page: Page) => page.locator("#sw-notice");
const heading = (page: Page) => page.locator("h1").textContent();
const cacheNames = (page: Page) => page.evaluate(() => caches.keys());

describe("a deploy without sw.js", () => {
  it("tells a first visitor there is no offline copy, without an uncaught error", async () => {
    const { root, server, origin } = await deploy();
    remove(root, "sw.js");
    const context = await site.browser().newContext();
    const { page, errors } = await visit(context, `${origin}/`);
    await expect
      .poll(() => notice(page).textContent(), { timeout: 10_000 })
      .toBe("Offline copy unavailable: /sw.js could not be loaded (HTTP 404). The handbook works while you are online. Dismiss");
    expect(await page.evaluate(async () => (await navigator.serviceWorker.getRegistration()) ?? null)).toBeNull();
    await notice(page).getByRole("button", { name: "Dismiss" }).click();
    expect(await notice(page).count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
    await server.close();
  });

  it("gives a returning visitor the new pages and says the offline copy was not updated", async () => {
    const { root, server, origin } = await deploy();
    const context = await site.browser().newContext();
    const { page, errors } = await returningVisitor(context, origin);
    expect(await heading(page)).toBe("Whirlbook");
    edit(root, "index.html", SECOND_EDITION);
    remove(root, "sw.js");
    await page.reload();
    expect(await heading(page)).toBe("Whirlbook, second edition");
    await expect
      .poll(() => notice(page).textContent(), { timeout: 10_000 })
      .toBe("Offline copy not updated: /sw.js could not be loaded (HTTP 404). Your saved copy still works offline. Dismiss");
    // Offline, the copy saved earlier is served, whole.
    await context.setOffline(true);
    await page.goto(`${origin}/`);
    expect(await heading(page)).toBe("Whirlbook");
    expect(await notice(page).count()).toBe(0);
    expect((await page.goto(`${origin}/chapters/rims/`))?.ok()).toBe(true);
    expect(errors).toEqual([]);
    await context.close();
    await server.close();
  });
});

describe("a deploy missing a file of the offline copy", () => {
  it("tells a first visitor which file is missing and leaves no partial cache behind", async () => {
    const { root, server, origin } = await deploy();
    remove(root, "chapters/rims/index.html");
    const context = await site.browser().newContext();
    const { page, errors } = await visit(context, `${origin}/`);
    await expect
      .poll(() => notice(page).textContent(), { timeout: 15_000 })
      .toBe("Offline copy unavailable: /chapters/rims/ could not be downloaded (HTTP 404). The handbook works while you are online. Dismiss");
    await expect.poll(() => cacheNames(page)).toEqual([]);
    expect(await page.evaluate(() => navigator.serviceWorker.controller)).toBeNull();
    expect(errors).toEqual([]);
    await context.close();
    await server.close();
  });

  it("gives a returning visitor the new pages, keeps the older offline copy whole, and installs the fixed deploy", async () => {
    const { root, server, origin } = await deploy();
    const context = await site.browser().newContext();
    const { page, errors } = await returningVisitor(context, origin);
    const saved = await cacheNames(page);
    expect(saved).toHaveLength(1);

    // The broken deploy: a new version whose offline copy cannot be complete.
    edit(root, "index.html", SECOND_EDITION);
    remove(root, "chapters/rims/index.html");
    newVersion(root, "00000000000a");
    await page.reload();
    expect(await heading(page)).toBe("Whirlbook, second edition");
    await expect
      .poll(() => notice(page).textContent(), { timeout: 15_000 })
      .toBe("Offline copy not updated: /chapters/rims/ could not be downloaded (HTTP 404). Your saved copy still works offline. Dismiss");
    await expect.poll(() => cacheNames(page)).toEqual(saved);

    // Offline, the older copy is served whole: its home page and the page the new deploy lacks.
    await context.setOffline(true);
    await page.goto(`${origin}/`);
    expect(await heading(page)).toBe("Whirlbook");
    expect((await page.goto(`${origin}/chapters/rims/`))?.ok()).toBe(true);
    await context.setOffline(false);

    // The fixed deploy reaches the same visitor. Its sw.js goes in first and the missing page last,
    // after any install of the broken version still running has failed (each visit above retried it).
    newVersion(root, "00000000000b");
    await noInstallRunning(page);
    cpSync(join(DIST_DIR, "chapters/rims/index.html"), join(root, "chapters/rims/index.html"));
    await page.goto(`${origin}/`);
    expect(await heading(page)).toBe("Whirlbook, second edition");
    const banner = page.locator("#sw-update");
    await expect.poll(() => banner.textContent(), { timeout: 15_000 }).toContain("A new version of the handbook is ready.");
    await Promise.all([page.waitForEvent("load"), banner.getByRole("button", { name: "Reload to update" }).click()]);
    await expect.poll(() => cacheNames(page), { timeout: 15_000 }).toEqual(["whirlbook-00000000000b"]);
    await context.setOffline(true);
    await page.goto(`${origin}/`);
    expect(await heading(page)).toBe("Whirlbook, second edition");
    expect(errors).toEqual([]);
    await context.close();
    await server.close();
  });
});
