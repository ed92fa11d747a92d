/**
 * Shared set-up for browser tests: serves dist/ on 127.0.0.1 and launches Debian's chromium
 * through playwright-core (no browser download).
 */
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, beforeAll, expect } from "vitest";
import { existsSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { startStaticServer } from "../../scripts/static-server.mjs";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export async function launchBrowser(): Promise<Browser> {
  if (!existsSync(CHROMIUM_PATH)) {
    throw new Error(`chromium not found at ${CHROMIUM_PATH}: install Debian's chromium (apt-get install -y chromium) or set CHROMIUM_PATH`);
  }
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
}

/** The built site's folder: OUT_DIR when set (as for the build), else dist/. */
export const DIST_DIR = process.env.OUT_DIR ? resolve(process.env.OUT_DIR) : fileURLToPath(new URL("../../dist/", import.meta.url));

export async function serveDist(base = "/") {
  return startStaticServer({ root: `${DIST_DIR}/`, port: 0, base });
}

const axeSource = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

/**
 * Runs axe-core on the page (or inside `selector`) and returns its violations as
 * "rule: targets" lines; an empty list means none.
 */
export async function axeViolations(page: Page, selector = "html"): Promise<string[]> {
  // Evaluated through the browser's debugging protocol: the pages' security policy blocks an inline <script>.
  if (!(await page.evaluate(() => "axe" in window))) await page.evaluate(axeSource);
  return page.evaluate(async (within) => {
    // A chapter's blocks past the first screen are drawn only when they come near it
    // (`content-visibility: auto`); a reader sees them drawn, so axe checks them drawn (its colour
    // and size checks read the drawn page), and they are put back as they were afterwards.
    const lazy = [...document.querySelectorAll<HTMLElement>(".lazy-block")];
    for (const block of lazy) block.style.contentVisibility = "visible";
    try {
      // @ts-expect-error axe is injected above
      const r = await window.axe.run(document.querySelector(within), { resultTypes: ["violations"] });
      return r.violations.map((v: { id: string; nodes: { target: string[] }[] }) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
    } finally {
      for (const block of lazy) block.style.removeProperty("content-visibility");
    }
  }, selector);
}

/**
 * Brings a calculator to the screen, as a reader does before using it, and waits until its charts
 * are drawn at the width they are shown at: a calculator is laid out only when it comes near the
 * screen (`content-visibility: auto`), and a chart measures its width then.
 */
export async function showCalculator(page: Page, selector = "section.calc"): Promise<void> {
  // Scrolled to the top of the block that holds it (a reader scrolling down reaches that first): a
  // scroll straight to an element inside a block not yet drawn is placed from the block's real
  // height, past the height held for it, and would leave the block undrawn.
  await page.$eval(selector, (element) => {
    const block = element.closest(".lazy-block") ?? element;
    window.scrollTo(0, block.getBoundingClientRect().top + window.scrollY);
  });
  await expect
    .poll(() =>
      page.$$eval(`${selector} .chart svg`, (svgs) =>
        svgs.every((svg) => {
          const shown = (svg.parentElement as HTMLElement).clientWidth;
          return shown === 0 || (svg as SVGSVGElement).viewBox.baseVal.width <= Math.round(shown) + 1;
        }),
      ),
    )
    .toBe(true);
}

/**
 * One served site and one browser for a test file: registers beforeAll/afterAll and returns
 * `open(path)`, which opens a page on a phone-sized viewport, waits for its islands, and records
 * page errors, console errors, dialogs and every request.
 */
export function useSite() {
  let browser: Browser;
  let server: Awaited<ReturnType<typeof serveDist>>;
  beforeAll(async () => {
    server = await serveDist();
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });
  const origin = () => server.url.replace(/\/$/, "");
  async function open(path: string, options: { colorScheme?: "light" | "dark"; width?: number } = {}) {
    const context = await browser.newContext({ colorScheme: options.colorScheme ?? "light", viewport: { width: options.width ?? 390, height: 844 } });
    const page = await context.newPage();
    const problems: string[] = [];
    page.on("pageerror", (error) => problems.push(`pageerror: ${error.message}`));
    page.on("console", (message) => {
      if (message.type() === "error") problems.push(`console: ${message.text()}`);
    });
    page.on("dialog", (dialog) => {
      problems.push(`dialog: ${dialog.message()}`);
      void dialog.dismiss();
    });
    const requests: string[] = [];
    page.on("request", (request) => requests.push(request.url()));
    await page.goto(`${origin()}${path}`);
    await waitForIslands(page);
    return { page, context, problems, requests };
  }
  return { browser: () => browser, origin, open };
}

/** Waits until every island on the page has hydrated (returns at once on pages without one). */
export async function waitForIslands(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelectorAll("[data-island]:not([data-hydrated])").length === 0);
}
