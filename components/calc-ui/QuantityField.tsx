/**
 * A labelled text field for a quantity with a unit, the help text, and the field's error right
 * beside it. Phones open a numeric keypad (fields that take negative values keep the full
 * keyboard for the minus sign); the unit is chosen from the menu beside the number, which writes
 * it into the text, and typing a unit ("1.5 in") always works too. A kind with one unit names it in
 * the label instead.
 */
import type { Signal, ReadonlySignal } from "./reactive.ts";
import type { FieldReading, InputSpec } from "../../calc/core/inputs.ts";
import { fieldUnit } from "../../calc/core/inputs.ts";
import { findUnit, unitsOfKind, type UnitSystem, unitDef } from "../../calc/core/units.ts";

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
  const bare = fieldUnit(spec, system);
  const units = unitsOfKind(spec.kind).filter((u) => unitDef(u).symbol);
  // The number and the unit as typed: "45 mm" → "45", "mm" (a bare number is in the field's unit).
  const [, number = "", typed = ""] = /^([\s+\-−\d.,]*(?:[eE][+\-−]?\d+)?)\s*(.*)$/.exec(text.value) ?? [];
  const shown = (typed ? findUnit(typed, spec.kind) : bare) ?? "";
  // A menu when the kind has several units and the field reads a unit at all: a plain ratio (a nut
  // factor of 0.2) offers none, though "%" may still be typed.
  const menu = units.length > 1 && unitDef(bare).symbol !== "";
  const unit = menu ? "" : unitDef(bare).symbol;
  const current = reading.value;
  const error = !current.ok ? current.error.message : (extraError ?? null);
  const describedBy = [spec.help ? `${id}-help` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  return (
    <div class={`field${error ? " field--error" : ""}`}>
      <label for={id}>
        {spec.label}
        {unit ? <span class="field-unit"> ({unit})</span> : null}
      </label>
      <span class="field-entry">
        <input
          id={id}
          name={spec.urlKey}
          type="text"
          inputMode={(spec.min ?? 0) < 0 ? "text" : "decimal"}
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
        {menu ? (
          <select
            aria-label={`${spec.label}: unit`}
            value={shown}
            onChange={(event) => {
              text.value = `${number.trim()} ${unitDef((event.currentTarget as HTMLSelectElement).value as typeof bare).symbol}`.trim();
            }}
          >
            {shown === "" ? <option value="">?</option> : null}
            {units.map((u) => (
              <option key={u} value={u}>
                {unitDef(u).symbol}
              </option>
            ))}
          </select>
        ) : null}
      </span>
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
