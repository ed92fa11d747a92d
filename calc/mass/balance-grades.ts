/**
 * The standard balance quality grades of ISO 21940-11 as data, apart from the balance arithmetic
 * (calc/mass/balance.ts) so that a form listing the grades does not carry it.
 */

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
