/**
 * A category input: a labelled <select>, or a radio group with a legend, with help text and an
 * error beside it. Large touch targets; keyboard use is the browser's own.
 */
import type { ReadonlySignal, Signal } from "../calc-ui/reactive.ts";
import type { ChoiceSpec } from "../../calc/core/choices.ts";

export interface ChoiceFieldProps {
  /** Unique id prefix for this calculator instance. */
  idPrefix: string;
  name: string;
  spec: ChoiceSpec;
  /** The current value; written on a pick unless `onPick` is given. */
  value: ReadonlySignal<string>;
  /** "select" (default) or "radio". */
  as?: "select" | "radio";
  /** Called with the new value instead of setting `value` directly. */
  onPick?: (value: string) => void;
  /** Shown after the help text, e.g. "not read in tension". */
  note?: string | null;
  /** An error from the calculation that names this choice. */
  error?: string | null;
}

export function ChoiceField({ idPrefix, name, spec, value, as = "select", onPick, note, error }: ChoiceFieldProps) {
  const id = `${idPrefix}-${name}`;
  const pick = (next: string) => {
    if (onPick) onPick(next);
    else (value as Signal<string>).value = next;
  };
  const describedBy = [spec.help || note ? `${id}-help` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  const help =
    spec.help || note ? (
      <p class="field-help" id={`${id}-help`}>
        {spec.help}
        {note ? <strong> {note}</strong> : null}
      </p>
    ) : null;
  const errorLine = error ? (
    <p class="field-error" id={`${id}-error`} role="alert">
      {error}
    </p>
  ) : null;
  const options = spec.options;
  if (as === "radio") {
    return (
      <fieldset class={`loads-radios${error ? " field--error" : ""}`} aria-describedby={describedBy}>
        <legend>{spec.label}</legend>
        {options.map((option) => (
          <label key={option.value}>
            <input
              type="radio"
              name={`${idPrefix}-${spec.urlKey}`}
              value={option.value}
              checked={value.value === option.value}
              onChange={() => pick(option.value)}
            />
            <span>{option.label}</span>
          </label>
        ))}
        {help}
        {errorLine}
      </fieldset>
    );
  }
  return (
    <div class={`field${error ? " field--error" : ""}`}>
      <label for={id}>{spec.label}</label>
      <select
        id={id}
        name={spec.urlKey}
        aria-invalid={error ? "true" : undefined}
        aria-describedby={describedBy}
        onChange={(event) => pick((event.currentTarget as HTMLSelectElement).value)}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value} selected={value.value === option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {help}
      {errorLine}
    </div>
  );
}
