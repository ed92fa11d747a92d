/**
 * The steering model as a system of ODEs: a planar rigid body (position, velocity, heading, spin)
 * on n driven wheels whose speeds are states, driven by DC motors from one sagging pack, with
 * brush-model tyre forces, a skid, air drag, and the running integrals of every power flow.
 *
 * Geometry: wheel i sits at body angle α_i = 2πi/n, at R from the centre of mass; its axle is
 * radial (e_r), it rolls along e_t = ẑ × e_r. A wheel speed ω > 0 rolls it in the spin direction.
 * The velocity of the tyre at the contact relative to the floor is
 * V_s = v + Ω·R·e_t − ω·r_w·e_t (rigid-body kinematics, meriam-kraige-dynamics), and the tyre force
 * F (contact.ts) acts on the body at R·e_r and on the wheel's rim at r_w below the axle.
 *
 * Equations (meriam-kraige-dynamics, plane kinetics): M·v̇ = ΣF_i + F_skid; J·Ω̇ = Σ R·F_t,i + τ_skid − c·Ω|Ω|;
 * θ̇ = Ω; (J_w + m·G²·J_m)·ω̇_i = G·m·K_t·(I_i − I_0·s(ω_m)) − r_w·F_t,i, with F_t = F·e_t, the currents
 * from drive.ts, and s(x) = x/√(x² + 1 rad²/s²) a smooth sign for the no-load loss torque.
 * One wheel: a skid at −R·e_r carries what the wheel does not; the wheel's gyroscopic moment moves
 * weight onto the wheel (gyro.ts). Two or more: each wheel carries s_w·M·g/n, a centre skid the rest.
 *
 * The energy ledger is integrated with the state: drawn = V_oc·I_b; pack loss R_p·I_b²; copper
 * m·R_m·ΣI²; no-load loss; tyre slip −ΣF·V_s; skid −F·V; drag c·|Ω|³. In the model
 * drawn = Δ(kinetic) + every loss exactly, so the integrated ledger closes to the integrator's
 * tolerance.
 */
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { CalcInputError } from "../core/errors.ts";
import { torqueConstantFromKv } from "../drivetrain/motor.ts";
import { brushForceInto, LOW_SPEED, skidForceInto } from "./contact.ts";
import { PackSolver, type PackDriveParameters, steadyDuty } from "./drive.ts";
import { type SteeringInput, validateSteeringInput } from "./inputs.ts";

// State layout.
export const S_X = 0;
export const S_Y = 1;
export const S_VX = 2;
export const S_VY = 3;
export const S_TH = 4;
export const S_OM = 5;
export const S_W0 = 6;
/** Offsets after the wheel speeds. */
export const E_DRAWN = 0;
export const E_PACK = 1;
export const E_COPPER = 2;
export const E_NOLOAD = 3;
export const E_SLIP = 4;
export const E_SKID = 5;
export const E_DRAG = 6;
/** ∫ body-frame acceleration, x and y (for the sensor bias). */
export const E_ABX = 7;
export const E_ABY = 8;
const EXTRA = 9;

const SIGN_SPEED = 1; // rad/s, width of the smooth sign of the no-load loss torque

/** Everything the right-hand side reads, reduced to numbers. */
export class SteeringModel {
  readonly n: number;
  readonly dimension: number;
  /** Index of the first ledger entry. */
  readonly e0: number;
  readonly cosA: Float64Array;
  readonly sinA: Float64Array;
  readonly R: number;
  readonly rw: number;
  readonly M: number;
  readonly J: number;
  readonly jWheel: number;
  readonly G: number;
  readonly m: number;
  readonly kt: number;
  readonly rm: number;
  readonly i0: number;
  readonly drag: number;
  readonly mu: number;
  readonly stiffnessPerLoad: number;
  readonly muSkid: number;
  readonly weight: number;
  readonly share: number;
  readonly gyroInertia: number;
  readonly pack: PackSolver;
  readonly voc: number;
  readonly rp: number;
  readonly baseDuty: number;
  readonly depth: number;
  readonly spin0: number;
  readonly wheel0: number;
  /** Drive command per wheel: +1 add window, −1 opposite window, 0 base. Set by the controller. */
  readonly mode: Int8Array;
  private readonly duty: Float64Array;
  private readonly motorSpeed: Float64Array;
  readonly current: Float64Array;
  private readonly applied: Float64Array;
  private readonly ft: Float64Array;
  private readonly f2 = new Float64Array(2);
  /** From the last evaluation: the most grip any wheel used [-] (1 = sliding), and whether the skid was off the floor. */
  lastGrip = 0;
  /** Set by `setLoads`, which the constructor calls before anything reads it. */
  lastSkidLifted!: boolean;
  /** Normal loads from the last `setLoads` [N]. */
  loadWheel = 0;
  loadSkid = 0;

  constructor(input: SteeringInput) {
    validateSteeringInput(input);
    const n = input.wheelCount;
    this.n = n;
    this.e0 = S_W0 + n;
    this.dimension = S_W0 + n + EXTRA;
    this.cosA = new Float64Array(n);
    this.sinA = new Float64Array(n);
    // Stryker disable next-line EqualityOperator: equivalent, a write past a typed array's end is dropped
    for (let i = 0; i < n; i++) {
      this.cosA[i] = Math.cos((2 * Math.PI * i) / n);
      this.sinA[i] = Math.sin((2 * Math.PI * i) / n);
    }
    this.R = input.wheelOffset;
    this.rw = input.wheelRadius;
    this.M = input.robotMass;
    this.J = input.inertia;
    this.G = input.gearRatio;
    this.m = input.motorsPerWheel;
    this.kt = torqueConstantFromKv({ kv: input.motorKv });
    this.rm = input.motorResistance;
    this.i0 = input.noLoadCurrent;
    this.jWheel = input.wheelInertia + this.m * this.G * this.G * input.motorRotorInertia; // reflected rotor inertia G²·J_m
    this.gyroInertia = input.wheelInertia + this.m * this.G * input.motorRotorInertia; // angular momentum per wheel speed (gyro.ts)
    this.drag = input.spinDragTorque / (input.spinSpeed * input.spinSpeed); // quadratic-air-drag: T = c·Ω²
    this.mu = input.tyreFriction;
    this.stiffnessPerLoad = input.slipStiffness;
    this.muSkid = input.skidFriction;
    this.weight = input.robotMass * STANDARD_GRAVITY;
    this.share = n >= 2 ? input.weightShare : 0.5;
    this.voc = input.cellCount * input.cellVoltage; // battery-thevenin-model: n cells in series
    this.rp = input.cellCount * input.cellResistance;
    const pack: PackDriveParameters = {
      openCircuitVoltage: this.voc,
      packResistance: this.rp,
      motorResistance: this.rm,
      torqueConstant: this.kt,
      currentLimit: input.currentLimit,
      motorsPerGroup: this.m,
    };
    this.pack = new PackSolver(pack, n);
    this.mode = new Int8Array(n);
    this.duty = new Float64Array(n);
    this.motorSpeed = new Float64Array(n);
    this.current = new Float64Array(n);
    this.applied = new Float64Array(n);
    this.ft = new Float64Array(n);
    this.spin0 = input.spinSpeed;
    this.depth = input.depth;

    // Steady spin before the move: the wheels push just enough to hold Ω₀ against drag and skid.
    this.setLoads(input.spinSpeed, (input.spinSpeed * this.R) / this.rw);
    const loads = { wheel: this.loadWheel, skid: this.loadSkid };
    const vSkid = input.spinSpeed * this.R;
    const skidTorque = n === 1 ? (this.muSkid * loads.skid * vSkid * this.R) / Math.sqrt(vSkid * vSkid + LOW_SPEED * LOW_SPEED) : 0;
    const perWheel = (input.spinDragTorque + skidTorque) / (n * this.R); // tangential force each wheel must give
    const limit = this.mu * loads.wheel;
    if (perWheel > 0 && !(perWheel < limit)) {
      const needed = perWheel / loads.wheel;
      throw new CalcInputError({
        param: "tyreFriction",
        value: input.tyreFriction,
        expected: `more than ${Number(needed.toPrecision(3))} so that the wheels can hold the spin against the drag and skid`,
        unit: "",
      });
    }
    // Invert the brush curve: F/(μF_z) = 1 − (1 − u)³ (pacejka-tyre-dynamics), then σ = 3μF_z·u/C and V_r − ΩR = σ·√(V_r² + v_ε²).
    const u = perWheel > 0 ? 1 - Math.cbrt(1 - perWheel / limit) : 0;
    const sigma = perWheel > 0 ? (3 * limit * u) / (this.stiffnessPerLoad * loads.wheel) : 0;
    let vr = vSkid;
    for (let it = 0; it < 60; it++) vr = vSkid + sigma * Math.sqrt(vr * vr + LOW_SPEED * LOW_SPEED);
    this.wheel0 = vr / this.rw;
    const wm = this.G * this.wheel0;
    const current = this.i0 * (wm / Math.sqrt(wm * wm + SIGN_SPEED * SIGN_SPEED)) + (perWheel * this.rw) / (this.G * this.m * this.kt);
    if (current > input.currentLimit) {
      throw new CalcInputError({
        param: "spinSpeed",
        value: input.spinSpeed,
        expected: `low enough that holding it needs at most the current limit (it needs ${Number(current.toPrecision(3))} A per motor)`,
        unit: "rad/s",
      });
    }
    const base = steadyDuty(pack, n, wm, current);
    if (base === null) {
      throw new CalcInputError({ param: "spinSpeed", value: input.spinSpeed, expected: "a speed the pack can hold at full duty", unit: "rad/s" });
    }
    this.baseDuty = base;
    const headroom = input.oppositeWindow === 1 ? Math.min(1 - base, base) : 1 - base;
    if (input.depth > headroom) {
      throw new CalcInputError({
        param: "depth",
        value: input.depth,
        expected: `at most ${Number(headroom.toPrecision(3))}, the duty left ${input.oppositeWindow === 1 ? "above and below" : "above"} the ${Number(base.toPrecision(3))} that holds the spin`,
        unit: "",
      });
    }
  }

  /** Sets the wheel and skid normal loads at a spin and wheel speed (gyro.ts), without validation or allocation. */
  setLoads(spin: number, wheelSpeed: number): void {
    this.lastSkidLifted = false;
    if (this.n >= 2) {
      this.loadWheel = (this.share * this.weight) / this.n;
      this.loadSkid = (1 - this.share) * this.weight;
      return;
    }
    // meriam-kraige-dynamics: (N_w − N_s)·R = (J_w + m·G·J_m)·ω_w·Ω, N_w + N_s = M·g
    const wheel = this.weight / 2 + (this.gyroInertia * wheelSpeed * spin) / (2 * this.R);
    this.lastSkidLifted = wheel >= this.weight;
    this.loadWheel = Math.min(this.weight, Math.max(0, wheel));
    this.loadSkid = this.weight - this.loadWheel;
  }

  /**
   * The initial state: heading 0, steady spin, wheels at their steady speed, no drive pulses. Two or
   * more wheels: at rest in translation. One wheel: its wheel and skid forces add to a force fixed
   * in the body, so at steady spin the centre of mass circles once per turn with velocity
   * F/(M·Ω) turned back a quarter turn from the force (M·v̇ = F rotating at Ω); the run starts on
   * that circle (found by a few fixed-point passes, the force depending a little on the velocity),
   * so that with no pulses the centre stays put instead of drifting off at the circle's speed.
   */
  initialState(): Float64Array {
    const y = new Float64Array(this.dimension);
    y[S_OM] = this.spin0;
    for (let i = 0; i < this.n; i++) y[S_W0 + i] = this.wheel0;
    if (this.n === 1) {
      const saved = this.mode[0]!;
      this.mode[0] = 0;
      const dy = new Float64Array(this.dimension);
      for (let pass = 0; pass < 4; pass++) {
        this.rhs(y, dy);
        // meriam-kraige-dynamics: v = F/(iΩM) for a force rotating at Ω, i.e. (F_y, −F_x)/(ΩM)
        y[S_VX] = dy[S_VY]! / this.spin0;
        y[S_VY] = -dy[S_VX]! / this.spin0;
      }
      this.mode[0] = saved;
    }
    return y;
  }

  /** Kinetic energy: translation, spin, and each wheel with its motor rotors about their axles [J]. */
  kineticEnergy(y: Float64Array): number {
    let e = 0.5 * this.M * (y[S_VX]! ** 2 + y[S_VY]! ** 2) + 0.5 * this.J * y[S_OM]! ** 2;
    for (let i = 0; i < this.n; i++) e += 0.5 * this.jWheel * y[S_W0 + i]! ** 2;
    return e;
  }

  /** The right-hand side f(t, y) (see the module comment). */
  rhs(y: Float64Array, dy: Float64Array): void {
    const { n, R, rw, G, m, kt, f2, ft } = this;
    const vx = y[S_VX]!;
    const vy = y[S_VY]!;
    const th = y[S_TH]!;
    const om = y[S_OM]!;
    const c = Math.cos(th);
    const s = Math.sin(th);
    let fx = 0;
    let fy = 0;
    let torque = 0;
    let pSlip = 0;
    let grip = 0;
    this.setLoads(om, y[S_W0]!);
    const load = this.loadWheel;
    for (let i = 0; i < n; i++) {
      const ci = c * this.cosA[i]! - s * this.sinA[i]!; // e_r of wheel i
      const si = s * this.cosA[i]! + c * this.sinA[i]!;
      const w = y[S_W0 + i]!;
      const rel = om * R - w * rw; // (Ω·R − ω·r_w), along e_t = (−sin, cos)
      const vsx = vx - rel * si; // meriam-kraige-dynamics: V_s = v + (ΩR − ωr_w)·e_t
      const vsy = vy + rel * ci;
      const used = brushForceInto(vsx, vsy, w * rw, load, this.mu, this.stiffnessPerLoad * load, f2);
      if (used > grip) grip = used;
      const fxi = f2[0]!;
      const fyi = f2[1]!;
      fx += fxi;
      fy += fyi;
      const fti = -si * fxi + ci * fyi; // F·e_t
      ft[i] = fti;
      torque += R * fti; // (R e_r × F)_z = R·F_t
      pSlip -= fxi * vsx + fyi * vsy;
      this.motorSpeed[i] = G * w;
      this.duty[i] = this.baseDuty + this.mode[i]! * this.depth;
    }
    this.lastGrip = grip;
    let pSkid = 0;
    // Stryker disable next-line ConditionalExpression,LogicalOperator,EqualityOperator: equivalent, with no skid load or no skid friction the skid's force, torque and power are all zero, so this only skips the work
    if (this.loadSkid > 0 && this.muSkid > 0) {
      // A one-wheel robot's skid at −R·e_r of wheel 0; otherwise a centre skid.
      const kx = n === 1 ? vx + om * R * s : vx;
      const ky = n === 1 ? vy - om * R * c : vy;
      pSkid = skidForceInto(kx, ky, this.loadSkid, this.muSkid, f2); // serway-beichner-5e: f_k = μ_k n
      fx += f2[0]!;
      fy += f2[1]!;
      if (n === 1) torque -= R * (c * f2[1]! - s * f2[0]!); // (−R e_r × F)_z
    }
    const ib = this.pack.solve(this.duty, this.motorSpeed, this.current, this.applied);
    const e0 = this.e0;
    let copper = 0;
    let noLoad = 0;
    for (let i = 0; i < n; i++) {
      const wm = this.motorSpeed[i]!;
      const amps = this.current[i]!;
      const loss = kt * this.i0 * (wm / Math.sqrt(wm * wm + SIGN_SPEED * SIGN_SPEED));
      dy[S_W0 + i] = (G * m * (kt * amps - loss) - rw * ft[i]!) / this.jWheel; // torque through G, less the tyre's
      copper += m * this.rm * amps * amps;
      noLoad += m * loss * wm;
    }
    const dragTorque = this.drag * om * Math.abs(om); // quadratic-air-drag
    const ax = fx / this.M;
    const ay = fy / this.M;
    dy[S_X] = vx;
    dy[S_Y] = vy;
    dy[S_VX] = ax;
    dy[S_VY] = ay;
    dy[S_TH] = om;
    dy[S_OM] = (torque - dragTorque) / this.J;
    dy[e0 + E_DRAWN] = this.voc * ib;
    dy[e0 + E_PACK] = this.rp * ib * ib;
    dy[e0 + E_COPPER] = copper;
    dy[e0 + E_NOLOAD] = noLoad;
    dy[e0 + E_SLIP] = pSlip;
    dy[e0 + E_SKID] = pSkid;
    dy[e0 + E_DRAG] = dragTorque * om;
    dy[e0 + E_ABX] = c * ax + s * ay; // body frame: x along wheel 0's radius
    dy[e0 + E_ABY] = -s * ax + c * ay;
  }
}
