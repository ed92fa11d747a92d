/**
 * The error family of calc/. Every bad input becomes a `CalcInputError` whose fields say which
 * input, what it was, what was expected and in which unit; the message is built from them, so the
 * calculators can show it beside the field it names.
 */

/** Formats a received value for a message without ever printing markup or a long float tail. */
function describeValue(value: unknown): string {
  if (typeof value === "number") {
    if (Number.isNaN(value)) return "not a number";
    // Stryker disable next-line EqualityOperator: equivalent, an infinite value is never 0
    if (!Number.isFinite(value)) return value > 0 ? "infinity" : "minus infinity";
    return String(Number(value.toPrecision(6)));
  }
  if (typeof value === "string") {
    const shown = value.length > 40 ? `${value.slice(0, 40)}…` : value;
    return `"${shown}"`;
  }
  // What a person can read, not a program's leftovers ("[object Object]", an array's items run together).
  if (value === undefined) return "nothing";
  if (Array.isArray(value)) return `a list of ${value.length}`;
  if (typeof value === "function") return "a function";
  if (typeof value === "object" && value !== null) return "an object";
  return String(value);
}

/**
 * A rule that compares the input with a limit, kept as data so that a screen can word it in the
 * user's units ("greater than Low end of the plot (500 rpm)") instead of the SI message.
 */
export interface Bound {
  /** How the value must stand to the limit. */
  relation: "greater" | "at-least" | "less" | "at-most";
  /** The limit [SI]. */
  limit: number;
  /** The quantity kind of value and limit (a units.ts kind, e.g. "angularSpeed"). */
  kind: string;
  /** The parameter whose value is the limit, when the limit is another input. */
  other?: string;
}

/** An allowed range, kept as data so that a screen can word it in the user's units [SI]. */
export interface InputRange {
  min: number;
  max: number;
  minOpen?: boolean;
  maxOpen?: boolean;
}

export interface CalcInputErrorFields {
  /** The input's name, as the function's parameter object spells it (e.g. "radius"). */
  param: string;
  /** What was received. */
  value: unknown;
  /** The rule it broke, with its unit, e.g. "greater than 0 m". */
  expected: string;
  /** The unit `value` is expressed in ("" when dimensionless or not a number). */
  unit: string;
  /** The rule as data, when it compares the value with a limit. */
  bound?: Bound;
  /** The allowed range as data, when the rule is one [SI]. */
  range?: InputRange;
}

/** An input outside the domain of a calculation. */
export class CalcInputError extends RangeError implements CalcInputErrorFields {
  readonly param: string;
  readonly value: unknown;
  readonly expected: string;
  readonly unit: string;
  readonly bound: Bound | undefined;
  readonly range: InputRange | undefined;

  constructor(fields: CalcInputErrorFields) {
    const got = describeValue(fields.value);
    // Number.isFinite is false for anything that is not a number (it does not convert).
    const unit = fields.unit && Number.isFinite(fields.value) ? ` ${fields.unit}` : "";
    super(`${fields.param} must be ${fields.expected} (got ${got}${unit})`);
    this.name = "CalcInputError";
    this.param = fields.param;
    this.value = fields.value;
    this.expected = fields.expected;
    this.unit = fields.unit;
    this.bound = fields.bound;
    this.range = fields.range;
  }
}

const RELATION_WORDS: Record<Bound["relation"], string> = { greater: "greater than", "at-least": "at least", less: "less than", "at-most": "at most" };

/**
 * Throws unless `value` stands to `limit` as `relation` says; the error carries the rule as data.
 * `other` names the input the limit comes from ("lowSpeed"), for the message.
 */
export function requireRelation(
  param: string,
  value: number,
  relation: Bound["relation"],
  limit: number,
  options: { kind: string; unit: string; other?: string },
): number {
  // Missing options or limit (a call with null) still give this error family: the check then fails.
  const { kind, unit, other } = options ?? { kind: "", unit: "" };
  requireFinite(param, value, unit);
  const ok = relation === "greater" ? value > limit : relation === "at-least" ? value >= limit : relation === "less" ? value < limit : value <= limit;
  if (!ok) {
    const shown = `${Number(Number(limit).toPrecision(6))}${unit ? ` ${unit}` : ""}`;
    throw new CalcInputError({
      param,
      value,
      expected: `${RELATION_WORDS[relation] ?? relation} ${other ? `${other} (${shown})` : shown}`,
      unit,
      bound: { relation, limit, kind, ...(other ? { other } : {}) },
    });
  }
  return value;
}

/** Throws unless `value` is a finite number. */
export function requireFinite(param: string, value: number, unit: string): number {
  // Number.isFinite is false for anything that is not a number (it does not convert "1").
  if (!Number.isFinite(value)) {
    throw new CalcInputError({ param, value, expected: "a finite number", unit });
  }
  return value;
}

/** Throws unless `value` is finite and strictly greater than zero. */
export function requirePositive(param: string, value: number, unit: string): number {
  requireFinite(param, value, unit);
  if (!(value > 0)) {
    throw new CalcInputError({ param, value, expected: `greater than 0${unit ? ` ${unit}` : ""}`, unit });
  }
  return value;
}

/** Throws unless `value` is finite and zero or more. */
export function requireNonNegative(param: string, value: number, unit: string): number {
  requireFinite(param, value, unit);
  if (!(value >= 0)) {
    throw new CalcInputError({ param, value, expected: `0${unit ? ` ${unit}` : ""} or more`, unit });
  }
  return value;
}

/**
 * Throws unless `min <= value <= max` (or `min < value` / `value < max` where the bound is open).
 */
export function requireInRange(param: string, value: number, unit: string, range: InputRange): number {
  // A missing range (a call with null) fails every comparison: the value is refused, by name.
  const { min, max, minOpen, maxOpen } = range ?? ({} as InputRange);
  // Number.isFinite is false for anything that is not a number (it does not convert "1").
  if (!Number.isFinite(value)) {
    throw new CalcInputError({ param, value, expected: "a finite number", unit, range });
  }
  const lowOk = minOpen ? value > min : value >= min;
  const highOk = maxOpen ? value < max : value <= max;
  if (!lowOk || !highOk) {
    const u = unit ? ` ${unit}` : "";
    const low = minOpen ? `greater than ${min}${u}` : `at least ${min}${u}`;
    const high = maxOpen ? `less than ${max}${u}` : `at most ${max}${u}`;
    throw new CalcInputError({ param, value, expected: `${low} and ${high}`, unit, range });
  }
  return value;
}
