/**
 * Helpers shared by the weapon-in-motion tests: tolerance checks, the numbers inside a result,
 * declaration defaults, and fast-check arbitraries over the whole double range (with null,
 * undefined and strings mixed in) for the "finite or a named CalcInputError" properties.
 */
import { expect } from "vitest";
import fc from "fast-check";
import { CalcInputError } from "../../../calc/core/errors.ts";
import type { InputSpec, InputSpecs } from "../../../calc/core/inputs.ts";

export function expectClose(actual: number, expected: number, rtol: number): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (rtol ${rtol})`).toBeLessThanOrEqual(rtol * Math.abs(expected));
}

/** Every number anywhere in a plain result object. */
export function numbersIn(value: unknown): number[] {
  if (typeof value === "number") return [value];
  if (value && typeof value === "object") return Object.values(value).flatMap(numbersIn);
  return [];
}

export function defaultsOf<T extends InputSpecs>(specs: T): { [K in keyof T]: number } {
  return Object.fromEntries(Object.entries(specs).map(([k, spec]) => [k, spec.default])) as { [K in keyof T]: number };
}

/** Any double at all, with the edges (±0, subnormals, ±MAX_VALUE) well represented; no NaN or infinity. */
export const anyFinite = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, -0, Number.MIN_VALUE, -Number.MIN_VALUE, 2.2e-308, Number.MAX_VALUE, -Number.MAX_VALUE, 1e300, -1e300, 1e-300, 1, -1),
  fc.double({ min: -1e3, max: 1e3, noNaN: true }),
);

/** Anything a caller might pass as a number field: any double, NaN, ±infinity, null, undefined or a string. */
export const anyField = fc.oneof(
  { weight: 8, arbitrary: anyFinite },
  { weight: 1, arbitrary: fc.constantFrom<unknown>(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, null, undefined, "12", {}) },
);

/**
 * Runs `run`: it must either return a value whose every number is finite, or throw a
 * CalcInputError that names one of `params` (or "input" for the argument itself).
 */
export function expectFiniteOrNamedError(run: () => unknown, params: readonly string[]): void {
  let result: unknown;
  try {
    result = run();
  } catch (error) {
    expect(error, String(error)).toBeInstanceOf(CalcInputError);
    expect([...params, "input"]).toContain((error as CalcInputError).param);
    return;
  }
  for (const x of numbersIn(result)) expect(Number.isFinite(x), `non-finite number in ${JSON.stringify(result)}`).toBe(true);
}

/** A valid SI value for one declared input: anywhere in its range, the bounds and whole numbers included. */
export function validValue(spec: InputSpec): fc.Arbitrary<number> {
  if (spec.integer) return fc.integer({ min: Math.ceil(spec.min), max: Math.floor(spec.max) });
  const inner = fc.double({ min: spec.min, max: spec.max, noNaN: true, minExcluded: spec.minOpen === true });
  const edges = [spec.max, spec.default, ...(spec.minOpen ? [] : [spec.min])];
  return fc.oneof(inner, fc.constantFrom(...edges));
}

/** A record of valid values for every declared input. */
export function validInputs<T extends InputSpecs>(specs: T): fc.Arbitrary<{ [K in keyof T]: number }> {
  return fc.record(Object.fromEntries(Object.entries(specs).map(([k, spec]) => [k, validValue(spec)]))) as unknown as fc.Arbitrary<{ [K in keyof T]: number }>;
}

/** A value outside the declared range of `spec` (or not whole where it must be), or not a number at all. */
export function invalidValue(spec: InputSpec): fc.Arbitrary<unknown> {
  const options: fc.Arbitrary<unknown>[] = [
    fc.constantFrom<unknown>(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, null, undefined, "1"),
    fc.double({ max: spec.min, noNaN: true, noDefaultInfinity: true }).filter((x) => (spec.minOpen ? x <= spec.min : x < spec.min)),
    fc.double({ min: spec.max, noNaN: true, noDefaultInfinity: true }).filter((x) => x > spec.max),
  ];
  if (spec.integer) options.push(fc.double({ min: spec.min, max: spec.max, noNaN: true }).filter((x) => !Number.isInteger(x)));
  return fc.oneof(...options);
}

/**
 * Checks that `run` refuses every invalid value of each declared field (out of range, non-finite,
 * null, missing) with a `CalcInputError` naming that field, the other fields at their defaults.
 */
export function expectEachFieldNamed<T extends InputSpecs>(specs: T, defaults: object, run: (input: never) => unknown, runs: fc.Parameters<unknown>): void {
  const names = Object.keys(specs);
  fc.assert(
    fc.property(fc.constantFrom(...names), fc.gen(), (name, gen) => {
      const bad = gen(() => invalidValue(specs[name] as InputSpec));
      try {
        run({ ...defaults, [name]: bad } as never);
        expect.unreachable(`accepted ${name} = ${String(bad)}`);
      } catch (error) {
        expect(error).toBeInstanceOf(CalcInputError);
        expect((error as CalcInputError).param).toBe(name);
      }
    }),
    runs,
  );
}
