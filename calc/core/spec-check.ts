/**
 * The one way calc/ checks an input against its declaration (calc/core/inputs.ts), so an entry
 * function refuses exactly what its fields would refuse, by name and in SI: an object of named
 * inputs, each present, finite, within its declared range and whole where it must be. Also the
 * guard for a result that would leave the finite range.
 */
import { CalcInputError } from "./errors.ts";
import type { InputSpec, InputSpecs } from "./inputs.ts";
import { siUnit, unitDef } from "./units.ts";

/** The SI symbol a value of the spec's kind is given in ("m", "rad/s"; "" for a plain ratio). */
export function siSymbol(spec: Pick<InputSpec, "kind">): string {
  return unitDef(siUnit(spec.kind)).symbol;
}

function shown(bound: number, unit: string): string {
  return `${Number(bound.toPrecision(6))}${unit ? ` ${unit}` : ""}`;
}

/**
 * Throws a `CalcInputError` naming `param` unless `input` is an object (so that a function called
 * with null or undefined reports it instead of failing with a TypeError); returns it otherwise.
 */
export function requireInputObject<T>(input: T, param = "input"): NonNullable<T> & Record<string, unknown> {
  if (input === null || typeof input !== "object") {
    throw new CalcInputError({ param, value: input, expected: "an object of named inputs", unit: "" });
  }
  return input as NonNullable<T> & Record<string, unknown>;
}

/**
 * Throws a `CalcInputError` naming `name` unless `value` is a finite number within the range
 * `spec` declares (min excluded where `minOpen`) and whole where it must be; returns it otherwise.
 */
export function requireDeclared(spec: InputSpec, name: string, value: unknown): number {
  // A name the declaration does not hold (its spec looked up as undefined) is refused the same way.
  if (spec === null || typeof spec !== "object")
    throw new CalcInputError({ param: String(name), value, expected: "an input this calculator declares", unit: "" });
  const unit = siSymbol(spec);
  // Stryker disable next-line ConditionalExpression: equivalent, Number.isFinite is false for anything not a number (the typeof narrows the type)
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new CalcInputError({ param: name, value, expected: "a finite number", unit });
  }
  const lowOk = spec.minOpen ? value > spec.min : value >= spec.min;
  if (!lowOk || !(value <= spec.max) || (spec.integer === true && !Number.isInteger(value))) {
    const low = `${spec.minOpen ? "greater than" : "at least"} ${shown(spec.min, unit)}`;
    throw new CalcInputError({ param: name, value, expected: `${spec.integer ? "a whole number " : ""}${low} and at most ${shown(spec.max, unit)}`, unit });
  }
  return value;
}

/**
 * Checks every declared input of `input` (SI) against its declaration; other fields are ignored.
 *
 * @param specs the calculator's input declaration
 * @param input the values in SI, one per declared input
 * @returns the declared inputs as numbers; throws on the first bad one, e.g. "radius1 must be
 * greater than 0.0001 m and at most 1 m (got 0 m)"
 */
export function requireWithinSpecs<T extends InputSpecs>(specs: T, input: unknown): { [K in keyof T]: number } {
  requireInputObject(specs, "specs");
  const fields = requireInputObject(input);
  const out: Record<string, number> = {};
  for (const [name, spec] of Object.entries(specs)) out[name] = requireDeclared(spec, name, fields[name]);
  return out as { [K in keyof T]: number };
}

/** Throws unless `value` is a whole number in [min, max] (param names the input). */
export function requireWhole(param: string, value: number, min: number, max: number): number {
  return requireDeclared({ kind: "count", min, max, integer: true } as InputSpec, param, value);
}

/** An input as the finiteness guard sees it: its value and its SI unit. */
export type NamedValue = readonly [value: number, unit: string];

/** The inputs a result came from, by name, or a function that lists them (called only when the result is not finite). */
export type NamedValues = Record<string, NamedValue> | (() => Record<string, NamedValue>);

/**
 * Returns `result` when it is finite. Otherwise throws a `CalcInputError` naming the input of most
 * extreme magnitude among `inputs` (the one furthest from 1 in orders of magnitude): with every
 * input finite, a non-finite result can only come from an overflow or a division by an
 * underflowed product, and that input is the one that took it out of range.
 *
 * @param result the computed value
 * @param what the quantity, for the message ("gyroscopic moment")
 * @param inputs the inputs the result was computed from, by name
 * @returns `result`, finite
 */
export function requireFiniteResult(result: number, what: string, inputs: NamedValues): number {
  if (Number.isFinite(result)) return result;
  // Orders of magnitude from 1 (0 for an input of 0).
  const score = ([, [value]]: [string, NamedValue]) => Math.abs(Math.log10(Math.abs(value) || 1));
  const entries: [string, NamedValue][] = Object.entries(typeof inputs === "function" ? inputs() : inputs);
  const [param, [value, unit]] = entries.length ? entries.reduce((a, b) => (score(b) > score(a) ? b : a)) : ["input", [result, ""] as NamedValue];
  throw new CalcInputError({ param, value, expected: `${Math.abs(value) >= 1 ? "small" : "large"} enough for the ${what} to stay finite`, unit });
}

/**
 * a/b, or null when the quotient is not finite (b is 0, or so small that the quotient passes the
 * largest double): for ratios whose "infinite" end means "nothing comes near the limit".
 */
export function ratioOrNull(a: number, b: number): number | null {
  const q = a / b;
  return Number.isFinite(q) ? q : null;
}

/** True when every number in `value` (its fields and list items, deeply) is finite. */
function everyNumberFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  // Stryker disable next-line ConditionalExpression: equivalent, a for…in over null runs no iteration, so null reads as finite either way
  if (value === null || typeof value !== "object") return true;
  // A loop without copies: a simulation's result holds a few thousand numbers.
  for (const key in value) if (!everyNumberFinite((value as Record<string, unknown>)[key])) return false;
  return true;
}

/**
 * Returns `result` when every number in it (fields and list items, deeply) is finite; otherwise
 * throws as `requireFiniteResult` does, naming the most extreme of `inputs`.
 *
 * @param result a computed result object
 * @param what the quantity, for the message ("stress profile")
 * @param inputs the inputs the result was computed from, by name
 * @returns `result`, every number in it finite
 */
export function requireFiniteFields<T>(result: T, what: string, inputs: NamedValues): T {
  if (!everyNumberFinite(result)) requireFiniteResult(Number.NaN, what, inputs);
  return result;
}

/** Throws a `CalcInputError` naming `param` unless `list` is an array; returns it otherwise. */
export function requireList<T>(list: readonly T[], param: string): readonly T[] {
  if (!Array.isArray(list)) throw new CalcInputError({ param, value: list, expected: "a list", unit: "" });
  return list;
}

/** The declared inputs of `input` by name, each with its SI unit: what the finiteness guards name. */
export function declaredInputs(specs: InputSpecs, input: unknown): Record<string, NamedValue> {
  const fields = requireInputObject(input);
  return Object.fromEntries(Object.entries(specs).map(([name, spec]) => [name, [Number(fields[name]), siSymbol(spec)]]));
}
