/**
 * What is wrong with a part, in the parts editor's words: the field's label, its allowed range and
 * the value received in the unit the editor shows ("Radius must be greater than 0 mm and at most
 * 100000 mm (got -5 mm)"), instead of the check's own parameter path and SI units. Used for a part
 * read from a link or a design file.
 */
import { CalcInputError } from "../core/errors.ts";
import { describeRange, describeReceived, type InputSpec } from "../core/inputs.ts";
import type { QuantityKind, UnitId, UnitSystem } from "../core/units.ts";

type FieldKind = "length" | "angle" | "mass" | "inertia";

/** A part's fields in the parts editor's words, by the name `checkPart` gives them, with what each holds. */
export const PART_FIELD_WORDS = {
  x: { label: "x", kind: "length" },
  y: { label: "y", kind: "length" },
  z: { label: "Height z", kind: "length" },
  radius: { label: "Radius", kind: "length" },
  innerRadius: { label: "Inner radius", kind: "length" },
  outerRadius: { label: "Outer radius", kind: "length" },
  length: { label: "Length", kind: "length" },
  width: { label: "Width", kind: "length" },
  height: { label: "Height", kind: "length" },
  angle: { label: "Direction", kind: "angle" },
  inertiaZ: { label: "Own inertia about z", kind: "inertia" },
  productXZ: { label: "Own product I′xz", kind: "inertia" },
  productYZ: { label: "Own product I′yz", kind: "inertia" },
  mass: { label: "Mass", kind: "mass" },
  thickness: { label: "Thickness", kind: "length" },
  section: { label: "Section diameter", kind: "length" },
} as const satisfies Record<string, { label: string; kind: FieldKind }>;

/** The unit the parts editor shows each kind of field in. */
export const PART_FIELD_UNITS: Record<FieldKind, Record<UnitSystem, UnitId>> = {
  length: { metric: "mm", us: "in" },
  angle: { metric: "deg", us: "deg" },
  mass: { metric: "g", us: "oz" },
  inertia: { metric: "g·cm2", us: "oz·in2" },
};

/** Words for the fields that hold no number. */
const OTHER_FIELDS: Record<string, string> = { name: "Name", "shape.kind": "Shape", "mass.kind": "Mass source", "mass.material": "Material" };

const RELATION_WORDS = { greater: "greater than", "at-least": "at least", less: "less than", "at-most": "at most" } as const;

/** The declaration-like form of a field, for `describeRange` and `describeReceived`. */
function specOf(kind: FieldKind, label: string, range: { min: number; max: number; minOpen?: boolean }): InputSpec {
  const quantity: QuantityKind = kind;
  return { label, kind: quantity, min: range.min, max: range.max, minOpen: range.minOpen, default: range.min, urlKey: "", unit: PART_FIELD_UNITS[kind] };
}

/**
 * A part's problem as the editor would word it, in two pieces so a caller can say which part:
 * `{ label: "Radius", rule: "must be greater than 0 mm and at most 100000 mm (got -5 mm)" }`.
 *
 * @param error what `checkPart` threw (anything else gives a general sentence)
 * @param options the unit system for numbers, and the part's shape (a ring's or rod's thickness is its section diameter)
 * @returns the field's label and the rest of the sentence
 * @example
 * describePartProblem(new CalcInputError({ param: "part.x", value: 3, expected: "…", unit: "m", range: { min: -100, max: 100 } })) // → { label: "x", rule: "must be between -100000 mm and 100000 mm (got 3000 mm)" }
 *
 * Sources: none (message wording of our own).
 */
export function describePartProblem(error: unknown, options: { system?: UnitSystem; shape?: unknown } = {}): { label: string; rule: string } {
  const system = options.system ?? "metric";
  if (!(error instanceof CalcInputError)) return { label: "The part", rule: "is not a valid part" };
  const path = error.param.replace(/^(?:part|parts\[\d+\])\.?/, "");
  if (path === "") return { label: "The part", rule: `must be an object with a name, a shape and a mass (got ${describeReceived(error.value)})` };
  const other = OTHER_FIELDS[path];
  if (other) return { label: other, rule: `must be ${error.expected}` };
  let name = path.split(".").at(-1)!;
  if (name === "thickness" && (options.shape === "ring" || options.shape === "rod")) name = "section";
  const words = (PART_FIELD_WORDS as Record<string, { label: string; kind: FieldKind }>)[name];
  if (!words) return { label: path, rule: `must be ${error.expected}` };
  const unit = PART_FIELD_UNITS[words.kind][system];
  if (error.value === "missing") return { label: words.label, rule: "is missing" };
  const got = `(got ${describeReceived(error.value, unit)})`;
  if (typeof error.value !== "number") return { label: words.label, rule: `must be a number ${got}` };
  if (error.bound) {
    const limit = describeReceived(error.bound.limit, unit);
    const otherLabel = error.bound.other ? (PART_FIELD_WORDS as Record<string, { label: string }>)[error.bound.other]?.label : undefined;
    const than = otherLabel ? `the ${otherLabel.toLowerCase()} (${limit})` : limit;
    return { label: words.label, rule: `must be ${RELATION_WORDS[error.bound.relation]} ${than} ${got}` };
  }
  if (error.range) return { label: words.label, rule: `must be ${describeRange(specOf(words.kind, words.label, error.range), system)} ${got}` };
  return { label: words.label, rule: `must be ${error.expected} ${got}` };
}
