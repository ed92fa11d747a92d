/**
 * What the calculator "turning with a spinning weapon" asks for: its choice defaults and numeric
 * input declarations, apart from the check itself (calc/weapon/turn-check.ts) so that a page that
 * only reads or writes a design's turn section does not carry the physics.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import type { AxleOrientation, HorizontalSpin, VerticalSpin } from "./gyroscopic.ts";

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
    urlKey: "fv",
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
