import { STANDARD_GRAVITY } from "../core/constants.ts";
import { torqueConstantFromKv } from "./motor.ts";
import type { CurrentLimitAt, DrivetrainInput, NoLoadLoss } from "./inputs.ts";
import { R_CURRENT, R_STALLED, R_TRACTION, R_VOLTAGE, type RegimeSegment, type SpinUpEndReason, type SpinUpPoint } from "./results.ts";

// ---------------------------------------------------------------------------------------------
// The model, reduced to numbers.

export interface Model {
  spinner: boolean;
  N: number;
  kt: number;
  rm: number;
  i0: number;
  /** Motor no-load speed at V₀ when the loss grows with speed [rad/s]; 0 for a constant loss torque. */
  w0: number;
  jm: number;
  ilim: number;
  /** Where the current limit acts: LIMIT_MOTOR, LIMIT_BATTERY or LIMIT_NONE. */
  limitAt: number;
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
  /** Static and kinetic friction per newton of wheel load [-] (the coefficients; 0 for a weapon). */
  mus: number;
  muk: number;
  /** Wheel load at rest, s·M·g [N], and the most it can carry, M·g [N]. */
  normal0: number;
  normalMax: number;
  /**
   * One wheel and a skid: the wheel load the wheels' gyroscopic moment adds per unit of motor speed
   * times spin, (J_w + G·n·J_m)/(2·R·G) [N·s²] (0 with two wheels or more, where the moments cancel).
   */
  gyroLoad: number;
  target: number;
  maxTime: number;
}

/** The input reduced to the model's numbers (SI; see the module comment). @internal */
export function buildModel(input: DrivetrainInput, spinner: boolean, limitAt: CurrentLimitAt = "motor", noLoadLoss: NoLoadLoss = "constant"): Model {
  const kt = torqueConstantFromKv({ kv: input.motorKv });
  const normal = input.weightShare * input.robotMass * STANDARD_GRAVITY;
  return {
    spinner,
    N: input.motorCount,
    kt,
    rm: input.motorResistance,
    i0: input.noLoadCurrent,
    // ctms-dc-motor-speed, steady state at no load: ω₀ = (V₀ − I₀·R)/K_e, the speed I₀ was measured at.
    w0: noLoadLoss === "speed" ? (input.noLoadVoltage - input.noLoadCurrent * input.motorResistance) / kt : 0,
    jm: input.motorRotorInertia,
    ilim: input.currentLimit,
    limitAt: limitAt === "battery" ? LIMIT_BATTERY : limitAt === "none" ? LIMIT_NONE : LIMIT_MOTOR,
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
    mus: spinner ? input.staticFriction : 0,
    muk: spinner ? input.kineticFriction : 0,
    normal0: normal,
    normalMax: input.robotMass * STANDARD_GRAVITY,
    // meriam-kraige-dynamics, steady precession: M = (J_w·ω_w + n·J_m·G·ω_w)·Ω with ω_w = ω_m/G; the skid
    // sits as far out opposite the wheel, so the wheel gains M/(2R) (calc/steering/gyro.ts wheelNormalLoads).
    gyroLoad:
      spinner && input.drivenWheels === 1
        ? (input.wheelInertia + input.gearRatio * input.motorCount * input.motorRotorInertia) / (2 * input.wheelOffset * input.gearRatio)
        : 0,
    target: input.targetSpeed,
    maxTime: input.maxTime,
  };
}

/** Where the current limit acts (Model.limitAt). */
export const LIMIT_MOTOR = 0;
export const LIMIT_BATTERY = 1;
export const LIMIT_NONE = 2;

// State vector: speeds, then the running integrals of every power flow.
export const S_SPEED = 0; // Ω, rotor or robot [rad/s]
export const S_MOTOR = 1; // ω_m, motor shaft (relative to the robot) [rad/s]
export const S_DRAWN = 2;
export const S_BATT = 3;
export const S_COPPER = 4;
export const S_MLOSS = 5;
export const S_GEAR = 6;
export const S_FRIC = 7;
export const S_DRAG = 8;
export const S_SLIP = 9;
export const S_CHARGE = 10;
export const NS = 11;

export const MAX_TRIALS = 50_000;
export const MAX_SWITCHES = 10_000;
export const STEADY_TOLERANCE = 1e-5;
export const SPEED_FRACTIONS = [0.5, 0.9, 1] as const;

export const LOCKED = 0;
export const SLIPPING = 1;

export interface RawRun {
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
export class SpinUpSystem {
  readonly spinner: boolean;
  readonly N: number;
  readonly kt: number;
  readonly rm: number;
  readonly i0: number;
  readonly w0: number;
  readonly jm: number;
  readonly ilim: number;
  readonly limitAt: number;
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
  readonly mus: number;
  readonly muk: number;
  readonly normal0: number;
  readonly normalMax: number;
  readonly gyroLoad: number;
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
    this.w0 = m.w0;
    this.jm = m.jm;
    this.ilim = m.ilim;
    this.limitAt = m.limitAt;
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
    this.mus = m.mus;
    this.muk = m.muk;
    this.normal0 = m.normal0;
    this.normalMax = m.normalMax;
    this.gyroLoad = m.gyroLoad;
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

  /**
   * Load on the driven wheels at spin om and motor speed wm [N]: s·M·g, plus, for one wheel and a
   * skid, the share of the wheels' gyroscopic moment, up to the whole weight (the skid lifts).
   */
  normalAt(om: number, wm: number): number {
    return Math.min(this.normalMax, Math.max(0, this.normal0 + this.gyroLoad * wm * om));
  }

  /** Most grip the wheels give at this state, μ_s·N [N] (serway-beichner-5e: f_s ≤ μ_s n). */
  staticLimitAt(om: number, wm: number): number {
    return this.mus * this.normalAt(om, wm);
  }

  /** Sliding friction at this state, μ_k·N [N] (serway-beichner-5e: f_k = μ_k n). */
  kineticForceAt(om: number, wm: number): number {
    return this.muk * this.normalAt(om, wm);
  }

  /**
   * The no-load loss at motor speed wm as a current [A]: I₀ at every speed (constant loss torque),
   * or I₀·ω/ω₀, a loss torque in proportion to speed that equals K_t·I₀ at the speed ω₀ where I₀
   * was measured (the viscous friction term b·ω of ctms-dc-motor-speed, with b = K_t·I₀/ω₀).
   */
  lossCurrent(wm: number): number {
    return this.w0 > 0 ? (this.i0 * wm) / this.w0 : this.i0;
  }

  /** Controller, battery and motor at motor speed wm (erickson-power-electronics, battery-thevenin-model). */
  electrical(wm: number): void {
    const emf = this.kt * wm; // ctms-dc-motor-speed: e = K_e ω
    let current = (this.duty * this.voc - emf) / this.rTot; // D·V_b − e = I·R with V_b = V_oc − R_p·N·D·I
    let d = this.duty;
    this.limited = false;
    if (this.limitAt === LIMIT_BATTERY && d * current > this.ilim) {
      // Battery side held at I_lim per motor: V_b = V_oc − R_p·N·I_lim, and D·I = I_lim with
      // D·V_b − e = I·R gives V_b·D² − e·D − I_lim·R = 0, the positive root (erickson-power-electronics).
      const vb = this.voc - this.rp * this.N * this.ilim;
      d = (emf + Math.sqrt(emf * emf + 4 * vb * this.ilim * this.rm)) / (2 * vb);
      current = this.ilim / d;
      this.limited = true;
    } else if (this.limitAt === LIMIT_MOTOR && current > this.ilim) {
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
    const tm = this.N * this.kt * (this.current - this.lossCurrent(wm)); // motor torque net of the no-load loss
    const load = this.tf + this.c * om * om;
    let acc = (this.k * this.eta * tm - load) / this.jLockF; // gear-efficiency-model, motors driving
    // Stryker disable next-line EqualityOperator: equivalent, at zero output torque both gear directions give the same acceleration, −T_load/J_load
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
      const tm = this.N * this.kt * (this.current - this.lossCurrent(wm));
      const f = this.dir * this.kineticForceAt(om, wm); // serway-beichner-5e: f_k = μ_k n
      let dww = (this.g * this.eta * tm - f * this.rw) / this.jWheelF;
      tg = this.jw * dww + f * this.rw;
      // Stryker disable next-line EqualityOperator: equivalent, at zero output torque the input torque is zero too, so both gear directions give the same wheel acceleration
      if (tg < 0) {
        dww = (this.g * (tm / this.eta) - f * this.rw) / this.jWheelR;
        tg = this.jw * dww + f * this.rw;
      }
      // Stryker disable next-line EqualityOperator: equivalent, at zero wheel acceleration and no motor speed the clamp changes only the output torque, which books nothing at ω_m ≤ 0
      if (wm <= 0 && dww <= 0) {
        dww = 0;
        tg = 0;
      }
      dwm = this.g * dww;
      accBody = (f * this.roff - load) / this.j;
      // Stryker disable next-line EqualityOperator: equivalent, at zero acceleration the clamp sets the 0 it already is
      if (om <= 0 && accBody <= 0) accBody = 0;
      this.force = f;
      this.stuck = false;
      pSlip = f * (ww * this.rw - om * this.roff);
    }
    const tin = this.N * this.kt * (this.current - this.lossCurrent(wm)) - this.N * this.jm * dwm; // torque into the reduction
    // gear-efficiency-model: driving, T_out = η·G·T_in, so the loss is (1 − η)·T_in·ω_m; driven, (1 − η)·(−T_out)·ω_w.
    // Stryker disable next-line EqualityOperator: equivalent, at ω_m = 0 both loss terms are 0, and T_out = 0 only when stalled (ω_m = k·Ω ≤ 0) or with T_in = 0 too
    const pGear = wm > 0 ? (tg >= 0 ? (1 - this.eta) * tin * wm : -(1 - this.eta) * tg * ww) : 0;
    const ib = this.battCurrent;
    dy[S_SPEED] = accBody;
    dy[S_MOTOR] = dwm;
    dy[S_DRAWN] = this.voc * ib;
    dy[S_BATT] = this.rp * ib * ib;
    dy[S_COPPER] = this.N * this.rm * this.current * this.current;
    // Stryker disable next-line EqualityOperator: equivalent, at zero motor speed the loss power is 0 either way
    dy[S_MLOSS] = wm > 0 ? this.N * this.kt * this.lossCurrent(wm) * wm : 0;
    dy[S_GEAR] = pGear;
    // Stryker disable next-line EqualityOperator: equivalent, at zero speed the friction power is 0 either way
    dy[S_FRIC] = om > 0 ? this.tf * om : 0;
    // Stryker disable next-line EqualityOperator: equivalent, at zero speed the drag power is 0 either way
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

  /** Positive while the controller limits the current (motor or battery side); −I_lim, never positive, with no limit. */
  currentMargin(wm: number): number {
    const current = (this.duty * this.voc - this.kt * wm) / this.rTot;
    return this.limitAt === LIMIT_NONE ? -this.ilim : (this.limitAt === LIMIT_BATTERY ? this.duty * current : current) - this.ilim;
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
    if (Math.abs(this.force) > this.staticLimitAt(y[S_SPEED]!, y[S_MOTOR]!)) {
      this.mode = SLIPPING;
      // Stryker disable next-line EqualityOperator: equivalent, reached only with |F| > μ_s·N ≥ 0, so F is never 0 here
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
