/** Entry checks shared by the steering modules. */
import { CalcInputError } from "../core/errors.ts";

/**
 * Throws a `CalcInputError` unless `value` is an object (so that a null or missing argument is a
 * named input error, never a TypeError from destructuring).
 *
 * @param value the argument received
 * @param param its name in messages (default "input")
 * @returns the same value, typed
 */
export function requireInputObject<T>(value: T, param = "input"): T {
  if (value === null || typeof value !== "object") throw new CalcInputError({ param, value, expected: "an object of named inputs", unit: "" });
  return value;
}
