/**
 * One descriptor per calculator: everything the handbook needs to know about a calculator in one
 * place. Its number inputs (`defineInputs`), its category inputs (`defineChoices`), any further
 * value it holds (a parts list, a table of readings), the calc entry it runs, the cards it shows on
 * its page, the build sheet and the command line, the chapter and anchor it lives at, and from
 * those: its link grammar, its design-file section and its links. Descriptors live in
 * calc/calculators/; the registry (calc/design/registry.ts) finds them by file name.
 *
 * Values are always SI numbers, option values and structured extras; text exists only at the
 * edges (a field, a link, a file), and every value written to a link reads back exactly.
 */
import type { CheckCard } from "./check.ts";
import type { ChoiceSpecs } from "./choices.ts";
import { fieldUnit, readField, type InputSpecs } from "./inputs.ts";
import { type LinkKey, MAX_VALUE_LENGTH, quoteForNotice, readLinkKeys, writeLinkKeys } from "./permalink.ts";
import { linkSpelling, quantityToText, type UnitSystem } from "./units.ts";
import { requireInputObject } from "./spec-check.ts";
import { CalcInputError } from "./errors.ts";

/** A problem found reading a stored value: where (a path under the value) and what. */
export interface ValueProblem {
  path: string;
  message: string;
}

/**
 * A value of a calculator that is neither a number nor a choice: a parts list, a table of readings.
 * It declares how it is written to and read from a link and a design file.
 */
export interface ExtraSpec<T> {
  label: string;
  urlKey: string;
  /** Longest link value read [characters]. */
  maxLength: number;
  /** The value a calculator starts with. */
  initial(): T;
  /** The link text of a value (it must read back as the same value). */
  write(value: T, system: UnitSystem): string;
  /** Reads link text; never throws. `value` is null when nothing usable could be read. */
  read(text: string, system: UnitSystem): { value: T | null; notices: string[] };
  /**
   * Reads the value stored in a design file; never throws. `value` is null when nothing usable could
   * be read. Without it, a stored list is read the way a link carries it (calc/design/sections.ts).
   */
  fromDesign?(raw: unknown): { value: T | null; problems: ValueProblem[] };
}

// biome-ignore lint/suspicious/noExplicitAny: a record of extras of any value type
export type ExtraSpecs = Readonly<Record<string, ExtraSpec<any>>>;

export type NumberValues<S extends InputSpecs> = { [K in keyof S]: number };
export type ChoiceValues<C extends ChoiceSpecs> = { [K in keyof C]: C[K]["options"][number]["value"] };
export type ExtraValues<E extends ExtraSpecs> = { [K in keyof E]: E[K] extends ExtraSpec<infer T> ? T : never };
export type CalculatorValues<S extends InputSpecs, C extends ChoiceSpecs, E extends ExtraSpecs> = NumberValues<S> & ChoiceValues<C> & ExtraValues<E>;

/** How a calculator's values are stored in a design: one set, or a named list of them. */
export type SectionShape = { kind: "single" } | { kind: "list"; max: number; entryName: string };

/** What a calculator holds and where it lives: everything a link, a design section or a form needs. */
export interface FormSpec<S extends InputSpecs, C extends ChoiceSpecs, E extends ExtraSpecs> {
  /** The design section it fills, and its name in code ("placement", "fasteners"). */
  id: string;
  /** Its name for people ("Accelerometer placement"). */
  title: string;
  /** The chapter (slug) that hosts it, and the element id of the calculator there. */
  chapter: string;
  anchor: string;
  /** Place on the build sheet (ascending). */
  order: number;
  /** Prefix of its link keys when it shares a page with another calculator ("p" → "p.rpm"). */
  scope?: string;
  /** A named list of entries (fasteners, rims) instead of one set of values. */
  list?: { max: number; entryName: string };
  inputs: S;
  choices?: C;
  extras?: E;
  /**
   * Further link keys of its scope that its page reads itself (e.g. comparison variants): read
   * neither as fields nor reported as unknown.
   */
  pageKeys?: readonly string[];
  /**
   * Whether a number input applies for these values (a whole-body spinner's wheel inputs do not
   * apply to a weapon): links leave out inputs that do not apply. All apply when absent.
   */
  applies?(input: string, values: Partial<CalculatorValues<S, C, E>>): boolean;
}

/** What a calculator does with its values. */
export interface Behaviour<S extends InputSpecs, C extends ChoiceSpecs, E extends ExtraSpecs, R> {
  /** Whether the values hold anything to check (a layout with parts); checked when absent. */
  present?(values: CalculatorValues<S, C, E>): boolean;
  /** The calc entry: values in, result out; throws CalcInputError on an invalid combination. */
  run(values: CalculatorValues<S, C, E>): R;
  /** What the calculator says about the values: the first card is its verdict. */
  cards(values: CalculatorValues<S, C, E>, result: R, system: UnitSystem): CheckCard[];
}

/** A calculator's form: its values and where it lives, without the physics (what links need). */
export interface CalculatorForm<S extends InputSpecs = InputSpecs, C extends ChoiceSpecs = ChoiceSpecs, E extends ExtraSpecs = ExtraSpecs>
  extends Omit<FormSpec<S, C, E>, "choices" | "extras" | "scope" | "list"> {
  readonly scope: string;
  readonly section: SectionShape;
  readonly choices: C;
  readonly extras: E;
}

/** A calculator: its form and its behaviour. */
export interface Calculator<S extends InputSpecs = InputSpecs, C extends ChoiceSpecs = ChoiceSpecs, E extends ExtraSpecs = ExtraSpecs, R = unknown>
  extends CalculatorForm<S, C, E>,
    Behaviour<S, C, E, R> {}

export type AnyForm = CalculatorForm<InputSpecs, ChoiceSpecs, ExtraSpecs>;
// biome-ignore lint/suspicious/noExplicitAny: the registry holds calculators of every shape
export type AnyCalculator = Calculator<InputSpecs, ChoiceSpecs, ExtraSpecs, any>;
export type ValuesOf<K> = K extends CalculatorForm<infer S, infer C, infer E> ? CalculatorValues<S, C, E> : never;
// biome-ignore lint/suspicious/noExplicitAny: any values of any calculator
export type AnyValues = Record<string, any>;

/** Declares a calculator's form (checks that its link keys are unique). */
export function defineForm<S extends InputSpecs, const C extends ChoiceSpecs = Record<never, never>, E extends ExtraSpecs = Record<never, never>>(
  spec: FormSpec<S, C, E>,
): CalculatorForm<S, C, E> {
  const { choices = {} as C, extras = {} as E, scope = "", list, ...rest } = requireInputObject(spec, "spec");
  const keys = [
    ...Object.values(requireInputObject(spec.inputs, "inputs")).map((s) => s.urlKey),
    ...Object.values(choices).map((s) => s.urlKey),
    ...Object.values(extras).map((s) => s.urlKey),
    ...(spec.pageKeys ?? []),
  ];
  const repeated = keys.filter((k, i) => keys.indexOf(k) !== i || k === "u" || k === "v");
  if (repeated.length)
    throw new CalcInputError({ param: "urlKey", value: repeated.join(", "), expected: `used once in calculator "${spec.id}", and not u or v`, unit: "" });
  return { ...rest, scope, choices, extras, section: list ? { kind: "list", ...list } : { kind: "single" } };
}

/** A calculator: its form with what it runs and what it says. */
export function defineCalculator<S extends InputSpecs, C extends ChoiceSpecs, E extends ExtraSpecs, R>(
  form: CalculatorForm<S, C, E>,
  behaviour: Behaviour<S, C, E, R>,
): Calculator<S, C, E, R> {
  return { ...form, ...behaviour };
}

/** The values a calculator starts with. */
export function initialValues<K extends AnyForm>(calc: K): ValuesOf<K> {
  requireInputObject(calc, "calc");
  const out: AnyValues = {};
  for (const [name, spec] of Object.entries(calc.inputs)) out[name] = spec.default;
  for (const [name, spec] of Object.entries(calc.choices)) out[name] = spec.default;
  for (const [name, spec] of Object.entries(calc.extras)) out[name] = spec.initial();
  return out as ValuesOf<K>;
}

/** Every link key the calculator reads, with its label and longest value. */
export function linkKeys(calc: AnyForm): LinkKey[] {
  requireInputObject(calc, "calc");
  return [
    ...Object.values(calc.inputs).map((s) => ({ key: s.urlKey, label: s.label, maxLength: MAX_VALUE_LENGTH })),
    ...Object.values(calc.choices).map((s) => ({ key: s.urlKey, label: s.label, maxLength: MAX_VALUE_LENGTH })),
    ...Object.values(calc.extras).map((s) => ({ key: s.urlKey, label: s.label, maxLength: s.maxLength })),
  ];
}

/** A calculator's state as text, the way fields hold it and links carry it. */
export interface TextState {
  /** Field text by input name. */
  texts: Record<string, string>;
  /** Option value by choice name. */
  choices: Record<string, string>;
  /** Link text by extra name. */
  extras: Record<string, string>;
}

/** What a link sets, by name, and what in it was ignored. */
export interface LinkedState extends Partial<TextState> {
  texts: Record<string, string>;
  choices: Record<string, string>;
  extras: Record<string, string>;
  system?: UnitSystem;
  notices: string[];
}

/**
 * Reads a calculator's keys from a query string: field texts as written, choices checked against
 * their options, extras as text for the calculator to read. Never throws.
 */
export function readLink(calc: AnyForm, search: string): LinkedState {
  requireInputObject(calc, "calc");
  if (typeof search !== "string") throw new CalcInputError({ param: "search", value: search, expected: "a query string", unit: "" });
  const read = readLinkKeys(search, calc.scope, linkKeys(calc), calc.pageKeys ?? []);
  const texts: Record<string, string> = {};
  const choices: Record<string, string> = {};
  const extras: Record<string, string> = {};
  const notices = [...read.notices];
  for (const [name, spec] of Object.entries(calc.inputs)) if (read.values[spec.urlKey] !== undefined) texts[name] = read.values[spec.urlKey]!;
  for (const [name, spec] of Object.entries(calc.choices)) {
    const value = read.values[spec.urlKey];
    if (value === undefined) continue;
    if (spec.options.some((o) => o.value === value)) choices[name] = value;
    else notices.push(`The link's ${spec.label.toLowerCase()} ${quoteForNotice(value)} is not one this calculator offers; it was ignored.`);
  }
  for (const [name, spec] of Object.entries(calc.extras)) if (read.values[spec.urlKey] !== undefined) extras[name] = read.values[spec.urlKey]!;
  return { texts, choices, extras, system: read.system, notices };
}

/** Writes a calculator's text state into a query string, keeping other scopes' keys of `existing`. */
export function writeLink(calc: AnyForm, state: TextState, system: UnitSystem, existing = "", pageValues: Record<string, string> = {}): string {
  requireInputObject(calc, "calc");
  requireInputObject(state, "state");
  if (typeof existing !== "string") throw new CalcInputError({ param: "existing", value: existing, expected: "a query string", unit: "" });
  const values: Record<string, string> = {};
  for (const [name, spec] of Object.entries(calc.inputs)) if (state.texts?.[name] !== undefined) values[spec.urlKey] = linkSpelling(String(state.texts[name]));
  for (const [name, spec] of Object.entries(calc.choices)) if (state.choices?.[name] !== undefined) values[spec.urlKey] = String(state.choices[name]);
  for (const [name, spec] of Object.entries(calc.extras)) if (state.extras?.[name] !== undefined) values[spec.urlKey] = String(state.extras[name]);
  return writeLinkKeys(existing, calc.scope, system, { ...values, ...pageValues });
}

/**
 * The text state of SI values: each number in its field's unit, written so it reads back exactly.
 * Values left out (a hand-off that sets two fields) are left out of the text too.
 */
export function textsOf(calc: AnyForm, values: Partial<AnyValues>, system: UnitSystem): TextState {
  requireInputObject(calc, "calc");
  requireInputObject(values, "values");
  const texts: Record<string, string> = {};
  const choices: Record<string, string> = {};
  const extras: Record<string, string> = {};
  for (const [name, spec] of Object.entries(calc.inputs)) {
    if (values[name] !== undefined && (!calc.applies || calc.applies(name, values))) texts[name] = quantityToText(values[name], fieldUnit(spec, system));
  }
  for (const name of Object.keys(calc.choices)) if (values[name] !== undefined) choices[name] = values[name];
  for (const [name, spec] of Object.entries(calc.extras)) if (values[name] !== undefined) extras[name] = spec.write(values[name], system);
  return { texts, choices, extras };
}

/** A value that did not read, by name, with the message to show beside its field. */
export interface ValueError {
  name: string;
  message: string;
}

/**
 * The values a text state holds: each field read and range-checked, each missing one at its
 * default; null values with the errors when a field or an extra does not read.
 */
export function valuesOf<K extends AnyCalculator>(
  calc: K,
  state: Partial<TextState>,
  system: UnitSystem,
): { values: ValuesOf<K> | null; errors: ValueError[]; notices: string[] } {
  requireInputObject(state, "state");
  const values: AnyValues = initialValues(calc);
  const errors: ValueError[] = [];
  const notices: string[] = [];
  for (const [name, spec] of Object.entries(calc.inputs)) {
    const text = state.texts?.[name];
    if (text === undefined) continue;
    const reading = readField(spec, text, system);
    // Stryker disable next-line ConditionalExpression: equivalent, a field that does not read adds an error, and any error makes the values null
    if (reading.ok) values[name] = reading.value;
    else errors.push({ name, message: reading.error.message });
  }
  for (const name of Object.keys(calc.choices)) if (state.choices?.[name] !== undefined) values[name] = state.choices[name];
  for (const [name, spec] of Object.entries(calc.extras)) {
    const text = state.extras?.[name];
    if (text === undefined) continue;
    const read = spec.read(text, system);
    notices.push(...read.notices);
    if (read.value === null) errors.push({ name, message: `${spec.label} could not be read.` });
    else values[name] = read.value;
  }
  return { values: errors.length ? null : (values as ValuesOf<K>), errors, notices };
}

/** The query string (without "?") that opens the calculator on `values`. */
export function linkQuery(
  calc: AnyForm,
  values: AnyValues,
  options: { system?: UnitSystem; pageValues?: Record<string, string>; existing?: string } = {},
): string {
  const system = requireInputObject(options, "options").system ?? "metric";
  return writeLink(calc, textsOf(calc, values, system), system, options.existing ?? "", options.pageValues ?? {});
}

/** A link to the calculator from its own chapter: "?v=1&…#anchor". */
export function pageLink(
  calc: AnyForm,
  values: AnyValues,
  options: { system?: UnitSystem; pageValues?: Record<string, string>; existing?: string } = {},
): string {
  const query = linkQuery(calc, values, options);
  return `?${query}#${calc.anchor}`;
}

/**
 * The link, relative to the site's base, that opens the calculator on `values` in its chapter:
 * `chapters/spin-up/?v=1&…#spin-up-calculator`. Chapters and the build sheet build every link
 * to a calculator here; nothing else spells a calculator's link grammar.
 */
export function linkFor(
  calc: AnyForm,
  values: AnyValues,
  options: { system?: UnitSystem; pageValues?: Record<string, string>; existing?: string } = {},
): string {
  const query = linkQuery(calc, values, options);
  return `chapters/${calc.chapter}/?${query}#${calc.anchor}`;
}
