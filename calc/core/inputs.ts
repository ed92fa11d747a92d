/**
 * The typed input layer. Every calculator declares its inputs once (quantity kind, allowed range,
 * default, URL key); the same declaration parses what a user typed, checks the range, and builds
 * the message shown beside the field, in the user's units.
 */
import { CalcInputError } from "./errors.ts";
import {
  displayUnit,
  exactQuantity,
  fromSI,
  parseQuantity,
  quantityToText,
  type QuantityKind,
  type UnitDef,
  type UnitId,
  type UnitSystem,
  siUnit,
  unitDef,
} from "./units.ts";

export interface InputSpec {
  /** Label shown to users, e.g. "Top speed". */
  label: string;
  /** What the field holds; decides the units it accepts. */
  kind: QuantityKind;
  /** Smallest allowed value [SI]. */
  min: number;
  /** Largest allowed value [SI]. */
  max: number;
  /** True when `min` itself is not allowed (e.g. a radius must be greater than 0). */
  minOpen?: boolean;
  /** Default value [SI]. */
  default: number;
  /** Only whole numbers (counts). */
  integer?: boolean;
  /** Short key in the calculator's URL, e.g. "r". */
  urlKey: string;
  /** Unit a bare number is read in and the field shows, per system; defaults by kind. */
  unit?: Partial<Record<UnitSystem, UnitId>>;
  /** One sentence on what the input means. */
  help?: string;
}

export type InputSpecs = Record<string, InputSpec>;

/**
 * Declares a calculator's inputs (identity at run time; keeps the literal types). Throws a
 * CalcInputError naming "<input>.default" when a default lies outside its finite range.
 */
export function defineInputs<const T extends InputSpecs>(specs: T): T {
  for (const [name, spec] of Object.entries(specs ?? requireSpec(specs))) {
    const { min, max, default: start, minOpen } = spec ?? requireSpec(spec);
    if (!(Number.isFinite(min) && Number.isFinite(max) && min <= start && start <= max) || (minOpen && start === min)) {
      throw new CalcInputError({
        param: `${name}.default`,
        value: start,
        expected: `within the declared range, ${minOpen ? "above" : "from"} ${min} to ${max}`,
        unit: "",
      });
    }
  }
  return specs;
}

/** Throws the CalcInputError for a missing declaration (called where one is null or undefined). */
function requireSpec(spec: unknown): never {
  throw new CalcInputError({ param: "spec", value: spec, expected: "an input declaration", unit: "" });
}

/** The unit a field shows and reads bare numbers in. */
export function fieldUnit(spec: InputSpec, system: UnitSystem): UnitId {
  return (spec ?? requireSpec(spec)).unit?.[system] ?? displayUnit(spec.kind, system, spec.default);
}

/** Formats a range bound in the field's unit, without trailing zeros ("50 %", "2000 mm"). */
function show(spec: InputSpec, valueSI: number, system: UnitSystem): string {
  const unit = fieldUnit(spec, system);
  const symbol = unitDef(unit).symbol;
  return `${Number(fromSI(valueSI, unit).toPrecision(4))}${symbol ? ` ${symbol}` : ""}`;
}

/** The allowed range in words, in the user's units: "between 1 mm and 2000 mm". */
export function describeRange(spec: InputSpec, system: UnitSystem): string {
  const low = show(spec, (spec ?? requireSpec(spec)).min, system);
  const high = show(spec, spec.max, system);
  const kindWord = spec.integer ? "a whole number " : "";
  return spec.minOpen ? `${kindWord}greater than ${low} and at most ${high}` : `${kindWord}between ${low} and ${high}`;
}

/**
 * Checks an SI value against the spec. Returns the error to show (never throws), or null.
 */
export function checkValue(spec: InputSpec, valueSI: number, system: UnitSystem): CalcInputError | null {
  const unit = fieldUnit(spec, system);
  // The value in the field's unit, to 6 significant figures: computed, never read back from display text.
  const shownValue = Number((valueSI / unitDef(unit).factor).toPrecision(6));
  const tooLow = spec.minOpen ? !(valueSI > spec.min) : !(valueSI >= spec.min);
  const tooHigh = !(valueSI <= spec.max);
  const notWhole = spec.integer === true && !Number.isInteger(valueSI);
  // No separate finiteness test: NaN fails both comparisons, +Infinity the high one, -Infinity the low one.
  if (tooLow || tooHigh || notWhole) {
    // A value that leaves the doubles in the field's unit (1e308 m in millimetres) is stated in SI, with the SI symbol.
    const inFieldUnit = Number.isFinite(shownValue);
    return new CalcInputError({
      param: spec.label,
      value: inFieldUnit ? shownValue : valueSI,
      expected: describeRange(spec, system),
      unit: unitDef(inFieldUnit ? unit : siUnit(spec.kind)).symbol,
    });
  }
  return null;
}

export type FieldReading = { ok: true; value: number; unit: UnitId } | { ok: false; error: CalcInputError };

/** Parses and range-checks what a user typed into the field described by `spec`. */
export function readField(spec: InputSpec, text: string, system: UnitSystem): FieldReading {
  const unit = fieldUnit(spec, system);
  const parsed = parseQuantity(text, spec.kind, unit);
  if (!parsed.ok) {
    const error = new CalcInputError({ param: spec.label, value: text, expected: describeRange(spec, system), unit: "" });
    // A parse failure says what was wrong with the text first, then the range.
    Object.defineProperty(error, "message", { value: `${spec.label} ${parsed.message}; allowed: ${describeRange(spec, system)}` });
    return { ok: false, error };
  }
  const error = checkValue(spec, parsed.valueSI, system);
  return error ? { ok: false, error } : { ok: true, value: parsed.valueSI, unit: parsed.unit };
}

/** The text a field starts with: the default in the system's unit. */
export function defaultText(spec: InputSpec, system: UnitSystem): string {
  const unit = fieldUnit(spec, system);
  const symbol = unitDef(unit).symbol;
  return `${Number(fromSI(spec.default, unit).toPrecision(6))}${symbol ? ` ${symbol}` : ""}`;
}

/**
 * Field text for an SI value that reads back as exactly that value: "33.73790238966863 mm", or in
 * the SI unit ("0.3 m") when no number in the field's unit does. A value carried from a link or a
 * design keeps every digit, so the calculator shows the stored value's verdict.
 */
export function exactFieldText(spec: InputSpec, valueSI: number, system: UnitSystem): string {
  const exact = exactQuantity(valueSI, fieldUnit(spec, system));
  const def: UnitDef = unitDef(exact.unit);
  const symbol = def.symbol || def.aliases?.[0] || "";
  return symbol === "" || symbol === "°" ? `${exact.number}${symbol}` : `${exact.number} ${symbol}`;
}

/** Compact text for a URL: "32mm". */
export function urlText(_spec: InputSpec, valueSI: number, unit: UnitId): string {
  return quantityToText(valueSI, unit);
}
