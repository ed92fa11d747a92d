import { createRequire } from "node:module";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../calc/core/errors.ts";
import {
  dcMotorSteadySpeed,
  motorLine,
  MOTOR_SOURCES,
  spinUpTimeConstant,
  timeToSpeedFraction,
  torqueConstantFromKv,
  torqueSpeedLine,
  voltageLimitedSpeed,
} from "../../calc/drivetrain/motor.ts";
import { isSourceKey } from "../../calc/sources/index.ts";
import { rpmToRadPerSecond } from "../../calc/core/units.ts";

// odex ships TypeScript source without declarations; loading it through require keeps tsc out of it.
interface OdexSolver {
  relativeTolerance: number;
  absoluteTolerance: number;
  maxSteps: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number): { y: number[]; outcome: number };
}
const { Solver } = createRequire(import.meta.url)("odex") as { Solver: new (n: number) => OdexSolver };

/** |actual − expected| ≤ rtol·|expected| + atol (atol for expectations that can be zero). */
const close = (actual: number, expected: number, rtol: number, atol = 0) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);

// An invented worked example, computed in double precision from the ideal DC-motor relations and
// τ = J·R/(K_t·K_e): V = 24 V, Kv = 100 rpm/V, R = 0.1 Ω, J = 0.01 kg·m².
const EX = { voltage: 24, kv: rpmToRadPerSecond(100), resistance: 0.1, inertia: 0.01 };

describe("torque constant from Kv", () => {
  it.each([
    {
      source: "motor-constants-wikipedia",
      locator: "K_T = 60/(2π K_v(RPM)) = 1/K_v(SI)",
      inputs: { kvRpm: 1000 },
      expected: 60 / (2 * Math.PI * 1000),
      rtol: 1e-12,
      note: "the published formula evaluated exactly; 0.009 549 296 586 N·m/A",
    },
    {
      source: "motor-constants-wikipedia",
      locator: "K_T = 60/(2π K_v(RPM)), the worked-example motor",
      inputs: { kvRpm: 100 },
      expected: 0.09549296586,
      rtol: 1e-10,
      note: "computed in double precision from the published formula, printed as 0.095 492 965 86 (11 digits)",
    },
    {
      source: "ctms-dc-motor-speed",
      locator: "Franklin, Powell & Emami-Naeini problem: 25 V back-EMF at 1000 rpm, K_t = K_e in SI",
      inputs: { kvRpm: 1000 / 25 },
      expected: 25 / rpmToRadPerSecond(1000),
      rtol: 1e-12,
      note: "computed from K_t = K_e in SI: K_e = 25 V / 104.72 rad/s = 0.2387 V·s/rad, which is K_t in N·m/A (the book's answer is not shown)",
    },
  ])("$source, $locator: $expected N·m/A ($note)", ({ inputs, expected, rtol }) => {
    close(torqueConstantFromKv({ kv: rpmToRadPerSecond(inputs.kvRpm) }), expected, rtol);
  });

  it("makes K_t equal K_e: the no-load speed times K_t gives back the voltage (ctms-dc-motor-speed)", () => {
    const line = motorLine(EX);
    close(line.noLoadSpeed * line.torqueConstant, EX.voltage, 1e-14);
  });

  it("refuses a Kv of zero, naming the input and its unit", () => {
    expect(() => torqueConstantFromKv({ kv: 0 })).toThrowError(CalcInputError);
    expect(() => torqueConstantFromKv({ kv: 0 })).toThrowError("kv must be greater than 0 rad/(s·V) (got 0 rad/(s·V))");
  });
});

describe("the torque–speed line (hughes-drury-motors)", () => {
  it("is straight: torque falls linearly from stall to zero at no-load speed", () => {
    const points = torqueSpeedLine(EX, { points: 11 });
    const line = motorLine(EX);
    expect(points[0]!.torque).toBeCloseTo(line.stallTorque, 12);
    expect(points[10]!.torque).toBe(0);
    expect(points[10]!.speed).toBeCloseTo(line.noLoadSpeed, 10);
    for (const p of points) close(p.torque, line.stallTorque * (1 - p.speed / line.noLoadSpeed), 1e-12, 1e-12 * line.stallTorque);
  });

  it("peaks in power at half the no-load speed, at V²/(4R) for an ideal motor", () => {
    const points = torqueSpeedLine(EX, { points: 3 });
    close(points[1]!.power, (EX.voltage * EX.voltage) / (4 * EX.resistance), 1e-12);
    const dense = torqueSpeedLine(EX, { points: 201 });
    const best = dense.reduce((a, b) => (b.power > a.power ? b : a));
    close(best.speed, motorLine(EX).speedAtMaxPower, 1e-12);
  });

  it("with a no-load current, draws exactly that current at no-load speed and gives (V − I₀R)²/(4R) at best", () => {
    const line = motorLine({ ...EX, noLoadCurrent: 5 });
    const pts = torqueSpeedLine({ ...EX, noLoadCurrent: 5 }, { points: 3 });
    close(pts[2]!.current, 5, 1e-12);
    close(line.maxPower, (24 - 0.5) ** 2 / 0.4, 1e-12);
  });

  it("refuses a no-load current as large as the stall current", () => {
    expect(() => motorLine({ ...EX, noLoadCurrent: 240 })).toThrowError("noLoadCurrent must be less than the stall current V/R (240.0 A) (got 240 A)");
  });

  it("gives finite, consistent figures for any valid motor (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 20000, noNaN: true }),
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        fc.double({ min: 0.5, max: 100, noNaN: true }),
        (kvRpm, resistance, voltage) => {
          const line = motorLine({ kv: rpmToRadPerSecond(kvRpm), resistance, voltage });
          for (const v of Object.values(line)) expect(Number.isFinite(v)).toBe(true);
          close(line.maxPower, (line.stallTorque * line.noLoadSpeed) / 4, 1e-12);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("first-order spin-up of an inertia (first-order-step-response)", () => {
  it("reaches 63.2 % of the final speed at t = τ (the mechanical-time-constant definition)", () => {
    // The 63.2 % definition is published only on low-authority web pages (common practice otherwise);
    // 3 significant figures → rtol 5e-3.
    close(voltageLimitedSpeed({ finalSpeed: 1, timeConstant: 0.2, time: 0.2 }), 0.632, 5e-3);
  });

  it("inverts: the speed at the time to a fraction is that fraction of the final speed", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.999, noNaN: true }), fc.double({ min: 1e-4, max: 100, noNaN: true }), (fraction, timeConstant) => {
        const time = timeToSpeedFraction({ timeConstant, fraction });
        close(voltageLimitedSpeed({ finalSpeed: 300, timeConstant, time }), 300 * fraction, 1e-12, 1e-12 * 300);
      }),
    );
  });

  it("takes τ·ln 10 to 90 % and τ·ln 20 to 95 %", () => {
    close(timeToSpeedFraction({ timeConstant: 1, fraction: 0.9 }), Math.LN10, 1e-15);
    close(timeToSpeedFraction({ timeConstant: 1, fraction: 0.95 }), Math.log(20), 1e-15);
  });

  it("starts from a given speed and still approaches the same final speed", () => {
    expect(voltageLimitedSpeed({ finalSpeed: 100, timeConstant: 0.1, time: 0, initialSpeed: 40 })).toBe(40);
    close(voltageLimitedSpeed({ finalSpeed: 100, timeConstant: 0.1, time: 0.1, initialSpeed: 40 }), 100 - 60 / Math.E, 1e-14);
  });

  it("refuses the final speed itself as a fraction (it is never reached)", () => {
    expect(() => timeToSpeedFraction({ timeConstant: 1, fraction: 1 })).toThrowError("fraction must be at least 0 and less than 1 (got 1)");
  });

  it("scales τ by 1/(N·G²·η) for N motors through a reduction", () => {
    const single = spinUpTimeConstant({ inertia: 0.01, resistance: 0.1, torqueConstant: 0.05 });
    close(
      spinUpTimeConstant({ inertia: 0.01, resistance: 0.1, torqueConstant: 0.05, motorCount: 2, ratio: 3, efficiency: 0.9 }),
      single / (2 * 9 * 0.9),
      1e-14,
    );
  });
});

describe("steady speed against friction: the CTMS DC-motor example (ctms-dc-motor-speed)", () => {
  const CTMS = { J: 0.01, b: 0.1, K: 0.01, R: 1, L: 0.5, V: 1 }; // parameters from memory (Control Tutorials for MATLAB & Simulink, DC Motor Speed)

  it("settles near the published 0.1 rad/s for a 1 V step", () => {
    // The tutorial prints one significant figure: ± half a unit in the last digit is ±0.05 rad/s.
    const w = dcMotorSteadySpeed({ torqueConstant: CTMS.K, resistance: CTMS.R, voltage: CTMS.V, viscousFriction: CTMS.b });
    expect(Math.abs(w - 0.1)).toBeLessThanOrEqual(0.05);
  });

  it("agrees with odex integrating the full model with inductance to t = 8 s", () => {
    // J ω̇ = K i − b ω; L di/dt = V − R i − K ω. The slowest pole is −2 /s (published), so at 8 s the
    // transient is e^(−16) ≈ 1e-7 of the step: tolerance 1e-6.
    const s = new Solver(2);
    s.relativeTolerance = 1e-12;
    s.absoluteTolerance = 1e-14;
    s.maxSteps = 100000;
    const out = s.solve((_t, [w, i]) => [(CTMS.K * i! - CTMS.b * w!) / CTMS.J, (CTMS.V - CTMS.R * i! - CTMS.K * w!) / CTMS.L], 0, [0, 0], 8);
    close(out.y[0]!, dcMotorSteadySpeed({ torqueConstant: CTMS.K, resistance: CTMS.R, voltage: CTMS.V, viscousFriction: CTMS.b }), 1e-6);
  });

  it("stays at rest when the friction torque exceeds what the stalled motor gives", () => {
    expect(dcMotorSteadySpeed({ torqueConstant: 0.01, resistance: 1, voltage: 1, frictionTorque: 0.02 })).toBe(0);
  });
});

describe("regression pins (our own digits, computed in double precision from the ideal DC-motor relations, not outside authorities)", () => {
  it.each([
    { quantity: "no-load speed", actual: () => motorLine(EX).noLoadSpeed, expected: 251.3274123, rtol: 1e-9 },
    { quantity: "stall current", actual: () => motorLine(EX).stallCurrent, expected: 240, rtol: 1e-12 },
    { quantity: "stall torque", actual: () => motorLine(EX).stallTorque, expected: 22.91831181, rtol: 1e-9 },
    { quantity: "peak power", actual: () => motorLine(EX).maxPower, expected: 1440, rtol: 1e-12 },
    {
      quantity: "τ",
      actual: () => spinUpTimeConstant({ inertia: EX.inertia, resistance: EX.resistance, torqueConstant: torqueConstantFromKv(EX) }),
      expected: 0.1096622711,
      rtol: 1e-9,
    },
    {
      quantity: "ω(τ)",
      actual: () => voltageLimitedSpeed({ finalSpeed: 251.3274123, timeConstant: 0.1096622711, time: 0.1096622711 }),
      expected: 158.8692243,
      rtol: 1e-9,
    },
    {
      quantity: "ω(0.1 s)",
      actual: () => voltageLimitedSpeed({ finalSpeed: 251.3274123, timeConstant: 0.1096622711, time: 0.1 }),
      expected: 150.3531286,
      rtol: 1e-9,
    },
    {
      quantity: "ω(0.5 s)",
      actual: () => voltageLimitedSpeed({ finalSpeed: 251.3274123, timeConstant: 0.1096622711, time: 0.5 }),
      expected: 248.6965721,
      rtol: 1e-9,
    },
    { quantity: "t90", actual: () => timeToSpeedFraction({ timeConstant: 0.1096622711, fraction: 0.9 }), expected: 0.2525067108, rtol: 1e-9 },
    { quantity: "t95", actual: () => timeToSpeedFraction({ timeConstant: 0.1096622711, fraction: 0.95 }), expected: 0.328518805, rtol: 1e-9 },
    {
      quantity: "CTMS steady speed K·V/(bR + K²)",
      actual: () => dcMotorSteadySpeed({ torqueConstant: 0.01, resistance: 1, voltage: 1, viscousFriction: 0.1 }),
      expected: 0.0999001,
      rtol: 1e-6,
    },
  ])("$quantity = $expected", ({ actual, expected, rtol }) => {
    close(actual(), expected, rtol);
  });
});

describe("bibliography", () => {
  it("names only source keys that exist", () => {
    for (const key of MOTOR_SOURCES) expect(isSourceKey(key)).toBe(true);
  });
});
