import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireChoice, type ChoiceOption } from "./common.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

// Clamp and slip; the bolt once it slips.

/**
 * Shear a friction joint carries before it slips: friction on every faying surface under the clamp
 * of every bolt (en-1090-2 / en-1993-1-8 slip resistance without its partial factor; shigley-mechanical-design §8-12).
 *
 * Formula: $V_{slip} = \mu\,F_i\,n_b\,n_s$
 *
 * @param preload F_i per bolt [N], 0 or more
 * @param frictionCoefficient μ [-], greater than 0 and at most 1.5 (see `SLIP_FACTORS`; approximate)
 * @param boltCount n_b [-], a whole number, 1 or more
 * @param interfaces n_s, faying surfaces the load crosses [-], a whole number, 1 or more
 * @returns V_slip [N]
 *
 * Assumptions: the clamp stays at F_i (no external tension, no loss to embedding or loosening); μ
 * is a rough figure, and the preload behind it scatters with the nut factor.
 *
 * @example
 * slipResistance({ preload: 6387.45, frictionCoefficient: 0.2, boltCount: 4, interfaces: 1 }) // → 5109.96
 *
 * Sources: en-1090-2, en-1993-1-8, shigley-mechanical-design.
 */
export function slipResistance(input: { preload: number; frictionCoefficient: number; boltCount: number; interfaces: number }): number {
  const { preload, frictionCoefficient, boltCount, interfaces } = requireInputObject(input);
  requireNonNegative("preload", preload, "N");
  requireInRange("frictionCoefficient", frictionCoefficient, "", { min: 0, max: 1.5, minOpen: true });
  requireWholeCount("boltCount", boltCount);
  requireWholeCount("interfaces", interfaces);
  return requireFiniteResult(frictionCoefficient * preload * boltCount * interfaces, "slip resistance", { preload: [preload, "N"] }); // en-1090-2
}

function requireWholeCount(param: string, value: number): void {
  requireInRange(param, value, "", { min: 1, max: 1e6 });
  if (!Number.isInteger(value)) throw new CalcInputError({ param, value, expected: "a whole number", unit: "" });
}

/** How the bolt's ends are held once the stack it passes through has slipped sideways. */
export const END_CONDITION_OPTIONS = [
  { value: "cantilever", label: "Cantilever: the head is free to tilt, M = F·h (conservative)" },
  { value: "guided", label: "Guided: both ends held square, M = F·h/2" },
] as const satisfies readonly ChoiceOption[];

export type EndCondition = (typeof END_CONDITION_OPTIONS)[number]["value"];

/**
 * Bending moment in a bolt that carries a sideways load across a stack of height h once the joint
 * has slipped: a cantilever fixed where it enters the part (M = F h), or a beam held square at both
 * ends (M = F h/2) (roark-beams Table 8.1).
 *
 * Formula: $M = F\,h$ (cantilever), $M = F\,h/2$ (guided)
 *
 * @param force F, the sideways load on this bolt [N], 0 or more
 * @param height h, from the face the bolt is held in to where the load acts [m], 0 or more
 * @param endCondition a value of `END_CONDITION_OPTIONS`
 * @returns M [N·m]
 *
 * Assumptions: elastic beam, load at the top of the stack; the cantilever is the upper bound (head
 * free to tilt), the guided beam the lower (head and part both held square).
 *
 * @example
 * boltBendingMoment({ force: 146, height: 0.005, endCondition: "cantilever" }) // → 0.73
 *
 * Sources: roark-beams.
 */
export function boltBendingMoment(input: { force: number; height: number; endCondition: string }): number {
  const { force, height, endCondition } = requireInputObject(input);
  requireNonNegative("force", force, "N");
  requireNonNegative("height", height, "m");
  const condition = requireChoice("endCondition", endCondition, END_CONDITION_OPTIONS);
  const moment = condition === "cantilever" ? force * height : (force * height) / 2; // roark-beams Table 8.1
  return requireFiniteResult(moment, "bending moment", { force: [force, "N"] });
}

/**
 * Bending stress at the root of the thread: the bending formula on a solid circle of the root
 * (minor) diameter (roark-beams; shigley-mechanical-design §8-12).
 *
 * Formula: $\sigma_b = \dfrac{32\,M}{\pi\,d_r^3}$
 *
 * @param moment M [N·m], 0 or more
 * @param rootDiameter d_r [m], greater than 0 (d₃ metric, d_r inch; see `fastenerThread`)
 * @returns σ_b [Pa]
 *
 * @example
 * rootBendingStress({ moment: 0.73, rootDiameter: 3.1411915e-3 }) // → 239.9e6
 *
 * Sources: roark-beams, shigley-mechanical-design.
 */
export function rootBendingStress(input: { moment: number; rootDiameter: number }): number {
  const { moment, rootDiameter } = requireInputObject(input);
  requireNonNegative("moment", moment, "N·m");
  requirePositive("rootDiameter", rootDiameter, "m");
  const stress = (32 * moment) / (Math.PI * rootDiameter ** 3); // roark-beams, σ = M/Z with Z = πd³/32
  return requireFiniteResult(stress, "bending stress", { moment: [moment, "N·m"], rootDiameter: [rootDiameter, "m"] });
}

/**
 * Eurocode 3's reduction of a bolt's shear resistance for packing thicker than d/3 under it, a
 * published cross-check of how much a stack weakens the bolt (en-1993-1-8 §3.6.1(12), clause number
 * from memory).
 *
 * Formula: $\beta_p = \dfrac{9\,d}{8\,d + 3\,t_p} \le 1$
 *
 * @param nominalDiameter d [m], greater than 0
 * @param packingThickness t_p [m], 0 or more
 * @returns β_p [-], 1 for packing up to d/3
 *
 * @example
 * eurocodePackingFactor({ nominalDiameter: 0.004, packingThickness: 0.005 }) // → 0.766
 *
 * Sources: en-1993-1-8.
 */
export function eurocodePackingFactor(input: { nominalDiameter: number; packingThickness: number }): number {
  const { nominalDiameter, packingThickness } = requireInputObject(input);
  requirePositive("nominalDiameter", nominalDiameter, "m");
  requireNonNegative("packingThickness", packingThickness, "m");
  const ratio = packingThickness / nominalDiameter;
  // Finite without a guard: β_p lies between 0 and 1 for any ratio, an infinite one included.
  return Math.min(1, 9 / (8 + 3 * ratio)); // en-1993-1-8: β_p = 9d/(8d + 3t_p) ≤ 1
}

// ---------------------------------------------------------------------------------------------
