// How quickly each calculator answers in a real browser: from a typed value (an input event on the
// calculator's first field) to the results changing in the page, and to the next frame, at full speed
// and with the CPU slowed four times (Chrome's throttling, as for a slow phone); the longest task on
// the main thread while editing, and after each on-demand press (a sweep, a simulation, a comparison)
// and the switch of unit system; and, apart, the page load at 4× (before any edit: parsing, style
// and layout of the chapter, scripts and hydration; from a trace, the median of LOAD_RUNS loads, 5
// unless set: the longest task and the blocking time), with the same measure of an empty page
// below the table, the floor no page goes under. A benchmark prints; it never asserts. Target (for
// a person reading it): no task over 50 ms at 4× while editing or after a press; the load as close
// to the empty page's as the chapter allows (Lighthouse's blocking time, `npm run lighthouse`, is
// the load's target).
// Usage: npm run bench (after its build), or alone: node scripts/bench-browser.mjs [runs]
// (BENCH_PAGES=heading-drift,spin-up to time only those chapters)
import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { chromium } from "playwright-core";
import { startStaticServer } from "./static-server.mjs";

const root = fileURLToPath(new URL("../", import.meta.url));
const dist = join(root, "dist");
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const RUNS = Number(process.argv[2] ?? 30);

if (!existsSync(CHROMIUM)) {
  console.log(`browser timings skipped: no chromium at ${CHROMIUM} (set CHROMIUM_PATH)`);
  process.exit(0);
}
if (!existsSync(join(dist, "chapters"))) {
  console.log("browser timings skipped: build the site first (npm run build)");
  process.exit(0);
}

/**
 * The page load at 4× CPU, from a performance trace: every top-level task on the page's main thread
 * from the first parse until 2.5 s after the load event (parse, style, layout, scripts, hydration),
 * as the longest task and the blocking time (the sum of each task's time over 50 ms). A trace adds
 * a little to every task; one load varies a lot, so the bench prints the median of LOAD_RUNS loads.
 */
async function traceLoad(url) {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send("Emulation.setCPUThrottlingRate", { rate: 4 });
  const events = [];
  cdp.on("Tracing.dataCollected", (e) => events.push(...e.value));
  await cdp.send("Tracing.start", { categories: "toplevel,devtools.timeline", transferMode: "ReportEvents" });
  await page.goto(url, { waitUntil: "load" });
  await page.waitForTimeout(2500);
  const done = new Promise((resolve) => cdp.once("Tracing.tracingComplete", resolve));
  await cdp.send("Tracing.end");
  await done;
  await context.close();
  const parse = events.find((e) => e.name === "ParseHTML");
  if (!parse) return null;
  const onMain = events.filter((e) => e.tid === parse.tid && e.dur);
  const taskName = onMain.some((e) => e.name === "ThreadControllerImpl::RunTask") ? "ThreadControllerImpl::RunTask" : "RunTask";
  const tasks = onMain.filter((e) => e.name === taskName && e.ts + e.dur >= parse.ts).map((e) => e.dur / 1000);
  return { longest: Math.max(0, ...tasks), blocking: tasks.reduce((sum, d) => sum + Math.max(0, d - 50), 0) };
}
const LOAD_RUNS = Number(process.env.LOAD_RUNS ?? 5);

/** Collects long tasks (over 50 ms, the browser's own threshold) from the first script on. */
function watchLongTasks() {
  window.__longTasks = [];
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries()) window.__longTasks.push({ start: entry.startTime, duration: entry.duration });
  }).observe({ type: "longtask", buffered: true });
}

/**
 * In the page: edits the calculator's first quantity field `runs` times (alternating its value and
 * 1 % more) and times each edit to the first change of the page outside that field, and to the next
 * frame. Returns the times [ms] and the longest task during the edits.
 */
async function timeEdits(runs) {
  const calc = document.querySelector("section.calc");
  const input = calc?.querySelector('input[type="text"], input:not([type])');
  if (!input) return null;
  const field = input.closest(".field, .quantity-field, label, div") ?? input;
  const original = input.value;
  const match = /^\s*([+-]?[\d.]+)(.*)$/.exec(original);
  if (!match) return null;
  const changed = `${Number((Number(match[1]) * 1.01).toPrecision(6))}${match[2]}`;
  const nextFrame = () => new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
  await nextFrame();
  const from = performance.now();
  const dom = [];
  const frame = [];
  for (let i = 0; i < runs; i += 1) {
    const text = i % 2 === 0 ? changed : original;
    let seen = null;
    const observer = new MutationObserver((records) => {
      if (seen === null && records.some((r) => !field.contains(r.target))) seen = performance.now();
    });
    observer.observe(calc, { subtree: true, childList: true, characterData: true, attributes: true });
    const start = performance.now();
    input.value = text;
    input.dispatchEvent(new Event("input", { bubbles: true }));
    await nextFrame();
    observer.disconnect();
    const end = performance.now();
    dom.push((seen ?? end) - start);
    frame.push(end - start);
  }
  const longest = Math.max(0, ...window.__longTasks.filter((t) => t.start >= from).map((t) => t.duration));
  return { field: input.id, dom, frame, longest };
}

/**
 * Presses `control` as a reader would (scrolled to first) but from the page itself, in a task of its
 * own, so that the tasks counted are the page's: a click sent by the automation runs the
 * automation's own scripts in the page (tens of ms at 4×), which no reader's press does. Returns the
 * longest task from the press until no long task began for a second (10 s at most) [ms].
 */
async function pressFromPage(page, control) {
  await control.scrollIntoViewIfNeeded();
  await page.waitForTimeout(500);
  const before = await control.evaluate(
    (element) =>
      new Promise((resolve) =>
        setTimeout(() => {
          const start = performance.now();
          element.click();
          resolve(start);
        }),
      ),
  );
  const started = Date.now();
  while (Date.now() - started < 10_000) {
    await page.waitForTimeout(250);
    const last = await page.evaluate(() => Math.max(0, ...window.__longTasks.map((t) => t.start + t.duration)));
    const now = await page.evaluate(() => performance.now());
    if (now - Math.max(last, before) > 1000) break;
  }
  return page.evaluate((t0) => Math.max(0, ...window.__longTasks.filter((t) => t.start + t.duration > t0).map((t) => t.duration)), before);
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const ms = (x) => `${x.toFixed(1)}`.padStart(7);

const server = await startStaticServer({ root: `${dist}/`, port: 0 });
const browser = await chromium.launch({ executablePath: CHROMIUM, args: ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run"] });
const only = process.env.BENCH_PAGES?.split(",");
const slugs = readdirSync(join(dist, "chapters"))
  .filter((slug) => !only || only.includes(slug))
  .sort();

console.log(`\nbrowser: input to DOM and to the next frame (median / worst of ${RUNS} edits, ms), longest task while editing and on demand`);
console.log(
  `${"calculator page".padEnd(18)}${"field".padEnd(34)}   1×: dom   frame   worst    4×: dom   frame   worst  task(4×)  load(4×) longest / blocking  on demand (4×)`,
);
for (const slug of slugs) {
  const row = { slug };
  for (const rate of [1, 4]) {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.addInitScript(watchLongTasks);
    const cdp = await context.newCDPSession(page);
    await cdp.send("Emulation.setCPUThrottlingRate", { rate });
    await page.goto(`${server.url}chapters/${slug}/`, { waitUntil: "load" });
    if ((await page.locator("section.calc").count()) === 0) {
      await context.close();
      row.none = true;
      break;
    }
    // Interactive once an island has rendered its results.
    await page.waitForSelector("section.calc [data-out], section.calc [data-bar]", { timeout: 15_000 }).catch(() => {});
    row[rate] = await page.evaluate(timeEdits, RUNS);
    if (rate === 4) {
      // On-demand work: each calculator button that starts a computation (one a press reveals, such
      // as the steering map, included), then the switch to the other unit system, which redraws every
      // field and output.
      const buttons = page.locator("section.calc button").filter({ hasText: /sweep|simulat|run\b|compare|\bmap\b/i });
      const tasks = [];
      const pressed = new Set();
      for (let i = 0; i < (await buttons.count()); i += 1) {
        const button = buttons.nth(i);
        const label = ((await button.textContent()) ?? "").trim().slice(0, 24);
        if (pressed.has(label) || !(await button.isVisible()) || (await button.isDisabled())) continue;
        pressed.add(label);
        tasks.push(`${label}: ${(await pressFromPage(page, button)).toFixed(0)} ms`);
        i = -1; // a press may add buttons before this one: look again from the first
      }
      const other = page.locator('section.calc input[type="radio"]:not(:checked)').first();
      if (await other.count()) tasks.push(`units: ${(await pressFromPage(page, other)).toFixed(0)} ms`);
      row.demand = tasks.join("; ") || "—";
    }
    await context.close();
  }
  if (row.none) continue;
  const loads = [];
  for (let i = 0; i < LOAD_RUNS; i += 1) loads.push(await traceLoad(`${server.url}chapters/${slug}/`));
  const traced = loads.filter(Boolean);
  if (traced.length) row.load = { longest: median(traced.map((l) => l.longest)), blocking: median(traced.map((l) => l.blocking)) };
  const part = (r) => (r ? `${ms(median(r.dom))} ${ms(median(r.frame))} ${ms(Math.max(...r.frame))}` : "   (no quantity field)".padEnd(23));
  const task = row[4] ? `${row[4].longest.toFixed(0)} ms`.padStart(9) : "".padStart(9);
  const load = row.load === undefined ? "".padStart(14) : `${row.load.longest.toFixed(0)} / ${row.load.blocking.toFixed(0)} ms`.padStart(14);
  console.log(`${slug.padEnd(18)}${(row[1]?.field ?? "").slice(0, 33).padEnd(34)}${part(row[1])}   ${part(row[4])}${task} ${load}  ${row.demand}`);
}
// The floor: the same measure on an empty page (one paragraph, no style, no script), served the
// same way. Its load has a task of its own (the browser setting up the page's window and script
// context) that a chapter cannot shorten; a chapter's load reads against this.
const blankRoot = mkdtempSync(join(tmpdir(), "bench-blank-"));
mkdirSync(join(blankRoot, "blank"));
writeFileSync(
  join(blankRoot, "blank", "index.html"),
  '<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>Empty</title></head><body><p>An empty page.</p></body></html>',
);
const blankServer = await startStaticServer({ root: `${blankRoot}/`, port: 0 });
const blank = [];
for (let i = 0; i < LOAD_RUNS; i += 1) blank.push(await traceLoad(`${blankServer.url}blank/`));
const blankTraced = blank.filter(Boolean);
if (blankTraced.length) {
  const floor = `${median(blankTraced.map((l) => l.longest)).toFixed(0)} / ${median(blankTraced.map((l) => l.blocking)).toFixed(0)} ms`;
  console.log(
    `${"(an empty page)".padEnd(18)}${"".padEnd(34)}${"".padEnd(23)}   ${"".padEnd(23)}${"".padStart(9)} ${floor.padStart(14)}  (the floor of the load measure)`,
  );
}
await blankServer.close();
rmSync(blankRoot, { recursive: true, force: true });
await browser.close();
await server.close();
