/**
 * Inputs of the steering-while-spinning simulation: one declaration (`steeringInputs`) that the
 * calculator's fields, its URL and the entry function's checks all read, the cross-field rules,
 * and an invented demo robot. SI throughout (angles in rad, rates in rad/s, the loop rate in Hz).
 */
import { CalcInputError, requireInRange } from "../core/errors.ts";
import { defineInputs, type InputSpec } from "../core/inputs.ts";
import { rpmToRadPerSecond, type QuantityKind } from "../core/units.ts";

const RPM = rpmToRadPerSecond(1);
const DEG = Math.PI / 180;

/** Numeric inputs of the steering simulation, in SI. Defaults are the invented demo robot (`DEMO_STEERING_SPINNER`). */
export const steeringInputs = defineInputs({
  spinSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 10 * RPM,
    max: 20000 * RPM,
    default: 3000 * RPM,
    urlKey: "rpm",
    help: "The steady spin the robot holds before it starts to translate; the drive's base duty is worked out from it.",
  },
  robotMass: { label: "Robot mass", kind: "mass", min: 0.05, max: 500, default: 1.5, urlKey: "mass", help: "The whole robot." },
  inertia: {
    label: "Robot inertia",
    kind: "inertia",
    min: 1e-6,
    max: 100,
    default: 0.005,
    unit: { metric: "kg·m2", us: "lb·in2" },
    urlKey: "j",
    help: "The whole robot about its centre of mass, wheels and motors included.",
  },
  wheelCount: {
    label: "Driven wheels",
    kind: "count",
    min: 1,
    max: 4,
    integer: true,
    default: 2,
    urlKey: "wheels",
    help: "Evenly spaced around the centre; one wheel rides with a skid opposite it.",
  },
  wheelRadius: { label: "Wheel radius", kind: "length", min: 0.002, max: 0.5, default: 0.018, urlKey: "rw", help: "Radius of a driven wheel." },
  wheelOffset: {
    label: "Wheel distance from centre",
    kind: "length",
    min: 0.005,
    max: 2,
    default: 0.07,
    urlKey: "offset",
    help: "From the centre of mass to each wheel's contact point (the skid of a one-wheel robot sits as far out on the other side).",
  },
  wheelInertia: {
    label: "Wheel inertia",
    kind: "inertia",
    min: 1e-8,
    max: 0.1,
    default: 4e-6,
    unit: { metric: "g·cm2", us: "oz·in2" },
    urlKey: "jw",
    help: "One driven wheel and its hub about its axle.",
  },
  weightShare: {
    label: "Weight on the wheels",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 1,
    default: 1,
    urlKey: "share",
    help: "Two wheels or more: the share of the weight they carry; the rest rides on a skid at the centre.",
  },
  motorsPerWheel: {
    label: "Motors per wheel",
    kind: "count",
    min: 1,
    max: 4,
    integer: true,
    default: 1,
    urlKey: "mpw",
    help: "Identical motors driving each wheel together.",
  },
  motorKv: {
    label: "Motor Kv",
    kind: "motorVelocityConstant",
    min: 10 * RPM,
    max: 20000 * RPM,
    default: 1100 * RPM,
    urlKey: "kv",
    help: "No-load speed per volt.",
  },
  motorResistance: {
    label: "Winding resistance",
    kind: "resistance",
    min: 1e-4,
    max: 10,
    default: 0.09,
    unit: { metric: "mohm", us: "mohm" },
    urlKey: "rm",
    help: "One motor, terminal to terminal.",
  },
  noLoadCurrent: { label: "No-load current", kind: "current", min: 0, max: 100, default: 0.6, urlKey: "i0", help: "Modelled as a constant loss torque." },
  motorRotorInertia: {
    label: "Motor rotor inertia",
    kind: "inertia",
    min: 0,
    max: 0.01,
    default: 3e-6,
    unit: { metric: "g·cm2", us: "oz·in2" },
    urlKey: "jm",
    help: "One motor's spinning part about its shaft (it also adds to the wheel's gyroscopic moment).",
  },
  gearRatio: {
    label: "Gear ratio",
    kind: "fraction",
    min: 0.05,
    max: 100,
    default: 1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "ratio",
    help: "Motor turns per wheel turn; the rotor is taken to turn the same way as the wheel.",
  },
  cellCount: { label: "Cells in series (S)", kind: "count", min: 1, max: 24, integer: true, default: 4, urlKey: "cells", help: "Battery cells in series." },
  cellVoltage: {
    label: "Cell open-circuit voltage",
    kind: "voltage",
    min: 0.5,
    max: 5,
    default: 4.1,
    urlKey: "vcell",
    help: "One cell with no current flowing.",
  },
  cellResistance: {
    label: "Cell internal resistance",
    kind: "resistance",
    min: 0,
    max: 1,
    default: 0.01,
    unit: { metric: "mohm", us: "mohm" },
    urlKey: "rcell",
    help: "One cell; the pack sags by this times the current.",
  },
  currentLimit: {
    label: "Current limit per motor",
    kind: "current",
    min: 0,
    minOpen: true,
    max: 1000,
    default: 30,
    urlKey: "ilim",
    help: "Both ways: driving and braking.",
  },
  tyreFriction: {
    label: "Tyre friction coefficient",
    kind: "fraction",
    min: 0,
    max: 3,
    default: 1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "mu",
    help: "Tyre on floor, sliding (1.0 for rubber on dry concrete); 0 for a frictionless floor.",
  },
  slipStiffness: {
    label: "Tyre slip stiffness per load",
    kind: "fraction",
    min: 0.5,
    max: 200,
    default: 10,
    unit: { metric: "frac", us: "frac" },
    urlKey: "stiff",
    help: "Force per unit slip divided by the wheel load, at small slip (an estimate: about 10 for a rubber tyre).",
  },
  skidFriction: {
    label: "Skid friction coefficient",
    kind: "fraction",
    min: 0,
    max: 3,
    default: 0.3,
    unit: { metric: "frac", us: "frac" },
    urlKey: "muskid",
    help: "Skid on floor, sliding.",
  },
  spinDragTorque: {
    label: "Spin drag torque",
    kind: "torque",
    min: 0,
    max: 100,
    default: 0.05,
    urlKey: "drag",
    help: "Air drag on the spinning body at the spin speed; it scales with speed squared.",
  },
  windowWidth: {
    label: "Window width",
    kind: "angle",
    min: 0,
    minOpen: true,
    max: 2 * Math.PI,
    default: 120 * DEG,
    urlKey: "window",
    help: "The arc of heading over which each wheel gets extra drive (at most 180° with the opposite window).",
  },
  depth: {
    label: "Modulation depth",
    kind: "fraction",
    min: 0,
    max: 1,
    default: 0.25,
    urlKey: "depth",
    help: "Duty added over the window (and taken away over the opposite one), as a share of full drive.",
  },
  oppositeWindow: {
    label: "Opposite window",
    kind: "count",
    min: 0,
    max: 1,
    integer: true,
    default: 1,
    urlKey: "opp",
    help: "1: also take drive away over the window facing the other way; 0: add only.",
  },
  phaseLead: {
    label: "Phase lead",
    kind: "angle",
    min: -Math.PI,
    max: Math.PI,
    default: 0,
    urlKey: "lead",
    help: "How far ahead of the measured heading the firmware places its windows.",
  },
  loopRate: {
    label: "Control loop rate",
    kind: "frequency",
    min: 50,
    max: 100000,
    default: 2000,
    urlKey: "loop",
    help: "The drive is updated at this rate and held between updates.",
  },
  latency: {
    label: "Latency",
    kind: "time",
    min: 0,
    max: 0.05,
    default: 0.0003,
    urlKey: "lat",
    help: "From the heading the sensor sees to the drive reaching the wheels (filtering, computing, controller).",
  },
  commandedDistance: {
    label: "Commanded distance",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 100,
    default: 1,
    urlKey: "dist",
    help: "How far the robot is asked to go.",
  },
  duration: { label: "Simulated time", kind: "time", min: 0.05, max: 10, default: 1.5, urlKey: "tmax", help: "How long the move is simulated." },
  directionTolerance: {
    label: "Direction tolerance",
    kind: "angle",
    min: 0,
    minOpen: true,
    max: Math.PI / 2,
    default: 10 * DEG,
    urlKey: "dirtol",
    help: "How far off the commanded direction the robot may go and still pass.",
  },
  sensorRadius: {
    label: "Accelerometer radius",
    kind: "length",
    min: 0.0005,
    max: 1,
    default: 0.012,
    urlKey: "rs",
    help: "Distance of the heading accelerometer from the centre, for the drift the drive pulses cause.",
  },
  sensorAngle: {
    label: "Accelerometer position angle",
    kind: "angle",
    min: -Math.PI,
    max: Math.PI,
    default: 90 * DEG,
    urlKey: "sangle",
    help: "Where the accelerometer sits around the centre, measured from the first wheel in the spin direction.",
  },
});

export type SteeringParameter = keyof typeof steeringInputs;
export type SteeringInput = { [K in SteeringParameter]: number };

const SI_SYMBOL: Partial<Record<QuantityKind, string>> = {
  length: "m",
  mass: "kg",
  angularSpeed: "rad/s",
  angle: "rad",
  time: "s",
  frequency: "Hz",
  torque: "N·m",
  inertia: "kg·m²",
  voltage: "V",
  current: "A",
  resistance: "Ω",
  motorVelocityConstant: "rad/(s·V)",
};

/** SI unit symbol of an input, for messages. */
export function steeringUnit(name: SteeringParameter): string {
  if (typeof name !== "string" || !Object.hasOwn(steeringInputs, name)) {
    throw new CalcInputError({ param: "name", value: String(name), expected: "the name of a steering input", unit: "" });
  }
  return SI_SYMBOL[steeringInputs[name].kind] ?? "";
}

/**
 * Checks every declared field of a steering input (finite, in range, whole where declared) and
 * the rule that depends on two fields (the window fits twice in a turn with the opposite window);
 * throws `CalcInputError` naming the first bad field. The drive's own limits (a spin speed the
 * pack cannot hold, a depth beyond the duty left) are checked where the base duty is worked out.
 *
 * @param input every field of `steeringInputs` [SI]
 * @returns the same input, typed
 */
export function validateSteeringInput(input: SteeringInput): SteeringInput {
  if (input === null || typeof input !== "object")
    throw new CalcInputError({ param: "input", value: input, expected: "an object of steering inputs", unit: "" });
  for (const name of Object.keys(steeringInputs) as SteeringParameter[]) {
    const spec: InputSpec = steeringInputs[name];
    const unit = steeringUnit(name);
    requireInRange(name, input[name], unit, { min: spec.min, max: spec.max, minOpen: spec.minOpen });
    if (spec.integer && !Number.isInteger(input[name])) throw new CalcInputError({ param: name, value: input[name], expected: "a whole number", unit });
  }
  if (input.oppositeWindow === 1 && input.windowWidth > Math.PI) {
    throw new CalcInputError({ param: "windowWidth", value: input.windowWidth, expected: "at most π rad (180°) with the opposite window on", unit: "rad" });
  }
  return input;
}

/**
 * An invented demo robot for the chapter's worked example (not any real robot): a 1.5 kg
 * whole-body spinner, J = 0.005 kg·m², two direct-drive wheels of 18 mm radius at 70 mm from the
 * centre, one 1100 rpm/V motor per wheel (90 mΩ, 0.6 A no-load, 30 A limit), four cells at 4.1 V
 * and 10 mΩ, rubber tyres on concrete (μ = 1.0), spinning at 3000 rpm; it steers with a 120° window,
 * 25 % depth and the opposite window on, a 2 kHz loop and 0.3 ms of latency, asked to go 1 m in 1.5 s.
 */
export const DEMO_STEERING_SPINNER: Readonly<SteeringInput> = Object.freeze(
  Object.fromEntries(Object.entries(steeringInputs).map(([key, spec]) => [key, spec.default])) as SteeringInput,
);
