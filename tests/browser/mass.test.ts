/**
 * The mass-layout calculator in a real browser (Debian chromium via playwright-core): build a
 * three-part layout from the editor, read the centre of mass, apply the counterweight, reopen the
 * permalink and get the same numbers; errors beside fields; a malformed or hostile link; keyboard
 * reordering; and axe-core on the page in light and dark.
 */
import { describe, expect, it } from "vitest";
import type { Locator, Page } from "playwright-core";
import { axeViolations, useSite } from "../support/browser.ts";

const site = useSite();
const { origin, open } = site;
const PAGE = "/chapters/mass-layout/";

const out = (page: Page, name: string) => page.locator(`[data-out="${name}"]`).first().textContent();
const card = (page: Page, index: number) => page.locator(".mass-parts details").nth(index);
const input = (c: Locator, name: string) => c.locator(`[id$="-${name}"]`);
const OUTPUTS = ["total-mass", "com-x", "com-y", "com-z", "offset", "inertia-com", "unbalance", "grade", "grade-met", "sensor-true", "sensor-drift"];

describe("mass layout in the browser", () => {
  it("builds a three-part layout from the editor, applies the counterweight, and reopens the link to the same numbers", async () => {
    const { page, context, problems } = await open(`${PAGE}?v=1&l=v1`);
    expect(await page.locator(".mass-parts details").count()).toBe(0);
    expect(await page.locator(".mass-calc").textContent()).toContain("Add a part to see results.");
    const add = page.getByRole("button", { name: "Add a part" });

    await add.click();
    let c = card(page, 0);
    await expect.poll(() => page.evaluate(() => document.activeElement?.id ?? "")).toMatch(/-name$/);
    await input(c, "name").fill("base");
    await input(c, "shape").selectOption("disk");
    await input(c, "src").selectOption("al-6061-t6");
    await input(c, "thickness").fill("5 mm");
    await input(c, "radius").fill("70 mm");
    await input(c, "z").fill("2.5");

    await add.click();
    c = card(page, 1);
    await input(c, "name").fill("battery");
    await input(c, "shape").selectOption("plate");
    await input(c, "mass").fill("280 g");
    await input(c, "length").fill("70");
    await input(c, "width").fill("35");
    await input(c, "angle").fill("90");
    await input(c, "x").fill("12 mm");
    await input(c, "z").fill("13.5 mm");

    await add.click();
    c = card(page, 2);
    await input(c, "name").fill("sensor");
    await input(c, "mass").fill("4");
    await input(c, "x").fill("-32");
    await input(c, "z").fill("8");

    // Hand sums: base 2700 kg/m³ × π × (70 mm)² × 5 mm = 207.8 g; M = 207.8 + 280 + 4 = 491.8 g;
    // x̄ = (280 × 12 − 4 × 32) g·mm / 491.8 g = 6.57 mm; U = 3232 g·mm. The wheels slide (grip radius
    // 0.8 × 0.9 × g/Ω² = 0.112 mm at 2400 rpm): the robot turns 0.112 mm short of the centre of mass,
    // so the sensor sits 32 + 6.57 − 0.11 = 38.5 mm from the spin centre.
    await expect.poll(() => out(page, "total-mass")).toBe("492 g");
    expect(await out(page, "com-x")).toBe("6.57 mm");
    expect(await out(page, "unbalance")).toBe("3230 g·mm");
    expect(await out(page, "sensor-true")).toBe("38.5 mm");
    expect(await page.locator('[data-out="offset-verdict"]').textContent()).toContain("Fails: offset outside the target.");
    expect(new URL(page.url()).searchParams.get("l")).toBe("v1~disk_base_0_0_2.5_70_al-6061-t6_5~plate_battery_12_0_13.5_70_35_90_280~pt_sensor_-32_0_8_4");

    // m = M(e − e_t)/(r + e_t) = 491.8 g × 6.37 mm / 55.2 mm = 56.77 g, rounded up to 56.8 g at 180°.
    expect(await out(page, "cw-mass")).toBe("56.8 g");
    await page.getByRole("button", { name: "Apply: add it to the parts list" }).click();
    await expect.poll(() => page.locator(".mass-parts details").count()).toBe(4);
    // (3232 − 56.8 × 55) g·mm / 548.6 g = 0.197 mm.
    expect(await out(page, "offset")).toBe("0.197 mm");
    expect(await out(page, "total-mass")).toBe("549 g");
    expect(await page.locator('[data-out="offset-verdict"]').textContent()).toContain("Holds: offset within the target.");
    expect(await out(page, "applied")).toContain("offset 6.57 mm → 0.197 mm");

    const before = Object.fromEntries(await Promise.all(OUTPUTS.map(async (name) => [name, await out(page, name)] as const)));
    await expect.poll(() => new URL(page.url()).searchParams.get("l")).toContain("~pt_counterweight_-55_");
    const reopened = await open(page.url().replace(origin(), ""));
    expect(await reopened.page.locator(".mass-parts details").count()).toBe(4);
    for (const name of OUTPUTS) expect(await out(reopened.page, name), name).toBe(before[name]);
    expect(reopened.problems).toEqual([]);
    await reopened.context.close();

    await page.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => out(page, "offset")).toBe("6.57 mm");
    expect(await page.locator(".mass-parts details").count()).toBe(3);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("turns about the wheels' centre or short of the centre of mass as the grip says, shows the couple lift, and takes a lying cylinder", async () => {
    // One 1 kg point 0.1 mm off centre and the sensor at 12 mm (the review's case): the grip holds a
    // 0.112 mm orbit at 2400 rpm, so the robot turns about the wheels' centre and the sensor reads true.
    const { page, context, problems } = await open(`${PAGE}?v=1&l=v1~pt_p_0.1_0_0_1000&sx=-12mm`);
    await expect.poll(() => out(page, "spin-centre")).toBe("the wheels' centre (their grip holds)");
    expect(await out(page, "sensor-drift")).toBe("0°");
    // No grip: the robot turns about its centre of mass, 12.1 mm from the sensor (+1.50° per revolution).
    await page.fill('[id$="-sideGrip"]', "0");
    await expect.poll(() => out(page, "sensor-true")).toBe("12.1 mm");
    expect(await out(page, "sensor-drift")).toBe("1.50°");
    await expect.poll(() => new URL(page.url()).searchParams.get("mu")).toBe("0");

    // Two 10 g masses at (±50, 0, ±10) mm, 1.40 kg in all: C = 1.0e-5 kg·m²; on a 70 mm support radius at
    // 2400 rpm, Ω²C/(M g a) = 0.632/0.961 = 65.7 %, lifting at 2400 × √(1/0.657) = 2960 rpm (the review's case).
    await page.goto(`${origin()}${PAGE}?v=1&l=v1~pt_a_50_0_10_10~pt_b_-50_0_-10_10~pt_c_0_0_0_1380`);
    await expect.poll(() => out(page, "couple-lift")).toContain("65.7 %");
    expect(await out(page, "couple-lift")).toContain("lifts at 2960 rpm");
    await page.fill('[id$="-supportRadius"]', "140 mm");
    await expect.poll(() => out(page, "couple-lift")).toContain("32.9 %");

    // A drive motor lying radially: 75 g, R = 14 mm, L = 30 mm: m(3R² + L²)/12 = 75 × (588 + 900)/12 g·mm² = 9300 g·mm².
    await page.goto(`${origin()}${PAGE}?v=1&l=v1~lcyl_motor_0_0_0_14_30_90_75`);
    await expect.poll(() => out(page, "inertia-com")).toBe("9.300 × 10⁻⁶ kg·m²");
    await card(page, 0).locator("summary").click();
    expect(await page.inputValue('[id$="-shape"]')).toBe("lyingCylinder");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("shows an error beside a bad part field and a bad scalar field, and no NaN anywhere", async () => {
    const { page, context } = await open(PAGE);
    await card(page, 3).locator("summary").click();
    const x = input(card(page, 3), "x");
    for (const [text, message] of [
      ["abc", "x must start with a number"],
      ["5 kg", 'x has a unit "kg" that is not a length unit'],
      ["3 m", "x must be between -2000 mm and 2000 mm (got 3000 mm)"],
    ] as const) {
      await x.fill(text);
      const id = await x.getAttribute("id");
      await expect.poll(() => page.locator(`#${id}-error`).textContent()).toContain(message);
      expect(await x.getAttribute("aria-invalid")).toBe("true");
      expect(await x.getAttribute("aria-describedby")).toContain(`${id}-error`);
    }
    expect(await card(page, 3).locator("summary").textContent()).toContain("check the fields");
    expect(await page.locator(".mass-calc").textContent()).toContain("Results appear when every field holds a valid value.");
    await x.fill("12 mm");
    await expect.poll(() => out(page, "offset")).toBe("1.74 mm");

    await page.fill("#mass-calculator-spinSpeed", "0");
    await expect.poll(() => page.locator("#mass-calculator-spinSpeed-error").textContent()).toContain("Spin speed must be greater than 0 rpm");
    await page.fill("#mass-calculator-spinSpeed", "2400");
    await page.fill("#mass-calculator-planeZ2", "4 mm");
    await expect
      .poll(() => page.locator("#mass-calculator-planeZ2-error").textContent())
      .toContain("Upper correction plane must be a height different from the other plane");
    expect((await page.textContent("body")) ?? "").not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });

  it("explains a malformed parts list part by part, keeps the good parts, and treats hostile text as text", async () => {
    const name = encodeURIComponent("<img src=x onerror=alert(1)>");
    const { page, context, problems, requests } = await open(
      `${PAGE}?v=1&l=${encodeURIComponent(`v1~pt_${name}_10_0_0_100~blob_b_0_0_0_1~disk_c_0_0_0_20~disk_d_0_0_0_-5_20`)}&cw=zz`,
    );
    expect(await page.locator(".mass-parts details").count()).toBe(1);
    expect(await card(page, 0).locator("summary").textContent()).toContain("<img src=x onerror=alert(1)>");
    expect(await page.locator("main img").count()).toBe(0);
    const notices = (await page.locator(".calc-notices").textContent()) ?? "";
    expect(notices).toContain(`Part 2 of the link's parts list was left out: unknown shape "blob"`);
    expect(notices).toContain("Part 3 of the link's parts list was left out: a disk part needs 7 fields, got 6");
    expect(notices).toContain(`The link's counterweight question "zz" is not one this calculator offers`);
    // A part that breaks a rule is described in the parts editor's words (that wording loads on demand).
    await expect
      .poll(() => page.locator(".calc-notices").textContent())
      .toContain("Part 4 of the link's parts list was left out: Radius must be greater than 0 mm and at most 100000 mm (got -5 mm).");
    // One 100 g part at 10 mm: the centre of mass is at 10 mm.
    expect(await out(page, "com-x")).toBe("10.0 mm");
    expect(problems).toEqual([]);
    expect(requests.filter((url) => !url.startsWith(origin()))).toEqual([]);
    await context.close();
  });

  it.each(["toString", "constructor", "hasOwnProperty"])(
    "refuses %s as the counterweight question, a shape and a material, each with a notice, and keeps working",
    async (name) => {
      const layout = `v1~pt_a_10_0_0_100~${name}_b_0_0_0_10_100~disk_c_0_0_0_10_${name}_3`;
      const { page, context, problems } = await open(`${PAGE}?v=1&cw=${name}&l=${encodeURIComponent(layout)}`);
      const notices = (await page.locator(".calc-notices").textContent()) ?? "";
      expect(notices).toContain(`The link's counterweight question "${name}" is not one this calculator offers; it was ignored.`);
      expect(notices).toContain(`Part 2 of the link's parts list was left out: unknown shape "${name.slice(0, 12)}"`);
      expect(notices).toContain(`Part 3 of the link's parts list was left out: mass "${name}" is neither a number of grams nor a known material`);
      expect(await page.locator(".mass-parts details").count()).toBe(1);
      expect(await page.getByRole("radio", { name: "Mass at a radius" }).isChecked()).toBe(true);
      expect(await out(page, "com-x")).toBe("10.0 mm");
      expect(problems).toEqual([]);
      await context.close();
    },
  );

  it("opens the worked example from the chapter's link: the invented demo robot with its four bolts", async () => {
    const first = await open(PAGE);
    const href = await first.page.getByRole("link", { name: "Open this example in the calculator" }).getAttribute("href");
    await first.context.close();
    expect(href).toMatch(/^\?v=1&.*#mass-calculator$/);
    const { page, context, problems } = await open(`${PAGE}${href}`);
    expect(new URL(page.url()).searchParams.get("cw")).toBe("p");
    expect(await page.locator(".calc-notices").count()).toBe(0);
    // Chapter figures (tests/calc/mass.test.ts): 1.399 kg, e = 1.74 mm; only the bolt at (−55, 0) works, 38.99 g → 39.0 g.
    expect(await out(page, "offset")).toBe("1.74 mm");
    expect(await page.locator('[data-out="cw-points"] li').nth(2).textContent()).toBe("(−55.0 mm, 0 mm): 39.0 g ← least");
    expect(await out(page, "cw-mass")).toBe("39.0 g");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("reorders, duplicates and mirrors parts from the keyboard, and links the sensor to the drift budget", async () => {
    const { page, context } = await open(`${PAGE}?v=1&l=v1~pt_a_10_0_0_100~pt_b_0_20_0_50&cw=p&pts=-40,0;0,-40`);
    await card(page, 0).locator("summary").focus();
    await page.keyboard.press("Enter");
    const down = card(page, 0).getByRole("button", { name: "Move down: a" });
    await down.focus();
    await page.keyboard.press("Enter");
    await expect.poll(() => card(page, 0).locator("summary").textContent()).toContain("1. b");
    // The moved part is now last: focus stays on its "Move up" button.
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute("aria-label"))).toBe("Move up: a");
    await card(page, 1).locator('[id$="-axis"]').selectOption("origin");
    await card(page, 1).getByRole("button", { name: "Add mirrored copy: a" }).click();
    await expect.poll(() => card(page, 2).locator("summary").textContent()).toContain("3. a (mirror)");
    expect(await input(card(page, 2), "x").inputValue()).toBe("-10 mm");
    // Mounting points mode: of (−40, 0) and (0, −40) mm, the second lies opposite the offset of b.
    expect(await page.locator('[data-out="cw-points"] li').count()).toBe(2);
    const href = await page.locator('[data-out="drift-link"]').getAttribute("href");
    expect(href).toMatch(/^\/chapters\/heading-drift\/\?v=1&ra=32mm&rpm=2400rpm&rt=[\d.]+mm&u=metric#drift-calculator$/);
    await context.close();
  });

  it("comes with the starting result, loads the part editor when a card opens and the arithmetic once the page is idle", async () => {
    const { page, context, problems, requests } = await open(PAGE);
    const loaded = (name: string) => requests.some((url) => new RegExp(`/_astro/${name}\\.[\\w-]+\\.js$`).test(url));
    // The demo's figures are on the page without the arithmetic or the editor.
    expect(await out(page, "total-mass")).toBe("1.40 kg");
    const force = await out(page, "unbalance-force");
    // Neither is one of the page's own scripts: they come after the first paint.
    const scripts = await page.evaluate(() =>
      [...document.querySelectorAll("script[src], link[rel=modulepreload]")].map((e) => e.getAttribute("src") ?? e.getAttribute("href") ?? ""),
    );
    expect(scripts.filter((url) => /\/(compute|mass-balance|PartEditor)\./.test(url))).toEqual([]);
    expect(loaded("PartEditor")).toBe(false);
    await card(page, 0).locator("summary").click();
    await expect.poll(() => input(card(page, 0), "name").count()).toBe(1);
    expect(loaded("PartEditor")).toBe(true);
    // The arithmetic arrives while the page is idle, before any change asks for it.
    await expect.poll(() => loaded("compute")).toBe(true);
    // Twice the speed: four times the rotating force.
    await page.fill("#mass-calculator-spinSpeed", "4800 rpm");
    await expect.poll(() => out(page, "unbalance-force")).not.toBe(force);
    expect(await out(page, "total-mass")).toBe("1.40 kg");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("works out a permalink's own layout straight away, and opens its cards", async () => {
    const { page, context, problems } = await open(`${PAGE}?v=1&l=v1~pt_a_10_0_0_100~pt_b_0_20_0_50&rpm=3000rpm`);
    await expect.poll(() => out(page, "total-mass")).toBe("150 g");
    await card(page, 1).locator("summary").click();
    await expect.poll(() => input(card(page, 1), "name").inputValue()).toBe("b");
    await input(card(page, 1), "mass").fill("100 g");
    await expect.poll(() => out(page, "total-mass")).toBe("200 g");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("starts empty from the demo layout, the link following, and puts the parts back with undo; a negligible couple is one line", async () => {
    const { page, context, problems } = await open(PAGE);
    const count = () => page.locator(".mass-parts details").count();
    expect(await count()).toBe(9);
    // The demo's couple is 17 % of G 100's allowance per plane (tests/calc/mass.test.ts): a note, no two-plane figures.
    expect(await out(page, "couple-note")).toContain("One counterweight at the height of the centre of mass will do.");
    expect(await page.locator('[data-out="plane-lower"]').count()).toBe(0);
    await page.getByRole("button", { name: "Start empty" }).click();
    await expect.poll(count).toBe(0);
    await expect.poll(() => new URL(page.url()).searchParams.get("l")).toBe("v1");
    await expect.poll(() => page.evaluate(() => document.activeElement?.id ?? "")).toMatch(/-restore$/);
    await page.getByRole("button", { name: "Undo: put the parts back" }).click();
    await expect.poll(count).toBe(9);
    await expect.poll(() => new URL(page.url()).searchParams.get("l")).toMatch(/^v1~disk_/);
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe("accessibility of the mass-layout page (axe-core)", () => {
  const scan = (page: Page, selector: string) => axeViolations(page, selector);

  for (const colorScheme of ["light", "dark"] as const) {
    it(`finds no violations on the page, then in the calculator with a part open, an error and an applied counterweight (${colorScheme})`, async () => {
      const { page, context } = await open(PAGE, { colorScheme });
      expect(await scan(page, "html")).toEqual([]);
      await page.getByRole("button", { name: "Apply: add it to the parts list" }).click();
      await card(page, 3).locator("summary").click();
      await page.getByRole("radio", { name: "Best mounting point" }).check();
      await page.fill("#mass-calculator-points", "55, 0; 12");
      await expect.poll(() => page.locator("#mass-calculator-points-error").count()).toBe(1);
      expect(await scan(page, "#mass-calculator")).toEqual([]);
      await input(card(page, 3), "x").fill("abc");
      expect(await scan(page, "#mass-calculator")).toEqual([]);
      await context.close();
    });
  }
});
