/**
 * The steering calculator's simulation in a real browser (Debian chromium via playwright-core):
 * the simulation's code loads only when asked for; a permalink with `sim=1` opens with the simulated
 * move shown, whose figures are read against calc/ run here in Node on the same values; the
 * computations run in a worker, not on the page's main thread; the window-and-depth map marks the
 * best cell calc/ names; axe-core passes in light and dark. How long the longest main-thread task
 * took during the map is printed, not asserted.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { axeViolations, useSite } from "../support/browser.ts";
import { pageLink } from "../../calc/core/calculator.ts";
import { form as steeringForm } from "../../calc/calculators/steering.ts";
import { formatNumber, formatQuantity } from "../../calc/core/units.ts";
import { DEMO_STEERING_SPINNER } from "../../calc/steering/inputs.ts";
import { steeringPath } from "../../calc/steering/path.ts";
import { simulateSteering } from "../../calc/steering/simulate.ts";
import { sweepSteering } from "../../calc/steering/sweep.ts";
import { STATUS_WORDS } from "../../calc/core/check.ts";

const site = useSite();
const { open } = site;
const ID = "#steering-calculator";
const out = (page: Page, name: string) => page.locator(`${ID} [data-out="${name}"]`).first().textContent();

// The invented demo robot with a phase lead of 1.3 rad (the lead its own simulation names is 1.319
// rad, tests/calc/steering/simulate.test.ts) and a distance of 0.8 m. The link writes each value
// in its field's unit so that it reads back exactly, so the page simulates exactly these values.
const values = { ...DEMO_STEERING_SPINNER, phaseLead: 1.3 };
const LINK = `/chapters/steering/${pageLink(steeringForm, values, { pageValues: { sim: "1", dist: "0.8 m" } })}`;
const input = { ...values, commandedDistance: 0.8 };
// The page runs the same functions with a step budget of 100 000 (the demo needs about 1 300 steps).
const expected = simulateSteering(input, { maxSteps: 100_000, revolutions: false });
const path = steeringPath({ input, options: { maxSteps: 100_000 } });
const q = (v: number, kind: Parameters<typeof formatQuantity>[1]) => formatQuantity(v, kind, { system: "metric" }).text;

describe("the steering simulation in the browser", () => {
  it("fetches the simulation's code once the page is idle (not with the page), and shows it only when asked", async () => {
    const { page, context, problems, requests } = await open("/chapters/steering/");
    const simulationChunk = () => requests.filter((url) => /\/_astro\/simulation\.[^/]*\.js$/.test(url));
    const scripts = await page.evaluate(() =>
      [...document.querySelectorAll("script[src], link[rel=modulepreload]")].map((e) => e.getAttribute("src") ?? e.getAttribute("href")),
    );
    expect(scripts.filter((url) => /simulation\./.test(url ?? ""))).toEqual([]);
    await expect.poll(() => simulationChunk().length).toBe(1);
    expect(await page.locator(`${ID} [data-out="simulation"]`).count()).toBe(0);
    await page.locator(`${ID} [data-action="simulate"]`).click();
    await expect.poll(() => page.locator(`${ID} [data-out="sim-speed"]`).count()).toBe(1);
    // Fetched once: the press uses the code fetched at idle.
    expect(simulationChunk()).toHaveLength(1);
    // Computed in a worker: the page's main thread only draws the figures.
    expect(page.workers().map((worker) => new URL(worker.url()).pathname)).toEqual([expect.stringMatching(/^\/_astro\/simulation-worker\.[^/]+\.js$/)]);
    // Shown, the link carries it: the page's URL now says sim=1.
    expect(new URL(page.url()).searchParams.get("sim")).toBe("1");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("opens a permalink with the simulation shown and the figures calc/ gives for the same values", async () => {
    const { page, context, problems } = await open(LINK);
    await expect.poll(() => out(page, "sim-speed")).toBe(q(expected.translationSpeed, "speed"));
    expect(expected.verdict).toBe("holds");
    expect(await out(page, "sim-verdict")).toBe(`${STATUS_WORDS.holds}: ${expected.reason}`);
    expect(await out(page, "sim-acceleration")).toBe(q(expected.peakAcceleration, "acceleration"));
    expect(expected.timeToDistance).not.toBeNull();
    expect(await out(page, "sim-time")).toBe(q(expected.timeToDistance!, "time"));
    expect(await out(page, "sim-spin-lost")).toBe(q(expected.spinLost, "angularSpeed"));
    expect(await out(page, "sim-slip")).toBe(`${formatNumber(expected.slipEnergyShare * 100, 2)} %`);
    expect(await out(page, "sim-direction-error")).toBe(q(expected.directionError, "angle"));
    expect(await out(page, "sim-latency-error")).toBe(q(expected.latencyDirectionError, "angle"));
    expect(await out(page, "sim-lead")).toBe(q(expected.leadToCancel, "angle"));
    expect(await out(page, "sim-energy")).toBe(q(expected.energy.drawn, "energy"));
    expect(await page.inputValue(`${ID}-commandedDistance`)).toBe("0.8 m");
    // The top view: its text alternative and the wobble come from steeringPath.
    expect(await out(page, "path-wobble")).toBe(q(path.wobble, "length"));
    const label = await page.locator(`${ID} [data-out="path-plot"]`).getAttribute("aria-label");
    expect(label).toContain(`ends at (${q(path.legEnds[1]!.x, "length")}, ${q(path.legEnds[1]!.y, "length")})`);
    // A change of the distance follows into the result and the link.
    await page.fill(`${ID}-commandedDistance`, "5 m");
    await expect.poll(() => out(page, "sim-time")).toMatch(/^not within /);
    await expect.poll(() => new URL(page.url()).searchParams.get("dist")).toBe("5 m");
    // The distance field follows the unit system with the rest of the form.
    await page.locator(`${ID}`).getByRole("radio", { name: "US" }).check();
    await expect.poll(() => page.inputValue(`${ID}-commandedDistance`)).not.toBe("5 m");
    expect(await page.inputValue(`${ID}-commandedDistance`)).toMatch(/ (in|ft)$/);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("maps the speed over window and depth and marks the cell calc/ finds fastest", async () => {
    const { page, context, problems } = await open(LINK, { width: 1280 });
    await expect.poll(() => out(page, "sim-speed")).toMatch(/m\/s$/);
    await page.evaluate(() => {
      const w = window as unknown as { longest: number };
      w.longest = 0;
      new PerformanceObserver((list) => {
        for (const entry of list.getEntries()) w.longest = Math.max(w.longest, entry.duration);
      }).observe({ type: "longtask", buffered: false });
    });
    await page.locator(`${ID} [data-action="sweep"]`).click();
    await expect.poll(() => page.locator(`${ID} [data-out="sweep-table"]`).count(), { timeout: 30_000 }).toBe(1);
    const sweep = sweepSteering({ input });
    const best = sweep.cells[sweep.best!.row]![sweep.best!.column]!;
    expect(await out(page, "sweep-best")).toBe(
      `Fastest: a ${q(best.windowWidth, "angle")} window at ${formatNumber(best.depth * 100, 2)} % depth, ${q(best.speed!, "speed")} after ${q(sweep.duration, "time")}.`,
    );
    expect(await page.locator(`${ID} .steer-best`).count()).toBe(1);
    const longest = await page.evaluate(() => (window as unknown as { longest: number }).longest);
    console.log(`steering map in chromium: longest main-thread task ${longest.toFixed(0)} ms (0 = none over 50 ms)`);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("passes axe-core in dark mode at 390 px with the simulation shown", async () => {
    const { page, context, problems } = await open(LINK, { colorScheme: "dark", width: 390 });
    await expect.poll(() => out(page, "sim-speed")).toMatch(/m\/s$/);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });
});
