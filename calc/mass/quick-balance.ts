/**
 * The pit's question about balance: "I am adding (or moving) this part: how far off does it put the
 * robot, is that still within what I accept, and what counterweight puts it right?" The limit comes
 * from an ISO 21940-11 balance grade at the robot's mass and spin speed, or from the rotating force
 * the builder accepts; the part gives the offset, the unbalance and the force it causes, and the
 * counterweight that cancels it. The robot is taken as balanced before the change, so the part is
 * judged alone. SI in and out: kg, m, rad/s, N, kg·m, m/s.
 */
import { CalcInputError } from "../core/errors.ts";
import { requireWithinSpecs } from "../core/spec-check.ts";
import { BALANCE_GRADES, type BalanceGrade, equivalentBalanceGrade, permissibleResidualUnbalance, staticUnbalance } from "./balance.ts";
import { counterweightAtRadius } from "./counterweight.ts";

export { QUICK_BALANCE_MARGIN, type QuickBalanceChange, type QuickBalanceLimit, quickBalanceInputs } from "./quick-balance-inputs.ts";
import { QUICK_BALANCE_MARGIN, type QuickBalanceChange, type QuickBalanceLimit, quickBalanceInputs } from "./quick-balance-inputs.ts";

export interface QuickBalanceInput {
  /** M₀, the robot before the change [kg]. */
  robotMass: number;
  /** Ω, the service spin speed [rad/s]. */
  spinSpeed: number;
  /** "grade" (read `grade`) or "force" (read `wobbleForce`). */
  limit: QuickBalanceLimit;
  /** The balance grade's designation number as in BALANCE_GRADES ("6.3" for G 6.3); read when `limit` is "grade". */
  grade: string;
  /** F_per, the rotating force accepted [N]; read when `limit` is "force". */
  wobbleForce: number;
  /** "added" (read `partRadius`) or "moved" (read `moveDistance`). */
  change: QuickBalanceChange;
  /** m, the part [kg]. */
  partMass: number;
  /** r, from the spin axis to the added part [m]. */
  partRadius: number;
  /** d, how far the moved part's centre went, in the plane of spin [m]. */
  moveDistance: number;
  /** r_cw, where a counterweight can sit [m]. */
  counterweightRadius: number;
}

export interface QuickBalanceAllowance {
  /** The grade when the limit is a grade, else null. */
  grade: BalanceGrade | null;
  /** e_per, the largest centre-of-mass offset [m]. */
  offset: number;
  /** U_per = M·e_per [kg·m]. */
  unbalance: number;
  /** U_per·Ω², the rotating force at the limit [N]. */
  force: number;
  /** e_per·Ω [m/s]: the grade itself, or the grade a force limit amounts to. */
  equivalentGrade: number;
}

export interface QuickBalance {
  /** M, the robot after the change: M₀ + m for an added part, M₀ for a moved one [kg]. */
  totalMass: number;
  /** What the builder accepts, at mass M. */
  allowance: QuickBalanceAllowance;
  /** e = m·r/M (added) or m·d/M (moved), the centre-of-mass offset the part causes [m]. */
  offset: number;
  /** U = m·r or m·d [kg·m]. */
  unbalance: number;
  /** U·Ω² [N]. */
  force: number;
  /** e·Ω [m/s]. */
  equivalentGrade: number;
  /** U/U_per [-]: 1 or less is within the limit. */
  shareOfLimit: number;
  /** The counterweight at r_cw, opposite the part (or opposite the way it moved), that cancels it fully: U/r_cw [kg]. */
  counterweight: number;
  /** The least counterweight at r_cw that brings the robot within the limit [kg]; 0 when none is needed. */
  leastCounterweight: number;
  status: "holds" | "marginal" | "fails";
  reason: string;
}

function gradeOf(designation: unknown): BalanceGrade {
  const found = BALANCE_GRADES.find((g) => g.label === `G ${designation}`);
  if (!found) {
    throw new CalcInputError({
      param: "grade",
      value: designation,
      expected: `one of ${BALANCE_GRADES.map((g) => g.label.slice(2)).join(", ")}`,
      unit: "mm/s",
    });
  }
  return found;
}

/**
 * The quick balance check of one added or moved part (iso-21940-11; centre-of-mass;
 * rigid-rotor-unbalance): the offset, unbalance and rotating force the part causes, against the
 * limit of a balance grade or an accepted wobble force, and the counterweight that cancels it.
 *
 * Formula: $M = M_0 + m$ (added) or $M_0$ (moved); $e = m r / M$ (or $m d / M$), $U = m r$,
 * $F = U\,\Omega^2$; limit $e_{per} = G/\Omega$, $U_{per} = M e_{per}$, or
 * $e_{per} = F_{per}/(M\Omega^2)$, $U_{per} = F_{per}/\Omega^2$; counterweight
 * $m_{cw} = U / r_{cw}$ opposite the part; least counterweight $M(e - e_{per})/(r_{cw} + e_{per})$
 * for a grade, $(U - U_{per})/r_{cw}$ for a force.
 *
 * @param input.robotMass M₀ [kg]; `spinSpeed` Ω [rad/s]; `limit` "grade" | "force"; `grade` the
 *   designation number ("6.3"); `wobbleForce` F_per [N]; `change` "added" | "moved"; `partMass` m
 *   [kg]; `partRadius` r [m]; `moveDistance` d [m]; `counterweightRadius` r_cw [m].
 * @returns M [kg], the allowance (e_per [m], U_per [kg·m], force [N], grade [m/s]), e [m], U [kg·m],
 *   F [N], e·Ω [m/s], U/U_per [-], the counterweight and the least counterweight [kg], and a verdict.
 * Assumptions: the robot was balanced before the change and spins about its geometric axis; the part
 * and the counterweight are point masses in the plane of the centre of mass (no couple). A moved part
 * keeps its mass in the robot, so it cannot weigh more than the robot. Holds when U ≤ U_per,
 * Marginal up to 2.5 × U_per (one step of the grade table), Fails beyond.
 * @example
 * quickBalance({ robotMass: 1.5, spinSpeed: rpmToRadPerSecond(2400), limit: "grade", grade: "100", wobbleForce: 50, change: "added", partMass: 0.012, partRadius: 0.045, moveDistance: 0, counterweightRadius: 0.05 }).counterweight // → 0.0108
 * Sources: iso-21940-11, centre-of-mass, rigid-rotor-unbalance, newton-second-law.
 */
export function quickBalance(input: QuickBalanceInput): QuickBalance {
  const { robotMass, spinSpeed, wobbleForce, partMass, partRadius, moveDistance, counterweightRadius } = requireWithinSpecs(quickBalanceInputs, input);
  const { limit, change } = input;
  if (limit !== "grade" && limit !== "force") throw new CalcInputError({ param: "limit", value: limit, expected: "one of grade, force", unit: "" });
  if (change !== "added" && change !== "moved") throw new CalcInputError({ param: "change", value: change, expected: "one of added, moved", unit: "" });
  const grade = limit === "grade" ? gradeOf(input.grade) : null;
  if (change === "moved" && partMass > robotMass) {
    throw new CalcInputError({
      param: "partMass",
      value: partMass,
      expected: `at most the robot's mass (${robotMass} kg): a moved part is part of the robot`,
      unit: "kg",
    });
  }
  // The robot after the change: an added part adds its mass (centre-of-mass, M = Σ m).
  const totalMass = change === "added" ? robotMass + partMass : robotMass;
  const lever = change === "added" ? partRadius : moveDistance;
  // First moment of the part about the axis (or the change of it when moved): U = m·r (centre-of-mass).
  const unbalance = partMass * lever;
  // e = U/M, the centre of mass's distance from the axis (centre-of-mass).
  const offset = unbalance / totalMass;
  // F = U·Ω² (rigid-rotor-unbalance, newton-second-law).
  const { force } = staticUnbalance({ totalMass, offset, angularSpeed: spinSpeed });
  const omega2 = spinSpeed * spinSpeed;
  let allowance: QuickBalanceAllowance;
  if (grade) {
    // e_per = G/Ω, U_per = M·e_per (iso-21940-11).
    const per = permissibleResidualUnbalance({ totalMass, grade: grade.value, angularSpeed: spinSpeed });
    allowance = { grade, offset: per.specificUnbalance, unbalance: per.unbalance, force: per.unbalance * omega2, equivalentGrade: grade.value };
  } else {
    // A force limit read as an unbalance: U_per = F/Ω², e_per = F/(M·Ω²) (rigid-rotor-unbalance).
    const allowedUnbalance = wobbleForce / omega2;
    const allowedOffset = allowedUnbalance / totalMass;
    allowance = {
      grade: null,
      offset: allowedOffset,
      unbalance: allowedUnbalance,
      force: wobbleForce,
      equivalentGrade: equivalentBalanceGrade({ offset: allowedOffset, angularSpeed: spinSpeed }),
    };
  }
  if (!(allowance.offset > 0) || !Number.isFinite(allowance.unbalance)) {
    // Only a subnormal force at the top speed underflows to nothing: no part would be allowed at all.
    throw new CalcInputError({ param: "wobbleForce", value: wobbleForce, expected: "large enough to allow some offset at this spin speed", unit: "N" });
  }
  // The counterweight opposite the part: at its own radius (rigid-rotor-unbalance) and the least within the offset limit (centre-of-mass).
  const atRadius = counterweightAtRadius({ totalMass, centreX: offset, centreY: 0, targetOffset: allowance.offset, radius: counterweightRadius });
  // With a force limit the unbalance, not the offset, is held: (U − m_cw·r_cw) ≤ U_per (rigid-rotor-unbalance).
  const leastCounterweight = grade ? atRadius.mass : Math.max(0, (unbalance - allowance.unbalance) / counterweightRadius);
  // U/U_per, the ratio iso-21940-11 judges by.
  const shareOfLimit = unbalance / allowance.unbalance;
  if (!Number.isFinite(shareOfLimit)) {
    throw new CalcInputError({
      param: grade ? "grade" : "wobbleForce",
      value: grade ? input.grade : wobbleForce,
      expected: "a limit large enough that U/U_per stays finite",
      unit: grade ? "mm/s" : "N",
    });
  }
  const status = shareOfLimit <= 1 ? "holds" : shareOfLimit <= QUICK_BALANCE_MARGIN ? "marginal" : "fails";
  const reason =
    status === "holds" ? "within the limit" : status === "marginal" ? "over the limit, by up to 2.5 times (one grade step)" : "more than 2.5 times the limit";
  return {
    totalMass,
    allowance,
    offset,
    unbalance,
    force,
    equivalentGrade: equivalentBalanceGrade({ offset, angularSpeed: spinSpeed }),
    shareOfLimit,
    counterweight: atRadius.massForZero,
    leastCounterweight,
    status,
    reason,
  };
}
