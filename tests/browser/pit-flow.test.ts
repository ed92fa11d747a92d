/**
 * The way to an answer on a phone: from the top of a chapter the calculator is one tap away, and
 * while a field is edited the verdict and the numbers that answer the chapter's question stay on
 * screen in the result bar, and follow the edit. At 390 px (a phone) and 1280 px.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { axeViolations, showCalculator, useSite } from "../support/browser.ts";
import { linkFor } from "../../calc/core/calculator.ts";
import { form as weaponTurnForm } from "../../calc/calculators/weapon-turn.ts";
import { DEMO_VERTICAL_SPINNER_TURN } from "../../calc/weapon/turn-check.ts";

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
  { slug: "heading-trim", anchor: "trim-calculator", bar: "radius" },
  { slug: "heading-timing", anchor: "timing-calculator", bar: "step" },
  { slug: "calibration", anchor: "calibration-calculator", bar: "radius" },
  { slug: "mass-layout", anchor: "mass-calculator", bar: "offset" },
  { slug: "quick-balance", anchor: "balance-calculator", bar: "counterweight" },
  { slug: "fasteners", anchor: "fastener-calculator", bar: "sf" },
  { slug: "rims", anchor: "rim-calculator", bar: "sf" },
  { slug: "spin-up", anchor: "spin-up-calculator", bar: "time-100" },
  { slug: "weapon-turn", anchor: "weapon-turn-calculator", bar: "lift" },
  { slug: "steering", anchor: "steering-calculator", bar: "speed" },
  { slug: "weapon-shaft", anchor: "weapon-shaft-calculator", bar: "sf" },
  { slug: "weapon-hit", anchor: "weapon-hit-calculator", bar: "given" },
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
        // Focusing may scroll the page a frame later: the bar is judged once the page has settled.
        await expect.poll(() => inView(page, `#${anchor} [data-result-bar]`)).toBe(true);
        await expect.poll(() => page.locator(`#${anchor} [data-result-bar] [data-bar="${bar}"]`).first().textContent()).toMatch(/\d/);
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

  it("answers the pit's heading question the way it is asked: 20° a turn ahead at 8 mm, then 10 °/s behind at 2000 rpm with 12 mm", async () => {
    const { page, context, problems } = await open("/chapters/heading-trim/");
    await page.locator(".to-calculator a").click();
    await page.fill("#trim-calculator-assumedRadius", "8 mm");
    await page.fill("#trim-calculator-driftPerTurn", "20°");
    // r̂′ = 8 mm × (1 + 20/360)² = 8.914 mm (tests/calc/drift-trim.test.ts).
    await expect.poll(() => page.locator('#trim-calculator [data-result-bar] [data-bar="radius"]').textContent()).toBe("8.914 mm");
    expect(await page.locator('[data-out="radius"]').textContent()).toBe("8.914 mm");
    await page.selectOption("#trim-calculator-sense", "behind");
    await page.selectOption("#trim-calculator-measure", "second");
    await page.fill("#trim-calculator-assumedRadius", "12 mm");
    await page.fill("#trim-calculator-driftRate", "10 °/s");
    await page.fill("#trim-calculator-angularSpeed", "2000 rpm");
    // 10 °/s at 33.3 turns/s is 0.3° a turn behind: 12 mm × (1 − 0.3/360)² = 11.98 mm.
    await expect.poll(() => page.locator('[data-out="radius"]').textContent()).toBe("11.98 mm");
    await expect.poll(() => new URL(page.url()).searchParams.get("per")).toBe("second");
    // No drift at all: keep the radius, in those words (it read "fell behind 0° … goes up by 0 mm").
    await page.fill("#trim-calculator-driftRate", "0 °/s");
    await expect
      .poll(() => page.locator("#trim-calculator .verdict").textContent())
      .toBe("Keep the firmware radius at 12.00 mm. No drift: the spin-rate estimate is right at this speed.");
    expect(await page.locator('#trim-calculator [data-result-bar] [data-bar="change"]').textContent()).toBe("0 mm");
    expect(await page.locator("#trim-calculator [data-result-bar]").textContent()).toContain("Change");
    expect(await page.locator("#trim-calculator [data-result-bar]").textContent()).not.toContain("Larger by");
    expect(problems).toEqual([]);
    await context.close();
  });

  it.each(["acceleration", "heading-drift", "heading-timing", "calibration", "rims", "spin-up"])(
    "draws the chart text of %s at 11 CSS px or more on a 390 px phone",
    async (slug) => {
      const { page, context } = await open(`/chapters/${slug}/`);
      await showCalculator(page);
      const smallest = () =>
        page.$$eval(".chart svg text", (texts) =>
          Math.min(
            ...texts.map((t) => {
              const svg = (t as SVGTextElement).ownerSVGElement!;
              return parseFloat(getComputedStyle(t).fontSize) * (svg.getBoundingClientRect().width / svg.viewBox.baseVal.width);
            }),
          ),
        );
      await expect.poll(smallest).toBeGreaterThanOrEqual(11);
      await context.close();
    },
  );

  it.each([390, 1280])("lines the spin-up regime strip up with the charts' time axis at %i px", async (width) => {
    const { page, context } = await open("/chapters/spin-up/", { width });
    // The plot area of the speed chart (its first horizontal grid line spans it) and the strip's first and last bands, in CSS px.
    const edges = () =>
      page.evaluate(() => {
        const plot = document.querySelector(".dt-charts .chart .chart-grid line")!.getBoundingClientRect();
        const bands = [...document.querySelectorAll(".dt-strip rect")].map((r) => r.getBoundingClientRect());
        return { plot: [plot.left, plot.right], strip: [bands[0]!.left, bands.at(-1)!.right] };
      });
    await expect
      .poll(async () => {
        const { plot, strip } = await edges();
        return Math.max(Math.abs(plot[0]! - strip[0]!), Math.abs(plot[1]! - strip[1]!));
      })
      .toBeLessThanOrEqual(1);
    await context.close();
  });

  it.each(["spin-up", "fasteners", "heading-trim"])(
    "draws the whole of the %s calculator at 1280 px, where it is wider than the text: its late-drawn box holds it",
    async (slug) => {
      const { page, context } = await open(`/chapters/${slug}/`, { width: 1280 });
      await showCalculator(page);
      // The box drawn late clips what it holds (content-visibility: auto); the calculator and its widest chart lie inside it.
      const sticking = await page.evaluate(() => {
        const island = document.querySelector(".island")!.getBoundingClientRect();
        const parts = [document.querySelector("section.calc")!, ...document.querySelectorAll("section.calc .chart svg")].map((e) => e.getBoundingClientRect());
        return Math.max(...parts.map((r) => Math.max(r.right - island.right, island.left - r.left)));
      });
      expect(sticking).toBeLessThanOrEqual(0.5);
      expect(await page.evaluate(() => document.querySelector("section.calc")!.getBoundingClientRect().width)).toBeGreaterThan(800);
      await context.close();
    },
  );

  it("answers the pit's balance question the way it is asked: 12 g added at 45 mm, then a 180 g battery moved 4 mm against a 30 N wobble force", async () => {
    const { page, context, problems } = await open("/chapters/quick-balance/");
    await page.locator(".to-calculator a").click();
    const bar = (name: string) => page.locator(`#balance-calculator [data-result-bar] [data-bar="${name}"]`);
    await page.fill("#balance-calculator-robotMass", "1.5 kg");
    await page.fill("#balance-calculator-spinSpeed", "2400 rpm");
    await page.fill("#balance-calculator-partMass", "12 g");
    await page.fill("#balance-calculator-partRadius", "45 mm");
    await page.fill("#balance-calculator-counterweightRadius", "50 mm");
    // m_cw = m·r/r_cw = 12 g × 45/50 = 10.8 g; e = 540 g·mm / 1.512 kg = 0.357 mm; 89.8 % of G 100 (tests/calc/quick-balance.test.ts).
    await expect.poll(() => bar("counterweight").textContent()).toBe("10.8 g");
    expect(await bar("verdict").textContent()).toBe("Holds: within the limit");
    expect(await page.locator('#balance-calculator [data-out="offset"]').textContent()).toBe("0.357 mm");
    await page.selectOption("#balance-calculator-grade", "16");
    await expect.poll(() => bar("verdict").textContent()).toBe("Fails: more than 2.5 times the limit");
    await expect.poll(() => new URL(page.url()).searchParams.get("G")).toBe("16");
    await page.selectOption("#balance-calculator-limit", "force");
    await page.selectOption("#balance-calculator-change", "moved");
    await page.fill("#balance-calculator-wobbleForce", "30 N");
    await page.fill("#balance-calculator-partMass", "180 g");
    await page.fill("#balance-calculator-moveDistance", "4 mm");
    // U = 180 g × 4 mm = 720 g·mm; F = U·Ω² = 45.5 N at 2400 rpm, over 30 N by less than × 2.5; m_cw = 720/50 = 14.4 g.
    await expect.poll(() => bar("counterweight").textContent()).toBe("14.4 g");
    expect(await bar("verdict").textContent()).toBe("Marginal: over the limit, by up to 2.5 times (one grade step)");
    expect(await page.locator('#balance-calculator [data-out="force"]').textContent()).toBe("45.5 N");
    await expect.poll(() => new URL(page.url()).searchParams.get("p")).toBe("moved");
    await page.fill("#balance-calculator-partMass", "3 kg");
    await expect.poll(() => page.locator("#balance-calculator [data-result-bar]").textContent()).toContain("No result yet: correct the marked field.");
    expect(await page.locator("#balance-calculator .field--error").count()).toBe(1);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("opens the invented disc robot from its link and answers the turn question: the outer wheels lift at 136 °/s against the drive's 1020 °/s, then in place, then with a light weapon", async () => {
    const { page, context, problems } = await open(`/${linkFor(weaponTurnForm, DEMO_VERTICAL_SPINNER_TURN)}`);
    const bar = (name: string) => page.locator(`#weapon-turn-calculator [data-result-bar] [data-bar="${name}"]`);
    const out = (name: string) => page.locator(`#weapon-turn-calculator [data-out="${name}"]`);
    // ψ̇_lift = 2.3724 rad/s = 135.9 °/s; 2(3.5 − 1)/0.28 = 17.857 rad/s = 1023 °/s; margin 0.133 (tests/calc/weapon/gyroscopic.test.ts).
    await expect.poll(() => bar("lift").textContent()).toBe("136 °/s");
    expect(await bar("drive").textContent()).toBe("1020 °/s");
    expect(await bar("verdict").textContent()).toBe("Fails: a full turn lifts a wheel");
    expect(await out("margin").textContent()).toBe("0.133");
    // J·Ω·ψ̇ = 0.010125 × 837.76 × 2π = 53.3 N·m, over 50 mm: 1070 N (tests/calc/weapon/gyroscopic.test.ts).
    expect(await out("moment").textContent()).toBe("53.3 N·m");
    expect(await out("bearing").textContent()).toBe("1070 N");
    // Turning in place: no centrifugal moment, so m·g·t/2 ÷ J·Ω = 18.67/8.482 = 2.201 rad/s = 126 °/s; the drive 2 × 3.5/0.28 = 25 rad/s = 1432 °/s.
    await page.fill("#weapon-turn-calculator-forwardSpeed", "0 m/s");
    await expect.poll(() => bar("lift").textContent()).toBe("126 °/s");
    expect(await bar("drive").textContent()).toBe("1430 °/s");
    await expect.poll(() => new URL(page.url()).searchParams.get("fv")).toMatch(/^0/);
    // A light weapon, J = 0.0001 kg·m²: H = 0.0838 N·m·s lifts a wheel only at 223 rad/s, 8.9 times the drive's 25 rad/s.
    await page.fill("#weapon-turn-calculator-rotorInertia", "0.0001 kg·m²");
    await expect.poll(() => bar("verdict").textContent()).toBe("Holds: the wheels stay down");
    await page.fill("#weapon-turn-calculator-trackWidth", "6 m");
    await expect.poll(() => page.locator("#weapon-turn-calculator [data-result-bar]").textContent()).toContain("No result yet: correct the marked field.");
    expect(await page.locator("#weapon-turn-calculator .field--error").count()).toBe(1);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("opens a steering permalink with the numbers of the calc tests: 4.69 m/s, 18.9° off course at 0.8 ms latency, and a one-wheel robot's skid lifting at 1857 rpm", async () => {
    const { page, context, problems } = await open("/chapters/steering/?v=1&u=metric&rpm=3000rpm&lat=0.8ms&wheels=1");
    await page.locator(".to-calculator a").click();
    const bar = (name: string) => page.locator(`#steering-calculator [data-result-bar] [data-bar="${name}"]`);
    // v̄ = 2δ·sin 60°/π with δ = 0.25 · 16.4 V · 1100 rpm/V · 18 mm = 8.50 m/s (tests/calc/steering/estimate.test.ts).
    await expect.poll(() => bar("speed").textContent()).toBe("4.69 m/s");
    // Ω(L + 1/(2f)) = 314.16 rad/s × (0.8 ms + 0.25 ms) = 0.330 rad.
    expect(await bar("error").textContent()).toBe("18.9°");
    // √(M g r_w / (J_w + J_m)) = √(1.5 · 9.80665 · 0.018 / 7e-6) = 194.5 rad/s (tests/calc/steering/estimate.test.ts).
    expect(await bar("verdict").textContent()).toBe("Fails: skid lifts");
    expect(await page.locator('#steering-calculator [data-out="skid-lift"]').textContent()).toBe("1857 rpm");
    await page.fill("#steering-calculator-wheelCount", "2");
    await expect.poll(() => bar("verdict").textContent()).toBe("Marginal: push off course");
    await page.locator('#steering-calculator [data-action="simulate"]').click();
    await expect.poll(() => page.locator('#steering-calculator [data-out="sim-speed"]').textContent()).toMatch(/\d m\/s$/);
    expect(await page.locator('#steering-calculator [data-out="sim-spin-lost"]').textContent()).toMatch(/\d/);
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe("number entry on a phone", () => {
  it("opens a numeric keypad and lets the unit be picked from the menu beside the number", async () => {
    const { page, context } = await open("/chapters/acceleration/#placement-calculator", { width: 390 });
    const field = "#placement-calculator-partMass";
    // A decimal keypad where values cannot be negative; the unit is not typed but picked.
    expect(await page.getAttribute(field, "inputmode")).toBe("decimal");
    const menu = page.getByRole("combobox", { name: "Part mass: unit" });
    expect(await menu.inputValue()).toBe("g");
    await page.fill(field, "2");
    await menu.selectOption("oz");
    // The chosen unit is written into the text: 2 oz = 56.70 g (1 oz = 28.349 523 125 g, NIST SP 811).
    await expect.poll(() => page.inputValue(field)).toBe("2 oz");
    await expect.poll(() => new URL(page.url()).searchParams.get("pm")).toBe("2oz");
    // A unit typed on a desktop keyboard still counts, and the menu follows it.
    await page.fill(field, "0.1 lb");
    await expect.poll(() => menu.inputValue()).toBe("lb");
    await context.close();
  });
});
