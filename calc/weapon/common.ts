/**
 * Shared plumbing of the weapon-in-motion modules (gyroscopic.ts, shaft.ts, bearings.ts,
 * impact.ts): reading one object of named inputs, choosing from a fixed list, checking a whole
 * input against its declaration, and refusing a result that would leave the finite range. No
 * physics lives here. SI in and out.
 */
import { CalcInputError } from "../errors.ts";
import type { InputSpecs } from "../inputs.ts";
import type { QuantityKind } from "../units.ts";

/** How a checked design stands. */
export type Verdict = "holds" | "marginal" | "fails";

/** One entry of a fixed list of choices: the value the code uses and the label a person reads. */
export interface ChoiceOption<V extends string = string> {
  readonly value: V;
  readonly label: string;
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
 * Throws a `CalcInputError` naming `param` and listing the allowed values unless `value` is one
 * of `options`; returns it narrowed to the option type otherwise.
 */
export function requireOption<V extends string>(param: string, value: unknown, options: readonly ChoiceOption<V>[]): V {
  const found = options.find((option) => option.value === value);
  if (!found) {
    throw new CalcInputError({ param, value, expected: `one of ${options.map((o) => `"${o.value}"`).join(", ")}`, unit: "" });
  }
  return found.value;
}

/** SI symbol of every quantity kind, for error messages. */
export const SI_SYMBOL: Record<QuantityKind, string> = {
  length: "m",
  mass: "kg",
  acceleration: "m/s²",
  angularSpeed: "rad/s",
  angularAcceleration: "rad/s²",
  angle: "rad",
  time: "s",
  frequency: "Hz",
  force: "N",
  speed: "m/s",
  energy: "J",
  power: "W",
  torque: "N·m",
  inertia: "kg·m²",
  stress: "Pa",
  density: "kg/m³",
  unbalance: "kg·m",
  voltage: "V",
  current: "A",
  resistance: "Ω",
  motorVelocityConstant: "rad/(s·V)",
  fraction: "",
  count: "",
};

function shown(bound: number, unit: string): string {
  return `${Number(bound.toPrecision(6))}${unit ? ` ${unit}` : ""}`;
}

/**
 * Checks every declared field of `input` (SI) against its declaration: present, finite, inside
 * [min, max] (min excluded where `minOpen`), whole where `integer`. Throws a `CalcInputError`
 * naming the first field that is not; returns the numeric fields otherwise.
 *
 * @param specs the calculator's input declaration
 * @param input the values in SI (other, non-declared fields are ignored)
 * @returns the declared fields as numbers
 */
export function requireDeclaredInputs<T extends InputSpecs>(specs: T, input: unknown): { [K in keyof T]: number } {
  const fields = requireInputObject(input);
  const out: Record<string, number> = {};
  for (const [name, spec] of Object.entries(specs)) {
    out[name] = requireDeclared(spec, name, fields[name]);
  }
  return out as { [K in keyof T]: number };
}

/** Throws a `CalcInputError` naming `name` unless `value` lies in the range `spec` declares. */
export function requireDeclared(spec: InputSpecs[string], name: string, value: unknown): number {
  const unit = SI_SYMBOL[spec.kind];
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new CalcInputError({ param: name, value, expected: "a finite number", unit });
  }
  const lowOk = spec.minOpen ? value > spec.min : value >= spec.min;
  if (!lowOk || !(value <= spec.max)) {
    const low = `${spec.minOpen ? "greater than" : "at least"} ${shown(spec.min, unit)}`;
    throw new CalcInputError({ param: name, value, expected: `${low} and at most ${shown(spec.max, unit)}`, unit });
  }
  if (spec.integer === true && !Number.isInteger(value)) {
    throw new CalcInputError({ param: name, value, expected: "a whole number", unit });
  }
  return value;
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
