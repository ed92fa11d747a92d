/**
 * Checks a calculator's whole SI input object against its input declaration (calc/inputs.ts), so
 * an entry function refuses exactly what its fields would refuse, by name and in SI.
 */
import { CalcInputError, requireFinite } from "./errors.ts";
import type { InputSpecs } from "./inputs.ts";
import type { QuantityKind } from "./units.ts";

/** SI symbol of each quantity kind, for error messages. */
const SI_SYMBOL: Partial<Record<QuantityKind, string>> = {
  length: "m",
  acceleration: "m/s²",
  angularSpeed: "rad/s",
  angularAcceleration: "rad/s²",
  angle: "rad",
  time: "s",
  frequency: "Hz",
  fraction: "",
  count: "",
};

function round6(x: number): number {
  return Number(x.toPrecision(6));
}

/**
 * Throws a `CalcInputError` naming the first input that is not finite, lies outside its declared
 * range, or is not whole where the declaration asks for a whole number.
 *
 * @param specs the calculator's input declaration
 * @param input the values in SI, one per declared input
 * @returns nothing; throws on the first bad value, e.g. "radius1 must be greater than 0.0001 m and
 * at most 1 m (got 0 m)"
 */
export function requireWithinSpecs(specs: InputSpecs, input: Record<string, number>): void {
  for (const [name, spec] of Object.entries(specs)) {
    const value = input[name];
    const unit = SI_SYMBOL[spec.kind] ?? "";
    requireFinite(name, value as number, unit);
    const v = value as number;
    const u = unit ? ` ${unit}` : "";
    const low = spec.minOpen ? `greater than ${round6(spec.min)}${u}` : `at least ${round6(spec.min)}${u}`;
    const lowOk = spec.minOpen ? v > spec.min : v >= spec.min;
    if (!lowOk || !(v <= spec.max)) {
      throw new CalcInputError({ param: name, value: v, expected: `${low} and at most ${round6(spec.max)}${u}`, unit });
    }
    if (spec.integer && !Number.isInteger(v)) {
      throw new CalcInputError({ param: name, value: v, expected: "a whole number", unit });
    }
  }
}
