/**
 * Small view parts shared by the heading calculators: a form of quantity fields in groups, the
 * placeholder shown while a field is invalid, the verdict line (calc-ui), and a grid of labelled outputs.
 */
import type { ComponentChildren } from "preact";
import type { InputSpecs } from "../../calc/core/inputs.ts";
import type { FieldsModel } from "../calc-ui/fields.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";

/** An error from calc/, mapped to its field (null: shown above the results). */
export type FieldError = { field: string | null; message: string } | null;

export interface FieldGroup<S> {
  legend: string;
  names: (keyof S & string)[];
}

export function FieldsForm<S extends InputSpecs>({
  fields,
  groups,
  idPrefix,
  error,
}: {
  fields: FieldsModel<S>;
  groups: FieldGroup<S>[];
  idPrefix: string;
  /** The calculator's error, read here so that only the form re-renders when it changes. */
  error: () => FieldError;
}) {
  const current = error();
  return (
    <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
      {groups.map((group) => (
        <fieldset key={group.legend}>
          <legend>{group.legend}</legend>
          {group.names.map((name) => (
            <QuantityField
              key={name}
              idPrefix={idPrefix}
              name={name}
              spec={fields.specs[name]!}
              text={fields.texts[name]}
              reading={fields.readings[name]}
              system={fields.system.value}
              extraError={current && current.field === name ? current.message : null}
            />
          ))}
        </fieldset>
      ))}
    </form>
  );
}

export function Empty({ error, id }: { error: FieldError; id?: string }) {
  return (
    <div class="calc-results calc-results--empty" id={id} aria-live="polite">
      <p>{error && error.field === null ? error.message : "Results appear when every field above holds a valid value."}</p>
    </div>
  );
}

export { Verdict } from "../calc-ui/Verdict.tsx";

/** One output: its label, its `data-out` name, and the formatted value (null: left out). */
export type Output = readonly [label: ComponentChildren, name: string, value: string | null];

export function Outputs({ items }: { items: readonly Output[] }) {
  return (
    <dl class="results-grid">
      {items.map(([label, name, value]) =>
        value === null ? null : (
          <div key={name}>
            <dt>{label}</dt>
            <dd data-out={name}>{value}</dd>
          </div>
        ),
      )}
    </dl>
  );
}

/**
 * A table of results that scrolls sideways on a narrow screen: the scroll box can take focus (so
 * keyboard users can scroll it), and the caption stays readable above it.
 */
export function DataTable({ id, caption, head, children }: { id: string; caption: ComponentChildren; head: readonly string[]; children: ComponentChildren }) {
  return (
    <>
      <p class="calc-caption" id={id}>
        {caption}
      </p>
      <div class="calc-table-wrap" role="region" aria-labelledby={id} tabIndex={0}>
        <table class="calc-table" aria-labelledby={id}>
          <thead>
            <tr>
              {head.map((h) => (
                <th key={h} scope="col">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>{children}</tbody>
        </table>
      </div>
    </>
  );
}
