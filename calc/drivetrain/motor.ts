/**
 * The DC motor in closed form: constants from Kv, the straight torque–speed line, and the
 * first-order spin-up of an inertia. These are the textbook limits the spin-up simulation in
 * drivetrain.ts reduces to, and the chapter's formulas. SI in and out: rad/s, V, A, Ω, N·m, kg·m².
 *
 * A brushless motor driven by a hobby speed controller is treated as a brushed DC motor with the
 * same Kv and winding resistance (the averaged, commutation-free model).
 */
import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import type { SourceKey } from "../sources/index.ts";
import { type NamedValue, requireFiniteFields, requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

/**
 * Torque constant from the velocity constant (motor-constants-wikipedia); in SI the torque and
 * back-EMF constants are the same number (ctms-dc-motor-speed).
 *
 * Formula: $K_t = K_e = \dfrac{1}{K_v} = \dfrac{60}{2\pi\,K_{v,\mathrm{rpm}}}$
 *
 * @param kv K_v, the velocity constant [rad/(s·V)], greater than 0 (1 rpm/V = 2π/60 rad/(s·V))
 * @returns K_t [N·m/A], equal to K_e [V·s/rad]
 *
 * Assumptions: an ideal machine (no saturation, no armature reaction); the data-sheet Kv is
 * the no-load speed per volt. Example: Kv = 1000 rpm/V (104.72 rad/(s·V)) gives
 * K_t = 0.009 549 N·m/A; 100 rpm/V gives 0.095 49 N·m/A.
 *
 * Sources: motor-constants-wikipedia, ctms-dc-motor-speed.
 */
export function torqueConstantFromKv(input: { kv: number }): number {
  const { kv } = requireInputObject(input);
  requirePositive("kv", kv, "rad/(s·V)");
  return requireFiniteResult(1 / kv, "torque constant", { kv: [kv, "rad/(s·V)"] }); // motor-constants-wikipedia: K_T = 1/K_v(SI)
}

export interface MotorLine {
  /** K_t = K_e [N·m/A]. */
  torqueConstant: number;
  /** Speed with no load: the shaft torque is zero there [rad/s]. */
  noLoadSpeed: number;
  /** Current at zero speed, V/R [A]. */
  stallCurrent: number;
  /** Shaft torque at zero speed [N·m]. */
  stallTorque: number;
  /** Largest shaft power, at half the no-load speed [W]. */
  maxPower: number;
  /** Speed of the largest shaft power [rad/s]. */
  speedAtMaxPower: number;
}

/**
 * The straight torque–speed line of a DC motor at a fixed terminal voltage: no-load speed, stall
 * current and torque, and the peak shaft power (hughes-drury-motors; constants from
 * motor-constants-wikipedia).
 *
 * Formula: $T(\omega) = K_t\left(\dfrac{V - K_e\omega}{R} - I_0\right)$,
 * $\omega_{nl} = \dfrac{V - I_0R}{K_e}$, $I_{stall} = \dfrac{V}{R}$,
 * $T_{stall} = K_t\left(\dfrac{V}{R} - I_0\right)$, $P_{max} = \dfrac{(V - I_0R)^2}{4R}$
 *
 * @param kv K_v [rad/(s·V)], greater than 0
 * @param resistance R, winding resistance [Ω], greater than 0
 * @param voltage V, terminal voltage [V], greater than 0
 * @param noLoadCurrent I_0, current drawn at no load [A], 0 or more, below V/R (default 0)
 * @returns the line's end points and peak power (see `MotorLine`)
 *
 * Assumptions: no inductance (steady state), constant loss torque K_t·I_0 (with I_0 = 0 this is
 * the ideal line, P_max = V²/(4R)). Example (computed in double precision from these relations): V = 24 V, Kv = 100 rpm/V, R = 0.1 Ω →
 * ω_nl = 251.33 rad/s (2400 rpm), I_stall = 240 A, T_stall = 22.918 N·m, P_max = 1440 W.
 *
 * Sources: hughes-drury-motors, motor-constants-wikipedia.
 */
export function motorLine(input: { kv: number; resistance: number; voltage: number; noLoadCurrent?: number }): MotorLine {
  const { kv, resistance, voltage, noLoadCurrent = 0 } = requireInputObject(input);
  const kt = torqueConstantFromKv({ kv });
  requirePositive("resistance", resistance, "Ω");
  requirePositive("voltage", voltage, "V");
  requireNonNegative("noLoadCurrent", noLoadCurrent, "A");
  const stallCurrent = voltage / resistance; // hughes-drury-motors: I_stall = V/R
  if (!(noLoadCurrent < stallCurrent)) {
    throw new CalcInputError({
      param: "noLoadCurrent",
      value: noLoadCurrent,
      expected: `less than the stall current V/R (${stallCurrent.toPrecision(4)} A)`,
      unit: "A",
    });
  }
  const drivingVoltage = voltage - noLoadCurrent * resistance;
  const noLoadSpeed = drivingVoltage / kt; // hughes-drury-motors: ω_nl = V/K_e (less the I_0·R drop)
  const line = {
    torqueConstant: kt,
    noLoadSpeed,
    stallCurrent,
    stallTorque: kt * (stallCurrent - noLoadCurrent), // hughes-drury-motors: T_stall = K_t·V/R
    maxPower: (drivingVoltage * drivingVoltage) / (4 * resistance), // hughes-drury-motors: P_max = V²/(4R)
    speedAtMaxPower: noLoadSpeed / 2,
  };
  return requireFiniteFields(line, "motor line", motorInputs(kv, resistance, voltage));
}

/** A motor's inputs by name, for the finiteness guard. */
function motorInputs(kv: number, resistance: number, voltage: number): Record<string, NamedValue> {
  return { kv: [kv, "rad/(s·V)"], resistance: [resistance, "Ω"], voltage: [voltage, "V"] };
}

export interface MotorLinePoint {
  /** Shaft speed [rad/s]. */
  speed: number;
  /** Shaft torque [N·m]. */
  torque: number;
  /** Winding current [A]. */
  current: number;
  /** Shaft power T·ω [W]. */
  power: number;
}

/**
 * Points along the torque–speed line from stall to no load, for a plot (hughes-drury-motors).
 *
 * Formula: $T = K_t\left(\dfrac{V - K_e\omega}{R} - I_0\right)$, $P = T\omega$
 *
 * @param kv, resistance, voltage, noLoadCurrent as in `motorLine`
 * @param points number of points, a whole number from 2 to 1000 (default 41)
 * @returns evenly spaced points from ω = 0 to ω_nl: speed [rad/s], torque [N·m], current [A], power [W]
 *
 * @example
 * torqueSpeedLine({ kv: rpmToRadPerSecond(100), resistance: 0.1, voltage: 24 }, { points: 3 })[1] // → { torque: 11.46, power: 1440, … } (the ends: 22.92 N·m at stall, 0 at no load, power 0 at both)
 * Sources: hughes-drury-motors.
 */
export function torqueSpeedLine(
  input: { kv: number; resistance: number; voltage: number; noLoadCurrent?: number },
  options: { points?: number } = {},
): MotorLinePoint[] {
  const { kv, resistance, voltage, noLoadCurrent = 0 } = requireInputObject(input);
  const { points = 41 } = requireInputObject(options);
  const line = motorLine({ kv, resistance, voltage, noLoadCurrent });
  requireInRange("points", points, "", { min: 2, max: 1000 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
  const out: MotorLinePoint[] = [];
  for (let i = 0; i < points; i++) {
    const speed = (line.noLoadSpeed * i) / (points - 1);
    const current = (voltage - line.torqueConstant * speed) / resistance;
    const torque = i === points - 1 ? 0 : line.torqueConstant * (current - noLoadCurrent);
    out.push({ speed, torque, current, power: torque * speed });
  }
  return requireFiniteFields(out, "torque-speed line", motorInputs(kv, resistance, voltage));
}

/**
 * Mechanical time constant of a DC-motor drive spinning up an inertia at a fixed voltage
 * (first-order-step-response applied to the motor equations of ctms-dc-motor-speed).
 *
 * Formula: $\tau = \dfrac{J\,R}{N\,G^2\,\eta\,K_t K_e}$ (the reference case N = G = η = 1: $\tau = JR/(K_tK_e)$)
 *
 * @param inertia J, inertia at the output, including any reflected motor rotors [kg·m²], greater than 0
 * @param resistance R, resistance in the current path seen by one motor [Ω], greater than 0
 * @param torqueConstant K_t = K_e [N·m/A], greater than 0
 * @param motorCount N, identical motors in parallel on the load, 1 or more (default 1)
 * @param ratio G, motor turns per output turn, greater than 0 (default 1)
 * @param efficiency η, reduction efficiency, greater than 0 and at most 1 (default 1)
 * @returns τ [s]
 *
 * Assumptions: no inductance, linear motor, load with no speed-dependent torque.
 * @example
 * spinUpTimeConstant({ inertia: 0.01, resistance: 0.1, torqueConstant: torqueConstantFromKv({ kv: rpmToRadPerSecond(100) }) }) // → 0.1096622711 [s]
 *
 * Sources: ctms-dc-motor-speed, first-order-step-response.
 */
export function spinUpTimeConstant(input: {
  inertia: number;
  resistance: number;
  torqueConstant: number;
  motorCount?: number;
  ratio?: number;
  efficiency?: number;
}): number {
  const { inertia, resistance, torqueConstant, motorCount = 1, ratio = 1, efficiency = 1 } = requireInputObject(input);
  requirePositive("inertia", inertia, "kg·m²");
  requirePositive("resistance", resistance, "Ω");
  requirePositive("torqueConstant", torqueConstant, "N·m/A");
  requirePositive("motorCount", motorCount, "");
  requirePositive("ratio", ratio, "");
  requireInRange("efficiency", efficiency, "", { min: 0, max: 1, minOpen: true });
  // ctms-dc-motor-speed: J ω̇ = K_t (V − K_e ω)/R → τ = J R/(K_t K_e), here with N motors through G at η
  return requireFiniteResult((inertia * resistance) / (motorCount * ratio * ratio * efficiency * torqueConstant * torqueConstant), "time constant", {
    inertia: [inertia, "kg·m²"],
    resistance: [resistance, "Ω"],
    torqueConstant: [torqueConstant, "N·m/A"],
    motorCount: [motorCount, ""],
    ratio: [ratio, ""],
    efficiency: [efficiency, ""],
  });
}

/**
 * Speed of an inertia spun up by a DC motor at a fixed voltage, in closed form
 * (first-order-step-response).
 *
 * Formula: $\omega(t) = \omega_\infty - (\omega_\infty - \omega_0)\,e^{-t/\tau}$; from rest $\omega(t) = \omega_{nl}(1 - e^{-t/\tau})$
 *
 * @param finalSpeed ω_∞, the speed approached (the no-load speed for an ideal motor) [rad/s], finite
 * @param timeConstant τ [s], greater than 0
 * @param time t since the start [s], 0 or more
 * @param initialSpeed ω_0 [rad/s], finite (default 0)
 * @returns ω(t) [rad/s]
 *
 * @example
 * voltageLimitedSpeed({ finalSpeed: 251.327, timeConstant: 0.109662, time: 0.1 }) // → 150.3531096 [rad/s]
 * Sources: first-order-step-response.
 */
export function voltageLimitedSpeed(input: { finalSpeed: number; timeConstant: number; time: number; initialSpeed?: number }): number {
  const { finalSpeed, timeConstant, time, initialSpeed = 0 } = requireInputObject(input);
  requirePositive("timeConstant", timeConstant, "s");
  requireNonNegative("time", time, "s");
  if (!Number.isFinite(finalSpeed)) throw new CalcInputError({ param: "finalSpeed", value: finalSpeed, expected: "a finite number", unit: "rad/s" });
  if (!Number.isFinite(initialSpeed)) throw new CalcInputError({ param: "initialSpeed", value: initialSpeed, expected: "a finite number", unit: "rad/s" });
  // Only the speeds can take the result out of range: e^(−t/τ) lies in [0, 1].
  return requireFiniteResult(finalSpeed - (finalSpeed - initialSpeed) * Math.exp(-time / timeConstant), "speed", {
    finalSpeed: [finalSpeed, "rad/s"],
    initialSpeed: [initialSpeed, "rad/s"],
  }); // first-order-step-response
}

/**
 * Time for a first-order spin-up from rest to reach a fraction of its final speed
 * (first-order-step-response, the closed form solved for t).
 *
 * Formula: $t_f = -\tau\,\ln(1 - f)$; $t_{90} = \tau\ln 10$, $t_{95} = \tau \ln 20$
 *
 * @param timeConstant τ [s], greater than 0
 * @param fraction f of the final speed [-], 0 ≤ f < 1 (the final speed itself is never reached)
 * @returns t_f [s]
 *
 * @example
 * timeToSpeedFraction({ timeConstant: 0.1096622711, fraction: 0.9 }) // → 0.252506711 [s] (t_90)
 * Sources: first-order-step-response.
 */
export function timeToSpeedFraction(input: { timeConstant: number; fraction: number }): number {
  const { timeConstant, fraction } = requireInputObject(input);
  requirePositive("timeConstant", timeConstant, "s");
  requireInRange("fraction", fraction, "", { min: 0, max: 1, maxOpen: true });
  return requireFiniteResult(-timeConstant * Math.log1p(-fraction), "time to the speed fraction", {
    timeConstant: [timeConstant, "s"],
    // Stryker disable next-line ArrayDeclaration,StringLiteral: equivalent, an overflow needs τ above 4.9e306 s (|ln(1 − f)| ≤ 36.8), and f never lies further from 1 in orders of magnitude without making the product small
    fraction: [fraction, ""],
  }); // first-order-step-response
}

/**
 * Steady speed of a DC motor against viscous and constant friction at a fixed voltage
 * (ctms-dc-motor-speed; the constant-friction term added as a loss torque).
 *
 * Formula: $\omega_{ss} = \dfrac{K_t V - R\,T_f}{b R + K_t K_e}$ (CTMS: $\omega_{ss} = \dfrac{K V}{bR + K^2}$)
 *
 * @param torqueConstant K = K_t = K_e [N·m/A], greater than 0
 * @param resistance R [Ω], greater than 0
 * @param voltage V [V], 0 or more
 * @param viscousFriction b [N·m·s/rad], 0 or more (default 0)
 * @param frictionTorque T_f, a constant loss torque [N·m], 0 or more (default 0)
 * @returns ω_ss [rad/s]; 0 when the friction holds the motor at rest
 *
 * Assumptions: steady state, so the inductance drops out.
 * @example
 * dcMotorSteadySpeed({ torqueConstant: 0.01, resistance: 1, viscousFriction: 0.1, voltage: 1 }) // → 0.0999 [rad/s] (the CTMS case; the tutorial prints 0.1 rad/s)
 *
 * Sources: ctms-dc-motor-speed.
 */
export function dcMotorSteadySpeed(input: {
  torqueConstant: number;
  resistance: number;
  voltage: number;
  viscousFriction?: number;
  frictionTorque?: number;
}): number {
  const { torqueConstant, resistance, voltage, viscousFriction = 0, frictionTorque = 0 } = requireInputObject(input);
  requirePositive("torqueConstant", torqueConstant, "N·m/A");
  requirePositive("resistance", resistance, "Ω");
  requireNonNegative("voltage", voltage, "V");
  requireNonNegative("viscousFriction", viscousFriction, "N·m·s/rad");
  requireNonNegative("frictionTorque", frictionTorque, "N·m");
  const drive = torqueConstant * voltage - resistance * frictionTorque;
  if (drive <= 0) return 0;
  return requireFiniteResult(drive / (viscousFriction * resistance + torqueConstant * torqueConstant), "steady speed", {
    torqueConstant: [torqueConstant, "N·m/A"],
    resistance: [resistance, "Ω"],
    voltage: [voltage, "V"],
    viscousFriction: [viscousFriction, "N·m·s/rad"],
    frictionTorque: [frictionTorque, "N·m"],
  }); // ctms-dc-motor-speed
}

/** Source keys this module relies on (checked by the meta test). */
export const MOTOR_SOURCES: readonly SourceKey[] = ["motor-constants-wikipedia", "ctms-dc-motor-speed", "hughes-drury-motors", "first-order-step-response"];
