/**
 * The sensor's true radius (calc/mass/sensor.ts) at its edges: the figures derived from the rate
 * ratio, a sensor right on the spin axis, a single axis that reads nothing, and the refusals (each
 * names the field, its value and SI unit, as the page shows them). Formulas from the function's
 * documentation (openstax-college-physics, a = ω²r): ω̂/ω = √(r/r̂), drift 2π(√(r/r̂) − 1) per turn.
 */
import { describe, expect, it } from "vitest";
import { trueSensorRadius } from "#calc";
import { refusal } from "../../support/refusal.ts";

describe("figures derived from the rate ratio", () => {
  it("gives the rate error and the single axis's drift of a sensor 32 mm out with the centre of mass 2 mm beyond it", () => {
    // r = 34 mm, r̂ = 32 mm: ω̂/ω − 1 = √(34/32) − 1 = 0.030776; the axis aimed at the centre reads the
    // whole acceleration here (the offset is radial), so its drift is the same 2π × 0.030776 = 0.19337 rad.
    const s = trueSensorRadius({ centreX: 0.002, centreY: 0, sensorX: -0.032, sensorY: 0 });
    expect(s.rateError).toBeCloseTo(Math.sqrt(34 / 32) - 1, 15);
    expect(s.rateError).toBeCloseTo(0.030776, 6);
    expect(s.singleAxis!.driftPerRevolution).toBeCloseTo(2 * Math.PI * (Math.sqrt(34 / 32) - 1), 15);
    expect(s.singleAxis!.driftPerRevolution).toBeCloseTo(0.19337, 5);
  });

  it("shows a sensor right on the spin axis reading nothing: rate ratio 0, the estimate losing a full turn per turn, and no misalignment", () => {
    // Sensor at (−30, −40) mm and the centre of mass there too: r = 0, r̂ = 50 mm.
    const s = trueSensorRadius({ centreX: -0.03, centreY: -0.04, sensorX: -0.03, sensorY: -0.04 });
    expect([s.radiusTrue, s.rateRatio, s.rateError]).toEqual([0, 0, -1]);
    expect(s.difference).toBeCloseTo(-0.05, 15);
    expect(s.driftPerRevolution).toBeCloseTo(-2 * Math.PI, 15);
    // No direction to the true centre: 0, not the 180° that atan2(0, −0) would give.
    expect(s.axisMisalignment).toBe(0);
    expect(s.singleAxis).toBeNull();
  });

  it("has no single-axis reading when the centre of mass lies square to the sensor's axis at its own depth", () => {
    // Sensor at (30, 0) mm, centre of mass at (30, 10) mm: the radial component r̂ − c·p̂ = 30 − 30 = 0.
    const s = trueSensorRadius({ centreX: 0.03, centreY: 0.01, sensorX: 0.03, sensorY: 0 });
    expect(s.radiusTrue).toBeCloseTo(0.01, 15);
    expect(s.singleAxis).toBeNull();
  });
});

describe("refusals of the sensor radius", () => {
  it("refuses a sensor at the geometric centre, naming sensorX in m", () => {
    const error = refusal(() => trueSensorRadius({ centreX: 0.001, centreY: 0, sensorX: 0, sensorY: 0 }));
    expect([error.param, error.value, error.unit]).toEqual(["sensorX", 0, "m"]);
    expect(error.message).toBe("sensorX must be a sensor position away from the geometric centre (radius greater than 0 m) (got 0 m)");
  });

  it("names the sensor coordinate so close to the centre that the rate ratio passes the largest double", () => {
    // r/r̂ = 1 m / 1e-315 m = 1e315, past the largest double (about 1.8e308).
    const x = refusal(() => trueSensorRadius({ centreX: 1, centreY: 0, sensorX: 1e-315, sensorY: 0 }));
    expect([x.param, x.value, x.unit]).toEqual(["sensorX", 1e-315, "m"]);
    expect(x.message).toBe("sensorX must be large enough for the rate ratio to stay finite (got 1e-315 m)");
    const y = refusal(() => trueSensorRadius({ centreX: 0, centreY: 1, sensorX: 0, sensorY: 1e-315 }));
    expect([y.param, y.value, y.unit]).toEqual(["sensorY", 1e-315, "m"]);
    expect(y.message).toBe("sensorY must be large enough for the rate ratio to stay finite (got 1e-315 m)");
  });
});
