/**
 * Tipping and drive turn rate at the edges: refusals name the input, its unit and the quantity
 * that would not stay finite; a centre of mass outside the wheels is refused even when nothing
 * lifts; a roll moment too small to lift anything gives no lift rate.
 */
import { describe, expect, it } from "vitest";
import { differentialDriveTurnRate, driveTurnRateLimit, liftTurnRate, rollMomentWhileTurning, weightRestoringMoment } from "../../../calc/weapon/tipping.ts";

const refused = (fields: Record<string, unknown>) => expect.objectContaining({ name: "CalcInputError", ...fields });

describe("rollMomentWhileTurning past the largest double", () => {
  it("refuses a centrifugal moment m·v·ψ̇·h = 1e300 kg × 1e10 m/s × 1 rad/s × 1 m, naming the mass", () => {
    expect(() =>
      rollMomentWhileTurning({ inertia: 1, spinSpeed: 1, spin: "front-up", turnRate: 1, robotMass: 1e300, forwardSpeed: 1e10, comHeight: 1 }),
    ).toThrow(refused({ param: "robotMass", unit: "kg", expected: "small enough for the centrifugal moment to stay finite" }));
  });

  it("refuses a sum that passes the largest double although each part is finite: front-down, J·Ω·ψ̇ = 1e200·1e108 = 1e308 plus m·v·ψ̇·h = 1e154·1e154 = 1e308", () => {
    expect(() =>
      rollMomentWhileTurning({ inertia: 1e200, spinSpeed: 1e108, spin: "front-down", turnRate: 1, robotMass: 1e154, forwardSpeed: 1e154, comHeight: 1 }),
    ).toThrow(refused({ param: "inertia", unit: "kg·m²", expected: "small enough for the roll moment to stay finite" }));
  });
});

describe("weightRestoringMoment at the edges", () => {
  it("names the centre-of-mass offset and its unit when it is not a number", () => {
    expect(() => weightRestoringMoment({ robotMass: 10, trackWidth: 0.3, comOffset: Number.NaN, side: "left" })).toThrow(
      refused({ param: "comOffset", unit: "m" }),
    );
  });

  it("refuses m·g·t/2 past the largest double: 1e308 kg × 9.80665 m/s² × 0.5 m, naming the mass", () => {
    expect(() => weightRestoringMoment({ robotMass: 1e308, trackWidth: 1, side: "left" })).toThrow(
      refused({ param: "robotMass", value: 1e308, unit: "kg", expected: "small enough for the restoring moment to stay finite" }),
    );
  });

  it("names the track width when it is the extreme input: 1e10 kg × 9.80665 × 5e299 m", () => {
    expect(() => weightRestoringMoment({ robotMass: 1e10, trackWidth: 1e300, side: "right" })).toThrow(
      refused({ param: "trackWidth", value: 1e300, unit: "m", expected: "small enough for the restoring moment to stay finite" }),
    );
  });
});

describe("liftTurnRate at the edges", () => {
  it("refuses a centre of mass outside the wheels even when no turn lifts a wheel (weapon stopped, robot standing)", () => {
    const still = { inertia: 0.01, spinSpeed: 0, spin: "front-up", robotMass: 10, trackWidth: 0.3, forwardSpeed: 0, turn: "left" };
    expect(liftTurnRate({ ...still, comOffset: 0 }).liftTurnRate).toBeNull();
    expect(() => liftTurnRate({ ...still, comOffset: 0.2 })).toThrow(refused({ param: "comOffset", value: 0.2, unit: "m" }));
  });

  it("gives no lift rate when the roll moment is so small that the rate passes the largest double (a 5e-324 rad/s spin), but reports that roll moment", () => {
    // m·g·t/2 = 10 × 9.80665 × 0.15 = 14.71 N·m over |−J·Ω| = 5e-324 N·m·s is about 3e324 rad/s: not a double.
    const r = liftTurnRate({ inertia: 1, spinSpeed: Number.MIN_VALUE, spin: "front-up", robotMass: 10, trackWidth: 0.3, turn: "left" });
    expect(r).toEqual({ turn: "left", liftTurnRate: null, side: null, wheel: null, rollMomentPerTurnRate: -Number.MIN_VALUE, restoringMoment: null });
  });
});

describe("differentialDriveTurnRate at the edges", () => {
  it("gives the forward speed of two wheels at the largest double without overflow: (v_R + v_L)/2 = v", () => {
    expect(differentialDriveTurnRate({ leftWheelSpeed: Number.MAX_VALUE, rightWheelSpeed: Number.MAX_VALUE, trackWidth: 1 })).toEqual({
      forwardSpeed: Number.MAX_VALUE,
      turnRate: 0,
    });
  });

  it("refuses a turn rate past the largest double, naming the most extreme wheel speed: (1e308 + 1e300)/1e-10", () => {
    expect(() => differentialDriveTurnRate({ leftWheelSpeed: -1e300, rightWheelSpeed: 1e308, trackWidth: 1e-10 })).toThrow(
      refused({ param: "rightWheelSpeed", value: 1e308, unit: "m/s", expected: "small enough for the turn rate to stay finite" }),
    );
  });
});

describe("driveTurnRateLimit at the edges", () => {
  it("names the forward speed and its unit when it is not a number", () => {
    expect(() => driveTurnRateLimit({ wheelTopSpeed: 3, trackWidth: 0.3, forwardSpeed: Number.NaN })).toThrow(refused({ param: "forwardSpeed", unit: "m/s" }));
  });

  it("says the forward speed must be at most the wheels' top speed either way, in m/s", () => {
    expect(() => driveTurnRateLimit({ wheelTopSpeed: 3, trackWidth: 0.25, forwardSpeed: -3.5 })).toThrow(
      refused({
        param: "forwardSpeed",
        value: -3.5,
        unit: "m/s",
        expected: "at most the wheels' top speed (3 m/s) either way",
        message: "forwardSpeed must be at most the wheels' top speed (3 m/s) either way (got -3.5 m/s)",
      }),
    );
  });

  it("refuses 2·v_max/t past the largest double: 2 × 1e308 m/s / 1 m names the top speed, 2 × 1e10 / 1e-300 names the track", () => {
    expect(() => driveTurnRateLimit({ wheelTopSpeed: 1e308, trackWidth: 1 })).toThrow(
      refused({ param: "wheelTopSpeed", value: 1e308, unit: "m/s", expected: "small enough for the drive turn rate to stay finite" }),
    );
    expect(() => driveTurnRateLimit({ wheelTopSpeed: 1e10, trackWidth: 1e-300 })).toThrow(
      refused({ param: "trackWidth", value: 1e-300, unit: "m", expected: "large enough for the drive turn rate to stay finite" }),
    );
  });
});
