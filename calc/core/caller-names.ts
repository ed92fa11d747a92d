/**
 * Refusals in the caller's words: a calc function that hands its inputs to a helper under other
 * names (or hands it a value derived from one, such as a point sampled within a range) renames the
 * helper's refusal to the field its own caller wrote. Apart from spec-check.ts so that only the
 * pages whose calculators use it carry it.
 */
import { CalcInputError } from "./errors.ts";

/**
 * Runs `run`, and when it refuses an input under a name of its own (a helper's parameter), refuses
 * it again under the caller's name for it, so the message names the field the caller wrote
 * (`names`: the helper's name → the caller's, or the caller's name and its value, when the helper
 * was given a value derived from it, such as a point sampled within the caller's range).
 */
export function asCallerNames<T>(names: Readonly<Record<string, string | readonly [string, number]>>, run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof CalcInputError) || !(error.param in names)) throw error;
    const to = names[error.param]!;
    const [param, value] = typeof to === "string" ? [to, error.value] : to;
    throw new CalcInputError({ param, value, expected: error.expected, unit: error.unit, bound: error.bound, range: error.range });
  }
}
