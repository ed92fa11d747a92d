/**
 * Inputs of the steering-while-spinning simulation: one declaration (`steeringInputs`) that the
 * calculator's fields, its URL and the entry function's checks all read, the cross-field rules,
 * and an invented demo robot. SI throughout (angles in rad, rates in rad/s, the loop rate in Hz).
 */
import { CalcInputError, requireInRange } from "../core/errors.ts";
import { defineInputs, type InputSpec } from "../core/inputs.ts";
import type { QuantityKind } from "../core/units.ts";
import { steeringEstimateInputs as e } from "./estimate-inputs.ts";

const DEG = Math.PI / 180;

/** Numeric inputs of the steering simulation, in SI. Defaults are the invented demo robot (`DEMO_STEERING_SPINNER`). */
export const steeringInputs = defineInputs({
  spinSpeed: e.spinSpeed,
  robotMass: e.robotMass,
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
  wheelCount: e.wheelCount,
  wheelRadius: e.wheelRadius,
  wheelOffset: e.wheelOffset,
  wheelInertia: e.wheelInertia,
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
  motorsPerWheel: e.motorsPerWheel,
  motorKv: e.motorKv,
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
  motorRotorInertia: e.motorRotorInertia,
  gearRatio: e.gearRatio,
  cellCount: e.cellCount,
  cellVoltage: e.cellVoltage,
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
  windowWidth: e.windowWidth,
  depth: e.depth,
  oppositeWindow: e.oppositeWindow,
  phaseLead: e.phaseLead,
  loopRate: e.loopRate,
  latency: e.latency,
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
  directionTolerance: e.directionTolerance,
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
