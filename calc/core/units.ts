/**
 * Units as data. Every unit is an exact (or derived-exact) ratio to its SI unit, pinned here with
 * its definition and source. calc/ works in SI only; this module converts at the edge: it parses
 * what a user types ("45 mm", "1.8 in", "350 g") for a field of a known quantity kind and formats
 * SI results in metric or US customary units to a sensible number of significant figures.
 */
import { STANDARD_GRAVITY } from "./constants.ts";
import { CalcInputError } from "./errors.ts";

/** The quantity a field holds; it decides which units a typed value may carry. */
export type QuantityKind =
  | "length"
  | "area"
  | "mass"
  | "acceleration"
  | "angularSpeed"
  | "angularAcceleration"
  | "angle"
  | "time"
  | "frequency"
  | "force"
  | "speed"
  | "energy"
  | "power"
  | "torque"
  | "inertia"
  | "stress"
  | "density"
  | "unbalance"
  | "voltage"
  | "current"
  | "resistance"
  | "motorVelocityConstant"
  | "fraction"
  | "count";

export interface UnitDef {
  /** Symbol shown to users. */
  symbol: string;
  kind: QuantityKind;
  /** Size of one unit in the kind's SI unit (value_SI = value × factor). */
  factor: number;
  /** Other spellings accepted when parsing (compared case-sensitively, then case-insensitively). */
  aliases?: readonly string[];
}

const INCH = 0.0254; // nist-sp811, exact (1 yd = 0.9144 m, intl-yard-pound-1959)
const FOOT = 0.3048; // nist-sp811, exact
const POUND = 0.45359237; // nist-sp811, exact
const OUNCE = POUND / 16; // avoirdupois ounce, exact
const POUND_FORCE = POUND * STANDARD_GRAVITY; // nist-sp811, exact by definition: 4.448 221 615 260 5 N
const RPM = (2 * Math.PI) / 60; // 1 rev = 2π rad, exact

/** Every unit Whirlbook knows, keyed by id. */
export const UNITS = {
  // length [m]
  m: { symbol: "m", kind: "length", factor: 1, aliases: ["metre", "meter", "meters", "metres"] },
  cm: { symbol: "cm", kind: "length", factor: 0.01 },
  mm: { symbol: "mm", kind: "length", factor: 0.001, aliases: ["millimetre", "millimeter", "millimeters", "millimetres"] },
  in: { symbol: "in", kind: "length", factor: INCH, aliases: ["inch", "inches", '"', "″"] },
  ft: { symbol: "ft", kind: "length", factor: FOOT, aliases: ["foot", "feet", "'", "′"] },
  // area [m²]
  m2: { symbol: "m²", kind: "area", factor: 1, aliases: ["m²", "m^2", "sq m"] },
  mm2: { symbol: "mm²", kind: "area", factor: 1e-6, aliases: ["mm²", "mm^2", "sq mm"] },
  in2: { symbol: "in²", kind: "area", factor: INCH * INCH, aliases: ["in²", "in^2", "sq in"] },
  // mass [kg]
  kg: { symbol: "kg", kind: "mass", factor: 1 },
  g: { symbol: "g", kind: "mass", factor: 0.001, aliases: ["gram", "grams", "gr"] },
  lb: { symbol: "lb", kind: "mass", factor: POUND, aliases: ["lbs", "pound", "pounds", "lbm"] },
  oz: { symbol: "oz", kind: "mass", factor: OUNCE, aliases: ["ounce", "ounces"] },
  // acceleration [m/s²]
  "m/s2": { symbol: "m/s²", kind: "acceleration", factor: 1, aliases: ["m/s²", "m/s^2", "ms-2", "m s-2"] },
  // Shown as gₙ so that an acceleration never reads like grams; "g" is still read in an acceleration field.
  gn: { symbol: "gₙ", kind: "acceleration", factor: STANDARD_GRAVITY, aliases: ["g", "G", "g0"] },
  "ft/s2": { symbol: "ft/s²", kind: "acceleration", factor: FOOT, aliases: ["ft/s²", "ft/s^2"] },
  // angular speed [rad/s]
  "rad/s": { symbol: "rad/s", kind: "angularSpeed", factor: 1, aliases: ["rad s-1", "1/s"] },
  rpm: { symbol: "rpm", kind: "angularSpeed", factor: RPM, aliases: ["rev/min", "r/min", "RPM"] },
  rps: { symbol: "rev/s", kind: "angularSpeed", factor: 2 * Math.PI, aliases: ["rev/s", "r/s"] },
  "deg/s": { symbol: "°/s", kind: "angularSpeed", factor: Math.PI / 180, aliases: ["°/s", "dps"] },
  // angular acceleration [rad/s²]
  "rad/s2": { symbol: "rad/s²", kind: "angularAcceleration", factor: 1, aliases: ["rad/s²", "rad/s^2"] },
  "rpm/s": { symbol: "rpm/s", kind: "angularAcceleration", factor: RPM },
  // angle [rad]
  rad: { symbol: "rad", kind: "angle", factor: 1, aliases: ["radian", "radians"] },
  deg: { symbol: "°", kind: "angle", factor: Math.PI / 180, aliases: ["°", "degree", "degrees"] },
  rev: { symbol: "rev", kind: "angle", factor: 2 * Math.PI, aliases: ["turn", "turns"] },
  // time [s]
  s: { symbol: "s", kind: "time", factor: 1, aliases: ["sec", "second", "seconds"] },
  h: { symbol: "h", kind: "time", factor: 3600, aliases: ["hr", "hour", "hours"] },
  ms: { symbol: "ms", kind: "time", factor: 1e-3 },
  us: { symbol: "µs", kind: "time", factor: 1e-6, aliases: ["µs", "μs"] },
  // frequency [Hz]
  Hz: { symbol: "Hz", kind: "frequency", factor: 1, aliases: ["hz"] },
  kHz: { symbol: "kHz", kind: "frequency", factor: 1e3, aliases: ["khz"] },
  // force [N]
  N: { symbol: "N", kind: "force", factor: 1, aliases: ["newton", "newtons"] },
  kN: { symbol: "kN", kind: "force", factor: 1e3 },
  lbf: { symbol: "lbf", kind: "force", factor: POUND_FORCE },
  ozf: { symbol: "ozf", kind: "force", factor: POUND_FORCE / 16 },
  // speed [m/s]
  "m/s": { symbol: "m/s", kind: "speed", factor: 1 },
  "mm/s": { symbol: "mm/s", kind: "speed", factor: 1e-3 },
  "km/h": { symbol: "km/h", kind: "speed", factor: 1000 / 3600, aliases: ["kph"] },
  "ft/s": { symbol: "ft/s", kind: "speed", factor: FOOT, aliases: ["fps"] },
  mph: { symbol: "mph", kind: "speed", factor: (5280 * FOOT) / 3600 },
  // energy [J]
  J: { symbol: "J", kind: "energy", factor: 1, aliases: ["joule", "joules"] },
  kJ: { symbol: "kJ", kind: "energy", factor: 1e3 },
  Wh: { symbol: "Wh", kind: "energy", factor: 3600 },
  ft·lbf: { symbol: "ft·lbf", kind: "energy", factor: FOOT * POUND_FORCE, aliases: ["ft*lbf", "ft-lbf", "ftlbf", "ft.lbf", "ft lbf"] },
  // power [W]
  W: { symbol: "W", kind: "power", factor: 1 },
  kW: { symbol: "kW", kind: "power", factor: 1e3 },
  // torque [N·m]
  N·m: { symbol: "N·m", kind: "torque", factor: 1, aliases: ["Nm", "N*m", "N.m", "N m"] },
  lbf·in: { symbol: "lbf·in", kind: "torque", factor: POUND_FORCE * INCH, aliases: ["lbf*in", "lbf-in", "in-lbf", "in·lbf", "lbfin"] },
  ozf·in: { symbol: "ozf·in", kind: "torque", factor: (POUND_FORCE / 16) * INCH, aliases: ["ozf*in", "oz-in", "oz·in", "ozin", "ozf-in"] },
  // moment of inertia [kg·m²]
  kg·m2: { symbol: "kg·m²", kind: "inertia", factor: 1, aliases: ["kg·m²", "kgm2", "kg*m^2", "kg m2", "kg.m2", "kgm^2", "kg·m^2"] },
  g·cm2: { symbol: "g·cm²", kind: "inertia", factor: 1e-7, aliases: ["g·cm²", "gcm2", "g*cm^2", "g cm2"] },
  lb·in2: { symbol: "lb·in²", kind: "inertia", factor: POUND * INCH * INCH, aliases: ["lb·in²", "lbin2", "lb*in^2", "lb in2", "lb-in2", "lb-in^2"] },
  oz·in2: { symbol: "oz·in²", kind: "inertia", factor: OUNCE * INCH * INCH, aliases: ["oz·in²", "ozin2", "oz*in^2", "oz in2", "oz-in2", "oz-in^2"] },
  // stress [Pa]
  Pa: { symbol: "Pa", kind: "stress", factor: 1 },
  MPa: { symbol: "MPa", kind: "stress", factor: 1e6, aliases: ["N/mm2", "N/mm²"] },
  GPa: { symbol: "GPa", kind: "stress", factor: 1e9 },
  psi: { symbol: "psi", kind: "stress", factor: POUND_FORCE / (INCH * INCH), aliases: ["lbf/in2", "lbf/in²"] },
  ksi: { symbol: "ksi", kind: "stress", factor: (1000 * POUND_FORCE) / (INCH * INCH) },
  // density [kg/m³]
  "kg/m3": { symbol: "kg/m³", kind: "density", factor: 1, aliases: ["kg/m³", "kg/m^3"] },
  "g/cm3": { symbol: "g/cm³", kind: "density", factor: 1000, aliases: ["g/cm³", "g/cc", "g/cm^3", "g/ml"] },
  "lb/in3": { symbol: "lb/in³", kind: "density", factor: POUND / INCH ** 3, aliases: ["lb/in³", "lb/in^3"] },
  // static unbalance (mass × eccentricity) [kg·m]
  kg·m: { symbol: "kg·m", kind: "unbalance", factor: 1, aliases: ["kgm", "kg*m", "kg m"] },
  g·mm: { symbol: "g·mm", kind: "unbalance", factor: 1e-6, aliases: ["gmm", "g*mm", "g mm", "g-mm"] },
  oz·in: { symbol: "oz·in", kind: "unbalance", factor: OUNCE * INCH, aliases: ["ozin", "oz*in", "oz in", "oz-in"] },
  // electrical
  V: { symbol: "V", kind: "voltage", factor: 1, aliases: ["volt", "volts"] },
  A: { symbol: "A", kind: "current", factor: 1, aliases: ["amp", "amps"] },
  ohm: { symbol: "Ω", kind: "resistance", factor: 1, aliases: ["Ω", "ohms", "Ohm"] },
  mohm: { symbol: "mΩ", kind: "resistance", factor: 1e-3, aliases: ["mΩ", "milliohm", "milliohms", "mOhm"] },
  // motor velocity constant Kv [rad/(s·V)]
  "rad/(s·V)": { symbol: "rad/(s·V)", kind: "motorVelocityConstant", factor: 1, aliases: ["rad/s/V", "rad/(s V)"] },
  "rpm/V": { symbol: "rpm/V", kind: "motorVelocityConstant", factor: RPM, aliases: ["kv", "Kv", "KV", "rpm/v"] },
  // dimensionless
  frac: { symbol: "", kind: "fraction", factor: 1, aliases: ["x"] },
  pct: { symbol: "%", kind: "fraction", factor: 0.01, aliases: ["%", "percent"] },
  ppm: { symbol: "ppm", kind: "fraction", factor: 1e-6 },
  count: { symbol: "", kind: "count", factor: 1 },
} as const satisfies Record<string, UnitDef>;

export type UnitId = keyof typeof UNITS;

/** Unit ids of one kind, in table order. */
export function unitsOfKind(kind: QuantityKind): UnitId[] {
  return (Object.keys(UNITS) as UnitId[]).filter((id) => UNITS[id].kind === kind);
}

/** `table[id]` when the table holds `id` (a unit, a kind); a CalcInputError naming `param` otherwise. */
function known<T>(table: Readonly<Record<string, T>>, id: unknown, param: string): T {
  if (typeof id === "string" && Object.hasOwn(table, id)) return table[id]!;
  throw new CalcInputError({ param, value: String(id), expected: `one of ${Object.keys(table).slice(0, 3).join(", ")}, …`, unit: "" });
}

/** `value`·`factor` (or `value`/`factor`), or a CalcInputError naming "value" when that is not finite. */
function scaled(value: number, factor: number, divide: boolean): number {
  const result = divide ? value / factor : value * factor;
  if (typeof value === "number" && Number.isFinite(result)) return result;
  throw new CalcInputError({ param: "value", value, expected: "a number that stays finite in the new unit", unit: "" });
}

/** Converts `value` in unit `from` to SI. */
export function toSI(value: number, from: UnitId): number {
  return scaled(value, known(UNITS, from, "from").factor, false);
}

/** Converts an SI `value` into unit `to`. */
export function fromSI(value: number, to: UnitId): number {
  return scaled(value, known(UNITS, to, "to").factor, true);
}

/** rpm → rad/s (exact: 1 rpm = 2π/60 rad/s). */
export function rpmToRadPerSecond(rpm: number): number {
  return scaled(rpm, RPM, false);
}

/** rad/s → rpm (exact: 1 rad/s = 60/2π rpm). */
export function radPerSecondToRpm(angularSpeed: number): number {
  return scaled(angularSpeed, RPM, true);
}

// ---------------------------------------------------------------------------------------------
// Unit systems: which unit each kind is shown in.

export type UnitSystem = "metric" | "us";

/**
 * Display units per kind: metric steps, then US steps when they differ. Each step is a unit, or
 * [unit, from] with `from` in SI; `formatQuantity` takes the last step whose `from` the value
 * reaches (the first starts at 0), so 0.45 kg shows as 450 g and 2.3 kg as 2.3 kg.
 */
type DisplaySteps = readonly (UnitId | readonly [UnitId, number])[];
const DISPLAY: Record<QuantityKind, readonly [DisplaySteps, DisplaySteps?]> = {
  length: [
    ["mm", ["m", 10]],
    ["in", ["ft", 10 * FOOT]],
  ],
  area: [["mm2"], ["in2"]],
  mass: [
    ["g", ["kg", 1]],
    ["oz", ["lb", POUND]],
  ],
  acceleration: [["gn"]],
  angularSpeed: [["rpm"]],
  angularAcceleration: [["rpm/s"]],
  angle: [["deg"]],
  time: [["us", ["ms", 1e-3], ["s", 1]]],
  frequency: [["Hz", ["kHz", 1e4]]],
  force: [["N", ["kN", 1e4]], ["lbf"]],
  speed: [["m/s"], ["ft/s"]],
  energy: [["J", ["kJ", 1e4]], ["ft·lbf"]],
  power: [["W", ["kW", 1e4]]],
  torque: [["N·m"], ["ozf·in", ["lbf·in", POUND_FORCE * INCH]]],
  inertia: [["kg·m2"], ["lb·in2"]],
  stress: [["MPa"], ["ksi"]],
  density: [["g/cm3"], ["lb/in3"]],
  unbalance: [["g·mm"], ["oz·in"]],
  voltage: [["V"]],
  current: [["A"]],
  resistance: [["mohm", ["ohm", 10]]],
  motorVelocityConstant: [["rpm/V"]],
  fraction: [["pct"]],
  count: [["count"]],
};

/** The unit a value of `kind` is shown in for `system`, chosen by magnitude. */
export function displayUnit(kind: QuantityKind, system: UnitSystem, valueSI = 0): UnitId {
  const [metric, us] = known(DISPLAY, kind, "kind");
  let chosen = metric[0] as UnitId;
  for (const step of (system === "us" && us) || metric) {
    if (typeof step === "string") chosen = step;
    else if (Math.abs(valueSI) >= step[1]) chosen = step[0];
  }
  return chosen;
}

const SUPERSCRIPT: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/**
 * Formats a plain number to `significant` figures (a whole number from 1 to 100): no exponent
 * between 1e-3 and 1e6, trailing zeros kept as the precision implies ("32.0"), and "× 10ⁿ" outside
 * that range. Never prints NaN: a non-finite value is the caller's bug and yields "—".
 */
export function formatNumber(value: number, significant = 3): string {
  if (!(Number.isInteger(significant) && significant >= 1 && significant <= 100)) {
    throw new CalcInputError({ param: "significant", value: significant, expected: "a whole number from 1 to 100", unit: "" });
  }
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  // Choose the form after rounding: 999 500 to three figures is 1.00 × 10⁶, not "1000000".
  const rounded = Number(value.toPrecision(significant));
  const abs = Math.abs(rounded);
  if (abs >= 1e6 || abs < 1e-3) {
    const [mantissa, exponent] = rounded.toExponential(significant - 1).split("e");
    const power = String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
    return `${mantissa!.replace("-", "−")} × 10${power}`;
  }
  const digitsBeforePoint = Math.floor(Math.log10(abs)) + 1;
  const decimals = Math.max(0, significant - digitsBeforePoint);
  return rounded.toFixed(decimals).replace("-", "−");
}

export interface FormattedQuantity {
  /** Number and unit, e.g. "32.0 mm". */
  text: string;
  /** The number alone, formatted. */
  number: string;
  /** The unit's symbol. */
  symbol: string;
  unit: UnitId;
}

/** Formats an SI value of `kind` in `system` (or in an explicit `unit`). */
export function formatQuantity(
  valueSI: number,
  kind: QuantityKind,
  options: { system?: UnitSystem; unit?: UnitId; significant?: number } = {},
): FormattedQuantity {
  const { unit = displayUnit(kind, options?.system ?? "metric", valueSI), significant = 3 } = options ?? {};
  // A value beyond the largest double in a small unit shows as "—", as formatNumber shows any non-finite value.
  const number = formatNumber(valueSI / known<UnitDef>(UNITS, unit, "unit").factor, significant);
  const symbol = UNITS[unit].symbol;
  const joiner = symbol === "" || symbol === "°" ? "" : " ";
  return { text: `${number}${joiner}${symbol}`, number, symbol, unit };
}

/**
 * Writes a number without an exponent where that stays short ("0.0001", "1200"), so links and files
 * read as people write numbers; a very small or very large number keeps its exponent ("5e-324").
 * The text reads back as exactly the same number.
 */
export function plainNumber(value: number): string {
  const text = String(value);
  const match = /^(-?)(\d)(?:\.(\d+))?e([+-]\d+)$/.exec(text);
  if (!match) return text;
  const [, sign, lead, rest = "", exp] = match;
  const digits = lead! + rest;
  const power = Number(exp);
  const plain = power < 0 ? `${sign}0.${"0".repeat(-power - 1)}${digits}` : `${sign}${digits}${"0".repeat(Math.max(0, power - rest.length))}`;
  return plain.length <= 24 ? plain : text;
}

/**
 * The shortest number n (as few significant figures as possible) with n × factor = valueSI exactly
 * in floating point, the way `parseQuantity` turns a number in a unit back into SI; null when no
 * such number exists.
 */
function exactMultiple(valueSI: number, factor: number): number | null {
  if (factor === 1) return valueSI;
  const n = valueSI / factor;
  for (let figures = 1; figures <= 17; figures += 1) {
    const candidate = Number(n.toPrecision(figures));
    if (candidate * factor === valueSI) return candidate;
  }
  // Division and multiplication each round: the number sits within a few units in the last place.
  const bits = new Float64Array(1);
  const word = new BigInt64Array(bits.buffer);
  for (const step of [1n, -1n, 2n, -2n, 3n, -3n, 4n, -4n]) {
    bits[0] = n;
    word[0]! += step;
    const candidate = bits[0]!;
    if (Number.isFinite(candidate) && candidate * factor === valueSI) return candidate;
  }
  return null;
}

/** The kind's SI unit: the one unit of the kind whose factor is 1 (e.g. "m", "rad/s", "frac"). */
export function siUnit(kind: QuantityKind): UnitId {
  return unitsOfKind(kind).find((u) => UNITS[u].factor === 1)!;
}

/** How a link spells the kind's SI unit. */
function siUnitText(kind: QuantityKind): string {
  const id = siUnit(kind);
  const def: UnitDef = UNITS[id];
  return def.symbol === "" ? (def.aliases?.[0] ?? "") : urlSpelling(id);
}

/**
 * The shortest number that reads back as exactly `valueSI` in `unit`, and the unit it is in: `unit`
 * itself, or the kind's SI unit when no number in `unit` multiplies back exactly.
 */
export function exactQuantity(valueSI: number, unit: UnitId): { number: string; unit: UnitId } {
  if (!Number.isFinite(valueSI)) throw new CalcInputError({ param: "value", value: valueSI, expected: "a finite number", unit: "" });
  const n = exactMultiple(valueSI, known<UnitDef>(UNITS, unit, "unit").factor);
  if (n === null) return { number: plainNumber(valueSI), unit: siUnit(UNITS[unit].kind) };
  return { number: plainNumber(Object.is(n, -0) ? 0 : n), unit };
}

/**
 * Writes an SI value as compact text ("32mm", "2400rpm", "12.703125mm") that `parseQuantity` reads
 * back as exactly the same SI value: the shortest number that does so in `unit`, in plain decimal;
 * when no number in `unit` multiplies back exactly, the value in the kind's SI unit ("0.0127031m").
 */
export function quantityToText(valueSI: number, unit: UnitId): string {
  const exact = exactQuantity(valueSI, unit);
  if (exact.unit !== unit) return `${exact.number}${siUnitText(UNITS[unit].kind)}`;
  return `${exact.number}${UNITS[unit].symbol === "" ? "" : urlSpelling(unit)}`;
}

/**
 * Writes an SI value as a bare number in a unit of size `factor` (mm: 0.001) for compact list texts
 * (a parts list, calibration readings) so that `readExactNumber` gives back exactly the same value:
 * the shortest such number, or, when none exists, the SI value itself marked "si" ("0.0127031si").
 */
export function exactNumberText(valueSI: number, factor: number): string {
  if (!Number.isFinite(valueSI)) throw new CalcInputError({ param: "value", value: valueSI, expected: "a finite number", unit: "" });
  const n = exactMultiple(valueSI, factor);
  return n === null ? `${plainNumber(valueSI)}si` : plainNumber(Object.is(n, -0) ? 0 : n);
}

const EXACT_NUMBER = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)(si)?$/;

/** Reads a number written by `exactNumberText` into SI; null when the text is not such a number (or passes the largest double in SI). */
export function readExactNumber(text: string, factor: number): number | null {
  const match = EXACT_NUMBER.exec(text);
  if (!match) return null;
  const n = match[2] ? Number(match[1]) : Number(match[1]) * factor;
  return Number.isFinite(n) ? n : null;
}

/** ASCII spellings for units whose symbol and id both have characters a URL would percent-encode. */
const URL_SPELLING: Partial<Record<UnitId, string>> = {
  gn: "g",
  ft·lbf: "ft-lbf",
  N·m: "Nm",
  lbf·in: "lbf-in",
  ozf·in: "ozf-in",
  kg·m2: "kgm2",
  g·cm2: "gcm2",
  lb·in2: "lb-in2",
  oz·in2: "oz-in2",
  kg·m: "kgm",
  g·mm: "gmm",
  oz·in: "oz-in",
  "rad/(s·V)": "rad/s/V",
};

/** How a unit is written in a URL: its symbol when that is plain ASCII, else an ASCII spelling. */
function urlSpelling(id: UnitId): string {
  const symbol = UNITS[id].symbol;
  return URL_SPELLING[id] ?? (/^[\w/.]*$/.test(symbol) ? symbol : id);
}

/**
 * Field text as a link writes it: without spaces, and with a unit symbol a URL would percent-encode
 * written in its ASCII spelling ("200 gₙ" → "200g", "8 mΩ" → "8mohm"); `findUnit` reads both back
 * as the same unit. Text in any other form is kept as typed.
 */
export function linkSpelling(text: string): string {
  if (typeof text !== "string") throw new CalcInputError({ param: "text", value: text, expected: "text", unit: "" });
  const compact = text.replace(/\s+/g, "");
  const match = /^([+\-−]?[\d.,]+(?:[eE][+\-−]?\d+)?)(.+)$/.exec(compact);
  if (!match || /^[\w/.%]*$/.test(match[2]!)) return compact;
  const id = (Object.keys(UNITS) as UnitId[]).find((u) => UNITS[u].symbol === match[2]);
  return id ? `${match[1]}${urlSpelling(id)}` : compact;
}

// ---------------------------------------------------------------------------------------------
// Parsing what a user typed.

export type ParseResult =
  | { ok: true; valueSI: number; unit: UnitId; number: number }
  | { ok: false; reason: "empty" | "not-a-number" | "unknown-unit"; message: string };

const NUMBER_AND_UNIT = /^([+\-−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-−]?\d+)?)\s*(.*)$/;

function normaliseUnitText(text: string): string {
  return text
    .trim()
    .replace(/\s+/g, " ")
    .replace(/[μu](?=s$)/, "µ")
    .replace(/\^?²/g, "2")
    .replace(/\^?³/g, "3")
    .replace(/\^2/g, "2")
    .replace(/\^3/g, "3");
}

/** Looks up a unit of `kind` by symbol, id or alias: exact spelling first, then ignoring case. */
export function findUnit(text: string, kind: QuantityKind): UnitId | undefined {
  const wanted = normaliseUnitText(String(text));
  const candidates = unitsOfKind(kind);
  const spellings = (id: UnitId): string[] => {
    const def: UnitDef = UNITS[id];
    return [id, def.symbol, urlSpelling(id), ...(def.aliases ?? [])].filter((s) => s !== "").map(normaliseUnitText);
  };
  for (const id of candidates) if (spellings(id).includes(wanted)) return id;
  const lower = wanted.toLowerCase();
  const matches = candidates.filter((id) => spellings(id).some((s) => s.toLowerCase() === lower));
  return matches.length === 1 ? matches[0] : undefined;
}

/** Names of the kinds whose identifier is not already the word a message uses. */
const KIND_WORDS: Partial<Record<QuantityKind, string>> = {
  angularSpeed: "rotational speed",
  angularAcceleration: "angular acceleration",
  inertia: "moment of inertia",
  motorVelocityConstant: "motor velocity constant",
  fraction: "ratio",
};

/** The kind's name in words, for messages ("rotational speed"). */
export function kindName(kind: QuantityKind): string {
  return KIND_WORDS[kind] ?? kind;
}

/**
 * Reads what a user typed for a field of `kind`. A bare number takes `defaultUnit`; a decimal
 * comma is accepted ("1,8 in"). "350 g" is a mass in a mass field and 350 standard gravities in
 * an acceleration field: the field's kind decides.
 */
export function parseQuantity(text: string, kind: QuantityKind, defaultUnit: UnitId): ParseResult {
  known(UNITS, defaultUnit, "defaultUnit");
  const trimmed = String(text).trim();
  if (trimmed === "") return { ok: false, reason: "empty", message: "is required" };
  const match = NUMBER_AND_UNIT.exec(trimmed);
  if (!match) {
    return { ok: false, reason: "not-a-number", message: `must start with a number, e.g. ${example(kind, defaultUnit)}` };
  }
  if (/^[+\-−]?\d{1,3},\d{3}$/.test(match[1]!)) {
    const digits = match[1]!.replace(",", "");
    const decimal = match[1]!.replace(",", ".");
    return {
      ok: false,
      reason: "not-a-number",
      message: `is ambiguous: write ${digits} or ${decimal} (a comma can be a decimal mark or a thousands separator)`,
    };
  }
  const number = Number(match[1]!.replace(",", ".").replace(/−/g, "-"));
  if (!Number.isFinite(number)) {
    return { ok: false, reason: "not-a-number", message: `must be a finite number, e.g. ${example(kind, defaultUnit)}` };
  }
  const unitText = match[2]!;
  let unit: UnitId | undefined = defaultUnit;
  if (unitText !== "") {
    unit = findUnit(unitText, kind);
    if (!unit) {
      const known = unitsOfKind(kind)
        .map((id) => UNITS[id].symbol)
        .filter((s) => s !== "");
      const shown = unitText.length > 20 ? `${unitText.slice(0, 20)}…` : unitText;
      return {
        ok: false,
        reason: "unknown-unit",
        message: known.length
          ? `has a unit "${shown}" that is not a ${kindName(kind)} unit; use ${known.join(", ")}`
          : `takes a plain number, without a unit (got "${shown}")`,
      };
    }
  }
  const valueSI = number * UNITS[unit].factor;
  if (!Number.isFinite(valueSI)) return { ok: false, reason: "not-a-number", message: "is too large a number" };
  return { ok: true, valueSI, unit, number };
}

function example(kind: QuantityKind, unit: UnitId): string {
  const symbol = UNITS[unit].symbol;
  const sample = kind === "angularSpeed" ? 2400 : kind === "fraction" ? 10 : 32;
  return symbol ? `${sample} ${symbol}` : String(sample);
}
