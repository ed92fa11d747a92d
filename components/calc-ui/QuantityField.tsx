/**
 * A labelled text field for a quantity with a unit. Shows the unit a bare number is read in, the
 * help text, and the field's error right beside it. Typing a unit ("1.5 in") is always allowed.
 */
import type { Signal, ReadonlySignal } from "./reactive.ts";
import type { FieldReading, InputSpec } from "../../calc/core/inputs.ts";
import { fieldUnit } from "../../calc/core/inputs.ts";
import { UNITS, type UnitSystem } from "../../calc/core/units.ts";

export interface QuantityFieldProps {
  /** Unique id prefix for this calculator instance. */
  idPrefix: string;
  name: string;
  spec: InputSpec;
  text: Signal<string>;
  reading: ReadonlySignal<FieldReading>;
  system: UnitSystem;
  /** An error from the calculation itself (a rule across fields), shown like a field error. */
  extraError?: string | null;
}

export function QuantityField({ idPrefix, name, spec, text, reading, system, extraError }: QuantityFieldProps) {
  const id = `${idPrefix}-${name}`;
  const unit = UNITS[fieldUnit(spec, system)].symbol;
  const current = reading.value;
  const error = !current.ok ? current.error.message : (extraError ?? null);
  const describedBy = [spec.help ? `${id}-help` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  return (
    <div class={`field${error ? " field--error" : ""}`}>
      <label for={id}>
        {spec.label}
        {unit ? <span class="field-unit"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        name={spec.urlKey}
        type="text"
        inputMode="text"
        autoComplete="off"
        autoCapitalize="off"
        spellcheck={false}
        value={text.value}
        aria-invalid={error ? "true" : undefined}
        aria-describedby={describedBy}
        onInput={(event) => {
          text.value = (event.currentTarget as HTMLInputElement).value;
        }}
      />
      {spec.help ? (
        <p class="field-help" id={`${id}-help`}>
          {spec.help}
        </p>
      ) : null}
      {error ? (
        <p class="field-error" id={`${id}-error`} role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}
