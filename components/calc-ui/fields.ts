/**
 * The generic model behind every calculator form: one text signal per declared input, the
 * parsed reading of each, the unit system, and conversion of field texts when the system changes.
 * No DOM; safe on the server.
 */
import { batch, computed, signal, type ReadonlySignal, type Signal } from "./reactive.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import { defaultText, fieldUnit, readField, type FieldReading, type InputSpec, type InputSpecs } from "../../calc/core/inputs.ts";
import { displayUnit, fromSI, parseQuantity, type QuantityKind, type UnitSystem, unitDef } from "../../calc/core/units.ts";

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
  /** Shows field texts from a link ("3000rpm" as "3000 rpm"), after switching to `system` when given. */
  applyTexts(texts: Partial<Record<keyof S, string>>, system?: UnitSystem): void;
}

/** Rewrites an SI value as field text in `unit`, to 6 significant figures. */
function textIn(valueSI: number, unitSymbol: string, factor: number): string {
  const n = Number((valueSI / factor).toPrecision(6));
  return unitSymbol ? `${n} ${unitSymbol}` : String(n);
}

export function createFieldsModel<S extends InputSpecs>(specs: S, initialSystem: UnitSystem = "metric"): FieldsModel<S> {
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
  /** The text a switch of units last wrote into each field: while the field still holds it, switching back restores the text it had. */
  const written = new Map<string, string>();

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
          const untouched = written.get(name) === texts[name].value;
          if (old.ok && (untouched || Math.abs(old.value - reading.value) <= 1e-9 * Math.max(1, Math.abs(reading.value)))) {
            texts[name].value = back;
            written.delete(name);
            continue;
          }
        }
        const unit = fieldUnit(spec, next);
        if (reading.unit === unit) continue;
        texts[name].value = textIn(reading.value, unitDef(unit).symbol, unitDef(unit).factor);
        written.set(name, texts[name].value);
      }
      system.value = next;
    });
  }

  function applyTexts(linked: Partial<Record<keyof S, string>>, linkedSystem?: UnitSystem): void {
    batch(() => {
      if (linkedSystem) system.value = linkedSystem;
      for (const [name, text] of Object.entries(linked) as [keyof S & string, string][]) {
        // Show "3000rpm" from a link as "3000 rpm"; leave text that does not read as it came.
        const parsed = parseQuantity(text, specs[name]!.kind, fieldUnit(specs[name]!, system.value));
        const symbol = parsed.ok ? unitDef(parsed.unit).symbol : "";
        texts[name].value = parsed.ok && /\d\s*\D/.test(text) ? `${parsed.number}${symbol ? ` ${symbol}` : ""}` : text;
      }
    });
  }

  return { specs, system, texts, readings, values, notices, setSystem, applyTexts };
}

/** The words of each relation of a bound. */
const RELATION_WORDS = { greater: "greater than", "at-least": "at least", less: "less than", "at-most": "at most" } as const;

/**
 * A calc/ error mapped to the field it names, with a message in the user's words and units: a rule
 * that compares with a limit (another field's value, say) is worded from the error's bound, in the
 * unit of the field the limit belongs to.
 *
 * @param fields each field's label, and its declaration where it has one (for the unit)
 */
export function fieldMessage(
  error: unknown,
  fields: Record<string, string | (Partial<InputSpec> & { label: string })>,
  system: UnitSystem = "metric",
): { field: string | null; message: string } {
  if (error instanceof CalcInputError) {
    const named = fields[error.param];
    if (!named) return { field: null, message: error.message };
    const label = typeof named === "string" ? named : named.label;
    const bound = error.bound;
    if (bound) {
      const owner = fields[bound.other ?? error.param];
      const spec = typeof owner === "object" && owner.kind ? (owner as InputSpec) : null;
      const unit = spec ? fieldUnit(spec, system) : displayUnit(bound.kind as QuantityKind, system, bound.limit);
      const limit = `${Number(fromSI(bound.limit, unit).toPrecision(6))}${unitDef(unit).symbol ? ` ${unitDef(unit).symbol}` : ""}`;
      const other = bound.other ? (typeof owner === "string" ? owner : owner?.label) : undefined;
      // "Top speed" reads "the top speed" inside a sentence; "Kv" stays as it is.
      const inSentence = other && /^[A-Z][a-z]/.test(other) ? `the ${other[0]!.toLowerCase()}${other.slice(1)}` : other;
      return { field: error.param, message: `${label} must be ${RELATION_WORDS[bound.relation]} ${inSentence ? `${inSentence} (${limit})` : limit}.` };
    }
    return { field: error.param, message: `${label} must be ${error.expected}.` };
  }
  return { field: null, message: "This combination of inputs cannot be computed; please check the values." };
}
