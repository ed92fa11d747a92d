/**
 * The bolt and rim calculators in a real browser (Debian chromium via playwright-core): open a
 * permalink, read the outputs, edit a quantity and a category, see the URL follow, see errors
 * beside fields, survive a hostile link, and pass axe-core in light and dark.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { axeViolations, useSite } from "../support/browser.ts";
import fasteners from "../../calc/calculators/fasteners.ts";
import { initialValues } from "../../calc/core/calculator.ts";
import { formatNumber } from "../../calc/core/units.ts";
import { boltedJointCheck } from "../../calc/loads/joint.ts";
import type { BoltedJointCheck, BoltedJointInput } from "../../calc/loads/joint-inputs.ts";

const site = useSite();
const { origin, open } = site;

const out = (page: Page, name: string) => page.locator(`[data-out="${name}"]`).textContent();
const param = (page: Page, key: string) => new URL(page.url()).searchParams.get(key);

const BOLT = "/chapters/fasteners/";
const RIM = "/chapters/rims/";

/** The joint check's result for the calculator's defaults changed by `change`, as the page must show it. */
function joint(change: Partial<BoltedJointInput>): BoltedJointCheck {
  return boltedJointCheck({ ...(initialValues(fasteners) as unknown as BoltedJointInput), ...change });
}
const sf = (value: number | null) => formatNumber(value!);

describe("the bolt calculator in the browser", () => {
  it("opens a link of the earlier average-shear check: its keys keep their meaning, the retired ones are named, and the joint check answers", async () => {
    const { page, context, problems } = await open(
      `${BOLT}?v=1&u=metric&m=42g&r=55mm&rpm=2400rpm&n=1&size=M2&cls=4.6&mode=shear&plane=thread&sr=0.5&fail=1&thin=2`,
    );
    const expected = joint({ partMass: 0.042, radius: 0.055, size: "M2", grade: "4.6" });
    expect(await page.inputValue("#fastener-calculator-size")).toBe("M2");
    expect(await page.inputValue("#fastener-calculator-grade")).toBe("4.6");
    expect(await page.isChecked('input[name="fastener-calculator-mode"][value="shear"]')).toBe(true);
    expect(await page.inputValue("#fastener-calculator-partMass")).toBe("42 g");
    expect(await page.locator(".calc-notices").textContent()).toContain("Its shear ratio and shear plane are no longer read");
    await expect.poll(() => out(page, "sf-friction")).toBe(sf(expected.safetyFactors.friction));
    expect(await out(page, "sf-bending")).toBe(sf(expected.safetyFactors.bending));
    expect(await out(page, "sf-shear")).toBe(sf(expected.safetyFactors.shear));
    expect(await page.locator('[data-bar="governs"]').first().textContent()).toBe(expected.governs);
    expect(await out(page, "verdict")).toContain(`${expected.verdict[0]!.toUpperCase()}${expected.verdict.slice(1)}.`);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("takes the new inputs: torque and nut factor, stack height, friction, the thread, inch sizes and the folded bending choice, each kept in the link", async () => {
    const { page, context, problems } = await open(BOLT);
    // Before any change the page answers from the result computed at build time.
    expect(await out(page, "sf-friction")).toBe(sf(joint({}).safetyFactors.friction));

    // Preload from the torque: the share field goes, the torque field comes, the link follows.
    await page.getByRole("radio", { name: /tightening torque/i }).check();
    await expect.poll(() => param(page, "pf")).toBe("torque");
    expect(await page.locator("#fastener-calculator-preloadShare").count()).toBe(0);
    await page.fill("#fastener-calculator-tighteningTorque", "1.5 N·m");
    await page.fill("#fastener-calculator-nutFactor", "0.15");
    await page.fill("#fastener-calculator-frictionCoefficient", "0.3");
    await page.fill("#fastener-calculator-stackHeight", "8.4 mm");
    let expected = joint({ preloadFrom: "torque", tighteningTorque: 1.5, nutFactor: 0.15, frictionCoefficient: 0.3, stackHeight: 0.0084 });
    await expect.poll(() => out(page, "sf-bending")).toBe(sf(expected.safetyFactors.bending));
    expect(await out(page, "sf-friction")).toBe(sf(expected.safetyFactors.friction));
    expect(await out(page, "sf-stripping")).toBe(sf(expected.safetyFactors.stripping));
    await expect.poll(() => param(page, "T")).toBe("1.5Nm");
    expect(param(page, "K")).toBe("0.15");
    expect(param(page, "mu")).toBe("0.3");
    expect(param(page, "h")).toBe("8.4mm");
    expect(param(page, "pre")).toBeNull();

    // No preload at all: the joint slips and the bolt bends.
    await page.fill("#fastener-calculator-tighteningTorque", "0");
    expected = joint({ preloadFrom: "torque", tighteningTorque: 0, nutFactor: 0.15, frictionCoefficient: 0.3, stackHeight: 0.0084 });
    expect(expected.governs).toBe("bending");
    await expect.poll(() => page.locator('[data-bar="governs"]').first().textContent()).toBe("bending");
    expect(await out(page, "verdict")).toContain("With no preload the joint slips");

    // A nut instead of the tapped part: no engagement field, no stripping row.
    await page.selectOption("#fastener-calculator-threadIn", "nut");
    await expect.poll(() => param(page, "into")).toBe("nut");
    expect(await page.locator("#fastener-calculator-engagedLength").count()).toBe(0);
    expect(await page.locator('[data-out="sf-stripping"]').count()).toBe(0);

    // A guided bolt, from the folded inputs: the bending moment halves.
    await page.locator(".joint-more summary").click();
    await page.selectOption("#fastener-calculator-endCondition", "guided");
    expected = joint({
      preloadFrom: "torque",
      tighteningTorque: 0,
      nutFactor: 0.15,
      frictionCoefficient: 0.3,
      stackHeight: 0.0084,
      threadIn: "nut",
      endCondition: "guided",
    });
    await expect.poll(() => out(page, "sf-bending")).toBe(sf(expected.safetyFactors.bending));
    expect(param(page, "end")).toBe("guided");

    // An inch size: the grade menu offers inch grades only, and 8.8 becomes SAE J429 grade 5.
    await page.selectOption("#fastener-calculator-size", "#10-32");
    await expect.poll(() => param(page, "cls")).toBe("sae-5");
    expect(await page.inputValue("#fastener-calculator-grade")).toBe("sae-5");
    expect(await page.locator("#fastener-calculator-grade option").allTextContents()).toEqual([
      "SAE J429 grade 2",
      "SAE J429 grade 5",
      "SAE J429 grade 8",
      "ASTM A574 socket head",
    ]);
    expect(await out(page, "basis")).toBe("Bolt strengths: SAE J429 specified minimum values");
    expect(await out(page, "scope")).toContain("0.25 to 1 in");

    // Tension: friction and bending leave the table, tension comes in.
    await page.getByRole("radio", { name: /^Tension/ }).check();
    await expect.poll(() => page.locator('[data-out="sf-tension"]').count()).toBe(1);
    expect(await page.locator('[data-out="sf-friction"]').count()).toBe(0);
    expect(await page.locator("#fastener-calculator-stackHeight").count()).toBe(0);
    expect(param(page, "h")).toBeNull();
    const body = (await page.textContent("body")) ?? "";
    expect(body).not.toMatch(/\bNaN\b|Infinity/);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("shows errors beside the field, including a rule across two fields in the folded inputs, and no NaN", async () => {
    const { page, context } = await open(BOLT);
    for (const [id, text, message] of [
      ["radius", "abc", "Radius of the part must start with a number"],
      ["count", "2.5", "Number of bolts must be a whole number between 1 and 64 (got 2.5)"],
      ["partMass", "5 mm", 'Part mass has a unit "mm" that is not a mass unit'],
    ] as const) {
      await page.fill(`#fastener-calculator-${id}`, text);
      await expect.poll(() => page.locator(`#fastener-calculator-${id}-error`).textContent()).toContain(message);
      expect(await page.getAttribute(`#fastener-calculator-${id}`, "aria-invalid")).toBe("true");
      await page.fill(`#fastener-calculator-${id}`, id === "radius" ? "70 mm" : id === "count" ? "1" : "40 g");
    }
    await page.locator(".joint-more summary").click();
    await page.fill("#fastener-calculator-failBelow", "3");
    await expect
      .poll(() => page.locator("#fastener-calculator-marginalBelow-error").textContent())
      .toBe("Marginal below must be at least the fails below (3).");
    expect(await page.getAttribute("#fastener-calculator-marginalBelow", "aria-describedby")).toContain("fastener-calculator-marginalBelow-error");
    expect(await page.locator(".calc-results--empty").count()).toBe(1);
    const body = (await page.textContent("body")) ?? "";
    expect(body).not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });

  it("treats a hostile link as text: unknown choices are reported, nothing runs, nothing is fetched elsewhere", async () => {
    const hostile = `?size=${encodeURIComponent("<img src=x onerror=alert(1)>")}&cls=99.9&m=${encodeURIComponent('"><script>alert(2)</script>')}`;
    const { page, context, problems, requests } = await open(`${BOLT}${hostile}`);
    expect(await page.locator("main img").count()).toBe(0);
    const notices = (await page.locator(".calc-notices").textContent()) ?? "";
    expect(notices).toContain('thread size "<img src=x onerror=alert…" is not one this calculator offers');
    expect(notices).toContain('class or grade "99.9" is not one this calculator offers');
    expect(await page.inputValue("#fastener-calculator-size")).toBe("M4");
    expect(await page.locator("#fastener-calculator-partMass-error").textContent()).toContain("Part mass must start with a number");
    expect(problems).toEqual([]);
    expect(requests.filter((url) => !url.startsWith(origin()))).toEqual([]);
    await context.close();
  });

  it("opens the worked example's link from the chapter with the same numbers as the prose: friction governs, bending next", async () => {
    const { page, context } = await open(BOLT);
    const href = await page.getByRole("link", { name: "Open the tightened M4 in the calculator" }).getAttribute("href");
    expect(href).toContain("size=M4");
    const example = await open(`${BOLT}${href}`);
    // The demo: 42 g at 55 mm, 2400 rpm, one M4 8.8 with a nut, 75 % of proof, μ 0.2, 8.4 mm stack
    // (tests/calc/loads/joint.test.ts: friction 5.24, bending 1.58, average shear 22.2).
    await expect.poll(() => out(example.page, "sf-friction")).toBe("5.24");
    expect(await out(example.page, "sf-bending")).toBe("1.58");
    expect(await out(example.page, "sf-shear")).toBe("22.2");
    expect(await example.page.locator('[data-bar="governs"]').first().textContent()).toBe("friction");
    expect(await out(example.page, "verdict")).toContain("Holds.");
    await example.context.close();
    await context.close();
  });
});

describe("the rim calculator in the browser", () => {
  it("answers a permalink: a 4130 disk with a 10 mm bore at 10 000 rpm peaks at the bore", async () => {
    const { page, context, problems } = await open(`${RIM}?v=1&u=metric&shape=annular-disk&mat=steel-4130-normalized&ro=100mm&ri=10mm&rpm=10000rpm`);
    // σ_θ(a) = ρω²/4 · [(3+ν)b² + (1−ν)a²] with ρ = 7850 kg/m³, ν = 0.29, ω = 1047.2 rad/s: 71.0 MPa;
    // n_y = 435/71.0 = 6.13; burst estimate 10 000 rpm × √(670/71.0) = 30 700 rpm (tests/components/loads.test.tsx).
    expect(await out(page, "peak-stress")).toBe("71.0 MPa");
    expect(await out(page, "peak-at")).toBe("at the bore, r = 10.0 mm");
    expect(await out(page, "radial-stress")).toBe("28.7 MPa");
    expect(await out(page, "tip-speed")).toBe("105 m/s");
    expect(await out(page, "sf-yield")).toBe("6.13");
    expect(await out(page, "speed-ult")).toBe("30700 rpm");
    expect(await out(page, "verdict")).toContain("Holds.");
    expect(await page.inputValue("#rim-calculator-material")).toBe("steel-4130-normalized");
    expect(await page.inputValue("#rim-calculator-density")).toBe("7.85 g/cm³");
    expect(await page.inputValue("#rim-calculator-poisson")).toBe("0.29");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("updates outputs and the URL when the speed, the shape and the material change", async () => {
    const { page, context } = await open(`${RIM}?v=1&shape=annular-disk&mat=steel-4130-normalized&ro=100mm&ri=10mm&rpm=10000rpm`);
    await page.fill("#rim-calculator-angularSpeed", "20000 rpm");
    // Twice the speed, four times the stress: 284 MPa; n_y = 6.13/4 = 1.53, marginal.
    await expect.poll(() => out(page, "peak-stress")).toBe("284 MPa");
    expect(await out(page, "sf-yield")).toBe("1.53");
    expect(await out(page, "verdict")).toContain("Marginal.");
    await expect.poll(() => param(page, "rpm")).toBe("20000rpm");

    await page.getByRole("radio", { name: /^Solid disk/ }).check();
    // Solid disk: (3+ν)/8 · ρω²b² = 3.29/8 × 7850 × 2094.4² × 0.01 = 142 MPa, at the centre.
    await expect.poll(() => out(page, "peak-stress")).toBe("142 MPa");
    expect(await out(page, "peak-at")).toBe("at the centre");
    await expect.poll(() => param(page, "shape")).toBe("solid-disk");

    await page.selectOption("#rim-calculator-material", "ti-6al-4v-annealed");
    await expect.poll(() => page.inputValue("#rim-calculator-density")).toBe("4.43 g/cm³");
    await expect.poll(() => param(page, "mat")).toBe("ti-6al-4v-annealed");
    // The link spells the unit in ASCII (g/cm3); the field shows g/cm³.
    expect(param(page, "rho")).toBe("4.43g/cm3");

    await page.fill("#rim-calculator-yieldStrength", "800 MPa");
    await expect.poll(() => page.inputValue("#rim-calculator-material")).toBe("custom");
    await expect.poll(() => param(page, "mat")).toBe("custom");
    await context.close();
  });

  it("marks the strengths' basis: specified minimums for 6061-T6, typical for a steel, and keeps it in the link", async () => {
    const { page, context } = await open(RIM);
    // 6061-T6 at the ASTM B221 minimums, 35/38 ksi.
    expect(await page.inputValue("#rim-calculator-yieldStrength")).toBe("241.317 MPa");
    expect(await page.inputValue("#rim-calculator-strengthBasis")).toBe("minimum");
    await page.selectOption("#rim-calculator-material", "steel-4130-normalized");
    await expect.poll(() => page.inputValue("#rim-calculator-strengthBasis")).toBe("typical");
    await expect.poll(() => param(page, "basis")).toBe("typical");
    await context.close();
  });

  it("shows the thin ring's single stress as one point and says so", async () => {
    const { page, context } = await open(RIM);
    // The default 6061-T6 ring of 125 mm at 2400 rpm: 2.66 MPa, n_y = 104 (tests/calc/loads.test.ts).
    expect(await out(page, "peak-stress")).toBe("2.66 MPa");
    expect(await out(page, "radial-at")).toBe("none in a thin ring");
    expect(await page.locator(".chart-legend").textContent()).toContain("Hoop stress of the ring (one value, at its outer radius)");
    await context.close();
  });

  it("puts a bore as large as the rim on the bore field, and a bad number on its own field", async () => {
    const { page, context } = await open(`${RIM}?shape=annular-disk&ro=100mm&ri=10mm`);
    await page.fill("#rim-calculator-innerRadius", "120 mm");
    await expect.poll(() => page.locator("#rim-calculator-innerRadius-error").textContent()).toMatch(/^Bore radius must be /);
    expect(await page.getAttribute("#rim-calculator-innerRadius", "aria-invalid")).toBe("true");
    await page.fill("#rim-calculator-innerRadius", "10 mm");
    await page.fill("#rim-calculator-density", "heavy");
    await expect.poll(() => page.locator("#rim-calculator-density-error").textContent()).toContain("Density must start with a number");
    const body = (await page.textContent("body")) ?? "";
    expect(body).not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });
});

describe("accessibility of the loads chapters (axe-core)", () => {
  const cases = [
    ...[BOLT, RIM].flatMap((path) => (["light", "dark"] as const).map((colorScheme) => ({ path, colorScheme }))),
    // With errors showing beside fields and a notice above them.
    { path: `${BOLT}?r=abc&mode=tension&cls=0.1`, colorScheme: "light" as const },
    { path: `${RIM}?shape=annular-disk&ri=300mm&mat=x`, colorScheme: "dark" as const },
  ];
  for (const { path, colorScheme } of cases) {
    it(`finds no violations on ${path} (${colorScheme})`, async () => {
      const { page, context } = await open(path, { colorScheme });
      const result = await axeViolations(page);
      expect(result).toEqual([]);
      await context.close();
    });
  }
});
