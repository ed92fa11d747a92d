/**
 * What the printed build sheet shows besides the cards: each check's inputs as short texts in the
 * design's units, and the QR code's drawing. Pure functions; the QR encoder itself loads only when
 * someone prints (print-qr.ts).
 */
import type { AnyForm, AnyValues } from "../../calc/core/calculator.ts";
import { fieldUnit } from "../../calc/core/inputs.ts";
import { formatQuantity, type UnitSystem } from "../../calc/core/units.ts";

/** One input as printed: "Top speed 2400 rpm". */
export interface PrintedInput {
  label: string;
  text: string;
}

/**
 * The inputs a check was computed from, as the sheet prints them: every number input that applies
 * (three significant figures, counts as whole numbers, in the field's unit for `system`), every choice by its option's
 * words, and each list (parts, entries) by its count. Inputs the values do not hold are left out.
 */
export function printedInputs(calc: AnyForm, values: AnyValues, system: UnitSystem): PrintedInput[] {
  const out: PrintedInput[] = [];
  for (const [name, spec] of Object.entries(calc.inputs)) {
    const value = values[name];
    if (typeof value !== "number" || !Number.isFinite(value)) continue;
    if (calc.applies && !calc.applies(name, values)) continue;
    // A count prints as the whole number it is ("2", not "2.00").
    const quantity = formatQuantity(value, spec.kind, { unit: fieldUnit(spec, system) });
    out.push({ label: spec.label, text: spec.integer ? quantity.text.replace(quantity.number, String(value)) : quantity.text });
  }
  for (const [name, spec] of Object.entries(calc.choices)) {
    const option = spec.options.find((o) => o.value === values[name]);
    if (option) out.push({ label: spec.label, text: option.label });
  }
  for (const [name, spec] of Object.entries(calc.extras)) {
    const value = values[name];
    if (Array.isArray(value)) out.push({ label: spec.label, text: `${value.length} ${value.length === 1 ? "entry" : "entries"}` });
  }
  return out;
}

/**
 * An SVG path of a QR code's dark modules (true), one rectangle per horizontal run, so that
 * neighbouring modules print without seams between them.
 */
export function qrPath(modules: readonly (readonly boolean[])[]): string {
  let d = "";
  modules.forEach((row, y) => {
    let x = 0;
    while (x < row.length) {
      if (!row[x]) {
        x += 1;
        continue;
      }
      const start = x;
      while (x < row.length && row[x]) x += 1;
      d += `M${start} ${y}h${x - start}v1h${start - x}z`;
    }
  });
  return d;
}

/** The address that reopens a design: this page's address with the design's fragment. */
export function designAddress(origin: string, pathname: string, fragment: string): string {
  return `${origin}${pathname}#${fragment.replace(/^#/, "")}`;
}
