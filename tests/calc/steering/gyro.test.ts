/**
 * The wheels' gyroscopic moment and the wheel loads it sets (calc/steering/gyro.ts).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { gyroscopicBearingForce, rollingWheelGyroscopicMoment, skidLiftSpeed, wheelGyroscopicMoment, wheelNormalLoads } from "../../../calc/steering/gyro.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";

const close = (actual: number, expected: number, rtol: number, atol = 0) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};
const RPM = rpmToRadPerSecond(1);

describe("the textbook gyroscopic relation M = I·ω·Ω (meriam-kraige-dynamics, steady precession)", () => {
  it.each([
    {
      source: "khurmi-gupta-theory-of-machines",
      locator: "Ex. 14.2, p. 485: disc 150 mm, 5 kg (I = mr²/2 = 0.0140625 kg·m²), 1000 rpm, precession 60 rpm",
      inputs: { wheelInertia: 0.0140625, wheelSpeed: 1000 * RPM, spinSpeed: 60 * RPM },
      expected: 9.2,
      rtol: 0.006,
      note: "the book prints C to 2 significant figures (9.2 N·m): ±0.05 N·m, about 0.6 %",
    },
    {
      source: "a ship's turbine worked example (Theory of Machines, ch. 14 type), as reproduced in a solution page",
      locator: "m = 3500 kg, k = 0.45 m (I = 708.75 kg·m²), 3000 rpm, turning at v/R = 10 m/s over 100 m",
      inputs: { wheelInertia: 708.75, wheelSpeed: 3000 * RPM, spinSpeed: 0.1 },
      expected: 22270,
      rtol: 5e-4,
      note: "printed 22.27 kN·m from ω rounded to 314.2 rad/s",
    },
  ])("$source, $locator → $expected N·m ($note)", ({ inputs, expected, rtol }) => {
    close(wheelGyroscopicMoment(inputs), expected, rtol);
  });

  it("gives the bearing reactions of khurmi-gupta-theory-of-machines Ex. 14.2: 116.5 N up at A, 67.5 N down at B (bearings 100 mm apart)", () => {
    const moment = wheelGyroscopicMoment({ wheelInertia: 0.0140625, wheelSpeed: 1000 * RPM, spinSpeed: 60 * RPM });
    const f = gyroscopicBearingForce({ moment, bearingSpacing: 0.1 });
    const half = (5 * 9.81) / 2; // the book's g = 9.81
    // The book carries C = 9.2 N·m into F = C/x: its reactions are ±0.5 N from that rounding, and printed to 0.1 N.
    close(f + half, 116.5, 0, 0.6);
    close(f - half, 67.5, 0, 0.6);
  });

  it("counts the motor rotor's momentum G·J_m (not its reflected inertia G²·J_m), reversed by one gear mesh", () => {
    const base = { wheelInertia: 4e-6, rotorInertia: 3e-6, wheelSpeed: 1000, spinSpeed: 300 };
    close(wheelGyroscopicMoment({ ...base, gearRatio: 2 }), (4e-6 + 2 * 3e-6) * 1000 * 300, 1e-14);
    close(wheelGyroscopicMoment({ ...base, gearRatio: 2, rotorSense: -1 }), (4e-6 - 2 * 3e-6) * 1000 * 300, 1e-12);
  });

  it("rolling, is (J_w + G·J_m)·(R/r_w)·Ω²: the general form with ω_w = Ω·R/r_w", () => {
    const p = { wheelInertia: 4e-6, rotorInertia: 3e-6, gearRatio: 1.5, wheelRadius: 0.018, contactRadius: 0.07 };
    fc.assert(
      fc.property(fc.double({ min: -3000, max: 3000, noNaN: true }), (om) => {
        close(
          rollingWheelGyroscopicMoment({ ...p, spinSpeed: om }),
          wheelGyroscopicMoment({ ...p, wheelSpeed: (om * 0.07) / 0.018, spinSpeed: om }),
          1e-12,
          1e-300,
        );
      }),
    );
    close(rollingWheelGyroscopicMoment({ ...p, gearRatio: 1, spinSpeed: 3000 * RPM }), 7e-6 * (0.07 / 0.018) * (3000 * RPM) ** 2, 1e-14);
  });
});

describe("wheel loads of a one-wheel spinner with a skid opposite (re-derived in gyro.ts)", () => {
  const robot = { robotMass: 1.5, wheelRadius: 0.018, wheelInertia: 4e-6, rotorInertia: 3e-6 };
  const layout = { ...robot, wheelCount: 1, contactRadius: 0.07 };
  const lift = skidLiftSpeed(robot)!;

  it("lifts the skid at Ω = √(M·g·r_w/(J_w + G·J_m)) = 194.5 rad/s (1857 rpm) for the invented demo wheel", () => {
    close(lift, Math.sqrt((1.5 * STANDARD_GRAVITY * 0.018) / 7e-6), 1e-14);
    close(lift / RPM, 1857.2, 1e-4);
  });

  it("shares the weight equally at rest and shifts M_gy/(2R) onto the wheel as it spins", () => {
    const still = wheelNormalLoads({ ...layout, spinSpeed: 0 });
    close(still.wheelLoad, (1.5 * STANDARD_GRAVITY) / 2, 1e-14);
    close(still.skidLoad, (1.5 * STANDARD_GRAVITY) / 2, 1e-14);
    const spinning = wheelNormalLoads({ ...layout, spinSpeed: 100 });
    close(spinning.wheelLoad - still.wheelLoad, spinning.gyroscopicMoment / (2 * 0.07), 1e-12);
    close(spinning.wheelLoad + spinning.skidLoad, 1.5 * STANDARD_GRAVITY, 1e-14);
  });

  it("brings the skid load to zero exactly at the lift speed (a round trip), and reports it lifted above", () => {
    close(wheelNormalLoads({ ...layout, spinSpeed: lift }).skidLoad, 0, 0, 1e-12);
    expect(wheelNormalLoads({ ...layout, spinSpeed: 0.999 * lift }).skidLifted).toBe(false);
    const above = wheelNormalLoads({ ...layout, spinSpeed: 1.01 * lift });
    expect(above.skidLifted).toBe(true);
    expect(above.skidLoad).toBe(0);
  });

  it("checks the lift speed by moments about the skid's contact (a second method): N_w·2R = M·g·R + M_gy", () => {
    // About the skid contact the weight acts at R and the wheel reaction at 2R; the moment adds.
    const m = rollingWheelGyroscopicMoment({ ...robot, contactRadius: 0.07, spinSpeed: 150 });
    const wheel = (1.5 * STANDARD_GRAVITY * 0.07 + m) / (2 * 0.07);
    close(wheelNormalLoads({ ...layout, spinSpeed: 150 }).wheelLoad, wheel, 1e-12);
  });

  it("has no lift speed when a reversed rotor outweighs the wheel: the moment then presses the skid down", () => {
    expect(skidLiftSpeed({ ...robot, rotorSense: -1, gearRatio: 3 })).toBeNull();
  });
});

describe("two or more evenly spaced wheels", () => {
  it("keep their share of the weight at any speed: the moments cancel on the body (the bearings carry them)", () => {
    for (const om of [0, 300, 3000]) {
      const l = wheelNormalLoads({
        wheelCount: 2,
        robotMass: 1.5,
        weightShare: 0.9,
        wheelInertia: 4e-6,
        wheelRadius: 0.018,
        contactRadius: 0.07,
        spinSpeed: om,
      });
      close(l.wheelLoad, (0.9 * 1.5 * STANDARD_GRAVITY) / 2, 1e-14);
      close(l.skidLoad, 0.1 * 1.5 * STANDARD_GRAVITY, 1e-12);
    }
  });
});

describe("inputs", () => {
  it.each([
    { fn: () => wheelGyroscopicMoment({ wheelInertia: -1, wheelSpeed: 1, spinSpeed: 1 }), param: "wheelInertia" },
    { fn: () => wheelGyroscopicMoment({ wheelInertia: 1, wheelSpeed: 1, spinSpeed: 1, rotorSense: 2 as 1 }), param: "rotorSense" },
    { fn: () => wheelGyroscopicMoment({ wheelInertia: 1, wheelSpeed: Number.MAX_VALUE, spinSpeed: 10 }), param: "spinSpeed" },
    { fn: () => gyroscopicBearingForce({ moment: 1, bearingSpacing: 0 }), param: "bearingSpacing" },
    {
      fn: () => wheelNormalLoads({ wheelCount: 1.5, robotMass: 1, wheelInertia: 1e-6, wheelRadius: 0.02, contactRadius: 0.1, spinSpeed: 1 }),
      param: "wheelCount",
    },
    { fn: () => skidLiftSpeed(null as unknown as Parameters<typeof skidLiftSpeed>[0]), param: "input" },
  ])("refuses $param with a named CalcInputError", ({ fn, param }) => {
    try {
      fn();
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).param).toBe(param);
    }
  });

  it("returns only finite numbers or a CalcInputError over the whole double range (fast-check)", () => {
    const any = fc.oneof(fc.double(), fc.constantFrom(0, -0, Number.MIN_VALUE, Number.MAX_VALUE, -Number.MAX_VALUE, 1e300));
    fc.assert(
      fc.property(any, any, any, any, (a, b, c, d) => {
        for (const fn of [
          () => [wheelGyroscopicMoment({ wheelInertia: a, rotorInertia: Math.abs(b), gearRatio: 1, wheelSpeed: c, spinSpeed: d })],
          () => [rollingWheelGyroscopicMoment({ wheelInertia: a, wheelRadius: b, contactRadius: c, spinSpeed: d })],
          () => [skidLiftSpeed({ robotMass: a, wheelRadius: b, wheelInertia: c, rotorInertia: d }) ?? 0],
          () => {
            const l = wheelNormalLoads({ wheelCount: 1, robotMass: a, wheelInertia: b, wheelRadius: c, contactRadius: 0.07, spinSpeed: d });
            return [l.wheelLoad, l.skidLoad, l.gyroscopicMoment];
          },
        ]) {
          try {
            for (const v of fn()) expect(Number.isFinite(v)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(CalcInputError);
          }
        }
      }),
      { numRuns: 500 },
    );
  });
});
