/**
 * unitTables: the tables a page registers, refused by name for anything that is not a list of
 * quantity kinds.
 */
import { describe, expect, it } from "vitest";
import { DISPLAY, type QuantityKind, type UnitId, unitTables } from "../../../calc/core/unit-table.ts";
import { displayUnit } from "../../../calc/core/units.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("unitTables refuses what is not a quantity kind", () => {
  it.each([
    { kind: ["length"], got: "a list of 1", why: "a list holding a kind's name" },
    { kind: 5, got: "5", why: "a number" },
    { kind: "toString", got: '"toString"', why: "a name of an object's machinery" },
    { kind: "colour", got: '"colour"', why: "an unknown kind" },
    { kind: undefined, got: "nothing", why: "nothing" },
  ])("refuses $why, and says what it got in words", ({ kind, got }) => {
    expectRefusal(() => unitTables([kind] as never), "kinds", kind, "", `kinds must be quantity kinds (length, mass, …) (got ${got})`);
  });

  it("refuses a list that is not one, never writing it as [object Object]", () => {
    expectRefusal(() => unitTables({ length: 1 } as never), "kinds", { length: 1 }, "", "kinds must be a list of quantity kinds (got an object)");
    expectRefusal(() => unitTables("length" as never), "kinds", "length", "", 'kinds must be a list of quantity kinds (got "length")');
  });

  it("gives an empty list for no kinds, and each kind's display steps as declared", () => {
    expect(unitTables([])).toEqual([]);
    expect(unitTables(["time"])[0]!.display).toBe(DISPLAY.time);
    expect(Object.keys(unitTables(["time"])[0]!.units)).toEqual(["s", "h", "ms", "us"]);
  });
});

/**
 * The unit each kind is shown in, for a small value (0) and a large one (10⁶ SI), metric then US:
 * a regression pin of the handbook's display choices, so that a changed step shows here.
 */
const SHOWN: Record<QuantityKind, readonly [UnitId, UnitId, UnitId, UnitId]> = {
  length: ["mm", "m", "in", "ft"],
  area: ["mm2", "mm2", "in2", "in2"],
  mass: ["g", "kg", "oz", "lb"],
  acceleration: ["gn", "gn", "gn", "gn"],
  angularSpeed: ["rpm", "rpm", "rpm", "rpm"],
  angularAcceleration: ["rpm/s", "rpm/s", "rpm/s", "rpm/s"],
  angle: ["deg", "deg", "deg", "deg"],
  time: ["us", "s", "us", "s"],
  frequency: ["Hz", "kHz", "Hz", "kHz"],
  force: ["N", "kN", "lbf", "lbf"],
  speed: ["m/s", "m/s", "ft/s", "ft/s"],
  energy: ["J", "kJ", "ft·lbf", "ft·lbf"],
  power: ["W", "kW", "W", "kW"],
  torque: ["N·m", "N·m", "ozf·in", "lbf·in"],
  inertia: ["kg·m2", "kg·m2", "lb·in2", "lb·in2"],
  stress: ["MPa", "MPa", "ksi", "ksi"],
  density: ["g/cm3", "g/cm3", "lb/in3", "lb/in3"],
  unbalance: ["g·mm", "g·mm", "oz·in", "oz·in"],
  voltage: ["V", "V", "V", "V"],
  current: ["A", "A", "A", "A"],
  resistance: ["mohm", "ohm", "mohm", "ohm"],
  motorVelocityConstant: ["rpm/V", "rpm/V", "rpm/V", "rpm/V"],
  fraction: ["pct", "pct", "pct", "pct"],
  count: ["count", "count", "count", "count"],
};

describe("the unit each kind is shown in", () => {
  it("has a row for every kind", () => {
    expect(Object.keys(SHOWN).sort()).toEqual(Object.keys(DISPLAY).sort());
  });

  it.each(Object.entries(SHOWN))("%s: small and large values, metric and US, show in %j", (kind, [metricSmall, metricLarge, usSmall, usLarge]) => {
    const k = kind as QuantityKind;
    expect([displayUnit(k, "metric", 0), displayUnit(k, "metric", 1e6), displayUnit(k, "us", 0), displayUnit(k, "us", 1e6)]).toEqual([
      metricSmall,
      metricLarge,
      usSmall,
      usLarge,
    ]);
  });
});
