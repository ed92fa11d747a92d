/**
 * Units as data. Every unit is an exact (or derived-exact) ratio to its SI unit, pinned here with
 * its definition and source (unit-definitions.ts has each one in words). Parsing and formatting
 * (units.ts) read only the kinds registered with `useUnits`: a calculator page's script registers the
 * kinds its code names (the build writes them into the page's entry, scripts/site/unit-kinds.mjs),
 * and all-units.ts registers every one for the command line, the build sheet and tests.
 */
import { FOOT, INCH, POUND, POUND_FORCE, RAD_PER_S_PER_RPM, STANDARD_GRAVITY } from "./constants.ts";
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
  /** How a link writes the unit when its symbol and id have characters a URL would percent-encode. */
  url?: string;
  /** Other spellings accepted when parsing (compared case-sensitively, then case-insensitively). */
  aliases?: readonly string[];
}

const OUNCE = POUND / 16; // avoirdupois ounce, exact (nist-sp811)

/** Every unit Whirlbook knows, keyed by id. */
export const UNITS = {
  // length [m]
  m: { symbol: "m", kind: "length", factor: 1, aliases: ["metre", "meter", "meters", "metres"] },
  cm: { symbol: "cm", kind: "length", factor: 0.01 },
  mm: { symbol: "mm", kind: "length", factor: 0.001, aliases: ["millimetre", "millimeter", "millimeters", "millimetres"] },
  in: { symbol: "in", kind: "length", factor: INCH, aliases: ["inch", "inches", '"', "″"] },
  ft: { symbol: "ft", kind: "length", factor: FOOT, aliases: ["foot", "feet", "'", "′"] },
  // area [m²]
  m2: { symbol: "m²", kind: "area", factor: 1, aliases: ["sq m"] },
  mm2: { symbol: "mm²", kind: "area", factor: 1e-6, aliases: ["sq mm"] },
  in2: { symbol: "in²", kind: "area", factor: INCH * INCH, aliases: ["sq in"] },
  // mass [kg]
  kg: { symbol: "kg", kind: "mass", factor: 1 },
  g: { symbol: "g", kind: "mass", factor: 0.001, aliases: ["gram", "grams", "gr"] },
  lb: { symbol: "lb", kind: "mass", factor: POUND, aliases: ["lbs", "pound", "pounds", "lbm"] },
  oz: { symbol: "oz", kind: "mass", factor: OUNCE, aliases: ["ounce", "ounces"] },
  // acceleration [m/s²]
  "m/s2": { symbol: "m/s²", kind: "acceleration", factor: 1, aliases: ["ms-2", "m s-2"] },
  // Shown as gₙ so that an acceleration never reads like grams; "g" is still read in an acceleration field.
  gn: { symbol: "gₙ", kind: "acceleration", url: "g", factor: STANDARD_GRAVITY, aliases: ["G", "g0"] },
  "ft/s2": { symbol: "ft/s²", kind: "acceleration", factor: FOOT },
  // angular speed [rad/s]
  "rad/s": { symbol: "rad/s", kind: "angularSpeed", factor: 1, aliases: ["rad s-1", "1/s"] },
  rpm: { symbol: "rpm", kind: "angularSpeed", factor: RAD_PER_S_PER_RPM, aliases: ["rev/min", "r/min", "RPM"] },
  rps: { symbol: "rev/s", kind: "angularSpeed", factor: 2 * Math.PI, aliases: ["r/s"] },
  "deg/s": { symbol: "°/s", kind: "angularSpeed", factor: Math.PI / 180, aliases: ["dps"] },
  // angular acceleration [rad/s²]
  "rad/s2": { symbol: "rad/s²", kind: "angularAcceleration", factor: 1 },
  "rpm/s": { symbol: "rpm/s", kind: "angularAcceleration", factor: RAD_PER_S_PER_RPM },
  // angle [rad]
  rad: { symbol: "rad", kind: "angle", factor: 1, aliases: ["radian", "radians"] },
  deg: { symbol: "°", kind: "angle", factor: Math.PI / 180, aliases: ["degree", "degrees"] },
  rev: { symbol: "rev", kind: "angle", factor: 2 * Math.PI, aliases: ["turn", "turns"] },
  // time [s]
  s: { symbol: "s", kind: "time", factor: 1, aliases: ["sec", "second", "seconds"] },
  h: { symbol: "h", kind: "time", factor: 3600, aliases: ["hr", "hour", "hours"] },
  ms: { symbol: "ms", kind: "time", factor: 1e-3 },
  us: { symbol: "µs", kind: "time", factor: 1e-6 },
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
  ft·lbf: { symbol: "ft·lbf", kind: "energy", url: "ft-lbf", factor: FOOT * POUND_FORCE, aliases: ["ft*lbf", "ftlbf", "ft.lbf", "ft lbf"] },
  // power [W]
  W: { symbol: "W", kind: "power", factor: 1 },
  kW: { symbol: "kW", kind: "power", factor: 1e3 },
  // torque [N·m]
  N·m: { symbol: "N·m", kind: "torque", url: "Nm", factor: 1, aliases: ["N*m", "N.m", "N m"] },
  lbf·in: { symbol: "lbf·in", kind: "torque", url: "lbf-in", factor: POUND_FORCE * INCH, aliases: ["lbf*in", "in-lbf", "in·lbf", "lbfin"] },
  ozf·in: { symbol: "ozf·in", kind: "torque", url: "ozf-in", factor: (POUND_FORCE / 16) * INCH, aliases: ["ozf*in", "oz-in", "oz·in", "ozin"] },
  // moment of inertia [kg·m²]
  kg·m2: { symbol: "kg·m²", kind: "inertia", url: "kgm2", factor: 1, aliases: ["kg*m^2", "kg m2", "kg.m2"] },
  g·cm2: { symbol: "g·cm²", kind: "inertia", url: "gcm2", factor: 1e-7, aliases: ["g*cm^2", "g cm2"] },
  lb·in2: {
    symbol: "lb·in²",
    kind: "inertia",
    url: "lb-in2",
    factor: POUND * INCH * INCH,
    aliases: ["lbin2", "lb*in^2", "lb in2"],
  },
  oz·in2: {
    symbol: "oz·in²",
    kind: "inertia",
    url: "oz-in2",
    factor: OUNCE * INCH * INCH,
    aliases: ["ozin2", "oz*in^2", "oz in2"],
  },
  // stress [Pa]
  Pa: { symbol: "Pa", kind: "stress", factor: 1 },
  MPa: { symbol: "MPa", kind: "stress", factor: 1e6, aliases: ["N/mm2"] },
  GPa: { symbol: "GPa", kind: "stress", factor: 1e9 },
  psi: { symbol: "psi", kind: "stress", factor: POUND_FORCE / (INCH * INCH), aliases: ["lbf/in2"] },
  ksi: { symbol: "ksi", kind: "stress", factor: (1000 * POUND_FORCE) / (INCH * INCH) },
  // density [kg/m³]
  "kg/m3": { symbol: "kg/m³", kind: "density", factor: 1 },
  "g/cm3": { symbol: "g/cm³", kind: "density", factor: 1000, aliases: ["g/cc", "g/ml"] },
  "lb/in3": { symbol: "lb/in³", kind: "density", factor: POUND / INCH ** 3 },
  // static unbalance (mass × eccentricity) [kg·m]
  kg·m: { symbol: "kg·m", kind: "unbalance", url: "kgm", factor: 1, aliases: ["kg*m", "kg m"] },
  g·mm: { symbol: "g·mm", kind: "unbalance", url: "gmm", factor: 1e-6, aliases: ["g*mm", "g mm", "g-mm"] },
  oz·in: { symbol: "oz·in", kind: "unbalance", url: "oz-in", factor: OUNCE * INCH, aliases: ["ozin", "oz*in", "oz in"] },
  // electrical
  V: { symbol: "V", kind: "voltage", factor: 1, aliases: ["volt", "volts"] },
  A: { symbol: "A", kind: "current", factor: 1, aliases: ["amp", "amps"] },
  ohm: { symbol: "Ω", kind: "resistance", factor: 1, aliases: ["ohms", "Ohm"] },
  mohm: { symbol: "mΩ", kind: "resistance", factor: 1e-3, aliases: ["milliohm", "milliohms", "mOhm"] },
  // motor velocity constant Kv [rad/(s·V)]
  "rad/(s·V)": { symbol: "rad/(s·V)", kind: "motorVelocityConstant", url: "rad/s/V", factor: 1, aliases: ["rad/(s V)"] },
  "rpm/V": { symbol: "rpm/V", kind: "motorVelocityConstant", factor: RAD_PER_S_PER_RPM, aliases: ["kv", "Kv", "KV", "rpm/v"] },
  // dimensionless
  frac: { symbol: "", kind: "fraction", factor: 1, aliases: ["x"] },
  pct: { symbol: "%", kind: "fraction", factor: 0.01, aliases: ["percent"] },
  ppm: { symbol: "ppm", kind: "fraction", factor: 1e-6 },
  count: { symbol: "", kind: "count", factor: 1 },
} as const satisfies Record<string, UnitDef>;

export type UnitId = keyof typeof UNITS;

/**
 * Display units per kind: metric steps, then US steps when they differ. Each step is a unit, or
 * [unit, from] with `from` in SI; `formatQuantity` takes the last step whose `from` the value
 * reaches (the first starts at 0), so 0.45 kg shows as 450 g and 2.3 kg as 2.3 kg.
 */
export type DisplaySteps = readonly (UnitId | readonly [UnitId, number])[];
export const DISPLAY: Record<QuantityKind, readonly [DisplaySteps, DisplaySteps?]> = {
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

/** A kind's units and how its values are shown: what `useUnits` registers. */
export interface KindUnits {
  kind: QuantityKind;
  units: Readonly<Record<string, Omit<UnitDef, "kind">>>;
  display: readonly [DisplaySteps, DisplaySteps?];
}

/** The tables of the given kinds (every kind when none are given), as `useUnits` takes them. */
export function unitTables(kinds: readonly QuantityKind[] = Object.keys(DISPLAY) as QuantityKind[]): KindUnits[] {
  if (!Array.isArray(kinds as unknown)) throw new CalcInputError({ param: "kinds", value: kinds, expected: "a list of quantity kinds", unit: "" });
  return kinds.map((kind) => {
    const display = typeof kind === "string" && Object.hasOwn(DISPLAY, kind) ? DISPLAY[kind] : undefined;
    if (!display) throw new CalcInputError({ param: "kinds", value: kind, expected: "quantity kinds (length, mass, …)", unit: "" });
    const units = Object.fromEntries(
      Object.entries(UNITS as Record<string, UnitDef>)
        .filter(([, def]) => def.kind === kind)
        .map(([id, { kind: _, ...rest }]) => [id, rest]),
    );
    return { kind, units, display };
  });
}
