/**
 * Where a wheeled spinner really turns, and whether its couple unbalance lifts one side: the side
 * grip of the drive wheels against the force that keeps an off-centre centre of mass on its orbit,
 * and the weight's restoring moment against the rocking moment of the products of inertia.
 */
import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { requireFiniteFields, requireInputObject } from "../core/spec-check.ts";

import { requireCoordinate } from "./parts.ts";

// ---------------------------------------------------------------------------------------------
// Spin centre: the wheels' centre while their side grip holds, else short of the centre of mass.

export interface SpinCentre {
  /**
   * "wheels-hold": the side grip keeps the wheels' centre still and the robot turns about it (the
   * centre of mass orbits it); "wheels-slide": the grip is too weak, the wheels slide sideways and
   * the robot turns about a point `gripRadius` short of the centre of mass.
   */
  state: "wheels-hold" | "wheels-slide";
  /** μ·s·g/Ω², the largest orbit the side grip can hold the centre of mass on [m]. */
  gripRadius: number;
  /** e, distance of the centre of mass from the wheels' centre [m]. */
  offset: number;
  /**
   * e/(μ·s·g/Ω²), the grip the orbit needs as a share of what the wheels have (1 or less: they
   * hold) [-]; null when the wheels have no grip (μ or s is 0) or so little that the share leaves
   * the double range.
   */
  gripShareNeeded: number | null;
  /** Position of the spin centre from the wheels' centre [m]. */
  centreX: number;
  /** [m] */
  centreY: number;
  /** Distance of the spin centre from the wheels' centre [m]. */
  distanceFromWheels: number;
}

/**
 * The point a wheeled spinner turns about, from the side grip of its wheels against the centripetal
 * force of its off-centre centre of mass (newton-second-law, F = M e Ω²; serway-beichner-5e,
 * Coulomb friction f ≤ μ n).
 *
 * Formula: $d_g = \dfrac{\mu\, s\, g}{\Omega^2}$; for $e \le d_g$ the wheels hold and the spin centre
 * is the wheels' centre; for $e > d_g$ it lies on the line to the centre of mass, $d_g$ short of it:
 * $\mathbf c_s = \bar{\mathbf c}\,(1 - d_g/e)$
 *
 * @param centreX x̄, centre of mass from the wheels' centre [m]
 * @param centreY ȳ [m]
 * @param angularSpeed Ω, spin speed [rad/s], greater than 0
 * @param sideGrip μ, friction coefficient of the wheels on the floor sideways [-], 0 to 3 (0: no grip, the robot turns about its centre of mass)
 * @param gripShare s, share of the weight on the drive wheels [-], 0 to 1
 * @returns state, grip radius [m], offset [m], share of grip needed [-], spin centre [m]
 *
 * Assumptions: steady spin on a level floor; the wheels' grip is lumped at the wheels' centre and can
 * push sideways in any direction with at most μ·s·M·g (one coefficient for holding and for sliding);
 * the floor's other contacts (skids) slide freely. While the wheels hold, the centre of mass orbits the
 * wheels' centre on a circle of radius e. Once they slide, the grip force μ·s·M·g is what keeps the
 * centre of mass on its orbit, of radius d_g; that the spin centre lies on the line from the centre of
 * mass to the wheels' centre is an approximation (the sliding direction depends on how the wheels
 * are steered), so the distance is the dependable figure. Calibrate the sensor radius on the robot.
 * @example
 * spinCentre({ centreX: 0.0001, centreY: 0, angularSpeed: rpmToRadPerSecond(2400), sideGrip: 0.8, gripShare: 0.9 }) // → { state: "wheels-hold", gripRadius: 1.118e-4, centreX: 0, … } (grip holds a 0.112 mm orbit; 0.1 mm is within it)
 * Sources: newton-second-law, serway-beichner-5e.
 */
export function spinCentre(input: { centreX: number; centreY: number; angularSpeed: number; sideGrip: number; gripShare: number }): SpinCentre {
  const { centreX, centreY, angularSpeed, sideGrip, gripShare } = requireInputObject(input);
  requireCoordinate("centreX", centreX);
  requireCoordinate("centreY", centreY);
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requireInRange("sideGrip", sideGrip, "", { min: 0, max: 3 });
  requireInRange("gripShare", gripShare, "", { min: 0, max: 1 });
  // Largest orbit the grip holds: M d Ω² = μ s M g (newton-second-law; serway-beichner-5e, f ≤ μ n).
  const gripRadius = (sideGrip * gripShare * STANDARD_GRAVITY) / angularSpeed / angularSpeed;
  if (!Number.isFinite(gripRadius)) {
    throw new CalcInputError({
      param: "angularSpeed",
      value: angularSpeed,
      expected: "large enough that the grip radius μ·s·g/Ω² stays finite",
      unit: "rad/s",
    });
  }
  // Distance formula (oxford-concise-mathematics).
  const offset = Math.hypot(centreX, centreY);
  const holds = offset <= gripRadius;
  // Sliding: the spin centre sits d_g short of the centre of mass, toward the wheels' centre (newton-second-law).
  const scale = holds ? 0 : 1 - gripRadius / offset;
  const cx = centreX * scale + 0;
  const cy = centreY * scale + 0;
  // e/d_g: 0 on centre; null when the grip is nil or so small that the share leaves the double range.
  const ratio = offset === 0 ? 0 : offset / gripRadius;
  const share = Number.isFinite(ratio) ? ratio : null;
  // No finiteness guard: the grip radius is guarded above, and the offset, the scale (0 to 1) and the centre it gives stay finite.
  return {
    state: holds ? "wheels-hold" : "wheels-slide",
    gripRadius,
    offset,
    gripShareNeeded: share,
    centreX: cx,
    centreY: cy,
    distanceFromWheels: Math.hypot(cx, cy),
  };
}

// ---------------------------------------------------------------------------------------------
// Couple lift: the rocking moment against the weight's restoring moment.

export interface CoupleLift {
  /** Ω²·C, the rocking moment the couple unbalance makes [N·m]. */
  rockingMoment: number;
  /** M·g·a, the most the weight can resist before one side lifts [N·m]. */
  restoringMoment: number;
  /** Ω²C/(M g a) [-]: 1 or more, one side lifts. */
  ratio: number;
  /** √(M g a / C), the speed at which one side lifts [rad/s]; null when there is no couple. */
  liftSpeed: number | null;
}

/**
 * Whether the couple unbalance lifts one side of a spinner off the floor: the rocking moment it
 * makes against the most the weight can hold down (rigid-rotor-unbalance for the rocking moment;
 * openstax-university-physics-1 for the moment of the weight about the tipping edge).
 *
 * Formula: $M_{rock} = \Omega^2 C$, $M_{hold} = M g a$, ratio $= \dfrac{\Omega^2 C}{M g a}$,
 * $\Omega_{lift} = \sqrt{\dfrac{M g a}{C}}$
 *
 * @param couple C = √(I_xz² + I_yz²) about the centre of mass [kg·m²], 0 or more
 * @param totalMass M [kg], greater than 0
 * @param supportRadius a, distance from the spin axis to the edge the robot would tip over (its wheels' or skids' contact) [m], greater than 0
 * @param angularSpeed Ω [rad/s], 0 or more
 * @returns rocking and restoring moments [N·m], their ratio [-], lift speed [rad/s] or null
 *
 * Assumptions: level floor; the rocking moment turns with the robot, so the shortest distance to a
 * tipping edge counts; the weight can shift wholly onto that edge (M g a); the moment of the side
 * forces at the floor and any gyroscopic stiffening from tilting are left out.
 * @example
 * coupleLift({ couple: 1e-5, totalMass: 1.4, supportRadius: 0.07, angularSpeed: rpmToRadPerSecond(2400) }) // → { rockingMoment: 0.632, restoringMoment: 0.961, ratio: 0.657, liftSpeed: 310.0 } (lifts at 2960 rpm)
 * Sources: rigid-rotor-unbalance, openstax-university-physics-1.
 */
export function coupleLift(input: { couple: number; totalMass: number; supportRadius: number; angularSpeed: number }): CoupleLift {
  const { couple, totalMass, supportRadius, angularSpeed } = requireInputObject(input);
  requireNonNegative("couple", couple, "kg·m²");
  requirePositive("totalMass", totalMass, "kg");
  requirePositive("supportRadius", supportRadius, "m");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  // Rocking moment of a couple unbalance, Ω² C (rigid-rotor-unbalance).
  const rockingMoment = angularSpeed * angularSpeed * couple;
  // Moment of the weight about the tipping edge, M g a (openstax-university-physics-1, torque = r F).
  const restoringMoment = totalMass * STANDARD_GRAVITY * supportRadius;
  // Ω_lift from Ω² C = M g a, as √(M g a)/√C so that a tiny couple does not overflow the square.
  const liftSpeed = couple > 0 ? Math.sqrt(restoringMoment) / Math.sqrt(couple) : null;
  return requireFiniteFields({ rockingMoment, restoringMoment, ratio: rockingMoment / restoringMoment, liftSpeed }, "couple lift", {
    couple: [couple, "kg·m²"],
    totalMass: [totalMass, "kg"],
    supportRadius: [supportRadius, "m"],
    angularSpeed: [angularSpeed, "rad/s"],
  });
}
