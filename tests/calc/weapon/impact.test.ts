import { describe, expect, it } from "vitest";
import { expectWellDeclared } from "../../support/arbitraries.ts";
import fc from "fast-check";
import { biteDepth } from "../../../calc/drivetrain/figures.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import {
  DEMO_HIT,
  effectiveTipMass,
  halfSinePeakForce,
  impactForceEstimate,
  rotorImpact,
  weaponHit,
  weaponHitInputs,
  type WeaponHitInput,
} from "../../../calc/weapon/impact.ts";
import { anyField, anyFinite, defaultsOf, expectClose, expectFiniteOrNamedError, validInputs, expectEachFieldNamed } from "./support.ts";

const rpm = rpmToRadPerSecond;

describe("impact with restitution against published worked examples", () => {
  // Direct central impact is the limit of a rotor of inertia m1·r² at Ω = v1/r: the tip is then a plain mass m1.
  const cars = () => rotorImpact({ inertia: 20000, spinSpeed: 0.5, tipRadius: 1, targetMass: 35000, restitution: 0.65 });
  // A rod of 8 kg, 1.2 m, hinged at one end (I = mL²/3 = 3.84 kg·m²), at rest; a 2 kg sphere moving at 5 m/s toward its lower end.
  const rod = () => rotorImpact({ inertia: (8 * 1.2 ** 2) / 3, spinSpeed: 0, tipRadius: 1.2, targetMass: 2, targetVelocity: -5, restitution: 0.8 });
  // A 10 lb, 3 ft rod hung from a pin (I = mL²/3 in slug·ft², g = 32.2 ft/s²); a 2 lb ball at 30 ft/s strikes its centre (1.5 ft).
  const hung = () =>
    rotorImpact({ inertia: ((10 / 32.2) * 3 ** 2) / 3, spinSpeed: 0, tipRadius: 1.5, targetMass: 2 / 32.2, targetVelocity: -30, restitution: 0.4 });
  const CASES = [
    {
      source: "Beer & Johnston, Vector Mechanics for Engineers: Dynamics, Sample Problem 13.13",
      locator: "20 Mg car at 0.5 m/s strikes a 35 Mg car at rest, which leaves at 0.3 m/s with e = 0.65: the first car ends at 'v′A = −0.025 m/s'",
      actual: () => cars().spinSpeedAfter, // the tip speed Ω′·r, with r = 1 m
      expected: -0.025,
      rtol: 2e-2,
      note: "printed to 2 figures",
    },
    {
      source: "Beer & Johnston, Vector Mechanics for Engineers: Dynamics, Sample Problem 13.13",
      locator: "the struck car leaves at 0.3 m/s for e = 0.65 (the problem finds e from it)",
      actual: () => cars().targetVelocityAfter,
      expected: 0.3,
      rtol: 1e-12,
      note: "exact decimals",
    },
    {
      source: "Beer & Johnston-style sample problem, sphere striking a hinged rod (a published worked solution)",
      locator: "rod 8 kg, 1.2 m; sphere 2 kg at 5 m/s; e = 0.80: 'ω′ = 3.21 rad/s'",
      actual: () => -rod().spinSpeedAfter,
      expected: 3.21,
      rtol: 1.6e-3,
      note: "printed to 3 figures; negative in our frame: the rod swings the way the sphere was going",
    },
    {
      source: "Beer & Johnston-style sample problem, sphere striking a hinged rod",
      locator: "the sphere rebounds: 'v_s′ = −0.143 m/s' (toward where it came from)",
      actual: () => rod().targetVelocityAfter,
      expected: 0.143,
      rtol: 3.5e-3,
      note: "printed to 3 figures; positive in our frame: moving away from the rod",
    },
    {
      source: "Hibbeler, Engineering Mechanics: Dynamics, eccentric-impact example (as reproduced in university course notes)",
      locator: "10 lb rod, 3 ft, pinned; 2 lb ball at 30 ft/s hits its centre; e = 0.4: 'ω2 = 3.65 rad/sec'",
      actual: () => -hung().spinSpeedAfter,
      expected: 3.65,
      rtol: 1.4e-3,
      note: "printed to 3 figures (g = 32.2 ft/s², slug·ft units)",
    },
    {
      source: "Hibbeler, Engineering Mechanics: Dynamics, eccentric-impact example",
      locator: "the ball rebounds: '(vB)2 = −6.52 ft/s'",
      actual: () => hung().targetVelocityAfter,
      expected: 6.52,
      rtol: 7.7e-4,
      note: "printed to 3 figures",
    },
  ];
  it.each(CASES.map((c) => [`${c.source}: ${c.locator}`, c] as const))("%s", (_, c) => {
    expectClose(c.actual(), c.expected, c.rtol);
  });

  it("loses ½·m1·m2/(m1 + m2)·(1 − e²)·(v1 − v2)² in a direct impact (the UK M2 textbook relation 2(m1+m2)E = m1m2(u1−u2)²(1−e²)), equal to the drop in kinetic energy", () => {
    const r = rotorImpact({ inertia: 20000, spinSpeed: 0.5, tipRadius: 1, targetMass: 35000, restitution: 0.65 });
    const expected = 0.5 * ((20000 * 35000) / 55000) * (1 - 0.65 ** 2) * 0.5 ** 2;
    expectClose(r.energyLost, expected, 1e-12);
    expectClose(r.energyLost, r.rotorEnergyDrop - r.energyToTarget, 1e-9);
    // Not printed in the sample problem: ΔE = 918.75 J (our arithmetic).
    expectClose(r.energyLost, 918.75, 1e-12);
  });
});

describe("limits of the restitution model", () => {
  const base = { inertia: 0.05, spinSpeed: 500, tipRadius: 0.1, targetMass: 13.6 } as const;

  it("e = 1: no energy is lost; the rotor's loss is exactly the target's gain", () => {
    const r = rotorImpact({ ...base, restitution: 1 });
    expect(r.energyLost).toBe(0);
    expectClose(r.rotorEnergyDrop, r.energyToTarget, 1e-12);
    // The tip and target part as fast as they met.
    expectClose(r.targetVelocityAfter - r.spinSpeedAfter * 0.1, 50, 1e-12);
  });

  it("e = 0: fully plastic, tip and target move on together and the whole compression energy is lost", () => {
    const r = rotorImpact({ ...base, restitution: 0 });
    expectClose(r.spinSpeedAfter * 0.1, r.targetVelocityAfter, 1e-12);
    expectClose(r.energyLost, r.compressionEnergy, 1e-15);
    expectClose(r.energyLost, r.rotorEnergyDrop - r.energyToTarget, 1e-12);
  });

  it("doubles the impulse from e = 0 to e = 1", () => {
    expectClose(rotorImpact({ ...base, restitution: 1 }).impulse, 2 * rotorImpact({ ...base, restitution: 0 }).impulse, 1e-15);
  });

  it("with your robot free: its momentum balances the target's, and the energy balances (rotor drop = target + recoil + lost)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (e, M) => {
        const r = rotorImpact({ ...base, restitution: e, selfMass: M });
        expect(Math.abs(M * r.selfVelocityAfter + 13.6 * r.targetVelocityAfter)).toBeLessThan(1e-9 * r.impulse);
        expectClose(r.rotorEnergyDrop, r.energyToTarget + r.energyToSelf + r.energyLost, 1e-9);
      }),
      { numRuns: 200 },
    );
  });

  it("tends to the held axle as your robot grows heavy, and a free robot takes less impulse", () => {
    const held = rotorImpact({ ...base, restitution: 0.2 });
    expectClose(rotorImpact({ ...base, restitution: 0.2, selfMass: 1e9 }).impulse, held.impulse, 1e-8);
    expect(rotorImpact({ ...base, restitution: 0.2, selfMass: 13.6 }).impulse).toBeLessThan(held.impulse);
    expect(effectiveTipMass({ inertia: 0.05, tipRadius: 0.1 })).toBe(5);
    expectClose(effectiveTipMass({ inertia: 0.05, tipRadius: 0.1, selfMass: 5 }), 2.5, 1e-15);
  });

  it("regression pins (our own digits, not published): I = 0.05 kg·m², r = 0.10 m, 500 rad/s onto 13.6 kg with e = 0.2", () => {
    const r = rotorImpact({ ...base, restitution: 0.2 });
    expectClose(r.reducedMass, 3.655913978, 1e-9);
    expectClose(r.impulse, 219.3548387, 1e-9);
    expectClose(r.spinSpeedAfter, 61.29032258, 1e-9);
    expectClose(r.targetVelocityAfter, 16.12903226, 1e-9);
    expectClose(r.energyLost, 4387.096774, 1e-9);
  });

  it("refuses a target that the tip never reaches, naming targetVelocity", () => {
    expect(() => rotorImpact({ ...base, restitution: 0.5, targetVelocity: 60 })).toThrow(
      expect.objectContaining({ name: "CalcInputError", param: "targetVelocity" }),
    );
  });
});

describe("the hit simulated as a linear spring contact (a second method)", () => {
  /**
   * RK4 on the rotor angle, your robot and the target, coupled by a contact force k·δ while the
   * crush δ = (robot + r·θ) − target is positive. With a linear spring the contact is elastic,
   * so the closed form with e = 1 must come out; the peak force must be 2E/s and the time to
   * the deepest crush π·s/(2·v_a).
   */
  function simulate(J: number, omega: number, r: number, m: number, M: number, k: number) {
    let s = [0, omega, 0, 0, 0, 0]; // θ, ω, x_self, v_self, x_target, v_target
    const deriv = (y: number[]) => {
      const crush = y[2]! + r * y[0]! - y[4]!;
      const F = crush > 0 ? k * crush : 0;
      return [y[1]!, (-F * r) / J, y[3]!, -F / M, y[5]!, F / m];
    };
    const dt = 2e-8;
    let t = 0;
    let peakForce = 0;
    let peakCrush = 0;
    let timeAtPeak = 0;
    let impulse = 0;
    let touched = false;
    for (let i = 0; i < 2e6; i++) {
      const k1 = deriv(s);
      const k2 = deriv(s.map((v, j) => v + (dt / 2) * k1[j]!));
      const k3 = deriv(s.map((v, j) => v + (dt / 2) * k2[j]!));
      const k4 = deriv(s.map((v, j) => v + dt * k3[j]!));
      s = s.map((v, j) => v + (dt / 6) * (k1[j]! + 2 * k2[j]! + 2 * k3[j]! + k4[j]!));
      t += dt;
      const crush = s[2]! + r * s[0]! - s[4]!;
      if (crush > 0) {
        touched = true;
        impulse += k * crush * dt;
        if (crush > peakCrush) {
          peakCrush = crush;
          peakForce = k * crush;
          timeAtPeak = t;
        }
      } else if (touched) break;
    }
    return { omegaAfter: s[1]!, selfVelocity: s[3]!, targetVelocity: s[5]!, peakForce, peakCrush, timeAtPeak, impulse };
  }

  it("reproduces the e = 1 impulse, speeds, peak force 2E/s and compression time πs/(2v_a) of a free-robot hit", () => {
    const J = 0.010125;
    const omega = 400;
    const r = 0.09;
    const m = 13.6;
    const M = 13.6;
    const sim = simulate(J, omega, r, m, M, 2e7);
    const closed = rotorImpact({ inertia: J, spinSpeed: omega, tipRadius: r, targetMass: m, restitution: 1, selfMass: M });
    // The step (20 ns against a contact of about 0.7 ms) and the contact's touch and release between steps limit agreement to ~1e-4.
    expectClose(sim.omegaAfter, closed.spinSpeedAfter, 1e-3);
    expectClose(sim.targetVelocity, closed.targetVelocityAfter, 1e-4);
    expectClose(sim.selfVelocity, closed.selfVelocityAfter, 1e-4);
    expectClose(sim.impulse, closed.impulse, 1e-4);
    const estimate = impactForceEstimate({ energy: closed.compressionEnergy, stoppingDistance: sim.peakCrush, approachSpeed: closed.approachSpeed });
    expectClose(sim.peakForce, estimate.peak, 1e-4);
    expectClose(sim.timeAtPeak, estimate.compressionTime!, 1e-3);
  });
});

describe("force estimates", () => {
  it("takes the work–energy average E/s (HyperPhysics: the average force of impact times the distance travelled equals the work); regression pin: 3600 J over 10 mm is 360 kN", () => {
    const f = impactForceEstimate({ energy: 3600, stoppingDistance: 0.01 });
    expectClose(f.average, 360000, 1e-15);
    expectClose(f.peak, 720000, 1e-15);
    expectClose(f.timeAverage, (2 / Math.PI) * 720000, 1e-15);
    expect(f.compressionTime).toBeNull();
  });

  it("half-sine pulse: the peak is π/2 times the impulse over the duration (Lalanne, vol. II ch. 5: a half-sine A·sin(πt/τ) changes velocity by 2Aτ/π), checked by integrating the pulse", () => {
    const tau = 1e-3;
    const peak = halfSinePeakForce({ impulse: 2, duration: tau });
    let integral = 0;
    const n = 100000;
    for (let i = 0; i < n; i++) integral += peak * Math.sin((Math.PI * (i + 0.5)) / n) * (tau / n);
    expectClose(integral, 2, 1e-9);
  });

  it("agrees with itself: the time-average over the compression times its duration is the compression impulse μ·v_a", () => {
    const r = rotorImpact({ inertia: 0.02, spinSpeed: 600, tipRadius: 0.1, targetMass: 10, restitution: 0.3 });
    const f = impactForceEstimate({ energy: r.compressionEnergy, stoppingDistance: 0.004, approachSpeed: r.approachSpeed });
    expectClose(f.timeAverage * f.compressionTime!, r.reducedMass * r.approachSpeed, 1e-14);
  });
});

// ---------------------------------------------------------------------------------------------

describe("weaponHit", () => {
  const DEFAULTS = defaultsOf(weaponHitInputs) as WeaponHitInput;

  it("declares a unique URL key, a label and a default inside the range for every field", () => {
    expectWellDeclared(weaponHitInputs);
    expect(DEMO_HIT).toEqual(DEFAULTS);
  });

  it("gives the same bite as the drivetrain module's biteDepth (an independent implementation of d = v·T/n)", () => {
    const r = weaponHit(DEMO_HIT);
    expectClose(r.bite, biteDepth({ closingSpeed: 2, angularSpeed: rpm(8000), impactors: 2 }), 1e-15);
    expectClose(r.bite, 0.0075, 1e-12);
  });

  it("works the invented demo through: energies balance and the figures of its doc comment come out", () => {
    const r = weaponHit(DEMO_HIT);
    expectClose(r.tipSpeed, rpm(8000) * 0.09, 1e-15);
    expectClose(r.storedEnergy, 0.5 * 0.010125 * rpm(8000) ** 2, 1e-15);
    expectClose(r.impact.rotorEnergyDrop, r.impact.energyToTarget + r.impact.energyToSelf + r.impact.energyLost, 1e-12);
    expectClose(r.energyFractionUsed, r.impact.rotorEnergyDrop / r.storedEnergy, 1e-15);
    // Regression pins (our own digits).
    expectClose(r.impact.impulse, 95.53563747, 1e-9);
    expectClose(r.force.average, 150067.0284, 1e-9);
    expectClose(r.force.peak, 300134.0568, 1e-9);
    expect(r.speedRatioAfter).toBeLessThan(0);
  });

  it("names the field for every out-of-range, non-finite, null or missing value", () => {
    expectEachFieldNamed(weaponHitInputs, DEFAULTS, weaponHit, { numRuns: 300 });
    expect(() => weaponHit(null as unknown as WeaponHitInput)).toThrow(expect.objectContaining({ param: "input" }));
  });

  it("says what it expected and what it got", () => {
    expect(() => weaponHit({ ...DEFAULTS, impactors: 2.5 })).toThrow("impactors must be a whole number at least 1 and at most 16 (got 2.5)");
  });

  it("gives finite numbers for every valid input", () => {
    fc.assert(
      fc.property(validInputs(weaponHitInputs), (input) => expectFiniteOrNamedError(() => weaponHit(input), [])),
      { numRuns: 400 },
    );
  });
});

describe("fuzz: never a non-finite number, every bad input a named CalcInputError", () => {
  const RUNS = { numRuns: 300 };
  const PRIMITIVES: [string, (x: Record<string, unknown>) => unknown, string[]][] = [
    ["effectiveTipMass", (x) => effectiveTipMass(x as never), ["inertia", "tipRadius", "selfMass"]],
    ["rotorImpact", (x) => rotorImpact(x as never), ["inertia", "spinSpeed", "tipRadius", "targetMass", "restitution", "targetVelocity", "selfMass"]],
    ["impactForceEstimate", (x) => impactForceEstimate(x as never), ["energy", "stoppingDistance", "approachSpeed"]],
    ["halfSinePeakForce", (x) => halfSinePeakForce(x as never), ["impulse", "duration"]],
  ];
  it.each(PRIMITIVES.map((p) => [p[0], p] as const))("%s: finite over the whole double range, or a named CalcInputError", (_, [, fn, numeric]) => {
    for (const field of [anyFinite, anyField]) {
      fc.assert(
        fc.property(fc.record(Object.fromEntries(numeric.map((k) => [k, field]))), (numbers) => {
          expectFiniteOrNamedError(() => fn(numbers), numeric);
        }),
        RUNS,
      );
    }
    for (const nothing of [null, undefined]) expect(() => fn(nothing as never)).toThrow(expect.objectContaining({ name: "CalcInputError", param: "input" }));
  });

  it("weaponHit: finite numbers or a named CalcInputError for any value of its fields", () => {
    const names = Object.keys(weaponHitInputs);
    fc.assert(
      fc.property(fc.dictionary(fc.constantFrom(...names), anyField), (fields) => {
        expectFiniteOrNamedError(() => weaponHit({ ...DEMO_HIT, ...(fields as object) } as WeaponHitInput), names);
      }),
      RUNS,
    );
  });
});
