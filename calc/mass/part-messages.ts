/**
 * What is wrong with a part, in the parts editor's words: the field's label, the allowed range and
 * the value received in the unit the editor shows ("Radius must be greater than 0 mm and at most
 * 100000 mm (got -5 mm)"), instead of the check's parameter path and SI units. Used for a part
 * read from a link or a design file.
 */
import { CalcInputError } from "../core/errors.ts";
import { describeRange, fieldUnit, type InputSpec } from "../core/inputs.ts";
import { fromSI, type UnitId, type UnitSystem, unitDef } from "../core/units.ts";
import { PART_INPUTS } from "./part-inputs.ts";

const FIELDS: Record<string, InputSpec> = PART_INPUTS;
/** Words for the fields that hold no number. */
const OTHER: Record<string, string> = { name: "Name", "shape.kind": "Shape", "mass.kind": "Mass source", "mass.material": "Material" };
/** A number in a unit, to 6 significant figures: "-5 mm". */
const inUnit = (value: unknown, unit: UnitId) => `${Number(fromSI(Number(value), unit).toPrecision(6))} ${unitDef(unit).symbol}`;
const RELATION = { greater: "greater than", "at-least": "at least", less: "less than", "at-most": "at most" };

/**
 * A part's problem as the editor would word it, in two pieces so a caller can say which part.
 *
 * @param error what `checkPart` threw (anything else gives a general sentence)
 * @param options the unit system for numbers; the part's shape (a ring's or rod's thickness is its section diameter);
 *   how to word a received value that may be anything (`describeReceived` for a design file; a link
 *   holds only numbers, which are written in the field's unit by default)
 * @returns the field's label and the rest of the sentence
 * @example
 * describePartProblem(new CalcInputError({ param: "part.x", value: 300, expected: "…", unit: "m", range: { min: -100, max: 100 } })) // → { label: "x", rule: "must be between -100000 mm and 100000 mm (got 300000 mm)" }
 *
 * Sources: none (message wording of our own).
 */
export function describePartProblem(
  error: unknown,
  options: { system?: UnitSystem; shape?: unknown; received?: (value: unknown, unit: UnitId) => string } = {},
): { label: string; rule: string } {
  if (!(error instanceof CalcInputError)) return { label: "The part", rule: "is not a valid part" };
  const { system = "metric", received = inUnit } = options;
  // Stryker disable next-line Regex: equivalent, [^.]*\.? matches (if only the empty text) at the start, so the first match begins there without ^ too
  const path = error.param.replace(/^[^.]*\.?/, "");
  const field = path.split(".").at(-1)!;
  const name = field === "thickness" && (options.shape === "ring" || options.shape === "rod") ? "section" : field;
  const spec = Object.hasOwn(FIELDS, name) ? FIELDS[name]! : null;
  if (!spec) return { label: Object.hasOwn(OTHER, path) ? OTHER[path]! : "The part", rule: `must be ${error.expected}` };
  if (error.value === "missing" || error.value === undefined) return { label: spec.label, rule: "is missing" };
  const got = ` (got ${received(error.value, fieldUnit(spec, system))})`;
  const { bound, range } = error;
  let rule = typeof error.value !== "number" ? "a number" : range ? describeRange({ ...spec, ...range }, system) : error.expected;
  if (bound && typeof error.value === "number") {
    const other = bound.other && Object.hasOwn(FIELDS, bound.other) ? FIELDS[bound.other]! : spec;
    const limit = inUnit(bound.limit, fieldUnit(other, system));
    rule = `${RELATION[bound.relation]} ${other === spec ? limit : `the ${other.label.toLowerCase()} (${limit})`}`;
  }
  return { label: spec.label, rule: `must be ${rule}${got}` };
}
