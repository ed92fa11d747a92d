/**
 * Closed-form figures of a spinning rotor at their edges: the friction torque in the traction
 * limit, the gear efficiency's open lower end, and refusals of results beyond the double range,
 * each naming the input furthest from 1 with its unit.
 */
import { describe, expect, it } from "vitest";
import { biteDepth, currentLimitedAcceleration, rotorKineticEnergy, rotorTipSpeed, tractionLimitedAcceleration } from "../../../calc/drivetrain/figures.ts";
import { expectRefusal } from "../../support/refusal.ts";

/** |actual − expected| ≤ rtol·|expected|. */
const close = (actual: number, expected: number, rtol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));

// The invented demo spinner's traction figures: μ_k = 0.8, N_n = 0.9 × 1.5 kg × 9.81 m/s² ≈ 13.24 N,
// wheel contacts 0.07 m from the centre, J = 0.005 kg·m².
const SPINNER = { frictionCoefficient: 0.8, normalForce: 13.24, contactRadius: 0.07, inertia: 0.005 };

describe("traction-limited acceleration with a friction torque (serway-beichner-5e)", () => {
  it("subtracts the skids' friction torque from the wheels' friction couple", () => {
    // μ·N_n·R = 0.8 × 13.24 × 0.07 = 0.741 44 N·m; (0.741 44 − 0.1)/0.005 = 128.288 rad/s²
    // (against 0.741 44/0.005 = 148.288 rad/s² with no friction torque).
    close(tractionLimitedAcceleration({ ...SPINNER, frictionTorque: 0.1 }), 128.288, 1e-12);
  });

  it("gives 0 when the friction torque is larger than the wheels can push", () => {
    expect(tractionLimitedAcceleration({ ...SPINNER, frictionTorque: 1 })).toBe(0);
  });
});

describe("current-limited acceleration: the gear efficiency", () => {
  it("refuses an efficiency of 0 (the range is open there), naming efficiency", () => {
    expectRefusal(
      () => currentLimitedAcceleration({ currentLimit: 60, torqueConstant: 0.0068, inertia: 6.3e-4, efficiency: 0 }),
      "efficiency",
      0,
      "",
      "efficiency must be greater than 0 and at most 1 (got 0)",
    );
  });
});

describe("refusals of results beyond the double range name the input furthest from 1", () => {
  it("kinetic energy: the speed or the inertia", () => {
    // ½·1·(1e200)² = 5e399.
    expectRefusal(
      () => rotorKineticEnergy({ inertia: 1, angularSpeed: 1e200 }),
      "angularSpeed",
      1e200,
      "rad/s",
      "angularSpeed must be small enough for the kinetic energy to stay finite (got 1e+200 rad/s)",
    );
    // ½·1e300·(1e10)² = 5e319.
    expectRefusal(
      () => rotorKineticEnergy({ inertia: 1e300, angularSpeed: 1e10 }),
      "inertia",
      1e300,
      "kg·m²",
      "inertia must be small enough for the kinetic energy to stay finite (got 1e+300 kg·m²)",
    );
  });

  it("tip speed: the speed or the radius", () => {
    // 1e300 × 1e10 = 1e310 either way round.
    expectRefusal(
      () => rotorTipSpeed({ angularSpeed: 1e300, radius: 1e10 }),
      "angularSpeed",
      1e300,
      "rad/s",
      "angularSpeed must be small enough for the rotor tip speed to stay finite (got 1e+300 rad/s)",
    );
    expectRefusal(
      () => rotorTipSpeed({ angularSpeed: 1e10, radius: 1e300 }),
      "radius",
      1e300,
      "m",
      "radius must be small enough for the rotor tip speed to stay finite (got 1e+300 m)",
    );
  });

  it("bite depth: the weapon speed or the closing speed", () => {
    // 3 m/s × 2π/(1e-309 rad/s × 2) = 9.4e309 m.
    expectRefusal(
      () => biteDepth({ closingSpeed: 3, angularSpeed: 1e-309, impactors: 2 }),
      "angularSpeed",
      1e-309,
      "rad/s",
      "angularSpeed must be large enough for the bite depth to stay finite (got 1e-309 rad/s)",
    );
    // 1e300 m/s × 2π/1e-10 rad/s = 6.3e310 m.
    expectRefusal(
      () => biteDepth({ closingSpeed: 1e300, angularSpeed: 1e-10, impactors: 1 }),
      "closingSpeed",
      1e300,
      "m/s",
      "closingSpeed must be small enough for the bite depth to stay finite (got 1e+300 m/s)",
    );
  });

  it("traction-limited acceleration: μ, N_n, R, J or T_f", () => {
    const base = { frictionCoefficient: 1, normalForce: 1, contactRadius: 1, inertia: 1 };
    // μ·N_n·R = 1e300 × 1e10 = 1e310, whichever of the three is 1e300.
    const cases = [
      { param: "frictionCoefficient", unit: "", shown: "1e+300" },
      { param: "normalForce", unit: "N", shown: "1e+300 N" },
      { param: "contactRadius", unit: "m", shown: "1e+300 m" },
    ] as const;
    for (const { param, unit, shown } of cases) {
      const other = param === "normalForce" ? "contactRadius" : "normalForce";
      expectRefusal(
        () => tractionLimitedAcceleration({ ...base, [other]: 1e10, [param]: 1e300 }),
        param,
        1e300,
        unit,
        `${param} must be small enough for the acceleration to stay finite (got ${shown})`,
      );
    }
    // 1 N·m/1e-309 kg·m² = 1e309 rad/s².
    expectRefusal(
      () => tractionLimitedAcceleration({ ...base, inertia: 1e-309 }),
      "inertia",
      1e-309,
      "kg·m²",
      "inertia must be large enough for the acceleration to stay finite (got 1e-309 kg·m²)",
    );
    // μ·N_n = 1e200 × 1e200 overflows; T_f = 1e250 is the input furthest from 1.
    expectRefusal(
      () => tractionLimitedAcceleration({ ...base, frictionCoefficient: 1e200, normalForce: 1e200, frictionTorque: 1e250 }),
      "frictionTorque",
      1e250,
      "N·m",
      "frictionTorque must be small enough for the acceleration to stay finite (got 1e+250 N·m)",
    );
  });

  it("current-limited acceleration: each of its nine inputs", () => {
    const base = { currentLimit: 1, torqueConstant: 1, inertia: 1 };
    // η·G·N·K_t·I = 1e300 × 1e10 = 1e310 for I_lim, K_t, N and G (G² = 1e600 in the rotor term too).
    const big = [
      { param: "currentLimit", unit: "A", shown: "1e+300 A", other: "torqueConstant" },
      { param: "torqueConstant", unit: "N·m/A", shown: "1e+300 N·m/A", other: "currentLimit" },
      { param: "motorCount", unit: "", shown: "1e+300", other: "torqueConstant" },
      { param: "ratio", unit: "", shown: "1e+300", other: "torqueConstant" },
    ] as const;
    for (const { param, unit, shown, other } of big) {
      expectRefusal(
        () => currentLimitedAcceleration({ ...base, [other]: 1e10, [param]: 1e300 }),
        param,
        1e300,
        unit,
        `${param} must be small enough for the current limited acceleration to stay finite (got ${shown})`,
      );
    }
    // 1 N·m/1e-309 kg·m² = 1e309 rad/s².
    expectRefusal(
      () => currentLimitedAcceleration({ ...base, inertia: 1e-309 }),
      "inertia",
      1e-309,
      "kg·m²",
      "inertia must be large enough for the current limited acceleration to stay finite (got 1e-309 kg·m²)",
    );
    // K_t·I_lim = 1e300 × 1e300 overflows; the one input at 1e-309 is the furthest from 1.
    const tiny = [
      { param: "noLoadCurrent", unit: "A", shown: "1e-309 A" },
      { param: "frictionTorque", unit: "N·m", shown: "1e-309 N·m" },
      { param: "motorRotorInertia", unit: "kg·m²", shown: "1e-309 kg·m²" },
    ] as const;
    for (const { param, unit, shown } of tiny) {
      expectRefusal(
        () => currentLimitedAcceleration({ ...base, currentLimit: 1e300, torqueConstant: 1e300, [param]: 1e-309 }),
        param,
        1e-309,
        unit,
        `${param} must be large enough for the current limited acceleration to stay finite (got ${shown})`,
      );
    }
    // η·K_t·I_lim = 1e-309 × 1e300 × 1e300 = 1e291 N·m over J = 1e-300 kg·m² gives 1e591.
    expectRefusal(
      () => currentLimitedAcceleration({ currentLimit: 1e300, torqueConstant: 1e300, inertia: 1e-300, efficiency: 1e-309 }),
      "efficiency",
      1e-309,
      "",
      "efficiency must be large enough for the current limited acceleration to stay finite (got 1e-309)",
    );
  });
});
