import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  CalcInputError,
  convert,
  findUnit,
  type QuantityKind,
  formatNumber,
  formatQuantity,
  fromSI,
  linkSpelling,
  parseQuantity,
  quantityToText,
  radPerSecondToRpm,
  rpmToRadPerSecond,
  STANDARD_GRAVITY,
  toSI,
  UNITS,
  UNIT_DEFINITIONS,
  isSourceKey,
  unitsOfKind,
  type UnitId,
} from "#calc";

interface ReferenceCase {
  source: string;
  locator: string;
  value: number;
  from: UnitId;
  expected: number;
  rtol: number;
  note: string;
}

// Exact definitional factors: tolerance is floating point only (1e-12).
const exactFactors: ReferenceCase[] = [
  { source: "3rd CGPM (1901)", locator: "Comptes rendus p. 70", value: 1, from: "gn", expected: 9.80665, rtol: 1e-12, note: "standard gravity, exact" },
  { source: "1959 international yard and pound", locator: "yard = 0.9144 m", value: 12, from: "in", expected: 0.3048, rtol: 1e-12, note: "12 in = 1 ft" },
  { source: "NIST SP 811", locator: "App. B.8, inch", value: 1, from: "in", expected: 0.0254, rtol: 1e-12, note: "exact" },
  { source: "NIST SP 811", locator: "App. B.8, foot", value: 1, from: "ft", expected: 0.3048, rtol: 1e-12, note: "exact" },
  { source: "NPL FAQ / 1959 agreement", locator: "1 lb = 0.453 592 37 kg", value: 10, from: "lb", expected: 4.5359237, rtol: 1e-12, note: "exact" },
  { source: "NIST SP 811", locator: "App. B.8, ounce (avoirdupois)", value: 1, from: "oz", expected: 0.028349523125, rtol: 1e-12, note: "lb/16, exact" },
  {
    source: "NIST SP 811 (13 digits via a reference copy)",
    locator: "pound-force = lb × g_n",
    value: 100,
    from: "lbf",
    expected: 444.82216152605,
    rtol: 1e-12,
    note: "exact by definition",
  },
  { source: "NIST SP 811", locator: "rev/min → rad/s", value: 3000, from: "rpm", expected: 314.159265358979, rtol: 1e-12, note: "1 rev = 2π rad" },
  {
    source: "NIST SP 811",
    locator: "App. B.8, lbf·in (rounded 1.129 848 E-01)",
    value: 1,
    from: "lbf·in",
    expected: 0.112984829027617,
    rtol: 1e-12,
    note: "derived exact",
  },
  {
    source: "NIST SP 811 (from memory) / derived exact",
    locator: "ozf·in",
    value: 1,
    from: "ozf·in",
    expected: 7.06155181422604e-3,
    rtol: 1e-12,
    note: "derived exact",
  },
  {
    source: "NIST SP 811 (from memory) / derived exact",
    locator: "lb·in²",
    value: 1,
    from: "lb·in2",
    expected: 2.926396534292e-4,
    rtol: 1e-12,
    note: "derived exact",
  },
  { source: "NIST SP 811 / derived exact", locator: "ft·lbf", value: 1, from: "ft·lbf", expected: 1.3558179483314, rtol: 1e-12, note: "derived exact" },
];

describe("units: exact conversion factors", () => {
  it.each(exactFactors)("$source, $locator: $value $from = $expected SI ($note)", ({ value, from, expected, rtol }) => {
    expect(Math.abs(toSI(value, from) - expected) / expected).toBeLessThanOrEqual(rtol);
  });

  it("defines standard gravity as 9.806 65 m/s² exactly (3rd CGPM 1901)", () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });

  it("gives g_n as 32.174 05 ft/s² and 386.0886 in/s² (ASA glossary, derived exact)", () => {
    expect(convert(1, "gn", "ft/s2")).toBeCloseTo(32.17405, 5);
    expect(fromSI(STANDARD_GRAVITY, "in")).toBeCloseTo(386.0886, 4);
  });

  it("turns 1 rad/s into 9.549 296 585 513 72 rpm (exact, 60/2π)", () => {
    expect(radPerSecondToRpm(1)).toBeCloseTo(9.54929658551372, 12);
    expect(rpmToRadPerSecond(1)).toBeCloseTo(0.10471975511965977, 15);
  });

  it("marks every unit exact, derived or approximate, defines it in words and names a source", () => {
    for (const [id, def] of Object.entries(UNITS)) {
      const provenance = UNIT_DEFINITIONS[id as UnitId];
      expect(["exact", "derived", "approximate"], id).toContain(provenance.exactness);
      expect(provenance.definition.length, id).toBeGreaterThan(2);
      expect(isSourceKey(provenance.source), id).toBe(true);
      expect(def.factor, id).toBeGreaterThan(0);
    }
    expect(Object.keys(UNIT_DEFINITIONS).sort()).toEqual(Object.keys(UNITS).sort());
  });

  it("round-trips every unit through SI (property)", () => {
    const ids = Object.keys(UNITS) as UnitId[];
    fc.assert(
      fc.property(fc.constantFrom(...ids), fc.double({ min: -1e9, max: 1e9, noNaN: true }), (id, value) => {
        const back = fromSI(toSI(value, id), id);
        expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(value)));
      }),
    );
  });

  it("refuses to convert between different kinds", () => {
    expect(() => convert(1, "mm", "kg")).toThrow(CalcInputError);
    expect(() => convert(1, "mm", "kg")).toThrow('to must be a unit of length, as mm is (got "kg")');
  });
});

describe("units: reading what a user typed", () => {
  it.each([
    { text: "45 mm", kind: "length", unit: "mm", si: 0.045 },
    { text: "1.8 in", kind: "length", unit: "mm", si: 0.04572 },
    { text: "1.8in", kind: "length", unit: "mm", si: 0.04572 },
    { text: "1,8 in", kind: "length", unit: "mm", si: 0.04572 },
    { text: "32", kind: "length", unit: "mm", si: 0.032 },
    { text: "2000 rpm", kind: "angularSpeed", unit: "rpm", si: 209.43951023931956 },
    { text: "2000 RPM", kind: "angularSpeed", unit: "rpm", si: 209.43951023931956 },
    { text: "350 g", kind: "mass", unit: "g", si: 0.35 },
    { text: "350 g", kind: "acceleration", unit: "gn", si: 350 * 9.80665 },
    { text: "1.5 kg", kind: "mass", unit: "g", si: 1.5 },
    { text: "3 lb", kind: "mass", unit: "g", si: 3 * 0.45359237 },
    { text: "20 %", kind: "fraction", unit: "pct", si: 0.2 },
    { text: "0.2", kind: "fraction", unit: "frac", si: 0.2 },
    { text: "100 m/s²", kind: "acceleration", unit: "gn", si: 100 },
    { text: "100 m/s^2", kind: "acceleration", unit: "gn", si: 100 },
    { text: "250 µs", kind: "time", unit: "ms", si: 250e-6 },
    { text: "250 us", kind: "time", unit: "ms", si: 250e-6 },
    { text: "1e3 rpm", kind: "angularSpeed", unit: "rpm", si: 104.71975511965977 },
    { text: "−5 mm", kind: "length", unit: "mm", si: -0.005 },
  ] as const)('reads "$text" in a $kind field as $si SI', ({ text, kind, unit, si }) => {
    const result = parseQuantity(text, kind, unit);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.valueSI).toBeCloseTo(si, 12);
  });

  it("says a field is required when it is empty", () => {
    expect(parseQuantity("   ", "length", "mm")).toMatchObject({ ok: false, reason: "empty", message: "is required" });
  });

  it("explains a value that does not start with a number", () => {
    expect(parseQuantity("abc", "length", "mm")).toMatchObject({ ok: false, reason: "not-a-number", message: "must start with a number, e.g. 32 mm" });
  });

  it("names the valid units when the unit is of the wrong kind", () => {
    const result = parseQuantity("3 kg", "length", "mm");
    expect(result).toMatchObject({ ok: false, reason: "unknown-unit" });
    if (!result.ok) expect(result.message).toBe('has a unit "kg" that is not a length unit; use m, cm, mm, in, ft');
    // An article that fits the kind's name: "an acceleration", "an angular acceleration".
    expect(parseQuantity("3 kg", "acceleration", "g")).toMatchObject({
      message: expect.stringMatching(/^has a unit "kg" that is not an acceleration unit; use /),
    });
    expect(parseQuantity("3 kg", "angularAcceleration", "rad/s2")).toMatchObject({
      message: expect.stringMatching(/^has a unit "kg" that is not an angular acceleration unit; use /),
    });
  });

  it("takes only real spellings of a unit, never a name from the code (a constant's name once stood among rpm's aliases)", () => {
    for (const spelling of ["RAD_PER_S_PER_RPM", "RPM_TO_RAD", "STANDARD_GRAVITY"]) {
      expect(parseQuantity(`3000 ${spelling}`, "angularSpeed", "rpm")).toMatchObject({ ok: false, reason: "unknown-unit" });
    }
    for (const [id, def] of Object.entries(UNITS))
      for (const alias of ("aliases" in def ? def.aliases : []) as readonly string[]) expect(alias, `${id}: ${alias}`).not.toMatch(/^[A-Z0-9]+_[A-Z0-9_]+$/);
  });

  it("refuses a comma that could be a thousands separator", () => {
    const result = parseQuantity("2,400 rpm", "angularSpeed", "rpm");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain("write 2400 or 2.400");
  });

  it("rejects infinite numbers", () => {
    expect(parseQuantity("1e999 mm", "length", "mm")).toMatchObject({ ok: false, reason: "not-a-number" });
  });

  it("never throws on any text (property)", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 60 }), (text) => {
        const result = parseQuantity(text, "length", "mm");
        if (result.ok) expect(Number.isFinite(result.valueSI)).toBe(true);
        else expect(result.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 2000 },
    );
  });

  it("finds each unit of a kind by its own symbol", () => {
    for (const kind of ["length", "mass", "acceleration", "angularSpeed", "force", "stress", "inertia"] as const) {
      for (const id of unitsOfKind(kind)) expect(findUnit(UNITS[id].symbol, kind), `${kind} ${id}`).toBe(id);
    }
  });

  it("reads a superscript, a caret power, a Greek mu and the URL spelling without listing each as an alias", () => {
    const spellings: [string, QuantityKind, string][] = [
      ["kg·m²", "inertia", "kg·m2"],
      ["kg·m^2", "inertia", "kg·m2"],
      ["kgm^2", "inertia", "kg·m2"],
      ["kgm2", "inertia", "kg·m2"],
      ["lb-in^2", "inertia", "lb·in2"],
      ["g·cm²", "inertia", "g·cm2"],
      ["m/s^2", "acceleration", "m/s2"],
      ["g", "acceleration", "gn"],
      ["N/mm²", "stress", "MPa"],
      ["lbf/in²", "stress", "psi"],
      ["kg/m^3", "density", "kg/m3"],
      ["μs", "time", "us"],
      ["µs", "time", "us"],
      ["Nm", "torque", "N·m"],
      ["ft-lbf", "energy", "ft·lbf"],
      ["%", "fraction", "pct"],
      ["Ω", "resistance", "ohm"],
      ["rad/s/V", "motorVelocityConstant", "rad/(s·V)"],
      ["°/s", "angularSpeed", "deg/s"],
      ["m^2", "area", "m2"],
    ];
    for (const [text, kind, id] of spellings) expect(findUnit(text, kind), text).toBe(id);
  });

  it("writes URL text that reads back to the same value (6 significant figures)", () => {
    for (const [value, unit] of [
      [0.032, "mm"],
      [251.327, "rpm"],
      [1961.33, "gn"],
      [0.2, "pct"],
      [0.05, "g"],
    ] as const) {
      const text = quantityToText(value, unit);
      expect(text).not.toMatch(/\s/);
      const back = parseQuantity(text, UNITS[unit].kind, unit);
      expect(back.ok && Math.abs(back.valueSI - value) / value).toBeLessThan(1e-5);
    }
  });
});

describe("units: field text in a link", () => {
  it.each([
    { text: "200 gₙ", kind: "acceleration", unit: "gn", link: "200g" },
    { text: "8 mΩ", kind: "resistance", unit: "mohm", link: "8mohm" },
    { text: "15 °", kind: "angle", unit: "deg", link: "15deg" },
    { text: "2400 rpm", kind: "angularSpeed", unit: "rpm", link: "2400rpm" },
    { text: "20 %", kind: "fraction", unit: "frac", link: "20%" },
  ] as const)("writes $text as $link, which reads back as the same quantity", ({ text, kind, unit, link }) => {
    expect(linkSpelling(text)).toBe(link);
    expect(parseQuantity(link, kind, unit)).toEqual(parseQuantity(text, kind, unit));
  });

  it("keeps text it cannot read as typed, less its spaces", () => {
    expect(linkSpelling("three mm")).toBe("threemm");
    expect(linkSpelling("12 furlongs")).toBe("12furlongs");
  });
});

describe("units: formatting", () => {
  it.each([
    { value: 32, sig: 3, text: "32.0" },
    { value: 0.012345, sig: 3, text: "0.0123" },
    { value: 2400, sig: 3, text: "2400" },
    { value: 398.0948, sig: 5, text: "398.09" },
    { value: 4626377.063, sig: 3, text: "4.63 × 10⁶" },
    { value: 0.00012, sig: 2, text: "1.2 × 10⁻⁴" },
    { value: -1.5, sig: 2, text: "−1.5" },
    { value: 0, sig: 3, text: "0" },
    // The form is chosen after rounding: these round up across the 1e6 and 1e-3 switches.
    { value: 999_500, sig: 3, text: "1.00 × 10⁶" },
    { value: -999_999.5, sig: 4, text: "−1.000 × 10⁶" },
    { value: 999_499, sig: 3, text: "999000" },
    { value: 0.00099996, sig: 3, text: "0.00100" },
  ])("formats $value to $sig significant figures as $text", ({ value, sig, text }) => {
    expect(formatNumber(value, sig)).toBe(text);
  });

  it("never prints NaN or Infinity", () => {
    expect(formatNumber(Number.NaN)).toBe("—");
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe("—");
  });

  it("shows lengths in mm or in, masses in g/kg or oz/lb, by magnitude", () => {
    expect(formatQuantity(0.032, "length").text).toBe("32.0 mm");
    expect(formatQuantity(0.032, "length", { system: "us" }).text).toBe("1.26 in");
    expect(formatQuantity(0.45, "mass").text).toBe("450 g");
    expect(formatQuantity(2.3, "mass").text).toBe("2.30 kg");
    expect(formatQuantity(0.1, "mass", { system: "us" }).text).toBe("3.53 oz");
    expect(formatQuantity(1, "mass", { system: "us" }).text).toBe("2.20 lb");
    expect(formatQuantity(189.5, "force", { system: "us" }).text).toBe("42.6 lbf");
    expect(formatQuantity(3903.976852, "acceleration", { significant: 5 }).text).toBe("398.09 gₙ");
  });
});
