/**
 * Category inputs (a thread size, a class, a loading mode, a shape) beside a calculator's quantity
 * fields: one signal each, validated against the calc module's fixed list, read from and written
 * to the page URL next to the quantity fields (`encodeState`'s `extra` keys). No DOM.
 */
import { signal, type Signal } from "../calc-ui/reactive.ts";
import type { ChoiceOption } from "../../calc/loads/common.ts";
import type { InputSpecs } from "../../calc/core/inputs.ts";
import type { FieldsModel } from "../calc-ui/fields.ts";
import { encodeState } from "../calc-ui/permalink.ts";

/** One category input: its label, URL key, allowed values and default. */
export interface ChoiceSpec {
  label: string;
  urlKey: string;
  options: readonly ChoiceOption[];
  default: string;
  /** One sentence on what the choice means. */
  help?: string;
}

export type ChoiceSpecs = Record<string, ChoiceSpec>;

export type ChoiceSignals<C extends ChoiceSpecs> = { [K in keyof C]: Signal<string> };

/** Makes a short, printable rendering of untrusted text for a notice. */
function quote(text: string): string {
  const printable = text.replace(/[\u0000-\u001f\u007f]/g, "?");
  return `"${printable.length > 24 ? `${printable.slice(0, 24)}…` : printable}"`;
}

/** One signal per choice, each starting at its default. */
export function createChoices<C extends ChoiceSpecs>(specs: C): ChoiceSignals<C> {
  const out = {} as ChoiceSignals<C>;
  for (const name of Object.keys(specs) as (keyof C)[]) out[name] = signal(specs[name]!.default);
  return out;
}

/**
 * Reads the choices a query string sets. A value that is not on the list, or a key given twice,
 * becomes a plain-text notice; the link's other keys are returned untouched for the fields.
 */
export function readChoices<C extends ChoiceSpecs>(specs: C, search: string): { values: Partial<Record<keyof C, string>>; notices: string[]; rest: string } {
  const params = new URLSearchParams(search);
  const values: Partial<Record<keyof C, string>> = {};
  const notices: string[] = [];
  for (const [name, spec] of Object.entries(specs) as [keyof C & string, ChoiceSpec][]) {
    const given = params.getAll(spec.urlKey);
    params.delete(spec.urlKey);
    if (given.length === 0) continue;
    if (given.length > 1) notices.push(`The link sets ${quote(spec.urlKey)} more than once; the first value was used.`);
    const value = given[0]!;
    if (spec.options.some((option) => option.value === value)) values[name] = value;
    else notices.push(`The link's ${spec.label.toLowerCase()} ${quote(value)} is not one this calculator offers; it was ignored.`);
  }
  return { values, notices, rest: params.toString() };
}

/** The label of a choice's value, for results and verdicts. */
export function choiceLabel(spec: ChoiceSpec, value: string): string {
  return spec.options.find((option) => option.value === value)?.label ?? value;
}

/**
 * The fields model extended with choices, as `syncWithUrl` and `linkFor` take it: the choices are
 * read from and written to the link along with the fields.
 * `apply` runs between reading the choices and reading the fields (to fill fields from a choice).
 */
export function withChoices<S extends InputSpecs, C extends ChoiceSpecs>(
  fields: FieldsModel<S>,
  specs: C,
  choices: ChoiceSignals<C>,
  options: { urlValues?: () => Record<string, string>; apply?: (values: Partial<Record<keyof C, string>>) => void } = {},
): FieldsModel<S> {
  const urlValues = options.urlValues ?? (() => Object.fromEntries(Object.entries(specs).map(([name, spec]) => [spec.urlKey, choices[name as keyof C].value])));
  return {
    ...fields,
    applyQuery(search: string) {
      const read = readChoices(specs, search);
      for (const [name, value] of Object.entries(read.values)) choices[name as keyof C].value = value as string;
      options.apply?.(read.values);
      fields.applyQuery(read.rest);
      fields.notices.value = [...fields.notices.value, ...read.notices];
    },
    queryFor(existing: string) {
      const texts: Record<string, string> = {};
      for (const name of Object.keys(fields.specs)) texts[name] = fields.texts[name as keyof S].value;
      return encodeState(fields.specs, texts, fields.system.value, "", existing, urlValues());
    },
  };
}
