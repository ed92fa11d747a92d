import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { biteDepth, currentLimitedAcceleration, rotorKineticEnergy, rotorTipSpeed, tractionLimitedAcceleration } from "../../calc/drivetrain/figures.ts";
import { compareDrivetrains, markSweepOptimum, summariseSweep, sweepDrivetrain, sweepPoint, sweepValues } from "../../calc/drivetrain/compare.ts";
import { DEMO_SPINNER, DEMO_WEAPON, DRIVETRAIN_SOURCE_KEYS, drivetrainWorkedExample } from "../../calc/drivetrain/demo.ts";
import {
  DRIVE_TYPE_OPTIONS,
  DRIVE_TYPE_URL_KEY,
  drivetrainInputs,
  validateDrivetrainInput,
  type DrivetrainInput,
  type DrivetrainParameter,
} from "../../calc/drivetrain/inputs.ts";
import { simulateSpinUp } from "../../calc/drivetrain/simulate.ts";
import type { SpinUpResult } from "../../calc/drivetrain/results.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import { isSourceKey } from "../../calc/sources/index.ts";
import { rpmToRadPerSecond } from "../../calc/core/units.ts";
import { STANDARD_GRAVITY } from "../../calc/core/constants.ts";

// odex ships TypeScript source without declarations; loading it through require keeps tsc out of it.
interface OdexSolver {
  relativeTolerance: number;
  absoluteTolerance: number;
  maxSteps: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number): { y: number[]; outcome: number };
}
const { Solver } = createRequire(import.meta.url)("odex") as { Solver: new (n: number) => OdexSolver };

/** |actual − expected| ≤ rtol·|expected| + atol. */
const close = (actual: number | null, expected: number, rtol: number, atol = 0) => {
  expect(actual).not.toBeNull();
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};

const RPM = rpmToRadPerSecond(1);

// An invented ideal motor (worked example computed in double precision from the ideal DC-motor
// relations and τ = J·R/(K_t·K_e), first-order-step-response): V = 24 V (6 cells × 4 V, no internal resistance), Kv = 100 rpm/V,
// R = 0.1 Ω, J = 0.01 kg·m², no losses, a current limit far above the 240 A stall current.
const OMEGA_NL = 2400 * RPM;
const TAU = (0.01 * 0.1) / (1 / (100 * RPM)) ** 2; // J·R/(K_t·K_e)
const IDEAL: DrivetrainInput = {
  ...DEMO_WEAPON,
  motorCount: 1,
  motorKv: 100 * RPM,
  motorResistance: 0.1,
  noLoadCurrent: 0,
  motorRotorInertia: 0,
  currentLimit: 1000,
  throttle: 1,
  cellCount: 6,
  cellVoltage: 4,
  cellResistance: 0,
  gearRatio: 1,
  gearEfficiency: 1,
  inertia: 0.01,
  frictionTorque: 0,
  dragTorque: 0,
  targetSpeed: OMEGA_NL,
};

/**
 * Closed form of a drag-free weapon drive: a constant-acceleration current-limited phase, then a
 * first-order approach to the speed where the motor torque meets the constant losses. Written here
 * from the model's equations, independently of calc/drivetrain/.
 */
function twoPhase(p: DrivetrainInput) {
  const kt = 1 / p.motorKv;
  const d = p.throttle;
  const voc = p.cellCount * p.cellVoltage;
  const rp = p.cellCount * p.cellResistance;
  const { motorCount: N, gearRatio: G, gearEfficiency: eta } = p;
  const rTot = p.motorResistance + N * d * d * rp;
  const jEff = p.inertia + eta * G * G * N * p.motorRotorInertia;
  const alpha = (eta * G * N * kt * (p.currentLimit - p.noLoadCurrent) - p.frictionTorque) / jEff;
  const wSwitch = (d * voc - p.currentLimit * rTot) / (kt * G);
  const tSwitch = wSwitch / alpha;
  const wFinal = (d * voc - rTot * (p.noLoadCurrent + p.frictionTorque / (eta * G * N * kt))) / (kt * G);
  const tau = (jEff * rTot) / (eta * G * G * N * kt * kt);
  const speedAt = (t: number) => (t <= tSwitch ? alpha * t : wFinal - (wFinal - wSwitch) * Math.exp(-(t - tSwitch) / tau));
  const timeTo = (w: number) => (w <= wSwitch ? w / alpha : tSwitch - tau * Math.log((wFinal - w) / (wFinal - wSwitch)));
  return { alpha, wSwitch, tSwitch, wFinal, tau, speedAt, timeTo, peakBattery: N * d * p.currentLimit, minVoltage: voc - rp * N * d * p.currentLimit };
}

// A drive exercising every term but drag: 2 motors, 3:1 at 90 %, 80 % throttle, a sagging pack,
// no-load current, bearing friction and rotor inertia (an invented test case).
const FULL_BASE: DrivetrainInput = {
  ...DEMO_WEAPON,
  motorCount: 2,
  motorKv: 300 * RPM,
  motorResistance: 0.05,
  noLoadCurrent: 2,
  motorRotorInertia: 1e-5,
  currentLimit: 40,
  throttle: 0.8,
  cellCount: 6,
  cellVoltage: 4,
  cellResistance: 0.01,
  gearRatio: 3,
  gearEfficiency: 0.9,
  inertia: 0.02,
  frictionTorque: 0.05,
  dragTorque: 0,
};
const FULL: DrivetrainInput = { ...FULL_BASE, targetSpeed: 0.95 * twoPhase(FULL_BASE).wFinal };

/** Every number inside a value, with its path. */
function numbersIn(value: unknown, path = "result"): [string, number][] {
  if (typeof value === "number") return [[path, value]];
  if (value === null || typeof value !== "object") return [];
  return Object.entries(value).flatMap(([k, v]) => numbersIn(v, `${path}.${k}`));
}

describe("rotational kinetic energy, tip speed and bite", () => {
  it.each([
    {
      source: "softschools-rotational-ke",
      locator: "question 1",
      inputs: { inertia: 1.0e-4, angularSpeed: 760.0 },
      expected: 28.88,
      rtol: 0.005 / 28.88,
      note: "printed to 4 significant figures: ± half a unit in the last digit",
    },
    {
      source: "softschools-rotational-ke",
      locator: "question 2",
      inputs: { inertia: 1500, angularSpeed: 8.0 },
      expected: 48000,
      rtol: 5e-3,
      note: "inputs printed to 3 significant figures",
    },
  ])("$source, $locator: ½·J·Ω² = $expected J ($note)", ({ inputs, expected, rtol }) => {
    close(rotorKineticEnergy(inputs), expected, rtol);
  });

  it("gives v·(60/rpm)/n for the bite: 3 m/s at 10 000 rpm with 2 impactors is 9 mm (weapon-bite)", () => {
    close(biteDepth({ closingSpeed: 3, angularSpeed: 10000 * RPM, impactors: 2 }), (3 * (60 / 10000)) / 2, 1e-14);
  });

  it("gives Ω·r for the tip speed", () => {
    close(rotorTipSpeed({ angularSpeed: 10000 * RPM, radius: 0.06 }), 62.83185307, 1e-9);
  });

  it("refuses a bite at zero speed and a fractional impactor count", () => {
    expect(() => biteDepth({ closingSpeed: 3, angularSpeed: 0, impactors: 2 })).toThrowError("angularSpeed must be greater than 0 rad/s (got 0 rad/s)");
    expect(() => biteDepth({ closingSpeed: 3, angularSpeed: 100, impactors: 1.5 })).toThrowError(
      "impactors must be a whole number at least 1 and at most 1000 (got 1.5)",
    );
  });
});

describe("the voltage-limited spin-up matches ω(t) = ω_nl(1 − e^(−t/τ)) (first-order-step-response, common practice)", () => {
  const run = simulateSpinUp(IDEAL, { maxPoints: 5000 });

  it("follows the closed form at every recorded point within 0.1 % of ω_nl", () => {
    // Brief's tolerance 0.1 %; the integrator (rtol 1e-8) actually lands within about 1e-8.
    for (const p of run.series) close(p.speed, OMEGA_NL * (1 - Math.exp(-p.time / TAU)), 0, 1e-3 * OMEGA_NL);
    for (const p of run.series) close(p.speed, OMEGA_NL * (1 - Math.exp(-p.time / TAU)), 0, 1e-7 * OMEGA_NL);
  });

  it("reaches 50 % at τ·ln 2 and 90 % at τ·ln 10, and never quite reaches ω_nl itself", () => {
    close(run.timeTo50, TAU * Math.LN2, 1e-3);
    close(run.timeTo90, TAU * Math.LN10, 1e-3);
    expect(run.timeToTarget).toBeNull();
    expect(run.verdict).toBe("falls-short");
    expect(run.endReason).toBe("steady-state");
    close(run.topSpeed, OMEGA_NL, 2e-5);
  });

  it("gives the speed at 0.1 s when the run is stopped at 0.1 s", () => {
    const short = simulateSpinUp({ ...IDEAL, maxTime: 0.1 }, { stopAtSteadyState: false });
    expect(short.endTime).toBe(0.1);
    close(short.topSpeed, OMEGA_NL * (1 - Math.exp(-0.1 / TAU)), 1e-3);
  });

  it("draws J·ω_nl²·(1 − e^(−t/τ)) from the battery, of which the part not stored is lost in the winding", () => {
    // Closed form of ∫V·I dt with I = (V/R)·e^(−t/τ); V²τ/R = J·ω_nl².
    const short = simulateSpinUp({ ...IDEAL, maxTime: 0.1 }, { stopAtSteadyState: false });
    const drawn = 0.01 * OMEGA_NL * OMEGA_NL * (1 - Math.exp(-0.1 / TAU));
    close(short.energy.drawn, drawn, 1e-6);
    close(short.energy.copperLoss, drawn - short.energy.kinetic, 1e-6);
    expect(short.energy.batteryLoss + short.energy.gearLoss + short.energy.frictionLoss + short.energy.dragLoss + short.energy.slipLoss).toBe(0);
  });

  it("reports the ideal drive's figures in closed form", () => {
    close(run.drive.timeConstant, TAU, 1e-12);
    close(run.drive.idealNoLoadSpeed, OMEGA_NL, 1e-12);
    close(run.drive.torqueConstant, 60 / (2 * Math.PI * 100), 1e-12);
    expect(run.regimes).toEqual([{ regime: "voltage", start: 0, end: run.endTime }]);
  });
});

describe("a current-limited phase, then a voltage-limited one, match their closed forms", () => {
  const cf = twoPhase(FULL);
  const run = simulateSpinUp(FULL, { maxPoints: 5000 });

  // Tolerance 1e-6: the integrator runs at rtol 1e-8 and the regime switch is located to 1e-13 of a step.
  it("accelerates at the constant η·G·N·K_t·(I_lim − I₀) − T_f over J_eff while the limit holds", () => {
    close(run.drive.currentLimitedAcceleration, cf.alpha, 1e-12);
    close(
      currentLimitedAcceleration({
        currentLimit: 40,
        torqueConstant: 1 / FULL.motorKv,
        inertia: 0.02,
        motorCount: 2,
        ratio: 3,
        efficiency: 0.9,
        noLoadCurrent: 2,
        frictionTorque: 0.05,
        motorRotorInertia: 1e-5,
      }),
      cf.alpha,
      1e-12,
    );
    for (const p of run.series.filter((q) => q.regime === "current-limit")) close(p.speed, cf.alpha * p.time, 0, 1e-9 * cf.wFinal);
  });

  it("lets go of the limit where the back-EMF leaves I_lim·(R + N·D²·R_p) of the throttle's voltage", () => {
    expect(run.regimes.map((s) => s.regime)).toEqual(["current-limit", "voltage"]);
    close(run.regimes[0]!.end, cf.tSwitch, 1e-6);
  });

  it("then approaches its top speed exponentially with τ = J_eff·(R + N·D²·R_p)/(η·G²·N·K_t²)", () => {
    for (const p of run.series) close(p.speed, cf.speedAt(p.time), 0, 1e-6 * cf.wFinal);
    close(run.timeTo50, cf.timeTo(0.5 * FULL.targetSpeed), 1e-6);
    close(run.timeTo90, cf.timeTo(0.9 * FULL.targetSpeed), 1e-6);
    close(run.timeToTarget, cf.timeTo(FULL.targetSpeed), 1e-6);
    close(run.topSpeed, cf.wFinal, 2e-5);
    close(run.drive.timeConstant, cf.tau, 1e-12);
  });

  it("draws the most battery current, N·D·I_lim, and sags deepest, at the end of the limit", () => {
    close(run.peakBatteryCurrent, cf.peakBattery, 1e-9);
    close(run.minBatteryVoltage, cf.minVoltage, 1e-9);
    close(run.peakMotorCurrent, 40, 1e-12);
  });

  it("closes its energy balance", () => {
    expect(run.energy.balanceError).toBeLessThan(1e-6);
  });
});

describe("a whole-body spinner", () => {
  it("accelerates at μ_k·N_n·R/J while its wheels slip (serway-beichner-5e)", () => {
    const spin = { ...DEMO_SPINNER, frictionTorque: 0, dragTorque: 0 };
    const run = simulateSpinUp(spin, { maxPoints: 5000 });
    const normal = 0.9 * 1.5 * STANDARD_GRAVITY;
    const alpha = (0.8 * normal * 0.07) / 0.005;
    close(tractionLimitedAcceleration({ frictionCoefficient: 0.8, normalForce: normal, contactRadius: 0.07, inertia: 0.005 }), alpha, 1e-14);
    close(run.drive.tractionLimitedAcceleration!, alpha, 1e-12);
    const slipping = run.series.filter((p) => p.regime === "traction");
    expect(slipping.length).toBeGreaterThan(10);
    // Constant acceleration is integrated exactly; only rounding remains.
    for (const p of slipping) close(p.speed, alpha * p.time, 0, 1e-9 * spin.targetSpeed);
    close(run.timeTo50, (0.5 * spin.targetSpeed) / alpha, 1e-9);
  });

  it("slips first, then grips once the robot catches up with its wheels, and books the slip as a loss", () => {
    const run = simulateSpinUp(DEMO_SPINNER);
    expect(run.regimes.map((s) => s.regime)).toEqual(["traction", "voltage"]);
    expect(run.energy.slipLoss).toBeGreaterThan(0.1 * run.energy.drawn);
    expect(run.energy.balanceError).toBeLessThan(1e-6);
    expect(run.drive.normalForcePerWheel).toBeCloseTo((0.9 * 1.5 * STANDARD_GRAVITY) / 2, 12);
  });

  it("behaves, while gripping, exactly as a weapon geared by G·R/r_w carrying the wheels' inertia × (R/r_w)²", () => {
    const grip = { ...DEMO_SPINNER, currentLimit: 8 }; // too little torque to break traction
    const rho = grip.wheelOffset / grip.wheelRadius;
    const asWeapon = {
      ...grip,
      driveType: "weapon",
      gearRatio: grip.gearRatio * rho,
      inertia: grip.inertia + rho * rho * grip.drivenWheels * grip.wheelInertia,
    };
    const a = simulateSpinUp(grip);
    const b = simulateSpinUp(asWeapon);
    expect(a.regimes.some((s) => s.regime === "traction")).toBe(false);
    close(a.timeToTarget, b.timeToTarget!, 1e-6);
    close(a.topSpeed, b.topSpeed, 1e-6);
    close(a.energy.drawn, b.energy.drawn, 1e-5);
  });

  it("is slowed by a higher current limit once its wheels start to slip, when μ_k < μ_s", () => {
    const sweep = sweepDrivetrain({ base: DEMO_SPINNER, parameter: "currentLimit", from: 5, to: 40, points: 36 });
    const best = sweep.points[sweep.optimumIndex]!;
    expect(best.value).toBe(14);
    expect(sweep.points.at(-1)!.timeToTarget!).toBeGreaterThan(best.timeToTarget! * 1.1);
  });

  it("is never slowed by a higher current limit when μ_k = μ_s", () => {
    const sweep = sweepDrivetrain({ base: { ...DEMO_SPINNER, kineticFriction: 1 }, parameter: "currentLimit", from: 5, to: 40, points: 15 });
    const times = sweep.points.map((p) => p.timeToTarget!);
    for (let i = 1; i < times.length; i++) expect(times[i]!).toBeLessThanOrEqual(times[i - 1]! * (1 + 1e-6));
  });

  it("stops within its step budget, and says why, when its wheels are absurdly light for its motors", () => {
    const stiff = {
      ...DEMO_SPINNER,
      wheelInertia: 1e-8,
      motorRotorInertia: 0,
      motorCount: 8,
      motorKv: 50 * RPM,
      motorResistance: 1e-3,
      cellResistance: 0,
      currentLimit: 1000,
    };
    const run = simulateSpinUp(stiff);
    expect(run.endReason).toBe("step-limit");
    expect(run.solver.acceptedSteps + run.solver.rejectedSteps).toBeLessThanOrEqual(50_000);
    expect(run.warnings[0]).toMatch(/too fast to simulate beside the rest/);
    for (const [path, v] of numbersIn(run)) expect(Number.isFinite(v), path).toBe(true);
  });
});

describe("a second method: odex (Hairer's GBS extrapolation code) on the same equations", () => {
  it("agrees on the demo weapon's speed and energy drawn, with sag, current limit, friction and drag", () => {
    const p = DEMO_WEAPON;
    const kt = 1 / p.motorKv;
    const voc = p.cellCount * p.cellVoltage;
    const rp = p.cellCount * p.cellResistance;
    const { motorCount: N, gearRatio: G, gearEfficiency: eta, throttle: d } = p;
    const c = p.dragTorque / p.dragReferenceSpeed ** 2;
    const jEff = p.inertia + eta * G * G * N * p.motorRotorInertia;
    // Written from the equations in the module comment: state [Ω, energy drawn].
    const rhs = (_t: number, [w]: number[]): number[] => {
      let i = (d * voc - kt * G * w!) / (p.motorResistance + N * d * d * rp);
      let duty = d;
      if (i > p.currentLimit) {
        i = p.currentLimit;
        const a = N * rp * i;
        const need = kt * G * w! + i * p.motorResistance;
        duty = (voc - Math.sqrt(voc * voc - 4 * a * need)) / (2 * a);
      }
      const torque = eta * G * N * kt * (i - p.noLoadCurrent) - p.frictionTorque - c * w! * w!;
      return [torque / jEff, voc * N * duty * i];
    };
    const run = simulateSpinUp(p, { maxPoints: 12 });
    const s = new Solver(2);
    s.relativeTolerance = 1e-11;
    s.absoluteTolerance = 1e-9;
    s.maxSteps = 100000;
    // Tolerance 1e-6: both integrators run far tighter; the gap is set by the kink at the current limit.
    for (const point of run.series.slice(1)) {
      const out = s.solve(rhs, 0, [0, 0], point.time);
      close(point.speed, out.y[0]!, 1e-6);
    }
    close(run.energy.drawn, s.solve(rhs, 0, [0, 0], run.endTime).y[1]!, 1e-6);
  });

  it("agrees on the demo spinner's body and wheel speeds while it slips", () => {
    const p = DEMO_SPINNER;
    const kt = 1 / p.motorKv;
    const voc = p.cellCount * p.cellVoltage;
    const rp = p.cellCount * p.cellResistance;
    const { motorCount: N, gearRatio: G, gearEfficiency: eta, throttle: d } = p;
    const c = p.dragTorque / p.dragReferenceSpeed ** 2;
    const F = p.kineticFriction * p.weightShare * p.robotMass * STANDARD_GRAVITY;
    const jWheel = p.drivenWheels * p.wheelInertia + eta * G * G * N * p.motorRotorInertia;
    // Slipping: body J·Ω̇ = F·R − T_f − cΩ²; wheel side (n_w·J_w + η·G²·N·J_m)·ω̇_w = η·G·N·K_t·(I − I₀) − F·r_w.
    const rhs = (_t: number, [w, wm]: number[]): number[] => {
      let i = (d * voc - kt * wm!) / (p.motorResistance + N * d * d * rp);
      if (i > p.currentLimit) i = p.currentLimit;
      const wheelAcc = (eta * G * N * kt * (i - p.noLoadCurrent) - F * p.wheelRadius) / jWheel;
      const bodyAcc = (F * p.wheelOffset - p.frictionTorque - c * w! * w!) / p.inertia;
      return [w! <= 0 && bodyAcc <= 0 ? 0 : bodyAcc, G * wheelAcc];
    };
    const run = simulateSpinUp(p, { maxPoints: 300 });
    const s = new Solver(2);
    s.relativeTolerance = 1e-11;
    s.absoluteTolerance = 1e-9;
    s.maxSteps = 100000;
    const slipping = run.series.filter((q) => q.regime === "traction" && q.time > 0);
    for (const point of slipping.filter((_, i) => i % 10 === 0)) {
      const out = s.solve(rhs, 0, [0, 0], point.time);
      close(point.speed, out.y[0]!, 1e-6, 1e-9);
      close(point.motorSpeed, out.y[1]!, 1e-6);
    }
  });
});

describe("run outputs", () => {
  const weapon = simulateSpinUp(DEMO_WEAPON);

  it("tiles the run with regime segments from 0 to the end", () => {
    for (const r of [weapon, simulateSpinUp(DEMO_SPINNER)]) {
      expect(r.regimes[0]!.start).toBe(0);
      expect(r.regimes.at(-1)!.end).toBe(r.endTime);
      for (let i = 1; i < r.regimes.length; i++) expect(r.regimes[i]!.start).toBe(r.regimes[i - 1]!.end);
    }
  });

  it("keeps the time series to at most 300 points, from 0 to the end, in time order", () => {
    const long = simulateSpinUp(DEMO_SPINNER, { stopAtSteadyState: false, relativeTolerance: 1e-11 });
    expect(long.solver.acceptedSteps).toBeGreaterThan(300);
    expect(long.series.length).toBeLessThanOrEqual(300);
    expect(long.series[0]!.time).toBe(0);
    expect(long.series.at(-1)!.time).toBe(long.endTime);
    for (let i = 1; i < long.series.length; i++) expect(long.series[i]!.time).toBeGreaterThan(long.series[i - 1]!.time);
    expect(simulateSpinUp(DEMO_WEAPON, { series: false }).series).toEqual([]);
  });

  it("runs to the time limit when asked not to stop at steady state", () => {
    const full = simulateSpinUp(DEMO_WEAPON, { stopAtSteadyState: false });
    expect(full.endReason).toBe("max-time");
    expect(full.endTime).toBe(DEMO_WEAPON.maxTime);
    expect(full.warnings[0]).toMatch(/still changing at the time limit/);
    close(full.topSpeed, weapon.topSpeed, 2e-5);
  });

  it("gives the stored energy, tip speed, energy per kg and bite at both top and target speed", () => {
    close(weapon.atTargetSpeed.storedEnergy, 0.5 * 6.3e-4 * (10000 * RPM) ** 2, 1e-14);
    close(weapon.atTargetSpeed.bite!, 0.009, 1e-12);
    close(weapon.atTopSpeed.storedEnergy, 0.5 * 6.3e-4 * weapon.topSpeed ** 2, 1e-14);
    close(weapon.atTopSpeed.tipSpeed, 0.06 * weapon.topSpeed, 1e-14);
    close(weapon.atTopSpeed.energyPerMass, weapon.atTopSpeed.storedEnergy / 1.5, 1e-14);
  });

  it("gives the average current to target as the charge to target over the time to target", () => {
    expect(weapon.averageBatteryCurrentToTarget!).toBeGreaterThan(weapon.averageBatteryCurrent);
    expect(weapon.averageBatteryCurrentToTarget!).toBeLessThanOrEqual(weapon.peakBatteryCurrent);
    expect(weapon.energyToTarget!).toBeLessThan(weapon.energy.drawn);
  });

  it("says when the target is out of reach, and reports the top speed instead", () => {
    const far = simulateSpinUp({ ...DEMO_WEAPON, targetSpeed: 20000 * RPM });
    expect(far.verdict).toBe("falls-short");
    expect(far.timeToTarget).toBeNull();
    expect(far.endReason).toBe("steady-state");
    expect(far.endTime).toBeLessThan(DEMO_WEAPON.maxTime);
    expect(far.topSpeed).toBeLessThan(far.drive.idealNoLoadSpeed);
    expect(far.atTopSpeed.angularSpeed).toBe(far.topSpeed);
  });

  it("gives the share the motor's rotor adds through the belt, J_eff/J − 1 with J_eff = J + ηG²N·J_m", () => {
    // Reflected inertia through a gear stage, J_eff = J + ηG²N·J_m (serway-beichner-5e, rotational dynamics; the model's own formula).
    const p = DEMO_WEAPON;
    const expected = (p.inertia + p.gearEfficiency * p.gearRatio ** 2 * p.motorCount * p.motorRotorInertia) / p.inertia - 1;
    expect(weapon.drive.addedInertiaShare).toBeCloseTo(expected, 12);
    expect(weapon.drive.addedInertiaShare).toBeCloseTo(weapon.drive.effectiveInertia / p.inertia - 1, 15);
  });

  it("gives the time to half the target at the current-limited acceleration held constant, t = ½Ω/α", () => {
    // Constant angular acceleration from rest, ω = αt (openstax-university-physics-1, rotational kinematics).
    expect(weapon.straightLineTimeTo50).toBeCloseTo((0.5 * DEMO_WEAPON.targetSpeed) / weapon.drive.currentLimitedAcceleration, 12);
    expect(weapon.straightLineTimeTo50!).toBeLessThan(weapon.timeTo50!);
    expect(simulateSpinUp({ ...DEMO_WEAPON, frictionTorque: 5 }).straightLineTimeTo50).toBeNull();
  });

  it("gives the top speed's margin over the target, Ω_top/Ω_target − 1: above 0 when reached, below when it falls short, −1 when stalled", () => {
    // Relative difference of two speeds (common practice).
    expect(weapon.topSpeedMargin).toBeCloseTo(weapon.topSpeed / DEMO_WEAPON.targetSpeed - 1, 15);
    expect(weapon.topSpeedMargin).toBeGreaterThan(0);
    const far = simulateSpinUp({ ...DEMO_WEAPON, targetSpeed: 20000 * RPM });
    expect(far.topSpeedMargin).toBeLessThan(0);
    expect(simulateSpinUp({ ...DEMO_WEAPON, frictionTorque: 5 }).topSpeedMargin).toBe(-1);
  });

  it("gives the height a 1 kg mass falls to carry the stored energy, h = E/(m·g) with m = 1 kg", () => {
    // Gravitational potential energy E = m·g·h (openstax-university-physics-1, §8.1), g_n = 9.80665 m/s² (cgpm-1901).
    for (const f of [weapon.atTopSpeed, weapon.atTargetSpeed]) expect(f.dropHeightPerKilogram).toBeCloseTo(f.storedEnergy / 9.80665, 12);
  });

  it("says so when friction holds the drive at rest", () => {
    const stuck = simulateSpinUp({ ...DEMO_WEAPON, frictionTorque: 5 });
    expect(stuck.verdict).toBe("stalled");
    expect(stuck.endReason).toBe("stalled");
    expect(stuck.topSpeed).toBe(0);
    expect(stuck.atTopSpeed.bite).toBeNull();
    expect(stuck.regimes).toEqual([{ regime: "stalled", start: 0, end: 0 }]);
    expect(stuck.warnings[0]).toMatch(/never moves/);
  });

  it("closes the energy balance of both demo robots (brief: within 1 %; in practice within 1e-7)", () => {
    const { weapon: w, spinner: s } = drivetrainWorkedExample();
    for (const r of [w.result, s.result]) {
      expect(r.energy.balanceError).toBeLessThan(0.01);
      expect(r.energy.balanceError).toBeLessThan(1e-7);
      const e = r.energy;
      expect(e.totalLoss).toBeCloseTo(e.batteryLoss + e.copperLoss + e.motorLoss + e.gearLoss + e.frictionLoss + e.dragLoss + e.slipLoss, 9);
      expect(Math.abs(e.drawn - e.kinetic - e.totalLoss) / e.drawn).toBeCloseTo(e.balanceError, 12);
    }
  });
});

describe("sweep summary (order statistics of the swept points)", () => {
  const point = (timeToTarget: number | null, topSpeed: number) => ({
    value: 1,
    timeToTarget,
    timeTo90: null,
    topSpeed,
    verdict: timeToTarget === null ? ("falls-short" as const) : ("reaches-target" as const),
    peakBatteryCurrent: 0,
    storedEnergy: 0,
    isOptimum: false,
  });

  it("gives the shortest and longest time to target, the count that miss, and the range of top speeds (by hand)", () => {
    const s = summariseSweep([point(null, 900), point(1.2, 1100), point(1.0, 1200), point(1.1, 1150)]);
    expect(s).toEqual({ shortestTimeToTarget: 1.0, longestTimeToTarget: 1.2, missedCount: 1, lowestTopSpeed: 900, highestTopSpeed: 1200 });
  });

  it("has no times when no point reaches the target", () => {
    expect(summariseSweep([point(null, 900), point(null, 950)])).toMatchObject({ shortestTimeToTarget: null, longestTimeToTarget: null, missedCount: 2 });
  });

  it("agrees with the demo weapon's gear-ratio sweep, whose best point is the shortest time", () => {
    const sweep = sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 1, to: 4, points: 31 });
    const s = summariseSweep(sweep.points);
    expect(s.shortestTimeToTarget).toBe(sweep.points[sweep.optimumIndex]!.timeToTarget);
    expect(s.missedCount).toBe(sweep.points.filter((p) => p.timeToTarget === null).length);
  });

  it("names points when the list is empty", () => {
    expect(() => summariseSweep([])).toThrowError(CalcInputError);
  });
});

describe("design comparison", () => {
  it("runs variants side by side and names the fastest and the fastest-spinning", () => {
    const c = compareDrivetrains([DEMO_WEAPON, { ...DEMO_WEAPON, cellCount: 6 }, { ...DEMO_WEAPON, gearRatio: 1.5 }]);
    expect(c.results).toHaveLength(3);
    expect(c.fastestIndex).toBe(1);
    expect(c.topSpeedIndex).toBe(1);
  });

  it("has no fastest variant when none reaches its target", () => {
    const c = compareDrivetrains([{ ...DEMO_WEAPON, targetSpeed: 30000 * RPM }]);
    expect(c.fastestIndex).toBeNull();
  });

  it("refuses an empty list or more than six variants", () => {
    expect(() => compareDrivetrains([])).toThrowError("variants must be a list of 1 to 6 designs (got 0)");
    expect(() => compareDrivetrains(Array(7).fill(DEMO_WEAPON))).toThrowError(CalcInputError);
  });

  it("sweeps the reduction and marks the fastest ratio, near the demo's 2:1", () => {
    const sweep = sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 1, to: 4, points: 31 });
    expect(sweep.points).toHaveLength(31);
    expect(sweep.optimumBy).toBe("time-to-target");
    expect(sweep.points[sweep.optimumIndex]!.value).toBeCloseTo(2, 12);
    expect(sweep.points.filter((p) => p.isOptimum)).toHaveLength(1);
    expect(sweep.points.at(-1)!.timeToTarget).toBeNull();
    expect(sweep.points.at(-1)!.verdict).toBe("falls-short");
  });

  it("marks the highest top speed when no point reaches the target", () => {
    const sweep = sweepDrivetrain({ base: { ...DEMO_WEAPON, targetSpeed: 30000 * RPM }, parameter: "gearRatio", from: 0.5, to: 2, points: 7 });
    expect(sweep.optimumBy).toBe("top-speed");
    const best = Math.max(...sweep.points.map((p) => p.topSpeed));
    expect(sweep.points[sweep.optimumIndex]!.topSpeed).toBe(best);
  });

  it("takes each whole number once when sweeping a count", () => {
    const sweep = sweepDrivetrain({ base: DEMO_WEAPON, parameter: "cellCount", from: 2, to: 8, points: 50 });
    expect(sweep.points.map((p) => p.value)).toEqual([2, 3, 4, 5, 6, 7, 8]);
  });

  it("keeps a 50-point sweep cheap: each point's spin-up takes a few hundred solver steps, far inside the 50 000-step budget", () => {
    // Counted, not timed (a wall-clock bound in a test fails on a busy machine): the work of a sweep
    // is its points' solver steps; `npm run bench` reports the time.
    const sweep = sweepDrivetrain({ base: DEMO_SPINNER, parameter: "wheelRadius", from: 0.01, to: 0.04, points: 50 });
    expect(sweep.points).toHaveLength(50);
    for (const { value } of sweep.points) {
      const { solver } = simulateSpinUp({ ...DEMO_SPINNER, wheelRadius: value }, { series: false });
      expect(solver.acceptedSteps + solver.rejectedSteps).toBeLessThan(500); // 97 to 202 here
    }
  });

  it("splits into values, points and an optimum that a page can run in batches, with the same answer", () => {
    const whole = sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 1, to: 4, points: 31 });
    const values = sweepValues({ parameter: "gearRatio", from: 1, to: 4, points: 31 });
    expect(values).toEqual(whole.points.map((p) => p.value));
    const points = values.map((value) => sweepPoint({ base: DEMO_WEAPON, parameter: "gearRatio", value }));
    expect(markSweepOptimum(points)).toEqual({ optimumIndex: whole.optimumIndex, optimumBy: whole.optimumBy });
    expect(points).toEqual(whole.points);
  });

  it("lists the values of a sweep as its doc comment says", () => {
    expect(sweepValues({ parameter: "gearRatio", from: 1, to: 4, points: 4 })).toEqual([1, 2, 3, 4]);
    expect(sweepValues({ parameter: "cellCount", from: 8, to: 2, points: 50 })).toEqual([8, 7, 6, 5, 4, 3, 2]);
    expect(sweepValues({ parameter: "cellCount", from: 1, to: 24, points: 3 })).toEqual([1, 13, 24]);
    expect(() => sweepValues({ parameter: "cellCount", from: 2.2, to: 2.8 })).toThrowError(
      "to must be a range holding at least one whole number (from 2.2) (got 2.8)",
    );
  });

  it("gives one point as the full simulation does, and a null time when the target is out of reach", () => {
    const p = sweepPoint({ base: DEMO_WEAPON, parameter: "gearRatio", value: 3 });
    const full = simulateSpinUp({ ...DEMO_WEAPON, gearRatio: 3 });
    expect(p).toEqual({
      value: 3,
      timeToTarget: null,
      timeTo90: full.timeTo90,
      topSpeed: full.topSpeed,
      verdict: "falls-short",
      peakBatteryCurrent: full.peakBatteryCurrent,
      storedEnergy: full.atTopSpeed.storedEnergy,
      isOptimum: false,
    });
    expect(() => sweepPoint({ base: DEMO_WEAPON, parameter: "colour", value: 1 })).toThrowError(CalcInputError);
  });

  it("marks the optimum by time to target, else by top speed (the doc comment's example)", () => {
    const pt = (timeToTarget: number | null, topSpeed = 100) => ({
      value: 0,
      timeToTarget,
      timeTo90: null,
      topSpeed,
      verdict: "falls-short" as const,
      peakBatteryCurrent: 0,
      storedEnergy: 0,
      isOptimum: true,
    });
    const points = [pt(null), pt(1.2), pt(1.0), pt(1.1)];
    expect(markSweepOptimum(points)).toEqual({ optimumIndex: 2, optimumBy: "time-to-target" });
    expect(points.map((p) => p.isOptimum)).toEqual([false, false, true, false]);
    expect(markSweepOptimum([pt(null, 5), pt(null, 7), pt(null, 7)])).toEqual({ optimumIndex: 1, optimumBy: "top-speed" });
    expect(() => markSweepOptimum([])).toThrowError("points must be a list of at least one sweep point (got 0)");
  });

  it("refuses an unknown parameter and a range outside the declared one", () => {
    expect(() => sweepDrivetrain({ base: DEMO_WEAPON, parameter: "colour", from: 1, to: 2 })).toThrowError(
      'parameter must be one of the spin-up inputs (e.g. "gearRatio") (got "colour")',
    );
    expect(() => sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 0, to: 2 })).toThrowError(
      "from must be at least 0.05 and at most 100 (got 0)",
    );
    expect(() => sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 1, to: 2, points: 1 })).toThrowError(
      "points must be a whole number at least 2 and at most 200 (got 1)",
    );
  });
});

describe("input declarations", () => {
  const names = Object.keys(drivetrainInputs) as DrivetrainParameter[];

  it("gives every input a label, a help sentence and a short URL key, none shared with the drive-type key", () => {
    const keys = names.map((n) => drivetrainInputs[n].urlKey);
    expect(new Set([...keys, DRIVE_TYPE_URL_KEY]).size).toBe(keys.length + 1);
    for (const n of names) {
      const spec = drivetrainInputs[n];
      expect(spec.label.length).toBeGreaterThan(2);
      expect(spec.help?.length ?? 0).toBeGreaterThan(10);
      expect(spec.urlKey).toMatch(/^[a-z0-9]{1,6}$/);
    }
  });

  it("defaults to the invented demo weapon, and the demo spinner uses the published rubber-on-concrete coefficients", () => {
    for (const n of names) expect(DEMO_WEAPON[n]).toBe(drivetrainInputs[n].default);
    expect(DEMO_WEAPON.driveType).toBe("weapon");
    // serway-beichner-5e, Table 5.2: rubber on dry concrete μ_s = 1.0, μ_k = 0.8.
    expect(DEMO_SPINNER.staticFriction).toBe(1.0);
    expect(DEMO_SPINNER.kineticFriction).toBe(0.8);
  });

  it("lists the two drive types", () => {
    expect(DRIVE_TYPE_OPTIONS.map((o) => o.value)).toEqual(["weapon", "spinner"]);
  });

  it("refuses a drive type that is not an option", () => {
    expect(() => simulateSpinUp({ ...DEMO_WEAPON, driveType: "tank" })).toThrowError(CalcInputError);
    expect(() => simulateSpinUp({ ...DEMO_WEAPON, driveType: "tank" })).toThrowError('driveType must be one of "weapon", "spinner" (got "tank")');
  });

  it("refuses a sliding coefficient above the grip coefficient", () => {
    expect(() => validateDrivetrainInput({ ...DEMO_SPINNER, kineticFriction: 1.2 })).toThrowError(
      "kineticFriction must be at most staticFriction (1) (got 1.2)",
    );
  });

  it("names the unit in range errors", () => {
    expect(() => simulateSpinUp({ ...DEMO_WEAPON, currentLimit: 0 })).toThrowError("currentLimit must be greater than 0 A and at most 1000 A (got 0 A)");
    expect(() => simulateSpinUp({ ...DEMO_WEAPON, cellCount: 3.5 })).toThrowError("cellCount must be a whole number at least 1 and at most 24 (got 3.5)");
  });

  it("refuses every invalid input with a CalcInputError naming it (fast-check)", () => {
    fc.assert(
      fc.property(fc.constantFrom(...names), fc.constantFrom("nan", "low", "high", "infinite"), (name, how) => {
        const spec = drivetrainInputs[name];
        const value = how === "nan" ? Number.NaN : how === "low" ? spec.min - 1 : how === "high" ? spec.max * 2 + 1 : Number.POSITIVE_INFINITY;
        let caught: unknown = null;
        try {
          simulateSpinUp({ ...DEMO_WEAPON, [name]: value });
        } catch (e) {
          caught = e;
        }
        expect(caught).toBeInstanceOf(CalcInputError);
        expect((caught as CalcInputError).param).toBe(name);
      }),
      { numRuns: 150 },
    );
  });

  it("refuses bad run options", () => {
    expect(() => simulateSpinUp(DEMO_WEAPON, { maxPoints: 1 })).toThrowError("maxPoints must be a whole number at least 2 and at most 5000 (got 1)");
    expect(() => simulateSpinUp(DEMO_WEAPON, { relativeTolerance: 0.1 })).toThrowError(CalcInputError);
  });
});

// Random but sensible drives, kept moderate so each run is fast.
const weaponArb = fc.record({
  motorCount: fc.integer({ min: 1, max: 4 }),
  motorKv: fc.double({ min: 200 * RPM, max: 3000 * RPM, noNaN: true }),
  motorResistance: fc.double({ min: 0.01, max: 0.5, noNaN: true }),
  noLoadCurrent: fc.double({ min: 0, max: 3, noNaN: true }),
  motorRotorInertia: fc.double({ min: 0, max: 5e-5, noNaN: true }),
  currentLimit: fc.double({ min: 5, max: 200, noNaN: true }),
  throttle: fc.double({ min: 0.2, max: 1, noNaN: true }),
  cellCount: fc.integer({ min: 2, max: 12 }),
  cellVoltage: fc.double({ min: 3, max: 4.2, noNaN: true }),
  cellResistance: fc.double({ min: 0, max: 0.02, noNaN: true }),
  gearRatio: fc.double({ min: 0.5, max: 8, noNaN: true }),
  gearEfficiency: fc.double({ min: 0.7, max: 1, noNaN: true }),
  inertia: fc.double({ min: 1e-4, max: 0.05, noNaN: true }),
  frictionTorque: fc.double({ min: 0, max: 0.2, noNaN: true }),
  dragTorque: fc.double({ min: 0, max: 0.5, noNaN: true }),
  dragReferenceSpeed: fc.double({ min: 1000 * RPM, max: 20000 * RPM, noNaN: true }),
  targetSpeed: fc.double({ min: 500 * RPM, max: 20000 * RPM, noNaN: true }),
});
const spinnerArb = fc.record({
  wheelRadius: fc.double({ min: 0.01, max: 0.05, noNaN: true }),
  wheelOffset: fc.double({ min: 0.03, max: 0.2, noNaN: true }),
  wheelInertia: fc.double({ min: 1e-6, max: 1e-4, noNaN: true }),
  drivenWheels: fc.integer({ min: 1, max: 4 }),
  weightShare: fc.double({ min: 0.3, max: 1, noNaN: true }),
  staticFriction: fc.double({ min: 0.3, max: 1.2, noNaN: true }),
  slideRatio: fc.double({ min: 0.5, max: 1, noNaN: true }),
  inertia: fc.double({ min: 1e-3, max: 0.05, noNaN: true }),
});

// Each property simulates dozens of drives: 3–4 s on a busy 2-core machine, several times that under the mutation
// tool's coverage counting; the timeout only guards against a hang.
describe("properties (fast-check)", { timeout: 90_000 }, () => {
  it("never gives a non-finite number, for weapons and spinners, and always closes the energy balance", () => {
    fc.assert(
      fc.property(weaponArb, spinnerArb, fc.boolean(), (w, s, isSpinner) => {
        const { slideRatio, ...wheels } = s;
        const input: DrivetrainInput = isSpinner
          ? { ...DEMO_WEAPON, ...w, ...wheels, driveType: "spinner", kineticFriction: s.staticFriction * slideRatio }
          : { ...DEMO_WEAPON, ...w, driveType: "weapon" };
        const r: SpinUpResult = simulateSpinUp(input, { maxPoints: 50 });
        for (const [path, v] of numbersIn(r)) expect(Number.isFinite(v), path).toBe(true);
        expect(r.energy.balanceError).toBeLessThan(1e-3);
        expect(r.endTime).toBeLessThanOrEqual(input.maxTime);
      }),
      { numRuns: 60 },
    );
  });

  /** A drive from `w` aimed at `fraction` of its own settled top speed (skips drives that do not settle). */
  function aimed(w: Partial<DrivetrainInput>, fraction: number): DrivetrainInput {
    const probe = simulateSpinUp({ ...DEMO_WEAPON, ...w }, { series: false });
    fc.pre(probe.endReason === "steady-state" && probe.topSpeed > 1 && fraction * probe.topSpeed <= drivetrainInputs.targetSpeed.max);
    return { ...DEMO_WEAPON, ...w, targetSpeed: fraction * probe.topSpeed };
  }

  // Targets kept at most 95 % of the top speed: near the asymptote the time to a speed is ill-conditioned.
  it("never takes longer to reach the target when a weapon's current limit rises", () => {
    let compared = 0;
    fc.assert(
      fc.property(weaponArb, fc.double({ min: 0.1, max: 0.95, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), (w, fraction, factor) => {
        const base = aimed(w, fraction);
        const low = simulateSpinUp(base, { series: false });
        const high = simulateSpinUp({ ...base, currentLimit: Math.min(1000, base.currentLimit * factor) }, { series: false });
        expect(high.topSpeed).toBeGreaterThanOrEqual(low.topSpeed * (1 - 1e-4));
        expect(low.timeToTarget).not.toBeNull();
        expect(high.timeToTarget!).toBeLessThanOrEqual(low.timeToTarget! * (1 + 1e-6) + 1e-9);
        compared++;
      }),
      { numRuns: 60 },
    );
    expect(compared).toBeGreaterThan(30);
  });

  it("never takes longer to reach the target when the cells' voltage rises", () => {
    let compared = 0;
    fc.assert(
      fc.property(weaponArb, fc.double({ min: 0.1, max: 0.95, noNaN: true }), fc.double({ min: 0, max: 0.8, noNaN: true }), (w, fraction, extra) => {
        const base = aimed(w, fraction);
        const low = simulateSpinUp(base, { series: false });
        const high = simulateSpinUp({ ...base, cellVoltage: Math.min(5, base.cellVoltage + extra) }, { series: false });
        expect(high.topSpeed).toBeGreaterThanOrEqual(low.topSpeed * (1 - 1e-4));
        expect(high.timeToTarget!).toBeLessThanOrEqual(low.timeToTarget! * (1 + 1e-6) + 1e-9);
        compared++;
      }),
      { numRuns: 60 },
    );
    expect(compared).toBeGreaterThan(30);
  });

  it("reports an unreachable target as not reached, within the time limit, with the top speed below it", () => {
    fc.assert(
      fc.property(weaponArb, fc.double({ min: 1.01, max: 3, noNaN: true }), (w, above) => {
        const probe = simulateSpinUp({ ...DEMO_WEAPON, ...w }, { series: false });
        fc.pre(probe.drive.idealNoLoadSpeed * above <= drivetrainInputs.targetSpeed.max);
        const target = probe.drive.idealNoLoadSpeed * above;
        const r = simulateSpinUp({ ...DEMO_WEAPON, ...w, targetSpeed: target }, { series: false });
        expect(r.timeToTarget).toBeNull();
        expect(r.verdict).not.toBe("reaches-target");
        expect(r.topSpeed).toBeLessThan(target);
        expect(r.endTime).toBeLessThanOrEqual(DEMO_WEAPON.maxTime);
      }),
      { numRuns: 40 },
    );
  });
});

describe("regression pins (our own digits, not outside authorities)", () => {
  // The invented ideal motor above, computed in double precision from τ = J·R/(K_t·K_e) and
  // ω(t) = ω_nl(1 − e^(−t/τ)) (first-order-step-response), reproduced by the simulation at rtol 1e-8 (tolerance 1e-6).
  it.each([
    { quantity: "τ", actual: () => simulateSpinUp(IDEAL).drive.timeConstant, expected: 0.1096622711, rtol: 1e-9 },
    {
      quantity: "ω(0.1 s)",
      actual: () => simulateSpinUp({ ...IDEAL, maxTime: 0.1 }, { stopAtSteadyState: false }).topSpeed,
      expected: 150.3531286,
      rtol: 1e-6,
    },
    { quantity: "t90", actual: () => simulateSpinUp(IDEAL).timeTo90!, expected: 0.2525067108, rtol: 1e-6 },
    {
      quantity: "KE at ω_nl (computed from E = ½Jω², openstax-university-physics-1 §10.4)",
      actual: () => rotorKineticEnergy({ inertia: 0.01, angularSpeed: OMEGA_NL }),
      expected: 315.8273408,
      rtol: 1e-9,
    },
    {
      quantity: "KE at 2000 rpm (computed from E = ½Jω², openstax-university-physics-1 §10.4)",
      actual: () => rotorKineticEnergy({ inertia: 0.01, angularSpeed: 2000 * RPM }),
      expected: 219.3245422,
      rtol: 1e-9,
    },
  ])("$quantity = $expected", ({ actual, expected, rtol }) => {
    close(actual(), expected, rtol);
  });

  // The invented demo robots, as simulated here (guards against unintended change, not a check).
  it.each([
    { quantity: "demo weapon, time to 10 000 rpm [s]", actual: () => simulateSpinUp(DEMO_WEAPON).timeToTarget!, expected: 1.00851076, rtol: 1e-6 },
    { quantity: "demo weapon, top speed [rad/s]", actual: () => simulateSpinUp(DEMO_WEAPON).topSpeed, expected: 1179.98341, rtol: 2e-5 },
    { quantity: "demo spinner, time to 3000 rpm [s]", actual: () => simulateSpinUp(DEMO_SPINNER).timeToTarget!, expected: 2.23053759, rtol: 1e-6 },
    { quantity: "demo spinner, top speed [rad/s]", actual: () => simulateSpinUp(DEMO_SPINNER).topSpeed, expected: 356.12193, rtol: 2e-5 },
  ])("$quantity = $expected", ({ actual, expected, rtol }) => {
    close(actual(), expected, rtol);
  });
});

describe("documentation and bibliography", () => {
  const text = ["figures", "inputs", "results", "model", "dopri5", "simulate", "compare", "demo"]
    .map((f) => readFileSync(new URL(`../../calc/drivetrain/${f}.ts`, import.meta.url), "utf8"))
    .join("\n");

  it("names only source keys that exist", () => {
    for (const key of DRIVETRAIN_SOURCE_KEYS) expect(isSourceKey(key), key).toBe(true);
  });

  it("documents every exported function with its units, an example and its sources", () => {
    const docs = [...text.matchAll(/\/\*\*((?:(?!\*\/)[\s\S])*)\*\/\s*export function (\w+)/g)];
    const exported = [...text.matchAll(/^export function (\w+)/gm)].map((m) => m[1]);
    expect(docs.map((d) => d[2])).toEqual(exported);
    for (const [, doc, name] of docs) {
      if (name === "requireDriveType" || name === "validateDrivetrainInput" || doc!.includes("@internal")) continue;
      expect(doc, name).toMatch(/@returns/);
      expect(doc, name).toMatch(/@example|Example/);
      expect(doc, name).toMatch(/Sources:/);
      const keys = [...doc!.split("Sources:")[1]!.matchAll(/[a-z0-9]+(?:-[a-z0-9]+)+/g)].map((m) => m[0]);
      for (const key of keys) expect(isSourceKey(key), `${name}: ${key}`).toBe(true);
    }
  });

  it("labels the demo robots as invented", () => {
    expect(drivetrainWorkedExample().note).toMatch(/invented/);
  });
});
