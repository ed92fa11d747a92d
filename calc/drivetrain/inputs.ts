/**
 * The spin-up calculator's inputs: the two drive types (a weapon rotor, a whole-body spinner) and
 * every motor, battery, controller, reduction, load and wheel figure, declared once with their
 * ranges, defaults and URL keys; and the check of a whole input against them.
 */
import { CalcInputError, requireRelation } from "../core/errors.ts";
import { requireWithinSpecs } from "../core/spec-check.ts";
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

// ---------------------------------------------------------------------------------------------
// Inputs.

/** The two drive types. */
export const DRIVE_TYPE_OPTIONS = [
  { value: "weapon", label: "Spinning weapon: motors turn a rotor" },
  { value: "spinner", label: "Whole-body spinner: motors turn wheels that spin the robot" },
] as const satisfies readonly { value: string; label: string }[];

export type DriveType = (typeof DRIVE_TYPE_OPTIONS)[number]["value"];

/** URL key of the drive-type choice (the numeric inputs' keys are in `drivetrainInputs`). */
export const DRIVE_TYPE_URL_KEY = "type";

/**
 * Where the controller's current limit acts: on each motor's (phase) current, on the current each
 * motor's controller draws from the battery, or nowhere (then a stalled motor draws (D·V)/R).
 */
export const CURRENT_LIMIT_AT_OPTIONS = [
  { value: "motor", label: "Motor (phase) current" },
  { value: "battery", label: "Battery current" },
  { value: "none", label: "No limit" },
] as const satisfies readonly { value: string; label: string }[];

export type CurrentLimitAt = (typeof CURRENT_LIMIT_AT_OPTIONS)[number]["value"];

/**
 * How the no-load loss is modelled: a constant torque K_t·I₀ at every speed, or a torque that grows
 * in proportion to speed and equals K_t·I₀ at the speed I₀ was measured at (the voltage V₀).
 */
export const NO_LOAD_LOSS_OPTIONS = [
  { value: "constant", label: "Constant torque" },
  { value: "speed", label: "Grows with speed" },
] as const satisfies readonly { value: string; label: string }[];

export type NoLoadLoss = (typeof NO_LOAD_LOSS_OPTIONS)[number]["value"];

/** Throws a `CalcInputError` naming `param` unless `value` is one of `options`; undefined gives the first option (the earlier behaviour). */
function requireOption<T extends string>(param: string, value: unknown, options: readonly { value: T }[]): T {
  if (value === undefined) return options[0]!.value;
  for (const option of options) if (value === option.value) return option.value;
  throw new CalcInputError({ param, value, expected: `one of ${options.map((o) => `"${o.value}"`).join(", ")}`, unit: "" });
}

/** Throws a `CalcInputError` unless `value` is one of `DRIVE_TYPE_OPTIONS`. */
export function requireDriveType(value: unknown): DriveType {
  for (const option of DRIVE_TYPE_OPTIONS) if (value === option.value) return option.value;
  throw new CalcInputError({ param: "driveType", value, expected: `one of ${DRIVE_TYPE_OPTIONS.map((o) => `"${o.value}"`).join(", ")}`, unit: "" });
}

export const RPM = rpmToRadPerSecond(1);

/**
 * Numeric inputs of the spin-up calculator, in SI. The choice `driveType` ("weapon" | "spinner")
 * is in `DRIVE_TYPE_OPTIONS`. Defaults are the invented demo weapon (`DEMO_WEAPON`); the wheel
 * fields default to the invented demo spinner's and are read only for a whole-body spinner.
 */
export const drivetrainInputs = defineInputs({
  motorCount: {
    label: "Motors",
    kind: "count",
    min: 1,
    max: 16,
    integer: true,
    default: 1,
    urlKey: "motors",
    help: "Identical motors driving together.",
  },
  motorKv: {
    label: "Motor Kv",
    kind: "motorVelocityConstant",
    min: 10 * RPM,
    max: 20000 * RPM,
    default: 1400 * RPM,
    urlKey: "kv",
    help: "No-load speed per volt, from the data sheet.",
  },
  motorResistance: {
    label: "Winding resistance",
    kind: "resistance",
    min: 1e-4,
    max: 10,
    default: 0.045,
    unit: { metric: "mohm", us: "mohm" },
    urlKey: "rm",
    help: "Resistance of one motor's winding, terminal to terminal.",
  },
  noLoadCurrent: {
    label: "No-load current",
    kind: "current",
    min: 0,
    max: 100,
    default: 1.2,
    urlKey: "i0",
    help: "Current one motor draws spinning with nothing attached, from the data sheet.",
  },
  noLoadVoltage: {
    label: "No-load current measured at",
    kind: "voltage",
    min: 0.5,
    max: 200,
    default: 10,
    urlKey: "v0",
    help: "The voltage the data sheet quotes the no-load current at; read when the loss grows with speed.",
  },
  motorRotorInertia: {
    label: "Motor rotor inertia",
    kind: "inertia",
    min: 0,
    max: 0.01,
    default: 8e-6,
    unit: { metric: "g·cm2", us: "oz·in2" },
    urlKey: "jm",
    help: "Inertia of one motor's spinning part about its shaft; 0 to leave it out.",
  },
  currentLimit: {
    label: "Current limit per motor",
    kind: "current",
    min: 0,
    minOpen: true,
    max: 1000,
    default: 60,
    urlKey: "ilim",
    help: "The most current the controller lets each motor draw, at the point chosen below.",
  },
  throttle: {
    label: "Throttle",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 1,
    default: 1,
    urlKey: "thr",
    help: "Controller duty: the motors see this fraction of the battery voltage.",
  },
  cellCount: {
    label: "Cells in series (S)",
    kind: "count",
    min: 1,
    max: 24,
    integer: true,
    default: 4,
    urlKey: "cells",
    help: "Number of battery cells in series.",
  },
  cellVoltage: {
    label: "Cell open-circuit voltage",
    kind: "voltage",
    min: 0.5,
    max: 5,
    default: 4.1,
    urlKey: "vcell",
    help: "Voltage of one cell with no current flowing, at its state of charge.",
  },
  cellResistance: {
    label: "Cell internal resistance",
    kind: "resistance",
    min: 0,
    max: 1,
    default: 0.008,
    unit: { metric: "mohm", us: "mohm" },
    urlKey: "rcell",
    help: "Internal resistance of one cell; the pack sags by this times the current per cell.",
  },
  gearRatio: {
    label: "Gear ratio",
    kind: "fraction",
    min: 0.05,
    max: 100,
    default: 2,
    unit: { metric: "frac", us: "frac" },
    urlKey: "ratio",
    help: "Motor turns per output turn (weapon) or per wheel turn (spinner); 1 for direct drive.",
  },
  gearEfficiency: {
    label: "Gear efficiency",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 1,
    default: 0.95,
    urlKey: "eff",
    help: "Share of the motor power that the belt or gears pass on.",
  },
  inertia: {
    label: "Inertia",
    kind: "inertia",
    min: 1e-7,
    max: 100,
    default: 6.3e-4,
    unit: { metric: "kg·m2", us: "lb·in2" },
    urlKey: "j",
    help: "Weapon: the rotor about its axle. Spinner: the whole robot about its centre of mass.",
  },
  robotMass: {
    label: "Robot mass",
    kind: "mass",
    min: 0.05,
    max: 500,
    default: 1.5,
    urlKey: "mass",
    help: "Whole robot; gives the energy per kilogram and, for a spinner, the load on the wheels.",
  },
  frictionTorque: {
    label: "Friction torque",
    kind: "torque",
    min: 0,
    max: 100,
    default: 0.01,
    urlKey: "tf",
    help: "Constant drag of bearings (weapon) or of skids on the floor (spinner); 0 to leave out.",
  },
  dragTorque: {
    label: "Air drag torque",
    kind: "torque",
    min: 0,
    max: 100,
    default: 0.02,
    urlKey: "drag",
    help: "Air-drag torque at the drag reference speed (from a coast-down test or an estimate); it scales with speed squared. 0 to leave out.",
  },
  dragReferenceSpeed: {
    label: "Drag reference speed",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: 60000 * RPM,
    default: 10000 * RPM,
    urlKey: "dragat",
    help: "The speed at which the air drag torque above applies.",
  },
  targetSpeed: {
    label: "Target speed",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: 60000 * RPM,
    default: 10000 * RPM,
    urlKey: "rpm",
    help: "The speed you want to reach: of the weapon, or of the whole robot.",
  },
  maxTime: {
    label: "Time limit",
    kind: "time",
    min: 0.01,
    max: 300,
    default: 10,
    urlKey: "tmax",
    help: "The simulation stops here if it has not settled earlier.",
  },
  tipRadius: {
    label: "Tip radius",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.06,
    urlKey: "tip",
    help: "Radius of the outermost point (impactor tip or shell edge), for the tip speed.",
  },
  closingSpeed: {
    label: "Closing speed",
    kind: "speed",
    min: 0,
    max: 30,
    default: 3,
    urlKey: "vclose",
    help: "How fast the two robots approach, for the bite.",
  },
  impactors: {
    label: "Impactors",
    kind: "count",
    min: 1,
    max: 12,
    integer: true,
    default: 2,
    urlKey: "teeth",
    help: "Impactors evenly spaced around the weapon (or the spinner's shell).",
  },
  wheelRadius: {
    label: "Wheel radius",
    kind: "length",
    min: 0.002,
    max: 0.5,
    default: 0.018,
    urlKey: "rw",
    help: "Spinner only: radius of a driven wheel.",
  },
  wheelOffset: {
    label: "Wheel distance from centre",
    kind: "length",
    min: 0.005,
    max: 2,
    default: 0.07,
    urlKey: "offset",
    help: "Spinner only: distance from the centre of mass to the driven wheels' contact points.",
  },
  wheelInertia: {
    label: "Wheel inertia",
    kind: "inertia",
    min: 1e-8,
    max: 0.1,
    default: 4e-6,
    unit: { metric: "g·cm2", us: "oz·in2" },
    urlKey: "jw",
    help: "Spinner only: one driven wheel (and its hub) about its axle.",
  },
  drivenWheels: {
    label: "Driven wheels",
    kind: "count",
    min: 1,
    max: 8,
    integer: true,
    default: 2,
    urlKey: "wheels",
    help: "Spinner only: wheels the motors turn; the motors share them evenly.",
  },
  weightShare: {
    label: "Weight on driven wheels",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 1,
    default: 0.9,
    urlKey: "share",
    help: "Spinner only: share of the robot's weight the driven wheels carry (the rest rides on skids).",
  },
  staticFriction: {
    label: "Grip coefficient",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 3,
    default: 1.0,
    unit: { metric: "frac", us: "frac" },
    urlKey: "mu",
    help: "Spinner only: static friction coefficient of tyre on floor (1.0 for rubber on dry concrete).",
  },
  kineticFriction: {
    label: "Sliding coefficient",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 3,
    default: 0.8,
    unit: { metric: "frac", us: "frac" },
    urlKey: "muk",
    help: "Spinner only: kinetic friction coefficient while the wheels slip; at most the grip coefficient.",
  },
});

export type DrivetrainNumericInput = { [K in keyof typeof drivetrainInputs]: number };

/** Everything the spin-up simulation reads, SI. */
export type DrivetrainInput = DrivetrainNumericInput & {
  /** A value of `DRIVE_TYPE_OPTIONS`. */
  driveType: DriveType | string;
  /** A value of `CURRENT_LIMIT_AT_OPTIONS`; "motor" when left out (the earlier model). */
  currentLimitAt?: CurrentLimitAt | string;
  /** A value of `NO_LOAD_LOSS_OPTIONS`; "constant" when left out (the earlier model). */
  noLoadLoss?: NoLoadLoss | string;
};

/** A numeric input the sweep can vary. */
export type DrivetrainParameter = keyof typeof drivetrainInputs;

/**
 * Checks a spin-up input: every numeric field in its declared range, the drive type one of the
 * options, and the sliding coefficient at most the grip coefficient. Throws `CalcInputError`
 * naming the first bad field.
 */
export function validateDrivetrainInput(input: DrivetrainInput): { driveType: DriveType; currentLimitAt: CurrentLimitAt; noLoadLoss: NoLoadLoss } {
  if (input === null || typeof input !== "object") {
    throw new CalcInputError({ param: "input", value: input, expected: "an object of spin-up inputs", unit: "" });
  }
  const driveType = requireDriveType(input.driveType);
  const currentLimitAt = requireOption("currentLimitAt", input.currentLimitAt, CURRENT_LIMIT_AT_OPTIONS);
  const noLoadLoss = requireOption("noLoadLoss", input.noLoadLoss, NO_LOAD_LOSS_OPTIONS);
  requireWithinSpecs(drivetrainInputs, input);
  // The no-load speed at V₀ must be positive: V₀ − I₀·R > 0 (ctms-dc-motor-speed, steady state).
  if (noLoadLoss === "speed")
    requireRelation("noLoadVoltage", input.noLoadVoltage, "greater", input.noLoadCurrent * input.motorResistance, {
      kind: "voltage",
      unit: "V",
    });
  if (driveType === "spinner")
    requireRelation("kineticFriction", input.kineticFriction, "at-most", input.staticFriction, { kind: "fraction", unit: "", other: "staticFriction" });
  return { driveType, currentLimitAt, noLoadLoss };
}
