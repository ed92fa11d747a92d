/**
 * The spin-up calculator in a real browser (Debian chromium via playwright-core): open a permalink
 * and read the times to speed against the closed form, switch the drive type, compare two
 * variants, run a sweep, see errors beside fields, survive a hostile link, open on the figures
 * computed at build time (the same as the live simulation's) and load the comparison and the sweep
 * only when used or linked, pass axe-core in light and dark, and print how long the simulation and
 * a sweep take in chromium (printed, not asserted).
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fileURLToPath } from "node:url";
import { build } from "esbuild";
import { axeViolations, showCalculator, useSite } from "../support/browser.ts";

const site = useSite();
const { origin, open } = site;
const PAGE = "/chapters/spin-up/";
const ID = "#spin-up-calculator";

const out = (page: Page, name: string) => page.locator(`[data-out="${name}"]`).first().textContent();
const param = (page: Page, key: string) => new URL(page.url()).searchParams.get(key);

// The invented demo weapon with the air drag set to 0, so that the closed form applies exactly:
// K_t = 60/(2π·1400) = 6.8209e-3 N·m/A; R + N·D²·R_p = 0.045 + 4 × 0.008 = 0.077 Ω;
// J_eff = 6.3e-4 + 0.95 × 2² × 8e-6 = 6.604e-4 kg·m².
// Current-limited: α = (0.95 × 2 × 6.8209e-3 × (60 − 1.2) − 0.01)/6.604e-4 = 1138.76 rad/s²,
//   until Ω_sw = (16.4 − 60 × 0.077)/(6.8209e-3 × 2) = 863.52 rad/s (8246 rpm), at t_sw = 0.7583 s.
// 50 % of 10 000 rpm (523.60 rad/s) is inside that phase: t_50 = 523.60/1138.76 = 0.4598 s.
// Then τ = 6.604e-4 × 0.077/(0.95 × 4 × 6.8209e-3²) = 0.28763 s towards
//   Ω_∞ = (16.4 − 0.077 × (1.2 + 0.01/(0.95 × 2 × 6.8209e-3)))/(6.8209e-3 × 2) = 1191.05 rad/s (11 374 rpm):
//   t_90 = t_sw − τ·ln((Ω_∞ − 942.48)/(Ω_∞ − 863.52)) = 0.8376 s; t_100 = 0.9950 s.
// Peak battery current N·D·I_lim = 60 A; sag to 16.4 − 0.032 × 60 = 14.48 V.
const DRAG_FREE = `${PAGE}?v=1&u=metric&type=weapon&motors=1&kv=1400rpm/V&rm=45mohm&i0=1.2A&jm=80gcm2&ilim=60A&thr=100pct&cells=4&vcell=4.1V&rcell=8mohm&ratio=2&eff=95pct&j=0.00063kgm2&mass=1.5kg&tf=0.01Nm&drag=0Nm&dragat=10000rpm&rpm=10000rpm&tmax=10s&tip=60mm&vclose=3m/s&teeth=2`;

describe("spin-up calculator in the browser", () => {
  it("answers a permalink with the closed-form times to speed", async () => {
    const { page, context, problems } = await open(DRAG_FREE);
    // The page opened on the demo's figures (computed at build time); the link's values are simulated once the simulation's code has loaded.
    await expect.poll(() => out(page, "time-50")).toBe("460 ms");
    expect(await out(page, "time-90")).toBe("838 ms");
    expect(await out(page, "time-100")).toBe("995 ms");
    // The run stops once settled, 1e-5 short of Ω_∞ = 11 374 rpm.
    expect(await out(page, "top-speed")).toBe("11370 rpm");
    expect(await out(page, "peak-current")).toBe("60.0 A");
    expect(await out(page, "min-voltage")).toBe("14.5 V of 16.4 V");
    expect(await out(page, "regimes")).toContain("0 s to 758 ms: Current limit");
    // ½ J Ω² at the target: 0.5 × 6.3e-4 × 1047.2² = 345 J; tip speed 1047.2 × 0.06 = 62.8 m/s.
    expect(await out(page, "stored-target")).toBe("345 J");
    expect(await out(page, "energy-drag")).toBe("0 J");
    expect(await page.locator(".verdict").first().textContent()).toContain("Holds: reaches the target.");
    expect(await page.inputValue(`${ID}-motorKv`)).toBe("1400 rpm/V");
    expect(await page.locator(`${ID} svg`).count()).toBe(3);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("switches the drive type: the outputs change, the wheel inputs appear, and the URL follows", async () => {
    const { page, context } = await open(PAGE);
    expect(await out(page, "time-100")).toBe("1.01 s");
    expect(await page.locator(`${ID}-wheelRadius`).count()).toBe(0);
    expect(await out(page, "wheels-note")).toContain("Only a whole-body spinner");
    await page.getByRole("radio", { name: /Whole-body spinner/ }).check();
    // The demo spinner (calc doc comment of drivetrainWorkedExample): 3000 rpm in 2.23 s, slipping until 2.22 s.
    await expect.poll(() => out(page, "time-100")).toBe("2.23 s");
    expect(await out(page, "regimes")).toContain("0 s to 2.22 s: Traction");
    expect(await page.inputValue(`${ID}-wheelRadius`)).toBe("18 mm");
    await expect.poll(() => param(page, "type")).toBe("spinner");
    expect(param(page, "rw")).toBe("18mm");
    await page.getByRole("radio", { name: /Spinning weapon/ }).check();
    await expect.poll(() => out(page, "time-100")).toBe("1.01 s");
    await expect.poll(() => param(page, "type")).toBe("weapon");
    expect(param(page, "rw")).toBeNull();
    await context.close();
  });

  it("moves the current limit to the battery or nowhere, shows the stall current, and lets the no-load loss grow with speed", async () => {
    const { page, context, problems } = await open(PAGE);
    await expect.poll(() => out(page, "time-100")).toBe("1.01 s");
    // tests/calc/drivetrain/limits.test.ts: battery limit 0.769 s with 139 A in the motor; no limit 0.619 s at a 213 A stall (16.4 V / 77 mΩ).
    await page.selectOption(`${ID}-limat`, "battery");
    await expect.poll(() => out(page, "time-100")).toBe("769 ms");
    expect(await out(page, "motor-current")).toBe("139 A");
    await expect.poll(() => param(page, "limat")).toBe("battery");
    await page.selectOption(`${ID}-limat`, "none");
    await expect.poll(() => out(page, "stall-current")).toBe("213 A");
    expect(await out(page, "time-100")).toBe("619 ms");
    await page.selectOption(`${ID}-limat`, "motor");
    // I₀ = 1.2 A measured at 10 V, growing with speed: top speed 11 230 rpm instead of 11 270 rpm.
    await page.selectOption(`${ID}-loss`, "speed");
    await expect.poll(() => param(page, "loss")).toBe("speed");
    await expect.poll(() => out(page, "top-speed")).toBe("11230 rpm");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("adds a variant, compares two designs on one chart and in a table, and keeps them in the URL", async () => {
    const { page, context } = await open(PAGE, { width: 1100 });
    await page.getByRole("button", { name: "Add variant 1" }).click();
    await page.selectOption(`${ID}-b-pick`, "cellCount");
    await page.getByRole("button", { name: "Change it in variant 1" }).click();
    await page.fill(`${ID}-b-cellCount`, "6");
    // calc doc comment of compareDrivetrains: 4 cells 1.01 s, 6 cells 0.93 s; six cells is fastest and tops out highest.
    await expect.poll(() => out(page, "cmp-b-time")).toBe("928 ms — fastest");
    expect(await out(page, "cmp-a-time")).toBe("1.01 s");
    expect(await out(page, "cmp-b-top")).toBe("16810 rpm — highest");
    expect(await out(page, "cmp-b-peak")).toBe("60.0 A");
    // One column per design, named; the changed input is a row above the results.
    expect(await page.locator('[data-out="comparison"] thead th').allTextContents()).toEqual(["This design", "Variant 1"]);
    expect(await page.locator('[data-out="comparison"] tbody th').first().textContent()).toBe("Cells in series (S)");
    await expect.poll(() => param(page, "b.cells")).toBe("6");
    expect(param(page, "variants")).toBe("1");
    // The variant follows the design: drag off in the design, variant 1 keeps its six cells (0.920 s, see tests/calc).
    await page.fill(`${ID}-dragTorque`, "0");
    await expect.poll(() => out(page, "cmp-b-time")).toBe("920 ms — fastest");
    const reopened = await open(new URL(page.url()).pathname + new URL(page.url()).search);
    expect(await out(reopened.page, "cmp-b-time")).toBe("920 ms — fastest");
    expect(await reopened.page.inputValue(`${ID}-b-cellCount`)).toBe("6");
    await reopened.context.close();
    await page.getByRole("button", { name: "Remove variant 1" }).click();
    await expect.poll(() => param(page, "variants")).toBeNull();
    await context.close();
  });

  it("runs a 50-point sweep without freezing the page, marks the best gear ratio, and keeps it in the URL", async () => {
    const { page, context } = await open(PAGE);
    const started = Date.now();
    await page.getByRole("button", { name: "Run the sweep" }).click();
    await expect.poll(() => out(page, "sweep-status")).toBe("50 values simulated.");
    const wall = Date.now() - started;
    // sweepDrivetrain on the demo weapon, gear ratio 1 to 4 in 50 points: best at point 16, 1 + 3·16/49 = 1.980, 1.01 s.
    expect(await out(page, "sweep-optimum")).toContain("Best gear ratio: 1.980.");
    expect(await out(page, "sweep-optimum")).toContain("1.01 s");
    await expect.poll(() => param(page, "s.p")).toBe("ratio");
    expect([param(page, "s.from"), param(page, "s.to"), param(page, "s.n")]).toEqual(["1", "4", "50"]);
    const ms = await page.getAttribute('[data-out="sweep-status"]', "data-ms");
    console.log(`[perf] widget sweep in chromium, 50 points, batched: ${ms} ms of computing; click to result ${wall} ms (includes the test's polling)`);
    // A change reruns the sweep by itself.
    await page.fill(`${ID}-sweepPoints`, "11");
    await expect.poll(() => out(page, "sweep-status")).toBe("11 values simulated.");
    await expect.poll(() => param(page, "s.n")).toBe("11");
    await page.getByRole("button", { name: "Hide the sweep" }).click();
    await expect.poll(() => param(page, "s.p")).toBeNull();
    await context.close();
  });

  it("opens a link with a variant and a sweep as it was written", async () => {
    const { page, context, problems } = await open(`${PAGE}?v=1&type=weapon&variants=1&b.ratio=1.5&s.p=cells&s.from=2&s.to=8&s.n=50`);
    // calc doc comment of compareDrivetrains: 1.5:1 reaches 10 000 rpm in 1.22 s.
    expect(await out(page, "cmp-b-time")).toBe("1.22 s");
    await expect.poll(() => out(page, "sweep-status")).toBe("7 values simulated.");
    // 2 and 3 cells never reach 10 000 rpm; from 5 cells on the target comes inside the current-limited
    // phase, so 5, 6, 7 and 8 cells all take α-limited 0.928 s and the first of the tie wins.
    expect(await out(page, "sweep-optimum")).toContain("Best cells in series (S): 5.");
    expect(await out(page, "sweep-optimum")).toContain("928 ms");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("shows a clear error beside a bad field, and a rule across fields beside the field it names", async () => {
    const { page, context } = await open(PAGE);
    for (const [text, message] of [
      ["abc", "Gear ratio must start with a number"],
      ["0", "Gear ratio must be between 0.05 and 100 (got 0)"],
      ["", "Gear ratio is required"],
    ] as const) {
      await page.fill(`${ID}-gearRatio`, text);
      await expect.poll(() => page.locator(`${ID}-gearRatio-error`).textContent()).toContain(message);
      expect(await page.getAttribute(`${ID}-gearRatio`, "aria-invalid")).toBe("true");
      expect(await page.getAttribute(`${ID}-gearRatio`, "aria-describedby")).toContain("spin-up-calculator-gearRatio-error");
    }
    await page.fill(`${ID}-gearRatio`, "2");
    await page.getByRole("radio", { name: /Whole-body spinner/ }).check();
    await page.fill(`${ID}-kineticFriction`, "1.2");
    await expect.poll(() => page.locator(`${ID}-kineticFriction-error`).textContent()).toBe("Sliding coefficient must be at most the grip coefficient (1).");
    const body = (await page.textContent("body")) ?? "";
    expect(body).not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });

  it("treats a hostile query string as text: no script runs, no markup appears", async () => {
    const hostile = `?ratio=${encodeURIComponent('"><img src=x onerror=alert(1)>')}&type=${encodeURIComponent("<b>x</b>")}&b.cells=${encodeURIComponent("<script>alert(2)</script>")}&z.q=1`;
    const { page, context, problems, requests } = await open(`${PAGE}${hostile}`);
    expect(await page.locator("main img").count()).toBe(0);
    expect(await page.inputValue(`${ID}-gearRatio`)).toBe('"><img src=x onerror=alert(1)>');
    expect(await page.inputValue(`${ID}-b-cellCount`)).toBe("<script>alert(2)</script>");
    const notices = (await page.locator(".calc-notices").textContent()) ?? "";
    expect(notices).toContain('drive type "<b>x</b>" is not one this calculator offers');
    expect(notices).toContain('parameters for "z."');
    expect(problems).toEqual([]);
    expect(requests.filter((url) => !url.startsWith(origin()))).toEqual([]);
    await context.close();
  });
});

describe("the spin-up page's figures computed at build time, and what it loads when", () => {
  /** Everything the calculator shows of its result: the bar, the results, the charts' text, and what the charts say to a screen reader. */
  const shown = (page: Page) =>
    page.evaluate((id) => {
      const calc = document.querySelector(id)!;
      const text = (selector: string) => [...calc.querySelectorAll(selector)].map((e) => e.textContent?.replace(/\s+/g, " ").trim());
      return {
        bar: text("[data-result-bar]"),
        results: text(`${id}-results`),
        charts: text(".dt-charts"),
        labels: [...calc.querySelectorAll(".dt-charts [aria-label]")].map((e) => e.getAttribute("aria-label")),
      };
    }, ID);

  it("opens on the default design's figures, the same as the live simulation shows after an edit and its undo, and loads no simulation until then", async () => {
    const { page, context, problems, requests } = await open(PAGE);
    await showCalculator(page, ID);
    const opened = await shown(page);
    expect(opened.results.join(" ")).toContain("1.01 s");
    expect(opened.labels.length).toBeGreaterThan(0);
    // Nothing computed the defaults in the browser: neither the simulation nor the comparison or sweep code came.
    const chunks = () => requests.filter((url) => /\/(simulate|Compare|Sweep)\.[^/]*\.js$/.test(url));
    expect(chunks()).toEqual([]);
    await page.fill(`${ID}-gearRatio`, "3");
    await expect.poll(() => out(page, "time-100")).not.toBe("1.01 s");
    expect(chunks().length).toBeGreaterThan(0);
    await page.fill(`${ID}-gearRatio`, "2");
    await expect.poll(() => out(page, "time-100")).toBe("1.01 s");
    // The charts follow the figures a task later.
    await expect.poll(() => shown(page)).toEqual(opened);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("keeps the comparison and the sweep closed on a fresh page, and opens them at once from a link that holds them", async () => {
    const fresh = await open(PAGE);
    expect(await fresh.page.getByRole("button", { name: "Add variant 1" }).count()).toBe(1);
    expect(await fresh.page.getByRole("button", { name: "Run the sweep" }).count()).toBe(1);
    expect(await fresh.page.locator(`${ID}-sweepFrom`).count()).toBe(0);
    // Set up first: the sweep's fields come without a run.
    await fresh.page.getByRole("button", { name: "Choose what to sweep" }).click();
    await expect.poll(() => fresh.page.inputValue(`${ID}-sweepFrom`)).toBe("1");
    expect(await out(fresh.page, "sweep-status")).toBe("");
    await fresh.context.close();
    const { page, context, problems } = await open(`${PAGE}?v=1&variants=2&b.cells=6&c.ratio=1.5&s.p=ratio&s.from=1&s.to=4&s.n=7`);
    // No click: the variants' editors and the sweep's fields are there, and both run.
    expect(await page.inputValue(`${ID}-b-cellCount`)).toBe("6");
    expect(await page.inputValue(`${ID}-c-gearRatio`)).toBe("1.5");
    expect(await page.inputValue(`${ID}-sweepPoints`)).toBe("7");
    // compareDrivetrains' doc comment: six cells 0.93 s (fastest), 1.5:1 1.22 s.
    await expect.poll(() => out(page, "cmp-b-time")).toBe("928 ms — fastest");
    expect(await out(page, "cmp-c-time")).toBe("1.22 s");
    await expect.poll(() => out(page, "sweep-status")).toBe("7 values simulated.");
    // The link stays as it was given.
    expect([param(page, "variants"), param(page, "b.cells"), param(page, "c.ratio"), param(page, "s.n")]).toEqual(["2", "6", "1.5", "7"]);
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe("spin-up timing in chromium (printed for the record; never asserted)", () => {
  it("times one 10-second simulation and a 50-point sweep", async () => {
    const bundle = await build({
      stdin: {
        contents:
          'import "./calc/core/all-units.ts"; export { simulateSpinUp } from "./calc/drivetrain/simulate.ts"; export { sweepDrivetrain } from "./calc/drivetrain/compare.ts"; export { DEMO_WEAPON, DEMO_SPINNER } from "./calc/drivetrain/demo.ts";',
        resolveDir: fileURLToPath(new URL("../../", import.meta.url)),
        loader: "ts",
      },
      bundle: true,
      format: "iife",
      globalName: "spinUp",
      write: false,
      minify: true,
    });
    const { page, context } = await open("/404.html");
    // Evaluated through the browser's debugging protocol: the pages' security policy blocks inline scripts.
    await page.evaluate(bundle.outputFiles[0]!.text);
    const timing = await page.evaluate(() => {
      // @ts-expect-error injected above
      const { simulateSpinUp, sweepDrivetrain, DEMO_WEAPON, DEMO_SPINNER } = window.spinUp;
      // Chromium rounds performance.now() to 0.1 ms here, so each sample times `each` runs together.
      const median = (fn: () => unknown, samples: number, each: number) => {
        for (let i = 0; i < 3 * each; i++) fn();
        const times: number[] = [];
        for (let i = 0; i < samples; i++) {
          const t = performance.now();
          for (let k = 0; k < each; k++) fn();
          times.push((performance.now() - t) / each);
        }
        times.sort((a, b) => a - b);
        return { median: times[Math.floor(samples / 2)]!, p90: times[Math.floor(samples * 0.9)]! };
      };
      return {
        weapon10s: median(() => simulateSpinUp({ ...DEMO_WEAPON, maxTime: 10 }, { stopAtSteadyState: false }), 25, 20),
        spinner10s: median(() => simulateSpinUp({ ...DEMO_SPINNER, maxTime: 10 }, { stopAtSteadyState: false }), 25, 20),
        weaponSweep50: median(() => sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 0.5, to: 4, points: 50 }), 15, 1),
        spinnerSweep50: median(() => sweepDrivetrain({ base: DEMO_SPINNER, parameter: "wheelRadius", from: 0.008, to: 0.04, points: 50 }), 15, 1),
      };
    });
    const f = (t: { median: number; p90: number }) => `median ${t.median.toFixed(3)} ms, p90 ${t.p90.toFixed(3)} ms`;
    console.log(`[perf] chromium ${site.browser().version()}: 10 s simulation, demo weapon: ${f(timing.weapon10s)} (target < 5 ms)`);
    console.log(`[perf] chromium: 10 s simulation, demo spinner: ${f(timing.spinner10s)} (target < 5 ms)`);
    console.log(`[perf] chromium: 50-point sweep, demo weapon, gear ratio 0.5 to 4: ${f(timing.weaponSweep50)} (target < 100 ms)`);
    console.log(`[perf] chromium: 50-point sweep, demo spinner, wheel radius 8 to 40 mm: ${f(timing.spinnerSweep50)} (target < 100 ms)`);
    expect(timing.weapon10s.median).toBeGreaterThan(0);
    await context.close();
  });
});

describe("accessibility of the spin-up page (axe-core)", () => {
  // Every section open (spinner, two variants, a sweep), with a bad value beside a variant's field.
  const withEverything = `${PAGE}?v=1&type=spinner&variants=2&b.ratio=abc&c.mu=1.2&s.p=offset&s.from=50mm&s.to=100mm&s.n=20`;
  for (const path of [PAGE, withEverything]) {
    for (const colorScheme of ["light", "dark"] as const) {
      it(`finds no violations on ${path} (${colorScheme})`, async () => {
        const { page, context } = await open(path, { colorScheme });
        if (path.includes("s.p=")) await expect.poll(() => out(page, "sweep-status")).toMatch(/values simulated/);
        const result = await axeViolations(page);
        expect(result).toEqual([]);
        await context.close();
      });
    }
  }
});
