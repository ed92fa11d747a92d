/**
 * The mass-layout calculator: its scalar inputs, its one entry point `massBalance` (layout, balance
 * grade, couple, counterweight and sensor radius at once) and the counterweight it offers to add,
 * with the figures after it.
 */
import { CalcInputError } from "../core/errors.ts";

import {
  type BalanceGrade,
  type CoupleUnbalance,
  type PermissibleUnbalance,
  type StaticUnbalance,
  type TwoPlaneCorrection,
  coupleUnbalance,
  equivalentBalanceGrade,
  finestGradeMet,
  permissibleResidualUnbalance,
  staticUnbalance,
  twoPlaneCorrection,
} from "./balance.ts";
import {
  type AppliedCounterweight,
  type CandidateChoice,
  type CounterweightAtRadius,
  type CounterweightForMass,
  applyCounterweight,
  counterweightAtCandidates,
  counterweightAtRadius,
  counterweightRadiusForMass,
} from "./counterweight.ts";
import { type LayoutPart, MAX_PARTS, MAX_PART_MASS } from "./parts.ts";
import { type MassProperties, massProperties } from "./properties.ts";
import { type TrueSensorRadius, trueSensorRadius } from "./sensor.ts";
import { type CoupleLift, type SpinCentre, coupleLift, spinCentre } from "./spin-centre.ts";
import { requireInputObject, requireList, requireWithinSpecs } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// The mass-and-balance calculator: its one entry point (its scalar inputs are declared in mass-balance-inputs.ts).

export { type MassBalanceInput, type MassBalanceScalars, massBalanceInputs } from "./mass-balance-inputs.ts";
import { type MassBalanceInput, massBalanceInputs } from "./mass-balance-inputs.ts";
import { asCallerNames } from "../core/caller-names.ts";

export interface MassBalance {
  layout: MassProperties;
  static: StaticUnbalance;
  /** e·Ω [m/s]. */
  equivalentGrade: number;
  /** The finest standard grade met, or null when coarser than G 4000. */
  gradeMet: BalanceGrade | null;
  /** U_per for the chosen grade. */
  permissible: PermissibleUnbalance;
  /** Whether U ≤ U_per. */
  gradeVerdict: "meets-grade" | "exceeds-grade";
  /** U/U_per, the static unbalance as a share of the permissible one (1 or less meets the grade) [-]. */
  unbalanceShareOfPermissible: number;
  /** Whether e ≤ e_target. */
  offsetVerdict: "within-target" | "outside-target";
  /** e/e_target, the offset as a share of the target (1 or less is within it) [-]. */
  offsetShareOfTarget: number;
  couple: CoupleUnbalance;
  /**
   * (C/|z₂ − z₁|)/(U_per/2), the couple as the equal and opposite unbalance it makes in each
   * correction plane, as a share of the half of U_per allowed in each plane [-]: 1 or less, the
   * couple alone is within the grade and one counterweight at the height of the centre of mass does.
   */
  coupleShareOfPermissible: number;
  /** The couple's rocking moment against the weight's restoring moment, and the speed one side lifts at. */
  lift: CoupleLift;
  twoPlane: TwoPlaneCorrection;
  counterweight: {
    atRadius: CounterweightAtRadius;
    forMass: CounterweightForMass;
    candidates: CandidateChoice | null;
  };
  /**
   * The layout with the least counterweight added: at the best candidate if one works, else at the
   * correction radius; at height z̄. "none" (layout unchanged) when the offset is within the target;
   * "list-full" (layout unchanged) when a counterweight is needed but the list already holds MAX_PARTS
   * rows; "too-heavy" (layout unchanged) when the mass would exceed the 10 000 kg part limit.
   */
  fix: AppliedCounterweight & { method: "none" | "list-full" | "correction-radius" | "candidate" | "too-heavy" };
  /** Where the robot turns: the wheels' centre while their side grip holds, else short of the centre of mass; before and after the fix. */
  spinCentre: { before: SpinCentre; after: SpinCentre };
  /** The sensor's radius about the spin centre, before and after the fix. */
  sensor: { before: TrueSensorRadius; after: TrueSensorRadius };
}

/**
 * The mass-and-balance check: mass properties of the layout, static and couple unbalance, the
 * balance grade it meets against the chosen one, counterweight options, a two-plane correction,
 * the layout with the counterweight added, and the sensor radius before and after.
 *
 * Formula: $e = |\bar{\mathbf c}|$, $U = M e$, $G = e\,\Omega$, $U_{per} = M G_{chosen} / \Omega$,
 * $M_{rock} = \Omega^2\sqrt{I_{xz}^2 + I_{yz}^2}$, $m_{min} = M(e - e_t)/(r + e_t)$,
 * couple share $\dfrac{C/|z_2 - z_1|}{U_{per}/2}$ with $C = \sqrt{I_{xz}^2 + I_{yz}^2}$, couple lift
 * $\Omega^2 C/(M g a)$, grip radius $d_g = \mu s g/\Omega^2$ (spin centre at the wheels' centre for
 * $e \le d_g$, else $d_g$ short of the centre of mass), sensor radius about the spin centre
 *
 * @param input the parts, optional candidates, and every field of `massBalanceInputs` (SI)
 * @returns MassBalance, with U/U_per, e/e_target and the couple per plane against U_per/2 as shares [-]
 *
 * Assumptions: rigid body spinning steadily about a vertical axis; the drive wheels' centre is the
 * geometric centre, and the robot turns about it while the wheels' side grip holds the centre of
 * mass on its orbit (see spinCentre); the counterweight goes at the height of the centre of mass so
 * that it adds no couple.
 * Sources: centre-of-mass, parallel-axis-theorem, iso-21940-11, rigid-rotor-unbalance,
 * bloch-geitner-machinery-maintenance, openstax-college-physics, newton-second-law, serway-beichner-5e,
 * openstax-university-physics-1.
 */
export function massBalance(input: MassBalanceInput): MassBalance {
  const { parts, candidates } = requireInputObject(input);
  const {
    spinSpeed,
    targetOffset,
    balanceGrade,
    correctionRadius,
    maxRadius,
    counterweightMass,
    planeZ1,
    planeZ2,
    sensorX,
    sensorY,
    sideGrip,
    gripShare,
    supportRadius,
  } = requireWithinSpecs(massBalanceInputs, input);
  const layout = massProperties(parts);
  const stat = staticUnbalance({ totalMass: layout.totalMass, offset: layout.offset, angularSpeed: spinSpeed });
  const equivalentGrade = equivalentBalanceGrade({ offset: layout.offset, angularSpeed: spinSpeed });
  const permissible = permissibleResidualUnbalance({ totalMass: layout.totalMass, grade: balanceGrade, angularSpeed: spinSpeed });
  const centre = { totalMass: layout.totalMass, centreX: layout.centreX, centreY: layout.centreY, targetOffset };
  const atRadius = counterweightAtRadius({ ...centre, radius: correctionRadius });
  const forMass = counterweightRadiusForMass({ ...centre, mass: counterweightMass, maxRadius });
  const choice = candidates && candidates.length > 0 ? counterweightAtCandidates({ ...centre, candidates }) : null;
  const couple = coupleUnbalance({ productXZ: layout.productXZ, productYZ: layout.productYZ, angularSpeed: spinSpeed });
  // A couple C acts as ±C/b in two planes b apart (rigid-rotor-unbalance), against U_per/2 per plane (bloch-geitner-machinery-maintenance).
  const coupleShareOfPermissible = couple.couple / Math.abs(planeZ2 - planeZ1) / permissible.perPlane;
  // (Planes at one height are refused just below, by the two-plane correction, with its own words.)
  if (!Number.isFinite(coupleShareOfPermissible) && planeZ2 !== planeZ1) {
    throw new CalcInputError({
      param: "planeZ2",
      value: planeZ2,
      expected: "far enough from the lower plane that the couple per plane stays finite",
      unit: "m",
    });
  }
  const twoPlane = twoPlaneCorrection({
    firstMomentX: layout.firstMomentX,
    firstMomentY: layout.firstMomentY,
    productXZ: layout.productXZAboutOrigin,
    productYZ: layout.productYZAboutOrigin,
    planeZ1,
    planeZ2,
    radius: correctionRadius,
  });
  // The offset against its target, e/e_target (the comparison behind offsetVerdict; centre-of-mass).
  const offsetShareOfTarget = layout.offset / targetOffset;
  if (!Number.isFinite(offsetShareOfTarget)) {
    throw new CalcInputError({
      param: "targetOffset",
      value: targetOffset,
      expected: "large enough that the offset as a share of it stays finite",
      unit: "m",
    });
  }
  const bestCandidate = choice && choice.best !== null ? choice.candidates[choice.best]! : null;
  const unchanged = { parts: [...parts], before: layout, after: layout };
  const useCandidate = bestCandidate !== null && bestCandidate.mass !== null && bestCandidate.mass > 0;
  const fixMass = useCandidate ? bestCandidate.mass! : atRadius.mass;
  let fix: MassBalance["fix"];
  if (atRadius.status === "not-needed") {
    fix = { method: "none", ...unchanged };
  } else if (parts.length >= MAX_PARTS) {
    // A list that already holds the most parts allowed has no room for a counterweight row.
    fix = { method: "list-full", ...unchanged };
  } else if (!(fixMass <= MAX_PART_MASS)) {
    fix = { method: "too-heavy", ...unchanged };
  } else if (useCandidate) {
    fix = { method: "candidate", ...applyCounterweight({ parts, mass: fixMass, x: bestCandidate.x, y: bestCandidate.y, z: layout.centreZ }) };
  } else {
    fix = { method: "correction-radius", ...applyCounterweight({ parts, mass: fixMass, x: atRadius.x, y: atRadius.y, z: layout.centreZ }) };
  }
  const grip = { angularSpeed: spinSpeed, sideGrip, gripShare };
  // A refusal names the caller's field: the spin speed, not the helper's angular speed.
  const callerNames = { angularSpeed: "spinSpeed" };
  const turnsBefore = asCallerNames(callerNames, () => spinCentre({ centreX: layout.centreX, centreY: layout.centreY, ...grip }));
  const turnsAfter = asCallerNames(callerNames, () => spinCentre({ centreX: fix.after.centreX, centreY: fix.after.centreY, ...grip }));
  // No finiteness guard: each figure above comes from a function with its own finiteness guard, and the shares are guarded just above.
  return {
    layout,
    static: stat,
    equivalentGrade,
    gradeMet: finestGradeMet(equivalentGrade),
    permissible,
    gradeVerdict: stat.unbalance <= permissible.unbalance ? "meets-grade" : "exceeds-grade",
    // U/U_per, the ratio iso-21940-11 judges by; equal to eΩ/G_chosen, so finite for any valid grade.
    unbalanceShareOfPermissible: stat.unbalance / permissible.unbalance,
    offsetVerdict: layout.offset <= targetOffset ? "within-target" : "outside-target",
    offsetShareOfTarget,
    couple,
    coupleShareOfPermissible,
    lift: coupleLift({ couple: couple.couple, totalMass: layout.totalMass, supportRadius, angularSpeed: spinSpeed }),
    twoPlane,
    counterweight: { atRadius, forMass, candidates: choice },
    fix,
    spinCentre: { before: turnsBefore, after: turnsAfter },
    sensor: {
      before: trueSensorRadius({ centreX: turnsBefore.centreX, centreY: turnsBefore.centreY, sensorX, sensorY }),
      after: trueSensorRadius({ centreX: turnsAfter.centreX, centreY: turnsAfter.centreY, sensorX, sensorY }),
    },
  };
}

// ---------------------------------------------------------------------------------------------
// The counterweight the calculator offers to add, with the figures after it.

/**
 * Which counterweight question to answer: the mass at a chosen radius ("radius"), the radius for a
 * mass in hand ("mass"), or the least mass among mounting points ("points").
 */
export type CounterweightMode = "radius" | "mass" | "points";

/** Balance figures of a layout, for a before/after comparison. */
export interface BalanceSnapshot {
  /** e [m] */
  offset: number;
  /** e·Ω [m/s] */
  equivalentGrade: number;
  /** Finest standard grade met, or null when coarser than G 4000. */
  gradeMet: BalanceGrade | null;
  /** The sensor about the new spin centre. */
  sensor: TrueSensorRadius;
}

export interface CounterweightPlan {
  /**
   * "apply": adding `counterweight` brings the offset within the target; "not-needed": it already
   * is; "none": this mode has no answer (mass too light for the max radius, no feasible mounting
   * point, no points given, more than 10 000 kg, or the list already holds the most parts allowed).
   */
  status: "apply" | "not-needed" | "none";
  /**
   * The point mass to add, at height z̄: mass [kg], position [m], and the same position as a
   * distance from the axis [m] and a direction atan2(y, x) [rad]; null unless "apply".
   */
  counterweight: { mass: number; x: number; y: number; z: number; radius: number; angle: number } | null;
  /** The layout with the counterweight as its last row, and its figures; null unless "apply". */
  after: (BalanceSnapshot & { parts: LayoutPart[] }) | null;
}

/** Rounds a positive value up to `figures` significant figures; exact values stay put. */
function roundUpSignificant(value: number, figures: number): number {
  const step = 10 ** (Math.floor(Math.log10(value)) - figures + 1);
  return Number((Math.ceil(value / step - 1e-9) * step).toPrecision(figures));
}

/**
 * The counterweight one mode of the calculator proposes, ready to add to the layout, and the
 * offset, balance grade and sensor figures with it in place (centre-of-mass; iso-21940-11 for the
 * grade; openstax-college-physics for the sensor radius).
 *
 * Formula: adding m at $\mathbf p$: $\bar{\mathbf c}' = \dfrac{M\bar{\mathbf c} + m\,\mathbf p}{M + m}$,
 * $e' = |\bar{\mathbf c}'|$, $G' = e'\,\Omega$
 *
 * @param input the calculator's input (parts, candidates and every scalar, SI)
 * @param balance massBalance(input)
 * @param mode "radius", "mass" or "points"
 * @returns status; counterweight (mass [kg], x, y, z [m], radius [m], angle [rad]) or null; after (parts, offset [m],
 * equivalentGrade [m/s], gradeMet, sensor) or null
 *
 * Assumptions: a least mass puts the offset exactly on the target, where rounding or a mounting
 * tolerance pushes it out; so the "radius" and "points" masses are rounded UP to 3 significant
 * figures (what a workshop scale resolves), which moves the offset inside the target, unless that
 * would overshoot the far edge of the workable band (then the exact mass is kept). In "mass" mode
 * the given mass goes at the radius counterweightRadiusForMass recommends. The counterweight sits
 * at z̄, so it adds no couple.
 * Example: the invented demo robot (1.399 kg, e = 1.738 mm toward +x, target 0.2 mm, r = 55 mm)
 * needs 38.99 g; the plan adds 39.0 g at (−55, 0) mm and leaves e = 0.1996 mm.
 * Sources: centre-of-mass, iso-21940-11, openstax-college-physics.
 */
export function counterweightPlan(request: { input: MassBalanceInput; balance: MassBalance; mode: CounterweightMode }): CounterweightPlan {
  const { input, balance, mode } = requireInputObject(request, "request");
  requireInputObject(input, "input");
  requireInputObject(balance, "balance");
  requireList(input.parts, "parts");
  const none = (status: "not-needed" | "none"): CounterweightPlan => ({ status, counterweight: null, after: null });
  if (balance.offsetVerdict === "within-target") return none("not-needed");
  const { atRadius, forMass, candidates } = balance.counterweight;
  const bestIndex = candidates ? candidates.best : null;
  const best = bestIndex !== null ? candidates!.candidates[bestIndex]! : null;
  const pick =
    mode === "radius"
      ? atRadius
      : mode === "mass"
        ? forMass.status === "placed"
          ? { mass: input.counterweightMass, x: forMass.x!, y: forMass.y! }
          : null
        : best;
  if (!pick || !(pick.mass! <= MAX_PART_MASS) || input.parts.length >= MAX_PARTS) return none("none");
  const z = balance.layout.centreZ;
  const place = (mass: number) => ({ mass, ...applyCounterweight({ parts: input.parts, mass, x: pick.x, y: pick.y, z }) });
  let placed = place(pick.mass!);
  if (mode !== "mass") {
    const rounded = place(roundUpSignificant(pick.mass!, 3));
    if (rounded.after.offset <= input.targetOffset) placed = rounded;
  }
  const { after } = placed;
  const equivalentGrade = equivalentBalanceGrade({ offset: after.offset, angularSpeed: input.spinSpeed });
  const turns = asCallerNames({ angularSpeed: "spinSpeed" }, () =>
    spinCentre({
      centreX: after.centreX,
      centreY: after.centreY,
      angularSpeed: input.spinSpeed,
      sideGrip: input.sideGrip,
      gripShare: input.gripShare,
    }),
  );
  return {
    status: "apply",
    // Polar form of the mounting point: r = √(x² + y²), θ = atan2(y, x) (oxford-concise-mathematics).
    counterweight: { mass: placed.mass, x: pick.x, y: pick.y, z, radius: Math.hypot(pick.x, pick.y), angle: Math.atan2(pick.y, pick.x) },
    after: {
      parts: placed.parts,
      offset: after.offset,
      equivalentGrade,
      gradeMet: finestGradeMet(equivalentGrade),
      sensor: trueSensorRadius({ centreX: turns.centreX, centreY: turns.centreY, sensorX: input.sensorX, sensorY: input.sensorY }),
    },
  };
}
