/**
 * The shaft and hit calculators as the build sheet and links see them: their cards for the
 * invented demos (figures read from the same calc/ entries), the inputs a layout reads, the hour
 * as a unit of the required life, and the material table read from its two parts.
 */
import { describe, expect, it } from "vitest";
import weaponHitCalculator from "../../../calc/calculators/weapon-hit.ts";
import weaponShaftCalculator, { shaftInputApplies } from "../../../calc/calculators/weapon-shaft.ts";
import { linkQuery } from "../../../calc/core/calculator.ts";
import { parseQuantity } from "../../../calc/core/units.ts";
import { runChecks } from "../../../calc/design/run-checks.ts";
import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from "../../../calc/design/format.ts";
import { MATERIAL_DENSITIES, MATERIAL_IDS } from "../../../calc/materials/densities.ts";
import { MATERIALS } from "../../../calc/materials/materials.ts";
import { MATERIAL_STRENGTHS } from "../../../calc/materials/strengths.ts";
import { DEMO_HIT, weaponHit } from "../../../calc/weapon/impact.ts";
import { weaponShaftCheck } from "../../../calc/weapon/shaft-check.ts";
import { DEMO_SHAFT } from "../../../calc/weapon/shaft-demo.ts";

const design = (sections: Record<string, unknown>): Design =>
  ({
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: "Invented test robot",
    notes: "",
    created: "2026-12-01T00:00:00.000Z",
    modified: "2026-12-01T00:00:00.000Z",
    units: "metric",
    ...sections,
  }) as Design;

describe("the shaft calculator on the build sheet", () => {
  const checks = runChecks(design({ weaponShaft: DEMO_SHAFT }));
  const r = weaponShaftCheck(DEMO_SHAFT);

  it("gives three cards: the shaft on yield, the bearings' life and the bearings under a hit", () => {
    expect(checks.map((c) => c.id)).toEqual(["weaponShaft", "weaponShaft.life", "weaponShaft.shock"]);
    expect(checks.map((c) => c.title)).toEqual(["Weapon shaft", "Weapon bearings: life", "Weapon bearings: shock"]);
  });

  it("judges each card as the check judges its criterion (the invented demo fails all three)", () => {
    const verdictOf = (criterion: string) => r.criteria.find((c) => c.criterion === criterion)!.verdict;
    expect(checks.map((c) => c.status)).toEqual([verdictOf("shaft-yield"), verdictOf("bearing-life"), verdictOf("bearing-static")]);
    expect(checks.map((c) => c.status)).toEqual(["fails", "fails", "fails"]);
  });

  it("shows the safety factor, the life in hours at the design's speed and s0 as the check computes them", () => {
    expect(checks[0]!.figure).toMatchObject({ value: r.safetyFactor, text: "0.961" });
    // L10h = (5400/2684)³ × 10⁶ rev ÷ (8000 rpm × 60) = 17.0 h (tests/calc/weapon/shaft.test.ts pins 16.965 h).
    expect(checks[1]!.figure).toMatchObject({ value: r.bearing.ratingLifeHours! * 3600, unit: "s", text: "17.0 h" });
    expect(checks[1]!.rule).toContain("8000 rpm");
    expect(checks[1]!.rule).toContain("20 h required");
    expect(checks[2]!.figure).toMatchObject({ value: r.bearing.staticSafetyFactor, text: "0.353" });
  });

  it("gives a layout that holds three holding cards (a 20 mm shaft, larger bearings, a long hub, a light hit)", () => {
    const stout = { ...DEMO_SHAFT, shaftDiameter: 0.02, hubBearingSpacing: 0.04, dynamicLoadRating: 13500, staticLoadRating: 6550, impactForce: 2000 };
    expect(runChecks(design({ weaponShaft: stout })).map((c) => c.status)).toEqual(["holds", "holds", "holds"]);
  });
});

describe("the inputs a layout reads", () => {
  it("reads the rotor position between supports, the overhang when overhung, the hub spacing on a dead shaft and the motor torque on a live one", () => {
    expect(shaftInputApplies("rotorPosition", { layout: "between" })).toBe(true);
    expect(shaftInputApplies("rotorPosition", { layout: "overhung" })).toBe(false);
    expect(shaftInputApplies("overhang", { layout: "overhung" })).toBe(true);
    expect(shaftInputApplies("overhang", { layout: "between" })).toBe(false);
    expect(shaftInputApplies("hubBearingSpacing", { shaft: "dead" })).toBe(true);
    expect(shaftInputApplies("hubBearingSpacing", { shaft: "live" })).toBe(false);
    expect(shaftInputApplies("motorTorque", { shaft: "live" })).toBe(true);
    expect(shaftInputApplies("motorTorque", { shaft: "dead" })).toBe(false);
    expect(shaftInputApplies("shaftDiameter", { layout: "overhung", shaft: "live" })).toBe(true);
  });

  it("leaves the inputs a layout does not read out of its link", () => {
    const keys = (values: object) => [...new URLSearchParams(linkQuery(weaponShaftCalculator, values)).keys()];
    expect(keys(DEMO_SHAFT)).toEqual(expect.arrayContaining(["a", "s", "lay", "sh"]));
    expect(keys(DEMO_SHAFT)).not.toEqual(expect.arrayContaining(["c"]));
    expect(keys(DEMO_SHAFT)).not.toContain("T");
    const live = keys({ ...DEMO_SHAFT, layout: "overhung", shaft: "live" });
    expect(live).toEqual(expect.arrayContaining(["c", "T"]));
    expect(live).not.toContain("a");
    expect(live).not.toContain("s");
  });

  it("writes the required life in hours and reads hours back (20 h = 72 000 s, NIST SP 811: 1 h = 3600 s)", () => {
    expect(new URLSearchParams(linkQuery(weaponShaftCalculator, DEMO_SHAFT)).get("life")).toBe("20h");
    expect(parseQuantity("20 h", "time", "s")).toMatchObject({ ok: true, valueSI: 72000 });
    expect(parseQuantity("1.5 hours", "time", "s")).toMatchObject({ ok: true, valueSI: 5400 });
  });
});

describe("the hit calculator on the build sheet", () => {
  it("gives one card for information with the energy to the opponent, the impulse and the force range", () => {
    const [card, ...rest] = runChecks(design({ weaponHit: DEMO_HIT }));
    const r = weaponHit(DEMO_HIT);
    expect(rest).toEqual([]);
    expect(card).toMatchObject({ id: "weaponHit", status: "info", title: "What a hit does" });
    expect(card!.figure).toMatchObject({ value: r.impact.energyToTarget, text: "336 J" });
    // Regression pins from tests/calc/weapon/impact.test.ts: P = 95.5 N·s; F = 150 kN to 300 kN.
    expect(card!.details.map((d) => d.text)).toEqual(["95.5 N·s", "300 kN", "7.50 mm"]);
    expect(card!.margin).toContain("150 kN to 300 kN");
  });

  it("is the chapter weapon-hit's calculator", () => {
    expect(weaponHitCalculator.chapter).toBe("weapon-hit");
    expect(weaponShaftCalculator.chapter).toBe("weapon-shaft");
  });
});

describe("the material table from its two parts", () => {
  it.each(MATERIAL_IDS)("%s: the row is its density part and its strength part, unchanged", (id) => {
    expect(MATERIALS[id]).toMatchObject({ ...MATERIAL_DENSITIES[id], ...MATERIAL_STRENGTHS[id] });
  });
});
