/**
 * The spin-up simulation: `simulateSpinUp` integrates the model from rest with adaptive steps,
 * locates every regime switch (current limit on and off, grip lost and regained) and speed crossing
 * on the dense output, and books every energy flow so the ledger closes.
 *
 * Why adaptive and not fixed-step RK4: a spin-up has phases an order of magnitude apart in time
 * scale (a slipping wheel settles in milliseconds while the body takes seconds; the approach to top
 * speed takes several mechanical time constants), and it has kinks (current limit on and off) and
 * switches (grip and slip) that must be located in time rather than stepped over. The embedded
 * error estimate picks each step, the dense output locates every switch and every speed crossing to
 * about 1e-13 of a step, and the energy flows are integrated as extra states under the same error
 * control, so the energy balance closes to the integration tolerance. The run stops at steady state
 * (the speed could rise by less than 1e-5 of itself), at the time limit, or at its step budget
 * (50 000 steps, a step shrunk below 1e-14 of the time, or 10 000 grip switches), whichever comes
 * first; it never runs unbounded. A spinner whose wheels and motor rotors are extremely light next
 * to the motors' torque (a wheel-side time constant of microseconds) is stiff for an explicit
 * method: such a run ends with `endReason` "step-limit" and a warning that starts "Stopped at … s:
 * too stiff to resolve in 50000 steps" (or says which other bound stopped it) rather than take
 * seconds. Inputs whose time constants leave the doubles are refused by name before any step.
 * Realistic pairings of motor and wheel give wheel-side time constants of milliseconds
 * and finish in well under 1 ms.
 */
import { requireInRange } from "../core/errors.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { Dopri5 } from "./dopri5.ts";
import { biteDepth, rotorKineticEnergy, rotorTipSpeed, tractionLimitedAcceleration } from "./figures.ts";
import { asCallerNames } from "../core/caller-names.ts";
import { type DrivetrainInput, drivetrainInputs, validateDrivetrainInput } from "./inputs.ts";
import { declaredInputs, type NamedValue, requireFiniteFields, requireFiniteResult, requireInputObject, requireWhole } from "../core/spec-check.ts";
import {
  LOCKED,
  MAX_SWITCHES,
  MAX_TRIALS,
  type Model,
  NS,
  type RawRun,
  SLIPPING,
  SPEED_FRACTIONS,
  STEADY_TOLERANCE,
  S_BATT,
  S_CHARGE,
  S_COPPER,
  S_DRAG,
  S_DRAWN,
  S_FRIC,
  S_GEAR,
  S_MLOSS,
  S_MOTOR,
  S_SLIP,
  S_SPEED,
  SpinUpSystem,
  buildModel,
} from "./model.ts";
import {
  type DriveSummary,
  type EnergyBudget,
  REGIMES,
  type RegimeSegment,
  type SpeedFigures,
  type SpinUpEndReason,
  type SpinUpOptions,
  type SpinUpPoint,
  type SpinUpResult,
  type SpinUpVerdict,
} from "./results.ts";

/** Peaks, regime segments and (optionally) the time series of a run. */
class Recorder {
  readonly keepSeries: boolean;
  topSpeed = 0;
  peakMotorSpeed = 0;
  peakBattCurrent = 0;
  peakCurrent = 0;
  minVoltage: number;
  // Stryker disable next-line UnaryOperator: equivalent, the first record is at time 0 = segStart, so no segment is pushed and segStart stays 0 whatever the start value
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
      // Stryker disable next-line LogicalOperator: equivalent, segRegime < 0 only at the first record, at time 0 = segStart, where time > segStart is false too
      if (this.segRegime >= 0 && time > this.segStart) this.segments.push({ regime: REGIMES[this.segRegime]!, start: this.segStart, end: time });
      // Stryker disable next-line EqualityOperator: equivalent, records come in non-decreasing time, so setting segStart = time when time = segStart changes nothing
      if (this.segRegime < 0 || time > this.segStart) this.segStart = time;
      this.segRegime = regime;
    }
    const om = y[S_SPEED]!;
    const wm = y[S_MOTOR]!;
    this.topSpeed = Math.max(this.topSpeed, om);
    this.peakMotorSpeed = Math.max(this.peakMotorSpeed, wm);
    this.peakBattCurrent = Math.max(this.peakBattCurrent, sys.battCurrent);
    this.peakCurrent = Math.max(this.peakCurrent, sys.current);
    this.minVoltage = Math.min(this.minVoltage, sys.battVoltage);
    // Stryker disable next-line ConditionalExpression: equivalent, series() returns [] without keepSeries, so arrays filled anyway are never read
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
    // Stryker disable next-line ConditionalExpression: equivalent, record(0) always runs before finish, so segRegime is already a regime (0 to 3)
    if (this.segRegime >= 0) this.segments.push({ regime: REGIMES[this.segRegime]!, start: this.segStart, end: Math.max(time, this.segStart) });
  }

  series(maxPoints: number): SpinUpPoint[] {
    // Stryker disable next-line ConditionalExpression: equivalent, without keepSeries the arrays are empty and pickIndices of no times is []
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
    const g1 = sys.staticLimitAt(y1[S_SPEED]!, y1[S_MOTOR]!) - Math.abs(sys.force); // the traction force is from the evaluation at y1 (k7)
    if (g1 < -tolForce) {
      st.prepareDense();
      const gripMargin = (th: number): number => {
        const om = st.dense(S_SPEED, th);
        const wm = st.dense(S_MOTOR, th);
        sys.lockedAcceleration(om, wm);
        return sys.staticLimitAt(om, wm) - Math.abs(sys.force);
      };
      const th = locate(gripMargin, gripMargin(0), g1, 1, (v) => v < -tolForce);
      if (event === EVENT_NONE || th < found.theta) {
        found.theta = th;
        event = EVENT_GRIP_LOST;
      }
    }
    // Stryker disable next-line LogicalOperator,ConditionalExpression: equivalent, a spinner reaches this branch only when SLIPPING, a weapon is never SLIPPING, and a weapon's rim slip ω_m/G − Ω is 0 up to rounding (under 1e-11 of the speed), far inside tolSlip (1e-9)
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
  sys.electrical(0);
  const chargeRef = m.N * sys.current * tauLocked;
  const rtol = opts.relativeTolerance;
  st.rtol = rtol;
  st.atol[S_SPEED] = rtol * speedRef;
  st.atol[S_MOTOR] = rtol * motorRef;
  // Stryker disable next-line EqualityOperator: equivalent, atol[S_CHARGE] is set again on the next line
  for (let i = S_DRAWN; i < S_CHARGE; i++) st.atol[i] = rtol * energyRef;
  st.atol[S_CHARGE] = rtol * chargeRef;
  const tolForce = 1e-9 * m.fs;
  const tolSlip = 1e-9 * speedRef * m.roff;
  const rec = new Recorder(opts.series, m.voc);
  // Stryker disable next-line ObjectLiteral: equivalent, findEvent writes found.theta before anything reads it
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
      // At err = 0, 0^−0.2 = ∞ and the factor is its cap, 10.
      let factor = Math.min(10, Math.max(0.2, 0.9 * err ** -0.2));
      if (lastRejected) factor = Math.min(1, factor);
      lastRejected = false;

      // Events inside the step, each located on the dense output; the earliest one cuts the step.
      const event = findEvent(sys, st, gCur, tolForce, tolSlip, found);
      const theta = found.theta;
      // Stryker disable next-line EqualityOperator: equivalent, a write at index NS of the length-NS Float64Array is ignored
      if (event !== EVENT_NONE) for (let i = 0; i < NS; i++) st.y1[i] = st.dense(i, theta);
      // Speed crossings (50 %, 90 %, 100 % of target) up to the end of the (possibly cut) step.
      // Stryker disable next-line ConditionalExpression,EqualityOperator: equivalent, past the last fraction SPEED_FRACTIONS[nextCross] is undefined, the level NaN, and the comparison false
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
          // Stryker disable next-line EqualityOperator: equivalent, grip is lost only when |force| exceeds μ_s·N plus a positive tolerance, so force is never 0 here
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
    // The secant's root; where it is not strictly inside (fb = fa gives ±∞ or NaN), the midpoint.
    let x = (a * fb - b * fa) / (fb - fa);
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

/** The figures at one speed; `speedName` is the caller's name for it, which a refusal of the bite names. */
function speedFigures(input: DrivetrainInput, angularSpeed: number, speedName: string): SpeedFigures {
  const storedEnergy = rotorKineticEnergy({ inertia: input.inertia, angularSpeed });
  return {
    angularSpeed,
    storedEnergy,
    tipSpeed: rotorTipSpeed({ angularSpeed, radius: input.tipRadius }),
    energyPerMass: storedEnergy / input.robotMass,
    // Gravitational potential energy E = m g h solved for h with m = 1 kg (openstax-university-physics-1).
    dropHeightPerKilogram: storedEnergy / STANDARD_GRAVITY,
    bite:
      angularSpeed > 0
        ? asCallerNames({ angularSpeed: speedName }, () => biteDepth({ closingSpeed: input.closingSpeed, angularSpeed, impactors: input.impactors }))
        : null,
  };
}

function readOptions(options: SpinUpOptions): Required<SpinUpOptions> {
  requireInputObject(options, "options");
  const maxPoints = options.maxPoints ?? 300;
  requireWhole("maxPoints", maxPoints, 2, 5000);
  const relativeTolerance = options.relativeTolerance ?? 1e-8;
  requireInRange("relativeTolerance", relativeTolerance, "", { min: 1e-12, max: 1e-3 });
  return { series: options.series ?? true, maxPoints, stopAtSteadyState: options.stopAtSteadyState ?? true, relativeTolerance };
}

/** The value when it is finite (a division by a zero or vanishing rate gives null instead). */
function finiteOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
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
 * Where the limit acts (`currentLimitAt`): "motor" caps I as above; "battery" caps D·I, so that
 * $V_b D^2 - K_e k\Omega\,D - I_{lim} R = 0$ with $V_b = V_{oc} - N R_p I_{lim}$ and $I = I_{lim}/D$
 * (erickson-power-electronics); "none" never caps it (stall: $I = D V_{oc}/(R + N D^2 R_p)$).
 * No-load loss (`noLoadLoss`): "constant" charges $I_0$ at every speed; "speed" charges
 * $I_0\,\omega_m/\omega_0$ with $\omega_0 = (V_0 - I_0 R)/K_e$, the viscous term $b\,\omega$ of
 * ctms-dc-motor-speed with $b = K_t I_0/\omega_0$.
 *
 * @param input every field of `drivetrainInputs` [SI], `driveType` ("weapon" | "spinner"), and
 *   optionally `currentLimitAt` ("motor", the default and the earlier model, | "battery" | "none")
 *   and `noLoadLoss` ("constant", the default and the earlier model, | "speed")
 * @param options what to record and when to stop (see `SpinUpOptions`)
 * @returns times [s], speeds [rad/s], currents [A], voltages [V], energies [J], figures at top and
 *   target speed, the top speed's margin over the target [-], the regime segments, a verdict, and a
 *   time series of at most `maxPoints` points
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
  const { driveType, currentLimitAt, noLoadLoss } = validateDrivetrainInput(input);
  const opts = readOptions(options);
  const spinner = driveType === "spinner";
  const m = buildModel(input, spinner, currentLimitAt, noLoadLoss);
  const named = () => declaredInputs(drivetrainInputs, input) as { [K in keyof typeof drivetrainInputs]: NamedValue };
  // Time constants beyond the doubles (a gear efficiency near the smallest double) are out of the
  // model's reach: refused by name before any step is taken.
  const probe = new SpinUpSystem(m);
  if (!(probe.tauLocked > 0 && Number.isFinite(probe.tauLocked) && probe.tauWheel > 0 && Number.isFinite(probe.tauWheel))) {
    const { gearEfficiency, gearRatio, motorKv, inertia, motorResistance, motorRotorInertia } = named();
    requireFiniteResult(Number.NaN, "drive's time constant", { gearEfficiency, gearRatio, motorKv, inertia, motorResistance, motorRotorInertia });
  }
  const run = integrate(m, opts);
  // Standstill: each motor's current and the pack's with the limit where it acts (stall draws D·V/R with none).
  const stall = new SpinUpSystem(m);
  stall.electrical(0);
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
    // Share added by the reflected inertias, J_eff/J − 1, with J_eff as above (serway-beichner-5e).
    addedInertiaShare: run.jLocked / input.inertia - 1,
    timeConstant: run.tauLocked,
    idealNoLoadSpeed: (m.duty * m.voc) / (m.kt * k),
    // Motor limit: every motor at I_lim (as before); battery limit or none: at its stall current.
    currentLimitedAcceleration:
      Math.max(0, m.eta * k * m.N * m.kt * ((currentLimitAt === "motor" ? m.ilim : stall.current) - stall.lossCurrent(0)) - m.tf) / run.jLocked,
    currentLimitAt,
    noLoadLoss,
    stallCurrent: stall.current,
    stallBatteryCurrent: stall.battCurrent,
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
    // Which bound of the step budget stopped it: the number of steps, a step size shrunk to nothing, or the grip chattering.
    const steps = run.accepted + run.rejected;
    const cause =
      steps >= MAX_TRIALS
        ? `too stiff to resolve in ${MAX_TRIALS} steps`
        : run.switches > MAX_SWITCHES
          ? `the grip switched between holding and slipping more than ${MAX_SWITCHES} times`
          : `too stiff to resolve: after ${steps} steps the step size fell below 10⁻¹⁴ of the time`;
    warnings.push(
      `Stopped at ${run.endTime.toPrecision(3)} s: ${cause}` +
        (spinner && run.tauWheel < 1e-4
          ? `; the wheels and motor rotors settle in ${run.tauWheel.toPrecision(2)} s, too fast to simulate beside the rest. Check the wheel and motor rotor inertias.`
          : ", before the speed settled."),
    );
  }
  if (m.gyroLoad > 0) {
    // Rolling, ω_m = k·Ω: the skid lifts where s·M·g + gyroLoad·k·Ω² reaches M·g (meriam-kraige-dynamics, steady precession).
    const lift = Math.sqrt((m.normalMax - m.normal0) / (m.gyroLoad * k));
    if (run.topSpeed > lift) {
      warnings.push(
        `The wheel's gyroscopic moment lifts the skid at ${Math.round((lift * 30) / Math.PI)} rpm; above it the robot tilts onto its wheel, which this model does not follow.`,
      );
    }
  }
  const result: SpinUpResult = {
    driveType,
    verdict,
    endReason: run.endReason,
    endTime: run.endTime,
    targetSpeed: m.target,
    timeTo50: t50,
    // Constant acceleration from rest: t = Ω/α, here Ω = ½Ω_target (openstax-university-physics-1).
    straightLineTimeTo50: finiteOrNull((0.5 * input.targetSpeed) / drive.currentLimitedAcceleration),
    timeTo90: t90,
    timeToTarget: tTarget,
    topSpeed: run.topSpeed,
    // Relative excess of the top speed over the target, Ω_top/Ω_target − 1 (definition of a relative difference, common practice).
    topSpeedMargin: run.topSpeed / m.target - 1,
    peakMotorSpeed: run.peakMotorSpeed,
    regimes: run.segments,
    peakBatteryCurrent: run.peakBatteryCurrent,
    averageBatteryCurrent: run.endTime > 0 ? y[S_CHARGE]! / run.endTime : run.peakBatteryCurrent,
    // Charge to the target ÷ time to it: null when the target is not reached (NaN) or the quotient is not finite.
    averageBatteryCurrentToTarget: finiteOrNull((run.chargeAtTarget ?? Number.NaN) / (tTarget ?? Number.NaN)),
    chargeDrawn: y[S_CHARGE]!,
    peakMotorCurrent: run.peakMotorCurrent,
    minBatteryVoltage: run.minBatteryVoltage,
    openCircuitVoltage: m.voc,
    energy,
    energyToTarget: run.drawnAtTarget,
    atTopSpeed: speedFigures(input, run.topSpeed, "topSpeed"),
    atTargetSpeed: speedFigures(input, m.target, "targetSpeed"),
    drive,
    series: run.series,
    solver: { acceptedSteps: run.accepted, rejectedSteps: run.rejected, evaluations: run.evaluations, modeSwitches: run.switches },
    warnings,
  };
  return requireFiniteFields(result, "spin-up figures", named);
}
