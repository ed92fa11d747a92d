/**
 * Converting between two units of one kind, and checking a unit id against a kind, with every
 * refusal worded; and the constants the unit table is built from, against their definitions.
 */
import { describe, expect, it } from "vitest";
import { FOOT, INCH, POUND, POUND_FORCE, RAD_PER_S_PER_RPM, STANDARD_GRAVITY, TURN } from "../../../calc/core/constants.ts";
import { convert, requireUnitOfKind } from "../../../calc/core/unit-tools.ts";
import type { UnitId } from "../../../calc/core/units.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("convert", () => {
  it("converts through SI: 1 mile per hour is 1.609 344 km/h, 1 ft is 304.8 mm (exact, NIST SP 811 App. B.8)", () => {
    expect(convert(1, "mph", "km/h")).toBeCloseTo(1.609344, 14);
    expect(convert(1, "ft", "mm")).toBeCloseTo(304.8, 12);
    expect(convert(-2, "rev", "deg")).toBeCloseTo(-720, 12);
    expect(convert(0, "psi", "MPa")).toBe(0);
  });

  it("refuses an unknown unit on either side, and a unit of another kind, by name", () => {
    expectRefusal(() => convert(1, "mm", "s"), "to", "s", "", 'to must be a unit of length, as mm is (got "s")');
    expectRefusal(() => convert(1, "rpm", "Hz"), "to", "Hz", "", 'to must be a unit of rotational speed, as rpm is (got "Hz")');
    expectRefusal(() => convert(1, "mm", "yard" as UnitId), "to", "yard", "", 'to must be one of m, cm, mm, … (got "yard")');
    expectRefusal(() => convert(1, "yard" as UnitId, "mm"), "from", "yard", "", 'from must be one of m, cm, mm, … (got "yard")');
  });

  it("refuses a value that leaves the doubles in the new unit", () => {
    // 1e308 GPa = 1e317 Pa.
    expectRefusal(() => convert(1e308, "GPa", "Pa"), "value", 1e308, "", "value must be a number that stays finite in the new unit (got 1e+308)");
  });
});

describe("requireUnitOfKind", () => {
  it("returns a unit id of the kind", () => {
    expect(requireUnitOfKind("column", "in", "length")).toBe("in");
    expect(requireUnitOfKind("column", "deg/s", "angularSpeed")).toBe("deg/s");
  });

  it.each([
    { unit: "kg", got: '"kg"', why: "a unit of another kind" },
    { unit: "yard", got: '"yard"', why: "an unknown unit" },
    { unit: 5, got: '"5"', why: "a number" },
    { unit: undefined, got: '"undefined"', why: "nothing" },
    { unit: "toString", got: '"toString"', why: "a name of an object's machinery" },
  ])("refuses $why, listing the kind's units", ({ unit, got }) => {
    expectRefusal(
      () => requireUnitOfKind("column", unit, "length"),
      "column",
      String(unit),
      "",
      `column must be a unit of length (m, cm, mm, in, ft) (got ${got})`,
    );
  });

  it("names the kind in words", () => {
    expectRefusal(
      () => requireUnitOfKind("speedColumn", "mm", "angularSpeed"),
      "speedColumn",
      "mm",
      "",
      'speedColumn must be a unit of rotational speed (rad/s, rpm, rps, deg/s) (got "mm")',
    );
  });
});

describe("constants against their definitions", () => {
  it("holds the exact definitions (3rd CGPM 1901; 1959 international yard and pound; NIST SP 811 App. B.8)", () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(INCH).toBe(0.0254);
    expect(FOOT).toBe(0.3048);
    expect(POUND).toBe(0.45359237);
    // lbf = 0.453 592 37 kg × 9.806 65 m/s² = 4.448 221 615 260 5 N exactly, to the double's precision.
    expect(Math.abs(POUND_FORCE - 4.4482216152605) / 4.4482216152605).toBeLessThanOrEqual(2.3e-16);
    expect(TURN).toBe(6.283185307179586);
    // 2π/60 = π/30 = 0.104 719 755 119 659 77 rad/s per rpm.
    expect(RAD_PER_S_PER_RPM).toBe(0.10471975511965977);
  });
});
