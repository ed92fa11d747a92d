/**
 * calc/core/units.ts at its edges: formatNumber on each side of its switches (1e6, 1e-3, the
 * significant-figure limits, ±0, the largest and smallest doubles), the display unit exactly on a
 * step, every message a field shows for text it cannot read, the spellings read and refused, and
 * numbers written for links and files that must read back exactly.
 */
import fc from "fast-check";
import { describe, expect, it, vi } from "vitest";
import { UNITS } from "../../../calc/core/unit-table.ts";
import {
  displayUnit,
  exactNumberText,
  exactQuantity,
  findUnit,
  formatNumber,
  formatQuantity,
  fromSI,
  kindName,
  linkSpelling,
  lookupUnit,
  parseQuantity,
  plainNumber,
  type QuantityKind,
  quantityToText,
  radPerSecondToRpm,
  readExactNumber,
  rpmToRadPerSecond,
  siUnit,
  toSI,
  unitDef,
  type UnitId,
  unitsLoaded,
  unitsOfKind,
  useUnits,
} from "../../../calc/core/units.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("formatNumber on each side of its switches", () => {
  it.each([
    // No exponent from 1e-3 up to, but not including, 1e6.
    { value: 1e6, sig: 3, text: "1.00 × 10⁶", why: "exactly 10⁶ takes the exponent" },
    { value: 999_999, sig: 6, text: "999999", why: "one below 10⁶ stays plain" },
    { value: -1e6, sig: 3, text: "−1.00 × 10⁶", why: "a negative value switches at the same size" },
    { value: 0.001, sig: 3, text: "0.00100", why: "exactly 10⁻³ stays plain" },
    { value: -0.001, sig: 3, text: "−0.00100", why: "and so does its negative" },
    { value: 0.000999, sig: 3, text: "9.99 × 10⁻⁴", why: "just below 10⁻³ takes the exponent" },
    { value: -0.0005, sig: 3, text: "−5.00 × 10⁻⁴", why: "a negative mantissa takes the minus sign" },
    { value: 1, sig: 3, text: "1.00", why: "one digit before the point, two after" },
    { value: 0.5, sig: 3, text: "0.500", why: "no digit before the point: three decimals" },
    { value: 10, sig: 3, text: "10.0", why: "two digits before the point" },
    { value: 123_456, sig: 3, text: "123000", why: "more digits than figures: no decimals, no exponent" },
    { value: 99.95, sig: 3, text: "100", why: "rounds up to three digits before the point" },
    { value: 1e300, sig: 3, text: "1.00 × 10³⁰⁰", why: "a three-digit exponent in superscripts" },
    { value: 1.5e-12, sig: 3, text: "1.50 × 10⁻¹²", why: "a negative two-digit exponent" },
    { value: 3e7, sig: 1, text: "3 × 10⁷", why: "each superscript digit: 7" },
    { value: 4e8, sig: 1, text: "4 × 10⁸", why: "8" },
    { value: 5e9, sig: 1, text: "5 × 10⁹", why: "9" },
    { value: 6e-5, sig: 1, text: "6 × 10⁻⁵", why: "5" },
    { value: 2e-4, sig: 1, text: "2 × 10⁻⁴", why: "4" },
    { value: 8e-6, sig: 1, text: "8 × 10⁻⁶", why: "6" },
    { value: 9e13, sig: 1, text: "9 × 10¹³", why: "1 and 3" },
    { value: 1e20, sig: 1, text: "1 × 10²⁰", why: "2 and 0" },
    { value: 5e-324, sig: 3, text: "4.94 × 10⁻³²⁴", why: "the smallest double (2⁻¹⁰⁷⁴ = 4.94 × 10⁻³²⁴)" },
    // The largest double, 1.797 693 × 10³⁰⁸ (IEEE 754 binary64), rounds to 1.80 × 10³⁰⁸ in three figures,
    // which is past the largest double: it must still print as a number, never "Infinity × 10NaN".
    { value: Number.MAX_VALUE, sig: 3, text: "1.80 × 10³⁰⁸", why: "the largest double" },
    { value: -Number.MAX_VALUE, sig: 2, text: "−1.8 × 10³⁰⁸", why: "and its negative" },
    { value: Number.MAX_VALUE, sig: 1, text: "2 × 10³⁰⁸", why: "to one figure" },
    { value: -0, sig: 3, text: "0", why: "minus zero reads as zero, never −0" },
    { value: 0, sig: 1, text: "0", why: "zero has no figures to pad" },
    { value: 7, sig: 1, text: "7", why: "one figure" },
    { value: 0.04, sig: 1, text: "0.04", why: "one figure after leading zeros" },
  ])("$value to $sig figures is $text: $why", ({ value, sig, text }) => {
    expect(formatNumber(value, sig)).toBe(text);
  });

  it("uses three figures when told nothing", () => {
    expect(formatNumber(Math.PI)).toBe("3.14");
  });

  it("shows every non-finite value as a dash", () => {
    expect(formatNumber(Number.NEGATIVE_INFINITY)).toBe("—");
    expect(formatNumber(Number.NaN, 5)).toBe("—");
  });

  it("refuses a figure count that is not a whole number from 1 to 100, even for a value it would show as a dash", () => {
    expectRefusal(() => formatNumber(Number.NaN, 0), "significant", 0, "", "significant must be a whole number from 1 to 100 (got 0)");
    expectRefusal(() => formatNumber(1, Number.NaN), "significant", Number.NaN, "", "significant must be a whole number from 1 to 100 (got not a number)");
    expectRefusal(() => formatNumber(1, -3), "significant", -3, "", "significant must be a whole number from 1 to 100 (got -3)");
    expect(formatNumber(1, 100)).toBe(`1.${"0".repeat(99)}`);
  });
});

describe("the display unit exactly on a step", () => {
  it.each([
    { kind: "length", system: "metric", value: 10, unit: "m", text: "10.0 m", why: "10 m reaches the metre step" },
    { kind: "length", system: "metric", value: 9.99, unit: "mm", text: "9990 mm", why: "just short of it" },
    // 10 ft = 3.048 m exactly (1 ft = 0.3048 m, NIST SP 811 App. B.8).
    { kind: "length", system: "us", value: 3.048, unit: "ft", text: "10.0 ft", why: "10 ft reaches the foot step" },
    { kind: "length", system: "us", value: 3.0479, unit: "in", text: "120 in", why: "just short of it" },
    { kind: "mass", system: "us", value: 0.45359237, unit: "lb", text: "1.00 lb", why: "1 lb exactly (0.453 592 37 kg)" },
    { kind: "mass", system: "us", value: 0.45359236, unit: "oz", text: "16.0 oz", why: "just short of it" },
    { kind: "time", system: "metric", value: 1e-3, unit: "ms", text: "1.00 ms", why: "1 ms reaches the millisecond step" },
    { kind: "time", system: "metric", value: 9.99e-4, unit: "us", text: "999 µs", why: "just short of it" },
    { kind: "time", system: "metric", value: 1, unit: "s", text: "1.00 s", why: "1 s reaches the second step" },
    { kind: "frequency", system: "metric", value: 1e4, unit: "kHz", text: "10.0 kHz", why: "10 kHz" },
    { kind: "frequency", system: "metric", value: 9999, unit: "Hz", text: "10000 Hz", why: "one hertz short" },
    { kind: "power", system: "metric", value: 1e4, unit: "kW", text: "10.0 kW", why: "10 kW" },
    { kind: "resistance", system: "metric", value: 10, unit: "ohm", text: "10.0 Ω", why: "10 Ω" },
    { kind: "resistance", system: "metric", value: 9, unit: "mohm", text: "9000 mΩ", why: "below it" },
    // 1 lbf·in = 4.448 221 615 260 5 N × 0.0254 m (NIST SP 811 App. B.8).
    { kind: "torque", system: "us", value: 4.4482216152605 * 0.0254, unit: "lbf·in", text: "1.00 lbf·in", why: "1 lbf·in" },
    { kind: "torque", system: "us", value: 0.1, unit: "ozf·in", text: "14.2 ozf·in", why: "below it (0.1 N·m = 14.16 ozf·in)" },
    { kind: "acceleration", system: "us", value: 9.80665, unit: "gn", text: "1.00 gₙ", why: "a kind without US steps shows its metric unit" },
    { kind: "mass", system: "metric", value: 0, unit: "g", text: "0 g", why: "zero takes the first step" },
  ] as const)("$value SI of $kind ($system) shows in $unit as $text: $why", ({ kind, system, value, unit, text }) => {
    expect(displayUnit(kind, system, value)).toBe(unit);
    expect(formatQuantity(value, kind, { system }).text).toBe(text);
  });

  it("takes the first step when no value is given", () => {
    expect(displayUnit("mass", "metric")).toBe("g");
    expect(displayUnit("length", "us")).toBe("in");
  });

  it("formats in an explicit unit with the figures asked for, and says what it used", () => {
    expect(formatQuantity(0.0254, "length", { unit: "mm", significant: 4 })).toEqual({ text: "25.40 mm", number: "25.40", symbol: "mm", unit: "mm" });
    expect(formatQuantity(0.25, "fraction", { unit: "frac" })).toEqual({ text: "0.250", number: "0.250", symbol: "", unit: "frac" });
    expect(formatQuantity(Math.PI, "angle", { unit: "rad" }).text).toBe("3.14 rad");
    // 1 rev/s = 60 rpm; shown in °/s with its degree sign set against the number.
    expect(formatQuantity(2 * Math.PI, "angularSpeed", { unit: "deg/s" }).text).toBe("360 °/s");
  });

  it("shows a value beyond the largest double in a small unit as a dash", () => {
    expect(formatQuantity(1e308, "length", { unit: "mm" }).text).toBe("— mm");
  });
});

describe("parseQuantity: every message a field shows", () => {
  it("asks for the unit a bare number is read in to be a known one", () => {
    expectRefusal(
      () => parseQuantity("3", "length", "furlong" as UnitId),
      "defaultUnit",
      "furlong",
      "",
      'defaultUnit must be one of m, cm, mm, … (got "furlong")',
    );
  });

  it.each([
    { kind: "angularSpeed", unit: "rpm", example: "2400 rpm" },
    { kind: "fraction", unit: "frac", example: "10" },
    { kind: "fraction", unit: "pct", example: "10 %" },
    { kind: "count", unit: "count", example: "32" },
    { kind: "mass", unit: "g", example: "32 g" },
  ] as const)("gives $example as the example for a $kind field in $unit", ({ kind, unit, example }) => {
    expect(parseQuantity("fast", kind, unit)).toEqual({ ok: false, reason: "not-a-number", message: `must start with a number, e.g. ${example}` });
    expect(parseQuantity("1e400", kind, unit)).toEqual({ ok: false, reason: "not-a-number", message: `must be a finite number, e.g. ${example}` });
  });

  it("asks which a comma after one to three digits means, keeping the sign as typed", () => {
    const tail = "(a comma can be a decimal mark or a thousands separator)";
    expect(parseQuantity("2,400 rpm", "angularSpeed", "rpm")).toEqual({
      ok: false,
      reason: "not-a-number",
      message: `is ambiguous: write 2400 or 2.400 ${tail}`,
    });
    expect(parseQuantity("-1,500", "length", "mm")).toEqual({ ok: false, reason: "not-a-number", message: `is ambiguous: write -1500 or -1.500 ${tail}` });
    expect(parseQuantity("+12,500 mm", "length", "mm")).toMatchObject({ message: `is ambiguous: write +12500 or +12.500 ${tail}` });
    expect(parseQuantity("−1,500", "length", "mm")).toMatchObject({ message: `is ambiguous: write −1500 or −1.500 ${tail}` });
  });

  it("reads a comma that cannot be a thousands separator as a decimal mark", () => {
    expect(parseQuantity("12,5 mm", "length", "mm")).toEqual({ ok: true, valueSI: 0.0125, unit: "mm", number: 12.5 });
    expect(parseQuantity("1,2345 m", "length", "mm")).toEqual({ ok: true, valueSI: 1.2345, unit: "m", number: 1.2345 });
    expect(parseQuantity(",5", "fraction", "frac")).toEqual({ ok: true, valueSI: 0.5, unit: "frac", number: 0.5 });
    expect(parseQuantity("1,234e3 mm", "length", "mm")).toMatchObject({ ok: true, number: 1234 });
  });

  it("reads the typographic minus in the number and in its exponent", () => {
    expect(parseQuantity("−2e−3 m", "length", "mm")).toEqual({ ok: true, valueSI: -0.002, unit: "m", number: -0.002 });
    expect(parseQuantity("+3 mm", "length", "mm")).toEqual({ ok: true, valueSI: 0.003, unit: "mm", number: 3 });
    expect(parseQuantity(".5 in", "length", "mm")).toEqual({ ok: true, valueSI: 0.0127, unit: "in", number: 0.5 });
    expect(parseQuantity("  7.  ", "length", "mm")).toEqual({ ok: true, valueSI: 0.007, unit: "mm", number: 7 });
  });

  it("names the kind of the field in words, with the article that fits", () => {
    const names: [QuantityKind, UnitId, string][] = [
      ["angularSpeed", "rpm", 'has a unit "kg" that is not a rotational speed unit; use rad/s, rpm, rev/s, °/s'],
      ["inertia", "kg·m2", 'has a unit "kg" that is not a moment of inertia unit; use kg·m², g·cm², lb·in², oz·in²'],
      ["motorVelocityConstant", "rpm/V", 'has a unit "kg" that is not a motor velocity constant unit; use rad/(s·V), rpm/V'],
      ["unbalance", "g·mm", 'has a unit "kg" that is not an unbalance unit; use kg·m, g·mm, oz·in'],
      ["energy", "J", 'has a unit "kg" that is not an energy unit; use J, kJ, Wh, ft·lbf'],
      ["area", "mm2", 'has a unit "kg" that is not an area unit; use m², mm², in²'],
      ["density", "g/cm3", 'has a unit "kg" that is not a density unit; use kg/m³, g/cm³, lb/in³'],
    ];
    for (const [kind, unit, message] of names) expect(parseQuantity("3 kg", kind, unit), kind).toEqual({ ok: false, reason: "unknown-unit", message });
    expect(kindName("length")).toBe("length");
    expect(kindName("fraction")).toBe("ratio");
    expect(kindName("angularAcceleration")).toBe("angular acceleration");
  });

  it("shows an unknown unit of up to 20 characters whole, and cuts a longer one", () => {
    const twenty = "abcdefghijklmnopqrst";
    expect(parseQuantity(`3 ${twenty}`, "length", "mm")).toMatchObject({ message: `has a unit "${twenty}" that is not a length unit; use m, cm, mm, in, ft` });
    expect(parseQuantity(`3 ${twenty}u`, "length", "mm")).toMatchObject({
      message: `has a unit "${twenty}…" that is not a length unit; use m, cm, mm, in, ft`,
    });
  });

  it("tells a count field that it takes no unit", () => {
    expect(parseQuantity("3 bolts", "count", "count")).toEqual({
      ok: false,
      reason: "unknown-unit",
      message: 'takes a plain number, without a unit (got "bolts")',
    });
    expect(parseQuantity("3", "count", "count")).toEqual({ ok: true, valueSI: 3, unit: "count", number: 3 });
  });

  it("refuses a number whose SI value passes the largest double", () => {
    // 1e300 GPa = 1e309 Pa, past 1.797 69 × 10³⁰⁸.
    expect(parseQuantity("1e300 GPa", "stress", "MPa")).toEqual({ ok: false, reason: "not-a-number", message: "is too large a number" });
    expect(parseQuantity("1e299 GPa", "stress", "MPa")).toMatchObject({ ok: true, valueSI: 1e308 });
  });

  it("reads the number only at the start of the text, and the unit to its end", () => {
    expect(parseQuantity("about 5 mm", "length", "mm")).toEqual({ ok: false, reason: "not-a-number", message: "must start with a number, e.g. 32 mm" });
    expect(parseQuantity("5 mm\nx", "length", "mm")).toEqual({ ok: false, reason: "not-a-number", message: "must start with a number, e.g. 32 mm" });
    expect(parseQuantity("5 mm x", "length", "mm")).toMatchObject({ ok: false, reason: "unknown-unit" });
  });

  it("says an empty or blank field is required", () => {
    expect(parseQuantity("", "length", "mm")).toEqual({ ok: false, reason: "empty", message: "is required" });
    expect(parseQuantity("\t \n", "length", "mm")).toEqual({ ok: false, reason: "empty", message: "is required" });
  });
});

describe("findUnit: spellings read and refused", () => {
  it.each([
    { text: "MM", kind: "length", id: "mm", why: "case is ignored when only one unit matches" },
    { text: "KG", kind: "mass", id: "kg", why: "" },
    { text: "Mpa", kind: "stress", id: "MPa", why: "" },
    { text: "MOHM", kind: "resistance", id: "mohm", why: "" },
    { text: "us", kind: "time", id: "us", why: "a Latin u before s reads as micro" },
    { text: "in^2", kind: "area", id: "in2", why: "a caret power" },
    { text: "in²", kind: "area", id: "in2", why: "a superscript power" },
    { text: "in^²", kind: "area", id: "in2", why: "a caret before a superscript" },
    { text: "lb/in^3", kind: "density", id: "lb/in3", why: "" },
    { text: "g/cm³", kind: "density", id: "g/cm3", why: "" },
    { text: "  kg  m2 ", kind: "inertia", id: "kg·m2", why: "spaces trimmed and collapsed" },
    { text: "x", kind: "fraction", id: "frac", why: "the plain ratio's alias" },
  ] as const)('reads "$text" as $id in a $kind field $why', ({ text, kind, id }) => {
    expect(findUnit(text, kind)).toBe(id);
  });

  it.each([
    { text: "mus", kind: "time", why: "a u inside a word is not micro" },
    { text: "kg", kind: "length", why: "a unit of another kind" },
    { text: "m2", kind: "length", why: "an area in a length field" },
    { text: "rpm", kind: "angle", why: "a speed in an angle field" },
    { text: "ms", kind: "length", why: "" },
    { text: "mm ", kind: "area", why: "" },
    { text: "sqmm", kind: "area", why: "a spelling with a space is not read without it" },
    { text: "rads-1", kind: "angularSpeed", why: "" },
  ] as const)('refuses "$text" in a $kind field $why', ({ text, kind }) => {
    expect(findUnit(text, kind)).toBeUndefined();
  });
});

describe("exact numbers for links and files", () => {
  it("writes plain decimals up to 24 characters and keeps the exponent beyond", () => {
    // 10⁻²² is "0." and 21 zeros and a 1: 24 characters; 10⁻²³ would be 25.
    expect(plainNumber(1e-22)).toBe("0.0000000000000000000001");
    expect(plainNumber(1e-23)).toBe("1e-23");
    expect(plainNumber(-1e-22)).toBe("-1e-22");
    expect(plainNumber(1e23)).toBe("100000000000000000000000");
    expect(plainNumber(1.25e-7)).toBe("0.000000125");
    expect(plainNumber(1.2345678e21)).toBe("1234567800000000000000");
  });

  it("writes the shortest number that reads back exactly, in the unit asked for", () => {
    expect(exactQuantity(0.032, "mm")).toEqual({ number: "32", unit: "mm" });
    expect(exactQuantity(0.0254, "in")).toEqual({ number: "1", unit: "in" });
    expect(exactQuantity(-0.0254, "in")).toEqual({ number: "-1", unit: "in" });
    expect(exactQuantity(-0, "mm")).toEqual({ number: "0", unit: "mm" });
    expect(exactQuantity(0.3, "m")).toEqual({ number: "0.3", unit: "m" });
    // 0.03 m is no product n × 0.0254 of a double n (no rounding of 0.03/0.0254 and none of its
    // four neighbours either side multiplies back to it): it stays in metres.
    expect(exactQuantity(0.03, "in")).toEqual({ number: "0.03", unit: "m" });
    expectRefusal(() => exactQuantity(0.3, "furlong" as UnitId), "unit", "furlong", "", 'unit must be one of m, cm, mm, … (got "furlong")');
    expectRefusal(() => exactQuantity(Number.NaN, "mm"), "value", Number.NaN, "", "value must be a finite number (got not a number)");
  });

  it("falls back to the kind's SI unit in the spelling a link reads", () => {
    expect(quantityToText(0.03, "in")).toBe("0.03m");
    expect(quantityToText(1.9, "lbf·in")).toBe("1.9Nm");
    // 0.7 is no product n × 0.01 of a double n (found by trying every shorter n): the plain ratio is marked "x".
    expect(quantityToText(0.7, "pct")).toBe("0.7x");
    expect(parseQuantity("0.7x", "fraction", "pct")).toMatchObject({ ok: true, valueSI: 0.7 });
    expect(quantityToText(0.25, "frac")).toBe("0.25");
    expect(quantityToText(0.25, "pct")).toBe("25pct");
    expect(quantityToText(3, "count")).toBe("3");
    expect(quantityToText(2, "N·m")).toBe("2Nm");
    expect(quantityToText(9.80665, "gn")).toBe("1g");
    expect(quantityToText(-0, "mm")).toBe("0mm");
  });

  it("uses all seventeen figures when no shorter number reads back", () => {
    // 102 × 0.001 is 0.10200000000000001 in doubles, not 0.102; 101.99999999999999 × 0.001 is 0.102.
    expect(102 * 0.001).not.toBe(0.102);
    expect(quantityToText(0.102, "mm")).toBe("101.99999999999999mm");
    expect(parseQuantity("101.99999999999999mm", "length", "mm")).toMatchObject({ ok: true, valueSI: 0.102 });
    expect(exactNumberText(0.102, 0.001)).toBe("101.99999999999999");
  });

  it.each([
    { value: 2e-6, unit: "mm2", text: "2mm2" },
    { value: Math.PI / 12, unit: "deg", text: "15deg" },
    { value: 2.5e-4, unit: "us", text: "250us" },
    { value: 3, unit: "m/s2", text: "3m/s2" },
    { value: 2000, unit: "kg/m3", text: "2000kg/m3" },
    { value: 8, unit: "ohm", text: "8ohm" },
    { value: 0.008, unit: "mohm", text: "8mohm" },
    { value: 1, unit: "kg·m2", text: "1kgm2" },
    { value: 5, unit: "rad/s", text: "5rad/s" },
    { value: 2 * Math.PI, unit: "rps", text: "1rev/s", why: "a plain symbol with a slash is written as shown, not by its id" },
  ] as const)("writes $value SI in $unit as $text, with the unit in letters a URL keeps as they are", ({ value, unit, text }) => {
    expect(quantityToText(value, unit)).toBe(text);
  });

  it("writes every finite value in every unit so that it reads back as exactly the same value (property)", () => {
    const ids = Object.keys(UNITS) as UnitId[];
    fc.assert(
      fc.property(fc.constantFrom(...ids), fc.double({ noNaN: true, noDefaultInfinity: true }), (unit, value) => {
        const text = quantityToText(value, unit);
        const back = parseQuantity(text, UNITS[unit].kind, unit);
        // −0 is written "0" and reads back as 0.
        expect(back.ok && back.valueSI).toBe(value === 0 ? 0 : value);
        expect(readExactNumber(exactNumberText(value, UNITS[unit].factor), UNITS[unit].factor)).toBe(value === 0 ? 0 : value);
      }),
      { numRuns: 3000 },
    );
  });

  it("finds the number one step in the last place above the quotient when no rounding of it reads back", () => {
    // 1/49 is 0.020408163265306121 as a double, and that times 49 is 0.9999999999999999; the next
    // double up, 0.020408163265306124, times 49 is 1 exactly.
    expect((1 / 49) * 49).not.toBe(1);
    expect(exactNumberText(1, 49)).toBe("0.020408163265306124");
    expect(readExactNumber("0.020408163265306124", 49)).toBe(1);
  });

  it("writes a bare number in the unit of a given size, or the SI value marked si", () => {
    expect(exactNumberText(0.0127, 0.001)).toBe("12.7");
    expect(exactNumberText(-0, 0.001)).toBe("0");
    expect(exactNumberText(0.3, 1)).toBe("0.3");
    expect(exactNumberText(0.03, 0.0254)).toBe("0.03si");
    expectRefusal(() => exactNumberText(Number.POSITIVE_INFINITY, 1), "value", Number.POSITIVE_INFINITY, "", "value must be a finite number (got infinity)");
  });

  it.each([
    { text: "12.7", factor: 0.001, value: 0.0127 },
    { text: "0.03si", factor: 0.0254, value: 0.03 },
    { text: "-2", factor: 0.5, value: -1 },
    { text: "+2", factor: 0.5, value: 1 },
    { text: ".5", factor: 2, value: 1 },
    { text: "5.", factor: 2, value: 10 },
    { text: "1e3", factor: 0.001, value: 1 },
    { text: "1E-3si", factor: 5, value: 0.001 },
  ])('reads "$text" with unit size $factor as $value SI', ({ text, factor, value }) => {
    expect(readExactNumber(text, factor)).toBe(value);
  });

  it.each([
    { text: "", why: "nothing" },
    { text: "12.7 mm", why: "a unit" },
    { text: "si", why: "no number" },
    { text: "1,5", why: "a comma" },
    { text: "12.7SI", why: "a capital SI" },
    { text: " 12", why: "a leading space" },
    { text: "1e400", why: "past the largest double" },
    { text: "1e306", why: "past it once scaled by 1000" },
  ])('reads no number from "$text" ($why)', ({ text }) => {
    expect(readExactNumber(text, 1000)).toBeNull();
  });
});

describe("link spelling of field text", () => {
  it.each([
    { text: "1,5 kg·m²", link: "1,5kgm2", why: "a symbol a URL would encode takes its ASCII spelling" },
    { text: "−3 N·m", link: "−3Nm", why: "a typographic minus is kept" },
    { text: "2e3 lbf·in", link: "2e3lbf-in", why: "an exponent is kept" },
    { text: "12 mm", link: "12mm", why: "a plain symbol stays" },
    { text: "5 %", link: "5%", why: "a per cent sign stays" },
    { text: "3 furlong²", link: "3furlong²", why: "an unknown symbol stays as typed" },
    { text: "45", link: "45", why: "a bare number" },
    { text: "", link: "", why: "nothing" },
  ])('writes "$text" as "$link": $why', ({ text, link }) => {
    expect(linkSpelling(text)).toBe(link);
  });

  it("refuses what is not text, by name", () => {
    expectRefusal(() => linkSpelling(5 as unknown as string), "text", 5, "", "text must be text (got 5)");
  });
});

describe("conversions and registration refuse what they cannot do, by name", () => {
  it("refuses a conversion that leaves the doubles", () => {
    // 1e308 rad/s = 9.55 × 10³⁰⁸ rpm, past the largest double.
    expectRefusal(() => radPerSecondToRpm(1e308), "value", 1e308, "", "value must be a number that stays finite in the new unit (got 1e+308)");
    expectRefusal(() => rpmToRadPerSecond(Number.NaN), "value", Number.NaN, "", "value must be a number that stays finite in the new unit (got not a number)");
    expect(rpmToRadPerSecond(60)).toBe(2 * Math.PI);
    expect(toSI(-0, "mm")).toBe(-0);
    expect(fromSI(1, "m")).toBe(1);
  });

  it("refuses a table that is not one, naming what it was given", () => {
    const message = (kind: string) => `tables must be unit tables from unitTables() (got "${kind}")`;
    expectRefusal(() => useUnits([{ kind: 5, units: {}, display: [] } as never]), "tables", "5", "", message("5"));
    expectRefusal(() => useUnits([{ kind: "length", units: "mm", display: [["mm"]] } as never]), "tables", "length", "", message("length"));
    expectRefusal(() => useUnits([{ kind: "length", units: {}, display: "mm" } as never]), "tables", "length", "", message("length"));
    expect(() => useUnits(null as never)).not.toThrow();
    expect(unitsOfKind("length")).toEqual(["m", "cm", "mm", "in", "ft"]);
  });

  it("never takes a name of an object's machinery for a kind or a unit", () => {
    expect(unitsLoaded("toString" as QuantityKind)).toBe(false);
    expect(unitsLoaded(5 as unknown as QuantityKind)).toBe(false);
    expect(lookupUnit("toString")).toBeUndefined();
    expect(lookupUnit(5)).toBeUndefined();
    expectRefusal(
      () => unitsOfKind("toString" as QuantityKind),
      "kind",
      "toString",
      "",
      'kind must be a quantity kind whose units are registered (useUnits) (got "toString")',
    );
    expectRefusal(() => unitDef("valueOf" as UnitId), "unit", "valueOf", "", 'unit must be one of m, cm, mm, … (got "valueOf")');
  });

  it("gives a copy of a kind's units that a caller may change", () => {
    const list = unitsOfKind("mass");
    list.push("m");
    expect(unitsOfKind("mass")).toEqual(["kg", "g", "lb", "oz"]);
  });

  it("names each kind's SI unit: the one whose factor is 1", () => {
    const si: Record<string, string> = {
      length: "m",
      area: "m2",
      mass: "kg",
      acceleration: "m/s2",
      angularSpeed: "rad/s",
      angle: "rad",
      time: "s",
      torque: "N·m",
      inertia: "kg·m2",
      stress: "Pa",
      fraction: "frac",
      count: "count",
    };
    for (const [kind, id] of Object.entries(si)) expect(siUnit(kind as QuantityKind), kind).toBe(id);
  });
});

describe("a spelling that differs from another unit's only in case", () => {
  // The megametre (Mm) and the millimetre (mm): SI prefixes mega (10⁶) and milli (10⁻³), NIST SP 811 Table 5.
  // The handbook's own table has no such pair, so a fresh copy of the module registers one.
  it("reads the exact spelling first, and no unit when ignoring case leaves two", async () => {
    vi.resetModules();
    const fresh = await import("../../../calc/core/units.ts");
    fresh.useUnits([
      {
        kind: "length",
        units: { mm: { symbol: "mm", factor: 1e-3 }, Mm: { symbol: "Mm", factor: 1e6 }, m: { symbol: "m", factor: 1 } } as never,
        display: [["mm"]],
      },
    ]);
    // The SI unit is the one of factor 1, wherever it stands in the table.
    expect(fresh.siUnit("length")).toBe("m");
    expect(fresh.findUnit("mm", "length")).toBe("mm");
    expect(fresh.findUnit("Mm", "length")).toBe("Mm");
    expect(fresh.findUnit("MM", "length")).toBeUndefined();
    expect(fresh.findUnit("mM", "length")).toBeUndefined();
    expect(fresh.findUnit("M", "length")).toBe("m");
    expect(fresh.parseQuantity("2 Mm", "length", "mm")).toMatchObject({ ok: true, valueSI: 2e6 });
    expect(fresh.parseQuantity("2 MM", "length", "mm")).toMatchObject({ ok: false, reason: "unknown-unit" });
  });
});

describe("registering a table without units", () => {
  it("refuses it by name instead of failing on the missing list", async () => {
    vi.resetModules();
    const fresh = await import("../../../calc/core/units.ts");
    const error = (() => {
      try {
        fresh.useUnits([{ kind: "length", units: null, display: [["mm"]] } as never]);
      } catch (thrown) {
        return thrown as Error;
      }
      return null;
    })();
    expect(error?.name).toBe("CalcInputError");
    expect(error?.message).toBe('tables must be unit tables from unitTables() (got "length")');
    expect(fresh.unitsLoaded("length")).toBe(false);
  });
});
