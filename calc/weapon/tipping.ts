/**
 * Tipping while turning: the roll moment a horizontal-axle weapon puts on the robot when it turns,
 * the weight's restoring moment about the wheel line, the largest turn rate before a wheel lifts,
 * and the turn rate a differential drive can reach. SI in and out.
 */
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { CalcInputError, requireFinite, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { type ChoiceOption, requireChoice as requireOption } from "../core/choices.ts";
import { type Side, spinAxis } from "./gyroscopic.ts";

// Tipping while turning (horizontal axle across the robot).

/** Roll moments on a robot turning with a horizontal-axle weapon; positive lifts the LEFT wheels. */
export interface RollMoment {
  /** From the weapon, (H × ω)_x [N·m]. */
  gyroscopic: number;
  /** From the turn taken at speed, m·v·ψ̇·h [N·m]. */
  centrifugal: number;
  /** The sum [N·m]. */
  total: number;
}

/**
 * Roll moment on a robot that turns while carrying a weapon on a horizontal axle across it: the
 * weapon's gyroscopic moment plus, when the robot also moves, the centrifugal overturning moment
 * (meriam-kraige-dynamics, khurmi-gupta-theory-of-machines, gillespie-vehicle-dynamics).
 *
 * Formula: $M_x = \dot\psi\,(s\,J\,\Omega + m\,v\,h)$, $s = -1$ when the front edge moves up, $+1$ when it moves down
 *
 * @param inertia J, the weapon rotor [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], 0 or more
 * @param spin a value of `HORIZONTAL_SPIN_OPTIONS`
 * @param turnRate ψ̇, yaw rate [rad/s], positive turning LEFT, negative turning right
 * @param robotMass m, the whole robot [kg], greater than 0
 * @param forwardSpeed v [m/s], positive forwards, negative backwards (default 0)
 * @param comHeight h, centre of mass above the ground [m], 0 or more (default 0)
 * @returns gyroscopic, centrifugal and total roll moment [N·m]; positive lifts the left wheels
 *
 * Assumptions: steady turn (ψ̇ and v constant, so the path radius is v/ψ̇), flat ground, rigid
 * robot and tyres, the weapon's axle square to the direction of travel.
 * @example
 * rollMomentWhileTurning({ inertia: 0.01, spinSpeed: 500, spin: "front-up", turnRate: 5, robotMass: 10, forwardSpeed: 1, comHeight: 0.05 })
 * // → { gyroscopic: -25, centrifugal: 2.5, total: -22.5 }
 * Sources: meriam-kraige-dynamics, khurmi-gupta-theory-of-machines, gillespie-vehicle-dynamics.
 */
export function rollMomentWhileTurning(input: {
  inertia: number;
  spinSpeed: number;
  spin: string;
  turnRate: number;
  robotMass: number;
  forwardSpeed?: number;
  comHeight?: number;
}): RollMoment {
  const fields = requireInputObject(input);
  const { inertia, spinSpeed, turnRate, robotMass } = fields;
  const forwardSpeed = fields.forwardSpeed ?? 0;
  const comHeight = fields.comHeight ?? 0;
  const h = spinAxis("horizontal", fields.spin);
  requirePositive("inertia", inertia, "kg·m²");
  requireNonNegative("spinSpeed", spinSpeed, "rad/s");
  requireFinite("turnRate", turnRate, "rad/s");
  requirePositive("robotMass", robotMass, "kg");
  requireFinite("forwardSpeed", forwardSpeed, "m/s");
  requireNonNegative("comHeight", comHeight, "m");
  const named = {
    inertia: [inertia, "kg·m²"],
    spinSpeed: [spinSpeed, "rad/s"],
    turnRate: [turnRate, "rad/s"],
    robotMass: [robotMass, "kg"],
    forwardSpeed: [forwardSpeed, "m/s"],
    comHeight: [comHeight, "m"],
  } as const;
  const gyroscopic = requireFiniteResult(h[1] * inertia * spinSpeed * turnRate, "gyroscopic moment", named); // meriam-kraige-dynamics: (H × ω)_x = H_y·ψ̇
  const centrifugal = requireFiniteResult(robotMass * forwardSpeed * turnRate * comHeight, "centrifugal moment", named); // gillespie-vehicle-dynamics: m·a_y·h, a_y = v·ψ̇
  return { gyroscopic, centrifugal, total: requireFiniteResult(gyroscopic + centrifugal, "roll moment", named) };
}

/** Throws unless the centre of mass lies within half the track either side. @internal */
export function requireComInsideTrack(comOffset: number, trackWidth: number): void {
  requireFinite("comOffset", comOffset, "m");
  if (!(Math.abs(comOffset) < trackWidth / 2)) {
    throw new CalcInputError({
      param: "comOffset",
      value: comOffset,
      expected: `less than half the track (${Number((trackWidth / 2).toPrecision(6))} m) either way: the centre of mass must lie between the wheels`,
      unit: "m",
    });
  }
}

/**
 * The weight's moment that holds a robot's wheels on the ground on one side: about the line of
 * the other side's wheel contacts (gillespie-vehicle-dynamics, quasi-static rollover).
 *
 * Formula: $M_r = m\,g\,(t/2 + y_c)$ to lift the left side, $m\,g\,(t/2 - y_c)$ to lift the right side
 *
 * @param robotMass m [kg], greater than 0
 * @param trackWidth t, between the left and right wheel contact lines [m], greater than 0
 * @param comOffset y_c, centre of mass to the LEFT of the centreline [m], less than t/2 either way (default 0)
 * @param side the side that would lift: "left" or "right"
 * @returns M_r [N·m]
 *
 * Assumptions: flat ground, rigid robot and tyres, g = g_n.
 * @example
 * weightRestoringMoment({ robotMass: 10, trackWidth: 0.3, side: "left" }) // → 14.71
 * Sources: gillespie-vehicle-dynamics, cgpm-1901.
 */
export function weightRestoringMoment(input: { robotMass: number; trackWidth: number; comOffset?: number; side: Side }): number {
  const fields = requireInputObject(input);
  const { robotMass, trackWidth } = fields;
  const comOffset = fields.comOffset ?? 0;
  requirePositive("robotMass", robotMass, "kg");
  requirePositive("trackWidth", trackWidth, "m");
  requireComInsideTrack(comOffset, trackWidth);
  const side = requireOption("side", fields.side, SIDE_OPTIONS);
  const arm = side === "left" ? trackWidth / 2 + comOffset : trackWidth / 2 - comOffset;
  return requireFiniteResult(robotMass * STANDARD_GRAVITY * arm, "restoring moment", { robotMass: [robotMass, "kg"], trackWidth: [trackWidth, "m"] }); // gillespie-vehicle-dynamics: m·g·t/2
}

/** The two sides, as choices. */
export const SIDE_OPTIONS = [
  { value: "left", label: "Left" },
  { value: "right", label: "Right" },
] as const satisfies readonly ChoiceOption[];

/** The two turn directions, as choices. */
export const TURN_OPTIONS = [
  { value: "left", label: "Turning left" },
  { value: "right", label: "Turning right" },
] as const satisfies readonly ChoiceOption[];

/** Where a turn in one direction lifts the robot. */
export interface TurnLift {
  /** The turn direction. */
  turn: "left" | "right";
  /** The yaw rate at which the wheels of `side` lift [rad/s]; null when no turn rate lifts them (the moments cancel). */
  liftTurnRate: number | null;
  /** The side that lifts; null when none does. */
  side: Side | null;
  /** Whether that side is on the inside or the outside of the turn; null when none lifts. */
  wheel: "inner" | "outer" | null;
  /** Roll moment per unit yaw rate in this direction, positive lifting the left wheels [N·m·s]. */
  rollMomentPerTurnRate: number;
  /** The weight's moment that holds the lifting side down [N·m]; null when none lifts. */
  restoringMoment: number | null;
}

/**
 * The yaw rate at which a robot carrying a horizontal-axle weapon lifts its wheels on one side,
 * for a turn to the left or to the right: where the roll moment of `rollMomentWhileTurning`
 * reaches the weight's restoring moment (meriam-kraige-dynamics, gillespie-vehicle-dynamics,
 * irodov-problems-general-physics).
 *
 * Formula: $\dot\psi_{lift} = \dfrac{m\,g\,(t/2 \pm y_c)}{|s\,J\,\Omega + m\,v\,h|}$
 *
 * @param inertia J [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], 0 or more
 * @param spin a value of `HORIZONTAL_SPIN_OPTIONS`
 * @param robotMass m [kg], greater than 0
 * @param trackWidth t [m], greater than 0
 * @param comHeight h [m], 0 or more (default 0)
 * @param comOffset y_c, to the left [m], less than t/2 either way (default 0)
 * @param forwardSpeed v [m/s], signed (default 0)
 * @param turn "left" or "right"
 * @returns the lift yaw rate [rad/s], the side that lifts and whether it is the inner or outer side; the rate
 *   and side are null when no turn lifts a wheel (the moments cancel, or so nearly that the rate would pass
 *   the largest representable number)
 *
 * Which side lifts: the weapon's moment lifts the OUTER wheels when its front edge moves up and
 * the INNER wheels when it moves down, whichever way the robot turns; the centrifugal moment of
 * a turn taken going forwards lifts the inner wheels. So they add for a front-down weapon and
 * oppose for a front-up one.
 * Assumptions: as `rollMomentWhileTurning`; quasi-static (the robot's roll inertia and the
 * suspension, if any, are ignored).
 * @example
 * liftTurnRate({ inertia: 0.01, spinSpeed: 500, spin: "front-up", robotMass: 10, trackWidth: 0.3, turn: "left" })
 * // → { liftTurnRate: 2.942, side: "right", wheel: "outer", … }
 * Sources: meriam-kraige-dynamics, gillespie-vehicle-dynamics, irodov-problems-general-physics.
 */
export function liftTurnRate(input: {
  inertia: number;
  spinSpeed: number;
  spin: string;
  robotMass: number;
  trackWidth: number;
  comHeight?: number;
  comOffset?: number;
  forwardSpeed?: number;
  turn: string;
}): TurnLift {
  const fields = requireInputObject(input);
  const turn = requireOption("turn", fields.turn, TURN_OPTIONS);
  const direction = turn === "left" ? 1 : -1;
  const perRate = rollMomentWhileTurning({
    inertia: fields.inertia,
    spinSpeed: fields.spinSpeed,
    spin: fields.spin,
    turnRate: direction,
    robotMass: fields.robotMass,
    forwardSpeed: fields.forwardSpeed,
    comHeight: fields.comHeight,
  }).total;
  requirePositive("trackWidth", fields.trackWidth, "m");
  const comOffset = fields.comOffset ?? 0;
  requireComInsideTrack(comOffset, fields.trackWidth);
  if (perRate === 0) return { turn, liftTurnRate: null, side: null, wheel: null, rollMomentPerTurnRate: 0, restoringMoment: null };
  // Stryker disable next-line EqualityOperator: equivalent, perRate is not 0 here (the line above returns for it)
  const side: Side = perRate > 0 ? "left" : "right";
  const restoringMoment = weightRestoringMoment({ robotMass: fields.robotMass, trackWidth: fields.trackWidth, comOffset, side });
  const rate = restoringMoment / Math.abs(perRate); // gillespie-vehicle-dynamics: lift when the roll moment reaches m·g·t/2
  // A roll moment so small that the lift rate passes the largest double: no representable turn lifts the wheels.
  if (!Number.isFinite(rate)) return { turn, liftTurnRate: null, side: null, wheel: null, rollMomentPerTurnRate: perRate, restoringMoment: null };
  return { turn, liftTurnRate: rate, side, wheel: side === turn ? "inner" : "outer", rollMomentPerTurnRate: perRate, restoringMoment };
}

// ---------------------------------------------------------------------------------------------
// Differential-drive turn rate.

/**
 * Forward speed and yaw rate of a differential-drive robot from its two wheel speeds
 * (siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics).
 *
 * Formula: $v = \dfrac{v_R + v_L}{2}$, $\dot\psi = \dfrac{v_R - v_L}{t}$
 *
 * @param leftWheelSpeed v_L, ground speed of the left wheels [m/s], signed
 * @param rightWheelSpeed v_R, ground speed of the right wheels [m/s], signed
 * @param trackWidth t, the FULL distance between the left and right wheel contacts [m], greater than 0
 * @returns forwardSpeed v [m/s] and turnRate ψ̇ [rad/s], positive turning left
 *
 * Assumptions: rolling without slip at the wheel contacts; a skid-steered robot with more than two
 * wheels per side turns more slowly than this (its wheels scrub).
 * @example
 * differentialDriveTurnRate({ leftWheelSpeed: 1, rightWheelSpeed: 2, trackWidth: 0.25 }) // → { forwardSpeed: 1.5, turnRate: 4 }
 * Sources: siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics.
 */
export function differentialDriveTurnRate(input: { leftWheelSpeed: number; rightWheelSpeed: number; trackWidth: number }): {
  forwardSpeed: number;
  turnRate: number;
} {
  const { leftWheelSpeed, rightWheelSpeed, trackWidth } = requireInputObject(input);
  requireFinite("leftWheelSpeed", leftWheelSpeed, "m/s");
  requireFinite("rightWheelSpeed", rightWheelSpeed, "m/s");
  requirePositive("trackWidth", trackWidth, "m");
  const named = { leftWheelSpeed: [leftWheelSpeed, "m/s"], rightWheelSpeed: [rightWheelSpeed, "m/s"], trackWidth: [trackWidth, "m"] } as const;
  return {
    // Halved before the sum, so it stays within the largest double for any finite wheel speeds.
    forwardSpeed: leftWheelSpeed / 2 + rightWheelSpeed / 2, // dudek-jenkin-mobile-robotics: v = (V_r + V_l)/2
    turnRate: requireFiniteResult((rightWheelSpeed - leftWheelSpeed) / trackWidth, "turn rate", named), // dudek-jenkin-mobile-robotics: ω = (V_r − V_l)/l
  };
}

/**
 * The largest yaw rate a differential drive reaches at a given forward speed, with the faster
 * wheel at its top ground speed: in place (v = 0) the wheels run at ±v_max
 * (siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics).
 *
 * Formula: $\dot\psi_{max} = \dfrac{2\,(v_{max} - |v|)}{t}$
 *
 * @param wheelTopSpeed v_max, the wheels' top ground speed [m/s], greater than 0
 * @param trackWidth t [m], greater than 0
 * @param forwardSpeed v [m/s], at most v_max either way (default 0)
 * @returns ψ̇_max [rad/s]
 *
 * Assumptions: as `differentialDriveTurnRate`; the wheels can reach their top speed in both
 * directions and the tyres do not slip.
 * @example
 * driveTurnRateLimit({ wheelTopSpeed: 3, trackWidth: 0.3 }) // → 20
 * Sources: siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics.
 */
export function driveTurnRateLimit(input: { wheelTopSpeed: number; trackWidth: number; forwardSpeed?: number }): number {
  const fields = requireInputObject(input);
  const { wheelTopSpeed, trackWidth } = fields;
  const forwardSpeed = fields.forwardSpeed ?? 0;
  requirePositive("wheelTopSpeed", wheelTopSpeed, "m/s");
  requirePositive("trackWidth", trackWidth, "m");
  requireFinite("forwardSpeed", forwardSpeed, "m/s");
  if (!(Math.abs(forwardSpeed) <= wheelTopSpeed)) {
    throw new CalcInputError({
      param: "forwardSpeed",
      value: forwardSpeed,
      expected: `at most the wheels' top speed (${Number(wheelTopSpeed.toPrecision(6))} m/s) either way`,
      unit: "m/s",
    });
  }
  // dudek-jenkin-mobile-robotics: v_R = v + ψ̇·t/2 ≤ v_max, v_L = v − ψ̇·t/2 ≥ −v_max
  return requireFiniteResult((2 * (wheelTopSpeed - Math.abs(forwardSpeed))) / trackWidth, "drive turn rate", {
    wheelTopSpeed: [wheelTopSpeed, "m/s"],
    trackWidth: [trackWidth, "m"],
  });
}

// ---------------------------------------------------------------------------------------------
