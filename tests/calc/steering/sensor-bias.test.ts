/**
 * Drive pulses on a single heading accelerometer (calc/steering/sensor-bias.ts).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { headingDriftAt } from "../../../calc/heading/drift.ts";
import { pulseTrainFundamental } from "../../../calc/steering/kinematics.ts";
import { drivePulseBias, drivePulseHeadingDrift } from "../../../calc/steering/sensor-bias.ts";

const close = (actual: number, expected: number, rtol: number, atol = 0) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};

describe("the bias a one-wheel robot's pulses put on a radial sensor", () => {
  it("is −(ΔF/M)·(w/2π)·sin β: the pulse train's mean (oppenheim-willsky-signals) over the mass (newton-second-law)", () => {
    const w = Math.PI / 2;
    const duty = pulseTrainFundamental({ windowWidth: w }).dutyCycle;
    close(drivePulseBias({ pulseForce: 3, robotMass: 1.5, windowWidth: w, sensorAngle: Math.PI / 2 }), -(3 / 1.5) * duty, 1e-14);
    close(drivePulseBias({ pulseForce: 3, robotMass: 1.5, windowWidth: w, sensorAngle: Math.PI / 6 }), -(3 / 1.5) * duty * 0.5, 1e-12);
  });

  it("vanishes for a sensor on the line through the wheel, for the opposite window, and for two or more wheels", () => {
    const base = { pulseForce: 3, robotMass: 1.5, windowWidth: 1 };
    expect(drivePulseBias({ ...base, sensorAngle: 0 })).toBe(0);
    expect(drivePulseBias({ ...base, sensorAngle: Math.PI / 2, oppositeWindow: true })).toBe(0);
    for (const n of [2, 3, 4]) expect(drivePulseBias({ ...base, sensorAngle: 1.2, wheelCount: n })).toBe(0);
  });
});

describe("the heading drift it causes (spinner-heading-practice, in the terms of calc/heading/drift.ts)", () => {
  it("is ω̂ − ω with ω̂ = √((ω²r + b)/r), about b/(2rω)", () => {
    const d = drivePulseHeadingDrift({ bias: -0.5, angularSpeed: 314.16, sensorRadius: 0.012 });
    close(d.driftRate!, -0.5 / (2 * 0.012 * 314.16), 1e-3);
    close(
      d.driftRate!,
      headingDriftAt({ angularSpeed: 314.16, assumedRadius: 0.012, trueRadius: 0.012, scaleError: 0, bias: -0.5, biasCorrection: 0, tilt: 0 }).driftRate!,
      1e-15,
    );
    close(d.driftPerRevolution!, (2 * Math.PI * d.driftRate!) / 314.16, 1e-12);
  });

  it("is cancelled by two opposed sensors, whose sum does not see the centre's acceleration (hibbeler-dynamics-2016 §16.7)", () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: 20, max: 2000, noNaN: true }), (b, w) => {
        close(drivePulseHeadingDrift({ bias: b, angularSpeed: w, sensorRadius: 0.012 }).opposedPairDriftRate, 0, 0, 1e-9 * w);
      }),
    );
  });

  it("refuses bad inputs by name and never returns a non-finite number", () => {
    expect(() => drivePulseBias({ pulseForce: -1, robotMass: 1, windowWidth: 1, sensorAngle: 0 })).toThrowError(CalcInputError);
    expect(() => drivePulseHeadingDrift({ bias: 1, angularSpeed: 0, sensorRadius: 0.01 })).toThrowError(
      "angularSpeed must be greater than 0 rad/s (got 0 rad/s)",
    );
    const any = fc.oneof(fc.double(), fc.constantFrom(0, Number.MIN_VALUE, Number.MAX_VALUE, -Number.MAX_VALUE));
    fc.assert(
      fc.property(any, any, any, any, (a, b, c, d) => {
        try {
          expect(Number.isFinite(drivePulseBias({ pulseForce: a, robotMass: b, windowWidth: c, sensorAngle: d }))).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(CalcInputError);
        }
        try {
          const r = drivePulseHeadingDrift({ bias: a, angularSpeed: b, sensorRadius: c });
          for (const v of [r.driftRate, r.driftPerRevolution, r.opposedPairDriftRate]) if (v !== null) expect(Number.isFinite(v)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(CalcInputError);
        }
      }),
      { numRuns: 400 },
    );
  });
});
