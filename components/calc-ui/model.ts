/**
 * The model behind a calculator, built from its descriptor's form and calc entry (calc/calculators/:
 * `form`, `run`; the cards stay with the build sheet): a text signal
 * per field, a signal per choice and per extra value, the values in SI when everything reads, the
 * calc entry's result (or the error it raised, mapped to its field), the link state, and
 * saving into a design. Widgets read and format; they never compute. No DOM.
 */
import {
  type AnyValues,
  type CalculatorForm,
  type CalculatorValues,
  type ExtraSpecs,
  type ExtraValues,
  readLink,
  writeLink,
} from "../../calc/core/calculator.ts";
import type { ChoiceSpecs } from "../../calc/core/choices.ts";
import type { InputSpec, InputSpecs } from "../../calc/core/inputs.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "./fields.ts";
import { batch, computed, signal, type ReadonlySignal, type Signal } from "./reactive.ts";
import { saveToDesign } from "./save.ts";

/** The keys of one scope of a query string, without their scope prefix. */
function scopedParams(search: string, scope: string): URLSearchParams {
  const out = new URLSearchParams();
  for (const [key, value] of new URLSearchParams(search)) {
    const dot = key.indexOf(".");
    if ((dot >= 0 ? key.slice(0, dot) : "") === scope) out.append(dot >= 0 ? key.slice(dot + 1) : key, value);
  }
  return out;
}

/** An error from calc/, mapped to its field (null: shown above the results). */
export type FieldError = { field: string | null; message: string } | null;

export interface Outcome<R> {
  result: R | null;
  error: FieldError;
}

/**
 * State a page keeps in the link beside the calculator's own values (its `pageKeys`): a material
 * menu, comparison variants. `apply` runs before the fields are filled from the link and returns
 * notices; `write` gives the keys to write.
 */
export interface PageState {
  apply(params: URLSearchParams): string[];
  write(): Record<string, string>;
}

export function createCalculatorModel<S extends InputSpecs, C extends ChoiceSpecs, E extends ExtraSpecs, R>(
  calc: CalculatorForm<S, C, E>,
  run: (values: CalculatorValues<S, C, E>) => R,
  initialSystem: UnitSystem = "metric",
  page?: PageState,
) {
  type Values = CalculatorValues<S, C, E>;
  const fields = createFieldsModel(calc.inputs, initialSystem);
  const choices = Object.fromEntries(Object.entries(calc.choices).map(([name, spec]) => [name, signal(spec.default)])) as { [N in keyof C]: Signal<string> };
  const extras = Object.fromEntries(Object.entries(calc.extras).map(([name, spec]) => [name, signal(spec.initial())])) as {
    [N in keyof E]: Signal<ExtraValues<E>[N]>;
  };
  const labels: Record<string, string | InputSpec> = Object.fromEntries([
    ...Object.entries(calc.inputs),
    ...Object.entries(calc.choices).map(([k, s]) => [k, s.label]),
    ...Object.entries(calc.extras).map(([k, s]) => [k, s.label]),
  ]);

  /** Whether a field is read for the current choices (see the descriptor's `applies`). */
  const applies = (name: string, current: AnyValues) => !calc.applies || calc.applies(name, current as Partial<Values>);

  /**
   * Every value in SI (with the choices and extras) when every field that applies reads, else
   * null; a field that does not apply takes its reading, or its default while it does not read.
   */
  const values = computed((): Values | null => {
    const out: AnyValues = {};
    for (const [name, choice] of Object.entries(choices) as [string, Signal<string>][]) out[name] = choice.value;
    for (const [name, extra] of Object.entries(extras) as [string, Signal<unknown>][]) out[name] = extra.value;
    for (const [name, spec] of Object.entries(calc.inputs)) {
      const reading = fields.readings[name as keyof S].value;
      if (reading.ok) out[name] = reading.value;
      else if (applies(name, out)) return null;
      else out[name] = spec.default;
    }
    return out as Values;
  });

  const outcome = computed((): Outcome<R> => {
    const current = values.value;
    if (!current) return { result: null, error: null };
    try {
      return { result: run(current), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, labels, fields.system.value) };
    }
  });

  /** Applies a link: the fields' text as written, choices and extra values that read; the rest become notices. */
  function applyQuery(search: string): void {
    const read = readLink(calc, search);
    const notices = [...read.notices];
    batch(() => {
      if (page) notices.push(...page.apply(scopedParams(search, calc.scope)));
      fields.applyTexts(read.texts as Partial<Record<keyof S, string>>, read.system);
      for (const [name, value] of Object.entries(read.choices)) (choices as Record<string, Signal<string>>)[name]!.value = value;
      for (const [name, text] of Object.entries(read.extras)) {
        const extra = calc.extras[name]!.read(text, fields.system.value);
        notices.push(...extra.notices);
        if (extra.value !== null) (extras as Record<string, Signal<unknown>>)[name]!.value = extra.value;
      }
      fields.notices.value = notices;
    });
  }

  /** The query string of the current state, keeping other calculators' keys of `existing`. */
  function queryFor(existing: string, pageValues: Record<string, string> = {}): string {
    const system = fields.system.value;
    const choiceValues = Object.fromEntries((Object.entries(choices) as [string, Signal<string>][]).map(([name, choice]) => [name, choice.value]));
    const texts = Object.fromEntries(
      (Object.entries(fields.texts) as [string, Signal<string>][]).filter(([name]) => applies(name, choiceValues)).map(([name, text]) => [name, text.value]),
    );
    const extraTexts = Object.fromEntries(
      (Object.entries(extras) as [string, Signal<unknown>][]).map(([name, extra]) => [name, calc.extras[name]!.write(extra.value, system)]),
    );
    return writeLink(calc, { texts, choices: choiceValues, extras: extraTexts }, system, existing, { ...page?.write(), ...pageValues });
  }

  return {
    calc,
    fields,
    system: fields.system as Signal<UnitSystem>,
    choices,
    extras,
    values: values as ReadonlySignal<Values | null>,
    outcome,
    notices: fields.notices,
    setSystem: fields.setSystem,
    applyQuery,
    queryFor,
    /** Saves the current values into a design; resolves to the message to show. */
    save: () => saveToDesign(calc, values.value),
  };
}
