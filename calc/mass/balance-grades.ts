/**
 * The standard balance quality grades of ISO 21940-11 as data, apart from the balance arithmetic
 * (calc/mass/balance.ts) so that a form listing the grades does not carry it.
 */
import { requireNonNegative } from "../core/errors.ts";

/** One standard balance quality grade. */
export interface BalanceGrade {
  /** Designation, e.g. "G 6.3". */
  label: string;
  /** e_per·Ω [m/s] (the designation number is this in mm/s). */
  value: number;
}

/**
 * The standard balance quality grades, finest first: G 0.4 … G 4000 (iso-21940-11 Table 1, the
 * same in ISO 1940-1; bloch-geitner-machinery-maintenance Table 6-5). Values in m/s.
 */
export const BALANCE_GRADES: readonly BalanceGrade[] = [0.4, 1, 2.5, 6.3, 16, 40, 100, 250, 630, 1600, 4000].map((mmPerS) => ({
  label: `G ${mmPerS}`,
  value: mmPerS / 1000,
}));

/**
 * The standard balance quality grade a value names, if any: the entry of `BALANCE_GRADES` equal to
 * it to within a relative 1e-9, so that 6.3 mm/s typed or read back from a link finds G 6.3
 * (iso-21940-11 Table 1).
 *
 * Formula: $|G_k - G| \le 10^{-9}\,G_k$
 *
 * @param grade G [m/s], 0 or more
 * @returns the standard grade, or null when the value is none of them
 *
 * @example
 * standardBalanceGrade(0.0063) // → { label: "G 6.3", value: 0.0063 }; standardBalanceGrade(0.005) // → null
 * Sources: iso-21940-11.
 */
export function standardBalanceGrade(grade: number): BalanceGrade | null {
  requireNonNegative("grade", grade, "m/s");
  // Equality up to the rounding of a unit conversion, against iso-21940-11's list.
  // Stryker disable next-line EqualityOperator: equivalent, no double lies exactly 1e-9·G_k from a grade (G_k ± 1e-9·G_k is not representable for any of the 11), so < and ≤ agree
  return BALANCE_GRADES.find((g) => Math.abs(g.value - grade) <= 1e-9 * g.value) ?? null;
}
