/**
 * Spin-up: how long a weapon rotor or a whole-body spinner takes to reach its speed, how fast it
 * can go at all, what it draws from the battery and where that energy goes.
 *
 * The model, in one place (every symbol is SI):
 *
 * - Motors. N identical DC motors (a brushless motor and its controller are treated as a brushed
 *   motor with the same Kv and winding resistance, averaged over commutation). K_t = K_e = 1/K_v
 *   (motor-constants-wikipedia, ctms-dc-motor-speed). Winding resistance R; no inductance (its
 *   time constant, well under a millisecond, is far shorter than any spin-up). The no-load current
 *   I_0 is modelled as a CONSTANT loss torque K_t·I_0 on each motor shaft while it turns (and as
 *   up to that much static friction at rest): with it the motor draws exactly I_0 with no load at
 *   any voltage, as the data sheet figure is defined, and its no-load speed is (V − I_0R)/K_e.
 * - Battery. n cells in series, each an open-circuit voltage behind an internal resistance
 *   (battery-thevenin-model): V_b = n·(V_cell − I_b·R_cell).
 * - Controller. An ideal averaged switching stage (erickson-power-electronics): with duty D the
 *   motor terminals see D·V_b and the battery supplies I_b = N·D·I (power in = power out). The
 *   throttle sets D. Each motor's current is capped at I_lim: when the throttle's D would draw more,
 *   the controller lowers D to hold I = I_lim exactly. Only the driving direction is limited; a
 *   spin-up from rest at a fixed throttle never regenerates.
 * - Reduction. G motor turns per output turn with efficiency η (gear-efficiency-model): output
 *   torque η·G·T_in while the motors drive, T_in = T_out/(η·G) if the load ever drives them.
 *   Motor rotor inertia J_m is on the motor side, so it appears at the output as η·G²·J_m.
 * - Weapon. The motors turn a rotor of inertia J; one degree of freedom, Ω.
 * - Whole-body spinner. The motors turn wheels of radius r_w whose contact points lie R from the
 *   centre of mass; the robot (inertia J, mass M) turns at Ω = ω_w·r_w/R while they grip. The
 *   driven wheels carry a share s of the weight, N_n = s·M·g, and can push at most μ_s·N_n in total
 *   while gripping (serway-beichner-5e). Once that is exceeded they slip: the wheel-and-motor side
 *   and the body become two degrees of freedom, coupled by the kinetic friction μ_k·N_n
 *   (serway-beichner-5e). Stick and slip are switched exactly (the switch model of
 *   leine-stick-slip-1998): separate equations for each state, the change located in time by
 *   root-finding; on re-gripping, the tiny remaining slip speed is removed by a contact impulse and
 *   its energy booked as slip loss. The wheels' spin axes are radial, so wheel spin and body spin
 *   do not exchange angular momentum.
 * - Load. A constant friction torque T_f (bearings, or skids on the floor) and air drag c·Ω²
 *   (quadratic-air-drag), given as a drag torque at a stated reference speed: c = T_drag/Ω_ref².
 *
 * Integration: Dormand–Prince 5(4) with error control and its 4th-order dense output
 * (dormand-prince-1980, hairer-norsett-wanner-1), written out here. Why adaptive and not fixed-step
 * RK4: a spin-up has phases an order of magnitude apart in time scale (a slipping wheel settles in
 * milliseconds while the body takes seconds; the approach to top speed takes several mechanical
 * time constants), and it has kinks (current limit on and off) and switches (grip and slip) that
 * must be located in time rather than stepped over. The embedded error estimate picks each step,
 * the dense output locates every switch and every speed crossing to about 1e-13 of a step, and the
 * energy flows are integrated as extra states under the same error control, so the energy balance
 * closes to the integration tolerance. The run stops at steady state (the speed could rise by less
 * than 1e-5 of itself), at the time limit, or after 50 000 steps, whichever comes first; it never
 * runs unbounded. A spinner whose wheels and motor rotors are extremely light next to the motors'
 * torque (a wheel-side time constant of microseconds) is stiff for an explicit method: such a run
 * stops at the step cap and says so in `warnings` rather than take seconds. Realistic pairings of
 * motor and wheel give wheel-side time constants of milliseconds and finish in well under 1 ms.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { defineInputs, type InputSpec } from "../core/inputs.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { rpmToRadPerSecond, type QuantityKind } from "../core/units.ts";
import { torqueConstantFromKv } from "./motor.ts";
import type { SourceKey } from "../sources/index.ts";

// ---------------------------------------------------------------------------------------------
// Closed-form figures at a speed.

/**
 * Kinetic energy of a body spinning about a fixed axis (openstax-university-physics-1).
 *
 * Formula: $E = \tfrac12 J \Omega^2$
 *
 * @param inertia J, moment of inertia about the spin axis [kg·m²], 0 or more
 * @param angularSpeed Ω [rad/s], finite
 * @returns E [J]
 *
 * Example: J = 1.000 × 10⁻⁴ kg·m² at 760.0 rad/s stores 28.88 J (softschools-rotational-ke);
 * J = 0.01 kg·m² at 2000 rpm stores 219.32 J.
 *
 * Sources: openstax-university-physics-1, softschools-rotational-ke.
 */
export function rotorKineticEnergy({ inertia, angularSpeed }: { inertia: number; angularSpeed: number }): number {
  requireNonNegative("inertia", inertia, "kg·m²");
  requireFinite("angularSpeed", angularSpeed, "rad/s");
  return 0.5 * inertia * angularSpeed * angularSpeed; // openstax-university-physics-1: K = ½Iω²
}

/**
 * Peripheral speed of a point at a radius from the spin axis (openstax-university-physics-1).
 *
 * Formula: $v = \Omega r$
 *
 * @param angularSpeed Ω [rad/s], 0 or more
 * @param radius r [m], 0 or more
 * @returns v [m/s]
 *
 * Example: 10 000 rpm (1047.2 rad/s) at 60 mm → 62.83 m/s. Sources: openstax-university-physics-1.
 */
export function rotorTipSpeed({ angularSpeed, radius }: { angularSpeed: number; radius: number }): number {
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("radius", radius, "m");
  return angularSpeed * radius; // openstax-university-physics-1: v = rω
}

/**
 * Bite of a spinning weapon: how far an opponent closes between two impactor passes (weapon-bite).
 *
 * Formula: $d = \dfrac{v\,T}{n} = \dfrac{2\pi v}{n\,\Omega}$ (in rpm: $d = v \cdot \dfrac{60}{\mathrm{rpm}} \cdot \dfrac1n$)
 *
 * @param closingSpeed v, speed at which the two robots approach [m/s], 0 or more
 * @param angularSpeed Ω, weapon speed [rad/s], greater than 0
 * @param impactors n, impactors evenly spaced around the weapon, a whole number 1 or more
 * @returns d [m]
 *
 * Assumptions: evenly spaced impactors of equal reach; constant closing speed over one pass.
 * Example: 3 m/s closing, 10 000 rpm, 2 impactors → 9.0 mm. Sources: weapon-bite.
 */
export function biteDepth({ closingSpeed, angularSpeed, impactors }: { closingSpeed: number; angularSpeed: number; impactors: number }): number {
  requireNonNegative("closingSpeed", closingSpeed, "m/s");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requireWhole("impactors", impactors, 1, 1000);
  return (closingSpeed * (2 * Math.PI)) / (angularSpeed * impactors); // weapon-bite: d = v·T/n
}

/**
 * Largest angular acceleration traction allows a whole-body spinner whose wheels slip
 * (serway-beichner-5e, kinetic friction at the contact, and Newton's second law for rotation).
 *
 * Formula: $\dot\Omega = \dfrac{\mu\,N_n\,R - T_f}{J}$, summed over the driven wheels ($N_n = s\,M\,g$ in total)
 *
 * @param frictionCoefficient μ, kinetic (sliding) or static (gripping) [-], greater than 0
 * @param normalForce N_n, total load on the driven wheels [N], greater than 0
 * @param contactRadius R, centre of mass to the wheels' contact points [m], greater than 0
 * @param inertia J, the robot about its centre of mass [kg·m²], greater than 0
 * @param frictionTorque T_f, constant friction torque (skids, bearings) [N·m], 0 or more (default 0)
 * @returns Ω̇ [rad/s²]; 0 when the friction torque holds the robot still
 *
 * Example: μ_k = 0.8, N_n = 13.24 N, R = 0.07 m, J = 0.005 kg·m² → 148.3 rad/s².
 * Sources: serway-beichner-5e.
 */
export function tractionLimitedAcceleration({
  frictionCoefficient,
  normalForce,
  contactRadius,
  inertia,
  frictionTorque = 0,
}: {
  frictionCoefficient: number;
  normalForce: number;
  contactRadius: number;
  inertia: number;
  frictionTorque?: number;
}): number {
  requirePositive("frictionCoefficient", frictionCoefficient, "");
  requirePositive("normalForce", normalForce, "N");
  requirePositive("contactRadius", contactRadius, "m");
  requirePositive("inertia", inertia, "kg·m²");
  requireNonNegative("frictionTorque", frictionTorque, "N·m");
  return Math.max(0, frictionCoefficient * normalForce * contactRadius - frictionTorque) / inertia; // serway-beichner-5e: f_k = μ_k n
}

/**
 * Angular acceleration of a current-limited drive: every motor at its current limit, so the
 * torque is constant (motor-constants-wikipedia, gear-efficiency-model).
 *
 * Formula: $\dot\Omega = \dfrac{\eta\,G\,N\,K_t\,(I_{lim} - I_0) - T_f}{J + \eta G^2 N J_m}$
 *
 * @param currentLimit I_lim, per motor [A], greater than 0
 * @param torqueConstant K_t [N·m/A], greater than 0
 * @param inertia J at the output [kg·m²], greater than 0
 * @param motorCount N (default 1), ratio G (default 1), efficiency η (default 1)
 * @param noLoadCurrent I_0 [A] (default 0), frictionTorque T_f [N·m] (default 0), motorRotorInertia J_m [kg·m²] (default 0)
 * @returns Ω̇ [rad/s²]; 0 when the losses hold the drive still
 *
 * Example: I_lim = 60 A, Kv = 1400 rpm/V, G = 2, η = 0.95, I_0 = 1.2 A, T_f = 0.01 N·m,
 * J = 6.3 × 10⁻⁴ kg·m², J_m = 8 × 10⁻⁶ kg·m² → 1139 rad/s².
 *
 * Sources: motor-constants-wikipedia, gear-efficiency-model.
 */
export function currentLimitedAcceleration({
  currentLimit,
  torqueConstant,
  inertia,
  motorCount = 1,
  ratio = 1,
  efficiency = 1,
  noLoadCurrent = 0,
  frictionTorque = 0,
  motorRotorInertia = 0,
}: {
  currentLimit: number;
  torqueConstant: number;
  inertia: number;
  motorCount?: number;
  ratio?: number;
  efficiency?: number;
  noLoadCurrent?: number;
  frictionTorque?: number;
  motorRotorInertia?: number;
}): number {
  requirePositive("currentLimit", currentLimit, "A");
  requirePositive("torqueConstant", torqueConstant, "N·m/A");
  requirePositive("inertia", inertia, "kg·m²");
  requirePositive("motorCount", motorCount, "");
  requirePositive("ratio", ratio, "");
  requireInRange("efficiency", efficiency, "", { min: 0, max: 1, minOpen: true });
  requireNonNegative("noLoadCurrent", noLoadCurrent, "A");
  requireNonNegative("frictionTorque", frictionTorque, "N·m");
  requireNonNegative("motorRotorInertia", motorRotorInertia, "kg·m²");
  const drive = efficiency * ratio * motorCount * torqueConstant * (currentLimit - noLoadCurrent) - frictionTorque; // T = η G N K_t I
  return Math.max(0, drive) / (inertia + efficiency * ratio * ratio * motorCount * motorRotorInertia);
}

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

/** Throws a `CalcInputError` unless `value` is one of `DRIVE_TYPE_OPTIONS`. */
export function requireDriveType(value: unknown): DriveType {
  for (const option of DRIVE_TYPE_OPTIONS) if (value === option.value) return option.value;
  throw new CalcInputError({ param: "driveType", value, expected: `one of ${DRIVE_TYPE_OPTIONS.map((o) => `"${o.value}"`).join(", ")}`, unit: "" });
}

const RPM = rpmToRadPerSecond(1);

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
    help: "Current one motor draws spinning with nothing attached; modelled as a constant loss torque.",
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
    help: "The most current the controller lets each motor draw.",
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
    label: "Cells in series",
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
    label: "Reduction",
    kind: "fraction",
    min: 0.05,
    max: 100,
    default: 2,
    unit: { metric: "frac", us: "frac" },
    urlKey: "ratio",
    help: "Motor turns per output turn (weapon) or per wheel turn (spinner); 1 for direct drive.",
  },
  gearEfficiency: {
    label: "Reduction efficiency",
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
};

/** A numeric input the sweep can vary. */
export type DrivetrainParameter = keyof typeof drivetrainInputs;

const SI_SYMBOL: Partial<Record<QuantityKind, string>> = {
  length: "m",
  mass: "kg",
  angularSpeed: "rad/s",
  time: "s",
  speed: "m/s",
  torque: "N·m",
  inertia: "kg·m²",
  voltage: "V",
  current: "A",
  resistance: "Ω",
  motorVelocityConstant: "rad/(s·V)",
  fraction: "",
  count: "",
};

function requireWhole(param: string, value: number, min: number, max: number): number {
  requireInRange(param, value, "", { min, max });
  if (!Number.isInteger(value)) throw new CalcInputError({ param, value, expected: "a whole number", unit: "" });
  return value;
}

function requireDeclared(name: DrivetrainParameter, value: number): number {
  const spec: InputSpec = drivetrainInputs[name];
  const unit = SI_SYMBOL[spec.kind] ?? "";
  requireInRange(name, value, unit, { min: spec.min, max: spec.max, minOpen: spec.minOpen });
  if (spec.integer && !Number.isInteger(value)) throw new CalcInputError({ param: name, value, expected: "a whole number", unit });
  return value;
}

/**
 * Checks a spin-up input: every numeric field in its declared range, the drive type one of the
 * options, and the sliding coefficient at most the grip coefficient. Throws `CalcInputError`
 * naming the first bad field.
 */
export function validateDrivetrainInput(input: DrivetrainInput): { driveType: DriveType } {
  if (input === null || typeof input !== "object") {
    throw new CalcInputError({ param: "input", value: input, expected: "an object of spin-up inputs", unit: "" });
  }
  const driveType = requireDriveType(input.driveType);
  for (const name of Object.keys(drivetrainInputs) as DrivetrainParameter[]) requireDeclared(name, input[name]);
  if (driveType === "spinner" && !(input.kineticFriction <= input.staticFriction)) {
    throw new CalcInputError({
      param: "kineticFriction",
      value: input.kineticFriction,
      expected: `at most the grip coefficient (${input.staticFriction})`,
      unit: "",
    });
  }
  return { driveType };
}

// ---------------------------------------------------------------------------------------------
// Results.

/** What limits the acceleration at a moment. */
export type SpinUpRegime = "current-limit" | "voltage" | "traction" | "stalled";

const REGIMES: readonly SpinUpRegime[] = ["current-limit", "voltage", "traction", "stalled"];
const R_CURRENT = 0;
const R_VOLTAGE = 1;
const R_TRACTION = 2;
const R_STALLED = 3;

export interface RegimeSegment {
  /** current-limit: the controller caps the motor current (constant torque); voltage: the motors run at the throttle's duty and back-EMF sets the current; traction: a spinner's wheels slip; stalled: friction holds the drive at rest. */
  regime: SpinUpRegime;
  /** [s] */
  start: number;
  /** [s] */
  end: number;
}

export interface SpinUpPoint {
  /** [s] */
  time: number;
  /** Weapon or robot speed [rad/s]. */
  speed: number;
  /** Motor shaft speed (relative to the robot for a spinner) [rad/s]. */
  motorSpeed: number;
  /** Current out of the battery [A]. */
  batteryCurrent: number;
  /** Battery terminal voltage after sag [V]. */
  batteryVoltage: number;
  /** Current in each motor [A]. */
  motorCurrent: number;
  regime: SpinUpRegime;
}

export interface EnergyBudget {
  /** Drawn from the cells' open-circuit voltage, ∫V_oc·I_b dt [J]. */
  drawn: number;
  /** Kinetic energy at the end: rotor or robot, plus wheels and motor rotors [J]. */
  kinetic: number;
  /** Lost in the cells' internal resistance [J]. */
  batteryLoss: number;
  /** Lost in the motor windings, N·I²·R [J]. */
  copperLoss: number;
  /** Lost to the motors' no-load loss torque K_t·I_0 [J]. */
  motorLoss: number;
  /** Lost in the reduction [J]. */
  gearLoss: number;
  /** Lost to the constant friction torque [J]. */
  frictionLoss: number;
  /** Lost to air drag [J]. */
  dragLoss: number;
  /** Lost in wheel slip (spinner) [J]. */
  slipLoss: number;
  /** Sum of every loss above [J]; drawn = kinetic + totalLoss to within `balanceError`. */
  totalLoss: number;
  /** |drawn − kinetic − all losses| / drawn: how well the balance closes [-]. */
  balanceError: number;
}

export interface SpeedFigures {
  /** [rad/s] */
  angularSpeed: number;
  /** ½·J·Ω² of the rotor (weapon) or the whole robot (spinner) [J]. */
  storedEnergy: number;
  /** Ω·tip radius [m/s]. */
  tipSpeed: number;
  /** Stored energy per kilogram of robot [J/kg]. */
  energyPerMass: number;
  /** Bite per impactor at the closing speed [m]; null at zero speed. */
  bite: number | null;
}

export interface DriveSummary {
  /** K_t = K_e [N·m/A]. */
  torqueConstant: number;
  /** Motor turns per output turn (weapon: G; spinner: G·R/r_w) [-]. */
  motorTurnsPerTurn: number;
  /** Inertia the motors accelerate, seen at the output (rotor or robot, plus reflected wheels and rotors, the rotors through η) [kg·m²]. */
  effectiveInertia: number;
  /** Mechanical time constant with the throttle's duty and the battery sag included [s]. */
  timeConstant: number;
  /** Output speed at which the motors' back-EMF equals the throttle's share of the open-circuit voltage [rad/s]. */
  idealNoLoadSpeed: number;
  /** Output acceleration from rest with every motor at its current limit (grip assumed) [rad/s²]. */
  currentLimitedAcceleration: number;
  /** Spinner: total grip force of the driven wheels, μ_s·s·M·g [N]; null for a weapon. */
  tractionLimit: number | null;
  /** Spinner: the robot's acceleration while the wheels slip, (μ_k·s·M·g·R − T_f)/J [rad/s²]; null for a weapon. */
  tractionLimitedAcceleration: number | null;
  /** Spinner: load on each driven wheel [N]; null for a weapon. */
  normalForcePerWheel: number | null;
  /** Spinner: time constant of the wheel-and-motor side alone, while slipping [s]; null for a weapon. */
  wheelTimeConstant: number | null;
}

export type SpinUpVerdict = "reaches-target" | "falls-short" | "stalled";
export type SpinUpEndReason = "steady-state" | "max-time" | "stalled" | "step-limit";

export interface SpinUpResult {
  driveType: DriveType;
  /** reaches-target, falls-short (top speed below target), or stalled (never moves). */
  verdict: SpinUpVerdict;
  /** Why the run ended. */
  endReason: SpinUpEndReason;
  /** Simulated time at the end [s]. */
  endTime: number;
  /** [rad/s] */
  targetSpeed: number;
  /** Time to 50 % of the target [s]; null if not reached. */
  timeTo50: number | null;
  /** Time to 90 % of the target [s]; null if not reached. */
  timeTo90: number | null;
  /** Time to the target [s]; null if not reached (then `topSpeed` is what the drive gets to). */
  timeToTarget: number | null;
  /** Highest speed reached [rad/s]. */
  topSpeed: number;
  /** Highest motor shaft speed [rad/s]. */
  peakMotorSpeed: number;
  /** The limiting regime over time, as contiguous segments from 0 to `endTime`. */
  regimes: RegimeSegment[];
  /** [A] */
  peakBatteryCurrent: number;
  /** Charge drawn ÷ end time [A]. */
  averageBatteryCurrent: number;
  /** Charge drawn up to the target ÷ time to target [A]; null if not reached. */
  averageBatteryCurrentToTarget: number | null;
  /** Charge drawn from the battery over the run [C] (3.6 C = 1 mAh). */
  chargeDrawn: number;
  /** Highest current in each motor [A]. */
  peakMotorCurrent: number;
  /** Lowest battery terminal voltage (deepest sag) [V]. */
  minBatteryVoltage: number;
  /** Battery voltage with no current [V]. */
  openCircuitVoltage: number;
  /** Where the energy went, from 0 to `endTime`. */
  energy: EnergyBudget;
  /** Energy drawn from the battery up to the target [J]; null if not reached. */
  energyToTarget: number | null;
  /** Stored energy, tip speed, energy per kg and bite at the top speed reached. */
  atTopSpeed: SpeedFigures;
  /** The same at the target speed (whether or not it is reached). */
  atTargetSpeed: SpeedFigures;
  /** Closed-form figures of the drive. */
  drive: DriveSummary;
  /** Time series for a plot, at most `maxPoints` points; empty when `series` is false. */
  series: SpinUpPoint[];
  /** Integrator statistics. */
  solver: { acceptedSteps: number; rejectedSteps: number; evaluations: number; modeSwitches: number };
  /** Plain-language notes on a run that did not end at steady state (empty when it did). */
  warnings: string[];
}

/** Options of a run (not physics): what to record and when to stop. */
export interface SpinUpOptions {
  /** Record the time series (default true; the sweep turns it off). */
  series?: boolean;
  /** Most points in the time series, 2 to 5000 (default 300). */
  maxPoints?: number;
  /** Stop once the speed has settled (default true); false runs to `maxTime`. */
  stopAtSteadyState?: boolean;
  /** Relative error tolerance of the integrator, 1e-12 to 1e-3 (default 1e-8). */
  relativeTolerance?: number;
}

// ---------------------------------------------------------------------------------------------
// The model, reduced to numbers.

interface Model {
  spinner: boolean;
  N: number;
  kt: number;
  rm: number;
  i0: number;
  jm: number;
  ilim: number;
  duty: number;
  voc: number;
  rp: number;
  g: number;
  eta: number;
  j: number;
  tf: number;
  c: number;
  rw: number;
  roff: number;
  jw: number;
  fs: number;
  fk: number;
  target: number;
  maxTime: number;
}

function buildModel(input: DrivetrainInput, spinner: boolean): Model {
  const kt = torqueConstantFromKv({ kv: input.motorKv });
  const normal = input.weightShare * input.robotMass * STANDARD_GRAVITY;
  return {
    spinner,
    N: input.motorCount,
    kt,
    rm: input.motorResistance,
    i0: input.noLoadCurrent,
    jm: input.motorRotorInertia,
    ilim: input.currentLimit,
    duty: input.throttle,
    voc: input.cellCount * input.cellVoltage, // battery-thevenin-model: pack of n cells in series
    rp: input.cellCount * input.cellResistance,
    g: input.gearRatio,
    eta: input.gearEfficiency,
    j: input.inertia,
    tf: input.frictionTorque,
    c: input.dragTorque / (input.dragReferenceSpeed * input.dragReferenceSpeed), // quadratic-air-drag: T = c Ω²
    rw: spinner ? input.wheelRadius : 1,
    roff: spinner ? input.wheelOffset : 1,
    jw: spinner ? input.drivenWheels * input.wheelInertia : 0,
    fs: spinner ? input.staticFriction * normal : Infinity, // serway-beichner-5e: f_s ≤ μ_s n
    fk: spinner ? input.kineticFriction * normal : Infinity, // serway-beichner-5e: f_k = μ_k n
    target: input.targetSpeed,
    maxTime: input.maxTime,
  };
}

// Dormand–Prince 5(4) tableau, error weights (b − b̂) and dense-output weights
// (dormand-prince-1980; dense output as in hairer-norsett-wanner-1 §II.6).
const A21 = 1 / 5;
const A31 = 3 / 40,
  A32 = 9 / 40;
const A41 = 44 / 45,
  A42 = -56 / 15,
  A43 = 32 / 9;
const A51 = 19372 / 6561,
  A52 = -25360 / 2187,
  A53 = 64448 / 6561,
  A54 = -212 / 729;
const A61 = 9017 / 3168,
  A62 = -355 / 33,
  A63 = 46732 / 5247,
  A64 = 49 / 176,
  A65 = -5103 / 18656;
const A71 = 35 / 384,
  A73 = 500 / 1113,
  A74 = 125 / 192,
  A75 = -2187 / 6784,
  A76 = 11 / 84;
const E1 = 71 / 57600,
  E3 = -71 / 16695,
  E4 = 71 / 1920,
  E5 = -17253 / 339200,
  E6 = 22 / 525,
  E7 = -1 / 40;
const D1 = -12715105075 / 11282082432,
  D3 = 87487479700 / 32700410799,
  D4 = -10690763975 / 1880347072;
const D5 = 701980252875 / 199316789632,
  D6 = -1453857185 / 822651844,
  D7 = 69997945 / 29380423;

// State vector: speeds, then the running integrals of every power flow.
const S_SPEED = 0; // Ω, rotor or robot [rad/s]
const S_MOTOR = 1; // ω_m, motor shaft (relative to the robot) [rad/s]
const S_DRAWN = 2;
const S_BATT = 3;
const S_COPPER = 4;
const S_MLOSS = 5;
const S_GEAR = 6;
const S_FRIC = 7;
const S_DRAG = 8;
const S_SLIP = 9;
const S_CHARGE = 10;
const NS = 11;

const MAX_TRIALS = 50_000;
const MAX_SWITCHES = 10_000;
const STEADY_TOLERANCE = 1e-5;
const SPEED_FRACTIONS = [0.5, 0.9, 1] as const;

const LOCKED = 0;
const SLIPPING = 1;

interface RawRun {
  endTime: number;
  endReason: SpinUpEndReason;
  y: Float64Array;
  crossTimes: (number | null)[];
  chargeAtTarget: number | null;
  drawnAtTarget: number | null;
  topSpeed: number;
  peakMotorSpeed: number;
  peakBatteryCurrent: number;
  peakMotorCurrent: number;
  minBatteryVoltage: number;
  segments: RegimeSegment[];
  series: SpinUpPoint[];
  accepted: number;
  rejected: number;
  evaluations: number;
  switches: number;
  tauLocked: number;
  tauWheel: number;
  jLocked: number;
}

/**
 * The drive as a system of ODEs: parameters, the state's derivative, and the auxiliary values
 * (currents, voltage, traction force) of the last evaluation. A class, so that every run shares
 * the same compiled methods.
 */
class SpinUpSystem {
  readonly spinner: boolean;
  readonly N: number;
  readonly kt: number;
  readonly rm: number;
  readonly i0: number;
  readonly jm: number;
  readonly ilim: number;
  readonly duty: number;
  readonly voc: number;
  readonly rp: number;
  readonly g: number;
  readonly eta: number;
  readonly j: number;
  readonly tf: number;
  readonly c: number;
  readonly rw: number;
  readonly roff: number;
  readonly jw: number;
  readonly fs: number;
  readonly fk: number;
  /** Wheel turns per robot turn while gripping (1 for a weapon). */
  readonly rho: number;
  /** Motor turns per output turn while locked. */
  readonly k: number;
  /** Robot (or rotor) plus wheels, at the output. */
  readonly jLoad: number;
  readonly jLockF: number;
  readonly jLockR: number;
  readonly jWheelF: number;
  readonly jWheelR: number;
  readonly jWheelTrue: number;
  /** One motor's view of its winding plus the sagging pack. */
  readonly rTot: number;
  readonly tauLocked: number;
  readonly tauWheel: number;

  mode = LOCKED;
  dir = 1;
  /** Motor current [A], battery current [A], battery voltage [V], traction force [N]. */
  current = 0;
  battCurrent = 0;
  battVoltage = 0;
  force = 0;
  limited = false;
  stuck = false;
  evaluations = 0;

  constructor(m: Model) {
    this.spinner = m.spinner;
    this.N = m.N;
    this.kt = m.kt;
    this.rm = m.rm;
    this.i0 = m.i0;
    this.jm = m.jm;
    this.ilim = m.ilim;
    this.duty = m.duty;
    this.voc = m.voc;
    this.rp = m.rp;
    this.g = m.g;
    this.eta = m.eta;
    this.j = m.j;
    this.tf = m.tf;
    this.c = m.c;
    this.rw = m.rw;
    this.roff = m.roff;
    this.jw = m.jw;
    this.fs = m.fs;
    this.fk = m.fk;
    this.battVoltage = m.voc;
    const rho = m.spinner ? m.roff / m.rw : 1;
    const k = m.g * rho;
    this.rho = rho;
    this.k = k;
    this.jLoad = m.j + rho * rho * m.jw;
    this.jLockF = this.jLoad + m.eta * k * k * m.N * m.jm;
    this.jLockR = this.jLoad + (k * k * m.N * m.jm) / m.eta;
    this.jWheelF = m.jw + m.eta * m.g * m.g * m.N * m.jm;
    this.jWheelR = m.jw + (m.g * m.g * m.N * m.jm) / m.eta;
    this.jWheelTrue = m.jw + m.g * m.g * m.N * m.jm;
    this.rTot = m.rm + m.N * m.duty * m.duty * m.rp;
    this.tauLocked = (this.jLockF * this.rTot) / (m.eta * k * k * m.N * m.kt * m.kt);
    this.tauWheel = m.spinner ? (this.jWheelF * this.rTot) / (m.eta * m.g * m.g * m.N * m.kt * m.kt) : this.tauLocked;
  }

  /** Controller, battery and motor at motor speed wm (erickson-power-electronics, battery-thevenin-model). */
  electrical(wm: number): void {
    const emf = this.kt * wm; // ctms-dc-motor-speed: e = K_e ω
    let current = (this.duty * this.voc - emf) / this.rTot; // D·V_b − e = I·R with V_b = V_oc − R_p·N·D·I
    let d = this.duty;
    this.limited = false;
    if (current > this.ilim) {
      // The controller lowers its duty so that D·(V_oc − R_p·N·D·I_lim) = e + I_lim·R: the smaller root.
      current = this.ilim;
      const need = emf + this.ilim * this.rm;
      const a = this.N * this.rp * this.ilim;
      d = (2 * need) / (this.voc + Math.sqrt(Math.max(0, this.voc * this.voc - 4 * a * need)));
      this.limited = true;
    }
    this.current = current;
    this.battCurrent = this.N * d * current; // erickson-power-electronics: ideal converter, I_in = D·I_out
    this.battVoltage = this.voc - this.rp * this.battCurrent; // battery-thevenin-model
  }

  /** Locked (weapon, or spinner gripping): one degree of freedom. Returns Ω̇ and sets the traction force. */
  lockedAcceleration(om: number, wm: number): number {
    this.electrical(wm);
    const tm = this.N * this.kt * (this.current - this.i0); // motor torque net of the constant loss torque
    const load = this.tf + this.c * om * om;
    let acc = (this.k * this.eta * tm - load) / this.jLockF; // gear-efficiency-model, motors driving
    if ((this.jLoad * acc + load) / this.rho < 0) acc = (this.k * (tm / this.eta) - load) / this.jLockR; // load driving the motors
    if (om <= 0 && acc <= 0) {
      this.stuck = true;
      this.force = (this.k * this.eta * tm) / this.roff; // held: the wheels push with all the motors give
      return 0;
    }
    this.stuck = false;
    this.force = (this.j * acc + load) / this.roff; // traction the robot needs (spinner)
    return acc;
  }

  /** The state's derivative: accelerations, then every power flow (see the module comment). */
  deriv(y: Float64Array, dy: Float64Array): void {
    const om = y[S_SPEED]!;
    const wm = y[S_MOTOR]!;
    const ww = wm / this.g;
    const load = this.tf + this.c * om * om;
    let accBody: number;
    let dwm: number;
    let tg: number; // torque out of the reduction
    let pSlip = 0;
    if (this.mode === LOCKED) {
      accBody = this.lockedAcceleration(om, wm);
      dwm = this.k * accBody;
      tg = this.stuck ? 0 : (this.jLoad * accBody + load) / this.rho;
    } else {
      this.electrical(wm);
      const tm = this.N * this.kt * (this.current - this.i0);
      const f = this.dir * this.fk; // serway-beichner-5e: f_k = μ_k n
      let dww = (this.g * this.eta * tm - f * this.rw) / this.jWheelF;
      tg = this.jw * dww + f * this.rw;
      if (tg < 0) {
        dww = (this.g * (tm / this.eta) - f * this.rw) / this.jWheelR;
        tg = this.jw * dww + f * this.rw;
      }
      if (wm <= 0 && dww <= 0) {
        dww = 0;
        tg = 0;
      }
      dwm = this.g * dww;
      accBody = (f * this.roff - load) / this.j;
      if (om <= 0 && accBody <= 0) accBody = 0;
      this.force = f;
      this.stuck = false;
      pSlip = f * (ww * this.rw - om * this.roff);
    }
    const tin = this.N * this.kt * (this.current - this.i0) - this.N * this.jm * dwm; // torque into the reduction
    // gear-efficiency-model: driving, T_out = η·G·T_in, so the loss is (1 − η)·T_in·ω_m; driven, (1 − η)·(−T_out)·ω_w.
    const pGear = wm > 0 ? (tg >= 0 ? (1 - this.eta) * tin * wm : -(1 - this.eta) * tg * ww) : 0;
    const ib = this.battCurrent;
    dy[S_SPEED] = accBody;
    dy[S_MOTOR] = dwm;
    dy[S_DRAWN] = this.voc * ib;
    dy[S_BATT] = this.rp * ib * ib;
    dy[S_COPPER] = this.N * this.rm * this.current * this.current;
    dy[S_MLOSS] = wm > 0 ? this.N * this.kt * this.i0 * wm : 0;
    dy[S_GEAR] = pGear;
    dy[S_FRIC] = om > 0 ? this.tf * om : 0;
    dy[S_DRAG] = om > 0 ? this.c * om * om * om : 0;
    dy[S_SLIP] = pSlip;
    dy[S_CHARGE] = ib;
    this.evaluations++;
  }

  /** Kinetic energy of rotor or robot, wheels and motor rotors [J]. */
  kineticEnergy(y: Float64Array): number {
    const om = y[S_SPEED]!;
    const wm = y[S_MOTOR]!;
    const ww = wm / this.g;
    return 0.5 * (this.j * om * om + this.jw * ww * ww + this.N * this.jm * wm * wm);
  }

  /** Positive while the controller limits the current. */
  currentMargin(wm: number): number {
    return (this.duty * this.voc - this.kt * wm) / this.rTot - this.ilim;
  }

  /** Wheel rim speed minus ground speed at the contact [m/s]. */
  slipSpeed(om: number, wm: number): number {
    return (wm / this.g) * this.rw - om * this.roff;
  }

  /** Picks grip or slip at a state: a spinner slips when gripping would need more than μ_s·N_n. */
  setModeAt(y: Float64Array): void {
    this.mode = LOCKED;
    if (!this.spinner) return;
    this.lockedAcceleration(y[S_SPEED]!, y[S_MOTOR]!);
    if (Math.abs(this.force) > this.fs) {
      this.mode = SLIPPING;
      this.dir = this.force >= 0 ? 1 : -1;
    }
  }

  /** Re-grip: a contact impulse removes the remaining slip speed; its energy is booked as slip loss. */
  regrip(y: Float64Array): void {
    const before = this.kineticEnergy(y);
    const vs = this.slipSpeed(y[S_SPEED]!, y[S_MOTOR]!);
    const impulse = vs / ((this.rw * this.rw) / this.jWheelTrue + (this.roff * this.roff) / this.j);
    const om = y[S_SPEED]! + (impulse * this.roff) / this.j;
    y[S_SPEED] = om;
    y[S_MOTOR] = this.k * om;
    y[S_SLIP] = y[S_SLIP]! + Math.max(0, before - this.kineticEnergy(y));
    this.setModeAt(y);
  }

  /** Which regime the last evaluation was in. */
  regime(): number {
    return this.mode === SLIPPING ? R_TRACTION : this.stuck ? R_STALLED : this.limited ? R_CURRENT : R_VOLTAGE;
  }
}

/** One Dormand–Prince 5(4) step with its error estimate and dense output (dormand-prince-1980, hairer-norsett-wanner-1). */
class Dopri5 {
  readonly y = new Float64Array(NS);
  readonly y1 = new Float64Array(NS);
  readonly yt = new Float64Array(NS);
  k1 = new Float64Array(NS);
  readonly k2 = new Float64Array(NS);
  readonly k3 = new Float64Array(NS);
  readonly k4 = new Float64Array(NS);
  readonly k5 = new Float64Array(NS);
  readonly k6 = new Float64Array(NS);
  k7 = new Float64Array(NS);
  readonly r1 = new Float64Array(NS);
  readonly r2 = new Float64Array(NS);
  readonly r3 = new Float64Array(NS);
  readonly r4 = new Float64Array(NS);
  readonly r5 = new Float64Array(NS);
  readonly atol = new Float64Array(NS);
  rtol = 1e-8;
  h = 0;
  denseReady = false;

  /** Takes a trial step of size h from y into y1 (k7 = f(y1)); returns the scaled error norm (≤ 1 to accept). */
  step(sys: SpinUpSystem): number {
    const { y, y1, yt, k1, k2, k3, k4, k5, k6, k7, atol, rtol, h } = this;
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * A21 * k1[i]!;
    sys.deriv(yt, k2);
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A31 * k1[i]! + A32 * k2[i]!);
    sys.deriv(yt, k3);
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A41 * k1[i]! + A42 * k2[i]! + A43 * k3[i]!);
    sys.deriv(yt, k4);
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A51 * k1[i]! + A52 * k2[i]! + A53 * k3[i]! + A54 * k4[i]!);
    sys.deriv(yt, k5);
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A61 * k1[i]! + A62 * k2[i]! + A63 * k3[i]! + A64 * k4[i]! + A65 * k5[i]!);
    sys.deriv(yt, k6);
    for (let i = 0; i < NS; i++) y1[i] = y[i]! + h * (A71 * k1[i]! + A73 * k3[i]! + A74 * k4[i]! + A75 * k5[i]! + A76 * k6[i]!);
    sys.deriv(y1, k7);
    // Error estimate (hairer-norsett-wanner-1 §II.4): RMS of the 5th−4th order difference over the tolerance.
    let sum = 0;
    for (let i = 0; i < NS; i++) {
      const e = h * (E1 * k1[i]! + E3 * k3[i]! + E4 * k4[i]! + E5 * k5[i]! + E6 * k6[i]! + E7 * k7[i]!);
      const sc = atol[i]! + rtol * Math.max(Math.abs(y[i]!), Math.abs(y1[i]!));
      sum += (e / sc) * (e / sc);
    }
    this.denseReady = false;
    return Math.sqrt(sum / NS);
  }

  /** Builds the continuous extension of the accepted step (hairer-norsett-wanner-1 §II.6). */
  prepareDense(): void {
    if (this.denseReady) return;
    const { y, y1, k1, k3, k4, k5, k6, k7, r1, r2, r3, r4, r5, h } = this;
    for (let i = 0; i < NS; i++) {
      const dy = y1[i]! - y[i]!;
      const bspl = h * k1[i]! - dy;
      r1[i] = y[i]!;
      r2[i] = dy;
      r3[i] = bspl;
      r4[i] = dy - h * k7[i]! - bspl;
      r5[i] = h * (D1 * k1[i]! + D3 * k3[i]! + D4 * k4[i]! + D5 * k5[i]! + D6 * k6[i]! + D7 * k7[i]!);
    }
    this.denseReady = true;
  }

  /** Component i at the fraction th of the accepted step (prepareDense first). */
  dense(i: number, th: number): number {
    const th1 = 1 - th;
    return this.r1[i]! + th * (this.r2[i]! + th1 * (this.r3[i]! + th * (this.r4[i]! + th1 * this.r5[i]!)));
  }

  /** Accepts y1 as the new state; k7 becomes k1 (first same as last). */
  advance(): void {
    this.y.set(this.y1);
    const swap = this.k1;
    this.k1 = this.k7;
    this.k7 = swap;
  }
}

/** Peaks, regime segments and (optionally) the time series of a run. */
class Recorder {
  readonly keepSeries: boolean;
  topSpeed = 0;
  peakMotorSpeed = 0;
  peakBattCurrent = 0;
  peakCurrent = 0;
  minVoltage: number;
  segRegime = -1;
  segStart = 0;
  readonly segments: RegimeSegment[] = [];
  readonly t: number[] = [];
  readonly speed: number[] = [];
  readonly motor: number[] = [];
  readonly battCurrent: number[] = [];
  readonly battVoltage: number[] = [];
  readonly current: number[] = [];
  readonly regime: number[] = [];

  constructor(keepSeries: boolean, voc: number) {
    this.keepSeries = keepSeries;
    this.minVoltage = voc;
  }

  record(time: number, y: Float64Array, sys: SpinUpSystem): void {
    const regime = sys.regime();
    if (regime !== this.segRegime) {
      if (this.segRegime >= 0 && time > this.segStart) this.segments.push({ regime: REGIMES[this.segRegime]!, start: this.segStart, end: time });
      if (this.segRegime < 0 || time > this.segStart) this.segStart = time;
      this.segRegime = regime;
    }
    const om = y[S_SPEED]!;
    const wm = y[S_MOTOR]!;
    if (om > this.topSpeed) this.topSpeed = om;
    if (wm > this.peakMotorSpeed) this.peakMotorSpeed = wm;
    if (sys.battCurrent > this.peakBattCurrent) this.peakBattCurrent = sys.battCurrent;
    if (sys.current > this.peakCurrent) this.peakCurrent = sys.current;
    if (sys.battVoltage < this.minVoltage) this.minVoltage = sys.battVoltage;
    if (this.keepSeries) {
      this.t.push(time);
      this.speed.push(om);
      this.motor.push(wm);
      this.battCurrent.push(sys.battCurrent);
      this.battVoltage.push(sys.battVoltage);
      this.current.push(sys.current);
      this.regime.push(regime);
    }
  }

  finish(time: number): void {
    if (this.segRegime >= 0) this.segments.push({ regime: REGIMES[this.segRegime]!, start: this.segStart, end: Math.max(time, this.segStart) });
  }

  series(maxPoints: number): SpinUpPoint[] {
    if (!this.keepSeries) return [];
    return pickIndices(this.t, maxPoints).map((i) => ({
      time: this.t[i]!,
      speed: this.speed[i]!,
      motorSpeed: this.motor[i]!,
      batteryCurrent: this.battCurrent[i]!,
      batteryVoltage: this.battVoltage[i]!,
      motorCurrent: this.current[i]!,
      regime: REGIMES[this.regime[i]!]!,
    }));
  }
}

const EVENT_NONE = 0;
const EVENT_CURRENT = 1;
const EVENT_GRIP_LOST = 2;
const EVENT_REGRIP = 3;

/** Finds the earliest event inside the accepted step; returns its kind and sets `found.theta`. */
function findEvent(sys: SpinUpSystem, st: Dopri5, gCur: number, tolForce: number, tolSlip: number, found: { theta: number }): number {
  let event = EVENT_NONE;
  found.theta = 1;
  const y1 = st.y1;
  const gCur1 = sys.currentMargin(y1[S_MOTOR]!);
  if (gCur > 0 !== gCur1 > 0) {
    st.prepareDense();
    const wasLimited = gCur > 0;
    found.theta = locate(
      (th) => sys.currentMargin(st.dense(S_MOTOR, th)),
      gCur,
      gCur1,
      1,
      (v) => (wasLimited ? v <= 0 : v > 0),
    );
    event = EVENT_CURRENT;
  }
  if (sys.spinner && sys.mode === LOCKED) {
    const g1 = sys.fs - Math.abs(sys.force); // the traction force is from the evaluation at y1 (k7)
    if (g1 < -tolForce) {
      st.prepareDense();
      const gripMargin = (th: number): number => {
        sys.lockedAcceleration(st.dense(S_SPEED, th), st.dense(S_MOTOR, th));
        return sys.fs - Math.abs(sys.force);
      };
      const th = locate(gripMargin, gripMargin(0), g1, 1, (v) => v < -tolForce);
      if (event === EVENT_NONE || th < found.theta) {
        found.theta = th;
        event = EVENT_GRIP_LOST;
      }
    }
  } else if (sys.spinner && sys.mode === SLIPPING) {
    const g1 = sys.dir * sys.slipSpeed(y1[S_SPEED]!, y1[S_MOTOR]!);
    if (g1 < -tolSlip) {
      st.prepareDense();
      const slipMargin = (th: number): number => sys.dir * sys.slipSpeed(st.dense(S_SPEED, th), st.dense(S_MOTOR, th));
      const th = locate(slipMargin, slipMargin(0), g1, 1, (v) => v < -tolSlip);
      if (event === EVENT_NONE || th < found.theta) {
        found.theta = th;
        event = EVENT_REGRIP;
      }
    }
  }
  return event;
}

/** The integration itself: Dormand–Prince 5(4) with events, from rest until it settles or the limit. */
function integrate(m: Model, opts: Required<SpinUpOptions>): RawRun {
  const sys = new SpinUpSystem(m);
  const st = new Dopri5();
  const { tauLocked, tauWheel } = sys;
  const motorRef = (m.duty * m.voc) / m.kt; // motor no-load speed [rad/s]
  const speedRef = motorRef / sys.k;
  const energyRef = 0.5 * sys.jLockF * speedRef * speedRef;
  const chargeRef = m.N * Math.min(m.ilim, (m.duty * m.voc) / sys.rTot) * tauLocked;
  const rtol = opts.relativeTolerance;
  st.rtol = rtol;
  st.atol[S_SPEED] = rtol * speedRef;
  st.atol[S_MOTOR] = rtol * motorRef;
  for (let i = S_DRAWN; i < S_CHARGE; i++) st.atol[i] = rtol * energyRef;
  st.atol[S_CHARGE] = rtol * chargeRef;
  const tolForce = 1e-9 * m.fs;
  const tolSlip = 1e-9 * speedRef * m.roff;
  const rec = new Recorder(opts.series, m.voc);
  const found = { theta: 1 };

  let t = 0;
  sys.setModeAt(st.y);
  sys.deriv(st.y, st.k1);
  rec.record(0, st.y, sys);
  let gCur = sys.currentMargin(0);

  const crossTimes: (number | null)[] = SPEED_FRACTIONS.map(() => null);
  let nextCross = 0;
  let chargeAtTarget: number | null = null;
  let drawnAtTarget: number | null = null;

  let endReason: SpinUpEndReason = "max-time";
  const tEnd = m.maxTime;
  const hMax = tEnd / 100;
  const initialStep = (): number => Math.min(hMax, 1e-3 * (sys.mode === SLIPPING ? Math.min(tauLocked, tauWheel) : tauLocked));
  st.h = initialStep();
  let lastRejected = false;
  let accepted = 0;
  let rejected = 0;
  let switches = 0;

  if (st.k1[S_SPEED] === 0 && st.k1[S_MOTOR] === 0) {
    endReason = "stalled";
  } else {
    while (t < tEnd) {
      if (accepted + rejected >= MAX_TRIALS || switches > MAX_SWITCHES || st.h <= 1e-14 * Math.max(1, t)) {
        endReason = "step-limit";
        break;
      }
      const last = t + st.h >= tEnd;
      if (last) st.h = tEnd - t;
      const err = st.step(sys);
      if (!(err <= 1)) {
        rejected++;
        st.h *= Number.isFinite(err) ? Math.max(0.2, 0.9 * err ** -0.2) : 0.2;
        lastRejected = true;
        continue;
      }
      accepted++;
      let factor = err === 0 ? 10 : Math.min(10, Math.max(0.2, 0.9 * err ** -0.2));
      if (lastRejected) factor = Math.min(1, factor);
      lastRejected = false;

      // Events inside the step, each located on the dense output; the earliest one cuts the step.
      const event = findEvent(sys, st, gCur, tolForce, tolSlip, found);
      const theta = found.theta;
      if (event !== EVENT_NONE) for (let i = 0; i < NS; i++) st.y1[i] = st.dense(i, theta);
      // Speed crossings (50 %, 90 %, 100 % of target) up to the end of the (possibly cut) step.
      while (nextCross < SPEED_FRACTIONS.length && st.y1[S_SPEED]! >= SPEED_FRACTIONS[nextCross]! * m.target) {
        const level = SPEED_FRACTIONS[nextCross]! * m.target;
        st.prepareDense();
        const th = locate(
          (s) => st.dense(S_SPEED, s) - level,
          st.y[S_SPEED]! - level,
          st.y1[S_SPEED]! - level,
          theta,
          (v) => v >= 0,
        );
        crossTimes[nextCross] = t + th * st.h;
        if (SPEED_FRACTIONS[nextCross] === 1) {
          chargeAtTarget = st.dense(S_CHARGE, th);
          drawnAtTarget = st.dense(S_DRAWN, th);
        }
        nextCross++;
      }

      if (event === EVENT_NONE) {
        t = last ? tEnd : t + st.h;
        st.advance(); // k1 is now f(y), and the auxiliaries are from that evaluation
        st.h = Math.min(hMax, st.h * factor);
      } else {
        t += theta * st.h;
        st.y.set(st.y1);
        switches++;
        if (event === EVENT_GRIP_LOST) {
          sys.lockedAcceleration(st.y[S_SPEED]!, st.y[S_MOTOR]!);
          sys.mode = SLIPPING;
          sys.dir = sys.force >= 0 ? 1 : -1;
        } else if (event === EVENT_REGRIP) {
          sys.regrip(st.y);
        }
        sys.deriv(st.y, st.k1);
        st.h = Math.min(hMax, 10 * initialStep(), st.h);
      }
      gCur = sys.currentMargin(st.y[S_MOTOR]!);
      rec.record(t, st.y, sys);
      if (last && event === EVENT_NONE) break;
      if (opts.stopAtSteadyState) {
        // Settled when the speed could rise by less than STEADY_TOLERANCE of itself in one time constant.
        const y = st.y;
        const bodySettled = Math.abs(st.k1[S_SPEED]!) * tauLocked <= STEADY_TOLERANCE * Math.max(y[S_SPEED]!, 1e-9 * speedRef);
        const motorSettled = sys.mode === LOCKED || Math.abs(st.k1[S_MOTOR]!) * tauWheel <= STEADY_TOLERANCE * Math.max(y[S_MOTOR]!, 1e-9 * motorRef);
        if (bodySettled && motorSettled && !(sys.limited && sys.mode === LOCKED && !sys.stuck)) {
          endReason = "steady-state";
          break;
        }
      }
    }
  }
  rec.finish(t);

  return {
    endTime: t,
    endReason,
    y: Float64Array.from(st.y),
    crossTimes,
    chargeAtTarget,
    drawnAtTarget,
    topSpeed: rec.topSpeed,
    peakMotorSpeed: rec.peakMotorSpeed,
    peakBatteryCurrent: rec.peakBattCurrent,
    peakMotorCurrent: rec.peakCurrent,
    minBatteryVoltage: rec.minVoltage,
    segments: rec.segments,
    series: rec.series(opts.maxPoints),
    accepted,
    rejected,
    evaluations: sys.evaluations,
    switches,
    tauLocked,
    tauWheel,
    jLocked: sys.jLockF,
  };
}

/**
 * Finds where `after` first holds on [0, hi], given it fails at 0 (value f0) and holds at hi (value
 * fHi): the Illinois variant of false position, run on the dense output (hairer-norsett-wanner-1,
 * event location). Returns a point where `after` holds, within 1e-13 of the crossing.
 */
function locate(fn: (th: number) => number, f0: number, fHi: number, hi: number, after: (v: number) => boolean): number {
  let a = 0;
  let fa = f0;
  let b = hi;
  let fb = fHi;
  let side = 0;
  for (let it = 0; it < 200 && b - a > 1e-13; it++) {
    let x = fb !== fa ? (a * fb - b * fa) / (fb - fa) : 0.5 * (a + b);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
    const fx = fn(x);
    if (after(fx)) {
      b = x;
      fb = fx;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = x;
      fa = fx;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return b;
}

/** Indices of at most `count` samples spread evenly in time, first and last always kept. */
function pickIndices(times: readonly number[], count: number): number[] {
  const n = times.length;
  if (n <= count) return Array.from({ length: n }, (_, i) => i);
  const t0 = times[0]!;
  const t1 = times[n - 1]!;
  const out: number[] = [];
  let i = 0;
  for (let p = 0; p < count; p++) {
    const want = t0 + ((t1 - t0) * p) / (count - 1);
    while (i < n - 1 && times[i]! < want) i++;
    if (out.length === 0 || out[out.length - 1]! !== i) out.push(i);
  }
  if (out[out.length - 1] !== n - 1) out[out.length - 1] = n - 1;
  return out;
}

function speedFigures(input: DrivetrainInput, angularSpeed: number): SpeedFigures {
  const storedEnergy = rotorKineticEnergy({ inertia: input.inertia, angularSpeed });
  return {
    angularSpeed,
    storedEnergy,
    tipSpeed: rotorTipSpeed({ angularSpeed, radius: input.tipRadius }),
    energyPerMass: storedEnergy / input.robotMass,
    bite: angularSpeed > 0 ? biteDepth({ closingSpeed: input.closingSpeed, angularSpeed, impactors: input.impactors }) : null,
  };
}

function readOptions(options: SpinUpOptions): Required<SpinUpOptions> {
  const maxPoints = options.maxPoints ?? 300;
  requireWhole("maxPoints", maxPoints, 2, 5000);
  const relativeTolerance = options.relativeTolerance ?? 1e-8;
  requireInRange("relativeTolerance", relativeTolerance, "", { min: 1e-12, max: 1e-3 });
  return { series: options.series ?? true, maxPoints, stopAtSteadyState: options.stopAtSteadyState ?? true, relativeTolerance };
}

/**
 * Spin-up of a spinning weapon or a whole-body spinner from rest at a fixed throttle: time to
 * 50 %, 90 % and 100 % of the target speed, the top speed, the limiting regime over time, battery
 * current and sag, and a closed energy balance (model and integrator: see the module comment).
 *
 * Formula (locked: weapon, or spinner gripping; k = G for a weapon, G·R/r_w for a spinner):
 * $J_{eff}\,\dot\Omega = \eta\,k\,N K_t\,(I - I_0) - T_f - c\,\Omega^2$, with
 * $I = \min\!\left(\dfrac{D V_{oc} - K_e k \Omega}{R + N D^2 R_p},\ I_{lim}\right)$,
 * $J_{eff} = J + (R/r_w)^2 n_w J_w + \eta k^2 N J_m$.
 * Slipping: $J\,\dot\Omega = \mu_k N_n R - T_f - c\Omega^2$ and
 * $(n_w J_w + \eta G^2 N J_m)\,\dot\omega_w = \eta G N K_t (I - I_0) - \mu_k N_n r_w$.
 *
 * @param input every field of `drivetrainInputs` [SI] and `driveType` ("weapon" | "spinner")
 * @param options what to record and when to stop (see `SpinUpOptions`)
 * @returns times [s], speeds [rad/s], currents [A], voltages [V], energies [J], figures at top and
 *   target speed, the regime segments, a verdict, and a time series of at most `maxPoints` points
 *
 * Assumptions: listed in the module comment. Not modelled: motor heating (R rises with
 * temperature), the controller's own losses, inductance, the robot translating while it spins,
 * and a spinner's wheels lifting or bouncing.
 * Example (invented demo weapon, `DEMO_WEAPON`): one 1400 rpm/V motor through a 2:1 belt at
 * 60 A on 4 cells turns a 6.3 × 10⁻⁴ kg·m² disc to 10 000 rpm in 1.01 s (current-limited for the first
 * 0.76 s), storing 345 J; it settles at 1180 rad/s (11 270 rpm), and the energy balance closes to 1e-8.
 *
 * Sources: motor-constants-wikipedia, ctms-dc-motor-speed, battery-thevenin-model,
 * erickson-power-electronics, gear-efficiency-model, serway-beichner-5e, leine-stick-slip-1998,
 * quadratic-air-drag, dormand-prince-1980, hairer-norsett-wanner-1, openstax-university-physics-1,
 * weapon-bite.
 */
export function simulateSpinUp(input: DrivetrainInput, options: SpinUpOptions = {}): SpinUpResult {
  const { driveType } = validateDrivetrainInput(input);
  const opts = readOptions(options);
  const spinner = driveType === "spinner";
  const m = buildModel(input, spinner);
  const run = integrate(m, opts);
  const y = run.y;

  const kinetic = 0.5 * (m.j * y[S_SPEED]! ** 2 + m.jw * (y[S_MOTOR]! / m.g) ** 2 + m.N * m.jm * y[S_MOTOR]! ** 2);
  const drawn = y[S_DRAWN]!;
  const losses = y[S_BATT]! + y[S_COPPER]! + y[S_MLOSS]! + y[S_GEAR]! + y[S_FRIC]! + y[S_DRAG]! + y[S_SLIP]!;
  const energy: EnergyBudget = {
    drawn,
    kinetic,
    batteryLoss: y[S_BATT]!,
    copperLoss: y[S_COPPER]!,
    motorLoss: y[S_MLOSS]!,
    gearLoss: y[S_GEAR]!,
    frictionLoss: y[S_FRIC]!,
    dragLoss: y[S_DRAG]!,
    slipLoss: y[S_SLIP]!,
    totalLoss: losses,
    balanceError: drawn > 0 ? Math.abs(drawn - kinetic - losses) / drawn : 0,
  };

  const [t50, t90, tTarget] = run.crossTimes as [number | null, number | null, number | null];
  const rho = spinner ? m.roff / m.rw : 1;
  const k = m.g * rho;
  const normal = input.weightShare * input.robotMass * STANDARD_GRAVITY;
  const drive: DriveSummary = {
    torqueConstant: m.kt,
    motorTurnsPerTurn: k,
    effectiveInertia: run.jLocked,
    timeConstant: run.tauLocked,
    idealNoLoadSpeed: (m.duty * m.voc) / (m.kt * k),
    currentLimitedAcceleration: Math.max(0, m.eta * k * m.N * m.kt * (m.ilim - m.i0) - m.tf) / run.jLocked,
    tractionLimit: spinner ? m.fs : null,
    tractionLimitedAcceleration: spinner
      ? tractionLimitedAcceleration({
          frictionCoefficient: input.kineticFriction,
          normalForce: normal,
          contactRadius: m.roff,
          inertia: m.j,
          frictionTorque: m.tf,
        })
      : null,
    normalForcePerWheel: spinner ? normal / input.drivenWheels : null,
    wheelTimeConstant: spinner ? run.tauWheel : null,
  };
  const verdict: SpinUpVerdict = run.topSpeed <= 0 ? "stalled" : tTarget !== null ? "reaches-target" : "falls-short";
  const warnings: string[] = [];
  if (run.endReason === "stalled") {
    warnings.push("The drive never moves: the friction torque and the motors' no-load loss exceed what the motors give at the current limit.");
  } else if (run.endReason === "max-time") {
    warnings.push(`The speed was still changing at the time limit (${m.maxTime} s); the top speed is the speed reached by then.`);
  } else if (run.endReason === "step-limit") {
    warnings.push(
      spinner && run.tauWheel < 1e-4
        ? `The run stopped after ${MAX_TRIALS} steps at ${run.endTime.toPrecision(3)} s: the wheels and motor rotors settle in ${run.tauWheel.toPrecision(2)} s, too fast to simulate beside the rest. Check the wheel and motor rotor inertias.`
        : `The run stopped after ${MAX_TRIALS} steps at ${run.endTime.toPrecision(3)} s, before the speed settled.`,
    );
  }
  return {
    driveType,
    verdict,
    endReason: run.endReason,
    endTime: run.endTime,
    targetSpeed: m.target,
    timeTo50: t50,
    timeTo90: t90,
    timeToTarget: tTarget,
    topSpeed: run.topSpeed,
    peakMotorSpeed: run.peakMotorSpeed,
    regimes: run.segments,
    peakBatteryCurrent: run.peakBatteryCurrent,
    averageBatteryCurrent: run.endTime > 0 ? y[S_CHARGE]! / run.endTime : run.peakBatteryCurrent,
    averageBatteryCurrentToTarget: tTarget !== null && tTarget > 0 && run.chargeAtTarget !== null ? run.chargeAtTarget / tTarget : null,
    chargeDrawn: y[S_CHARGE]!,
    peakMotorCurrent: run.peakMotorCurrent,
    minBatteryVoltage: run.minBatteryVoltage,
    openCircuitVoltage: m.voc,
    energy,
    energyToTarget: run.drawnAtTarget,
    atTopSpeed: speedFigures(input, run.topSpeed),
    atTargetSpeed: speedFigures(input, m.target),
    drive,
    series: run.series,
    solver: { acceptedSteps: run.accepted, rejectedSteps: run.rejected, evaluations: run.evaluations, modeSwitches: run.switches },
    warnings,
  };
}

// ---------------------------------------------------------------------------------------------
// Design comparison.

export interface DrivetrainComparison {
  /** One result per variant, in the order given. */
  results: SpinUpResult[];
  /** The variant that reaches its target first; null if none does. */
  fastestIndex: number | null;
  /** The variant with the highest top speed. */
  topSpeedIndex: number;
}

/**
 * Runs several design variants side by side (the same simulation as `simulateSpinUp`).
 *
 * @param variants 1 to 6 complete inputs (each with its own target)
 * @param options as in `simulateSpinUp`
 * @returns each variant's result, the fastest to its target and the one with the highest top speed
 *
 * Example: the demo weapon on 4 cells, on 6 cells, and on 4 cells with a 1.5:1 reduction reaches
 * 10 000 rpm in 1.01 s, 0.93 s and 1.22 s: the 6-cell variant is fastest and tops out highest.
 * Sources: as `simulateSpinUp`.
 */
export function compareDrivetrains(variants: readonly DrivetrainInput[], options: SpinUpOptions = {}): DrivetrainComparison {
  if (!Array.isArray(variants) || variants.length < 1 || variants.length > 6) {
    throw new CalcInputError({
      param: "variants",
      value: Array.isArray(variants) ? variants.length : variants,
      expected: "a list of 1 to 6 designs",
      unit: "",
    });
  }
  const results = variants.map((v) => simulateSpinUp(v, options));
  let fastestIndex: number | null = null;
  let topSpeedIndex = 0;
  results.forEach((r, i) => {
    if (r.timeToTarget !== null && (fastestIndex === null || r.timeToTarget < results[fastestIndex]!.timeToTarget!)) fastestIndex = i;
    if (r.topSpeed > results[topSpeedIndex]!.topSpeed) topSpeedIndex = i;
  });
  return { results, fastestIndex, topSpeedIndex };
}

export interface SweepPoint {
  /** The swept parameter's value [SI]. */
  value: number;
  /** [s], null if the target is not reached. */
  timeToTarget: number | null;
  /** [s], null if 90 % of the target is not reached. */
  timeTo90: number | null;
  /** [rad/s] */
  topSpeed: number;
  verdict: SpinUpVerdict;
  /** [A] */
  peakBatteryCurrent: number;
  /** Stored energy at the top speed [J]. */
  storedEnergy: number;
  /** True at the best point (see `DrivetrainSweep.optimumBy`). */
  isOptimum: boolean;
}

export interface DrivetrainSweep {
  parameter: DrivetrainParameter;
  points: SweepPoint[];
  /** Index of the best point: the shortest time to target, or, if no point reaches it, the highest top speed. */
  optimumIndex: number;
  optimumBy: "time-to-target" | "top-speed";
}

/** Throws unless `parameter` names one of the numeric spin-up inputs. */
function requireParameter(parameter: string): DrivetrainParameter {
  if (!Object.hasOwn(drivetrainInputs, parameter)) {
    throw new CalcInputError({ param: "parameter", value: parameter, expected: 'one of the spin-up inputs (e.g. "gearRatio")', unit: "" });
  }
  return parameter as DrivetrainParameter;
}

/**
 * The values a sweep visits: evenly spaced from `from` to `to`, or, for a whole-number input,
 * each whole number in the range once. Split out of `sweepDrivetrain` so that a page can run the
 * points in small batches and stay responsive.
 *
 * @param parameter the input to vary, any key of `drivetrainInputs`
 * @param from first value [SI], within the parameter's declared range
 * @param to last value [SI], within the declared range (may be below `from`)
 * @param points 2 to 200 values (default 50); a whole-number parameter takes each whole number in
 *   the range once, at most `points` of them, spread evenly
 * @returns the values [SI], in sweep order
 *
 * Example: the reduction from 1 to 4 in 4 points → 1, 2, 3, 4; cells from 2 to 8 in 50 points →
 * 2, 3, 4, 5, 6, 7, 8. Sources: as `simulateSpinUp`.
 */
export function sweepValues({
  parameter,
  from,
  to,
  points = 50,
}: {
  parameter: DrivetrainParameter | string;
  from: number;
  to: number;
  points?: number;
}): number[] {
  const name = requireParameter(parameter);
  const spec: InputSpec = drivetrainInputs[name];
  const unit = SI_SYMBOL[spec.kind] ?? "";
  const range = { min: spec.min, max: spec.max, minOpen: spec.minOpen };
  requireInRange("from", from, unit, range);
  requireInRange("to", to, unit, range);
  requireWhole("points", points, 2, 200);
  if (!spec.integer) return Array.from({ length: points }, (_, i) => (i === points - 1 ? to : from + ((to - from) * i) / (points - 1)));
  const lo = Math.ceil(Math.min(from, to));
  const hi = Math.floor(Math.max(from, to));
  const all: number[] = [];
  for (let v = lo; v <= hi; v++) all.push(v);
  if (all.length === 0) throw new CalcInputError({ param: "to", value: to, expected: `a range holding at least one whole number (from ${from})`, unit });
  let values = all.length <= points ? all : Array.from({ length: points }, (_, i) => all[Math.round((i * (all.length - 1)) / (points - 1))]!);
  values = [...new Set(values)];
  if (from > to) values.reverse();
  return values;
}

/**
 * One point of a sweep: the base design with one input changed, simulated without a time series
 * (the same simulation as `simulateSpinUp`).
 *
 * @param base a complete input
 * @param parameter the input to change, any key of `drivetrainInputs`
 * @param value its value [SI], within its declared range
 * @returns times to 90 % and 100 % of the target [s] (null if not reached), top speed [rad/s],
 *   verdict, peak battery current [A] and stored energy at the top speed [J]; `isOptimum` false
 *
 * Example: the demo weapon with a 3:1 reduction tops out below 10 000 rpm, so its time to target
 * is null and its verdict "falls-short". Sources: as `simulateSpinUp`.
 */
export function sweepPoint({ base, parameter, value }: { base: DrivetrainInput; parameter: DrivetrainParameter | string; value: number }): SweepPoint {
  const name = requireParameter(parameter);
  const r = simulateSpinUp({ ...base, [name]: value }, { series: false });
  return {
    value,
    timeToTarget: r.timeToTarget,
    timeTo90: r.timeTo90,
    topSpeed: r.topSpeed,
    verdict: r.verdict,
    peakBatteryCurrent: r.peakBatteryCurrent,
    storedEnergy: r.atTopSpeed.storedEnergy,
    isOptimum: false,
  };
}

/**
 * Marks the best point of a sweep: the shortest time to target; if no point reaches the target,
 * the highest top speed. Of points equal within the integration tolerance (1e-7), the first wins.
 * Sets `isOptimum` on that point (and clears it on the others).
 *
 * @param points one or more sweep points, in sweep order
 * @returns the index of the best point and the rule that chose it
 *
 * Example: times to target null, 1.2 s, 1.0 s, 1.1 s → index 2, "time-to-target".
 * Sources: as `simulateSpinUp`.
 */
export function markSweepOptimum(points: SweepPoint[]): { optimumIndex: number; optimumBy: DrivetrainSweep["optimumBy"] } {
  if (!Array.isArray(points) || points.length === 0) {
    throw new CalcInputError({ param: "points", value: Array.isArray(points) ? 0 : points, expected: "a list of at least one sweep point", unit: "" });
  }
  const TIE = 1e-7;
  let optimumIndex = -1;
  points.forEach((p, i) => {
    p.isOptimum = false;
    if (p.timeToTarget !== null && (optimumIndex < 0 || p.timeToTarget < points[optimumIndex]!.timeToTarget! * (1 - TIE))) optimumIndex = i;
  });
  let optimumBy: DrivetrainSweep["optimumBy"] = "time-to-target";
  if (optimumIndex < 0) {
    optimumBy = "top-speed";
    optimumIndex = 0;
    points.forEach((p, i) => {
      if (p.topSpeed > points[optimumIndex]!.topSpeed * (1 + TIE)) optimumIndex = i;
    });
  }
  points[optimumIndex]!.isOptimum = true;
  return { optimumIndex, optimumBy };
}

/**
 * Varies one numeric input over a range and reports time to target and top speed at each value,
 * with the best point marked (the same simulation as `simulateSpinUp`, without time series):
 * `sweepValues`, then `sweepPoint` at each value, then `markSweepOptimum`.
 *
 * @param base a complete input; every field but `parameter` is held
 * @param parameter the input to vary, any key of `drivetrainInputs`
 * @param from first value [SI], within the parameter's declared range
 * @param to last value [SI], within the declared range (may be below `from`)
 * @param points 2 to 200 evenly spaced values (default 50); a whole-number parameter takes each
 *   whole number in the range once, at most `points` of them
 * @returns one point per value and the optimum
 *
 * Example: the demo weapon's reduction from 1 to 4 in 31 points: time to 10 000 rpm is shortest at
 * 2.0 (1.01 s); above 2.2 the motor can no longer reach 10 000 rpm, so those points report null.
 * Sources: as `simulateSpinUp`.
 */
export function sweepDrivetrain({
  base,
  parameter,
  from,
  to,
  points = 50,
}: {
  base: DrivetrainInput;
  parameter: DrivetrainParameter | string;
  from: number;
  to: number;
  points?: number;
}): DrivetrainSweep {
  validateDrivetrainInput(base);
  const name = requireParameter(parameter);
  const values = sweepValues({ parameter: name, from, to, points });
  const out = values.map((value) => sweepPoint({ base, parameter: name, value }));
  const { optimumIndex, optimumBy } = markSweepOptimum(out);
  return { parameter: name, points: out, optimumIndex, optimumBy };
}

// ---------------------------------------------------------------------------------------------
// Worked example.

/**
 * An invented demo weapon (not any real robot): a 1.5 kg robot with a 120 mm steel disc
 * (0.35 kg, J = ½·m·r² = 6.3 × 10⁻⁴ kg·m²), one 1400 rpm/V outrunner (45 mΩ, 1.2 A no-load) on a
 * 2:1 belt at 95 %, 4 cells at 4.1 V and 8 mΩ each, a 60 A limit, aiming for 10 000 rpm.
 */
export const DEMO_WEAPON: Readonly<DrivetrainInput> = Object.freeze({
  driveType: "weapon",
  ...Object.fromEntries(Object.entries(drivetrainInputs).map(([key, spec]) => [key, spec.default])),
} as DrivetrainInput);

/**
 * An invented demo whole-body spinner (not any real robot): 1.5 kg, J = 0.005 kg·m² about its
 * centre, two direct-drive wheels of 18 mm radius whose contacts sit 70 mm from the centre and
 * carry 90 % of the weight, one 1100 rpm/V motor per wheel (90 mΩ, 0.6 A no-load, 30 A limit),
 * 3 cells at 4.1 V and 10 mΩ each, rubber on dry concrete (μ_s = 1.0, μ_k = 0.8), aiming for 3000 rpm.
 */
export const DEMO_SPINNER: Readonly<DrivetrainInput> = Object.freeze({
  ...DEMO_WEAPON,
  driveType: "spinner",
  motorCount: 2,
  motorKv: 1100 * RPM,
  motorResistance: 0.09,
  noLoadCurrent: 0.6,
  motorRotorInertia: 3e-6,
  currentLimit: 30,
  cellCount: 3,
  cellResistance: 0.01,
  gearRatio: 1,
  gearEfficiency: 1,
  inertia: 0.005,
  frictionTorque: 0.02,
  dragTorque: 0.05,
  dragReferenceSpeed: 3000 * RPM,
  targetSpeed: 3000 * RPM,
  tipRadius: 0.09,
  impactors: 1,
});

export interface DrivetrainWorkedExample {
  /** Says that the robots are invented. */
  note: string;
  weapon: { input: Readonly<DrivetrainInput>; result: SpinUpResult };
  spinner: { input: Readonly<DrivetrainInput>; result: SpinUpResult };
}

/**
 * The chapter's worked example: the invented demo weapon and demo spinner, simulated.
 *
 * @returns both inputs and results (with time series for the plots)
 *
 * Example: the weapon reaches 10 000 rpm in 1.01 s; the spinner's wheels slip for 2.22 s of its
 * 2.23 s to 3000 rpm, so traction, not the motors, sets its pace. Sources: as `simulateSpinUp`.
 */
export function drivetrainWorkedExample(): DrivetrainWorkedExample {
  return {
    note: "Both robots are invented for this handbook; their numbers are plausible, not measured.",
    weapon: { input: DEMO_WEAPON, result: simulateSpinUp(DEMO_WEAPON) },
    spinner: { input: DEMO_SPINNER, result: simulateSpinUp(DEMO_SPINNER) },
  };
}

/** Source keys this module relies on (checked by the meta test). */
export const DRIVETRAIN_SOURCE_KEYS: readonly SourceKey[] = [
  "motor-constants-wikipedia",
  "ctms-dc-motor-speed",
  "battery-thevenin-model",
  "erickson-power-electronics",
  "gear-efficiency-model",
  "serway-beichner-5e",
  "leine-stick-slip-1998",
  "quadratic-air-drag",
  "dormand-prince-1980",
  "hairer-norsett-wanner-1",
  "openstax-university-physics-1",
  "softschools-rotational-ke",
  "weapon-bite",
];
