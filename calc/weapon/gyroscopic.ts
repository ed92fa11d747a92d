import { requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { type ChoiceOption, requireChoice as requireOption } from "../core/choices.ts";

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
  // Stryker disable next-line ArithmeticOperator: equivalent, a is always a spin axis (along y or z), so a[0] = 0 and the term a[0]·b[2] is 0
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Unit vector of the rotor's angular momentum for an axle and a spin direction. */
export function spinAxis(axle: AxleOrientation, spin: string): Vector {
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
    // Stryker disable next-line EqualityOperator: equivalent, v is a unit axis or zero, so the dot product is exactly -1, 0 or 1, never 0.5
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
