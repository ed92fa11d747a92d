/**
 * Units at the edge. calc/ works in SI only; this module converts: it parses what a user types
 * ("45 mm", "1.8 in", "350 g") for a field of a known quantity kind and formats SI results in metric
 * or US customary units to a sensible number of significant figures. It reads the units of the kinds
 * registered with `useUnits` (the tables are in unit-table.ts), so that a page carries only the kinds
 * it uses.
 */
import { RAD_PER_S_PER_RPM } from "./constants.ts";
import { CalcInputError } from "./errors.ts";
import type { KindUnits, QuantityKind, UnitDef, UnitId } from "./unit-table.ts";

export type { DisplaySteps, KindUnits, QuantityKind, UnitDef, UnitId } from "./unit-table.ts";

/** The registered units by id, and each registered kind's ids (in table order) and display steps. */
const UNIT: Record<string, UnitDef> = {};
const KIND: Partial<Record<QuantityKind, { ids: UnitId[]; display: KindUnits["display"] }>> = {};

/**
 * Makes the units of the given kinds known to parsing and formatting (tables from unit-table.ts,
 * `unitTables`); registering a kind again does nothing.
 *
 * @param tables the kinds' tables
 */
export function useUnits(tables: readonly KindUnits[]): void {
  for (const table of tables ?? []) {
    const { kind, units, display } = table ?? {};
    if (typeof kind !== "string" || typeof units !== "object" || units === null || !Array.isArray(display)) {
      throw new CalcInputError({ param: "tables", value: String(kind), expected: "unit tables from unitTables()", unit: "" });
    }
    if (KIND[kind]) continue;
    KIND[kind] = { ids: Object.keys(units) as UnitId[], display };
    for (const [id, entry] of Object.entries(units)) UNIT[id] = { ...entry, kind };
  }
}

/** Whether the units of `kind` are registered (see `useUnits`). */
export function unitsLoaded(kind: QuantityKind): boolean {
  return typeof kind === "string" && Object.hasOwn(KIND, kind);
}

/** The unit `id`: symbol, kind, factor; a CalcInputError naming `param` when no registered unit has that id. */
export function unitDef(id: UnitId, param = "unit"): UnitDef {
  return known(UNIT, id, param);
}

/** The registered unit with id `id` (untrusted), or undefined. */
export function lookupUnit(id: unknown): UnitDef | undefined {
  return typeof id === "string" && Object.hasOwn(UNIT, id) ? UNIT[id] : undefined;
}

/** The registered ids and display steps of `kind`; a CalcInputError naming "kind" when it has none. */
function kindUnits(kind: QuantityKind): NonNullable<(typeof KIND)[QuantityKind]> {
  if (typeof kind === "string" && Object.hasOwn(KIND, kind)) return KIND[kind]!;
  throw new CalcInputError({ param: "kind", value: String(kind), expected: "a quantity kind whose units are registered (useUnits)", unit: "" });
}

/** Unit ids of one kind, in table order. */
export function unitsOfKind(kind: QuantityKind): UnitId[] {
  return [...kindUnits(kind).ids];
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
  return scaled(value, known(UNIT, from, "from").factor, false);
}

/** Converts an SI `value` into unit `to`. */
export function fromSI(value: number, to: UnitId): number {
  return scaled(value, known(UNIT, to, "to").factor, true);
}

/** rpm → rad/s (exact: 1 rpm = 2π/60 rad/s). */
export function rpmToRadPerSecond(rpm: number): number {
  return scaled(rpm, RAD_PER_S_PER_RPM, false);
}

/** rad/s → rpm (exact: 1 rad/s = 60/2π rpm). */
export function radPerSecondToRpm(angularSpeed: number): number {
  return scaled(angularSpeed, RAD_PER_S_PER_RPM, true);
}

// ---------------------------------------------------------------------------------------------
// Unit systems: which unit each kind is shown in.

export type UnitSystem = "metric" | "us";

/** The unit a value of `kind` is shown in for `system`, chosen by magnitude. */
export function displayUnit(kind: QuantityKind, system: UnitSystem, valueSI = 0): UnitId {
  const [metric, us] = kindUnits(kind).display;
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
    // From the value itself: the largest doubles round past the largest double (1.80 × 10³⁰⁸ to three figures).
    const [mantissa, exponent] = value.toExponential(significant - 1).split("e");
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
  // Stryker disable next-line StringLiteral: equivalent, displayUnit shows metric units for any system but "us"
  const { unit = displayUnit(kind, options?.system ?? "metric", valueSI), significant = 3 } = options ?? {};
  // A value beyond the largest double in a small unit shows as "—", as formatNumber shows any non-finite value.
  const def = known(UNIT, unit, "unit");
  const number = formatNumber(valueSI / def.factor, significant);
  const symbol = def.symbol;
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
  // No anchors: String(value) is the number alone, so a match spans the whole text.
  const match = /(-?)(\d)(?:\.(\d+))?e([+-]\d+)/.exec(text);
  if (!match) return text;
  const [, sign, lead, rest = "", exp] = match;
  const digits = lead! + rest;
  const power = Number(exp);
  // Stryker disable next-line EqualityOperator: equivalent, String writes an exponent only from e+21 up and e-7 down, so power is never 0
  const plain = power < 0 ? `${sign}0.${"0".repeat(-power - 1)}${digits}` : `${sign}${digits}${"0".repeat(Math.max(0, power - rest.length))}`;
  return plain.length <= 24 ? plain : text;
}

/**
 * The shortest number n (as few significant figures as possible) with n × factor = valueSI exactly
 * in floating point, the way `parseQuantity` turns a number in a unit back into SI; null when no
 * such number exists.
 */
function exactMultiple(valueSI: number, factor: number): number | null {
  // Stryker disable next-line ConditionalExpression: equivalent, for a factor of 1 the loop below finds the same double (n × 1 = n), a shortcut only
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
    // Stryker disable next-line AssignmentOperator: equivalent, n × factor rounds monotonically in n, so the doubles that multiply back to valueSI lie on one side of n and either order of steps finds the same nearest one
    word[0]! += step;
    const candidate = bits[0]!;
    // A step past the largest double gives ±Infinity (or NaN from NaN), whose product is never the finite valueSI.
    if (candidate * factor === valueSI) return candidate;
  }
  return null;
}

/** The kind's SI unit: the one unit of the kind whose factor is 1 (e.g. "m", "rad/s", "frac"). */
export function siUnit(kind: QuantityKind): UnitId {
  return unitsOfKind(kind).find((u) => UNIT[u]!.factor === 1)!;
}

/** How a link spells the kind's SI unit. */
function siUnitText(kind: QuantityKind): string {
  const id = siUnit(kind);
  const def = UNIT[id]!;
  // Stryker disable next-line OptionalChaining: equivalent, only a unit whose factor is not 1 falls back to SI, and the one symbol-less kind with such a unit (fraction: %, ppm) has an alias for its SI unit
  return def.symbol === "" ? (def.aliases?.[0] ?? "") : urlSpelling(id);
}

/**
 * The shortest number that reads back as exactly `valueSI` in `unit`, and the unit it is in: `unit`
 * itself, or the kind's SI unit when no number in `unit` multiplies back exactly.
 */
export function exactQuantity(valueSI: number, unit: UnitId): { number: string; unit: UnitId } {
  if (!Number.isFinite(valueSI)) throw new CalcInputError({ param: "value", value: valueSI, expected: "a finite number", unit: "" });
  const def = known(UNIT, unit, "unit");
  const n = exactMultiple(valueSI, def.factor);
  if (n === null) return { number: plainNumber(valueSI), unit: siUnit(def.kind) };
  return { number: plainNumber(n), unit }; // plainNumber writes −0 as "0" (String(-0))
}

/**
 * Writes an SI value as compact text ("32mm", "2400rpm", "12.703125mm") that `parseQuantity` reads
 * back as exactly the same SI value: the shortest number that does so in `unit`, in plain decimal;
 * when no number in `unit` multiplies back exactly, the value in the kind's SI unit ("0.0127031m").
 */
export function quantityToText(valueSI: number, unit: UnitId): string {
  const exact = exactQuantity(valueSI, unit);
  if (exact.unit !== unit) return `${exact.number}${siUnitText(UNIT[unit]!.kind)}`;
  return `${exact.number}${urlSpelling(unit)}`; // a unit without a symbol (a ratio, a count) is spelled ""
}

/**
 * Writes an SI value as a bare number in a unit of size `factor` (mm: 0.001) for compact list texts
 * (a parts list, calibration readings) so that `readExactNumber` gives back exactly the same value:
 * the shortest such number, or, when none exists, the SI value itself marked "si" ("0.0127031si").
 */
export function exactNumberText(valueSI: number, factor: number): string {
  if (!Number.isFinite(valueSI)) throw new CalcInputError({ param: "value", value: valueSI, expected: "a finite number", unit: "" });
  const n = exactMultiple(valueSI, factor);
  return n === null ? `${plainNumber(valueSI)}si` : plainNumber(n); // plainNumber writes −0 as "0"
}

const EXACT_NUMBER = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)(si)?$/;

/** Reads a number written by `exactNumberText` into SI; null when the text is not such a number (or passes the largest double in SI). */
export function readExactNumber(text: string, factor: number): number | null {
  const match = EXACT_NUMBER.exec(text);
  if (!match) return null;
  const n = match[2] ? Number(match[1]) : Number(match[1]) * factor;
  return Number.isFinite(n) ? n : null;
}

/** How a unit is written in a URL: its symbol when that is plain ASCII, else an ASCII spelling. */
function urlSpelling(id: UnitId): string {
  const { symbol, url } = UNIT[id]!;
  return url ?? (/^[\w/.]*$/.test(symbol) ? symbol : id);
}

/**
 * Field text as a link writes it: without spaces, and with a unit symbol a URL would percent-encode
 * written in its ASCII spelling ("200 gₙ" → "200g", "8 mΩ" → "8mohm"); `findUnit` reads both back
 * as the same unit. Text in any other form is kept as typed.
 */
export function linkSpelling(text: string): string {
  if (typeof text !== "string") throw new CalcInputError({ param: "text", value: text, expected: "text", unit: "" });
  const compact = text.replace(/\s/g, "");
  const match = /^([+\-−]?[\d.,]+(?:[eE][+\-−]?\d+)?)(.+)$/.exec(compact);
  if (!match || /^[\w/.%]*$/.test(match[2]!)) return compact;
  const id = (Object.keys(UNIT) as UnitId[]).find((u) => UNIT[u]!.symbol === match[2]);
  return id ? `${match[1]}${urlSpelling(id)}` : compact;
}

// ---------------------------------------------------------------------------------------------
// Parsing what a user typed.

export type ParseResult =
  | { ok: true; valueSI: number; unit: UnitId; number: number }
  | { ok: false; reason: "empty" | "not-a-number" | "unknown-unit"; message: string };

const NUMBER_AND_UNIT = /^([+\-−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-−]?\d+)?)\s*(.*)$/;

function normaliseUnitText(text: string): string {
  return (
    text
      .trim()
      .replace(/\s+/g, " ")
      .replace(/[μu](?=s$)/, "µ")
      // A caret before a superscript ("m^²") goes with the caret rules below.
      .replace(/²/g, "2")
      .replace(/³/g, "3")
      .replace(/\^2/g, "2")
      .replace(/\^3/g, "3")
  );
}

/** Looks up a unit of `kind` by symbol, id or alias: exact spelling first, then ignoring case. */
export function findUnit(text: string, kind: QuantityKind): UnitId | undefined {
  const wanted = normaliseUnitText(String(text));
  const candidates = unitsOfKind(kind);
  const spellings = (id: UnitId): string[] => {
    const def = UNIT[id]!;
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

/** "a length", "an acceleration": every kind's name starts with a consonant sound or a vowel letter. */
function withArticle(words: string): string {
  return `${/^[aeiou]/i.test(words) ? "an" : "a"} ${words}`;
}

/**
 * Reads what a user typed for a field of `kind`. A bare number takes `defaultUnit`; a decimal
 * comma is accepted ("1,8 in"). "350 g" is a mass in a mass field and 350 standard gravities in
 * an acceleration field: the field's kind decides.
 */
export function parseQuantity(text: string, kind: QuantityKind, defaultUnit: UnitId): ParseResult {
  known(UNIT, defaultUnit, "defaultUnit");
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
        .map((id) => UNIT[id]!.symbol)
        .filter((s) => s !== "");
      const shown = unitText.length > 20 ? `${unitText.slice(0, 20)}…` : unitText;
      return {
        ok: false,
        reason: "unknown-unit",
        message: known.length
          ? `has a unit "${shown}" that is not ${withArticle(kindName(kind))} unit; use ${known.join(", ")}`
          : `takes a plain number, without a unit (got "${shown}")`,
      };
    }
  }
  const valueSI = number * UNIT[unit]!.factor;
  if (!Number.isFinite(valueSI)) return { ok: false, reason: "not-a-number", message: "is too large a number" };
  return { ok: true, valueSI, unit, number };
}

function example(kind: QuantityKind, unit: UnitId): string {
  const symbol = UNIT[unit]!.symbol;
  const sample = kind === "angularSpeed" ? 2400 : kind === "fraction" ? 10 : 32;
  return symbol ? `${sample} ${symbol}` : String(sample);
}
