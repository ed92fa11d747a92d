/**
 * Edges of the drive-pulse bias and its heading drift (calc/steering/sensor-bias.ts): the window's
 * range with and without the opposite window, a fractional wheel count, and each result past the
 * largest double refused naming the caller's own input, with its unit and wording.
 */
import { describe, expect, it } from "vitest";
import { drivePulseBias, drivePulseHeadingDrift } from "../../../calc/steering/sensor-bias.ts";
import { refusal } from "../../support/refusal.ts";

describe("drivePulseBias input ranges", () => {
  it("accepts a three-quarter-turn window without the opposite window: b = −(F/M)·(w/2π)·sin β", () => {
    // b = −(2 N / 1 kg)·(1.5π/2π)·sin(π/2) = −2·0.75·1 = −1.5 m/s²
    expect(drivePulseBias({ pulseForce: 2, robotMass: 1, windowWidth: 1.5 * Math.PI, sensorAngle: Math.PI / 2 })).toBeCloseTo(-1.5, 12);
  });

  it("refuses a three-quarter-turn window with the opposite window (both must fit in one turn), naming the width in rad", () => {
    const error = refusal(() => drivePulseBias({ pulseForce: 2, robotMass: 1, windowWidth: 1.5 * Math.PI, oppositeWindow: true, sensorAngle: 0 }));
    expect(error.param).toBe("windowWidth");
    expect(error.value).toBe(1.5 * Math.PI);
    expect(error.unit).toBe("rad");
    expect(error.message).toContain("at most 3.14159");
  });

  it("refuses a window of zero width, naming the width", () => {
    const error = refusal(() => drivePulseBias({ pulseForce: 2, robotMass: 1, windowWidth: 0, sensorAngle: 0 }));
    expect(error.param).toBe("windowWidth");
    expect(error.message).toContain("greater than 0");
  });

  it("refuses a fractional wheel count as not a whole number", () => {
    const error = refusal(() => drivePulseBias({ pulseForce: 2, robotMass: 1, windowWidth: 1, wheelCount: 2.5, sensorAngle: 0 }));
    expect(error.param).toBe("wheelCount");
    expect(error.value).toBe(2.5);
    expect(error.expected).toBe("a whole number");
    expect(error.unit).toBe("");
  });

  it("refuses a bias past the largest double by naming the pulse force in N", () => {
    // b = −(1e300/1e-10)·1·sin(π/2) = −1e310 → −∞
    const error = refusal(() => drivePulseBias({ pulseForce: 1e300, robotMass: 1e-10, windowWidth: 2 * Math.PI, sensorAngle: Math.PI / 2 }));
    expect(error.param).toBe("pulseForce");
    expect(error.value).toBe(1e300);
    expect(error.unit).toBe("N");
    expect(error.expected).toBe("small enough for the bias to stay finite");
  });
});

describe("drivePulseHeadingDrift at the ends of the double range", () => {
  it("names the sensor radius in m when the single sensor's reading overflows", () => {
    // ω²r = 1e300·1e300 → ∞
    const error = refusal(() => drivePulseHeadingDrift({ bias: 1, angularSpeed: 1e150, sensorRadius: 1e300 }));
    expect(error.param).toBe("sensorRadius");
    expect(error.value).toBe(1e300);
    expect(error.unit).toBe("m");
    expect(error.expected).toBe("small enough for the drift to stay finite");
  });

  it("names the sensor radius in m when only the pair's summed reading overflows", () => {
    // ω²r = 1e8·1e300 = 1e308 (finite, one sensor); a₁ + a₂ = 2e308 → ∞ (the pair)
    const error = refusal(() => drivePulseHeadingDrift({ bias: 1, angularSpeed: 1e4, sensorRadius: 1e300 }));
    expect(error.param).toBe("sensorRadius");
    expect(error.value).toBe(1e300);
    expect(error.unit).toBe("m");
    expect(error.expected).toBe("small enough for the opposed sensors drift to stay finite");
  });

  it("names the bias in m/s², with the caller's sign, when one sensor of the pair overflows", () => {
    // ω²r = 1e308; the sensor the pulse adds to reads 1e308 + 1.7e308 → ∞; the single sensor reads 1e308 − 1.7e308 < 0 (no estimate)
    const error = refusal(() => drivePulseHeadingDrift({ bias: -1.7e308, angularSpeed: 1e154, sensorRadius: 1 }));
    expect(error.param).toBe("bias");
    expect(error.value).toBe(-1.7e308);
    expect(error.unit).toBe("m/s²");
    expect(error.expected).toBe("small enough for the opposed sensors drift to stay finite");
  });

  it("reports no single-sensor estimate and no pair drift when the pulse swamps the centripetal reading", () => {
    // ω²r = 1 m/s²; single: 1 − 1e308 < 0 → no estimate; pair: (1 − 1e308) + (1 + 1e308) rounds to 0 → no estimate, reported as 0 drift
    expect(drivePulseHeadingDrift({ bias: -1e308, angularSpeed: 1, sensorRadius: 1 })).toEqual({
      bias: -1e308,
      driftRate: null,
      driftPerRevolution: null,
      opposedPairDriftRate: 0,
    });
  });
});
