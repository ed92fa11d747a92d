/**
 * The closed-form DC motor at its edges: the no-load current in the stall torque and along the
 * torque–speed line, the line's point count, the steady speed with friction, and every refusal
 * worded by name and unit, including the inputs that take a result out of the double range.
 */
import { describe, expect, it } from "vitest";
import {
  dcMotorSteadySpeed,
  motorLine,
  spinUpTimeConstant,
  timeToSpeedFraction,
  torqueConstantFromKv,
  torqueSpeedLine,
  voltageLimitedSpeed,
} from "../../../calc/drivetrain/motor.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import { expectRefusal } from "../../support/refusal.ts";

/** |actual − expected| ≤ rtol·|expected|. */
const close = (actual: number, expected: number, rtol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));

// An invented motor: 24 V, Kv = 100 rpm/V, R = 0.1 Ω. K_t = 60/(2π·100) = 0.095 492 97 N·m/A
// (motor-constants-wikipedia: K_T = 1/K_v in SI), I_stall = V/R = 240 A.
const EX = { voltage: 24, kv: rpmToRadPerSecond(100), resistance: 0.1 };
const KT = 60 / (2 * Math.PI * 100);

// The invented demo weapon's motor: 1400 rpm/V, 45 mΩ, 1.2 A no-load, on 4 × 4.1 V = 16.4 V.
const DEMO_MOTOR = { kv: rpmToRadPerSecond(1400), resistance: 0.045, voltage: 16.4, noLoadCurrent: 1.2 };

describe("the no-load current in the motor line (hughes-drury-motors)", () => {
  it("takes K_t·I₀ off the stall torque: T_stall = K_t·(V/R − I₀)", () => {
    // 0.095 492 97 N·m/A × (240 A − 5 A) = 22.4408 N·m, against 22.9183 N·m for the ideal motor.
    close(motorLine({ ...EX, noLoadCurrent: 5 }).stallTorque, KT * (240 - 5), 1e-12);
    close(motorLine({ ...EX, noLoadCurrent: 5 }).stallTorque, 22.4408, 1e-5);
  });

  it("starts the plotted line at the same stall torque, and draws I₀ at no load", () => {
    // K_t = 60/(2π·1400) = 0.006 820 926 N·m/A; V/R = 16.4/0.045 = 364.444 A;
    // T_stall = 0.006 820 926 × (364.444 − 1.2) = 2.477 66 N·m.
    const [stall, noLoad] = torqueSpeedLine(DEMO_MOTOR, { points: 2 });
    close(stall!.torque, (60 / (2 * Math.PI * 1400)) * (16.4 / 0.045 - 1.2), 1e-12);
    close(stall!.torque, 2.47766, 1e-5);
    expect(stall!.speed).toBe(0);
    close(noLoad!.current, 1.2, 1e-12);
  });

  it("ends at exactly zero torque and power at the no-load speed, not at a rounding error's worth", () => {
    // ω_nl = (V − I₀R)/K_t = (16.4 − 0.054)/0.006 820 926 = 2396.45 rad/s. Worked through in
    // doubles, K_t·(I − I₀) there comes out about −2e-16 N·m rather than 0.
    for (const points of [2, 3, 41]) {
      const line = torqueSpeedLine(DEMO_MOTOR, { points });
      const last = line[line.length - 1]!;
      close(last.speed, 16.346 / (60 / (2 * Math.PI * 1400)), 1e-12);
      close(last.speed, 2396.45, 1e-6);
      expect(last.torque).toBe(0);
      expect(last.power).toBe(0);
    }
  });

  it("gives exactly the number of points asked for, from stall to no load", () => {
    expect(torqueSpeedLine(EX, { points: 3 })).toHaveLength(3);
    expect(torqueSpeedLine(EX, { points: 2 })).toHaveLength(2);
    expect(torqueSpeedLine(EX)).toHaveLength(41);
  });
});

describe("the point count of the torque–speed line", () => {
  it("refuses fewer than 2 points, naming points", () => {
    expectRefusal(() => torqueSpeedLine(EX, { points: 1 }), "points", 1, "", "points must be at least 2 and at most 1000 (got 1)");
  });

  it("refuses a count that is not whole, naming points", () => {
    expectRefusal(() => torqueSpeedLine(EX, { points: 2.5 }), "points", 2.5, "", "points must be a whole number (got 2.5)");
  });

  it("refuses a Kv so large that the points' speeds leave the double range, naming kv", () => {
    // ω_nl = V·K_v = 1e8 V × 1e300 rad/(s·V) = 1e308 rad/s; the third point's ω_nl·2 passes the largest double.
    expectRefusal(
      () => torqueSpeedLine({ kv: 1e300, resistance: 1, voltage: 1e8 }, { points: 3 }),
      "kv",
      1e300,
      "rad/(s·V)",
      "kv must be small enough for the torque-speed line to stay finite (got 1e+300 rad/(s·V))",
    );
  });
});

describe("refusals of results beyond the double range name the input that caused them", () => {
  it("torque constant: a Kv below 1/1.8e308 rad/(s·V)", () => {
    expectRefusal(
      () => torqueConstantFromKv({ kv: 1e-309 }),
      "kv",
      1e-309,
      "rad/(s·V)",
      "kv must be large enough for the torque constant to stay finite (got 1e-309 rad/(s·V))",
    );
  });

  it("motor line: a voltage or a resistance that makes V/R overflow", () => {
    // I_stall = 1e300 V / 1e-10 Ω = 1e310 A: the voltage is the further from 1.
    expectRefusal(
      () => motorLine({ kv: 100, resistance: 1e-10, voltage: 1e300 }),
      "voltage",
      1e300,
      "V",
      "voltage must be small enough for the motor line to stay finite (got 1e+300 V)",
    );
    // I_stall = 1 V / 1e-309 Ω = 1e309 A: the resistance is.
    expectRefusal(
      () => motorLine({ kv: 100, resistance: 1e-309, voltage: 1 }),
      "resistance",
      1e-309,
      "Ω",
      "resistance must be large enough for the motor line to stay finite (got 1e-309 Ω)",
    );
  });

  it("time constant: each of J, R, N, G and η when it alone takes τ = J·R/(N·G²·η·K_t²) out of range", () => {
    const base = { inertia: 1, resistance: 1, torqueConstant: 1 };
    // 1e300 × 1e10 = 1e310 for J·R.
    expectRefusal(
      () => spinUpTimeConstant({ ...base, inertia: 1e300, resistance: 1e10 }),
      "inertia",
      1e300,
      "kg·m²",
      "inertia must be small enough for the time constant to stay finite (got 1e+300 kg·m²)",
    );
    expectRefusal(
      () => spinUpTimeConstant({ ...base, inertia: 1e10, resistance: 1e300 }),
      "resistance",
      1e300,
      "Ω",
      "resistance must be small enough for the time constant to stay finite (got 1e+300 Ω)",
    );
    // 1/1e-309 = 1e309 for N and η; G² = 1e-400 is 0 in doubles.
    expectRefusal(
      () => spinUpTimeConstant({ ...base, motorCount: 1e-309 }),
      "motorCount",
      1e-309,
      "",
      "motorCount must be large enough for the time constant to stay finite (got 1e-309)",
    );
    expectRefusal(
      () => spinUpTimeConstant({ ...base, ratio: 1e-200 }),
      "ratio",
      1e-200,
      "",
      "ratio must be large enough for the time constant to stay finite (got 1e-200)",
    );
    expectRefusal(
      () => spinUpTimeConstant({ ...base, efficiency: 1e-309 }),
      "efficiency",
      1e-309,
      "",
      "efficiency must be large enough for the time constant to stay finite (got 1e-309)",
    );
  });

  it("speed at a time: the final or the initial speed, whichever is further out (τ and t cannot overflow it)", () => {
    // ω_∞ − ω_0 = 1e308 + 1e308 passes the largest double; e^(−t/τ) only ever shrinks it.
    expectRefusal(
      () => voltageLimitedSpeed({ finalSpeed: 1e308, initialSpeed: -1e308, timeConstant: 1, time: 0 }),
      "finalSpeed",
      1e308,
      "rad/s",
      "finalSpeed must be small enough for the speed to stay finite (got 1e+308 rad/s)",
    );
    expectRefusal(
      () => voltageLimitedSpeed({ finalSpeed: 1e308, initialSpeed: -1.7e308, timeConstant: 1e-300, time: 1e-300 }),
      "initialSpeed",
      -1.7e308,
      "rad/s",
      "initialSpeed must be small enough for the speed to stay finite (got -1.7e+308 rad/s)",
    );
  });

  it("time to a speed fraction: the time constant", () => {
    // −1e308 s × ln(1 − 0.99) = 1e308 × 4.605 s passes the largest double.
    expectRefusal(
      () => timeToSpeedFraction({ timeConstant: 1e308, fraction: 0.99 }),
      "timeConstant",
      1e308,
      "s",
      "timeConstant must be small enough for the time to the speed fraction to stay finite (got 1e+308 s)",
    );
  });

  it("steady speed: K, R, V, b or T_f, whichever is furthest from 1", () => {
    // K·V = 1e200 × 1e200 overflows, and so does the denominator b·R + K², so ω_ss is ∞/∞.
    const big = { torqueConstant: 1e200, resistance: 1, voltage: 1e200, viscousFriction: 1, frictionTorque: 0 };
    const cases = [
      { param: "resistance", value: 1e250, unit: "Ω" },
      { param: "voltage", value: 1e250, unit: "V" },
      { param: "viscousFriction", value: 1e250, unit: "N·m·s/rad" },
      { param: "frictionTorque", value: 1e250, unit: "N·m" },
    ] as const;
    for (const { param, value, unit } of cases) {
      expectRefusal(
        () => dcMotorSteadySpeed({ ...big, [param]: value }),
        param,
        value,
        unit,
        `${param} must be small enough for the steady speed to stay finite (got 1e+250 ${unit})`,
      );
    }
    // K = 1e-300: K² is 0 in doubles and, with no viscous friction, K·V/(b·R + K²) = 1e-300/0.
    expectRefusal(
      () => dcMotorSteadySpeed({ torqueConstant: 1e-300, resistance: 1, voltage: 1 }),
      "torqueConstant",
      1e-300,
      "N·m/A",
      "torqueConstant must be large enough for the steady speed to stay finite (got 1e-300 N·m/A)",
    );
  });
});

describe("the other refusals, by name and unit", () => {
  it("time constant: N and G must be greater than 0, η in (0, 1]", () => {
    const base = { inertia: 0.01, resistance: 0.1, torqueConstant: 0.05 };
    expectRefusal(() => spinUpTimeConstant({ ...base, motorCount: 0 }), "motorCount", 0, "", "motorCount must be greater than 0 (got 0)");
    expectRefusal(() => spinUpTimeConstant({ ...base, ratio: 0 }), "ratio", 0, "", "ratio must be greater than 0 (got 0)");
    expectRefusal(() => spinUpTimeConstant({ ...base, efficiency: 0 }), "efficiency", 0, "", "efficiency must be greater than 0 and at most 1 (got 0)");
    expectRefusal(() => spinUpTimeConstant({ ...base, efficiency: 1.1 }), "efficiency", 1.1, "", "efficiency must be greater than 0 and at most 1 (got 1.1)");
  });

  it("speed at a time: an initial speed that is not a finite number", () => {
    expectRefusal(
      () => voltageLimitedSpeed({ finalSpeed: 100, timeConstant: 0.1, time: 0.1, initialSpeed: Number.NaN }),
      "initialSpeed",
      Number.NaN,
      "rad/s",
      "initialSpeed must be a finite number (got not a number)",
    );
    expectRefusal(
      () => voltageLimitedSpeed({ finalSpeed: 100, timeConstant: 0.1, time: 0.1, initialSpeed: Number.POSITIVE_INFINITY }),
      "initialSpeed",
      Number.POSITIVE_INFINITY,
      "rad/s",
      "initialSpeed must be a finite number (got infinity)",
    );
  });

  it("steady speed: a negative friction torque", () => {
    expectRefusal(
      () => dcMotorSteadySpeed({ torqueConstant: 0.01, resistance: 1, voltage: 1, frictionTorque: -0.5 }),
      "frictionTorque",
      -0.5,
      "N·m",
      "frictionTorque must be 0 N·m or more (got -0.5 N·m)",
    );
  });
});

describe("steady speed against viscous and constant friction (ctms-dc-motor-speed)", () => {
  it("is (K·V − R·T_f)/(b·R + K²) for a motor off 1 V and 1 Ω", () => {
    // K = 0.05 N·m/A, R = 0.5 Ω, V = 12 V, b = 0.001 N·m·s/rad, T_f = 0.1 N·m:
    // (0.6 − 0.05)/(0.0005 + 0.0025) = 0.55/0.003 = 183.333 rad/s.
    close(dcMotorSteadySpeed({ torqueConstant: 0.05, resistance: 0.5, voltage: 12, viscousFriction: 0.001, frictionTorque: 0.1 }), 0.55 / 0.003, 1e-12);
  });

  it("stays at rest when the friction torque equals the stalled motor's torque K·V/R, even with K² below the double range", () => {
    // K·V − R·T_f = 1e-200 − 1e-200 = 0: no drive, so 0 rad/s (K² = 1e-400 is 0 in doubles, b = 0).
    expect(dcMotorSteadySpeed({ torqueConstant: 1e-200, resistance: 1, voltage: 1, frictionTorque: 1e-200 })).toBe(0);
    // The same balance at everyday figures (binary-exact, so the difference is exactly 0):
    // K = 0.0625 N·m/A, V = 12 V, R = 0.5 Ω, T_f = 0.0625 × 12/0.5 = 1.5 N·m.
    expect(dcMotorSteadySpeed({ torqueConstant: 0.0625, resistance: 0.5, voltage: 12, viscousFriction: 0.001, frictionTorque: 1.5 })).toBe(0);
  });
});
