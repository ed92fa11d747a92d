/**
 * The shaft and hit calculators in a real browser (Debian chromium via playwright-core): each opens
 * from a permalink of its invented demo and shows the figures calc/ computes for it, follows an
 * edit the way a builder would make it (a thicker shaft, an overhung rotor, a loose part hit), and
 * shows a bad field's message beside that field.
 */
import { describe, expect, it } from "vitest";
import { linkFor } from "../../calc/core/calculator.ts";
import { form as hitForm } from "../../calc/calculators/weapon-hit.ts";
import { form as shaftForm } from "../../calc/calculators/weapon-shaft.ts";
import { formatNumber, formatQuantity } from "../../calc/core/units.ts";
import { DEMO_HIT, weaponHit } from "../../calc/weapon/impact.ts";
import { weaponShaftCheck } from "../../calc/weapon/shaft-check.ts";
import { DEMO_SHAFT } from "../../calc/weapon/shaft-demo.ts";
import { axeViolations, useSite } from "../support/browser.ts";

const site = useSite();
const { open } = site;

describe("the shaft and bearings calculator", () => {
  it("opens the invented disc's link and shows what calc/ computes: the hub bearings dent in a hit (s0 0.353), live 17.0 h, the shaft 0.961 on yield", async () => {
    const { page, context, problems } = await open(`/${linkFor(shaftForm, DEMO_SHAFT)}`);
    const id = "#weapon-shaft-calculator";
    const bar = (name: string) => page.locator(`${id} [data-result-bar] [data-bar="${name}"]`);
    const out = (name: string) => page.locator(`${id} [data-out="${name}"]`);
    const r = weaponShaftCheck(DEMO_SHAFT);
    // Regression pins of tests/calc/weapon/shaft.test.ts: s0 = 0.35308, L10h = 16.965 h, n = 0.96100.
    await expect.poll(() => bar("s0").textContent()).toBe(formatNumber(r.bearing.staticSafetyFactor!, 3));
    expect(await bar("s0").textContent()).toBe("0.353");
    expect(await bar("life").textContent()).toBe("17.0 h");
    expect(await bar("sf").textContent()).toBe("0.961");
    expect(await bar("verdict").textContent()).toBe("Fails: the bearings under a hit");
    // J·Ω·q = 0.010125 × 837.76 × 2π = 53.3 N·m (the turn chapter's figure); U·Ω² = 2e-5 × 837.76² = 14.0 N.
    expect(await out("gyro").textContent()).toBe("53.3 N·m");
    expect(await out("unbalance").textContent()).toBe("14.0 N");
    expect(await out("moment").textContent()).toBe(formatQuantity(r.bendingMoment.peak, "torque", { system: "metric" }).text);
    expect(await out("verdict").textContent()).toContain("the raceways dent");
    // The layout's own fields: between supports on a dead shaft reads the rotor position and the hub spacing.
    expect(await page.locator(`${id}-rotorPosition`).count()).toBe(1);
    expect(await page.locator(`${id}-hubBearingSpacing`).count()).toBe(1);
    expect(await page.locator(`${id}-overhang`).count()).toBe(0);
    expect(await page.locator(`${id}-motorTorque`).count()).toBe(0);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("follows a builder's changes: a 20 mm shaft in larger bearings and a longer hub, then overhung on a live shaft", async () => {
    const { page, context, problems } = await open(`/${linkFor(shaftForm, DEMO_SHAFT)}`);
    const id = "#weapon-shaft-calculator";
    const bar = (name: string) => page.locator(`${id} [data-result-bar] [data-bar="${name}"]`);
    const stout = { ...DEMO_SHAFT, shaftDiameter: 0.02, hubBearingSpacing: 0.04, dynamicLoadRating: 13500, staticLoadRating: 6550 };
    const s = weaponShaftCheck(stout);
    await page.fill(`${id}-shaftDiameter`, "20 mm");
    await page.fill(`${id}-hubBearingSpacing`, "40 mm");
    await page.fill(`${id}-dynamicLoadRating`, "13.5 kN");
    await page.fill(`${id}-staticLoadRating`, "6.55 kN");
    // The chapter's second worked example: n = 4.45, L10h = 2080 h, s0 = 1.22 against the guideline 1.5.
    await expect.poll(() => bar("s0").textContent()).toBe(formatNumber(s.bearing.staticSafetyFactor!, 3));
    expect(await bar("sf").textContent()).toBe(formatNumber(s.safetyFactor!, 3));
    expect(await bar("life").textContent()).toBe(`${formatNumber(s.bearing.ratingLifeHours!, 3)} h`);
    expect(await bar("verdict").textContent()).toBe("Marginal: the bearings under a hit");
    await expect.poll(() => new URL(page.url()).searchParams.get("d")).toBe("20mm");
    // Overhung on a live shaft: the overhang and the motor torque appear, the rotor position and hub spacing go.
    await page.selectOption(`${id}-layout`, "overhung");
    await page.selectOption(`${id}-shaft`, "live");
    await page.fill(`${id}-overhang`, "25 mm");
    const h = weaponShaftCheck({ ...stout, layout: "overhung", shaft: "live", overhang: 0.025 });
    await expect.poll(() => bar("s0").textContent()).toBe(formatNumber(h.bearing.staticSafetyFactor!, 3));
    expect(await bar("verdict").textContent()).toBe("Fails: the bearings under a hit");
    expect(await page.locator(`${id}-rotorPosition`).count()).toBe(0);
    expect(await page.locator(`${id}-motorTorque`).count()).toBe(1);
    await expect.poll(() => new URL(page.url()).searchParams.get("lay")).toBe("overhung");
    expect(new URL(page.url()).searchParams.get("a")).toBeNull();
    expect(problems).toEqual([]);
    await context.close();
  });

  it("shows a bad field's message beside it: a rotor placed beyond the support span, then a diameter that is no number", async () => {
    const { page, context } = await open(`/${linkFor(shaftForm, DEMO_SHAFT)}`);
    const id = "#weapon-shaft-calculator";
    await page.fill(`${id}-rotorPosition`, "70 mm");
    await expect.poll(() => page.locator(`${id} [data-result-bar]`).textContent()).toContain("No result yet: correct the marked field.");
    const marked = page.locator(`${id} .field--error`);
    expect(await marked.count()).toBe(1);
    expect(await marked.textContent()).toContain("support span");
    // A field that does not read comes first: the span check waits until every field reads.
    await page.fill(`${id}-shaftDiameter`, "abc");
    await expect.poll(() => marked.textContent()).toContain("must start with a number");
    expect(await marked.count()).toBe(1);
    expect(await axeViolations(page)).toEqual([]);
    await context.close();
  });
});

describe("the hit calculator", () => {
  it("opens the invented full hit's link and shows what calc/ computes, then a hit on a loose 300 g part, then a bad field", async () => {
    const { page, context, problems } = await open(`/${linkFor(hitForm, DEMO_HIT)}`);
    const id = "#weapon-hit-calculator";
    const bar = (name: string) => page.locator(`${id} [data-result-bar] [data-bar="${name}"]`);
    const out = (name: string) => page.locator(`${id} [data-out="${name}"]`);
    const f = weaponHit(DEMO_HIT);
    // Regression pins of tests/calc/weapon/impact.test.ts: P = 95.536 N·s, F = 150.07 kN to 300.13 kN; ½JΩ² = 3553 J; bite 7.5 mm.
    await expect.poll(() => bar("force").textContent()).toBe("150 kN to 300 kN");
    expect(await bar("given").textContent()).toBe(formatQuantity(f.impact.rotorEnergyDrop, "energy", { system: "metric" }).text);
    expect(await out("impulse").textContent()).toBe("95.5 N·s");
    expect(await out("stored").textContent()).toBe("3550 J");
    expect(await out("bite").textContent()).toBe("7.50 mm");
    expect(await out("after").textContent()).toContain("backwards");
    expect(await out("target").textContent()).toBe("336 J");
    const part = weaponHit({ ...DEMO_HIT, targetMass: 0.3 });
    await page.fill(`${id}-targetMass`, "300 g");
    await expect.poll(() => out("target").textContent()).toBe(formatQuantity(part.impact.energyToTarget, "energy", { system: "metric" }).text);
    expect(await out("after").textContent()).not.toContain("backwards");
    expect(await bar("force").textContent()).toBe(
      `${formatQuantity(part.force.average, "force", { system: "metric" }).text} to ${formatQuantity(part.force.peak, "force", { system: "metric" }).text}`,
    );
    await page.fill(`${id}-restitution`, "1.5");
    await expect.poll(() => page.locator(`${id} [data-result-bar]`).textContent()).toContain("No result yet: correct the marked field.");
    expect(await page.locator(`${id} .field--error`).count()).toBe(1);
    expect(await axeViolations(page)).toEqual([]);
    expect(problems).toEqual([]);
    await context.close();
  });
});
