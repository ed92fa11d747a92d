/**
 * Category inputs: a thread size, a property class, a loading mode, a shape, a drive type. Each is
 * chosen from a fixed list declared once (label, URL key, options, default), checked the same way
 * wherever it arrives (a field, a link, a design file) and named in the error when it is not on the
 * list.
 */
import { CalcInputError } from "./errors.ts";

/** One entry of a fixed list of choices: the value the code uses and the label a person reads. */
export interface ChoiceOption<V extends string = string> {
  readonly value: V;
  readonly label: string;
}

/** A category input: its label, URL key, allowed values and default. */
export interface ChoiceSpec<V extends string = string> {
  readonly label: string;
  readonly urlKey: string;
  readonly options: readonly ChoiceOption<V>[];
  readonly default: V;
  /** One sentence on what the choice means. */
  readonly help?: string;
}

export type ChoiceSpecs = Readonly<Record<string, ChoiceSpec>>;

/**
 * Throws a `CalcInputError` naming `param` and listing the allowed values unless `value` is one
 * of `options`; returns it narrowed to the option type otherwise.
 */
export function requireChoice<V extends string>(param: string, value: unknown, options: readonly ChoiceOption<V>[]): V {
  const list = Array.isArray(options) ? options : [];
  const found = list.find((option) => option?.value === value);
  if (!found) {
    throw new CalcInputError({ param, value, expected: `one of ${list.map((o) => o?.value).join(", ")}`, unit: "" });
  }
  return found.value;
}

/** Declares a calculator's category inputs (identity at run time; keeps the literal types). */
export function defineChoices<const T extends ChoiceSpecs>(specs: T): T {
  for (const [name, spec] of Object.entries(specs)) {
    if (!spec.options.some((o) => o.value === spec.default)) throw new Error(`choice "${name}": default "${spec.default}" is not one of its options`);
  }
  return specs;
}

/** The label of a choice's value, for results and verdicts. */
export function choiceLabel(spec: ChoiceSpec, value: string): string {
  return spec.options.find((option) => option.value === value)?.label ?? value;
}
