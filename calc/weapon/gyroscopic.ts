/**
 * Gyroscopic loads of a spinning weapon in motion: the moment needed to turn a spinning rotor's
 * axle, which way it pushes the robot, the turn rate at which a robot carrying a horizontal-axle
 * weapon lifts its wheels on one side (with the centrifugal moment of a turn taken at speed), the
 * turn rate a differential drive can reach, and the precession of a spinner tilted by a hit.
 *
 * Axes (those of ISO 8855 road vehicles): x forward, y to the left, z up, fixed to the robot.
 * Rates follow the right-hand rule: a positive yaw rate turns the robot to the LEFT, a positive
 * roll rate (about x) lifts the LEFT side, a positive pitch rate (about y) lowers the nose. The
 * rotor's angular momentum H is constant in size; turning the axle at rate ω needs the moment
 * dH/dt = ω × H on the rotor, so the rotor pushes the robot with −ω × H = H × ω (steady
 * precession, axle at 90° to the turn axis).
 *
 * SI in and out: kg·m², rad/s, N·m, N·m·s, m, m/s, kg, s.
 */
import { STANDARD_GRAVITY } from "../constants.ts";
import { CalcInputError, requireFinite, requireNonNegative, requirePositive } from "../errors.ts";
import { defineInputs } from "../inputs.ts";
import { rpmToRadPerSecond } from "../units.ts";
import { type ChoiceOption, ratioOrNull, requireDeclaredInputs, requireFiniteResult, requireInputObject, requireOption, type Verdict } from "./common.ts";

// ---------------------------------------------------------------------------------------------
// Choices and direction words.

/** Where the weapon's spin axis points. */
export const AXLE_OPTIONS = [
  { value: "horizontal", label: "Horizontal axle across the robot (vertical disc, drum, bar)" },
  { value: "vertical", label: "Vertical axle (horizontal spinner)" },
  { value: "whole-body", label: "The whole robot spins (vertical axis)" },
] as const satisfies readonly ChoiceOption[];

export type AxleOrientation = (typeof AXLE_OPTIONS)[number]["value"];

/** Spin direction of a weapon on a horizontal axle across the robot. */
export const HORIZONTAL_SPIN_OPTIONS = [
  { value: "front-up", label: "The weapon's front edge moves up" },
  { value: "front-down", label: "The weapon's front edge moves down" },
] as const satisfies readonly ChoiceOption[];

export type HorizontalSpin = (typeof HORIZONTAL_SPIN_OPTIONS)[number]["value"];

/** Spin direction of a weapon (or a whole robot) turning about a vertical axis, seen from above. */
export const VERTICAL_SPIN_OPTIONS = [
  { value: "counterclockwise", label: "Counter-clockwise, seen from above" },
  { value: "clockwise", label: "Clockwise, seen from above" },
] as const satisfies readonly ChoiceOption[];

export type VerticalSpin = (typeof VERTICAL_SPIN_OPTIONS)[number]["value"];

/** How the robot moves (or is pushed to move), in its own axes. */
export const ROBOT_MOTION_OPTIONS = [
  { value: "yaw-left", label: "Turning left (yaw)" },
  { value: "yaw-right", label: "Turning right (yaw)" },
  { value: "left-up", label: "Left side rising (roll)" },
  { value: "right-up", label: "Right side rising (roll)" },
  { value: "nose-up", label: "Nose rising (pitch)" },
  { value: "nose-down", label: "Nose dropping (pitch)" },
] as const satisfies readonly ChoiceOption[];

export type RobotMotion = (typeof ROBOT_MOTION_OPTIONS)[number]["value"];

/** A side of the robot. */
export type Side = "left" | "right";

type Vector = readonly [number, number, number];

const MOTION_AXIS: Record<RobotMotion, Vector> = {
  "yaw-left": [0, 0, 1],
  "yaw-right": [0, 0, -1],
  "left-up": [1, 0, 0],
  "right-up": [-1, 0, 0],
  "nose-down": [0, 1, 0],
  "nose-up": [0, -1, 0],
};

function cross(a: Vector, b: Vector): Vector {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Unit vector of the rotor's angular momentum for an axle and a spin direction. */
function spinAxis(axle: AxleOrientation, spin: string): Vector {
  if (axle === "horizontal") {
    // Front edge (at +x) moving up (+z): ω × x̂ = ẑ needs ω along −ŷ.
    return requireOption("spin", spin, HORIZONTAL_SPIN_OPTIONS) === "front-up" ? [0, -1, 0] : [0, 1, 0];
  }
  return requireOption("spin", spin, VERTICAL_SPIN_OPTIONS) === "counterclockwise" ? [0, 0, 1] : [0, 0, -1];
}

/** The motion word of a unit rotation vector along one axis, or null for the zero vector. */
function motionOf(v: Vector): RobotMotion | null {
  for (const option of ROBOT_MOTION_OPTIONS) {
    const axis = MOTION_AXIS[option.value];
    if (axis[0] * v[0] + axis[1] * v[1] + axis[2] * v[2] > 0.5) return option.value;
  }
  return null;
}

// ---------------------------------------------------------------------------------------------
// Angular momentum, gyroscopic moment and the force pair on the bearings.

/**
 * Angular momentum of a rotor about its spin axis (meriam-kraige-dynamics).
 *
 * Formula: $H = J\,\Omega$
 *
 * @param inertia J, the rotor about its spin axis [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], 0 or more
 * @returns H [N·m·s]
 *
 * Assumptions: the rotor spins about a principal axis; the robot's own slow motions add nothing.
 * @example
 * angularMomentum({ inertia: 0.01, spinSpeed: 500 }) // → 5
 * Sources: meriam-kraige-dynamics.
 */
export function angularMomentum(input: { inertia: number; spinSpeed: number }): number {
  const { inertia, spinSpeed } = requireInputObject(input);
  requirePositive("inertia", inertia, "kg·m²");
  requireNonNegative("spinSpeed", spinSpeed, "rad/s");
  return requireFiniteResult(inertia * spinSpeed, "angular momentum", { inertia: [inertia, "kg·m²"], spinSpeed: [spinSpeed, "rad/s"] }); // meriam-kraige-dynamics: H = IΩ
}

/**
 * Gyroscopic moment: the moment that turns a spinning rotor's axle at a steady rate about an axis
 * at right angles to it; the rotor pushes back on its mounts with the same moment
 * (meriam-kraige-dynamics, khurmi-gupta-theory-of-machines).
 *
 * Formula: $M = J\,\Omega\,q$ (vector form $\vec M = \vec q \times \vec H$)
 *
 * @param inertia J, the rotor about its spin axis [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], 0 or more
 * @param turnRate q, the rate the axle is turned at, about an axis at 90° to the spin axis [rad/s], 0 or more
 * @returns M [N·m]
 *
 * Assumptions: steady precession (q constant), spin axis perpendicular to the turn axis (for an
 * angle θ between them multiply by sin θ), Ω ≫ q so the rotor's angular momentum about the turn
 * axis is negligible. Direction: see `gyroscopicReaction`.
 * @example
 * gyroscopicMoment({ inertia: 0.01, spinSpeed: 500, turnRate: 5 }) // → 25
 * Sources: meriam-kraige-dynamics, khurmi-gupta-theory-of-machines.
 */
export function gyroscopicMoment(input: { inertia: number; spinSpeed: number; turnRate: number }): number {
  const { inertia, spinSpeed, turnRate } = requireInputObject(input);
  requirePositive("inertia", inertia, "kg·m²");
  requireNonNegative("spinSpeed", spinSpeed, "rad/s");
  requireNonNegative("turnRate", turnRate, "rad/s");
  const moment = inertia * spinSpeed * turnRate; // khurmi-gupta-theory-of-machines: C = I·ω·ω_P
  return requireFiniteResult(moment, "gyroscopic moment", { inertia: [inertia, "kg·m²"], spinSpeed: [spinSpeed, "rad/s"], turnRate: [turnRate, "rad/s"] });
}

/**
 * The force pair two bearings carry when a moment acts on the shaft between them: equal forces
 * in opposite directions, one on each bearing (khurmi-gupta-theory-of-machines, Ex. 14.2).
 *
 * Formula: $F = \dfrac{M}{L}$
 *
 * @param moment M, e.g. the gyroscopic moment [N·m], 0 or more
 * @param bearingSpan L, distance between the two bearings [m], greater than 0
 * @returns F on each bearing [N], added to (one) and taken from (the other) the steady loads
 *
 * Assumptions: two simple (self-aligning) supports; a moment carried by the bearings' own tilt
 * stiffness is ignored.
 * @example
 * bearingForcePair({ moment: 9.2, bearingSpan: 0.1 }) // → 92
 * Sources: khurmi-gupta-theory-of-machines.
 */
export function bearingForcePair(input: { moment: number; bearingSpan: number }): number {
  const { moment, bearingSpan } = requireInputObject(input);
  requireNonNegative("moment", moment, "N·m");
  requirePositive("bearingSpan", bearingSpan, "m");
  return requireFiniteResult(moment / bearingSpan, "bearing force", { moment: [moment, "N·m"], bearingSpan: [bearingSpan, "m"] }); // khurmi-gupta-theory-of-machines: F = C/x
}

/** The moment a spinning rotor puts on the robot while the robot turns, and what it does. */
export interface GyroscopicReaction {
  /** Size of the moment on the robot, J·Ω·rate [N·m]. */
  moment: number;
  /** The motion the moment pushes the robot into; null when the turn axis is the spin axis (no moment). */
  effect: RobotMotion | null;
}

/**
 * Which way a spinning weapon pushes the robot when the robot turns, rolls or pitches, and how
 * hard (meriam-kraige-dynamics: M = Ω × H on the rotor; the robot feels −Ω × H).
 *
 * Formula: $\vec M_{robot} = \vec H \times \vec\omega$, with $|\vec M| = J\,\Omega\,\omega$ when they are at 90°
 *
 * @param axle a value of `AXLE_OPTIONS`
 * @param spin a value of `HORIZONTAL_SPIN_OPTIONS` (horizontal axle) or `VERTICAL_SPIN_OPTIONS` (vertical axle, whole body)
 * @param motion a value of `ROBOT_MOTION_OPTIONS`: how the robot moves
 * @param inertia J [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], 0 or more
 * @param rate ω, the rate of that motion [rad/s], 0 or more
 * @returns the moment [N·m] and the motion it pushes the robot into (null when the motion is about the spin axis)
 *
 * Assumptions: as `gyroscopicMoment`. Examples of the directions: a weapon whose front edge
 * moves up, on a robot turning left, rolls the robot onto its left side (the right wheels
 * lift); the same weapon on a robot whose left side rises pushes the robot to turn left; a
 * horizontal spinner turning counter-clockwise seen from above, lifted at the nose, rolls
 * the robot's left side up.
 * @example
 * gyroscopicReaction({ axle: "horizontal", spin: "front-up", motion: "yaw-left", inertia: 0.01, spinSpeed: 500, rate: 5 })
 * // → { moment: 25, effect: "right-up" }
 * Sources: meriam-kraige-dynamics.
 */
export function gyroscopicReaction(input: {
  axle: string;
  spin: string;
  motion: string;
  inertia: number;
  spinSpeed: number;
  rate: number;
}): GyroscopicReaction {
  const fields = requireInputObject(input);
  const axle = requireOption("axle", fields.axle, AXLE_OPTIONS);
  const h = spinAxis(axle, fields.spin);
  const motion = requireOption("motion", fields.motion, ROBOT_MOTION_OPTIONS);
  const { inertia, spinSpeed, rate } = fields;
  requirePositive("inertia", inertia, "kg·m²");
  requireNonNegative("spinSpeed", spinSpeed, "rad/s");
  requireNonNegative("rate", rate, "rad/s");
  const moment = requireFiniteResult(inertia * spinSpeed * rate, "gyroscopic moment", {
    inertia: [inertia, "kg·m²"],
    spinSpeed: [spinSpeed, "rad/s"],
    rate: [rate, "rad/s"],
  }); // meriam-kraige-dynamics: |M| = IΩp
  const direction = motionOf(cross(h, MOTION_AXIS[motion])); // meriam-kraige-dynamics: robot feels H × ω
  return { moment: direction === null ? 0 : moment, effect: direction };
}

// ---------------------------------------------------------------------------------------------
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

function requireComInsideTrack(comOffset: number, trackWidth: number): void {
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
    forwardSpeed: requireFiniteResult(leftWheelSpeed / 2 + rightWheelSpeed / 2, "forward speed", named), // dudek-jenkin-mobile-robotics: v = (V_r + V_l)/2
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
// Precession of a spinner tilted by a moment.

/**
 * Precession rate of a spinning body under a moment at right angles to its spin axis: a
 * whole-body spinner (or a robot carrying a large rotor) hit so as to tilt it turns its axis
 * sideways at this rate instead of tipping over (khurmi-gupta-theory-of-machines Ex. 14.1,
 * meriam-kraige-dynamics).
 *
 * Formula: $\Omega_p = \dfrac{M}{J\,\Omega}$
 *
 * @param moment M, the tilting moment [N·m], 0 or more
 * @param inertia J, about the spin axis [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], greater than 0
 * @returns Ω_p [rad/s]
 *
 * Assumptions: steady precession of a fast top (J·Ω much larger than the body's angular momentum
 * about the other axes), axis at 90° to the moment, nutation ignored.
 * @example
 * precessionRate({ moment: 30, inertia: 0.05, spinSpeed: 209.44 }) // → 2.865
 * Sources: khurmi-gupta-theory-of-machines, meriam-kraige-dynamics.
 */
export function precessionRate(input: { moment: number; inertia: number; spinSpeed: number }): number {
  const { moment, inertia, spinSpeed } = requireInputObject(input);
  requireNonNegative("moment", moment, "N·m");
  requirePositive("inertia", inertia, "kg·m²");
  requirePositive("spinSpeed", spinSpeed, "rad/s");
  const named = { moment: [moment, "N·m"], inertia: [inertia, "kg·m²"], spinSpeed: [spinSpeed, "rad/s"] } as const;
  const h = requireFiniteResult(inertia * spinSpeed, "angular momentum", named);
  return requireFiniteResult(moment / h, "precession rate", named); // khurmi-gupta-theory-of-machines: ω_P = C/(I·ω)
}

/**
 * Time a spinner takes to precess through an angle under a steady tilting moment
 * (khurmi-gupta-theory-of-machines, meriam-kraige-dynamics).
 *
 * Formula: $t = \dfrac{\theta}{\Omega_p} = \dfrac{\theta\,J\,\Omega}{M}$
 *
 * @param angle θ [rad], greater than 0
 * @param moment M [N·m], greater than 0
 * @param inertia J [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], greater than 0
 * @returns t [s]
 *
 * Assumptions: as `precessionRate`, with M held for the whole time.
 * @example
 * precessionTime({ angle: 0.5, moment: 30, inertia: 0.05, spinSpeed: 209.44 }) // → 0.1745
 * Sources: khurmi-gupta-theory-of-machines, meriam-kraige-dynamics.
 */
export function precessionTime(input: { angle: number; moment: number; inertia: number; spinSpeed: number }): number {
  const { angle, moment, inertia, spinSpeed } = requireInputObject(input);
  requirePositive("angle", angle, "rad");
  requirePositive("moment", moment, "N·m");
  const rate = precessionRate({ moment, inertia, spinSpeed });
  const named = { angle: [angle, "rad"], moment: [moment, "N·m"], inertia: [inertia, "kg·m²"], spinSpeed: [spinSpeed, "rad/s"] } as const;
  // An underflowed rate (0) is a precession too slow to represent: name the input that caused it.
  return requireFiniteResult(rate === 0 ? Number.POSITIVE_INFINITY : angle / rate, "precession time", named);
}

// ---------------------------------------------------------------------------------------------
// The calculator: turning with a spinning weapon.

/** Choice defaults of the turn check (the numeric defaults are in `weaponTurnInputs`). */
export const WEAPON_TURN_CHOICE_DEFAULTS = { axle: "horizontal", horizontalSpin: "front-up", verticalSpin: "counterclockwise" } as const satisfies {
  axle: AxleOrientation;
  horizontalSpin: HorizontalSpin;
  verticalSpin: VerticalSpin;
};

/** Default lift margin: the robot should lift only at 1.5 times the fastest turn it can make (a choice, see the help text). */
export const DEFAULT_LIFT_MARGIN = 1.5;

/**
 * Numeric inputs of the turn check, in SI. Choices: `AXLE_OPTIONS`, `HORIZONTAL_SPIN_OPTIONS`,
 * `VERTICAL_SPIN_OPTIONS`. Defaults: the invented demo robot of `DEMO_VERTICAL_SPINNER_TURN`.
 */
export const weaponTurnInputs = defineInputs({
  rotorInertia: {
    label: "Rotor inertia",
    kind: "inertia",
    min: 1e-7,
    max: 50,
    default: 0.010125,
    urlKey: "J",
    help: "Moment of inertia of everything that spins, about the spin axis (for a whole-body spinner, the whole robot).",
  },
  weaponSpeed: {
    label: "Weapon speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(10),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(8000),
    urlKey: "rpm",
    help: "The spin speed while you drive.",
  },
  robotMass: {
    label: "Robot mass",
    kind: "mass",
    min: 0.05,
    max: 1000,
    default: 13.6,
    urlKey: "m",
    help: "The whole robot, weapon included.",
  },
  trackWidth: {
    label: "Track width",
    kind: "length",
    min: 0.01,
    max: 5,
    default: 0.28,
    urlKey: "t",
    help: "From the left wheels' ground contact to the right wheels' ground contact.",
  },
  comHeight: {
    label: "Centre-of-mass height",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.045,
    urlKey: "h",
    help: "Height of the whole robot's centre of mass above the ground.",
  },
  comOffset: {
    label: "Centre-of-mass offset to the left",
    kind: "length",
    min: -2.5,
    max: 2.5,
    default: 0,
    urlKey: "yc",
    help: "How far the centre of mass sits left of the centreline between the wheels (negative: to the right). It must lie between the wheels.",
  },
  forwardSpeed: {
    label: "Forward speed while turning",
    kind: "speed",
    min: -50,
    max: 50,
    default: 1,
    urlKey: "v",
    help: "Speed along the path while turning (negative when reversing); a turn at speed adds a centrifugal moment. At most the wheels' top speed.",
  },
  wheelTopSpeed: {
    label: "Wheel top speed",
    kind: "speed",
    min: 0.01,
    max: 50,
    default: 3.5,
    urlKey: "vw",
    help: "The drive's top ground speed; spinning in place, the wheels run at this speed in opposite directions.",
  },
  turnRate: {
    label: "Turn rate",
    kind: "angularSpeed",
    min: 0,
    max: 200,
    default: rpmToRadPerSecond(60),
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "yaw",
    help: "A yaw rate you want the numbers for, e.g. your transmitter's turn-rate limit or a measured turn; checked in both directions.",
  },
  tiltRate: {
    label: "Pitch or roll rate",
    kind: "angularSpeed",
    min: 0,
    max: 200,
    default: 3,
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "tilt",
    help: "How fast the robot tips when lifted by a wedge, hit from below or landing. For a vertical axle, pitching rolls the robot.",
  },
  bearingSpan: {
    label: "Bearing span",
    kind: "length",
    min: 0.002,
    max: 2,
    default: 0.05,
    urlKey: "L",
    help: "Distance between the two bearings that carry the weapon; the gyroscopic moment loads them as an opposite pair of forces.",
  },
  tiltingMoment: {
    label: "Tilting moment",
    kind: "torque",
    min: 0,
    max: 1e5,
    default: 20,
    urlKey: "Mt",
    help: "A moment trying to tip the spinning axis, e.g. a hit below the centre of mass: it makes the spinner precess.",
  },
  precessionAngle: {
    label: "Precession angle",
    kind: "angle",
    min: 0,
    minOpen: true,
    max: 2 * Math.PI,
    default: Math.PI / 12,
    urlKey: "ang",
    help: "The angle through which the precession time is reported.",
  },
  liftMargin: {
    label: "Lift margin",
    kind: "fraction",
    min: 1,
    max: 10,
    default: DEFAULT_LIFT_MARGIN,
    unit: { metric: "frac", us: "frac" },
    urlKey: "mg",
    help: "How many times the fastest turn (or tilt) the wheels should stay down for: between 1 and this the margin is called thin.",
  },
});

export type WeaponTurnInput = { [K in keyof typeof weaponTurnInputs]: number } & {
  /** A value of `AXLE_OPTIONS`. */
  axle: string;
  /** A value of `HORIZONTAL_SPIN_OPTIONS`; read for a horizontal axle only. */
  horizontalSpin: string;
  /** A value of `VERTICAL_SPIN_OPTIONS`; read for a vertical axle or a whole-body spinner only. */
  verticalSpin: string;
};

/** The turn part of the check (not made for a whole-body spinner). */
export interface WeaponTurnSection {
  /** The turn rate entered [rad/s]. */
  turnRate: number;
  /** Gyroscopic moment at that turn rate: J·Ω·ψ̇ for a horizontal axle, 0 for a vertical one [N·m]. */
  gyroscopicMoment: number;
  /** What that moment does while turning left (turning right does the opposite); null for a vertical axle. */
  gyroscopicEffectTurningLeft: RobotMotion | null;
  /** Centrifugal overturning moment at that turn rate and the forward speed, m·|v|·ψ̇·h [N·m]. */
  centrifugalMoment: number;
  /** Force pair on the weapon's bearings at that turn rate [N]. */
  bearingForce: number;
  /** Turning left and turning right at the forward speed. */
  left: TurnLift;
  right: TurnLift;
  /** The lower of the two lift turn rates [rad/s]; null when no turn lifts a wheel. */
  liftTurnRate: number | null;
  /** The turn that lifts first; null when none does. */
  liftTurn: "left" | "right" | null;
  /** Fastest turn the drive reaches at the forward speed, 2(v_max − |v|)/t [rad/s]. */
  driveTurnRate: number;
  /** Fastest turn in place, 2·v_max/t [rad/s]. */
  driveTurnRateInPlace: number;
  /** True when the turn rate entered lifts a wheel in at least one direction. */
  turnRateLifts: boolean;
  /** True when the drive's fastest turn lifts a wheel in at least one direction. */
  driveTurnLifts: boolean;
  /** Lift turn rate ÷ the larger of the drive's turn rate and the turn rate entered [-]; null when none lifts or neither turns (or the quotient passes the largest double). */
  margin: number | null;
}

/** The tilt part: what a pitch or roll rate does. */
export interface WeaponTiltSection {
  /** The pitch or roll rate entered [rad/s]. */
  tiltRate: number;
  /** J·Ω·rate [N·m]. */
  moment: number;
  /** Force pair on the weapon's bearings [N]; null for a whole-body spinner (no weapon bearings). */
  bearingForce: number | null;
  /** What the moment does when the nose rises. */
  whenNoseRises: RobotMotion | null;
  /** What the moment does when the left side rises. */
  whenLeftSideRises: RobotMotion | null;
  /** Vertical axes only: the pitch rate at which the roll it causes lifts a side, m·g·(t/2 − |y_c|)/(J·Ω) [rad/s]; null for a horizontal axle (it yaws instead). */
  liftTiltRate: number | null;
  /** Lift pitch rate ÷ the rate entered [-]; null when not applicable or the rate is 0 (or so small the quotient passes the largest double). */
  margin: number | null;
}

/** The result of `weaponTurnCheck`. */
export interface WeaponTurnCheck {
  axle: AxleOrientation;
  /** The spin direction read (horizontal or vertical option, by axle). */
  spin: HorizontalSpin | VerticalSpin;
  /** H = J·Ω [N·m·s]. */
  angularMomentum: number;
  /** Null for a whole-body spinner. */
  turn: WeaponTurnSection | null;
  tilt: WeaponTiltSection;
  precession: {
    /** The tilting moment entered [N·m]. */
    tiltingMoment: number;
    /** Ω_p = M/(J·Ω) [rad/s]. */
    rate: number;
    /** The angle entered [rad]. */
    angle: number;
    /** Time to precess through it [s]; null when the moment is 0 (or so small the time passes the largest double). */
    time: number | null;
  };
  verdict: Verdict;
  /** Which check decides the verdict; null when nothing lifts. */
  governs: "turn" | "tilt" | null;
  /** One or two sentences: why. */
  reason: string;
}

function ratioText(x: number): string {
  return Number(x.toPrecision(2)).toString();
}

/**
 * Turning with a spinning weapon: the gyroscopic and centrifugal moments at a turn, the turn rate
 * at which a wheel lifts (each way) against the turn rate the drive can reach, what a pitch or
 * roll does, the bearing force pair, and how fast a tilted spinner precesses
 * (meriam-kraige-dynamics, khurmi-gupta-theory-of-machines, gillespie-vehicle-dynamics,
 * siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics).
 *
 * Formula: $M_g = J\Omega\dot\psi$, $\dot\psi_{lift} = \dfrac{m g (t/2 \pm y_c)}{|s J\Omega + m v h|}$,
 * $\dot\psi_{drive} = \dfrac{2(v_{max} - |v|)}{t}$, $F = M/L$, $\Omega_p = \dfrac{M_t}{J\Omega}$
 *
 * @param input the numeric fields of `weaponTurnInputs` (SI) plus `axle`, `horizontalSpin`, `verticalSpin`
 * @returns the turn section (horizontal and vertical axles), the tilt and precession sections, a verdict, what governs it and the reason
 *
 * Verdict (thresholds: 1 and `liftMargin`):
 * - turn (horizontal and vertical axles): margin = lowest lift turn rate ÷ the larger of the
 *   drive's fastest turn at the forward speed and the turn rate entered;
 * - tilt (vertical axle and whole body): margin = lift pitch rate ÷ the pitch rate entered;
 * - the smaller margin governs: at most 1 "fails" (a full-speed turn, or the rate entered, lifts
 *   a wheel), below `liftMargin` "marginal", otherwise "holds" (also when nothing lifts).
 * Assumptions: as `liftTurnRate` and `precessionRate`; for a vertical axle, turning makes no
 * gyroscopic moment (the turn is about the spin axis) and only the centrifugal moment can lift a
 * wheel in a turn; the lift pitch rate treats the robot as if all four corners were still on the
 * ground, so it is an estimate. Not modelled: bumps, the robot's roll inertia, tyre slip.
 * @example
 * weaponTurnCheck(DEMO_VERTICAL_SPINNER_TURN) // → { verdict: "fails", governs: "turn", … } (see the demo)
 * Sources: meriam-kraige-dynamics, khurmi-gupta-theory-of-machines, gillespie-vehicle-dynamics,
 * siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics.
 */
export function weaponTurnCheck(input: WeaponTurnInput): WeaponTurnCheck {
  const fields = requireInputObject(input);
  const axle = requireOption("axle", fields.axle, AXLE_OPTIONS);
  const spin =
    axle === "horizontal"
      ? requireOption("horizontalSpin", fields.horizontalSpin, HORIZONTAL_SPIN_OPTIONS)
      : requireOption("verticalSpin", fields.verticalSpin, VERTICAL_SPIN_OPTIONS);
  const v = requireDeclaredInputs(weaponTurnInputs, fields);
  requireComInsideTrack(v.comOffset, v.trackWidth);
  const J = v.rotorInertia;
  const omega = v.weaponSpeed;
  const angularMomentumValue = angularMomentum({ inertia: J, spinSpeed: omega });

  // Turn section.
  let turn: WeaponTurnSection | null = null;
  if (axle !== "whole-body") {
    const driveTurnRate = driveTurnRateLimit({ wheelTopSpeed: v.wheelTopSpeed, trackWidth: v.trackWidth, forwardSpeed: v.forwardSpeed });
    const driveTurnRateInPlace = driveTurnRateLimit({ wheelTopSpeed: v.wheelTopSpeed, trackWidth: v.trackWidth });
    // A vertical axle makes no gyroscopic moment in a turn (the turn is about the spin axis), so only
    // the centrifugal moment is left: the spin is set to 0 for the roll moment.
    const lift = (turnWay: "left" | "right"): TurnLift =>
      axle === "horizontal"
        ? liftTurnRate({
            inertia: J,
            spinSpeed: omega,
            spin,
            robotMass: v.robotMass,
            trackWidth: v.trackWidth,
            comHeight: v.comHeight,
            comOffset: v.comOffset,
            forwardSpeed: v.forwardSpeed,
            turn: turnWay,
          })
        : liftTurnRate({
            inertia: J,
            spinSpeed: 0,
            spin: "front-up",
            robotMass: v.robotMass,
            trackWidth: v.trackWidth,
            comHeight: v.comHeight,
            comOffset: v.comOffset,
            forwardSpeed: v.forwardSpeed,
            turn: turnWay,
          });
    const left = lift("left");
    const right = lift("right");
    const candidates = [left, right].filter((l) => l.liftTurnRate !== null);
    const first = candidates.length === 0 ? null : candidates.reduce((a, b) => (b.liftTurnRate! < a.liftTurnRate! ? b : a));
    const gyroscopic = axle === "horizontal" ? gyroscopicMoment({ inertia: J, spinSpeed: omega, turnRate: v.turnRate }) : 0;
    const reference = Math.max(driveTurnRate, v.turnRate);
    const lowest = first?.liftTurnRate ?? null;
    turn = {
      turnRate: v.turnRate,
      gyroscopicMoment: gyroscopic,
      gyroscopicEffectTurningLeft:
        axle === "horizontal" ? gyroscopicReaction({ axle, spin, motion: "yaw-left", inertia: J, spinSpeed: omega, rate: 1 }).effect : null,
      centrifugalMoment: v.robotMass * Math.abs(v.forwardSpeed) * v.turnRate * v.comHeight, // gillespie-vehicle-dynamics: m·v·ψ̇·h
      bearingForce: bearingForcePair({ moment: gyroscopic, bearingSpan: v.bearingSpan }),
      left,
      right,
      liftTurnRate: lowest,
      liftTurn: first?.turn ?? null,
      driveTurnRate,
      driveTurnRateInPlace,
      turnRateLifts: lowest !== null && v.turnRate >= lowest,
      driveTurnLifts: lowest !== null && driveTurnRate >= lowest,
      margin: lowest === null ? null : ratioOrNull(lowest, reference),
    };
  }

  // Tilt section.
  const tiltMoment = gyroscopicMoment({ inertia: J, spinSpeed: omega, turnRate: v.tiltRate });
  const reactionTo = (motion: RobotMotion) => gyroscopicReaction({ axle, spin, motion, inertia: J, spinSpeed: omega, rate: 1 }).effect;
  let liftTiltRate: number | null = null;
  if (axle !== "horizontal") {
    // khurmi-gupta-theory-of-machines: C = I·ω·ω_P about the roll axis; gillespie-vehicle-dynamics: lift at m·g·(t/2 − |y_c|)
    const weakerSide = weightRestoringMoment({ robotMass: v.robotMass, trackWidth: v.trackWidth, comOffset: Math.abs(v.comOffset), side: "right" });
    liftTiltRate = weakerSide / angularMomentumValue;
  }
  const tilt: WeaponTiltSection = {
    tiltRate: v.tiltRate,
    moment: tiltMoment,
    bearingForce: axle === "whole-body" ? null : bearingForcePair({ moment: tiltMoment, bearingSpan: v.bearingSpan }),
    whenNoseRises: reactionTo("nose-up"),
    whenLeftSideRises: reactionTo("left-up"),
    liftTiltRate,
    margin: liftTiltRate === null ? null : ratioOrNull(liftTiltRate, v.tiltRate),
  };

  const rate = precessionRate({ moment: v.tiltingMoment, inertia: J, spinSpeed: omega });
  const precession = {
    tiltingMoment: v.tiltingMoment,
    rate,
    angle: v.precessionAngle,
    // khurmi-gupta-theory-of-machines: t = θ/ω_P; null for no moment, or one so small the time passes the largest double
    time: ratioOrNull(v.precessionAngle * angularMomentumValue, v.tiltingMoment),
  };

  // Verdict: the smaller margin governs.
  const turnMargin = turn?.margin ?? null;
  const tiltMargin = tilt.margin;
  let governs: "turn" | "tilt" | null = null;
  if (turnMargin !== null && (tiltMargin === null || turnMargin <= tiltMargin)) governs = "turn";
  else if (tiltMargin !== null) governs = "tilt";
  const margin = governs === "turn" ? turnMargin! : governs === "tilt" ? tiltMargin! : null;
  const verdict: Verdict = margin === null ? "holds" : margin <= 1 ? "fails" : margin < v.liftMargin ? "marginal" : "holds";
  return {
    axle,
    spin,
    angularMomentum: angularMomentumValue,
    turn,
    tilt,
    precession,
    verdict,
    governs,
    reason: turnReason(verdict, governs, margin, turn, v.turnRate, v.liftMargin, axle),
  };
}

function turnReason(
  verdict: Verdict,
  governs: "turn" | "tilt" | null,
  margin: number | null,
  turn: WeaponTurnSection | null,
  turnRate: number,
  liftMargin: number,
  axle: AxleOrientation,
): string {
  if (governs === null || margin === null) {
    return axle === "whole-body"
      ? "Nothing entered tips the robot: with no pitch or roll rate, the spin makes no moment that could lift a side."
      : "No turn and no tilt entered lifts a wheel: the moments either cancel or nothing turns.";
  }
  if (governs === "turn" && turn) {
    const lifting = turn.liftTurn === "left" ? turn.left : turn.right;
    const which = turn.driveTurnRate >= turnRate ? "the drive's fastest turn" : "the turn rate entered";
    const what = `Turning ${turn.liftTurn} lifts the ${lifting.wheel} (${lifting.side}) wheels at ${ratioText(margin)} times ${which}`;
    if (verdict === "fails") return `${what}: a full turn lifts a wheel.`;
    if (verdict === "marginal") return `${what}: below the margin of ${ratioText(liftMargin)}, so a hard turn, a bump or a hit can lift a wheel.`;
    return `${what}: the wheels stay down with the margin of ${ratioText(liftMargin)} or more.`;
  }
  const what = `A pitch at the rate entered rolls the robot; a side lifts at ${ratioText(margin)} times that rate`;
  if (verdict === "fails") return `${what}: the pitch rate entered lifts a side.`;
  if (verdict === "marginal") return `${what}: below the margin of ${ratioText(liftMargin)}.`;
  return `${what}: the margin of ${ratioText(liftMargin)} is kept.`;
}

/**
 * An invented scenario (no real robot): a 13.6 kg robot carrying a 2.5 kg, 180 mm steel disc
 * (J = ½·m·r² = 0.010125 kg·m²) on a horizontal axle, front edge moving up at 8000 rpm; wheels
 * 280 mm apart with a 3.5 m/s top speed; centre of mass 45 mm up, on the centreline; turning at
 * 360 °/s while moving forward at 1 m/s; weapon bearings 50 mm apart. Result: H = 8.48 N·m·s;
 * the outer wheels lift from 2.37 rad/s (136 °/s) either way, 0.13 of the 17.9 rad/s the drive
 * reaches at 1 m/s, so the check fails: the weapon, not the drive, sets how fast this robot can
 * turn. For the chapter's worked example.
 */
export const DEMO_VERTICAL_SPINNER_TURN: WeaponTurnInput = {
  axle: "horizontal",
  horizontalSpin: "front-up",
  verticalSpin: "counterclockwise",
  rotorInertia: 0.010125,
  weaponSpeed: rpmToRadPerSecond(8000),
  robotMass: 13.6,
  trackWidth: 0.28,
  comHeight: 0.045,
  comOffset: 0,
  forwardSpeed: 1,
  wheelTopSpeed: 3.5,
  turnRate: 2 * Math.PI,
  tiltRate: 3,
  bearingSpan: 0.05,
  tiltingMoment: 20,
  precessionAngle: Math.PI / 12,
  liftMargin: DEFAULT_LIFT_MARGIN,
};
