import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../../calc/drivetrain/demo-robots.ts";
import { type DrivetrainInput, RPM } from "../../../calc/drivetrain/inputs.ts";
import { simulateSpinUp } from "../../../calc/drivetrain/simulate.ts";

/**
 * The spin-up integration checked against closed forms of a DC motor on a pure inertia
 * (ctms-dc-motor-speed with the inductance left out): J·dΩ/dt = K_t·I, I = (V − K_t·Ω)/R_tot, so
 * Ω(t) = Ω_nl·(1 − e^(−t/τ)) with Ω_nl = V/K_t and τ = J·R_tot/K_t². The integrator runs at a
 * relative tolerance of 1e-8; the checks below allow 1e-6 (times and speeds) unless said otherwise.
 */

// One motor, direct drive, no loss, no friction, no drag, no current limit, one 4 V cell of 20 mΩ.
const kv = 1000 * RPM; // [rad/s per V]
const kt = 1 / kv; // K_t = 1/K_v in SI (motor-constants-wikipedia): 0.0095493 N·m/A
const V = 4;
const R = 0.1 + 0.02; // winding plus cell, R_tot = R_m + N·D²·R_p with N = D = 1
const J = 1e-4;
const wNl = V / kt; // 418.879 rad/s (4000 rpm)
const tau = (J * R) / (kt * kt); // 1e-4·0.12/9.1189e-5 = 0.131595 s
const PURE: DrivetrainInput = {
  ...DEMO_WEAPON,
  motorCount: 1,
  motorKv: kv,
  motorResistance: 0.1,
  noLoadCurrent: 0,
  motorRotorInertia: 0,
  currentLimitAt: "none",
  throttle: 1,
  cellCount: 1,
  cellVoltage: V,
  cellResistance: 0.02,
  gearRatio: 1,
  gearEfficiency: 1,
  inertia: J,
  frictionTorque: 0,
  dragTorque: 0,
  dragReferenceSpeed: 1,
  targetSpeed: 0.95 * wNl,
  maxTime: 2,
};
/** Ω(t) = Ω_nl·(1 − e^(−t/τ)), and the time to reach a fraction f of Ω_nl, t = −τ·ln(1 − f). */
const pureSpeed = (t: number): number => wNl * (1 - Math.exp(-t / tau));
const pureTime = (f: number): number => -tau * Math.log(1 - f);

describe("spin-up of a DC motor on a pure inertia, no current limit: Ω = Ω_nl·(1 − e^(−t/τ))", () => {
  const r = simulateSpinUp(PURE, { maxPoints: 5 });

  it("with a reduction: G = 20 and J·G² give the same τ, Ω_nl/G and the same closed forms", () => {
    // Reflected through the gear (η = 1): Ω_nl = V/(K_t·G), τ = J·R_tot/(G²·K_t²) (serway-beichner-5e, J·G² as seen by the motor).
    const geared = simulateSpinUp({ ...PURE, gearRatio: 20, inertia: 400 * J, targetSpeed: (0.95 * wNl) / 20 }, { series: false });
    expect(geared.timeTo50! / pureTime(0.475)).toBeCloseTo(1, 7);
    expect(geared.timeToTarget! / pureTime(0.95)).toBeCloseTo(1, 7);
    expect(geared.energy.balanceError).toBeLessThan(1e-8);
    expect(geared.topSpeed / (wNl / 20)).toBeGreaterThan(1 - 1e-5);
  });

  it("reaches 50 %, 90 % and 100 % of a target at 95 % of the no-load speed at −τ·ln(1 − f)", () => {
    expect(r.timeTo50).toBeCloseTo(pureTime(0.475), 6); // −0.131595·ln 0.525 = 0.08480 s
    expect(r.timeTo90).toBeCloseTo(pureTime(0.855), 6); // −0.131595·ln 0.145 = 0.25412 s
    expect(r.timeToTarget).toBeCloseTo(pureTime(0.95), 6); // −0.131595·ln 0.05 = 0.39423 s
    expect(r.verdict).toBe("reaches-target");
  });

  it("stops at steady state once Ω̇·τ ≤ 1e-5·Ω, i.e. at τ·ln(1 + 1e5) = 1.5151 s, within one largest step (maxTime/100)", () => {
    expect(r.endReason).toBe("steady-state");
    expect(r.warnings).toEqual([]);
    const settle = tau * Math.log(1 + 1e5);
    expect(r.endTime).toBeGreaterThanOrEqual(settle);
    expect(r.endTime).toBeLessThanOrEqual(settle + PURE.maxTime / 100);
    expect(r.topSpeed).toBeCloseTo(pureSpeed(r.endTime), 6);
    expect(r.topSpeed / wNl).toBeGreaterThan(1 - 1e-5);
    expect(r.regimes).toEqual([{ regime: "voltage", start: 0, end: r.endTime }]);
  });

  it("draws the stall current V/R_tot = 33.3 A at the start and sags the cell to V − R_p·I = 3.333 V there", () => {
    expect(r.peakBatteryCurrent).toBeCloseTo(V / R, 9);
    expect(r.peakMotorCurrent).toBeCloseTo(V / R, 9);
    expect(r.peakMotorSpeed).toBe(r.topSpeed); // direct drive: the motor turns with the rotor
    expect(r.minBatteryVoltage).toBeCloseTo(V - (0.02 * V) / R, 9);
  });

  it("draws a charge K_t·I·dt = J·dΩ, so Q = J·Ω/K_t, and stores ½·J·Ω² (softschools-rotational-ke)", () => {
    // Q(end) = 1e-4·418.875/0.0095493 = 4.3864 C; up to the target Q = J·Ω_target/K_t.
    expect(r.chargeDrawn).toBeCloseTo((J * r.topSpeed) / kt, 6);
    expect(r.energy.kinetic).toBeCloseTo(0.5 * J * r.topSpeed ** 2, 6);
    expect(r.energyToTarget! / ((V * J * PURE.targetSpeed) / kt)).toBeCloseTo(1, 6);
    expect(r.averageBatteryCurrentToTarget! / ((J * PURE.targetSpeed) / kt / pureTime(0.95))).toBeCloseTo(1, 6);
    // Drawn V·Q = J·Ω·Ω_nl; the resistances take the rest, J·Ω·(Ω_nl − Ω/2) → ½·J·Ω_nl² at the end.
    expect(r.energy.copperLoss + r.energy.batteryLoss).toBeCloseTo(r.energy.drawn - r.energy.kinetic, 6);
    expect(r.energy.batteryLoss / r.energy.copperLoss).toBeCloseTo(0.02 / 0.1, 6); // same current through both
  });

  it("samples the series on the exponential, first point at rest and last at the end", () => {
    expect(r.series).toHaveLength(5);
    expect(r.series[0]).toEqual({
      time: 0,
      speed: 0,
      motorSpeed: 0,
      batteryCurrent: V / R,
      batteryVoltage: V - (0.02 * V) / R,
      motorCurrent: V / R,
      regime: "voltage",
    });
    expect(r.series.at(-1)!.time).toBe(r.endTime);
    for (const p of r.series) {
      expect(p.speed).toBeCloseTo(pureSpeed(p.time), 5);
      expect(p.motorCurrent).toBeCloseTo((V - kt * p.speed) / R, 6);
    }
    expect(simulateSpinUp(PURE, { series: false }).series).toEqual([]);
  });

  it("falls short of a target above the no-load speed: 50 % is timed, 90 % and 100 % and the energy to target are null", () => {
    const far = simulateSpinUp({ ...PURE, targetSpeed: 1.2 * wNl }, { series: false });
    expect(far.verdict).toBe("falls-short");
    expect(far.timeTo50).toBeCloseTo(pureTime(0.6), 6); // −0.131595·ln 0.4 = 0.12058 s
    expect(far.timeTo90).toBeNull();
    expect(far.timeToTarget).toBeNull();
    expect(far.energyToTarget).toBeNull();
    expect(far.averageBatteryCurrentToTarget).toBeNull();
  });

  it("reaches its time limit 1e-4 s after the settling time: ends there, at the time limit, with its warning", () => {
    const settle = tau * Math.log(1 + 1e5);
    const close = simulateSpinUp({ ...PURE, maxTime: settle + 1e-4 }, { series: false });
    expect(close.endReason).toBe("max-time");
    expect(close.endTime).toBe(settle + 1e-4);
    expect(close.warnings).toEqual([`The speed was still changing at the time limit (${settle + 1e-4} s); the top speed is the speed reached by then.`]);
  });

  it("runs to the time limit when told not to stop at steady state, ending on the limit exactly", () => {
    const full = simulateSpinUp({ ...PURE, maxTime: 0.3 }, { stopAtSteadyState: false, maxPoints: 2 });
    expect(full.endReason).toBe("max-time");
    expect(full.endTime).toBe(0.3);
    expect(full.topSpeed).toBeCloseTo(pureSpeed(0.3), 6); // 418.879·(1 − e^(−0.3/0.131595)) = 376.10 rad/s
    expect(full.series.map((p) => p.time)).toEqual([0, 0.3]);
  });
});

describe("spin-up held at a current limit first: constant torque, then the exponential", () => {
  // 20 A limit with no cell resistance: Ω̇ = K_t·I_lim/J = 1909.86 rad/s² until V − K_t·Ω = I_lim·R_m,
  // i.e. Ω₁ = (4 − 2)/K_t = 209.44 rad/s at t₁ = Ω₁/Ω̇ = 0.109662 s (= τ = J·R_m/K_t² here).
  const LIMITED: DrivetrainInput = { ...PURE, cellResistance: 0, currentLimitAt: "motor", currentLimit: 20 };
  const acc = (kt * 20) / J;
  const w1 = (V - 20 * 0.1) / kt;
  const t1 = w1 / acc;
  const tauM = (J * 0.1) / (kt * kt);
  const r = simulateSpinUp(LIMITED, { maxPoints: 3 });

  it("ends the current-limited phase at t₁ = 0.10966 s and records the two regimes end to end", () => {
    expect(r.regimes).toHaveLength(2);
    expect(r.regimes[0]!.regime).toBe("current-limit");
    expect(r.regimes[0]!.start).toBe(0);
    expect(r.regimes[0]!.end).toBeCloseTo(t1, 7);
    expect(r.regimes[1]).toEqual({ regime: "voltage", start: r.regimes[0]!.end, end: r.endTime });
    expect(r.series[0]!.regime).toBe("current-limit");
    expect(r.series.at(-1)!.regime).toBe("voltage");
    expect(r.solver.modeSwitches).toBe(1);
    expect(r.solver.rejectedSteps).toBeGreaterThanOrEqual(0);
  });

  it("meeting the end of the limit in its last step, still runs on to the time limit", () => {
    // The time limit set 1e-6·t₁ after t₁: the step that ends on the time limit holds the switch.
    const end = t1 * (1 + 1e-6);
    const just = simulateSpinUp({ ...LIMITED, maxTime: end }, { series: false, stopAtSteadyState: false });
    expect(just.endTime).toBe(end);
    expect(just.regimes.map((g) => g.regime)).toEqual(["current-limit", "voltage"]);
    expect(just.regimes[0]!.end).toBeCloseTo(t1, 7);
  });

  it("stopped inside the limited phase, speeds up on the straight line Ω = Ω̇·t and ends in that regime", () => {
    const short = simulateSpinUp({ ...LIMITED, maxTime: 0.05 }, { maxPoints: 2 });
    expect(short.endReason).toBe("max-time");
    expect(short.regimes).toEqual([{ regime: "current-limit", start: 0, end: 0.05 }]);
    expect(short.topSpeed).toBeCloseTo(acc * 0.05, 7); // 1909.86·0.05 = 95.493 rad/s
    expect(short.series.map((p) => p.regime)).toEqual(["current-limit", "current-limit"]);
  });

  it("times 50 % on the straight line and 90 % on the exponential after t₁", () => {
    expect(r.timeTo50).toBeCloseTo((0.475 * wNl) / acc, 7); // 198.97/1909.86 = 0.104179 s
    // Ω = Ω_nl − (Ω_nl − Ω₁)·e^(−(t − t₁)/τ): 0.855·Ω_nl at t₁ − τ·ln(0.145·Ω_nl/(Ω_nl − Ω₁)) = 0.24541 s.
    expect(r.timeTo90).toBeCloseTo(t1 - tauM * Math.log((0.145 * wNl) / (wNl - w1)), 7);
    expect(r.peakMotorCurrent).toBe(20);
  });

  it("starting exactly at the limit (stall current = I_lim) never switches regime", () => {
    const edge = simulateSpinUp({ ...LIMITED, currentLimit: V / 0.1 }, { series: false });
    expect(V / 0.1).toBe(40);
    expect(edge.solver.modeSwitches).toBe(0);
    expect(edge.timeTo50).toBeCloseTo(-tauM * Math.log(0.525), 6);
  });
});

describe("a weapon held at its current limit by air drag: Ω = Ω_eq·tanh(a·t/Ω_eq)", () => {
  // Limited, J·Ω̇ = K_t·I_lim − c·Ω² with a = K_t·I_lim/J: Ω(t) = Ω_eq·tanh(a·t/Ω_eq), Ω_eq = √(K_t·I_lim/c)
  // (separable ODE, dΩ/(Ω_eq² − Ω²) = (c/J)·dt). Here a = 0.19099/1e-4 = 1909.9 rad/s², Ω_eq = 3820 rad/s,
  // below the speed where a 48 V pack stops the 20 A limit, (48 − 20·0.001)/K_t = 5024 rad/s; the
  // approach (Ω_eq/a = 2 s) is far slower than the motor's own τ = J·R/K_t² = 1.1 ms.
  const wEq = 3820;
  const a = (kt * 20) / J;
  const DRAG: DrivetrainInput = {
    ...PURE,
    motorResistance: 0.001,
    cellResistance: 0,
    cellCount: 12,
    currentLimitAt: "motor",
    currentLimit: 20,
    dragTorque: kt * 20,
    dragReferenceSpeed: wEq,
    targetSpeed: 0.99 * wEq,
    maxTime: 20,
  };

  it("stays in the limit, is not called settled on the motor's short time constant, and ends at tanh(10)·Ω_eq", () => {
    const r = simulateSpinUp(DRAG, { series: false });
    expect(r.regimes.map((g) => g.regime)).toEqual(["current-limit"]);
    expect(r.endReason).toBe("max-time");
    expect(r.topSpeed / (wEq * Math.tanh((a * 20) / wEq))).toBeCloseTo(1, 7);
    expect(r.timeTo90! / ((wEq / a) * Math.atanh(0.9 * 0.99))).toBeCloseTo(1, 7); // 2·atanh(0.891) = 2.853 s
  });
});

/** The demo spinner with its losses reduced to air drag alone (4.6 N·m at 182 rad/s), no current limit, and heavy wheels of 0.00149 kg·m² under a 5 kg robot. */
const DRAGGED_SPINNER: DrivetrainInput = {
  ...DEMO_SPINNER,
  noLoadCurrent: 0,
  motorRotorInertia: 0,
  currentLimitAt: "none",
  cellResistance: 0,
  frictionTorque: 0,
  dragTorque: 4.6,
  dragReferenceSpeed: 182,
  wheelInertia: 0.00149,
  robotMass: 5,
  weightShare: 1,
};

describe("a spinner that grips at first and slips once air drag asks more of its wheels than μ_s·N", () => {
  // Two wheels of 18 mm at 70 mm, direct drive, k = R/r_w = 3.889; wheels heavy next to the body
  // (ρ²·n·J_w = 15.12·0.00298 = 0.045 kg·m² beside J = 0.005), so while gripping the wheels need
  // F = (J·Ω̇ + c·Ω²)/R with J_eff·Ω̇ = k·T_m − c·Ω²: a force that grows with the drag.
  const SP: DrivetrainInput = {
    ...DRAGGED_SPINNER,
    staticFriction: 0.8,
    kineticFriction: 0.6,
    maxTime: 5,
    targetSpeed: 100,
  };
  const r = simulateSpinUp(SP, { maxPoints: 4 });
  const n = SP.robotMass * STANDARD_GRAVITY; // 49.03 N on the wheels
  const c = SP.dragTorque / SP.dragReferenceSpeed ** 2;
  const k = SP.wheelOffset / SP.wheelRadius;
  const jEff = SP.inertia + k * k * 2 * SP.wheelInertia;

  it("loses grip where (J/J_eff)·k·T_m(Ω) + (1 − J/J_eff)·c·Ω² = μ_s·N·R, and that speed is the top speed", () => {
    // T_m(Ω) = 2·K_t·(V − K_t·k·Ω)/R_m; solve the quadratic in Ω (derived by hand from the locked equations).
    const ktS = 1 / SP.motorKv;
    const v = SP.cellCount * SP.cellVoltage;
    const s = SP.inertia / jEff;
    const a2 = (1 - s) * c;
    const a1 = (-s * k * 2 * ktS * ktS * k) / SP.motorResistance;
    const a0 = (s * k * 2 * ktS * v) / SP.motorResistance - SP.staticFriction * n * SP.wheelOffset;
    const wLoss = (-a1 + Math.sqrt(a1 * a1 - 4 * a2 * a0)) / (2 * a2);
    expect(r.topSpeed).toBeCloseTo(wLoss, 6);
    expect(r.regimes.map((g) => g.regime)).toEqual(["voltage", "traction"]);
    expect(r.regimes[1]!.end).toBe(5);
    expect(r.solver.modeSwitches).toBe(1);
  });

  it("then slows to where sliding friction balances the drag, μ_k·N·R = c·Ω², Ω = 121.78 rad/s", () => {
    const wSlide = Math.sqrt((SP.kineticFriction * n * SP.wheelOffset) / c);
    expect(r.series.at(-1)!.speed).toBeCloseTo(wSlide, 6);
    expect(r.series.at(-1)!.speed).toBeLessThan(r.topSpeed);
    expect(r.endReason).toBe("max-time");
    expect(r.energy.slipLoss).toBeGreaterThan(0);
    // The wheels keep speeding up while they slip: the fastest motor speed is the last one.
    expect(r.peakMotorSpeed).toBe(r.series.at(-1)!.motorSpeed);
    expect(r.peakMotorSpeed).toBeGreaterThan(k * r.topSpeed);
    expect(r.energy.balanceError).toBeLessThan(1e-6);
  });
});

describe("a spinner whose wheels spin but whose body is held by its friction torque", () => {
  // Friction 1 N·m above μ_k·N·R = 0.8·13.24·0.07 = 0.741 N·m: the body never turns, the wheels slip
  // and settle where the two motors' torque equals the sliding friction at the rims,
  // 2·K_t·(V − K_t·ω)/R_m = μ_k·N·r_w (direct drive, no loss), ω = (V − μ_k·N·r_w·R_m/(2·K_t))/K_t.
  const HELD: DrivetrainInput = { ...DEMO_SPINNER, noLoadCurrent: 0, motorRotorInertia: 0, currentLimitAt: "none", cellResistance: 0, frictionTorque: 1 };
  const n = HELD.weightShare * HELD.robotMass * STANDARD_GRAVITY;
  const ktS = 1 / HELD.motorKv;
  const v = HELD.cellCount * HELD.cellVoltage;
  const wWheel = (v - (HELD.kineticFriction * n * HELD.wheelRadius * HELD.motorResistance) / (2 * ktS)) / ktS; // 1303 rad/s

  it("is not called stalled: its wheels run up to 1303 rad/s and the run ends at steady state", () => {
    const r = simulateSpinUp(HELD, { maxPoints: 2 });
    expect(r.endReason).toBe("steady-state");
    expect(r.warnings).toEqual([]);
    expect(r.topSpeed).toBe(0);
    expect(r.verdict).toBe("stalled");
    expect(r.peakMotorSpeed / wWheel).toBeCloseTo(1, 4); // settled to 1e-5 of the speed
    expect(r.regimes.map((g) => g.regime)).toEqual(["traction"]);
  });
});

describe("a spinner that grips, then loses grip a hair before its current limit would end", () => {
  // As the drag spinner above, with a 60 A limit and less drag: while limited and gripping,
  // T_m = 2·K_t·I_lim and F(Ω) = (s·k·T_m + (1 − s)·c·Ω²)/R with s = J/J_eff. The limit ends at
  // Ω₁ = (V − I_lim·R_m)/(K_t·k) = 204.4 rad/s; μ_s is set so grip goes at Ω_g = Ω₁·(1 − 1e-4), inside the same step.
  const base: DrivetrainInput = {
    ...DEMO_SPINNER,
    noLoadCurrent: 0,
    motorRotorInertia: 0,
    currentLimitAt: "motor",
    currentLimit: 60,
    cellResistance: 0,
    frictionTorque: 0,
    dragTorque: 2,
    dragReferenceSpeed: 200,
    wheelInertia: 0.00149,
    robotMass: 5,
    weightShare: 1,
    kineticFriction: 0.4,
    maxTime: 10,
  };
  const n = base.robotMass * STANDARD_GRAVITY;
  const c = base.dragTorque / base.dragReferenceSpeed ** 2;
  const k = base.wheelOffset / base.wheelRadius;
  const s = base.inertia / (base.inertia + k * k * 2 * base.wheelInertia);
  const ktS = 1 / base.motorKv;
  const w1 = (base.cellCount * base.cellVoltage - base.currentLimit * base.motorResistance) / (ktS * k);
  const wG = w1 * (1 - 1e-4);
  const force = (w: number): number => (s * k * 2 * ktS * base.currentLimit + (1 - s) * c * w * w) / base.wheelOffset;

  it("takes the earlier event, the grip loss, so the top speed is Ω_g and not Ω₁", () => {
    const r = simulateSpinUp({ ...base, staticFriction: force(wG) / n }, { series: false });
    expect(r.regimes.map((g) => g.regime)).toEqual(["current-limit", "traction"]);
    expect(r.topSpeed).toBeCloseTo(wG, 6);
  });
});

describe("a spinner whose steady grip needs all but 3e-10 of μ_s·N", () => {
  // No limit, no friction: steady where k·T_m(kΩ) = c·Ω², 2·K_t·k·(V − K_t·k·Ω)/R_m = c·Ω², and the
  // wheels then push F = c·Ω²/R. With μ_s·N = F·(1 + 3e-10) the grip holds (the switch allows 1e-9·μ_s·N).
  const base: DrivetrainInput = {
    ...DRAGGED_SPINNER,
    kineticFriction: 0.5,
    maxTime: 20,
  };
  const n = base.robotMass * STANDARD_GRAVITY;
  const c = base.dragTorque / base.dragReferenceSpeed ** 2;
  const k = base.wheelOffset / base.wheelRadius;
  const ktS = 1 / base.motorKv;
  const v = base.cellCount * base.cellVoltage;
  const b = (2 * ktS * ktS * k * k) / base.motorResistance;
  const wSs = (-b + Math.sqrt(b * b + 4 * c * ((2 * ktS * k * v) / base.motorResistance))) / (2 * c);
  const fSs = (c * wSs * wSs) / base.wheelOffset;

  it("keeps its grip to the end and settles at Ω_ss", () => {
    const r = simulateSpinUp({ ...base, staticFriction: (fSs * (1 + 3e-10)) / n }, { series: false, stopAtSteadyState: false });
    expect(r.regimes.map((g) => g.regime)).toEqual(["voltage"]);
    expect(r.topSpeed).toBeCloseTo(wSs, 6);
  });
});
