import type { CurrentLimitAt, DriveType, NoLoadLoss } from "./inputs.ts";

// ---------------------------------------------------------------------------------------------
// Results.

/** What limits the acceleration at a moment. */
export type SpinUpRegime = "current-limit" | "voltage" | "traction" | "stalled";

export const REGIMES: readonly SpinUpRegime[] = ["current-limit", "voltage", "traction", "stalled"];
export const R_CURRENT = 0;
export const R_VOLTAGE = 1;
export const R_TRACTION = 2;
export const R_STALLED = 3;

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
  /** Height a 1 kg mass must fall to carry the same energy, E/(1 kg·g_n) [m]. */
  dropHeightPerKilogram: number;
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
  /** What the reflected rotors and wheels add to the output's own inertia, J_eff/J − 1 [-]. */
  addedInertiaShare: number;
  /** Mechanical time constant with the throttle's duty and the battery sag included [s]. */
  timeConstant: number;
  /** Output speed at which the motors' back-EMF equals the throttle's share of the open-circuit voltage [rad/s]. */
  idealNoLoadSpeed: number;
  /**
   * Output acceleration from rest (grip assumed) [rad/s²]: every motor at its current limit when the
   * limit acts on the motor current; at its stall current when it acts on the battery or nowhere.
   */
  currentLimitedAcceleration: number;
  /** Where the current limit acts ("motor", "battery" or "none"). */
  currentLimitAt: CurrentLimitAt;
  /** How the no-load loss is modelled ("constant" or "speed"). */
  noLoadLoss: NoLoadLoss;
  /** Each motor's current at standstill [A]: the limit (motor), above it (battery: I_lim/D), or (D·V_oc)/(R + N·D²·R_p) with no limit. */
  stallCurrent: number;
  /** The pack's current at standstill [A]. */
  stallBatteryCurrent: number;
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
  /** Time to 50 % of the target at the current-limited acceleration held constant, ½Ω_target/Ω̇_lim [s]; null when that acceleration is 0. */
  straightLineTimeTo50: number | null;
  /** Time to 90 % of the target [s]; null if not reached. */
  timeTo90: number | null;
  /** Time to the target [s]; null if not reached (then `topSpeed` is what the drive gets to). */
  timeToTarget: number | null;
  /** Highest speed reached [rad/s]. */
  topSpeed: number;
  /** How far the top speed lies above (+) or below (−) the target, as a fraction of it, Ω_top/Ω_target − 1 [-]. */
  topSpeedMargin: number;
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
