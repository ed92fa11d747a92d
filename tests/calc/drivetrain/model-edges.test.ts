/**
 * The spin-up model's right-hand side evaluated at hand-picked states of an invented drive with
 * round numbers, against the DC motor, battery, gear and friction equations worked by hand:
 * the reflected inertias and time constants, the current with and without its limit at the motor
 * or at the battery, the locked and the slipping accelerations (motors driving and load driving),
 * every power flow, the kinetic energy, the slip speed, the choice of grip or slip and the re-grip.
 */
import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { DEMO_WEAPON } from "../../../calc/drivetrain/demo-robots.ts";
import type { DrivetrainInput } from "../../../calc/drivetrain/inputs.ts";
import {
  buildModel,
  LOCKED,
  NS,
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
  SLIPPING,
  SpinUpSystem,
} from "../../../calc/drivetrain/model.ts";
import { R_CURRENT, R_STALLED, R_TRACTION, R_VOLTAGE } from "../../../calc/drivetrain/results.ts";

/** |actual − expected| ≤ rtol·|expected|. */
const close = (actual: number, expected: number, rtol = 1e-12) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));

// An invented drive with round numbers (not any real robot): two motors of K_v = 100 rad/(s·V), so
// K_t = 1/K_v = 0.01 N·m/A (motor-constants-wikipedia), R = 0.06 Ω, I₀ = 2 A, J_m = 1e-4 kg·m²;
// 4 cells of 4 V and 10 mΩ (V_oc = 16 V, R_p = 0.04 Ω); a 2:1 reduction at 80 %; J = 0.01 kg·m²;
// friction 0.1 N·m; drag 0.4 N·m at 200 rad/s, so c = 0.4/200² = 1e-5 N·m·s²; a 2 kg robot with
// half its weight on the wheels (N = 0.5 × 2 × 9.80665 = 9.80665 N), μ_s = 1, μ_k = 0.8; two
// wheels of 20 mm radius and 2e-5 kg·m² each, their contacts 80 mm from the centre.
const BASE: DrivetrainInput = {
  ...DEMO_WEAPON,
  currentLimitAt: "none",
  motorCount: 2,
  motorKv: 100,
  motorResistance: 0.06,
  noLoadCurrent: 2,
  motorRotorInertia: 1e-4,
  currentLimit: 50,
  throttle: 1,
  cellCount: 4,
  cellVoltage: 4,
  cellResistance: 0.01,
  gearRatio: 2,
  gearEfficiency: 0.8,
  inertia: 0.01,
  frictionTorque: 0.1,
  dragTorque: 0.4,
  dragReferenceSpeed: 200,
  robotMass: 2,
  weightShare: 0.5,
  staticFriction: 1,
  kineticFriction: 0.8,
  wheelRadius: 0.02,
  wheelOffset: 0.08,
  wheelInertia: 2e-5,
  drivenWheels: 2,
};

const weapon = (over: Partial<DrivetrainInput> = {}, limitAt: "motor" | "battery" | "none" = "none") =>
  new SpinUpSystem(buildModel({ ...BASE, ...over }, false, limitAt));
const spinner = (over: Partial<DrivetrainInput> = {}, limitAt: "motor" | "battery" | "none" = "none") =>
  new SpinUpSystem(buildModel({ ...BASE, ...over }, true, limitAt));
const state = (om: number, wm: number) => {
  const y = new Float64Array(NS);
  y[S_SPEED] = om;
  y[S_MOTOR] = wm;
  return y;
};

describe("the model's numbers (buildModel)", () => {
  it("grips with μ_s·N and slides with μ_k·N on the wheel load s·M·g (serway-beichner-5e)", () => {
    const m = buildModel(BASE, true);
    close(m.fs, 1 * 0.5 * 2 * STANDARD_GRAVITY); // 9.80665 N
    close(m.fk, 0.8 * 0.5 * 2 * STANDARD_GRAVITY); // 7.84532 N
  });

  it("adds (J_w + G·n·J_m)/(2·R·G) of wheel load per unit of motor speed times spin on one wheel (meriam-kraige-dynamics)", () => {
    // (2e-5 + 2 × 2 × 1e-4)/(2 × 0.08 × 2) = 4.2e-4/0.32 = 1.3125e-3 N·s².
    close(buildModel({ ...BASE, drivenWheels: 1 }, true).gyroLoad, 1.3125e-3);
    expect(buildModel(BASE, true).gyroLoad).toBe(0);
  });
});

describe("inertias and time constants reflected through the reduction (gear-efficiency-model)", () => {
  it("a weapon: J_lock = J + η·G²·n·J_m driving, J + G²·n·J_m/η driven", () => {
    const sys = weapon();
    close(sys.jLockF, 0.01 + 0.8 * 4 * 2 * 1e-4); // 0.01064 kg·m²
    close(sys.jLockR, 0.01 + (4 * 2 * 1e-4) / 0.8); // 0.011 kg·m²
    close(sys.jWheelF, 0.8 * 4 * 2 * 1e-4); // 6.4e-4 kg·m²
    close(sys.jWheelR, (4 * 2 * 1e-4) / 0.8); // 1e-3 kg·m²
    close(sys.jWheelTrue, 4 * 2 * 1e-4); // 8e-4 kg·m²
  });

  it("a spinner: the wheels count at (R/r)² on the body and once on the wheel side", () => {
    const sys = spinner();
    // ρ = 0.08/0.02 = 4; k = G·ρ = 8; J_load = 0.01 + 16 × 4e-5 = 0.01064 kg·m².
    close(sys.jLoad, 0.01064);
    close(sys.jWheelF, 4e-5 + 6.4e-4); // 6.8e-4 kg·m²
    close(sys.jWheelR, 4e-5 + 1e-3); // 1.04e-3 kg·m²
    close(sys.jWheelTrue, 4e-5 + 8e-4); // 8.4e-4 kg·m²
  });

  it("one motor sees its winding plus n·D² of the pack: R_tot = R + n·D²·R_p (erickson-power-electronics)", () => {
    close(weapon().rTot, 0.06 + 2 * 0.04); // 0.14 Ω at full throttle
    close(weapon({ throttle: 0.5 }).rTot, 0.06 + 2 * 0.25 * 0.04); // 0.08 Ω at half throttle
  });

  it("τ = J·R_tot/(η·k²·n·K_t²) locked, and on the wheel side for a spinner", () => {
    // Weapon: 0.01064 × 0.14/(0.8 × 4 × 2 × 1e-4) = 1.4896e-3/6.4e-4 = 2.3275 s.
    close(weapon().tauLocked, 2.3275);
    close(weapon().tauWheel, 2.3275);
    // Spinner wheels: 6.8e-4 × 0.14/(0.8 × 4 × 2 × 1e-4) = 0.14875 s.
    close(spinner().tauWheel, 0.14875);
  });
});

describe("the controller, battery and motor (electrical)", () => {
  it("a fresh system reports no limit and no stall: the voltage-limited regime", () => {
    const sys = weapon();
    expect(sys.limited).toBe(false);
    expect(sys.stuck).toBe(false);
    expect(sys.regime()).toBe(R_VOLTAGE);
  });

  it("with no limit: I = (D·V_oc − K·ω)/R_tot, I_b = n·D·I, V_b = V_oc − R_p·I_b (battery-thevenin-model)", () => {
    const sys = weapon({}, "none");
    sys.electrical(100);
    // (16 − 0.01 × 100)/0.14 = 107.142 857 A; I_b = 2 × 107.142 857 = 214.285 714 A; V_b = 16 − 8.571 = 7.428 571 V.
    close(sys.current, 15 / 0.14);
    close(sys.battCurrent, 30 / 0.14);
    close(sys.battVoltage, 16 - (0.04 * 30) / 0.14);
    expect(sys.limited).toBe(false);
  });

  it("a battery-side limit below its value leaves the current alone", () => {
    const sys = weapon({ currentLimit: 500 }, "battery");
    sys.electrical(100);
    close(sys.current, 15 / 0.14);
    expect(sys.limited).toBe(false);
  });

  it("a battery-side limit holds D·I = I_lim with V_b = V_oc − R_p·n·I_lim: the root of V_b·D² − e·D − I_lim·R = 0", () => {
    const sys = weapon({}, "battery");
    sys.electrical(0);
    // V_b = 16 − 0.04 × 2 × 50 = 12 V; e = 0; D = √(4 × 12 × 50 × 0.06)/(2 × 12) = √144/24 = 0.5;
    // I = 50/0.5 = 100 A; I_b = 2 × 0.5 × 100 = 100 A; check: D·V_b = 6 V = I·R = 100 × 0.06.
    close(sys.current, 100);
    close(sys.battCurrent, 100);
    close(sys.battVoltage, 12);
    expect(sys.limited).toBe(true);
    expect(sys.regime()).toBe(R_CURRENT);
  });

  it("a motor-side limit holds I = I_lim with D·(V_oc − R_p·n·D·I_lim) = e + I_lim·R: the smaller root", () => {
    const sys = weapon({}, "motor");
    sys.electrical(0);
    // need = 0 + 50 × 0.06 = 3 V; a = 2 × 0.04 × 50 = 4; D = 2 × 3/(16 + √(256 − 48)) = 6/(16 + √208) = 0.197 224.
    const d = 6 / (16 + Math.sqrt(208));
    close(sys.current, 50);
    close(sys.battCurrent, 2 * d * 50); // 19.7224 A
    close(sys.battVoltage, 16 - 0.04 * 2 * d * 50);
    close(d * sys.battVoltage, 3);
    expect(sys.limited).toBe(true);
    expect(sys.regime()).toBe(R_CURRENT);
  });

  it("a current exactly at the limit is not reported as limited, at the motor or at the battery", () => {
    // No pack resistance, R = 0.25 Ω, at rest: I = 16/0.25 = 64 A exactly, with I_lim = 64 A.
    for (const at of ["motor", "battery"] as const) {
      const sys = weapon({ cellResistance: 0, motorResistance: 0.25, currentLimit: 64 }, at);
      sys.electrical(0);
      expect(sys.current).toBe(64);
      expect(sys.limited).toBe(false);
    }
  });

  it("the current margin: I − I_lim at the motor, D·I − I_lim at the battery, −I_lim with no limit", () => {
    // Half throttle: R_tot = 0.08 Ω; at ω = 100 rad/s, I = (8 − 1)/0.08 = 87.5 A.
    close(weapon({ throttle: 0.5 }, "motor").currentMargin(100), 87.5 - 50); // 37.5 A
    close(weapon({ throttle: 0.5 }, "battery").currentMargin(100), 0.5 * 87.5 - 50); // −6.25 A
    expect(weapon({ throttle: 0.5 }, "none").currentMargin(100)).toBe(-50);
  });
});

describe("locked: one degree of freedom (lockedAcceleration)", () => {
  it("motors driving: Ω̇ = (k·η·T_m − T_load)/J_lock,F", () => {
    const sys = weapon();
    const acc = sys.lockedAcceleration(50, 100);
    // I = 15/0.14 = 107.142 857 A; T_m = 2 × 0.01 × (107.142 857 − 2) = 2.102 857 N·m;
    // T_load = 0.1 + 1e-5 × 50² = 0.125 N·m; Ω̇ = (2 × 0.8 × 2.102 857 − 0.125)/0.01064 = 304.471 rad/s².
    const tm = 0.02 * (15 / 0.14 - 2);
    close(acc, (1.6 * tm - 0.125) / 0.01064);
    close(acc, 304.471, 1e-5);
    close(sys.force, 0.01 * acc + 0.125);
    expect(sys.stuck).toBe(false);
  });

  it("load driving the motors (motor above its no-load speed): Ω̇ = (k·T_m/η − T_load)/J_lock,R", () => {
    const sys = weapon({ dragTorque: 0 });
    const acc = sys.lockedAcceleration(850, 1700);
    // I = (16 − 17)/0.14 = −7.142 857 A; T_m = 0.02 × (−9.142 857) = −0.182 857 N·m; the driving formula
    // would give (−0.292 571 − 0.1)/0.01064 = −36.9 rad/s², and J·Ω̇ + T_load = −0.269 N·m < 0, so the
    // gear runs backwards: Ω̇ = (2 × −0.182 857/0.8 − 0.1)/0.011 = −50.649 rad/s².
    const tm = 0.02 * (-1 / 0.14 - 2);
    close(acc, ((2 * tm) / 0.8 - 0.1) / 0.011);
    close(acc, -50.6494, 1e-5);
  });

  it("at rest with no throttle, no loss and no friction the rotor is held: stalled, Ω̇ = 0", () => {
    const sys = weapon({ throttle: 0, noLoadCurrent: 0, frictionTorque: 0 });
    expect(sys.lockedAcceleration(0, 0)).toBe(0);
    expect(sys.stuck).toBe(true);
    expect(sys.regime()).toBe(R_STALLED);
  });

  it("a spinner held by friction pushes on the floor with all the motors give: F = k·η·T_m/R", () => {
    const sys = spinner({ frictionTorque: 100 });
    expect(sys.lockedAcceleration(0, 0)).toBe(0);
    expect(sys.stuck).toBe(true);
    // T_m = 0.02 × (16/0.14 − 2) = 2.245 714 N·m; F = 8 × 0.8 × 2.245 714/0.08 = 179.657 N.
    close(sys.force, (6.4 * 0.02 * (16 / 0.14 - 2)) / 0.08);
    close(sys.force, 179.657, 1e-5);
  });
});

describe("the state's derivative (deriv)", () => {
  it("a weapon, motors driving: accelerations and every power flow", () => {
    const sys = weapon();
    const dy = new Float64Array(NS);
    sys.deriv(state(50, 100), dy);
    const i = 15 / 0.14; // 107.142 857 A
    const ib = 2 * i; // 214.285 714 A
    const tm = 0.02 * (i - 2);
    const acc = (1.6 * tm - 0.125) / 0.01064;
    close(dy[S_SPEED]!, acc);
    close(dy[S_MOTOR]!, 2 * acc);
    close(dy[S_DRAWN]!, 16 * ib); // V_oc·I_b = 3428.57 W
    close(dy[S_BATT]!, 0.04 * ib * ib); // R_p·I_b² = 1836.73 W
    close(dy[S_COPPER]!, 2 * 0.06 * i * i); // n·R·I² = 1377.55 W
    close(dy[S_MLOSS]!, 2 * 0.01 * 2 * 100); // n·K_t·I₀·ω = 4 W
    // Driving: (1 − η)·T_in·ω_m with T_in = T_m − n·J_m·ω̇_m.
    close(dy[S_GEAR]!, 0.2 * (tm - 2e-4 * 2 * acc) * 100);
    close(dy[S_FRIC]!, 0.1 * 50); // 5 W
    close(dy[S_DRAG]!, 1e-5 * 50 ** 3); // 1.25 W
    expect(dy[S_SLIP]).toBe(0);
    close(dy[S_CHARGE]!, ib);
    expect(sys.evaluations).toBe(1);
    expect(sys.regime()).toBe(R_VOLTAGE);
  });

  it("a gripping spinner driven by its body: the gear loss is (1 − η)·(−T_out)·ω_w", () => {
    const sys = spinner({ dragTorque: 0 });
    const dy = new Float64Array(NS);
    sys.deriv(state(200, 1600), dy);
    // I = (16 − 16)/0.14 = 0; T_m = 0.02 × (0 − 2) = −0.04 N·m; J_lock,R = 0.01064 + 64 × 2e-4/0.8 = 0.02664;
    // Ω̇ = (8 × −0.04/0.8 − 0.1)/0.02664 = −18.769 rad/s²; T_out = (0.01064 × Ω̇ + 0.1)/4 = −0.024 93 N·m;
    // ω_w = 1600/2 = 800 rad/s; loss = 0.2 × 0.024 93 × 800 = 3.989 W.
    const tm = 0.02 * ((16 - 1600 / 100) / 0.14 - 2);
    const acc = ((8 * tm) / 0.8 - 0.1) / 0.02664;
    close(dy[S_SPEED]!, acc);
    close(dy[S_MOTOR]!, 8 * acc);
    const tOut = (0.01064 * acc + 0.1) / 4;
    close(dy[S_GEAR]!, -0.2 * tOut * 800);
    close(dy[S_GEAR]!, 3.989, 1e-3);
  });

  it("a stage that lands below zero speed books no friction, drag, no-load or gear power (the spin-up runs forward)", () => {
    const sys = weapon();
    const dy = new Float64Array(NS);
    sys.deriv(state(-10, -20), dy);
    expect(dy[S_FRIC]).toBe(0);
    expect(dy[S_DRAG]).toBe(0);
    expect(dy[S_MLOSS]).toBe(0);
    expect(dy[S_GEAR]).toBe(0);
  });

  it("a slipping spinner, wheels faster than the floor: μ_k·N at the rim drives the body, the rest the wheels", () => {
    const sys = spinner();
    sys.mode = SLIPPING;
    sys.dir = 1;
    sys.stuck = true;
    const dy = new Float64Array(NS);
    sys.deriv(state(10, 400), dy);
    // I = (16 − 4)/0.14 = 85.714 A; T_m = 0.02 × 83.714 = 1.674 286 N·m; f = 0.8 × 9.80665 = 7.845 32 N;
    // ω̇_w = (2 × 0.8 × 1.674 286 − 7.845 32 × 0.02)/6.8e-4 = 3708.75 rad/s²; T_out = 4e-5 × 3708.75 + 0.156 906 > 0;
    // Ω̇ = (7.845 32 × 0.08 − (0.1 + 1e-5 × 100))/0.01 = 52.6626 rad/s²;
    // slip power f·(ω_w·r − Ω·R) = 7.845 32 × (200 × 0.02 − 10 × 0.08) = 25.105 W.
    const tm = 0.02 * (12 / 0.14 - 2);
    const f = 0.8 * STANDARD_GRAVITY;
    const dww = (1.6 * tm - f * 0.02) / 6.8e-4;
    close(dy[S_MOTOR]!, 2 * dww);
    close(dy[S_MOTOR]!, 7417.5, 1e-4);
    close(dy[S_SPEED]!, (f * 0.08 - 0.101) / 0.01);
    close(dy[S_SLIP]!, f * (200 * 0.02 - 10 * 0.08));
    close(dy[S_GEAR]!, 0.2 * (tm - 2e-4 * 2 * dww) * 400);
    close(sys.force, f);
    expect(sys.stuck).toBe(false);
    expect(sys.regime()).toBe(R_TRACTION);
  });

  it("a slipping spinner, floor faster than the wheels: friction drives the wheels and the gear runs backwards", () => {
    const sys = spinner();
    sys.mode = SLIPPING;
    sys.dir = -1;
    const dy = new Float64Array(NS);
    sys.deriv(state(100, 1000), dy);
    // I = 6/0.14 = 42.857 A; T_m = 0.02 × 40.857 = 0.817 143 N·m; f = −7.845 32 N. Driving formula:
    // ω̇_w = (1.307 429 + 0.156 906)/6.8e-4 = 2153.4 rad/s², T_out = 4e-5 × 2153.4 − 0.156 906 = −0.0708 N·m < 0,
    // so ω̇_w = (2 × 0.817 143/0.8 + 0.156 906)/1.04e-3 = 2115.2 rad/s² and T_out = 4e-5 × ω̇_w − 0.156 906.
    const tm = 0.02 * (6 / 0.14 - 2);
    const f = -0.8 * STANDARD_GRAVITY;
    const dww = ((2 * tm) / 0.8 - f * 0.02) / 1.04e-3;
    close(dy[S_MOTOR]!, 2 * dww);
    close(dy[S_MOTOR]!, 4230.3, 1e-4);
    const tOut = 4e-5 * dww + f * 0.02;
    close(dy[S_GEAR]!, -0.2 * tOut * 500);
    close(dy[S_SPEED]!, (f * 0.08 - (0.1 + 1e-5 * 1e4)) / 0.01);
  });

  it("a slipping spinner, wheels spun far above no-load speed: the motors brake the wheels and the gear runs backwards", () => {
    const sys = spinner();
    sys.mode = SLIPPING;
    sys.dir = 1;
    const dy = new Float64Array(NS);
    sys.deriv(state(10, 4000), dy);
    // I = (16 − 40)/0.14 = −171.43 A; T_m = 0.02 × (−173.43) = −3.468 57 N·m; f = +7.845 32 N. Driving formula:
    // ω̇_w = (1.6 × −3.468 57 − 0.156 906)/6.8e-4 = −8392 rad/s², T_out = 4e-5 × −8392 + 0.156 906 = −0.179 N·m < 0,
    // so ω̇_w = (2 × −3.468 57/0.8 − 0.156 906)/1.04e-3 = −8488.8 rad/s².
    const tm = 0.02 * (-24 / 0.14 - 2);
    const f = 0.8 * STANDARD_GRAVITY;
    const dww = ((2 * tm) / 0.8 - f * 0.02) / 1.04e-3;
    close(dy[S_MOTOR]!, 2 * dww);
    close(dy[S_MOTOR]!, -16977.6, 1e-4);
    close(dy[S_GEAR]!, -0.2 * (4e-5 * dww + f * 0.02) * 2000);
  });

  it("a slipping wheel at rest that its loss would turn backwards stays at rest, and so does a body at rest pushed backwards", () => {
    const sys = spinner({ throttle: 0 });
    sys.mode = SLIPPING;
    sys.dir = -1;
    const dy = new Float64Array(NS);
    sys.deriv(state(0, 0), dy);
    // dir = −1: T_m = 0.02 × (0 − 2) = −0.04 N·m; the floor turns the wheel forward, ω̇_w = (−0.064 + 0.156 906)/6.8e-4 > 0,
    // and pulls the body backwards: Ω̇ = (−7.845 32 × 0.08 − 0.1)/0.01 < 0 at Ω = 0 → held at 0.
    expect(dy[S_SPEED]).toBe(0);
    const back = spinner({ throttle: 0 });
    back.mode = SLIPPING;
    back.dir = 1;
    back.deriv(state(0, 0), dy);
    // dir = +1: ω̇_w = (2 × 0.8 × −0.04 − 0.156 906)/6.8e-4 < 0 at ω_m = 0 → held at 0; Ω̇ = (0.627 − 0.1)/0.01 > 0.
    expect(dy[S_MOTOR]).toBe(0);
    expect(dy[S_GEAR]).toBe(0);
    close(dy[S_SPEED]!, (0.8 * STANDARD_GRAVITY * 0.08 - 0.1) / 0.01);
  });
});

describe("energy, slip speed, grip and re-grip", () => {
  it("kinetic energy ½(J·Ω² + J_w·ω_w² + n·J_m·ω_m²) (softschools-rotational-ke)", () => {
    // ½ × (0.01 × 10² + 4e-5 × 200² + 2 × 1e-4 × 400²) = ½ × (1 + 1.6 + 32) = 17.3 J.
    close(spinner().kineticEnergy(state(10, 400)), 17.3);
  });

  it("slip speed ω_m/G·r − Ω·R", () => {
    // 400/2 × 0.02 − 10 × 0.08 = 4 − 0.8 = 3.2 m/s.
    close(spinner().slipSpeed(10, 400), 3.2);
  });

  it("slips when gripping would need more than μ_s·N, in the direction of the needed force", () => {
    // Gripping at Ω = 250, ω_m = 2000 (above no-load): the gear runs backwards and the wheels must
    // brake the body, F < 0 beyond −9.81 N, so the wheels slip backwards.
    const sys = spinner();
    sys.setModeAt(state(250, 2000));
    expect(sys.force).toBeLessThan(-STANDARD_GRAVITY);
    expect(sys.mode).toBe(SLIPPING);
    expect(sys.dir).toBe(-1);
    const fwd = spinner();
    fwd.setModeAt(state(0, 0));
    expect(fwd.mode).toBe(SLIPPING);
    expect(fwd.dir).toBe(1);
    expect(weapon().mode).toBe(LOCKED);
  });

  it("grips at exactly μ_s·N: only a force above the limit slips (serway-beichner-5e: f_s ≤ μ_s n)", () => {
    // Held by friction at rest, the wheels push with F = 179.657 N (above). A robot of 16/g kg with half its
    // weight on the wheels puts exactly 8 N on them, so μ_s = F/8 makes μ_s·N equal F to the last bit.
    const heavy = { frictionTorque: 100, robotMass: 16 / STANDARD_GRAVITY };
    const probe = spinner(heavy);
    probe.lockedAcceleration(0, 0);
    const force = probe.force;
    expect(probe.normal0).toBe(8);
    const sys = spinner({ ...heavy, staticFriction: force / 8 });
    expect(sys.staticLimitAt(0, 0)).toBe(force);
    sys.setModeAt(state(0, 0));
    expect(sys.mode).toBe(LOCKED);
    const over = spinner({ ...heavy, staticFriction: (force / 8) * (1 - 1e-12) });
    over.setModeAt(state(0, 0));
    expect(over.mode).toBe(SLIPPING);
  });

  it("re-grip: the contact impulse vs/(r²/J_w,eff + R²/J) ends the slip and books the lost energy", () => {
    const sys = spinner();
    const y = state(10, 400);
    const before = sys.kineticEnergy(y);
    sys.regrip(y);
    // v_s = 3.2 m/s; r²/J_w,eff = 4e-4/8.4e-4 = 0.476 190; R²/J = 0.0064/0.01 = 0.64; P = 3.2/1.116 190 = 2.866 894 N·s;
    // Ω = 10 + 2.866 894 × 0.08/0.01 = 32.935 15 rad/s, ω_m = 8 × Ω.
    const om = 10 + ((3.2 / (4e-4 / 8.4e-4 + 0.64)) * 0.08) / 0.01;
    close(y[S_SPEED]!, om);
    close(y[S_SPEED]!, 32.93515, 1e-6);
    close(y[S_MOTOR]!, 8 * om);
    const lost = before - sys.kineticEnergy(y);
    expect(lost).toBeGreaterThan(0);
    close(y[S_SLIP]!, lost);
  });
});
