/**
 * The integrator's tolerance options read into its per-component arrays: a number for every
 * component or a list of one per component, each within its range (hairer-norsett-wanner-1 §II.4:
 * sc_i = atol_i + rtol_i·max(|y_i|, |y1_i|)). Used by `DormandPrince45.solve` (./ode.ts).
 */
import { CalcInputError, requireInRange } from "../core/errors.ts";

/** Fills `out` from a tolerance option; refuses a value or a list entry outside min–max (∞ only where allowed) by name. */
export function tolerances(
  name: string,
  value: number | ArrayLike<number>,
  n: number,
  out: Float64Array,
  min: number,
  max: number,
  allowInfinity: boolean,
): void {
  if (typeof value === "number") {
    if (!(allowInfinity && value === Number.POSITIVE_INFINITY)) requireInRange(name, value, "", { min, max });
    out.fill(value);
    return;
  }
  // No null here: the caller's `?? default` has already turned a null tolerance into the default.
  if (typeof value !== "object" || value.length !== n) {
    throw new CalcInputError({
      param: name,
      value: typeof value !== "object" ? value : value.length,
      expected: `a number or a list of ${n}`,
      unit: "",
    });
  }
  for (let i = 0; i < n; i++) {
    const v = value[i]!;
    if (!(allowInfinity && v === Number.POSITIVE_INFINITY)) requireInRange(`${name}[${i}]`, v, "", { min, max });
    out[i] = v;
  }
}
