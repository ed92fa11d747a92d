/**
 * Edges of the wheels' gyroscopic loads (calc/steering/gyro.ts): the one-wheel load split on each
 * side of the skid's and the wheel's lift (exact ties included), the n-wheel split, and each result
 * past the largest double refused naming the input that drove it, with its unit and wording.
 */
import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { gyroscopicBearingForce, skidLiftSpeed, wheelNormalLoads } from "../../../calc/steering/gyro.ts";
import { refusal } from "../../support/refusal.ts";

const g = STANDARD_GRAVITY; // cgpm-1901: g_n = 9.80665 m/s²

describe("wheelNormalLoads, one wheel and a skid", () => {
  it("splits the weight with the gyroscopic shift below the lift speed, neither side lifted (the doc example)", () => {
    // J = 4e-6 + 3e-6 = 7e-6 kg·m²; ω_w = 100·0.07/0.018 = 388.89 rad/s; M_gy = 7e-6·388.89·100 = 0.27222 N·m
    // shift = M_gy/(2R) = 0.27222/0.14 = 1.94444 N; N_w = 1.5·9.80665/2 + 1.94444 = 9.29943 N; N_s = 14.70998 − 9.29943 = 5.41054 N
    const loads = wheelNormalLoads({
      wheelCount: 1,
      robotMass: 1.5,
      wheelInertia: 4e-6,
      rotorInertia: 3e-6,
      wheelRadius: 0.018,
      contactRadius: 0.07,
      spinSpeed: 100,
    });
    expect(loads.wheelLoad).toBeCloseTo(9.29943, 4);
    expect(loads.skidLoad).toBeCloseTo(5.41054, 4);
    expect(loads.skidLifted).toBe(false);
    expect(loads.wheelLifted).toBe(false);
    expect(loads.gyroscopicMoment).toBeCloseTo(0.272222, 5);
  });

  it("reports the skid lifted when the shift is exactly half the weight (N_s = 0 at the lift speed)", () => {
    // J_w = 9.80665 kg·m², Ω = 1 rad/s, R = r_w = 1 m: M_gy = 9.80665 N·m, shift = 4.903325 N = W/2 for M = 1 kg
    const loads = wheelNormalLoads({ wheelCount: 1, robotMass: 1, wheelInertia: g, wheelRadius: 1, contactRadius: 1, spinSpeed: 1 });
    expect(loads).toEqual({ wheelLoad: g, skidLoad: 0, skidLifted: true, wheelLifted: false, gyroscopicMoment: g });
  });

  it("reports the wheel lifted when a reversed rotor's shift is exactly minus half the weight (N_w = 0)", () => {
    // J = 0 − 1·9.80665 = −9.80665 kg·m²: M_gy = −9.80665 N·m, shift = −4.903325 N, N_w = 4.903325 − 4.903325 = 0
    const loads = wheelNormalLoads({
      wheelCount: 1,
      robotMass: 1,
      wheelInertia: 0,
      rotorInertia: g,
      rotorSense: -1,
      wheelRadius: 1,
      contactRadius: 1,
      spinSpeed: 1,
    });
    expect(loads).toEqual({ wheelLoad: 0, skidLoad: g, skidLifted: false, wheelLifted: true, gyroscopicMoment: -g });
  });

  it("puts the whole weight on the skid when a reversed rotor lifts the wheel well past its lift", () => {
    // J = −10·1e-4 = −1e-3 kg·m²; ω_w = 200·0.05/0.02 = 500 rad/s; M_gy = −1e-3·500·200 = −100 N·m; shift = −100/0.1 = −1000 N
    const loads = wheelNormalLoads({
      wheelCount: 1,
      robotMass: 1,
      wheelInertia: 0,
      rotorInertia: 1e-4,
      gearRatio: 10,
      rotorSense: -1,
      wheelRadius: 0.02,
      contactRadius: 0.05,
      spinSpeed: 200,
    });
    expect(loads.wheelLoad).toBe(0);
    expect(loads.skidLoad).toBeCloseTo(g, 12);
    expect(loads.skidLifted).toBe(false);
    expect(loads.wheelLifted).toBe(true);
    expect(loads.gyroscopicMoment).toBeCloseTo(-100, 9);
  });
});

describe("wheelNormalLoads, two or more wheels", () => {
  it("shares the wheels' part of the weight evenly and leaves the rest on the centre skid, nothing lifted", () => {
    // W = 2·9.80665 = 19.6133 N; N_w = 0.8·19.6133/2 = 7.84532 N; N_s = 0.2·19.6133 = 3.92266 N
    const loads = wheelNormalLoads({
      wheelCount: 2,
      robotMass: 2,
      weightShare: 0.8,
      wheelInertia: 4e-6,
      wheelRadius: 0.018,
      contactRadius: 0.07,
      spinSpeed: 300,
    });
    expect(loads.wheelLoad).toBeCloseTo(7.84532, 5);
    expect(loads.skidLoad).toBeCloseTo(3.92266, 5);
    expect(loads.skidLifted).toBe(false);
    expect(loads.wheelLifted).toBe(false);
  });

  it("refuses a fractional wheel count as not a whole number", () => {
    const error = refusal(() => wheelNormalLoads({ wheelCount: 1.5, robotMass: 1, wheelInertia: 1e-6, wheelRadius: 0.02, contactRadius: 0.05, spinSpeed: 0 }));
    expect(error.param).toBe("wheelCount");
    expect(error.value).toBe(1.5);
    expect(error.expected).toBe("a whole number");
    expect(error.unit).toBe("");
  });

  it("refuses a weight share of 0 (the wheels must carry some weight), naming the share without a unit", () => {
    const error = refusal(() =>
      wheelNormalLoads({ wheelCount: 2, robotMass: 1, weightShare: 0, wheelInertia: 1e-6, wheelRadius: 0.02, contactRadius: 0.05, spinSpeed: 0 }),
    );
    expect(error.param).toBe("weightShare");
    expect(error.value).toBe(0);
    expect(error.unit).toBe("");
    expect(error.message).toContain("greater than 0");
  });
});

describe("gyroscopic results past the largest double", () => {
  it("refuses a weight past the largest double by naming the robot mass in kg", () => {
    // W = 1e308·9.80665 > 1.8e308
    const error = refusal(() =>
      wheelNormalLoads({ wheelCount: 1, robotMass: 1e308, wheelInertia: 1e-6, wheelRadius: 0.02, contactRadius: 0.05, spinSpeed: 0 }),
    );
    expect(error.param).toBe("robotMass");
    expect(error.value).toBe(1e308);
    expect(error.unit).toBe("kg");
    expect(error.expected).toBe("small enough for the weight to stay finite");
  });

  it("refuses a load shift past the largest double by naming the spin speed in rad/s", () => {
    // ω_w = 1e155·1e-10/1 = 1e145; M_gy = 1·1e145·1e155 = 1e300 N·m (finite); shift = 1e300/(2·1e-10) = 5e309 N → ∞
    const error = refusal(() => wheelNormalLoads({ wheelCount: 1, robotMass: 1, wheelInertia: 1, wheelRadius: 1, contactRadius: 1e-10, spinSpeed: 1e155 }));
    expect(error.param).toBe("spinSpeed");
    expect(error.value).toBe(1e155);
    expect(error.unit).toBe("rad/s");
    expect(error.expected).toBe("small enough for the load shift to stay finite");
  });

  it("refuses a bearing force past the largest double by naming the bearing spacing in m", () => {
    // F = 1e300/1e-10 = 1e310 → ∞
    const error = refusal(() => gyroscopicBearingForce({ moment: 1e300, bearingSpacing: 1e-10 }));
    expect(error.param).toBe("bearingSpacing");
    expect(error.value).toBe(1e-10);
    expect(error.unit).toBe("m");
    expect(error.expected).toBe("large enough for the bearing force to stay finite");
  });

  it("refuses a spinning inertia past the largest double by naming the rotor inertia in kg·m²", () => {
    // J_w + G·J_m = 0 + 1e10·1e300 = 1e310 → ∞
    const error = refusal(() => skidLiftSpeed({ robotMass: 1, wheelRadius: 0.02, wheelInertia: 0, rotorInertia: 1e300, gearRatio: 1e10 }));
    expect(error.param).toBe("rotorInertia");
    expect(error.value).toBe(1e300);
    expect(error.unit).toBe("kg·m²");
    expect(error.expected).toBe("small enough for the angular momentum per wheel speed to stay finite");
  });

  it("refuses a lift speed past the largest double by naming the wheel inertia in kg·m²", () => {
    // Ω² = M·g/J·r_w = 1e10·9.80665/1e-300·1 ≈ 9.8e310 → ∞
    const error = refusal(() => skidLiftSpeed({ robotMass: 1e10, wheelRadius: 1, wheelInertia: 1e-300 }));
    expect(error.param).toBe("wheelInertia");
    expect(error.value).toBe(1e-300);
    expect(error.unit).toBe("kg·m²");
    expect(error.expected).toBe("large enough for the lift speed to stay finite");
  });
});

describe("skidLiftSpeed with no net spinning inertia", () => {
  it("never lifts the skid when a reversed rotor exactly cancels the wheel's inertia (J_w − G·J_m = 2e-6 − 2·1e-6 = 0)", () => {
    expect(skidLiftSpeed({ robotMass: 1.5, wheelRadius: 0.018, wheelInertia: 2e-6, rotorInertia: 1e-6, gearRatio: 2, rotorSense: -1 })).toBeNull();
  });

  it("never lifts the skid of a massless wheel with no rotor (J = 0)", () => {
    expect(skidLiftSpeed({ robotMass: 1.5, wheelRadius: 0.018, wheelInertia: 0 })).toBeNull();
  });
});
