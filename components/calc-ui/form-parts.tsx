/**
 * Field renderers bound to one calculator model: a `QuantityField` per number input (with the
 * calculation's error beside the field it names) and a labelled menu per choice, so a widget lays
 * out its form by name: `field("robotMass")`, `choice("limit")`.
 */
import type { CalculatorForm } from "../../calc/core/calculator.ts";
import type { ChoiceSpecs } from "../../calc/core/choices.ts";
import type { InputSpecs } from "../../calc/core/inputs.ts";
import type { FieldsModel } from "./fields.ts";
import { QuantityField } from "./QuantityField.tsx";
import type { ReadonlySignal, Signal } from "./reactive.ts";

interface BoundModel<S extends InputSpecs, C extends ChoiceSpecs> {
  calc: CalculatorForm<S, C>;
  fields: FieldsModel<S>;
  choices: { [N in keyof C]: Signal<string> };
  outcome: ReadonlySignal<{ error: { field: string | null; message: string } | null }>;
}

export function formParts<S extends InputSpecs, C extends ChoiceSpecs>(model: BoundModel<S, C>, idPrefix: string) {
  const { fields, choices, calc } = model;
  const error = model.outcome.value.error;
  return {
    field: (name: keyof S & string) => (
      <QuantityField
        key={name}
        idPrefix={idPrefix}
        name={name}
        spec={fields.specs[name]!}
        text={fields.texts[name]}
        reading={fields.readings[name]}
        system={fields.system.value}
        extraError={error && error.field === name ? error.message : null}
      />
    ),
    choice: (name: keyof C & string) => (
      <div class="field" key={name}>
        <label for={`${idPrefix}-${name}`}>{calc.choices[name]!.label}</label>
        <select id={`${idPrefix}-${name}`} value={choices[name].value} onChange={(e) => (choices[name].value = e.currentTarget.value)}>
          {calc.choices[name]!.options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      </div>
    ),
  };
}
