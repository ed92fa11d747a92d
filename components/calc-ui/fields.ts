/**
 * The generic model behind every calculator form: one text signal per declared input, the
 * parsed reading of each, the unit system, and conversion of field texts when the system changes.
 * No DOM; safe on the server.
 */
import { batch, computed, signal, type ReadonlySignal, type Signal } from "./reactive.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import { defaultText, fieldUnit, readField, type FieldReading, type InputSpecs } from "../../calc/core/inputs.ts";
import { parseQuantity, UNITS, type UnitSystem } from "../../calc/core/units.ts";
import { decodeState, encodeState } from "./permalink.ts";

export interface FieldsModel<S extends InputSpecs> {
  specs: S;
  system: Signal<UnitSystem>;
  texts: { [K in keyof S]: Signal<string> };
  readings: { [K in keyof S]: ReadonlySignal<FieldReading> };
  /** All values in SI when every field reads cleanly, else null. */
  values: ReadonlySignal<{ [K in keyof S]: number } | null>;
  /** Notices from the last link that was read. */
  notices: Signal<string[]>;
  /** Switches the unit system, re-expressing each valid field in the new system's unit. */
  setSystem(next: UnitSystem): void;
  /** Applies a query string (a permalink). */
  applyQuery(search: string): void;
  /** The query string for the current state, merged into `existing` (other calculators' keys). */
  queryFor(existing: string): string;
}

/** Rewrites an SI value as field text in `unit`, to 6 significant figures. */
function textIn(valueSI: number, unitSymbol: string, factor: number): string {
  const n = Number((valueSI / factor).toPrecision(6));
  return unitSymbol ? `${n} ${unitSymbol}` : String(n);
}

export function createFieldsModel<S extends InputSpecs>(specs: S, initialSystem: UnitSystem = "metric", scope = ""): FieldsModel<S> {
  const names = Object.keys(specs) as (keyof S & string)[];
  const system = signal<UnitSystem>(initialSystem);
  const texts = {} as { [K in keyof S]: Signal<string> };
  const readings = {} as { [K in keyof S]: ReadonlySignal<FieldReading> };
  for (const name of names) {
    texts[name] = signal(defaultText(specs[name]!, initialSystem));
    readings[name] = computed(() => readField(specs[name]!, texts[name].value, system.value));
  }
  const values = computed(() => {
    const out = {} as { [K in keyof S]: number };
    for (const name of names) {
      const reading = readings[name].value;
      if (!reading.ok) return null;
      (out as Record<string, number>)[name] = reading.value;
    }
    return out;
  });
  const notices = signal<string[]>([]);
  /** Text each field last showed in each system, to switch back without rounding drift. */
  const remembered = new Map<string, string>();

  function setSystem(next: UnitSystem): void {
    if (next === system.value) return;
    batch(() => {
      for (const name of names) {
        const spec = specs[name]!;
        const reading = readings[name].value;
        remembered.set(`${system.value}:${name}`, texts[name].value);
        if (!reading.ok) continue;
        const back = remembered.get(`${next}:${name}`);
        if (back !== undefined) {
          const old = readField(spec, back, next);
          if (old.ok && Math.abs(old.value - reading.value) <= 1e-9 * Math.max(1, Math.abs(reading.value))) {
            texts[name].value = back;
            continue;
          }
        }
        const unit = fieldUnit(spec, next);
        if (reading.unit === unit) continue;
        texts[name].value = textIn(reading.value, UNITS[unit].symbol, UNITS[unit].factor);
      }
      system.value = next;
    });
  }

  function applyQuery(search: string): void {
    const decoded = decodeState(specs, search, scope);
    batch(() => {
      if (decoded.system) system.value = decoded.system;
      for (const [name, text] of Object.entries(decoded.texts)) {
        // Show "3000rpm" from a link as "3000 rpm"; leave text that does not read as it came.
        const parsed = parseQuantity(text, specs[name]!.kind, fieldUnit(specs[name]!, system.value));
        const symbol = parsed.ok ? UNITS[parsed.unit].symbol : "";
        texts[name as keyof S].value = parsed.ok && /\d\s*\D/.test(text) ? `${parsed.number}${symbol ? ` ${symbol}` : ""}` : text;
      }
      notices.value = decoded.notices;
    });
  }

  function queryFor(existing: string): string {
    const current: Record<string, string> = {};
    for (const name of names) current[name] = texts[name].value;
    return encodeState(specs, current, system.value, scope, existing);
  }

  return { specs, system, texts, readings, values, notices, setSystem, applyQuery, queryFor };
}

/** A calc/ error mapped to the field it names, with a message in the user's words. */
export function fieldMessage(error: unknown, labels: Record<string, string>): { field: string | null; message: string } {
  if (error instanceof CalcInputError) {
    const label = labels[error.param];
    if (label) return { field: error.param, message: `${label} must be ${error.expected}.` };
    return { field: null, message: error.message };
  }
  return { field: null, message: "This combination of inputs cannot be computed; please check the values." };
}
