import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { coupleLift, spinCentre } from "../../../calc/mass/spin-centre.ts";
import { massBalance, massBalanceInputs, type MassBalanceScalars } from "../../../calc/mass/mass-balance.ts";
import { massProperties } from "../../../calc/mass/properties.ts";
import { trueSensorRadius } from "../../../calc/mass/sensor.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import type { LayoutPart } from "../../../calc/mass/parts.ts";
import { refusal as thrown } from "../../support/refusal.ts";

const DEFAULTS = Object.fromEntries(Object.entries(massBalanceInputs).map(([k, spec]) => [k, spec.default])) as MassBalanceScalars;
const RPM_2400 = rpmToRadPerSecond(2400);
const point = (mass: number, x: number, y: number, z = 0): LayoutPart => ({ name: "p", shape: { kind: "point" }, mass: { kind: "given", mass }, x, y, z });

function rel(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

describe("spinCentre: reference checks", () => {
  const cases = [
    {
      source: "OpenStax College Physics (2012)",
      locator: "Example 6.3, a car on a flat curve: 25.0 m/s on r = 500 m needs μs = 0.13",
      // Same centripetal acceleration v²/r = 1.25 m/s² on a 50 m orbit (positions are limited to 100 m): Ω² = 0.025 s⁻².
      inputs: { centreX: 50, centreY: 0, angularSpeed: Math.sqrt(0.025), sideGrip: 1, gripShare: 1 },
      expected: 0.13,
      rtol: 5e-2,
      note: "the grip the orbit needs, e·Ω²/g, is the friction coefficient the book finds (printed to 2 figures)",
      read: (r: ReturnType<typeof spinCentre>) => r.gripShareNeeded!,
    },
    {
      source: "Serway & Beichner, Physics for Scientists and Engineers, 5th ed.",
      locator: "Table 5.2, rubber on concrete μk = 0.8; with g_n = 9.80665 m/s² (NIST SP 811)",
      inputs: { centreX: 0.002, centreY: 0, angularSpeed: 100, sideGrip: 0.8, gripShare: 1 },
      // d_g = 0.8 × 9.80665 / 100² = 7.845e-4 m, worked by hand from the table's coefficient.
      expected: 7.845e-4,
      rtol: 5e-3,
      note: "grip radius μ g/Ω² at 100 rad/s",
      read: (r: ReturnType<typeof spinCentre>) => r.gripRadius,
    },
  ];
  it.each(cases)("$source, $locator", ({ inputs, expected, rtol, read }) => {
    expect(rel(read(spinCentre(inputs)), expected)).toBeLessThanOrEqual(rtol);
  });
});

describe("spinCentre: behaviour", () => {
  it("keeps the wheels' centre still while the grip holds the centre of mass on its orbit", () => {
    const r = spinCentre({ centreX: 0.0001, centreY: 0, angularSpeed: RPM_2400, sideGrip: 0.8, gripShare: 0.9 });
    expect(r.state).toBe("wheels-hold");
    expect([r.centreX, r.centreY, r.distanceFromWheels]).toEqual([0, 0, 0]);
    expect(r.gripShareNeeded!).toBeLessThan(1);
  });

  it("puts the spin centre the grip radius short of the centre of mass once the wheels slide", () => {
    const r = spinCentre({ centreX: 0.0012, centreY: -0.0016, angularSpeed: RPM_2400, sideGrip: 0.8, gripShare: 0.9 });
    expect(r.state).toBe("wheels-slide");
    // Second method, Newton's second law: the grip force μ s M g keeps the centre of mass on its orbit about the spin centre.
    const orbit = Math.hypot(0.0012 - r.centreX, -0.0016 - r.centreY);
    expect(rel(orbit * RPM_2400 ** 2, 0.8 * 0.9 * STANDARD_GRAVITY)).toBeLessThan(1e-12);
    // On the line to the centre of mass.
    expect(Math.abs(r.centreX * -0.0016 - r.centreY * 0.0012)).toBeLessThan(1e-18);
  });

  it("turns about the centre of mass when the wheels have no grip (the earlier model)", () => {
    const r = spinCentre({ centreX: 0.0017, centreY: 0.0003, angularSpeed: RPM_2400, sideGrip: 0, gripShare: 0.9 });
    expect([r.centreX, r.centreY]).toEqual([0.0017, 0.0003]);
    expect(r.gripShareNeeded).toBeNull();
  });

  it("turns about the wheels' centre at any offset when the speed is low enough", () => {
    const r = spinCentre({ centreX: 0.005, centreY: 0, angularSpeed: 10, sideGrip: 0.8, gripShare: 0.9 });
    expect(r.state).toBe("wheels-hold");
  });

  it("names the input that is out of range", () => {
    const ok = { centreX: 0.001, centreY: 0, angularSpeed: 100, sideGrip: 0.8, gripShare: 0.9 };
    expect(thrown(() => spinCentre({ ...ok, sideGrip: -0.1 })).param).toBe("sideGrip");
    expect(thrown(() => spinCentre({ ...ok, gripShare: 1.5 })).param).toBe("gripShare");
    expect(thrown(() => spinCentre({ ...ok, angularSpeed: 0 })).param).toBe("angularSpeed");
    expect(thrown(() => spinCentre({ ...ok, angularSpeed: 1e-300 })).param).toBe("angularSpeed");
    expect(thrown(() => spinCentre(null as never)).param).toBe("input");
  });

  it("never returns a non-finite number (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: Number.MIN_VALUE, max: Number.MAX_VALUE, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (centreX, centreY, angularSpeed, sideGrip, gripShare) => {
          try {
            const r = spinCentre({ centreX, centreY, angularSpeed, sideGrip, gripShare });
            for (const v of [r.gripRadius, r.offset, r.centreX, r.centreY, r.distanceFromWheels, r.gripShareNeeded ?? 0]) expect(Number.isFinite(v)).toBe(true);
            expect(r.distanceFromWheels).toBeLessThanOrEqual(r.offset * (1 + 1e-12));
          } catch (error) {
            expect(error).toBeInstanceOf(CalcInputError);
            expect((error as CalcInputError).param).toBe("angularSpeed");
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe("coupleLift: reference checks", () => {
  it("Newton's second law (OpenStax University Physics vol. 1, §6.3), two point masses: the rocking moment is the couple of their centripetal forces", () => {
    // 10 g at (50 mm, 0, +10 mm) and 10 g at (−50 mm, 0, −10 mm): forces m r Ω² at heights ±10 mm, 20 mm apart.
    const parts = [point(0.01, 0.05, 0, 0.01), point(0.01, -0.05, 0, -0.01)];
    const layout = massProperties(parts);
    const byForces = 0.01 * 0.05 * RPM_2400 ** 2 * 0.02;
    const r = coupleLift({ couple: Math.hypot(layout.productXZ, layout.productYZ), totalMass: 1.4, supportRadius: 0.07, angularSpeed: RPM_2400 });
    expect(rel(r.rockingMoment, byForces)).toBeLessThan(1e-12);
  });

  it("lifts exactly at the lift speed (round trip)", () => {
    const r = coupleLift({ couple: 3e-6, totalMass: 2, supportRadius: 0.05, angularSpeed: 100 });
    const atLift = coupleLift({ couple: 3e-6, totalMass: 2, supportRadius: 0.05, angularSpeed: r.liftSpeed! });
    expect(atLift.ratio).toBeCloseTo(1, 12);
    expect(r.restoringMoment).toBeCloseTo(2 * STANDARD_GRAVITY * 0.05, 14);
  });

  it("has no lift speed without a couple", () => {
    expect(coupleLift({ couple: 0, totalMass: 1, supportRadius: 0.05, angularSpeed: 300 })).toMatchObject({ ratio: 0, liftSpeed: null });
  });

  it("stays finite for the smallest couple and refuses a moment beyond the double range", () => {
    expect(Number.isFinite(coupleLift({ couple: Number.MIN_VALUE, totalMass: 1e4, supportRadius: 2, angularSpeed: 1 }).liftSpeed)).toBe(true);
    expect(thrown(() => coupleLift({ couple: 1, totalMass: 1, supportRadius: 0.05, angularSpeed: 1e300 })).param).toBe("angularSpeed");
    expect(thrown(() => coupleLift({ couple: 1, totalMass: 0, supportRadius: 0.05, angularSpeed: 1 })).param).toBe("totalMass");
    expect(thrown(() => coupleLift({ couple: 1, totalMass: 1, supportRadius: -1, angularSpeed: 1 })).param).toBe("supportRadius");
  });

  it("names the couple, the mass or the support radius that takes a moment past the largest double, with its value and unit", () => {
    // Ω²·C = 1000² × 1e305 = 1e311 N·m; M·g·a = 1e308 × 9.80665 × 2 = 2.0e309 N·m and
    // 1.4 × 9.80665 × 1e308 = 1.4e309 N·m: each past the largest double (about 1.8e308).
    const cases = [
      [{ couple: 1e305, totalMass: 1.4, supportRadius: 0.07, angularSpeed: 1000 }, "couple", 1e305, "kg·m²", "1e+305"],
      [{ couple: 1e-5, totalMass: 1e308, supportRadius: 2, angularSpeed: RPM_2400 }, "totalMass", 1e308, "kg", "1e+308"],
      [{ couple: 1e-5, totalMass: 1.4, supportRadius: 1e308, angularSpeed: RPM_2400 }, "supportRadius", 1e308, "m", "1e+308"],
    ] as const;
    for (const [input, param, value, unit, shown] of cases) {
      const e = thrown(() => coupleLift(input));
      expect([e.param, e.value, e.unit]).toEqual([param, value, unit]);
      expect(e.message).toBe(`${param} must be small enough for the couple lift to stay finite (got ${shown} ${unit})`);
    }
  });
});

describe("regression pins from the engineering review (our own digits)", () => {
  it("a 0.1 mm offset with the sensor at 12 mm drifts 0 per revolution at 2400 rpm, not the +1.50° the centre-of-mass model gave", () => {
    const input = { ...DEFAULTS, sensorX: -0.012, sensorY: 0, parts: [point(1, 0.0001, 0)] };
    const r = massBalance(input);
    expect(r.spinCentre.before.state).toBe("wheels-hold");
    expect(r.sensor.before.driftPerRevolution).toBe(0);
    // The earlier figure, about the centre of mass.
    const old = trueSensorRadius({ centreX: 0.0001, centreY: 0, sensorX: -0.012, sensorY: 0 });
    expect((old.driftPerRevolution * 180) / Math.PI).toBeCloseTo(1.497, 3);
    // With no side grip the earlier figure comes back.
    expect(massBalance({ ...input, sideGrip: 0 }).sensor.before.driftPerRevolution).toBe(old.driftPerRevolution);
  });

  it("the documented couple (10 g pairs at ±50 mm, ±10 mm) on a 1.4 kg robot standing on 70 mm is about 66 % of the weight's moment at 2400 rpm and lifts near 3000 rpm", () => {
    const r = coupleLift({ couple: 1e-5, totalMass: 1.4, supportRadius: 0.07, angularSpeed: RPM_2400 });
    expect(r.ratio).toBeCloseTo(0.6573, 4);
    expect((r.liftSpeed! * 60) / (2 * Math.PI)).toBeCloseTo(2960.4, 1);
  });
});

describe("the spin centre at its edges", () => {
  const spin = { angularSpeed: 250, sideGrip: 0.8, gripShare: 0.9 };

  it("lets the wheels hold an orbit exactly as large as the grip allows", () => {
    const { gripRadius } = spinCentre({ ...spin, centreX: 0, centreY: 0 });
    const edge = spinCentre({ ...spin, centreX: gripRadius, centreY: 0 });
    expect([edge.state, edge.gripShareNeeded]).toEqual(["wheels-hold", 1]);
    expect(spinCentre({ ...spin, centreX: gripRadius * (1 + 1e-12), centreY: 0 }).state).toBe("wheels-slide");
  });

  it("puts a holding spin centre at +0, never −0 (a link or a label would show “−0 mm”)", () => {
    const held = spinCentre({ ...spin, centreX: -1e-5, centreY: -1e-5 });
    expect(held.state).toBe("wheels-hold");
    expect(Object.is(held.centreX, 0) && Object.is(held.centreY, 0)).toBe(true);
  });

  it("needs no share of the grip for a centred robot, even with no grip at all", () => {
    expect(spinCentre({ ...spin, sideGrip: 0, centreX: 0, centreY: 0 })).toMatchObject({ state: "wheels-hold", gripRadius: 0, gripShareNeeded: 0 });
    expect(spinCentre({ ...spin, sideGrip: 0, centreX: 1e-4, centreY: 0 }).gripShareNeeded).toBeNull();
  });
});
