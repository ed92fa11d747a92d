/**
 * The turn check's figures and the sentence it shows, branch by branch: which turn lifts first
 * and which side, when nothing lifts, the tilt check of a vertical axle or a whole-body spinner,
 * and the verdict exactly at its thresholds (a margin of exactly 1 fails; exactly `liftMargin`
 * holds). Hand arithmetic uses g_n = 9.80665 m/s² and the invented demo: J = 0.010125 kg·m² at
 * 8000 rpm, so J·Ω = 0.010125 × 837.758 = 8.48230 N·m·s; m = 13.6 kg, t = 0.28 m, h = 0.045 m.
 */
import { describe, expect, it } from "vitest";
import { DEMO_VERTICAL_SPINNER_TURN, type WeaponTurnInput, weaponTurnCheck } from "../../../calc/weapon/turn-check.ts";
import { expectClose } from "./support.ts";

const DEMO = DEMO_VERTICAL_SPINNER_TURN;
const check = (changes: Partial<WeaponTurnInput>) => weaponTurnCheck({ ...DEMO, ...changes });

describe("weaponTurnCheck: which turn lifts first", () => {
  it("with the centre of mass on the centreline both turns lift at the same rate; the left turn is named, and a front-up weapon turning left lifts the outer (right) wheels", () => {
    const r = check({});
    expect(r.turn!.left.liftTurnRate).toBe(r.turn!.right.liftTurnRate);
    expect(r.turn!.liftTurn).toBe("left");
    expect(r.turn!.gyroscopicEffectTurningLeft).toBe("right-up");
    // 2.3724 rad/s over the drive's 2(3.5 − 1)/0.28 = 17.857 rad/s = 0.133, shown to 2 figures.
    expect(r.reason).toBe("Turning left lifts the outer (right) wheels at 0.13 times the drive's fastest turn: a full turn lifts a wheel.");
    expect(r.turn!.turnRateLifts).toBe(true);
  });

  it("the centre of mass to the right makes the right turn lift first, on the left wheels", () => {
    // Lifting the left side: m·g·(t/2 + y_c) = 13.6 × 9.80665 × (0.14 − 0.05) = 12.0033 N·m, over
    // |−J·Ω + m·v·h| = 8.48230 − 13.6 × 1 × 0.045 = 7.87030 N·m·s: 1.52514 rad/s; 1.52514/17.857 = 0.085.
    const r = check({ comOffset: -0.05 });
    expect(r.turn!.liftTurn).toBe("right");
    expectClose(r.turn!.liftTurnRate!, 12.00334 / 7.8703, 1e-5);
    expect(r.turn!.right.side).toBe("left");
    expect(r.reason).toBe("Turning right lifts the outer (left) wheels at 0.085 times the drive's fastest turn: a full turn lifts a wheel.");
  });

  it("the centre of mass to the left makes the left turn lift first, on the right wheels, and the right turn later", () => {
    // Lifting the right side: the same 12.0033 N·m / 7.87030 = 1.52514 rad/s; the left side needs
    // 13.6 × 9.80665 × 0.19 / 7.87030 = 3.21975 rad/s.
    const r = check({ comOffset: 0.05 });
    expect(r.turn!.liftTurn).toBe("left");
    expectClose(r.turn!.liftTurnRate!, 12.00334 / 7.8703, 1e-5);
    expectClose(r.turn!.right.liftTurnRate!, (13.6 * 9.80665 * 0.19) / 7.8703, 1e-5);
    expect(r.reason).toBe("Turning left lifts the outer (right) wheels at 0.085 times the drive's fastest turn: a full turn lifts a wheel.");
  });

  it("says the turn rate entered does not lift a wheel when it is below the lift rate, while the drive's fastest turn does", () => {
    const r = check({ turnRate: 1 });
    expect(r.turn!.turnRateLifts).toBe(false);
    expect(r.turn!.driveTurnLifts).toBe(true);
  });

  it("gives the bearing force pair of the pitch or roll rate entered: J·Ω·3 rad/s over 50 mm", () => {
    // 8.48230 × 3 = 25.4469 N·m; / 0.05 m = 508.94 N.
    expectClose(check({}).tilt.bearingForce!, 508.938, 1e-5);
  });
});

describe("weaponTurnCheck: nothing lifts", () => {
  it("a vertical axle on a robot standing still: no turn lifts a wheel, no verdict margin, and it says so", () => {
    const r = check({ axle: "vertical", forwardSpeed: 0, tiltRate: 0 });
    expect(r.turn).toMatchObject({
      gyroscopicEffectTurningLeft: null,
      liftTurnRate: null,
      liftTurn: null,
      turnRateLifts: false,
      driveTurnLifts: false,
      margin: null,
    });
    expect(r.turn!.turnRate).toBeGreaterThan(0);
    expect(r.verdict).toBe("holds");
    expect(r.governs).toBeNull();
    expect(r.reason).toBe("No turn and no tilt entered lifts a wheel: the moments either cancel or nothing turns.");
  });

  it("a whole-body spinner with no pitch or roll rate: nothing tips it, in its own words", () => {
    const r = check({ axle: "whole-body", tiltRate: 0 });
    expect(r.verdict).toBe("holds");
    expect(r.reason).toBe("Nothing entered tips the robot: with no pitch or roll rate, the spin makes no moment that could lift a side.");
  });
});

describe("weaponTurnCheck: the verdict at its thresholds (turn)", () => {
  // Standing, track 0.25 m: the lift rate is m·g·t/2/(J·Ω) = 13.6 × 9.80665 × 0.125 / 8.48230 = 1.96543 rad/s,
  // and the drive's fastest turn 2·v_max/0.25 = 8·v_max, exact in binary for any v_max.
  const standing = { trackWidth: 0.25, forwardSpeed: 0, turnRate: 0 };
  const lift = check({ ...standing, wheelTopSpeed: 1 }).turn!.liftTurnRate!;

  it("finds the lift rate by hand", () => {
    expectClose(lift, (13.6 * 9.80665 * 0.125) / 8.4823, 1e-5);
  });

  it("fails when the drive's fastest turn is exactly the lift rate (a margin of exactly 1)", () => {
    const r = check({ ...standing, wheelTopSpeed: lift / 8 });
    expect(r.turn!.driveTurnRate).toBe(lift);
    expect(r.turn!.driveTurnLifts).toBe(true);
    expect(r.turn!.margin).toBe(1);
    expect(r.verdict).toBe("fails");
    expect(r.reason).toBe("Turning left lifts the outer (right) wheels at 1 times the drive's fastest turn: a full turn lifts a wheel.");
  });

  it("fails when the turn rate entered is exactly the lift rate, and says it is the rate entered", () => {
    const r = check({ ...standing, wheelTopSpeed: lift / 16, turnRate: lift });
    expect(r.turn!.turnRateLifts).toBe(true);
    expect(r.turn!.driveTurnLifts).toBe(false);
    expect(r.verdict).toBe("fails");
    expect(r.reason).toBe("Turning left lifts the outer (right) wheels at 1 times the turn rate entered: a full turn lifts a wheel.");
  });

  it("holds at a margin of exactly liftMargin (2), and names the drive when the rate entered equals its fastest turn", () => {
    const r = check({ ...standing, wheelTopSpeed: lift / 16, turnRate: lift / 2, liftMargin: 2 });
    expect(r.turn!.driveTurnRate).toBe(lift / 2);
    expect(r.turn!.margin).toBe(2);
    expect(r.verdict).toBe("holds");
    expect(r.reason).toBe(
      "Turning left lifts the outer (right) wheels at 2 times the drive's fastest turn: the wheels stay down with the margin of 2 or more.",
    );
  });

  it("is marginal below liftMargin and says what can lift a wheel", () => {
    const r = check({ ...standing, wheelTopSpeed: lift / 16, liftMargin: 3 });
    expect(r.verdict).toBe("marginal");
    expect(r.reason).toBe(
      "Turning left lifts the outer (right) wheels at 2 times the drive's fastest turn: below the margin of 3, so a hard turn, a bump or a hit can lift a wheel.",
    );
  });
});

describe("weaponTurnCheck: the tilt check", () => {
  // Whole body: a side lifts at m·g·t/2/(J·Ω) = 13.6 × 9.80665 × 0.14 / 8.48230 = 2.20127 rad/s of pitch.
  const liftTilt = check({ axle: "whole-body" }).tilt.liftTiltRate!;

  it("finds the lift pitch rate by hand", () => {
    expectClose(liftTilt, (13.6 * 9.80665 * 0.14) / 8.4823, 1e-5);
  });

  it("fails a pitch of 3 rad/s on a whole-body spinner: a side lifts at 2.20127/3 = 0.73 of it", () => {
    const r = check({ axle: "whole-body", tiltRate: 3 });
    expect(r.verdict).toBe("fails");
    expect(r.governs).toBe("tilt");
    expect(r.reason).toBe("A pitch at the rate entered rolls the robot; a side lifts at 0.73 times that rate: the pitch rate entered lifts a side.");
  });

  it("holds at a tilt margin of exactly liftMargin (2) and is marginal below it (3)", () => {
    const held = check({ axle: "whole-body", tiltRate: liftTilt / 2, liftMargin: 2 });
    expect(held.tilt.margin).toBe(2);
    expect(held.verdict).toBe("holds");
    expect(held.reason).toBe("A pitch at the rate entered rolls the robot; a side lifts at 2 times that rate: the margin of 2 is kept.");
    const near = check({ axle: "whole-body", tiltRate: liftTilt / 2, liftMargin: 3 });
    expect(near.verdict).toBe("marginal");
    expect(near.reason).toBe("A pitch at the rate entered rolls the robot; a side lifts at 2 times that rate: below the margin of 3.");
  });

  it("judges a vertical axle by its pitch when the pitch margin is the smaller, though a turn would also lift a wheel", () => {
    // Turn: 2(3.5 − 1)/0.28 = 17.857 rad/s, lift from the centrifugal moment only g·t/(2·v·h) = 30.51 rad/s: margin 1.71.
    // Tilt: 2.20127/10 = 0.22.
    const r = check({ axle: "vertical", tiltRate: 10 });
    expect(r.turn!.margin).toBeGreaterThan(1);
    expect(r.governs).toBe("tilt");
    expect(r.verdict).toBe("fails");
    expect(r.reason).toBe("A pitch at the rate entered rolls the robot; a side lifts at 0.22 times that rate: the pitch rate entered lifts a side.");
  });

  it("lets the turn govern when the turn and tilt margins are equal", () => {
    // Vertical axle at 2 m/s with h = 0.1 m: the inner wheels lift at g·t/(2·v·h) = 9.80665 × 0.28 / 0.4 = 6.86466 rad/s,
    // and the drive reaches 2(3.5 − 2)/0.28 = 10.714 rad/s: margin 0.6407. The pitch rate is set to give the same margin.
    const base = { axle: "vertical", forwardSpeed: 2, comHeight: 0.1, turnRate: 0 } as const;
    const probe = check({ ...base, tiltRate: 1 });
    expectClose(probe.turn!.liftTurnRate!, (9.80665 * 0.28) / 0.4, 1e-12);
    const r = check({ ...base, tiltRate: probe.tilt.liftTiltRate! / probe.turn!.margin! });
    expect(r.tilt.margin).toBe(r.turn!.margin);
    expect(r.governs).toBe("turn");
    expect(r.reason).toBe("Turning left lifts the inner (left) wheels at 0.64 times the drive's fastest turn: a full turn lifts a wheel.");
  });
});

describe("weaponTurnCheck: refusals", () => {
  it("refuses a whole-body spinner's centre of mass outside the wheels with the offset as entered (to the right, negative)", () => {
    expect(() => check({ axle: "whole-body", comOffset: -0.2 })).toThrow(
      expect.objectContaining({ name: "CalcInputError", param: "comOffset", value: -0.2, unit: "m" }),
    );
  });
});
