/**
 * Edges of the steering closed forms (calc/steering/kinematics.ts): each result past the largest
 * double refused naming the input that drove it, with its unit and wording, and a straight path
 * reported without a radius. Overflow values are chosen by hand so one product passes ~1.8e308.
 */
import { describe, expect, it } from "vitest";
import {
  differentialDriveKinematics,
  differentialDriveWheelSpeeds,
  kinematicRimSpeedDepth,
  kinematicTranslationSpeed,
} from "../../../calc/steering/kinematics.ts";
import { refusal } from "../../support/refusal.ts";

describe("steering closed forms past the double range", () => {
  it("refuses a rim-speed depth past the largest double by naming the voltage in V", () => {
    // δ = ΔD·V/G·Kv·r_w = 1 · 1e300 / 1 · 1e10 · 1 = 1e310 > 1.8e308
    const error = refusal(() => kinematicRimSpeedDepth({ dutyStep: 1, voltage: 1e300, kv: 1e10, wheelRadius: 1 }));
    expect(error.param).toBe("voltage");
    expect(error.value).toBe(1e300);
    expect(error.unit).toBe("V");
    expect(error.expected).toBe("small enough for the rim speed to stay finite");
  });

  it("refuses a turn rate past the largest double by naming the track in m", () => {
    // ω = v_R/b − v_L/b = 1e300/1e-10 − (−1e300/1e-10) = 1e310 + 1e310 → ∞
    const error = refusal(() => differentialDriveKinematics({ leftSpeed: -1e300, rightSpeed: 1e300, track: 1e-10 }));
    expect(error.param).toBe("track");
    expect(error.value).toBe(1e-10);
    expect(error.unit).toBe("m");
    expect(error.expected).toBe("large enough for the turn rate to stay finite");
  });

  it("refuses a right rim speed past the largest double by naming the speed in m/s", () => {
    // half = ω·b/2 = 1e308 · 2/2 = 1e308; v_R = 1e308 + 1e308 = 2e308 → ∞, v_L = 0
    const error = refusal(() => differentialDriveWheelSpeeds({ speed: 1e308, turnRate: 1e308, track: 2 }));
    expect(error.param).toBe("speed");
    expect(error.value).toBe(1e308);
    expect(error.unit).toBe("m/s");
    expect(error.expected).toBe("small enough for the right rim speed to stay finite");
  });

  it("refuses a left rim speed past the largest double by naming the speed in m/s", () => {
    // half = 1e308; v_L = −1e308 − 1e308 = −2e308 → −∞, v_R = 0
    const error = refusal(() => differentialDriveWheelSpeeds({ speed: -1e308, turnRate: 1e308, track: 2 }));
    expect(error.param).toBe("speed");
    expect(error.value).toBe(-1e308);
    expect(error.unit).toBe("m/s");
    expect(error.expected).toBe("small enough for the left rim speed to stay finite");
  });
});

describe("steering closed forms at their quiet ends", () => {
  it("reports no turn radius when both wheels are stopped (ω = 0, v = 0)", () => {
    expect(differentialDriveKinematics({ leftSpeed: 0, rightSpeed: 0, track: 0.25 })).toEqual({ speed: 0, turnRate: 0, turnRadius: null });
  });

  it("reports no turn radius when driving straight (ω = 0, v = 1.5 m/s)", () => {
    expect(differentialDriveKinematics({ leftSpeed: 1.5, rightSpeed: 1.5, track: 0.25 }).turnRadius).toBeNull();
  });

  it("keeps the largest depth finite: δ = 1e308 m/s over a half-turn window with the opposite window gives 2/π·1e308", () => {
    // v̄ = 2·δ·sin(π/2)/π = (2/π)·1e308 ≈ 6.3662e307, below the largest double
    const v = kinematicTranslationSpeed({ depth: 1e308, windowWidth: Math.PI, oppositeWindow: true });
    expect(v / 1e308).toBeCloseTo(2 / Math.PI, 12);
  });
});
