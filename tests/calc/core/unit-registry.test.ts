/**
 * The unit registry: parsing and formatting read only the kinds registered with `useUnits`, so a
 * calculator page carries only its own tables. Each test here loads calc/core/units.ts afresh (the
 * setup file registers every kind in the shared copy), registers what it needs, and checks what the
 * page would see.
 */
import { beforeEach, describe, expect, it, vi } from "vitest";
import { DISPLAY, UNITS, type UnitId, unitTables } from "../../../calc/core/unit-table.ts";

type Units = typeof import("../../../calc/core/units.ts");
let units: Units;
/** The error class of the fresh copy (a module loaded afresh has its own). */
let CalcInputError: typeof import("../../../calc/core/errors.ts").CalcInputError;

beforeEach(async () => {
  vi.resetModules();
  units = await import("../../../calc/core/units.ts");
  ({ CalcInputError } = await import("../../../calc/core/errors.ts"));
});

describe("a page that registers only lengths and speeds", () => {
  beforeEach(() => units.useUnits(unitTables(["length", "angularSpeed"])));

  it("reads and shows those kinds as the whole table would (45 mm, 1.8 in, 2400 rpm)", () => {
    expect(units.parseQuantity("45 mm", "length", "mm")).toMatchObject({ ok: true, valueSI: 0.045, unit: "mm" });
    // 1 in = 0.0254 m exactly (NIST SP 811, B.8).
    expect(units.parseQuantity("1.8 in", "length", "mm")).toMatchObject({ ok: true, valueSI: 1.8 * 0.0254, unit: "in" });
    expect(units.formatQuantity(0.032, "length").text).toBe("32.0 mm");
    expect(units.formatQuantity(0.032, "length", { system: "us" }).text).toBe("1.26 in");
    expect(units.formatQuantity(units.rpmToRadPerSecond(2400), "angularSpeed").text).toBe("2400 rpm");
    expect(units.unitsOfKind("length")).toEqual(["m", "cm", "mm", "in", "ft"]);
    expect(units.siUnit("angularSpeed")).toBe("rad/s");
    expect(units.quantityToText(0.2, "mm")).toBe("200mm");
  });

  it("says which kinds it has", () => {
    expect(units.unitsLoaded("length")).toBe(true);
    expect(units.unitsLoaded("angularSpeed")).toBe(true);
    expect(units.unitsLoaded("mass")).toBe(false);
    expect(units.lookupUnit("mm")).toMatchObject({ kind: "length", factor: 0.001, symbol: "mm" });
    expect(units.lookupUnit("kg")).toBeUndefined();
    expect(units.unitDef("rpm")).toMatchObject({ kind: "angularSpeed", symbol: "rpm" });
  });

  it("refuses a kind or unit it was not given, by name, instead of guessing", () => {
    expect(() => units.formatQuantity(0.35, "mass")).toThrow(CalcInputError);
    expect(() => units.formatQuantity(0.35, "mass")).toThrow('kind must be a quantity kind whose units are registered (useUnits) (got "mass")');
    expect(() => units.unitDef("kg")).toThrow(/^unit must be one of/);
    expect(() => units.unitDef("kg", "to")).toThrow(/^to must be one of/);
    expect(() => units.toSI(1, "kg")).toThrow(/^from must be one of/);
    expect(() => units.findUnit("kg", "mass")).toThrow(CalcInputError);
  });

  it("keeps the first registration of a kind (a second one changes nothing)", () => {
    units.useUnits([{ kind: "length", units: { mm: { symbol: "millimetre", factor: 2 } }, display: [["mm"]] }]);
    expect(units.unitDef("mm")).toMatchObject({ symbol: "mm", factor: 0.001 });
    expect(units.unitsOfKind("length")).toHaveLength(5);
  });
});

describe("registering", () => {
  it("starts empty: a page that registers nothing reads no kind", () => {
    expect(units.unitsLoaded("length")).toBe(false);
    expect(() => units.parseQuantity("45 mm", "length", "mm")).toThrow(CalcInputError);
  });

  it("refuses a table that is not one, naming it", () => {
    expect(() => units.useUnits([{ kind: "length" } as never])).toThrow(CalcInputError);
    expect(() => units.useUnits([null as never])).toThrow(CalcInputError);
    expect(units.unitsLoaded("length")).toBe(false);
  });

  it("adds the kind to each unit it registers", () => {
    units.useUnits(unitTables(["torque"]));
    const newtonMetre: UnitId = "N·m";
    expect(units.unitDef(newtonMetre)).toEqual({ ...UNITS[newtonMetre] });
    expect(units.unitDef("lbf·in").kind).toBe("torque");
  });
});

describe("unitTables", () => {
  it("gives each kind's units without the kind field, and its display steps", () => {
    const [length] = unitTables(["length"]);
    expect(length!.kind).toBe("length");
    expect(Object.keys(length!.units)).toEqual(["m", "cm", "mm", "in", "ft"]);
    expect(length!.units.mm).toEqual({ symbol: "mm", factor: 0.001, aliases: ["millimetre", "millimeter", "millimeters", "millimetres"] });
    expect(length!.display).toBe(DISPLAY.length);
  });

  it("gives every kind when none are named, each unit exactly once", () => {
    const all = unitTables();
    expect(all.map((t) => t.kind)).toEqual(Object.keys(DISPLAY));
    expect(all.flatMap((t) => Object.keys(t.units)).sort()).toEqual(Object.keys(UNITS).sort());
  });

  it("refuses an unknown kind and a list that is not one, by name", () => {
    expect(() => unitTables(["colour" as never])).toThrow('kinds must be quantity kinds (length, mass, …) (got "colour")');
    expect(() => unitTables("length" as never)).toThrow("kinds must be a list of quantity kinds");
  });
});

describe("plainNumber (numbers in links and files written as people write them)", () => {
  // JavaScript writes numbers below 1e-6 and from 1e21 up with an exponent (ECMA-262, Number::toString).
  it.each([
    [1.5e-7, "0.00000015"],
    [-1e-7, "-0.0000001"],
    [2.5e-10, "0.00000000025"],
    [1e21, "1000000000000000000000"],
    [-1.2345e22, "-12345000000000000000000"],
    [1.5e23, "150000000000000000000000"],
    // Longer than 24 characters plain: the exponent stays.
    [1.5e-30, "1.5e-30"],
    [1e24, "1e+24"],
    [5e-324, "5e-324"],
    [-Number.MAX_VALUE, "-1.7976931348623157e+308"],
    // Already plain: as JavaScript writes it.
    [0.000025, "0.000025"],
    [123, "123"],
    [-0.5, "-0.5"],
  ])("writes %s as %s", (value, text) => {
    expect(units.plainNumber(value)).toBe(text);
    expect(Number(units.plainNumber(value))).toBe(value);
  });
});

describe("reading what a builder types, at its edges (all kinds registered)", () => {
  beforeEach(() => units.useUnits(unitTables()));

  it("keeps a link value that does not start with a number as it came", () => {
    expect(units.linkSpelling("x200 gₙ")).toBe("x200gₙ");
    expect(units.linkSpelling("200 gₙ")).toBe("200g");
  });

  it("reads a unit typed with doubled spaces, and no unit from empty text", () => {
    expect(units.findUnit("kg  m2", "inertia")).toBe("kg·m2");
    expect(units.findUnit("", "fraction")).toBeUndefined();
    expect(units.findUnit("  ", "count")).toBeUndefined();
  });

  it("takes a comma after four digits as a decimal mark, and asks about one after three", () => {
    expect(units.parseQuantity("1234,567 mm", "length", "mm")).toMatchObject({ ok: true, number: 1234.567 });
    expect(units.parseQuantity("1,234 mm", "length", "mm")).toMatchObject({ ok: false, reason: "not-a-number" });
  });

  it("lists a kind's units without the empty symbol of a plain ratio", () => {
    expect(units.parseQuantity("5 furlongs", "fraction", "frac")).toEqual({
      ok: false,
      reason: "unknown-unit",
      message: 'has a unit "furlongs" that is not a ratio unit; use %, ppm',
    });
  });

  it("refuses to write a value that is not finite, by name", () => {
    expect(() => units.exactQuantity(Number.POSITIVE_INFINITY, "mm")).toThrow("value must be a finite number");
    expect(() => units.exactNumberText(Number.NaN, 0.001)).toThrow("value must be a finite number");
    expect(() => units.quantityToText(Number.NEGATIVE_INFINITY, "mm")).toThrow(CalcInputError);
  });
});
