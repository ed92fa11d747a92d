/**
 * The one way calc/ checks an input against its declaration (calc/core/inputs.ts), so an entry
 * function refuses exactly what its fields would refuse, by name and in SI: an object of named
 * inputs, each present, finite, within its declared range and whole where it must be. Also the
 * guard for a result that would leave the finite range.
 */
import { CalcInputError } from "./errors.ts";
import type { InputSpec, InputSpecs } from "./inputs.ts";
import { siUnit, UNITS } from "./units.ts";

/** The SI symbol a value of the spec's kind is given in ("m", "rad/s"; "" for a plain ratio). */
export function siSymbol(spec: Pick<InputSpec, "kind">): string {
  return UNITS[siUnit(spec.kind)].symbol;
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
  const unit = siSymbol(spec);
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
export function requireFiniteResult(result: number, what: string, inputs: Record<string, NamedValue>): number {
  if (Number.isFinite(result)) return result;
  let worst: [string, number, string] | null = null;
  let worstScore = -1;
  for (const [name, [value, unit]] of Object.entries(inputs)) {
    const score = value === 0 ? 0 : Math.abs(Math.log10(Math.abs(value)));
    if (score > worstScore) {
      worstScore = score;
      worst = [name, value, unit];
    }
  }
  const [param, value, unit] = worst ?? ["input", result, ""];
  const expected = Math.abs(value) >= 1 ? `small enough for the ${what} to stay finite` : `large enough for the ${what} to stay finite`;
  throw new CalcInputError({ param, value, expected, unit });
}

/**
 * a/b, or null when the quotient is not finite (b is 0, or so small that the quotient passes the
 * largest double): for ratios whose "infinite" end means "nothing comes near the limit".
 */
export function ratioOrNull(a: number, b: number): number | null {
  const q = a / b;
  return Number.isFinite(q) ? q : null;
}
