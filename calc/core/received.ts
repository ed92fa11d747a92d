/**
 * A received value in words, for the "(got …)" of a message. Apart from inputs.ts so that only the
 * pages that report stored or linked values (the build sheet, the parts list) carry it.
 */
import { lookupUnit, type UnitId } from "./units.ts";

/**
 * What a stored or typed value was, for a message, in the field's unit: "-3000 mm" for -3 m in a
 * millimetre field, "the text "fast"", "a number too large to store" (JSON's 1e999 reads as
 * infinity), "nothing (null)", "a list", "an object".
 *
 * @param value the value received (numbers in SI)
 * @param unit the unit the field shows (a number without one is shown as it is)
 * @returns the value in words, for "(got …)"
 * @example
 * describeReceived(-3, "mm") // → "-3000 mm"
 * describeReceived(Number.POSITIVE_INFINITY, "mm") // → "a number too large to store"
 * describeReceived(null) // → "nothing (null)"
 *
 * Sources: none (message wording of our own).
 */
export function describeReceived(value: unknown, unit?: UnitId): string {
  if (typeof value === "number") {
    if (Number.isNaN(value)) return "not a number";
    // Stryker disable next-line EqualityOperator: equivalent, an infinite value is never 0
    if (!Number.isFinite(value)) return value > 0 ? "a number too large to store" : "a negative number too large to store";
    // An unknown unit (not one of calc/core's ids) is left out rather than guessed.
    const def = lookupUnit(unit);
    if (!def) return String(Number(value.toPrecision(6)));
    // Divided here, not by fromSI, which refuses a value that leaves the doubles in the new unit.
    const shown = Number((value / def.factor).toPrecision(6));
    return Number.isFinite(shown) ? `${shown}${def.symbol ? ` ${def.symbol}` : ""}` : "a number too large to show in that unit";
  }
  if (typeof value === "string") return `the text ${JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value)}`;
  if (value === null) return "nothing (null)";
  if (value === undefined) return "nothing";
  if (Array.isArray(value)) return "a list";
  if (typeof value === "object") return "an object";
  return String(value);
}
