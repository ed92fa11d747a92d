import { describe, expect, it } from "vitest";
import { expectWellDeclared } from "../../support/arbitraries.ts";
import fc from "fast-check";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import {
  angularMomentum,
  AXLE_OPTIONS,
  bearingForcePair,
  gyroscopicMoment,
  gyroscopicReaction,
  HORIZONTAL_SPIN_OPTIONS,
  ROBOT_MOTION_OPTIONS,
  VERTICAL_SPIN_OPTIONS,
} from "../../../calc/weapon/gyroscopic.ts";
import {
  DEFAULT_LIFT_MARGIN,
  DEMO_VERTICAL_SPINNER_TURN,
  WEAPON_TURN_CHOICE_DEFAULTS,
  weaponTurnCheck,
  weaponTurnInputs,
  type WeaponTurnInput,
} from "../../../calc/weapon/turn-check.ts";
import { differentialDriveTurnRate, driveTurnRateLimit, liftTurnRate, rollMomentWhileTurning, weightRestoringMoment } from "../../../calc/weapon/tipping.ts";
import { precessionRate, precessionTime } from "../../../calc/weapon/precession.ts";
import { anyField, anyFinite, defaultsOf, expectClose, expectFiniteOrNamedError, validInputs, expectEachFieldNamed } from "./support.ts";

const rpm = rpmToRadPerSecond;
const KMH = 1000 / 3600;
const DEFAULTS: WeaponTurnInput = { ...defaultsOf(weaponTurnInputs), ...WEAPON_TURN_CHOICE_DEFAULTS };

// ---------------------------------------------------------------------------------------------

describe("gyroscopic moment against published worked examples", () => {
  const CASES = [
    {
      source: "R. S. Khurmi, J. K. Gupta, Theory of Machines, ch. 14, ship-turbine example (a published worked solution)",
      locator: "m = 3500 kg, k = 0.45 m, 3000 rpm, steering on R = 100 m at 36 km/h: 'C = I.ω.ωp = 708.75 × 314.2 × 0.1 = 22 270 N-m'",
      inputs: { inertia: 3500 * 0.45 ** 2, spinSpeed: rpm(3000), turnRate: (36 * KMH) / 100 },
      expected: 22270,
      rtol: 2.5e-4,
      note: "printed to 4 figures from ω rounded to 314.2 rad/s",
    },
    {
      source:
        "Engineering Services Examination (India), mechanical engineering: gyroscopic couple of an aircraft's turbines and propellers (published worked solution)",
      locator: "500 kg, k = 25 cm, 2000 rpm, turning on a 100 m arc at 360 km/h: 'Gyroscopic Couple = 31.25 × 209.43 × 1 = 6544.98 Nm'",
      inputs: { inertia: 500 * 0.25 ** 2, spinSpeed: rpm(2000), turnRate: (360 * KMH) / 100 },
      expected: 6544.98,
      rtol: 1e-6,
      note: "printed to 6 figures",
    },
    {
      source: "R. S. Khurmi, J. K. Gupta, Theory of Machines, Ex. 14.2 (p. 485), as worked in an open textbook-companion notebook",
      locator: "disc 5 kg, Ø 150 mm at 1000 rpm, axle precessing at 60 rpm; the book rounds I = ½·m·r² to 0.014 kg·m² and prints C = 9.2 N·m",
      inputs: { inertia: 0.014, spinSpeed: rpm(1000), turnRate: rpm(60) },
      expected: 9.2,
      rtol: 5.5e-3,
      note: "printed to 2 figures (our 9.21 from the book's own rounded I)",
    },
  ];
  it.each(CASES.map((c) => [`${c.source}: ${c.locator}`, c] as const))("%s", (_, c) => {
    expectClose(gyroscopicMoment(c.inputs), c.expected, c.rtol);
  });

  it("reproduces the bearing reactions of Khurmi & Gupta Ex. 14.2 from the book's couple: R_A = 116.5 N up, R_B = 67.5 N down", () => {
    // Printed: 'Resultant reaction at the bearing A RA1 = 116.5 N upwards', 'at the bearing B RB1 = 67.5 N downwards'
    // (Example 14.2, p. 485, as worked in an open textbook-companion notebook): bearings 100 mm apart, weight 5 × 9.81 N shared equally.
    const pair = bearingForcePair({ moment: 9.2, bearingSpan: 0.1 });
    const weightShare = (5 * 9.81) / 2;
    expectClose(pair + weightShare, 116.5, 4.3e-4); // printed to 0.1 N
    expectClose(pair - weightShare, 67.5, 7.5e-4);
  });

  it("carries the gyroscopic couple of I. E. Irodov, Problems in General Physics 1.289 on the rails as about 1.4 kN", () => {
    // Turbine I = 240 kg·m² at 1500 rpm on a locomotive at 50 km/h round R = 250 m; gauge 1.5 m.
    // A published solution: 'The additional force in this case has the magnitude 1.4kN' (2 figures).
    const moment = gyroscopicMoment({ inertia: 240, spinSpeed: rpm(1500), turnRate: (50 * KMH) / 250 });
    expectClose(bearingForcePair({ moment, bearingSpan: 1.5 }), 1400, 0.036);
  });

  it("gives H = J·Ω and M = H·q: the moment is the angular momentum turned at rate q", () => {
    const H = angularMomentum({ inertia: 0.01, spinSpeed: 500 });
    expect(H).toBe(5);
    expect(gyroscopicMoment({ inertia: 0.01, spinSpeed: 500, turnRate: 5 })).toBeCloseTo(H * 5, 12);
  });
});

describe("precession rate against a published worked example", () => {
  it("Khurmi & Gupta, Theory of Machines, Ex. 14.1 (p. 484): ω_P = 16.7 rad/s", () => {
    // 'I = m.r^2/2 = 5(0.15)^2/2 = 0.056 kg-m^2', 'C = m.g.l = 5 × 9.81 × 0.6 = 29.43 N-m', 'ωP = 29.43/1.76 = 16.7 rad/s'
    // (a published worked solution and an open textbook-companion notebook print the same 16.7 rad/s). Disc at 300 rpm.
    expectClose(precessionRate({ moment: 5 * 9.81 * 0.6, inertia: 0.056, spinSpeed: rpm(300) }), 16.7, 3e-3);
  });

  it("takes θ/Ω_p to precess through θ (round trip)", () => {
    const rate = precessionRate({ moment: 30, inertia: 0.05, spinSpeed: rpm(2000) });
    const t = precessionTime({ angle: 0.5, moment: 30, inertia: 0.05, spinSpeed: rpm(2000) });
    expectClose(t * rate, 0.5, 1e-14);
  });

  it("regression pin (our own digits, not a published value): 30 N·m on 0.05 kg·m² at 2000 rpm precesses at 2.864788976 rad/s", () => {
    expectClose(precessionRate({ moment: 30, inertia: 0.05, spinSpeed: rpm(2000) }), 2.864788976, 1e-9);
  });
});

// ---------------------------------------------------------------------------------------------

describe("direction of the gyroscopic moment on the robot", () => {
  // Independent vector algebra: x forward, y left, z up. The rotor needs M = ω × H; the robot feels H × ω.
  const H_AXIS: Record<string, [number, number, number]> = {
    "front-up": [0, -1, 0], // the front edge (at +x) moving up (+z) means ω·(−ŷ) × x̂ = +ẑ
    "front-down": [0, 1, 0],
    counterclockwise: [0, 0, 1],
    clockwise: [0, 0, -1],
  };
  const W_AXIS: Record<string, [number, number, number]> = {
    "yaw-left": [0, 0, 1],
    "yaw-right": [0, 0, -1],
    "left-up": [1, 0, 0],
    "right-up": [-1, 0, 0],
    "nose-down": [0, 1, 0],
    "nose-up": [0, -1, 0],
  };
  const cross = (a: number[], b: number[]) => [a[1]! * b[2]! - a[2]! * b[1]!, a[2]! * b[0]! - a[0]! * b[2]!, a[0]! * b[1]! - a[1]! * b[0]!];
  const word = (v: number[]) => Object.entries(W_AXIS).find(([, axis]) => axis.every((c, i) => c === v[i]))?.[0] ?? null;

  const combos = AXLE_OPTIONS.flatMap((axle) =>
    (axle.value === "horizontal" ? HORIZONTAL_SPIN_OPTIONS : VERTICAL_SPIN_OPTIONS).flatMap((spin) =>
      ROBOT_MOTION_OPTIONS.map((motion) => [axle.value, spin.value, motion.value] as const),
    ),
  );
  it.each(combos)("%s axle, %s, robot %s: matches H × ω worked out by hand", (axle, spin, motion) => {
    const r = gyroscopicReaction({ axle, spin, motion, inertia: 0.01, spinSpeed: 500, rate: 2 });
    const expected = word(cross(H_AXIS[spin]!, W_AXIS[motion]!));
    expect(r.effect).toBe(expected);
    expect(r.moment).toBe(expected === null ? 0 : 10);
  });

  it("a weapon whose front edge moves up lifts the OUTER wheels whichever way the robot turns", () => {
    expect(gyroscopicReaction({ axle: "horizontal", spin: "front-up", motion: "yaw-left", inertia: 1, spinSpeed: 1, rate: 1 }).effect).toBe("right-up");
    expect(gyroscopicReaction({ axle: "horizontal", spin: "front-up", motion: "yaw-right", inertia: 1, spinSpeed: 1, rate: 1 }).effect).toBe("left-up");
  });

  it("a weapon whose front edge moves down lifts the INNER wheels, as the rolling road wheels of a turning vehicle do (Khurmi & Gupta ch. 14, from memory)", () => {
    // A road wheel rolling forwards has its front edge moving down; turning, its gyroscopic couple loads the
    // outer wheels and unloads the inner ones, adding to the centrifugal couple (Khurmi & Gupta, four-wheel vehicle).
    expect(gyroscopicReaction({ axle: "horizontal", spin: "front-down", motion: "yaw-left", inertia: 1, spinSpeed: 1, rate: 1 }).effect).toBe("left-up");
    expect(gyroscopicReaction({ axle: "horizontal", spin: "front-down", motion: "yaw-right", inertia: 1, spinSpeed: 1, rate: 1 }).effect).toBe("right-up");
  });

  it("turning a vertical axle about itself makes no moment", () => {
    expect(gyroscopicReaction({ axle: "vertical", spin: "clockwise", motion: "yaw-right", inertia: 1, spinSpeed: 100, rate: 5 })).toEqual({
      moment: 0,
      effect: null,
    });
  });

  it("gives the roll moment of rollMomentWhileTurning the same sign as the direction word", () => {
    const m = rollMomentWhileTurning({ inertia: 0.01, spinSpeed: 500, spin: "front-up", turnRate: 5, robotMass: 10 });
    expect(m.gyroscopic).toBe(-25); // negative: lifts the right side, as "right-up" says
    expect(m.centrifugal).toBe(0);
  });
});

// ---------------------------------------------------------------------------------------------

describe("tipping while turning", () => {
  const base = { inertia: 0.01215, spinSpeed: rpm(8000), spin: "front-up", robotMass: 13.6, trackWidth: 0.3 } as const;

  /** Wheel loads by static equilibrium (a second method): vertical forces and roll moments about the ground line under the centre of mass. */
  function wheelLoads(rollMoment: number, m: number, t: number, yc: number): { left: number; right: number } {
    const left = (m * STANDARD_GRAVITY * (t / 2 + yc)) / t - rollMoment / t;
    return { left, right: m * STANDARD_GRAVITY - left };
  }

  it("reduces to ψ̇ = m·g·t/(2·J·Ω) with no forward speed and the centre of mass on the centreline (the textbook tipping criterion)", () => {
    const r = liftTurnRate({ ...base, turn: "left" });
    expectClose(r.liftTurnRate!, (13.6 * STANDARD_GRAVITY * 0.3) / (2 * 0.01215 * rpm(8000)), 1e-14);
    expect(r.side).toBe("right");
    expect(r.wheel).toBe("outer");
  });

  it("regression pin (our own digits): 0.01215 kg·m² at 8000 rpm on a 13.6 kg robot with a 0.30 m track lifts at 1.965422666 rad/s", () => {
    expectClose(liftTurnRate({ ...base, turn: "right" }).liftTurnRate!, 1.965422666, 1e-9);
  });

  it.each([
    ["left", "front-up", 1.2, 0.05, 0.02],
    ["right", "front-up", 1.2, 0.05, -0.03],
    ["left", "front-down", 2, 0.08, 0.04],
    ["right", "front-down", -1, 0.06, 0.01],
    ["left", "front-up", 3, 0.3, 0],
  ] as const)(
    "turning %s (%s, v = %s m/s, h = %s m, y_c = %s m): at the lift rate the lifting side carries no load (equilibrium, a second method)",
    (turn, spin, v, h, yc) => {
      const r = liftTurnRate({ ...base, spin, forwardSpeed: v, comHeight: h, comOffset: yc, turn });
      const rate = turn === "left" ? r.liftTurnRate! : -r.liftTurnRate!;
      const roll = rollMomentWhileTurning({ ...base, spin, turnRate: rate, forwardSpeed: v, comHeight: h }).total;
      const loads = wheelLoads(roll, 13.6, 0.3, yc);
      expect(Math.abs(loads[r.side!])).toBeLessThan(1e-9 * 13.6 * STANDARD_GRAVITY);
      expect(loads[r.side === "left" ? "right" : "left"]).toBeCloseTo(13.6 * STANDARD_GRAVITY, 9);
      expectClose(Math.abs(roll), r.restoringMoment!, 1e-12);
    },
  );

  it("with the weapon stopped, lifts the inner wheels at the quasi-static rollover threshold a_y/g = t/(2h) (Gillespie ch. 9)", () => {
    const r = liftTurnRate({ ...base, spinSpeed: 0, forwardSpeed: 2, comHeight: 0.05, turn: "left" });
    expect(r.wheel).toBe("inner");
    expectClose((r.liftTurnRate! * 2) / STANDARD_GRAVITY, 0.3 / (2 * 0.05), 1e-14);
  });

  it("makes a front-up weapon and a forward turn oppose each other, and a front-down weapon add to it", () => {
    const still = liftTurnRate({ ...base, turn: "left" }).liftTurnRate!;
    const upMoving = liftTurnRate({ ...base, forwardSpeed: 2, comHeight: 0.05, turn: "left" }).liftTurnRate!;
    const downMoving = liftTurnRate({ ...base, spin: "front-down", forwardSpeed: 2, comHeight: 0.05, turn: "left" }).liftTurnRate!;
    expect(upMoving).toBeGreaterThan(still);
    expect(downMoving).toBeLessThan(still);
  });

  it("reports no lift when the weapon's and the turn's moments cancel exactly", () => {
    // J·Ω = m·v·h: 0.5 × 20 = 10 × 20 × 0.05.
    const r = liftTurnRate({ inertia: 0.5, spinSpeed: 20, spin: "front-up", robotMass: 10, trackWidth: 0.3, forwardSpeed: 20, comHeight: 0.05, turn: "left" });
    expect(r).toMatchObject({ liftTurnRate: null, side: null, wheel: null });
  });

  it("makes the heavier side harder to lift: y_c to the left raises the restoring moment for the left side", () => {
    const centred = weightRestoringMoment({ robotMass: 10, trackWidth: 0.3, side: "left" });
    expectClose(weightRestoringMoment({ robotMass: 10, trackWidth: 0.3, comOffset: 0.05, side: "left" }), (centred * 0.2) / 0.15, 1e-14);
    expectClose(weightRestoringMoment({ robotMass: 10, trackWidth: 0.3, comOffset: 0.05, side: "right" }), (centred * 0.1) / 0.15, 1e-14);
  });

  it("refuses a centre of mass outside the wheels, naming comOffset", () => {
    expect(() => weightRestoringMoment({ robotMass: 10, trackWidth: 0.3, comOffset: 0.15, side: "left" })).toThrow(
      expect.objectContaining({ name: "CalcInputError", param: "comOffset" }),
    );
  });
});

describe("differential-drive turn rate", () => {
  it("Siegwart, Nourbakhsh & Scaramuzza, Introduction to Autonomous Mobile Robots (2nd ed.), differential-drive kinematics ω = (v_r − v_l)/L, worked by hand: wheels at +0.381π and −0.381π m/s on a 0.762 m track turn at −π rad/s in place", () => {
    const r = differentialDriveTurnRate({ leftWheelSpeed: 0.381 * Math.PI, rightWheelSpeed: -0.381 * Math.PI, trackWidth: 0.762 });
    expectClose(r.turnRate, -Math.PI, 1e-12);
    expect(r.forwardSpeed).toBe(0);
  });

  it("Siegwart et al., differential-drive kinematics v = (v_r + v_l)/2, worked by hand: wheels at 3 m/s and 3 m/s go straight at 3 m/s", () => {
    expect(differentialDriveTurnRate({ leftWheelSpeed: 3, rightWheelSpeed: 3, trackWidth: 0.762 })).toEqual({ forwardSpeed: 3, turnRate: 0 });
  });

  it("Siegwart et al., differential-drive kinematics inverted, worked by hand: a turn of π rad/s in place needs ±0.381π m/s on a 0.762 m track", () => {
    expectClose(driveTurnRateLimit({ wheelTopSpeed: 0.381 * Math.PI, trackWidth: 0.762 }), Math.PI, 1e-12);
  });

  it("agrees with the forward kinematics at speed: the faster wheel at v_max, the slower at 2v − v_max", () => {
    const limit = driveTurnRateLimit({ wheelTopSpeed: 3, trackWidth: 0.25, forwardSpeed: 1 });
    const direct = differentialDriveTurnRate({ leftWheelSpeed: 2 * 1 - 3, rightWheelSpeed: 3, trackWidth: 0.25 });
    expectClose(limit, direct.turnRate, 1e-14);
    expect(direct.forwardSpeed).toBe(1);
  });

  it("refuses a forward speed above the wheels' top speed, naming forwardSpeed", () => {
    expect(() => driveTurnRateLimit({ wheelTopSpeed: 3, trackWidth: 0.25, forwardSpeed: -3.5 })).toThrow(
      expect.objectContaining({ name: "CalcInputError", param: "forwardSpeed" }),
    );
  });
});

// ---------------------------------------------------------------------------------------------

describe("weaponTurnCheck", () => {
  it("declares a unique URL key, a label and a default inside the range for every field", () => {
    expectWellDeclared(weaponTurnInputs);
  });

  it("uses the invented demo as its defaults", () => {
    expect(DEMO_VERTICAL_SPINNER_TURN).toEqual(DEFAULTS);
  });

  it("fails the invented demo: the outer wheels lift at 0.13 of the drive's fastest turn", () => {
    const r = weaponTurnCheck(DEMO_VERTICAL_SPINNER_TURN);
    expect(r.verdict).toBe("fails");
    expect(r.governs).toBe("turn");
    expect(r.turn!.left.wheel).toBe("outer");
    expect(r.turn!.driveTurnLifts).toBe(true);
    expect(r.reason).toMatch(/outer/);
    // Regression pins (our own digits).
    expectClose(r.angularMomentum, 8.482300165, 1e-9);
    expectClose(r.turn!.liftTurnRate!, 2.372445931, 1e-9);
    expectClose(r.turn!.driveTurnRate, 2.5 / 0.14, 1e-12);
    expectClose(r.turn!.margin!, 0.1328569721, 1e-9);
  });

  it("gives the gyroscopic moment J·Ω·ψ̇ at the turn rate entered, and its force pair over the bearing span", () => {
    const r = weaponTurnCheck(DEFAULTS);
    expectClose(r.turn!.gyroscopicMoment, 0.010125 * rpm(8000) * 2 * Math.PI, 1e-14);
    expectClose(r.turn!.bearingForce, r.turn!.gyroscopicMoment / 0.05, 1e-14);
  });

  it("holds when the drive cannot reach the lift rate with the margin, is marginal inside it, and fails at or past it", () => {
    const at = (wheelTopSpeed: number) => weaponTurnCheck({ ...DEFAULTS, forwardSpeed: 0, turnRate: 0, wheelTopSpeed });
    const lift = at(1).turn!.liftTurnRate!;
    const speedFor = (rate: number) => (rate * 0.28) / 2;
    expect(at(speedFor(lift / 2)).verdict).toBe("holds");
    expect(at(speedFor(lift / DEFAULT_LIFT_MARGIN) * 0.999).verdict).toBe("holds");
    expect(at(speedFor(lift / DEFAULT_LIFT_MARGIN) * 1.001).verdict).toBe("marginal");
    expect(at(speedFor(lift) * 0.999).verdict).toBe("marginal");
    expect(at(speedFor(lift) * 1.001).verdict).toBe("fails");
  });

  it("judges the turn rate entered when it is faster than the drive's", () => {
    const r = weaponTurnCheck({ ...DEFAULTS, forwardSpeed: 0, wheelTopSpeed: 0.01, turnRate: 10 });
    expect(r.verdict).toBe("fails");
    expect(r.turn!.turnRateLifts).toBe(true);
    expect(r.turn!.driveTurnLifts).toBe(false);
    expect(r.reason).toMatch(/turn rate entered/);
  });

  it("gives a vertical axle no gyroscopic moment in a turn, only the centrifugal one, and judges the pitch rate instead", () => {
    const r = weaponTurnCheck({ ...DEFAULTS, axle: "vertical", tiltRate: 10 });
    expect(r.turn!.gyroscopicMoment).toBe(0);
    expect(r.turn!.left.wheel === null || r.turn!.left.wheel === "inner").toBe(true);
    expectClose(r.tilt.liftTiltRate!, (13.6 * STANDARD_GRAVITY * 0.14) / (0.010125 * rpm(8000)), 1e-14);
    expect(r.governs).toBe("tilt");
    expect(r.verdict).toBe("fails");
    expect(r.tilt.whenNoseRises).toBe("left-up");
  });

  it("skips the turn for a whole-body spinner and reports its precession", () => {
    const r = weaponTurnCheck({ ...DEFAULTS, axle: "whole-body", rotorInertia: 0.05, weaponSpeed: rpm(2000), tiltingMoment: 30, tiltRate: 0 });
    expect(r.turn).toBeNull();
    expect(r.tilt.bearingForce).toBeNull();
    expectClose(r.precession.rate, 2.864788976, 1e-9);
    expectClose(r.precession.time!, Math.PI / 12 / r.precession.rate, 1e-14);
    expect(r.verdict).toBe("holds");
    expect(r.governs).toBeNull();
  });

  it("reports no precession time when there is no tilting moment", () => {
    expect(weaponTurnCheck({ ...DEFAULTS, tiltingMoment: 0 }).precession).toMatchObject({ rate: 0, time: null });
  });

  it("names the choice that is not in its list", () => {
    expect(() => weaponTurnCheck({ ...DEFAULTS, axle: "diagonal" })).toThrow(expect.objectContaining({ name: "CalcInputError", param: "axle" }));
    expect(() => weaponTurnCheck({ ...DEFAULTS, horizontalSpin: "sideways" })).toThrow(expect.objectContaining({ param: "horizontalSpin" }));
    expect(() => weaponTurnCheck({ ...DEFAULTS, axle: "vertical", verticalSpin: "front-up" })).toThrow(expect.objectContaining({ param: "verticalSpin" }));
  });

  it("refuses a forward speed above the wheels' top speed and a centre of mass outside the wheels, by name", () => {
    expect(() => weaponTurnCheck({ ...DEFAULTS, forwardSpeed: 4 })).toThrow(expect.objectContaining({ param: "forwardSpeed" }));
    expect(() => weaponTurnCheck({ ...DEFAULTS, comOffset: -0.14 })).toThrow(expect.objectContaining({ param: "comOffset" }));
  });

  it("refuses null or undefined in place of the input or of a field with a named CalcInputError", () => {
    expect(() => weaponTurnCheck(null as unknown as WeaponTurnInput)).toThrow(expect.objectContaining({ name: "CalcInputError", param: "input" }));
    expect(() => weaponTurnCheck({ ...DEFAULTS, robotMass: undefined } as unknown as WeaponTurnInput)).toThrow(expect.objectContaining({ param: "robotMass" }));
    expect(() => weaponTurnCheck({ ...DEFAULTS, trackWidth: null } as unknown as WeaponTurnInput)).toThrow(expect.objectContaining({ param: "trackWidth" }));
  });

  it("says what it expected and what it got", () => {
    try {
      weaponTurnCheck({ ...DEFAULTS, robotMass: 0 });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect((error as CalcInputError).message).toBe("robotMass must be at least 0.05 kg and at most 1000 kg (got 0 kg)");
    }
  });
});

// ---------------------------------------------------------------------------------------------

describe("fuzz: never a non-finite number, every bad input a named CalcInputError", () => {
  const RUNS = { numRuns: 400 };

  it("gives finite numbers for every valid input of the turn check, with every choice", () => {
    fc.assert(
      fc.property(
        validInputs(weaponTurnInputs),
        fc.constantFrom(...AXLE_OPTIONS.map((o) => o.value)),
        fc.constantFrom(...HORIZONTAL_SPIN_OPTIONS.map((o) => o.value)),
        fc.constantFrom(...VERTICAL_SPIN_OPTIONS.map((o) => o.value)),
        (numbers, axle, horizontalSpin, verticalSpin) => {
          const input = { ...numbers, axle, horizontalSpin, verticalSpin };
          // Cross-field rules: the centre of mass between the wheels, the forward speed within the drive's.
          fc.pre(Math.abs(input.comOffset) < input.trackWidth / 2 && Math.abs(input.forwardSpeed) <= input.wheelTopSpeed);
          expectFiniteOrNamedError(() => weaponTurnCheck(input), []);
        },
      ),
      RUNS,
    );
  });

  it("names the field for every out-of-range, non-finite, null or missing value of the turn check", () => {
    expectEachFieldNamed(weaponTurnInputs, DEFAULTS, weaponTurnCheck, RUNS);
  });

  it("gives finite numbers or a named CalcInputError for any value of the turn check's fields", () => {
    const names = Object.keys(weaponTurnInputs);
    fc.assert(
      fc.property(fc.dictionary(fc.constantFrom(...names), anyField), fc.constantFrom(...AXLE_OPTIONS.map((o) => o.value), "x", null), (fields, axle) => {
        expectFiniteOrNamedError(() => weaponTurnCheck({ ...DEFAULTS, ...(fields as object), axle } as WeaponTurnInput), [...names, "axle"]);
      }),
      RUNS,
    );
  });

  const PRIMITIVES: [string, (x: Record<string, unknown>) => unknown, string[], Record<string, fc.Arbitrary<unknown>>][] = [
    ["angularMomentum", (x) => angularMomentum(x as never), ["inertia", "spinSpeed"], {}],
    ["gyroscopicMoment", (x) => gyroscopicMoment(x as never), ["inertia", "spinSpeed", "turnRate"], {}],
    ["bearingForcePair", (x) => bearingForcePair(x as never), ["moment", "bearingSpan"], {}],
    [
      "gyroscopicReaction",
      (x) => gyroscopicReaction(x as never),
      ["inertia", "spinSpeed", "rate"],
      {
        axle: fc.constantFrom("horizontal", "vertical", "whole-body", "up"),
        spin: fc.constantFrom("front-up", "front-down", "clockwise", "counterclockwise"),
        motion: fc.constantFrom("yaw-left", "nose-up", "left-up", "spin"),
      },
    ],
    [
      "rollMomentWhileTurning",
      (x) => rollMomentWhileTurning(x as never),
      ["inertia", "spinSpeed", "turnRate", "robotMass", "forwardSpeed", "comHeight"],
      { spin: fc.constantFrom("front-up", "front-down", "clockwise") },
    ],
    [
      "weightRestoringMoment",
      (x) => weightRestoringMoment(x as never),
      ["robotMass", "trackWidth", "comOffset"],
      { side: fc.constantFrom("left", "right", "middle") },
    ],
    [
      "liftTurnRate",
      (x) => liftTurnRate(x as never),
      ["inertia", "spinSpeed", "robotMass", "trackWidth", "comHeight", "comOffset", "forwardSpeed"],
      { spin: fc.constantFrom("front-up", "front-down"), turn: fc.constantFrom("left", "right", "around") },
    ],
    ["differentialDriveTurnRate", (x) => differentialDriveTurnRate(x as never), ["leftWheelSpeed", "rightWheelSpeed", "trackWidth"], {}],
    ["driveTurnRateLimit", (x) => driveTurnRateLimit(x as never), ["wheelTopSpeed", "trackWidth", "forwardSpeed"], {}],
    ["precessionRate", (x) => precessionRate(x as never), ["moment", "inertia", "spinSpeed"], {}],
    ["precessionTime", (x) => precessionTime(x as never), ["angle", "moment", "inertia", "spinSpeed"], {}],
  ];
  it.each(PRIMITIVES.map((p) => [p[0], p] as const))("%s: finite over the whole double range, or a named CalcInputError", (_, [, fn, numeric, choices]) => {
    const choiceNames = Object.keys(choices);
    fc.assert(
      fc.property(fc.record(Object.fromEntries(numeric.map((k) => [k, anyFinite]))), fc.record(choices), (numbers, picked) => {
        expectFiniteOrNamedError(() => fn({ ...numbers, ...picked }), [...numeric, ...choiceNames, "spin", "side", "turn"]);
      }),
      RUNS,
    );
    fc.assert(
      fc.property(fc.record(Object.fromEntries(numeric.map((k) => [k, anyField]))), fc.record(choices), (numbers, picked) => {
        expectFiniteOrNamedError(() => fn({ ...numbers, ...picked }), [...numeric, ...choiceNames, "spin", "side", "turn"]);
      }),
      RUNS,
    );
    for (const nothing of [null, undefined]) {
      expect(() => fn(nothing as never)).toThrow(expect.objectContaining({ name: "CalcInputError", param: "input" }));
    }
  });
});
