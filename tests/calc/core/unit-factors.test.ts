/**
 * Every unit Whirlbook knows, against its SI value written out here independently of
 * calc/core/units.ts: a changed factor (g·cm², lb/in³, …) fails its own row.
 *
 * Each exact value is worked from the definitions, by hand or in decimal arithmetic outside this
 * project, never from the project's constants:
 * - inch 0.0254 m and pound 0.453 592 37 kg exactly, from the 1959 international yard and pound
 *   agreement (yard 0.9144 m); foot = 12 in, mile = 5280 ft, ounce = lb/16;
 * - standard gravity g_n = 9.806 65 m/s² exactly (3rd CGPM, 1901), so 1 lbf = lb × g_n;
 * - the SI prefixes (milli 10⁻³, centi 10⁻², kilo 10³, mega 10⁶, giga 10⁹; NIST SP 811 Table 5);
 * - 1 revolution = 2π rad, 1° = π/180 rad, 1 min = 60 s, 1 h = 3600 s.
 * Beside it, where NIST SP 811 (2008), Appendix B.8 lists the unit, its printed factor (seven
 * significant figures) is checked too, with a tolerance of half a unit in its last place. Those
 * rows are quoted from memory of the table; the exact values above do not depend on them.
 */
import { UNITS } from "../../../calc/core/unit-table.ts";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { displayUnit, findUnit, formatNumber, formatQuantity, fromSI, type QuantityKind, toSI, type UnitId } from "../../../calc/core/units.ts";
import { convert } from "../../../calc/core/unit-tools.ts";

interface FactorCase {
  /** The unit's id in UNITS. */
  id: UnitId;
  /** SI value of one unit, from the definitions [SI unit of its kind]. */
  exact: number;
  /** How the exact value follows from the definitions. */
  definition: string;
  /** NIST SP 811 Appendix B.8 printed factor (7 significant figures), where the table lists the unit. */
  nist?: number;
}

const FACTORS: FactorCase[] = [
  // length [m]
  { id: "m", exact: 1, definition: "SI base unit" },
  { id: "cm", exact: 0.01, definition: "centi = 10⁻²" },
  { id: "mm", exact: 0.001, definition: "milli = 10⁻³" },
  { id: "in", exact: 0.0254, definition: "1959 agreement: yard/36 = 0.9144/36", nist: 2.54e-2 },
  { id: "ft", exact: 0.3048, definition: "1959 agreement: yard/3 = 12 in", nist: 3.048e-1 },
  // area [m²]
  { id: "m2", exact: 1, definition: "SI coherent unit" },
  { id: "mm2", exact: 1e-6, definition: "(10⁻³ m)²" },
  { id: "in2", exact: 0.00064516, definition: "0.0254² m²", nist: 6.4516e-4 },
  // mass [kg]
  { id: "kg", exact: 1, definition: "SI base unit" },
  { id: "g", exact: 0.001, definition: "10⁻³ kg" },
  { id: "lb", exact: 0.45359237, definition: "1959 agreement", nist: 4.535924e-1 },
  { id: "oz", exact: 0.028349523125, definition: "lb/16 (avoirdupois)", nist: 2.834952e-2 },
  // acceleration [m/s²]
  { id: "m/s2", exact: 1, definition: "SI coherent unit" },
  { id: "gn", exact: 9.80665, definition: "3rd CGPM (1901), exact", nist: 9.80665 },
  { id: "ft/s2", exact: 0.3048, definition: "ft per s²", nist: 3.048e-1 },
  // angular speed [rad/s]
  { id: "rad/s", exact: 1, definition: "SI coherent unit" },
  { id: "rpm", exact: 0.10471975511965977, definition: "2π/60 = π/30", nist: 1.047198e-1 },
  { id: "rps", exact: 6.283185307179586, definition: "2π" },
  { id: "deg/s", exact: 0.017453292519943295, definition: "π/180" },
  // angular acceleration [rad/s²]
  { id: "rad/s2", exact: 1, definition: "SI coherent unit" },
  { id: "rpm/s", exact: 0.10471975511965977, definition: "2π/60 per s" },
  // angle [rad]
  { id: "rad", exact: 1, definition: "SI coherent unit" },
  { id: "deg", exact: 0.017453292519943295, definition: "π/180", nist: 1.745329e-2 },
  { id: "rev", exact: 6.283185307179586, definition: "2π" },
  // time [s]
  { id: "s", exact: 1, definition: "SI base unit" },
  { id: "ms", exact: 0.001, definition: "milli" },
  { id: "us", exact: 0.000001, definition: "micro = 10⁻⁶" },
  { id: "h", exact: 3600, definition: "1 h = 60 min = 3600 s" },
  // frequency [Hz]
  { id: "Hz", exact: 1, definition: "SI unit, 1/s" },
  { id: "kHz", exact: 1000, definition: "kilo" },
  // force [N]
  { id: "N", exact: 1, definition: "SI coherent unit" },
  { id: "kN", exact: 1000, definition: "kilo" },
  { id: "lbf", exact: 4.4482216152605, definition: "0.45359237 kg × 9.80665 m/s²", nist: 4.448222 },
  { id: "ozf", exact: 0.2780138509537812, definition: "lbf/16", nist: 2.780139e-1 },
  // speed [m/s]
  { id: "m/s", exact: 1, definition: "SI coherent unit" },
  { id: "mm/s", exact: 0.001, definition: "milli" },
  { id: "km/h", exact: 1000 / 3600, definition: "1000 m per 3600 s", nist: 2.777778e-1 },
  { id: "ft/s", exact: 0.3048, definition: "ft per s", nist: 3.048e-1 },
  { id: "mph", exact: 0.44704, definition: "5280 × 0.3048 m per 3600 s", nist: 4.4704e-1 },
  // energy [J]
  { id: "J", exact: 1, definition: "SI coherent unit" },
  { id: "kJ", exact: 1000, definition: "kilo" },
  { id: "Wh", exact: 3600, definition: "1 W × 3600 s", nist: 3.6e3 },
  { id: "ft·lbf", exact: 1.3558179483314003, definition: "0.3048 m × 4.4482216152605 N", nist: 1.355818 },
  // power [W]
  { id: "W", exact: 1, definition: "SI coherent unit" },
  { id: "kW", exact: 1000, definition: "kilo" },
  // torque [N·m]
  { id: "N·m", exact: 1, definition: "SI coherent unit" },
  { id: "lbf·in", exact: 0.1129848290276167, definition: "4.4482216152605 N × 0.0254 m", nist: 1.129848e-1 },
  { id: "ozf·in", exact: 0.0070615518142260435, definition: "lbf/16 × 0.0254 m", nist: 7.061552e-3 },
  // moment of inertia [kg·m²]
  { id: "kg·m2", exact: 1, definition: "SI coherent unit" },
  { id: "g·cm2", exact: 1e-7, definition: "10⁻³ kg × (10⁻² m)²" },
  { id: "lb·in2", exact: 0.0002926396534292, definition: "0.45359237 kg × 0.0254² m²", nist: 2.926397e-4 },
  { id: "oz·in2", exact: 0.000018289978339325, definition: "0.028349523125 kg × 0.0254² m²" },
  // stress [Pa]
  { id: "Pa", exact: 1, definition: "SI coherent unit" },
  { id: "MPa", exact: 1e6, definition: "mega" },
  { id: "GPa", exact: 1e9, definition: "giga" },
  { id: "psi", exact: 6894.757293168361, definition: "4.4482216152605 N / 0.00064516 m²", nist: 6.894757e3 },
  { id: "ksi", exact: 6894757.293168361, definition: "1000 lbf/in²", nist: 6.894757e6 },
  // density [kg/m³]
  { id: "kg/m3", exact: 1, definition: "SI coherent unit" },
  { id: "g/cm3", exact: 1000, definition: "10⁻³ kg / (10⁻² m)³", nist: 1e3 },
  { id: "lb/in3", exact: 27679.904710203122, definition: "0.45359237 kg / 0.0254³ m³", nist: 2.76799e4 },
  // static unbalance [kg·m]
  { id: "kg·m", exact: 1, definition: "SI coherent unit" },
  { id: "g·mm", exact: 1e-6, definition: "10⁻³ kg × 10⁻³ m" },
  { id: "oz·in", exact: 0.000720077887375, definition: "0.028349523125 kg × 0.0254 m" },
  // electrical
  { id: "V", exact: 1, definition: "SI coherent unit" },
  { id: "A", exact: 1, definition: "SI base unit" },
  { id: "ohm", exact: 1, definition: "SI coherent unit" },
  { id: "mohm", exact: 0.001, definition: "milli" },
  // motor velocity constant [rad/(s·V)]
  { id: "rad/(s·V)", exact: 1, definition: "SI coherent unit" },
  { id: "rpm/V", exact: 0.10471975511965977, definition: "2π/60 rad/s per V" },
  // dimensionless
  { id: "frac", exact: 1, definition: "a ratio" },
  { id: "pct", exact: 0.01, definition: "per cent = 1/100" },
  { id: "ppm", exact: 1e-6, definition: "per million" },
  { id: "count", exact: 1, definition: "a whole number" },
];

/** Relative difference of two positive numbers. */
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("unit factors against their definitions", () => {
  it("has a row here for every unit in the table, and none for a unit it does not know", () => {
    expect(FACTORS.map((f) => f.id).sort()).toEqual(Object.keys(UNITS).sort());
  });

  // Floating point only: each exact value above is the double nearest the decimal or π-multiple, and
  // the table's factor may be a product of two rounded doubles (2 ulp = 4.4e-16 relative).
  it.each(FACTORS)("1 $id = $exact SI ($definition)", ({ id, exact }) => {
    expect(relative(UNITS[id].factor, exact)).toBeLessThanOrEqual(4.5e-16);
    expect(relative(toSI(1, id), exact)).toBeLessThanOrEqual(4.5e-16);
    expect(relative(fromSI(exact, id), 1)).toBeLessThanOrEqual(4.5e-16);
  });

  // NIST SP 811 prints 7 significant figures: the exact value lies within half a unit of the 7th figure.
  it.each(FACTORS.filter((f) => f.nist !== undefined))("1 $id = $nist SI as NIST SP 811 Appendix B.8 prints it", ({ id, nist }) => {
    const digits = 10 ** (Math.floor(Math.log10(nist!)) - 6);
    expect(Math.abs(toSI(1, id) - nist!)).toBeLessThanOrEqual(digits / 2 + 1e-15 * nist!);
  });

  it("converts between two units of a kind through SI: 1 ft = 12 in, 1 lbf = 16 ozf, 1 lb = 16 oz, 1 ksi = 1000 psi, 1 g/cm³ = 0.036127 lb/in³", () => {
    expect(convert(1, "ft", "in")).toBeCloseTo(12, 12);
    expect(convert(1, "lbf", "ozf")).toBeCloseTo(16, 12);
    expect(convert(1, "lb", "oz")).toBeCloseTo(16, 12);
    expect(convert(1, "ksi", "psi")).toBeCloseTo(1000, 9);
    // 1000 kg/m³ / 27679.9047 kg/m³ per lb/in³ (NIST SP 811 B.8: 2.767 990 E+04).
    expect(convert(1, "g/cm3", "lb/in3")).toBeCloseTo(1000 / 27679.904710203122, 12);
    // 1 kg·m² = 10⁷ g·cm² = 3417.17 lb·in² (1/2.926397e-4).
    expect(convert(1, "kg·m2", "g·cm2")).toBeCloseTo(1e7, 5);
    expect(convert(1, "kg·m2", "lb·in2")).toBeCloseTo(1 / 0.0002926396534292, 8);
  });

  it("keeps the kind of each unit: a g·cm² is a moment of inertia, a g·mm an unbalance, a gₙ an acceleration", () => {
    expect(UNITS.g·cm2.kind).toBe("inertia");
    expect(UNITS.g·mm.kind).toBe("unbalance");
    expect(UNITS.gn.kind).toBe("acceleration");
    expect(UNITS["lb/in3"].kind).toBe("density");
    expect(UNITS["rpm/V"].kind).toBe("motorVelocityConstant");
    expect(findUnit("g", "acceleration")).toBe("gn");
    expect(findUnit("g", "mass")).toBe("g");
  });
});

/**
 * What each unit is shown as (first) and every other spelling it is read from: a regression pin of
 * the handbook's own spellings, so that a spelling that stops being read, or a symbol that changes
 * on screen, fails here.
 */
const SPELLINGS: Record<UnitId, readonly string[]> = {
  m: ["m", "metre", "meter", "meters", "metres"],
  cm: ["cm"],
  mm: ["mm", "millimetre", "millimeter", "millimeters", "millimetres"],
  in: ["in", "inch", "inches", '"', "″"],
  ft: ["ft", "foot", "feet", "'", "′"],
  m2: ["m²", "m²", "m^2", "sq m"],
  mm2: ["mm²", "mm²", "mm^2", "sq mm"],
  in2: ["in²", "in²", "in^2", "sq in"],
  kg: ["kg"],
  g: ["g", "gram", "grams", "gr"],
  lb: ["lb", "lbs", "pound", "pounds", "lbm"],
  oz: ["oz", "ounce", "ounces"],
  "m/s2": ["m/s²", "m/s²", "m/s^2", "ms-2", "m s-2"],
  gn: ["gₙ", "g", "G", "g0"],
  "ft/s2": ["ft/s²", "ft/s²", "ft/s^2"],
  "rad/s": ["rad/s", "rad s-1", "1/s"],
  rpm: ["rpm", "rev/min", "r/min", "RPM"],
  rps: ["rev/s", "rev/s", "r/s"],
  "deg/s": ["°/s", "°/s", "dps"],
  "rad/s2": ["rad/s²", "rad/s²", "rad/s^2"],
  "rpm/s": ["rpm/s"],
  rad: ["rad", "radian", "radians"],
  deg: ["°", "°", "degree", "degrees"],
  rev: ["rev", "turn", "turns"],
  s: ["s", "sec", "second", "seconds"],
  ms: ["ms"],
  us: ["µs", "µs", "μs"],
  h: ["h", "hr", "hour", "hours"],
  Hz: ["Hz", "hz"],
  kHz: ["kHz", "khz"],
  N: ["N", "newton", "newtons"],
  kN: ["kN"],
  lbf: ["lbf"],
  ozf: ["ozf"],
  "m/s": ["m/s"],
  "mm/s": ["mm/s"],
  "km/h": ["km/h", "kph"],
  "ft/s": ["ft/s", "fps"],
  mph: ["mph"],
  J: ["J", "joule", "joules"],
  kJ: ["kJ"],
  Wh: ["Wh"],
  ft·lbf: ["ft·lbf", "ft*lbf", "ft-lbf", "ftlbf", "ft.lbf", "ft lbf"],
  W: ["W"],
  kW: ["kW"],
  N·m: ["N·m", "Nm", "N*m", "N.m", "N m"],
  lbf·in: ["lbf·in", "lbf*in", "lbf-in", "in-lbf", "in·lbf", "lbfin"],
  ozf·in: ["ozf·in", "ozf*in", "oz-in", "oz·in", "ozin", "ozf-in"],
  kg·m2: ["kg·m²", "kg·m²", "kgm2", "kg*m^2", "kg m2", "kg.m2", "kgm^2", "kg·m^2"],
  g·cm2: ["g·cm²", "g·cm²", "gcm2", "g*cm^2", "g cm2"],
  lb·in2: ["lb·in²", "lb·in²", "lbin2", "lb*in^2", "lb in2", "lb-in2", "lb-in^2"],
  oz·in2: ["oz·in²", "oz·in²", "ozin2", "oz*in^2", "oz in2", "oz-in2", "oz-in^2"],
  Pa: ["Pa"],
  MPa: ["MPa", "N/mm2", "N/mm²"],
  GPa: ["GPa"],
  psi: ["psi", "lbf/in2", "lbf/in²"],
  ksi: ["ksi"],
  "kg/m3": ["kg/m³", "kg/m³", "kg/m^3"],
  "g/cm3": ["g/cm³", "g/cm³", "g/cc", "g/cm^3", "g/ml"],
  "lb/in3": ["lb/in³", "lb/in³", "lb/in^3"],
  kg·m: ["kg·m", "kgm", "kg*m", "kg m"],
  g·mm: ["g·mm", "gmm", "g*mm", "g mm", "g-mm"],
  oz·in: ["oz·in", "ozin", "oz*in", "oz in", "oz-in"],
  V: ["V", "volt", "volts"],
  A: ["A", "amp", "amps"],
  ohm: ["Ω", "Ω", "ohms", "Ohm"],
  mohm: ["mΩ", "mΩ", "milliohm", "milliohms", "mOhm"],
  "rad/(s·V)": ["rad/(s·V)", "rad/s/V", "rad/(s V)"],
  "rpm/V": ["rpm/V", "kv", "Kv", "KV", "rpm/v"],
  frac: ["", "x"],
  pct: ["%", "%", "percent"],
  ppm: ["ppm"],
  count: [""],
};

describe("unit symbols and spellings (regression pin of the handbook's own table)", () => {
  it.each(Object.entries(SPELLINGS) as [UnitId, string[]][])("%s shows as %j and reads every spelling listed", (id, [symbol, ...others]) => {
    expect(UNITS[id].symbol).toBe(symbol);
    for (const spelling of [id, symbol ?? "", ...others].filter((s) => s !== "")) expect(findUnit(spelling, UNITS[id].kind), `${id}: ${spelling}`).toBe(id);
  });
});

describe("conversions refuse what they cannot convert, by name", () => {
  it.each([
    { call: () => toSI(1, "furlong" as UnitId), message: 'from must be one of m, cm, mm, … (got "furlong")' },
    { call: () => toSI(1, "toString" as UnitId), message: 'from must be one of m, cm, mm, … (got "toString")' },
    { call: () => fromSI(1, "furlong" as UnitId), message: 'to must be one of m, cm, mm, … (got "furlong")' },
    { call: () => convert(1, "furlong" as UnitId, "mm"), message: 'from must be one of m, cm, mm, … (got "furlong")' },
    { call: () => convert(1, "mm", "furlong" as UnitId), message: 'to must be one of m, cm, mm, … (got "furlong")' },
    { call: () => formatQuantity(1, "length", { unit: "furlong" as UnitId }), message: 'unit must be one of m, cm, mm, … (got "furlong")' },
    {
      call: () => displayUnit("colour" as QuantityKind, "metric"),
      message: 'kind must be a quantity kind whose units are registered (useUnits) (got "colour")',
    },
    { call: () => toSI(1e308, "kN"), message: "value must be a number that stays finite in the new unit (got 1e+308)" },
    { call: () => fromSI(1e308, "ppm"), message: "value must be a number that stays finite in the new unit (got 1e+308)" },
    { call: () => toSI("1" as unknown as number, "mm"), message: 'value must be a number that stays finite in the new unit (got "1")' },
    { call: () => formatNumber(1, 0), message: "significant must be a whole number from 1 to 100 (got 0)" },
    { call: () => formatNumber(1, 101), message: "significant must be a whole number from 1 to 100 (got 101)" },
    { call: () => formatNumber(1, 2.5), message: "significant must be a whole number from 1 to 100 (got 2.5)" },
  ])("$message", ({ call, message }) => {
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow(message);
  });

  it("formats to 1 and to 100 significant figures, the ends of the range", () => {
    expect(formatNumber(2.5, 1)).toBe("3");
    expect(formatNumber(0.125, 100)).toMatch(/^0\.1250{97}$/);
  });
});

describe("the number and the symbol of a formatted quantity", () => {
  it.each([
    { value: 0.1, kind: "angle", text: "5.73°", why: "a degree sign sits on the number" },
    { value: 0.5, kind: "fraction", text: "50.0 %", why: "a per cent sign is spaced" },
    { value: 3, kind: "count", text: "3.00", why: "a count has no symbol" },
    { value: 0.032, kind: "length", text: "32.0 mm", why: "a symbol is spaced" },
  ] as const)("$value SI of $kind shows as $text: $why", ({ value, kind, text }) => {
    expect(formatQuantity(value, kind).text).toBe(text);
  });

  it("takes the metric system when the options are missing or say nothing", () => {
    expect(formatQuantity(0.032, "length", null as unknown as undefined).text).toBe("32.0 mm");
    expect(formatQuantity(0.032, "length", {}).text).toBe("32.0 mm");
    expect(formatQuantity(0.0254, "length", { system: "us" })).toEqual({ text: "1.00 in", number: "1.00", symbol: "in", unit: "in" });
  });
});
